package plot

import (
	"bytes"
	"errors"
	"math"
	"slices"
	"testing"
)

// coordTol is the largest difference in mm allowed between a coordinate
// read back and the one expected: coordinates are written to 0.01 mm.
const coordTol = 0.006

func TestRLCMatch(t *testing.T) {
	// At resonance the load is R = 60 Ω on 50 Ω: Γ = 10/110, VSWR = R/Z0
	// = 1.2 and return loss = 20·log10(11) = 20.83 dB.
	// Source: Pozar, Microwave Engineering, 4th ed., §2.3.
	s, rl := rlcMatch(436, 436, 12, 60, 50)
	if math.Abs(s-1.2) > 1e-12 || math.Abs(rl-20*math.Log10(11)) > 1e-12 {
		t.Errorf("VSWR %g, return loss %g dB; want 1.2 and 20.83", s, rl)
	}
}

func TestWriteFrequencyChart(t *testing.T) {
	var buf bytes.Buffer
	c := sampleMatchChart()
	if err := WriteFrequencyChart(&buf, c, ChartOptions{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "match.svg", buf.Bytes())
	doc := parseSVG(t, buf.Bytes())

	t.Run("accessible name", func(t *testing.T) {
		title, ok := doc.child("title")
		if !ok || title.Text != c.Title {
			t.Errorf("title %q, want %q", title.Text, c.Title)
		}
		desc, ok := doc.child("desc")
		if !ok || !bytes.Contains([]byte(desc.Text), []byte("430 to 440 MHz")) {
			t.Errorf("description %q does not state the band", desc.Text)
		}
		if doc.attr("role") != "img" || doc.attr("aria-labelledby") != "title desc" {
			t.Errorf("root role %q, aria-labelledby %q", doc.attr("role"), doc.attr("aria-labelledby"))
		}
	})

	areas := doc.all("plot-area")
	if len(areas) != 1 {
		t.Fatalf("%d plot areas, want 1", len(areas))
	}
	a := areas[0]
	ax, ay, aw, ah := a.num(t, "x"), a.num(t, "y"), a.num(t, "width"), a.num(t, "height")
	// The axis mapping, written out again here: 400–480 MHz across the
	// area, VSWR 1–6 and return loss 0–30 dB up it.
	xAt := func(mhz float64) float64 { return ax + (mhz-400)/(480-400)*aw }
	yAt := func(v, lo, hi float64) float64 { return ay + ah - (v-lo)/(hi-lo)*ah }
	near := func(t *testing.T, what string, got, want float64) {
		t.Helper()
		if math.Abs(got-want) > coordTol {
			t.Errorf("%s at %.3f mm, want %.3f mm", what, got, want)
		}
	}

	t.Run("band", func(t *testing.T) {
		bands := doc.all("band")
		if len(bands) != 1 {
			t.Fatalf("%d bands, want 1", len(bands))
		}
		b := bands[0]
		near(t, "band low edge", b.num(t, "x"), xAt(430))
		near(t, "band high edge", b.num(t, "x")+b.num(t, "width"), xAt(440))
		near(t, "band top", b.num(t, "y"), ay)
		near(t, "band bottom", b.num(t, "y")+b.num(t, "height"), ay+ah)
		edges := doc.all("band-edge")
		if len(edges) != 2 {
			t.Fatalf("%d band edge lines, want 2", len(edges))
		}
		near(t, "low edge line", edges[0].num(t, "x1"), xAt(430))
		near(t, "high edge line", edges[1].num(t, "x2"), xAt(440))
		if got := doc.texts("band-label"); !slices.Equal(got, []string{"Band 430–440 MHz"}) {
			t.Errorf("band labels %q", got)
		}
	})

	t.Run("target line", func(t *testing.T) {
		ts := doc.all("target")
		if len(ts) != 1 {
			t.Fatalf("%d target lines, want 1", len(ts))
		}
		near(t, "target y1", ts[0].num(t, "y1"), yAt(2, 1, 6))
		near(t, "target y2", ts[0].num(t, "y2"), yAt(2, 1, 6))
		near(t, "target start", ts[0].num(t, "x1"), ax)
		near(t, "target end", ts[0].num(t, "x2"), ax+aw)
		if got := doc.texts("target-label"); !slices.Equal(got, []string{"Target VSWR 2"}) {
			t.Errorf("target labels %q", got)
		}
	})

	t.Run("axis labels", func(t *testing.T) {
		for _, tc := range []struct {
			class string
			want  []string
		}{
			{"tick-label x", []string{"400", "410", "420", "430", "440", "450", "460", "470", "480"}},
			{"tick-label y", []string{"1", "2", "3", "4", "5", "6"}},
			{"tick-label y2", []string{"0", "5", "10", "15", "20", "25", "30"}},
			{"axis-label x", []string{"Frequency (MHz)"}},
			{"axis-label y", []string{"VSWR"}},
			{"axis-label y2", []string{"Return loss (dB)"}},
			{"legend-label", []string{"VSWR", "Return loss (dB)"}},
		} {
			if got := doc.texts(tc.class); !slices.Equal(got, tc.want) {
				t.Errorf("%s: %q, want %q", tc.class, got, tc.want)
			}
		}
		// Each x tick sits at its frequency.
		for i, tk := range doc.all("tick x") {
			near(t, "x tick", tk.num(t, "x1"), xAt(400+10*float64(i)))
		}
		for i, tk := range doc.all("tick y2") {
			near(t, "return loss tick", tk.num(t, "y1"), yAt(5*float64(i), 0, 30))
		}
	})

	t.Run("series", func(t *testing.T) {
		ss := doc.all("series")
		if len(ss) != 2 {
			t.Fatalf("%d series, want 2", len(ss))
		}
		// The demo resonator's VSWR dips to R/Z0 = 1.2 at 436 MHz.
		// Source: Pozar, Microwave Engineering, 4th ed., §2.3.
		pts := points(t, ss[0].attr("d"))
		low := slices.MinFunc(pts, func(p, q [2]float64) int { return -cmpFloat(p[1], q[1]) })
		near(t, "VSWR minimum x", low[0], xAt(436))
		near(t, "VSWR minimum y", low[1], yAt(1.2, 1, 6))
		// Colour and dash both differ between the two series.
		if ss[0].attr("stroke") == ss[1].attr("stroke") || ss[0].attr("stroke-dasharray") == ss[1].attr("stroke-dasharray") {
			t.Errorf("series styles not distinct: %v / %v", ss[0].Attrs, ss[1].Attrs)
		}
	})
}

// cmpFloat orders a before b.
func cmpFloat(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

func TestWriteFrequencyChartPanels(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteFrequencyChart(&buf, sampleGainChart(), ChartOptions{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "gain.svg", buf.Bytes())
	doc := parseSVG(t, buf.Bytes())
	areas := doc.all("plot-area")
	if len(areas) != 2 {
		t.Fatalf("%d panels, want 2", len(areas))
	}
	if a, b := areas[0], areas[1]; a.num(t, "y")+a.num(t, "height") >= b.num(t, "y") || a.attr("x") != b.attr("x") || a.attr("width") != b.attr("width") {
		t.Errorf("panels not stacked on one x axis: %v / %v", a.Attrs, b.Attrs)
	}
	if n := len(doc.all("band")); n != 2 {
		t.Errorf("band drawn in %d panels, want 2", n)
	}
	if n := len(doc.all("tick-label x")); n == 0 || n != len(doc.all("tick x"))/2 {
		t.Errorf("%d x tick labels for %d ticks: only the bottom panel is labelled", n, len(doc.all("tick x")))
	}
	if n := len(doc.all("envelope")); n != 1 {
		t.Errorf("%d envelopes, want 1", n)
	}
	// The envelope shares the next series' style (RHCP), and the three
	// series take three different styles.
	env, ss := doc.all("envelope")[0], doc.all("series")
	if env.attr("stroke") != ss[0].attr("stroke") {
		t.Errorf("envelope stroke %s, RHCP %s", env.attr("stroke"), ss[0].attr("stroke"))
	}
	seen := map[string]bool{}
	for _, s := range ss {
		seen[s.attr("data-style")] = true
	}
	if len(seen) != 3 {
		t.Errorf("series styles %v, want 3 different", seen)
	}
}

func TestFrequencyChartErrors(t *testing.T) {
	good := sampleMatchChart()
	for _, tc := range []struct {
		name  string
		edit  func(c *FrequencyChart)
		field string
	}{
		{"no panels", func(c *FrequencyChart) { c.Panels = nil }, "Panels"},
		{"band upside down", func(c *FrequencyChart) { c.Bands[0].LowMHz = 450 }, "Bands[0]"},
		{"lengths differ", func(c *FrequencyChart) { c.Panels[0].Series[0].Values = c.Panels[0].Series[0].Values[1:] }, "Panels[0].Series[0].Values"},
		{"x range backwards", func(c *FrequencyChart) { c.XMaxMHz = 300 }, "XMaxMHz"},
		{"unknown style", func(c *FrequencyChart) { c.Panels[0].Series[1].Style = 99 }, "Panels[0].Series[1].Style"},
		{"target not finite", func(c *FrequencyChart) { c.Panels[0].Targets[0].Value = math.Inf(1) }, "Panels[0].Targets[0].Value"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			c := sampleMatchChart()
			c.Bands = slices.Clone(good.Bands)
			c.Panels = slices.Clone(good.Panels)
			if len(c.Panels) > 0 {
				c.Panels[0].Series = slices.Clone(good.Panels[0].Series)
				c.Panels[0].Targets = slices.Clone(good.Panels[0].Targets)
			}
			tc.edit(&c)
			var buf bytes.Buffer
			err := WriteFrequencyChart(&buf, c, ChartOptions{})
			var ie *InputError
			if !errors.As(err, &ie) || ie.Field != tc.field {
				t.Fatalf("error %v, want an InputError on %s", err, tc.field)
			}
			if buf.Len() != 0 {
				t.Errorf("%d bytes written before the error", buf.Len())
			}
		})
	}
}

func TestTicks(t *testing.T) {
	// Expected values follow the 1-2-5 rule worked by hand.
	// Source: Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990.
	for _, tc := range []struct {
		name   string
		lo, hi float64
		n      int
		want   []float64
		step   float64
	}{
		{"400 to 480 MHz", 400, 480, 8, []float64{400, 410, 420, 430, 440, 450, 460, 470, 480}, 10},
		{"VSWR 1 to 6", 1, 6, 5, []float64{1, 2, 3, 4, 5, 6}, 1},
		{"gain -10 to 15", -10, 15, 5, []float64{-10, -5, 0, 5, 10, 15}, 5},
		{"tenths", 0.1, 0.6, 5, []float64{0.1, 0.2, 0.3, 0.4, 0.5, 0.6}, 0.1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, step := ticks(tc.lo, tc.hi, tc.n)
			if math.Abs(step-tc.step) > 1e-12 || len(got) != len(tc.want) {
				t.Fatalf("ticks %v step %g, want %v step %g", got, step, tc.want, tc.step)
			}
			for i := range got {
				if math.Abs(got[i]-tc.want[i]) > 1e-9 {
					t.Errorf("tick %d = %g, want %g", i, got[i], tc.want[i])
				}
			}
		})
	}
	for _, tc := range []struct {
		v, step float64
		want    string
	}{{-10, 5, "−10"}, {0.5, 0.1, "0.5"}, {-0.0000000001, 0.1, "0.0"}, {436, 0.5, "436.0"}} {
		if got := tickText(tc.v, tc.step); got != tc.want {
			t.Errorf("tickText(%g, %g) = %q, want %q", tc.v, tc.step, got, tc.want)
		}
	}
	if lo, hi := niceRange(1.2, 5.7, 5); lo != 1 || hi != 6 {
		t.Errorf("niceRange(1.2, 5.7) = %g, %g; want 1, 6", lo, hi)
	}
}
