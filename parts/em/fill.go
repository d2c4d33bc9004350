package em

// Filling the impedance matrix. Segment pairs (p, q ≥ p) are integrated in
// parallel a block of test segments at a time into pre-indexed storage;
// one goroutine then scatters each pair's moments into the basis functions
// that live on p and q, in a fixed order, so the matrix is the same bit for
// bit on any number of cores and exactly symmetric.
//
// Z_mn = jωμ ∫∫ f_m·f_n G − (j/ωε) ∫∫ (∇·f_m)(∇·f_n) G (+ surface impedance
// on the diagonal blocks), plus, over a ground plane, the same with the
// source mirrored and negated (image current: horizontal part reversed,
// vertical part kept; image charge negated).
// Source: Harrington 1968 ch. 4; Balanis ch. 8; EM.md §2.

import (
	"math"
	"math/cmplx"

	"coilwright/cam/geom"
)

// Physical constants (SI). Source: CODATA 2018 (c exact; μ0 measured).
const (
	c0   = 299792458.0
	mu0  = 1.25663706212e-6
	eps0 = 1 / (mu0 * c0 * c0)
	eta0 = mu0 * c0
)

const fillBlock = 32

// fill writes the n×n impedance matrix at angular frequency omega into z
// (row-major, overwritten).
func (m *Mesh) fill(z []complex128, omega float64) {
	m.fillMany([][]complex128{z}, []float64{omega})
}

// fillMany writes the impedance matrices at the angular frequencies omegas
// into zs (one n×n row-major matrix each, overwritten). The frequencies
// share each pair's geometry, and the kernel's phase across a run of
// equally spaced frequencies is stepped by one rotation per frequency
// (see phasePlan) instead of a sine and cosine each.
func (m *Mesh) fillMany(zs [][]complex128, omegas []float64) {
	n := m.nBasis
	nf := len(omegas)
	for _, z := range zs {
		clear(z[:n*n])
	}
	ks := make([]float64, nf)
	vec := make([]complex128, nf)
	sca := make([]complex128, nf)
	for f, w := range omegas {
		ks[f] = w / c0
		vec[f] = complex(0, w*mu0)
		sca[f] = complex(0, -1/(w*eps0))
	}
	plan := newPhasePlan(ks)
	ns := len(m.segs)
	direct := make([]moments, fillBlock*ns*nf)
	var image []moments
	if m.ground {
		image = make([]moments, fillBlock*ns*nf)
	}
	for p0 := 0; p0 < ns; p0 += fillBlock {
		p1 := min(p0+fillBlock, ns)
		parallelFor(m.workers, p1-p0, func(i int) {
			p := p0 + i
			w := plan.scratch()
			m.row(direct[i*ns*nf:(i+1)*ns*nf], p, m.segs, &m.near, plan, w)
			if m.ground {
				m.row(image[i*ns*nf:(i+1)*ns*nf], p, m.img, &m.nearImg, plan, w)
			}
		})
		for p := p0; p < p1; p++ {
			i := p - p0
			for q := p; q < ns; q++ {
				at := (i*ns + q) * nf
				for f, z := range zs {
					m.scatter(z, p, q, direct[at+f], m.segs[q].t, 1, vec[f], sca[f])
					if m.ground {
						m.scatter(z, p, q, image[at+f], m.img[q].t, -1, vec[f], sca[f])
					}
				}
			}
			if s := m.segs[p]; s.sigma > 0 {
				for f, z := range zs {
					m.addLoss(z, p, omegas[f])
				}
			}
		}
	}
}

// row integrates test segment p against sources src[q], q ≥ p, at every
// frequency of plan into out[q·nf + f].
func (m *Mesh) row(out []moments, p int, src []segment, near *pairList, plan *phasePlan, w *phaseScratch) {
	sp := &m.segs[p]
	nf := len(plan.k)
	ni := near.start[p]
	for q := p; q < len(src); q++ {
		sq := &src[q]
		a2 := pairA2(sp, sq)
		o := out[q*nf : (q+1)*nf]
		if ni < near.start[p+1] && near.q[ni] == q {
			st := &near.st[ni]
			remainderPair(o, sp, sq, a2, plan, w, &m.rules.rem)
			for f, k := range plan.k {
				h := 0.5 * k * k
				for j := range 4 {
					o[f][j] += complex(st[j]-h*st[4+j], 0)
				}
			}
			ni++
			continue
		}
		sep := separation(sp, sq)
		ru := &m.rules.far[0]
		if sep >= m.rules.farRatio {
			ru = &m.rules.far[1]
		}
		farPair(o, sp, sq, a2, plan, w, ru)
	}
}

// scatter adds one pair's contribution to z: sign is +1 for the direct
// source and −1 for its image; tq is the source segment's direction and
// pi4 the Green's function's 1/(4π) is applied here.
func (m *Mesh) scatter(z []complex128, p, q int, mo moments, tq geom.Vec3, sign float64, vec, sca complex128) {
	n := m.nBasis
	sp, sq := &m.segs[p], &m.segs[q]
	for j := range mo {
		mo[j] = scale(mo[j], sign/(4*math.Pi))
	}
	lp, lq := sp.l, sq.l
	var shape [2][2]complex128 // [rising on p][rising on q]
	shape[1][1] = divReal(mo[3], lp*lq)
	shape[1][0] = divReal(mo[1]-divReal(mo[3], lq), lp)
	shape[0][1] = divReal(mo[2]-divReal(mo[3], lp), lq)
	shape[0][0] = mo[0] - divReal(mo[1], lp) - divReal(mo[2], lq) + divReal(mo[3], lp*lq)
	v := scale(vec, sp.t.Dot(tq))
	s := divReal(sca*mo[0], lp*lq)
	for _, h := range m.halves[p] {
		for _, g := range m.halves[q] {
			ds := s
			if h.rising != g.rising {
				ds = -s
			}
			val := scale(v*shape[b2i(h.rising)][b2i(g.rising)]+ds, h.sign*g.sign)
			z[h.basis*n+g.basis] += val
			if p != q {
				z[g.basis*n+h.basis] += val
			}
		}
	}
}

// addLoss adds the surface-impedance term ∫ f_m·f_n Z_s/(2πa) ds of segment
// p, Z_s = (1 + j)√(ωμ0/(2σ)).
// Source: skin-effect surface impedance of a good conductor, e.g. Balanis
// ch. 2 (loss resistance of a wire); EM.md §2.
func (m *Mesh) addLoss(z []complex128, p int, omega float64) {
	n := m.nBasis
	sp := &m.segs[p]
	rs := math.Sqrt(omega * mu0 / (2 * sp.sigma))
	zl := complex(rs, rs) / complex(2*math.Pi*sp.a, 0)
	for _, h := range m.halves[p] {
		for _, g := range m.halves[p] {
			w := sp.l / 6
			if h.rising == g.rising {
				w = sp.l / 3
			}
			z[h.basis*n+g.basis] += complex(h.sign*g.sign*w, 0) * zl
		}
	}
}

// divReal returns c/d for real d: the same value the general complex
// division gives for a divisor with zero imaginary part, without its
// scaling steps.
func divReal(c complex128, d float64) complex128 { return complex(real(c)/d, imag(c)/d) }

// scale returns c·x for real x: the same value as c*complex(x, 0).
func scale(c complex128, x float64) complex128 { return complex(real(c)*x, imag(c)*x) }

func b2i(b bool) int {
	if b {
		return 1
	}
	return 0
}

// lossPower returns ½ Σ ∫ |I|² Re(Z_s)/(2πa) ds over all lossy segments,
// from the segment end currents (A), in watts.
func (m *Mesh) lossPower(ends [][2]complex128, omega float64) float64 {
	var p float64
	for i, s := range m.segs {
		if s.sigma <= 0 {
			continue
		}
		rs := math.Sqrt(omega * mu0 / (2 * s.sigma))
		i0, i1 := ends[i][0], ends[i][1]
		sq := (abs2(i0) + abs2(i1) + real(i0*cmplx.Conj(i1))) * s.l / 3
		p += 0.5 * rs / (2 * math.Pi * s.a) * sq
	}
	return p
}

func abs2(c complex128) float64 { return real(c)*real(c) + imag(c)*imag(c) }
