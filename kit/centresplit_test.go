package kit

import (
	"bytes"
	"fmt"
	"math"
	"strings"
	"testing"

	"coilwright/cam/geom"
)

// starterCentre is the 1.27 GHz cylindrical starter spec that
// `coilwright new --frequency-mhz 1270` writes, fed at the centre, with a
// wire rod long enough for its blank and the field solver off (the former
// does not depend on it). Its former, about 384 mm tall, is split into
// two sections for the default 250 mm print volume.
const starterCentre = `kit = "Starter 1270 MHz cylindrical"
frequency_mhz = 1270.0
quantity = 1

[coil]
shape = "cylindrical"
turns = 7.0
hand = "RHCP"
feed = "centre"
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5

[wire]
material = "copper-annealed"
diameter_mm = 4.7

[reflector]
shape = "disc"

[stock]
wire_rod_mm = 2000

[solver]
enabled = false
`

// sectionChannelDepth measures, on the solid of the section that holds
// the start of the groove, how far the lead channel reaches in from the
// wire centreline there, across the axis if it does: the first point, in
// 0.01 mm steps, inside the solid. It returns the section's number too.
func sectionChannelDepth(t *testing.T, k *Kit) (float64, int) {
	t.Helper()
	c := k.formerObj.Centreline(0)
	r := math.Hypot(c.X, c.Y)
	in := geom.Vec3{X: -c.X / r, Y: -c.Y / r}
	for _, sec := range k.split.Sections {
		if c.Z < sec.Z0 || c.Z > sec.Z1 {
			continue
		}
		at := c.Sub(geom.Vec3{Z: sec.Z0})
		const step = 0.01
		for s := step; s < 2*r; s += step {
			if sec.Solid.Eval(at.Add(in.Scale(s))) < 0 {
				return s - step, sec.Number
			}
		}
		return 2 * r, sec.Number
	}
	t.Fatalf("no section holds the start of the groove at z %.2f mm", c.Z)
	return 0, 0
}

// TestCentreFeedSplitKeepsLead splits the centre-fed 1.27 GHz starter's
// former onto its support rod. The rod's bore is blind short of the lead
// channel, so the channel measured on the section's solid takes the whole
// lock end, which is the feed lead as built (Design.FeedRun,
// parts/feedlead.go); the build sheet and the cut list say one length and
// nothing tells the builder to cut the lead shorter.
func TestCentreFeedSplitKeepsLead(t *testing.T) {
	k := specKit(t, starterCentre)
	if k.split == nil {
		t.Fatalf("the %.0f mm centre-fed former is not split: %v", k.Former.HeightMM, k.Design.Warnings)
	}
	lead, tail := k.Design.FeedRun(), k.cutList.Wire.LockTailMM
	depth, num := sectionChannelDepth(t, k)
	t.Logf("%d sections; feed lead %.2f mm, lock end %.2f mm, channel in section %d %.2f mm from the wire centre, rod bore %.1f mm blind %.1f mm",
		len(k.split.Sections), lead, tail, num, depth, k.split.RodBore, k.onRod.Params.BoreDepth)
	if math.Abs(tail-lead) > leadAgreeMM || math.Abs(k.onRod.LockHoleMM-lead) > leadAgreeMM {
		t.Errorf("lock end %.2f mm, channel %.2f mm, feed lead %.2f mm: more than %.1f mm apart", tail, k.onRod.LockHoleMM, lead, leadAgreeMM)
	}
	if depth < tail {
		t.Errorf("the channel in section %d takes %.2f mm of the %.2f mm lock end", num, depth, tail)
	}
	// The rod: through every section but the channel's, blind in that one.
	for _, sec := range k.split.Sections {
		if want := map[bool]int{true: 0, false: 1}[sec.Number == num]; sec.Genus != want {
			t.Errorf("section %d has genus %d, want %d", sec.Number, sec.Genus, want)
		}
	}
	var m Memory
	if err := k.writeSheet(&m); err != nil {
		t.Fatal(err)
	}
	banned := []string{"takes only", "cut the lock end to", "later cut down", "later cut to", "lock-hole-short"}
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
		if l := fmt.Sprintf("%.1f", tail); !bytes.Contains(b, []byte(l)) {
			t.Errorf("%s does not give the %s mm lock end", name, l)
		}
	}
	b, _ := m.File("build-sheet.md")
	if !strings.Contains(string(b), "blind") {
		t.Error("the build sheet does not say the rod stops in a blind bore")
	}
}
