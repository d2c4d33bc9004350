package kit

import (
	"math"

	"coilwright/cam/geom"
)

// labelPlacer places the dimension text of a view so that no two labels'
// boxes overlap and, where a free place exists, no label crosses a line of
// the drawing. A label's box is estimated from its height and number of
// characters (geom.Text.Bounds); the drawing's own text (a plate's kit
// name, the start angle) counts as placed labels.
type labelPlacer struct {
	boxes []geom.Box2    // the labels placed so far
	segs  [][2]geom.Vec2 // the drawing's lines, arcs and circles as chords
}

// newLabelPlacer collects the text boxes and line work of d, flattening
// curves to within tol mm.
func newLabelPlacer(d geom.Drawing, tol float64) *labelPlacer {
	p := &labelPlacer{}
	for _, l := range d.Layers {
		for _, e := range l.Entities {
			p.add(e, tol)
		}
	}
	return p
}

// add records one entity: a text's box, or a shape's chords.
func (p *labelPlacer) add(e geom.Entity, tol float64) {
	chain := func(pl geom.Polyline, closed bool) {
		for i := 1; i < len(pl); i++ {
			p.segs = append(p.segs, [2]geom.Vec2{pl[i-1], pl[i]})
		}
		if closed && len(pl) > 2 {
			p.segs = append(p.segs, [2]geom.Vec2{pl[len(pl)-1], pl[0]})
		}
	}
	switch e := e.(type) {
	case geom.Text:
		p.boxes = append(p.boxes, e.Bounds())
	case geom.Line:
		p.segs = append(p.segs, [2]geom.Vec2{e.A, e.B})
	case geom.Circle:
		chain(e.Flatten(tol), true)
	case geom.Arc:
		chain(e.Flatten(tol), false)
	case geom.Contour:
		chain(e.Flatten(tol), e.Closed)
	}
}

// place returns the first of cands whose box clears every placed label and
// every line; failing that, the first that clears the labels; failing
// that, the first. The chosen label's box is recorded.
func (p *labelPlacer) place(cands []geom.Text) geom.Text {
	pick, clearOfLabels := -1, -1
	for i, t := range cands {
		b := t.Bounds()
		if p.hitsLabel(b) {
			continue
		}
		if clearOfLabels < 0 {
			clearOfLabels = i
		}
		if !p.hitsLine(b) {
			pick = i
			break
		}
	}
	if pick < 0 {
		pick = max(clearOfLabels, 0)
	}
	p.boxes = append(p.boxes, cands[pick].Bounds())
	return cands[pick]
}

func (p *labelPlacer) hitsLabel(b geom.Box2) bool {
	for _, c := range p.boxes {
		if boxesOverlap(b, c) {
			return true
		}
	}
	return false
}

func (p *labelPlacer) hitsLine(b geom.Box2) bool {
	for _, s := range p.segs {
		if segmentHitsBox(s[0], s[1], b) {
			return true
		}
	}
	return false
}

// boxesOverlap reports whether two boxes share interior (touching edges do
// not count).
func boxesOverlap(a, b geom.Box2) bool {
	return a.Min.X < b.Max.X && b.Min.X < a.Max.X && a.Min.Y < b.Max.Y && b.Min.Y < a.Max.Y
}

// segmentHitsBox reports whether the segment pq passes through the box's
// interior: the segment clipped to the box's slabs (Liang–Barsky) keeps a
// part of positive length, or a point of it lies strictly inside.
func segmentHitsBox(p, q geom.Vec2, b geom.Box2) bool {
	t0, t1 := 0.0, 1.0
	d := q.Sub(p)
	for _, c := range [][3]float64{{-d.X, p.X - b.Min.X}, {d.X, b.Max.X - p.X}, {-d.Y, p.Y - b.Min.Y}, {d.Y, b.Max.Y - p.Y}} {
		den, num := c[0], c[1]
		if den == 0 {
			if num <= 0 {
				return false // parallel to this side and on or outside it
			}
			continue
		}
		t := num / den
		if den < 0 {
			t0 = math.Max(t0, t)
		} else {
			t1 = math.Min(t1, t)
		}
		if t0 >= t1 {
			return false
		}
	}
	return true
}

// dimensionLabels returns the places a dimension's text may take, best
// first: centred over its line when it fits between the ends, else beside
// either end; then the same moved clear of the line, to the other side of
// it and then farther out. a and b are the line's ends, ang the text's
// angle and n the side of the line the text reads from.
func dimensionLabels(dm geom.Dimension, a, b geom.Vec2, ang float64, n geom.Vec2, textH float64) []geom.Text {
	u := b.Sub(a)
	l := u.Len()
	u = u.Scale(1 / l)
	w := geom.Text{Height: textH, Value: dm.Text}.Bounds().Size().X
	beside := l/2 + w/2 + textH/2
	along := []float64{0, beside, -beside}
	if w+textH > l {
		along = []float64{beside, -beside, 0}
	}
	mid := a.Add(b).Scale(0.5)
	var out []geom.Text
	for _, off := range []float64{0.4, -1.65, 1.9, 3.4, 4.9, 6.4} {
		for _, s := range along {
			out = append(out, geom.Text{At: mid.Add(u.Scale(s)).Add(n.Scale(off * textH)), Height: textH, Angle: ang, Value: dm.Text, Align: geom.AlignCenter})
		}
	}
	return out
}
