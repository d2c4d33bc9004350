// Existing drawings framed as plots: an SVG document sized in mm (such as
// a part drawing) nested at a stated scale under a title, with a scale
// note.

package plot

import (
	"bytes"
	"encoding/xml"
	"errors"
	"fmt"
	"io"
	"math"
	"regexp"
	"strconv"
	"strings"
)

// Drawing is an existing SVG drawing to frame.
type Drawing struct {
	// Title is drawn at the top and written as the SVG title.
	Title string
	// Description is the SVG description; empty generates one.
	Description string
	// Note is one line under the drawing.
	Note string
	// SVG is a complete SVG document whose root width and height are given
	// in mm (as cam's drawing writer makes them) and which has a viewBox.
	SVG []byte
	// Scale is the printed size over the true size (0.5 draws at 1:2);
	// zero means 1:1.
	Scale float64
}

// DrawingOptions tunes WriteDrawing. The zero value widens lines to
// DefaultDrawingLineMM.
type DrawingOptions struct {
	// LineMM is the least printed width in mm of the drawing's lines:
	// thinner strokes (cut-file hairlines) are widened to it so they show
	// on screen and paper. Zero means DefaultDrawingLineMM; negative keeps
	// the drawing's own widths.
	LineMM float64
}

// DefaultDrawingLineMM is the least printed line width of a framed
// drawing. Common practice (no published source): 0.25 mm is the usual
// thin line of technical drawings.
const DefaultDrawingLineMM = 0.25

// strokeWidthAttr matches a stroke-width attribute with a plain number.
var strokeWidthAttr = regexp.MustCompile(`stroke-width="([0-9.eE+-]+)"`)

// widenLines returns body with every stroke-width below least raised to
// it.
func widenLines(body []byte, least float64) []byte {
	return strokeWidthAttr.ReplaceAllFunc(body, func(m []byte) []byte {
		v, err := strconv.ParseFloat(string(strokeWidthAttr.FindSubmatch(m)[1]), 64)
		if err != nil || v >= least {
			return m
		}
		return []byte(`stroke-width="` + strconv.FormatFloat(least, 'f', -1, 64) + `"`)
	})
}

// drawingMarginMM is the clear border around a framed drawing.
const drawingMarginMM = 6

// WriteDrawing writes d's drawing nested at d.Scale under its title, with
// a line stating the scale, as a new SVG document. It returns an
// *InputError when the drawing is not an SVG document sized in mm with a
// viewBox, or uses the ids "title" or "desc" that the frame needs.
func WriteDrawing(w io.Writer, d Drawing, opt DrawingOptions) error {
	scale := d.Scale
	if scale == 0 {
		scale = 1
	}
	if !(scale > 0) || math.IsInf(scale, 0) {
		return inputErr("Scale", "%g must be positive", d.Scale)
	}
	in, err := parseDrawing(d.SVG)
	if err != nil {
		return err
	}
	line := opt.LineMM
	if line == 0 {
		line = DefaultDrawingLineMM
	}
	if line > 0 {
		// Inner user units per mm printed: viewBox width over printed width.
		vb := strings.Fields(strings.ReplaceAll(in.viewBox, ",", " "))
		if len(vb) != 4 {
			return inputErr("SVG", "viewBox %q does not hold four numbers", in.viewBox)
		}
		vw, err := strconv.ParseFloat(vb[2], 64)
		if err != nil || !(vw > 0) {
			return inputErr("SVG", "viewBox %q has no positive width", in.viewBox)
		}
		in.body = widenLines(in.body, line*vw/(in.w*scale))
	}
	dw, dh := in.w*scale, in.h*scale
	sn := scaleText(scale)
	width := dw
	for _, l := range []label{{text: d.Title, capMM: titleCapMM, bold: true}, {text: sn + scaleSuffix, capMM: labelCapMM}, {text: d.Note, capMM: labelCapMM}} {
		tw, err := textWidth(l.text, l.capMM, l.bold)
		if err != nil {
			return err
		}
		width = math.Max(width, tw)
	}
	width += 2 * drawingMarginMM
	top := titleBaselineMM + 4.0
	noteY := top + dh + 6
	height := noteY + 2
	if d.Note != "" {
		height += 6
	}
	desc := d.Description
	if desc == "" {
		desc = fmt.Sprintf("Drawing %s × %s mm shown at %s.", fmtVal(in.w), fmtVal(in.h), sn)
	}
	doc := begin(w, width, height, "drawing-frame", d.Title, desc)
	doc.text("title", inkColour, label{text: d.Title, capMM: titleCapMM, bold: true, x: drawingMarginMM, y: titleBaselineMM})
	doc.printf("<svg class=\"drawing\" x=\"%s\" y=\"%s\" width=\"%s\" height=\"%s\" viewBox=\"%s\">", num((width-dw)/2), num(top), num(dw), num(dh), attr(in.viewBox))
	doc.printf("%s", in.body)
	doc.printf("</svg>\n")
	doc.text("scale-note", noteColour, label{text: sn + scaleSuffix, capMM: labelCapMM, x: drawingMarginMM, y: noteY})
	doc.text("note", noteColour, label{text: d.Note, capMM: labelCapMM, x: drawingMarginMM, y: noteY + 6})
	return doc.end()
}

// scaleSuffix follows the scale in the note under a drawing.
const scaleSuffix = " when printed at 100 %"

// scaleText returns "Scale 1:n" or "Scale n:1".
func scaleText(s float64) string {
	f := func(v float64) string { return strconv.FormatFloat(math.Round(v*100)/100, 'f', -1, 64) }
	if s < 1 {
		return "Scale 1:" + f(1/s)
	}
	return "Scale " + f(s) + ":1"
}

// parsedDrawing is what WriteDrawing needs of a nested document: its size
// in mm, its viewBox and the bytes between its root tags.
type parsedDrawing struct {
	w, h    float64
	viewBox string
	body    []byte
}

// parseDrawing reads the root of an SVG document and checks that the
// whole document is well-formed XML.
func parseDrawing(b []byte) (parsedDrawing, error) {
	var out parsedDrawing
	dec := xml.NewDecoder(bytes.NewReader(b))
	depth := 0
	start := int64(-1)
	for {
		tok, err := dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return out, inputErr("SVG", "not well-formed XML: %v", err)
		}
		switch t := tok.(type) {
		case xml.StartElement:
			if depth == 0 {
				if t.Name.Local != "svg" {
					return out, inputErr("SVG", "root element is <%s>, want <svg>", t.Name.Local)
				}
				for _, a := range t.Attr {
					switch a.Name.Local {
					case "width":
						out.w, err = mmLength(a.Value)
					case "height":
						out.h, err = mmLength(a.Value)
					case "viewBox":
						out.viewBox = a.Value
					}
					if err != nil {
						return out, err
					}
				}
				start = dec.InputOffset()
			}
			for _, a := range t.Attr {
				if a.Name.Local == "id" && (a.Value == "title" || a.Value == "desc") {
					return out, inputErr("SVG", "id %q is taken by the frame; rename it", a.Value)
				}
			}
			depth++
		case xml.EndElement:
			depth--
		}
	}
	if start < 0 {
		return out, inputErr("SVG", "no root element")
	}
	if !(out.w > 0) || !(out.h > 0) || out.viewBox == "" {
		return out, inputErr("SVG", "root needs a width and height in mm and a viewBox")
	}
	end := bytes.LastIndex(b, []byte("</svg>"))
	if end < int(start) {
		return out, inputErr("SVG", "root element is not closed with </svg>")
	}
	out.body = b[start:end]
	return out, nil
}

// mmLength parses a length such as "54mm".
func mmLength(s string) (float64, error) {
	v, ok := strings.CutSuffix(strings.TrimSpace(s), "mm")
	if !ok {
		return 0, inputErr("SVG", "length %q is not in mm", s)
	}
	f, err := strconv.ParseFloat(v, 64)
	if err != nil || !(f > 0) {
		return 0, inputErr("SVG", "length %q is not a positive number of mm", s)
	}
	return f, nil
}
