// Linear axes: a value range mapped onto a span of the page, with tick
// values at round numbers.

package plot

import (
	"math"
	"strconv"
)

// axis maps values in [lo, hi] linearly onto page positions [p0, p1]
// (p1 may be less than p0: y grows downwards on the page).
type axis struct {
	lo, hi float64
	p0, p1 float64
}

// at returns the page position of value v.
func (a axis) at(v float64) float64 {
	return a.p0 + (v-a.lo)/(a.hi-a.lo)*(a.p1-a.p0)
}

// niceStep returns a round tick spacing (1, 2 or 5 times a power of ten)
// that cuts span into about n intervals.
// Source: Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990.
func niceStep(span float64, n int) float64 {
	raw := span / float64(n)
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	f := raw / mag
	switch {
	case f < 1.5:
		return mag
	case f < 3:
		return 2 * mag
	case f < 7:
		return 5 * mag
	}
	return 10 * mag
}

// tickFit is the relative slack allowed when deciding whether a tick lies
// inside the axis range, so rounding does not drop the end ticks.
const tickFit = 1e-9

// niceRange widens [lo, hi] outwards to whole multiples of a round step
// giving about n intervals. An empty range is widened by one unit each way
// (or by a tenth of its size when that is larger).
func niceRange(lo, hi float64, n int) (float64, float64) {
	if !(hi > lo) {
		d := math.Max(1, math.Abs(lo)/10)
		lo, hi = lo-d, hi+d
	}
	step := niceStep(hi-lo, n)
	return math.Floor(lo/step+tickFit) * step, math.Ceil(hi/step-tickFit) * step
}

// ticks returns the multiples of a round step inside [lo, hi], about n
// intervals apart, and the step.
func ticks(lo, hi float64, n int) ([]float64, float64) {
	step := niceStep(hi-lo, n)
	var out []float64
	for k := math.Ceil(lo/step - tickFit); k*step <= hi+tickFit*step*float64(n); k++ {
		v := k * step
		if math.Abs(v) < step*tickFit {
			v = 0
		}
		out = append(out, v)
	}
	return out, step
}

// tickText formats v with just enough decimals for the step and a true
// minus sign.
func tickText(v, step float64) string {
	dec := 0
	if step < 1 {
		dec = int(math.Ceil(-math.Log10(step) - tickFit))
	}
	s := strconv.FormatFloat(v, 'f', dec, 64)
	if s[0] == '-' {
		if strings0(s[1:]) {
			return s[1:]
		}
		s = "\u2212" + s[1:]
	}
	return s
}

// strings0 reports whether s holds only zeros and a decimal point.
func strings0(s string) bool {
	for _, r := range s {
		if r != '0' && r != '.' {
			return false
		}
	}
	return true
}
