package parts

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
