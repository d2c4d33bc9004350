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
