package wire

import (
	"math"
	"testing"
)

func TestYieldScatter(t *testing.T) {
	// Source: ASTM B3 via supplier data, annealed copper yield 70–100 MPa:
	// ±2σ about 85 MPa gives σ = 7.5 MPa, CV = 7.5/85.
	cu, err := LookupMaterial("copper-annealed")
	if err != nil {
		t.Fatal(err)
	}
	if got, want := YieldScatter(cu).CV, 7.5/85; math.Abs(got-want) > 1e-12 {
		t.Errorf("copper CV %g, want %g", got, want)
	}
	// Source: C26000 half-hard tensile mill limits 545–650 MPa (supplier
	// datasheet): σ = 105/4, mean 597.5.
	br, err := LookupMaterial("brass-c26000-half-hard")
	if err != nil {
		t.Fatal(err)
	}
	if got, want := YieldScatter(br).CV, 105.0/4/597.5; math.Abs(got-want) > 1e-12 {
		t.Errorf("brass CV %g, want %g", got, want)
	}
	for _, m := range Materials() {
		if s := YieldScatter(m); !(s.CV > 0 && s.CV < 0.2) || s.Source == "" {
			t.Errorf("%s: scatter %+v out of range or unsourced", m.ID, s)
		}
	}
}
