package geom

// Polyline is an ordered list of points in the plane, in millimetres.
type Polyline []Vec2

// Length returns the summed length of the polyline's segments.
func (p Polyline) Length() float64 {
	var l float64
	for i := 1; i < len(p); i++ {
		l += p[i].Sub(p[i-1]).Len()
	}
	return l
}

// Area returns the signed area of the closed polygon through p (shoelace
// formula), positive when the points run counter-clockwise.
func (p Polyline) Area() float64 {
	var a float64
	for i := range p {
		j := (i + 1) % len(p)
		a += p[i].Cross(p[j])
	}
	return a / 2
}

// Path3 is an ordered list of points in space, in millimetres.
type Path3 []Vec3

// Length returns the summed length of the path's segments.
func (p Path3) Length() float64 {
	var l float64
	for i := 1; i < len(p); i++ {
		l += p[i].Sub(p[i-1]).Len()
	}
	return l
}
