package parts

import "fmt"

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
// and the plate or the feed can spoil it.
func fieldMatchWarning(d *Design, f *FieldSolution) (Warning, bool) {
	w := f.Summary.Worst
	if d.Spec.Wedge.MaxVSWR <= 0 || !(w.VSWR > d.Spec.Wedge.MaxVSWR) {
		return Warning{}, false
	}
	fix := "remove wedge.span_deg and coil.first_turn_height_mm so the solver can choose them, or accept a higher wedge.max_vswr"
	if d.CentreFed() {
		fix = `set coil.feed = "periphery": a centre feed's radial lead is a line of its own that the strip cannot undo`
	}
	return Warning{Code: "field-match", Message: fmt.Sprintf("the field solution (%s reflector model) gives VSWR %.2f at %s MHz in the band, above wedge.max_vswr = %s; %s",
		f.Reflector, w.VSWR, num(w.FrequencyMHz), num(d.Spec.Wedge.MaxVSWR), fix)}, true
}
