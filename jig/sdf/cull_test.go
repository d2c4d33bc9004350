package sdf

import (
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
)

// The culling tests: each shortcut that passes over part of a shape must
// give the same float64, bit for bit, as the evaluation without it, at
// random points near, on and far from the shape.

// evalAll is Eval measuring every edge, the definition the passed-over
// runs are tested against.
func (g *Polygon) evalAll(p geom.Vec2) float64 {
	v := g.v
	px, py := p.X, p.Y
	w0x, w0y := px-v[0].X, py-v[0].Y
	d := w0x*w0x + w0y*w0y
	s := 1.0
	for i, j := 0, len(v)-1; i < len(v); j, i = i, i+1 {
		ex, ey := g.e[i].X, g.e[i].Y
		wx, wy := px-v[i].X, py-v[i].Y
		t := max(0, min(1, (wx*ex+wy*ey)/g.ee[i]))
		bx, by := wx-ex*t, wy-ey*t
		d = min(d, bx*bx+by*by)
		c1, c2, c3 := py >= v[i].Y, py < v[j].Y, ex*wy > ey*wx
		if (c1 && c2 && c3) || (!c1 && !c2 && !c3) {
			s = -s
		}
	}
	return s * math.Sqrt(d)
}

// randomPolygon returns a star-shaped polygon of n vertices about c with
// radii in [r/2, r], in either winding, some vertices sharing a height.
func randomPolygon(t *testing.T, rng *rand.Rand, n int, c geom.Vec2, r float64) *Polygon {
	t.Helper()
	pts := make(geom.Polyline, n)
	for i := range pts {
		a := 2 * math.Pi * (float64(i) + 0.8*rng.Float64()) / float64(n)
		rr := r * (0.5 + 0.5*rng.Float64())
		pts[i] = geom.Vec2{X: c.X + rr*math.Cos(a), Y: c.Y + rr*math.Sin(a)}
		if i > 0 && rng.IntN(4) == 0 {
			pts[i].Y = pts[i-1].Y // a level edge
		}
	}
	if rng.IntN(2) == 0 {
		for i, j := 0, n-1; i < j; i, j = i+1, j-1 {
			pts[i], pts[j] = pts[j], pts[i]
		}
	}
	g, err := NewPolygon(pts)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

// probePoints returns test points for a polygon: uniform in a box three
// times its size, at its vertices' heights, on and just off its edges and
// vertices, and far away.
func probePoints(rng *rand.Rand, g *Polygon, count int) []geom.Vec2 {
	b := g.Bounds()
	size := b.Max.Sub(b.Min)
	var out []geom.Vec2
	for range count {
		v := g.v[rng.IntN(len(g.v))]
		w := g.v[rng.IntN(len(g.v))]
		u := rng.Float64()
		onEdge := v.Add(w.Sub(v).Scale(u))
		out = append(out,
			geom.Vec2{X: b.Min.X + (3*rng.Float64()-1)*size.X, Y: b.Min.Y + (3*rng.Float64()-1)*size.Y},
			geom.Vec2{X: b.Min.X + (3*rng.Float64()-1)*size.X, Y: v.Y},
			v,
			onEdge,
			onEdge.Add(geom.Vec2{X: 1e-9 * (rng.Float64() - 0.5), Y: 1e-9 * (rng.Float64() - 0.5)}),
			geom.Vec2{X: math.Nextafter(v.X, math.Inf(1)), Y: math.Nextafter(v.Y, math.Inf(-1))},
			geom.Vec2{X: (rng.Float64() - 0.5) * 1e6, Y: (rng.Float64() - 0.5) * 1e6},
		)
	}
	return out
}

// TestPolygonRunsExact holds the polygon's run culling to the evaluation
// of every edge on random polygons of 3 to 60 vertices at small and large
// coordinates, and on a core-like profile drawn symmetric about the axis.
func TestPolygonRunsExact(t *testing.T) {
	rng := rand.New(rand.NewPCG(21, 22))
	var polys []*Polygon
	for range 200 {
		n := 3 + rng.IntN(58)
		scale := math.Pow(10, rng.Float64()*5-2) // 0.01 to 1000 mm
		c := geom.Vec2{X: (rng.Float64() - 0.5) * 10 * scale, Y: (rng.Float64() - 0.5) * 10 * scale}
		polys = append(polys, randomPolygon(t, rng, n, c, scale))
	}
	// A revolved core's half profile and its mirror image.
	half := geom.Polyline{{X: 12, Y: -1}}
	for i := range 40 {
		half = append(half, geom.Vec2{X: 12 + 0.3*math.Sin(float64(i)/5), Y: float64(i) * 2.5})
	}
	half = append(half, geom.Vec2{X: 11, Y: 101})
	core := append(geom.Polyline(nil), half...)
	for i := len(half) - 1; i >= 0; i-- {
		core = append(core, geom.Vec2{X: -half[i].X, Y: half[i].Y})
	}
	g, err := NewPolygon(core)
	if err != nil {
		t.Fatal(err)
	}
	polys = append(polys, g)
	checked := 0
	for _, g := range polys {
		for _, p := range probePoints(rng, g, 200) {
			got, want := g.Eval(p), g.evalAll(p)
			if math.Float64bits(got) != math.Float64bits(want) {
				t.Fatalf("polygon of %d vertices at %v: culled %v, every edge %v", len(g.v), p, got, want)
			}
			checked++
		}
	}
	if p := (geom.Vec2{X: math.NaN()}); !math.IsNaN(g.Eval(p)) || !math.IsNaN(g.evalAll(p)) {
		t.Error("a NaN point does not give NaN")
	}
	t.Logf("%d points agree", checked)
}

// curveDirect is the sweep's curve worked from the table at each call:
// the Catmull–Rom cubic through the four entries about phi with its first
// and second derivatives.
func curveDirect(s *HelixSweep, phi float64) (r, r1, r2, z, z1, z2 float64) {
	x := (phi - s.h.Start) / s.dphi
	n := len(s.zs)
	i := max(0, min(n-2, int(math.Floor(x))))
	t := x - float64(i)
	one := func(tab []float64) (v, d1, d2 float64) {
		p1, p2 := tab[i], tab[i+1]
		p0 := 2*p1 - p2
		if i > 0 {
			p0 = tab[i-1]
		}
		p3 := 2*p2 - p1
		if i+2 < len(tab) {
			p3 = tab[i+2]
		}
		a := -0.5*p0 + 1.5*p1 - 1.5*p2 + 0.5*p3
		b := p0 - 2.5*p1 + 2*p2 - 0.5*p3
		c := -0.5*p0 + 0.5*p2
		v = ((a*t+b)*t+c)*t + p1
		d1 = ((3*a*t+2*b)*t + c) / s.dphi
		d2 = (6*a*t + 2*b) / (s.dphi * s.dphi)
		return
	}
	r, r1, r2 = one(s.rs)
	z, z1, z2 = one(s.zs)
	return
}

// TestHelixSegmentsExact holds the sweep's stored cubic coefficients to
// the cubic worked from the table at each call, bit for bit, at random
// angles, at every table entry and past both ends, on a helix whose radius
// and rise both vary.
func TestHelixSegmentsExact(t *testing.T) {
	circ := must[*Circle](t)(NewCircle(geom.Vec2{}, 0.7))
	h := Helix{
		Radius: func(phi float64) float64 { return 8 + 0.3*phi + 0.5*math.Sin(phi) },
		Z:      func(phi float64) float64 { return 1.7*phi + 0.02*phi*phi },
		Hand:   1, Start: -0.4, End: 6 * math.Pi,
	}
	s := must[*HelixSweep](t)(NewHelixSweep(h, circ))
	rng := rand.New(rand.NewPCG(27, 28))
	var phis []float64
	for i := range s.zs {
		phis = append(phis, h.Start+float64(i)*s.dphi)
	}
	for range 100000 {
		phis = append(phis, h.Start-1+(h.End-h.Start+2)*rng.Float64())
	}
	for _, phi := range phis {
		a0, a1, a2, a3, a4, a5 := s.curve(phi)
		b0, b1, b2, b3, b4, b5 := curveDirect(s, phi)
		for k, pair := range [6][2]float64{{a0, b0}, {a1, b1}, {a2, b2}, {a3, b3}, {a4, b4}, {a5, b5}} {
			if math.Float64bits(pair[0]) != math.Float64bits(pair[1]) {
				t.Fatalf("phi %v, output %d: stored %v, direct %v", phi, k, pair[0], pair[1])
			}
		}
	}
}
