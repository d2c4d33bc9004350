package kit

import (
	"errors"
	"strings"
	"testing"

	"coilwright/parts/spec"
	"coilwright/parts/spec/spectest"
)

// base is a valid 5.8 GHz conical spec the fit tests change one key of.
const base = spectest.Base

// newKit parses src and plans its kit.
func newKit(src string) (*Kit, error) {
	s, err := spec.ParseSpec([]byte(src))
	if err != nil {
		return nil, err
	}
	return New(Source{Name: "test.toml", Bytes: []byte(src), Spec: s}, Options{})
}

// TestFormerFitErrors checks that the former's fit problems come back as
// spec errors on the key to change, with its line.
func TestFormerFitErrors(t *testing.T) {
	for _, tc := range []struct {
		name     string
		old, new string
		extra    string // appended to the spec
		key      string
		words    string
	}{
		{"bore too wide for the coil", "[wire]", "[former]\ndrive = \"bore\"\nbore_diameter_mm = 12.0\n[wire]", "", "former.bore_diameter_mm", "wall under the groove"},
		// 3 mm wire with 0.2 mm clearance: groove radius 1.6 mm needs
		// max(1.6·(1 + √2) + 0.8, 3.5·1.6) = 5.6 mm of spacing; 4.5 mm
		// is short.
		{"groove needs spacing", "pitch_angle_deg = 13.0\n\n[wire]\nmaterial = \"copper-annealed\"\ndiameter_mm = 1.6", "spacing_mm = 4.5\n\n[wire]\nmaterial = \"copper-annealed\"\ndiameter_mm = 3.0", "", "coil.spacing_mm", "groove"},
		{"hex socket deeper than the former", "turns = 5.0", "turns = 1.0", "\n[former]\nhex_depth_mm = 40.0\n", "former.hex_depth_mm", "socket"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			src := strings.Replace(base, tc.old, tc.new, 1) + tc.extra
			if src == base {
				t.Fatal("the test's change does not apply")
			}
			_, err := newKit(src)
			var ses spec.SpecErrors
			if !errors.As(err, &ses) {
				t.Fatalf("got %v, want spec errors", err)
			}
			found := false
			for _, e := range ses {
				if e.Key == tc.key {
					found = true
					if e.Line == 0 {
						t.Errorf("%s reported without its line", tc.key)
					}
					if !strings.Contains(e.Error(), tc.words) || e.Fix == "" {
						t.Errorf("%v: want %q and a fix", e, tc.words)
					}
				}
			}
			if !found {
				t.Errorf("got %v, want an error on %s", err, tc.key)
			}
		})
	}
}

// TestFormerSizeWarning checks that a former larger than the print volume
// is a warning, not an error, and that no former files are written.
func TestFormerSizeWarning(t *testing.T) {
	for _, tc := range []struct{ name, key string }{
		{"taller than the printer", "print_height_mm = 40.0"},
		{"wider than the printer", "print_width_mm = 30.0"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			k, err := newKit(strings.Replace(base, "[wire]", "[former]\n"+tc.key+"\n[wire]", 1))
			if err != nil {
				t.Fatal(err)
			}
			found := false
			for _, w := range k.Report.Warnings {
				found = found || w.Code == "former-size"
			}
			if !found {
				t.Errorf("warnings %v lack former-size", k.Report.Warnings)
			}
			var m Memory
			if err := k.writeFormer(&m); err != nil {
				t.Fatal(err)
			}
			if len(m.Names()) != 0 {
				t.Errorf("wrote %v for a former the printer cannot take", m.Names())
			}
		})
	}
}
