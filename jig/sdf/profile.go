package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Circle is a disc in the plane. Its distance is exact.
type Circle struct {
	c geom.Vec2
	r float64
}

// NewCircle returns the disc of radius r mm (above zero) centred on c.
func NewCircle(c geom.Vec2, r float64) (*Circle, error) {
	if err := positive("circle", "radius", r); err != nil {
		return nil, err
	}
	return &Circle{c, r}, nil
}

// Eval returns the exact signed distance from p to the disc.
func (c *Circle) Eval(p geom.Vec2) float64 { return p.Sub(c.c).Len() - c.r }

// Bounds returns the disc's bounding square.
func (c *Circle) Bounds() Box2 {
	d := geom.Vec2{X: c.r, Y: c.r}
	return Box2{c.c.Sub(d), c.c.Add(d)}
}

// Polygon is a simple polygon in the plane (either winding). Its distance is
// exact: the nearest edge gives the magnitude and a crossing count the sign.
//
// Source: the polygon distance in I. Quilez, "distance functions"
// (iquilezles.org).
//
// The edges are taken in runs of polyRun; a run whose box lies farther from
// p than the nearest point found so far (with a margin far above rounding)
// and that spans no part of p's horizontal line is passed over whole, which
// leaves the result bit for bit as if every edge were measured (see Eval).
type Polygon struct {
	v    []geom.Vec2
	e    []geom.Vec2 // e[i] = v[i−1] − v[i], cyclically
	ee   []float64   // e[i]·e[i]
	b    Box2
	runs []Box2  // per run of polyRun edges: the box of their end points
	mag  float64 // largest |coordinate| of a vertex
}

// polyRun is the number of edges in a run that Eval may pass over at once.
const polyRun = 4

// polyMargin scales the margin by which a run's box is widened before it is
// trusted to lie beyond the nearest edge so far: relative to the size of
// the coordinates, a million times the rounding error of the edge formula.
const polyMargin = 1e-9

// NewPolygon returns the polygon through the points (at least 3; the last
// point joins the first). The points are copied.
func NewPolygon(pts geom.Polyline) (*Polygon, error) {
	if len(pts) < 3 {
		return nil, &ArgError{"polygon", "points", float64(len(pts)), "needs at least 3"}
	}
	if a := pts.Area(); a == 0 || math.IsNaN(a) || math.IsInf(a, 0) {
		return nil, &ArgError{"polygon", "area", a, "must be finite and not 0"}
	}
	v := append([]geom.Vec2(nil), pts...)
	b := Box2{v[0], v[0]}
	for _, p := range v[1:] {
		b = b.Union(Box2{p, p})
	}
	g := &Polygon{v: v, b: b, e: make([]geom.Vec2, len(v)), ee: make([]float64, len(v))}
	for i, j := 0, len(v)-1; i < len(v); j, i = i, i+1 {
		g.e[i] = v[j].Sub(v[i])
		g.ee[i] = g.e[i].Dot(g.e[i])
		g.mag = max(g.mag, math.Abs(v[i].X), math.Abs(v[i].Y))
		if i%polyRun == 0 {
			g.runs = append(g.runs, Box2{v[i], v[i]})
		}
		r := &g.runs[len(g.runs)-1]
		*r = r.Union(Box2{v[i], v[i]}).Union(Box2{v[j], v[j]})
	}
	return g, nil
}

// Eval returns the exact signed distance from p to the polygon.
//
// Each edge gives a squared distance, d is their minimum, and the edges
// whose end points straddle p's height (c1 = c2) flip the sign when p lies
// on their inner side. A run of edges is passed over when neither part can
// change: its end points all lie above p's height or all at or below it,
// so no edge in it straddles, and its box, widened on each side by a
// margin m, is farther than √d. The computed offset from an edge's nearest
// point differs from the exact one by far less than m in each coordinate
// (a few roundings of numbers no larger than the coordinates), and the
// exact offset is at least the box's gap on each axis, so every skipped
// edge would give at least d and the minimum is the same number.
func (g *Polygon) Eval(p geom.Vec2) float64 {
	v := g.v
	px, py := p.X, p.Y
	w0x, w0y := px-v[0].X, py-v[0].Y
	d := w0x*w0x + w0y*w0y
	s := 1.0
	m := polyMargin * (1 + g.mag + math.Abs(px) + math.Abs(py))
	n := len(v)
	for r, rb := range g.runs {
		i0 := r * polyRun
		i1 := min(i0+polyRun, n)
		straddle := py >= rb.Min.Y && py < rb.Max.Y
		gx := max(rb.Min.X-px, px-rb.Max.X) - m
		gy := max(rb.Min.Y-py, py-rb.Max.Y) - m
		gx, gy = max(gx, 0), max(gy, 0)
		far := (gx*gx+gy*gy)*(1-polyMargin) > d
		if far && !straddle {
			continue
		}
		j := i0 - 1
		if j < 0 {
			j = n - 1
		}
		for i := i0; i < i1; j, i = i, i+1 {
			ex, ey := g.e[i].X, g.e[i].Y
			wx, wy := px-v[i].X, py-v[i].Y
			if !far {
				t := max(0, min(1, (wx*ex+wy*ey)/g.ee[i]))
				bx, by := wx-ex*t, wy-ey*t
				d = min(d, bx*bx+by*by)
			}
			c1, c2 := py >= v[i].Y, py < v[j].Y
			if c1 == c2 && c1 == (ex*wy > ey*wx) {
				s = -s
			}
		}
	}
	return s * math.Sqrt(d)
}

// Bounds returns the polygon's bounding rectangle.
func (g *Polygon) Bounds() Box2 { return g.b }

// Strokes is a set of line segments drawn with a round pen of the given
// radius: the union of their capsules. Its distance is exact.
type Strokes struct {
	seg [][2]geom.Vec2
	r   float64
	b   Box2
}

// NewStrokes returns the strokes drawn through the segments (at least one)
// with pen radius r mm (above zero). The segments are copied.
func NewStrokes(seg [][2]geom.Vec2, r float64) (*Strokes, error) {
	if err := positive("strokes", "pen radius", r); err != nil {
		return nil, err
	}
	if len(seg) == 0 {
		return nil, &ArgError{"strokes", "segments", 0, "needs at least 1"}
	}
	s := append([][2]geom.Vec2(nil), seg...)
	b := Box2{s[0][0], s[0][0]}
	for _, e := range s {
		b = b.Union(Box2{e[0], e[0]}).Union(Box2{e[1], e[1]})
	}
	d := geom.Vec2{X: r, Y: r}
	return &Strokes{s, r, Box2{b.Min.Sub(d), b.Max.Add(d)}}, nil
}

// Eval returns the exact signed distance from p to the strokes.
func (s *Strokes) Eval(p geom.Vec2) float64 {
	d := math.Inf(1)
	for _, e := range s.seg {
		ab := e[1].Sub(e[0])
		ap := p.Sub(e[0])
		t := 0.0
		if l := ab.Dot(ab); l > 0 {
			t = max(0, min(1, ap.Dot(ab)/l))
		}
		q := ap.Sub(ab.Scale(t))
		d = min(d, q.Dot(q))
	}
	return math.Sqrt(d) - s.r
}

// Bounds returns the strokes' bounding rectangle, pen included.
func (s *Strokes) Bounds() Box2 { return s.b }
