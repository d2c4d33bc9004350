package em

import "math"

// Complex symmetric LDLᵀ factorisation without pivoting, blocked
// right-looking, for the Galerkin impedance matrix (Z = Zᵀ). It does half
// the work of the LU factorisation. It reads and overwrites only the lower
// triangle and the diagonal, so the strict upper triangle still holds the
// matrix: the solution's residual is checked against it, and a matrix the
// factorisation does not solve accurately (a small or growing pivot) is
// rebuilt from it and solved by LU with partial pivoting instead.
// Source: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed.,
// §4.1 (LDLᵀ; complex symmetric matrices use the unconjugated transpose)
// and §3.5.3 (the residual as a check of a computed solution).

// ldlResidualTol is the largest relative residual ‖b − Zx‖∞/(‖Z‖∞‖x‖∞)
// accepted from the LDLᵀ solution; a backward-stable solve leaves a few
// units of rounding (about 1e-16 times a modest factor of n).
const ldlResidualTol = 1e-12

// ldlSolve solves z x = b for the symmetric n×n row-major matrix z (both
// triangles filled) and returns false, with z restored to the full matrix,
// when the LDLᵀ factorisation is not accurate enough. b is overwritten by
// x on success and left alone otherwise. tiny is the smallest pivot
// accepted (in |re|+|im|); workers bounds the goroutines of the trailing
// updates (see parallelFor), which do not change the result.
func ldlSolve(z []complex128, n int, b []complex128, tiny float64, workers int) bool {
	diag := make([]complex128, n)
	for i := range n {
		diag[i] = z[i*n+i]
	}
	restore := func() {
		for i := range n {
			z[i*n+i] = diag[i]
			for j := range i {
				z[i*n+j] = z[j*n+i]
			}
		}
	}
	if !ldlFactor(z, n, tiny, workers) {
		restore()
		return false
	}
	x := append([]complex128(nil), b...)
	// L y = b.
	for i := range n {
		s := x[i]
		for c, l := range z[i*n : i*n+i] {
			s -= l * x[c]
		}
		x[i] = s
	}
	// D w = y.
	for i := range n {
		x[i] /= z[i*n+i]
	}
	// Lᵀ x = w.
	for i := n - 1; i >= 0; i-- {
		s := x[i]
		for r := i + 1; r < n; r++ {
			s -= z[r*n+i] * x[r]
		}
		x[i] = s
	}
	// Residual against the matrix kept in the upper triangle.
	var rmax, amax, xmax float64
	for i := range n {
		s := b[i] - diag[i]*x[i]
		row := cabs1(diag[i])
		for j := range n {
			if j == i {
				continue
			}
			v := z[min(i, j)*n+max(i, j)]
			s -= v * x[j]
			row += cabs1(v)
		}
		rmax = math.Max(rmax, cabs1(s))
		amax = math.Max(amax, row)
		xmax = math.Max(xmax, cabs1(x[i]))
	}
	if !(rmax <= ldlResidualTol*amax*xmax) {
		restore()
		return false
	}
	copy(b, x)
	return true
}

// ldlFactor overwrites the lower triangle of a with L (unit diagonal not
// stored) and the diagonal with D. It returns false at a pivot not above
// tiny. The trailing updates run on at most workers goroutines; each
// element sees the same operations in the same order whatever their
// number.
func ldlFactor(a []complex128, n int, tiny float64, workers int) bool {
	t := make([]complex128, luBlock)
	u := make([]complex128, luBlock*n)
	for k := 0; k < n; k += luBlock {
		kb := min(k+luBlock, n)
		// Panel: columns k..kb−1 of the lower triangle.
		for j := k; j < kb; j++ {
			d := a[j*n+j]
			if !(cabs1(d) > tiny) {
				return false
			}
			inv := 1 / d
			// Keep the panel rows' unscaled entries of column j.
			for c := j + 1; c < kb; c++ {
				t[c-k] = a[c*n+j]
			}
			for i := j + 1; i < n; i++ {
				l := a[i*n+j] * inv
				a[i*n+j] = l
				row := a[i*n : i*n+min(i, kb-1)+1]
				for c := j + 1; c < len(row); c++ {
					row[c] -= l * t[c-k]
				}
			}
		}
		if kb == n {
			break
		}
		// u_j[c] = d_j·l_cj for c ≥ kb, one contiguous row per column j.
		w := n - kb
		for j := k; j < kb; j++ {
			d := a[j*n+j]
			uj := u[(j-k)*w : (j-k+1)*w]
			for c := kb; c < n; c++ {
				uj[c-kb] = d * a[c*n+j]
			}
		}
		// Trailing update of the lower triangle: a_ic −= Σ_j l_ij u_j[c].
		parallelFor(workers, w, func(r int) {
			i := kb + r
			dst := a[i*n+kb : i*n+i+1]
			m := len(dst)
			j := k
			for ; j+3 < kb; j += 4 {
				l0, l1, l2, l3 := a[i*n+j], a[i*n+j+1], a[i*n+j+2], a[i*n+j+3]
				s0 := u[(j-k)*w:][:m]
				s1 := u[(j+1-k)*w:][:m]
				s2 := u[(j+2-k)*w:][:m]
				s3 := u[(j+3-k)*w:][:m]
				for x := range dst {
					v := dst[x] - (l0*s0[x] + l1*s1[x])
					dst[x] = v - (l2*s2[x] + l3*s3[x])
				}
			}
			for ; j < kb; j++ {
				l := a[i*n+j]
				s := u[(j-k)*w:][:m]
				for x := range dst {
					dst[x] -= l * s[x]
				}
			}
		})
	}
	return true
}
