package parts

import (
	"strings"
	"testing"
)

func TestFieldMatchWarningNamesOnlyKeysTheSpecSets(t *testing.T) {
	// A solution whose worst in-band VSWR (1.56) misses wedge.max_vswr
	// (1.5): the fix may tell the user to remove a strip key only when the
	// spec sets it, and otherwise says what the search reached and why it
	// stopped. The figures are made up; only the wording is checked.
	sol := &FieldSolution{Reflector: "plate", Summary: FieldSummary{Worst: FieldFigures{FrequencyMHz: 5880, VSWR: 1.56}}}
	free := &StripSearch{SpanDeg: 120, FirstTurnHeightMM: 3, WorstVSWR: 1.49, SuggestedSpanDeg: 120, SuggestedHeightMM: 3, SuggestedVSWR: 1.49,
		SpanStepDeg: 30, HeightStep: 1.2}
	bounded := *free
	bounded.SpanDeg, bounded.Limits = 180, []string{"the longest span it tries, 180° (wedge.span_deg)"}
	spanGiven := *free
	spanGiven.SpanGiven, spanGiven.WorstVSWR, spanGiven.SuggestedVSWR = true, 1.7, 1.45
	for _, c := range []struct {
		name     string
		edit     string
		search   *StripSearch
		want     []string
		wantNot  []string
		wantWarn bool
	}{
		{"search had a free hand", "", free, []string{"chose both", "reached VSWR 1.49", "grid", "wedge.max_vswr = 1.6"}, []string{"remove"}, true},
		{"search stopped at a bound", "", &bounded, []string{"stopping at the longest span it tries, 180° (wedge.span_deg)", "wedge.max_vswr = 1.6"}, []string{"remove"}, true},
		{"span given", "\n[wedge]\nspan_deg = 90.0\n", &spanGiven, []string{"the spec sets wedge.span_deg", "remove it", "reaches VSWR 1.45"}, []string{"coil.first_turn_height_mm"}, true},
		{"target met", "\n[wedge]\nmax_vswr = 1.6\n", free, nil, nil, false},
	} {
		t.Run(c.name, func(t *testing.T) {
			d, err := NewDesign(mustParse(t, []byte(base+c.edit)))
			if err != nil {
				t.Fatal(err)
			}
			d.StripSearch = c.search
			w, ok := fieldMatchWarning(d, sol)
			if ok != c.wantWarn {
				t.Fatalf("warning %v (%q), want %v", ok, w.Message, c.wantWarn)
			}
			for _, s := range c.want {
				if !strings.Contains(w.Message, s) {
					t.Errorf("warning %q lacks %q", w.Message, s)
				}
			}
			for _, s := range c.wantNot {
				if strings.Contains(w.Message, s) {
					t.Errorf("warning %q says %q", w.Message, s)
				}
			}
		})
	}
}
