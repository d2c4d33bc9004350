package spec

import (
	"math"
	"testing"
)

// lambdaTol is the agreement required with the four-decimal table values.
const lambdaTol = 5e-5

func TestSpeedOfLightIsExact(t *testing.T) {
	// Source: SI Brochure, 9th ed., BIPM 2019: c = 299 792 458 m/s exactly.
	if SpeedOfLight != 299792458 {
		t.Fatalf("SpeedOfLight = %v, want 299792458 exactly", SpeedOfLight)
	}
}

func TestWavelength(t *testing.T) {
	// Source: λ = c/f with the SI value of c (SI Brochure, 9th ed., BIPM 2019) [calc].
	for _, tc := range []struct {
		name string
		fMHz float64
		want float64
	}{
		{"1.28 GHz", 1280, 234.2129},
		{"2.44 GHz", 2440, 122.8658},
		{"5.8 GHz", 5800, 51.6884},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := Wavelength(tc.fMHz); math.Abs(got-tc.want) > lambdaTol {
				t.Errorf("Wavelength(%v) = %.5f mm, want %.4f", tc.fMHz, got, tc.want)
			}
		})
	}
}
