package kit

import (
	"fmt"
	"math"
	"strings"

	"coilwright/cam/geom"
	"coilwright/cam/pdf"
)

// Size of the build sheet's band figure in drawing units (it is fitted to
// the page): frequency across, VSWR 1 to bandFigVSWRMax up.
const (
	bandFigW       = 150.0
	bandFigH       = 50.0
	bandFigVSWRMax = 4.0
	bandFigHeight  = 60.0 // mm of page the figure may take
)

// bandFigure draws the VSWR the analyser should show: the curve over the
// plot range, the band shaded, the target line, with the band and the
// target given as dimensions and the axes in the caption.
func bandFigure(e *electrical) pdf.Figure {
	x := func(f float64) float64 { return (f - e.LowMHz) / (e.HighMHz - e.LowMHz) * bandFigW }
	y := func(v float64) float64 { return (math.Min(v, bandFigVSWRMax) - 1) / (bandFigVSWRMax - 1) * bandFigH }
	rect := func(x0, y0, x1, y1 float64) geom.Polyline {
		return geom.Polyline{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
	}
	var paths []pdf.FigurePath
	var dims []geom.Dimension
	if b := e.Band; b != nil {
		paths = append(paths, pdf.FigurePath{Points: rect(x(b.LowMHz), 0, x(b.HighMHz), bandFigH), Closed: true, Fill: true, FillGray: 0.12, Gray: 0.5})
		dims = append(dims, geom.Dimension{A: geom.Vec2{X: x(b.LowMHz), Y: bandFigH}, B: geom.Vec2{X: x(b.HighMHz), Y: bandFigH}, Offset: 6,
			Text: fmt.Sprintf("band %s–%s MHz", num(b.LowMHz), num(b.HighMHz))})
	}
	for v := 2.0; v < bandFigVSWRMax; v++ {
		paths = append(paths, pdf.FigurePath{Points: geom.Polyline{{X: 0, Y: y(v)}, {X: bandFigW, Y: y(v)}}, Gray: 0.2})
	}
	paths = append(paths, pdf.FigurePath{Points: rect(0, 0, bandFigW, bandFigH), Closed: true, Gray: 1},
		pdf.FigurePath{Points: geom.Polyline{{X: 0, Y: y(e.TargetVSWR)}, {X: bandFigW, Y: y(e.TargetVSWR)}}, StrokeMM: 0.6, Gray: 0.55})
	curve := make(geom.Polyline, len(e.FreqMHz))
	for i, f := range e.FreqMHz {
		curve[i] = geom.Vec2{X: x(f), Y: y(e.VSWR[i])}
	}
	paths = append(paths, pdf.FigurePath{Points: curve, StrokeMM: 0.8, Gray: 1})
	dims = append(dims,
		geom.Dimension{A: geom.Vec2{X: 0, Y: 0}, B: geom.Vec2{X: 0, Y: y(e.TargetVSWR)}, Offset: 6, Text: fmt.Sprintf("VSWR 1 to %.2f", e.TargetVSWR)},
		geom.Dimension{A: geom.Vec2{X: 0, Y: 0}, B: geom.Vec2{X: bandFigW, Y: 0}, Offset: -6, Text: fmt.Sprintf("%.0f to %.0f MHz", e.LowMHz, e.HighMHz)})
	return pdf.Figure{Paths: paths, Dimensions: dims, Height: bandFigHeight,
		Caption: fmt.Sprintf("What the analyser should show (%s): VSWR (thick line) against frequency from %.0f to %.0f MHz, VSWR 1 at the bottom to %s at the top, grid lines at VSWR 2 and 3; the grey line is the target, VSWR %.2f (return loss %.0f dB)%s.",
			strings.ToLower(e.Short[:1])+e.Short[1:], e.LowMHz, e.HighMHz, num(bandFigVSWRMax), e.TargetVSWR, -20*math.Log10((e.TargetVSWR-1)/(e.TargetVSWR+1)), bandCaption(e))}
}

// bandCaption names the shaded band for the figure's caption.
func bandCaption(e *electrical) string {
	if e.Band == nil {
		return "; the spec sets no band"
	}
	return fmt.Sprintf("; the band %s–%s MHz is shaded", num(e.Band.LowMHz), num(e.Band.HighMHz))
}

// withBandFigure returns blocks with fig placed after the last numbered
// step (the final check), before the page break that ends the steps. The
// steps are the groups headed "Step N."; without them fig goes last.
func withBandFigure(blocks []pdf.Block, fig pdf.Block) []pdf.Block {
	last := -1
	for i, b := range blocks {
		if g, ok := b.(pdf.Group); ok && len(g.Blocks) > 0 {
			if h, ok := g.Blocks[0].(pdf.Heading); ok && strings.HasPrefix(h.Text, "Step ") {
				last = i
			}
		}
	}
	at := len(blocks)
	if last >= 0 {
		for i := last + 1; i < len(blocks); i++ {
			if _, ok := blocks[i].(pdf.PageBreak); ok {
				at = i
				break
			}
		}
	}
	out := append(append(append([]pdf.Block{}, blocks[:at]...), fig), blocks[at:]...)
	return out
}
