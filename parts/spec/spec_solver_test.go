package spec

import (
	"strings"
	"testing"
)

func TestSolverDefaults(t *testing.T) {
	s := mustParse(t, []byte(base))
	x := s.Solver
	// Defaults as documented in templates/reference.toml.
	if !x.On() || x.ReflectorModel != "plate" || x.Points != 21 || x.SegmentsPerWavelength != 20 || x.SweepLowMHz != nil || x.SweepHighMHz != nil {
		t.Errorf("solver defaults: %+v", x)
	}
	off := mustParse(t, []byte(base+"\n[solver]\nenabled = false\nreflector_model = \"ideal\"\n"))
	if off.Solver.On() || off.Solver.ReflectorModel != "ideal" {
		t.Errorf("enabled = false or ideal not taken: %+v", off.Solver)
	}
}

func TestBadSolverSpecs(t *testing.T) {
	for _, tc := range []struct {
		name, table, key, words string
	}{
		{"unknown model", `reflector_model = "cup"`, "solver.reflector_model", `"plate", "ideal"`},
		{"one point", "points = 1", "solver.points", "between 2 and 201"},
		{"too few segments", "segments_per_wavelength = 3.0", "solver.segments_per_wavelength", "between 8 and 60"},
		{"sweep far off", "sweep_low_mhz = 1000.0", "solver.sweep_low_mhz", "within ±50 %"},
		{"sweep swapped", "sweep_low_mhz = 6000.0\nsweep_high_mhz = 5600.0", "solver.sweep_high_mhz", "above solver.sweep_low_mhz"},
		{"enabled not a bool", `enabled = "yes"`, "solver.enabled", "wrong type"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParseSpec([]byte(base + "\n[solver]\n" + tc.table + "\n"))
			if err == nil {
				t.Fatal("accepted")
			}
			if !strings.Contains(err.Error(), tc.key) || !strings.Contains(err.Error(), tc.words) || !strings.Contains(err.Error(), "fix:") {
				t.Errorf("error %q lacks %q, %q or a fix", err, tc.key, tc.words)
			}
		})
	}
}
