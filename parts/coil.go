package parts

import (
	"errors"
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/parts/spec"
)

// Hand is the winding sense of a helix: +1 right-hand (RHCP), −1 left-hand
// (LHCP). A right-hand helix advances along +z while turning
// counter-clockwise seen from above (IEEE Std 145).
type Hand int

// The two hands.
const (
	RightHand Hand = 1
	LeftHand  Hand = -1
)

// String returns "RHCP" or "LHCP".
func (h Hand) String() string {
	if h == LeftHand {
		return "LHCP"
	}
	return "RHCP"
}

// PitchMode says how a conical helix advances: constant axial spacing per
// turn (radius linear in azimuth) or constant pitch angle (equiangular,
// radius exponential in azimuth).
type PitchMode int

// The pitch modes.
const (
	ConstantSpacing PitchMode = iota
	ConstantAngle
)

// Coil is the wire centreline of a cylindrical or conical helix, measured
// from the reflector's top face. The azimuth φ runs from 0 at the feed end
// to Span() = 2π·Turns. It is a plain value: methods never mutate it.
type Coil struct {
	StartRadius float64   // centreline radius at φ = 0, mm
	EndRadius   float64   // centreline radius at φ = Span, mm
	Turns       float64   // number of turns, may be fractional
	Mode        PitchMode // how the pitch is held
	Spacing     float64   // axial advance per turn, mm (ConstantSpacing)
	PitchAngle  float64   // pitch angle on the cone surface, rad (ConstantAngle)
	Hand        Hand      // winding sense
	Z0          float64   // centreline height above the reflector at φ = 0, mm
}

// Span returns the total azimuth 2π·Turns in radians.
func (c Coil) Span() float64 { return 2 * math.Pi * c.Turns }

// rate returns dr/dφ for ConstantSpacing (a) or the exponent k for
// ConstantAngle (r = r0·e^{kφ}).
func (c Coil) rate() float64 {
	if c.Mode == ConstantAngle {
		return math.Log(c.EndRadius/c.StartRadius) / c.Span()
	}
	return (c.EndRadius - c.StartRadius) / c.Span()
}

// coneSin returns sin θ0 of the cone half-angle for ConstantAngle, from
// k = sin θ0 · tan α (Source: Dyson, IEEE Trans. AP-13, 1965, equiangular
// spiral on a cone).
func (c Coil) coneSin() float64 { return c.rate() / math.Tan(c.PitchAngle) }

// Radius returns the centreline radius at azimuth φ in mm.
func (c Coil) Radius(phi float64) float64 {
	if c.Mode == ConstantAngle {
		return c.StartRadius * math.Exp(c.rate()*phi)
	}
	return c.StartRadius + c.rate()*phi
}

// Z returns the centreline height above the reflector at azimuth φ in mm.
func (c Coil) Z(phi float64) float64 {
	if c.Mode == ConstantAngle {
		s := c.coneSin()
		cos := math.Sqrt(1 - s*s)
		// on the cone, dz = dr / tan θ0
		return c.Z0 + (c.Radius(phi)-c.StartRadius)*cos/s
	}
	return c.Z0 + c.Spacing*phi/(2*math.Pi)
}

// Point returns the centreline point at azimuth φ; a left-hand coil mirrors
// y.
func (c Coil) Point(phi float64) geom.Vec3 {
	r := c.Radius(phi)
	s, co := math.Sincos(phi)
	return geom.Vec3{X: r * co, Y: float64(c.Hand) * r * s, Z: c.Z(phi)}
}

// Height returns the axial length of the winding in mm (Z at the end less Z0).
func (c Coil) Height() float64 { return c.Z(c.Span()) - c.Z0 }

// PitchAngleAt returns the local pitch angle in radians at φ, measured on
// the cone surface between the wire and the circumferential direction:
// tan α = √(ṙ² + ż²)/r. For a cylinder this is Kraus's tan α = S/C.
func (c Coil) PitchAngleAt(phi float64) float64 {
	if c.Mode == ConstantAngle {
		return c.PitchAngle
	}
	a, b := c.rate(), c.Spacing/(2*math.Pi)
	return math.Atan(math.Hypot(a, b) / c.Radius(phi))
}

// SpacingAt returns the local axial advance per turn at φ in mm.
func (c Coil) SpacingAt(phi float64) float64 {
	if c.Mode == ConstantAngle {
		s := c.coneSin()
		return 2 * math.Pi * c.rate() * c.Radius(phi) * math.Sqrt(1-s*s) / s
	}
	return c.Spacing
}

// MinSpacing returns the smallest axial advance per turn along the coil, mm.
func (c Coil) MinSpacing() float64 {
	return math.Min(c.SpacingAt(0), c.SpacingAt(c.Span()))
}

// Length returns the exact arc length of the centreline in mm, in closed
// form (derived; tested against numerical quadrature): for constant
// spacing ∫√(r² + a² + b²) dφ with r = r0 + aφ, b = S/2π; for constant
// pitch angle L = (r1 − r0)/(sin θ0 · sin α).
func (c Coil) Length() float64 { return c.LengthBetween(0, c.Span()) }

// LengthBetween returns the centreline arc length from φ0 to φ1 in mm.
func (c Coil) LengthBetween(phi0, phi1 float64) float64 {
	r0, r1 := c.Radius(phi0), c.Radius(phi1)
	if c.Mode == ConstantAngle {
		return (r1 - r0) / (c.coneSin() * math.Sin(c.PitchAngle))
	}
	a, b := c.rate(), c.Spacing/(2*math.Pi)
	if math.Abs(a) < 1e-12 {
		return (phi1 - phi0) * math.Hypot(r0, b)
	}
	c2 := a*a + b*b
	cc := math.Sqrt(c2)
	F := func(u float64) float64 { return 0.5 * (u*math.Sqrt(u*u+c2) + c2*math.Asinh(u/cc)) }
	return (F(r1) - F(r0)) / a
}

// MeanRadius returns the centreline radius averaged over azimuth, mm.
func (c Coil) MeanRadius() float64 {
	if c.Mode == ConstantAngle && c.rate() != 0 {
		return (c.EndRadius - c.StartRadius) / (c.rate() * c.Span())
	}
	return (c.StartRadius + c.EndRadius) / 2
}

// errNoCone is returned when no cone carries a constant-angle spiral with
// the given ends, turns and pitch angle.
var errNoCone = errors.New("no cone fits")

// coilFromSpec works out the centreline from a validated spec.
func coilFromSpec(s *spec.Spec) (Coil, error) {
	cs := &s.Coil
	lambda := s.Wavelength()
	radius := func(d, cl *float64) float64 {
		if d != nil {
			return *d / 2
		}
		return *cl * lambda / (2 * math.Pi)
	}
	c := Coil{Turns: cs.Turns, Hand: RightHand}
	if cs.Hand == "LHCP" {
		c.Hand = LeftHand
	}
	c.StartRadius = radius(cs.BaseDiameterMM, cs.BaseCircumferenceLambda)
	c.EndRadius = c.StartRadius
	if cs.Shape == "conical" {
		c.EndRadius = radius(cs.TopDiameterMM, cs.TopCircumferenceLambda)
	}
	if cs.FirstTurnHeightMM != nil {
		c.Z0 = *cs.FirstTurnHeightMM
	} else {
		c.Z0 = spec.DefaultFirstTurnHeight(lambda, s.Wire.DiameterMM)
	}
	if cs.PitchMode == "constant_angle" && c.StartRadius != c.EndRadius {
		c.Mode = ConstantAngle
		c.PitchAngle = *cs.PitchAngleDeg * math.Pi / 180
		if s := c.coneSin(); math.Abs(s) >= 1 || s == 0 {
			return Coil{}, fmt.Errorf("%w: a constant %.1f° pitch over %s turns cannot span radii %.2f to %.2f mm (the cone would need sin θ0 = %.2f)",
				errNoCone, *cs.PitchAngleDeg, num(cs.Turns), c.StartRadius, c.EndRadius, s)
		}
		return c, nil
	}
	if cs.SpacingMM != nil {
		c.Spacing = *cs.SpacingMM
	} else {
		// Spacing from the pitch angle on the mean circumference:
		// tan α = S/C. Source: Kraus, Antennas, 2nd ed., §7-2.
		c.Spacing = 2 * math.Pi * (c.StartRadius + c.EndRadius) / 2 * math.Tan(*cs.PitchAngleDeg*math.Pi/180)
	}
	return c, nil
}
