// Kerf compensation: the tool removes a band of material of width kerf
// centred on the path it follows, so a path for a part must run kerf/2
// outside the part's outer contour and kerf/2 inside each of its holes.
//
// A closed contour is offset segment by segment: a line moves along its
// normal, an arc keeps its centre and changes its radius. Where two offset
// segments no longer meet, the corner is bridged by an arc of radius |d|
// about the original corner (exactly the path a round tool's centre takes
// round a sharp corner); where they cross, both are trimmed to the crossing
// nearest the corner. A straight segment shorter than the offset may be
// swallowed by its neighbours' trims (it would turn back on itself); it is
// dropped and its neighbours joined directly. Holes and outer contours are told apart by nesting
// depth on the CUT layer: a closed entity inside an odd number of others
// is a hole.

package cut

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
)

// offsetTol is the distance in mm under which two offset end points count
// as meeting (no corner to bridge or trim).
const offsetTol = 1e-9

// offSeg is one segment of a contour being offset: a line from p to q, or
// an arc about c of radius r from p to q, counter-clockwise when ccw.
type offSeg struct {
	p, q   geom.Vec2
	arc    bool
	c      geom.Vec2
	r      float64
	ccw    bool
	spare  bool      // a bridging arc added at a corner
	dir    geom.Vec2 // a line's direction before trimming
	op, oq geom.Vec2 // the original segment's end points
}

// tangentAt returns the unit direction of travel at point x of s.
func (s offSeg) tangentAt(x geom.Vec2) geom.Vec2 {
	if !s.arc {
		d := s.q.Sub(s.p)
		return d.Scale(1 / d.Len())
	}
	rad := x.Sub(s.c).Scale(1 / s.r)
	if s.ccw {
		return geom.Vec2{X: -rad.Y, Y: rad.X}
	}
	return geom.Vec2{X: rad.Y, Y: -rad.X}
}

// bulge returns the DXF bulge of s from its end points.
func (s offSeg) bulge() float64 {
	if !s.arc {
		return 0
	}
	a0 := math.Atan2(s.p.Y-s.c.Y, s.p.X-s.c.X)
	a1 := math.Atan2(s.q.Y-s.c.Y, s.q.X-s.c.X)
	span := a1 - a0
	if s.ccw {
		for span <= 0 {
			span += 2 * math.Pi
		}
		return math.Tan(span / 4)
	}
	for span >= 0 {
		span -= 2 * math.Pi
	}
	return math.Tan(span / 4)
}

// OffsetContour returns the closed contour c moved outward by d mm (inward
// when d < 0), with round corners where the offset opens a gap. It returns
// an error for an open or degenerate contour, or when an arc would shrink
// to nothing.
func OffsetContour(c geom.Contour, d float64) (geom.Contour, error) {
	if !c.Closed || len(c.Vertices) < 2 {
		return geom.Contour{}, fmt.Errorf("only closed contours of two or more vertices can be offset")
	}
	if d == 0 {
		return c, nil
	}
	// Work counter-clockwise, so outward is to the right of travel.
	if geom.Polyline(c.Flatten(0.01)).Area() < 0 {
		c = reverseContour(c)
	}
	var segs []offSeg
	for i := range c.Segments() {
		p, q, b := c.Segment(i)
		if p.Sub(q).Len() < offsetTol {
			continue
		}
		if b == 0 {
			t := q.Sub(p).Scale(1 / q.Sub(p).Len())
			nrm := geom.Vec2{X: t.Y, Y: -t.X}.Scale(d)
			segs = append(segs, offSeg{p: p.Add(nrm), q: q.Add(nrm), dir: t, op: p, oq: q})
			continue
		}
		a := geom.BulgeArc(p, q, b)
		ccw := b > 0
		// Outward is away from the centre on a counter-clockwise arc.
		r := a.Radius + d
		if !ccw {
			r = a.Radius - d
		}
		if !(r > offsetTol) {
			return geom.Contour{}, fmt.Errorf("an arc of radius %.3f mm cannot be offset by %.3f mm", a.Radius, d)
		}
		move := func(x geom.Vec2) geom.Vec2 { return a.Center.Add(x.Sub(a.Center).Scale(r / a.Radius)) }
		segs = append(segs, offSeg{p: move(p), q: move(q), arc: true, c: a.Center, r: r, ccw: ccw, op: p, oq: q})
	}
	// A straight segment shorter than the offset can be swallowed by its
	// neighbours' trims; drop it and join its neighbours directly.
	for len(segs) >= 2 {
		out, fold, err := joinOffsets(segs, d)
		if err != nil {
			return geom.Contour{}, err
		}
		if fold < 0 {
			res := geom.Contour{Closed: true, Vertices: make([]geom.Vertex, len(out))}
			for i, s := range out {
				res.Vertices[i] = geom.Vertex{P: s.p, Bulge: s.bulge()}
			}
			return res, nil
		}
		segs = append(segs[:fold:fold], segs[fold+1:]...)
	}
	return geom.Contour{}, fmt.Errorf("contour too small to offset by %.3f mm", d)
}

// joinOffsets joins consecutive offset segments: a round arc about the
// original corner where they part, a trim to their crossing where they
// overlap. It returns the joined path, or the index of a straight segment
// that the trims turned back on itself (fold ≥ 0), which the caller drops.
func joinOffsets(segs []offSeg, d float64) (out []offSeg, fold int, err error) {
	m := len(segs)
	work := append([]offSeg(nil), segs...)
	bridge := make([]*offSeg, m)
	for k := range m {
		a, b := work[k], work[(k+1)%m]
		adjacent := segs[k].oq.Sub(segs[(k+1)%m].op).Len() < offsetTol
		v := segs[k].oq.Add(segs[(k+1)%m].op).Scale(0.5)
		if a.q.Sub(b.p).Len() < offsetTol {
			continue
		}
		turn := a.tangentAt(a.q).Cross(b.tangentAt(b.p))
		// A gap opens when the offset moves away from the turn: outward
		// round a left (convex) turn, or inward round a right one.
		if turn*d > 0 && adjacent {
			bridge[k] = &offSeg{p: a.q, q: b.p, arc: true, c: v, r: math.Abs(d), ccw: d > 0, spare: true}
			continue
		}
		x, ok := crossNear(a, b, v)
		if !ok {
			return nil, -1, fmt.Errorf("offset segments at (%.3f, %.3f) do not meet; the feature is smaller than the kerf", v.X, v.Y)
		}
		work[k].q = x
		work[(k+1)%m].p = x
	}
	for k, s := range work {
		if !s.arc && s.q.Sub(s.p).Dot(s.dir) <= 0 {
			return nil, k, nil
		}
	}
	for k, s := range work {
		out = append(out, s)
		if bridge[k] != nil {
			out = append(out, *bridge[k])
		}
	}
	return out, -1, nil
}

// reverseContour returns the closed contour c traversed the other way:
// vertex j of the result is vertex −j of c, and the segment leaving it is
// c's segment −j−1 run backwards, its bulge negated.
func reverseContour(c geom.Contour) geom.Contour {
	n := len(c.Vertices)
	out := geom.Contour{Closed: c.Closed, Vertices: make([]geom.Vertex, n)}
	for j := range n {
		out.Vertices[j] = geom.Vertex{P: c.Vertices[(n-j)%n].P, Bulge: -c.Vertices[(2*n-j-1)%n].Bulge}
	}
	return out
}

// crossNear returns the crossing of the full lines or circles carrying a
// and b that lies nearest v.
func crossNear(a, b offSeg, v geom.Vec2) (geom.Vec2, bool) {
	var pts []geom.Vec2
	switch {
	case !a.arc && !b.arc:
		da, db := a.q.Sub(a.p), b.q.Sub(b.p)
		den := da.Cross(db)
		if math.Abs(den) < 1e-15 {
			return geom.Vec2{}, false
		}
		t := b.p.Sub(a.p).Cross(db) / den
		pts = append(pts, a.p.Add(da.Scale(t)))
	case a.arc && b.arc:
		pts = circleCircle(a.c, a.r, b.c, b.r)
	case a.arc:
		pts = lineCircle(b.p, b.q, a.c, a.r)
	default:
		pts = lineCircle(a.p, a.q, b.c, b.r)
	}
	best, bestD := geom.Vec2{}, math.Inf(1)
	for _, p := range pts {
		if dd := p.Sub(v).Len(); dd < bestD {
			best, bestD = p, dd
		}
	}
	return best, len(pts) > 0
}

// lineCircle returns the points where the line through p and q meets the
// circle of radius r about c.
func lineCircle(p, q, c geom.Vec2, r float64) []geom.Vec2 {
	d := q.Sub(p)
	f := p.Sub(c)
	a, b, cc := d.Dot(d), 2*f.Dot(d), f.Dot(f)-r*r
	disc := b*b - 4*a*cc
	if disc < 0 {
		return nil
	}
	s := math.Sqrt(disc)
	return []geom.Vec2{p.Add(d.Scale((-b - s) / (2 * a))), p.Add(d.Scale((-b + s) / (2 * a)))}
}

// circleCircle returns the points where two circles meet.
func circleCircle(c0 geom.Vec2, r0 float64, c1 geom.Vec2, r1 float64) []geom.Vec2 {
	dv := c1.Sub(c0)
	d := dv.Len()
	if d == 0 || d > r0+r1 || d < math.Abs(r0-r1) {
		return nil
	}
	a := (r0*r0 - r1*r1 + d*d) / (2 * d)
	h := math.Sqrt(math.Max(0, r0*r0-a*a))
	m := c0.Add(dv.Scale(a / d))
	perp := geom.Vec2{X: -dv.Y / d, Y: dv.X / d}.Scale(h)
	return []geom.Vec2{m.Add(perp), m.Sub(perp)}
}

// ApplyKerf returns a copy of d whose CUT layer is compensated for a tool
// removing kerf mm (≥ 0): outer contours grow by kerf/2 and holes shrink by
// kerf/2. Other layers are copied unchanged. It returns an error for an open
// entity on the CUT layer or a feature too small for the kerf.
func ApplyKerf(d geom.Drawing, kerf float64) (geom.Drawing, error) {
	if kerf < 0 || math.IsNaN(kerf) {
		return geom.Drawing{}, fmt.Errorf("kerf %g mm must not be negative", kerf)
	}
	out := geom.Drawing{Layers: make([]geom.Layer, len(d.Layers))}
	for i, l := range d.Layers {
		out.Layers[i].Name = l.Name
		if l.Name != "CUT" || kerf == 0 {
			out.Layers[i].Entities = append([]geom.Entity(nil), l.Entities...)
			continue
		}
		depth, err := nestingDepth(l.Entities)
		if err != nil {
			return geom.Drawing{}, err
		}
		for j, e := range l.Entities {
			off := kerf / 2
			if depth[j]%2 == 1 {
				off = -off
			}
			switch e := e.(type) {
			case geom.Circle:
				if !(e.Radius+off > 0) {
					return geom.Drawing{}, fmt.Errorf("a hole of Ø %.3f mm is smaller than the kerf %.3f mm", 2*e.Radius, kerf)
				}
				out.Layers[i].Entities = append(out.Layers[i].Entities, geom.Circle{Center: e.Center, Radius: e.Radius + off})
			case geom.Contour:
				c, err := OffsetContour(e, off)
				if err != nil {
					return geom.Drawing{}, err
				}
				out.Layers[i].Entities = append(out.Layers[i].Entities, c)
			}
		}
	}
	return out, nil
}

// closedRegion is a closed CUT entity flattened for containment tests.
type closedRegion struct {
	poly  geom.Polyline
	probe geom.Vec2 // a point on the entity's boundary
}

// nestingDepth returns, for each entity, how many of the others enclose it.
// Every entity must be closed (a circle or a closed contour).
func nestingDepth(es []geom.Entity) ([]int, error) {
	regs := make([]closedRegion, len(es))
	for i, e := range es {
		switch e := e.(type) {
		case geom.Circle:
			regs[i] = closedRegion{e.Flatten(1e-4), e.Center.Add(geom.Vec2{X: e.Radius})}
		case geom.Contour:
			if !e.Closed || len(e.Vertices) < 2 {
				return nil, fmt.Errorf("the CUT layer holds an open polyline; kerf compensation needs closed contours")
			}
			regs[i] = closedRegion{e.Flatten(1e-4), e.Vertices[0].P}
		default:
			return nil, fmt.Errorf("the CUT layer holds a %T; kerf compensation needs closed contours", e)
		}
	}
	depth := make([]int, len(es))
	for i := range regs {
		for j := range regs {
			if i != j && PointInPolygon(regs[i].probe, regs[j].poly) {
				depth[i]++
			}
		}
	}
	return depth, nil
}

// PointInPolygon reports whether p lies inside the closed polygon poly
// (even–odd rule; points on the boundary may go either way).
func PointInPolygon(p geom.Vec2, poly geom.Polyline) bool {
	in := false
	n := len(poly)
	for i, j := 0, n-1; i < n; j, i = i, i+1 {
		a, b := poly[i], poly[j]
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < (b.X-a.X)*(p.Y-a.Y)/(b.Y-a.Y)+a.X {
			in = !in
		}
	}
	return in
}
