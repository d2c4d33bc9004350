package em

import (
	"math"
	"math/cmplx"
	"runtime"
)

// singularPivot is the pivot size, relative to the largest matrix entry,
// below which the impedance matrix counts as singular.
const singularPivot = 1e-9

// Solution is the current distribution at one frequency and what follows
// from it. It keeps a reference to its Mesh for far-field work.
type Solution struct {
	// Frequency in hertz.
	Frequency float64
	// Impedance is the input impedance at the feed, ohms.
	Impedance complex128
	// Voltage is the feed's gap voltage, volts.
	Voltage complex128
	// FeedCurrent is the current through the gap along the fed wire, amperes.
	FeedCurrent complex128
	// Coefficients are the basis-function amplitudes, amperes.
	Coefficients []complex128

	mesh  *Mesh
	omega float64
	ends  [][2]complex128 // current at each segment's start and end, along t
}

// Solve fills and solves the moment-method system at freq (Hz). It
// returns a *FrequencyError, *SingularMatrixError or *NotFiniteError on
// failure.
func (m *Mesh) Solve(freq float64) (*Solution, error) {
	z := make([]complex128, m.nBasis*m.nBasis)
	return m.solve(freq, z, make([]int, m.nBasis))
}

// sweepMemory bounds the matrix storage of one group of a sweep's
// frequencies, bytes (see Sweep). The fill's block storage, kept across
// the groups, adds pairMemory per frequency of a group. The size trades
// the geometry the frequencies of a group share against the peak memory
// of a build (kit's benchmarks and the build's peak resident size show
// both).
const sweepMemory = 24 << 20

// Sweep solves at each frequency (Hz). The frequencies are filled in
// groups, as many at a time as sweepMemory holds matrices for, sharing
// each segment pair's geometry and phases (fillMany); each group's
// matrices are then factored one per worker, each on its own goroutine,
// or, in a group with fewer matrices than workers, one after the other
// with the workers sharing each factorisation: the work runs in parallel
// at one level only. The groups depend only on the frequencies and the
// matrix order, and a factorisation is the same whoever runs it, so the
// results are in the order of freqs and do not depend on the number of
// cores; the first error in that order is returned.
func (m *Mesh) Sweep(freqs []float64) ([]*Solution, error) {
	out := make([]*Solution, len(freqs))
	errs := make([]error, len(freqs))
	n := m.nBasis
	per := max(1, sweepMemory/(16*n*n))
	groups := (len(freqs) + per - 1) / max(per, 1)
	var zs [][]complex128
	var buf []moments
	piv := make([][]int, 0, per)
	for g := range groups {
		// Spread the frequencies evenly over the groups.
		lo, hi := g*len(freqs)/groups, (g+1)*len(freqs)/groups
		for len(zs) < hi-lo {
			zs = append(zs, make([]complex128, n*n))
			piv = append(piv, make([]int, n))
		}
		omegas := make([]float64, 0, hi-lo)
		ok := make([]int, 0, hi-lo) // indices with a valid frequency
		for i := lo; i < hi; i++ {
			if err := checkFrequency(freqs[i]); err != nil {
				errs[i] = err
				continue
			}
			ok = append(ok, i)
			omegas = append(omegas, 2*math.Pi*freqs[i])
		}
		m.fillMany(zs[:len(ok)], omegas, &buf)
		outer, inner := m.workerCount(), 1
		if len(ok) < outer {
			outer, inner = 1, outer
		}
		parallelFor(outer, len(ok), func(j int) {
			i := ok[j]
			out[i], errs[i] = m.solveFilled(freqs[i], zs[j], piv[j], inner)
		})
	}
	for _, err := range errs {
		if err != nil {
			return nil, err
		}
	}
	return out, nil
}

// matrix returns the impedance matrix at freq (Hz), row-major n×n. It is
// for checks (symmetry, reciprocity); Solve does not keep it.
func (m *Mesh) matrix(freq float64) []complex128 {
	z := make([]complex128, m.nBasis*m.nBasis)
	m.fill(z, 2*math.Pi*freq)
	return z
}

func (m *Mesh) solve(freq float64, z []complex128, piv []int) (*Solution, error) {
	if err := checkFrequency(freq); err != nil {
		return nil, err
	}
	m.fill(z, 2*math.Pi*freq)
	return m.solveFilled(freq, z, piv, m.workers)
}

// workerCount returns the number of goroutines the mesh's work may use.
func (m *Mesh) workerCount() int {
	if m.workers > 0 {
		return m.workers
	}
	return runtime.GOMAXPROCS(0)
}

// checkFrequency refuses a frequency that is not positive and finite.
func checkFrequency(freq float64) error {
	if !(freq > 0) || math.IsInf(freq, 0) {
		return &FrequencyError{Value: freq}
	}
	return nil
}

// solveFilled factors the matrix z, filled at freq, on at most workers
// goroutines and solves for the feed.
func (m *Mesh) solveFilled(freq float64, z []complex128, piv []int, workers int) (*Solution, error) {
	n := m.nBasis
	omega := 2 * math.Pi * freq
	scale := 0.0
	for _, v := range z[:n*n] {
		if c := cabs1(v); c > scale || math.IsNaN(c) {
			scale = c
		}
	}
	if math.IsNaN(scale) || math.IsInf(scale, 0) {
		return nil, &NotFiniteError{Frequency: freq, Quantity: "impedance matrix"}
	}
	x := make([]complex128, n)
	gw := m.gapWeights()
	for _, g := range gw {
		x[g.basis] = m.voltage * complex(g.w, 0)
	}
	if !ldlSolve(z, n, x, singularPivot*scale, workers) {
		if col := luFactor(z, n, piv, singularPivot*scale, workers); col >= 0 {
			return nil, &SingularMatrixError{Frequency: freq, Column: col}
		}
		luSolve(z, n, piv, x)
	}
	var iGap complex128
	for _, g := range gw {
		iGap += x[g.basis] * complex(g.w, 0)
	}
	s := &Solution{Frequency: freq, Voltage: m.voltage, FeedCurrent: iGap, Coefficients: x, mesh: m, omega: omega}
	s.Impedance = m.voltage / iGap
	if cmplx.IsNaN(s.Impedance) || cmplx.IsInf(s.Impedance) {
		return nil, &NotFiniteError{Frequency: freq, Quantity: "input impedance"}
	}
	s.ends = make([][2]complex128, len(m.segs))
	for p, hs := range m.halves {
		for _, h := range hs {
			s.ends[p][b2i(h.rising)] += complex(h.sign, 0) * x[h.basis]
		}
	}
	return s, nil
}

// InputPower returns ½ Re(V I*) at the feed, watts.
func (s *Solution) InputPower() float64 {
	return 0.5 * real(s.Voltage*cmplx.Conj(s.FeedCurrent))
}

// LossPower returns the power dissipated in the wires' conductivity,
// watts, from the surface-impedance model.
func (s *Solution) LossPower() float64 { return s.mesh.lossPower(s.ends, s.omega) }

// Efficiency returns the radiation efficiency 1 − P_loss/P_in (0..1).
func (s *Solution) Efficiency() float64 { return 1 - s.LossPower()/s.InputPower() }

// Wavenumber returns k = ω/c in rad/m.
func (s *Solution) Wavenumber() float64 { return s.omega / c0 }
