package spec

import "fmt"

// ToleranceSpec is the [tolerance] table: how much the wire, the winding
// and the cutting of a batch spread, and how many kits to simulate. Each
// "±" figure is a limit read as three standard deviations of a normal
// spread (common practice, no published source: a capable process keeps
// its output within ±3σ of its limits). Keys left out take the defaults
// below; the yield scatter and the wire tolerance depend on the wire.
type ToleranceSpec struct {
	Enabled *bool  `toml:"enabled"` // run the analysis; default true for a batch (quantity > 1)
	Samples int    `toml:"samples"` // kits to simulate, default DefaultToleranceSamples
	Seed    *int64 `toml:"seed"`    // random seed, default 1

	YieldCV         *float64 `toml:"yield_cv"`                 // wire yield scatter (σ/mean); default from the material
	WireDiameterMM  *float64 `toml:"wire_diameter_tol_mm"`     // ± on the bare wire; default from the wire standard
	TurnDiameterMM  float64  `toml:"turn_diameter_tol_mm"`     // ± winding error in each turn's diameter
	TurnSpacingMM   float64  `toml:"turn_spacing_tol_mm"`      // ± winding error in each turn's axial advance
	FirstTurnMM     float64  `toml:"first_turn_height_tol_mm"` // ± on the wire's height at the feed
	StripWidthMM    float64  `toml:"strip_width_tol_mm"`       // ± on the matching strip's width as cut
	StripHeightMM   float64  `toml:"strip_height_tol_mm"`      // ± on the strip's height above the reflector
	KerfMM          float64  `toml:"kerf_tol_mm"`              // ± variation of the cutting kerf
	InspectionShare float64  `toml:"inspection_share"`         // share of inspected kits that must meet the target, default 0.95
}

// Tolerance defaults. The winding, height and strip figures are common
// practice (no published source): a printed former's groove holds the wire
// to about ±0.2 mm; a first turn set by hand against a gauge and a strip
// soldered under the wire sit within a few tenths; shim cut with snips or a
// blade holds about ±0.1 mm, and a cutting tool's kerf drifts by about
// ±0.05 mm with wear and focus.
const (
	DefaultToleranceSamples  = 100
	MaxToleranceSamples      = 5000
	DefaultToleranceSeed     = 1
	DefaultTurnDiameterTolMM = 0.2
	DefaultTurnSpacingTolMM  = 0.2
	DefaultFirstTurnTolMM    = 0.2
	DefaultStripWidthTolMM   = 0.1
	DefaultStripHeightTolMM  = 0.1
	DefaultKerfTolMM         = 0.05
	DefaultInspectionShare   = 0.95
)

// Bare round copper wire diameter tolerance. From memory: ASTM B3 allows
// ±1 % of the diameter for wire of 0.254 mm (0.0100 in) and over, and
// ±0.0025 mm (0.0001 in) below; IEC 60317-0-1 grades are of the same size.
const (
	wireTolFraction = 0.01
	wireTolSmallMM  = 0.0025
	wireTolBreakMM  = 0.254
)

// DefaultWireDiameterTolMM returns the ± tolerance in mm of a bare wire of
// diameter d mm under the wire standard.
func DefaultWireDiameterTolMM(d float64) float64 {
	if d < wireTolBreakMM {
		return wireTolSmallMM
	}
	return wireTolFraction * d
}

// On reports whether the analysis runs (filled by validation: by default
// for a batch, quantity > 1).
func (t *ToleranceSpec) On() bool { return t.Enabled != nil && *t.Enabled }

// SeedValue returns the random seed.
func (t *ToleranceSpec) SeedValue() uint64 {
	if t.Seed == nil {
		return DefaultToleranceSeed
	}
	return uint64(*t.Seed)
}

// WireTolMM returns the ± bare-wire tolerance in mm for a wire of
// diameter d mm: the spec's or the standard's.
func (t *ToleranceSpec) WireTolMM(d float64) float64 {
	if t.WireDiameterMM != nil {
		return *t.WireDiameterMM
	}
	return DefaultWireDiameterTolMM(d)
}

func (t *ToleranceSpec) validate(c *checker, s *Spec) {
	if t.Enabled == nil {
		// A batch asks how many of its kits will meet the band; for one
		// kit the analysis (a few seconds) runs on request.
		on := s.Quantity > 1
		t.Enabled = &on
	}
	if !c.has("tolerance.samples") && t.Samples == 0 {
		t.Samples = DefaultToleranceSamples
	}
	if t.Samples < 1 || t.Samples > MaxToleranceSamples {
		c.fail("tolerance.samples", fmt.Sprint(t.Samples), fmt.Sprintf("must be between 1 and %d", MaxToleranceSamples), "simulate a few hundred kits, e.g. samples = 200")
	}
	if t.YieldCV != nil {
		c.within("tolerance.yield_cv", *t.YieldCV, 0, 0.5, "(standard deviation over mean)")
	}
	if t.WireDiameterMM != nil {
		c.within("tolerance.wire_diameter_tol_mm", *t.WireDiameterMM, 0, 0.5, "mm")
	}
	for _, k := range []struct {
		key string
		v   *float64
		def float64
	}{
		{"tolerance.turn_diameter_tol_mm", &t.TurnDiameterMM, DefaultTurnDiameterTolMM},
		{"tolerance.turn_spacing_tol_mm", &t.TurnSpacingMM, DefaultTurnSpacingTolMM},
		{"tolerance.first_turn_height_tol_mm", &t.FirstTurnMM, DefaultFirstTurnTolMM},
		{"tolerance.strip_width_tol_mm", &t.StripWidthMM, DefaultStripWidthTolMM},
		{"tolerance.strip_height_tol_mm", &t.StripHeightMM, DefaultStripHeightTolMM},
		{"tolerance.kerf_tol_mm", &t.KerfMM, DefaultKerfTolMM},
	} {
		c.orDefault(k.key, k.v, k.def)
		c.within(k.key, *k.v, 0, 2, "mm")
	}
	c.orDefault("tolerance.inspection_share", &t.InspectionShare, DefaultInspectionShare)
	c.within("tolerance.inspection_share", t.InspectionShare, 0.5, 0.999, "(share of kits)")
}
