package spec

import "fmt"

// SolverSpec is the [solver] table: the field solution that computes what
// the built antenna will do across the band. Every key has a default.
type SolverSpec struct {
	// Enabled runs the field solution (default true).
	Enabled *bool `toml:"enabled"`
	// ReflectorModel is "plate" (the actual plate as a wire grid, default)
	// or "ideal" (an infinite ground plane; faster, no back lobe).
	ReflectorModel string `toml:"reflector_model"`
	// Points is the number of sweep frequencies, 2–201 (default 21).
	Points int `toml:"points"`
	// SegmentsPerWavelength sets the longest wire segment, λ/n at the top
	// of the sweep (default 20; segments are never cut below four wire
	// radii where the wire allows).
	SegmentsPerWavelength float64 `toml:"segments_per_wavelength"`
	// SweepLowMHz and SweepHighMHz are the sweep's edges; by default the
	// band widened by 5 % on each side (the centre frequency ± 5 % without
	// a band).
	SweepLowMHz  *float64 `toml:"sweep_low_mhz"`
	SweepHighMHz *float64 `toml:"sweep_high_mhz"`
}

// Limits and defaults of the [solver] table. Common practice (no published
// source): thin-wire models use 10–20 segments per wavelength; fewer than
// 8 misses the current's shape, more than 60 only costs time (and the
// kernel's four-radii floor holds the length anyway).
const (
	DefaultSolverPoints        = 21
	MinSolverPoints            = 2
	MaxSolverPoints            = 201
	DefaultSegmentsPerWave     = 20.0
	MinSegmentsPerWave         = 8.0
	MaxSegmentsPerWave         = 60.0
	DefaultSolverReflector     = "plate"
	solverReflectorIdeal       = "ideal"
	maxSweepSpanOverCentreFrac = 0.5
)

// On reports whether the field solution runs.
func (x *SolverSpec) On() bool { return x.Enabled == nil || *x.Enabled }

func (x *SolverSpec) validate(c *checker, s *Spec) {
	c.oneOf("solver.reflector_model", &x.ReflectorModel, DefaultSolverReflector, DefaultSolverReflector, solverReflectorIdeal)
	if !c.has("solver.points") && x.Points == 0 {
		x.Points = DefaultSolverPoints
	}
	if x.Points < MinSolverPoints || x.Points > MaxSolverPoints {
		c.fail("solver.points", fmt.Sprint(x.Points), fmt.Sprintf("must be between %d and %d", MinSolverPoints, MaxSolverPoints), fmt.Sprintf("write points = %d", DefaultSolverPoints))
	}
	c.orDefault("solver.segments_per_wavelength", &x.SegmentsPerWavelength, DefaultSegmentsPerWave)
	c.within("solver.segments_per_wavelength", x.SegmentsPerWavelength, MinSegmentsPerWave, MaxSegmentsPerWave, "segments per wavelength")
	// The sweep must stay near the centre frequency: the mesh is cut for
	// the top of the sweep, and the design (and its warnings) for the centre.
	lo, hi := s.FrequencyMHz*(1-maxSweepSpanOverCentreFrac), s.FrequencyMHz*(1+maxSweepSpanOverCentreFrac)
	ok := true
	if x.SweepLowMHz != nil {
		ok = c.within("solver.sweep_low_mhz", *x.SweepLowMHz, round3(lo), round3(hi), "MHz (within ±50 % of frequency_mhz)") && ok
	}
	if x.SweepHighMHz != nil {
		ok = c.within("solver.sweep_high_mhz", *x.SweepHighMHz, round3(lo), round3(hi), "MHz (within ±50 % of frequency_mhz)") && ok
	}
	if ok && x.SweepLowMHz != nil && x.SweepHighMHz != nil && *x.SweepLowMHz >= *x.SweepHighMHz {
		c.fail("solver.sweep_high_mhz", num(*x.SweepHighMHz), fmt.Sprintf("must be above solver.sweep_low_mhz = %s", num(*x.SweepLowMHz)), "swap the sweep edges")
	}
}
