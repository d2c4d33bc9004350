package kit

import (
	"coilwright/parts/cutlist"
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// holeAgreeMM is how closely the build sheet's and the cut list's hole
// depth must match the former's plan, mm: the task's bound.
const holeAgreeMM = 0.01

// checkHoleIsPlanned holds the lock hole the build sheet draws and the
// cut list's lock end to the plan's FormerPlan.LockHoleMM, and the plan to
// the hole measured on the former's solid (channelDepth, in 0.01 mm steps).
func checkHoleIsPlanned(t *testing.T, name string, k *Kit) {
	t.Helper()
	pl, w := k.Former, k.cutList.Wire
	p := pl.Params
	// The sheet's lock figure dimensions the hole from the core surface
	// at its mouth: the groove's depth and the hole's below it.
	fig := k.lockFigure()
	found := false
	for _, d := range fig.Dimensions {
		if !strings.HasPrefix(d.Text, "hole ") {
			continue
		}
		found = true
		if got, want := d.B.Sub(d.A).Len(), p.GrooveDepth+pl.LockHoleMM; math.Abs(got-want) > holeAgreeMM {
			t.Errorf("%s: the sheet draws a %.3f mm hole; the plan's is %.3f mm (%.3f below the groove bottom)", name, got, want, pl.LockHoleMM)
		}
	}
	if !found {
		t.Errorf("%s: the lock figure does not dimension the hole", name)
	}
	if room := k.lockRoom(); math.Abs(room-(p.Wire/2+pl.LockHoleMM)) > holeAgreeMM {
		t.Errorf("%s: the sheet lets the lock end reach %.3f mm from the wire centre; the plan's hole %.3f mm", name, room, p.Wire/2+pl.LockHoleMM)
	}
	// The cut list's lock end is the hole's depth, or for a centre feed
	// the feed lead the channel is planned to; longer only with the
	// lock-hole-short warning.
	short := false
	for _, wn := range k.cutList.Warnings {
		short = short || wn.Code == "lock-hole-short"
	}
	if !short && math.Abs(w.LockTailMM-pl.LockHoleMM) > holeAgreeMM {
		t.Errorf("%s: the cut list's lock end is %.3f mm; the plan's hole %.3f mm", name, w.LockTailMM, pl.LockHoleMM)
	}
	// The model: the first solid point in from the wire centre lies
	// within a probe step of the hole's planned end.
	const step = 0.01
	if got, want := channelDepth(t, k), p.Wire/2+pl.LockHoleMM; got < want-step-1e-9 || got > want+step {
		t.Errorf("%s: the hole on the former reaches %.2f mm from the wire centre; the plan %.3f mm", name, got, want)
	}
}

// TestSheetHoleIsThePlans checks the lock hole's depth in the build sheet
// and the cut list against the former's plan for both demos fed at either
// end, and for random specs, periphery and centre fed, including wire
// thicker than 2.4 mm, where the wire radius, not the 1.2 mm wall, sets
// the floor under the hole.
func TestSheetHoleIsThePlans(t *testing.T) {
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			checkHoleIsPlanned(t, demo, demoKit(t, demo, Options{}))
			checkHoleIsPlanned(t, demo+", centre feed", centreDemoKit(t, demo))
		})
	}
	t.Run("random specs", func(t *testing.T) {
		rng := rand.New(rand.NewPCG(23, 2026))
		checked, thick := map[bool]int{}, 0
		for i := 0; i < 600 && checked[false]+checked[true] < 40; i++ {
			src := randomSpecText(rng)
			centre := i%2 == 1
			if centre {
				src = centreSpec(src)
			}
			d, pl, ok := plannedDesign(src)
			if !ok {
				continue
			}
			cl, err := cutlist.NewCutList(d)
			if err != nil {
				continue
			}
			cl.FitLockTail(pl.LockHoleMM)
			checked[centre]++
			if d.Spec.Wire.DiameterMM > 2*1.2 {
				thick++
			}
			checkHoleIsPlanned(t, "random", &Kit{Design: d, Former: pl, cutList: cl})
		}
		t.Logf("%d periphery-fed and %d centre-fed specs, %d with wire over 2.4 mm", checked[false], checked[true], thick)
		if checked[false] < 15 || checked[true] < 15 || thick < 5 {
			t.Errorf("only %d periphery-fed and %d centre-fed specs, %d with wire over 2.4 mm", checked[false], checked[true], thick)
		}
	})
}
