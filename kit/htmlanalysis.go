package kit

import (
	"bytes"
	"fmt"
	"strconv"

	"coilwright/cam/html"
	"coilwright/cam/plot"
	"coilwright/parts"
	"coilwright/parts/report"
)

// The report page's analysis sections: the field solution and the batch
// tolerance analysis, each present only when it ran.

// Section titles of the analysis sections.
const (
	fieldSectionTitle     = "Field solution"
	toleranceSectionTitle = "Tolerance"
)

// reportSectionTitles returns the report page's section titles in order:
// the fixed ones with the field solution and the tolerance analysis after
// the plots when they ran.
func (k *Kit) reportSectionTitles() []string {
	out := []string{reportSections[0], reportSections[1]}
	if k.Design.Field != nil {
		out = append(out, fieldSectionTitle)
	}
	if k.tolerance != nil {
		out = append(out, toleranceSectionTitle)
	}
	return append(out, reportSections[2:]...)
}

// fieldSection lays out what the field solution assumed, its size, the
// figures at the band's edges and centre and the whole sweep.
func fieldSection(f *parts.FieldSolution) html.Section {
	model := "the reflector plate as a wire grid"
	if f.Reflector == "ideal" {
		model = "an ideal infinite ground plane under the coil"
	}
	facts := []html.Definition{
		{Term: "Method", Detail: "Thin-wire method of moments: the coil as released, the feed lead and the matching strip, over " + model + "."},
		{Term: "Size", Detail: fmt.Sprintf("%d unknowns on %d segments, none longer than %.2f mm", f.Unknowns, f.Segments, f.MaxSegmentMM)},
	}
	if f.PlateSpacingMM > 0 {
		facts = append(facts, html.Definition{Term: "Plate grid", Detail: fmt.Sprintf("wires %.2f mm apart", f.PlateSpacingMM)})
	}
	s := f.Summary
	facts = append(facts,
		html.Definition{Term: "Feed cable", Detail: fmt.Sprintf("reflection and VSWR against %s Ω", num(f.CableOhm))},
		html.Definition{Term: "VSWR 2 or better", Detail: s.Matched.Text()},
		html.Definition{Term: "VSWR 1.5 or better", Detail: s.Good.Text()},
		html.Definition{Term: "Against the textbook", Detail: fmt.Sprintf("gain %+.1f dB from the textbook %.1f dBic; input resistance %.2f × the textbook %.0f Ω%s",
			s.GainDifferenceDB, s.TextbookGainDBic, s.ResistanceRatio, s.TextbookInputOhm, map[bool]string{true: "; a large disagreement: trust the measurement over both", false: ""}[s.LargeDisagreement])},
	)
	f1 := func(v float64) string { return strconv.FormatFloat(v, 'f', 1, 64) }
	f2 := func(v float64) string { return strconv.FormatFloat(v, 'f', 2, 64) }
	fig := func(name string, g parts.FieldFigures) []string {
		return []string{name, num(g.FrequencyMHz), f1(g.ResistanceOhm), f1(g.ReactanceOhm), f2(g.VSWR), f1(g.AxisDBic), f1(g.RealisedDBic), f2(g.AxialRatioDB)}
	}
	centre := html.Table{
		Caption:    "The solution at the band's edges and centre, and the worst point in the band",
		Header:     []string{"Where", "Frequency (MHz)", "R (Ω)", "X (Ω)", "VSWR", "Gain on axis (dBic)", "Realised peak gain (dBic)", "Axial ratio (dB)"},
		Rows:       [][]string{fig("Band low", s.Low), fig("Band centre", s.Centre), fig("Band high", s.High), fig("Worst in band", s.Worst)},
		RowHeaders: true, Numeric: []bool{false, true, true, true, true, true, true, true},
	}
	var rows [][]string
	for _, p := range f.Points {
		rows = append(rows, []string{num(p.FrequencyMHz), f1(p.ResistanceOhm), f1(p.ReactanceOhm), f2(p.VSWR), f1(p.ReturnLossDB),
			f1(p.AxisRHCPDBic), f1(p.AxisLHCPDBic), f2(p.AxialRatioDB), f1(p.RealisedDBic), f1(100 * p.Efficiency)})
	}
	sweep := html.Table{
		Caption: "The sweep (also in sweep.csv and sweep.s1p)",
		Header:  []string{"Frequency (MHz)", "R (Ω)", "X (Ω)", "VSWR", "Return loss (dB)", "RHCP on axis (dBic)", "LHCP on axis (dBic)", "Axial ratio (dB)", "Realised peak gain (dBic)", "Efficiency (%)"},
		Rows:    rows, RowHeaders: true, Numeric: []bool{true, true, true, true, true, true, true, true, true, true},
	}
	return html.Section{ID: "field", Title: fieldSectionTitle, Blocks: []html.Block{
		html.Paragraph{Text: "The plots above, the quoted gain and the build sheet's band figure come from this solution."},
		html.Definitions{Items: facts},
		html.Paragraph{Text: "What the model leaves out:"},
		html.List{Items: f.Assumptions},
		centre, sweep,
	}}
}

// toleranceSection lays out the batch tolerance analysis: the share of
// kits meeting the target, the distributions with their histograms (the
// same drawings as the tolerance-*.svg files), the inputs ranked by their
// effect, and the derived inspection band.
func toleranceSection(rep *report.ToleranceReport) (html.Section, error) {
	pct := func(v float64) string { return strconv.FormatFloat(100*v, 'f', 0, 64) }
	f2 := func(v float64) string { return strconv.FormatFloat(v, 'f', 2, 64) }
	yield := fmt.Sprintf("%s %% of %d simulated kits meet VSWR %g or better across %s–%s MHz (seed %d).",
		pct(rep.Share), rep.Samples, rep.VSWRTarget, num(rep.BandLowMHz), num(rep.BandHighMHz), rep.Seed)
	if rep.Unbuildable > 0 {
		yield += fmt.Sprintf(" %d of them could not be built and count as failing.", rep.Unbuildable)
	}
	if rep.Unmodelled > 0 {
		yield += fmt.Sprintf(" %d could not be solved because the field model cannot represent them, and are left out of the share (the first: %s).", rep.Unmodelled, rep.UnmodelledProblem)
	}
	blocks := []html.Block{
		html.Paragraph{Text: yield},
		html.Paragraph{Text: "Model inside the loop: " + rep.Model.Description + "."},
	}
	var dist [][]string
	for _, f := range rep.Figures {
		unit := f.Unit
		if unit == "" {
			unit = "—"
		}
		dist = append(dist, []string{f.Name, unit, f2(f.Nominal), f2(f.Mean), f2(f.SD), f2(f.P5), f2(f.P50), f2(f.P95)})
	}
	blocks = append(blocks, html.Table{Caption: "How each figure spreads over the batch",
		Header: []string{"Figure", "Unit", "Nominal", "Mean", "Spread (σ)", "5 %", "Median", "95 %"},
		Rows:   dist, RowHeaders: true, Numeric: []bool{false, false, true, true, true, true, true, true}})
	for _, h := range toleranceHistograms(rep) {
		var b bytes.Buffer
		if err := plot.WriteHistogram(&b, h.hist, plot.ChartOptions{}); err != nil {
			return html.Section{}, fmt.Errorf("%s: %w", h.file, err)
		}
		blocks = append(blocks, html.Figure{SVG: b.Bytes(), Name: h.hist.Title,
			Caption: fmt.Sprintf("%s over the simulated kits (%s), nominal marked.", h.hist.Title, h.file)})
	}
	var sens [][]string
	for i, s := range rep.Sensitivities {
		centre := "— (at the sweep's edge)"
		if rep.Nominal.MatchInside {
			centre = signed(s.CentreMHz, 0)
		}
		sens = append(sens, []string{strconv.Itoa(i + 1), s.Name, s.Words, pct(s.Share), centre, signed(s.WorstVSWR, 2)})
	}
	blocks = append(blocks, html.Table{Caption: "What matters most: the spreads ranked by their share of the worst in-band VSWR's variance",
		Header: []string{"Rank", "Spread", "What it does", "Share (%)", "Match centre moves (MHz)", "Worst VSWR changes by"},
		Rows:   sens, RowHeaders: true, Numeric: []bool{true, false, false, true, true, true}})
	in := rep.Inspection
	var band [][]string
	for i, t := range in.ToleranceMM {
		band = append(band, []string{strconv.Itoa(i + 1), "± " + f2(t)})
	}
	reach := fmt.Sprintf("Of the kits this band passes, %s %% meet the target (aim %s %%); it passes %s %% of all kits.", pct(in.Achieved), pct(in.Share), pct(in.Accepted))
	if !in.Reached {
		reach = fmt.Sprintf("No band reaches %s %% of passed kits meeting the target; this is the best found, %s %%, passing %s %% of all kits.", pct(in.Share), pct(in.Achieved), pct(in.Accepted))
	}
	blocks = append(blocks, html.Paragraph{Text: in.Note}, html.Paragraph{Text: reach},
		html.Table{Caption: "Derived inspection band: each released turn's centreline diameter, in mm",
			Header: []string{"Turn", "Tolerance (mm)"}, Rows: band, RowHeaders: true, Numeric: []bool{true, true}})
	return html.Section{ID: "tolerance", Title: toleranceSectionTitle, Blocks: blocks}, nil
}

// signed formats v with an explicit sign and prec decimals, writing a
// value that rounds to zero as plain 0 (never −0.00).
func signed(v float64, prec int) string {
	s := strconv.FormatFloat(v, 'f', prec, 64)
	if z, _ := strconv.ParseFloat(s, 64); z == 0 {
		return strconv.FormatFloat(0, 'f', prec, 64)
	}
	if v > 0 {
		return "+" + s
	}
	return s
}
