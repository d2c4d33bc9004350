package kit

import (
	"strings"
	"testing"

	"coilwright/parts/spec"
)

// specKit plans a kit from spec text.
func specKit(t testing.TB, text string) *Kit {
	t.Helper()
	s, err := spec.ParseSpec([]byte(text))
	if err != nil {
		t.Fatal(err)
	}
	k, err := New(Source{Name: "test.toml", Bytes: []byte(text), Spec: s}, Options{Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	return k
}

// squareHard is a 2.44 GHz cylinder of hard-drawn copper on a square
// plate. The wire library gives hard-drawn copper 1.5 % elongation.
const squareHard = `kit = "Test Square"
frequency_mhz = 2440.0

[coil]
shape = "cylindrical"
turns = 1.0
hand = "RHCP"
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5

[wire]
material = "copper-hard-drawn"
diameter_mm = 2.0

[reflector]
shape = "square"
side_mm = 130.0
`

func TestDesignMarkdownWording(t *testing.T) {
	k := specKit(t, squareHard)
	var m Memory
	if err := k.writeDesign(&m); err != nil {
		t.Fatal(err)
	}
	b, _ := m.File("design.md")
	md := string(b)
	for _, bad := range []string{"square 130.00 mm square", "1 turns", "(elongation 2 %)"} {
		if strings.Contains(md, bad) {
			t.Errorf("design.md says %q", bad)
		}
	}
	for _, want := range []string{"square, side 130.00 mm", "1 turn,", "(elongation 1.5 %)"} {
		if !strings.Contains(md, want) {
			t.Errorf("design.md lacks %q", want)
		}
	}
}
