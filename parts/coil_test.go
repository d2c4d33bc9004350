package parts

import (
	"math"
	"testing"

	"coilwright/parts/spec"

	"gonum.org/v1/gonum/integrate/quad"
)

// quadRelTol is the agreement required between closed-form arc lengths and
// numerical quadrature.
const quadRelTol = 1e-9

// speed returns |dP/dφ| from the definition of each parametrisation, written
// out here independently of the closed forms under test: for constant
// spacing r = r0 + aφ, z = bφ; for constant angle r = r0·e^{kφ},
// z = (r − r0)/tan θ0.
func speed(c Coil) func(float64) float64 {
	if c.Mode == ConstantAngle {
		k := math.Log(c.EndRadius/c.StartRadius) / c.Span()
		sinT := k / math.Tan(c.PitchAngle)
		tanT := sinT / math.Sqrt(1-sinT*sinT)
		return func(phi float64) float64 {
			r := c.StartRadius * math.Exp(k*phi)
			dr := k * r
			return math.Sqrt(r*r + dr*dr + (dr/tanT)*(dr/tanT))
		}
	}
	a := (c.EndRadius - c.StartRadius) / c.Span()
	b := c.Spacing / (2 * math.Pi)
	return func(phi float64) float64 {
		r := c.StartRadius + a*phi
		return math.Sqrt(r*r + a*a + b*b)
	}
}

func TestArcLengthAgainstQuadrature(t *testing.T) {
	for _, tc := range []struct {
		name string
		c    Coil
	}{
		{"cylinder 7 turns", Coil{StartRadius: 19.555, EndRadius: 19.555, Turns: 7, Spacing: 27.24}},
		{"cone narrowing", Coil{StartRadius: 20, EndRadius: 10, Turns: 5, Spacing: 20}},
		{"cone widening fractional", Coil{StartRadius: 6, EndRadius: 9.5, Turns: 4.75, Spacing: 8}},
		{"equiangular widening", Coil{StartRadius: 10, EndRadius: 30, Turns: 4.542, Mode: ConstantAngle, PitchAngle: 12.5 * math.Pi / 180}},
		{"equiangular narrowing", Coil{StartRadius: 9, EndRadius: 6, Turns: 5, Mode: ConstantAngle, PitchAngle: 13 * math.Pi / 180}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			// Source: gonum integrate/quad, Gauss–Legendre, as the outside
			// reference for the closed-form arc lengths.
			want := quad.Fixed(speed(tc.c), 0, tc.c.Span(), 400, quad.Legendre{}, 0)
			got := tc.c.Length()
			if rel := math.Abs(got-want) / want; rel > quadRelTol {
				t.Errorf("Length = %.10f mm, quadrature %.10f mm (rel %.2g)", got, want, rel)
			}
		})
	}
}

func TestArcLengthCheckValues(t *testing.T) {
	t.Run("constant spacing", func(t *testing.T) {
		// Source: gonum integrate/quad (TestArcLengthAgainstQuadrature's
		// reference) [calc]: r0 = 20, r1 = 10, h = 100 mm, N = 5 → 482.2315 mm.
		c := Coil{StartRadius: 20, EndRadius: 10, Turns: 5, Spacing: 100.0 / 5}
		if got := c.Length(); math.Abs(got-482.2315) > 5e-5 {
			t.Errorf("Length = %.5f, want 482.2315", got)
		}
		if h := c.Height(); math.Abs(h-100) > 1e-9 {
			t.Errorf("Height = %v, want 100", h)
		}
	})
	t.Run("constant pitch angle", func(t *testing.T) {
		// Source: L = (r1 − r0)/(sin θ0 · sin α) [calc]: r0 = 10, r1 = 30 mm, θ0 = 10°,
		// α = 12.5° → 532.1365 mm over N = 4.542 turns; k = sin θ0·tan α
		// (Dyson, IEEE Trans. AP-13, 1965).
		alpha, theta := 12.5*math.Pi/180, 10*math.Pi/180
		n := math.Log(3) / (2 * math.Pi * math.Sin(theta) * math.Tan(alpha))
		if math.Abs(n-4.542) > 5e-4 {
			t.Fatalf("N = %.4f, want 4.542", n)
		}
		c := Coil{StartRadius: 10, EndRadius: 30, Turns: n, Mode: ConstantAngle, PitchAngle: alpha}
		if got := c.Length(); math.Abs(got-532.1365) > 5e-5 {
			t.Errorf("Length = %.5f, want 532.1365", got)
		}
		// the cone: z rises by (r1 − r0)/tan θ0
		if h := c.Height(); math.Abs(h-20/math.Tan(theta)) > 1e-9 {
			t.Errorf("Height = %v, want %v", h, 20/math.Tan(theta))
		}
	})
}

func TestHand(t *testing.T) {
	// A right-hand helix turns counter-clockwise seen from +z as z grows
	// (IEEE Std 145): the z component of P × P' is positive. Left is the
	// mirror image.
	for _, tc := range []struct {
		hand Hand
		sign float64
	}{{RightHand, 1}, {LeftHand, -1}} {
		t.Run(tc.hand.String(), func(t *testing.T) {
			c := Coil{StartRadius: 8, EndRadius: 6, Turns: 3, Spacing: 10, Hand: tc.hand}
			for phi := 0.1; phi < c.Span(); phi += 0.7 {
				p, q := c.Point(phi), c.Point(phi+1e-4)
				turn := p.X*q.Y - p.Y*q.X
				if turn*tc.sign <= 0 || q.Z <= p.Z {
					t.Fatalf("at φ = %.2f the %s coil turns the wrong way (%g) or does not rise", phi, tc.hand, turn)
				}
			}
		})
	}
}

func TestPitchAngleCylinder(t *testing.T) {
	// Source: Kraus, Antennas, 2nd ed., §7-2: tan α = S/C; for Cλ = 1 and
	// α = 12.5°, Sλ = tan 12.5° = 0.2217 [calc].
	lambda := spec.Wavelength(2440)
	r := lambda / (2 * math.Pi)
	c := Coil{StartRadius: r, EndRadius: r, Turns: 6, Spacing: 0.2217 * lambda}
	if a := c.PitchAngleAt(1) * 180 / math.Pi; math.Abs(a-12.5) > 0.01 {
		t.Errorf("pitch angle %.4f°, want 12.5°", a)
	}
}

func TestDemoLargestTurn(t *testing.T) {
	// Common practice (no published source): the largest turn of a 5.8 GHz
	// coil is about one wavelength round, about 52 mm.
	s := mustParse(t, demoSpec(t, "demo-5g8-cone.toml"))
	d, err := NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	largest := 0.0
	for _, tr := range d.Turns {
		largest = math.Max(largest, math.Pi*tr.DiameterMM)
	}
	if math.Abs(largest-52)/52 > 0.10 {
		t.Errorf("largest turn %.1f mm round, want about 52 mm (±10 %%)", largest)
	}
}

func TestDefaultFirstTurnHeight(t *testing.T) {
	// Common practice (no published source): the wire's underside 0.02 λ
	// above the reflector, rounded to 0.1 mm. At 5.8 GHz (λ = 51.688 mm)
	// with 1.6 mm wire: 1.034 + 0.8 = 1.834 → 1.8 mm [calc].
	if z := spec.DefaultFirstTurnHeight(spec.Wavelength(5800), 1.6); math.Abs(z-1.8) > 1e-12 {
		t.Errorf("first turn height %g mm, want 1.8", z)
	}
}
