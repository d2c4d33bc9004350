package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Booleans combine solids by min and max of their distances. With a blend
// radius k > 0 the corner where two surfaces meet is rounded by the
// quadratic smooth minimum, which stays 1-Lipschitz because its gradient is
// a convex combination of the operands' gradients.
//
// Source: the quadratic polynomial smooth minimum in I. Quilez, "smooth
// minimum" (iquilezles.org).
//
// Outside its bounding box an operand's distance is at least the distance to
// the box, so a union skips an operand whose box is farther than the running
// result (plus k). A difference skips a cut that cannot reach below −v + k
// (v the running value): one whose box is that far, or whose Bounded
// evaluation says so. Where v ≥ k, outside the first operand by more than
// the blend, this returns v itself, a lower bound on the true value with the
// right sign; everywhere else the result is as if every cut were evaluated.

// smin returns the smooth minimum of a and b with blend radius k (sharp min
// for k = 0).
func smin(a, b, k float64) float64 {
	if k <= 0 {
		return min(a, b)
	}
	h := max(k-math.Abs(a-b), 0) / k
	return min(a, b) - h*h*k/4
}

// blendArg checks a blend radius.
func blendArg(shape string, k float64) error {
	if !(k >= 0) || math.IsInf(k, 0) {
		return &ArgError{shape, "blend radius", k, "must be finite and at least 0"}
	}
	return nil
}

// union is the result of Union.
type union struct {
	s []SDF3
	b []geom.Box3
	k float64
	t geom.Box3
}

// Union returns the union of the solids (at least one) with blend radius k
// mm (0 for a sharp edge). The operands are evaluated in order.
func Union(k float64, s ...SDF3) (SDF3, error) {
	if err := blendArg("union", k); err != nil {
		return nil, err
	}
	if len(s) == 0 {
		return nil, &ArgError{"union", "operands", 0, "needs at least 1"}
	}
	u := &union{s: s, k: k}
	for i, c := range s {
		b := c.Bounds()
		u.b = append(u.b, b)
		if i == 0 {
			u.t = b
		} else {
			u.t = u.t.Union(b)
		}
	}
	return u, nil
}

// Eval returns the (smooth) minimum of the operands' distances.
func (u *union) Eval(p geom.Vec3) float64 {
	d := math.Inf(1)
	for i, c := range u.s {
		// Outside its box an operand's value is at least the box distance;
		// inside it may be anything, so it is always evaluated there.
		if b := boxDist(u.b[i], p); b > 0 && b >= d+u.k {
			continue
		}
		d = smin(d, c.Eval(p), u.k)
	}
	return d
}

// Bounds returns the union of the operands' boxes.
func (u *union) Bounds() geom.Box3 { return u.t }

// difference is the result of Difference.
type difference struct {
	a  SDF3
	s  []SDF3
	b  []geom.Box3
	ks []float64
}

// Cut is a solid to remove from another with its own blend radius k in mm.
type Cut struct {
	Shape SDF3
	Blend float64
}

// Difference returns a with every cut removed, in order, each edge rounded
// by its cut's blend radius (0 for sharp).
func Difference(a SDF3, cuts ...Cut) (SDF3, error) {
	d := &difference{a: a}
	for _, c := range cuts {
		if err := blendArg("difference", c.Blend); err != nil {
			return nil, err
		}
		d.s = append(d.s, c.Shape)
		d.b = append(d.b, c.Shape.Bounds())
		d.ks = append(d.ks, c.Blend)
	}
	return d, nil
}

// Eval returns max(a, −b) over the cuts, smoothed by each cut's blend.
func (d *difference) Eval(p geom.Vec3) float64 {
	v := d.a.Eval(p)
	for i, c := range d.s {
		// The cut changes v only where its value is below −v + k.
		bound := d.ks[i] - v
		if boxDist(d.b[i], p) >= bound {
			continue
		}
		var g float64
		if b, ok := c.(Bounded); ok {
			if g = b.EvalBound(p, bound); g >= bound {
				continue
			}
		} else {
			g = c.Eval(p)
		}
		v = -smin(-v, g, d.ks[i])
	}
	return v
}

// Bounds returns the first operand's box.
func (d *difference) Bounds() geom.Box3 { return d.a.Bounds() }

// intersection is the result of Intersection.
type intersection struct {
	s []SDF3
	k float64
	t geom.Box3
}

// Intersection returns the common part of the solids (at least one) with
// blend radius k mm.
func Intersection(k float64, s ...SDF3) (SDF3, error) {
	if err := blendArg("intersection", k); err != nil {
		return nil, err
	}
	if len(s) == 0 {
		return nil, &ArgError{"intersection", "operands", 0, "needs at least 1"}
	}
	t := s[0].Bounds()
	for _, c := range s[1:] {
		b := c.Bounds()
		t = geom.Box3{Min: t.Min.Max(b.Min), Max: t.Max.Min(b.Max)}
	}
	return &intersection{s, k, t}, nil
}

// Eval returns the (smooth) maximum of the operands' distances.
func (x *intersection) Eval(p geom.Vec3) float64 {
	d := math.Inf(-1)
	for _, c := range x.s {
		d = -smin(-d, -c.Eval(p), x.k)
	}
	return d
}

// Bounds returns the overlap of the operands' boxes.
func (x *intersection) Bounds() geom.Box3 { return x.t }

// union2 is the result of Union2.
type union2 struct {
	s []SDF2
	b []Box2
	t Box2
}

// Union2 returns the sharp union of plane regions (at least one).
func Union2(s ...SDF2) (SDF2, error) {
	if len(s) == 0 {
		return nil, &ArgError{"union", "operands", 0, "needs at least 1"}
	}
	u := &union2{s: s, t: s[0].Bounds()}
	for _, c := range s {
		u.b = append(u.b, c.Bounds())
		u.t = u.t.Union(c.Bounds())
	}
	return u, nil
}

// Eval returns the minimum of the operands' distances, skipping operands
// whose bounding rectangle is farther than the running minimum.
func (u *union2) Eval(p geom.Vec2) float64 {
	d := math.Inf(1)
	for i, c := range u.s {
		if b := boxDist2(u.b[i], p); b > 0 && b >= d {
			continue
		}
		d = min(d, c.Eval(p))
	}
	return d
}

// Bounds returns the union of the operands' rectangles.
func (u *union2) Bounds() Box2 { return u.t }
