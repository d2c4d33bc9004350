package spec

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilwright/parts/wire"
)

// WireSpec is the [wire] table: the wire the coil is wound from and how its
// springback is modelled.
type WireSpec struct {
	Material   string  `toml:"material"`    // material id from the library (`coilwright materials`)
	DiameterMM float64 `toml:"diameter_mm"` // bare wire diameter, 0.2–6 mm
	// SpringbackModel is "perfectly-plastic" (default) or "hardening" (the
	// material's strain-hardening law where the library has one).
	SpringbackModel string `toml:"springback_model"`
	// Calibration is the path of a calibration file written by
	// `coilwright calibrate`, relative to the spec file; empty for none.
	Calibration string `toml:"calibration"`
	// InspectionToleranceMM overrides the per-turn inspection tolerance on
	// the relaxed centreline diameter, mm (0.02–5).
	InspectionToleranceMM *float64 `toml:"inspection_tolerance_mm"`

	calibration *wire.Calibration // attached by AttachCalibration
}

// Limits of the [wire] table, in mm.
const (
	MinWireMM      = wire.MinDiameterMM
	MaxWireMM      = wire.MaxDiameterMM
	MinToleranceMM = 0.02
	MaxToleranceMM = 5.0
)

// Springback models a spec can name.
const (
	ModelPerfectlyPlastic = "perfectly-plastic"
	ModelHardening        = "hardening"
)

// CalibrationDiameterSlack is the relative difference between the spec's
// wire and a calibration's test wire beyond which the design warns.
// Common practice (no published source): wire of another gauge is another
// draw, with its own temper.
const CalibrationDiameterSlack = 0.02

func (w *WireSpec) validate(c *checker, s *Spec) {
	if w.Material == "" {
		c.fail("wire.material", "", "is required", `add material = "copper-annealed" to [wire]`)
	} else if _, err := wire.LookupMaterial(w.Material); err != nil {
		c.fail("wire.material", strconv.Quote(w.Material), "is not in the material library: must be one of "+quoteAll(wire.MaterialIDs()),
			"pick an id from `coilwright materials`")
	}
	c.oneOf("wire.springback_model", &w.SpringbackModel, ModelPerfectlyPlastic, ModelPerfectlyPlastic, ModelHardening)
	if w.InspectionToleranceMM != nil {
		c.within("wire.inspection_tolerance_mm", *w.InspectionToleranceMM, MinToleranceMM, MaxToleranceMM, "mm")
	}
	if c.has("wire.calibration") && strings.TrimSpace(w.Calibration) == "" {
		c.fail("wire.calibration", `""`, "must name a calibration file", "delete the key, or give the file `coilwright calibrate` wrote")
	}
	if !c.has("wire.diameter_mm") && w.DiameterMM == 0 {
		c.fail("wire.diameter_mm", "", fmt.Sprintf("is required: %s to %s mm", num(MinWireMM), num(MaxWireMM)), "add diameter_mm = 1.0 to [wire]")
		return
	}
	if math.IsNaN(w.DiameterMM) || !c.within("wire.diameter_mm", w.DiameterMM, MinWireMM, MaxWireMM, "mm") {
		return
	}
}

// Hardening reports whether the spec asks for the hardening springback model.
func (w *WireSpec) Hardening() bool { return w.SpringbackModel == ModelHardening }

// AttachCalibration gives the spec the calibration read from the file its
// wire.calibration key names; NewDesign then uses the calibrated yield. It
// returns a *SpecError when the calibration is for another material or was
// fitted with the other springback model; whether a former can then wind
// the coil is checked by the design. It mutates s.
func (s *Spec) AttachCalibration(cal wire.Calibration) error {
	w := &s.Wire
	fail := func(problem, fix string) error {
		return &SpecError{Key: "wire.calibration", Line: s.Line("wire.calibration"), Value: strconv.Quote(w.Calibration), Problem: problem, Fix: fix}
	}
	if cal.Material != w.Material {
		return fail(fmt.Sprintf("calibration is for material %q, but wire.material = %q", cal.Material, w.Material),
			"calibrate this wire, or point to its own calibration file")
	}
	if cal.Hardening != w.Hardening() {
		model := ModelPerfectlyPlastic
		if cal.Hardening {
			model = ModelHardening
		}
		return fail(fmt.Sprintf("calibration was fitted with springback_model = %q, the spec asks for %q", model, w.SpringbackModel),
			fmt.Sprintf("set springback_model = %q, or calibrate again with the spec's model", model))
	}
	w.calibration = &cal
	return nil
}

// CalibrationData returns the attached calibration, or nil.
func (w *WireSpec) CalibrationData() *wire.Calibration { return w.calibration }
