package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// VGroove is a V-section cut below a horizontal face, as a chisel or a
// V-bit engraves: along a set of centre lines in the xy plane the cut is
// depth deep, and its flanks rise straight to the face at halfWidth from
// the lines. It reaches 1 mm above the face so that it opens cleanly. The
// distance is exact to the flanks in the plane normal to the nearest line
// and 1-Lipschitz everywhere.
type VGroove struct {
	lines      *Strokes
	top, depth float64
	half       float64
	b          geom.Box3
}

// NewVGroove returns the cut along the segments with the face at height
// top, depth and halfWidth in mm (above zero).
func NewVGroove(seg [][2]geom.Vec2, top, depth, halfWidth float64) (*VGroove, error) {
	if err := positive("v-groove", "depth", depth); err != nil {
		return nil, err
	}
	s, err := NewStrokes(seg, halfWidth)
	if err != nil {
		return nil, err
	}
	b := s.Bounds()
	return &VGroove{s, top, depth, halfWidth, geom.Box3{
		Min: geom.Vec3{X: b.Min.X, Y: b.Min.Y, Z: top - depth},
		Max: geom.Vec3{X: b.Max.X, Y: b.Max.Y, Z: top + 1},
	}}, nil
}

// Eval returns the distance bound from p to the cut: the flank plane in the
// (distance from the line, z) half-plane, capped 1 mm above the face.
func (v *VGroove) Eval(p geom.Vec3) float64 {
	r := v.lines.Eval(geom.Vec2{X: p.X, Y: p.Y}) + v.half // distance to the centre line
	s := v.depth / v.half
	flank := (s*r - (p.Z - v.top + v.depth)) / math.Sqrt(1+s*s)
	return max(flank, p.Z-v.top-1)
}

// Bounds returns the cut's bounding box.
func (v *VGroove) Bounds() geom.Box3 { return v.b }
