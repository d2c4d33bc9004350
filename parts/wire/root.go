// Brent's bracketed root finder.
//
// The springback inverse, the helix radius from curvature and the calibration
// fit all reduce to one monotone scalar equation f(x) = 0 on an interval where
// f changes sign. Brent's method keeps the bracket of bisection (it never
// leaves [a, b] and always converges) while taking inverse-quadratic or secant
// steps when they make progress, so it usually needs a handful of evaluations.
//
// Source: R. P. Brent, Algorithms for Minimization without Derivatives,
// Prentice-Hall 1973, ch. 4 (procedure zero).

package wire

import (
	"errors"
	"fmt"
	"math"
)

// errNoBracket reports that f has the same sign at both ends of the interval.
var errNoBracket = errors.New("root not bracketed")

// rootMaxIter bounds the iterations of findRoot; bisection alone halves a
// float64 interval to its last bit in fewer than 1100 steps.
const rootMaxIter = 2000

// findRoot returns x in [a, b] with f(x) = 0 to within xtol (absolute) plus
// four units of rounding of x. f(a) and f(b) must differ in sign (or one be
// zero); otherwise it returns errNoBracket. f must be continuous on [a, b].
func findRoot(f func(float64) float64, a, b, xtol float64) (float64, error) {
	fa, fb := f(a), f(b)
	switch {
	case fa == 0:
		return a, nil
	case fb == 0:
		return b, nil
	case math.IsNaN(fa) || math.IsNaN(fb):
		return 0, fmt.Errorf("root finder: f is NaN at an end of [%g, %g]", a, b)
	case (fa > 0) == (fb > 0):
		return 0, fmt.Errorf("%w: f(%g) = %g, f(%g) = %g", errNoBracket, a, fa, b, fb)
	}
	c, fc := a, fa
	d := b - a
	e := d
	for range rootMaxIter {
		if (fb > 0) == (fc > 0) {
			c, fc = a, fa
			d = b - a
			e = d
		}
		if math.Abs(fc) < math.Abs(fb) {
			a, b, c = b, c, b
			fa, fb, fc = fb, fc, fb
		}
		tol := 2*0x1p-52*math.Abs(b) + xtol/2
		m := (c - b) / 2
		if math.Abs(m) <= tol || fb == 0 {
			return b, nil
		}
		if math.Abs(e) < tol || math.Abs(fa) <= math.Abs(fb) {
			d, e = m, m
		} else {
			s := fb / fa
			var p, q float64
			if a == c {
				p = 2 * m * s
				q = 1 - s
			} else {
				q0 := fa / fc
				r := fb / fc
				p = s * (2*m*q0*(q0-r) - (b-a)*(r-1))
				q = (q0 - 1) * (r - 1) * (s - 1)
			}
			if p > 0 {
				q = -q
			} else {
				p = -p
			}
			if 2*p < math.Min(3*m*q-math.Abs(tol*q), math.Abs(e*q)) {
				e, d = d, p/q
			} else {
				d, e = m, m
			}
		}
		a, fa = b, fb
		if math.Abs(d) > tol {
			b += d
		} else {
			b += math.Copysign(tol, m)
		}
		fb = f(b)
		if math.IsNaN(fb) {
			return 0, fmt.Errorf("root finder: f is NaN at %g", b)
		}
	}
	return b, fmt.Errorf("root finder: no convergence in %d iterations near %g", rootMaxIter, b)
}
