package kit

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"slices"
	"strconv"
	"strings"
	"text/template"

	"coilwright/cam/cut"
	"coilwright/cam/pdf"
	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/sheet"
	"coilwright/parts/spec"
	"coilwright/templates"
)

var (
	cutlistTmpl = template.Must(template.New("cutlist.md.tmpl").Funcs(reportFuncs).ParseFS(templates.FS(), "cutlist.md.tmpl"))
	batchTmpl   = template.Must(template.New("batch.md.tmpl").Funcs(reportFuncs).ParseFS(templates.FS(), "batch.md.tmpl"))
	sheetTmpl   = template.Must(template.New("build-sheet.md.tmpl").Funcs(reportFuncs).ParseFS(templates.FS(), "build-sheet.md.tmpl"))
)

// cutlistView is what cutlist.md.tmpl reads.
type cutlistView struct {
	*cutlist.CutList
	Kit        string
	SpecSHA256 string
	Rows       []cutlist.CutRow
}

// writeSheet writes the cut list, the batch plan (more than one kit) and
// the build sheet.
func (k *Kit) writeSheet(out Sink) error {
	d, cl := k.Design, k.cutList
	rows := cl.Rows()
	if err := out.Add("cutlist.csv", func(w io.Writer) error { return writeCutCSV(w, rows) }); err != nil {
		return err
	}
	view := cutlistView{CutList: cl, Kit: d.Spec.Kit, SpecSHA256: k.Source.SHA256(), Rows: rows}
	if err := out.Add("cutlist.md", func(w io.Writer) error { return cutlistTmpl.Execute(w, view) }); err != nil {
		return err
	}
	if bp := k.batch; bp != nil {
		if err := out.Add("batch.csv", func(w io.Writer) error { return writeBatchCSV(w, bp) }); err != nil {
			return err
		}
		if err := out.Add("batch.md", func(w io.Writer) error { return batchTmpl.Execute(w, bp) }); err != nil {
			return err
		}
	}
	bs := sheet.NewBuildSheet(d, cl, k.Source.SHA256())
	for i, st := range bs.Steps {
		if st.Title != "Lock its end in the former" {
			continue
		}
		if lead := k.formerLead(); lead != "" {
			bs.Steps[i].Text = append([]string{lead}, bs.Steps[i].Text...)
		}
		if note, _ := k.lockCut(); note != "" && (k.Former.FitsPrinter || k.split != nil) {
			bs.Steps[i].Text = append(bs.Steps[i].Text, note)
		}
	}
	if err := out.Add("build-sheet.md", func(w io.Writer) error { return sheetTmpl.Execute(w, bs) }); err != nil {
		return err
	}
	page, err := pdf.PageSizeByName(bs.Paper)
	if err != nil {
		return err
	}
	doc := sheetDocument(bs, page, k.stepFigures(bs))
	doc.Blocks = withBandFigure(doc.Blocks, pdf.Group{Blocks: []pdf.Block{pdf.Heading{Text: "What the analyser should show", Level: 3}, bandFigure(k.electrical())}})
	doc.TrailingPages = len(k.templates)
	pages, err := doc.Pages()
	if err != nil {
		return err
	}
	opt := pdf.PDFOptions{Title: bs.Kit + " — build sheet", Subject: bs.Summary, Creator: k.creator(), Created: k.opt.Created}
	return out.Add("build-sheet.pdf", func(w io.Writer) error { return pdf.WritePDF(w, append(pages, k.templates...), opt) })
}

// fmtMM formats a length or amount for CSV: one decimal, empty when zero.
func fmtMM(v float64) string {
	if v == 0 {
		return ""
	}
	return strconv.FormatFloat(v, 'f', 1, 64)
}

func writeCutCSV(w io.Writer, rows []cutlist.CutRow) error {
	cw := csv.NewWriter(w)
	cw.Write([]string{"item", "material", "size", "count", "length_mm", "amount", "unit", "note"})
	for _, r := range rows {
		count := ""
		if r.Count > 0 {
			count = strconv.Itoa(r.Count)
		}
		cw.Write([]string{r.Item, r.Material, r.Size, count, fmtMM(r.LengthMM), fmtMM(r.Amount), r.Unit, r.Note})
	}
	cw.Flush()
	return cw.Error()
}

// batchPlan is the batch's cutting plans and shopping list, read by
// batch.md.tmpl and written to batch.csv.
type batchPlan struct {
	Kit      string
	Quantity int
	Stocks   []batchStock
	Sheets   []batchSheet
	Buy      []sheet.SheetRow
}

// batchSheet is the nesting of one flat part on stock sheets.
type batchSheet struct {
	Part              string
	PerSheet, Sheets  int
	WidthMM, HeightMM float64
}

// batchStock is the cutting plan of one stock.
type batchStock struct {
	Name     string // "Wire", "Support rod"
	Item     string // the piece's cut-list item
	PieceMM  float64
	Plan     cut.StockPlan
	Patterns []rodPattern
	// ReusableMM is the offcut, counted in the waste, from rods whose
	// offcut would still give another piece.
	ReusableMM float64
}

// rodPattern is a run of consecutive rods cut alike.
type rodPattern struct {
	Rods     string // "1" or "1–4"
	Pieces   int
	OffcutMM float64
}

func newBatchPlan(d *parts.Design, cl *cutlist.CutList, cps []cutPart) (*batchPlan, error) {
	s := d.Spec
	n := s.Quantity
	bp := &batchPlan{Kit: s.Kit, Quantity: n}
	type stock struct {
		name, item, key string
		piece           float64
		rod             cut.Rod
		joint           string // the other fix
	}
	stocks := []stock{
		{"Wire", "wire blank", "stock.wire_rod_mm", cl.Wire.LengthMM, cut.Rod{Length: s.Stock.WireRodMM, Kerf: s.Stock.WireKerfMM, EndTrim: s.Stock.EndTrimMM},
			" and buy the wire on a reel or in longer lengths; the winding must be one piece (a joint in the coil changes its tuning and breaks on the former)"},
		{"Support rod", "support rod", "stock.dowel_rod_mm", cl.Dowel.LengthMM, cut.Rod{Length: s.Stock.DowelRodMM, Kerf: s.Stock.DowelKerfMM, EndTrim: s.Stock.EndTrimMM},
			", or join two rods end to end with a glued sleeve of the same material"},
	}
	if cl.Dowel.OverFeed {
		stocks = stocks[:1] // the kit has no support rod
	}
	for _, st := range stocks {
		pieces := make([]cut.Piece, n)
		for i := range pieces {
			pieces[i] = cut.Piece{Label: st.item, Length: st.piece}
		}
		plan, err := cut.PlanStock(pieces, st.rod)
		if errors.Is(err, cut.ErrPieceTooLong) {
			need := math.Ceil((st.piece+st.rod.Kerf+st.rod.EndTrim)/10) * 10
			return nil, &spec.SpecError{Key: st.key, Line: s.Line(st.key), Value: strconv.FormatFloat(st.rod.Length, 'g', -1, 64),
				Problem: fmt.Sprintf("is too short for one %s of %.1f mm with %s mm kerf and %s mm end trim", st.item, st.piece,
					strconv.FormatFloat(st.rod.Kerf, 'g', -1, 64), strconv.FormatFloat(st.rod.EndTrim, 'g', -1, 64)),
				Fix: fmt.Sprintf("set %s = %.0f or more%s", st.key[strings.LastIndex(st.key, ".")+1:], need, st.joint)}
		}
		if err != nil {
			return nil, fmt.Errorf("%s: %w", st.item, err)
		}
		bs := batchStock{Name: st.name, Item: st.item, PieceMM: st.piece, Plan: plan, Patterns: patterns(plan)}
		for _, r := range plan.Rods {
			if r.Offcut >= st.piece+st.rod.Kerf {
				bs.ReusableMM += r.Offcut
			}
		}
		bp.Stocks = append(bp.Stocks, bs)
	}
	w := bp.Stocks[0]
	nf := float64(n)
	bp.Buy = []sheet.SheetRow{
		{Label: "Wire rods", Value: fmt.Sprintf("%d × %.0f mm, %s Ø%s mm", len(w.Plan.Rods), w.Plan.Rod.Length, cl.Wire.Material, strconv.FormatFloat(cl.Wire.DiameterMM, 'g', -1, 64))},
		{Label: "Feed cable", Value: fmt.Sprintf("%.0f mm of %s (%d × %.1f mm)", nf*cl.Coax.CutMM, cl.Coax.Cable.Name, n, cl.Coax.CutMM)},
		{Label: "Heat-shrink", Value: fmt.Sprintf("%.0f mm of Ø%.1f mm 2:1 sleeve", nf*cl.Sleeve.LengthMM, cl.Sleeve.SuppliedMM)},
		{Label: "Solder", Value: fmt.Sprintf("%.0f mm of Ø%.1f mm wire", nf*cl.Solder.Amount, s.Stock.SolderWireMM)},
		{Label: "Epoxy", Value: fmt.Sprintf("%.1f mL mixed", nf*cl.Epoxy.Amount)},
	}
	if len(bp.Stocks) > 1 {
		dw := bp.Stocks[1]
		bp.Buy = slices.Insert(bp.Buy, 1, sheet.SheetRow{Label: "Support rods", Value: fmt.Sprintf("%d × %.0f mm, %s Ø%s mm", len(dw.Plan.Rods), dw.Plan.Rod.Length, cl.Dowel.Material, strconv.FormatFloat(cl.Dowel.DiameterMM, 'g', -1, 64))})
	}
	for _, c := range cps {
		bp.Sheets = append(bp.Sheets, batchSheet{Part: c.title, PerSheet: c.nest.PerSheet, Sheets: c.nest.Sheets,
			WidthMM: c.sheet.Width, HeightMM: c.sheet.Height})
		mat := d.Patterns.Material.Name
		if c.name == "wedge" {
			mat = d.Patterns.WedgeMaterial.Name
		}
		bp.Buy = append(bp.Buy, sheet.SheetRow{Label: c.title + " sheets", Value: fmt.Sprintf("%d × %g × %g mm %s (%d parts per sheet)", c.nest.Sheets, c.sheet.Width, c.sheet.Height, mat, c.nest.PerSheet)})
	}
	for _, h := range cl.Hardware {
		bp.Buy = append(bp.Buy, sheet.SheetRow{Label: "Hardware", Value: fmt.Sprintf("%d × %s", n*h.Count, h.Item)})
	}
	return bp, nil
}

// patterns groups consecutive rods with the same piece count and offcut.
func patterns(p cut.StockPlan) []rodPattern {
	var out []rodPattern
	start := 0
	for i := 1; i <= len(p.Rods); i++ {
		if i < len(p.Rods) && len(p.Rods[i].Pieces) == len(p.Rods[start].Pieces) && fmtMM(p.Rods[i].Offcut) == fmtMM(p.Rods[start].Offcut) {
			continue
		}
		rods := strconv.Itoa(start + 1)
		if i-1 > start {
			rods = fmt.Sprintf("%d–%d", start+1, i)
		}
		out = append(out, rodPattern{Rods: rods, Pieces: len(p.Rods[start].Pieces), OffcutMM: p.Rods[start].Offcut})
		start = i
	}
	return out
}

// writeBatchCSV writes one "cut" row per rod and one "total" row per
// stock.
func writeBatchCSV(w io.Writer, bp *batchPlan) error {
	cw := csv.NewWriter(w)
	cw.Write([]string{"row", "stock", "rod", "rod_length_mm", "pieces", "piece_mm", "kerf_mm", "offcut_mm", "rods", "bought_mm", "demand_mm", "waste_mm", "waste_percent"})
	f := func(v float64) string { return strconv.FormatFloat(v, 'f', 1, 64) }
	for _, st := range bp.Stocks {
		p := st.Plan
		for i, r := range p.Rods {
			cw.Write([]string{"cut", st.Item, strconv.Itoa(i + 1), f(p.Rod.Length), strconv.Itoa(len(r.Pieces)), f(st.PieceMM), f(p.Rod.Kerf), f(r.Offcut), "", "", "", "", ""})
		}
		cw.Write([]string{"total", st.Item, "", f(p.Rod.Length), strconv.Itoa(p.Pieces), f(st.PieceMM), f(p.Rod.Kerf), "", strconv.Itoa(len(p.Rods)), f(p.Bought), f(p.Demand), f(p.Waste), f(p.WastePercent())})
	}
	for _, sh := range bp.Sheets {
		cw.Write([]string{"sheets", strings.ToLower(sh.Part), "", "", strconv.Itoa(bp.Quantity), "", "", "", strconv.Itoa(sh.Sheets), "", "", "", ""})
	}
	cw.Flush()
	return cw.Error()
}
