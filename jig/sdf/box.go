package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Box is a solid rectangular block centred on the origin with faces normal to
// the axes. Its distance is exact.
type Box struct {
	half geom.Vec3
}

// NewBox returns a block of the given size in mm (every component above
// zero).
func NewBox(size geom.Vec3) (*Box, error) {
	for _, c := range []struct {
		n string
		v float64
	}{{"size.x", size.X}, {"size.y", size.Y}, {"size.z", size.Z}} {
		if err := positive("box", c.n, c.v); err != nil {
			return nil, err
		}
	}
	return &Box{size.Scale(0.5)}, nil
}

// Eval returns the exact signed distance from p to the block.
func (b *Box) Eval(p geom.Vec3) float64 {
	qx := math.Abs(p.X) - b.half.X
	qy := math.Abs(p.Y) - b.half.Y
	qz := math.Abs(p.Z) - b.half.Z
	out := geom.Vec3{X: max(qx, 0), Y: max(qy, 0), Z: max(qz, 0)}.Len()
	return out + min(max(qx, max(qy, qz)), 0)
}

// Bounds returns the block itself.
func (b *Box) Bounds() geom.Box3 {
	return geom.Box3{Min: b.half.Scale(-1), Max: b.half}
}
