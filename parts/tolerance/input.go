package tolerance

import (
	"fmt"
	"math"

	"coilwright/parts"
	"coilwright/parts/report"
	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// limitSigmas is how many standard deviations a "±" limit spans. Common
// practice (no published source): a capable process keeps its output
// within ±3σ of its limits.
const limitSigmas = 3.0

// kind says what an input perturbs.
type kind int

const (
	kindYield kind = iota
	kindWireDiameter
	kindTurnDiameter
	kindTurnSpacing
	kindFirstTurn
	kindStripWidth
	kindStripHeight
	kindKerf
)

// input is one sampled quantity: a standard-normal draw z becomes
// sigma·z mm, or for the yield a log-normal factor of mean 1 and
// coefficient of variation sigma.
type input struct {
	kind  kind
	turn  int // 0-based turn for the per-turn kinds
	sigma float64
	info  report.ToleranceInput
}

// value returns the input's value for the standard-normal draw z: a
// deviation in mm, or the yield factor.
func (in input) value(z float64) float64 {
	if in.kind == kindYield {
		// Log-normal with mean 1 and CV sigma: ln f ~ N(−s²/2, s²),
		// s² = ln(1 + CV²). Source: the moments of the log-normal
		// distribution (any statistics text, e.g. Johnson, Kotz and
		// Balakrishnan, Continuous Univariate Distributions, ch. 14).
		s := math.Sqrt(math.Log1p(in.sigma * in.sigma))
		return math.Exp(s*z - s*s/2)
	}
	return in.sigma * z
}

// nominal returns the input's value at the nominal design.
func (in input) nominal() float64 {
	if in.kind == kindYield {
		return 1
	}
	return 0
}

// inputs lists the spreads of design d under its [tolerance] table.
func inputs(d *parts.Design) ([]input, error) {
	t := &d.Spec.Tolerance
	var in []input
	add := func(k kind, turn int, limit float64, name, key, unit, source string) {
		in = append(in, input{kind: k, turn: turn, sigma: limit / limitSigmas,
			info: report.ToleranceInput{Name: name, Key: key, Limit: limit, Unit: unit, Source: source}})
	}
	cv, src := 0.0, ""
	if t.YieldCV != nil {
		cv, src = *t.YieldCV, "set in the spec"
	} else {
		sc := wire.YieldScatter(d.Wire.Material)
		cv, src = sc.CV, sc.Source
	}
	if !(cv >= 0) {
		return nil, fmt.Errorf("yield scatter %g must be zero or positive", cv)
	}
	in = append(in, input{kind: kindYield, sigma: cv, info: report.ToleranceInput{Name: "wire yield", Key: "tolerance.yield_cv",
		Limit: 100 * limitSigmas * cv, Unit: "%", Source: src}})
	wsrc := "wire standard (ASTM B3: ±1 % of the diameter; from memory)"
	if t.WireDiameterMM != nil {
		wsrc = "set in the spec"
	}
	add(kindWireDiameter, 0, t.WireTolMM(d.Wire.Diameter), "wire diameter", "tolerance.wire_diameter_tol_mm", "mm", wsrc)
	const practice = "common practice (no published source)"
	for i := range d.Turns {
		add(kindTurnDiameter, i, t.TurnDiameterMM, fmt.Sprintf("turn %d diameter", i+1), "tolerance.turn_diameter_tol_mm", "mm", practice)
	}
	for i := range d.Turns {
		add(kindTurnSpacing, i, t.TurnSpacingMM, fmt.Sprintf("turn %d spacing", i+1), "tolerance.turn_spacing_tol_mm", "mm", practice)
	}
	add(kindFirstTurn, 0, t.FirstTurnMM, "first-turn height", "tolerance.first_turn_height_tol_mm", "mm", practice)
	if d.Patterns != nil && d.Patterns.Wedge != nil {
		add(kindStripWidth, 0, t.StripWidthMM, "strip width", "tolerance.strip_width_tol_mm", "mm", practice)
		add(kindStripHeight, 0, t.StripHeightMM, "strip height", "tolerance.strip_height_tol_mm", "mm", practice)
		if d.Spec.Cutting.Kerf() > 0 {
			add(kindKerf, 0, t.KerfMM, "cutting kerf", "tolerance.kerf_tol_mm", "mm", practice)
		}
	}
	return in, nil
}

// specTarget returns the VSWR the band must meet: the one the matching
// strip is sized for ([wedge] max_vswr), or DefaultVSWRTarget when unset.
func specTarget(s *spec.Spec) float64 {
	if s.Wedge.MaxVSWR > 0 {
		return s.Wedge.MaxVSWR
	}
	return DefaultVSWRTarget
}

// DefaultVSWRTarget is the VSWR across the band a kit must reach to count
// as meeting the spec when the spec sets none. Common practice (no
// published source): VSWR 2 (return loss 9.5 dB) is the usual acceptance
// for a hobby antenna.
const DefaultVSWRTarget = 2.0
