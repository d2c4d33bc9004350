package parts

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"

	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/spec"
)

func TestCutSpecErrors(t *testing.T) {
	// Lines count from the first line of base (spec_test.go); the added
	// table's header is line 17 and its first key line 18.
	for _, tc := range []struct {
		name, table string
		key         string
		line        int
		words       string
	}{
		{"strip too thick for the first turn's height", "[wedge]\nthickness_mm = 1.0", "wedge.thickness_mm", 18, "of air under the matching strip"},
		{"strip too thick names the thickest that fits", "[wedge]\nthickness_mm = 1.0", "wedge.thickness_mm", 18, "set wedge.thickness_mm to at most 0.90 mm"},
		{"ripple without the klopfenstein taper", "[wedge]\nripple = 0.05", "wedge.ripple", 18, "only to taper"},
		{"unknown taper", "[wedge]\ntaper = \"linear\"", "wedge.taper", 18, `"exponential", "klopfenstein"`},
		{"span too short", "[wedge]\nspan_deg = 10.0", "wedge.span_deg", 18, "between 30 and 360"},
		{"unknown cutting method", "[cutting]\nmethod = \"plasma\"", "cutting.method", 18, `"mill"`},
		{"laser with no kerf", "[cutting]\nmethod = \"laser\"\nkerf_mm = 0.0", "cutting.kerf_mm", 19, "removes some material"},
		{"tiny sheet", "[cutting]\nsheet_width_mm = 5.0", "cutting.sheet_width_mm", 18, "between 20 and 5000"},
		// λ = 51.688 mm at 5.8 GHz: the default disc, 1 mm kerf and two
		// 5 mm margins need 62.7 mm.
		{"sheet smaller than the reflector", "[cutting]\nsheet_height_mm = 50.0", "cutting.sheet_height_mm", 18, "need 62.7 mm"},
		{"unknown paper", "[cutting]\npaper = \"A3\"", "cutting.paper", 18, `"A4", "Letter"`},
		{"corner radius on a disc", "[reflector]\ncorner_radius_mm = 3.0", "reflector.corner_radius_mm", 18, "only to shape"},
		{"unknown plate material", "[reflector]\nmaterial = \"plywood\"", "reflector.material", 18, `"fr4"`},
		{"too many mounting holes", "[reflector]\nmounting_holes = 20", "reflector.mounting_holes", 18, "between 0 and 12"},
		{"unknown connector", "[reflector]\nconnector = \"bnc\"", "reflector.connector", 18, `"coax"`},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := spec.ParseSpec([]byte(base + "\n" + tc.table + "\n"))
			var errs spec.SpecErrors
			if !errors.As(err, &errs) {
				t.Fatalf("want SpecErrors, got %v", err)
			}
			for _, e := range errs {
				if e.Key == tc.key && e.Line == tc.line && strings.Contains(e.Error(), tc.words) && strings.Contains(e.Error(), "fix:") {
					return
				}
			}
			t.Fatalf("no error for %s on line %d saying %q, in:\n%v", tc.key, tc.line, tc.words, err)
		})
	}
}

func TestDefaultSheetHoldsTheReflector(t *testing.T) {
	// A 250 mm disc with a 1 mm kerf and two 5 mm margins needs 261 mm: the
	// 200 mm default height grows to the next 10 mm, 270 mm; the 300 mm
	// default width already holds it.
	s := mustParse(t, []byte(base+"\n[reflector]\ndiameter_mm = 250.0\n"))
	if s.Cutting.SheetWidthMM != spec.DefaultSheetWidthMM || s.Cutting.SheetHeightMM != 270 {
		t.Errorf("sheet %g × %g mm, want 300 × 270", s.Cutting.SheetWidthMM, s.Cutting.SheetHeightMM)
	}
}

func TestDefaultStripThickness(t *testing.T) {
	const tol = 1e-12
	t.Run("a 24 GHz spec without a strip thickness parses", func(t *testing.T) {
		// λ = 12.491 mm at 24 GHz: the default first turn puts the 0.2 mm
		// wire's underside 0.2 mm up, room for a 0.1 mm strip only.
		src := strings.NewReplacer("frequency_mhz = 5800.0", "frequency_mhz = 24000.0",
			"base_diameter_mm = 17.5\ntop_diameter_mm = 12.5", "base_circumference_lambda = 1.1\ntop_circumference_lambda = 1.0",
			"diameter_mm = 1.6", "diameter_mm = 0.2").Replace(base)
		s, err := designSpec([]byte(src))
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(s.Wedge.ThicknessMM-0.1) > tol {
			t.Errorf("strip %g mm, want 0.1", s.Wedge.ThicknessMM)
		}
		// The top turn, 1.0 λ round, is 3.976 mm across the wire centres,
		// 3.776 mm inside: a 3 mm rod (the smallest stock size, common
		// practice) fits with 0.388 mm all round, so the default clearance
		// closes to 0.35 mm.
		if math.Abs(s.Dowel.ClearanceMM-0.35) > tol {
			t.Errorf("dowel clearance %g mm, want 0.35", s.Dowel.ClearanceMM)
		}
	})
}

func TestDowelFitErrors(t *testing.T) {
	// A 24 GHz cone (λ = 12.491 mm) of 0.2 mm wire. Top 1.0 λ: 3.776 mm
	// inside the smallest turn; top 0.8 λ: 2.981 mm inside, less than the
	// smallest 3 mm stock rod (common practice).
	at24 := func(top, dowel string) string {
		return strings.NewReplacer("frequency_mhz = 5800.0", "frequency_mhz = 24000.0",
			"base_diameter_mm = 17.5\ntop_diameter_mm = 12.5", "base_circumference_lambda = 1.1\ntop_circumference_lambda = "+top,
			"diameter_mm = 1.6", "diameter_mm = 0.2").Replace(base) + dowel
	}
	for _, tc := range []struct {
		name, src, key, words string
	}{
		{"given clearance too wide", at24("1.0", "\n[dowel]\nclearance_mm = 0.5\n"), "dowel.clearance_mm", "reduce the clearance to at most 0.39 mm"},
		{"given rod and clearance leave no room", at24("0.8", "\n[dowel]\ndiameter_mm = 2.0\nclearance_mm = 1.5\n"), "dowel.diameter_mm", "the rod plus twice the clearance must stay within 2.98 mm"},
		{"no stock rod fits at all", at24("0.8", ""), "dowel.clearance_mm", "dowel.diameter_mm plus twice clearance_mm at most 2.98 mm"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := designSpec([]byte(tc.src))
			var errs spec.SpecErrors
			if !errors.As(err, &errs) {
				t.Fatalf("want SpecErrors, got %v", err)
			}
			for _, e := range errs {
				if e.Key == tc.key && strings.Contains(e.Error(), tc.words) {
					return
				}
			}
			t.Fatalf("no %s error saying %q, in:\n%v", tc.key, tc.words, err)
		})
	}
}

func TestPatternsFromDemo(t *testing.T) {
	d := mustDesign(t, string(demoSpec(t, "demo-5g8-cone.toml")))
	p := d.Patterns
	in := p.Reflector.Input
	// The demo's [reflector] diameter_mm = 50 and feed = "periphery": the
	// feed hole sits under the start of the winding.
	if in.Size != 50 || math.Abs(in.FeedRadius-d.Coil.StartRadius) > 1e-9 || in.Shape != flat.ReflectorDisc {
		t.Errorf("reflector input %+v", in)
	}
	// Source: published cable data, 0.141 in semi-rigid jacket 3.58 mm,
	// plus 0.1 mm clearance.
	if math.Abs(in.Feed.Diameter-3.68) > 1e-12 {
		t.Errorf("feed hole Ø %g mm", in.Feed.Diameter)
	}
	w := p.Wedge
	if first := w.Stations[0]; math.Abs(first.Ohm-spec.WedgeFeedOhm) > 1e-6 {
		t.Errorf("feed station %.6f Ω, want 50", first.Ohm)
	}
	if last := w.Stations[len(w.Stations)-1]; !last.Clamped && math.Abs(last.Ohm-p.WedgeLoadOhm) > 1e-6 {
		t.Errorf("far station %.6f Ω, want %.6f", last.Ohm, p.WedgeLoadOhm)
	}
	if p.WedgeLoadOhm != d.Turns[0].InputResistanceOhm {
		t.Errorf("wedge load %g Ω, first turn %g Ω", p.WedgeLoadOhm, d.Turns[0].InputResistanceOhm)
	}
	if !strings.Contains(p.ReflectorLabel, "milling or shearing") || p.LaserHalogen {
		t.Errorf("FR-4 plate label %q", p.ReflectorLabel)
	}
	t.Logf("5.8 GHz demo wedge: %.2f mm long, %.3f mm at the feed, %.3f mm at the end, |Γ| %.3f", w.Length, w.FeedWidth, w.EndWidth, w.Reflection)
}

func TestMaterialGuard(t *testing.T) {
	for _, tc := range []struct {
		name, table string
		laser       bool
	}{
		{"FR-4 by laser", "[cutting]\nmethod = \"laser\"", true},
		{"FR-4 milled", "[cutting]\nmethod = \"mill\"", false},
		{"aluminium by laser", "[reflector]\nmaterial = \"aluminium\"\n[cutting]\nmethod = \"laser\"", false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			d := mustDesign(t, base+"\n"+tc.table+"\n")
			p := d.Patterns
			warned := false
			for _, w := range d.Warnings {
				warned = warned || w.Code == "laser-halogenated"
			}
			if p.LaserHalogen != tc.laser || warned != tc.laser || (p.ReflectorLabel == LaserHalogenWarning) != tc.laser {
				t.Errorf("laser flag %v, warning %v, label %q", p.LaserHalogen, warned, p.ReflectorLabel)
			}
			if strings.Contains(p.WedgeLabel, "WARNING") {
				t.Errorf("copper wedge labelled %q", p.WedgeLabel)
			}
		})
	}
}

func TestPlateTooSmallForFeed(t *testing.T) {
	// A 20 mm disc cannot hold a Ø 3.68 mm feed hole 8.75 mm from its
	// centre with 1 mm of web: the design stands, with a warning and no
	// plate.
	d := mustDesign(t, strings.Replace(strings.Replace(base, "[wire]", "[reflector]\ndiameter_mm = 20.0\n[wire]", 1), "[coil]", "[coil]\nfeed = \"periphery\"", 1))
	if d.Patterns.Reflector != nil || !strings.Contains(","+warningCodes(d)+",", ",reflector-fit,") {
		t.Errorf("plate %v, warnings %q", d.Patterns.Reflector, warningCodes(d))
	}
}

func ExampleStripWidthRatio() {
	// Width-to-height ratio of a 50 Ω zero-thickness strip in air.
	u, _ := line.StripWidthRatio(50, 0)
	fmt.Printf("%.3f\n", u)
	// Output: 4.912
}
