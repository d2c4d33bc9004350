package kit

import (
	"fmt"
	"strings"

	"coilwright/cam/geom"
	"coilwright/cam/pdf"
	"coilwright/parts/sheet"
)

// num formats a number compactly.
func num(v float64) string { return fmt.Sprintf("%g", v) }

// sheetDocument lays out the build sheet's content as a flowing document.
// figs holds figures to print after the step of each title ("feed": the
// step that fits the cable or connector); any left over follow the steps.
func sheetDocument(b *sheet.BuildSheet, page pdf.PageSize, figs map[string][]pdf.Figure) pdf.Document {
	var bl []pdf.Block
	add := func(x ...pdf.Block) { bl = append(bl, x...) }

	// Cover.
	add(pdf.Heading{Text: b.Kit, Level: 1},
		pdf.Paragraph{Text: "Build sheet: " + b.Summary + ".", Size: 13},
		pdf.Paragraph{Lead: "Hand: " + b.Hand + ".", Text: strings.ToUpper(b.HandWords[:1]) + b.HandWords[1:] + ". Both ends of a link must use the same hand.", Boxed: true, Size: 13},
		pdf.Paragraph{Lead: "Spec SHA-256:", Text: b.SpecSHA256, Size: 8.5})
	if b.Quantity > 1 {
		add(pdf.Paragraph{Text: fmt.Sprintf("One of %d kits in this batch: the batch plan (batch.md) lists the stock to buy and how to cut it.", b.Quantity)})
	}
	add(pdf.Paragraph{Text: "Contents: design table and side view; tools and materials; cautions; " + fmt.Sprintf("%d numbered steps", len(b.Steps)) + "; inspection table; closing note; 1:1 templates."},
		pdf.Paragraph{Lead: "Read the cautions before step 1.", Text: "Each caution is repeated at the step that needs it.", Boxed: true})
	add(pdf.PageBreak{})

	// Design and side view.
	add(pdf.Heading{Text: "Design", Level: 2})
	rows := make([][]string, len(b.Design))
	for i, r := range b.Design {
		rows[i] = []string{r.Label, r.Value}
	}
	add(pdf.Table{Widths: []float64{1, 2.6}, Rows: rows})
	add(pdf.Group{Blocks: []pdf.Block{pdf.Heading{Text: "Side view", Level: 2}, sideFigure(b)}})

	add(pdf.Heading{Text: "Tools", Level: 2}, pdf.List{Items: b.Tools})
	add(pdf.Heading{Text: "Materials (one kit)", Level: 2})
	rows = make([][]string, len(b.Materials))
	for i, r := range b.Materials {
		rows[i] = []string{r.Label, r.Value}
	}
	add(pdf.Table{Widths: []float64{1, 3}, Rows: rows})

	add(pdf.PageBreak{}, pdf.Heading{Text: "Cautions — read before step 1", Level: 2})
	for _, c := range b.Cautions {
		add(pdf.Group{Blocks: []pdf.Block{pdf.Heading{Text: c.Heading, Level: 3}, pdf.Paragraph{Text: c.Text}}})
	}

	add(pdf.PageBreak{}, pdf.Heading{Text: "Steps", Level: 2})
	for _, st := range b.Steps {
		// The step's title, its cautions and its first paragraph stay on
		// one page.
		g := pdf.Group{Blocks: []pdf.Block{pdf.Heading{Text: fmt.Sprintf("Step %d. %s", st.Number, st.Title), Level: 3}}}
		for _, c := range st.Cautions {
			g.Blocks = append(g.Blocks, pdf.Paragraph{Lead: "Caution — " + c.Heading + ".", Text: c.Text, Boxed: true, Size: 9})
		}
		for i, t := range st.Text {
			if i == 0 {
				g.Blocks = append(g.Blocks, pdf.Paragraph{Text: t})
				add(g)
				continue
			}
			add(pdf.Paragraph{Text: t})
		}
		key := st.Title
		if strings.Contains(st.Title, "coax") || strings.HasPrefix(st.Title, "Mount the") {
			for _, f := range figs["feed"] {
				add(f)
			}
			delete(figs, "feed")
		}
		for _, f := range figs[key] {
			add(f)
		}
		delete(figs, key)
	}
	for _, key := range []string{"Lock its end in the former", "Solder the wedge under the start of the winding", "Prepare the reflector", "feed"} {
		for _, f := range figs[key] {
			add(f)
		}
	}

	add(pdf.PageBreak{}, pdf.Heading{Text: "Inspection table", Level: 2}, pdf.Paragraph{Text: b.InspectionNote})
	rows = make([][]string, len(b.Inspection))
	for i, r := range b.Inspection {
		rows[i] = []string{fmt.Sprint(r.Turn), fmt.Sprintf("%.2f", r.OutsideMM), fmt.Sprintf("± %.2f", r.ToleranceMM), fmt.Sprintf("%.2f", r.CentrelineMM), fmt.Sprintf("%.1f", r.HeightMM), ""}
	}
	add(pdf.Table{Widths: []float64{0.6, 1.3, 1.1, 1.3, 1, 1.6}, Right: []bool{true, true, true, true, true, false},
		Header: []string{"Turn", "Target outside Ø (mm)", "Tolerance (mm)", "Wire centre Ø (mm)", "Height (mm)", "Measured (mm)"},
		Rows:   rows, MinRowMM: 9})
	if len(b.Warnings) > 0 {
		items := make([]string, len(b.Warnings))
		for i, w := range b.Warnings {
			items[i] = w.Code + ": " + w.Message
		}
		add(pdf.Heading{Text: "Design warnings", Level: 2}, pdf.List{Items: items})
	}
	add(pdf.Heading{Text: "Closing note", Level: 2})
	for _, c := range b.Closing {
		add(pdf.Paragraph{Text: c})
	}
	add(pdf.Paragraph{Text: "The 1:1 templates follow. Print them at 100 % (actual size, no fit to page) and check the 50 mm scale bar with a rule before cutting.", Boxed: true})
	return pdf.Document{Page: page, Footer: b.Kit + " — build sheet — spec " + b.SpecSHA256[:12], Blocks: bl}
}

// sideFigure draws the side view: reflector, support rod, feed cable and
// the wire, with the dimensions.
func sideFigure(b *sheet.BuildSheet) pdf.Figure {
	v := b.View
	rect := func(x0, y0, x1, y1 float64) geom.Polyline {
		return geom.Polyline{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
	}
	cable := v.CableShown
	// Far halves of the turns first, light and thin, behind the rod; near
	// halves last, dark and full width, so the slant of the front of each
	// turn shows the hand.
	var paths []pdf.FigurePath
	for _, far := range v.Far {
		paths = append(paths, pdf.FigurePath{Points: far, StrokeMM: 0.6 * v.WireDiameter, Gray: 0.3})
	}
	behind := "behind the support rod (Ø" + num(v.RodDiameter) + fmt.Sprintf(" × %.1f mm)", v.RodLength)
	if v.RodDiameter > 0 {
		paths = append(paths, pdf.FigurePath{Points: rect(-v.RodDiameter/2, 0, v.RodDiameter/2, v.RodLength), Closed: true, Fill: true, FillGray: 0.08, Gray: 0.6})
	} else {
		behind = "behind (this kit has no support rod)"
	}
	paths = append(paths,
		pdf.FigurePath{Points: rect(-v.ReflectorWidth/2, -v.ReflectorThick, v.ReflectorWidth/2, 0), Closed: true, Fill: true, FillGray: 0.45, Gray: 1},
		pdf.FigurePath{Points: rect(v.CoaxX-v.CoaxOuter/2, -v.ReflectorThick-cable, v.CoaxX+v.CoaxOuter/2, 0), Closed: true, Fill: true, FillGray: 0.3, Gray: 1})
	for _, near := range v.Near {
		paths = append(paths, pdf.FigurePath{Points: near, StrokeMM: v.WireDiameter, Gray: 0.85})
	}
	return pdf.Figure{Paths: paths, Dimensions: v.Dimensions, Height: 120,
		Caption: fmt.Sprintf("Side view, fitted to the page (not 1:1); dimensions in mm. %s coil drawn on its wire centreline: the near half of each turn dark and full width, the far half light and thin %s; feed cable coming up through the reflector under the coil's start.", b.Hand, behind)}
}
