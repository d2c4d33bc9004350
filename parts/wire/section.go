package wire

import "math"

// Section is a cross-section bent about an axis of symmetry: the neutral
// axis. Lengths are in mm. The bending integrals of Springback run over any
// Section, so the round-wire and the sheet (rectangular) cases share one code
// path.
type Section interface {
	// HalfDepth returns the distance in mm from the neutral axis to the
	// outer fibre; it is positive.
	HalfDepth() float64
	// WidthAt returns the width in mm of the section at distance y from the
	// neutral axis, for 0 ≤ y ≤ HalfDepth().
	WidthAt(y float64) float64
}

// RoundSection is a solid round wire of the given Diameter in mm.
type RoundSection struct {
	// Diameter is the wire diameter in mm.
	Diameter float64
}

// HalfDepth returns the wire radius in mm.
func (s RoundSection) HalfDepth() float64 { return s.Diameter / 2 }

// WidthAt returns the chord 2√(a² − y²) in mm at distance y from the centre.
func (s RoundSection) WidthAt(y float64) float64 {
	a := s.Diameter / 2
	return 2 * math.Sqrt(math.Max(0, (a-y)*(a+y)))
}

// RectSection is a rectangular strip of the given Breadth (along the bending
// axis) and Thickness (across it), both in mm.
type RectSection struct {
	// Breadth is the width of the strip along the bending axis, in mm.
	Breadth float64
	// Thickness is the depth of the strip across the bending axis, in mm.
	Thickness float64
}

// HalfDepth returns half the thickness in mm.
func (s RectSection) HalfDepth() float64 { return s.Thickness / 2 }

// WidthAt returns the breadth in mm, the same at every depth.
func (s RectSection) WidthAt(float64) float64 { return s.Breadth }
