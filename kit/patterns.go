package kit

import (
	"fmt"
	"io"

	"coilwright/cam/cut"
	"coilwright/cam/dxf"
	"coilwright/cam/geom"
	"coilwright/cam/pdf"
	"coilwright/cam/svg"
	"coilwright/parts"
	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/report"
)

// nestTolerance is the chord tolerance in mm used to flatten outlines for
// nesting; it is added to the spacing so chords inside arcs cannot bring
// parts closer than asked.
const nestTolerance = 0.01

// cutPart is one flat part ready for its files: the drawing as designed,
// the drawing compensated for the kerf, and the panel plan for the batch.
type cutPart struct {
	name    string // file stem: "reflector" or "wedge"
	title   string
	label   string
	paper   string // the label on the paper templates
	notes   []string
	nominal geom.Drawing
	drawing geom.Drawing // as the cut files carry it: true outline, and the tool path on request
	cut     geom.Drawing // compensated for the kerf: what the nests space
	nest    cut.Nest
	sheet   cut.Sheet
}

// cutParts works out both parts of d with their kerf offsets and nests.
func cutParts(d *parts.Design) ([]cutPart, error) {
	p := d.Patterns
	s := d.Spec
	sheet := cut.Sheet{Width: s.Cutting.SheetWidthMM, Height: s.Cutting.SheetHeightMM, Margin: s.Cutting.MarginMM, Spacing: s.Cutting.SpacingMM}
	w := p.Wedge
	var out []cutPart
	if p.Reflector != nil {
		rin := p.Reflector.Input
		marks := "centre cross, the support rod's place and the limit of its epoxy fillet, coil start tick and angle, kit name"
		if rin.RodFoot == 0 {
			marks = "centre cross, coil start tick and angle, kit name" // no rod's foot on the plate
		}
		out = append(out, cutPart{name: "reflector", title: "Reflector", label: p.ReflectorLabel, paper: p.ReflectorPaperLabel, nominal: p.Reflector.Drawing,
			notes: []string{
				fmt.Sprintf("%s %s, %.2f mm thick; size %.2f mm. Feed hole (%s) %.2f mm from the centre at the 0° tick.",
					p.Material.Name, s.Reflector.Shape, s.Reflector.ThicknessMM, rin.Size, s.Reflector.Connector, rin.FeedRadius),
				"Cut on the black lines; blue lines are marks (" + marks + ").",
			}})
	}
	out = append(out, cutPart{name: "wedge", title: "Matching wedge", label: p.WedgeLabel, paper: p.WedgePaperLabel, nominal: w.Drawing(),
		notes: []string{
			fmt.Sprintf("%s, %.2f mm thick; %.2f mm along the centreline, %.2f mm wide at the feed end (tick), %.2f mm at the far end.",
				p.WedgeMaterial.Name, s.Wedge.ThicknessMM, w.Length, w.FeedWidth, w.EndWidth),
			fmt.Sprintf("Solder it flat under the first %.0f° of wire, the ticked end to the feed pin. Expected |Γ| %.2f (VSWR %.2f) at %.0f MHz.",
				s.Wedge.SpanDeg, w.Reflection, line.VSWR(w.Reflection), s.FrequencyMHz),
		}})
	for i := range out {
		c, err := cut.ApplyKerf(out[i].nominal, p.Kerf)
		if err != nil {
			return nil, fmt.Errorf("%s: %w", out[i].name, err)
		}
		out[i].cut, out[i].sheet = c, sheet
		if out[i].drawing, err = fileDrawing(out[i].nominal, p.Kerf, p.ToolPath); err != nil {
			return nil, fmt.Errorf("%s: %w", out[i].name, err)
		}
		switch {
		case out[i].name == "wedge":
			out[i].nest, err = cut.NestPolygon(outerOutline(c), s.Quantity, sheet, cut.NestOptions{Interlock: true, Tolerance: nestTolerance})
		case p.Reflector.Input.Shape == flat.ReflectorDisc:
			out[i].nest, err = cut.NestDiscs(p.Reflector.Input.Size/2+p.Kerf/2, s.Quantity, sheet)
		default:
			out[i].nest, err = cut.NestPolygon(outerOutline(c), s.Quantity, sheet, cut.NestOptions{Tolerance: nestTolerance, Angles: []float64{0}})
		}
		if err != nil {
			return nil, fmt.Errorf("%s panel: %w", out[i].name, err)
		}
	}
	return out, nil
}

// outerOutline returns the first CUT entity, the part's outline, as a
// polygon.
func outerOutline(d geom.Drawing) geom.Polyline {
	l, _ := d.Layer(flat.LayerCut)
	switch e := l.Entities[0].(type) {
	case geom.Circle:
		return e.Flatten(nestTolerance)
	case geom.Contour:
		return e.Flatten(nestTolerance)
	}
	return nil
}

// panelReport summarises a part's nest for design.json.
func (c cutPart) panelReport(quantity int) *report.PanelReport {
	return &report.PanelReport{
		SheetWidthMM: c.sheet.Width, SheetHeightMM: c.sheet.Height, MarginMM: c.sheet.Margin, SpacingMM: c.sheet.Spacing,
		Quantity: quantity, PartsPerSheet: c.nest.PerSheet, Sheets: c.nest.Sheets,
	}
}

// addPanels puts each part's nesting figures into the report.
func (k *Kit) addPanels(r *report.Report) {
	d := k.Design
	for _, c := range k.parts {
		switch {
		case c.name == "reflector" && r.Reflector != nil:
			r.Reflector.Panel = c.panelReport(d.Spec.Quantity)
		case c.name == "wedge" && r.Wedge != nil:
			r.Wedge.Panel = c.panelReport(d.Spec.Quantity)
		}
	}
}

// writePatterns writes each part's DXF and SVG (the true outline on CUT,
// the tool-centre path on TOOLPATH on request, and a printed note saying
// which), the
// 1:1 paper templates, and, for a batch, each part's panel files.
func (k *Kit) writePatterns(out Sink) error {
	s := k.Design.Spec
	p := k.Design.Patterns
	version := dxf.DXFR12
	if s.Cutting.DXF == "R2000" {
		version = dxf.DXFR2000
	}
	for _, c := range k.parts {
		layers := "Units: millimetres. Layer CUT: the true part outline (not offset for the kerf); layer MARK: marks, not cut through; layer NOTE: this note, not cut."
		if p.ToolPath {
			layers = "Units: millimetres. Layer CUT: the true part outline (not offset for the kerf); layer TOOLPATH: the tool-centre path, offset by half the kerf; layer MARK: marks, not cut through; layer NOTE: this note, not cut."
		}
		comments := []string{
			fmt.Sprintf("coilwright %s: %s, %s", k.opt.Version, s.Kit, c.title),
			layers,
			c.label,
		}
		d, _ := withNote(c.drawing, c.drawing.Bounds(), p.Kerf, p.ToolPath)
		if err := writeDrawing(out, c.name, d, nil, version, comments); err != nil {
			return err
		}
		if s.Quantity > 1 {
			sheet := geom.Box2{Max: geom.Vec2{X: c.sheet.Width, Y: c.sheet.Height}}
			pd, frame := withNote(cut.PanelDrawing(c.drawing, c.nest), sheet, p.Kerf, p.ToolPath)
			pc := append(comments,
				fmt.Sprintf("Panel: sheet %g x %g mm, origin at its lower-left corner, margin %g mm, spacing %g mm; the note is printed below the sheet.", c.sheet.Width, c.sheet.Height, c.sheet.Margin, c.sheet.Spacing),
				fmt.Sprintf("%d parts per sheet; %d sheets for %d parts; this panel holds %d.", c.nest.PerSheet, c.nest.Sheets, s.Quantity, len(c.nest.Placements)))
			if err := writeDrawing(out, "panel-"+c.name, pd, &frame, version, pc); err != nil {
				return err
			}
		}
	}
	return out.Add("templates.pdf", func(w io.Writer) error {
		return pdf.WritePDF(w, k.templates, pdf.PDFOptions{Title: s.Kit + " cutting templates", Creator: k.creator(), Created: k.opt.Created})
	})
}

// creator is the PDF creator field: the tool and its version.
func (k *Kit) creator() string {
	if k.opt.Version == "" {
		return "coilwright"
	}
	return "coilwright " + k.opt.Version
}

// templateKerfNote says what the paper templates draw.
const templateKerfNote = "This template is the true part outline, with no kerf allowance: cut on the waste side of the line."

// templatePages lays out the 1:1 templates once: each part as designed (no
// kerf) with its notes and label. templates.pdf holds them and the build
// sheet ends with them.
func templatePages(d *parts.Design, cps []cutPart) ([]pdf.Page, error) {
	s := d.Spec
	tparts := make([]pdf.TemplatePart, len(cps))
	for i, c := range cps {
		tparts[i] = pdf.TemplatePart{Title: c.title, Notes: append(append([]string{}, c.notes...), c.paper, templateKerfNote), Drawing: c.nominal}
	}
	paper, err := pdf.PageSizeByName(s.Cutting.Paper)
	if err != nil {
		return nil, err
	}
	var warns []string
	if d.Patterns.LaserHalogen {
		warns = append(warns, parts.LaserHalogenWarning)
	}
	return pdf.TemplatePages(tparts, pdf.TemplateOptions{
		Page: paper, Heading: s.Kit + ": 1:1 templates (" + d.Coil.Hand.String() + "), print at 100 %", Warnings: warns,
	})
}

// writeDrawing writes name.dxf and name.svg for one drawing.
func writeDrawing(out Sink, name string, d geom.Drawing, frame *geom.Box2, version dxf.DXFVersion, comments []string) error {
	if err := out.Add(name+".dxf", func(w io.Writer) error {
		return dxf.WriteDXF(w, d, dxf.DXFOptions{Version: version, Comments: comments})
	}); err != nil {
		return err
	}
	return out.Add(name+".svg", func(w io.Writer) error {
		return svg.WriteSVG(w, d, svg.SVGOptions{Frame: frame, Title: comments[0], Comments: comments[1:]})
	})
}
