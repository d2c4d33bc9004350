// Uniaxial stress–strain laws for bending.
//
// A fibre at strain ε carries σ(ε) = min(E·ε, g(ε)), where g is the plastic
// flow stress: the yield stress (perfectly plastic), the larger of the yield
// and a power law K·εⁿ, or a straight line of slope Et from the yield point.
// The law is continuous, equals E·ε up to its elastic limit and never rises
// faster than E, so the unloading from any bent state is elastic. With n = 0
// and K equal to the yield the power law is exactly perfectly plastic.
// Tension and compression are taken as symmetric.

package wire

import (
	"fmt"
	"math"
)

// HardeningKind selects a strain-hardening law.
type HardeningKind int

// Hardening laws.
const (
	// HardeningNone is perfectly plastic beyond yield.
	HardeningNone HardeningKind = iota
	// HardeningPowerLaw has flow stress max(σy, K·εⁿ) (Hollomon's power law
	// on total strain).
	HardeningPowerLaw
	// HardeningLinear has flow stress σy + Et·(ε − σy/E) (bilinear law with
	// tangent modulus Et).
	HardeningLinear
)

// Hardening is a strain-hardening law. The zero value is no hardening.
type Hardening struct {
	// Kind selects the law.
	Kind HardeningKind
	// K is the power-law strength coefficient in MPa (HardeningPowerLaw).
	K float64
	// N is the power-law exponent, 0 ≤ N < 1 (HardeningPowerLaw).
	N float64
	// TangentModulus is Et in MPa, 0 ≤ Et < E (HardeningLinear).
	TangentModulus float64
}

// FlowLaw is a material's monotonic uniaxial stress–strain law for bending.
// Stresses in MPa, strains dimensionless.
type FlowLaw struct {
	// YoungsModulus is E in MPa; positive.
	YoungsModulus float64
	// Yield is the yield stress σy in MPa; non-negative, and positive unless
	// a power law carries the flow stress.
	Yield float64
	// Hardening is the law beyond yield; the zero value is perfectly plastic.
	Hardening Hardening
}

// Validate reports the first out-of-range parameter of l.
func (l FlowLaw) Validate() error {
	h := l.Hardening
	switch {
	case !(l.YoungsModulus > 0) || math.IsInf(l.YoungsModulus, 0):
		return fmt.Errorf("flow law: Young's modulus %g MPa must be positive", l.YoungsModulus)
	case !(l.Yield >= 0) || math.IsInf(l.Yield, 0):
		return fmt.Errorf("flow law: yield %g MPa must be zero or positive", l.Yield)
	}
	switch h.Kind {
	case HardeningNone:
		if l.Yield == 0 {
			return fmt.Errorf("flow law: yield must be positive without hardening")
		}
	case HardeningPowerLaw:
		if !(h.K >= 0) || !(h.N >= 0 && h.N < 1) || (h.K == 0 && l.Yield == 0) {
			return fmt.Errorf("flow law: power law K = %g MPa, n = %g: need K ≥ 0, 0 ≤ n < 1 and K or yield positive", h.K, h.N)
		}
	case HardeningLinear:
		if !(h.TangentModulus >= 0 && h.TangentModulus < l.YoungsModulus) || l.Yield == 0 {
			return fmt.Errorf("flow law: tangent modulus %g MPa must be in [0, E) with a positive yield", h.TangentModulus)
		}
	default:
		return fmt.Errorf("flow law: unknown hardening kind %d", h.Kind)
	}
	return nil
}

// flow returns the plastic flow stress g(ε) in MPa for strain ε ≥ 0.
func (l FlowLaw) flow(eps float64) float64 {
	h := l.Hardening
	switch h.Kind {
	case HardeningPowerLaw:
		return math.Max(l.Yield, h.K*math.Pow(eps, h.N))
	case HardeningLinear:
		return l.Yield + h.TangentModulus*math.Max(0, eps-l.Yield/l.YoungsModulus)
	}
	return l.Yield
}

// Stress returns the stress in MPa at strain eps ≥ 0 on first loading.
func (l FlowLaw) Stress(eps float64) float64 {
	return math.Min(l.YoungsModulus*eps, l.flow(eps))
}

// ElasticLimit returns the strain up to which the law is linear elastic.
func (l FlowLaw) ElasticLimit() float64 {
	E, h := l.YoungsModulus, l.Hardening
	ey := l.Yield / E
	if h.Kind != HardeningPowerLaw || h.K*math.Pow(ey, h.N) <= l.Yield {
		return ey
	}
	// The power law lies above the yield where it meets the elastic line:
	// E·ε = K·εⁿ.
	return math.Pow(h.K/E, 1/(1-h.N))
}

// kinks returns, in increasing order, the strains at which the law's slope
// jumps: the elastic limit and, for a power law that starts below the
// yield, the end of the yield plateau.
func (l FlowLaw) kinks() []float64 {
	ee := l.ElasticLimit()
	h := l.Hardening
	if h.Kind == HardeningPowerLaw && h.N > 0 && h.K > 0 && l.Yield > 0 {
		if eh := math.Pow(l.Yield/h.K, 1/h.N); eh > ee {
			return []float64{ee, eh}
		}
	}
	return []float64{ee}
}

// Scaled returns the law with its plastic flow stress multiplied by f > 0:
// yield, power-law K and tangent modulus scale, E does not. A calibration
// fits f.
func (l FlowLaw) Scaled(f float64) FlowLaw {
	l.Yield *= f
	l.Hardening.K *= f
	l.Hardening.TangentModulus *= f
	return l
}
