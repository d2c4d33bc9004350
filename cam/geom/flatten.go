package geom

import "math"

// arcSteps returns how many equal chords approximate an arc of radius r
// sweeping span radians with every chord's sagitta at most tol (> 0).
func arcSteps(r, span, tol float64) int {
	if tol >= r {
		return max(1, int(math.Ceil(span/(2*math.Pi/3))))
	}
	maxStep := 2 * math.Acos(1-tol/r)
	return max(1, int(math.Ceil(span/maxStep)))
}

// Flatten returns points along the arc from Start to End, no chord further
// than tol mm (> 0) from the arc. The chords lie inside the circle.
func (a Arc) Flatten(tol float64) Polyline {
	n := arcSteps(a.Radius, a.End-a.Start, tol)
	pts := make(Polyline, n+1)
	for i := range pts {
		pts[i] = a.Point(a.Start + (a.End-a.Start)*float64(i)/float64(n))
	}
	return pts
}

// Flatten returns a closed polygon (first point not repeated) inscribed in
// the circle, counter-clockwise, with sagitta at most tol mm (> 0).
func (c Circle) Flatten(tol float64) Polyline {
	pts := Arc{c.Center, c.Radius, 0, 2 * math.Pi}.Flatten(tol)
	return pts[:len(pts)-1]
}

// Flatten returns the contour's points with each arc segment replaced by
// chords no further than tol mm (> 0) from it. For a closed contour the
// first point is not repeated at the end.
func (c Contour) Flatten(tol float64) Polyline {
	var pts Polyline
	for i := range c.Segments() {
		p, q, b := c.Segment(i)
		pts = append(pts, p)
		if b == 0 {
			continue
		}
		arc := BulgeArc(p, q, b).Flatten(tol)
		inner := arc[1 : len(arc)-1]
		if b < 0 {
			for j := len(inner) - 1; j >= 0; j-- {
				pts = append(pts, inner[j])
			}
		} else {
			pts = append(pts, inner...)
		}
	}
	if !c.Closed && len(c.Vertices) > 0 {
		pts = append(pts, c.Vertices[len(c.Vertices)-1].P)
	}
	return pts
}
