package spec

import (
	"fmt"
	"math"
	"strconv"
)

// CoilSpec is the [coil] table: the shape, size, pitch, hand and feed of the
// helix. Sizes are of the wire centreline. Each end takes a diameter in mm or
// a circumference in wavelengths, not both; the pitch takes an angle or an
// axial spacing per turn, not both.
type CoilSpec struct {
	Shape             string   `toml:"shape"`                // "cylindrical" or "conical"
	Turns             float64  `toml:"turns"`                // 1–50, fractional allowed
	Hand              string   `toml:"hand"`                 // "RHCP" or "LHCP"
	Feed              string   `toml:"feed"`                 // "centre" (axial) or "periphery"
	FirstTurnHeightMM *float64 `toml:"first_turn_height_mm"` // wire centre above the reflector at the feed end

	BaseDiameterMM          *float64 `toml:"base_diameter_mm"`
	BaseCircumferenceLambda *float64 `toml:"base_circumference_lambda"`
	TopDiameterMM           *float64 `toml:"top_diameter_mm"`
	TopCircumferenceLambda  *float64 `toml:"top_circumference_lambda"`

	PitchAngleDeg *float64 `toml:"pitch_angle_deg"` // 2–45°
	SpacingMM     *float64 `toml:"spacing_mm"`      // axial advance per turn
	PitchMode     string   `toml:"pitch_mode"`      // "constant_spacing" or "constant_angle"
}

// Limits of the [coil] table.
const (
	MinTurns               = 1.0
	MaxTurns               = 50.0
	MinPitchAngleDeg       = 2.0
	MaxPitchAngleDeg       = 45.0
	MinCircumferenceLambda = 0.2
	MaxCircumferenceLambda = 3.0
	// MinTurnGapMM is the least clear gap between neighbouring turns: the
	// former needs a wall between its grooves and turns must not touch.
	// Common practice (no published source).
	MinTurnGapMM = 0.5
)

func (cs *CoilSpec) validate(c *checker, s *Spec) {
	c.oneOf("coil.shape", &cs.Shape, "cylindrical", "cylindrical", "conical")
	c.oneOf("coil.hand", &cs.Hand, "RHCP", "RHCP", "LHCP")
	c.oneOf("coil.feed", &cs.Feed, "periphery", "centre", "periphery")
	c.oneOf("coil.pitch_mode", &cs.PitchMode, "constant_spacing", "constant_spacing", "constant_angle")
	if cs.Turns < MinTurns || cs.Turns > MaxTurns || math.IsNaN(cs.Turns) {
		if !c.has("coil.turns") {
			c.fail("coil.turns", "", fmt.Sprintf("is required: the number of turns, %s to %s (fractions allowed)", num(MinTurns), num(MaxTurns)), "add turns = 5.0 to [coil]")
		} else {
			c.fail("coil.turns", num(cs.Turns), fmt.Sprintf("must be between %s and %s (fractions allowed)", num(MinTurns), num(MaxTurns)), "give the number of turns, e.g. 5.0")
		}
	}
	lambda := Wavelength(s.FrequencyMHz)
	c.exclusive("coil.base_diameter_mm", cs.BaseDiameterMM, "coil.base_circumference_lambda", cs.BaseCircumferenceLambda, true)
	c.exclusive("coil.top_diameter_mm", cs.TopDiameterMM, "coil.top_circumference_lambda", cs.TopCircumferenceLambda, cs.Shape == "conical")
	if cs.Shape == "cylindrical" {
		for _, k := range []string{"coil.top_diameter_mm", "coil.top_circumference_lambda"} {
			if c.has(k) || (k == "coil.top_diameter_mm" && cs.TopDiameterMM != nil) || (k == "coil.top_circumference_lambda" && cs.TopCircumferenceLambda != nil) {
				c.fail(k, "", `applies only to shape = "conical"`, "delete it, or set shape = \"conical\"")
			}
		}
	}
	checkSize := func(key string, v *float64, lo, hi float64, unit string) {
		if v != nil {
			c.within(key, *v, lo, hi, unit)
		}
	}
	if lambda > 0 && !math.IsInf(lambda, 0) {
		lo, hi := MinCircumferenceLambda*lambda/math.Pi, MaxCircumferenceLambda*lambda/math.Pi
		checkSize("coil.base_diameter_mm", cs.BaseDiameterMM, round3(lo), round3(hi), fmt.Sprintf("mm (%s–%s wavelengths round at %s MHz)", num(MinCircumferenceLambda), num(MaxCircumferenceLambda), num(s.FrequencyMHz)))
		checkSize("coil.top_diameter_mm", cs.TopDiameterMM, round3(lo), round3(hi), fmt.Sprintf("mm (%s–%s wavelengths round at %s MHz)", num(MinCircumferenceLambda), num(MaxCircumferenceLambda), num(s.FrequencyMHz)))
	}
	checkSize("coil.base_circumference_lambda", cs.BaseCircumferenceLambda, MinCircumferenceLambda, MaxCircumferenceLambda, "wavelengths")
	checkSize("coil.top_circumference_lambda", cs.TopCircumferenceLambda, MinCircumferenceLambda, MaxCircumferenceLambda, "wavelengths")

	c.exclusive("coil.pitch_angle_deg", cs.PitchAngleDeg, "coil.spacing_mm", cs.SpacingMM, true)
	if cs.PitchAngleDeg != nil {
		c.within("coil.pitch_angle_deg", *cs.PitchAngleDeg, MinPitchAngleDeg, MaxPitchAngleDeg, "degrees")
	}
	if cs.SpacingMM != nil && !(*cs.SpacingMM > 0 && *cs.SpacingMM <= 3*lambda) {
		c.fail("coil.spacing_mm", num(*cs.SpacingMM), fmt.Sprintf("must be above 0 and at most 3 wavelengths (%.1f mm)", 3*lambda), "give the axial advance per turn in mm")
	}
	if cs.PitchMode == "constant_angle" {
		if cs.SpacingMM != nil {
			c.fail("coil.spacing_mm", num(*cs.SpacingMM), `cannot be used with pitch_mode = "constant_angle"`, "give pitch_angle_deg instead")
		}
		if cs.Shape != "conical" {
			c.fail("coil.pitch_mode", strconv.Quote(cs.PitchMode), `"constant_angle" applies only to shape = "conical"`, `use pitch_mode = "constant_spacing"`)
		}
	}
	if cs.FirstTurnHeightMM != nil && (*cs.FirstTurnHeightMM < 0 || *cs.FirstTurnHeightMM > lambda) {
		c.fail("coil.first_turn_height_mm", num(*cs.FirstTurnHeightMM), fmt.Sprintf("must be between 0 and one wavelength (%.1f mm)", lambda), "give the height of the wire centre above the reflector at the feed end")
	}
}

func deref(p *float64) float64 {
	if p == nil {
		return 0
	}
	return *p
}

func round3(v float64) float64 { return math.Round(v*1000) / 1000 }
