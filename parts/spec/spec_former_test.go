package spec

import (
	"errors"
	"strings"
	"testing"
)

func TestFormerDefaults(t *testing.T) {
	s, err := ParseSpec([]byte(base))
	if err != nil {
		t.Fatal(err)
	}
	f := s.Former
	// Source: the defaults documented on FormerSpec (common FDM practice).
	if f.ClearanceMM != 0.2 || f.GrooveDepthRatio != 0.6 || f.GrooveProfile != "teardrop" || f.Drive != "hex" ||
		f.HexAcrossFlatsMM != 6.6 || f.ToleranceMM != DefaultFormerToleranceMM || f.BoreDiameterMM != 6.5 {
		t.Errorf("defaults not filled: %+v", f)
	}
}

func TestFormerErrors(t *testing.T) {
	cases := []struct {
		name, extra, key string
	}{
		{"clearance above 1 mm", "[former]\nclearance_mm = 1.5\n", "former.clearance_mm"},
		{"unknown profile", "[former]\ngroove_profile = \"square\"\n", "former.groove_profile"},
		{"flats deeper than the flange", "[former]\nflat_depth_mm = 8.0\n", "former.flat_depth_mm"},
		{"tolerance 0", "[former]\ntolerance_mm = 0.0\n", "former.tolerance_mm"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, err := ParseSpec([]byte(base + c.extra))
			var se *SpecError
			if !errors.As(err, &se) || !strings.Contains(err.Error(), c.key) {
				t.Fatalf("got %v, want an error on %s", err, c.key)
			}
			for _, e := range err.(SpecErrors) {
				if e.Key == c.key && e.Line == 0 {
					t.Errorf("%s reported without its line", c.key)
				}
			}
		})
	}
}
