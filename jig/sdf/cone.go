package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Cone is a solid frustum of a right circular cone on the z axis, centred on
// the origin, radius r0 at z = −h/2 and r1 at z = +h/2. Its distance is exact.
type Cone struct {
	half, r0, r1 float64
}

// NewCone returns a frustum of height h (mm, above zero) with bottom radius r0
// and top radius r1 (mm, at least zero, not both zero).
func NewCone(h, r0, r1 float64) (*Cone, error) {
	if err := positive("cone", "height", h); err != nil {
		return nil, err
	}
	if !(r0 >= 0) || !(r1 >= 0) || r0+r1 == 0 || math.IsInf(r0+r1, 0) {
		return nil, &ArgError{"cone", "radius", max(r0, r1), "radii must be finite, at least 0 and not both 0"}
	}
	return &Cone{h / 2, r0, r1}, nil
}

// Eval returns the exact signed distance from p to the frustum: the nearer of
// the flat end and the slanted side in the meridian half-plane.
//
// Source: the capped-cone distance in I. Quilez, "distance functions"
// (iquilezles.org, 2D-meridian form), re-derived for a z axis.
func (c *Cone) Eval(p geom.Vec3) float64 {
	qx, qy := math.Hypot(p.X, p.Y), p.Z
	// Flat end: the nearer cap radius.
	rc := c.r1
	if qy < 0 {
		rc = c.r0
	}
	cax := qx - min(qx, rc)
	cay := math.Abs(qy) - c.half
	// Side: segment from (r1, h/2) to (r0, −h/2).
	k1x, k1y := c.r1, c.half
	k2x, k2y := c.r1-c.r0, 2*c.half
	t := ((k1x-qx)*k2x + (k1y-qy)*k2y) / (k2x*k2x + k2y*k2y)
	t = max(0, min(1, t))
	cbx := qx - k1x + k2x*t
	cby := qy - k1y + k2y*t
	s := 1.0
	if cbx < 0 && cay < 0 {
		s = -1
	}
	return s * math.Sqrt(min(cax*cax+cay*cay, cbx*cbx+cby*cby))
}

// Bounds returns the frustum's bounding box.
func (c *Cone) Bounds() geom.Box3 {
	r := max(c.r0, c.r1)
	return geom.Box3{
		Min: geom.Vec3{X: -r, Y: -r, Z: -c.half},
		Max: geom.Vec3{X: r, Y: r, Z: c.half},
	}
}
