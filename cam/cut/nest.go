// Batch nesting: how many copies of a part fit on a sheet and where.
//
// Discs are packed on a hexagonal lattice (rows a pitch p = D + spacing
// apart along the row and p·√3/2 between rows, alternate rows shifted by
// p/2), the densest packing of equal circles, tried with rows along either
// side of the sheet and against a square grid.
//
// Other parts are packed as polygons on a lattice. A unit is one part, or,
// when interlocking, a part and a copy turned half a turn, slid against it
// as close as the spacing allows. The unit is then repeated: first along a
// row (the shortest shift that clears every copy), then row on row (the
// shortest shift for each of a few sideways offsets). Each slide walks in
// coarse steps from a clear position until copies collide, then bisects;
// clearance is tested exactly between polygon edges, so a layout is
// valid whatever the shape. A few base angles are tried and the layout
// holding the most parts wins. Every layout is checked pair by pair before
// it is returned.

package cut

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
)

// Sheet is the stock a panel is cut from. Lengths are mm.
type Sheet struct {
	Width, Height float64
	// Margin is the clear border left round the sheet's edge.
	Margin float64
	// Spacing is the least clear distance between the cut paths of
	// neighbouring parts.
	Spacing float64
}

// validate checks the sheet leaves room to place anything.
func (s Sheet) validate() error {
	if !(s.Width > 0) || !(s.Height > 0) || s.Margin < 0 || s.Spacing < 0 || math.IsNaN(s.Margin+s.Spacing) {
		return fmt.Errorf("sheet %g × %g mm with margin %g and spacing %g is not usable", s.Width, s.Height, s.Margin, s.Spacing)
	}
	return nil
}

// Nest is a panel layout for a batch.
type Nest struct {
	// Placements move the part's drawing onto the first sheet (sheet
	// origin at its lower-left corner); there are min(count, PerSheet).
	Placements []geom.Placement
	// PerSheet is how many parts a full sheet holds.
	PerSheet int
	// Sheets is how many sheets the batch needs.
	Sheets int
}

// finish fills Sheets and trims the placements to count.
func (n *Nest) finish(count int) error {
	n.PerSheet = len(n.Placements)
	if n.PerSheet == 0 {
		return fmt.Errorf("the part does not fit on the sheet inside its margin")
	}
	n.Sheets = (count + n.PerSheet - 1) / n.PerSheet
	if count < len(n.Placements) {
		n.Placements = n.Placements[:count]
	}
	return nil
}

// NestDiscs lays out count (≥ 1) discs of the given radius (mm, the cut
// path's radius) on sheet s. A disc's centre is its drawing origin.
func NestDiscs(radius float64, count int, s Sheet) (Nest, error) {
	if err := s.validate(); err != nil {
		return Nest{}, err
	}
	if !(radius > 0) || count < 1 {
		return Nest{}, fmt.Errorf("cannot nest %d discs of radius %g mm", count, radius)
	}
	p := 2*radius + s.Spacing
	best := []geom.Vec2(nil)
	for _, swap := range []bool{false, true} {
		w, h := s.Width, s.Height
		if swap {
			w, h = h, w
		}
		// Centres range over the usable area shrunk by the radius.
		lo := s.Margin + radius
		wu, hu := w-s.Margin-radius, h-s.Margin-radius
		for _, hex := range []bool{true, false} {
			var pts []geom.Vec2
			rowStep := p
			if hex {
				rowStep = p * math.Sqrt(3) / 2
			}
			for j := 0; lo+float64(j)*rowStep <= hu+1e-9; j++ {
				x0 := lo
				if hex && j%2 == 1 {
					x0 += p / 2
				}
				for x := x0; x <= wu+1e-9; x += p {
					c := geom.Vec2{X: x, Y: lo + float64(j)*rowStep}
					if swap {
						c = geom.Vec2{X: c.Y, Y: c.X}
					}
					pts = append(pts, c)
				}
			}
			if len(pts) > len(best) {
				best = pts
			}
		}
	}
	n := Nest{}
	for _, c := range best {
		n.Placements = append(n.Placements, geom.Placement{Offset: c})
	}
	return n, n.finish(count)
}

// NestOptions tunes NestPolygon.
type NestOptions struct {
	// Interlock pairs each part with a copy turned half a turn.
	Interlock bool
	// Tolerance (mm) is added to the spacing: the polygon's chords may lie
	// up to this far inside the true outline.
	Tolerance float64
	// Angles are the base angles tried, in radians; nil tries 0°, 45°, 90°
	// and 135°.
	Angles []float64
}

// NestPolygon lays out count (≥ 1) copies of a part whose outer cut path is
// the closed polygon outline (drawing coordinates, mm) on sheet s.
func NestPolygon(outline geom.Polyline, count int, s Sheet, opt NestOptions) (Nest, error) {
	if err := s.validate(); err != nil {
		return Nest{}, err
	}
	if len(outline) < 3 || count < 1 {
		return Nest{}, fmt.Errorf("cannot nest %d copies of a %d-point outline", count, len(outline))
	}
	gap := s.Spacing + opt.Tolerance
	angles := opt.Angles
	if angles == nil {
		angles = []float64{0, math.Pi / 4, math.Pi / 2, 3 * math.Pi / 4}
	}
	var best []placedPoly
	for _, a := range angles {
		got := latticeLayout(outline, a, opt.Interlock, gap, s)
		if len(got) > len(best) {
			best = got
		}
	}
	if err := checkLayout(best, gap, s); err != nil {
		return Nest{}, err
	}
	n := Nest{}
	for _, p := range best {
		n.Placements = append(n.Placements, p.pl)
	}
	return n, n.finish(count)
}

// placedPoly is one copy of the outline on the sheet.
type placedPoly struct {
	poly geom.Polyline
	box  geom.Box2
	pl   geom.Placement
}

// member is one polygon of a lattice unit, normalised so that the unit's
// box starts at the origin.
type member struct {
	poly geom.Polyline
	box  geom.Box2
	pl   geom.Placement
}

func placePoly(poly geom.Polyline, pl geom.Placement) geom.Polyline {
	out := make(geom.Polyline, len(poly))
	for i, p := range poly {
		out[i] = pl.Apply(p)
	}
	return out
}

func polyBox(poly geom.Polyline) geom.Box2 {
	b := geom.EmptyBox2()
	for _, p := range poly {
		b = b.Extend(p)
	}
	return b
}

// shift returns the member moved by v.
func (m member) shift(v geom.Vec2) member {
	return member{placePoly(m.poly, geom.Placement{Offset: v}), geom.Box2{Min: m.box.Min.Add(v), Max: m.box.Max.Add(v)},
		geom.Placement{Angle: m.pl.Angle, Offset: m.pl.Offset.Add(v)}}
}

// turned returns the outline turned by a and moved so its box starts at
// the origin.
func turned(outline geom.Polyline, a float64) member {
	p := placePoly(outline, geom.Placement{Angle: a})
	b := polyBox(p)
	m := member{poly: p, box: b, pl: geom.Placement{Angle: a}}
	return m.shift(b.Min.Scale(-1))
}

// apart reports whether two polygons keep at least gap apart (and neither
// holds the other).
func apart(a, b member, gap float64) bool {
	if a.box.Min.X-gap >= b.box.Max.X || b.box.Min.X-gap >= a.box.Max.X ||
		a.box.Min.Y-gap >= b.box.Max.Y || b.box.Min.Y-gap >= a.box.Max.Y {
		return true
	}
	return polygonsApart(a.poly, b.poly, move{}, gap)
}

// apartMoved reports whether a and b moved by v keep at least gap apart,
// as apart(a, b.shift(v), gap) would, without building the moved copy.
func apartMoved(a, b member, v geom.Vec2, gap float64) bool {
	bMin, bMax := b.box.Min.Add(v), b.box.Max.Add(v)
	if a.box.Min.X-gap >= bMax.X || bMin.X-gap >= a.box.Max.X ||
		a.box.Min.Y-gap >= bMax.Y || bMin.Y-gap >= a.box.Max.Y {
		return true
	}
	return polygonsApart(a.poly, b.poly, move{v: v, on: true}, gap)
}

// move is an optional shift of a polygon's points, applied on the fly.
type move struct {
	v  geom.Vec2
	on bool
}

// of returns p moved: exactly the point shift's placement (a turn by 0,
// then v) gives, to the bit, or p itself when the move is off.
func (m move) of(p geom.Vec2) geom.Vec2 {
	if !m.on {
		return p
	}
	// Rotate by 0: sin 0 = 0, cos 0 = 1, kept as products so that signed
	// zeros and infinities come out as the placement's do.
	const s, c = 0.0, 1.0
	return geom.Vec2{X: c*p.X - s*p.Y + m.v.X, Y: s*p.X + c*p.Y + m.v.Y}
}

// polygonsApart reports whether closed polygon a and closed polygon b
// moved by m keep at least gap apart: no edge of one comes within gap of
// an edge of the other and neither holds the other. Edge pairs whose boxes
// are further apart than gap are skipped, and so is every edge of a whose
// box is further than gap from the whole of b; distances are compared
// squared. Nothing is allocated.
func polygonsApart(a, b geom.Polyline, m move, gap float64) bool {
	ab, aOK := pointBox(a, move{})
	bb, bOK := pointBox(b, m)
	if !aOK || !bOK {
		// A NaN: no pre-check can be trusted, so none prunes anything.
		inf := math.Inf(1)
		ab = geom.Box2{Min: geom.Vec2{X: -inf, Y: -inf}, Max: geom.Vec2{X: inf, Y: inf}}
		bb = ab
	}
	// A point outside a polygon's span in y crosses none of its edges.
	if inYSpan(a[0], bb) && pointInMovedPolygon(a[0], b, m) {
		return false
	}
	if b0 := m.of(b[0]); inYSpan(b0, ab) && PointInPolygon(b0, a) {
		return false
	}
	if bb.Max.X < ab.Min.X-gap || bb.Min.X > ab.Max.X+gap || bb.Max.Y < ab.Min.Y-gap || bb.Min.Y > ab.Max.Y+gap {
		return true // every edge pair below would be skipped
	}
	g2 := gap * gap
	for i := range a {
		p, q := a[i], a[(i+1)%len(a)]
		minX, maxX := math.Min(p.X, q.X)-gap, math.Max(p.X, q.X)+gap
		minY, maxY := math.Min(p.Y, q.Y)-gap, math.Max(p.Y, q.Y)+gap
		if bb.Max.X < minX || bb.Min.X > maxX || bb.Max.Y < minY || bb.Min.Y > maxY {
			continue // every edge of b is skipped below
		}
		for j := range b {
			r, s := m.of(b[j]), m.of(b[(j+1)%len(b)])
			if (r.X < minX && s.X < minX) || (r.X > maxX && s.X > maxX) ||
				(r.Y < minY && s.Y < minY) || (r.Y > maxY && s.Y > maxY) {
				continue
			}
			if segmentsCross(p, q, r, s) || pointSegment2(p, r, s) < g2 || pointSegment2(q, r, s) < g2 ||
				pointSegment2(r, p, q) < g2 || pointSegment2(s, p, q) < g2 {
				return false
			}
		}
	}
	return true
}

// inYSpan reports whether p.Y lies in [b.Min.Y, b.Max.Y): outside it, no
// edge of a polygon inside b straddles p's height (PointInPolygon's test),
// so p is not inside.
func inYSpan(p geom.Vec2, b geom.Box2) bool { return p.Y >= b.Min.Y && p.Y < b.Max.Y }

// pointBox returns the box round the points of poly moved by m, and false
// when a coordinate is NaN (the box then means nothing).
func pointBox(poly geom.Polyline, m move) (geom.Box2, bool) {
	p0 := m.of(poly[0])
	b := geom.Box2{Min: p0, Max: p0}
	ok := true
	for _, p := range poly {
		p = m.of(p)
		ok = ok && p.X == p.X && p.Y == p.Y
		if p.X < b.Min.X {
			b.Min.X = p.X
		} else if p.X > b.Max.X {
			b.Max.X = p.X
		}
		if p.Y < b.Min.Y {
			b.Min.Y = p.Y
		} else if p.Y > b.Max.Y {
			b.Max.Y = p.Y
		}
	}
	return b, ok
}

// pointInMovedPolygon is PointInPolygon(p, poly moved by m), without
// building the moved copy.
func pointInMovedPolygon(p geom.Vec2, poly geom.Polyline, m move) bool {
	in := false
	n := len(poly)
	for i, j := 0, n-1; i < n; j, i = i, i+1 {
		a, b := m.of(poly[i]), m.of(poly[j])
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < (b.X-a.X)*(p.Y-a.Y)/(b.Y-a.Y)+a.X {
			in = !in
		}
	}
	return in
}

// pointSegment2 returns the squared distance from x to segment a–b.
func pointSegment2(x, a, b geom.Vec2) float64 {
	dx, dy := b.X-a.X, b.Y-a.Y
	l := dx*dx + dy*dy
	t := 0.0
	if l > 0 {
		t = ((x.X-a.X)*dx + (x.Y-a.Y)*dy) / l
		if t < 0 {
			t = 0
		} else if t > 1 {
			t = 1
		}
	}
	ex, ey := x.X-(a.X+t*dx), x.Y-(a.Y+t*dy)
	return ex*ex + ey*ey
}

// unitClear reports whether unit u and its copy moved by v keep gap apart.
func unitClear(u []member, v geom.Vec2, gap float64) bool {
	for _, a := range u {
		for _, b := range u {
			if !apartMoved(a, b, v, gap) {
				return false
			}
		}
	}
	return true
}

// slide returns the smallest t in [0, start] found by stepping down from
// start (where ok must hold) until ok fails, then bisecting.
func slide(start float64, ok func(float64) bool) float64 {
	const steps, fine = 40, 0.005
	step := math.Max(start/steps, fine)
	good := start
	for t := start - step; t >= 0; t -= step {
		if !ok(t) {
			bad := t
			for good-bad > fine {
				mid := (good + bad) / 2
				if ok(mid) {
					good = mid
				} else {
					bad = mid
				}
			}
			return good
		}
		good = t
	}
	return good
}

// unitBox returns the box around every member.
func unitBox(u []member) geom.Box2 {
	b := geom.EmptyBox2()
	for _, m := range u {
		b = b.Union(m.box)
	}
	return b
}

// latticeLayout packs the outline turned by a on sheet s.
func latticeLayout(outline geom.Polyline, a float64, interlock bool, gap float64, s Sheet) []placedPoly {
	u := []member{turned(outline, a)}
	if interlock {
		first, other := u[0], turned(outline, a+math.Pi)
		bestArea := math.Inf(1)
		var bestUnit []member
		// Try the turned copy at several heights beside the first and keep
		// the tightest pair.
		const heights = 8
		for k := 0; k <= heights; k++ {
			dy := -other.box.Max.Y + (first.box.Max.Y+other.box.Max.Y)*float64(k)/heights
			start := first.box.Max.X + gap
			dx := slide(start, func(t float64) bool { return apartMoved(first, other, geom.Vec2{X: t, Y: dy}, gap) })
			cand := []member{first, other.shift(geom.Vec2{X: dx, Y: dy})}
			b := unitBox(cand)
			if area := b.Size().X * b.Size().Y; area < bestArea-1e-9 {
				bestArea, bestUnit = area, cand
			}
		}
		b := unitBox(bestUnit)
		u = nil
		for _, m := range bestUnit {
			u = append(u, m.shift(b.Min.Scale(-1)))
		}
	}
	ub := unitBox(u)
	w, h := ub.Size().X, ub.Size().Y
	// Along the row.
	px := slide(w+gap, func(t float64) bool {
		for k := 1; float64(k)*t < w+gap; k++ {
			if !unitClear(u, geom.Vec2{X: float64(k) * t}, gap) {
				return false
			}
		}
		return t > 0
	})
	// Row on row, for a few sideways offsets of the next row.
	var best []placedPoly
	for _, frac := range []float64{0, 0.25, 0.5, 0.75} {
		sx := frac * px
		rowOK := func(t float64) bool {
			if t <= 0 {
				return false
			}
			for j := 1; float64(j)*t < h+gap; j++ {
				for i := -int(math.Ceil((w+gap)/px)) - j; i <= int(math.Ceil((w+gap)/px))+j; i++ {
					v := geom.Vec2{X: float64(i)*px + float64(j)*sx, Y: float64(j) * t}
					if !unitClear(u, v, gap) {
						return false
					}
				}
			}
			return true
		}
		py := slide(h+gap, rowOK)
		got := fillSheet(u, px, sx, py, s)
		if len(got) > len(best) {
			best = got
		}
	}
	return best
}

// fillSheet places every member of every lattice unit whose box lies in
// the sheet's usable area. Row j is shifted by j·sx, wrapped into one
// period so each row starts at the left margin.
func fillSheet(u []member, px, sx, py float64, s Sheet) []placedPoly {
	area := geom.Box2{Min: geom.Vec2{X: s.Margin, Y: s.Margin}, Max: geom.Vec2{X: s.Width - s.Margin, Y: s.Height - s.Margin}}
	var out []placedPoly
	for j := 0; area.Min.Y+float64(j)*py <= area.Max.Y; j++ {
		x0 := math.Mod(float64(j)*sx, px)
		for i := -1; area.Min.X+x0+float64(i)*px <= area.Max.X; i++ {
			v := area.Min.Add(geom.Vec2{X: x0 + float64(i)*px, Y: float64(j) * py})
			for _, m := range u {
				// The box first (as shift moves it), the outline only for a
				// part that is kept.
				bMin, bMax := m.box.Min.Add(v), m.box.Max.Add(v)
				if bMin.X >= area.Min.X-1e-9 && bMin.Y >= area.Min.Y-1e-9 &&
					bMax.X <= area.Max.X+1e-9 && bMax.Y <= area.Max.Y+1e-9 {
					mm := m.shift(v)
					out = append(out, placedPoly{poly: mm.poly, box: mm.box, pl: mm.pl})
				}
			}
		}
	}
	return out
}

// checkLayout verifies every pair of placed parts keeps gap apart.
func checkLayout(ps []placedPoly, gap float64, s Sheet) error {
	for i := range ps {
		for j := i + 1; j < len(ps); j++ {
			a := member{poly: ps[i].poly, box: ps[i].box}
			b := member{poly: ps[j].poly, box: ps[j].box}
			if !apart(a, b, gap-1e-9) {
				return fmt.Errorf("nesting placed parts %d and %d closer than %.3f mm", i+1, j+1, gap)
			}
		}
	}
	return nil
}

// segmentsCross reports whether segments p–q and r–s share a point.
func segmentsCross(p, q, r, s geom.Vec2) bool {
	d1 := q.Sub(p).Cross(r.Sub(p))
	d2 := q.Sub(p).Cross(s.Sub(p))
	d3 := s.Sub(r).Cross(p.Sub(r))
	d4 := s.Sub(r).Cross(q.Sub(r))
	return (d1 > 0) != (d2 > 0) && (d3 > 0) != (d4 > 0) && d1 != 0 && d2 != 0 && d3 != 0 && d4 != 0
}

// PanelDrawing returns one drawing holding a copy of part for every
// placement, layer by layer.
func PanelDrawing(part geom.Drawing, n Nest) geom.Drawing {
	var out geom.Drawing
	for _, pl := range n.Placements {
		out.Merge(part.Place(pl))
	}
	return out
}
