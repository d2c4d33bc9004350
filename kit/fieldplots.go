package kit

import (
	"fmt"
	"math"

	"coilwright/parts"
)

// fieldElectrical returns the curves of the design's field solution: the
// sweep's own frequencies and the solver's two centre-frequency cuts.
// Without cuts in the solution (an axis-only solve) the pattern falls back
// to the textbook cuts, and CutNote says so.
func fieldElectrical(d *parts.Design) *electrical {
	f := d.Field
	_, _, b := plotRange(d)
	model := "plate reflector model"
	if f.Reflector == "ideal" {
		model = "ideal ground model"
	}
	e := &electrical{
		Source:     fmt.Sprintf("Field solution (method of moments, %s, %d unknowns)", model, f.Unknowns),
		Short:      "Field solution, " + model,
		Band:       b,
		TargetVSWR: targetVSWR(d),
	}
	for _, p := range f.Points {
		e.FreqMHz = append(e.FreqMHz, p.FrequencyMHz)
		e.VSWR = append(e.VSWR, p.VSWR)
		e.ReturnLossDB = append(e.ReturnLossDB, p.ReturnLossDB)
		e.RHCPDBic = append(e.RHCPDBic, p.AxisRHCPDBic)
		e.LHCPDBic = append(e.LHCPDBic, p.AxisLHCPDBic)
		e.AxialRatioDB = append(e.AxialRatioDB, p.AxialRatioDB)
	}
	e.LowMHz, e.HighMHz = e.FreqMHz[0], e.FreqMHz[len(e.FreqMHz)-1]
	if e.HighMHz <= e.LowMHz { // a one-point sweep: widen it to the textbook range
		e.LowMHz, e.HighMHz, _ = plotRange(d)
	}
	if len(f.Cuts) == 0 {
		tb := textbookElectrical(d)
		e.CentreMHz, e.Cuts = tb.CentreMHz, tb.Cuts
		e.CutNote = "The field solution was run on the axis only: the pattern cuts are the textbook estimate. " + tb.CutNote
		return e
	}
	e.CentreMHz = f.Centre.FrequencyMHz
	for _, c := range f.Cuts {
		pc := patternCut{Name: fmt.Sprintf("φ = %s° plane", num(c.PhiDeg))}
		for _, s := range c.Samples {
			pc.AngleRad = append(pc.AngleRad, s.ThetaDeg*math.Pi/180)
			pc.RHCPDBic = append(pc.RHCPDBic, s.RHCPDBic)
			pc.LHCPDBic = append(pc.LHCPDBic, s.LHCPDBic)
		}
		e.Cuts = append(e.Cuts, pc)
	}
	if f.Reflector == "ideal" {
		e.CutNote = "Cuts of the field solution at the centre frequency over an ideal infinite ground plane: nothing radiates behind it, so the rear half is empty."
	} else {
		e.CutNote = "Cuts of the field solution at the centre frequency with the reflector plate modelled as a wire grid, the back lobe included."
	}
	return e
}
