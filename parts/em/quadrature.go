package em

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// rule is a quadrature rule on [0, 1]: nodes X with weights W.
type rule struct{ X, W []float64 }

// legendre returns the n-point Gauss–Legendre rule on [0, 1].
// Source: gonum integrate/quad Legendre (Golub–Welsch nodes and weights).
func legendre(n int) rule {
	r := rule{X: make([]float64, n), W: make([]float64, n)}
	quad.Legendre{}.FixedLocations(r.X, r.W, 0, 1)
	return r
}

// tanhSinh returns the double-exponential (tanh-sinh) rule on [0, 1] with
// step h in the transformed variable t ∈ [−tMax, tMax]. Its nodes crowd
// double-exponentially towards both ends, so integrands with logarithmic
// end behaviour converge exponentially in 1/h.
// Source: H. Takahasi and M. Mori, "Double exponential formulas for
// numerical integration", Publ. RIMS 9, 1974.
func tanhSinh(h, tMax float64) rule {
	k := int(math.Ceil(tMax / h))
	var r rule
	for i := -k; i <= k; i++ {
		t := float64(i) * h
		u := math.Pi / 2 * math.Sinh(t)
		ch := math.Cosh(u)
		w := h * 0.5 * math.Pi / 2 * math.Cosh(t) / (ch * ch)
		if w < 1e-300 {
			continue
		}
		// x = (1 + tanh u)/2 written to keep precision near both ends.
		x := 1 / (1 + math.Exp(-2*u))
		r.X = append(r.X, x)
		r.W = append(r.W, w)
	}
	return r
}

// rules is the set of integration rules one mesh uses, fixed by its
// quadrature level.
type rules struct {
	// far holds Gauss–Legendre rules for far pairs, coarsest last.
	far [3]rule
	// farRatio[i] is the smallest separation, in segment lengths, at which
	// far[i] is used; closer pairs use a finer rule or the near treatment.
	farRatio [3]float64
	// nearRatio: pairs closer than this many segment lengths get the
	// near treatment (static terms extracted).
	nearRatio float64
	// rem is the Gauss–Legendre rule for the smooth remainder of near pairs.
	rem rule
	// de is the outer rule for static near-pair integrals.
	de rule
}

// newRules builds the rules for quadrature level lvl ≥ 0. Each level adds
// four points to every Gauss rule, halves the tanh-sinh step and widens the
// near zone.
func newRules(lvl int) *rules {
	lvl = max(lvl, 0)
	add := 4 * lvl
	r := &rules{
		far:       [3]rule{legendre(6 + add), legendre(4 + add), legendre(3 + add)},
		farRatio:  [3]float64{0, 4, 10},
		nearRatio: 2 * (1 + 0.5*float64(lvl)),
		rem:       legendre(6 + add),
		de:        tanhSinh(1.0/6/math.Pow(2, float64(lvl)), 3.2),
	}
	return r
}
