package sdf

import "coilwright/cam/geom"

// offset is the result of Offset.
type offset struct {
	s SDF3
	r float64
}

// Offset returns s grown by r mm on every side (shrunk for r < 0): convex
// edges and corners become rounds of radius r. The distance stays exact
// outside when s's is.
func Offset(s SDF3, r float64) SDF3 { return &offset{s, r} }

// Eval returns s's distance less r.
func (o *offset) Eval(p geom.Vec3) float64 { return o.s.Eval(p) - o.r }

// Bounds returns s's box grown by r.
func (o *offset) Bounds() geom.Box3 { return o.s.Bounds().Enlarge(o.r) }
