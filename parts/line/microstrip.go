// Quasi-static impedance of a strip over a ground plane.
//
// The matching wedge is a metal strip held at a small height above the
// reflector, with air between them: an air-dielectric microstrip. Three
// published closed forms are provided: Hammerstad–Jensen (the design
// formula, with its thickness correction), Wheeler's 1977 formula (an
// independent cross-check) and Kraus's wide-strip approximation (a quick
// hand estimate). StripWidthRatio inverts Hammerstad–Jensen numerically.
// All are quasi-static line formulas: a first-order design aid for a strip
// whose width and height vary slowly along its length.

package line

import (
	"fmt"
	"math"

	"coilwright/parts/spec"
)

// hjZ01 is the Hammerstad–Jensen air-line impedance for width-to-height
// ratio u with zero strip thickness.
// Source: Hammerstad & Jensen, "Accurate models for microstrip
// computer-aided design", IEEE MTT-S Digest 1980, pp. 407–409.
func hjZ01(u float64) float64 {
	f := 6 + (2*math.Pi-6)*math.Exp(-math.Pow(30.666/u, 0.7528))
	return spec.FreeSpaceImpedance / (2 * math.Pi) * math.Log(f/u+math.Sqrt(1+(2/u)*(2/u)))
}

// hjThicknessDelta is the Hammerstad–Jensen width correction Δu1 for a
// strip of normalised thickness tn = t/h at width ratio u (homogeneous
// medium). Zero thickness gives zero.
// Source: Hammerstad & Jensen 1980.
func hjThicknessDelta(u, tn float64) float64 {
	if tn <= 0 {
		return 0
	}
	c := 1 / math.Tanh(math.Sqrt(6.517*u))
	return tn / math.Pi * math.Log(1+4*math.E/(tn*c*c))
}

// AirStripImpedance returns the characteristic impedance in ohms of a strip
// of width w at height h above a ground plane in air, with strip thickness t
// (all in mm; w, h > 0, t ≥ 0), by Hammerstad–Jensen with the thickness
// correction. For εr = 1 the correction for the dielectric vanishes and the
// thick strip behaves as a zero-thickness strip of width ratio u + Δu1.
// Source: Hammerstad & Jensen 1980.
func AirStripImpedance(w, h, t float64) float64 {
	u := w / h
	return hjZ01(u + hjThicknessDelta(u, t/h))
}

// WheelerImpedance returns the characteristic impedance in ohms of a
// zero-thickness strip with width-to-height ratio u (> 0) on a substrate of
// relative permittivity er (≥ 1), by Wheeler's 1977 closed form.
// Source: H. A. Wheeler, "Transmission-line properties of a strip on a
// dielectric sheet on a plane", IEEE Trans. MTT-25(8), 1977.
func WheelerImpedance(u, er float64) float64 {
	a := (14 + 8/er) / 11 * (4 / u)
	b := math.Sqrt(a*a + math.Pi*math.Pi*(1+1/er)/2)
	return spec.FreeSpaceImpedance / (2 * math.Pi * math.Sqrt(2*(1+er))) * math.Log(1+4/u*(a+b))
}

// KrausWideStripImpedance returns Kraus's wide-strip estimate in ohms,
// 377/(√εr·(w/h + 2)), for width ratio u (> 0) and relative permittivity
// er (≥ 1). It is a hand estimate, good to tens of percent.
// Source: Kraus, Marhefka & Khan, Antennas and Wave Propagation, 4th ed.,
// example 8-5.1.
func KrausWideStripImpedance(u, er float64) float64 {
	return 377 / (math.Sqrt(er) * (u + 2))
}

// Width-ratio search bounds and tolerance for StripWidthRatio.
const (
	minStripRatio = 1e-3
	maxStripRatio = 1e3
	ratioRelTol   = 1e-12
)

// StripWidthRatio returns the width-to-height ratio w/h at which a strip of
// normalised thickness tn = t/h (≥ 0) in air has impedance z ohms by
// Hammerstad–Jensen (AirStripImpedance). The impedance falls monotonically
// with width, so the root is found by bisection on ln u; an error is
// returned when z lies outside the range reachable for 0.001 ≤ w/h ≤ 1000.
func StripWidthRatio(z, tn float64) (float64, error) {
	// bisectMaxSteps bounds the bisection: halving the interval of ln u
	// (width 13.8) reaches any float64 resolution in fewer than 100 steps.
	const bisectMaxSteps = 100
	imp := func(u float64) float64 { return hjZ01(u + hjThicknessDelta(u, tn)) }
	lo, hi := math.Log(minStripRatio), math.Log(maxStripRatio)
	if zl, zh := imp(minStripRatio), imp(maxStripRatio); z > zl || z < zh || math.IsNaN(z) {
		return 0, fmt.Errorf("strip impedance %.4g Ω is outside the reachable range %.4g–%.4g Ω", z, zh, zl)
	}
	for steps := 0; hi-lo > ratioRelTol && steps < bisectMaxSteps; steps++ {
		mid := (lo + hi) / 2
		if imp(math.Exp(mid)) > z {
			lo = mid
		} else {
			hi = mid
		}
	}
	return math.Exp((lo + hi) / 2), nil
}
