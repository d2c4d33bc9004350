// Charts against frequency: one or more panels stacked on a shared
// frequency axis, each with a left and an optional right value axis, line
// series, shaded envelopes, horizontal target lines, and shaded bands that
// run through every panel.

package plot

import (
	"fmt"
	"io"
	"math"
	"strings"
)

// FrequencyChart is a chart of values against frequency in MHz.
type FrequencyChart struct {
	// Title is drawn at the top and written as the SVG title.
	Title string
	// Description is the SVG description for readers who cannot see the
	// chart; empty generates one from the data.
	Description string
	// Note is one line under the title, for example "Textbook estimate".
	Note string
	// XMinMHz and XMaxMHz fix the frequency axis; both zero takes the
	// range of the series, envelopes and bands.
	XMinMHz, XMaxMHz float64
	// Bands are shaded through every panel, labelled in the top one.
	Bands []Band
	// Panels are stacked top to bottom and share the frequency axis. At
	// least one.
	Panels []Panel
}

// Band is a frequency range from LowMHz to HighMHz shaded across the
// chart, with its edges drawn and Label written at its top.
type Band struct {
	LowMHz, HighMHz float64
	Label           string
}

// Panel is one plot area of a FrequencyChart.
type Panel struct {
	// Left is the value axis on the left. Right is drawn only when a
	// series, envelope or target is placed on it.
	Left, Right YAxis
	Series      []Series
	Envelopes   []Envelope
	Targets     []Target
}

// YAxis is a value axis. Its title reads "Label (Unit)". Min and Max fix
// its range; when Max is not above Min the range is taken from the data
// and targets and widened to round numbers.
type YAxis struct {
	Label, Unit string
	Min, Max    float64
}

// Series is a line through (FreqMHz[i], Values[i]). A NaN value leaves a
// gap. Name and Unit appear in the legend as "Name (Unit)". OnRight plots
// it against the panel's right axis. Style picks its dash and colour.
type Series struct {
	Name, Unit string
	FreqMHz    []float64
	Values     []float64
	OnRight    bool
	Style      LineStyle
}

// Envelope is the area between Low[i] and High[i] at FreqMHz[i], shaded
// and edged in the style's colour and dash, for a spread such as the 5th
// to 95th percentile of a batch. StyleAuto takes the style of the panel's
// next series, so a spread and its middle line match.
type Envelope struct {
	Name      string
	FreqMHz   []float64
	Low, High []float64
	OnRight   bool
	Style     LineStyle
}

// Target is a horizontal line at Value with Label written above its right
// end, for a limit such as "VSWR 2".
type Target struct {
	Value   float64
	Label   string
	OnRight bool
}

// ChartOptions tunes WriteFrequencyChart and WriteHistogram. The zero
// value draws a chart 170 mm wide (an A4 text width) with plot areas
// 55 mm tall.
type ChartOptions struct {
	WidthMM       float64
	PanelHeightMM float64
}

// Chart layout in mm.
const (
	defaultWidthMM       = 170
	defaultPanelHeightMM = 55
	marginLeftMM         = 20
	marginRightAxisMM    = 20
	marginRightMM        = 8
	titleBaselineMM      = 7
	noteBaselineMM       = 12.5
	panelGapMM           = 8
	tickLenMM            = 1.2
	legendRowMM          = 6
	legendSwatchMM       = 9
)

// frame is the plot area of a panel in page coordinates (y down).
type frame struct{ x, y, w, h float64 }

// WriteFrequencyChart draws c as an SVG document and writes it to w. It
// returns an *InputError for data it cannot draw (no panels, lengths that
// differ, a band whose low edge is not below its high edge, no finite
// value on an axis) and any write error.
func WriteFrequencyChart(w io.Writer, c FrequencyChart, opt ChartOptions) error {
	if err := c.validate(); err != nil {
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
	lo, hi := c.freqRange()
	right := float64(marginRightMM)
	for _, p := range c.Panels {
		if p.usesRight() {
			right = marginRightAxisMM
		}
	}
	top := titleBaselineMM + 6.0
	if c.Note != "" {
		top = noteBaselineMM + 6
	}
	frames := make([]frame, len(c.Panels))
	for i := range frames {
		frames[i] = frame{x: marginLeftMM, y: top + float64(i)*(ph+panelGapMM), w: width - marginLeftMM - right, h: ph}
	}
	last := frames[len(frames)-1]
	xa := axis{lo: lo, hi: hi, p0: last.x, p1: last.x + last.w}
	legend := c.legendEntries()
	legendTop := last.y + last.h + 18
	rows, err := layoutLegend(legend, marginLeftMM, width-right)
	if err != nil {
		return err
	}
	height := legendTop + float64(rows)*legendRowMM + 2

	desc := c.Description
	if desc == "" {
		desc = c.describe(lo, hi)
	}
	d := begin(w, width, height, "frequency-chart", c.Title, desc)
	d.text("title", inkColour, label{text: c.Title, capMM: titleCapMM, bold: true, x: marginLeftMM, y: titleBaselineMM})
	d.text("note", noteColour, label{text: c.Note, capMM: labelCapMM, x: marginLeftMM, y: noteBaselineMM})

	style := 0
	for i, p := range c.Panels {
		f := frames[i]
		ya, yr := p.axes(f)
		xt, xstep := ticks(lo, hi, 8)
		yt, ystep := ticks(ya.lo, ya.hi, 5)
		d.printf("<g class=\"panel\" id=\"panel-%d\">\n", i)
		d.printf("<clipPath id=\"clip-%d\"><rect x=\"%s\" y=\"%s\" width=\"%s\" height=\"%s\"/></clipPath>\n", i, num(f.x), num(f.y), num(f.w), num(f.h))
		d.rect("plot-area", f.x, f.y, f.w, f.h, "#ffffff", "none", 0, "")
		for _, b := range c.Bands {
			x0, x1 := xa.at(math.Max(b.LowMHz, lo)), xa.at(math.Min(b.HighMHz, hi))
			d.rect("band", x0, f.y, x1-x0, f.h, bandColour, "none", 0,
				fmt.Sprintf(" data-low-mhz=\"%s\" data-high-mhz=\"%s\"", fmtVal(b.LowMHz), fmtVal(b.HighMHz)))
		}
		for _, v := range xt {
			d.line("grid x", xa.at(v), f.y, xa.at(v), f.y+f.h, gridColour, gridWidthMM, "")
		}
		for _, v := range yt {
			d.line("grid y", f.x, ya.at(v), f.x+f.w, ya.at(v), gridColour, gridWidthMM, "")
		}
		for _, b := range c.Bands {
			for _, e := range []float64{b.LowMHz, b.HighMHz} {
				if e >= lo && e <= hi {
					d.line("band-edge", xa.at(e), f.y, xa.at(e), f.y+f.h, bandEdge, targetWidthMM, "1.5 1")
				}
			}
			if i == 0 {
				mid := xa.at((math.Max(b.LowMHz, lo) + math.Min(b.HighMHz, hi)) / 2)
				d.text("band-label", inkColour, label{text: b.Label, capMM: labelCapMM, x: mid, y: f.y + 4, anchor: alignMiddle})
			}
		}
		d.printf("<g clip-path=\"url(#clip-%d)\">\n", i)
		for _, e := range p.Envelopes {
			s := lineStyles[e.Style.resolve(style)]
			ax := ya
			if e.OnRight {
				ax = yr
			}
			xs := make([]float64, 0, 2*len(e.FreqMHz))
			ys := make([]float64, 0, 2*len(e.FreqMHz))
			for k := range e.FreqMHz {
				xs, ys = append(xs, xa.at(e.FreqMHz[k])), append(ys, ax.at(e.High[k]))
			}
			for k := len(e.FreqMHz) - 1; k >= 0; k-- {
				xs, ys = append(xs, xa.at(e.FreqMHz[k])), append(ys, ax.at(e.Low[k]))
			}
			d.printf("<path class=\"envelope\" data-name=\"%s\" d=\"%sZ\" fill=\"%s\" fill-opacity=\"0.18\" stroke=\"%s\" stroke-width=\"%s\"%s/>\n",
				attr(e.Name), polylineData(xs, ys), s.colour, s.colour, num(gridWidthMM*2), dashAttr(s.dash))
		}
		for _, sr := range p.Series {
			s := lineStyles[sr.Style.resolve(style)]
			style++
			ax := ya
			if sr.OnRight {
				ax = yr
			}
			xs := make([]float64, len(sr.FreqMHz))
			ys := make([]float64, len(sr.FreqMHz))
			for k := range sr.FreqMHz {
				xs[k], ys[k] = xa.at(sr.FreqMHz[k]), ax.at(sr.Values[k])
			}
			d.printf("<path class=\"series\" data-name=\"%s\" data-style=\"%s\" d=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"%s\" stroke-linejoin=\"round\"%s/>\n",
				attr(sr.Name), s.name, polylineData(xs, ys), s.colour, num(seriesWidthMM), dashAttr(s.dash))
		}
		d.printf("</g>\n")
		for _, t := range p.Targets {
			ax := ya
			if t.OnRight {
				ax = yr
			}
			y := ax.at(t.Value)
			if y < f.y-tickFit || y > f.y+f.h+tickFit {
				continue
			}
			d.line("target", f.x, y, f.x+f.w, y, targetColour, targetWidthMM, "")
			d.text("target-label", inkColour, label{text: t.Label, capMM: labelCapMM, x: f.x + f.w - 1, y: y - 1.2, anchor: alignEnd})
		}
		d.rect("frame", f.x, f.y, f.w, f.h, "none", inkColour, frameWidthMM, "")
		// Axes: ticks and labels.
		for _, v := range xt {
			x := xa.at(v)
			d.line("tick x", x, f.y+f.h, x, f.y+f.h+tickLenMM, inkColour, frameWidthMM, "")
			if i == len(c.Panels)-1 {
				d.text("tick-label x", inkColour, label{text: tickText(v, xstep), capMM: labelCapMM, x: x, y: f.y + f.h + tickLenMM + 3.4, anchor: alignMiddle})
			}
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
		d.text("axis-label y", inkColour, label{text: axisTitle(p.Left), capMM: axisCapMM, x: f.x - tickLenMM - lw - 3, y: f.y + f.h/2, anchor: alignMiddle, upward: true})
		if p.usesRight() {
			rt, rstep := ticks(yr.lo, yr.hi, 5)
			for _, v := range rt {
				y := yr.at(v)
				d.line("tick y2", f.x+f.w, y, f.x+f.w+tickLenMM, y, inkColour, frameWidthMM, "")
				d.text("tick-label y2", inkColour, label{text: tickText(v, rstep), capMM: labelCapMM, x: f.x + f.w + tickLenMM + 0.8, y: y + labelCapMM/2})
			}
			rw, err := widest(rt, rstep)
			if err != nil {
				return err
			}
			d.text("axis-label y2", inkColour, label{text: axisTitle(p.Right), capMM: axisCapMM, x: f.x + f.w + tickLenMM + rw + 3 + axisCapMM, y: f.y + f.h/2, anchor: alignMiddle, upward: true})
		}
		d.printf("</g>\n")
	}
	d.text("axis-label x", inkColour, label{text: "Frequency (MHz)", capMM: axisCapMM, x: last.x + last.w/2, y: last.y + last.h + tickLenMM + 9.5, anchor: alignMiddle})
	drawLegend(d, legend, marginLeftMM, width-right, legendTop)
	return d.end()
}

// dashAttr returns the stroke-dasharray attribute for dash, or nothing.
func dashAttr(dash string) string {
	if dash == "" {
		return ""
	}
	return " stroke-dasharray=\"" + dash + "\""
}

// axisTitle returns "Label (Unit)", or Label alone.
func axisTitle(a YAxis) string {
	if a.Unit == "" {
		return a.Label
	}
	return a.Label + " (" + a.Unit + ")"
}

// fmtVal formats a data value for an attribute: shortest exact form.
func fmtVal(v float64) string { return fmt.Sprint(v) }

// usesRight reports whether anything in p is plotted on its right axis.
func (p Panel) usesRight() bool {
	for _, s := range p.Series {
		if s.OnRight {
			return true
		}
	}
	for _, e := range p.Envelopes {
		if e.OnRight {
			return true
		}
	}
	for _, t := range p.Targets {
		if t.OnRight {
			return true
		}
	}
	return false
}

// axes returns the left and right value axes of p mapped onto f.
func (p Panel) axes(f frame) (axis, axis) {
	span := func(a YAxis, right bool) axis {
		lo, hi := a.Min, a.Max
		if !(hi > lo) {
			lo, hi = math.Inf(1), math.Inf(-1)
			grow := func(v float64) {
				if !math.IsNaN(v) && !math.IsInf(v, 0) {
					lo, hi = math.Min(lo, v), math.Max(hi, v)
				}
			}
			for _, s := range p.Series {
				if s.OnRight == right {
					for _, v := range s.Values {
						grow(v)
					}
				}
			}
			for _, e := range p.Envelopes {
				if e.OnRight == right {
					for k := range e.Low {
						grow(e.Low[k])
						grow(e.High[k])
					}
				}
			}
			for _, t := range p.Targets {
				if t.OnRight == right {
					grow(t.Value)
				}
			}
			if lo > hi {
				lo, hi = 0, 1
			}
			lo, hi = niceRange(lo, hi, 5)
		}
		return axis{lo: lo, hi: hi, p0: f.y + f.h, p1: f.y}
	}
	return span(p.Left, false), span(p.Right, true)
}

// freqRange returns the frequency axis range in MHz.
func (c FrequencyChart) freqRange() (float64, float64) {
	if c.XMaxMHz > c.XMinMHz {
		return c.XMinMHz, c.XMaxMHz
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	grow := func(fs ...float64) {
		for _, f := range fs {
			lo, hi = math.Min(lo, f), math.Max(hi, f)
		}
	}
	for _, p := range c.Panels {
		for _, s := range p.Series {
			grow(s.FreqMHz...)
		}
		for _, e := range p.Envelopes {
			grow(e.FreqMHz...)
		}
	}
	for _, b := range c.Bands {
		grow(b.LowMHz, b.HighMHz)
	}
	return lo, hi
}

// validate checks that c can be drawn.
func (c FrequencyChart) validate() error {
	if len(c.Panels) == 0 {
		return inputErr("Panels", "a chart needs at least one panel")
	}
	if c.XMinMHz != 0 || c.XMaxMHz != 0 {
		if !(c.XMaxMHz > c.XMinMHz) {
			return inputErr("XMaxMHz", "%g is not above XMinMHz %g", c.XMaxMHz, c.XMinMHz)
		}
	}
	n := 0
	for i, b := range c.Bands {
		if !(b.HighMHz > b.LowMHz) {
			return inputErr(fmt.Sprintf("Bands[%d]", i), "high edge %g MHz is not above low edge %g MHz", b.HighMHz, b.LowMHz)
		}
		n++
	}
	for i, p := range c.Panels {
		for j, s := range p.Series {
			f := fmt.Sprintf("Panels[%d].Series[%d]", i, j)
			if len(s.FreqMHz) != len(s.Values) {
				return inputErr(f+".Values", "%d values for %d frequencies", len(s.Values), len(s.FreqMHz))
			}
			if err := checkFreqs(f+".FreqMHz", s.FreqMHz); err != nil {
				return err
			}
			if !s.Style.valid() {
				return inputErr(f+".Style", "unknown line style %d", s.Style)
			}
			n += len(s.FreqMHz)
		}
		for j, e := range p.Envelopes {
			f := fmt.Sprintf("Panels[%d].Envelopes[%d]", i, j)
			if len(e.Low) != len(e.FreqMHz) || len(e.High) != len(e.FreqMHz) {
				return inputErr(f, "%d low and %d high values for %d frequencies", len(e.Low), len(e.High), len(e.FreqMHz))
			}
			if err := checkFreqs(f+".FreqMHz", e.FreqMHz); err != nil {
				return err
			}
			for k := range e.Low {
				if !finite(e.Low[k]) || !finite(e.High[k]) {
					return inputErr(f, "point %d is not finite", k)
				}
			}
			if !e.Style.valid() {
				return inputErr(f+".Style", "unknown line style %d", e.Style)
			}
			n += len(e.FreqMHz)
		}
		for j, t := range p.Targets {
			if !finite(t.Value) {
				return inputErr(fmt.Sprintf("Panels[%d].Targets[%d].Value", i, j), "%g is not finite", t.Value)
			}
		}
	}
	if n == 0 && c.XMaxMHz == 0 {
		return inputErr("Panels", "no series, envelope or band sets the frequency range; give XMinMHz and XMaxMHz")
	}
	return nil
}

// checkFreqs checks that frequencies are finite.
func checkFreqs(field string, fs []float64) error {
	for k, f := range fs {
		if !finite(f) {
			return inputErr(field, "point %d (%g) is not finite", k, f)
		}
	}
	return nil
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// legendEntries returns the legend of c in drawing order.
func (c FrequencyChart) legendEntries() []legendEntry {
	var out []legendEntry
	style := 0
	for _, p := range c.Panels {
		for _, e := range p.Envelopes {
			out = append(out, legendEntry{text: e.Name, style: e.Style.resolve(style), area: true})
		}
		for _, s := range p.Series {
			name := s.Name
			if s.Unit != "" {
				name += " (" + s.Unit + ")"
			}
			out = append(out, legendEntry{text: name, style: s.Style.resolve(style)})
			style++
		}
	}
	return out
}

// describe writes a plain-text summary of c for its SVG description.
func (c FrequencyChart) describe(lo, hi float64) string {
	var b strings.Builder
	fmt.Fprintf(&b, "Chart against frequency from %s to %s MHz.", fmtVal(lo), fmtVal(hi))
	if c.Note != "" {
		fmt.Fprintf(&b, " %s.", strings.TrimSuffix(c.Note, "."))
	}
	for _, bd := range c.Bands {
		fmt.Fprintf(&b, " Shaded band %s: %s to %s MHz.", bd.Label, fmtVal(bd.LowMHz), fmtVal(bd.HighMHz))
	}
	for _, p := range c.Panels {
		for _, s := range p.Series {
			mn, mx := math.Inf(1), math.Inf(-1)
			for _, v := range s.Values {
				if finite(v) {
					mn, mx = math.Min(mn, v), math.Max(mx, v)
				}
			}
			if mn <= mx {
				fmt.Fprintf(&b, " %s ranges from %.3g to %.3g %s.", s.Name, mn, mx, s.Unit)
			}
		}
		for _, t := range p.Targets {
			fmt.Fprintf(&b, " Target line: %s.", t.Label)
		}
	}
	return strings.Join(strings.Fields(b.String()), " ")
}

// widest returns the width in mm of the widest tick label of vs.
func widest(vs []float64, step float64) (float64, error) {
	w := 0.0
	for _, v := range vs {
		tw, err := textWidth(tickText(v, step), labelCapMM, false)
		if err != nil {
			return 0, err
		}
		w = math.Max(w, tw)
	}
	return w, nil
}
