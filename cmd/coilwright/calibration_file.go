package main

import (
	"errors"
	"path/filepath"

	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// attachCalibration reads the calibration file a spec's wire.calibration key
// names (relative to the spec's folder, or to the working folder for an
// embedded demo) and attaches it to the spec. Every problem with the file
// is a *spec.SpecError on wire.calibration, with its line and a fix.
func attachCalibration(specPath string, s *spec.Spec) error {
	name := s.Wire.Calibration
	if name == "" {
		return nil
	}
	path := name
	if !filepath.IsAbs(path) && specPath != "" {
		path = filepath.Join(filepath.Dir(specPath), name)
	}
	fail := func(problem, fix string) error {
		return &spec.SpecError{Key: "wire.calibration", Line: s.Line("wire.calibration"), Value: clipQuote(name),
			Problem: problem, Fix: fix}
	}
	b, err := readInputFile(path)
	if errors.Is(err, errNotFound) {
		return fail("calibration file not found at "+clipQuote(path)+" (the name is relative to the spec's folder)",
			"write one with `coilwright calibrate ... -o "+clipQuote(path)+"`, or remove wire.calibration from the spec")
	}
	if err != nil {
		return fail("calibration file "+clipQuote(path)+": "+err.Error(),
			"name the file `coilwright calibrate` wrote, or remove wire.calibration from the spec")
	}
	cal, err := wire.ParseCalibration(b)
	if err != nil {
		return fail("calibration file "+clipQuote(path)+": "+err.Error(),
			"write the file again with `coilwright calibrate ... -o "+clipQuote(path)+"`, or remove wire.calibration from the spec")
	}
	return s.AttachCalibration(cal)
}
