package kit

import (
	"fmt"
	"strings"

	"coilwright/cam"
	"coilwright/cam/geom"
	"coilwright/parts"
)

// num formats a number compactly.
func num(v float64) string { return fmt.Sprintf("%g", v) }

// sheetDocument lays out the build sheet's content as a flowing document.
func sheetDocument(b *parts.BuildSheet, page cam.PageSize) cam.Document {
	var bl []cam.Block
	add := func(x ...cam.Block) { bl = append(bl, x...) }

	// Cover.
	add(cam.Heading{Text: b.Kit, Level: 1},
		cam.Paragraph{Text: "Build sheet: " + b.Summary + ".", Size: 13},
		cam.Paragraph{Lead: "Hand: " + b.Hand + ".", Text: strings.ToUpper(b.HandWords[:1]) + b.HandWords[1:] + ". Both ends of a link must use the same hand.", Boxed: true, Size: 13},
		cam.Paragraph{Lead: "Spec SHA-256:", Text: b.SpecSHA256, Size: 8.5})
	if b.Quantity > 1 {
		add(cam.Paragraph{Text: fmt.Sprintf("One of %d kits in this batch: the batch plan (batch.md) lists the stock to buy and how to cut it.", b.Quantity)})
	}
	add(cam.Paragraph{Text: "Contents: design table and side view; tools and materials; cautions; " + fmt.Sprintf("%d numbered steps", len(b.Steps)) + "; inspection table; closing note; 1:1 templates."},
		cam.Paragraph{Lead: "Read the cautions before step 1.", Text: "Each caution is repeated at the step that needs it.", Boxed: true})
	add(cam.PageBreak{})

	// Design and side view.
	add(cam.Heading{Text: "Design", Level: 2})
	rows := make([][]string, len(b.Design))
	for i, r := range b.Design {
		rows[i] = []string{r.Label, r.Value}
	}
	add(cam.Table{Widths: []float64{1, 2.6}, Rows: rows})
	add(cam.Heading{Text: "Side view", Level: 2}, sideFigure(b))

	add(cam.Heading{Text: "Tools", Level: 2}, cam.List{Items: b.Tools})
	add(cam.Heading{Text: "Materials (one kit)", Level: 2})
	rows = make([][]string, len(b.Materials))
	for i, r := range b.Materials {
		rows[i] = []string{r.Label, r.Value}
	}
	add(cam.Table{Widths: []float64{1, 3}, Rows: rows})

	add(cam.PageBreak{}, cam.Heading{Text: "Cautions — read before step 1", Level: 2})
	for _, c := range b.Cautions {
		add(cam.Group{Blocks: []cam.Block{cam.Heading{Text: c.Heading, Level: 3}, cam.Paragraph{Text: c.Text}}})
	}

	add(cam.PageBreak{}, cam.Heading{Text: "Steps", Level: 2})
	for _, st := range b.Steps {
		// The step's title, its cautions and its first paragraph stay on
		// one page.
		g := cam.Group{Blocks: []cam.Block{cam.Heading{Text: fmt.Sprintf("Step %d. %s", st.Number, st.Title), Level: 3}}}
		for _, c := range st.Cautions {
			g.Blocks = append(g.Blocks, cam.Paragraph{Lead: "Caution — " + c.Heading + ".", Text: c.Text, Boxed: true, Size: 9})
		}
		for i, t := range st.Text {
			if i == 0 {
				g.Blocks = append(g.Blocks, cam.Paragraph{Text: t})
				add(g)
				continue
			}
			add(cam.Paragraph{Text: t})
		}
	}

	add(cam.PageBreak{}, cam.Heading{Text: "Inspection table", Level: 2}, cam.Paragraph{Text: b.InspectionNote})
	rows = make([][]string, len(b.Inspection))
	for i, r := range b.Inspection {
		rows[i] = []string{fmt.Sprint(r.Turn), fmt.Sprintf("%.2f", r.OutsideMM), fmt.Sprintf("± %.2f", r.ToleranceMM), fmt.Sprintf("%.2f", r.CentrelineMM), fmt.Sprintf("%.1f", r.HeightMM), ""}
	}
	add(cam.Table{Widths: []float64{0.6, 1.3, 1.1, 1.3, 1, 1.6}, Right: []bool{true, true, true, true, true, false},
		Header: []string{"Turn", "Target outside Ø (mm)", "Tolerance (mm)", "Wire centre Ø (mm)", "Height (mm)", "Measured (mm)"},
		Rows:   rows, MinRowMM: 9})
	if len(b.Warnings) > 0 {
		items := make([]string, len(b.Warnings))
		for i, w := range b.Warnings {
			items[i] = w.Code + ": " + w.Message
		}
		add(cam.Heading{Text: "Design warnings", Level: 2}, cam.List{Items: items})
	}
	add(cam.Heading{Text: "Closing note", Level: 2})
	for _, c := range b.Closing {
		add(cam.Paragraph{Text: c})
	}
	add(cam.Paragraph{Text: "The 1:1 templates follow. Print them at 100 % (actual size, no fit to page) and check the 50 mm scale bar with a rule before cutting.", Boxed: true})
	return cam.Document{Page: page, Footer: b.Kit + " — build sheet — spec " + b.SpecSHA256[:12], Blocks: bl}
}

// sideFigure draws the side view: reflector, support rod, feed cable and
// the wire, with the dimensions.
func sideFigure(b *parts.BuildSheet) cam.Figure {
	v := b.View
	rect := func(x0, y0, x1, y1 float64) geom.Polyline {
		return geom.Polyline{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
	}
	cable := v.CableShown
	paths := []cam.FigurePath{
		{Points: rect(-v.RodDiameter/2, 0, v.RodDiameter/2, v.RodLength), Closed: true, Fill: true, FillGray: 0.08, Gray: 0.6},
		{Points: rect(-v.ReflectorWidth/2, -v.ReflectorThick, v.ReflectorWidth/2, 0), Closed: true, Fill: true, FillGray: 0.45, Gray: 1},
		{Points: rect(v.CoaxX-v.CoaxOuter/2, -v.ReflectorThick-cable, v.CoaxX+v.CoaxOuter/2, 0), Closed: true, Fill: true, FillGray: 0.3, Gray: 1},
		{Points: v.Wire, StrokeMM: v.WireDiameter, Gray: 0.75},
	}
	return cam.Figure{Paths: paths, Dimensions: v.Dimensions, Height: 120,
		Caption: fmt.Sprintf("Side view, fitted to the page (not 1:1); dimensions in mm. %s coil drawn on its wire centreline, support rod Ø%s × %.1f mm, feed cable coming up through the reflector under the coil's start.", b.Hand, num(v.RodDiameter), v.RodLength)}
}
