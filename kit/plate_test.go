package kit

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"coilwright/cam/geom"
	"coilwright/parts"
	"coilwright/parts/flat"
	"coilwright/parts/spec"
)

// starterSpec is what `coilwright new --frequency-mhz F --turns N` prints
// for a cylindrical coil (its keys), with extra appended.
func starterSpec(f, turns float64, extra string) string {
	return fmt.Sprintf(`kit = "Starter"
frequency_mhz = %g

[coil]
shape = "cylindrical"
turns = %g
hand = "RHCP"
feed = "periphery"
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5

[wire]
material = "copper-annealed"
diameter_mm = %g
`, f, turns, wireFor(f)) + extra
}

// newKitText parses text and runs New on it.
func newKitText(t *testing.T, text string) (*Kit, error) {
	t.Helper()
	s, err := spec.ParseSpec([]byte(text))
	if err != nil {
		t.Fatalf("spec: %v\n%s", err, text)
	}
	return New(Source{Name: "test.toml", Bytes: []byte(text), Spec: s}, Options{})
}

// holes returns the plate's CUT entities after the outline, flattened.
func holes(t *testing.T, d geom.Drawing) []geom.Polyline {
	t.Helper()
	l, ok := d.Layer(flat.LayerCut)
	if !ok {
		t.Fatal("no CUT layer")
	}
	var out []geom.Polyline
	for _, e := range l.Entities[1:] {
		switch e := e.(type) {
		case geom.Circle:
			out = append(out, e.Flatten(0.002))
		case geom.Contour:
			out = append(out, e.Flatten(0.002))
		default:
			t.Fatalf("CUT holds a %T", e)
		}
	}
	return out
}

// polyGap returns the least vertex-to-vertex distance between a and b: the
// gap between two flattened outlines, within their chord tolerance and
// vertex spacing.
func polyGap(a, b geom.Polyline) float64 {
	g := math.Inf(1)
	for _, p := range a {
		for _, q := range b {
			g = math.Min(g, p.Sub(q).Len())
		}
	}
	return g
}

// markCircles returns the MARK layer's circles about the plate's centre,
// smallest first: the rod and the limit of its fillet.
func markCircles(d geom.Drawing) []geom.Circle {
	l, _ := d.Layer(flat.LayerMark)
	var out []geom.Circle
	for _, e := range l.Entities {
		if c, ok := e.(geom.Circle); ok && c.Center.Len() < 1e-9 {
			out = append(out, c)
		}
	}
	return out
}

// gapTol is the measuring tolerance on gaps between flattened outlines:
// the vertex spacing of a 0.002 mm chord tolerance on the holes here.
const gapTol = 0.05

// TestTenGHzRodFootClearsFeedHole reproduces the 10 GHz starter: its rod's
// epoxy fillet, 2 mm all round, reached 3.50 mm from the centre over a
// feed hole whose edge is 2.93 mm from it. The fillet now stops
// FootprintClearMM short of the hole, and the plate's drawing marks it.
func TestTenGHzRodFootClearsFeedHole(t *testing.T) {
	k, err := newKitText(t, starterSpec(10000, 7, ""))
	if err != nil {
		t.Fatal(err)
	}
	refl := k.Design.Patterns.Reflector
	mc := markCircles(refl.Drawing)
	if len(mc) != 2 {
		t.Fatalf("want the rod and its fillet limit marked about the centre, got %d circles", len(mc))
	}
	feed := holes(t, refl.Drawing)[0]
	foot := mc[1].Flatten(0.002)
	if g := polyGap(feed, foot); g < parts.FootprintClearMM-gapTol {
		t.Errorf("fillet limit Ø%.2f mm comes %.3f mm from the feed hole; want ≥ %g", 2*mc[1].Radius, g, parts.FootprintClearMM)
	}
	if leg := mc[1].Radius - mc[0].Radius; leg < parts.MinRodFilletLegMM-1e-9 || leg > parts.RodFilletLegMM+1e-9 {
		t.Errorf("fillet leg %.3f mm outside [%g, %g]", leg, parts.MinRodFilletLegMM, parts.RodFilletLegMM)
	}
}

// TestTenGHzThickRodRefused: a 5 mm rod passes inside the 10 GHz coil but
// its foot covers the feed hole; check must refuse it on the rod's key.
func TestTenGHzThickRodRefused(t *testing.T) {
	text := starterSpec(10000, 7, "\n[dowel]\ndiameter_mm = 5\n")
	_, err := newKitText(t, text)
	var errs spec.SpecErrors
	if !errors.As(err, &errs) || len(errs) == 0 {
		t.Fatalf("want spec errors, got %v", err)
	}
	e := errs[0]
	if e.Key != "dowel.diameter_mm" || e.Line != 17 || e.Fix == "" || !strings.Contains(e.Problem, "feed") {
		t.Errorf("got %+v", e)
	}
}

// TestRodScrewHoleIsCut: at 2.4 GHz with 12 turns the rod is held by an M3
// screw from behind; its clearance hole must be on the CUT layer at the
// centre, or a board house or mill operator will not cut it.
func TestRodScrewHoleIsCut(t *testing.T) {
	k, err := newKitText(t, starterSpec(2400, 12, "\n[stock]\nwire_rod_mm = 2000\n"))
	if err != nil {
		t.Fatal(err)
	}
	mt := k.cutList.Dowel.Rod.Mount
	if mt.Screw != "M3" {
		t.Fatalf("want an M3 mount for this rod, got %+v", mt)
	}
	l, _ := k.Design.Patterns.Reflector.Drawing.Layer(flat.LayerCut)
	found := false
	for _, e := range l.Entities {
		if c, ok := e.(geom.Circle); ok && c.Center.Len() < 1e-9 && math.Abs(2*c.Radius-mt.ClearMM) < 1e-9 {
			found = true
		}
	}
	if !found {
		t.Errorf("no Ø%g mm screw hole at the centre on the CUT layer", mt.ClearMM)
	}
	for _, c := range k.parts {
		if c.name != "reflector" {
			continue
		}
		if hs := holes(t, c.cut); len(hs) != 2 {
			t.Errorf("the kerf-offset plate has %d holes; want the feed and the screw hole", len(hs))
		}
	}
}

// randomPlateSpec draws a spec whose plate is crowded now and then: a
// given rod, a flange or bulkhead jack, a fixed feed hole, mounting holes.
func randomPlateSpec(rng *rand.Rand) string {
	f := 800 + rng.Float64()*11200
	var b strings.Builder
	b.WriteString("\n[reflector]\n")
	switch rng.IntN(3) {
	case 1:
		b.WriteString("connector = \"sma-flange\"\n")
	case 2:
		b.WriteString("connector = \"sma-bulkhead\"\n")
	}
	if rng.IntN(4) == 0 {
		b.WriteString("shape = \"square\"\n")
	}
	if rng.IntN(3) == 0 {
		fmt.Fprintf(&b, "mounting_holes = %d\nmounting_angle_deg = %.0f\n", 1+rng.IntN(6), rng.Float64()*360)
	}
	if rng.IntN(3) == 0 {
		fmt.Fprintf(&b, "\n[dowel]\ndiameter_mm = %.1f\n", 1+rng.Float64()*20)
	}
	return starterSpec(f, float64(3+rng.IntN(15)), b.String())
}

// TestPlateFeaturesNeverCollide draws seeded random specs; for every one
// the design and plate checks accept, the plate's drawing is measured:
// every pair of holes keeps PlateWebMM of web, and the rod's fillet limit
// keeps FootprintClearMM from every hole.
func TestPlateFeaturesNeverCollide(t *testing.T) {
	const draws = 300
	rng := rand.New(rand.NewPCG(6, 2026))
	accepted, refused := 0, 0
	for i := range draws {
		text := randomPlateSpec(rng)
		s, err := spec.ParseSpec([]byte(text))
		if err != nil {
			continue
		}
		d, err := parts.NewDesign(s)
		if err != nil || d.Patterns.Reflector == nil {
			continue
		}
		if checkPlate(d) != nil {
			refused++
			continue
		}
		accepted++
		dr := d.Patterns.Reflector.Drawing
		hs := holes(t, dr)
		for a := range hs {
			for b := a + 1; b < len(hs); b++ {
				if g := polyGap(hs[a], hs[b]); g < parts.PlateWebMM-gapTol {
					t.Errorf("draw %d: holes %d and %d have %.3f mm of web\n%s", i, a, b, g, text)
				}
			}
		}
		checkFeatureGaps(t, i, d.Patterns.Plate.Features, text)
		mc := markCircles(dr)
		if d.Patterns.Plate.RodMM == 0 {
			continue // no rod on the plate: the "rod-over-feed" warning
		}
		if len(mc) != 2 {
			t.Fatalf("draw %d: %d rod marks", i, len(mc))
		}
		foot := mc[1].Flatten(0.002)
		for a, h := range hs {
			if d.Patterns.Plate.ScrewHoleMM > 0 && a == len(hs)-1 {
				continue // the rod's own screw hole
			}
			if g := polyGap(h, foot); g < parts.FootprintClearMM-gapTol {
				t.Errorf("draw %d: hole %d comes %.3f mm from the rod's fillet\n%s", i, a, g, text)
			}
		}
	}
	if accepted < draws/3 {
		t.Errorf("only %d of %d draws accepted: the test checks too little", accepted, draws)
	}
	if refused == 0 {
		t.Errorf("no draw was refused for a collision: the draws do not crowd the plate")
	}
	t.Logf("%d of %d draws accepted, %d refused for a collision on the plate", accepted, draws, refused)
}

// wireFor is the starter's wire: 0.6 mm above 5 GHz, 1 mm below. (Demo
// data, chosen to stay inside the spec's limits.)
func wireFor(f float64) float64 {
	if f > 5000 {
		return 0.6
	}
	return 1
}

// outline returns a feature's outline as a polygon: a circle flattened, or
// a square's corners with points every 0.05 mm along its sides.
func outline(f parts.PlateFeature) geom.Polyline {
	if f.Side == 0 {
		return geom.Circle{Center: f.Center, Radius: f.Radius}.Flatten(0.002)
	}
	var p geom.Polyline
	h := f.Side / 2
	corners := []geom.Vec2{{X: -h, Y: -h}, {X: h, Y: -h}, {X: h, Y: h}, {X: -h, Y: h}}
	n := int(f.Side / 0.05)
	for k := range 4 {
		a, b := corners[k], corners[(k+1)%4]
		for j := range n {
			q := a.Add(b.Sub(a).Scale(float64(j) / float64(n)))
			p = append(p, q.Rotate(f.Angle).Add(f.Center))
		}
	}
	return p
}

// checkFeatureGaps measures every pair of the plate's features that may
// not touch: holes of different parts keep PlateWebMM, and a part resting
// on a face keeps FootprintClearMM from holes and from parts on its face,
// except the strip at the feed it joins. Circles are measured exactly,
// squares through their outlines.
func checkFeatureGaps(t *testing.T, draw int, fs []parts.PlateFeature, text string) {
	t.Helper()
	for a := range fs {
		for b := a + 1; b < len(fs); b++ {
			x, y := fs[a], fs[b]
			switch {
			case x.Part == y.Part && x.Index == y.Index:
				continue
			case x.Face != parts.FaceThrough && y.Face != parts.FaceThrough && x.Face != y.Face:
				continue
			case (x.Part == parts.PartStrip && y.Joined) || (y.Part == parts.PartStrip && x.Joined):
				continue
			}
			need := parts.FootprintClearMM
			if x.Face == parts.FaceThrough && y.Face == parts.FaceThrough {
				need = parts.PlateWebMM
			}
			var g float64
			if x.Side == 0 && y.Side == 0 {
				g = x.Center.Sub(y.Center).Len() - x.Radius - y.Radius
			} else {
				g = polyGap(outline(x), outline(y))
			}
			if g < need-gapTol {
				t.Errorf("draw %d: %s and %s are %.3f mm apart, want ≥ %g\n%s", draw, x.Name, y.Name, g, need, text)
			}
		}
	}
}
