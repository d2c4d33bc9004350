package sheet

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/wire"
	"coilwright/templates"
)

func demoSheet(t *testing.T, name string) (*parts.Design, *BuildSheet) {
	t.Helper()
	d := demoDesign(t, name, nil)
	cl := mustCutList(t, d)
	return d, NewBuildSheet(d, cl, strings.Repeat("ab", 32))
}

func TestEveryCautionRepeatedAtAStep(t *testing.T) {
	for _, name := range templates.Demos() {
		t.Run(name, func(t *testing.T) {
			_, b := demoSheet(t, name)
			used := map[HazardID]bool{}
			for i, st := range b.Steps {
				if st.Number != i+1 {
					t.Errorf("step %q numbered %d, want %d", st.Title, st.Number, i+1)
				}
				for _, c := range st.Cautions {
					used[c.ID] = true
				}
			}
			for _, c := range b.Cautions {
				if !used[c.ID] {
					t.Errorf("caution %q is not repeated at any step", c.Heading)
				}
			}
		})
	}
}

func TestCautionsNeededAtSteps(t *testing.T) {
	// The steps that handle solder, epoxy, cutting and transmitting carry
	// the matching caution. Common practice (no published source).
	_, b := demoSheet(t, templates.DefaultDemo)
	want := map[string][]HazardID{
		"Straighten and clean the wire":                   {HazardEyes},
		"Trim and form the feed lead":                     {HazardEyes},
		"Prepare the reflector":                           {HazardLaminate},
		"Prepare and solder the coax":                     {HazardSolder, HazardBurns},
		"Solder the wedge under the start of the winding": {HazardSolder, HazardBurns},
		"Solder the coil":                                 {HazardSolder, HazardBurns},
		"Epoxy and support":                               {HazardEpoxy},
		"Final checks":                                    {HazardRF},
	}
	for _, st := range b.Steps {
		for _, id := range want[st.Title] {
			found := false
			for _, c := range st.Cautions {
				found = found || c.ID == id
			}
			if !found {
				t.Errorf("step %q lacks the %s caution", st.Title, id)
			}
		}
		delete(want, st.Title)
	}
	for title := range want {
		t.Errorf("no step %q", title)
	}
}

func TestRFCautionCarriesGainAndEIRP(t *testing.T) {
	d, b := demoSheet(t, templates.DefaultDemo)
	var rf string
	for _, c := range b.Cautions {
		if c.ID == HazardRF {
			rf = c.Text
		}
	}
	if g := fmt.Sprintf("%.1f dBic", d.Estimates.Gain.Value); !strings.Contains(rf, g) {
		t.Errorf("RF caution lacks the gain %s: %s", g, rf)
	}
	// Source: e.i.r.p. definition, ITU Radio Regulations, Article 1:
	// EIRP = P − loss + G = 14 − 0.3 + G.
	e := 14 - 0.3 + d.Estimates.Gain.Value
	if s := fmt.Sprintf("%.1f dBm", e); !strings.Contains(rf, s) {
		t.Errorf("RF caution lacks the EIRP %s: %s", s, rf)
	}
}

func TestInspectionTable(t *testing.T) {
	d, b := demoSheet(t, templates.DefaultDemo)
	if len(b.Inspection) != len(d.Turns) {
		t.Fatalf("%d inspection rows for %d turns", len(b.Inspection), len(d.Turns))
	}
	for i, r := range b.Inspection {
		// Calipers across a turn read the centreline diameter plus one
		// wire diameter (geometry of a round wire).
		if math.Abs(r.OutsideMM-(d.Turns[i].DiameterMM+d.Spec.Wire.DiameterMM)) > 1e-9 {
			t.Errorf("turn %d: outside %.3f mm", r.Turn, r.OutsideMM)
		}
		if r.ToleranceMM != d.Turns[i].ToleranceMM || r.CentrelineMM != d.Turns[i].DiameterMM {
			t.Errorf("turn %d: target %.3f ± %.3f mm, design %.3f ± %.3f mm", r.Turn, r.CentrelineMM, r.ToleranceMM, d.Turns[i].DiameterMM, d.Turns[i].ToleranceMM)
		}
	}
}

func TestHandWordsFollowTheCoil(t *testing.T) {
	for _, c := range []struct {
		demo, hand, sense string
	}{
		// IEEE Std 145: a right-hand helix turns counter-clockwise seen
		// from the end it advances towards.
		{"demo-5g8-cone.toml", "RHCP", "counter-clockwise"},
		{"demo-2g4-cylinder.toml", "LHCP", " clockwise"},
	} {
		t.Run(c.hand, func(t *testing.T) {
			d, b := demoSheet(t, c.demo)
			if b.Hand != c.hand || !strings.Contains(b.HandWords, c.sense) {
				t.Errorf("hand %s: %q", b.Hand, b.HandWords)
			}
			// Seen from +z (the open end) with x right and y up, a
			// positive z component of P(0) × P(δ) is a counter-clockwise
			// turn; the wire rises as φ grows.
			p0, p1 := d.Coil.Point(0), d.Coil.Point(0.1)
			ccw := p0.X*p1.Y-p0.Y*p1.X > 0
			if ccw != strings.Contains(b.HandWords, "counter-clockwise") || p1.Z <= p0.Z {
				t.Errorf("hand words %q disagree with the coil path", b.HandWords)
			}
		})
	}
}

func TestMaterialCautionsReachStepOne(t *testing.T) {
	d := demoDesign(t, templates.DefaultDemo, nil)
	cl := mustCutList(t, d)
	d.Wire.Material.Cautions = []wire.Caution{wire.CautionStripEnamel}
	b := NewBuildSheet(d, cl, strings.Repeat("0", 64))
	if !strings.Contains(strings.Join(b.Steps[0].Text, " "), wire.CautionStripEnamel.Text()) {
		t.Errorf("step 1 lacks the wire's caution: %q", b.Steps[0].Text)
	}
}
