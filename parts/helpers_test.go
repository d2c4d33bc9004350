package parts

import (
	"testing"

	"coilwright/parts/spec"
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

func mustParse(t *testing.T, b []byte) *spec.Spec {
	t.Helper()
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatalf("ParseSpec: %v", err)
	}
	return s
}

// base is a valid spec the bad-input cases edit; line numbers in the cases
// below count from its first line.
const base = `kit = "Test Kit"
frequency_mhz = 5800.0
quantity = 2

[coil]
shape = "conical"
turns = 5.0
hand = "RHCP"
base_diameter_mm = 17.5
top_diameter_mm = 12.5
pitch_angle_deg = 13.0

[wire]
material = "copper-annealed"
diameter_mm = 1.6
`

func demoDesign(t *testing.T, name string, edit func(string) string) *Design {
	t.Helper()
	text := string(demoSpec(t, name))
	if edit != nil {
		text = edit(text)
	}
	return mustDesign(t, text)
}
