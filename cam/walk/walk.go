package walk

import (
	"fmt"

	"coilwright/cam/geom"
)

// Shapes is what a drawing writer does with each kind of shape. Each
// method gets the layer's name and the shape in drawing millimetres (y
// up); Walk has already checked the shape is drawable.
type Shapes interface {
	Circle(layer string, c geom.Circle) error
	Arc(layer string, a geom.Arc) error
	Line(layer string, l geom.Line) error
	Contour(layer string, c geom.Contour) error
}

// Prepare returns a copy of d as every writer draws it: text outlined into
// contours (see ExpandText) and every layer name checked. d is not
// changed.
func Prepare(d geom.Drawing) (geom.Drawing, error) {
	for _, l := range d.Layers {
		if !ValidLayerName(l.Name) {
			return geom.Drawing{}, fmt.Errorf("layer name %q: use A–Z, 0–9 and _", l.Name)
		}
	}
	return ExpandText(d)
}

// Walk hands every entity of d to s, layer by layer, in order. See Layer.
func Walk(d geom.Drawing, s Shapes) error {
	for _, l := range d.Layers {
		if err := Layer(l, s); err != nil {
			return err
		}
	}
	return nil
}

// Layer hands each entity of l to s in order, outlining any text on the
// way. It returns an error for a circle or arc without a positive radius,
// a contour of fewer than two vertices, an entity of another kind, or the
// first error s returns.
func Layer(l geom.Layer, s Shapes) error {
	for _, e := range l.Entities {
		var err error
		switch e := e.(type) {
		case geom.Circle:
			if !(e.Radius > 0) {
				return fmt.Errorf("layer %s: circle of radius %g mm", l.Name, e.Radius)
			}
			err = s.Circle(l.Name, e)
		case geom.Arc:
			if !(e.Radius > 0) {
				return fmt.Errorf("layer %s: arc of radius %g mm", l.Name, e.Radius)
			}
			err = s.Arc(l.Name, e)
		case geom.Line:
			err = s.Line(l.Name, e)
		case geom.Contour:
			if len(e.Vertices) < 2 {
				return fmt.Errorf("layer %s: polyline of %d vertices", l.Name, len(e.Vertices))
			}
			err = s.Contour(l.Name, e)
		case geom.Text:
			cs, oerr := OutlineText(e)
			if oerr != nil {
				return oerr
			}
			for _, c := range cs {
				if err = s.Contour(l.Name, c); err != nil {
					break
				}
			}
		default:
			return fmt.Errorf("layer %s: cannot draw a %T", l.Name, e)
		}
		if err != nil {
			return err
		}
	}
	return nil
}
