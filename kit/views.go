package kit

import (
	"bytes"
	"fmt"
	"math"

	"coilwright/cam/cut"
	"coilwright/cam/geom"
	"coilwright/cam/plot"
	"coilwright/cam/svg"
	"coilwright/parts"
	"coilwright/parts/sheet"
)

// Layers of the side and plan view drawings.
const (
	layerWire      = "WIRE"
	layerReflector = "REFLECTOR"
	layerRod       = "ROD"
	layerCable     = "CABLE"
	layerDim       = "DIM"
)

// drawingScales are the scales a framed drawing may take, largest first:
// the printed size over the true size.
var drawingScales = [...]float64{2, 1, 0.5, 0.2, 0.1, 0.05, 0.02, 0.01}

// Room a framed drawing may take on an A4 text width, in mm.
const (
	viewMaxWidthMM  = 160
	viewMaxHeightMM = 190
	// dimTextMM is the printed height of dimension text.
	dimTextMM = 2.5
)

// fitScale returns the largest standard scale at which a drawing of size
// (w, h) mm fits the room.
func fitScale(w, h float64) float64 {
	for _, s := range drawingScales {
		if w*s <= viewMaxWidthMM && h*s <= viewMaxHeightMM {
			return s
		}
	}
	return drawingScales[len(drawingScales)-1]
}

// fitWithText returns the largest standard scale at which the drawing
// draw makes for that scale (its text sized for it) fits the room.
func fitWithText(draw func(scale float64) geom.Drawing) float64 {
	for _, s := range drawingScales {
		sz := draw(s).Bounds().Size()
		if sz.X*s <= viewMaxWidthMM && sz.Y*s <= viewMaxHeightMM {
			return s
		}
	}
	return drawingScales[len(drawingScales)-1]
}

// rectContour is a closed axis-aligned rectangle.
func rectContour(x0, y0, x1, y1 float64) geom.Contour {
	return geom.Contour{Closed: true, Vertices: []geom.Vertex{{P: geom.Vec2{X: x0, Y: y0}}, {P: geom.Vec2{X: x1, Y: y0}}, {P: geom.Vec2{X: x1, Y: y1}}, {P: geom.Vec2{X: x0, Y: y1}}}}
}

// openContour is a polyline as an open contour.
func openContour(p geom.Polyline) geom.Contour {
	c := geom.Contour{Vertices: make([]geom.Vertex, len(p))}
	for i, v := range p {
		c.Vertices[i].P = v
	}
	return c
}

// addDimensions draws each dimension on the DIM layer: its extension
// lines, the dimension line with short end ticks, and its text, textH mm
// high in drawing units, above the middle of the line where it fits and
// is free, else where labelPlacer finds room (no two labels overlap).
func addDimensions(d *geom.Drawing, dims []geom.Dimension, textH float64) {
	type label struct {
		dm   geom.Dimension
		a, b geom.Vec2
		ang  float64
		n    geom.Vec2
	}
	var labels []label
	for _, dm := range dims {
		a, b := dm.Line()
		ext := func(p, q geom.Vec2) geom.Line { // from p past q by textH/2
			v := q.Sub(p)
			if l := v.Len(); l > 0 {
				q = q.Add(v.Scale(textH / 2 / l))
			}
			return geom.Line{A: p, B: q}
		}
		d.Add(layerDim, ext(dm.A, a), ext(dm.B, b), geom.Line{A: a, B: b})
		u := b.Sub(a)
		l := u.Len()
		if l == 0 {
			continue
		}
		u = u.Scale(1 / l)
		n := geom.Vec2{X: -u.Y, Y: u.X}
		tick := u.Add(n).Scale(textH / 3)
		for _, p := range []geom.Vec2{a, b} {
			d.Add(layerDim, geom.Line{A: p.Sub(tick), B: p.Add(tick)})
		}
		ang := math.Atan2(u.Y, u.X)
		if ang > math.Pi/2+1e-9 || ang < -math.Pi/2+1e-9 {
			ang += math.Pi // keep text readable from below or the right
			n = n.Scale(-1)
		}
		if ang < -math.Pi/2+1e-9 {
			ang += math.Pi
		}
		labels = append(labels, label{dm, a, b, ang, n})
	}
	// Every line is drawn before any text is placed, so a label keeps
	// clear of the dimensions that come after it too.
	p := newLabelPlacer(*d, textH/10)
	for _, lb := range labels {
		d.Add(layerDim, p.place(dimensionLabels(lb.dm, lb.a, lb.b, lb.ang, lb.n, textH)))
	}
}

// sideDrawing draws the side view of v: reflector, support rod, feed
// cable, the wire's centreline and the dimensions, dimension text sized
// for printing at scale.
func sideDrawing(v sheet.SideView, scale float64) geom.Drawing {
	var d geom.Drawing
	d.Add(layerReflector, rectContour(-v.ReflectorWidth/2, -v.ReflectorThick, v.ReflectorWidth/2, 0))
	if v.RodDiameter > 0 {
		d.Add(layerRod, rectContour(-v.RodDiameter/2, 0, v.RodDiameter/2, v.RodLength))
	}
	d.Add(layerCable, rectContour(v.CoaxX-v.CoaxOuter/2, -v.ReflectorThick-v.CableShown, v.CoaxX+v.CoaxOuter/2, -v.ReflectorThick))
	d.Add(layerWire, openContour(v.Wire))
	addDimensions(&d, v.Dimensions, dimTextMM/scale)
	return d
}

// planDrawing draws the plan view from above: the reflector as cut (when
// there is one), the wire's centreline projected on it, and the coil's
// base and top diameters.
func planDrawing(d *parts.Design, scale float64) geom.Drawing {
	var out geom.Drawing
	if r := d.Patterns.Reflector; r != nil {
		for _, l := range r.Drawing.Layers {
			out.Add(layerReflector, l.Entities...)
		}
	}
	c := d.Coil
	n := int(96*c.Turns) + 1
	wire := make(geom.Polyline, n+1)
	for i := range wire {
		p := c.Point(c.Span() * float64(i) / float64(n))
		wire[i] = geom.Vec2{X: p.X, Y: p.Y}
	}
	out.Add(layerWire, openContour(wire))
	rb, rt := c.StartRadius, c.EndRadius
	u := 2 * math.Max(rb, rt) / 6
	// Both above the coil, the top's nearer (the plate's name is below the
	// centre): the base's line clears the top's text by a text height.
	textH := dimTextMM / scale
	dims := []geom.Dimension{{A: geom.Vec2{X: -rb, Y: 0}, B: geom.Vec2{X: rb, Y: 0}, Offset: math.Max(rb, rt) + u, Text: fmt.Sprintf("Ø%.2f base", 2*rb)}}
	if math.Abs(rb-rt) > 0.005 {
		dims[0].Offset += 2.5 * textH
		dims = append(dims, geom.Dimension{A: geom.Vec2{X: -rt, Y: 0}, B: geom.Vec2{X: rt, Y: 0}, Offset: math.Max(rb, rt) + u, Text: fmt.Sprintf("Ø%.2f top", 2*rt)})
	}
	addDimensions(&out, dims, textH)
	return out
}

// framedDrawing writes d as a drawing SVG and frames it at scale.
func framedDrawing(d geom.Drawing, frame *geom.Box2, title, note string, scale float64) ([]byte, error) {
	var in bytes.Buffer
	if err := svg.WriteSVG(&in, d, svg.SVGOptions{Frame: frame, Title: title}); err != nil {
		return nil, err
	}
	var out bytes.Buffer
	if err := plot.WriteDrawing(&out, plot.Drawing{Title: title, Note: note, SVG: in.Bytes(), Scale: scale}, plot.DrawingOptions{}); err != nil {
		return nil, err
	}
	return out.Bytes(), nil
}

// scaleWords returns "1:2", "1:1" or "2:1".
func scaleWords(s float64) string {
	if s >= 1 {
		return num(s) + ":1"
	}
	return "1:" + num(math.Round(1/s))
}

// viewPlots draws the side and plan views, each flat part as designed, and
// for a batch each part's nested sheet.
func (k *Kit) viewPlots() ([]plotFile, error) {
	d := k.Design
	var out []plotFile
	add := func(name, title, caption string, dr geom.Drawing, frame *geom.Box2, note string, s float64) error {
		caption += " Scale " + scaleWords(s) + " when printed at 100 %."
		b, err := framedDrawing(dr, frame, title, note, s)
		if err != nil {
			return fmt.Errorf("%s: %w", name, err)
		}
		out = append(out, plotFile{Name: name, Title: title, Caption: caption, SVG: b})
		return nil
	}
	fit := func(b geom.Box2) float64 { sz := b.Size(); return fitScale(sz.X, sz.Y) }
	// The views carry dimension text sized for their scale, and where the
	// text goes depends on its size: take the largest scale at which the
	// view, text and all, fits.
	sv := sheet.NewSideView(d, k.cutList)
	s := fitWithText(func(s float64) geom.Drawing { return sideDrawing(sv, s) })
	with := "with the support rod and the feed cable"
	if sv.RodDiameter == 0 {
		with = "with the feed cable (this kit has no support rod)"
	}
	if err := add("plot-side.svg", "Side view", fmt.Sprintf("The %s coil on its wire centreline over the reflector, %s; dimensions in mm.", d.Coil.Hand, with),
		sideDrawing(sv, s), nil, "Dimensions in mm; the wire is drawn on its centreline.", s); err != nil {
		return nil, err
	}
	s = fitWithText(func(s float64) geom.Drawing { return planDrawing(d, s) })
	if err := add("plot-plan.svg", "Plan view", "The coil seen from above over the reflector as cut (feed hole at the start tick); dimensions in mm.",
		planDrawing(d, s), nil, "Seen from above, away from the reflector; dimensions in mm.", s); err != nil {
		return nil, err
	}
	for _, c := range k.parts {
		if err := add("plot-"+c.name+".svg", c.title+" as designed", c.title+" as designed (true outline, before any kerf offset): cut lines red, marks blue.",
			c.nominal, nil, c.label, fit(c.nominal.Bounds())); err != nil {
			return nil, err
		}
	}
	if d.Spec.Quantity > 1 {
		for _, c := range k.parts {
			frame := geom.Box2{Max: geom.Vec2{X: c.sheet.Width, Y: c.sheet.Height}}
			note := fmt.Sprintf("Sheet %s × %s mm: %d parts per sheet, %d sheets for %d.", num(c.sheet.Width), num(c.sheet.Height), c.nest.PerSheet, c.nest.Sheets, d.Spec.Quantity)
			if err := add("plot-panel-"+c.name+".svg", c.title+": nested sheet", c.title+" parts nested on one stock sheet (kerf offset applied). "+note,
				panelWithSheet(c), &frame, note, fit(frame)); err != nil {
				return nil, err
			}
		}
	}
	return out, nil
}

// panelWithSheet is a part's nested sheet with the sheet's edge drawn.
func panelWithSheet(c cutPart) geom.Drawing {
	d := cut.PanelDrawing(c.cut, c.nest)
	d.Add("SHEET", rectContour(0, 0, c.sheet.Width, c.sheet.Height))
	return d
}
