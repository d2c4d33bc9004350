// Flowing documents: headings, paragraphs, lists, tables and figures set
// top to bottom on pages of one size.
//
// Layout is a single pass. Each block is measured at the text width (text
// wraps with the canvas line breaker); a block that does not fit the room
// left on the page starts a new page, and a heading also starts a new page
// when less than HeadingKeep mm would remain below it, so it stays with
// what follows. Tables break between rows and repeat their header row on
// each new page. After layout, every page gets a footer with the running
// title and "page n of m". Text is set in the embedded Go fonts, so the
// PDF embeds them and every machine sets the same lines.

package pdf

import (
	"fmt"
	"image/color"
	"math"

	"github.com/tdewolff/canvas"

	"coilwright/cam/geom"
	"coilwright/cam/internal/font"
)

// Document is a flowing document printed on pages of Page (zero: A4).
// Footer is printed at the bottom of every page with its page number;
// TrailingPages counts pages that will follow the document in the same
// file (templates, say), so the numbers read "page n of all".
type Document struct {
	Page          PageSize
	Footer        string
	TrailingPages int
	Blocks        []Block
}

// Block is one element of a Document: Heading, Paragraph, List, Table,
// Figure, PageBreak or Group.
type Block interface{ block() }

// Heading is a title (Level 1), a section (2) or a subsection (3).
type Heading struct {
	Text  string
	Level int
}

// Paragraph is wrapped text. Lead, when set, is printed bold before Text.
// Boxed draws it on a tinted panel with a rule at its left, for cautions
// and checks. Size is the font size in points (zero: BodyPt).
type Paragraph struct {
	Lead  string
	Text  string
	Boxed bool
	Size  float64
}

// List is a bulleted list of wrapped items.
type List struct{ Items []string }

// Table is a grid of wrapped cells. Widths are the column widths as
// shares of the text width (they are scaled to fill it); Right marks
// columns set flush right. Header, when set, is bold and repeated on every
// page the table runs onto. MinRowMM is the least row height, for columns
// left blank to write in.
type Table struct {
	Widths   []float64
	Right    []bool
	Header   []string
	Rows     [][]string
	MinRowMM float64
}

// Figure is a drawing scaled to fit the text width and at most Height mm
// tall, with its outlines, dimensions and a caption. Drawing units are mm;
// y points up.
type Figure struct {
	Paths      []FigurePath
	Dimensions []geom.Dimension
	Height     float64
	Caption    string
	// Labels are short texts placed at points of the drawing.
	Labels []FigureLabel
}

// FigureLabel is a text at a drawing point: At is the left end of its
// baseline, the centre with Center set, or the right end with Right set.
// Size is in points (zero: 8); Bold sets it in bold.
type FigureLabel struct {
	At     geom.Vec2
	Text   string
	Size   float64
	Bold   bool
	Center bool
	Right  bool
}

// FigurePath is one outline of a Figure: a polyline, closed or open,
// stroked StrokeMM wide in drawing units (so it scales with the figure;
// zero draws a hairline) in Gray (0 black, 1 white), and filled with
// FillGray when Fill is set.
type FigurePath struct {
	Points   geom.Polyline
	Closed   bool
	StrokeMM float64
	Gray     float64
	Fill     bool
	FillGray float64
	// Dash is the dash and gap length in page mm; zero draws solid.
	Dash float64
}

// PageBreak starts a new page.
type PageBreak struct{}

// Group keeps its blocks on one page: when they do not fit the room left
// but fit a page, they start a new page. A group taller than a page flows
// like its blocks would.
type Group struct{ Blocks []Block }

func (Heading) block()   {}
func (Paragraph) block() {}
func (List) block()      {}
func (Table) block()     {}
func (Figure) block()    {}
func (PageBreak) block() {}
func (Group) block()     {}

// Layout constants, mm unless named in points.
const (
	// BodyPt is the body text size in points.
	BodyPt = 10.0
	// HeadingKeep is the least room left under a heading for it to stay
	// on its page.
	HeadingKeep = 40.0
	docMargin   = 18.0
	docBottom   = 20.0
	blockGap    = 3.0
	cellPad     = 1.4
	hairline    = 0.2
)

// layout is the state of a document being set.
type layout struct {
	doc   *Document
	fam   *canvas.FontFamily
	pages []*canvas.Canvas
	ctx   *canvas.Context
	y     float64 // top of the free room on the current page
	width float64 // text width
}

// Pages sets the document and returns its pages, ready for WritePDF. It
// fails when a single block is taller than a page.
func (d Document) Pages() ([]Page, error) {
	if d.Page.Width == 0 {
		d.Page = PageA4()
	}
	fam, err := font.Family()
	if err != nil {
		return nil, err
	}
	l := &layout{doc: &d, fam: fam, width: d.Page.Width - 2*docMargin}
	l.newPage()
	for i, b := range d.Blocks {
		if err := l.place(b); err != nil {
			return nil, fmt.Errorf("document block %d: %w", i+1, err)
		}
	}
	for i, p := range l.pages {
		ctx := canvas.NewContext(p)
		face := fam.Face(8, canvas.Gray)
		ctx.DrawText(docMargin, docBottom/2, canvas.NewTextLine(face, d.Footer, canvas.Left))
		ctx.DrawText(d.Page.Width-docMargin, docBottom/2, canvas.NewTextLine(face, fmt.Sprintf("page %d of %d", i+1, len(l.pages)+d.TrailingPages), canvas.Right))
	}
	out := make([]Page, len(l.pages))
	for i, p := range l.pages {
		out[i] = Page{p}
	}
	return out, nil
}

func (l *layout) newPage() {
	p := newPage(l.doc.Page)
	l.pages = append(l.pages, p)
	l.ctx = canvas.NewContext(p)
	l.y = l.doc.Page.Height - docMargin
}

// room returns the height left on the current page.
func (l *layout) room() float64 { return l.y - docBottom }

// fresh reports whether nothing has been set on the current page.
func (l *layout) fresh() bool { return l.y == l.doc.Page.Height-docMargin }

// need starts a new page unless h mm fit; it fails when h exceeds a whole
// page.
func (l *layout) need(h float64) error {
	if h <= l.room() {
		return nil
	}
	if full := l.doc.Page.Height - docMargin - docBottom; h > full {
		return fmt.Errorf("%.0f mm tall, more than the %.0f mm a page holds", h, full)
	}
	l.newPage()
	return nil
}

func (l *layout) face(pt float64, bold bool) *canvas.FontFace {
	if bold {
		return l.fam.Face(pt, canvas.Black, canvas.FontBold)
	}
	return l.fam.Face(pt, canvas.Black)
}

// textBox wraps s (with an optional bold lead) to width mm.
func (l *layout) textBox(lead, s string, pt float64, width float64, halign canvas.TextAlign) *canvas.Text {
	rt := canvas.NewRichText(l.face(pt, false))
	if lead != "" {
		rt.WriteFace(l.face(pt, true), lead+" ")
	}
	rt.WriteString(s)
	return rt.ToText(width, 0, halign, canvas.Top, nil)
}

// height returns the height of a text box from its top to the bottom of
// its last line, mm.
func height(t *canvas.Text) float64 {
	_, bottom := t.Heights()
	return bottom
}

func (l *layout) place(b Block) error {
	switch b := b.(type) {
	case PageBreak:
		if !l.fresh() {
			l.newPage()
		}
	case Heading:
		pt, gap := map[int]float64{1: 22, 2: 15, 3: 11.5}[b.Level], 2.0
		if pt == 0 {
			return fmt.Errorf("heading level %d: use 1, 2 or 3", b.Level)
		}
		t := canvas.NewTextBox(l.face(pt, true), b.Text, l.width, 0, canvas.Left, canvas.Top, nil)
		h := height(t)
		if b.Level < 3 {
			gap = 4
		}
		if !l.fresh() && h+gap+HeadingKeep > l.room() {
			l.newPage()
		}
		if !l.fresh() {
			l.y -= gap
		}
		l.ctx.DrawText(docMargin, l.y, t)
		l.y -= h + gap
		if b.Level == 2 {
			l.rule(l.y+gap/2, 0.4)
		}
	case Paragraph:
		pt := b.Size
		if pt == 0 {
			pt = BodyPt
		}
		inset := 0.0
		if b.Boxed {
			inset = 4
		}
		t := l.textBox(b.Lead, b.Text, pt, l.width-2*inset, canvas.Left)
		h := height(t) + 2*inset*0.6
		if err := l.need(h); err != nil {
			return err
		}
		if b.Boxed {
			l.ctx.SetStroke(nil)
			l.ctx.SetFillColor(color.RGBA{0xfd, 0xf1, 0xd8, 0xff})
			l.ctx.DrawPath(docMargin, l.y-h, canvas.Rectangle(l.width, h))
			l.ctx.SetFillColor(color.RGBA{0xd0, 0x80, 0x00, 0xff})
			l.ctx.DrawPath(docMargin, l.y-h, canvas.Rectangle(1.2, h))
		}
		l.ctx.DrawText(docMargin+inset, l.y-inset*0.6, t)
		l.y -= h + blockGap
	case List:
		for _, it := range b.Items {
			t := l.textBox("", it, BodyPt, l.width-5, canvas.Left)
			h := height(t)
			if err := l.need(h); err != nil {
				return err
			}
			l.ctx.DrawText(docMargin+1, l.y, canvas.NewTextBox(l.face(BodyPt, false), "•", 4, 0, canvas.Left, canvas.Top, nil))
			l.ctx.DrawText(docMargin+5, l.y, t)
			l.y -= h + 1.2
		}
		l.y -= blockGap - 1.2
	case Group:
		h, err := l.measure(b.Blocks)
		if err != nil {
			return err
		}
		if h > l.room() && h <= l.doc.Page.Height-docMargin-docBottom && !l.fresh() {
			l.newPage()
		}
		for _, x := range b.Blocks {
			if err := l.place(x); err != nil {
				return err
			}
		}
	case Table:
		return l.table(b)
	case Figure:
		return l.figure(b)
	default:
		return fmt.Errorf("unknown block %T", b)
	}
	return nil
}

// measure returns the height the blocks take when set from the top of a
// page, by setting them on a scratch page tall enough for any group.
func (l *layout) measure(bs []Block) (float64, error) {
	tall := *l.doc
	tall.Page.Height = 100 * l.doc.Page.Height
	m := &layout{doc: &tall, fam: l.fam, width: l.width}
	m.newPage()
	top := m.y
	for _, b := range bs {
		if err := m.place(b); err != nil {
			return 0, err
		}
	}
	return top - m.y, nil
}

// rule draws a horizontal line across the text width at y.
func (l *layout) rule(y, w float64) {
	l.ctx.SetFill(nil)
	l.ctx.SetStrokeColor(canvas.Black)
	l.ctx.SetStrokeWidth(w)
	l.ctx.DrawPath(docMargin, y, canvas.Line(l.width, 0))
}

func (l *layout) table(t Table) error {
	n := len(t.Widths)
	if n == 0 {
		return fmt.Errorf("table has no columns")
	}
	total := 0.0
	for _, w := range t.Widths {
		total += w
	}
	widths := make([]float64, n)
	for i, w := range t.Widths {
		widths[i] = w / total * l.width
	}
	set := func(cells []string, bold bool) ([]*canvas.Text, float64) {
		texts := make([]*canvas.Text, n)
		h := t.MinRowMM
		for i := range n {
			s := ""
			if i < len(cells) {
				s = cells[i]
			}
			align := canvas.Left
			if i < len(t.Right) && t.Right[i] {
				align = canvas.Right
			}
			face := l.face(BodyPt-1, bold)
			texts[i] = canvas.NewTextBox(face, s, widths[i]-2*cellPad, 0, align, canvas.Top, nil)
			h = math.Max(h, height(texts[i])+2*cellPad)
		}
		return texts, h
	}
	draw := func(texts []*canvas.Text, h float64, shade bool) {
		if shade {
			l.ctx.SetStroke(nil)
			l.ctx.SetFillColor(color.RGBA{0xe8, 0xe8, 0xe8, 0xff})
			l.ctx.DrawPath(docMargin, l.y-h, canvas.Rectangle(l.width, h))
		}
		x := docMargin
		for i, tx := range texts {
			l.ctx.DrawText(x+cellPad, l.y-cellPad, tx)
			x += widths[i]
		}
		l.ctx.SetFill(nil)
		l.ctx.SetStrokeColor(canvas.Gray)
		l.ctx.SetStrokeWidth(hairline)
		l.ctx.DrawPath(docMargin, l.y-h, canvas.Line(l.width, 0))
		l.y -= h
	}
	var head []*canvas.Text
	var headH float64
	if len(t.Header) > 0 {
		head, headH = set(t.Header, true)
	}
	first := true
	for _, row := range t.Rows {
		texts, h := set(row, false)
		if first || h > l.room() {
			if err := l.need(headH + h); err != nil {
				return err
			}
			if head != nil {
				draw(head, headH, true)
			}
			first = false
		}
		draw(texts, h, false)
	}
	l.y -= blockGap
	return nil
}

func (l *layout) figure(f Figure) error {
	box := geom.EmptyBox2()
	for _, p := range f.Paths {
		for _, v := range p.Points {
			box = box.Extend(v)
		}
	}
	for _, d := range f.Dimensions {
		a, b := d.Line()
		box = box.Extend(a).Extend(b)
	}
	for _, lb := range f.Labels {
		box = box.Extend(lb.At)
	}
	if box.IsEmpty() {
		return fmt.Errorf("figure is empty")
	}
	// Leave room round the drawing for dimension text.
	const pad = 12.0
	size := box.Size()
	scale := math.Min((l.width-2*pad)/size.X, (f.Height-2*pad)/size.Y)
	capt := l.textBox("", f.Caption, BodyPt-1, l.width, canvas.Left)
	h := size.Y*scale + 2*pad + height(capt) + 2
	if err := l.need(h); err != nil {
		return err
	}
	// Map drawing mm to page mm, centred across the text width.
	ox := docMargin + (l.width-size.X*scale)/2 - box.Min.X*scale
	oy := l.y - pad - size.Y*scale - box.Min.Y*scale
	at := func(v geom.Vec2) (float64, float64) { return ox + v.X*scale, oy + v.Y*scale }
	for _, p := range f.Paths {
		path := &canvas.Path{}
		for i, v := range p.Points {
			x, y := at(v)
			if i == 0 {
				path.MoveTo(x, y)
			} else {
				path.LineTo(x, y)
			}
		}
		if p.Closed {
			path.Close()
		}
		g := uint8(255 * (1 - math.Min(math.Max(p.Gray, 0), 1)))
		l.ctx.SetStroke(nil)
		l.ctx.SetFill(nil)
		if p.Fill {
			fg := uint8(255 * (1 - math.Min(math.Max(p.FillGray, 0), 1)))
			l.ctx.SetFillColor(color.RGBA{fg, fg, fg, 0xff})
		}
		l.ctx.SetStrokeColor(color.RGBA{g, g, g, 0xff})
		l.ctx.SetStrokeWidth(math.Max(p.StrokeMM*scale, hairline))
		l.ctx.SetStrokeCapper(canvas.RoundCap)
		l.ctx.SetStrokeJoiner(canvas.RoundJoin)
		if p.Dash > 0 {
			l.ctx.SetDashes(0, p.Dash, p.Dash)
		}
		l.ctx.DrawPath(0, 0, path)
		l.ctx.SetDashes(0)
	}
	for _, d := range f.Dimensions {
		l.dimension(d, at)
	}
	for _, lb := range f.Labels {
		pt := lb.Size
		if pt == 0 {
			pt = 8
		}
		align := canvas.Left
		switch {
		case lb.Center:
			align = canvas.Center
		case lb.Right:
			align = canvas.Right
		}
		x, y := at(lb.At)
		l.ctx.DrawText(x, y, canvas.NewTextLine(l.face(pt, lb.Bold), lb.Text, align))
	}
	l.ctx.DrawText(docMargin, l.y-h+height(capt)+1, capt)
	l.y -= h + blockGap
	return nil
}

// dimension draws a linear dimension: extension lines from the measured
// points, the dimension line with arrowheads, and its text above the line
// (left of it for an upright line), turned to read along it.
func (l *layout) dimension(d geom.Dimension, at func(geom.Vec2) (float64, float64)) {
	blue := color.RGBA{0x10, 0x40, 0xa0, 0xff}
	a, b := d.Line()
	ax, ay := at(d.A)
	bx, by := at(d.B)
	pax, pay := at(a)
	pbx, pby := at(b)
	l.ctx.SetFill(nil)
	l.ctx.SetStrokeColor(blue)
	l.ctx.SetStrokeWidth(0.15)
	for _, e := range [][4]float64{{ax, ay, pax, pay}, {bx, by, pbx, pby}} {
		dx, dy := e[2]-e[0], e[3]-e[1]
		if n := math.Hypot(dx, dy); n > 0 {
			// extend 1.5 mm past the dimension line
			e[2] += dx / n * 1.5
			e[3] += dy / n * 1.5
		}
		l.ctx.DrawPath(0, 0, canvas.Line(e[2]-e[0], e[3]-e[1]).Translate(e[0], e[1]))
	}
	l.ctx.DrawPath(0, 0, canvas.Line(pbx-pax, pby-pay).Translate(pax, pay))
	ang := math.Atan2(pby-pay, pbx-pax)
	l.ctx.SetStroke(nil)
	l.ctx.SetFillColor(blue)
	for _, end := range []struct{ x, y, a float64 }{{pax, pay, ang}, {pbx, pby, ang + math.Pi}} {
		arrow := &canvas.Path{}
		arrow.MoveTo(0, 0)
		arrow.LineTo(2.2, 0.7)
		arrow.LineTo(2.2, -0.7)
		arrow.Close()
		l.ctx.DrawPath(end.x, end.y, arrow.Transform(canvas.Identity.Rotate(end.a*180/math.Pi)))
	}
	t := canvas.NewTextLine(l.fam.Face(8, blue), d.Text, canvas.Center)
	mx, my := (pax+pbx)/2, (pay+pby)/2
	if w := t.Bounds().W(); math.Hypot(pbx-pax, pby-pay) < w+4 {
		// Too short to write along: write it level, past the right end of
		// a level line, or beside the middle of an upright one on the side
		// away from the measured points.
		face := l.fam.Face(8, blue)
		switch {
		case math.Abs(pby-pay) < math.Abs(pbx-pax):
			l.ctx.DrawText(math.Max(pax, pbx)+2.5, my-1, canvas.NewTextLine(face, d.Text, canvas.Left))
		case mx < (ax+bx)/2:
			l.ctx.DrawText(mx-2, my-1, canvas.NewTextLine(face, d.Text, canvas.Right))
		default:
			l.ctx.DrawText(mx+2, my-1, canvas.NewTextLine(face, d.Text, canvas.Left))
		}
		return
	}
	// Text reads left to right or bottom to top.
	ta := ang
	if ta > math.Pi/2+1e-9 || ta < -math.Pi/2+1e-9 {
		ta += math.Pi
	}
	nx, ny := -math.Sin(ta)*1.0, math.Cos(ta)*1.0
	l.ctx.Push()
	l.ctx.ComposeView(canvas.Identity.Translate(mx+nx, my+ny).Rotate(ta * 180 / math.Pi))
	l.ctx.DrawText(0, 0, t)
	l.ctx.Pop()
}
