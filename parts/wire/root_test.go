package wire

import (
	"errors"
	"math"
	"testing"
)

func TestFindRoot(t *testing.T) {
	const tol = 1e-14
	tests := []struct {
		name string
		f    func(float64) float64
		a, b float64
		want float64
	}{
		// Source: the fixed point of cos, 0.739085133215160641655… (OEIS A003957).
		{"cos x = x", func(x float64) float64 { return math.Cos(x) - x }, 0, 1, 0.7390851332151607},
		// Source: Wallis's cubic x³ − 2x − 5 = 0, real root
		// 2.0945514815423265914… (OEIS A007493).
		{"Wallis cubic", func(x float64) float64 { return x*x*x - 2*x - 5 }, 2, 3, 2.0945514815423265},
		// Source: √2 = 1.41421356237309504880… (OEIS A002193); a root at
		// the far end of a reversed bracket.
		{"square root of two, reversed bracket", func(x float64) float64 { return 2 - x*x }, 3, 0, math.Sqrt2},
		// Source: the step changes sign at 0.3 by construction; only the
		// bisection safeguard can find it.
		{"step", func(x float64) float64 {
			if x < 0.3 {
				return -1
			}
			return 1
		}, 0, 1, 0.3},
		// Source: ln x = 0 at x = 1; slope spans six decades across the bracket.
		{"logarithm", math.Log, 1e-6, 1e6, 1},
		{"root at the left end", func(x float64) float64 { return x }, 0, 5, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, err := findRoot(tc.f, tc.a, tc.b, 1e-15)
			if err != nil {
				t.Fatal(err)
			}
			if math.Abs(got-tc.want) > tol*math.Max(1, math.Abs(tc.want)) {
				t.Errorf("root = %.17g, want %.17g", got, tc.want)
			}
		})
	}
	t.Run("no sign change", func(t *testing.T) {
		_, err := findRoot(func(x float64) float64 { return x*x + 1 }, -1, 1, 1e-12)
		if !errors.Is(err, errNoBracket) {
			t.Errorf("err = %v, want errNoBracket", err)
		}
	})
	t.Run("NaN at an end", func(t *testing.T) {
		if _, err := findRoot(math.Sqrt, -1, 1, 1e-12); err == nil {
			t.Error("want an error for NaN")
		}
	})
}
