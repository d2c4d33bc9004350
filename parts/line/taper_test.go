package line

import (
	"math"
	"math/cmplx"
	"testing"
)

func TestKlopfensteinA(t *testing.T) {
	// Source: Pozar, Microwave Engineering, 4th ed., §5.9: 50 → 100 Ω with
	// Γm = 0.02 gives A = 3.5447 and a minimum length βℓ = A, ℓ = 0.5642 λ.
	const aTol = 5e-5
	a := KlopfensteinA(50, 100, 0.02)
	if math.Abs(a-3.5447) > aTol {
		t.Errorf("A = %.5f, want 3.5447", a)
	}
	if l := a / (2 * math.Pi); math.Abs(l-0.5642) > aTol {
		t.Errorf("minimum length %.5f λ, want 0.5642 λ", l)
	}
}

func TestTaperEnds(t *testing.T) {
	// zTol is the tolerance in ohms on the exponential profile's end values.
	const zTol = 1e-9
	t.Run("exponential reaches both ends", func(t *testing.T) {
		tp := Taper{Kind: TaperExponential, Z0: 50, ZL: 140}
		if z := tp.Impedance(0); math.Abs(z-50) > zTol {
			t.Errorf("Z(0) = %g", z)
		}
		if z := tp.Impedance(1); math.Abs(z-140) > zTol {
			t.Errorf("Z(1) = %g", z)
		}
		// Source: Pozar §5.9: Z(z) = Z0·e^(az), so the midpoint is √(Z0·ZL).
		if z := tp.Impedance(0.5); math.Abs(z-math.Sqrt(50*140)) > zTol {
			t.Errorf("Z(½) = %g", z)
		}
	})
	t.Run("klopfenstein ends step by the ripple", func(t *testing.T) {
		// Source: Pozar §5.9 with φ(1, A) = (cosh A − 1)/A²: ln Z steps by
		// Γm at each end of the Klopfenstein profile.
		tp := Taper{Kind: TaperKlopfenstein, Z0: 50, ZL: 100, GammaMax: 0.02}
		rho0 := math.Log(tp.Impedance(0) / 50)
		rhoL := math.Log(100 / tp.Impedance(1))
		const stepTol = 1e-4
		if math.Abs(rho0-0.02) > stepTol || math.Abs(rhoL-0.02) > stepTol {
			t.Errorf("end steps %.5f and %.5f, want 0.02", rho0, rhoL)
		}
	})
}

func TestReflectionMatchesClosedForms(t *testing.T) {
	// The stepped small-reflection sum must reproduce Pozar's closed forms
	// (Pozar, Microwave Engineering, 4th ed., §5.9) for ideal profiles.
	const gTol = 2e-3
	for _, bl := range []float64{0.5, 1.6, 3, 5, 8} {
		exp := Taper{Kind: TaperExponential, Z0: 50, ZL: 100}
		got := cmplx.Abs(Reflection(50, 100, exp.Profile(taperSections), bl))
		if want := ExponentialReflection(50, 100, bl); math.Abs(got-want) > gTol {
			t.Errorf("exponential βℓ = %g: sum %.5f, closed form %.5f", bl, got, want)
		}
		klo := Taper{Kind: TaperKlopfenstein, Z0: 50, ZL: 100, GammaMax: 0.02}
		got = cmplx.Abs(Reflection(50, 100, klo.Profile(taperSections), bl))
		if want := KlopfensteinReflection(50, 100, 0.02, bl); math.Abs(got-want) > gTol {
			t.Errorf("klopfenstein βℓ = %g: sum %.5f, closed form %.5f", bl, got, want)
		}
	}
	t.Run("klopfenstein ripple in the pass band", func(t *testing.T) {
		// Source: Pozar §5.9: for βℓ ≥ A the reflection never exceeds Γm.
		a := KlopfensteinA(50, 100, 0.02)
		for bl := a; bl < 4*a; bl += 0.05 {
			if g := KlopfensteinReflection(50, 100, 0.02, bl); g > 0.02+1e-12 {
				t.Errorf("βℓ = %.2f: |Γ| = %.5f", bl, g)
			}
		}
	})
}

func TestTaperValidate(t *testing.T) {
	tests := []struct {
		name string
		tp   Taper
		ok   bool
	}{
		{"exponential", Taper{Kind: TaperExponential, Z0: 50, ZL: 140}, true},
		{"klopfenstein", Taper{Kind: TaperKlopfenstein, Z0: 50, ZL: 140, GammaMax: 0.05}, true},
		{"zero impedance", Taper{Kind: TaperExponential, Z0: 0, ZL: 140}, false},
		{"ripple above the step", Taper{Kind: TaperKlopfenstein, Z0: 50, ZL: 140, GammaMax: 0.6}, false},
		{"no ripple", Taper{Kind: TaperKlopfenstein, Z0: 50, ZL: 140}, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if err := tc.tp.Validate(); (err == nil) != tc.ok {
				t.Errorf("Validate() = %v, want ok = %v", err, tc.ok)
			}
		})
	}
}

func TestMismatchFigures(t *testing.T) {
	// Source: Pozar, Microwave Engineering, 4th ed., §2.3: VSWR =
	// (1 + |Γ|)/(1 − |Γ|) and return loss RL = −20·log10|Γ| dB [calc].
	const tol = 1e-4
	for _, tc := range []struct {
		name            string
		gamma, vswr, rl float64
	}{
		{"|Γ| = 0.1", 0.1, 1.2222, 20},
		{"|Γ| = 1/3", 1.0 / 3, 2, 9.5424},
		{"10 dB return loss", 0.31623, 1.9249, 10.0},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if v := VSWR(tc.gamma); math.Abs(v-tc.vswr) > tol {
				t.Errorf("VSWR(%g) = %.5f, want %.4f", tc.gamma, v, tc.vswr)
			}
			if rl := ReturnLossDB(tc.gamma); math.Abs(rl-tc.rl) > tol {
				t.Errorf("ReturnLossDB(%g) = %.5f dB, want %.4f", tc.gamma, rl, tc.rl)
			}
		})
	}
}
