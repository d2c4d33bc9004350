// Histograms: how many values of a batch fall in each of equal-width
// bins, with marker lines for limits and percentiles.

package plot

import (
	"fmt"
	"io"
	"math"
	"slices"
	"strings"
)

// Histogram counts Values in equal bins and draws the counts as bars.
type Histogram struct {
	// Title is drawn at the top and written as the SVG title.
	Title string
	// Description is the SVG description; empty generates one.
	Description string
	// Note is one line under the title.
	Note string
	// Label and Unit name the value axis: "Label (Unit)".
	Label, Unit string
	// Values are the batch results; NaN values are left out. At least one.
	Values []float64
	// Bins is the number of bars (zero picks Sturges' rule). With an
	// automatic range it is a guide: the bars are then a round width and
	// their edges fall on round numbers.
	Bins int
	// Min and Max fix the value axis, cut into exactly Bins bars; when Max
	// is not above Min the range of Values and Markers, widened a little
	// and rounded, is used.
	Min, Max float64
	// Markers are vertical lines with labels, for limits and percentiles.
	Markers []Marker
}

// Marker is a vertical line at Value on a Histogram with Label at its top.
type Marker struct {
	Value float64
	Label string
}

// histogramPad is the share of the data range left clear each side of an
// automatic histogram axis, so markers at the extremes stay off the frame.
const histogramPad = 0.05

// Histogram colours: light bars with dark edges, so each bar reads in
// grey print.
const (
	barFill   = "#9ecae1"
	barStroke = "#2b5d80"
)

// bins returns the bin count of h: Bins, or Sturges' rule.
// Source: Sturges, "The choice of a class interval", J. Am. Stat. Assoc.
// 21 (1926), 65–66: k = 1 + log2(n).
func (h Histogram) bins(n int) int {
	if h.Bins > 0 {
		return h.Bins
	}
	return int(math.Ceil(math.Log2(float64(n)))) + 1
}

// Counts returns the bin edges (bins+1 values, ascending) and the number
// of values in each bin. A bin holds values v with edge[i] ≤ v <
// edge[i+1]; the last bin also holds its upper edge. Values outside the
// edges are not counted.
func (h Histogram) Counts() (edges []float64, counts []int, err error) {
	vs := make([]float64, 0, len(h.Values))
	for _, v := range h.Values {
		if !math.IsNaN(v) {
			if math.IsInf(v, 0) {
				return nil, nil, inputErr("Values", "%g is not finite", v)
			}
			vs = append(vs, v)
		}
	}
	if len(vs) == 0 {
		return nil, nil, inputErr("Values", "a histogram needs at least one value")
	}
	n := h.bins(len(vs))
	lo, hi := h.Min, h.Max
	if !(hi > lo) {
		lo, hi = slices.Min(vs), slices.Max(vs)
		for _, m := range h.Markers {
			lo, hi = math.Min(lo, m.Value), math.Max(hi, m.Value)
		}
		if !(hi > lo) {
			lo, hi = lo-0.5, hi+0.5
		}
		pad := (hi - lo) * histogramPad
		step := niceStep(hi-lo+2*pad, n)
		lo, hi = math.Floor((lo-pad)/step)*step, math.Ceil((hi+pad)/step)*step
		n = int(math.Round((hi - lo) / step))
	}
	edges = make([]float64, n+1)
	for i := range edges {
		edges[i] = lo + (hi-lo)*float64(i)/float64(n)
	}
	counts = make([]int, n)
	for _, v := range vs {
		if v < lo || v > hi {
			continue
		}
		i := min(int((v-lo)/(hi-lo)*float64(n)), n-1)
		counts[i]++
	}
	return edges, counts, nil
}

// WriteHistogram draws h as an SVG document and writes it to w. It returns
// an *InputError when h has no finite values and any write error.
func WriteHistogram(w io.Writer, h Histogram, opt ChartOptions) error {
	edges, counts, err := h.Counts()
	if err != nil {
		return err
	}
	width := opt.WidthMM
	if width <= 0 {
		width = defaultWidthMM
	}
	ph := opt.PanelHeightMM
	if ph <= 0 {
		ph = defaultPanelHeightMM
	}
	top := titleBaselineMM + 6.0
	if h.Note != "" {
		top = noteBaselineMM + 6
	}
	f := frame{x: marginLeftMM, y: top, w: width - marginLeftMM - marginRightMM, h: ph}
	height := f.y + f.h + 16
	xa := axis{lo: edges[0], hi: edges[len(edges)-1], p0: f.x, p1: f.x + f.w}
	_, ymax := niceRange(0, float64(slices.Max(counts))*1.1, 5)
	ya := axis{lo: 0, hi: ymax, p0: f.y + f.h, p1: f.y}
	desc := h.Description
	if desc == "" {
		desc = h.describe(edges, counts)
	}
	d := begin(w, width, height, "histogram", h.Title, desc)
	d.text("title", inkColour, label{text: h.Title, capMM: titleCapMM, bold: true, x: marginLeftMM, y: titleBaselineMM})
	d.text("note", noteColour, label{text: h.Note, capMM: labelCapMM, x: marginLeftMM, y: noteBaselineMM})
	yt, ystep := ticks(0, ymax, 5)
	if ystep < 1 {
		yt, ystep = ticks(0, ymax, int(ymax))
	}
	for _, v := range yt {
		d.line("grid y", f.x, ya.at(v), f.x+f.w, ya.at(v), gridColour, gridWidthMM, "")
	}
	for i, c := range counts {
		if c == 0 {
			continue
		}
		x0, x1 := xa.at(edges[i]), xa.at(edges[i+1])
		d.rect("bar", x0, ya.at(float64(c)), x1-x0, ya.at(0)-ya.at(float64(c)), barFill, barStroke, gridWidthMM*2,
			fmt.Sprintf(" data-count=\"%d\"", c))
	}
	for k, m := range h.Markers {
		x := xa.at(m.Value)
		d.line("marker", x, f.y, x, f.y+f.h, targetColour, targetWidthMM, "2 1")
		l := label{text: m.Label, capMM: labelCapMM, x: x + 1, y: f.y + 4 + float64(k%3)*4}
		if x > f.x+f.w/2 {
			l.x, l.anchor = x-1, alignEnd
		}
		d.text("marker-label", inkColour, l)
	}
	d.rect("frame", f.x, f.y, f.w, f.h, "none", inkColour, frameWidthMM, "")
	xt, xstep := ticks(xa.lo, xa.hi, 8)
	for _, v := range xt {
		x := xa.at(v)
		d.line("tick x", x, f.y+f.h, x, f.y+f.h+tickLenMM, inkColour, frameWidthMM, "")
		d.text("tick-label x", inkColour, label{text: tickText(v, xstep), capMM: labelCapMM, x: x, y: f.y + f.h + tickLenMM + 3.4, anchor: alignMiddle})
	}
	for _, v := range yt {
		y := ya.at(v)
		d.line("tick y", f.x-tickLenMM, y, f.x, y, inkColour, frameWidthMM, "")
		d.text("tick-label y", inkColour, label{text: tickText(v, ystep), capMM: labelCapMM, x: f.x - tickLenMM - 0.8, y: y + labelCapMM/2, anchor: alignEnd})
	}
	lw, err := widest(yt, ystep)
	if err != nil {
		return err
	}
	d.text("axis-label y", inkColour, label{text: "Count", capMM: axisCapMM, x: f.x - tickLenMM - lw - 3, y: f.y + f.h/2, anchor: alignMiddle, upward: true})
	d.text("axis-label x", inkColour, label{text: axisTitle(YAxis{Label: h.Label, Unit: h.Unit}), capMM: axisCapMM, x: f.x + f.w/2, y: f.y + f.h + tickLenMM + 9.5, anchor: alignMiddle})
	return d.end()
}

// describe writes a plain-text summary of h.
func (h Histogram) describe(edges []float64, counts []int) string {
	var b strings.Builder
	n := 0
	for _, c := range counts {
		n += c
	}
	fmt.Fprintf(&b, "Histogram of %d values of %s in %d bins from %.4g to %.4g %s.", n, axisTitle(YAxis{Label: h.Label}), len(counts), edges[0], edges[len(edges)-1], h.Unit)
	for _, m := range h.Markers {
		fmt.Fprintf(&b, " Marker %s at %.4g %s.", m.Label, m.Value, h.Unit)
	}
	return strings.Join(strings.Fields(b.String()), " ")
}
