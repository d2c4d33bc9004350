package kit

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"coilwright/cam/geom"
	"coilwright/jig"
	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// leadAgreeMM is how closely the cut list's lock end, the former's lead
// channel and the feed lead as built must agree, mm: the task's bound,
// half the 1 mm a builder marks by eye. Common practice (no published
// source).
const leadAgreeMM = 0.5

// centreSpec returns src with its coil fed at the centre.
func centreSpec(src string) string {
	if strings.Contains(src, `feed = "periphery"`) {
		return strings.Replace(src, `feed = "periphery"`, `feed = "centre"`, 1)
	}
	return strings.Replace(src, "[coil]\n", "[coil]\nfeed = \"centre\"\n", 1)
}

// centreDemoKit plans an embedded demo with a centre feed.
func centreDemoKit(t testing.TB, name string) *Kit {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	b = []byte(centreSpec(string(b)))
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	k, err := New(Source{Name: "centre:" + name, Bytes: b, Spec: s}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	return k
}

// channelDepth measures, on the former's solid, how far the lead channel
// reaches in from the wire centreline at the start of the groove, across
// the axis if it does: the first point, in 0.01 mm steps, inside the solid.
func channelDepth(t *testing.T, k *Kit) float64 {
	t.Helper()
	f, err := k.Former.Former()
	if err != nil {
		t.Fatal(err)
	}
	c := f.Centreline(0)
	r := math.Hypot(c.X, c.Y)
	in := geom.Vec3{X: -c.X / r, Y: -c.Y / r}
	const step = 0.01
	for s := step; s < 2*r; s += step {
		if f.Solid.Eval(c.Add(in.Scale(s))) < 0 {
			return s - step
		}
	}
	return 2 * r
}

// checkLeadAgrees holds the cut list's lock end, the planned channel depth,
// the channel measured on the solid and Design.FeedRun (the lead as built,
// parts/feedlead.go) to one another.
func checkLeadAgrees(t *testing.T, name string, d *parts.Design, k *Kit, cl *cutlist.CutList) {
	t.Helper()
	lead, hole, tail := d.FeedRun(), k.Former.LockHoleMM, cl.Wire.LockTailMM
	if math.Abs(tail-lead) > leadAgreeMM || math.Abs(hole-lead) > leadAgreeMM {
		t.Errorf("%s: lock end %.2f mm, channel %.2f mm, feed lead %.2f mm: more than %.1f mm apart", name, tail, hole, lead, leadAgreeMM)
	}
	if depth := channelDepth(t, k); depth < tail {
		t.Errorf("%s: the channel on the former takes %.2f mm of the %.2f mm lock end", name, depth, tail)
	}
	for _, w := range cl.Warnings {
		if w.Code == "lock-hole-short" {
			t.Errorf("%s: %s", name, w.Message)
		}
	}
}

func TestCentreFeedLeadAgrees(t *testing.T) {
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			k := centreDemoKit(t, demo)
			checkLeadAgrees(t, demo, k.Design, k, k.cutList)
		})
	}
	t.Run("random specs", func(t *testing.T) {
		rng := rand.New(rand.NewPCG(17, 2026))
		checked := 0
		for i := 0; i < 400 && checked < 40; i++ {
			src := centreSpec(randomSpecText(rng))
			d, pl, ok := plannedDesign(src)
			if !ok {
				continue
			}
			if !d.CentreFed() {
				t.Fatalf("draw %d is not centre-fed:\n%s", i, src)
			}
			checked++
			// What check accepts, build makes.
			if _, err := pl.Former(); err != nil {
				t.Errorf("draw %d: check passes but the former is refused: %v\n%s", i, err, src)
				continue
			}
			cl, err := cutlist.NewCutList(d)
			if err != nil {
				t.Fatal(err)
			}
			cl.FitLockTail(pl.LockHoleMM)
			checkLeadAgrees(t, "random", d, &Kit{Design: d, Former: pl}, cl)
		}
		if checked < 40 {
			t.Errorf("only %d random centre-fed specs checked", checked)
		}
	})
}

// TestCentreFeedSheetSaysOneThing holds the centre-fed demos' build sheet
// and cut list to the lead as built: the lock end is the feed lead, so
// nothing tells the builder to shorten it, and no lead runs down to the
// dielectric.
func TestCentreFeedSheetSaysOneThing(t *testing.T) {
	banned := []string{"takes only", "cut the lock end to", "later cut down", "later cut to", "down to the dielectric", "Cut the lock end off", "lock-hole-short"}
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			k := centreDemoKit(t, demo)
			var m Memory
			if err := k.writeSheet(&m); err != nil {
				t.Fatal(err)
			}
			for _, name := range []string{"build-sheet.md", "cutlist.md", "cutlist.csv"} {
				b, ok := m.File(name)
				if !ok {
					t.Fatalf("no %s", name)
				}
				for _, w := range banned {
					if i := bytes.Index(b, []byte(w)); i >= 0 {
						t.Errorf("%s says %q: …%s…", name, w, b[max(0, i-80):min(len(b), i+120)])
					}
				}
				if !bytes.Contains(b, []byte("lead channel")) {
					t.Errorf("%s does not name the former's lead channel", name)
				}
			}
		})
	}
}

// planErrors parses and designs src and plans its former as kit.New does,
// returning the plan's spec errors.
func planErrors(t *testing.T, src string) error {
	t.Helper()
	s, err := spec.ParseSpec([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	_, err = planFormer(d)
	return err
}

// TestCentreFeedDriveRefused gives a two-turn version of the 5.8 GHz
// demo the deepest hex socket its periphery-fed former takes. Fed at the
// centre, the socket enters from the end away from the feed and must stop
// a wall short of the lead channel, which that socket does not: check
// refuses it on the key to change, with its line and a fix.
func TestCentreFeedDriveRefused(t *testing.T) {
	b, _ := templates.Demo("demo-5g8-cone.toml")
	base := strings.Replace(string(b), "turns = 5.0", "turns = 2.0", 1)
	_, pl, ok := plannedDesign(base)
	if !ok {
		t.Fatal("the two-turn demo is refused")
	}
	driveR := pl.DriveMM - pl.Params.HexDepth
	depth := math.Floor(pl.HeightMM - jig.MinWallMM - driveR - 0.5)
	deep := fmt.Sprintf("\n[former]\ndrive = \"hex\"\nhex_depth_mm = %g\n", depth)
	build := func(src string) error { return planErrors(t, src) }
	if err := build(base + deep); err != nil {
		t.Fatalf("periphery feed, %g mm socket: %v", depth, err)
	}
	err := build(centreSpec(base) + deep)
	var errs spec.SpecErrors
	if !errors.As(err, &errs) {
		t.Fatalf("centre feed, %g mm socket: want spec errors, got %v", depth, err)
	}
	found := false
	for _, e := range errs {
		if e.Key == "former.hex_depth_mm" && e.Line > 0 && strings.Contains(e.Fix, "periphery") {
			found = true
		}
	}
	if !found {
		t.Errorf("no error on former.hex_depth_mm with its line and a fix: %v", err)
	}
	t.Logf("%g mm socket: %v", depth, err)
}

// TestCentreFeedChannelRefused designs a coil of spring-temper wire,
// which springs back far (parts/wire), fed at the centre: its lead, as
// long as the released coil's start radius, crosses the much smaller
// former's axis and runs out through the far side. check refuses it on
// coil.feed, with its line and a fix.
func TestCentreFeedChannelRefused(t *testing.T) {
	src := `kit = "Spring Wire Test"
frequency_mhz = 746.8

[coil]
feed = "centre"
turns = 18.75
hand = "RHCP"
base_circumference_lambda = 1.395
shape = "conical"
top_circumference_lambda = 1.066
pitch_angle_deg = 8.33

[wire]
material = "stainless-304-spring"
diameter_mm = 1.55
`
	err := planErrors(t, src)
	var errs spec.SpecErrors
	if !errors.As(err, &errs) {
		t.Fatalf("want spec errors, got %v", err)
	}
	found := false
	for _, e := range errs {
		if e.Key == "coil.feed" && e.Line == 5 && strings.Contains(e.Fix, `feed = "periphery"`) {
			found = true
		}
	}
	if !found {
		t.Errorf("no error on coil.feed (line 5) with a fix: %v", err)
	}
	t.Log(err)
}
