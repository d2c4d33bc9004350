package cutlist

import (
	"errors"
	"math"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/spec"
)

func TestCentreFeedRodClearsTheCable(t *testing.T) {
	// The 5.8 GHz demo's smallest turn is Ø12.5 mm at the wire centre, Ø10.9
	// mm inside; 1 mm clearance leaves 8.9 mm. A 0.141 in semi-rigid hole
	// is Ø3.68 mm (published jacket 3.58 mm + 0.1 mm), so the rod needs at
	// least 3.68 + 2 × 1 = 5.68 mm: the stocked 6 mm or 8 mm rods do.
	d := demoDesign(t, "demo-5g8-cone.toml", withFeed("centre"))
	cl := mustCutList(t, d)
	f := cl.Dowel.Foot
	if f == nil || f.BoreMM < 3.68-1e-9 || f.WallMM < parts.MinRodWallMM || cl.Dowel.DiameterMM > 8.9 {
		t.Fatalf("rod Ø%.2f mm, foot %+v", cl.Dowel.DiameterMM, f)
	}
	// The bore reaches past the lead, which runs in at the strip's feed-end
	// height (wire Ø1.6 mm).
	if want := d.FeedRise() + 0.8 + parts.RodFootClearMM; math.Abs(f.BoreDepthMM-want) > 1e-9 {
		t.Errorf("bore %.2f mm deep, want %.2f mm", f.BoreDepthMM, want)
	}
	for _, h := range cl.Hardware {
		if strings.HasPrefix(h.Item, "M3") {
			t.Errorf("a centre screw %q where the feed hole is", h.Item)
		}
	}
}

func TestCentreFeedRodConflictRefused(t *testing.T) {
	// A given 5 mm rod cannot be bored Ø3.68 mm and keep a 1 mm wall.
	// The design's fit check finds it before the cut list is made.
	text := strings.Replace(withFeed("centre")(string(demoSpec(t, "demo-5g8-cone.toml"))), `material = "ptfe"`, "material = \"ptfe\"\ndiameter_mm = 5.0", 1)
	_, err := parts.NewDesign(mustParse(t, []byte(text)))
	var se *spec.SpecError
	if !errors.As(err, &se) || se.Key != "dowel.diameter_mm" || !strings.Contains(se.Fix, "periphery") {
		t.Fatalf("err %v, want a dowel.diameter_mm spec error with a fix", err)
	}
	// The bulkhead jack's Ø6.5 mm cut-out needs an 8.5 mm rod; the next
	// stocked size, 10 mm, does not pass inside 8.9 mm: refuse the feed.
	d := demoDesign(t, "demo-5g8-cone.toml", func(s string) string {
		return strings.Replace(withFeed("centre")(s), "[reflector]", "[reflector]\nconnector = \"sma-bulkhead\"", 1)
	})
	_, err = NewCutList(d)
	if !errors.As(err, &se) || se.Key != "coil.feed" || se.Line == 0 {
		t.Fatalf("err %v, want a coil.feed spec error", err)
	}
	// With a periphery feed the axis is free and the same rod is accepted.
	d = demoDesign(t, "demo-5g8-cone.toml", func(s string) string {
		s = strings.Replace(s, `material = "ptfe"`, "material = \"ptfe\"\ndiameter_mm = 5.0", 1)
		return withFeed("periphery")(s)
	})
	if _, err := NewCutList(d); err != nil {
		t.Fatal(err)
	}
}

func TestRodLoadingWarns(t *testing.T) {
	// A Ø30 mm glass-fibre rod in the 2.4 GHz demo's coil fills most of it.
	d := demoDesign(t, "demo-2g4-cylinder.toml", func(s string) string {
		s = strings.Replace(s, `material = "ptfe"`, "material = \"glass-fibre\"\ndiameter_mm = 30", 1)
		return s
	})
	cl := mustCutList(t, d)
	found := false
	for _, w := range cl.Warnings {
		found = found || w.Code == "rod-loading"
	}
	if !found {
		t.Errorf("no rod-loading warning for a %.0f %% fill", 100*cl.Dowel.Rod.Loading.FillRatio)
	}
}
