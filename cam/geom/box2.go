package geom

import "math"

// Box2 is an axis-aligned rectangle in the plane, in millimetres. A box with
// Min > Max on either axis is empty; EmptyBox2 returns the canonical one.
type Box2 struct{ Min, Max Vec2 }

// EmptyBox2 returns the empty box, the identity for Union and Extend.
func EmptyBox2() Box2 {
	inf := math.Inf(1)
	return Box2{Vec2{inf, inf}, Vec2{-inf, -inf}}
}

// IsEmpty reports whether b holds no point.
func (b Box2) IsEmpty() bool { return b.Min.X > b.Max.X || b.Min.Y > b.Max.Y }

// Extend returns the smallest box holding b and p.
func (b Box2) Extend(p Vec2) Box2 {
	return Box2{
		Vec2{math.Min(b.Min.X, p.X), math.Min(b.Min.Y, p.Y)},
		Vec2{math.Max(b.Max.X, p.X), math.Max(b.Max.Y, p.Y)},
	}
}

// Union returns the smallest box holding both b and c.
func (b Box2) Union(c Box2) Box2 {
	if c.IsEmpty() {
		return b
	}
	return b.Extend(c.Min).Extend(c.Max)
}

// Size returns the box's width and height (zero for an empty box).
func (b Box2) Size() Vec2 {
	if b.IsEmpty() {
		return Vec2{}
	}
	return b.Max.Sub(b.Min)
}

// Center returns the box's centre point.
func (b Box2) Center() Vec2 { return b.Min.Add(b.Max).Scale(0.5) }
