package em

// A wire grid standing in for a flat conducting plate. Grid wires get the
// equal-area radius a = s/(2π) for a grid of spacing s.
// Source: A. C. Ludwig, "Wire grid modeling of surfaces", IEEE Trans.
// AP-35(9), 1987 (spacing ≤ λ/10, equal-area radius).

import (
	"math"

	"coilwright/cam/geom"
)

// PlateShape is the outline of a flat plate.
type PlateShape int

const (
	// Disc is a round plate; Size is its diameter. Its grid is polar: rings
	// and radial wires, the radials doubling in number outward to keep the
	// gaps near the spacing.
	Disc PlateShape = iota
	// Square is a square plate with sides parallel to x and y; Size is its
	// side. Its grid is Cartesian.
	Square
)

// PlateGrid describes a wire grid for a flat plate lying in the plane
// z = Z, centred on Centre.
type PlateGrid struct {
	Shape PlateShape
	// Size is the diameter (Disc) or side (Square), mm.
	Size float64
	// Spacing is the largest gap between neighbouring grid wires, mm (keep
	// it at most a tenth of the shortest wavelength).
	Spacing float64
	// Z is the height of the plate, mm.
	Z float64
	// Centre is the plate centre in the plate's plane, mm.
	Centre geom.Vec2
	// Join is a point of the plate (mm, same frame as Centre) that must be
	// a grid node, so another wire can end there; a disc's grid is centred
	// on the plate and turned so a radial passes through Join.
	Join geom.Vec2
	// Conductivity of the plate, S/m; 0 or +Inf for perfect.
	Conductivity float64
}

// Radius returns the grid-wire radius by the equal-area rule, s/(2π), mm.
func (g PlateGrid) Radius() float64 { return g.Spacing / (2 * math.Pi) }

// Wires returns the grid as one straight wire per edge between grid nodes.
// It returns a *GeometryError (kind BadGrid) when the size or spacing is
// not positive, the joining point lies outside the plate, or it lies so
// close to the centre or the edge (less than a quarter spacing, but not on
// them) that the grid would need very short wires.
func (g PlateGrid) Wires() ([]Wire, error) {
	bad := func(v, lim float64) error {
		return &GeometryError{Kind: BadGrid, Wire: -1, Segment: -1, Value: v, Limit: lim}
	}
	if !(g.Size > 0) || math.IsInf(g.Size, 0) {
		return nil, bad(g.Size, 0)
	}
	if !(g.Spacing > 0) || g.Spacing > g.Size {
		return nil, bad(g.Spacing, g.Size)
	}
	s := g.Spacing
	rad := []float64{g.Radius()}
	var out []Wire
	edge := func(a, b geom.Vec2) {
		out = append(out, Wire{
			Points:       []geom.Vec3{{X: a.X, Y: a.Y, Z: g.Z}, {X: b.X, Y: b.Y, Z: g.Z}},
			Radius:       rad,
			Conductivity: g.Conductivity,
		})
	}
	j := g.Join.Sub(g.Centre)
	switch g.Shape {
	case Square:
		h := g.Size / 2
		xs, err := gridLine(-h, h, j.X, s)
		if err != nil {
			return nil, err
		}
		ys, err := gridLine(-h, h, j.Y, s)
		if err != nil {
			return nil, err
		}
		at := func(x, y float64) geom.Vec2 { return g.Centre.Add(geom.Vec2{X: x, Y: y}) }
		for _, y := range ys {
			for i := 0; i+1 < len(xs); i++ {
				edge(at(xs[i], y), at(xs[i+1], y))
			}
		}
		for _, x := range xs {
			for i := 0; i+1 < len(ys); i++ {
				edge(at(x, ys[i]), at(x, ys[i+1]))
			}
		}
	default:
		r := g.Size / 2
		rj := j.Len()
		// Rings: the join radius is always a ring.
		rings, err := gridLine(0, r, rj, s)
		if err != nil {
			return nil, err
		}
		rings = rings[1:] // the centre is a node, not a ring
		phi0 := math.Atan2(j.Y, j.X)
		// Radials per annulus: 8, doubled until the arc gap at the annulus's
		// outer ring is at most the spacing, but not so far that the chords
		// of its inner ring (which carries every radial's foot) would fall
		// below half the spacing; there the gap may exceed the spacing until
		// the next ring.
		m := make([]int, len(rings))
		n := 8
		for i, ri := range rings {
			inner := 0.0
			if i > 0 {
				inner = rings[i-1]
			}
			for 2*math.Pi*ri/float64(n) > s && (inner == 0 || 2*inner*math.Sin(math.Pi/float64(2*n)) >= s/2) {
				n *= 2
			}
			m[i] = n
		}
		at := func(rr float64, k, of int) geom.Vec2 {
			sn, cs := math.Sincos(phi0 + 2*math.Pi*float64(k)/float64(of))
			return g.Centre.Add(geom.Vec2{X: rr * cs, Y: rr * sn})
		}
		for i, ri := range rings {
			inner := 0.0
			if i > 0 {
				inner = rings[i-1]
			}
			for k := range m[i] {
				if inner == 0 {
					edge(g.Centre, at(ri, k, m[i]))
				} else {
					edge(at(inner, k, m[i]), at(ri, k, m[i]))
				}
			}
			nodes := m[min(i+1, len(rings)-1)]
			for k := range nodes {
				edge(at(ri, k, nodes), at(ri, k+1, nodes))
			}
		}
	}
	return out, nil
}

// gridLine returns grid coordinates from lo to hi with at most spacing s
// between neighbours and with join as one of them.
func gridLine(lo, hi, join, s float64) ([]float64, error) {
	const eps = 1e-9
	if join < lo-eps || join > hi+eps {
		return nil, &GeometryError{Kind: BadGrid, Wire: -1, Segment: -1, Value: join, Limit: hi}
	}
	for _, d := range []float64{join - lo, hi - join} {
		if d > eps && d < s/4 {
			return nil, &GeometryError{Kind: BadGrid, Wire: -1, Segment: -1, Value: d, Limit: s / 4}
		}
	}
	var out []float64
	span := func(a, b float64) {
		if b-a <= eps {
			return
		}
		n := int(math.Ceil((b - a) / s))
		for i := range n {
			out = append(out, a+(b-a)*float64(i)/float64(n))
		}
	}
	span(lo, join)
	span(join, hi)
	return append(out, hi), nil
}
