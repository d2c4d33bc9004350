// Polar pattern cuts: levels in dB against angle, drawn on rings of
// constant level with the outer ring at the top of the scale.

package plot

import (
	"fmt"
	"io"
	"math"
	"strings"
)

// PolarPattern is one cut through a radiation pattern: each Trace is a
// level in dB against angle, drawn so that Top dB lies on the outer ring
// and Top − Range dB (and anything lower) at the centre.
type PolarPattern struct {
	// Title is drawn at the top and written as the SVG title.
	Title string
	// Description is the SVG description; empty generates one.
	Description string
	// Note is one line under the chart, for example "0 dB = peak RHCP
	// gain 12.1 dBic".
	Note string
	// Unit labels the rings: "dB" for levels relative to a stated peak,
	// "dBic" for absolute gain. Empty means "dB".
	Unit string
	// Top is the level in Unit of the outer ring (0 for relative levels).
	Top float64
	// Range is how many dB the rings span below Top; zero means 30.
	Range float64
	// RingStep is the spacing of labelled rings in dB; zero means 10.
	RingStep float64
	// Traces are the curves, for example the RHCP and LHCP components.
	Traces []Trace
}

// Trace is one curve of a PolarPattern: Level[i] in dB at AngleRad[i].
// Angles are measured from the top of the chart (the boresight),
// clockwise as seen on the page. A NaN level leaves a gap. The curve is
// closed when Closed is set (a full turn of samples).
type Trace struct {
	Name     string
	AngleRad []float64
	Level    []float64
	Closed   bool
	Style    LineStyle
}

// PolarOptions tunes WritePolarPattern. The zero value draws a chart
// 120 mm wide.
type PolarOptions struct {
	WidthMM float64
}

// Polar layout in mm.
const (
	defaultPolarWidthMM = 120
	polarTopMM          = 14 // from the page top to the top of the angle labels
	angleLabelGapMM     = 2.5
	angleTickStepDeg    = 30
	ringLabelDeg        = 165
)

// WritePolarPattern draws p as an SVG document and writes it to w. It
// returns an *InputError for data it cannot draw and any write error.
func WritePolarPattern(w io.Writer, p PolarPattern, opt PolarOptions) error {
	unit, rng, step := p.Unit, p.Range, p.RingStep
	if unit == "" {
		unit = "dB"
	}
	if rng == 0 {
		rng = 30
	}
	if step == 0 {
		step = 10
	}
	if !(rng > 0) || !(step > 0) || step > rng {
		return inputErr("Range", "range %g dB and ring step %g dB: both must be positive, the step no larger than the range", rng, step)
	}
	if len(p.Traces) == 0 {
		return inputErr("Traces", "a pattern needs at least one trace")
	}
	for i, t := range p.Traces {
		if len(t.AngleRad) != len(t.Level) {
			return inputErr(fmt.Sprintf("Traces[%d].Level", i), "%d levels for %d angles", len(t.Level), len(t.AngleRad))
		}
		if !t.Style.valid() {
			return inputErr(fmt.Sprintf("Traces[%d].Style", i), "unknown line style %d", t.Style)
		}
	}
	width := opt.WidthMM
	if width <= 0 {
		width = defaultPolarWidthMM
	}
	legend := make([]legendEntry, len(p.Traces))
	for i, t := range p.Traces {
		legend[i] = legendEntry{text: t.Name, style: t.Style.resolve(i)}
	}
	rows, err := layoutLegend(legend, 8, width-8)
	if err != nil {
		return err
	}
	r := width/2 - 14
	cx, cy := width/2, polarTopMM+labelCapMM+angleLabelGapMM+r
	noteY := cy + r + angleLabelGapMM + labelCapMM + 7
	legendTop := noteY + 7
	if p.Note == "" {
		legendTop = noteY
	}
	height := legendTop + float64(rows)*legendRowMM + 2
	desc := p.Description
	if desc == "" {
		desc = p.describe(unit, rng)
	}
	d := begin(w, width, height, "polar-pattern", p.Title, desc)
	d.text("title", inkColour, label{text: p.Title, capMM: titleCapMM, bold: true, x: 8, y: titleBaselineMM})
	// radius maps a level onto the page, clamping below the centre level.
	radius := func(level float64) float64 {
		return r * math.Max(0, math.Min(1, (level-(p.Top-rng))/rng))
	}
	d.printf("<g class=\"grid\">\n")
	for deg := 0; deg < 360; deg += angleTickStepDeg {
		a := float64(deg) * math.Pi / 180
		sx, sy := math.Sin(a), -math.Cos(a)
		d.line("spoke", cx, cy, cx+r*sx, cy+r*sy, gridColour, gridWidthMM, "")
		d.line("tick angle", cx+r*sx, cy+r*sy, cx+(r+tickLenMM)*sx, cy+(r+tickLenMM)*sy, inkColour, frameWidthMM, "")
		lr := r + tickLenMM + angleLabelGapMM
		anc := alignMiddle
		switch {
		case sx > 0.1:
			anc = alignStart
		case sx < -0.1:
			anc = alignEnd
		}
		// Centre the letters vertically on the spoke's end.
		ly := cy + lr*sy + labelCapMM/2 + sy*labelCapMM/2
		d.text("angle-label", inkColour, label{text: fmt.Sprintf("%d°", deg), capMM: labelCapMM, x: cx + lr*sx, y: ly, anchor: anc})
	}
	for lv := p.Top; lv > p.Top-rng-tickFit; lv -= step {
		rr := radius(lv)
		if rr <= 0 {
			continue
		}
		d.printf("<circle class=\"ring\" data-level=\"%s\" cx=\"%s\" cy=\"%s\" r=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"%s\"/>\n",
			fmtVal(lv), num(cx), num(cy), num(rr), ringColour(lv == p.Top), num(gridWidthMM*ringWeight(lv == p.Top)))
	}
	d.printf("</g>\n")
	for i, t := range p.Traces {
		s := lineStyles[t.Style.resolve(i)]
		xs := make([]float64, len(t.AngleRad))
		ys := make([]float64, len(t.AngleRad))
		for k, a := range t.AngleRad {
			if math.IsNaN(t.Level[k]) {
				xs[k], ys[k] = math.NaN(), math.NaN()
				continue
			}
			rr := radius(t.Level[k])
			xs[k], ys[k] = cx+rr*math.Sin(a), cy-rr*math.Cos(a)
		}
		data := polylineData(xs, ys)
		if t.Closed && data != "" {
			data += "Z"
		}
		d.printf("<path class=\"trace\" data-name=\"%s\" data-style=\"%s\" d=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"%s\" stroke-linejoin=\"round\"%s/>\n",
			attr(t.Name), s.name, data, s.colour, num(seriesWidthMM), dashAttr(s.dash))
	}
	// Ring labels along a spoke just off the back direction, where a
	// beam antenna's pattern is usually lowest, on a white backing so the
	// grid does not run through the digits.
	la := ringLabelDeg * math.Pi / 180
	for lv := p.Top; lv > p.Top-rng-tickFit; lv -= step {
		rr := radius(lv)
		if rr <= 0 {
			continue
		}
		txt := strings.Replace(fmtLevel(lv), "-", "\u2212", 1) + " " + unit
		tw, err := textWidth(txt, labelCapMM, false)
		if err != nil {
			return err
		}
		x, y := cx+rr*math.Sin(la)+0.8, cy-rr*math.Cos(la)+labelCapMM+0.8
		d.rect("ring-label-backing", x-0.5, y-labelCapMM-0.6, tw+1, labelCapMM+1.2, "#ffffff", "none", 0, " fill-opacity=\"0.85\"")
		d.text("ring-label", inkColour, label{text: txt, capMM: labelCapMM, x: x, y: y})
	}
	d.text("note", noteColour, label{text: p.Note, capMM: labelCapMM, x: 8, y: noteY})
	drawLegend(d, legend, 8, width-8, legendTop)
	return d.end()
}

// ringColour returns the outer ring's colour (ink) or an inner ring's.
func ringColour(outer bool) string {
	if outer {
		return inkColour
	}
	return gridColour
}

// ringWeight returns a ring's stroke width in grid widths.
func ringWeight(outer bool) float64 {
	if outer {
		return 2
	}
	return 1.5
}

// fmtLevel formats a ring level with at most one decimal.
func fmtLevel(v float64) string {
	if v == math.Trunc(v) {
		return fmt.Sprintf("%d", int(v))
	}
	return fmt.Sprintf("%.1f", v)
}

// describe writes a plain-text summary of p.
func (p PolarPattern) describe(unit string, rng float64) string {
	var b strings.Builder
	fmt.Fprintf(&b, "Polar pattern cut, rings from %s %s at the edge down to %s %s at the centre, angles clockwise from the top.",
		fmtLevel(p.Top), unit, fmtLevel(p.Top-rng), unit)
	for _, t := range p.Traces {
		best, at := math.Inf(-1), 0.0
		for k, v := range t.Level {
			if finite(v) && v > best {
				best, at = v, t.AngleRad[k]
			}
		}
		if finite(best) {
			fmt.Fprintf(&b, " %s peaks at %.1f %s at %.0f°.", t.Name, best, unit, at*180/math.Pi)
		}
	}
	if p.Note != "" {
		fmt.Fprintf(&b, " %s.", strings.TrimSuffix(p.Note, "."))
	}
	return b.String()
}
