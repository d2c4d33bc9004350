package field

import (
	"math"

	"coilwright/parts/spec"
)

// ReflectorModel selects how the reflector is modelled.
type ReflectorModel int

const (
	// PlateModel is the actual disc or square plate as a wire grid (the
	// default): it gives the back lobe and the gain lost to a small plate.
	PlateModel ReflectorModel = iota
	// IdealGround is an infinite perfectly conducting plane (image theory):
	// fast, no back radiation.
	IdealGround
)

// String returns "plate" or "ideal".
func (m ReflectorModel) String() string {
	if m == IdealGround {
		return "ideal"
	}
	return "plate"
}

// Options tunes Build and Sweep. The zero value is the default.
type Options struct {
	// Reflector is the reflector model; the zero value is PlateModel.
	Reflector ReflectorModel
	// Points is the number of sweep frequencies (≥ 2); zero means
	// DefaultPoints.
	Points int
	// LowMHz and HighMHz are the sweep edges; zero means the band widened
	// by DefaultWiden on each side, or the centre frequency ± DefaultWiden
	// when the spec gives no band.
	LowMHz, HighMHz float64
	// FrequenciesMHz, when not empty, replaces Points, LowMHz and HighMHz:
	// the sweep solves exactly these frequencies (for tolerance studies).
	FrequenciesMHz []float64
	// SegmentsPerWavelength sets the longest segment, λ/n at the highest
	// frequency solved; zero means DefaultSegmentsPerWavelength.
	SegmentsPerWavelength float64
	// MinSegmentRadii is the shortest segment the subdivision aims for, in
	// wire radii (a piece shorter than this stays whole); zero means
	// DefaultMinSegmentRadii.
	MinSegmentRadii float64
	// AxisOnly skips the pattern searches (peak gain, beamwidths, the
	// centre-frequency cuts): each point then carries the network figures,
	// the on-axis gains and axial ratio, and the efficiency.
	AxisOnly bool
	// Workers is the most goroutines one Sweep runs on at a time: 1 solves
	// on the calling goroutine, for callers that run many sweeps in
	// parallel themselves; zero means GOMAXPROCS. The result does not
	// depend on it (Key leaves it out).
	Workers int
}

// Defaults of Options.
const (
	DefaultPoints = 21
	// DefaultWiden widens the band on each side (5 %).
	DefaultWiden = 0.05
	// DefaultSegmentsPerWavelength: common practice (no published source)
	// for thin-wire models is 10–20 segments per wavelength; 20 keeps the
	// demo's input impedance within 3 % of a 1.5× finer mesh (tested).
	DefaultSegmentsPerWavelength = 20.0
	// DefaultMinSegmentRadii: the reduced kernel is used with segments of
	// at least four radii where the geometry allows. Common practice (no
	// published source); EM.md §1.
	DefaultMinSegmentRadii = 4.0
	// KernelMinSegmentRadii is the shortest segment the solver accepts, in
	// radii: below about two radii the reduced kernel fails (EM.md §4). A
	// lead that cannot be cut into segments this long is refused.
	KernelMinSegmentRadii = 1.5
	// PlateSpacingPerWavelength: grid spacing at most λ/10 at the highest
	// frequency. Source: Ludwig, IEEE Trans. AP-35(9), 1987.
	PlateSpacingPerWavelength = 10.0
)

// withDefaults fills zero fields.
func (o Options) withDefaults() Options {
	if o.Points == 0 {
		o.Points = DefaultPoints
	}
	if o.SegmentsPerWavelength == 0 {
		o.SegmentsPerWavelength = DefaultSegmentsPerWavelength
	}
	if o.MinSegmentRadii == 0 {
		o.MinSegmentRadii = DefaultMinSegmentRadii
	}
	return o
}

// Frequencies returns the sweep frequencies in MHz for spec s: the explicit
// list when given, otherwise Points equally spaced from the low to the high
// edge.
func (o Options) Frequencies(s *spec.Spec) []float64 {
	o = o.withDefaults()
	if len(o.FrequenciesMHz) > 0 {
		return append([]float64(nil), o.FrequenciesMHz...)
	}
	lo, hi := o.edges(s)
	n := max(o.Points, 2)
	out := make([]float64, n)
	for i := range out {
		out[i] = lo + (hi-lo)*float64(i)/float64(n-1)
	}
	return out
}

// edges returns the sweep edges in MHz.
func (o Options) edges(s *spec.Spec) (lo, hi float64) {
	lo, hi = s.FrequencyMHz*(1-DefaultWiden), s.FrequencyMHz*(1+DefaultWiden)
	if s.BandLowMHz != nil {
		lo = *s.BandLowMHz * (1 - DefaultWiden)
	}
	if s.BandHighMHz != nil {
		hi = *s.BandHighMHz * (1 + DefaultWiden)
	}
	if o.LowMHz > 0 {
		lo = o.LowMHz
	}
	if o.HighMHz > 0 {
		hi = o.HighMHz
	}
	return lo, hi
}

// topMHz returns the highest frequency a model built with o must carry:
// the top of the sweep, or the centre frequency if higher.
func (o Options) topMHz(s *spec.Spec) float64 {
	top := s.FrequencyMHz
	for _, f := range o.Frequencies(s) {
		top = math.Max(top, f)
	}
	return top
}

// OptionsFromSpec returns the options the spec's [solver] table asks for.
// The spec must be validated.
func OptionsFromSpec(s *spec.Spec) Options {
	x := &s.Solver
	o := Options{Points: x.Points, SegmentsPerWavelength: x.SegmentsPerWavelength}
	if x.ReflectorModel == "ideal" {
		o.Reflector = IdealGround
	}
	if x.SweepLowMHz != nil {
		o.LowMHz = *x.SweepLowMHz
	}
	if x.SweepHighMHz != nil {
		o.HighMHz = *x.SweepHighMHz
	}
	return o
}
