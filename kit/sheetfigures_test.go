package kit

import (
	"fmt"
	"os/exec"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/parts/sheet"
	"coilwright/templates"
)

// sheetPDFText builds a kit's build sheet in memory and returns its text
// as poppler's pdftotext reads it, spaces collapsed.
func sheetPDFText(t *testing.T, k *Kit) string {
	t.Helper()
	pdftotext := checktool.Need(t, "pdftotext")
	var m Memory
	if err := k.writeSheet(&m); err != nil {
		t.Fatal(err)
	}
	b, _ := m.File("build-sheet.pdf")
	path := checktool.TempFile(t, "sheet.pdf", b)
	out, err := exec.Command(pdftotext, path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	return strings.Join(strings.Fields(string(out)), " ")
}

// TestStepFiguresCarryTheirDimensions finds each step figure's caption and
// the dimensions it must print, worked out from the design, in the PDF's
// text.
func TestStepFiguresCarryTheirDimensions(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			k := demoKit(t, demo, Options{Version: "test"})
			text := sheetPDFText(t, k)
			d, cl := k.Design, k.cutList
			w := d.Patterns.Wedge
			in := d.Patterns.Reflector.Input
			want := map[string][]string{
				"lock tail": {"Lock tail, seen along the former's axis", "tail ", fmt.Sprintf("%.1f", cl.Wire.LockTailMM), "mark A at the hole's mouth", "deep"},
				"winding": {"Winding direction, seen from the open end", d.Coil.Hand.String(), fmt.Sprintf("Ø%.2f wire centre at the base", 2*d.Coil.StartRadius),
					"seen from the open end: " + handTurn(d) + " as it rises"},
				"strip": {"Matching strip (mm)", "FEED END", fmt.Sprintf("%.2f along the centreline", w.Length),
					fmt.Sprintf("%.2f above the plate at the feed", w.Stations[0].Height), fmt.Sprintf("%.2f", w.FeedWidth), fmt.Sprintf("%.2f far end", w.EndWidth)},
				"reflector": {"Reflector top face, seen from the coil side", "0°", fmt.Sprintf("%.2f centre to feed", in.FeedRadius), fmt.Sprintf("%.1f across", in.Size), "ground joint"},
				"feed": {"Feed in section at the plate", fmt.Sprintf("%.2f wire centre", d.Coil.Z0), fmt.Sprintf("hole Ø%.2f", cl.Coax.FeedHoleMM),
					fmt.Sprintf("bare centre %.1f", cl.Coax.CentreMM), fmt.Sprintf("dielectric %.1f", cl.Coax.DielectricMM)},
				"side view": {"near half of each turn dark", fmt.Sprintf("%.1f plate to top wire centre", sheet.Heights(d).TopCentre)},
			}
			for fig, ws := range want {
				for _, s := range ws {
					if !strings.Contains(text, s) {
						t.Errorf("%s figure: %q not in the PDF", fig, s)
					}
				}
			}
			if cl.Coax.FlareMM > 0 && !strings.Contains(text, fmt.Sprintf("braid fanned %.1f", cl.Coax.FlareMM)) {
				t.Error("feed figure lacks the braid flare")
			}
		})
	}
}

// TestSideViewShowsTheHand checks the depth cue against the hand: seen
// from −y with x to the right, the near (y < 0) half of a right-hand turn
// rises to the right and of a left-hand turn to the left (z = kφ,
// x = r cos φ on φ ∈ (π, 2π) for the right hand).
func TestSideViewShowsTheHand(t *testing.T) {
	for _, demo := range templates.Demos() {
		k := demoKit(t, demo, Options{Version: "test"})
		v := sheet.NewSideView(k.Design, k.cutList)
		if len(v.Near) == 0 || len(v.Far) == 0 {
			t.Fatalf("%s: %d near and %d far runs", demo, len(v.Near), len(v.Far))
		}
		sense := handSense(k.Design)
		for _, run := range v.Near {
			if len(run) < 4 {
				continue
			}
			a, b := run[0], run[len(run)-1]
			if (b.X-a.X)*(b.Y-a.Y)*sense <= 0 {
				t.Errorf("%s: a near run from %v to %v does not rise the way a %s turn's front does", demo, a, b, k.Design.Coil.Hand)
			}
		}
	}
}

// TestLockCutInTheSteps: when the lock hole is shallower than the lock
// tail (the hole stops a wall short of the drive), the lock step itself,
// not only the PDF figure, says how short to cut the tail.
func TestLockCutInTheSteps(t *testing.T) {
	for _, demo := range templates.Demos() {
		k := demoKit(t, demo, Options{Version: "test"})
		note, cut := k.lockCut()
		if room := k.lockRoom(); (note != "") != (k.cutList.Wire.LockTailMM > room) || cut > room {
			t.Errorf("%s: room %.2f mm, tail %.2f mm, cut %.2f mm, note %q", demo, room, k.cutList.Wire.LockTailMM, cut, note)
		}
		var m Memory
		if err := k.writeSheet(&m); err != nil {
			t.Fatal(err)
		}
		b, _ := m.File("build-sheet.md")
		if note != "" && !strings.Contains(string(b), note) {
			t.Errorf("%s: the lock step lacks %q", demo, note)
		}
	}
}
