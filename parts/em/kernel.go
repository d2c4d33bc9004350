package em

// Segment-pair integrals of the reduced kernel.
//
// For a test segment p (ξ ∈ [0, lp]) and a source segment q (ξ′ ∈ [0, lq])
// every function here returns the four moments
//
//	M0 = ∫∫ g,  M1 = ∫∫ ξ g,  M2 = ∫∫ ξ′ g,  M3 = ∫∫ ξ ξ′ g
//
// of a kernel g(R), R = √(|r − r′|² + a²), from which the products of the
// rising (ξ/l) and falling (1 − ξ/l) halves of triangle functions follow.
// Far pairs integrate e^{−jkR}/R by Gauss–Legendre on both segments. Near
// pairs split e^{−jkR}/R = 1/R − k²R/2 + rem(R): the two static terms are
// integrated in closed form along q and by tanh-sinh quadrature along p,
// once per geometry; the smooth remainder by Gauss–Legendre per frequency.
// Source: W. C. Gibson, The Method of Moments in Electromagnetics, thin-wire
// chapter (reduced kernel and singularity extraction); the closed forms are
// the elementary integrals of 1/√(x²+ρ²) and √(x²+ρ²).

import (
	"math"
	"sort"

	"coilwright/cam/geom"
)

// segment is one straight piece of wire, in metres.
type segment struct {
	p0, p1 geom.Vec3 // ends
	t      geom.Vec3 // unit direction p0 → p1
	c      geom.Vec3 // midpoint
	l      float64   // length
	a      float64   // radius
	sigma  float64   // conductivity S/m; 0 means perfect
	wire   int       // index into Model.Wires
	piece  int       // polyline piece index within that wire
}

func newSegment(p0, p1 geom.Vec3, a float64) segment {
	d := p1.Sub(p0)
	l := d.Len()
	return segment{p0: p0, p1: p1, t: d.Scale(1 / l), c: p0.Add(p1).Scale(0.5), l: l, a: a}
}

// mirror returns the segment reflected in the plane z = 0 (same parameter
// direction, mirrored points).
func (s segment) mirror() segment {
	m := s
	m.p0.Z, m.p1.Z, m.t.Z, m.c.Z = -s.p0.Z, -s.p1.Z, -s.t.Z, -s.c.Z
	return m
}

// moments holds M0..M3 of a complex kernel.
type moments [4]complex128

// staticMoments holds the moments of 1/R (first four) and R (last four).
type staticMoments [8]float64

// pairA2 is the squared reduced-kernel radius for a pair: the mean of the
// squared radii, symmetric in p and q so the matrix stays symmetric.
func pairA2(p, q *segment) float64 { return 0.5 * (p.a*p.a + q.a*q.a) }

// separation returns a lower bound on the distance between two segments
// divided by the longer length.
func separation(p, q *segment) float64 {
	d := p.c.Sub(q.c).Len() - 0.5*(p.l+q.l)
	return d / max(p.l, q.l)
}

// farPair integrates e^{−jkR}/R with the Gauss–Legendre rule r on both
// segments at every frequency of plan, into out[f].
func farPair(out []moments, p, q *segment, a2 float64, plan *phasePlan, w *phaseScratch, r *rule) {
	clear(out)
	n := len(r.X)
	s0, s2 := w.s0, w.s2
	for i := range n {
		xi := r.X[i] * p.l
		ri := p.p0.Add(p.t.Scale(xi))
		wi := r.W[i] * p.l
		clear(s0)
		clear(s2)
		for j := range n {
			xj := r.X[j] * q.l
			d := ri.Sub(q.p0.Add(q.t.Scale(xj)))
			R := math.Sqrt(d.Dot(d) + a2)
			g := r.W[j] * q.l / R
			e := plan.phases(w, R)
			for f, ef := range e {
				v := scale(ef, g)
				s0[f] += v
				s2[f] += scale(v, xj)
			}
		}
		for f := range out {
			a, b := scale(s0[f], wi), scale(s2[f], wi)
			out[f][0] += a
			out[f][1] += scale(a, xi)
			out[f][2] += b
			out[f][3] += scale(b, xi)
		}
	}
}

// remainderPair integrates rem(R) = (e^{−jkR} − 1)/R + k²R/2 with the
// Gauss–Legendre rule r on both segments at every frequency of plan, into
// out[f]. It works from the half-angle phase e^{−jkR/2} = c − js:
// sin kR = 2sc and cos kR − 1 = −2s², which keeps the leading terms from
// cancelling.
func remainderPair(out []moments, p, q *segment, a2 float64, plan *phasePlan, w *phaseScratch, r *rule) {
	clear(out)
	n := len(r.X)
	s0, s2 := w.s0, w.s2
	for i := range n {
		xi := r.X[i] * p.l
		ri := p.p0.Add(p.t.Scale(xi))
		wi := r.W[i] * p.l
		clear(s0)
		clear(s2)
		for j := range n {
			xj := r.X[j] * q.l
			d := ri.Sub(q.p0.Add(q.t.Scale(xj)))
			R := math.Sqrt(d.Dot(d) + a2)
			wj := r.W[j] * q.l
			g := wj / R
			e := plan.phases(w, 0.5*R)
			for f, ef := range e {
				c, sn := real(ef), -imag(ef)
				v := complex(-2*sn*sn*g+0.5*plan.k[f]*plan.k[f]*R*wj, -2*sn*c*g)
				s0[f] += v
				s2[f] += scale(v, xj)
			}
		}
		for f := range out {
			a, b := scale(s0[f], wi), scale(s2[f], wi)
			out[f][0] += a
			out[f][1] += scale(a, xi)
			out[f][2] += b
			out[f][3] += scale(b, xi)
		}
	}
}

// phasePlan evaluates e^{−jk_f R} for a list of wavenumbers k_f. A run of
// wavenumbers whose steps k_{f+1} − k_f take few distinct values (an
// equally spaced sweep takes one; a few points picked from a sweep, a
// couple) takes one sine and cosine for the run's first phase and one per
// distinct step e^{−jΔR}, then a complex rotation per frequency; the
// rounding this adds grows by about one unit in the last place per step
// (under 1e-14 over a run of any length the sweeps use). Other wavenumbers
// take a sine and cosine each. (Rotating by powers of one small step
// instead costs more than the sines it saves: the multiplications form one
// long dependent chain.)
type phasePlan struct {
	k    []float64
	runs []phaseRun
}

// phaseRun is a run of wavenumbers k[from:to]: k[from+i+1] lies
// steps[which[i]] above k[from+i].
type phaseRun struct {
	from, to int
	steps    []float64
	which    []int
}

// phaseStepTol is the relative difference within which two wavenumber
// steps count as equal (a sweep's frequencies are computed as
// lo + (hi − lo)·i/(n − 1), equal steps up to rounding).
const phaseStepTol = 1e-9

// newPhasePlan splits ks into runs, each as long as saves the most sines
// and cosines (the shortest of equals).
func newPhasePlan(ks []float64) *phasePlan {
	p := &phasePlan{k: ks}
	for i := 0; i < len(ks); {
		j, saved := i+1, 0
		for end := i + 2; end <= len(ks); end++ {
			steps, _ := distinctSteps(ks[i:end])
			if s := (end - i) - (1 + len(steps)); s > saved {
				j, saved = end, s
			}
		}
		r := phaseRun{from: i, to: j}
		if j-i > 1 {
			r.steps, r.which = distinctSteps(ks[i:j])
			if len(r.steps) == 1 {
				// Equal steps: the run's mean, from its ends.
				r.steps[0] = (ks[j-1] - ks[i]) / float64(j-1-i)
			}
		}
		p.runs = append(p.runs, r)
		i = j
	}
	return p
}

// distinctSteps returns the distinct steps between consecutive ks (each
// the mean of the steps equal to it within phaseStepTol, in order of first
// appearance) and, for each step, which of them it is.
func distinctSteps(ks []float64) (steps []float64, which []int) {
	var first []float64
	var count []int
	for i := 0; i+1 < len(ks); i++ {
		d := ks[i+1] - ks[i]
		u := -1
		for v, f := range first {
			if math.Abs(d-f) <= phaseStepTol*math.Abs(f) {
				u = v
				break
			}
		}
		if u < 0 {
			u = len(first)
			first = append(first, d)
			steps = append(steps, 0)
			count = append(count, 0)
		}
		steps[u] += d
		count[u]++
		which = append(which, u)
	}
	for u := range steps {
		steps[u] /= float64(count[u])
	}
	return steps, which
}

// phaseScratch is one worker's storage for a plan: the phases, the
// per-frequency sums of one quadrature row and the rotations of a run's
// steps.
type phaseScratch struct {
	e, s0, s2, rot []complex128
}

func (p *phasePlan) scratch() *phaseScratch {
	n := len(p.k)
	return &phaseScratch{e: make([]complex128, n), s0: make([]complex128, n), s2: make([]complex128, n), rot: make([]complex128, n)}
}

// phases writes e^{−jk_f R} for every f into w.e and returns it.
func (p *phasePlan) phases(w *phaseScratch, R float64) []complex128 {
	e := w.e
	for ri := range p.runs {
		r := &p.runs[ri]
		v := expj(-p.k[r.from] * R)
		e[r.from] = v
		if r.to-r.from < 2 {
			continue
		}
		if len(r.steps) == 1 {
			st := expj(-r.steps[0] * R)
			for f := r.from + 1; f < r.to; f++ {
				v *= st
				e[f] = v
			}
			continue
		}
		rot := w.rot[:len(r.steps)]
		for u, d := range r.steps {
			rot[u] = expj(-d * R)
		}
		for i, u := range r.which {
			v *= rot[u]
			e[r.from+1+i] = v
		}
	}
	return e
}

// staticPair integrates 1/R and R: in closed form along q, by the
// tanh-sinh rule de along p, split where the integrand has its sharp
// features (the projections of q's ends and the closest approach).
func staticPair(p, q *segment, a2 float64, de *rule) staticMoments {
	var out staticMoments
	brk := []float64{0, p.l}
	for _, x := range []float64{q.p0.Sub(p.p0).Dot(p.t), q.p1.Sub(p.p0).Dot(p.t), closestOnP(p, q)} {
		if x > 1e-6*p.l && x < p.l*(1-1e-6) {
			brk = append(brk, x)
		}
	}
	sort.Float64s(brk)
	for b := 0; b+1 < len(brk); b++ {
		u0, u1 := brk[b], brk[b+1]
		if u1-u0 < 1e-9*p.l {
			continue
		}
		for i, x := range de.X {
			xi := u0 + (u1-u0)*x
			w := de.W[i] * (u1 - u0)
			d := p.p0.Add(p.t.Scale(xi)).Sub(q.p0)
			s0 := d.Dot(q.t)
			rho2 := max(d.Dot(d)-s0*s0, 0) + a2
			rho := math.Sqrt(rho2)
			x1, x2 := -s0, q.l-s0
			R1 := math.Sqrt(x1*x1 + rho2)
			R2 := math.Sqrt(x2*x2 + rho2)
			var i0 float64
			if x1 < 0 && x2 < 0 {
				i0 = math.Asinh(-x1/rho) - math.Asinh(-x2/rho)
			} else {
				i0 = math.Asinh(x2/rho) - math.Asinh(x1/rho)
			}
			i1 := (R2 - R1) + s0*i0
			j0 := 0.5 * (x2*R2 - x1*R1 + rho2*i0)
			j1 := (R2*R2*R2-R1*R1*R1)/3 + s0*j0
			out[0] += w * i0
			out[1] += w * xi * i0
			out[2] += w * i1
			out[3] += w * xi * i1
			out[4] += w * j0
			out[5] += w * xi * j0
			out[6] += w * j1
			out[7] += w * xi * j1
		}
	}
	return out
}

// closestOnP returns the parameter on p (0..p.l) of the point closest to
// segment q. Source: C. Ericson, Real-Time Collision Detection, 2005, §5.1.9.
func closestOnP(p, q *segment) float64 {
	d1 := p.p1.Sub(p.p0)
	d2 := q.p1.Sub(q.p0)
	r := p.p0.Sub(q.p0)
	a, e, f := d1.Dot(d1), d2.Dot(d2), d2.Dot(r)
	c, b := d1.Dot(r), d1.Dot(d2)
	den := a*e - b*b
	s := 0.0
	if den > 1e-12*a*e {
		s = clamp01((b*f - c*e) / den)
	}
	t := (b*s + f) / e
	if t < 0 {
		s = clamp01(-c / a)
	} else if t > 1 {
		s = clamp01((b - c) / a)
	}
	return s * p.l
}

func clamp01(x float64) float64 { return min(max(x, 0), 1) }

// transpose returns the moments of the pair with p and q swapped.
func (m moments) transpose() moments { return moments{m[0], m[2], m[1], m[3]} }
