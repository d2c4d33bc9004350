package spec

import (
	"fmt"
	"math"
)

// WedgeSpec is the [wedge] table: the matching strip soldered under the
// coil's first part, from 50 Ω at the feed to the coil's input resistance.
type WedgeSpec struct {
	ThicknessMM float64 `toml:"thickness_mm"` // sheet thickness, default 0.3 mm (thinner under a low first turn)
	Material    string  `toml:"material"`     // sheet material id, default "copper"
	Taper       string  `toml:"taper"`        // "exponential" or "klopfenstein"
	Ripple      float64 `toml:"ripple"`       // Klopfenstein |Γ|max, default 0.05
	SpanDeg     float64 `toml:"span_deg"`     // winding angle covered; sized to MaxVSWR when absent
	MaxVSWR     float64 `toml:"max_vswr"`     // worst VSWR across the band the strip is sized for, default 1.5
	// SolvedSpanDeg, when above zero, is the span the whole-antenna strip
	// search chose; it replaces the line model's sizing. Never read from
	// a file.
	SolvedSpanDeg float64 `toml:"-"`
}

// Wedge defaults. Common practice (no published source): the strip is
// copper or brass shim a few tenths of a millimetre thick, covering the
// first quarter turn.
const (
	DefaultWedgeThicknessMM = 0.3
	DefaultWedgeSpanDeg     = 90.0
	DefaultWedgeRipple      = 0.05
	// DefaultWedgeMaxVSWR is the worst VSWR across the band the strip is
	// sized for: 1.5, a return loss of 14 dB. Common practice (no
	// published source).
	DefaultWedgeMaxVSWR = 1.5
	// WedgeFeedOhm is the feed line's impedance at the wedge's start.
	WedgeFeedOhm = 50.0
	// minStripHeightMM is the least air gap under the strip at the feed.
	minStripHeightMM = 0.1
	// minStripThicknessMM and stripThicknessStepMM bound and step the
	// default strip when the first turn sits too low for 0.3 mm shim:
	// shim is sold in 0.05 mm steps. Common practice (no published source).
	minStripThicknessMM  = 0.05
	stripThicknessStepMM = 0.05
	// stripFitTolMM absorbs rounding when heights and thicknesses written to
	// 0.01 mm are added up.
	stripFitTolMM = 1e-9
)

// defaultStripThickness returns the default strip thickness in mm for a
// wire whose underside is room mm above the reflector at the feed:
// DefaultWedgeThicknessMM, or the thickest stock shim that leaves
// minStripHeightMM of air under it (at least minStripThicknessMM).
func defaultStripThickness(room float64) float64 {
	if room-DefaultWedgeThicknessMM >= minStripHeightMM-stripFitTolMM {
		return DefaultWedgeThicknessMM
	}
	steps := math.Floor((room - minStripHeightMM + stripFitTolMM) / stripThicknessStepMM)
	return math.Max(minStripThicknessMM, steps*stripThicknessStepMM)
}

func (w *WedgeSpec) validate(c *checker, s *Spec) {
	z0 := 0.0 // wire centre above the reflector at the feed, mm
	if s.Wire.DiameterMM > 0 {
		z0 = DefaultFirstTurnHeight(s.Wavelength(), s.Wire.DiameterMM)
		if s.Coil.FirstTurnHeightMM != nil {
			z0 = *s.Coil.FirstTurnHeightMM
		}
		c.orDefault("wedge.thickness_mm", &w.ThicknessMM, defaultStripThickness(z0-s.Wire.DiameterMM/2))
	} else {
		c.orDefault("wedge.thickness_mm", &w.ThicknessMM, DefaultWedgeThicknessMM)
	}
	thickOK := c.within("wedge.thickness_mm", w.ThicknessMM, 0.05, 3, "mm")
	c.oneOf("wedge.material", &w.Material, "copper", "copper", "brass", "tinplate", "aluminium")
	c.oneOf("wedge.taper", &w.Taper, "exponential", "exponential", "klopfenstein")
	c.orDefault("wedge.ripple", &w.Ripple, DefaultWedgeRipple)
	c.within("wedge.ripple", w.Ripple, 0.001, 0.3, "(reflection magnitude)")
	if c.has("wedge.ripple") && w.Taper != "klopfenstein" {
		c.fail("wedge.ripple", num(w.Ripple), `applies only to taper = "klopfenstein"`, "delete it, or set taper = \"klopfenstein\"")
	}
	c.orDefault("wedge.span_deg", &w.SpanDeg, DefaultWedgeSpanDeg)
	c.within("wedge.span_deg", w.SpanDeg, 30, 360, "degrees")
	c.orDefault("wedge.max_vswr", &w.MaxVSWR, DefaultWedgeMaxVSWR)
	c.within("wedge.max_vswr", w.MaxVSWR, 1.05, 3, "(VSWR)")
	if !thickOK || s.Wire.DiameterMM <= 0 {
		return
	}
	if h := z0 - s.Wire.DiameterMM/2 - w.ThicknessMM; h < minStripHeightMM-stripFitTolMM {
		key, value := "wedge.thickness_mm", num(w.ThicknessMM)
		if s.Coil.FirstTurnHeightMM != nil {
			key, value = "coil.first_turn_height_mm", num(z0)
		}
		c.fail(key, value, fmt.Sprintf("leaves %.2f mm of air under the matching strip at the feed (wire centre %.2f mm up, wire %s mm, strip %s mm); at least %s mm is needed",
			h, z0, num(s.Wire.DiameterMM), num(w.ThicknessMM), num(minStripHeightMM)),
			stripFix(z0, s.Wire.DiameterMM, w.ThicknessMM))
	}
}

// stripFix says how to make room for a strip of thickness t mm under a wire
// of diameter d mm whose centre is z0 mm above the reflector.
func stripFix(z0, d, t float64) string {
	fix := fmt.Sprintf("raise coil.first_turn_height_mm to at least %.2f mm", d/2+t+minStripHeightMM)
	if most := z0 - d/2 - minStripHeightMM; most >= minStripThicknessMM-stripFitTolMM {
		fix += fmt.Sprintf(" or set wedge.thickness_mm to at most %.2f mm", most)
	}
	return fix
}
