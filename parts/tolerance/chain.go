package tolerance

import (
	"fmt"

	"coilwright/parts"
	"coilwright/parts/wire"
)

// Build is one kit as built: what differs from the nominal design. Lengths
// are mm. The zero deviations with the nominal wire are the nominal kit.
type Build struct {
	// WireDiameterMM is the bare wire's diameter.
	WireDiameterMM float64
	// YieldFactor scales the wire's flow stress (1 is the design's wire).
	YieldFactor float64
	// DiametersMM is each turn's released centreline diameter at mid-turn.
	DiametersMM []float64
	// DiameterDeltasMM is DiametersMM less the nominal released diameters
	// (the springback model's prediction for the design's wire).
	DiameterDeltasMM []float64
	// HeightDeltasMM is the shift of the centreline height at each turn
	// boundary, from the feed (index 0) to the end of the last turn
	// (index len(turns)): the first-turn error plus the spacing errors of
	// the turns below.
	HeightDeltasMM []float64
	// StripWidthDeltaMM is the matching strip's width error as cut
	// (the width error less the kerf's excess).
	StripWidthDeltaMM float64
	// StripHeightDeltaMM is the strip's height error above the reflector.
	StripHeightDeltaMM float64
}

// UnbuildableError reports a sampled wire that takes no set on the former.
type UnbuildableError struct {
	Turn int
	Err  error
}

// Error names the turn and the springback problem.
func (e *UnbuildableError) Error() string {
	return fmt.Sprintf("turn %d: %v", e.Turn, e.Err)
}

// Unwrap returns the springback error.
func (e *UnbuildableError) Unwrap() error { return e.Err }

// chain turns one kit's input values (in the order of ins) into the kit as
// built: the sampled wire is wound on the nominal former and released
// through the springback model, turn by turn, and the winding, height and
// strip errors are added.
func chain(d *parts.Design, ins []input, vals []float64) (Build, error) {
	n := len(d.Turns)
	b := Build{WireDiameterMM: d.Wire.Diameter, YieldFactor: 1,
		DiametersMM: make([]float64, n), DiameterDeltasMM: make([]float64, n), HeightDeltasMM: make([]float64, n+1)}
	winding := make([]float64, n)
	spacing := make([]float64, n)
	kerf := 0.0
	for i, in := range ins {
		v := vals[i]
		switch in.kind {
		case kindYield:
			b.YieldFactor = v
		case kindWireDiameter:
			b.WireDiameterMM += v
		case kindTurnDiameter:
			winding[in.turn] = v
		case kindTurnSpacing:
			spacing[in.turn] = v
		case kindFirstTurn:
			b.HeightDeltasMM[0] = v
		case kindStripWidth:
			b.StripWidthDeltaMM += v
		case kindStripHeight:
			b.StripHeightDeltaMM = v
		case kindKerf:
			kerf = v
		}
	}
	// A kerf wider than planned takes half the excess off each edge.
	b.StripWidthDeltaMM -= kerf
	for i := range n {
		b.HeightDeltasMM[i+1] = b.HeightDeltasMM[i] + spacing[i]
	}
	model := d.Wire.Model
	if b.YieldFactor != 1 || b.WireDiameterMM != d.Wire.Diameter {
		var err error
		model, err = wire.NewSpringback(wire.RoundSection{Diameter: b.WireDiameterMM}, d.Wire.Model.Law().Scaled(b.YieldFactor), 0)
		if err != nil {
			return Build{}, &UnbuildableError{Turn: 1, Err: err}
		}
	}
	for i, t := range d.Turns {
		mid := (t.StartPhi + t.EndPhi) / 2
		released := t.PredictedDiameterMM
		if model != d.Wire.Model {
			w, err := model.Relax(d.Former.Radius(mid), d.Former.SpacingAt(mid))
			if err != nil {
				return Build{}, &UnbuildableError{Turn: t.Index, Err: err}
			}
			released = 2 * w.RelaxedRadius
		}
		b.DiametersMM[i] = released + winding[i]
		b.DiameterDeltasMM[i] = b.DiametersMM[i] - t.PredictedDiameterMM
	}
	return b, nil
}
