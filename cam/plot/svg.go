// The SVG document every plot is written into: a root sized in mm with a
// title and a description, then elements written in drawing order.

package plot

import (
	"bufio"
	"fmt"
	"html"
	"io"
	"math"
	"strconv"
	"strings"
)

// Colours shared by all plots. Text and axes are near-black on white
// (contrast about 18:1); grid lines are light grey.
const (
	inkColour    = "#1a1a1a"
	gridColour   = "#d0d0d0"
	bandColour   = "#e3ecf5"
	bandEdge     = "#6b8fb3"
	targetColour = "#333333"
	noteColour   = "#444444"
)

// Line widths in mm.
const (
	frameWidthMM  = 0.25
	gridWidthMM   = 0.12
	seriesWidthMM = 0.5
	targetWidthMM = 0.35
)

// num formats v with at most two decimals (0.01 mm) and no negative zero.
func num(v float64) string {
	s := strconv.FormatFloat(math.Round(v*100)/100, 'f', 2, 64)
	s = strings.TrimRight(s, "0")
	s = strings.TrimSuffix(s, ".")
	if s == "-0" {
		s = "0"
	}
	return s
}

// attr escapes s for an attribute value or text node.
func attr(s string) string { return html.EscapeString(s) }

// svgDoc collects a plot's elements and remembers the first error.
type svgDoc struct {
	w   *bufio.Writer
	err error
}

// begin writes the XML declaration, the root element of a w × h mm page and
// its title and description.
func begin(w io.Writer, wmm, hmm float64, class, title, desc string) *svgDoc {
	d := &svgDoc{w: bufio.NewWriter(w)}
	d.printf("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
	d.printf("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" class=\"plot %s\" width=\"%smm\" height=\"%smm\" viewBox=\"0 0 %s %s\" role=\"img\" aria-labelledby=\"title desc\">\n",
		class, num(wmm), num(hmm), num(wmm), num(hmm))
	d.printf("<title id=\"title\">%s</title>\n", attr(title))
	d.printf("<desc id=\"desc\">%s</desc>\n", attr(desc))
	d.printf("<rect class=\"page\" x=\"0\" y=\"0\" width=\"%s\" height=\"%s\" fill=\"#ffffff\"/>\n", num(wmm), num(hmm))
	return d
}

// end closes the root element and flushes.
func (d *svgDoc) end() error {
	d.printf("</svg>\n")
	if d.err != nil {
		return d.err
	}
	return d.w.Flush()
}

func (d *svgDoc) printf(format string, args ...any) {
	if d.err != nil {
		return
	}
	_, d.err = fmt.Fprintf(d.w, format, args...)
}

// fail records err as the document's error when it is the first.
func (d *svgDoc) fail(err error) {
	if d.err == nil {
		d.err = err
	}
}

// text writes l as one filled outline path in colour fill, class cls.
func (d *svgDoc) text(cls, fill string, l label) {
	if l.text == "" {
		return
	}
	p, err := outline(l)
	if err != nil {
		d.fail(err)
		return
	}
	d.printf("<path class=\"%s\" data-text=\"%s\" fill=\"%s\" d=\"%s\"/>\n", cls, attr(l.text), fill, p)
}

// line writes a straight line from (x1, y1) to (x2, y2).
func (d *svgDoc) line(cls string, x1, y1, x2, y2 float64, stroke string, width float64, dash string) {
	da := ""
	if dash != "" {
		da = " stroke-dasharray=\"" + dash + "\""
	}
	d.printf("<line class=\"%s\" x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\" stroke=\"%s\" stroke-width=\"%s\"%s/>\n",
		cls, num(x1), num(y1), num(x2), num(y2), stroke, num(width), da)
}

// rect writes a rectangle; fill and stroke may be "none".
func (d *svgDoc) rect(cls string, x, y, w, h float64, fill, stroke string, width float64, extra string) {
	d.printf("<rect class=\"%s\" x=\"%s\" y=\"%s\" width=\"%s\" height=\"%s\" fill=\"%s\" stroke=\"%s\" stroke-width=\"%s\"%s/>\n",
		cls, num(x), num(y), num(w), num(h), fill, stroke, num(width), extra)
}

// polyline writes connected runs of points as one path, starting a new
// run wherever a point is missing (NaN).
func polylineData(xs, ys []float64) string {
	var b strings.Builder
	pen := false
	for i := range xs {
		if math.IsNaN(xs[i]) || math.IsNaN(ys[i]) {
			pen = false
			continue
		}
		if pen {
			b.WriteString("L")
		} else {
			b.WriteString("M")
		}
		b.WriteString(num(xs[i]) + " " + num(ys[i]))
		pen = true
	}
	return b.String()
}
