// Paper templates: parts drawn at 1:1 on printable pages, for makers who
// cut with shears. Each page carries a heading, the part's title and
// notes, any warnings, and a 50 mm scale bar to check the print scale with
// a ruler. A part larger than the page's drawing area is tiled: each tile
// page shows a window of the part, windows overlapping by TileOverlap, with
// the window's frame drawn so the sheets can be trimmed and taped together.

package pdf

import (
	"fmt"
	"math"
	"strings"

	"github.com/tdewolff/canvas"

	"coilwright/cam/geom"
	"coilwright/cam/internal/font"
	"coilwright/cam/walk"
)

// Template layout constants, in mm.
const (
	// ScaleBarMM is the length of the scale bar on every template page.
	ScaleBarMM = 50.0
	// TileOverlap is how far neighbouring tiles of a large part overlap.
	TileOverlap = 10.0
	// templateMargin is the clear border of a template page; Common
	// practice (no published source): home printers leave 4–6 mm
	// unprinted.
	templateMargin = 12.0
	// scaleBarHeight is the thickness of the filled scale bar.
	scaleBarHeight = 2.0
	// footerHeight is the band at the bottom holding the scale bar.
	footerHeight = 16.0
)

// TemplatePart is one part for a paper template: its drawing (mm), a title
// and lines of notes printed above it.
type TemplatePart struct {
	Title   string
	Notes   []string
	Drawing geom.Drawing
}

// TemplateOptions tunes TemplatePages. The zero value prints on A4.
type TemplateOptions struct {
	// Page is the paper size; zero means A4.
	Page PageSize
	// Heading is printed at the top of every page.
	Heading string
	// Warnings are printed in red on every page under the heading.
	Warnings []string
}

// ScaleBarOrigin returns the lower-left corner in mm (page coordinates from
// the page's lower-left corner, y up) of the filled scale bar on every
// template page.
func ScaleBarOrigin() geom.Vec2 {
	return geom.Vec2{X: templateMargin, Y: templateMargin + 6}
}

// TemplatePages lays the parts out at 1:1, one part per page or, for a
// part too large for the page, one page per tile. Text is set in the
// embedded Go Regular font.
func TemplatePages(parts []TemplatePart, opt TemplateOptions) ([]Page, error) {
	if opt.Page.Width == 0 {
		opt.Page = PageA4()
	}
	fam, err := font.Family()
	if err != nil {
		return nil, err
	}
	var pages []Page
	for _, part := range parts {
		d, err := walk.Prepare(part.Drawing)
		if err != nil {
			return nil, err
		}
		b := d.Bounds()
		if b.IsEmpty() {
			return nil, fmt.Errorf("template part %q is empty", part.Title)
		}
		// Header lines: heading, title, notes, warnings, each wrapped to
		// the page's printable width; 5 mm each.
		textW := opt.Page.Width - 2*templateMargin
		notes := wrapLines(fam.Face(noteSizePt, canvas.Black), part.Notes, textW)
		warns := wrapLines(fam.Face(noteSizePt, canvas.Red), opt.Warnings, textW)
		lines := 2 + len(notes) + len(warns)
		area := geom.Box2{
			Min: geom.Vec2{X: templateMargin, Y: templateMargin + footerHeight},
			Max: geom.Vec2{X: opt.Page.Width - templateMargin, Y: opt.Page.Height - templateMargin - 5*float64(lines) - 4},
		}
		if area.Size().X <= 2*TileOverlap || area.Size().Y <= 2*TileOverlap {
			return nil, fmt.Errorf("%d header lines leave no room to draw on a %s page", lines, opt.Page.Name)
		}
		size, room := b.Size(), area.Size()
		cols := tileCount(size.X, room.X)
		rows := tileCount(size.Y, room.Y)
		for r := range rows {
			for c := range cols {
				page := newPage(opt.Page)
				ctx := canvas.NewContext(page)
				title := part.Title
				// Window of the part shown on this tile, in drawing mm.
				win := b
				if rows*cols > 1 {
					title = fmt.Sprintf("%s: tile row %d of %d, column %d of %d (overlap %.0f mm)", part.Title, r+1, rows, c+1, cols, TileOverlap)
					step := room.Sub(geom.Vec2{X: TileOverlap, Y: TileOverlap})
					lo := geom.Vec2{X: b.Min.X + float64(c)*step.X, Y: b.Max.Y - room.Y - float64(r)*step.Y}
					win = geom.Box2{Min: lo, Max: lo.Add(room)}
				}
				// Offset maps drawing mm to page mm: a single page centres the
				// part in the area; a tile puts its window on the area.
				var off geom.Vec2
				if rows*cols == 1 {
					off = area.Center().Sub(b.Center())
				} else {
					off = area.Min.Sub(win.Min)
					ctx.SetStrokeColor(canvas.Gray)
					ctx.SetFill(nil)
					ctx.SetStrokeWidth(0.2)
					ctx.SetDashes(0, 2, 2)
					ctx.DrawPath(area.Min.X, area.Min.Y, canvas.Rectangle(room.X, room.Y))
					ctx.SetDashes(0)
				}
				clip := (*geom.Box2)(nil)
				if rows*cols > 1 {
					clip = &win
				}
				if err := drawOnPage(ctx, d, off, clip); err != nil {
					return nil, fmt.Errorf("template part %q: %w", part.Title, err)
				}
				y := opt.Page.Height - templateMargin - 5
				text := func(s string, pt float64, col any) {
					ctx.DrawText(templateMargin, y, canvas.NewTextLine(fam.Face(pt, col), s, canvas.Left))
					y -= 5
				}
				text(opt.Heading, 12, canvas.Black)
				text(title, 10, canvas.Black)
				for _, n := range notes {
					text(n, noteSizePt, canvas.Black)
				}
				for _, w := range warns {
					text(w, noteSizePt, canvas.Red)
				}
				drawScaleBar(ctx, fam)
				pages = append(pages, Page{page})
			}
		}
	}
	return pages, nil
}

// noteSizePt is the size of a template page's notes and warnings, points.
const noteSizePt = 8.5

// wrapLines breaks each of ss into lines no wider than width mm set in
// face, at spaces; a single word wider than width stays on its own line.
func wrapLines(face *canvas.FontFace, ss []string, width float64) []string {
	var out []string
	for _, s := range ss {
		line := ""
		for _, w := range strings.Fields(s) {
			try := w
			if line != "" {
				try = line + " " + w
			}
			if line != "" && face.TextWidth(try) > width {
				out = append(out, line)
				try = w
			}
			line = try
		}
		out = append(out, line)
	}
	return out
}

// tileCount returns how many windows of length room, overlapping by
// TileOverlap, cover a length of size.
func tileCount(size, room float64) int {
	if size <= room {
		return 1
	}
	return int(math.Ceil((size - TileOverlap) / (room - TileOverlap)))
}

// drawOnPage strokes every entity of d moved by off: CUT black and
// 0.3 mm wide, other layers blue and 0.15 mm. With clip set, only the parts
// inside that window (drawing mm) are drawn, as chords within
// TextTolerance of the curves.
func drawOnPage(ctx *canvas.Context, d geom.Drawing, off geom.Vec2, clip *geom.Box2) error {
	ctx.SetFill(nil)
	for _, l := range d.Layers {
		if l.Name == "CUT" {
			ctx.SetStrokeColor(canvas.Black)
			ctx.SetStrokeWidth(0.3)
		} else {
			ctx.SetStrokeColor(canvas.Blue)
			ctx.SetStrokeWidth(0.15)
		}
		if err := walk.Layer(l, pageShapes{ctx: ctx, off: off, clip: clip}); err != nil {
			return err
		}
	}
	return nil
}

// pageShapes strokes each shape on a page with the context's current
// stroke, moved by off and clipped to clip when it is set.
type pageShapes struct {
	ctx  *canvas.Context
	off  geom.Vec2
	clip *geom.Box2
}

// draw strokes p, given in drawing coordinates.
func (s pageShapes) draw(p *canvas.Path) error {
	if s.clip != nil {
		p = clipPath(p, *s.clip)
	}
	s.ctx.DrawPath(s.off.X, s.off.Y, p)
	return nil
}

const deg = 180 / math.Pi

// Circle strokes a circle.
func (s pageShapes) Circle(_ string, e geom.Circle) error {
	return s.draw(canvas.Circle(e.Radius).Translate(e.Center.X, e.Center.Y))
}

// Arc strokes an arc.
func (s pageShapes) Arc(_ string, e geom.Arc) error {
	p := &canvas.Path{}
	st := e.Point(e.Start)
	p.MoveTo(st.X, st.Y)
	p.Arc(e.Radius, e.Radius, 0, e.Start*deg, e.End*deg)
	return s.draw(p)
}

// Line strokes a line.
func (s pageShapes) Line(_ string, e geom.Line) error {
	p := &canvas.Path{}
	p.MoveTo(e.A.X, e.A.Y)
	p.LineTo(e.B.X, e.B.Y)
	return s.draw(p)
}

// Contour strokes a contour of lines and bulge arcs.
func (s pageShapes) Contour(_ string, e geom.Contour) error {
	p := &canvas.Path{}
	p.MoveTo(e.Vertices[0].P.X, e.Vertices[0].P.Y)
	for i := range e.Segments() {
		a, q, bulge := e.Segment(i)
		if bulge == 0 {
			p.LineTo(q.X, q.Y)
			continue
		}
		arc := geom.BulgeArc(a, q, bulge)
		if bulge > 0 {
			p.Arc(arc.Radius, arc.Radius, 0, arc.Start*deg, arc.End*deg)
		} else {
			p.Arc(arc.Radius, arc.Radius, 0, arc.End*deg, arc.Start*deg)
		}
	}
	if e.Closed {
		p.Close()
	}
	return s.draw(p)
}

// drawScaleBar draws the filled ScaleBarMM bar with end ticks and its
// label at ScaleBarOrigin.
func drawScaleBar(ctx *canvas.Context, fam *canvas.FontFamily) {
	o := ScaleBarOrigin()
	ctx.SetStroke(nil)
	ctx.SetFillColor(canvas.Black)
	ctx.DrawPath(o.X, o.Y, canvas.Rectangle(ScaleBarMM, scaleBarHeight))
	ctx.SetFill(nil)
	ctx.SetStrokeColor(canvas.Black)
	ctx.SetStrokeWidth(0.2)
	for _, x := range []float64{0, ScaleBarMM} {
		tick := &canvas.Path{}
		tick.MoveTo(0, -2)
		tick.LineTo(0, scaleBarHeight+2)
		ctx.DrawPath(o.X+x, o.Y, tick)
	}
	label := fmt.Sprintf("%.0f mm: print at 100 %% (no fit to page) and check this bar with a ruler before cutting", ScaleBarMM)
	ctx.DrawText(o.X, o.Y-6, canvas.NewTextLine(fam.Face(8, canvas.Black), label, canvas.Left))
}

// clipPath returns the parts of p inside the box b, as straight segments.
func clipPath(p *canvas.Path, b geom.Box2) *canvas.Path {
	out := &canvas.Path{}
	for _, sub := range p.Flatten(walk.TextTolerance).Split() {
		pts := sub.Coords()
		for i := 1; i < len(pts); i++ {
			a := geom.Vec2{X: pts[i-1].X, Y: pts[i-1].Y}
			c := geom.Vec2{X: pts[i].X, Y: pts[i].Y}
			if ca, cc, ok := clipSegment(a, c, b); ok {
				out.MoveTo(ca.X, ca.Y)
				out.LineTo(cc.X, cc.Y)
			}
		}
	}
	return out
}

// clipSegment clips the segment a–c to the box b (Liang–Barsky) and
// reports whether any of it remains.
// Source: Liang & Barsky, "A new concept and method for line clipping",
// ACM Transactions on Graphics 3(1), 1984.
func clipSegment(a, c geom.Vec2, b geom.Box2) (geom.Vec2, geom.Vec2, bool) {
	d := c.Sub(a)
	t0, t1 := 0.0, 1.0
	for _, pq := range [4][2]float64{
		{-d.X, a.X - b.Min.X}, {d.X, b.Max.X - a.X},
		{-d.Y, a.Y - b.Min.Y}, {d.Y, b.Max.Y - a.Y},
	} {
		p, q := pq[0], pq[1]
		if p == 0 {
			if q < 0 {
				return a, c, false
			}
			continue
		}
		t := q / p
		if p < 0 {
			t0 = math.Max(t0, t)
		} else {
			t1 = math.Min(t1, t)
		}
	}
	if t0 > t1 {
		return a, c, false
	}
	return a.Add(d.Scale(t0)), a.Add(d.Scale(t1)), true
}
