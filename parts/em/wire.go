package em

import (
	"math"

	"coilwright/cam/geom"
)

// Wire is a thin round conductor along a 3D polyline.
type Wire struct {
	// Points is the centreline in millimetres; at least two points.
	Points []geom.Vec3
	// Radius is the conductor radius in millimetres: either one value for
	// the whole wire or one per polyline piece (len(Points)−1 values), so a
	// strip can carry its equivalent radius w/4 piece by piece.
	Radius []float64
	// Conductivity is in S/m; 0 or +Inf means a perfect conductor.
	Conductivity float64
}

// radius returns the radius of polyline piece i.
func (w Wire) radius(i int) float64 {
	if len(w.Radius) == 1 {
		return w.Radius[0]
	}
	return w.Radius[i]
}

// Subdivide returns a copy of w whose polyline pieces are split into equal
// segments no longer than maxLen (mm) and, where a piece allows it, no
// shorter than minRadii times that piece's radius. When the two limits
// conflict the minimum wins: the piece gets fewer, longer segments. A piece
// already shorter than minRadii radii is kept whole; NewMesh then decides
// whether it is long enough for the kernel. The input's points stay nodes of
// the result, so a feed or junction placed on one is kept. w is not changed.
func Subdivide(w Wire, maxLen, minRadii float64) (Wire, error) {
	if !(maxLen > 0) || math.IsInf(maxLen, 0) {
		return Wire{}, &GeometryError{Kind: BadSubdivision, Wire: -1, Segment: -1, Value: maxLen}
	}
	if !(minRadii >= 0) || math.IsInf(minRadii, 0) {
		return Wire{}, &GeometryError{Kind: BadSubdivision, Wire: -1, Segment: -1, Value: minRadii}
	}
	if err := checkWire(w, -1); err != nil {
		return Wire{}, err
	}
	out := Wire{Conductivity: w.Conductivity, Points: []geom.Vec3{w.Points[0]}}
	for i := 0; i+1 < len(w.Points); i++ {
		a, b := w.Points[i], w.Points[i+1]
		l := b.Sub(a).Len()
		r := w.radius(i)
		n := int(math.Ceil(l / maxLen))
		if minLen := minRadii * r; n > 1 && l/float64(n) < minLen {
			n = max(1, int(math.Floor(l/minLen)))
		}
		n = max(n, 1)
		for j := 1; j <= n; j++ {
			p := b
			if j < n {
				p = a.Add(b.Sub(a).Scale(float64(j) / float64(n)))
			}
			out.Points = append(out.Points, p)
			out.Radius = append(out.Radius, r)
		}
	}
	return out, nil
}

// checkWire validates the fields of one wire; index is reported in errors.
func checkWire(w Wire, index int) error {
	if len(w.Points) < 2 {
		return &GeometryError{Kind: TooFewPoints, Wire: index, Segment: -1, Value: float64(len(w.Points))}
	}
	pieces := len(w.Points) - 1
	if len(w.Radius) != 1 && len(w.Radius) != pieces {
		return &GeometryError{Kind: RadiusCount, Wire: index, Segment: -1, Value: float64(len(w.Radius)), Limit: float64(pieces)}
	}
	if math.IsNaN(w.Conductivity) || w.Conductivity < 0 {
		return &GeometryError{Kind: BadConductivity, Wire: index, Segment: -1, Value: w.Conductivity}
	}
	for i, p := range w.Points {
		if !finite(p.X) || !finite(p.Y) || !finite(p.Z) {
			return &GeometryError{Kind: NotFinite, Wire: index, Segment: min(i, pieces-1), Value: math.NaN()}
		}
	}
	for i := range pieces {
		if r := w.radius(i); !(r > 0) || math.IsInf(r, 0) {
			return &GeometryError{Kind: BadRadius, Wire: index, Segment: i, Value: r}
		}
	}
	return nil
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
