package field

import (
	"testing"
	"time"

	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

func TestExplore(t *testing.T) {
	for _, name := range []string{"demo-5g8-cone", "demo-2g4-cylinder"} {
		data, _ := templates.Demo(name + ".toml")
		s, err := spec.ParseSpec(data)
		if err != nil {
			t.Fatal(err)
		}
		d, err := parts.NewDesign(s)
		if err != nil {
			t.Fatal(err)
		}
		for _, rm := range []ReflectorModel{IdealGround, PlateModel} {
			t0 := time.Now()
			r, err := Sweep(d, Options{Reflector: rm})
			if err != nil {
				t.Fatal(err)
			}
			c := r.Centre
			t.Logf("%s %s: %v unknowns %d; centre Z %.1f%+.1fj VSWR %.2f axis %.2f peak %.2f real %.2f AR %.2f hpbw %.1f/%.1f fb %.1f eff %.4f", name, rm, time.Since(t0), r.Unknowns,
				c.ResistanceOhm, c.ReactanceOhm, c.VSWR, c.AxisCoPolarDBic(r.RHCP), c.PeakCoPolarDBic(r.RHCP), c.RealisedDBic, c.AxialRatioDB, c.HPBWDeg[0], c.HPBWDeg[1], c.FrontToBackDB, c.Efficiency)
			t.Logf("summary %+v", r.Summary)
		}
	}
}
