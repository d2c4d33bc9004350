package plot

import (
	"math"
	"math/cmplx"
)

// Demo data for the tests: the match of a series RLC resonator on a 50 Ω
// line, and smooth made-up gain and pattern curves.

// rlcMatch returns VSWR and return loss in dB at f MHz of a series RLC
// load with resistance r Ω, resonant at f0 MHz with loaded quality q, on a
// line of z0 Ω.
// Source: Pozar, Microwave Engineering, 4th ed., §2.3 (reflection
// coefficient, VSWR, return loss) and §6.1 (series resonator impedance).
func rlcMatch(f, f0, q, r, z0 float64) (vswr, rl float64) {
	x := r * q * (f/f0 - f0/f)
	z := complex(r, x)
	g := cmplx.Abs((z - complex(z0, 0)) / (z + complex(z0, 0)))
	return (1 + g) / (1 - g), -20 * math.Log10(g)
}

// sampleMatchChart is a VSWR and return-loss chart of a demo resonator
// from 400 to 480 MHz with the 430–440 MHz band shaded and a VSWR 2
// target.
func sampleMatchChart() FrequencyChart {
	var fs, sw, rl []float64
	for f := 400.0; f <= 480; f += 1 {
		s, r := rlcMatch(f, 436, 12, 60, 50)
		fs, sw, rl = append(fs, f), append(sw, s), append(rl, r)
	}
	return FrequencyChart{
		Title:   "Match: VSWR and return loss",
		Note:    "Textbook estimate (demo resonator), not a solved sweep",
		XMinMHz: 400, XMaxMHz: 480,
		Bands: []Band{{LowMHz: 430, HighMHz: 440, Label: "Band 430–440 MHz"}},
		Panels: []Panel{{
			Left:    YAxis{Label: "VSWR", Min: 1, Max: 6},
			Right:   YAxis{Label: "Return loss", Unit: "dB", Min: 0, Max: 30},
			Series:  []Series{{Name: "VSWR", FreqMHz: fs, Values: sw}, {Name: "Return loss", Unit: "dB", FreqMHz: fs, Values: rl, OnRight: true}},
			Targets: []Target{{Value: 2, Label: "Target VSWR 2"}},
		}},
	}
}

// sampleGainChart is a two-panel chart: gain of both hands, and axial
// ratio. Demo data.
func sampleGainChart() FrequencyChart {
	var fs, rh, lh, ar, lo, hi []float64
	for f := 400.0; f <= 480; f += 2 {
		u := (f - 436) / 40
		fs = append(fs, f)
		rh = append(rh, 12-4*u*u)
		lh = append(lh, -8+6*u*u)
		ar = append(ar, 1.2+5*u*u)
		lo = append(lo, 11-5*u*u)
		hi = append(hi, 12.6-3.5*u*u)
	}
	return FrequencyChart{
		Title: "Gain and axial ratio",
		Bands: []Band{{LowMHz: 430, HighMHz: 440, Label: "Band"}},
		Panels: []Panel{
			{
				Left:      YAxis{Label: "Gain", Unit: "dBic"},
				Envelopes: []Envelope{{Name: "RHCP 5–95 % of batch", FreqMHz: fs, Low: lo, High: hi}},
				Series:    []Series{{Name: "RHCP", Unit: "dBic", FreqMHz: fs, Values: rh}, {Name: "LHCP", Unit: "dBic", FreqMHz: fs, Values: lh}},
			},
			{
				Left:    YAxis{Label: "Axial ratio", Unit: "dB"},
				Series:  []Series{{Name: "Axial ratio", Unit: "dB", FreqMHz: fs, Values: ar}},
				Targets: []Target{{Value: 3, Label: "3 dB"}},
			},
		},
	}
}

// samplePolar is a demo cut: a cos^n main lobe for RHCP and a weaker,
// broader LHCP, levels relative to the RHCP peak.
func samplePolar() PolarPattern {
	var a, rh, lh []float64
	for k := 0; k < 360; k += 2 {
		th := float64(k) * math.Pi / 180
		a = append(a, th)
		c := math.Max((1+math.Cos(th))/2, 1e-3)
		rh = append(rh, 20*math.Log10(math.Pow(c, 3)))
		lh = append(lh, -18+10*math.Log10(0.2+0.8*math.Abs(math.Sin(th))))
	}
	return PolarPattern{
		Title: "Pattern at 436 MHz, elevation cut", Note: "0 dB = RHCP peak, 12.0 dBic (demo data)",
		Traces: []Trace{{Name: "RHCP", AngleRad: a, Level: rh, Closed: true}, {Name: "LHCP", AngleRad: a, Level: lh, Closed: true}},
	}
}

// sampleHistogram is a demo batch of resonant frequencies: a fixed,
// evenly spread set (no randomness) with limit markers.
func sampleHistogram() Histogram {
	var vs []float64
	for i := range 40 {
		u := (float64(i) + 0.5) / 40
		vs = append(vs, 436+3*(u-0.5)+2*math.Pow(u-0.5, 3))
	}
	return Histogram{
		Title: "Batch: resonant frequency", Label: "Resonant frequency", Unit: "MHz", Values: vs, Bins: 8,
		Markers: []Marker{{Value: 434, Label: "Low limit"}, {Value: 438, Label: "High limit"}},
	}
}

// sampleDrawingSVG is a small part drawing as cam's writer makes them.
const sampleDrawingSVG = `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="54mm" height="54mm" viewBox="0 0 54 54">
<title>Test plate</title>
<g id="CUT" fill="none" stroke="#ff0000" stroke-width="0.025">
<circle cx="27" cy="27" r="25"/>
<circle cx="27" cy="27" r="3"/>
</g>
</svg>
`
