package parts

import (
	"fmt"
	"math"
)

// InspectionRow is one turn of the inspection table: what the assembler
// measures across the released coil at the turn's middle, with calipers
// over the outside of the wire. Lengths are mm.
type InspectionRow struct {
	Turn         int
	CentrelineMM float64 // target relaxed centreline diameter
	OutsideMM    float64 // target caliper reading across the outside of the wire
	ToleranceMM  float64 // ± on the outside reading
	HeightMM     float64 // wire centre above the reflector at mid-turn
}

// InspectionTable returns one row per started turn of the design.
func (d *Design) InspectionTable() []InspectionRow {
	rows := make([]InspectionRow, len(d.Turns))
	for i, t := range d.Turns {
		rows[i] = InspectionRow{Turn: t.Index, CentrelineMM: t.DiameterMM,
			OutsideMM:   t.DiameterMM + d.Spec.Wire.DiameterMM,
			ToleranceMM: t.ToleranceMM,
			HeightMM:    t.HeightMM}
	}
	return rows
}

// UseInspectionTolerances replaces the fixed-rule inspection tolerance of
// each turn with tol (mm, one per turn from the feed end), explained by
// basis, unless the spec sets the tolerance itself. It is called once,
// before the design is read for reports; it mutates d.
func (d *Design) UseInspectionTolerances(tol []float64, basis string) error {
	if len(tol) != len(d.Turns) {
		return fmt.Errorf("inspection tolerances: %d values for %d turns", len(tol), len(d.Turns))
	}
	for _, v := range tol {
		if !(v > 0) || math.IsInf(v, 0) {
			return fmt.Errorf("inspection tolerance %g mm must be positive", v)
		}
	}
	if d.Spec.Wire.InspectionToleranceMM != nil {
		return nil
	}
	for i := range d.Turns {
		d.Turns[i].ToleranceMM = tol[i]
	}
	d.InspectionBasis = basis
	return nil
}
