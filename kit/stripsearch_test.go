package kit

import (
	"bytes"
	"fmt"
	"math"
	"strings"
	"testing"

	"coilwright/parts/spec"
	"coilwright/templates"
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

func TestFeedChoiceChangesTheReflectorFile(t *testing.T) {
	// Source: DOMAIN.md §9 (Kraus): a centre feed comes up on the axis, a
	// periphery feed under the start of the winding.
	files := map[string][]byte{}
	for _, feed := range []string{"periphery", "centre"} {
		b, _ := templates.Demo("demo-2g4-cylinder.toml")
		src := strings.Replace(string(b), `feed = "periphery"`, fmt.Sprintf("feed = %q", feed), 1)
		s, err := spec.ParseSpec([]byte(src))
		if err != nil {
			t.Fatal(err)
		}
		k, err := New(Source{Name: feed, Bytes: []byte(src), Spec: s}, Options{})
		if err != nil {
			t.Fatal(err)
		}
		var m Memory
		if err := k.writePatterns(&m); err != nil {
			t.Fatal(err)
		}
		dxf, ok := m.File("reflector.dxf")
		if !ok {
			t.Fatalf("no reflector.dxf in %v", m.Names())
		}
		files[feed] = dxf
		r := k.Design.Patterns.Reflector.Input.FeedRadius
		want := 0.0
		if feed == "periphery" {
			want = k.Design.Coil.StartRadius
		}
		if math.Abs(r-want) > 1e-9 {
			t.Errorf("%s feed: hole %.3f mm from the axis, want %.3f mm", feed, r, want)
		}
	}
	if bytes.Equal(files["periphery"], files["centre"]) {
		t.Error("centre and periphery feeds write the same reflector.dxf")
	}
}
