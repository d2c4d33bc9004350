// Impedance tapers and their residual mismatch.
//
// A taper carries a line from impedance Z0 at x = 0 to ZL at x = 1, x being
// the fraction of the taper's length. The exponential taper makes ln Z
// linear in x; the Klopfenstein taper is the shortest for a given
// pass-band ripple Γm and has small steps at both ends. The reflection
// seen at the Z0 end is estimated by the theory of small reflections: the
// profile is cut into many short sections and each step's reflection is
// summed with its round-trip phase, Γ ≈ Σ ρi·e^(−2jβℓ·xi). The same sum
// serves the ideal profiles and a realised one (widths as cut).

package line

import (
	"fmt"
	"math"
	"math/cmplx"
)

// TaperKind selects an impedance profile.
type TaperKind int

const (
	// TaperExponential makes ln Z linear along the taper.
	TaperExponential TaperKind = iota
	// TaperKlopfenstein is the Dolph–Chebyshev-like optimum taper: shortest
	// for a given maximum reflection in the pass band.
	TaperKlopfenstein
)

// String returns the spec name of the taper kind.
func (k TaperKind) String() string {
	switch k {
	case TaperExponential:
		return "exponential"
	case TaperKlopfenstein:
		return "klopfenstein"
	}
	return fmt.Sprintf("TaperKind(%d)", int(k))
}

// Taper is an impedance profile from Z0 (ohms, at x = 0) to ZL (ohms, at
// x = 1). GammaMax is the Klopfenstein pass-band ripple |Γ|max (0 < Γm <
// |Γ0|); other kinds ignore it.
type Taper struct {
	Kind     TaperKind
	Z0, ZL   float64
	GammaMax float64
}

// Validate reports an error when the impedances are not positive or the
// Klopfenstein ripple is out of range.
func (t Taper) Validate() error {
	if !(t.Z0 > 0) || !(t.ZL > 0) {
		return fmt.Errorf("taper impedances %g Ω → %g Ω must be positive", t.Z0, t.ZL)
	}
	if t.Kind == TaperKlopfenstein {
		g0 := math.Abs(math.Log(t.ZL/t.Z0)) / 2
		if !(t.GammaMax > 0) || t.GammaMax >= g0 {
			return fmt.Errorf("klopfenstein ripple %g must lie between 0 and %.4g (half of |ln(ZL/Z0)|)", t.GammaMax, g0)
		}
	}
	return nil
}

// KlopfensteinA returns the Klopfenstein parameter A = acosh(Γ0/Γm) with
// Γ0 = ½·ln(ZL/Z0), for a ripple gammaMax below |Γ0|.
// Source: Pozar, Microwave Engineering, 4th ed., §5.9.
func KlopfensteinA(z0, zl, gammaMax float64) float64 {
	g0 := math.Abs(math.Log(zl/z0)) / 2
	return math.Acosh(g0 / gammaMax)
}

// klopfensteinPhi is φ(x, A) = ∫₀ˣ I1(A√(1−y²))/(A√(1−y²)) dy for
// |x| ≤ 1, by composite Simpson's rule.
// Source: Pozar, Microwave Engineering, 4th ed., §5.9.
func klopfensteinPhi(x, a float64) float64 {
	const n = 400 // even number of Simpson intervals
	f := func(y float64) float64 { return besselI1Over(a * math.Sqrt(math.Max(0, 1-y*y))) }
	h := x / n
	s := f(0) + f(x)
	for i := 1; i < n; i++ {
		w := 2.0
		if i%2 == 1 {
			w = 4
		}
		s += w * f(float64(i)*h)
	}
	return s * h / 3
}

// besselI1Over returns I1(z)/z for z ≥ 0 (½ at z = 0) from the power series
// I1(z) = Σ (z/2)^(2k+1)/(k!(k+1)!), which converges quickly for the
// arguments a taper needs (z below about 10).
// Source: Abramowitz & Stegun, Handbook of Mathematical Functions, 9.6.10.
func besselI1Over(z float64) float64 {
	q := z * z / 4
	term := 0.5 // k = 0 term of I1(z)/z
	sum := term
	for k := 1; k < 200; k++ {
		term *= q / float64(k*(k+1))
		sum += term
		if term < 1e-17*sum {
			break
		}
	}
	return sum
}

// Impedance returns the profile's impedance in ohms at fraction x of the
// length (clamped to [0, 1]). The Klopfenstein profile has steps at its
// ends, so Impedance(0) is not exactly Z0 for that kind.
// Source: Pozar, Microwave Engineering, 4th ed., §5.9.
func (t Taper) Impedance(x float64) float64 {
	x = math.Min(1, math.Max(0, x))
	lr := math.Log(t.ZL / t.Z0)
	switch t.Kind {
	case TaperKlopfenstein:
		a := KlopfensteinA(t.Z0, t.ZL, t.GammaMax)
		g0 := lr / 2
		return math.Exp(math.Log(t.Z0*t.ZL)/2 + g0/math.Cosh(a)*a*a*klopfensteinPhi(2*x-1, a))
	default:
		return t.Z0 * math.Exp(lr*x)
	}
}

// taperSections is the number of sections used to sample a profile.
const taperSections = 400

// Profile returns the taper's impedance at n+1 equally spaced points
// x = i/n, i = 0 … n (n ≥ 1).
func (t Taper) Profile(n int) []float64 {
	z := make([]float64, n+1)
	for i := range z {
		z[i] = t.Impedance(float64(i) / float64(n))
	}
	return z
}

// Reflection returns the complex reflection coefficient seen from a source
// of impedance z0 looking into a line whose impedance takes the values
// prof at equally spaced points along its electrical length betaL
// (radians, β·ℓ), terminated in zl. The steps z0 → prof[0] and
// prof[len−1] → zl are included.
// Source: Pozar, Microwave Engineering, 4th ed., §5.8 (theory of small
// reflections) applied to a stepped approximation.
func Reflection(z0, zl float64, prof []float64, betaL float64) complex128 {
	var g complex128
	step := func(za, zb, x float64) {
		rho := (zb - za) / (zb + za)
		g += complex(rho, 0) * cmplx.Exp(complex(0, -2*betaL*x))
	}
	n := len(prof) - 1
	step(z0, prof[0], 0)
	for i := 0; i < n; i++ {
		step(prof[i], prof[i+1], (float64(i)+0.5)/float64(n))
	}
	step(prof[n], zl, 1)
	return g
}

// ExponentialReflection returns Pozar's closed form |Γ| = ½|ln(ZL/Z0)|·
// |sin βℓ/βℓ| for an exponential taper of electrical length betaL.
// Source: Pozar, Microwave Engineering, 4th ed., §5.9.
func ExponentialReflection(z0, zl, betaL float64) float64 {
	s := 1.0
	if betaL != 0 {
		s = math.Sin(betaL) / betaL
	}
	return math.Abs(math.Log(zl/z0)) / 2 * math.Abs(s)
}

// KlopfensteinReflection returns Pozar's closed form for the Klopfenstein
// taper, |Γ| = Γ0·|cos√((βℓ)² − A²)|/cosh A (cosh of the imaginary root
// below cut-off, βℓ < A).
// Source: Pozar, Microwave Engineering, 4th ed., §5.9.
func KlopfensteinReflection(z0, zl, gammaMax, betaL float64) float64 {
	a := KlopfensteinA(z0, zl, gammaMax)
	g0 := math.Abs(math.Log(zl/z0)) / 2
	d := betaL*betaL - a*a
	if d >= 0 {
		return g0 * math.Abs(math.Cos(math.Sqrt(d))) / math.Cosh(a)
	}
	return g0 * math.Cosh(math.Sqrt(-d)) / math.Cosh(a)
}

// VSWR returns the voltage standing-wave ratio for a reflection magnitude
// g in [0, 1) (infinite at 1).
func VSWR(g float64) float64 { return (1 + g) / (1 - g) }

// ReturnLossDB returns −20·log10 |Γ| in dB for g in (0, 1].
func ReturnLossDB(g float64) float64 { return -20 * math.Log10(g) }
