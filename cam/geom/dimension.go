package geom

// Dimension is a linear dimension on a drawing, in mm: the distance from A
// to B, drawn as a line parallel to AB and Offset mm to its left (seen
// going from A to B), with extension lines back to A and B and Text
// written at the middle of the dimension line.
type Dimension struct {
	A, B   Vec2
	Offset float64
	Text   string
}

// Length returns the measured distance |B − A| in mm.
func (d Dimension) Length() float64 { return d.B.Sub(d.A).Len() }

// Line returns the two ends of the dimension line: A and B moved Offset mm
// along the left normal of AB. A zero-length dimension returns A and B.
func (d Dimension) Line() (Vec2, Vec2) {
	ab := d.B.Sub(d.A)
	l := ab.Len()
	if l == 0 {
		return d.A, d.B
	}
	n := Vec2{-ab.Y / l, ab.X / l}.Scale(d.Offset)
	return d.A.Add(n), d.B.Add(n)
}
