package cut

import (
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
)

// refPolygonsApart is the clearance test before the box pre-checks and the
// in-place move, kept as the reference the faster one must agree with.
func refPolygonsApart(a, b geom.Polyline, gap float64) bool {
	if PointInPolygon(a[0], b) || PointInPolygon(b[0], a) {
		return false
	}
	g2 := gap * gap
	for i := range a {
		p, q := a[i], a[(i+1)%len(a)]
		minX, maxX := math.Min(p.X, q.X)-gap, math.Max(p.X, q.X)+gap
		minY, maxY := math.Min(p.Y, q.Y)-gap, math.Max(p.Y, q.Y)+gap
		for j := range b {
			r, s := b[j], b[(j+1)%len(b)]
			if (r.X < minX && s.X < minX) || (r.X > maxX && s.X > maxX) ||
				(r.Y < minY && s.Y < minY) || (r.Y > maxY && s.Y > maxY) {
				continue
			}
			if segmentsCross(p, q, r, s) || pointSegment2(p, r, s) < g2 || pointSegment2(q, r, s) < g2 ||
				pointSegment2(r, p, q) < g2 || pointSegment2(s, p, q) < g2 {
				return false
			}
		}
	}
	return true
}

// refApart is apart as it was: the member boxes first, then the polygons.
func refApart(a, b member, gap float64) bool {
	if a.box.Min.X-gap >= b.box.Max.X || b.box.Min.X-gap >= a.box.Max.X ||
		a.box.Min.Y-gap >= b.box.Max.Y || b.box.Min.Y-gap >= a.box.Max.Y {
		return true
	}
	return refPolygonsApart(a.poly, b.poly, gap)
}

// randomOutline returns a closed outline: a star-shaped polygon (often
// concave) about c, or an axis-aligned rectangle on a 0.5 mm grid so that
// edges meet at exactly the gap.
func randomOutline(r *rand.Rand, c geom.Vec2) geom.Polyline {
	if r.IntN(3) == 0 {
		w, h := 0.5*float64(1+r.IntN(12)), 0.5*float64(1+r.IntN(12))
		return geom.Polyline{c, {X: c.X + w, Y: c.Y}, {X: c.X + w, Y: c.Y + h}, {X: c.X, Y: c.Y + h}}
	}
	n := 3 + r.IntN(28)
	rad := 1 + 5*r.Float64()
	p := make(geom.Polyline, n)
	for i := range p {
		a := 2 * math.Pi * float64(i) / float64(n)
		d := rad * (0.3 + 0.7*r.Float64())
		p[i] = geom.Vec2{X: c.X + d*math.Cos(a), Y: c.Y + d*math.Sin(a)}
	}
	return p
}

func TestPolygonsApartMatchesReference(t *testing.T) {
	r := rand.New(rand.NewPCG(4, 14))
	gaps := []float64{0, 0.5, 1, 2, 2 - 1e-9, -1e-9}
	var clear, blocked int
	for range 40000 {
		a := randomOutline(r, geom.Vec2{X: 0.5 * float64(r.IntN(9)), Y: 0.5 * float64(r.IntN(9))})
		b := randomOutline(r, geom.Vec2{X: 0.5 * float64(r.IntN(9)), Y: 0.5 * float64(r.IntN(9))})
		// Half the moves are on the 0.5 mm grid (exact touching), half
		// arbitrary; some put b far away, some inside a.
		v := geom.Vec2{X: 0.5 * float64(r.IntN(41)-20), Y: 0.5 * float64(r.IntN(41)-20)}
		if r.IntN(2) == 0 {
			v = geom.Vec2{X: 20 * (r.Float64() - 0.5), Y: 20 * (r.Float64() - 0.5)}
		}
		gap := gaps[r.IntN(len(gaps))]
		// Now and then a broken vertex, which no pre-check may misjudge.
		if r.IntN(50) == 0 {
			bad := []float64{math.NaN(), math.Inf(1), math.Inf(-1)}[r.IntN(3)]
			if r.IntN(2) == 0 {
				a[r.IntN(len(a))].Y = bad
			} else {
				b[r.IntN(len(b))].X = bad
			}
		}
		moved := placePoly(b, geom.Placement{Offset: v})
		want := refPolygonsApart(a, moved, gap)
		if got := polygonsApart(a, b, move{v: v, on: true}, gap); got != want {
			t.Fatalf("polygonsApart(%v, %v moved by %v, gap %g) = %v, reference %v", a, b, v, gap, got, want)
		}
		ma, mb := member{poly: a, box: polyBox(a)}, member{poly: b, box: polyBox(b)}
		want = refApart(ma, mb.shift(v), gap)
		if got := apartMoved(ma, mb, v, gap); got != want {
			t.Fatalf("apartMoved(%v, %v, %v, gap %g) = %v, reference %v", a, b, v, gap, got, want)
		}
		if got := apart(ma, mb.shift(v), gap); got != want {
			t.Fatalf("apart(%v, %v moved by %v, gap %g) = %v, reference %v", a, b, v, gap, got, want)
		}
		if want {
			clear++
		} else {
			blocked++
		}
	}
	// Both answers must be well represented or the comparison proves little.
	if clear < 5000 || blocked < 5000 {
		t.Errorf("%d clear and %d blocked pairs; want at least 5000 of each", clear, blocked)
	}
}

func TestPolygonsApartAllocatesNothing(t *testing.T) {
	r := rand.New(rand.NewPCG(1, 2))
	a, b := randomOutline(r, geom.Vec2{}), randomOutline(r, geom.Vec2{X: 3})
	ma, mb := member{poly: a, box: polyBox(a)}, member{poly: b, box: polyBox(b)}
	if n := testing.AllocsPerRun(100, func() { apartMoved(ma, mb, geom.Vec2{X: 0.7, Y: -0.2}, 1) }); n != 0 {
		t.Errorf("apartMoved made %v allocations, want 0", n)
	}
}
