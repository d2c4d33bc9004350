package field

import "coilwright/parts"

// The solution's data types live in parts, so a Design can carry its
// solution; these names are the ones this package's API speaks.
type (
	// Result is a design's field solution across the sweep.
	Result = parts.FieldSolution
	// Point is the field solution at one frequency.
	Point = parts.FieldPoint
	// Range is a frequency range within a VSWR limit.
	Range = parts.FieldRange
	// BandFigures is the solution interpolated at one frequency.
	BandFigures = parts.FieldFigures
	// Summary condenses the sweep.
	Summary = parts.FieldSummary
	// Cut is a centre-frequency pattern cut.
	Cut = parts.FieldCut
	// CutSample is one angle of a cut.
	CutSample = parts.FieldCutSample
)
