package flat

import (
	"math"
	"testing"

	"coilwright/cam/geom"
)

// areaTol is the relative tolerance on areas of flattened outlines
// (flattened at 1 µm, so the chord error is far below it).
const areaTol = 1e-4

func cutContours(t *testing.T, d geom.Drawing) []geom.Entity {
	t.Helper()
	l, ok := d.Layer(LayerCut)
	if !ok {
		t.Fatal("no CUT layer")
	}
	return l.Entities
}

func TestReflectorDisc(t *testing.T) {
	r, err := NewReflector(ReflectorInput{Shape: ReflectorDisc, Size: 60, FeedRadius: 8.23, Label: "TEST KIT", Hand: "RHCP",
		Mounting: MountingHoles{Count: 4, Diameter: 3.2, PitchDiameter: 45, Angle: math.Pi / 4}})
	if err != nil {
		t.Fatal(err)
	}
	es := cutContours(t, r.Drawing)
	if c, ok := es[0].(geom.Circle); !ok || c.Radius != 30 || c.Center != (geom.Vec2{}) {
		t.Errorf("outline %+v, want a circle of radius 30 at the origin", es[0])
	}
	if len(es) != 1+1+4 {
		t.Errorf("%d cut entities, want outline, feed hole and 4 mounting holes", len(es))
	}
	feed := es[1].(geom.Circle)
	// Source: published cable data (0.141 in semi-rigid jacket 3.58 mm)
	// plus 0.1 mm clearance.
	if math.Abs(feed.Radius-1.84) > 1e-12 || math.Abs(feed.Center.X-8.23) > 1e-12 {
		t.Errorf("feed hole %+v", feed)
	}
	marks, _ := r.Drawing.Layer(LayerMark)
	var lines, texts int
	for _, e := range marks.Entities {
		switch e.(type) {
		case geom.Line:
			lines++
		case geom.Text:
			texts++
		}
	}
	if lines != 3 || texts != 2 {
		t.Errorf("%d mark lines and %d texts, want a cross, a start tick, the angle and the name", lines, texts)
	}
}

func TestReflectorOutlines(t *testing.T) {
	t.Run("rounded square", func(t *testing.T) {
		// Area of a square with rounded corners: s² − (4 − π)·rc².
		c := squareOutline(50, 6)
		want := 50*50 - (4-math.Pi)*36
		if got := geom.Polyline(c.Flatten(1e-3)).Area(); math.Abs(got/want-1) > areaTol {
			t.Errorf("area %.4f mm², want %.4f", got, want)
		}
		if b := c.Bounds(); math.Abs(b.Size().X-50) > 1e-9 || math.Abs(b.Size().Y-50) > 1e-9 {
			t.Errorf("bounds %v", b)
		}
	})
	t.Run("bulkhead D-hole", func(t *testing.T) {
		// Source: connector vendor data: Ø 6.5 mm, 6.0 mm across the flat.
		// Area: circle less the circular segment beyond the flat, segment
		// area r²·acos(y/r) − y·√(r² − y²) (standard geometry).
		c := dHole(6.5, 6.0)
		r, y := 3.25, 2.75
		want := math.Pi*r*r - (r*r*math.Acos(y/r) - y*math.Sqrt(r*r-y*y))
		if got := geom.Polyline(c.Flatten(1e-4)).Area(); math.Abs(got/want-1) > areaTol {
			t.Errorf("area %.5f mm², want %.5f", got, want)
		}
		b := c.Bounds()
		if math.Abs(b.Size().Y-6.0) > 1e-9 || math.Abs(b.Size().X-6.5) > 1e-9 {
			t.Errorf("size %v, want 6.5 × 6.0", b.Size())
		}
	})
}

func TestReflectorRejects(t *testing.T) {
	tests := []struct {
		name string
		in   ReflectorInput
	}{
		{"no size", ReflectorInput{FeedRadius: 5}},
		{"feed past the edge", ReflectorInput{Size: 20, FeedRadius: 9}},
		{"holes crowd the feed", ReflectorInput{Size: 80, FeedRadius: 20,
			Mounting: MountingHoles{Count: 4, Diameter: 3, PitchDiameter: 40}}},
		{"holes past the edge", ReflectorInput{Size: 50, FeedRadius: 5,
			Mounting: MountingHoles{Count: 3, Diameter: 4, PitchDiameter: 48}}},
		{"corner too round", ReflectorInput{Shape: ReflectorSquare, Size: 50, CornerRadius: 25, FeedRadius: 5}},
		{"flat larger than the hole", ReflectorInput{Size: 50, FeedRadius: 5, Feed: FeedHole{Kind: FeedSMABulkhead, Flat: 7}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if _, err := NewReflector(tc.in); err == nil {
				t.Error("accepted")
			}
		})
	}
}

func TestJoinLabelNamesHandOnce(t *testing.T) {
	for _, c := range []struct{ kit, hand, want string }{
		{"Test 10G LHCP", "LHCP", "Test 10G LHCP"},
		{"Club (RHCP)", "RHCP", "Club (RHCP)"},
		{"Club 5G8", "RHCP", "Club 5G8 RHCP"},
		{"RHCPish", "RHCP", "RHCPish RHCP"},
		{"", "LHCP", "LHCP"},
	} {
		if got := joinLabel(c.kit, c.hand); got != c.want {
			t.Errorf("joinLabel(%q, %q) = %q, want %q", c.kit, c.hand, got, c.want)
		}
	}
}
