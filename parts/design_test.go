package parts

import (
	"math"
	"strings"
	"testing"
)

func warningCodes(d *Design) string {
	var codes []string
	for _, w := range d.Warnings {
		codes = append(codes, w.Code)
	}
	return strings.Join(codes, ",")
}

func TestWarnings(t *testing.T) {
	for _, tc := range []struct {
		name     string
		old, new string
		want     string // a warning code that must appear
	}{
		{"circumference too large", "base_diameter_mm = 17.5\ntop_diameter_mm = 12.5", "base_diameter_mm = 30.0\ntop_diameter_mm = 28.0", "circumference"},
		{"pitch too steep", "pitch_angle_deg = 13.0", "pitch_angle_deg = 25.0", "pitch-angle"},
		{"few turns", "turns = 5.0", "turns = 2.0", "turns"},
		{"thick wire", "diameter_mm = 1.6", "diameter_mm = 3.0", "wire-diameter"},
		{"small reflector", "[wire]", "[reflector]\ndiameter_mm = 20.0\n[wire]", "reflector-size"},
		{"EIRP", "[wire]", "[rf]\ntx_power_dbm = 20.0\n[wire]", "eirp"},
		{"conical", "", "", "conical"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			d, err := NewDesign(mustParse(t, []byte(strings.Replace(base, tc.old, tc.new, 1))))
			if err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(","+warningCodes(d)+",", ","+tc.want+",") {
				t.Errorf("warnings %q lack %q", warningCodes(d), tc.want)
			}
		})
	}
	t.Run("quiet cylinder", func(t *testing.T) {
		src := strings.Replace(base, `shape = "conical"`, `shape = "cylindrical"`, 1)
		src = strings.Replace(src, "base_diameter_mm = 17.5\ntop_diameter_mm = 12.5", "base_circumference_lambda = 1.0", 1)
		// A periphery feed: the strip starts at the feed and meets the
		// default max_vswr (a centre feed warns "match", see match_test.go).
		src = strings.Replace(src, "[coil]", "[coil]\nfeed = \"periphery\"", 1)
		d, err := NewDesign(mustParse(t, []byte(src)))
		if err != nil {
			t.Fatal(err)
		}
		if len(d.Warnings) != 0 {
			t.Errorf("a textbook cylinder warns: %v", d.Warnings)
		}
	})
}

func TestTurnTable(t *testing.T) {
	// A 4.5-turn cylinder: five rows, the last a half turn; constant
	// diameter and spacing (Kraus, tan α = S/C).
	src := strings.Replace(base, `shape = "conical"`, `shape = "cylindrical"`, 1)
	src = strings.Replace(src, "top_diameter_mm = 12.5\n", "", 1)
	src = strings.Replace(src, "turns = 5.0", "turns = 4.5", 1)
	d, err := NewDesign(mustParse(t, []byte(src)))
	if err != nil {
		t.Fatal(err)
	}
	if len(d.Turns) != 5 {
		t.Fatalf("%d rows, want 5", len(d.Turns))
	}
	var wire float64
	for _, tr := range d.Turns {
		wire += tr.WireMM
		if math.Abs(tr.DiameterMM-17.5) > 1e-9 {
			t.Errorf("turn %d diameter %v", tr.Index, tr.DiameterMM)
		}
		if a := math.Atan(tr.SpacingMM/(math.Pi*17.5)) * 180 / math.Pi; math.Abs(a-13) > 1e-9 || math.Abs(tr.PitchAngleDeg-13) > 1e-9 {
			t.Errorf("turn %d pitch %v°", tr.Index, tr.PitchAngleDeg)
		}
	}
	if math.Abs(d.Turns[4].WireMM*2-d.Turns[0].WireMM) > 1e-9 {
		t.Errorf("half turn wire %v, full turn %v", d.Turns[4].WireMM, d.Turns[0].WireMM)
	}
	if math.Abs(wire-d.WireLength) > 1e-9 {
		t.Errorf("turn wire sums to %v, total %v", wire, d.WireLength)
	}
	// Source: Kraus, Antennas, 2nd ed., §7-2: turn length √(C² + S²).
	c, s := math.Pi*17.5, d.Turns[0].SpacingMM
	if math.Abs(d.Turns[0].WireMM-math.Hypot(c, s)) > 1e-9 {
		t.Errorf("turn length %v, want √(C²+S²) = %v", d.Turns[0].WireMM, math.Hypot(c, s))
	}
}
