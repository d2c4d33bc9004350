package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Revolve is the solid swept by a profile turning about the z axis. The
// profile's X is the distance from the axis and its Y is z. A profile that
// reaches the axis is drawn symmetric about X = 0, so that the axis is not an
// edge of it; one that does not reach it lies wholly at X > 0. The distance
// is then exact when the profile's is.
type Revolve struct {
	prof SDF2
	b    geom.Box3
}

// NewRevolve returns the solid of revolution of prof, whose bounds must not
// reach farther left of the axis than right of it.
func NewRevolve(prof SDF2) (*Revolve, error) {
	pb := prof.Bounds()
	if pb.Min.X < -pb.Max.X {
		return nil, &ArgError{"revolve", "profile min x", pb.Min.X, "profile must lie at x ≥ 0 or be symmetric about x = 0"}
	}
	r := pb.Max.X
	return &Revolve{prof, geom.Box3{
		Min: geom.Vec3{X: -r, Y: -r, Z: pb.Min.Y},
		Max: geom.Vec3{X: r, Y: r, Z: pb.Max.Y},
	}}, nil
}

// Eval returns the profile's distance in the meridian half-plane through p.
func (r *Revolve) Eval(p geom.Vec3) float64 {
	return r.prof.Eval(geom.Vec2{X: math.Hypot(p.X, p.Y), Y: p.Z})
}

// Bounds returns the solid's bounding box.
func (r *Revolve) Bounds() geom.Box3 { return r.b }

// Extrude is a profile in the xy plane pulled straight along z between two
// heights. The distance is exact when the profile's is.
type Extrude struct {
	prof   SDF2
	z0, z1 float64
}

// NewExtrude returns prof extruded from z0 to z1 mm (z0 < z1).
func NewExtrude(prof SDF2, z0, z1 float64) (*Extrude, error) {
	if !(z1 > z0) {
		return nil, &ArgError{"extrude", "height", z1 - z0, "z1 must be above z0"}
	}
	return &Extrude{prof, z0, z1}, nil
}

// Eval returns the exact signed distance from p to the extrusion.
func (e *Extrude) Eval(p geom.Vec3) float64 {
	m, h := (e.z0+e.z1)/2, (e.z1-e.z0)/2
	return extrudeDist(e.prof.Eval(geom.Vec2{X: p.X, Y: p.Y}), math.Abs(p.Z-m)-h)
}

// Bounds returns the extrusion's bounding box.
func (e *Extrude) Bounds() geom.Box3 {
	b := e.prof.Bounds()
	return geom.Box3{
		Min: geom.Vec3{X: b.Min.X, Y: b.Min.Y, Z: e.z0},
		Max: geom.Vec3{X: b.Max.X, Y: b.Max.Y, Z: e.z1},
	}
}
