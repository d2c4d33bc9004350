package em

import (
	"math"
	"math/cmplx"

	"coilwright/cam/geom"
)

// Direction is a direction of observation: Theta from +z (0..π), Phi from
// +x towards +y, radians.
type Direction struct{ Theta, Phi float64 }

// unit returns r̂, θ̂ and φ̂ for d.
func (d Direction) unit() (r, th, ph geom.Vec3) {
	st, ct := math.Sincos(d.Theta)
	sp, cp := math.Sincos(d.Phi)
	return geom.Vec3{X: st * cp, Y: st * sp, Z: ct},
		geom.Vec3{X: ct * cp, Y: ct * sp, Z: -st},
		geom.Vec3{X: -sp, Y: cp}
}

// FarField is the radiated electric field in one direction, as r·E·e^{jkr}
// (volts): its θ̂ and φ̂ components for the Solution's feed voltage.
type FarField struct{ Theta, Phi complex128 }

// Right returns the right-hand circular component (E_θ + jE_φ)/√2, volts.
// With e^{+jωt}, a wave travelling along +z with E ∝ x̂ − jŷ is right-hand
// circular; since (θ̂, φ̂, r̂) is right-handed like (x̂, ŷ, ẑ) the same
// combination holds for an outgoing wave in any direction.
// Source: IEEE Std 145 (sense of polarisation); EM.md §3.
func (f FarField) Right() complex128 { return (f.Theta + 1i*f.Phi) / math.Sqrt2 }

// Left returns the left-hand circular component (E_θ − jE_φ)/√2, volts.
// Source: IEEE Std 145; EM.md §3.
func (f FarField) Left() complex128 { return (f.Theta - 1i*f.Phi) / math.Sqrt2 }

// AxialRatio returns (|E_R| + |E_L|)/||E_R| − |E_L|| (1 for circular);
// +Inf for a linearly polarised or zero field.
// Source: IEEE Std 145; EM.md §3.
func (f FarField) AxialRatio() float64 {
	r, l := cmplx.Abs(f.Right()), cmplx.Abs(f.Left())
	if r == l {
		return math.Inf(1)
	}
	return (r + l) / math.Abs(r-l)
}

// Component selects a polarisation of the radiated field.
type Component int

const (
	// Total is the whole field, |E_θ|² + |E_φ|².
	Total Component = iota
	// RightHand is the right-hand circular part (RHCP).
	RightHand
	// LeftHand is the left-hand circular part (LHCP).
	LeftHand
)

// intensity returns the radiation intensity of component c, W/sr:
// U = |rE_c|²/(2η0).
func (f FarField) intensity(c Component) float64 {
	var e2 float64
	switch c {
	case RightHand:
		e2 = abs2(f.Right())
	case LeftHand:
		e2 = abs2(f.Left())
	default:
		e2 = abs2(f.Theta) + abs2(f.Phi)
	}
	return e2 / (2 * eta0)
}

// Field returns the far field in direction d. Over a perfect ground the
// images are included and directions below the horizon (θ > π/2) return
// zero.
// Source: E = −jωμ e^{−jkr}/(4πr) ∫ J⊥ e^{jk r̂·r′} dl′, Balanis ch. 4 and 12.
func (s *Solution) Field(d Direction) FarField {
	m := s.mesh
	if m.ground && d.Theta > math.Pi/2+1e-12 {
		return FarField{}
	}
	r, _, _ := d.unit()
	k := s.omega / c0
	var vx, vy, vz complex128
	accumulate := func(sg *segment, i0, i1 complex128, t geom.Vec3) {
		x := k * sg.l * r.Dot(sg.t)
		e0, e1 := phaseMoments(x)
		ph0 := expj(k * r.Dot(sg.p0))
		a := scale(ph0, sg.l) * (i0*(e0-e1) + i1*e1)
		vx += scale(a, t.X)
		vy += scale(a, t.Y)
		vz += scale(a, t.Z)
	}
	for i := range m.segs {
		sg := &m.segs[i]
		accumulate(sg, s.ends[i][0], s.ends[i][1], sg.t)
		if m.ground {
			im := &m.img[i]
			accumulate(im, s.ends[i][0], s.ends[i][1], geom.Vec3{X: -sg.t.X, Y: -sg.t.Y, Z: sg.t.Z})
		}
	}
	f := complex(0, -s.omega*mu0/(4*math.Pi))
	return transverse([3]complex128{f * vx, f * vy, f * vz}, d)
}

// transverse returns the θ̂ and φ̂ components of the complex vector e in
// direction d.
func transverse(e [3]complex128, d Direction) FarField {
	_, th, ph := d.unit()
	proj := func(u geom.Vec3) complex128 {
		return e[0]*complex(u.X, 0) + e[1]*complex(u.Y, 0) + e[2]*complex(u.Z, 0)
	}
	return FarField{Theta: proj(th), Phi: proj(ph)}
}

// phaseMoments returns ∫₀¹ e^{jxu} du and ∫₀¹ u e^{jxu} du.
func phaseMoments(x float64) (complex128, complex128) {
	if math.Abs(x) < 1e-3 {
		x2 := x * x
		return complex(1-x2/6, x/2-x*x2/24), complex(0.5-x2/8, x/3-x*x2/30)
	}
	e := expj(x)
	e0 := divJ(e-1, x)
	return e0, divJ(e-e0, x)
}

// expj returns e^{jx}: the value cmplx.Exp gives for a purely imaginary
// argument (whose modulus factor is exactly 1).
func expj(x float64) complex128 {
	s, c := math.Sincos(x)
	return complex(c, s)
}

// divJ returns c/(jx) for real x ≠ 0: the value the general complex
// division gives for a purely imaginary divisor.
func divJ(c complex128, x float64) complex128 { return complex(imag(c)/x, -real(c)/x) }
