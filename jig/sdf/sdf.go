package sdf

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
)

// SDF3 is a solid in space. Eval returns the signed distance bound from p to
// the surface in millimetres (negative inside); Bounds returns a box, in
// millimetres, that holds every point where Eval is negative.
type SDF3 interface {
	Eval(p geom.Vec3) float64
	Bounds() geom.Box3
}

// Bounded is an SDF3 that can answer more cheaply when only values below a
// bound matter: EvalBound returns Eval(p) when that is below bound, and
// otherwise some value v with bound ≤ v ≤ Eval(p). Difference uses it for
// its cuts.
type Bounded interface {
	SDF3
	EvalBound(p geom.Vec3, bound float64) float64
}

// SDF2 is a region of the plane with the same contract as SDF3.
type SDF2 interface {
	Eval(p geom.Vec2) float64
	Bounds() Box2
}

// Box2 is an axis-aligned rectangle in millimetres, Min ≤ Max component-wise.
type Box2 struct{ Min, Max geom.Vec2 }

// Union returns the smallest rectangle holding both b and c.
func (b Box2) Union(c Box2) Box2 {
	return Box2{
		geom.Vec2{X: min(b.Min.X, c.Min.X), Y: min(b.Min.Y, c.Min.Y)},
		geom.Vec2{X: max(b.Max.X, c.Max.X), Y: max(b.Max.Y, c.Max.Y)},
	}
}

// ArgError reports a constructor argument that cannot make a shape: the
// shape, the argument's name, its value and the rule it breaks.
type ArgError struct {
	Shape string
	Arg   string
	Value float64
	Rule  string
}

// Error formats the argument error as "shape: arg = value: rule".
func (e *ArgError) Error() string {
	return fmt.Sprintf("%s: %s = %g: %s", e.Shape, e.Arg, e.Value, e.Rule)
}

// positive returns an *ArgError unless v is a finite number above zero.
func positive(shape, arg string, v float64) error {
	if !(v > 0) || math.IsInf(v, 0) {
		return &ArgError{shape, arg, v, "must be a finite number above 0"}
	}
	return nil
}

// boxDist returns the Euclidean distance from p to box b (0 inside). It is a
// lower bound on the distance to any solid b holds.
func boxDist(b geom.Box3, p geom.Vec3) float64 {
	dx := max(max(b.Min.X-p.X, p.X-b.Max.X), 0)
	dy := max(max(b.Min.Y-p.Y, p.Y-b.Max.Y), 0)
	dz := max(max(b.Min.Z-p.Z, p.Z-b.Max.Z), 0)
	return math.Sqrt(dx*dx + dy*dy + dz*dz)
}

// boxDist2 is boxDist in the plane.
func boxDist2(b Box2, p geom.Vec2) float64 {
	dx := max(max(b.Min.X-p.X, p.X-b.Max.X), 0)
	dy := max(max(b.Min.Y-p.Y, p.Y-b.Max.Y), 0)
	return math.Hypot(dx, dy)
}
