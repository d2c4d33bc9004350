package em

import "fmt"

// GeometryErrorKind names what is wrong with a wire model.
type GeometryErrorKind int

// The kinds of geometry error. Value and Limit in GeometryError carry the
// quantities named in each comment.
const (
	// NoWires: the model has no wires.
	NoWires GeometryErrorKind = iota + 1
	// TooFewPoints: a wire has fewer than two points (Value = point count).
	TooFewPoints
	// RadiusCount: a wire's Radius slice is neither one value nor one per
	// polyline piece (Value = given count, Limit = pieces).
	RadiusCount
	// BadRadius: a radius is zero, negative or not finite (Value = radius, mm).
	BadRadius
	// BadConductivity: conductivity is negative or NaN (Value = S/m).
	BadConductivity
	// NotFinite: a coordinate is NaN or infinite.
	NotFinite
	// ShortSegment: a segment is shorter than the kernel allows
	// (Value = length mm, Limit = minimum length mm).
	ShortSegment
	// BelowGround: a point lies below the ground plane z = 0 (Value = z, mm).
	BelowGround
	// TouchesGround: a wire touches the ground plane at a point that is not
	// one of its ends, or runs along it (Value = z, mm).
	TouchesGround
	// FeedWire: the feed names a wire that does not exist (Value = index).
	FeedWire
	// FeedNotOnNode: the feed point is not a node of its wire
	// (Value = distance to the nearest node mm, Limit = tolerance mm).
	FeedNotOnNode
	// FeedOpenEnd: the feed is at a free wire end, where no current flows.
	FeedOpenEnd
	// BadSubdivision: a subdivision length is not positive and finite
	// (Value = the length, mm).
	BadSubdivision
	// BadGrid: a plate grid's size, spacing or joining point is unusable
	// (Value = the offending quantity mm, Limit = the bound mm).
	BadGrid
)

var kindText = map[GeometryErrorKind]string{
	NoWires:         "no wires",
	TooFewPoints:    "wire has fewer than two points",
	RadiusCount:     "radius count must be 1 or one per polyline piece",
	BadRadius:       "radius must be positive and finite",
	BadConductivity: "conductivity must be zero, positive or +Inf",
	NotFinite:       "coordinate is not finite",
	ShortSegment:    "segment shorter than the thin-wire kernel allows",
	BelowGround:     "point below the ground plane z = 0",
	TouchesGround:   "wire touches the ground plane other than at an end",
	FeedWire:        "feed wire index out of range",
	FeedNotOnNode:   "feed point is not a node of its wire",
	FeedOpenEnd:     "feed at a free wire end carries no current",
	BadSubdivision:  "subdivision length must be positive and finite",
	BadGrid:         "plate grid cannot be built",
}

// GeometryError reports a wire model the solver refuses. Wire is the index
// into Model.Wires (−1 when not tied to one wire); Segment is the polyline
// piece of that wire as given to NewMesh (−1 when not tied to one). Value
// and Limit carry the quantities named by Kind, in millimetres unless the
// kind says otherwise.
type GeometryError struct {
	Kind    GeometryErrorKind
	Wire    int
	Segment int
	Value   float64
	Limit   float64
}

// Error describes the problem with its wire, segment, value and limit.
func (e *GeometryError) Error() string {
	s := "em: " + kindText[e.Kind]
	if e.Wire >= 0 {
		s += fmt.Sprintf(" (wire %d", e.Wire)
		if e.Segment >= 0 {
			s += fmt.Sprintf(", segment %d", e.Segment)
		}
		s += ")"
	}
	switch e.Kind {
	case ShortSegment:
		s += fmt.Sprintf(": length %.4g mm, minimum %.4g mm", e.Value, e.Limit)
	case FeedNotOnNode:
		s += fmt.Sprintf(": nearest node %.4g mm away, tolerance %.4g mm", e.Value, e.Limit)
	case RadiusCount:
		s += fmt.Sprintf(": %g given, %g pieces", e.Value, e.Limit)
	case BadGrid:
		s += fmt.Sprintf(": %.4g mm (limit %.4g mm)", e.Value, e.Limit)
	case NoWires, FeedOpenEnd:
	default:
		s += fmt.Sprintf(": %g", e.Value)
	}
	return s
}

// SingularMatrixError reports an impedance matrix the LU factorisation
// cannot invert at Frequency (Hz); Column is the first column whose pivot
// vanished. It usually means two wires overlap or a loop is shorted.
type SingularMatrixError struct {
	Frequency float64
	Column    int
}

// Error describes the singular column and frequency.
func (e *SingularMatrixError) Error() string {
	return fmt.Sprintf("em: impedance matrix singular at %.6g Hz (column %d)", e.Frequency, e.Column)
}

// FrequencyError reports a frequency that is not positive and finite (Hz).
type FrequencyError struct{ Value float64 }

// Error describes the bad frequency.
func (e *FrequencyError) Error() string {
	return fmt.Sprintf("em: frequency %g Hz must be positive and finite", e.Value)
}

// NotFiniteError reports a solution that came out NaN or infinite at
// Frequency (Hz): Quantity names what was not finite.
type NotFiniteError struct {
	Frequency float64
	Quantity  string
}

// Error describes the non-finite quantity.
func (e *NotFiniteError) Error() string {
	return fmt.Sprintf("em: %s not finite at %.6g Hz", e.Quantity, e.Frequency)
}
