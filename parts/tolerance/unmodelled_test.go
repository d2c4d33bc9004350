package tolerance

import (
	"math"
	"strings"
	"testing"

	"coilwright/parts/em"
	"coilwright/parts/spec"
)

// limitedModel is the stand-in resonator with the field model's limits: a
// kit whose first turn sits lower than the nominal cannot be segmented
// (as a feed pin too short for the kernel), and any change of the strip's
// height cannot be represented at all. The refusal is the field package's
// kind: a spec error naming a key the spec may not set.
type limitedModel struct{ resonator }

func (m limitedModel) Evaluate(b Build) (Response, error) {
	ge := &em.GeometryError{Kind: em.ShortSegment, Wire: 0, Segment: 0, Value: 0.2, Limit: 0.3}
	if b.HeightDeltasMM[0] < 0 || b.StripHeightDeltaMM != 0 {
		return Response{}, &spec.SpecError{Key: "coil.first_turn_height_mm", Value: "0.7",
			Problem: "the field model cannot segment the feed pin: " + ge.Error(), Fix: "raise the first turn"}
	}
	return m.resonator.Evaluate(b)
}

func TestKitsTheModelCannotRepresentAreCounted(t *testing.T) {
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 200\n")
	rep, err := Run(d, limitedModel{resonator{d}}, Options{})
	if err != nil {
		t.Fatalf("Run refused the spec over sampled kits: %v", err)
	}
	// Every kit draws a strip-height error (a continuous normal draw is
	// never exactly zero), so no kit can be solved.
	if rep.Unmodelled != rep.Samples || rep.Unbuildable != 0 {
		t.Errorf("unmodelled %d, unbuildable %d of %d kits, want all unmodelled", rep.Unmodelled, rep.Unbuildable, rep.Samples)
	}
	if !strings.Contains(rep.UnmodelledProblem, "cannot segment the feed pin") || strings.Contains(rep.UnmodelledProblem, "coil.first_turn_height_mm") {
		t.Errorf("problem %q: want the model's problem without the key", rep.UnmodelledProblem)
	}
	for _, k := range rep.Kits {
		if k.Meets || k.Solved() {
			t.Fatalf("kit %d counted as solved", k.Index)
		}
	}

	// One-sided: the first turn's +1σ kit solves, the −1σ one does not.
	// The effect must be the forward difference (nominal to +1σ), scaled
	// to the 3σ limit. Source: the forward difference f(x+h) − f(x), any
	// numerical analysis text (e.g. Burden and Faires, Numerical
	// Analysis, §4.1).
	ins, _ := inputs(d)
	band := bandOf(d, Options{})
	nom, err := solveAt(d, resonator{d}, band, ins, nominalValues(ins))
	if err != nil {
		t.Fatal(err)
	}
	var first, strip = -1, -1
	for i, in := range ins {
		switch in.kind {
		case kindFirstTurn:
			first = i
		case kindStripHeight:
			strip = i
		}
	}
	vals := nominalValues(ins)
	vals[first] = ins[first].value(1)
	up, err := solveAt(d, resonator{d}, band, ins, vals)
	if err != nil {
		t.Fatal(err)
	}
	want := limitSigmas * (up.fig.CentreMHz - nom.fig.CentreMHz)
	found := map[string]bool{}
	for _, s := range rep.Sensitivities {
		switch s.Name {
		case ins[first].info.Name:
			found[s.Name] = true
			if math.Abs(s.CentreMHz-want) > 1e-9 || s.Step == "" || !strings.Contains(s.Words, "one-sided") {
				t.Errorf("first turn: %+v, want a one-sided %g MHz", s, want)
			}
		case ins[strip].info.Name:
			found[s.Name] = true
			if s.Unmodelled == "" || s.Share != 0 || !strings.Contains(s.Words, "neither the −1σ nor the +1σ kit can be solved") {
				t.Errorf("strip height: %+v, want it marked unmodelled", s)
			}
		default:
			if s.Step != "" || s.Unmodelled != "" {
				t.Errorf("%s: %+v, want a central difference", s.Name, s)
			}
		}
	}
	if len(found) != 2 {
		t.Errorf("sensitivities %v: want the first turn and the strip height", found)
	}
}
