// Text as outlines: cutting machines and plain DXF readers know no fonts,
// so text is drawn as closed polylines traced from the Go Regular font
// (embedded, so every machine draws the same letters).

package walk

import (
	"fmt"
	"math"

	"github.com/tdewolff/canvas"

	"coilwright/cam/geom"
	"coilwright/cam/internal/font"
)

// TextTolerance is the largest distance in mm between a letter's curve and
// the chords that replace it.
const TextTolerance = 0.01

// textPath returns the outline of t as a canvas path in drawing
// coordinates (mm, y up).
func textPath(t geom.Text) (*canvas.Path, error) {
	fam, err := font.Family()
	if err != nil {
		return nil, err
	}
	// Size the face so capitals are t.Height tall.
	probe := fam.Face(100)
	capH := probe.Metrics().CapHeight
	if !(capH > 0) || !(t.Height > 0) {
		return nil, fmt.Errorf("text %q has no usable height", t.Value)
	}
	face := fam.Face(100 * t.Height / capH)
	p, width, err := face.ToPath(t.Value)
	if err != nil {
		return nil, fmt.Errorf("outlining %q: %w", t.Value, err)
	}
	dx := 0.0
	switch t.Align {
	case geom.AlignCenter:
		dx = -width / 2
	case geom.AlignRight:
		dx = -width
	}
	m := canvas.Identity.Translate(t.At.X, t.At.Y).Rotate(t.Angle*180/math.Pi).Translate(dx, 0)
	return p.Transform(m), nil
}

// OutlineText returns the letters of t as closed straight-segment contours
// in drawing coordinates, chords within TextTolerance of the glyph curves.
func OutlineText(t geom.Text) ([]geom.Contour, error) {
	p, err := textPath(t)
	if err != nil {
		return nil, err
	}
	// Each letter contour is flattened on its own: flattening a whole line
	// at once rebuilds the rest of the path after every curve, which costs
	// time and memory growing with the square of the text's length.
	var flat []*canvas.Path
	for _, sub := range p.Split() {
		flat = append(flat, sub.Flatten(TextTolerance).Split()...)
	}
	var out []geom.Contour
	for _, sub := range flat {
		var c geom.Contour
		c.Closed = true
		for _, pt := range sub.Coords() {
			v := geom.Vec2{X: pt.X, Y: pt.Y}
			if n := len(c.Vertices); n > 0 && c.Vertices[n-1].P == v {
				continue
			}
			c.Vertices = append(c.Vertices, geom.Vertex{P: v})
		}
		if n := len(c.Vertices); n > 1 && c.Vertices[0].P == c.Vertices[n-1].P {
			c.Vertices = c.Vertices[:n-1]
		}
		if len(c.Vertices) >= 3 {
			out = append(out, c)
		}
	}
	return out, nil
}

// ExpandText returns a copy of d with every Text entity replaced by its
// outline contours, on the same layer and in the same place in the order.
func ExpandText(d geom.Drawing) (geom.Drawing, error) {
	out := geom.Drawing{Layers: make([]geom.Layer, len(d.Layers))}
	for i, l := range d.Layers {
		out.Layers[i].Name = l.Name
		for _, e := range l.Entities {
			t, ok := e.(geom.Text)
			if !ok {
				out.Layers[i].Entities = append(out.Layers[i].Entities, e)
				continue
			}
			cs, err := OutlineText(t)
			if err != nil {
				return geom.Drawing{}, err
			}
			for _, c := range cs {
				out.Layers[i].Entities = append(out.Layers[i].Entities, c)
			}
		}
	}
	return out, nil
}

// ValidLayerName reports whether name is non-empty upper-case ASCII letters,
// digits and underscores.
func ValidLayerName(name string) bool {
	if name == "" {
		return false
	}
	for _, r := range name {
		if !(r >= 'A' && r <= 'Z' || r >= '0' && r <= '9' || r == '_') {
			return false
		}
	}
	return true
}
