package kit

import (
	"errors"
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

// TestWireLongerThanStockIsRefused plans one kit whose wire blank is
// longer than the stock rod: check refuses it on stock.wire_rod_mm with
// the length that fits and the other way out.
func TestWireLongerThanStockIsRefused(t *testing.T) {
	text := strings.Replace(squareHard, "turns = 1.0", "turns = 8.0", 1) + "\n[stock]\nwire_rod_mm = 500.0\n"
	s, err := spec.ParseSpec([]byte(text))
	if err != nil {
		t.Fatal(err)
	}
	_, err = New(Source{Name: "t.toml", Bytes: []byte(text), Spec: s}, Options{})
	var se *spec.SpecError
	if !errors.As(err, &se) || se.Key != "stock.wire_rod_mm" || se.Line == 0 {
		t.Fatalf("error %v, want a stock.wire_rod_mm SpecError with its line", err)
	}
	if !strings.Contains(se.Fix, "set wire_rod_mm = ") || !strings.Contains(se.Fix, "reel") {
		t.Errorf("fix %q", se.Fix)
	}
}
