package kit

import (
	"math"

	"coilwright/parts"
)

// electrical is what the electrical plots and the report draw: the match,
// the gain of each circular component and the axial ratio across a
// frequency range, and two pattern cuts at the band centre, with where
// they came from.
type electrical struct {
	// Estimate is true for the textbook estimates, false for a field
	// solution.
	Estimate bool
	// Source says where the curves came from, in a line under each plot's
	// title.
	Source string
	// Short is Source in a few words, for notes under narrow plots.
	Short string

	LowMHz, HighMHz float64 // the plotted frequency range
	Band            *band   // the design's band (parts.BandOf); nil for no band
	TargetVSWR      float64 // the matching target drawn on the match plot

	FreqMHz      []float64
	VSWR         []float64
	ReturnLossDB []float64
	RHCPDBic     []float64
	LHCPDBic     []float64
	AxialRatioDB []float64

	CentreMHz float64      // where the pattern cuts are taken
	Cuts      []patternCut // two cuts through the axis
	CutNote   string       // how the cuts were made
}

// band is the design's operating band.
type band struct {
	LowMHz, HighMHz float64
	Text            string // parts.Band.Text
}

// patternCut is one plane through the coil's axis: the level of each
// circular component against the angle from the axis, −π to π.
type patternCut struct {
	Name     string // "φ = 0° plane"
	AngleRad []float64
	RHCPDBic []float64
	LHCPDBic []float64
}

// targetVSWR is the match drawn as the target on every electrical plot,
// the build sheet's band figure and the report's matched band: the worst
// VSWR across the band the matching strip is sized for ([wedge] max_vswr).
// This is the one place that picks the target for d.
func targetVSWR(d *parts.Design) float64 {
	return d.Spec.Wedge.MaxVSWR
}

// Sweep sampling of the plotted range and the pattern cuts.
const (
	sweepPoints   = 121
	patternPoints = 361
	// patternFloorDB is how far below the peak the pattern plots go.
	patternFloorDB = 40
	// rangeMargin is the least share of the centre frequency plotted on
	// each side of it, and bandMargin the share of the band's width
	// plotted beyond each band edge.
	rangeMargin = 0.05
	bandMargin  = 0.5
)

// plotRange returns the frequency range the electrical plots cover and the
// design's band (parts.BandOf: the spec's edges, or the centre frequency
// ± 3 %): the band widened by half its width on each side, and at least
// ±5 % of the centre frequency.
func plotRange(d *parts.Design) (lo, hi float64, b *band) {
	f0 := d.Spec.FrequencyMHz
	lo, hi = f0*(1-rangeMargin), f0*(1+rangeMargin)
	s := d.Spec
	pb := parts.BandOf(s)
	b = &band{LowMHz: pb.LowMHz, HighMHz: pb.HighMHz, Text: pb.Text(f0)}
	w := b.HighMHz - b.LowMHz
	lo, hi = math.Min(lo, b.LowMHz-bandMargin*w), math.Max(hi, b.HighMHz+bandMargin*w)
	return lo, hi, b
}

// centre returns the band centre, or the design frequency without a band.
func (e *electrical) centre(f0 float64) float64 {
	if e.Band != nil {
		return (e.Band.LowMHz + e.Band.HighMHz) / 2
	}
	return f0
}

// textbookElectrical evaluates the textbook estimates of d over the plot
// range.
func textbookElectrical(d *parts.Design) *electrical {
	lo, hi, b := plotRange(d)
	e := &electrical{Estimate: true, LowMHz: lo, HighMHz: hi, Band: b, TargetVSWR: targetVSWR(d),
		Source: "Textbook estimate (Kraus, Pozar), not a field solution", Short: "Textbook estimate"}
	e.FreqMHz = make([]float64, sweepPoints)
	for i := range e.FreqMHz {
		e.FreqMHz[i] = lo + (hi-lo)*float64(i)/float64(sweepPoints-1)
	}
	for _, p := range d.TextbookSweep(e.FreqMHz) {
		e.VSWR = append(e.VSWR, p.VSWR)
		e.ReturnLossDB = append(e.ReturnLossDB, p.ReturnLossDB)
		e.RHCPDBic = append(e.RHCPDBic, p.RHCPDBic)
		e.LHCPDBic = append(e.LHCPDBic, p.LHCPDBic)
		e.AxialRatioDB = append(e.AxialRatioDB, p.AxialRatioDB)
	}
	e.CentreMHz = e.centre(d.Spec.FrequencyMHz)
	angles := make([]float64, patternPoints)
	for i := range angles {
		angles[i] = -math.Pi + 2*math.Pi*float64(i)/float64(patternPoints-1)
	}
	r, l := d.TextbookPattern(e.CentreMHz, angles, patternFloorDB)
	// The reflector stops the coil radiating backwards, which the free
	// helix's array pattern knows nothing of: the estimate covers the
	// forward half only.
	for i, a := range angles {
		if math.Abs(a) > math.Pi/2+1e-9 {
			r[i], l[i] = math.NaN(), math.NaN()
		}
	}
	for _, name := range []string{"φ = 0° plane", "φ = 90° plane"} {
		e.Cuts = append(e.Cuts, patternCut{Name: name, AngleRad: angles, RHCPDBic: r, LHCPDBic: l})
	}
	e.CutNote = "The textbook pattern is the same in every plane through the axis and covers the forward half only (the reflector's effect is not modelled); the axial ratio is held at its on-axis value."
	return e
}

// matchedBand returns the contiguous range around the centre frequency
// where the VSWR is at most the target, its edges interpolated between
// samples, and whether there is one. An edge at the end of the plotted
// range means the match holds beyond it.
func (e *electrical) matchedBand(f0 float64) (lo, hi float64, ok bool) {
	i0 := 0
	for i, f := range e.FreqMHz {
		if math.Abs(f-f0) < math.Abs(e.FreqMHz[i0]-f0) {
			i0 = i
		}
	}
	if !(e.VSWR[i0] <= e.TargetVSWR) {
		return 0, 0, false
	}
	cross := func(i, j int) float64 { // interpolate the target between samples i and j
		a, b := e.VSWR[i], e.VSWR[j]
		return e.FreqMHz[i] + (e.TargetVSWR-a)/(b-a)*(e.FreqMHz[j]-e.FreqMHz[i])
	}
	lo, hi = e.FreqMHz[0], e.FreqMHz[len(e.FreqMHz)-1]
	for i := i0; i > 0; i-- {
		if !(e.VSWR[i-1] <= e.TargetVSWR) {
			lo = cross(i, i-1)
			break
		}
	}
	for i := i0; i < len(e.FreqMHz)-1; i++ {
		if !(e.VSWR[i+1] <= e.TargetVSWR) {
			hi = cross(i, i+1)
			break
		}
	}
	return lo, hi, true
}
