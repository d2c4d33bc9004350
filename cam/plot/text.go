// Outlined text: labels are laid out with the embedded Go fonts and written
// as filled outlines, so no viewer substitutes a font of its own.

package plot

import (
	"fmt"
	"strings"
	"sync"

	"github.com/tdewolff/canvas"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goregular"
)

// Text heights: the height in mm of a capital letter.
const (
	labelCapMM = 2.2 // tick labels, legend, notes (about 9 pt type)
	axisCapMM  = 2.4 // axis titles
	titleCapMM = 3.0 // plot title (bold)
)

// fonts loads the embedded regular and bold faces once.
var fonts = sync.OnceValues(func() (*canvas.FontFamily, error) {
	f := canvas.NewFontFamily("Go")
	if err := f.LoadFont(goregular.TTF, 0, canvas.FontRegular); err != nil {
		return nil, fmt.Errorf("plot: loading the embedded regular font: %w", err)
	}
	if err := f.LoadFont(gobold.TTF, 0, canvas.FontBold); err != nil {
		return nil, fmt.Errorf("plot: loading the embedded bold font: %w", err)
	}
	return f, nil
})

// anchor is where a label's reference point sits along its width.
type anchor int

const (
	alignStart anchor = iota
	alignMiddle
	alignEnd
)

// label is one line of text to draw: its words, its cap height in mm, its
// weight, the reference point (baseline, SVG coordinates, y down), the
// anchor along the baseline, and a rotation in quarter turns
// anticlockwise on the page (0 or 1).
type label struct {
	text   string
	capMM  float64
	bold   bool
	x, y   float64
	anchor anchor
	upward bool // rotated a quarter turn anticlockwise, reading bottom to top
}

// face returns the face whose capitals are capMM tall.
func face(capMM float64, bold bool) (*canvas.FontFace, error) {
	fam, err := fonts()
	if err != nil {
		return nil, err
	}
	style := canvas.FontRegular
	if bold {
		style = canvas.FontBold
	}
	probe := fam.Face(100, canvas.Black, style)
	ch := probe.Metrics().CapHeight
	if !(ch > 0) {
		return nil, fmt.Errorf("plot: the embedded font has no cap height")
	}
	return fam.Face(100*capMM/ch, canvas.Black, style), nil
}

// textWidth returns the advance width in mm of s set at capMM.
func textWidth(s string, capMM float64, bold bool) (float64, error) {
	f, err := face(capMM, bold)
	if err != nil {
		return 0, err
	}
	return f.TextWidth(s), nil
}

// outline returns the SVG path data of l's letters in SVG coordinates.
func outline(l label) (string, error) {
	f, err := face(l.capMM, l.bold)
	if err != nil {
		return "", err
	}
	p, width, err := f.ToPath(l.text)
	if err != nil {
		return "", fmt.Errorf("plot: outlining %q: %w", l.text, err)
	}
	dx := 0.0
	switch l.anchor {
	case alignMiddle:
		dx = -width / 2
	case alignEnd:
		dx = -width
	}
	// Glyphs come y up; flip them onto the page (y down) about the
	// baseline, then rotate and place.
	m := canvas.Identity.Translate(l.x, l.y)
	if l.upward {
		m = m.Rotate(-90)
	}
	m = m.ReflectY().Translate(dx, 0)
	return pathData(p.Transform(m)), nil
}

// pathData writes p as SVG path data with coordinates rounded to 0.01 mm.
func pathData(p *canvas.Path) string {
	var b strings.Builder
	for s := p.Scanner(); s.Scan(); {
		e := s.End()
		switch s.Cmd() {
		case canvas.MoveToCmd:
			b.WriteString("M" + num(e.X) + " " + num(e.Y))
		case canvas.LineToCmd:
			b.WriteString("L" + num(e.X) + " " + num(e.Y))
		case canvas.QuadToCmd:
			c := s.CP1()
			b.WriteString("Q" + num(c.X) + " " + num(c.Y) + " " + num(e.X) + " " + num(e.Y))
		case canvas.CubeToCmd:
			c1, c2 := s.CP1(), s.CP2()
			b.WriteString("C" + num(c1.X) + " " + num(c1.Y) + " " + num(c2.X) + " " + num(c2.Y) + " " + num(e.X) + " " + num(e.Y))
		case canvas.ArcToCmd:
			// Glyph outlines hold no arcs; flatten any that appear.
			for _, q := range s.Path().Flatten(0.01).Coords()[1:] {
				b.WriteString("L" + num(q.X) + " " + num(q.Y))
			}
		case canvas.CloseCmd:
			b.WriteString("Z")
		}
	}
	return b.String()
}
