package field

import (
	"math"
	"testing"

	"coilwright/parts"
)

// bandWorst returns the worst VSWR of d's field solution at the band's
// edges and centre with reflector model m.
func bandWorst(t *testing.T, d *parts.Design, m ReflectorModel) (float64, []Point) {
	t.Helper()
	lo, hi := parts.BandMHz(d.Spec)
	r, err := Sweep(d, Options{Reflector: m, FrequenciesMHz: []float64{lo, (lo + hi) / 2, hi}, AxisOnly: true})
	if err != nil {
		t.Fatal(err)
	}
	w := 0.0
	for _, p := range r.Points {
		w = math.Max(w, p.VSWR)
	}
	return w, r.Points
}

func TestSearchStripMeetsTarget(t *testing.T) {
	// The target is the spec's wedge.max_vswr (default 1.5, 14 dB return
	// loss). Common practice (no published source).
	for _, n := range []string{"demo-5g8-cone", "demo-2g4-cylinder"} {
		for _, feed := range []string{"periphery", "centre"} {
			d := demoDesign(t, n, `feed = "periphery"`, `feed = "`+feed+`"`)
			before, bp := bandWorst(t, d, PlateModel)
			s, rec, err := SearchStrip(d.Spec)
			if err != nil {
				t.Fatal(err)
			}
			nd, err := parts.NewDesign(s)
			if err != nil {
				t.Fatal(err)
			}
			after, ap := bandWorst(t, nd, PlateModel)
			t.Logf("%s %s: span %.0f° h %.1f mm, %d solves; ideal %.2f → %.2f; plate %.2f → %.2f; suggested %.0f° %.1f mm %.2f", n, feed, rec.SpanDeg, rec.FirstTurnHeightMM, rec.Evaluations, rec.StartVSWR, rec.WorstVSWR, before, after, rec.SuggestedSpanDeg, rec.SuggestedHeightMM, rec.SuggestedVSWR)
			for i := range bp {
				t.Logf("  %.0f MHz: plate %.1f%+.1fj VSWR %.2f → %.1f%+.1fj VSWR %.2f", bp[i].FrequencyMHz, bp[i].ResistanceOhm, bp[i].ReactanceOhm, bp[i].VSWR, ap[i].ResistanceOhm, ap[i].ReactanceOhm, ap[i].VSWR)
			}
			if rec.WorstVSWR > rec.StartVSWR+1e-9 {
				t.Errorf("the search made the match worse: %.2f → %.2f", rec.StartVSWR, rec.WorstVSWR)
			}
			if feed == "periphery" && after > d.Spec.Wedge.MaxVSWR {
				t.Errorf("%s: plate-model worst VSWR %.2f above the target %.2f", n, after, d.Spec.Wedge.MaxVSWR)
			}
		}
	}
}

func TestSearchStripKeepsGivenHeight(t *testing.T) {
	d := demoDesign(t, "demo-2g4-cylinder", "[coil]", "[coil]\nfirst_turn_height_mm = 4.2")
	s, rec, err := SearchStrip(d.Spec)
	if err != nil {
		t.Fatal(err)
	}
	if !rec.HeightGiven || rec.FirstTurnHeightMM != 4.2 || *s.Coil.FirstTurnHeightMM != 4.2 {
		t.Errorf("given height 4.2 mm: search chose %.2f mm (given %v)", rec.FirstTurnHeightMM, rec.HeightGiven)
	}
	t.Logf("kept 4.2 mm: VSWR %.2f; suggested span %.0f° height %.1f mm, VSWR %.2f", rec.WorstVSWR, rec.SuggestedSpanDeg, rec.SuggestedHeightMM, rec.SuggestedVSWR)
}

func BenchmarkSearchStrip(b *testing.B) {
	for _, n := range []string{"demo-5g8-cone", "demo-2g4-cylinder"} {
		b.Run(n, func(b *testing.B) {
			d := demoDesign(b, n)
			b.ReportAllocs()
			for b.Loop() {
				if _, _, err := SearchStrip(d.Spec); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
