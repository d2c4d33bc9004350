package plot

import (
	"bytes"
	"errors"
	"math"
	"slices"
	"testing"
)

func TestHistogramCounts(t *testing.T) {
	for _, tc := range []struct {
		name   string
		h      Histogram
		counts []int
		edges  []float64
	}{
		// Counted by hand: 1 | 2 2 | 3 3 3 in bins of width 1 from 0.5.
		{"fixed range", Histogram{Values: []float64{1, 2, 2, 3, 3, 3}, Min: 0.5, Max: 3.5, Bins: 3}, []int{1, 2, 3}, []float64{0.5, 1.5, 2.5, 3.5}},
		// The top edge belongs to the last bin; NaN and out-of-range
		// values are not counted.
		{"edges", Histogram{Values: []float64{0, 1, 2, math.NaN(), 5}, Min: 0, Max: 2, Bins: 2}, []int{1, 2}, []float64{0, 1, 2}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			edges, counts, err := tc.h.Counts()
			if err != nil {
				t.Fatal(err)
			}
			if !slices.Equal(counts, tc.counts) || !slices.Equal(edges, tc.edges) {
				t.Errorf("edges %v counts %v, want %v %v", edges, counts, tc.edges, tc.counts)
			}
		})
	}
	t.Run("Sturges", func(t *testing.T) {
		// 40 values: 1 + log2(40) = 6.32, so 7 bins.
		// Source: Sturges, J. Am. Stat. Assoc. 21 (1926), 65–66.
		vs := make([]float64, 40)
		for i := range vs {
			vs[i] = float64(i)
		}
		if n := (Histogram{Values: vs}).bins(len(vs)); n != 7 {
			t.Errorf("%d bins, want 7", n)
		}
	})
	t.Run("no values", func(t *testing.T) {
		var ie *InputError
		if _, _, err := (Histogram{Values: []float64{math.NaN()}}).Counts(); !errors.As(err, &ie) {
			t.Errorf("error %v, want an InputError", err)
		}
	})
}

func TestWriteHistogram(t *testing.T) {
	var buf bytes.Buffer
	h := sampleHistogram()
	if err := WriteHistogram(&buf, h, ChartOptions{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "histogram.svg", buf.Bytes())
	doc := parseSVG(t, buf.Bytes())
	edges, counts, err := h.Counts()
	if err != nil {
		t.Fatal(err)
	}
	total := 0
	for _, b := range doc.all("bar") {
		total += int(b.num(t, "data-count"))
	}
	if total != len(h.Values) {
		t.Errorf("bars hold %d values, want %d", total, len(h.Values))
	}
	a := doc.all("frame")[0]
	ax, aw := a.num(t, "x"), a.num(t, "width")
	xAt := func(v float64) float64 { return ax + (v-edges[0])/(edges[len(edges)-1]-edges[0])*aw }
	ms := doc.all("marker")
	if len(ms) != 2 {
		t.Fatalf("%d markers, want 2", len(ms))
	}
	for i, m := range h.Markers {
		if got := ms[i].num(t, "x1"); math.Abs(got-xAt(m.Value)) > coordTol {
			t.Errorf("marker %s at %.3f mm, want %.3f", m.Label, got, xAt(m.Value))
		}
	}
	if got := doc.texts("marker-label"); !slices.Equal(got, []string{"Low limit", "High limit"}) {
		t.Errorf("marker labels %q", got)
	}
	if got := doc.texts("axis-label x"); !slices.Equal(got, []string{"Resonant frequency (MHz)"}) {
		t.Errorf("x axis label %q", got)
	}
	if len(counts) != len(edges)-1 {
		t.Errorf("%d counts for %d edges", len(counts), len(edges))
	}
}
