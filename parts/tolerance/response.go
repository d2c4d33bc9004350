package tolerance

import (
	"fmt"
	"math"
	"math/cmplx"
	"sort"

	"gonum.org/v1/gonum/interp"

	"coilwright/parts/report"
)

// Evaluator solves one kit as built at the frequencies it was made for.
// Implementations must be safe for concurrent use.
type Evaluator interface {
	Evaluate(b Build) (Response, error)
}

// Response is one kit's computed behaviour at a few frequencies, in
// increasing order.
type Response struct {
	FrequencyMHz []float64
	// Impedance is the input impedance at the feed, ohms.
	Impedance []complex128
	// GainDBic is the co-polar realised gain on axis, dBic.
	GainDBic []float64
	// AxialRatioDB is the on-axis axial ratio, dB.
	AxialRatioDB []float64
}

// Band is the frequency range a kit must match, MHz, with its target.
type Band struct {
	LowMHz, CentreMHz, HighMHz float64
	// RefOhm is the feed cable's impedance.
	RefOhm float64
	// VSWRTarget is the largest VSWR a kit may have across the band.
	VSWRTarget float64
}

// fineSteps is the number of steps the interpolated impedance is read at
// across the swept range when finding the best match; at 5.8 GHz ± 10 %
// that is under 2 MHz a step.
const fineSteps = 800

// vswrCeiling is the largest VSWR the analysis records: beyond it a kit
// is hopelessly mismatched and the exact figure means nothing, and an
// unbounded one could not be written to design.json or tolerance.csv.
// Common practice (no published source): analysers read out to about 100.
const vswrCeiling = 99.0

// figures reads a kit's figures from its response: the impedance is
// interpolated by natural cubic splines (real and imaginary parts) across
// the swept range, the VSWR read on a fine grid; gain and axial ratio are
// interpolated linearly at the band centre.
func figures(r Response, b Band) (report.ToleranceFigures, error) {
	n := len(r.FrequencyMHz)
	if n < 3 || len(r.Impedance) != n || len(r.GainDBic) != n || len(r.AxialRatioDB) != n {
		return report.ToleranceFigures{}, fmt.Errorf("response needs at least 3 frequencies with every figure, got %d", n)
	}
	if !sort.Float64sAreSorted(r.FrequencyMHz) {
		return report.ToleranceFigures{}, fmt.Errorf("response frequencies are not increasing")
	}
	re, im := make([]float64, n), make([]float64, n)
	for i, z := range r.Impedance {
		re[i], im[i] = real(z), imag(z)
	}
	var sr, si interp.NaturalCubic
	if err := sr.Fit(r.FrequencyMHz, re); err != nil {
		return report.ToleranceFigures{}, err
	}
	if err := si.Fit(r.FrequencyMHz, im); err != nil {
		return report.ToleranceFigures{}, err
	}
	vswr := func(f float64) float64 {
		z := complex(sr.Predict(f), si.Predict(f))
		g := cmplx.Abs((z - complex(b.RefOhm, 0)) / (z + complex(b.RefOhm, 0)))
		if g >= 1 { // the spline's resistance dipped below zero between samples
			return vswrCeiling
		}
		return math.Min((1+g)/(1-g), vswrCeiling)
	}
	lo, hi := r.FrequencyMHz[0], r.FrequencyMHz[n-1]
	out := report.ToleranceFigures{MinVSWR: math.Inf(1)}
	for k := 0; k <= fineSteps; k++ {
		f := lo + (hi-lo)*float64(k)/fineSteps
		v := vswr(f)
		if v < out.MinVSWR {
			out.MinVSWR, out.CentreMHz = v, f
		}
		if f >= b.LowMHz && f <= b.HighMHz {
			out.WorstVSWR = math.Max(out.WorstVSWR, v)
		}
	}
	out.MatchInside = out.CentreMHz > lo && out.CentreMHz < hi
	out.EdgeVSWR = math.Max(vswr(b.LowMHz), vswr(b.HighMHz))
	out.WorstVSWR = math.Max(out.WorstVSWR, out.EdgeVSWR)
	out.GainDBic = linear(r.FrequencyMHz, r.GainDBic, b.CentreMHz)
	out.AxialRatioDB = linear(r.FrequencyMHz, r.AxialRatioDB, b.CentreMHz)
	return out, nil
}

// linear interpolates y(x) at x0 on increasing xs, holding the end values
// outside.
func linear(xs, ys []float64, x0 float64) float64 {
	i := sort.SearchFloat64s(xs, x0)
	switch {
	case i == 0:
		return ys[0]
	case i == len(xs):
		return ys[len(ys)-1]
	}
	f := (x0 - xs[i-1]) / (xs[i] - xs[i-1])
	return ys[i-1] + f*(ys[i]-ys[i-1])
}
