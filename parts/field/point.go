package field

import (
	"math"
	"math/cmplx"

	"coilwright/parts/em"
)

// Caps that keep every figure finite (and JSON-encodable): a perfect match
// has an infinite return loss, a linear field an infinite axial ratio.
const (
	MaxVSWR         = 999.0
	MaxReturnLossDB = 99.0
	MaxAxialRatioDB = 60.0
	// MinGainDBic stands for a null (zero gain).
	MinGainDBic = -99.0
)

// dBic returns 10·log10(g), MinGainDBic for a null.
func dBic(g float64) float64 {
	if !(g > 0) {
		return MinGainDBic
	}
	return math.Max(MinGainDBic, em.DB(g))
}

// axialRatioDB returns 20·log10 AR, capped at MaxAxialRatioDB.
func axialRatioDB(f em.FarField) float64 {
	ar := f.AxialRatio()
	if math.IsInf(ar, 0) || math.IsNaN(ar) {
		return MaxAxialRatioDB
	}
	return math.Min(MaxAxialRatioDB, 20*math.Log10(ar))
}

// networkPoint fills the network and on-axis figures from a solution.
func networkPoint(s *em.Solution, z0 float64) Point {
	g := em.Reflection(s.Impedance, complex(z0, 0))
	p := Point{
		FrequencyMHz: s.Frequency / 1e6, Impedance: s.Impedance,
		ResistanceOhm: real(s.Impedance), ReactanceOhm: imag(s.Impedance),
		Reflection: g, GammaMag: cmplx.Abs(g), GammaRe: real(g), GammaIm: imag(g),
		VSWR:         math.Min(MaxVSWR, em.VSWR(g)),
		ReturnLossDB: math.Min(MaxReturnLossDB, em.ReturnLoss(g)),
		AxisRHCPDBic: dBic(s.Gain(em.Direction{}, em.RightHand)),
		AxisLHCPDBic: dBic(s.Gain(em.Direction{}, em.LeftHand)),
		AxialRatioDB: axialRatioDB(s.Field(em.Direction{})),
		Efficiency:   s.Efficiency(),
	}
	return p
}

// patternPoint adds the pattern figures: peaks, realised gain,
// beamwidths and front-to-back ratio.
func patternPoint(p *Point, s *em.Solution, rhcp, back bool) {
	pat := newPattern(s, rhcp)
	thMax := math.Pi / 2
	if back {
		thMax = math.Pi
	}
	dCo, gCo, gCross := pat.peaks(thMax)
	if rhcp {
		p.PeakRHCPDBic, p.PeakLHCPDBic = dBic(gCo), dBic(gCross)
	} else {
		p.PeakRHCPDBic, p.PeakLHCPDBic = dBic(gCross), dBic(gCo)
	}
	p.PeakThetaDeg = dCo.Theta * 180 / math.Pi
	p.RealisedDBic = dBic(gCo * em.Mismatch(p.Reflection))
	for i, phi := range []float64{0, math.Pi / 2} {
		if w, ok := pat.beamwidth(phi, thMax); ok {
			p.HPBWDeg[i] = w * 180 / math.Pi
		}
	}
	if back {
		front := s.Gain(em.Direction{}, em.Total)
		rear := s.Gain(em.Direction{Theta: math.Pi}, em.Total)
		switch {
		case rear > 0:
			p.FrontToBackDB = math.Min(MaxReturnLossDB, em.DB(front/rear))
		default:
			p.FrontToBackDB = MaxReturnLossDB
		}
	}
}
