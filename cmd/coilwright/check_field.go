package main

import (
	"fmt"
	"io"
	"math"

	"coilwright/parts"
)

// printField prints check's compact field-solution block: matched band,
// gain and axial ratio at the band's edges and centre (parts.BandOf: the
// spec's edges or the centre frequency ± 3 %; one row when the band is a
// single frequency), the worst in-band point and any wide disagreement
// with the textbook estimates.
func printField(w io.Writer, f *parts.FieldSolution) {
	if f == nil {
		fmt.Fprintln(w, "\nfield solution: off (solver.enabled = false); the gain above is the textbook estimate")
		return
	}
	sm := f.Summary
	fmt.Fprintf(w, "\nfield solution (%s reflector, %d unknowns): quoted gain %.1f dBic realised at %.1f MHz\n", f.Reflector, f.Unknowns, f.QuotedDBic(), f.Centre.FrequencyMHz)
	fmt.Fprintf(w, "  VSWR ≤ 2:   %s\n", sm.Matched.Text())
	fmt.Fprintf(w, "  VSWR ≤ 1.5: %s\n", sm.Good.Text())
	fmt.Fprintln(w, "  MHz        Z in Ω             VSWR   realised dBic  axis AR dB")
	rows := []parts.FieldFigures{sm.Low, sm.Centre, sm.High}
	if sm.BandLowMHz == sm.BandHighMHz {
		rows = rows[1:2]
	}
	for _, b := range rows {
		fmt.Fprintf(w, "  %-9.1f  %6.1f %+7.1fj      %5.2f  %13.1f  %10.1f\n", b.FrequencyMHz, b.ResistanceOhm, b.ReactanceOhm, b.VSWR, b.RealisedDBic, b.AxialRatioDB)
	}
	if sm.BandLowMHz == sm.BandHighMHz {
		fmt.Fprintf(w, "  the band is the one frequency %.1f MHz: VSWR %.2f there\n", sm.BandLowMHz, sm.Worst.VSWR)
	} else {
		fmt.Fprintf(w, "  worst in band: VSWR %.2f at %.1f MHz\n", sm.Worst.VSWR, sm.Worst.FrequencyMHz)
	}
	if sm.LargeDisagreement {
		fmt.Fprintf(w, "  textbook disagrees: gain %.1f dBic vs solver peak %.1f dBic (%+.1f dB); input resistance %.0f Ω vs %.0f Ω\n",
			sm.TextbookGainDBic, f.Centre.PeakCoPolarDBic(f.RHCP), sm.GainDifferenceDB, sm.TextbookInputOhm, f.Centre.ResistanceOhm)
	}
	if f.Centre.Efficiency < 0.9 && !math.IsNaN(f.Centre.Efficiency) {
		fmt.Fprintf(w, "  radiation efficiency only %.0f %% (conductor loss)\n", 100*f.Centre.Efficiency)
	}
}
