package kit

import (
	"coilwright/parts/sheet"
	"fmt"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// viewTexts returns every text of a drawing: the dimensions' labels and
// the drawing's own (the plate's name, the start angle).
func viewTexts(d geom.Drawing) []geom.Text {
	var out []geom.Text
	for _, l := range d.Layers {
		for _, e := range l.Entities {
			if t, ok := e.(geom.Text); ok {
				out = append(out, t)
			}
		}
	}
	return out
}

// checkLabelsApart fails when two texts' boxes, estimated from their
// height and length (geom.Text.Bounds), overlap.
func checkLabelsApart(t *testing.T, what string, d geom.Drawing) {
	t.Helper()
	ts := viewTexts(d)
	if len(ts) < 2 {
		t.Errorf("%s: %d texts, want the dimensions' labels", what, len(ts))
	}
	for i := range ts {
		for j := i + 1; j < len(ts); j++ {
			if boxesOverlap(ts[i].Bounds(), ts[j].Bounds()) {
				t.Errorf("%s: %q and %q overlap: %v, %v", what, ts[i].Value, ts[j].Value, ts[i].Bounds(), ts[j].Bounds())
			}
		}
	}
}

// TestViewLabelsDoNotOverlap draws the side and plan views of both demos
// and of seeded random specs at the scale the plots use, and checks that
// no two labels overlap.
func TestViewLabelsDoNotOverlap(t *testing.T) {
	var kits []*Kit
	for _, demo := range templates.Demos() {
		kits = append(kits, demoKit(t, demo, Options{}))
	}
	rng := rand.New(rand.NewPCG(14, 4))
	for len(kits) < len(templates.Demos())+6 {
		src := randomSpecText(rng) + "\n[solver]\nenabled = false\n"
		if s, err := spec.ParseSpec([]byte(src)); err == nil {
			if k, err := New(Source{Name: "random.toml", Bytes: []byte(src), Spec: s}, Options{}); err == nil {
				kits = append(kits, k)
			}
		}
	}
	for i, k := range kits {
		name := fmt.Sprintf("kit %d (%s, %.0f MHz)", i, k.Source.Spec.Kit, k.Source.Spec.FrequencyMHz)
		sv := sheet.NewSideView(k.Design, k.cutList)
		s := fitWithText(func(s float64) geom.Drawing { return sideDrawing(sv, s) })
		checkLabelsApart(t, name+" side view", sideDrawing(sv, s))
		s = fitWithText(func(s float64) geom.Drawing { return planDrawing(k.Design, s) })
		checkLabelsApart(t, name+" plan view", planDrawing(k.Design, s))
	}
}

// TestLabelPlacerGeometry checks the overlap tests the placer rests on
// against hand-worked cases.
func TestLabelPlacerGeometry(t *testing.T) {
	box := geom.Box2{Min: geom.Vec2{X: 0, Y: 0}, Max: geom.Vec2{X: 2, Y: 1}}
	for _, tc := range []struct {
		name string
		p, q geom.Vec2
		want bool
	}{
		{"through the middle", geom.Vec2{X: -1, Y: 0.5}, geom.Vec2{X: 3, Y: 0.5}, true},
		{"inside", geom.Vec2{X: 0.5, Y: 0.5}, geom.Vec2{X: 1, Y: 0.6}, true},
		{"along the top edge", geom.Vec2{X: -1, Y: 1}, geom.Vec2{X: 3, Y: 1}, false},
		{"above", geom.Vec2{X: -1, Y: 2}, geom.Vec2{X: 3, Y: 1.5}, false},
		{"diagonal past the corner", geom.Vec2{X: 1.5, Y: 2}, geom.Vec2{X: 3, Y: 0.5}, false},
		{"diagonal across the corner", geom.Vec2{X: 1.5, Y: 1.2}, geom.Vec2{X: 2.2, Y: 0.5}, true},
		{"stops short", geom.Vec2{X: -2, Y: 0.5}, geom.Vec2{X: -0.1, Y: 0.5}, false},
	} {
		if got := segmentHitsBox(tc.p, tc.q, box); got != tc.want {
			t.Errorf("%s: segmentHitsBox = %v, want %v", tc.name, got, tc.want)
		}
	}
	touch := geom.Box2{Min: geom.Vec2{X: 2, Y: 0}, Max: geom.Vec2{X: 3, Y: 1}}
	if boxesOverlap(box, touch) {
		t.Error("boxes sharing an edge counted as overlapping")
	}
	if !boxesOverlap(box, geom.Box2{Min: geom.Vec2{X: 1.9, Y: 0.9}, Max: geom.Vec2{X: 3, Y: 2}}) {
		t.Error("boxes sharing a corner square not counted as overlapping")
	}
}
