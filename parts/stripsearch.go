// The matching strip as the whole-antenna solution chose it: the values the
// search settled on and the worst in-band VSWR before and after, on the
// line model and on the field solution.

package parts

// StripSearch records the field solver's search for the matching strip.
type StripSearch struct {
	// SpanDeg and FirstTurnHeightMM are the values the search chose;
	// SpanGiven and HeightGiven say the spec fixed them (kept, not
	// searched).
	SpanDeg           float64 `json:"span_deg"`
	FirstTurnHeightMM float64 `json:"first_turn_height_mm"`
	SpanGiven         bool    `json:"span_given"`
	HeightGiven       bool    `json:"height_given"`
	// SuggestedSpanDeg and SuggestedHeightMM are the best values the
	// search found when it could move the given ones too (equal to the
	// chosen values when nothing was given).
	SuggestedSpanDeg  float64 `json:"suggested_span_deg"`
	SuggestedHeightMM float64 `json:"suggested_first_turn_height_mm"`
	SuggestedVSWR     float64 `json:"suggested_worst_vswr"`
	// StartVSWR is the worst in-band VSWR of the line model's strip on the
	// search's model (ideal ground); WorstVSWR that of the chosen strip.
	StartVSWR float64 `json:"start_worst_vswr"`
	WorstVSWR float64 `json:"worst_vswr"`
	// Limits names the search's bounds the chosen values sit on (each
	// with the spec key that moves past it); empty when the search stopped
	// between its bounds, at the best point of its grid.
	Limits []string `json:"limits,omitempty"`
	// SpanStepDeg and HeightStep are the search's grid: the span's step in
	// degrees and the first turn's height factor per step.
	SpanStepDeg float64 `json:"span_step_deg,omitempty"`
	HeightStep  float64 `json:"height_step,omitempty"`
	// Evaluations is the number of field solutions the search ran.
	Evaluations int `json:"evaluations"`
	// Model states the search's model.
	Model string `json:"model"`
}
