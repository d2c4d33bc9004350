package spec

import (
	"errors"
	"strings"
	"testing"

	"coilwright/parts/spec/spectest"
	"coilwright/templates"
)

func demoSpec(t *testing.T, name string) []byte {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	return b
}

func mustParse(t *testing.T, b []byte) *Spec {
	t.Helper()
	s, err := ParseSpec(b)
	if err != nil {
		t.Fatalf("ParseSpec: %v", err)
	}
	return s
}

// base is a valid spec the bad-input cases edit; line numbers in the cases
// below count from its first line.
const base = spectest.Base

func TestBaseSpecIsValid(t *testing.T) {
	s := mustParse(t, []byte(base))
	if s.Quantity != 2 || s.Coil.Feed != "periphery" || s.Reflector.Shape != "disc" {
		t.Errorf("defaults not filled: %+v", s)
	}
}

func TestBadSpecs(t *testing.T) {
	for _, tc := range []struct {
		name     string
		old, new string
		key      string
		line     int
		words    string
	}{
		{"unknown key", `hand = "RHCP"`, `hand = "RHCP"` + "\nhandedness = 1", "coil.handedness", 9, "unknown key"},
		{"wrong type", `turns = 5.0`, `turns = "five"`, "coil.turns", 7, "wrong type"},
		{"syntax error", `quantity = 2`, `quantity = = 2`, "quantity", 3, "syntax"},
		{"value missing", `turns = 5.0`, `turns =`, "coil.turns", 7, "syntax"},
		{"broken table header", `[wire]`, `[wire`, "spec", 13, "syntax"},
		{"negative turns", `turns = 5.0`, `turns = -3.0`, "coil.turns", 7, "between 1 and 50"},
		{"zero frequency", `frequency_mhz = 5800.0`, `frequency_mhz = 0.0`, "frequency_mhz", 2, "between 100 and 30000"},
		{"diameter and circumference", `base_diameter_mm = 17.5`, "base_diameter_mm = 17.5\nbase_circumference_lambda = 1.0", "coil.base_circumference_lambda", 10, "one or the other"},
		{"unknown shape", `shape = "conical"`, `shape = "barrel"`, "coil.shape", 6, `"cylindrical", "conical"`},
		{"top size on a cylinder", `shape = "conical"`, `shape = "cylindrical"`, "coil.top_diameter_mm", 10, "only"},
		{"zero quantity", `quantity = 2`, `quantity = 0`, "quantity", 3, "between 1 and"},
		{"band edges swapped", `quantity = 2`, "quantity = 2\nband_low_mhz = 5900.0\nband_high_mhz = 5700.0", "band_high_mhz", 5, "above band_low_mhz"},
		{"missing frequency", "frequency_mhz = 5800.0\n", "", "frequency_mhz", 0, "is required"},
		{"missing wire diameter", "diameter_mm = 1.6\n", "", "wire.diameter_mm", 0, "required"},
		{"unknown table", `[wire]`, "[antenna]\ngain = 3\n[wire]", "antenna", 13, "unknown key"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			src := strings.Replace(base, tc.old, tc.new, 1)
			if src == base {
				t.Fatalf("case did not change the spec")
			}
			_, err := ParseSpec([]byte(src))
			if err == nil {
				t.Fatal("ParseSpec accepted a bad spec")
			}
			var se *SpecError
			if !errors.As(err, &se) {
				t.Fatalf("error %T is not a *SpecError: %v", err, err)
			}
			found := false
			for _, e := range err.(SpecErrors) {
				msg := e.Error()
				if (tc.key == "" || strings.HasPrefix(e.Key, tc.key)) && e.Line == tc.line &&
					strings.Contains(msg, tc.words) && strings.Contains(msg, "fix:") {
					found = true
				}
			}
			if !found {
				t.Fatalf("no error for key %q on line %d saying %q with a fix, in:\n%v", tc.key, tc.line, tc.words, err)
			}
		})
	}
}

func TestSpecErrorFormat(t *testing.T) {
	e := &SpecError{Key: "coil.turns", Line: 12, Value: "0", Problem: "must be at least 1", Fix: "give the number of turns"}
	if got, want := e.Error(), "coil.turns = 0 (line 12): must be at least 1; fix: give the number of turns"; got != want {
		t.Errorf("got %q\nwant %q", got, want)
	}
}
