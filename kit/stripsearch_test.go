package kit

import (
	"testing"
)

func TestDemosMeetTheMatchTarget(t *testing.T) {
	// The target is wedge.max_vswr (default 1.5, a 14 dB return loss;
	// common practice, no published source), checked on the final sweep
	// with the plate modelled as a wire grid.
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			k := demoKit(t, demo, Options{})
			d := k.Design
			r := d.StripSearch
			if r == nil || d.Field == nil {
				t.Fatalf("strip search %v, field %v", r, d.Field)
			}
			w := d.Field.Summary.Worst
			t.Logf("span %.0f°, first turn %.1f mm, %d solves; ideal ground %.2f → %.2f; plate worst %.2f at %.0f MHz",
				r.SpanDeg, r.FirstTurnHeightMM, r.Evaluations, r.StartVSWR, r.WorstVSWR, w.VSWR, w.FrequencyMHz)
			if w.VSWR > d.Spec.Wedge.MaxVSWR {
				t.Errorf("plate-model worst in-band VSWR %.2f above wedge.max_vswr %.2f", w.VSWR, d.Spec.Wedge.MaxVSWR)
			}
			for _, wn := range d.Warnings {
				if wn.Code == "match" {
					t.Errorf("a met target still warns: %s", wn.Message)
				}
			}
		})
	}
}
