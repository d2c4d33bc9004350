package em

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// Gain returns the gain of component c in direction d (linear, relative to
// an isotropic radiator fed with the same input power): 4πU_c/P_in.
// Source: IEEE Std 145 (gain; partial gain per polarisation); Balanis ch. 2.
func (s *Solution) Gain(d Direction, c Component) float64 {
	return 4 * math.Pi * s.Field(d).intensity(c) / s.InputPower()
}

// DB returns 10·log10(x) (−Inf for 0).
func DB(x float64) float64 { return 10 * math.Log10(x) }

// RadiatedPower integrates the radiation intensity over the sphere (over
// the upper hemisphere above a perfect ground), watts. nTheta is the number
// of Gauss–Legendre points in cos θ (zero picks one from the structure's
// electrical size); φ uses 2·nTheta equally spaced points, exact for the
// trigonometric polynomials a finite source radiates.
func (s *Solution) RadiatedPower(nTheta int) float64 {
	m := s.mesh
	if nTheta <= 0 {
		rmax := 0.0
		for _, sg := range m.segs {
			rmax = max(rmax, sg.p0.Len(), sg.p1.Len())
		}
		nTheta = max(24, int(math.Ceil(s.omega/c0*rmax))+16)
	}
	lo := -1.0
	if m.ground {
		lo = 0
	}
	u := make([]float64, nTheta)
	w := make([]float64, nTheta)
	quad.Legendre{}.FixedLocations(u, w, lo, 1)
	nPhi := 2 * nTheta
	rows := make([]float64, nTheta)
	parallelFor(s.mesh.workers, nTheta, func(i int) {
		th := math.Acos(u[i])
		var sum float64
		for j := range nPhi {
			sum += s.Field(Direction{th, 2 * math.Pi * float64(j) / float64(nPhi)}).intensity(Total)
		}
		rows[i] = sum * w[i] * 2 * math.Pi / float64(nPhi)
	})
	var p float64
	for _, r := range rows {
		p += r
	}
	return p
}

// Peak returns the direction of greatest gain of component c and that gain
// (linear): a 3° search over the sphere (hemisphere over ground) refined by
// a shrinking compass search to 0.01°.
func (s *Solution) Peak(c Component) (Direction, float64) {
	thMax := math.Pi
	if s.mesh.ground {
		thMax = math.Pi / 2
	}
	step := 3 * math.Pi / 180
	nt := int(math.Round(thMax/step)) + 1
	np := int(math.Round(2 * math.Pi / step))
	vals := make([]float64, nt*np)
	parallelFor(s.mesh.workers, nt, func(i int) {
		for j := range np {
			vals[i*np+j] = s.Gain(Direction{float64(i) * step, float64(j) * step}, c)
		}
	})
	best := 0
	for i, v := range vals {
		if v > vals[best] {
			best = i
		}
	}
	d := Direction{float64(best/np) * step, float64(best%np) * step}
	g := vals[best]
	for h := step / 2; h > 1e-4*math.Pi/180; h /= 2 {
		for moved := true; moved; {
			moved = false
			for _, n := range []Direction{{d.Theta + h, d.Phi}, {d.Theta - h, d.Phi}, {d.Theta, d.Phi + h}, {d.Theta, d.Phi - h}} {
				if n.Theta < 0 || n.Theta > thMax {
					continue
				}
				if v := s.Gain(n, c); v > g {
					d, g, moved = n, v, true
				}
			}
		}
	}
	return d, g
}

// CutPoint is one sample of a pattern cut: Theta is the signed angle from
// +z in the cut plane (negative on the far side of the axis, radians),
// Right and Left the circular gains (linear).
type CutPoint struct {
	Theta       float64
	Right, Left float64
}

// inCut returns the direction at signed angle a in the plane through the z
// axis at azimuth phi.
func inCut(a, phi float64) Direction {
	if a < 0 {
		return Direction{-a, phi + math.Pi}
	}
	return Direction{a, phi}
}

// Cut samples the circular gains every step radians in the plane through
// the z axis at azimuth phi, from −π to π (−π/2 to π/2 over ground).
func (s *Solution) Cut(phi, step float64) []CutPoint {
	lim := math.Pi
	if s.mesh.ground {
		lim = math.Pi / 2
	}
	n := int(math.Floor(2*lim/step+1e-9)) + 1
	out := make([]CutPoint, n)
	parallelFor(s.mesh.workers, n, func(i int) {
		a := -lim + float64(i)*step
		f := s.Field(inCut(a, phi))
		p := s.InputPower()
		out[i] = CutPoint{Theta: a, Right: 4 * math.Pi * f.intensity(RightHand) / p, Left: 4 * math.Pi * f.intensity(LeftHand) / p}
	})
	return out
}

// Beamwidth returns the half-power beamwidth (radians) of component c in
// the plane through the z axis at azimuth phi, about the cut's maximum.
// ok is false when the gain does not fall to half on both sides within the
// cut (within the upper half-plane over ground).
func (s *Solution) Beamwidth(c Component, phi float64) (width float64, ok bool) {
	lim := math.Pi
	if s.mesh.ground {
		lim = math.Pi / 2
	}
	step := 0.5 * math.Pi / 180
	n := int(math.Floor(2*lim/step+1e-9)) + 1
	g := make([]float64, n)
	parallelFor(s.mesh.workers, n, func(i int) { g[i] = s.Gain(inCut(-lim+float64(i)*step, phi), c) })
	best := 0
	for i, v := range g {
		if v > g[best] {
			best = i
		}
	}
	half := g[best] / 2
	at := func(a float64) float64 { return s.Gain(inCut(a, phi), c) - half }
	edge := func(dir int) (float64, bool) {
		i := best
		for i+dir >= 0 && i+dir < n && g[i+dir] > half {
			i += dir
		}
		if i+dir < 0 || i+dir >= n {
			return 0, false
		}
		in, out := -lim+float64(i)*step, -lim+float64(i+dir)*step
		for range 40 {
			mid := 0.5 * (in + out)
			if at(mid) > 0 {
				in = mid
			} else {
				out = mid
			}
		}
		return 0.5 * (in + out), true
	}
	lo, ok1 := edge(-1)
	hi, ok2 := edge(1)
	if !ok1 || !ok2 {
		return 0, false
	}
	return hi - lo, true
}

// FrontToBack returns the ratio (dB) of component c's gain towards front to
// that towards the opposite direction. ok is false when the opposite
// direction is shadowed by a perfect ground (no back radiation exists).
func (s *Solution) FrontToBack(c Component, front Direction) (ratioDB float64, ok bool) {
	back := Direction{math.Pi - front.Theta, front.Phi + math.Pi}
	if s.mesh.ground && back.Theta > math.Pi/2 {
		return math.Inf(1), false
	}
	return DB(s.Gain(front, c) / s.Gain(back, c)), true
}
