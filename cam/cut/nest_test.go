package cut

import (
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// orient returns the sign of the turn a→b→c.
func orient(a, b, c geom.Vec2) float64 { return b.Sub(a).Cross(c.Sub(a)) }

// properCross reports whether segments a–b and c–d cross at a point
// interior to both (the orientation predicate).
func properCross(a, b, c, d geom.Vec2) bool {
	return orient(a, b, c)*orient(a, b, d) < 0 && orient(c, d, a)*orient(c, d, b) < 0
}

// overlapOrClose is the test's own exact check: two polygons conflict when
// any edges cross, one holds a vertex of the other, or a vertex of one lies
// nearer than gap to an edge of the other (for disjoint polygons the least
// distance is always reached between a vertex and an edge).
func overlapOrClose(a, b geom.Polyline, gap float64) bool {
	ba, bb := polyBox(a), polyBox(b)
	if ba.Max.X+gap < bb.Min.X || bb.Max.X+gap < ba.Min.X || ba.Max.Y+gap < bb.Min.Y || bb.Max.Y+gap < ba.Min.Y {
		return false // boxes further apart than gap
	}
	for i := range a {
		for j := range b {
			if properCross(a[i], a[(i+1)%len(a)], b[j], b[(j+1)%len(b)]) {
				return true
			}
		}
	}
	if PointInPolygon(a[0], b) || PointInPolygon(b[0], a) {
		return true
	}
	vertexEdge := func(p, q geom.Polyline) bool {
		for _, v := range p {
			for j := range q {
				e0, e1 := q[j], q[(j+1)%len(q)]
				d := e1.Sub(e0)
				t := math.Max(0, math.Min(1, v.Sub(e0).Dot(d)/d.Dot(d)))
				if v.Sub(e0.Add(d.Scale(t))).Len() < gap-1e-9 {
					return true
				}
			}
		}
		return false
	}
	return vertexEdge(a, b) || vertexEdge(b, a)
}

func checkNest(t *testing.T, outline geom.Polyline, n Nest, s Sheet) {
	t.Helper()
	placed := make([]geom.Polyline, len(n.Placements))
	for i, pl := range n.Placements {
		placed[i] = placePoly(outline, pl)
		for _, v := range placed[i] {
			if v.X < s.Margin-1e-9 || v.Y < s.Margin-1e-9 || v.X > s.Width-s.Margin+1e-9 || v.Y > s.Height-s.Margin+1e-9 {
				t.Fatalf("part %d point %v outside the sheet's margin %g on %g × %g", i, v, s.Margin, s.Width, s.Height)
			}
		}
	}
	for i := range placed {
		for j := i + 1; j < len(placed); j++ {
			if overlapOrClose(placed[i], placed[j], s.Spacing) {
				t.Fatalf("parts %d and %d overlap or come closer than %g mm", i, j, s.Spacing)
			}
		}
	}
}

func TestNestRandomBatches(t *testing.T) {
	for seed := uint64(1); seed <= 20; seed++ {
		rng := rand.New(rand.NewPCG(seed, 42))
		s := Sheet{Width: 80 + 140*rng.Float64(), Height: 80 + 140*rng.Float64(), Margin: 10 * rng.Float64(), Spacing: 0.5 + 3*rng.Float64()}
		count := 1 + rng.IntN(120)
		t.Run("discs", func(t *testing.T) {
			r := 3 + 20*rng.Float64() // at most 23 mm: fits the 60 mm usable width
			n, err := NestDiscs(r, count, s)
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			checkNest(t, geom.Circle{Radius: r}.Flatten(0.02), n, s)
			for i, a := range n.Placements {
				for _, b := range n.Placements[i+1:] {
					if d := a.Offset.Sub(b.Offset).Len(); d < 2*r+s.Spacing-1e-9 {
						t.Fatalf("seed %d: centres %.4f mm apart, need %.4f", seed, d, 2*r+s.Spacing)
					}
				}
			}
		})
		t.Run("interlocked strips", func(t *testing.T) {
			w0 := 1 + 7*rng.Float64()
			poly := fixture.Strip(5+15*rng.Float64(), math.Pi/3+math.Pi/2*rng.Float64(), w0, 0.5+w0*rng.Float64())
			n, err := NestPolygon(poly, count, s, NestOptions{Interlock: true})
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			if n.PerSheet < len(n.Placements) || n.Sheets != (count+n.PerSheet-1)/n.PerSheet {
				t.Errorf("seed %d: %d per sheet, %d sheets for %d parts", seed, n.PerSheet, n.Sheets, count)
			}
			checkNest(t, poly, n, s)
		})
	}
}

func TestNestDiscsHexCount(t *testing.T) {
	// Hexagonal rows of 10 mm discs on a 100 mm square, no margin or
	// spacing: rows 8.660 mm apart hold 10 and 9 discs alternately; 11 rows
	// fit (5 + 10·8.66 ≤ 95), 6·10 + 5·9 = 105 discs, more than the 100 of
	// a square grid (densest lattice packing of circles; Thue's theorem).
	n, err := NestDiscs(5, 1000, Sheet{Width: 100, Height: 100})
	if err != nil {
		t.Fatal(err)
	}
	if n.PerSheet != 105 || n.Sheets != 10 {
		t.Errorf("%d per sheet, %d sheets; want 105 and 10", n.PerSheet, n.Sheets)
	}
}

func TestNestInterlockHelps(t *testing.T) {
	// A curved strip packs tighter against its half-turned copy than alone.
	poly := fixture.Strip(10, math.Pi/2, 5, 2.7)
	s := Sheet{Width: 200, Height: 200, Margin: 5, Spacing: 2}
	alone, err := NestPolygon(poly, 1, s, NestOptions{})
	if err != nil {
		t.Fatal(err)
	}
	paired, err := NestPolygon(poly, 1, s, NestOptions{Interlock: true})
	if err != nil {
		t.Fatal(err)
	}
	if paired.PerSheet <= alone.PerSheet {
		t.Errorf("interlocked %d per sheet, alone %d", paired.PerSheet, alone.PerSheet)
	}
	t.Logf("strip per 200 mm sheet: %d alone, %d interlocked", alone.PerSheet, paired.PerSheet)
}

func TestNestRejects(t *testing.T) {
	if _, err := NestDiscs(60, 1, Sheet{Width: 100, Height: 100}); err == nil {
		t.Error("a disc wider than the sheet was placed")
	}
	if _, err := NestPolygon(fixture.Strip(10, 1, 2, 2), 3, Sheet{Width: -1, Height: 10}, NestOptions{}); err == nil {
		t.Error("a negative sheet was accepted")
	}
}
