package walk

import (
	"strings"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// tally records the shapes a walk hands over, as "LAYER kind" strings.
type tally []string

func (t *tally) Circle(l string, _ geom.Circle) error   { *t = append(*t, l+" circle"); return nil }
func (t *tally) Arc(l string, _ geom.Arc) error         { *t = append(*t, l+" arc"); return nil }
func (t *tally) Line(l string, _ geom.Line) error       { *t = append(*t, l+" line"); return nil }
func (t *tally) Contour(l string, _ geom.Contour) error { *t = append(*t, l+" contour"); return nil }

// TestWalkOrder checks that Walk hands over every shape of the plate in
// drawing order, the text as its letters' contours.
func TestWalkOrder(t *testing.T) {
	d := fixture.Plate()
	var got tally
	if err := Walk(d, &got); err != nil {
		t.Fatal(err)
	}
	// The plate: CUT holds two circles and a D-hole contour; MARK holds
	// two lines, an arc and the text.
	want := []string{"CUT circle", "CUT circle", "CUT contour", "MARK line", "MARK line", "MARK arc"}
	if len(got) <= len(want) || strings.Join(got[:len(want)], ",") != strings.Join(want, ",") {
		t.Fatalf("walk gave %v, want %v then the text's contours", got, want)
	}
	letters, err := OutlineText(d.Layers[1].Entities[3].(geom.Text))
	if err != nil {
		t.Fatal(err)
	}
	if n := len(got) - len(want); n != len(letters) {
		t.Errorf("text walked as %d contours, OutlineText gives %d", n, len(letters))
	}
}

// TestWalkRefuses checks the shapes no writer can draw and bad layer
// names.
func TestWalkRefuses(t *testing.T) {
	for _, tc := range []struct {
		name string
		l    geom.Layer
	}{
		{"circle of radius 0", geom.Layer{Name: "CUT", Entities: []geom.Entity{geom.Circle{}}}},
		{"arc of radius -1", geom.Layer{Name: "CUT", Entities: []geom.Entity{geom.Arc{Radius: -1}}}},
		{"contour of one vertex", geom.Layer{Name: "CUT", Entities: []geom.Entity{geom.Contour{Vertices: []geom.Vertex{{}}}}}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var got tally
			if err := Layer(tc.l, &got); err == nil {
				t.Error("accepted")
			}
		})
	}
	t.Run("lower-case layer name", func(t *testing.T) {
		if _, err := Prepare(geom.Drawing{Layers: []geom.Layer{{Name: "cut"}}}); err == nil {
			t.Error("accepted")
		}
	})
}
