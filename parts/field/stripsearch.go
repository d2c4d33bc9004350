package field

import (
	"fmt"
	"math"

	"coilwright/parts"
	"coilwright/parts/spec"
)

// Strip search bounds. Common practice (no published source): the strip
// covers 60°–180° of the first turn, and the first turn's height is moved
// within ±40 % of its default, never closer to the plate than one wire
// diameter.
const (
	searchMinSpanDeg   = 60.0
	searchMaxSpanDeg   = 180.0
	searchSpanStepDeg  = 30.0
	searchHeightStep   = 1.2 // height factor per step
	searchHeightRange  = 1.4 // the farthest factor from the start
	searchRounds       = 3
	searchFrequencies  = 3 // band edges and centre
	searchImprovedVSWR = 1e-3
)

// The search keeps descending after the target is met on the ideal ground:
// the plate's final sweep sits a little above or below it.

// StripSearchModel states the model the strip search uses.
const StripSearchModel = "Whole antenna over an ideal ground (image theory), on-axis figures only, at the band's edges and centre; coordinate search over the strip's span (30° steps, 60°–180°) and the first turn's height (×1.2 steps within ±40 % of the default, at least one wire diameter), keeping values the spec gives; the chosen strip is then solved with the spec's reflector model in the normal sweep."

// SearchStrip chooses the matching strip's span and the first turn's
// height for s by the whole-antenna solution: it returns a copy of s with
// the chosen values set and the search's record. Values the spec gives
// (wedge.span_deg, coil.first_turn_height_mm) are kept; the record says
// what the search would choose without them.
func SearchStrip(s *spec.Spec) (*spec.Spec, *parts.StripSearch, error) {
	lo, hi := parts.BandMHz(s)
	fs := make([]float64, searchFrequencies)
	for i := range fs {
		fs[i] = lo + (hi-lo)*float64(i)/float64(searchFrequencies-1)
	}
	base, err := parts.NewDesign(s)
	if err != nil {
		return nil, nil, err
	}
	h0 := base.Coil.Z0
	sp0 := base.Patterns.Wedge.Span * 180 / math.Pi
	rec := &parts.StripSearch{SpanGiven: s.Line("wedge.span_deg") > 0, HeightGiven: s.Line("coil.first_turn_height_mm") > 0, Model: StripSearchModel}
	solveCandidate := func(sp, h float64) float64 {
		c := *s
		c.Wedge.SolvedSpanDeg = sp
		c.Coil.FirstTurnHeightMM = &h
		d, err := parts.NewDesign(&c)
		if err != nil {
			return math.Inf(1)
		}
		rec.Evaluations++
		r, err := Sweep(d, Options{Reflector: IdealGround, FrequenciesMHz: fs, AxisOnly: true})
		if err != nil {
			return math.Inf(1)
		}
		w := 0.0
		for _, p := range r.Points {
			w = math.Max(w, p.VSWR)
		}
		return w
	}
	// A coordinate search returns to candidates it has solved (a round
	// that moved only one coordinate retries the other's neighbours): each
	// candidate is solved once.
	seen := map[[2]float64]float64{}
	worst := func(sp, h float64) float64 {
		if w, ok := seen[[2]float64{sp, h}]; ok {
			return w
		}
		w := solveCandidate(sp, h)
		seen[[2]float64{sp, h}] = w
		return w
	}
	rec.StartVSWR = worst(sp0, h0)
	// search runs a coordinate descent from (sp0, h0), moving the span
	// when moveSpan and the height when moveHeight.
	search := func(moveSpan, moveHeight bool) (float64, float64, float64) {
		sp, h, v := sp0, h0, rec.StartVSWR
		for range searchRounds {
			moved := false
			if moveSpan {
				for _, d := range []float64{-searchSpanStepDeg, searchSpanStepDeg} {
					for c := sp + d; c >= searchMinSpanDeg-1e-9 && c <= searchMaxSpanDeg+1e-9; c += d {
						w := worst(c, h)
						if w >= v-searchImprovedVSWR {
							break
						}
						sp, v, moved = c, w, true
					}
				}
			}
			if moveHeight {
				for _, f := range []float64{1 / searchHeightStep, searchHeightStep} {
					for c := h * f; c >= h0/searchHeightRange-1e-9 && c <= h0*searchHeightRange+1e-9 && c >= s.Wire.DiameterMM; c *= f {
						c = math.Round(c*10) / 10
						w := worst(sp, c)
						if w >= v-searchImprovedVSWR {
							break
						}
						h, v, moved = c, w, true
					}
				}
			}
			if !moved {
				break
			}
		}
		return sp, h, v
	}
	sp, h, v := search(!rec.SpanGiven, !rec.HeightGiven)
	if math.IsInf(v, 1) {
		return s, nil, nil // no candidate could be solved: keep the line model's strip
	}
	if math.IsInf(rec.StartVSWR, 1) {
		rec.StartVSWR = 0 // the line model's strip could not be solved
	}
	rec.SpanDeg, rec.FirstTurnHeightMM, rec.WorstVSWR = sp, h, v
	rec.SpanStepDeg, rec.HeightStep = searchSpanStepDeg, searchHeightStep
	rec.Limits = searchLimits(s, rec, h0)
	rec.SuggestedSpanDeg, rec.SuggestedHeightMM, rec.SuggestedVSWR = sp, h, v
	if (rec.SpanGiven || rec.HeightGiven) && v > s.Wedge.MaxVSWR {
		if a, b, c := search(true, true); !math.IsInf(c, 1) {
			rec.SuggestedSpanDeg, rec.SuggestedHeightMM, rec.SuggestedVSWR = a, b, c
		}
	}
	c := *s
	if !rec.SpanGiven {
		c.Wedge.SolvedSpanDeg = sp
	}
	if !rec.HeightGiven {
		c.Coil.FirstTurnHeightMM = &h
	}
	return &c, rec, nil
}

// searchLimits names the bounds of the search that the chosen values of
// rec sit on: the span's ends, and the first turn's lowest (one wire
// diameter or −40 % of the default h0) and highest (+40 %) heights.
// Values the spec gives are not searched and have no bound.
func searchLimits(s *spec.Spec, rec *parts.StripSearch, h0 float64) []string {
	var out []string
	const eps = 1e-9
	if !rec.SpanGiven {
		switch {
		case rec.SpanDeg <= searchMinSpanDeg+eps:
			out = append(out, fmt.Sprintf("the shortest span it tries, %.0f° (wedge.span_deg)", searchMinSpanDeg))
		case rec.SpanDeg >= searchMaxSpanDeg-eps:
			out = append(out, fmt.Sprintf("the longest span it tries, %.0f° (wedge.span_deg)", searchMaxSpanDeg))
		}
	}
	if !rec.HeightGiven {
		h := rec.FirstTurnHeightMM
		// The next steps the search would take (it rounds after
		// checking the bounds).
		lower := h / searchHeightStep
		switch {
		case lower < s.Wire.DiameterMM:
			out = append(out, fmt.Sprintf("the lowest first turn it tries, one wire diameter above the plate (%s mm; coil.first_turn_height_mm)", num(s.Wire.DiameterMM)))
		case lower < h0/searchHeightRange-eps:
			out = append(out, fmt.Sprintf("the lowest first turn it tries, %.0f %% below the default %s mm (coil.first_turn_height_mm)", 100*(1-1/searchHeightRange), num(h0)))
		case h*searchHeightStep > h0*searchHeightRange+eps:
			out = append(out, fmt.Sprintf("the highest first turn it tries, %.0f %% above the default %s mm (coil.first_turn_height_mm)", 100*(searchHeightRange-1), num(h0)))
		}
	}
	return out
}

// StripSearchWarning returns the warning for a search that did not reach
// the target, with a concrete fix, or nil.
func StripSearchWarning(s *spec.Spec, r *parts.StripSearch) *parts.Warning {
	if r == nil || r.WorstVSWR <= s.Wedge.MaxVSWR {
		return nil
	}
	fix := "no strip span (60°–180°) or first-turn height within ±40 % meets it: accept a higher wedge.max_vswr, narrow the band, or add a quarter-wave transformer in the cable"
	if s.Coil.Feed == "centre" {
		fix = "set coil.feed = \"periphery\" (the centre feed's horizontal lead is a high-impedance line in front of the strip), or " + fix
	}
	if given := givenStripKeys(r); given != "" && r.SuggestedVSWR < r.WorstVSWR-searchImprovedVSWR {
		fix = fmt.Sprintf("remove the given %s or set span_deg = %.0f and first_turn_height_mm = %.1f (worst VSWR %.2f on the same model)", given, r.SuggestedSpanDeg, r.SuggestedHeightMM, r.SuggestedVSWR)
	}
	return &parts.Warning{Code: "match", Message: fmt.Sprintf("the whole-antenna solution's best matching strip (span %.0f°, first turn %.1f mm up) reaches VSWR %.2f at worst in the band over an ideal ground, above wedge.max_vswr = %g; %s",
		r.SpanDeg, r.FirstTurnHeightMM, r.WorstVSWR, s.Wedge.MaxVSWR, fix)}
}

// givenStripKeys names the strip keys the spec gives ("" for none).
func givenStripKeys(r *parts.StripSearch) string {
	switch {
	case r.SpanGiven && r.HeightGiven:
		return "wedge.span_deg and coil.first_turn_height_mm"
	case r.SpanGiven:
		return "wedge.span_deg"
	case r.HeightGiven:
		return "coil.first_turn_height_mm"
	}
	return ""
}
