package parts

import (
	"math"
	"strings"
	"testing"

	"coilwright/parts/spec"
)

func TestWireOverGroundOhm(t *testing.T) {
	// Source: Pozar, Microwave Engineering, 4th ed., Table 2.1: a two-wire
	// line of spacing D and radius a has L = (μ/π)·acosh(D/2a) and C =
	// πε/acosh(D/2a); over ground (image theory, D = 2h) the impedance is
	// half of √(L/C). μ0 = 4π·10⁻⁷ H/m, ε0 = 8.8541878128·10⁻¹² F/m.
	const mu0, eps0 = 4 * math.Pi * 1e-7, 8.8541878128e-12
	for _, c := range []struct{ h, a float64 }{{1.8, 0.8}, {3.5, 1}, {10, 0.5}} {
		x := math.Acosh(2 * c.h / (2 * c.a))
		want := math.Sqrt((mu0/math.Pi*x)/(math.Pi*eps0/x)) / 2
		if got := WireOverGroundOhm(c.h, c.a); math.Abs(got-want) > 1e-3*want {
			t.Errorf("h %g a %g: %.3f Ω, want %.3f Ω", c.h, c.a, got, want)
		}
	}
}

func TestStripSizedToMaxVSWR(t *testing.T) {
	for _, name := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(name, func(t *testing.T) {
			// The old default, a quarter-turn strip, reproduces |Γ| ≈ 0.31–0.34
			// (VSWR about 1.9–2.0) on the line model, falling across the band.
			old := demoDesign(t, name, func(s string) string {
				return withFeed("periphery")(s) + "\n[wedge]\nspan_deg = 90.0\n"
			})
			ob := old.Patterns.LineBand
			if w := WorstVSWR(ob); w < 1.85 || w > 2.1 || ob[0].Reflection <= ob[len(ob)-1].Reflection {
				t.Errorf("quarter-turn strip: worst VSWR %.3f, |Γ| %.3f → %.3f", w, ob[0].Reflection, ob[len(ob)-1].Reflection)
			}
			if !strings.Contains(warningCodes(old), "match") {
				t.Errorf("a quarter-turn strip missing max_vswr does not warn: %s", warningCodes(old))
			}
			// Sized: the shortest span meeting the default 1.5 across the band.
			d := demoDesign(t, name, withFeed("periphery"))
			b := d.Patterns.LineBand
			if len(b) != MatchPoints || WorstVSWR(b) > d.Spec.Wedge.MaxVSWR {
				t.Errorf("sized strip: worst VSWR %.3f over %d points", WorstVSWR(b), len(b))
			}
			span := d.Patterns.Wedge.Span * 180 / math.Pi
			if span <= 90 || strings.Contains(warningCodes(d), "match") {
				t.Errorf("span %.0f°, warnings %s", span, warningCodes(d))
			}
			// One step shorter misses the target: the shortest span was chosen.
			shorter := demoDesign(t, name, func(s string) string {
				return withFeed("periphery")(s) + "\n[wedge]\nspan_deg = " + num(span-SpanStepDeg) + "\n"
			})
			if WorstVSWR(shorter.Patterns.LineBand) <= d.Spec.Wedge.MaxVSWR {
				t.Errorf("%.0f° already meets the target", span-SpanStepDeg)
			}
		})
	}
}

func TestCentreFeedSaysWhyNotMatched(t *testing.T) {
	// Both demos are centre-fed: the horizontal lead (a wire 1.8 mm or
	// 3.5 mm over the plate) sits between the cable and the strip.
	for _, name := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		d := demoDesign(t, name, nil)
		found := false
		for _, w := range d.Warnings {
			found = found || w.Code == "match" && strings.Contains(w.Message, `coil.feed = "periphery"`)
		}
		if WorstVSWR(d.Patterns.LineBand) > d.Spec.Wedge.MaxVSWR && !found {
			t.Errorf("%s: worst VSWR %.2f without a match warning: %v", name, WorstVSWR(d.Patterns.LineBand), d.Warnings)
		}
	}
}

func TestBandOf(t *testing.T) {
	// The band rule the reference spec documents (wedge.max_vswr: "across
	// the band, band_low_mhz to band_high_mhz, or ±3 % of the frequency"),
	// each edge on its own.
	f := func(v float64) *float64 { return &v }
	for _, c := range []struct {
		name     string
		low, hi  *float64
		lo, high float64
		text     string
	}{
		{"no edges", nil, nil, 11640, 12360, "12000 MHz ± 3 % (11640–12360 MHz; the spec sets no band_low_mhz or band_high_mhz)"},
		{"both edges", f(11700), f(12500), 11700, 12500, "11700–12500 MHz"},
		{"low edge only", f(11900), nil, 11900, 12360, "11900–12360 MHz (band_high_mhz not set: frequency_mhz + 3 %)"},
		{"high edge only", nil, f(12100), 11640, 12100, "11640–12100 MHz (band_low_mhz not set: frequency_mhz − 3 %)"},
	} {
		t.Run(c.name, func(t *testing.T) {
			s := &spec.Spec{FrequencyMHz: 12000, BandLowMHz: c.low, BandHighMHz: c.hi}
			b := BandOf(s)
			if math.Abs(b.LowMHz-c.lo) > 1e-9 || math.Abs(b.HighMHz-c.high) > 1e-9 {
				t.Errorf("band %g–%g MHz, want %g–%g", b.LowMHz, b.HighMHz, c.lo, c.high)
			}
			if got := b.Text(s.FrequencyMHz); got != c.text {
				t.Errorf("text %q, want %q", got, c.text)
			}
		})
	}
}
