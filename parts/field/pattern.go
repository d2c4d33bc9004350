package field

import (
	"math"
	"math/cmplx"

	"coilwright/parts/em"
)

// pattern evaluates a solution's circular gains with one far-field
// evaluation per direction (the solver's Gain evaluates the field once per
// component).
type pattern struct {
	s     *em.Solution
	scale float64 // linear gain per |rE|², from the solver's own Gain
	rhcp  bool
}

func newPattern(s *em.Solution, rhcp bool) *pattern {
	p := &pattern{s: s, rhcp: rhcp}
	for _, d := range []em.Direction{{}, {Theta: math.Pi / 2}, {Theta: math.Pi / 2, Phi: math.Pi / 2}, {Theta: math.Pi / 4, Phi: 1}} {
		f := s.Field(d)
		if e2 := abs2(f.Theta) + abs2(f.Phi); e2 > 0 {
			p.scale = s.Gain(d, em.Total) / e2
			break
		}
	}
	return p
}

func abs2(c complex128) float64 { r := cmplx.Abs(c); return r * r }

// gains returns the co- and cross-polar gains (linear) in direction d.
func (p *pattern) gains(d em.Direction) (co, cross float64) {
	f := p.s.Field(d)
	r, l := abs2(f.Right())*p.scale, abs2(f.Left())*p.scale
	if p.rhcp {
		return r, l
	}
	return l, r
}

func (p *pattern) co(d em.Direction) float64 { c, _ := p.gains(d); return c }

func (p *pattern) cross(d em.Direction) float64 { _, x := p.gains(d); return x }

// Peak-search grid. Common practice (no published source): a coarse grid
// finds the main lobe of an antenna a few wavelengths long (its lobes are
// tens of degrees wide); a shrinking compass search then refines it to
// peakTol.
const (
	peakGridTheta = 7.5 * math.Pi / 180
	peakGridPhi   = 30 * math.Pi / 180
	peakTol       = 0.05 * math.Pi / 180
)

// peaks returns the direction and gain of the co-polar maximum and the
// cross-polar maximum (linear) for θ in [0, thMax].
func (p *pattern) peaks(thMax float64) (em.Direction, float64, float64) {
	nt := int(math.Round(thMax/peakGridTheta)) + 1
	np := int(math.Round(2 * math.Pi / peakGridPhi))
	dc, dx := em.Direction{}, em.Direction{}
	gc, gx := p.gains(dc)
	for i := 1; i < nt; i++ {
		for j := range np {
			d := em.Direction{Theta: float64(i) * peakGridTheta, Phi: float64(j) * peakGridPhi}
			c, x := p.gains(d)
			if c > gc {
				dc, gc = d, c
			}
			if x > gx {
				dx, gx = d, x
			}
		}
	}
	dc, gc = refine(p.co, dc, gc, thMax)
	_, gx = refine(p.cross, dx, gx, thMax)
	return dc, gc, gx
}

// refineGain is the relative gain step the compass search must beat to
// move: along the axis every φ is the same direction, and rounding alone
// must not walk it round the pole.
const refineGain = 1e-9

// refineSteps bounds the moves at one step size.
const refineSteps = 200

// refine climbs from d by a shrinking compass search in θ and φ.
func refine(g func(em.Direction) float64, d em.Direction, v, thMax float64) (em.Direction, float64) {
	for h := peakGridTheta / 2; h > peakTol; h /= 2 {
		for moved, k := true, 0; moved && k < refineSteps; k++ {
			moved = false
			for _, n := range []em.Direction{{Theta: d.Theta + h, Phi: d.Phi}, {Theta: d.Theta - h, Phi: d.Phi},
				{Theta: d.Theta, Phi: d.Phi + 4*h}, {Theta: d.Theta, Phi: d.Phi - 4*h}} {
				if n.Theta < 0 || n.Theta > thMax {
					continue
				}
				if w := g(n); w > v*(1+refineGain) {
					n.Phi = math.Mod(n.Phi, 2*math.Pi)
					d, v, moved = n, w, true
				}
			}
		}
	}
	return d, v
}

// beamStep is the sampling step of a cut when looking for its half-power
// points; beamBisect the bisection steps that then place each point
// (5°/2¹⁴ ≈ 0.0003°).
const (
	beamStep   = 5 * math.Pi / 180
	beamBisect = 14
)

// inCut returns the direction at signed angle a from +z in the plane
// through the axis at azimuth phi.
func inCut(a, phi float64) em.Direction {
	if a < 0 {
		return em.Direction{Theta: -a, Phi: phi + math.Pi}
	}
	return em.Direction{Theta: a, Phi: phi}
}

// beamwidth returns the co-polar half-power beamwidth (radians) in the
// plane at azimuth phi, about the cut's maximum; ok is false when the gain
// does not fall to half on both sides within ±thMax.
func (p *pattern) beamwidth(phi, thMax float64) (float64, bool) {
	n := int(math.Round(2*thMax/beamStep)) + 1
	at := func(a float64) float64 { return p.co(inCut(a, phi)) }
	g := make([]float64, n)
	best := 0
	for i := range g {
		g[i] = at(-thMax + float64(i)*beamStep)
		if g[i] > g[best] {
			best = i
		}
	}
	a0, top := -thMax+float64(best)*beamStep, g[best]
	for h := beamStep / 2; h > peakTol; h /= 2 {
		for _, a := range []float64{a0 - h, a0 + h} {
			if math.Abs(a) <= thMax {
				if v := at(a); v > top {
					a0, top = a, v
				}
			}
		}
	}
	half := top / 2
	edge := func(dir float64) (float64, bool) {
		in := a0
		for {
			out := in + dir*beamStep
			if math.Abs(out) > thMax+1e-12 {
				return 0, false
			}
			if at(out) <= half {
				for range beamBisect {
					mid := 0.5 * (in + out)
					if at(mid) > half {
						in = mid
					} else {
						out = mid
					}
				}
				return 0.5 * (in + out), true
			}
			in = out
		}
	}
	lo, ok1 := edge(-1)
	hi, ok2 := edge(1)
	if !ok1 || !ok2 {
		return 0, false
	}
	return hi - lo, true
}
