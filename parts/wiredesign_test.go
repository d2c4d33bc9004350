package parts

import (
	"coilwright/parts/spec/spectest"
	"errors"
	"fmt"
	"math"
	"slices"
	"strings"
	"testing"

	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

var specText = spectest.SpecText

const (
	cylinder5800    = spectest.Cylinder5800
	coneSpacing5800 = spectest.ConeSpacing5800
	coneAngle5800   = spectest.ConeSpacing5800 + "\npitch_mode = \"constant_angle\""
)

// mustDesign parses text and works out its design, failing the test on
// any error.
func mustDesign(t *testing.T, text string) *Design {
	t.Helper()
	d, err := NewDesign(mustParse(t, []byte(text)))
	if err != nil {
		t.Fatal(err)
	}
	return d
}

func warningList(d *Design) []string {
	var c []string
	for _, w := range d.Warnings {
		c = append(c, w.Code)
	}
	return c
}

func TestFormerCompensation(t *testing.T) {
	const tol = 1e-9
	for _, material := range []string{"copper-annealed", "brass-c26000-half-hard", "steel-galvanised-soft"} {
		t.Run("cylinder "+material, func(t *testing.T) {
			// Source: identity; a cylinder's former radius is the inverse
			// springback of its radius, so the forward model returns the
			// target on every turn.
			d := mustDesign(t, specText(5800, cylinder5800, `material = "`+material+`"
diameter_mm = 1.6`))
			// The wire keeps its length: the former winds the coil's wire
			// length over the coil's height, in more turns.
			if relErr(d.Former.Length(), d.Coil.Length()) > tol || relErr(d.Former.Height(), d.Coil.Height()) > tol ||
				d.Former.Mode != d.Coil.Mode || d.Former.Hand != d.Coil.Hand || d.Former.Z0 != d.Coil.Z0 || !(d.Former.Turns > d.Coil.Turns) {
				t.Errorf("former %+v does not hold the coil's wire length, height, kind, hand and start %+v", d.Former, d.Coil)
			}
			if !(d.Former.StartRadius < d.Coil.StartRadius) {
				t.Errorf("former radius %g not below coil radius %g", d.Former.StartRadius, d.Coil.StartRadius)
			}
			for _, tr := range d.Turns {
				if relErr(tr.PredictedDiameterMM, tr.DiameterMM) > tol {
					t.Errorf("turn %d: predicted %.12g mm, target %.12g", tr.Index, tr.PredictedDiameterMM, tr.DiameterMM)
				}
				if math.Abs(tr.SpringbackMM-(tr.PredictedDiameterMM-tr.FormerDiameterMM)) > 1e-12 {
					t.Errorf("turn %d: springback %g is not predicted − former", tr.Index, tr.SpringbackMM)
				}
			}
		})
	}
	for _, tc := range []struct{ name, coil string }{
		{"constant spacing", coneSpacing5800},
		{"constant angle", coneAngle5800},
	} {
		t.Run("cone "+tc.name, func(t *testing.T) {
			d := mustDesign(t, specText(5800, tc.coil, `material = "brass-c26000-half-hard"
diameter_mm = 1.6`))
			// Source: identity; each end is compensated exactly.
			for _, phi := range []float64{0, d.Former.Span()} {
				w, err := d.Wire.Model.Relax(d.Former.Radius(phi), d.Former.SpacingAt(phi))
				if err != nil {
					t.Fatal(err)
				}
				if want := d.Coil.Radius(phi * d.Coil.Turns / d.Former.Turns); relErr(w.RelaxedRadius, want) > 1e-6 {
					t.Errorf("φ %.3g: relaxes to %.9g mm, coil %.9g", phi, w.RelaxedRadius, want)
				}
			}
			// Source: the groove holds the heights: same start and total height.
			if relErr(d.Former.Height(), d.Coil.Height()) > tol || d.Former.Z0 != d.Coil.Z0 {
				t.Errorf("former height %.12g, coil %.12g", d.Former.Height(), d.Coil.Height())
			}
			// Between the ends the interpolated former stays well inside
			// the inspection tolerance.
			for _, tr := range d.Turns {
				if dev := math.Abs(tr.PredictedDiameterMM - tr.DiameterMM); dev > formerFitFraction*tr.ToleranceMM {
					t.Errorf("turn %d: predicted %.4f mm, target %.4f", tr.Index, tr.PredictedDiameterMM, tr.DiameterMM)
				}
			}
			if slices.Contains(warningList(d), "former-fit") {
				t.Errorf("unexpected former-fit warning: %v", d.Warnings)
			}
		})
	}
}

func TestWireWarnings(t *testing.T) {
	tests := []struct {
		name, freq, coil, wire string
		want                   string
	}{
		// Source: 0.8/8.2 ≈ 9.7 % outer strain against hard C26000's 3 %.
		{"hard brass overstrained", "5800", cylinder5800, `material = "brass-c26000-hard"
diameter_mm = 1.6`, "wire-strain"},
		{"spring stainless flagged", "5800", cylinder5800, `material = "stainless-304-spring"
diameter_mm = 1.6`, "wire-stiff"},
		{"aluminium needs flux", "5800", cylinder5800, `material = "aluminium-1350"
diameter_mm = 1.6`, "wire-special-flux"},
		{"enamel to strip", "5800", cylinder5800, `material = "copper-enamelled"
diameter_mm = 1.6`, "wire-strip-enamel"},
		// Source: C26000 half-hard 1.0 mm on a 2.44 GHz helix springs
		// out by about 14 mm in diameter (the round-wire model's worked numbers in
		// TestRoundWireWorkedChecks), so a
		// 10 % yield scatter moves it far beyond the 0.39 mm tolerance.
		{"uncalibrated stiff wire", "2440", cylinder5800, `material = "brass-c26000-half-hard"
diameter_mm = 1.0`, "springback-calibration"},
		{"hardening without a law", "5800", cylinder5800, `material = "brass-c26000-half-hard"
diameter_mm = 1.6
springback_model = "hardening"`, "springback-model"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var f float64
			fmt.Sscan(tc.freq, &f)
			d := mustDesign(t, specText(f, tc.coil, tc.wire))
			if !slices.Contains(warningList(d), tc.want) {
				t.Errorf("warnings %v lack %q", warningList(d), tc.want)
			}
		})
	}
	t.Run("annealed copper is quiet", func(t *testing.T) {
		d := mustDesign(t, specText(5800, cylinder5800, `material = "copper-annealed"
diameter_mm = 1.6`))
		for _, c := range warningList(d) {
			if strings.HasPrefix(c, "wire-") || strings.HasPrefix(c, "springback") || c == "former-fit" {
				t.Errorf("unexpected warning %q", c)
			}
		}
	})
}

func TestWireSpecValidation(t *testing.T) {
	tests := []struct {
		name, wire, key, want string
	}{
		{"unknown material", `material = "unobtainium"
diameter_mm = 1.6`, "wire.material", `"copper-annealed"`},
		{"bad model", `material = "copper-annealed"
diameter_mm = 1.6
springback_model = "elastic"`, "wire.springback_model", "perfectly-plastic"},
		{"tolerance too small", `material = "copper-annealed"
diameter_mm = 1.6
inspection_tolerance_mm = 0.001`, "wire.inspection_tolerance_mm", "between"},
		{"empty calibration", `material = "copper-annealed"
diameter_mm = 1.6
calibration = ""`, "wire.calibration", "calibration file"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := spec.ParseSpec([]byte(specText(5800, cylinder5800, tc.wire)))
			var se *spec.SpecError
			found := false
			var ses spec.SpecErrors
			if errors.As(err, &ses) {
				for _, e := range ses {
					if e.Key == tc.key {
						se, found = e, true
					}
				}
			}
			if !found {
				t.Fatalf("err = %v, want a problem with %s", err, tc.key)
			}
			if se.Line == 0 || !strings.Contains(se.Error(), tc.want) {
				t.Errorf("%v: want a line and %q", se, tc.want)
			}
		})
	}
}

func TestAttachCalibration(t *testing.T) {
	text := specText(5800, cylinder5800, `material = "brass-c26000-half-hard"
diameter_mm = 1.6
calibration = "batch.toml"`)
	m, _ := wire.LookupMaterial("brass-c26000-half-hard")
	cal, err := wire.Calibrate(m, 1.6, 1.6, false, []wire.CalibrationPoint{{FormerDiameter: 16.6, RelaxedDiameter: 18.2}})
	if err != nil {
		t.Fatal(err)
	}
	t.Run("calibrated yield drives the former", func(t *testing.T) {
		s, err := spec.ParseSpec([]byte(text))
		if err != nil {
			t.Fatal(err)
		}
		plain, err := NewDesign(s)
		if err != nil {
			t.Fatal(err)
		}
		if err := s.AttachCalibration(cal); err != nil {
			t.Fatal(err)
		}
		d, err := NewDesign(s)
		if err != nil {
			t.Fatal(err)
		}
		if d.Wire.Material.Yield != cal.EffectiveYield || d.Wire.LibraryYield != m.Yield {
			t.Errorf("yield %g (library %g), want %g (%g)", d.Wire.Material.Yield, d.Wire.LibraryYield, cal.EffectiveYield, m.Yield)
		}
		// Source: a stronger batch springs back more, so its former is smaller.
		if !(cal.EffectiveYield > m.Yield && d.Former.StartRadius < plain.Former.StartRadius) {
			t.Errorf("former %g mm with yield %g, uncalibrated %g mm", d.Former.StartRadius, cal.EffectiveYield, plain.Former.StartRadius)
		}
	})
	mismatch := []struct {
		name string
		edit func(*wire.Calibration)
		want string
	}{
		{"other material", func(c *wire.Calibration) { c.Material = "copper-annealed" }, "is for material"},
		{"other model", func(c *wire.Calibration) { c.Hardening = true }, "springback_model"},
	}
	for _, tc := range mismatch {
		t.Run(tc.name, func(t *testing.T) {
			s, _ := spec.ParseSpec([]byte(text))
			c := cal
			tc.edit(&c)
			err := s.AttachCalibration(c)
			var se *spec.SpecError
			if !errors.As(err, &se) || se.Key != "wire.calibration" || se.Line == 0 || !strings.Contains(se.Problem, tc.want) {
				t.Errorf("err = %v, want a wire.calibration problem mentioning %q", err, tc.want)
			}
		})
	}
	t.Run("other gauge warns", func(t *testing.T) {
		s, _ := spec.ParseSpec([]byte(strings.Replace(text, "diameter_mm = 1.6", "diameter_mm = 2.0", 1)))
		if err := s.AttachCalibration(cal); err != nil {
			t.Fatal(err)
		}
		d, err := NewDesign(s)
		if err != nil {
			t.Fatal(err)
		}
		if !slices.Contains(warningList(d), "calibration-diameter") {
			t.Errorf("warnings %v lack calibration-diameter", warningList(d))
		}
	})
}

func TestInspectionTolerance(t *testing.T) {
	// Source: common practice as stated at InspectionFraction: the larger
	// of 0.2 mm and 1 % of the diameter.
	for _, tc := range []struct{ d, want float64 }{{10, 0.2}, {20, 0.2}, {39.11, 0.3911}} {
		if got := InspectionTolerance(tc.d); math.Abs(got-tc.want) > 1e-12 {
			t.Errorf("D %g: tolerance %g, want %g", tc.d, got, tc.want)
		}
	}
}

func TestNoFormerCanWind(t *testing.T) {
	// Source: a helix of spacing S bends at most to 1/(2p), p = S/2π. Thin
	// spring-temper stainless on a 1.28 GHz helix (R ≈ 37 mm, S ≈ 52 mm)
	// loses about 32σy/(3πE·d) ≈ 0.088 1/mm on release (derived, mostly plastic round wire), so the
	// former would need more than the 0.06 1/mm such a helix can have. At a
	// 45° pitch angle the coil already has that largest curvature, so no
	// wire can be compensated.
	for _, tc := range []struct{ name, freq, coil, wire string }{
		{"thin spring stainless", "1280", cylinder5800, "material = \"stainless-304-spring\"\ndiameter_mm = 0.3"},
		{"45 degree pitch", "5800", strings.Replace(cylinder5800, "12.5", "45.0", 1), "material = \"copper-annealed\"\ndiameter_mm = 1.6"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var f float64
			fmt.Sscan(tc.freq, &f)
			_, err := designSpec([]byte(specText(f, tc.coil, tc.wire)))
			var se *spec.SpecError
			if !errors.As(err, &se) || se.Key != "wire.material" || se.Line == 0 || !strings.Contains(se.Problem, "no former") {
				t.Errorf("err = %v, want a wire.material problem", err)
			}
		})
	}
}

func relErr(got, want float64) float64 { return math.Abs(got-want) / math.Abs(want) }
