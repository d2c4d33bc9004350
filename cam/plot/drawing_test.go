package plot

import (
	"bytes"
	"errors"
	"testing"
)

func TestWriteDrawing(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteDrawing(&buf, Drawing{Title: "Reflector", SVG: []byte(sampleDrawingSVG), Scale: 0.5, Note: "Cut on the red line"}, DrawingOptions{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "drawing.svg", buf.Bytes())
	doc := parseSVG(t, buf.Bytes())
	ds := doc.all("drawing")
	if len(ds) != 1 {
		t.Fatalf("%d nested drawings, want 1", len(ds))
	}
	// A 54 mm drawing at 1:2 is 27 mm on the page.
	if w, h := ds[0].num(t, "width"), ds[0].num(t, "height"); w != 27 || h != 27 || ds[0].attr("viewBox") != "0 0 54 54" {
		t.Errorf("nested drawing %g × %g mm, viewBox %q; want 27 × 27, 0 0 54 54", w, h, ds[0].attr("viewBox"))
	}
	// The 0.025 mm hairline becomes 0.25 mm printed: 0.5 drawing units at
	// 1:2.
	g, ok := ds[0].child("g")
	if !ok || g.attr("stroke-width") != "0.5" {
		t.Errorf("nested layer %v, want stroke-width 0.5", g.Attrs)
	}
	if got := doc.texts("scale-note"); len(got) != 1 || got[0] != "Scale 1:2 when printed at 100 %" {
		t.Errorf("scale note %q", got)
	}
	for _, tc := range []struct {
		name string
		svg  string
	}{
		{"not XML", "<svg"},
		{"no mm size", `<svg xmlns="http://www.w3.org/2000/svg" width="54" height="54" viewBox="0 0 54 54"></svg>`},
		{"not svg", `<html></html>`},
		{"taken id", `<svg xmlns="http://www.w3.org/2000/svg" width="5mm" height="5mm" viewBox="0 0 5 5"><g id="title"/></svg>`},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var ie *InputError
			if err := WriteDrawing(&bytes.Buffer{}, Drawing{SVG: []byte(tc.svg)}, DrawingOptions{}); !errors.As(err, &ie) {
				t.Errorf("error %v, want an InputError", err)
			}
		})
	}
	for _, tc := range []struct {
		s    float64
		want string
	}{{0.5, "Scale 1:2"}, {1, "Scale 1:1"}, {2, "Scale 2:1"}, {1.0 / 3, "Scale 1:3"}} {
		if got := scaleText(tc.s); got != tc.want {
			t.Errorf("scaleText(%g) = %q, want %q", tc.s, got, tc.want)
		}
	}
}
