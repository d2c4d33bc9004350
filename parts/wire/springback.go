// Springback of wire bent on a former.
//
// Bending to curvature κ strains a fibre at distance y from the neutral axis
// by ε = κ·y (plane sections stay plane). The bending moment is
//
//	M(κ) = 2 ∫₀ᶜ σ(κ·y) · y · b(y) dy
//
// over a section of half-depth c and width b(y). Released from the former,
// the wire unloads elastically: its curvature falls by M/(E·I), with
// I = 2 ∫₀ᶜ y² b(y) dy, so the relaxed curvature is κ − M(κ)/(E·I). Below the
// elastic-limit curvature M = E·I·κ and nothing remains: the wire takes no
// permanent set. Source: Gardiner, "The springback of metals", Trans. ASME 79,
// 1957, for the method; any plasticity text (e.g. Chakrabarty, Theory of
// Plasticity) for elastic unloading.
//
// The integral is evaluated on y = c·sin θ, which turns the round section's
// square-root edge into a smooth integrand, split where the stress–strain law
// has a kink and summed with fixed Gauss–Legendre rules on each piece: the
// sheet's polynomial integrands come out exact and the round wire's to
// rounding. For a helix the curvature of the wire path is κ = R/(R² + p²)
// with p the axial spacing per radian (the groove holds the spacing);
// the inverse (target → former) solves relaxed(κ) = target with a bracketed
// root finder, the relaxed curvature being increasing in κ.

package wire

import (
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// springbackNodes is the Gauss–Legendre order used on each piece of the
// section; ample for the smooth integrands of the θ substitution.
const springbackNodes = 32

// springbackRelTol is the relative tolerance of the inverse solve on the
// former curvature.
const springbackRelTol = 1e-14

// Springback is a moment–curvature and springback model for one section and
// stress–strain law. Curvatures are in 1/mm, radii in mm, moments in N·mm.
// A Springback is immutable and safe for concurrent use.
type Springback struct {
	sec         Section
	law         FlowLaw
	strainLimit float64
	inertia     float64
	x, w        []float64 // Gauss–Legendre nodes and weights on [0, 1]
}

// NewSpringback returns the springback model of section sec under law. A
// positive strainLimit (the material's elongation at break, as a fraction)
// makes windings that strain the outer fibre beyond it carry a warning;
// zero disables the warning.
func NewSpringback(sec Section, law FlowLaw, strainLimit float64) (*Springback, error) {
	if sec == nil || !(sec.HalfDepth() > 0) || math.IsInf(sec.HalfDepth(), 0) {
		return nil, errors.New("springback: section must have a positive, finite half-depth")
	}
	if err := law.Validate(); err != nil {
		return nil, fmt.Errorf("springback: %w", err)
	}
	if !(strainLimit >= 0) {
		return nil, fmt.Errorf("springback: strain limit %g must be zero or positive", strainLimit)
	}
	s := &Springback{sec: sec, law: law, strainLimit: strainLimit,
		x: make([]float64, springbackNodes), w: make([]float64, springbackNodes)}
	quad.Legendre{}.FixedLocations(s.x, s.w, 0, 1)
	s.inertia = s.integrate(func(y float64) float64 { return y * y }, nil)
	if !(s.inertia > 0) {
		return nil, errors.New("springback: section has no second moment of area")
	}
	return s, nil
}

// NewWireSpringback returns the springback model of a round wire of diameter
// d mm in material m: elastic–perfectly plastic, or with the material's
// hardening law when hardening is true. The strain warning uses the
// material's elongation.
func NewWireSpringback(m Material, d float64, hardening bool) (*Springback, error) {
	if !(d > 0) || math.IsInf(d, 0) {
		return nil, fmt.Errorf("springback: wire diameter %g mm must be positive", d)
	}
	return NewSpringback(RoundSection{Diameter: d}, m.FlowLaw(hardening), m.Elongation)
}

// Law returns the model's stress–strain law.
func (s *Springback) Law() FlowLaw { return s.law }

// Section returns the model's cross-section.
func (s *Springback) Section() Section { return s.sec }

// Inertia returns the second moment of area I of the section about its
// neutral axis, in mm⁴.
func (s *Springback) Inertia() float64 { return s.inertia }

// integrate returns 2 ∫₀ᶜ f(y)·b(y) dy, splitting the range at the given
// depths (each in (0, c), increasing).
func (s *Springback) integrate(f func(y float64) float64, splits []float64) float64 {
	c := s.sec.HalfDepth()
	sum := 0.0
	lo := 0.0
	piece := func(t0, t1 float64) {
		h := t1 - t0
		for i, xi := range s.x {
			t := t0 + h*xi
			st, ct := math.Sincos(t)
			y := c * st
			sum += s.w[i] * h * f(y) * s.sec.WidthAt(y) * c * ct
		}
	}
	for _, y := range splits {
		t := math.Asin(y / c)
		piece(lo, t)
		lo = t
	}
	piece(lo, math.Pi/2)
	return 2 * sum
}

// Moment returns the bending moment in N·mm that holds the section at
// curvature kappa ≥ 0 (1/mm) on first loading.
func (s *Springback) Moment(kappa float64) float64 {
	if kappa <= 0 {
		return 0
	}
	c := s.sec.HalfDepth()
	var splits []float64
	for _, e := range s.law.kinks() {
		if y := e / kappa; y < c {
			splits = append(splits, y)
		}
	}
	return s.integrate(func(y float64) float64 { return s.law.Stress(kappa*y) * y }, splits)
}

// ElasticLimit returns the curvature in 1/mm up to which the section stays
// elastic and takes no permanent set.
func (s *Springback) ElasticLimit() float64 {
	return s.law.ElasticLimit() / s.sec.HalfDepth()
}

// Relaxed returns the curvature in 1/mm that remains when the section, bent
// to curvature kappa, is released: κ − M(κ)/(E·I). It is zero (to rounding)
// at or below ElasticLimit.
func (s *Springback) Relaxed(kappa float64) float64 {
	if kappa <= s.ElasticLimit() {
		return 0
	}
	return kappa - s.Moment(kappa)/(s.law.YoungsModulus*s.inertia)
}

// Loaded returns the curvature in 1/mm the section must be bent to so that
// it relaxes to curvature relaxed > 0: the inverse of Relaxed.
func (s *Springback) Loaded(relaxed float64) (float64, error) {
	if !(relaxed > 0) || math.IsInf(relaxed, 0) {
		return 0, fmt.Errorf("springback: relaxed curvature %g 1/mm must be positive", relaxed)
	}
	lo := s.ElasticLimit()
	f := func(k float64) float64 { return s.Relaxed(k) - relaxed }
	hi := lo + relaxed
	for steps := 0; f(hi) < 0; steps++ {
		next := lo + 2*(hi-lo)
		if math.IsInf(next, 0) || !(next > hi) || steps == bracketMaxSteps {
			return 0, fmt.Errorf("springback: no curvature relaxes to %g 1/mm from the elastic limit %g 1/mm: the yield is outside what the model can bend", relaxed, lo)
		}
		hi = next
	}
	k, err := findRoot(f, lo, hi, springbackRelTol*hi)
	if err != nil {
		return 0, fmt.Errorf("springback: %w", err)
	}
	return k, nil
}

// NoSetError reports a former on which the wire stays elastic: released, it
// springs back straight, and a former cannot set its shape.
type NoSetError struct {
	// FormerRadius is the helix radius asked for, in mm.
	FormerRadius float64
	// Spacing is the axial spacing per turn, in mm.
	Spacing float64
	// Curvature is the wire-path curvature on that former, in 1/mm.
	Curvature float64
	// ElasticLimit is the curvature below which no set is taken, in 1/mm.
	ElasticLimit float64
	// MaxRadius is the largest former radius at this spacing that still
	// sets the wire, in mm (zero when no helix of this spacing bends the
	// wire that far).
	MaxRadius float64
}

// Error states the radius, why it fails and the radius that would work.
func (e *NoSetError) Error() string {
	msg := fmt.Sprintf("wire stays elastic on a former of radius %.4g mm (wire-path curvature %.4g 1/mm, elastic limit %.4g 1/mm): it takes no permanent set and springs back straight",
		e.FormerRadius, e.Curvature, e.ElasticLimit)
	if e.MaxRadius > 0 {
		return msg + fmt.Sprintf("; wind at a radius below %.4g mm or choose a softer wire", e.MaxRadius)
	}
	return msg + "; choose a softer or thicker wire"
}

// SteepHelixError reports a former curvature that no helix of the given
// spacing can have: a helix's wire-path curvature peaks at 1/(2p) where the
// radius equals p (pitch angle 45°).
type SteepHelixError struct {
	// Curvature is the wire-path curvature needed on the former, in 1/mm.
	Curvature float64
	// Spacing is the axial spacing per turn, in mm.
	Spacing float64
}

// Error states the needed curvature and the largest one the spacing allows.
func (e *SteepHelixError) Error() string {
	p := e.Spacing / (2 * math.Pi)
	return fmt.Sprintf("former would need a wire-path curvature of %.4g 1/mm, above the %.4g 1/mm a helix with %.4g mm spacing per turn can have: the wire is too springy for this coil",
		e.Curvature, 1/(2*p), e.Spacing)
}

// Winding is one turn's springback: the former it is wound on and the coil
// it relaxes to, both with the same axial spacing.
type Winding struct {
	// FormerRadius is the radius of the wire centreline in the former's
	// groove, in mm.
	FormerRadius float64
	// RelaxedRadius is the radius of the wire centreline after release, in mm.
	RelaxedRadius float64
	// Spacing is the axial spacing per turn in mm, held by the groove.
	Spacing float64
	// FormerCurvature and RelaxedCurvature are the wire-path curvatures in
	// 1/mm.
	FormerCurvature, RelaxedCurvature float64
	// OuterStrain is the bending strain of the outer fibre on the former.
	OuterStrain float64
	// Warnings holds notes on the winding, e.g. an outer-fibre strain beyond
	// the material's elongation.
	Warnings []string
}

// Springout returns the growth in diameter from former to relaxed coil, in mm.
func (w Winding) Springout() float64 { return 2 * (w.RelaxedRadius - w.FormerRadius) }

// HelixCurvature returns the curvature in 1/mm of a helix of radius r mm
// with axial spacing s mm per turn: κ = r/(r² + p²), p = s/2π.
// Source: standard differential geometry of the circular helix.
func HelixCurvature(r, s float64) float64 {
	p := s / (2 * math.Pi)
	return r / (r*r + p*p)
}

// HelixRadius returns the radius in mm (the branch r ≥ p) of the helix with
// axial spacing s mm per turn and curvature kappa in 1/mm:
// r = (1 + √(1 − 4κ²p²))/(2κ), for kappa > 0. It returns a
// *SteepHelixError when kappa exceeds the largest curvature 1/(2p) of such a
// helix.
// Source: standard differential geometry of the circular helix.
func HelixRadius(kappa, s float64) (float64, error) {
	if !(kappa > 0) || math.IsInf(kappa, 0) {
		return 0, fmt.Errorf("helix radius: curvature %g 1/mm must be positive", kappa)
	}
	p := s / (2 * math.Pi)
	q := 1 - 4*kappa*kappa*p*p
	if q < 0 {
		return 0, &SteepHelixError{Curvature: kappa, Spacing: s}
	}
	return (1 + math.Sqrt(q)) / (2 * kappa), nil
}

// checkHelix validates a radius and spacing pair.
func checkHelix(what string, r, s float64) error {
	switch {
	case !(r > 0) || math.IsInf(r, 0):
		return fmt.Errorf("springback: %s radius %g mm must be positive", what, r)
	case !(s >= 0) || math.IsInf(s, 0):
		return fmt.Errorf("springback: spacing %g mm must be zero or positive", s)
	case r < s/(2*math.Pi):
		return fmt.Errorf("springback: %s radius %g mm is below the spacing per radian %g mm (pitch angle above 45°)", what, r, s/(2*math.Pi))
	}
	return nil
}

// winding fills a Winding from the two curvatures and radii.
func (s *Springback) winding(rf, rr, sp, kf, kr float64) Winding {
	w := Winding{FormerRadius: rf, RelaxedRadius: rr, Spacing: sp,
		FormerCurvature: kf, RelaxedCurvature: kr, OuterStrain: kf * s.sec.HalfDepth()}
	if s.strainLimit > 0 && w.OuterStrain > s.strainLimit {
		w.Warnings = append(w.Warnings, fmt.Sprintf(
			"outer-fibre strain %.1f %% on a %.4g mm former radius exceeds the material's elongation %.1f %%: the wire may crack or neck; use a larger former or a softer temper",
			100*w.OuterStrain, rf, 100*s.strainLimit))
	}
	return w
}

// Relax returns the coil a wire wound at formerRadius mm with axial spacing
// spacing mm per turn relaxes to (forward model). It returns a *NoSetError
// when the wire would stay elastic on that former.
func (s *Springback) Relax(formerRadius, spacing float64) (Winding, error) {
	if err := checkHelix("former", formerRadius, spacing); err != nil {
		return Winding{}, err
	}
	kf := HelixCurvature(formerRadius, spacing)
	var kr float64
	if ke := s.ElasticLimit(); kf > ke {
		kr = s.Relaxed(kf)
	}
	if !(kr > 0) {
		// Elastic, or so close to the elastic limit that the set is lost
		// in rounding.
		ke := s.ElasticLimit()
		e := &NoSetError{FormerRadius: formerRadius, Spacing: spacing, Curvature: kf, ElasticLimit: ke}
		if r, err := HelixRadius(ke, spacing); err == nil {
			e.MaxRadius = r
		}
		return Winding{}, e
	}
	rr, err := HelixRadius(kr, spacing)
	if err != nil {
		return Winding{}, err
	}
	return s.winding(formerRadius, rr, spacing, kf, kr), nil
}

// Compensate returns the former on which a wire with axial spacing spacing
// mm per turn must be wound to relax to targetRadius mm (inverse model). It
// returns a *SteepHelixError when the former curvature needed exceeds what a
// helix of that spacing can have.
func (s *Springback) Compensate(targetRadius, spacing float64) (Winding, error) {
	if err := checkHelix("target", targetRadius, spacing); err != nil {
		return Winding{}, err
	}
	kr := HelixCurvature(targetRadius, spacing)
	kf, err := s.Loaded(kr)
	if err != nil {
		return Winding{}, err
	}
	rf, err := HelixRadius(kf, spacing)
	if err != nil {
		return Winding{}, err
	}
	return s.winding(rf, targetRadius, spacing, kf, kr), nil
}
