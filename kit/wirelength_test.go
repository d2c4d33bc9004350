package kit

import (
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/parts"
	"coilwright/parts/cutlist"
)

// wireAgreeMM is how closely the released-coil model, the former's groove,
// the marks and the cut list must agree. Common practice (no published
// source): half a millimetre is finer than a marker line on the wire.
const wireAgreeMM = 0.5

// grooveLength measures the former's groove from the lock hole (φ = 0) to
// the stop notch (φ = span) by summing chords of its centreline in print
// coordinates, 20 000 chords: the former's own geometry, not the closed
// form the cut list uses.
func grooveLength(t *testing.T, k *Kit) float64 {
	t.Helper()
	f, err := k.Former.Former()
	if err != nil {
		t.Fatal(err)
	}
	const n = 20000
	span := k.Former.Path.Span()
	sum := 0.0
	prev := f.Centreline(0)
	for i := 1; i <= n; i++ {
		p := f.Centreline(span * float64(i) / n)
		sum += p.Sub(prev).Len()
		prev = p
	}
	return sum
}

// checkWireAgrees compares the released coil's length, the groove, the
// distance between the marks and the cut list's winding.
func checkWireAgrees(t *testing.T, name string, d *parts.Design, k *Kit) {
	t.Helper()
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	groove := grooveLength(t, k)
	t.Logf("%s: groove %.2f mm, released coil %.2f mm, marks %.2f mm, former turns %.4f for %g", name, groove, d.WireLength, cl.Wire.MarkBMM-cl.Wire.MarkAMM, d.Former.Turns, d.Coil.Turns)
	w := cl.Wire
	for _, c := range []struct {
		what string
		v    float64
	}{{"released coil", d.WireLength}, {"marks A to B", w.MarkBMM - w.MarkAMM}, {"cut list winding", w.ArcMM}} {
		if math.Abs(c.v-groove) > wireAgreeMM {
			t.Errorf("%s: %s %.2f mm, groove %.2f mm", name, c.what, c.v, groove)
		}
	}
	if math.Abs(w.LengthMM-(w.MarkBMM+cutlist.TrimPerEndMM)) > 1e-9 {
		t.Errorf("%s: blank %.2f mm, mark B %.2f mm + trim", name, w.LengthMM, w.MarkBMM)
	}
}

func TestWireLengthMatchesGroove(t *testing.T) {
	// A groove 239.3 mm long under a 241.9 mm winding (5.8 GHz demo) and
	// 862.0 under 880.9 mm (2.4 GHz demo) is the failure this guards.
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			k := demoKit(t, demo, Options{})
			checkWireAgrees(t, demo, k.Design, k)
		})
	}
	t.Run("random specs", func(t *testing.T) {
		rng := rand.New(rand.NewPCG(7, 2026))
		checked := 0
		for i := 0; i < 300 && checked < 40; i++ {
			d, pl, ok := plannedDesign(randomSpecText(rng))
			if !ok {
				continue
			}
			checked++
			checkWireAgrees(t, "random", d, &Kit{Design: d, Former: pl})
		}
		if checked < 20 {
			t.Errorf("only %d random specs checked", checked)
		}
	})
}

// lockHoleDepth measures, on the former's solid, how far the wire-lock hole
// reaches inward from the wire centreline at the start of the groove: the
// first point, in 0.01 mm steps along the radius, inside the solid (a
// negative distance).
func lockHoleDepth(t *testing.T, k *Kit) float64 {
	t.Helper()
	f, err := k.Former.Former()
	if err != nil {
		t.Fatal(err)
	}
	c := f.Centreline(0)
	r := math.Hypot(c.X, c.Y)
	in := c.Scale(-1 / r)
	in.Z = 0
	const step = 0.01
	for s := step; s < r; s += step {
		if f.Solid.Eval(c.Add(in.Scale(s))) < 0 {
			return s - step
		}
	}
	return r
}

func TestLockHoleTakesTheTail(t *testing.T) {
	// A 10–15 mm lock tail against a 3 mm (5.8 GHz) or 5 mm (2.4 GHz)
	// hole is the failure this guards. The hole, measured on the former
	// from the wire centreline, must take the whole lock end.
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			k := demoKit(t, demo, Options{})
			depth := lockHoleDepth(t, k)
			tail := k.cutList.Wire.LockTailMM
			t.Logf("hole %.2f mm from the wire centre, lock end %.2f mm", depth, tail)
			if depth < tail {
				t.Errorf("hole %.2f mm deep, lock end %.2f mm", depth, tail)
			}
		})
	}
	t.Run("random specs", func(t *testing.T) {
		rng := rand.New(rand.NewPCG(11, 2026))
		checked := 0
		for i := 0; i < 300 && checked < 30; i++ {
			d, pl, ok := plannedDesign(randomSpecText(rng))
			if !ok {
				continue
			}
			cl, err := cutlist.NewCutList(d)
			if err != nil {
				t.Fatal(err)
			}
			cl.FitLockTail(pl.LockHoleMM)
			if len(cl.Warnings) > 0 && cl.Warnings[len(cl.Warnings)-1].Code == "lock-hole-short" {
				continue // warned: the feed lead is longer than the hole
			}
			checked++
			if depth := lockHoleDepth(t, &Kit{Design: d, Former: pl}); depth < cl.Wire.LockTailMM {
				t.Errorf("hole %.2f mm deep, lock end %.2f mm", depth, cl.Wire.LockTailMM)
			}
		}
		if checked < 15 {
			t.Errorf("only %d random specs checked", checked)
		}
	})
}
