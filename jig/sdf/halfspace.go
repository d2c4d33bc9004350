package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// HalfSpace is every point on the inner side of a plane: n·p ≤ offset with n
// the unit outward normal. Its distance is exact. Its bounds are infinite
// except on an axis-aligned plane, so it is meant to be intersected with or
// subtracted from a bounded solid.
type HalfSpace struct {
	n      geom.Vec3
	offset float64
}

// NewHalfSpace returns the half-space whose boundary plane passes through
// point and whose outward normal is normal (any non-zero length).
func NewHalfSpace(normal, point geom.Vec3) (*HalfSpace, error) {
	l := normal.Len()
	if !(l > 0) || math.IsInf(l, 0) {
		return nil, &ArgError{"half-space", "normal length", l, "must be finite and above 0"}
	}
	n := normal.Scale(1 / l)
	return &HalfSpace{n, n.Dot(point)}, nil
}

// Eval returns the exact signed distance from p to the plane.
func (h *HalfSpace) Eval(p geom.Vec3) float64 { return h.n.Dot(p) - h.offset }

// Bounds returns an infinite box, cut to the plane when the normal lies along
// an axis.
func (h *HalfSpace) Bounds() geom.Box3 {
	inf := math.Inf(1)
	b := geom.Box3{Min: geom.Vec3{X: -inf, Y: -inf, Z: -inf}, Max: geom.Vec3{X: inf, Y: inf, Z: inf}}
	switch {
	case h.n == geom.Vec3{X: 1}:
		b.Max.X = h.offset
	case h.n == geom.Vec3{X: -1}:
		b.Min.X = -h.offset
	case h.n == geom.Vec3{Y: 1}:
		b.Max.Y = h.offset
	case h.n == geom.Vec3{Y: -1}:
		b.Min.Y = -h.offset
	case h.n == geom.Vec3{Z: 1}:
		b.Max.Z = h.offset
	case h.n == geom.Vec3{Z: -1}:
		b.Min.Z = -h.offset
	}
	return b
}
