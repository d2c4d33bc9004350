package em

// Filling the impedance matrix. Segment pairs (p, q ≥ p) are integrated in
// parallel a block of test segments at a time into pre-indexed storage,
// and each pair's moments are turned there into its four entries between
// the rising and falling halves on p and q; then each frequency's matrix
// takes those entries into the basis functions that live on p and q on one
// goroutine (the matrices in parallel), in a fixed order, so the matrix is
// the same bit for bit on any number of cores.
//
// Z_mn = jωμ ∫∫ f_m·f_n G − (j/ωε) ∫∫ (∇·f_m)(∇·f_n) G (+ surface impedance
// on the diagonal blocks), plus, over a ground plane, the same with the
// source mirrored and negated (image current: horizontal part reversed,
// vertical part kept; image charge negated).
// Source: Harrington 1968 ch. 4; Balanis ch. 8; EM.md §2.

import (
	"math"
	"math/cmplx"
)

// Physical constants (SI). Source: CODATA 2018 (c exact; μ0 measured).
const (
	c0   = 299792458.0
	mu0  = 1.25663706212e-6
	eps0 = 1 / (mu0 * c0 * c0)
	eta0 = mu0 * c0
)

const fillBlock = 32

// pairMemory returns the bytes fillMany's block storage takes per
// frequency.
func (m *Mesh) pairMemory() int {
	b := fillBlock * len(m.segs) * 4 * 16 // moments: four complex128
	if m.ground {
		b *= 2
	}
	return b
}

// fill writes the n×n impedance matrix at angular frequency omega into z
// (row-major, overwritten).
func (m *Mesh) fill(z []complex128, omega float64) {
	m.fillMany([][]complex128{z}, []float64{omega}, nil)
}

// fillMany writes the impedance matrices at the angular frequencies omegas
// into zs (one n×n row-major matrix each, overwritten). The frequencies
// share each pair's geometry, and the kernel's phase across a run of
// equally spaced frequencies is stepped by one rotation per frequency
// (see phasePlan) instead of a sine and cosine each. buf, when not nil,
// holds the storage for one block's pair entries (pairMemory bytes per
// frequency) and is kept across calls, grown as needed.
func (m *Mesh) fillMany(zs [][]complex128, omegas []float64, buf *[]moments) {
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
	per := fillBlock * ns * nf
	var b []moments
	if buf != nil {
		b = *buf
	}
	if m.ground {
		per *= 2
	}
	if cap(b) < per {
		b = make([]moments, per)
		if buf != nil {
			*buf = b
		}
	}
	direct, image := b[:fillBlock*ns*nf], b[fillBlock*ns*nf:per]
	for p0 := 0; p0 < ns; p0 += fillBlock {
		p1 := min(p0+fillBlock, ns)
		parallelFor(m.workers, p1-p0, func(i int) {
			p := p0 + i
			w := plan.scratch()
			d := direct[i*ns*nf : (i+1)*ns*nf]
			m.row(d, p, m.segs, &m.near, plan, w)
			m.entries(d, p, m.segs, 1, vec, sca)
			if m.ground {
				g := image[i*ns*nf : (i+1)*ns*nf]
				m.row(g, p, m.img, &m.nearImg, plan, w)
				m.entries(g, p, m.img, -1, vec, sca)
			}
		})
		// Each matrix takes the block's entries on one goroutine, in the
		// same order whatever the number of them.
		parallelFor(m.workers, nf, func(f int) {
			z := zs[f]
			for p := p0; p < p1; p++ {
				i := p - p0
				for q := p; q < ns; q++ {
					at := (i*ns+q)*nf + f
					m.scatter(z, p, q, &direct[at])
					if m.ground {
						m.scatter(z, p, q, &image[at])
					}
				}
				if m.segs[p].sigma > 0 {
					m.addLoss(z, p, omegas[f])
				}
			}
		})
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

// entries turns test segment p's moments against sources src[q], q ≥ p,
// at every frequency (out[q·nf + f], as row wrote them) into the pairs'
// entries, in place: entry 2a + b is the term between the half on p that
// rises (a = 1) or falls (a = 0) and the half on q that rises (b = 1) or
// falls. sign is +1 for the direct sources and −1 for their images; vec
// and sca are the vector- and scalar-potential factors jωμ and −j/(ωε)
// per frequency; the Green's function's 1/(4π) is applied here.
func (m *Mesh) entries(out []moments, p int, src []segment, sign float64, vec, sca []complex128) {
	nf := len(vec)
	sp := &m.segs[p]
	for q := p; q < len(src); q++ {
		sq := &m.segs[q]
		lp, lq := sp.l, sq.l
		dot := sp.t.Dot(src[q].t)
		for f := range nf {
			mo := &out[q*nf+f]
			for j := range mo {
				mo[j] = scale(mo[j], sign/(4*math.Pi))
			}
			var shape [2][2]complex128 // [rising on p][rising on q]
			shape[1][1] = divReal(mo[3], lp*lq)
			shape[1][0] = divReal(mo[1]-divReal(mo[3], lq), lp)
			shape[0][1] = divReal(mo[2]-divReal(mo[3], lp), lq)
			shape[0][0] = mo[0] - divReal(mo[1], lp) - divReal(mo[2], lq) + divReal(mo[3], lp*lq)
			v := scale(vec[f], dot)
			s := divReal(sca[f]*mo[0], lp*lq)
			for a := range 2 {
				for b := range 2 {
					ds := s
					if a != b {
						ds = -s
					}
					mo[2*a+b] = v*shape[a][b] + ds
				}
			}
		}
	}
}

// scatter adds one pair's entries (see entries) to z, times the halves'
// signs.
func (m *Mesh) scatter(z []complex128, p, q int, e *moments) {
	n := m.nBasis
	for _, h := range m.halves[p] {
		for _, g := range m.halves[q] {
			val := scale(e[2*b2i(h.rising)+b2i(g.rising)], h.sign*g.sign)
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
