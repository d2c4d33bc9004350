package kit

import (
	"errors"
	"fmt"
	"io"
	"strconv"

	"coilwright/cam/html"
	"coilwright/parts/line"
	"coilwright/parts/sheet"
)

// reportPage is the name of the self-contained report page.
const reportPage = "report.html"

// reportSections are the report page's fixed section titles, in order;
// reportSectionTitles adds the analysis sections that ran.
var reportSections = [...]string{
	"Summary", "Plots", "Drawings", "Per-turn table", "Springback", "Parts",
	"Cut list and batch plan", "Cautions", "Warnings", "Provenance",
}

// writeHTML writes report.html: the whole kit on one page that opens
// offline. It must run after every other step: it lists the files they
// wrote and embeds the former's preview.
func (k *Kit) writeHTML(out Sink) error {
	rec, ok := out.(*recorder)
	if !ok {
		return errors.New("the report page needs the files written before it: run it through Kit.Write")
	}
	doc, err := k.reportDocument(rec)
	if err != nil {
		return err
	}
	bs := sheet.NewBuildSheet(k.Design, k.cutList, k.Source.SHA256())
	return out.Add(reportPage, func(w io.Writer) error { return html.WriteReport(w, doc, html.Options{Paper: bs.Paper}) })
}

// reportDocument lays out the report page from the kit, its plots and the
// files rec saw written.
func (k *Kit) reportDocument(rec *recorder) (html.Document, error) {
	d, r := k.Design, k.Report
	e := k.electrical()
	bs := sheet.NewBuildSheet(d, k.cutList, k.Source.SHA256())
	plots, err := k.plots()
	if err != nil {
		return html.Document{}, err
	}
	fig := func(p plotFile) html.Figure {
		return html.Figure{SVG: p.SVG, Caption: p.Caption, Name: p.Title}
	}
	byName := map[string]plotFile{}
	for _, p := range plots {
		byName[p.Name] = p
	}

	// Summary.
	sum := []html.Definition{
		{Term: "What it is", Detail: bs.Summary + "."},
		{Term: "Hand", Detail: r.Hand + ": " + bs.HandWords + "."},
	}
	if e.Band != nil {
		sum = append(sum, html.Definition{Term: "Band", Detail: fmt.Sprintf("%s, centre %s MHz; designed at %s MHz", e.Band.Text, num(e.CentreMHz), num(r.FrequencyMHz))})
	} else {
		sum = append(sum, html.Definition{Term: "Band", Detail: fmt.Sprintf("designed at %s MHz; the spec sets no band", num(r.FrequencyMHz))})
	}
	sum = append(sum, html.Definition{Term: "Quoted gain", Detail: fmt.Sprintf("%.1f dBic (%s)", r.QuotedGainDBic, r.QuotedGainSource)})
	matched := fmt.Sprintf("none: the VSWR at %s MHz is above the target %.2f", num(r.FrequencyMHz), e.TargetVSWR)
	if lo, hi, ok := e.matchedBand(r.FrequencyMHz); ok {
		matched = fmt.Sprintf("%.0f–%.0f MHz at VSWR %.2f or better (return loss %.0f dB)", lo, hi, e.TargetVSWR, line.ReturnLossDB((e.TargetVSWR-1)/(e.TargetVSWR+1)))
		if lo <= e.FreqMHz[0] || hi >= e.FreqMHz[len(e.FreqMHz)-1] {
			matched += "; the match holds to the edge of the plotted range"
		}
	}
	sum = append(sum, html.Definition{Term: "Matched band", Detail: matched + " (" + e.Short + ")"},
		html.Definition{Term: "Coil", Detail: fmt.Sprintf("%s, %.2f turns, Ø%.2f mm base, Ø%.2f mm top, %.1f mm long, %.0f mm of wire", r.Shape, r.TurnCount, r.BaseDiameterMM, r.TopDiameterMM, r.AxialLengthMM, r.WireLengthMM)})
	if r.Quantity > 1 {
		sum = append(sum, html.Definition{Term: "Batch", Detail: fmt.Sprintf("%d kits", r.Quantity)})
	}
	if t := k.tolerance; t != nil {
		sum = append(sum, html.Definition{Term: "Batch yield", Detail: fmt.Sprintf("%.0f %% of %d simulated kits meet VSWR %g across the band (see Tolerance)", 100*t.Share, t.Samples, t.VSWRTarget)})
	}

	// Plots.
	var cuts []html.Figure
	for i := range e.Cuts {
		f := fig(byName[fmt.Sprintf("plot-pattern-%d.svg", i+1)])
		f.Name = e.Cuts[i].Name
		cuts = append(cuts, f)
	}
	plotBlocks := []html.Block{
		html.Paragraph{Text: e.Source + ". Each plot is also written as its own SVG file beside this page."},
		fig(byName["plot-match.svg"]), fig(byName["plot-gain.svg"]),
		html.FigureSwitch{Label: "Pattern cut", Figures: cuts},
		html.Paragraph{Text: e.CutNote},
	}

	// Drawings.
	drawings := []html.Block{fig(byName["plot-side.svg"]), fig(byName["plot-plan.svg"])}
	if png, ok := rec.keep["former.png"]; ok {
		drawings = append(drawings, html.Figure{PNG: png, Alt: "Shaded picture of the winding former for " + r.Kit,
			Caption: "The winding former (former.stl, former.3mf) as printed: the wire is wound in its groove."})
	} else {
		drawings = append(drawings, html.Paragraph{Text: "No former was made: it does not fit the spec's print volume (see the warnings)."})
	}

	// Per-turn and springback tables.
	f1 := func(v float64) string { return strconv.FormatFloat(v, 'f', 1, 64) }
	f2 := func(v float64) string { return strconv.FormatFloat(v, 'f', 2, 64) }
	f3 := func(v float64) string { return strconv.FormatFloat(v, 'f', 3, 64) }
	var turns, spring [][]string
	for _, t := range r.Turns {
		turns = append(turns, []string{strconv.Itoa(t.Index), f2(t.DiameterMM), f3(t.CircumferenceLambda), f2(t.PitchAngleDeg), f2(t.SpacingMM), f1(t.HeightMM), f1(t.WireMM), f1(t.InputResistanceOhm)})
		spring = append(spring, []string{strconv.Itoa(t.Index), f2(t.TargetDiameterMM), f2(t.FormerDiameterMM), f2(t.PredictedDiameterMM), f3(t.SpringbackMM), "± " + f2(t.ToleranceMM)})
	}
	right := func(n int) []bool {
		b := make([]bool, n)
		for i := range b {
			b[i] = true
		}
		return b
	}

	// Parts.
	var partBlocks []html.Block
	for _, c := range k.parts {
		p := fig(byName["plot-"+c.name+".svg"])
		partBlocks = append(partBlocks, p)
		for _, n := range c.notes {
			partBlocks = append(partBlocks, html.Paragraph{Text: n})
		}
	}

	// Cut list and batch plan.
	var cut [][]string
	for _, row := range k.cutList.Rows() {
		count, length, amount := "", "", ""
		if row.Count > 0 {
			count = strconv.Itoa(row.Count)
		}
		if row.LengthMM > 0 {
			length = f1(row.LengthMM)
		}
		if row.Amount > 0 {
			amount = strconv.FormatFloat(row.Amount, 'g', -1, 64) + " " + row.Unit
		}
		cut = append(cut, []string{row.Item, row.Material, row.Size, count, length, amount, row.Note})
	}
	cutBlocks := []html.Block{html.Table{Caption: "Cut list for one kit", Header: []string{"Item", "Material", "Size", "Count", "Length (mm)", "Amount", "Note"},
		Rows: cut, RowHeaders: true, Numeric: []bool{false, false, false, true, true, true}}}
	if bp := k.batch; bp != nil {
		for _, st := range bp.Stocks {
			var rows [][]string
			for _, p := range st.Patterns {
				rows = append(rows, []string{p.Rods, strconv.Itoa(p.Pieces), f1(p.OffcutMM)})
			}
			cutBlocks = append(cutBlocks, html.Table{
				Caption: fmt.Sprintf("%s: %d pieces of %.1f mm from %.0f mm rods; %d rods, waste %.1f %%", st.Name, st.Plan.Pieces, st.PieceMM, st.Plan.Rod.Length, len(st.Plan.Rods), st.Plan.WastePercent()),
				Header:  []string{"Rods", "Pieces per rod", "Offcut per rod (mm)"}, Rows: rows, RowHeaders: true, Numeric: []bool{false, true, true}})
		}
		var buy [][]string
		for _, b := range bp.Buy {
			buy = append(buy, []string{b.Label, b.Value})
		}
		cutBlocks = append(cutBlocks, html.Table{Caption: fmt.Sprintf("To buy for the batch of %d", bp.Quantity), Header: []string{"Item", "Quantity"}, Rows: buy, RowHeaders: true})
		for _, c := range k.parts {
			cutBlocks = append(cutBlocks, fig(byName["plot-panel-"+c.name+".svg"]))
		}
	}

	// Cautions: the build sheet's own.
	var cautions []html.Definition
	for _, c := range bs.Cautions {
		cautions = append(cautions, html.Definition{Term: c.Heading, Detail: c.Text})
	}

	// Warnings.
	var warnBlocks []html.Block
	if len(r.Warnings) == 0 {
		warnBlocks = []html.Block{html.Paragraph{Text: "The design raised no warnings."}}
	} else {
		items := make([]string, len(r.Warnings))
		for i, w := range r.Warnings {
			items[i] = w.Code + ": " + w.Message
		}
		warnBlocks = []html.Block{html.Warnings{Items: items}}
	}

	// Provenance.
	version := k.opt.Version
	if version == "" {
		version = "not recorded"
	}
	prov := []html.Definition{
		{Term: "Spec", Detail: k.Source.Name},
		{Term: "Spec SHA-256", Detail: k.Source.SHA256()},
		{Term: "Tool", Detail: "coilwright " + version},
	}
	if !k.opt.Created.IsZero() {
		prov = append(prov, html.Definition{Term: "Created", Detail: k.opt.Created.UTC().Format("2006-01-02 15:04:05 UTC")})
	}
	var files [][]string
	for _, f := range rec.files {
		files = append(files, []string{f.Name, strconv.FormatInt(f.Size, 10), f.SHA256})
	}

	sections := []html.Section{
		{ID: "summary", Title: reportSections[0], Blocks: []html.Block{html.Definitions{Items: sum}}},
		{ID: "plots", Title: reportSections[1], Blocks: plotBlocks},
	}
	if d.Field != nil {
		sections = append(sections, fieldSection(d.Field))
	}
	if k.tolerance != nil {
		ts, err := toleranceSection(k.tolerance)
		if err != nil {
			return html.Document{}, err
		}
		sections = append(sections, ts)
	}
	return html.Document{
		Title:    r.Kit + ": build report",
		Subtitle: bs.Summary,
		Footer:   "coilwright " + version + " — spec SHA-256 " + k.Source.SHA256(),
		Sections: append(sections, []html.Section{
			{ID: "drawings", Title: reportSections[2], Blocks: drawings},
			{ID: "turns", Title: reportSections[3], Blocks: []html.Block{html.Table{
				Caption: "One row per started turn from the feed end: the relaxed coil aimed for",
				Header:  []string{"Turn", "Diameter (mm)", "Circumference (λ)", "Pitch angle (°)", "Spacing (mm)", "Height (mm)", "Wire (mm)", "Input resistance (Ω)"},
				Rows:    turns, RowHeaders: true, Numeric: right(8)}}},
			{ID: "springback", Title: reportSections[4], Blocks: []html.Block{
				html.Paragraph{Text: fmt.Sprintf("The former is wound smaller than the coil aimed for; the wire (%s, Ø%s mm) springs open on release.", r.Wire.MaterialName, num(r.Wire.DiameterMM))},
				html.Table{
					Caption: "Wire centreline diameters per turn, in mm",
					Header:  []string{"Turn", "Target Ø", "Former Ø", "Predicted Ø", "Springback", "Tolerance"},
					Rows:    spring, RowHeaders: true, Numeric: right(6)}}},
			{ID: "parts", Title: reportSections[5], Blocks: partBlocks},
			{ID: "cutting", Title: reportSections[6], Blocks: cutBlocks},
			{ID: "cautions", Title: reportSections[7], Blocks: []html.Block{
				html.Paragraph{Text: "The same cautions as the build sheet; read them before step 1."},
				html.Definitions{Items: cautions}}},
			{ID: "warnings", Title: reportSections[8], Blocks: warnBlocks},
			{ID: "provenance", Title: reportSections[9], Blocks: []html.Block{
				html.Definitions{Items: prov},
				html.Paragraph{Text: "The files written before this page, as they were written. manifest.json is written after every file, this page included, and lists them all with the same sizes and hashes."},
				html.Table{Caption: "Files written before this page", Header: []string{"File", "Size (bytes)", "SHA-256"}, Rows: files, RowHeaders: true, Numeric: []bool{false, true, false}},
			}},
		}...),
	}, nil
}
