package sheet

import (
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/cutlist"
)

// combo is a 2.44 GHz cylinder on a 130 mm square plate; the test fills in
// the plate material, connector, cable and cutting method.
const combo = `kit = "Combo"
frequency_mhz = 2440.0

[coil]
shape = "cylindrical"
turns = 6.0
hand = "RHCP"
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5

[wire]
material = "copper-annealed"
diameter_mm = 2.0

[reflector]
shape = "square"
side_mm = 130.0
material = "%MAT%"
connector = "%CONN%"

[coax]
type = "%CABLE%"

[cutting]
method = "%METHOD%"
`

func comboSheet(t *testing.T, mat, conn, cable, method string) string {
	t.Helper()
	text := strings.NewReplacer("%MAT%", mat, "%CONN%", conn, "%CABLE%", cable, "%METHOD%", method).Replace(combo)
	d := mustDesign(t, text)
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	for _, w := range d.Warnings {
		if w.Code == "reflector-fit" {
			t.Fatalf("%s %s: %s", mat, conn, w.Message)
		}
	}
	return sheetText(NewBuildSheet(d, cl, strings.Repeat("0", 64)))
}

// TestSheetFollowsMaterialAndConnector builds every plate material with
// every connector and checks that each gets its own steps and none of the
// others'. The facts checked (aluminium takes no soft solder with ordinary
// flux; a clad laminate's copper face is the reflector; a panel jack needs
// no heat-shrink or tie) are common practice (no published source).
func TestSheetFollowsMaterialAndConnector(t *testing.T) {
	type rule struct{ want, not []string }
	plate := map[string]rule{
		"fr4":       {want: []string{"copper face", "Laminate dust"}, not: []string{"cannot be soft-soldered", "takes solder"}},
		"aluminium": {want: []string{"cannot be soft-soldered", "Scrape the aluminium bright", "fibre laser"}, not: []string{"copper face", "takes solder", "Laminate dust"}},
		"brass":     {want: []string{"takes solder", "fibre laser"}, not: []string{"copper face", "cannot be soft-soldered", "Laminate dust"}},
		"copper":    {want: []string{"takes solder", "fibre laser"}, not: []string{"copper face", "cannot be soft-soldered", "Laminate dust"}},
		"tinplate":  {want: []string{"takes solder"}, not: []string{"copper face", "cannot be soft-soldered", "Laminate dust"}},
	}
	pigtailNot := []string{"lock washer", "four screws", "rear contact"}
	jackNot := []string{"heat-shrink", "Heat-shrink", "cable tie", "sleeve", "Cut the cable to", "Push the cable up", "centre conductor", "coax's dielectric"}
	conn := map[string]rule{
		"coax":         {want: []string{"Heat-shrink", "cable tie", "Push the cable up through the feed hole"}, not: pigtailNot},
		"sma-flange":   {want: []string{"SMA four-hole flange jack", "four screws", "rear contact"}, not: append([]string{"lock washer", "N "}, jackNot...)},
		"sma-bulkhead": {want: []string{"SMA bulkhead jack", "lock washer and nut"}, not: append([]string{"four screws", "N "}, jackNot...)},
		"n-flange":     {want: []string{"N four-hole flange jack", "four screws", "rear contact"}, not: append([]string{"lock washer", "SMA four", "SMA bulk"}, jackNot...)},
		"n-bulkhead":   {want: []string{"N bulkhead jack", "lock washer and nut"}, not: append([]string{"four screws", "SMA four", "SMA bulk"}, jackNot...)},
	}
	for mat, pr := range plate {
		for c, cr := range conn {
			for _, cable := range []string{"semi-rigid-141", "rg58"} {
				t.Run(mat+"/"+c+"/"+cable, func(t *testing.T) {
					text := comboSheet(t, mat, c, cable, "mill")
					for _, w := range append(append([]string{}, pr.want...), cr.want...) {
						if !strings.Contains(text, w) {
							t.Errorf("lacks %q", w)
						}
					}
					for _, n := range append(append([]string{}, pr.not...), cr.not...) {
						if strings.Contains(text, n) {
							t.Errorf("says %q", n)
						}
					}
					switch {
					case mat == "aluminium" && c == "coax":
						if !strings.Contains(text, "solder tag") || strings.Contains(text, "Solder the outer conductor all round the hole") {
							t.Error("an aluminium plate with a pigtail is not grounded through a solder tag")
						}
					case c == "coax" && cable == "rg58":
						if !strings.Contains(text, "Fan the braid") || strings.Contains(text, "pipe cutter") {
							t.Error("braided cable steps wrong")
						}
					case c == "coax":
						if strings.Contains(text, "Fan the braid") || !strings.Contains(text, "pipe cutter") {
							t.Error("semi-rigid cable steps wrong")
						}
					}
				})
			}
		}
	}
}

func TestLaserMethodCautions(t *testing.T) {
	text := comboSheet(t, "brass", "coax", "semi-rigid-141", "laser")
	if !strings.Contains(text, "This kit is set for laser cutting") || !strings.Contains(text, "fibre laser only") {
		t.Error("a laser-cut brass kit lacks the fibre-laser caution")
	}
	if strings.Contains(text, "FR-4") {
		t.Error("a brass kit carries the FR-4 caution")
	}
}

func TestSupportWordingFollowsTheGap(t *testing.T) {
	small := supportText(parts.DowelCut{DiameterMM: 8, InnerTurnMM: 10})
	if !strings.Contains(small, "by 1.0 mm") || strings.Contains(small, "spacers") {
		t.Errorf("1 mm gap: %q", small)
	}
	big := supportText(parts.DowelCut{DiameterMM: 10, InnerTurnMM: 60})
	if !strings.Contains(big, "25.0 mm off") || !strings.Contains(big, "spacers") || strings.Contains(big, "about 1") {
		t.Errorf("25 mm gap: %q", big)
	}
}

// TestFileLabelNamesItsMethod holds each cut file's label to the method it
// is set for, and a reflective metal on a laser to a fibre laser.
func TestFileLabelNamesItsMethod(t *testing.T) {
	for _, c := range []struct{ mat, method, want string }{
		{"brass", "laser", "for a fibre laser only"},
		{"copper", "laser", "for a fibre laser only"},
		{"brass", "mill", "labelled for milling"},
		{"tinplate", "shear", "labelled for shearing"},
		{"fr4", "mill", "For milling or shearing"},
	} {
		text := strings.NewReplacer("%MAT%", c.mat, "%CONN%", "coax", "%CABLE%", "rg316", "%METHOD%", c.method).Replace(combo)
		d := mustDesign(t, text)
		if !strings.Contains(d.Patterns.ReflectorLabel, c.want) {
			t.Errorf("%s by %s: label %q lacks %q", c.mat, c.method, d.Patterns.ReflectorLabel, c.want)
		}
	}
}
