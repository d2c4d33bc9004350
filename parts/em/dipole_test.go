package em

import (
	"math"
	"testing"
)

// Tolerances of the dipole and loop checks.
const (
	directivityTolDB = 0.1  // half-wave dipole directivity, dB
	smallRTol        = 0.15 // short dipole and small loop resistance, relative
	smallDirTol      = 0.02 // short dipole and small loop directivity, relative
)

func TestHalfWaveDipoleApproachesInducedEMF(t *testing.T) {
	// Source: Balanis, Antenna Theory, 3rd ed., ch. 4: induced-EMF
	// impedance of the infinitely thin half-wave dipole, 73.13 + j42.54 Ω.
	// A thin-wire solution stays above it at finite radius and closes the
	// gap like 1/ln(λ/a) (EM.md §4): check the approach, not equality.
	want := complex(73.13, 42.54)
	prev := math.Inf(1)
	for _, a := range []float64{1, 0.1, 0.01, 0.001} { // 1e-3 .. 1e-6 λ
		s := mustSolve(t, dipoleModel(500, a, 40), MeshOptions{}, lambda1m)
		z := s.Impedance
		gap := relErr(z, want)
		t.Logf("a = %g λ: Z = %.2f Ω", a/1000, z)
		if real(z) < real(want) || imag(z) < imag(want) {
			t.Errorf("a = %g mm: Z = %.2f below the induced-EMF limit %.2f", a, z, want)
		}
		if gap >= prev {
			t.Errorf("a = %g mm: gap %.4f did not shrink (previous %.4f)", a, gap, prev)
		}
		prev = gap
	}
}

func TestDipoleAtTenToMinusFourLambda(t *testing.T) {
	// From memory (EM.md §4, a separate implementation): about 80 + j45 Ω at
	// L = λ/2, a = 1e-4 λ. Allow 3 Ω on each part.
	s := mustSolve(t, dipoleModel(500, 0.1, 40), MeshOptions{}, lambda1m)
	if d := s.Impedance - complex(80, 45); math.Abs(real(d)) > 3 || math.Abs(imag(d)) > 3 {
		t.Errorf("Z = %.2f, want 80 + j45 ± 3 Ω", s.Impedance)
	}
}

func TestDipoleFirstResonance(t *testing.T) {
	// From memory, Balanis ch. 8 figures (EM.md §4): first resonance of a thin
	// dipole at 0.46–0.49 λ with R 68–75 Ω.
	for _, a := range []float64{0.1, 0.01} {
		x := func(l float64) float64 {
			return imag(mustSolve(t, dipoleModel(l, a, 40), MeshOptions{}, lambda1m).Impedance)
		}
		lo, hi := 440.0, 500.0
		if x(lo) >= 0 || x(hi) <= 0 {
			t.Fatalf("a = %g mm: no reactance sign change in [%g, %g] mm", a, lo, hi)
		}
		for hi-lo > 0.01 {
			if mid := 0.5 * (lo + hi); x(mid) < 0 {
				lo = mid
			} else {
				hi = mid
			}
		}
		l := 0.5 * (lo + hi)
		r := real(mustSolve(t, dipoleModel(l, a, 40), MeshOptions{}, lambda1m).Impedance)
		t.Logf("a = %g λ: resonance at %.4f λ, R = %.2f Ω", a/1000, l/1000, r)
		if l < 460 || l > 490 {
			t.Errorf("a = %g mm: resonant length %.4f λ outside 0.46–0.49 λ", a, l/1000)
		}
		if r < 68 || r > 75 {
			t.Errorf("a = %g mm: resonant R = %.2f Ω outside 68–75 Ω", a, r)
		}
	}
}

func TestHalfWaveDipoleDirectivityAndBeam(t *testing.T) {
	s := mustSolve(t, dipoleModel(500, 0.1, 40), MeshOptions{}, lambda1m)
	// Source: Balanis ch. 4: half-wave dipole directivity 1.643 (2.15 dBi),
	// half-power beamwidth 78°.
	if d := DB(directivity(s, Total)); math.Abs(d-2.15) > directivityTolDB {
		t.Errorf("directivity %.3f dBi, want 2.15 ± %.1f", d, directivityTolDB)
	}
	bw, ok := s.Beamwidth(Total, 0)
	if !ok || math.Abs(bw*180/math.Pi-78) > 1 {
		t.Errorf("beamwidth %.2f° (ok %v), want 78 ± 1°", bw*180/math.Pi, ok)
	}
}

func TestShortDipole(t *testing.T) {
	// Source: Balanis ch. 4: short dipole with triangular current,
	// R = 20π²(L/λ)², directivity 1.5. The delta gap's capacitive current
	// makes R come out 10–15 % low (EM.md §4); reached: about −12 %.
	s := mustSolve(t, dipoleModel(50, 0.1, 10), MeshOptions{}, lambda1m)
	want := 20 * math.Pi * math.Pi * 0.05 * 0.05
	if r := real(s.Impedance); math.Abs(r-want)/want > smallRTol {
		t.Errorf("R = %.4f Ω, want %.4f within %.0f %%", r, want, smallRTol*100)
	}
	if d := directivity(s, Total); math.Abs(d-1.5)/1.5 > smallDirTol {
		t.Errorf("directivity %.4f, want 1.5", d)
	}
}

func TestSmallLoop(t *testing.T) {
	// Source: Balanis ch. 5: small loop R = 20π²(C/λ)⁴, directivity 1.5.
	// Reached at C = 0.1 λ with 24 sides: about +10 % (the current is not
	// quite uniform at 0.1 λ).
	s := mustSolve(t, loopModel(100, 0.1, 24), MeshOptions{}, lambda1m)
	want := 20 * math.Pi * math.Pi * 1e-4
	if r := real(s.Impedance); math.Abs(r-want)/want > smallRTol {
		t.Errorf("R = %.5f Ω, want %.5f within %.0f %%", r, want, smallRTol*100)
	}
	if d := directivity(s, Total); math.Abs(d-1.5)/1.5 > smallDirTol {
		t.Errorf("directivity %.4f, want 1.5", d)
	}
}
