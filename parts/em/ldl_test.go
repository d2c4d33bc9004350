package em

import (
	"math"
	"math/cmplx"
	"slices"
	"testing"
)

// TestLDLMatchesLU solves the demo's plate and ideal-ground matrices by
// the symmetric factorisation and by LU with partial pivoting: the two
// are backward stable, so their solutions agree to rounding. Source:
// Golub and Van Loan, Matrix Computations, 4th ed., §3.3 and §4.1.
func TestLDLMatchesLU(t *testing.T) {
	for _, plate := range []bool{false, true} {
		m, err := NewMesh(demoModel(t, 20, plate), MeshOptions{})
		if err != nil {
			t.Fatal(err)
		}
		n := m.Unknowns()
		z := m.matrix(5800e6)
		b := make([]complex128, n)
		for i := range b {
			b[i] = complex(math.Cos(float64(i)), math.Sin(float64(3*i)))
		}
		x := slices.Clone(b)
		if !ldlSolve(slices.Clone(z), n, x, 0, 0) {
			t.Fatalf("plate %v: LDLᵀ refused the impedance matrix", plate)
		}
		y := slices.Clone(b)
		piv := make([]int, n)
		if col := luFactor(z, n, piv, 0, 0); col >= 0 {
			t.Fatal("LU: singular")
		}
		luSolve(z, n, piv, y)
		var dmax, ymax float64
		for i := range x {
			dmax = math.Max(dmax, cmplx.Abs(x[i]-y[i]))
			ymax = math.Max(ymax, cmplx.Abs(y[i]))
		}
		if dmax > 1e-10*ymax {
			t.Errorf("plate %v: LDLᵀ and LU differ by %.3g of the largest entry", plate, dmax/ymax)
		}
	}
}

// TestLDLFallsBackOnZeroPivot gives the symmetric factorisation a matrix
// it cannot factor without pivoting (a zero leading entry): it must refuse
// and leave the matrix as it was, for LU with pivoting to solve.
func TestLDLFallsBackOnZeroPivot(t *testing.T) {
	z := []complex128{
		0, 1, 2i,
		1, 3, 1,
		2i, 1, 4,
	}
	orig := slices.Clone(z)
	b := []complex128{1, 2, 3}
	if ldlSolve(z, 3, b, 1e-12, 0) {
		t.Fatal("LDLᵀ accepted a zero pivot")
	}
	if !slices.Equal(z, orig) || !slices.Equal(b, []complex128{1, 2, 3}) {
		t.Fatalf("matrix or right-hand side changed: %v %v", z, b)
	}
	// A small but non-zero pivot: the factorisation runs, and the residual
	// check decides; either way the answer must solve the system.
	z = []complex128{
		1e-14, 1, 0,
		1, 1, 1,
		0, 1, 2,
	}
	orig = slices.Clone(z)
	x := []complex128{1, 0, 0}
	if !ldlSolve(z, 3, x, 0, 0) {
		if !slices.Equal(z, orig) {
			t.Fatal("matrix not restored")
		}
		piv := make([]int, 3)
		luFactor(z, 3, piv, 0, 0)
		luSolve(z, 3, piv, x)
	}
	for i := range 3 {
		var s complex128
		for j := range 3 {
			s += orig[i*3+j] * x[j]
		}
		if want := complex(float64(1-min(i, 1)), 0); cmplx.Abs(s-want) > 1e-12 {
			t.Errorf("row %d: Zx = %v, want %v", i, s, want)
		}
	}
}
