package spec

import (
	"strings"
	"testing"
)

func TestToleranceTable(t *testing.T) {
	s := mustParse(t, []byte(base))
	x := s.Tolerance
	if !x.On() || x.Samples != DefaultToleranceSamples || x.SeedValue() != DefaultToleranceSeed || x.TurnDiameterMM != DefaultTurnDiameterTolMM || x.InspectionShare != DefaultInspectionShare {
		t.Errorf("defaults for a batch of 2 not filled: %+v", x)
	}
	// Source: ASTM B3 (from memory), ±1 % of a 1.6 mm wire.
	if got := x.WireTolMM(1.6); got != 0.016 {
		t.Errorf("wire tolerance %g mm, want 0.016", got)
	}
	one := mustParse(t, []byte(strings.Replace(base, "quantity = 2", "quantity = 1", 1)))
	if one.Tolerance.On() {
		t.Error("the analysis runs by default for one kit")
	}
	for _, tc := range []struct {
		name, add, key, words string
	}{
		{"no samples", "samples = 0", "tolerance.samples", "between 1 and 5000"},
		{"negative spread", "turn_diameter_tol_mm = -0.1", "tolerance.turn_diameter_tol_mm", "between 0 and 2"},
		{"huge yield scatter", "yield_cv = 0.9", "tolerance.yield_cv", "between 0 and 0.5"},
		{"share of one", "inspection_share = 1.0", "tolerance.inspection_share", "between 0.5 and 0.999"},
		{"misspelt key", "sample = 10", "tolerance.sample", "unknown key"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParseSpec([]byte(base + "\n[tolerance]\n" + tc.add + "\n"))
			if err == nil {
				t.Fatal("accepted")
			}
			errs, ok := err.(SpecErrors)
			if !ok {
				t.Fatalf("%T: %v", err, err)
			}
			for _, e := range errs {
				if e.Key == tc.key && e.Line == 18 && strings.Contains(e.Error(), tc.words) && strings.Contains(e.Error(), "fix:") {
					return
				}
			}
			t.Errorf("no error on %s line 18 saying %q in %v", tc.key, tc.words, err)
		})
	}
}
