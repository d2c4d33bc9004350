package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// Rigid is a rotation followed by a translation: p ↦ R·p + T, with R a proper
// rotation matrix stored by rows. Rigid motions keep distances, so a moved
// solid keeps its accuracy.
type Rigid struct {
	R [3][3]float64
	T geom.Vec3
}

// Identity returns the motion that leaves every point in place.
func Identity() Rigid {
	return Rigid{R: [3][3]float64{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}}
}

// Translation returns the motion by v mm.
func Translation(v geom.Vec3) Rigid {
	r := Identity()
	r.T = v
	return r
}

// RotationX returns the right-hand rotation by a radians about the x axis.
func RotationX(a float64) Rigid {
	s, c := math.Sincos(a)
	return Rigid{R: [3][3]float64{{1, 0, 0}, {0, c, -s}, {0, s, c}}}
}

// RotationZ returns the right-hand rotation by a radians about the z axis.
func RotationZ(a float64) Rigid {
	s, c := math.Sincos(a)
	return Rigid{R: [3][3]float64{{c, -s, 0}, {s, c, 0}, {0, 0, 1}}}
}

// Frame returns the motion that carries the x, y and z axes onto the unit
// vectors x, y = z × x and z, and the origin onto o. x and z must be
// perpendicular unit vectors.
func Frame(o, x, z geom.Vec3) Rigid {
	y := z.Cross(x)
	return Rigid{R: [3][3]float64{{x.X, y.X, z.X}, {x.Y, y.Y, z.Y}, {x.Z, y.Z, z.Z}}, T: o}
}

// Then returns the motion that applies r first and then s.
func (r Rigid) Then(s Rigid) Rigid {
	var m [3][3]float64
	for i := range 3 {
		for j := range 3 {
			for k := range 3 {
				m[i][j] += s.R[i][k] * r.R[k][j]
			}
		}
	}
	return Rigid{R: m, T: s.Apply(r.T)}
}

// Apply returns the image of point p.
func (r Rigid) Apply(p geom.Vec3) geom.Vec3 {
	return geom.Vec3{
		X: r.R[0][0]*p.X + r.R[0][1]*p.Y + r.R[0][2]*p.Z + r.T.X,
		Y: r.R[1][0]*p.X + r.R[1][1]*p.Y + r.R[1][2]*p.Z + r.T.Y,
		Z: r.R[2][0]*p.X + r.R[2][1]*p.Y + r.R[2][2]*p.Z + r.T.Z,
	}
}

// Inverse returns the point p maps from: Rᵀ·(p − T).
func (r Rigid) Inverse(p geom.Vec3) geom.Vec3 {
	q := p.Sub(r.T)
	return geom.Vec3{
		X: r.R[0][0]*q.X + r.R[1][0]*q.Y + r.R[2][0]*q.Z,
		Y: r.R[0][1]*q.X + r.R[1][1]*q.Y + r.R[2][1]*q.Z,
		Z: r.R[0][2]*q.X + r.R[1][2]*q.Y + r.R[2][2]*q.Z,
	}
}

// moved is the result of Move.
type moved struct {
	s SDF3
	m Rigid
	b geom.Box3
}

// Move returns s carried by the rigid motion m.
func Move(s SDF3, m Rigid) SDF3 {
	b := s.Bounds()
	var out geom.Box3
	for i := range 8 {
		c := b.Min
		if i&1 != 0 {
			c.X = b.Max.X
		}
		if i&2 != 0 {
			c.Y = b.Max.Y
		}
		if i&4 != 0 {
			c.Z = b.Max.Z
		}
		q := m.Apply(c)
		if i == 0 {
			out = geom.Box3{Min: q, Max: q}
		} else {
			out = out.Union(geom.Box3{Min: q, Max: q})
		}
	}
	if !finiteBox(out) {
		inf := math.Inf(1)
		out = geom.Box3{Min: geom.Vec3{X: -inf, Y: -inf, Z: -inf}, Max: geom.Vec3{X: inf, Y: inf, Z: inf}}
	}
	return &moved{s, m, out}
}

// Eval returns the distance of the point carried back by the motion.
func (t *moved) Eval(p geom.Vec3) float64 { return t.s.Eval(t.m.Inverse(p)) }

// Bounds returns the box holding the moved box's corners.
func (t *moved) Bounds() geom.Box3 { return t.b }

// finiteBox reports whether every coordinate of b is a finite number.
func finiteBox(b geom.Box3) bool {
	for _, v := range []float64{b.Min.X, b.Min.Y, b.Min.Z, b.Max.X, b.Max.Y, b.Max.Z} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return false
		}
	}
	return true
}
