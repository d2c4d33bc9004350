package cut

import (
	"math"
	"testing"

	"coilwright/cam/geom"
)

// TestWithToolPath: a 50 mm disc with a Ø3.68 mm hole and a 1 mm kerf
// keeps its CUT layer as drawn and gains a TOOLPATH layer with the disc at
// 25.5 mm and the hole at 1.34 mm. Source: the kerf is centred on the
// tool's path, so the path runs half the kerf outside the part and inside
// its holes (see ApplyKerf).
func TestWithToolPath(t *testing.T) {
	var d geom.Drawing
	d.Add("CUT", geom.Circle{Radius: 25}, geom.Circle{Center: geom.Vec2{X: 8.75}, Radius: 1.84})
	d.Add("MARK", geom.Line{B: geom.Vec2{X: 1}})
	got, err := WithToolPath(d, 1)
	if err != nil {
		t.Fatal(err)
	}
	const tol = 1e-12
	radii := func(name string) []float64 {
		l, ok := got.Layer(name)
		if !ok {
			t.Fatalf("no %s layer", name)
		}
		var r []float64
		for _, e := range l.Entities {
			r = append(r, e.(geom.Circle).Radius)
		}
		return r
	}
	for _, c := range []struct {
		layer string
		want  []float64
	}{{"CUT", []float64{25, 1.84}}, {ToolPathLayer, []float64{25.5, 1.34}}} {
		r := radii(c.layer)
		if len(r) != len(c.want) {
			t.Fatalf("%s: %v, want %v", c.layer, r, c.want)
		}
		for i := range r {
			if math.Abs(r[i]-c.want[i]) > tol {
				t.Errorf("%s circle %d: %.6f mm, want %.6f", c.layer, i, r[i], c.want[i])
			}
		}
	}
	if l, _ := d.Layer("CUT"); l.Entities[0].(geom.Circle).Radius != 25 {
		t.Error("the input drawing changed")
	}
	if _, err := WithToolPath(geom.Drawing{}, 1); err == nil {
		t.Error("a drawing without a CUT layer was offset")
	}
}
