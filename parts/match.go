// The match across the band: the matching strip's line model evaluated at
// each frequency of the band, and the strip's span sized to the spec's
// VSWR target.
//
// Line model (first order, stated in the report): the feed cable (50 Ω)
// looks into the centre feed's horizontal lead, if any, a uniform line of a
// round wire over the reflector, then the strip as cut (its Hammerstad–
// Jensen impedances station by station), ending in the coil's input
// resistance by Kraus's formula on the first turn's circumference at that
// frequency. The reflection is summed by the theory of small reflections
// with the round-trip phase at that frequency's wavelength. The vertical
// part of the lead and the coil's reactance are not in this model; the
// field solver (matchsolve.go) models both.

package parts

import (
	"fmt"
	"math"
	"math/cmplx"

	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/spec"
)

// MatchPoints is the number of frequencies across the band the match is
// evaluated at, band edges included.
const MatchPoints = 7

// DefaultBandFraction is the half-width of the band, as a fraction of the
// centre frequency, when the spec gives no band edges. Common practice (no
// published source).
const DefaultBandFraction = 0.03

// The spans the strip is sized from when the spec does not give one,
// degrees: MinSizedSpanDeg to MaxSizedSpanDeg in SpanStepDeg steps.
// Common practice (no published source): shorter than about a sixth of a
// turn the strip is too short to taper; longer than a turn it runs under
// the second turn.
const (
	MinSizedSpanDeg = 60.0
	MaxSizedSpanDeg = 360.0
	SpanStepDeg     = 15.0
)

// MatchPoint is the match at one frequency.
type MatchPoint struct {
	FrequencyMHz float64 `json:"frequency_mhz"`
	LoadOhm      float64 `json:"load_ohm,omitempty"` // line model: the coil's input resistance there
	ZRe          float64 `json:"z_re_ohm,omitempty"` // solver: input impedance
	ZIm          float64 `json:"z_im_ohm,omitempty"`
	Reflection   float64 `json:"reflection"`
	VSWR         float64 `json:"vswr"`
}

// Band is the band a design is matched for and judged over, MHz: the one
// definition the strip's sizing, the field solution's summary, the
// tolerance analysis, check, design.md and the build sheet share.
type Band struct {
	LowMHz, HighMHz float64
	// LowGiven and HighGiven say the spec sets band_low_mhz and
	// band_high_mhz; an edge it leaves out is the centre frequency ∓
	// DefaultBandFraction.
	LowGiven, HighGiven bool
}

// BandOf returns the band of spec s: each edge the spec gives, the other
// the centre frequency ∓ DefaultBandFraction.
func BandOf(s *spec.Spec) Band {
	b := Band{LowMHz: s.FrequencyMHz * (1 - DefaultBandFraction), HighMHz: s.FrequencyMHz * (1 + DefaultBandFraction)}
	if s.BandLowMHz != nil {
		b.LowMHz, b.LowGiven = *s.BandLowMHz, true
	}
	if s.BandHighMHz != nil {
		b.HighMHz, b.HighGiven = *s.BandHighMHz, true
	}
	return b
}

// BandMHz returns the edges of BandOf(s) in MHz.
func BandMHz(s *spec.Spec) (lo, hi float64) {
	b := BandOf(s)
	return b.LowMHz, b.HighMHz
}

// Text says the band for reports and the build sheet: "5650–5950 MHz"
// when the spec gives both edges, else with where the default edges come
// from, e.g. "12000 MHz ± 3 % (11640–12360 MHz; the spec sets no
// band_low_mhz or band_high_mhz)". f0 is the centre frequency, MHz.
func (b Band) Text(f0 float64) string {
	edges := fmt.Sprintf("%s–%s MHz", num(b.LowMHz), num(b.HighMHz))
	pct := num(100 * DefaultBandFraction)
	switch {
	case b.LowGiven && b.HighGiven:
		return edges
	case b.LowGiven:
		return fmt.Sprintf("%s (band_high_mhz not set: frequency_mhz + %s %%)", edges, pct)
	case b.HighGiven:
		return fmt.Sprintf("%s (band_low_mhz not set: frequency_mhz − %s %%)", edges, pct)
	}
	return fmt.Sprintf("%s MHz ± %s %% (%s; the spec sets no band_low_mhz or band_high_mhz)", num(f0), pct, edges)
}

// bandFrequencies returns MatchPoints frequencies in MHz evenly across the
// band, edges included.
func bandFrequencies(s *spec.Spec) []float64 {
	lo, hi := BandMHz(s)
	f := make([]float64, MatchPoints)
	for i := range f {
		f[i] = lo + (hi-lo)*float64(i)/float64(MatchPoints-1)
	}
	return f
}

// WireOverGroundOhm returns the characteristic impedance of a round wire
// of radius a whose centre is h above a ground plane (h > a), in ohms:
// (η0/2π)·acosh(h/a), half the two-wire line of spacing 2h by image
// theory. Source: Pozar, Microwave Engineering, 4th ed., Table 2.1
// (two-wire line, L = (μ/π)·acosh(D/2a), C = πε/acosh(D/2a)).
func WireOverGroundOhm(h, a float64) float64 {
	return spec.FreeSpaceImpedance / (2 * math.Pi) * math.Acosh(h/a)
}

// lineProfileSamples is the number of sections the lead and strip are cut
// into for the small-reflection sum.
const lineProfileSamples = 400

// lineMatch evaluates the line model of strip w (with the centre feed's
// horizontal lead in front of it when lead.Run > 0) across freqs (MHz).
func lineMatch(d *Design, w *flat.Wedge, freqs []float64) []MatchPoint {
	a := d.Spec.Wire.DiameterMM / 2
	zLead := 0.0
	rise := stripFeedHeight(d, w)
	if d.FeedRun() > 0 && rise > a {
		zLead = WireOverGroundOhm(rise, a)
	}
	run := 0.0
	if zLead > 0 {
		run = d.FeedRun()
	}
	total := run + w.Length
	prof := make([]float64, lineProfileSamples+1)
	for i := range prof {
		s := total * float64(i) / lineProfileSamples
		if s < run {
			prof[i] = zLead
			continue
		}
		prof[i] = impedanceAt(w, s-run)
	}
	first := d.Turns[0].DiameterMM * math.Pi
	out := make([]MatchPoint, len(freqs))
	for i, f := range freqs {
		lambda := spec.Wavelength(f)
		zl := KrausInputResistance(first/lambda, !d.CentreFed())
		g := cmplx.Abs(line.Reflection(spec.WedgeFeedOhm, zl, prof, 2*math.Pi*total/lambda))
		out[i] = MatchPoint{FrequencyMHz: f, LoadOhm: zl, Reflection: g, VSWR: line.VSWR(math.Min(g, 0.999999))}
	}
	return out
}

// impedanceAt interpolates the realised impedance of strip w at arc length s
// from its feed end.
func impedanceAt(w *flat.Wedge, s float64) float64 {
	st := w.Stations
	for j := 1; j < len(st); j++ {
		if s <= st[j].S || j == len(st)-1 {
			f := (s - st[j-1].S) / (st[j].S - st[j-1].S)
			f = math.Min(1, math.Max(0, f))
			return st[j-1].Ohm + f*(st[j].Ohm-st[j-1].Ohm)
		}
	}
	return st[0].Ohm
}

// WorstVSWR returns the largest VSWR of pts.
func WorstVSWR(pts []MatchPoint) float64 {
	worst := 0.0
	for _, p := range pts {
		worst = math.Max(worst, p.VSWR)
	}
	return worst
}

// sizeWedge returns the strip for d: at the spec's span when it gives one,
// else the shortest span from MinSizedSpanDeg that meets max_vswr across
// the band on the line model (the span with the lowest worst VSWR when
// none does). It also returns the line model's band figures and a warning
// when the target is not met.
func sizeWedge(d *Design, zl float64) (*flat.Wedge, []MatchPoint, *Warning, error) {
	s := d.Spec
	freqs := bandFrequencies(s)
	in := flat.WedgeInput{
		Path:         d.Coil.Point,
		WireDiameter: s.Wire.DiameterMM,
		Thickness:    s.Wedge.ThicknessMM,
		Wavelength:   d.Wavelength,
		Taper:        wedgeTaper(&s.Wedge, zl),
	}
	spans := []float64{s.Wedge.SpanDeg}
	if s.Wedge.SolvedSpanDeg > 0 {
		spans = []float64{s.Wedge.SolvedSpanDeg}
	} else if s.Line("wedge.span_deg") == 0 {
		spans = nil
		for sp := MinSizedSpanDeg; sp <= MaxSizedSpanDeg+1e-9; sp += SpanStepDeg {
			spans = append(spans, sp)
		}
	}
	var best *flat.Wedge
	var bestPts []MatchPoint
	var firstErr error
	for _, sp := range spans {
		in.Span = sp * math.Pi / 180
		w, err := flat.NewWedge(in)
		if err != nil {
			if firstErr == nil {
				firstErr = err
			}
			continue
		}
		pts := lineMatch(d, w, freqs)
		if best == nil || WorstVSWR(pts) < WorstVSWR(bestPts) {
			best, bestPts = w, pts
		}
		if WorstVSWR(pts) <= s.Wedge.MaxVSWR {
			best, bestPts = w, pts
			break
		}
	}
	if best == nil {
		return nil, nil, nil, firstErr
	}
	if wv := WorstVSWR(bestPts); wv > s.Wedge.MaxVSWR {
		lo, hi := BandMHz(s)
		fix := "lengthen the strip (wedge.span_deg), narrow the band, or accept a higher wedge.max_vswr"
		if rise := stripFeedHeight(d, best); d.CentreFed() && rise > s.Wire.DiameterMM/2 {
			fix = fmt.Sprintf("the centre feed's horizontal lead, %.1f mm of wire %.2f mm above the plate, is a %.0f Ω line between the 50 Ω cable and the strip, which no strip behind it undoes: set coil.feed = \"periphery\" so the strip starts at the feed, or accept a higher wedge.max_vswr",
				d.FeedRun(), rise, WireOverGroundOhm(rise, s.Wire.DiameterMM/2))
		} else if s.Line("wedge.span_deg") == 0 {
			fix = "no strip span from 60° to 360° meets it: change the first turn's height (coil.first_turn_height_mm), try taper = \"klopfenstein\", narrow the band, or accept a higher wedge.max_vswr"
		}
		return best, bestPts, &Warning{Code: "match", Message: fmt.Sprintf("the matching strip's line model reaches VSWR %.2f at worst across %s–%s MHz, above wedge.max_vswr = %s; %s",
			wv, num(lo), num(hi), num(s.Wedge.MaxVSWR), fix)}, nil
	}
	return best, bestPts, nil, nil
}

// stripFeedHeight returns the height above the plate at which candidate
// strip w starts: the height of the feed lead's horizontal run, the same
// point StripCentreline gives once w is the design's strip.
func stripFeedHeight(d *Design, w *flat.Wedge) float64 {
	if len(w.Stations) == 0 {
		return d.FeedRise()
	}
	return w.Stations[0].Height + d.Spec.Wedge.ThicknessMM/2
}
