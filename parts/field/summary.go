package field

import (
	"math"

	"coilwright/parts"
)

// Matched-band limits. Common practice (no published source): VSWR 2
// (about 11 % of the power reflected) is the usual acceptance limit, 1.5
// a good match.
const (
	MatchedVSWR = 2.0
	GoodVSWR    = 1.5
)

// Disagreement thresholds between the solver and the textbook estimates.
// Common practice (no published source): the closed forms are quoted to
// about ±1 dB in gain and ±20 % in input resistance (DOMAIN.md §2); beyond
// twice that the report points it out.
const (
	GainDisagreementDB  = 2.0
	ResistanceDisagrees = 0.4
)

// summarise works out the Summary of r for design d.
func summarise(r *Result, d *parts.Design) Summary {
	s := d.Spec
	var sm Summary
	sm.BandLowMHz, sm.BandHighMHz = parts.BandMHz(s)
	sm.Matched = matchedRange(r.Points, MatchedVSWR, sm.BandLowMHz, sm.BandHighMHz)
	sm.Good = matchedRange(r.Points, GoodVSWR, sm.BandLowMHz, sm.BandHighMHz)
	fig := func(f float64) BandFigures { return figuresAt(r.Points, f, r.RHCP) }
	sm.Low, sm.High = fig(sm.BandLowMHz), fig(sm.BandHighMHz)
	sm.Centre = pointFigures(r.Centre, r.RHCP)
	sm.Worst = sm.Low
	for _, c := range append([]BandFigures{sm.Centre, sm.High}, inBand(r.Points, sm.BandLowMHz, sm.BandHighMHz, r.RHCP)...) {
		if c.VSWR > sm.Worst.VSWR {
			sm.Worst = c
		}
	}
	e := d.Estimates
	sm.TextbookGainDBic = e.Gain.Value
	sm.TextbookHPBWDeg = e.HPBW.Value
	sm.TextbookARDB = 20 * math.Log10(e.AxialRatio.Value)
	sm.TextbookInputOhm = e.InputResistance.Value
	if r.Centre.PeakCoPolarDBic(r.RHCP) != 0 {
		sm.GainDifferenceDB = r.Centre.PeakCoPolarDBic(r.RHCP) - sm.TextbookGainDBic
	}
	if sm.TextbookInputOhm > 0 {
		sm.ResistanceRatio = r.Centre.ResistanceOhm / sm.TextbookInputOhm
	}
	sm.LargeDisagreement = math.Abs(sm.GainDifferenceDB) > GainDisagreementDB || math.Abs(sm.ResistanceRatio-1) > ResistanceDisagrees
	return sm
}

func pointFigures(p Point, rhcp bool) BandFigures {
	return BandFigures{FrequencyMHz: p.FrequencyMHz, ResistanceOhm: p.ResistanceOhm, ReactanceOhm: p.ReactanceOhm,
		VSWR: p.VSWR, AxisDBic: p.AxisCoPolarDBic(rhcp), RealisedDBic: p.RealisedDBic, AxialRatioDB: p.AxialRatioDB}
}

// figuresAt interpolates the sweep linearly at f (MHz), holding the end
// values outside it.
func figuresAt(pts []Point, f float64, rhcp bool) BandFigures {
	if f <= pts[0].FrequencyMHz {
		return pointFigures(pts[0], rhcp)
	}
	for i := 1; i < len(pts); i++ {
		if f <= pts[i].FrequencyMHz {
			a, b := pointFigures(pts[i-1], rhcp), pointFigures(pts[i], rhcp)
			t := (f - a.FrequencyMHz) / (b.FrequencyMHz - a.FrequencyMHz)
			l := func(x, y float64) float64 { return x + t*(y-x) }
			return BandFigures{FrequencyMHz: f, ResistanceOhm: l(a.ResistanceOhm, b.ResistanceOhm), ReactanceOhm: l(a.ReactanceOhm, b.ReactanceOhm),
				VSWR: l(a.VSWR, b.VSWR), AxisDBic: l(a.AxisDBic, b.AxisDBic), RealisedDBic: l(a.RealisedDBic, b.RealisedDBic), AxialRatioDB: l(a.AxialRatioDB, b.AxialRatioDB)}
		}
	}
	return pointFigures(pts[len(pts)-1], rhcp)
}

// inBand returns the sweep points strictly inside [lo, hi].
func inBand(pts []Point, lo, hi float64, rhcp bool) []BandFigures {
	var out []BandFigures
	for _, p := range pts {
		if p.FrequencyMHz > lo && p.FrequencyMHz < hi {
			out = append(out, pointFigures(p, rhcp))
		}
	}
	return out
}

// matchedRange returns the widest run of sweep points with VSWR ≤ limit,
// its edges interpolated linearly where the VSWR crosses the limit.
func matchedRange(pts []Point, limit, bandLo, bandHi float64) Range {
	r := Range{Limit: limit}
	best := -1.0
	for i := 0; i < len(pts); {
		if pts[i].VSWR > limit {
			i++
			continue
		}
		j := i
		for j+1 < len(pts) && pts[j+1].VSWR <= limit {
			j++
		}
		lo, hi := pts[i].FrequencyMHz, pts[j].FrequencyMHz
		if i > 0 {
			lo = cross(pts[i-1], pts[i], limit)
		}
		if j < len(pts)-1 {
			hi = cross(pts[j], pts[j+1], limit)
		}
		if hi-lo > best {
			best = hi - lo
			r = Range{Limit: limit, Found: true, LowMHz: lo, HighMHz: hi, OpenLow: i == 0, OpenHigh: j == len(pts)-1}
		}
		i = j + 1
	}
	r.CoversBand = r.Found && r.LowMHz <= bandLo && r.HighMHz >= bandHi
	return r
}

// cross returns the frequency between a and b where the VSWR, taken as
// linear between them, equals limit.
func cross(a, b Point, limit float64) float64 {
	t := (limit - a.VSWR) / (b.VSWR - a.VSWR)
	return a.FrequencyMHz + t*(b.FrequencyMHz-a.FrequencyMHz)
}
