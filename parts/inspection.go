package parts

import "math"

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

// Inspection tolerance rule, provisional until the springback model gives
// a per-turn tolerance: ±1 % of the turn's diameter (a 1 % larger turn
// tunes about 1 % lower, since the axial mode follows the circumference),
// and never tighter than 0.2 mm, about what hand calipers on round wire
// repeat to. Common practice (no published source).
const (
	InspectionToleranceShare = 0.01
	MinInspectionToleranceMM = 0.2
)

// InspectionTolerance returns the provisional ± tolerance in mm on a turn
// of centreline diameter dia mm.
func InspectionTolerance(dia float64) float64 {
	return math.Max(MinInspectionToleranceMM, InspectionToleranceShare*dia)
}

// InspectionTable returns one row per started turn of the design.
func (d *Design) InspectionTable() []InspectionRow {
	rows := make([]InspectionRow, len(d.Turns))
	for i, t := range d.Turns {
		rows[i] = InspectionRow{Turn: t.Index, CentrelineMM: t.DiameterMM,
			OutsideMM:   t.DiameterMM + d.Spec.Wire.DiameterMM,
			ToleranceMM: InspectionTolerance(t.DiameterMM),
			HeightMM:    t.HeightMM}
	}
	return rows
}
