package parts

import (
	"fmt"
	"math"
)

// FormerSize is the printed winding former's envelope: its overall height
// along the axis and the diameter of its flange, in mm, and whether it fits
// the print volume the spec allows.
type FormerSize struct {
	HeightMM   float64
	DiameterMM float64
	Fits       bool
}

// FormerLandMM is the flange face's clearance from the groove, mm. Common
// practice (no published source); the former model uses the same figure.
const FormerLandMM = 1.0

// FormerEnvelope returns the former's size as the former model builds it:
// the groove (with its lead-in and run-out, which leave the core at a tenth
// of the end slope) plus the land and flange at the narrow end's opposite
// (the wide end, so the former prints flange down) and the end margin at the
// other. The jig package's tests hold its solid to this height.
func (d *Design) FormerEnvelope() FormerSize {
	f := &d.Spec.Former
	c := d.Former
	span := c.Span()
	wire := d.Spec.Wire.DiameterMM
	a := f.GrooveRadius(wire)
	slope := func(phi float64) float64 { return c.SpacingAt(phi) / (2 * math.Pi) } // dz/dφ
	deg := math.Pi / 180
	zLo := c.Z(0) - f.LeadInDeg*deg*0.1*slope(0) - a*math.Sqrt2
	zHi := c.Z(span) + f.RunOutDeg*deg*0.1*slope(span) + a*math.Sqrt2
	var h float64
	if c.EndRadius > c.StartRadius { // printed upside down: flange at the coil's top
		h = (zHi + FormerLandMM + f.FlangeThicknessMM) - (zLo - f.EndMarginMM)
	} else {
		h = (zHi + f.EndMarginMM) - (math.Min(0, zLo-FormerLandMM) - f.FlangeThicknessMM)
	}
	core := math.Max(c.StartRadius, c.EndRadius) - wire/2 + f.GrooveDepthRatio*wire
	dia := 2 * (core + f.FlangeMarginMM)
	return FormerSize{HeightMM: h, DiameterMM: dia, Fits: h <= f.PrintHeightMM && dia <= f.PrintWidthMM}
}

// formerSizeWarning says when the former will not be printed.
func (d *Design) formerSizeWarning() []Warning {
	e := d.FormerEnvelope()
	if e.Fits {
		return nil
	}
	f := &d.Spec.Former
	return []Warning{{Code: "former-size", Message: fmt.Sprintf(
		"the winding former would be %.0f mm tall and %.0f mm across, more than the print volume of %s mm tall by %s mm across ([former] print_height_mm, print_width_mm): no former files are written; raise those limits if your printer takes it, or wind on a turned or segmented former to the diameters in the per-turn table",
		e.HeightMM, e.DiameterMM, num(f.PrintHeightMM), num(f.PrintWidthMM))}}
}
