package kit

import (
	"coilwright/parts/sheet"
	"maps"
	"slices"
	"strings"
	"testing"

	"coilwright/parts"
)

// TestNoRodOverTheFeed builds the 12 GHz starter (two kits, so the batch
// plan is made): its feed hole leaves no room for a rod's foot at the
// plate's centre, the design warns "rod-over-feed", and every output must
// then agree that the kit has no support rod. The 10 GHz starter, whose
// rod fits (TestTenGHzRodFootClearsFeedHole), must still list and place it.
func TestNoRodOverTheFeed(t *testing.T) {
	// quantity is a top-level key: it goes before the first table.
	spec := func(f float64) string {
		return strings.Replace(starterSpec(f, 7, ""), "\n[coil]", "\nquantity = 2\n\n[coil]", 1) + "\n[solver]\nenabled = false\n[tolerance]\nenabled = false\n"
	}
	for _, tc := range []struct {
		mhz   float64
		noRod bool
	}{{12000, true}, {10000, false}} {
		k, err := newKitText(t, spec(tc.mhz))
		if err != nil {
			t.Fatalf("%g MHz: %v", tc.mhz, err)
		}
		warned := false
		for _, w := range k.Design.Warnings {
			warned = warned || w.Code == "rod-over-feed"
			if tc.noRod && (w.Code == "rod-loading" || w.Code == "rod-slender" || w.Code == "rod-heavy") {
				t.Errorf("%g MHz: warning %s about a rod the kit does not have", tc.mhz, w.Code)
			}
		}
		if warned != tc.noRod {
			t.Fatalf("%g MHz: rod-over-feed warning %v, want %v", tc.mhz, warned, tc.noRod)
		}
		var m Memory
		if err := k.writeSheet(&m); err != nil {
			t.Fatal(err)
		}
		if err := k.writePlots(&m); err != nil {
			t.Fatal(err)
		}
		file := func(name string) string {
			b, ok := m.File(name)
			if !ok {
				t.Fatalf("%g MHz: no %s", tc.mhz, name)
			}
			return string(b)
		}
		has := map[string]bool{
			"cut list row":          strings.Contains(file("cutlist.csv"), "\nsupport rod,"),
			"batch plan stock":      strings.Contains(file("batch.md"), "Support rod"),
			"build sheet materials": strings.Contains(file("build-sheet.md"), "| Support rod | Ø"),
			"build sheet step":      strings.Contains(file("build-sheet.md"), "through the open top of the coil"),
			"side view figure":      strings.Contains(file("plot-side.svg"), `id="`+layerRod+`"`) || strings.Contains(file("plot-side.svg"), ">"+layerRod+"<"),
			"side view sizes":       sheet.NewSideView(k.Design, k.cutList).RodDiameter > 0,
			"plate's rod marks":     len(markCircles(k.Design.Patterns.Reflector.Drawing)) > 0,
		}
		for _, f := range k.Design.Patterns.Plate.Features {
			has["plate feature "+f.Name] = has["plate feature "+f.Name] || f.Part == parts.PartRod
		}
		for _, h := range k.cutList.Hardware {
			has["rod screw"] = has["rod screw"] || strings.Contains(h.Item, "screw") && strings.Contains(h.Note, "rod")
		}
		for _, what := range slices.Sorted(maps.Keys(has)) {
			if tc.noRod && has[what] {
				t.Errorf("%g MHz: the kit has no rod, but the %s shows one", tc.mhz, what)
			}
		}
		if !tc.noRod {
			for _, what := range []string{"cut list row", "batch plan stock", "build sheet materials", "build sheet step", "side view figure", "side view sizes", "plate's rod marks"} {
				if !has[what] {
					t.Errorf("%g MHz: the rod is placed, but the %s leaves it out", tc.mhz, what)
				}
			}
		}
		if tc.noRod && !strings.Contains(file("build-sheet.md"), "no support rod") {
			t.Errorf("%g MHz: the build sheet does not say the kit has no support rod", tc.mhz)
		}
	}
}
