package wire

import (
	"fmt"
	"math"
)

// Ranges of the values a calibration file carries.
const (
	// MinCalibratedYieldMPa and MaxCalibratedYieldMPa bound an effective
	// yield. From memory: annealed copper yields near 30–70 MPa, and the
	// hardest drawn steel wire reaches about 3 GPa in tension, so 5 GPa is
	// beyond any wire that can be wound.
	MinCalibratedYieldMPa = 1.0
	MaxCalibratedYieldMPa = 5000.0
	// MaxCalibrationSpacingMM bounds the test coil's spacing per turn.
	// Common practice (no published source): a test coil is close-wound or
	// a few wire diameters apart.
	MaxCalibrationSpacingMM = 100.0
	// MaxCalibrationPoints bounds the measured coils in one file.
	MaxCalibrationPoints = 1000
	// maxCalibrationBytes bounds a calibration file's size; one holds a few
	// hundred bytes a measurement.
	maxCalibrationBytes = 1 << 20
)

// bracketMaxSteps bounds every bracket-growing loop: doubling an interval
// from the smallest positive float64 overflows in fewer than 2100 steps.
const bracketMaxSteps = 2100

// validateRanges checks that every number in c is finite and within its
// physical range, so that no solve starts from a value the model cannot
// bend.
func (c Calibration) validateRanges() error {
	finite := func(key string, v float64) error {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return fmt.Errorf("calibration: %s = %g: must be a finite number", key, v)
		}
		return nil
	}
	within := func(key string, v, lo, hi float64, unit string) error {
		if err := finite(key, v); err != nil {
			return err
		}
		if v < lo || v > hi {
			return fmt.Errorf("calibration: %s = %g: must be between %g and %g %s", key, v, lo, hi, unit)
		}
		return nil
	}
	checks := []error{
		within("wire_diameter_mm", c.WireDiameter, MinDiameterMM, MaxDiameterMM, "mm"),
		within("effective_yield_mpa", c.EffectiveYield, MinCalibratedYieldMPa, MaxCalibratedYieldMPa, "MPa"),
		within("library_yield_mpa", c.LibraryYield, MinCalibratedYieldMPa, MaxCalibratedYieldMPa, "MPa"),
		within("spacing_mm", c.Spacing, 0, MaxCalibrationSpacingMM, "mm"),
		finite("residual_rms_mm", c.ResidualRMS),
		finite("yield_uncertainty_mpa", c.YieldUncertainty),
	}
	if len(c.Measurements) > MaxCalibrationPoints {
		checks = append(checks, fmt.Errorf("calibration: %d measurements: at most %d", len(c.Measurements), MaxCalibrationPoints))
	}
	for i, m := range c.Measurements {
		checks = append(checks,
			finite(fmt.Sprintf("measurement %d former_diameter_mm", i+1), m.FormerDiameter),
			finite(fmt.Sprintf("measurement %d relaxed_diameter_mm", i+1), m.RelaxedDiameter),
			finite(fmt.Sprintf("measurement %d predicted_diameter_mm", i+1), m.PredictedDiameter))
	}
	for _, err := range checks {
		if err != nil {
			return err
		}
	}
	return nil
}

// The wire diameters, in mm, the tool designs for and a calibration may
// record. Common practice (no published source): hand-wound helices use
// wire from about 0.2 mm to 6 mm.
const (
	MinDiameterMM = 0.2
	MaxDiameterMM = 6.0
)
