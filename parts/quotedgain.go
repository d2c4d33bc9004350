package parts

import (
	"fmt"
	"math"
	"strings"
)

// QuotedGainSource names where the quoted gain comes from when the field
// solution ran.
const QuotedGainSource = "field solution: realised gain (co-polar peak × (1 − |Γ|²)) at the centre frequency"

// WithField returns a copy of d that carries the field solution f: the
// quoted gain (report, build sheet, EIRP) becomes f's realised gain in dBic;
// the textbook estimates stay as a cross-check. d is not changed.
func (d *Design) WithField(f *FieldSolution) *Design {
	c := *d
	c.Field = f
	c.Warnings = append([]Warning(nil), d.Warnings...)
	if w, ok := fieldMatchWarning(d, f); ok {
		c.Warnings = append(c.Warnings, w)
	}
	if d.EIRP != nil {
		e := *d.EIRP
		e.GainDBic = f.QuotedDBic()
		e.EIRPDBm = EIRP(e.TxPowerDBm, e.FeederLossDB, e.GainDBic)
		e.EIRPmW = DBmToMilliwatt(e.EIRPDBm)
		c.EIRP = &e
		for i, w := range c.Warnings {
			if w.Code == "eirp" {
				c.Warnings[i] = eirpWarning(&e)
			}
		}
	}
	return &c
}

// QuotedGain returns the gain the outputs lead with and where it comes
// from: the field solution's realised gain in dBic when it ran, else the
// textbook estimate.
func (d *Design) QuotedGain() (value float64, source string) {
	if d.Field != nil {
		return d.Field.QuotedDBic(), QuotedGainSource
	}
	return d.Estimates.Gain.Value, d.Estimates.Gain.Formula
}

// eirpWarning is the warning every design with a transmitter power carries.
func eirpWarning(e *EIRPFigure) Warning {
	return Warning{Code: "eirp", Message: fmt.Sprintf("EIRP %.1f dBm (%.0f mW) with this antenna: check the limit that applies where you transmit and under your licence", e.EIRPDBm, e.EIRPmW)}
}

// fieldMatchWarning returns the warning a design carries when the field
// solution, with the spec's reflector model, finds the worst VSWR in the
// band above wedge.max_vswr: the strip was chosen over an ideal ground,
// and the plate or the feed can spoil it. The fix names only strip keys the
// spec sets; when the search chose both, it says what the search reached
// and what held it: a bound of the search (with the key that moves past
// it), or its grid.
func fieldMatchWarning(d *Design, f *FieldSolution) (Warning, bool) {
	w := f.Summary.Worst
	s := d.Spec
	if s.Wedge.MaxVSWR <= 0 || !(w.VSWR > s.Wedge.MaxVSWR) {
		return Warning{}, false
	}
	// The target that this solution meets, rounded up to 0.05.
	accept := fmt.Sprintf("or accept wedge.max_vswr = %s", num(math.Ceil(w.VSWR*20-1e-9)/20))
	r := d.StripSearch
	var given []string
	for _, k := range []string{"wedge.span_deg", "coil.first_turn_height_mm"} {
		if s.Line(k) > 0 {
			given = append(given, k)
		}
	}
	var fix string
	switch {
	case d.CentreFed():
		fix = `set coil.feed = "periphery": a centre feed's radial lead is a line of its own that the strip cannot undo`
	case len(given) > 0:
		keys := strings.Join(given, " and ")
		fix = fmt.Sprintf("the spec sets %s, which the solver keeps; remove it so the solver can choose", keys)
		if len(given) > 1 {
			fix = fmt.Sprintf("the spec sets %s, which the solver keeps; remove them so the solver can choose them", keys)
		}
		if r != nil && r.SuggestedVSWR > 0 && r.SuggestedVSWR < r.WorstVSWR {
			fix += fmt.Sprintf(" (free of them, the search reaches VSWR %.2f over its ideal ground with a %.0f° strip and the first turn %.1f mm up)", r.SuggestedVSWR, r.SuggestedSpanDeg, r.SuggestedHeightMM)
		}
		fix += ", " + accept
	case r == nil:
		fix = "the strip search could not solve any candidate strip, so the line model's strip is used: set wedge.span_deg and coil.first_turn_height_mm by hand and check again, " + accept
	default:
		fix = fmt.Sprintf("the strip search chose both (a %.0f° strip, the first turn %.1f mm up) and reached VSWR %.2f over the ideal ground it searches on", r.SpanDeg, r.FirstTurnHeightMM, r.WorstVSWR)
		if len(r.Limits) > 0 {
			fix += fmt.Sprintf(", stopping at %s: set that key beyond the bound and check again, %s", strings.Join(r.Limits, " and "), accept)
		} else {
			fix += fmt.Sprintf(" at the best point of its grid (%.0f° span steps, ×%s height steps), which the %s reflector moves to VSWR %.2f: set wedge.span_deg between %.0f° and %.0f° or coil.first_turn_height_mm between %.1f and %.1f mm and check again, %s",
				r.SpanStepDeg, num(r.HeightStep), f.Reflector, w.VSWR, r.SpanDeg-r.SpanStepDeg, r.SpanDeg+r.SpanStepDeg, r.FirstTurnHeightMM/r.HeightStep, r.FirstTurnHeightMM*r.HeightStep, accept)
		}
	}
	return Warning{Code: "field-match", Message: fmt.Sprintf("the field solution (%s reflector model) gives VSWR %.2f at %s MHz in the band, above wedge.max_vswr = %s; %s",
		f.Reflector, w.VSWR, num(w.FrequencyMHz), num(s.Wedge.MaxVSWR), fix)}, true
}
