package kit

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"strings"

	"coilwright/cam/plot"
	"coilwright/parts"
	"coilwright/parts/line"
)

// plotFile is one plot SVG of the build: its file name, the words a
// reader who cannot see it gets, and its bytes.
type plotFile struct {
	Name    string // e.g. "plot-match.svg"
	Title   string // the plot's title
	Caption string // a sentence saying what it shows
	SVG     []byte
}

// electrical returns the curves the electrical plots, the build sheet's
// band figure and the report's matched band draw: the field solution's
// sweep when it ran, else the textbook estimates of the design.
func (k *Kit) electrical() *electrical {
	if k.Design.Field != nil {
		return fieldElectrical(k.Design)
	}
	return textbookElectrical(k.Design)
}

// writePlots writes every plot SVG.
func (k *Kit) writePlots(out Sink) error {
	ps, err := k.plots()
	if err != nil {
		return err
	}
	for _, p := range ps {
		if err := out.Add(p.Name, func(w io.Writer) error { _, err := w.Write(p.SVG); return err }); err != nil {
			return err
		}
	}
	return nil
}

// plots draws every plot of the build in order: the match, gain and axial
// ratio, the two pattern cuts, the side and plan views, the flat parts
// and, for a batch, their nested sheets.
func (k *Kit) plots() ([]plotFile, error) {
	e := k.electrical()
	var out []plotFile
	add := func(name, title, caption string, draw func(w io.Writer) error) error {
		var b bytes.Buffer
		if err := draw(&b); err != nil {
			return fmt.Errorf("%s: %w", name, err)
		}
		out = append(out, plotFile{Name: name, Title: title, Caption: caption, SVG: b.Bytes()})
		return nil
	}
	mc := matchChart(k.Design, e)
	if err := add("plot-match.svg", mc.Title, "VSWR and return loss against frequency ("+e.Short+"), "+bandWords(e)+", the matching target drawn across.",
		func(w io.Writer) error { return plot.WriteFrequencyChart(w, mc, plot.ChartOptions{}) }); err != nil {
		return nil, err
	}
	gc := gainChart(e)
	if err := add("plot-gain.svg", gc.Title, "Gain of the right- and left-hand circular components (dBic) and the axial ratio (dB) on the axis against frequency ("+e.Short+"), "+bandWords(e)+".",
		func(w io.Writer) error { return plot.WriteFrequencyChart(w, gc, plot.ChartOptions{}) }); err != nil {
		return nil, err
	}
	for i, c := range e.Cuts {
		pp := polarCut(k.Design, e, c)
		if err := add(fmt.Sprintf("plot-pattern-%d.svg", i+1), pp.Title,
			fmt.Sprintf("Radiation pattern at %s MHz in the %s (%s): both circular components in dBic, rings every 10 dB.", num(e.CentreMHz), c.Name, strings.ToLower(e.Short[:1])+e.Short[1:]),
			func(w io.Writer) error { return plot.WritePolarPattern(w, pp, plot.PolarOptions{}) }); err != nil {
			return nil, err
		}
	}
	views, err := k.viewPlots()
	if err != nil {
		return nil, err
	}
	return append(out, views...), nil
}

// bandWords says how the band is shown.
func bandWords(e *electrical) string {
	if e.Band == nil {
		return "no band set in the spec"
	}
	return fmt.Sprintf("the band %s–%s MHz shaded", num(e.Band.LowMHz), num(e.Band.HighMHz))
}

// chartBands returns the band to shade, if any.
func chartBands(e *electrical) []plot.Band {
	if e.Band == nil {
		return nil
	}
	return []plot.Band{{LowMHz: e.Band.LowMHz, HighMHz: e.Band.HighMHz, Label: fmt.Sprintf("Band %s–%s MHz", num(e.Band.LowMHz), num(e.Band.HighMHz))}}
}

// The match chart's fixed value axes, so a poor match stays readable and
// the plot's coordinates are known: VSWR 1 to 6 on the left, return loss
// 0 to 40 dB on the right.
const (
	matchVSWRMax = 6
	matchRLMax   = 40
)

// matchChart is VSWR (left) and return loss (right) against frequency.
func matchChart(d *parts.Design, e *electrical) plot.FrequencyChart {
	rl := line.ReturnLossDB((e.TargetVSWR - 1) / (e.TargetVSWR + 1))
	label := fmt.Sprintf("Target: return loss %.0f dB, VSWR %.2f", rl, e.TargetVSWR)
	return plot.FrequencyChart{
		Title: d.Spec.Kit + ": match at the feed", Note: e.Source,
		XMinMHz: e.LowMHz, XMaxMHz: e.HighMHz, Bands: chartBands(e),
		Panels: []plot.Panel{{
			Left:  plot.YAxis{Label: "VSWR", Min: 1, Max: matchVSWRMax},
			Right: plot.YAxis{Label: "Return loss", Unit: "dB", Min: 0, Max: matchRLMax},
			Series: []plot.Series{
				{Name: "VSWR", FreqMHz: e.FreqMHz, Values: e.VSWR, Style: plot.StyleSolid},
				{Name: "Return loss", Unit: "dB", FreqMHz: e.FreqMHz, Values: e.ReturnLossDB, OnRight: true, Style: plot.StyleDashed},
			},
			Targets: []plot.Target{{Value: e.TargetVSWR, Label: label}},
		}},
	}
}

// gainChart is the gain of both circular components over the axial
// ratio, against frequency.
func gainChart(e *electrical) plot.FrequencyChart {
	return plot.FrequencyChart{
		Title: "Gain and axial ratio on the axis", Note: e.Source,
		XMinMHz: e.LowMHz, XMaxMHz: e.HighMHz, Bands: chartBands(e),
		Panels: []plot.Panel{
			{Left: plot.YAxis{Label: "Gain", Unit: "dBic"}, Series: []plot.Series{
				{Name: "RHCP", Unit: "dBic", FreqMHz: e.FreqMHz, Values: e.RHCPDBic, Style: plot.StyleSolid},
				{Name: "LHCP", Unit: "dBic", FreqMHz: e.FreqMHz, Values: e.LHCPDBic, Style: plot.StyleDashed},
			}},
			{Left: plot.YAxis{Label: "Axial ratio", Unit: "dB", Min: 0, Max: axialRatioAxisMax(e.AxialRatioDB)}, Series: []plot.Series{
				{Name: "Axial ratio", Unit: "dB", FreqMHz: e.FreqMHz, Values: e.AxialRatioDB, Style: plot.StyleDotted},
			}},
		},
	}
}

// axialRatioAxisMax is the top of the axial-ratio axis: 3 dB, or the next
// whole 3 dB above the largest value.
func axialRatioAxisMax(v []float64) float64 {
	m := 0.0
	for _, x := range v {
		if !math.IsNaN(x) {
			m = math.Max(m, x)
		}
	}
	return 3 * math.Max(1, math.Ceil(m/3))
}

// polarCut is one pattern cut with both circular components in dBic, the
// outer ring at the next 5 dB above the peak.
func polarCut(d *parts.Design, e *electrical, c patternCut) plot.PolarPattern {
	peak := math.Inf(-1)
	for i := range c.AngleRad {
		if !math.IsNaN(c.RHCPDBic[i]) {
			peak = math.Max(peak, math.Max(c.RHCPDBic[i], c.LHCPDBic[i]))
		}
	}
	top := 5 * math.Ceil(peak/5)
	return plot.PolarPattern{
		Title: fmt.Sprintf("Pattern at %s MHz, %s", num(e.CentreMHz), c.Name),
		Note:  fmt.Sprintf("%s; %s coil, peak %.1f dBic; 0° is the axis.", e.Short, d.Coil.Hand, peak),
		Unit:  "dBic", Top: top, Range: patternFloorDB, RingStep: 10,
		Traces: []plot.Trace{
			{Name: "RHCP", AngleRad: c.AngleRad, Level: c.RHCPDBic, Style: plot.StyleSolid},
			{Name: "LHCP", AngleRad: c.AngleRad, Level: c.LHCPDBic, Style: plot.StyleDashed},
		},
	}
}
