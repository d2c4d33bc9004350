package em

// Dense complex LU factorisation with partial pivoting, blocked
// right-looking (panel factorisation, triangular solve for the block row,
// rank-nb update of the trailing matrix in parallel by rows). Every element
// is updated by the same sequence of operations whatever the number of
// cores, so the factors are reproducible bit for bit.
// Source: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed.,
// §3.2 (Gaussian elimination with partial pivoting) and §3.2.11 (blocked).

const luBlock = 48

// luFactor factors the n×n row-major matrix a in place as P·A = L·U (unit
// lower L) and records the row interchanges in piv. It returns the first
// column whose pivot is not above tiny (in |re|+|im|), or −1. The
// trailing updates run on at most workers goroutines (see parallelFor).
func luFactor(a []complex128, n int, piv []int, tiny float64, workers int) int {
	for k := 0; k < n; k += luBlock {
		kb := min(k+luBlock, n)
		// Panel: columns k..kb−1, rows k..n−1.
		for j := k; j < kb; j++ {
			p, best := j, -1.0
			for i := j; i < n; i++ {
				if v := cabs1(a[i*n+j]); v > best {
					p, best = i, v
				}
			}
			piv[j] = p
			if !(best > tiny) {
				return j
			}
			if p != j {
				rj, rp := a[j*n:(j+1)*n], a[p*n:(p+1)*n]
				for c := range rj {
					rj[c], rp[c] = rp[c], rj[c]
				}
			}
			inv := 1 / a[j*n+j]
			urow := a[j*n+j+1 : j*n+kb]
			for i := j + 1; i < n; i++ {
				l := a[i*n+j] * inv
				a[i*n+j] = l
				row := a[i*n+j+1 : i*n+kb]
				for c, u := range urow {
					row[c] -= l * u
				}
			}
		}
		if kb == n {
			break
		}
		// Block row U12 = L11⁻¹ A12.
		for r := k + 1; r < kb; r++ {
			dst := a[r*n+kb : (r+1)*n]
			for c := k; c < r; c++ {
				l := a[r*n+c]
				src := a[c*n+kb : (c+1)*n]
				for x, u := range src {
					dst[x] -= l * u
				}
			}
		}
		// Trailing update A22 −= L21 U12, two rows per task.
		rows := n - kb
		parallelFor(workers, (rows+1)/2, func(t int) {
			for i := kb + 2*t; i < min(kb+2*t+2, n); i++ {
				dst := a[i*n+kb : (i+1)*n]
				c := k
				// Four columns per pass over dst, in two pairs: the same
				// operations in the same order as a pair per pass, with
				// half the loads and stores of dst.
				for ; c+3 < kb; c += 4 {
					l0, l1, l2, l3 := a[i*n+c], a[i*n+c+1], a[i*n+c+2], a[i*n+c+3]
					s0 := a[c*n+kb : (c+1)*n][:len(dst)]
					s1 := a[(c+1)*n+kb : (c+2)*n][:len(dst)]
					s2 := a[(c+2)*n+kb : (c+3)*n][:len(dst)]
					s3 := a[(c+3)*n+kb : (c+4)*n][:len(dst)]
					for x := range dst {
						d := dst[x] - (l0*s0[x] + l1*s1[x])
						dst[x] = d - (l2*s2[x] + l3*s3[x])
					}
				}
				for ; c+1 < kb; c += 2 {
					l0, l1 := a[i*n+c], a[i*n+c+1]
					s0 := a[c*n+kb : (c+1)*n]
					s1 := a[(c+1)*n+kb : (c+2)*n]
					s0, s1 = s0[:len(dst)], s1[:len(dst)]
					for x := range dst {
						dst[x] -= l0*s0[x] + l1*s1[x]
					}
				}
				for ; c < kb; c++ {
					l := a[i*n+c]
					src := a[c*n+kb : (c+1)*n][:len(dst)]
					for x := range dst {
						dst[x] -= l * src[x]
					}
				}
			}
		})
	}
	return -1
}

// luSolve solves A x = b in place using the factors from luFactor.
func luSolve(a []complex128, n int, piv []int, b []complex128) {
	for j := range n {
		if p := piv[j]; p != j {
			b[j], b[p] = b[p], b[j]
		}
	}
	for i := range n {
		s := b[i]
		row := a[i*n : i*n+i]
		for c, l := range row {
			s -= l * b[c]
		}
		b[i] = s
	}
	for i := n - 1; i >= 0; i-- {
		s := b[i]
		row := a[i*n+i+1 : (i+1)*n]
		for c, u := range row {
			s -= u * b[i+1+c]
		}
		b[i] = s / a[i*n+i]
	}
}

// cabs1 is |re| + |im|, the pivot measure used by LAPACK's complex LU.
func cabs1(c complex128) float64 {
	r, i := real(c), imag(c)
	if r < 0 {
		r = -r
	}
	if i < 0 {
		i = -i
	}
	return r + i
}
