package em

import (
	"math"
	"math/cmplx"
)

// Reflection returns Γ = (Z − Z0)/(Z + Z0) for a load z on a line of
// reference impedance z0 (ohms).
// Source: any transmission-line text, e.g. Pozar, Microwave Engineering, ch. 2.
func Reflection(z, z0 complex128) complex128 { return (z - z0) / (z + z0) }

// VSWR returns (1 + |Γ|)/(1 − |Γ|); +Inf for |Γ| ≥ 1.
// Source: Pozar, Microwave Engineering, ch. 2.
func VSWR(gamma complex128) float64 {
	g := cmplx.Abs(gamma)
	if g >= 1 {
		return math.Inf(1)
	}
	return (1 + g) / (1 - g)
}

// ReturnLoss returns −20·log10|Γ| in dB (+Inf for a perfect match).
// Source: Pozar, Microwave Engineering, ch. 2.
func ReturnLoss(gamma complex128) float64 { return -20 * math.Log10(cmplx.Abs(gamma)) }

// Mismatch returns 1 − |Γ|², the fraction of available power accepted by
// the load (realised gain = gain × Mismatch).
// Source: Pozar, Microwave Engineering, ch. 2.
func Mismatch(gamma complex128) float64 { return 1 - abs2(gamma) }
