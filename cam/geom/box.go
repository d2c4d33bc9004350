package geom

// Box3 is an axis-aligned box in millimetres, Min ≤ Max component-wise.
type Box3 struct{ Min, Max Vec3 }

// Size returns the box's extent along each axis.
func (b Box3) Size() Vec3 { return b.Max.Sub(b.Min) }

// Center returns the box's centre point.
func (b Box3) Center() Vec3 { return b.Min.Add(b.Max).Scale(0.5) }

// Union returns the smallest box holding both b and c.
func (b Box3) Union(c Box3) Box3 { return Box3{b.Min.Min(c.Min), b.Max.Max(c.Max)} }

// Enlarge returns b grown by d on every side (shrunk when d < 0).
func (b Box3) Enlarge(d float64) Box3 {
	e := Vec3{d, d, d}
	return Box3{b.Min.Sub(e), b.Max.Add(e)}
}

// Contains reports whether p lies inside b or on its boundary.
func (b Box3) Contains(p Vec3) bool {
	return p.X >= b.Min.X && p.X <= b.Max.X &&
		p.Y >= b.Min.Y && p.Y <= b.Max.Y &&
		p.Z >= b.Min.Z && p.Z <= b.Max.Z
}
