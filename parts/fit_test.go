package parts

import (
	"errors"
	"strings"
	"testing"

	"coilwright/parts/spec"
)

// designSpec parses src and works out its design, returning the spec as
// the design left it (defaults the fit checks close down included).
func designSpec(src []byte) (*spec.Spec, error) {
	s, err := spec.ParseSpec(src)
	if err != nil {
		return nil, err
	}
	if _, err := NewDesign(s); err != nil {
		return nil, err
	}
	return s, nil
}

func TestWireThickerThanSpacing(t *testing.T) {
	// 1.6 mm wire at 1.5 mm spacing: the turns overlap.
	_, err := designSpec([]byte(strings.Replace(base, `pitch_angle_deg = 13.0`, `spacing_mm = 1.5`, 1)))
	var se *spec.SpecError
	if !errors.As(err, &se) || se.Key != "coil.spacing_mm" || se.Line != 11 || !strings.Contains(se.Problem, "do not touch") {
		t.Fatalf("got %v, want a coil.spacing_mm error on line 11 saying the turns touch", err)
	}
}

func TestConstantAngleNeedsACone(t *testing.T) {
	src := strings.Replace(base, `pitch_angle_deg = 13.0`, "pitch_angle_deg = 2.0\npitch_mode = \"constant_angle\"", 1)
	src = strings.Replace(src, "turns = 5.0", "turns = 1.0", 1)
	src = strings.Replace(src, "top_diameter_mm = 12.5", "top_diameter_mm = 40.0", 1)
	_, err := designSpec([]byte(src))
	if err == nil || !strings.Contains(err.Error(), "no cone fits") {
		t.Fatalf("want a no-cone error, got %v", err)
	}
}
