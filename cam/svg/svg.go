// SVG writer: one group per layer (its id the layer name), hairline
// strokes, no fill, and a page whose width and height are given in
// millimetres so the file prints and imports at true size. Drawing coordinates (y up) are mapped to SVG user
// units of 1 mm (y down) inside the frame.

package svg

import (
	"bufio"
	"fmt"
	"html"
	"io"
	"math"
	"strconv"
	"strings"

	"coilwright/cam/geom"
	"coilwright/cam/walk"
)

// DefaultSVGMargin is the clear border in mm around a drawing's bounds
// when SVGOptions.Frame is not given.
const DefaultSVGMargin = 2.0

// HairlineMM is the stroke width in mm of every SVG line. Common practice
// (no published source): laser programs treat strokes of about 0.001 in
// as cut lines.
const HairlineMM = 0.025

// SVGOptions tunes WriteSVG. The zero value frames the drawing's bounds
// with DefaultSVGMargin.
type SVGOptions struct {
	// Frame, when not nil, is the area of the drawing shown, in mm; it sets
	// the page size. A sheet layout passes the sheet here.
	Frame *geom.Box2
	// Title is written as the document's title element.
	Title string
	// Comments are written as XML comments after the root element.
	Comments []string
}

// layerStroke returns the stroke colour of a layer: red for CUT, blue for
// MARK, green for TOOLPATH, black otherwise (see layerColor).
func layerStroke(name string) string {
	switch name {
	case "CUT":
		return "#ff0000"
	case "MARK":
		return "#0000ff"
	case "TOOLPATH":
		return "#00a000"
	}
	return "#000000"
}

// SVGFrame returns the frame WriteSVG uses for d under opt, in mm.
func SVGFrame(d geom.Drawing, opt SVGOptions) geom.Box2 {
	if opt.Frame != nil {
		return *opt.Frame
	}
	b := d.Bounds()
	if b.IsEmpty() {
		b = geom.Box2{}
	}
	m := geom.Vec2{X: DefaultSVGMargin, Y: DefaultSVGMargin}
	return geom.Box2{Min: b.Min.Sub(m), Max: b.Max.Add(m)}
}

// WriteSVG writes d to w as an SVG document sized in millimetres. Text is
// outlined first. It returns an error for an entity it cannot draw, an
// empty frame, or a failed write.
func WriteSVG(w io.Writer, d geom.Drawing, opt SVGOptions) error {
	d, err := walk.Prepare(d)
	if err != nil {
		return err
	}
	f := SVGFrame(d, opt)
	size := f.Size()
	if !(size.X > 0) || !(size.Y > 0) {
		return fmt.Errorf("SVG frame %v is empty", f)
	}
	sw := &svgWriter{w: bufio.NewWriter(w), frame: f}
	sw.printf("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
	sw.printf("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"%smm\" height=\"%smm\" viewBox=\"0 0 %s %s\">\n",
		svgNum(size.X), svgNum(size.Y), svgNum(size.X), svgNum(size.Y))
	for _, c := range opt.Comments {
		sw.printf("<!-- %s -->\n", strings.ReplaceAll(strings.Join(strings.Fields(c), " "), "--", "- -"))
	}
	if opt.Title != "" {
		sw.printf("<title>%s</title>\n", html.EscapeString(opt.Title))
	}
	for _, l := range d.Layers {
		sw.printf("<g id=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"%s\">\n",
			l.Name, layerStroke(l.Name), svgNum(HairlineMM))
		if err := walk.Layer(l, sw); err != nil {
			return err
		}
		sw.printf("</g>\n")
	}
	sw.printf("</svg>\n")
	return sw.w.Flush()
}

type svgWriter struct {
	w     *bufio.Writer
	frame geom.Box2
}

func (sw *svgWriter) printf(format string, args ...any) { fmt.Fprintf(sw.w, format, args...) }

// svgNum formats v with at most six decimals and no negative zero.
func svgNum(v float64) string {
	s := strconv.FormatFloat(v, 'f', 6, 64)
	s = strings.TrimRight(s, "0")
	s = strings.TrimSuffix(s, ".")
	if s == "-0" {
		s = "0"
	}
	return s
}

// pt maps a drawing point to SVG user units.
func (sw *svgWriter) pt(p geom.Vec2) string {
	return svgNum(p.X-sw.frame.Min.X) + " " + svgNum(sw.frame.Max.Y-p.Y)
}

// arcTo returns the SVG arc command to q along a circle of radius r that
// turns counter-clockwise in the drawing when ccw is set.
func (sw *svgWriter) arcTo(q geom.Vec2, r, span float64, ccw bool) string {
	large, sweep := 0, 1
	if span > math.Pi {
		large = 1
	}
	if ccw { // y is flipped: counter-clockwise in the drawing is sweep 0
		sweep = 0
	}
	return fmt.Sprintf("A %s %s 0 %d %d %s", svgNum(r), svgNum(r), large, sweep, sw.pt(q))
}

// Circle draws a circle.
func (sw *svgWriter) Circle(_ string, e geom.Circle) error {
	c := sw.pt(e.Center)
	x, y, _ := strings.Cut(c, " ")
	sw.printf("<circle cx=\"%s\" cy=\"%s\" r=\"%s\"/>\n", x, y, svgNum(e.Radius))
	return nil
}

// Arc draws an arc as a path.
func (sw *svgWriter) Arc(_ string, e geom.Arc) error {
	sw.printf("<path d=\"M %s %s\"/>\n", sw.pt(e.Point(e.Start)), sw.arcTo(e.Point(e.End), e.Radius, e.End-e.Start, true))
	return nil
}

// Line draws a line as a path.
func (sw *svgWriter) Line(_ string, e geom.Line) error {
	sw.printf("<path d=\"M %s L %s\"/>\n", sw.pt(e.A), sw.pt(e.B))
	return nil
}

// Contour draws a contour as one path of lines and arcs.
func (sw *svgWriter) Contour(_ string, e geom.Contour) error {
	var b strings.Builder
	b.WriteString("M " + sw.pt(e.Vertices[0].P))
	for i := range e.Segments() {
		p, q, bulge := e.Segment(i)
		if bulge == 0 {
			b.WriteString(" L " + sw.pt(q))
			continue
		}
		a := geom.BulgeArc(p, q, bulge)
		b.WriteString(" " + sw.arcTo(q, a.Radius, a.End-a.Start, bulge > 0))
	}
	if e.Closed {
		b.WriteString(" Z")
	}
	sw.printf("<path d=\"%s\"/>\n", b.String())
	return nil
}
