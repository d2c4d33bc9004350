package parts

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
		{"bore too wide for the coil", "[former]\ndrive = \"bore\"\nbore_diameter_mm = 12.0\n", "former.bore_diameter_mm"},
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

func TestFormerGrooveNeedsSpacing(t *testing.T) {
	// 3 mm wire with 0.2 mm clearance: groove radius 1.6 mm needs
	// max(1.6·(1 + √2) + 0.8, 3.5·1.6) = 5.6 mm of spacing; 4.5 mm is short.
	spec := strings.Replace(base, "pitch_angle_deg = 13.0", "spacing_mm = 4.5", 1)
	spec = strings.Replace(spec, "diameter_mm = 1.6", "diameter_mm = 3.0", 1)
	_, err := ParseSpec([]byte(spec))
	if err == nil || !strings.Contains(err.Error(), "coil.spacing_mm") || !strings.Contains(err.Error(), "groove") {
		t.Fatalf("got %v, want a groove spacing error on coil.spacing_mm", err)
	}
}
