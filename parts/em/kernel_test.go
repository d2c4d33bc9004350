package em

import (
	"math/cmplx"
	"testing"
)

// phaseTol bounds the rounding a stepped phase may add, relative: about
// one unit in the last place per grid step over the longest run tested,
// at distances up to 0.21 m (kR up to 30, about five wavelengths).
const phaseTol = 1e-14

func TestPhasePlanRuns(t *testing.T) {
	const k0, dk = 110.0, 1.7 // rad/m: about 5.25 GHz in steps of 81 MHz
	grid := func(ns ...float64) []float64 {
		out := make([]float64, len(ns))
		for i, n := range ns {
			out[i] = k0 + n*dk
		}
		return out
	}
	for _, c := range []struct {
		name  string
		ks    []float64
		sines int // sines and cosines per distance: runs plus their distinct steps
	}{
		{"sweep of 21 and its centre", append(grid(0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20), k0+9.83*dk), 3},
		{"four picked from the sweep and the centre", append(grid(0, 7, 13, 20), k0+9.83*dk), 4},
		{"falling", grid(20, 13, 7, 0), 3},
		{"a pair", grid(0, 5), 2},
		{"equal steps, then a jump", grid(0, 1, 2, 40), 3},
		{"off the grid", grid(0, 1, 2.37), 3},
		{"repeated", grid(3, 3, 3), 2},
	} {
		t.Run(c.name, func(t *testing.T) {
			p := newPhasePlan(c.ks)
			sines := 0
			for _, r := range p.runs {
				sines += 1 + len(r.steps)
			}
			if sines != c.sines {
				t.Errorf("%d sines and cosines per distance, want %d", sines, c.sines)
			}
			w := p.scratch()
			for _, R := range []float64{1e-4, 0.013, 0.07, 0.21} {
				e := p.phases(w, R)
				for f, k := range c.ks {
					if d := cmplx.Abs(e[f] - expj(-k*R)); d > phaseTol {
						t.Errorf("R = %g m, k = %g: phase off by %.2g", R, k, d)
					}
				}
			}
		})
	}
}

func TestPhasePlanEqualStepsKeepTheirBits(t *testing.T) {
	// An equally spaced run gives the same bits whatever follows it: a
	// sweep's phases do not depend on the centre frequency solved with it.
	ks := []float64{100, 101.5, 103, 104.5}
	a := newPhasePlan(ks)
	b := newPhasePlan(append(ks, 102.2))
	ea := a.phases(a.scratch(), 0.21)
	eb := b.phases(b.scratch(), 0.21)
	for f := range ea {
		if ea[f] != eb[f] {
			t.Errorf("phase %d: %v vs %v", f, ea[f], eb[f])
		}
	}
}
