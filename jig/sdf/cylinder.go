package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Cylinder is a solid round cylinder on the z axis, centred on the origin.
// Its distance is exact.
type Cylinder struct {
	radius, half float64
}

// NewCylinder returns a cylinder of the given radius and height in mm, both
// above zero, on the z axis from −height/2 to +height/2.
func NewCylinder(radius, height float64) (*Cylinder, error) {
	if err := positive("cylinder", "radius", radius); err != nil {
		return nil, err
	}
	if err := positive("cylinder", "height", height); err != nil {
		return nil, err
	}
	return &Cylinder{radius, height / 2}, nil
}

// Eval returns the exact signed distance from p to the cylinder.
func (c *Cylinder) Eval(p geom.Vec3) float64 {
	return extrudeDist(math.Hypot(p.X, p.Y)-c.radius, math.Abs(p.Z)-c.half)
}

// Bounds returns the cylinder's bounding box.
func (c *Cylinder) Bounds() geom.Box3 {
	return geom.Box3{
		Min: geom.Vec3{X: -c.radius, Y: -c.radius, Z: -c.half},
		Max: geom.Vec3{X: c.radius, Y: c.radius, Z: c.half},
	}
}

// extrudeDist combines an in-plane distance a and an axial distance b (both
// signed) into the exact distance to the extruded solid.
func extrudeDist(a, b float64) float64 {
	return min(max(a, b), 0) + math.Hypot(max(a, 0), max(b, 0))
}
