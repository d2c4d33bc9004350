package main

import (
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"strconv"

	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// attachCalibration reads the calibration file a spec's wire.calibration key
// names (relative to the spec's folder, or to the working folder for an
// embedded demo) and attaches it to the spec.
func attachCalibration(specPath string, s *spec.Spec) error {
	name := s.Wire.Calibration
	if name == "" {
		return nil
	}
	path := name
	if !filepath.IsAbs(path) && specPath != "" {
		path = filepath.Join(filepath.Dir(specPath), name)
	}
	b, err := os.ReadFile(path)
	if errors.Is(err, fs.ErrNotExist) {
		return &spec.SpecError{Key: "wire.calibration", Line: s.Line("wire.calibration"), Value: strconv.Quote(name),
			Problem: "calibration file not found at " + path + " (the name is relative to the spec's folder)",
			Fix:     "write one with `coilwright calibrate ... -o " + path + "`, or remove wire.calibration from the spec"}
	}
	if err != nil {
		return inputError{path, err}
	}
	cal, err := wire.ParseCalibration(b)
	if err != nil {
		return inputError{path, err}
	}
	return s.AttachCalibration(cal)
}
