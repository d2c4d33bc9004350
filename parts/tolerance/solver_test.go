package tolerance

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"math/cmplx"
	"runtime"
	"slices"
	"testing"

	"coilwright/parts"
	"coilwright/parts/field"
	"coilwright/parts/report"
	"coilwright/parts/spec"
)

// samePointsRelTol is how closely the nominal geometry, moved by nothing,
// must reproduce the built one: the same points, so rounding only.
const samePointsRelTol = 1e-9

// resegmentRelTol is how closely a moved geometry must agree with the same
// coil rebuilt: the rebuild cuts the longer wire into a few more segments,
// which moves the impedance by a fraction of the 3 % the solver's own
// convergence test allows for 1.5 times the density. Common practice (no
// published source).
const resegmentRelTol = 0.005

func TestSolverEvaluatorMovesLikeARebuild(t *testing.T) {
	if testing.Short() {
		t.Skip("solves the demo several times")
	}
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			d := demoDesign(t, demo, "")
			e, err := NewSolverEvaluator(d, nil)
			if err != nil {
				t.Fatal(err)
			}
			ins, _ := inputs(d)
			nom, err := chain(d, ins, nominalValues(ins))
			if err != nil {
				t.Fatal(err)
			}
			// Nominal: the moved geometry is the built one.
			got, err := e.Evaluate(nom)
			if err != nil {
				t.Fatal(err)
			}
			want, err := field.Sweep(d, e.opt)
			if err != nil {
				t.Fatal(err)
			}
			nominal := got
			compare(t, "nominal", got, response(append(want.Points, want.Centre), e.rhcp), samePointsRelTol)
			// Every turn 0.4 mm larger: the same as a coil built 0.2 mm
			// larger in radius, strip and lead following it.
			const delta = 0.4
			b := nom
			b.DiameterDeltasMM = make([]float64, len(nom.DiameterDeltasMM))
			for i := range b.DiameterDeltasMM {
				b.DiameterDeltasMM[i] = delta
			}
			got, err = e.Evaluate(b)
			if err != nil {
				t.Fatal(err)
			}
			d2 := *d
			d2.Coil.StartRadius += delta / 2
			d2.Coil.EndRadius += delta / 2
			want, err = field.Sweep(&d2, e.opt)
			if err != nil {
				t.Fatal(err)
			}
			rebuilt := response(append(want.Points, want.Centre), e.rhcp)
			compare(t, "larger coil", got, rebuilt, resegmentRelTol)
			// The move itself must be far larger than the disagreement,
			// or the check above proves nothing.
			for i := range got.Impedance {
				moved, off := cmplx.Abs(got.Impedance[i]-nominal.Impedance[i]), cmplx.Abs(got.Impedance[i]-rebuilt.Impedance[i])
				if !(moved > 5*off) {
					t.Errorf("at %.0f MHz the coil moved Z by %.3f Ω, only %.1f× its %.3f Ω disagreement with the rebuild", got.FrequencyMHz[i], moved, moved/off, off)
				}
			}
		})
	}
}

func compare(t *testing.T, what string, got, want Response, tol float64) {
	t.Helper()
	if len(got.Impedance) != len(want.Impedance) {
		t.Fatalf("%s: %d points, want %d", what, len(got.Impedance), len(want.Impedance))
	}
	for i := range got.Impedance {
		if e := cmplx.Abs(got.Impedance[i]-want.Impedance[i]) / cmplx.Abs(want.Impedance[i]); e > tol {
			t.Errorf("%s at %.0f MHz: Z %.4f, rebuilt %.4f", what, got.FrequencyMHz[i], got.Impedance[i], want.Impedance[i])
		}
	}
}

func TestSolverBatchIsDeterministicAcrossCores(t *testing.T) {
	if testing.Short() {
		t.Skip("solves a small batch twice")
	}
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 6\nseed = 3\n")
	run := func(procs int) []byte {
		defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
		e, err := NewSolverEvaluator(d, nil)
		if err != nil {
			t.Fatal(err)
		}
		rep, err := Run(d, e, Options{})
		if err != nil {
			t.Fatal(err)
		}
		var b bytes.Buffer
		if err := json.NewEncoder(&b).Encode(rep); err != nil {
			t.Fatal(err)
		}
		for _, k := range rep.Kits {
			fmt.Fprintln(&b, k)
		}
		return b.Bytes()
	}
	if !bytes.Equal(run(1), run(2)) {
		t.Error("the solved batch differs between 1 and 2 cores")
	}
}

func TestSolverSensitivityMatchesDirectDifference(t *testing.T) {
	if testing.Short() {
		t.Skip("solves the demo's sensitivities")
	}
	// The reported effect of turn 1's diameter runs through the sampler's
	// chain; the direct difference moves turn 1 of a hand-made build by
	// ±1σ and solves it. They must agree to rounding.
	const agree = 1e-9
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 1\n")
	e, err := NewSolverEvaluator(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	rep, err := Run(d, e, Options{})
	if err != nil {
		t.Fatal(err)
	}
	ins, _ := inputs(d)
	sigma := d.Spec.Tolerance.TurnDiameterMM / limitSigmas
	band := bandOf(d, Options{})
	at := func(delta float64) report.ToleranceFigures {
		b, err := chain(d, ins, nominalValues(ins))
		if err != nil {
			t.Fatal(err)
		}
		b.DiametersMM[0] += delta
		b.DiameterDeltasMM[0] += delta
		r, err := e.Evaluate(b)
		if err != nil {
			t.Fatal(err)
		}
		f, err := figures(r, band)
		if err != nil {
			t.Fatal(err)
		}
		return f
	}
	up, down := at(sigma), at(-sigma)
	direct := limitSigmas * (up.WorstVSWR - down.WorstVSWR) / 2
	for _, s := range rep.Sensitivities {
		if s.Name == "turn 1 diameter" {
			if math.Abs(s.WorstVSWR-direct) > agree {
				t.Errorf("reported %g, direct difference %g", s.WorstVSWR, direct)
			}
			if s.WorstVSWR == 0 {
				t.Error("turn 1's diameter has no effect at all")
			}
			return
		}
	}
	t.Error("no sensitivity for turn 1 diameter")
}

func TestSolverEvaluatorThinsAShortPin(t *testing.T) {
	// A 12 GHz coil of 0.5 mm wire whose first turn sits 0.7 mm up has a
	// feed pin that the full model already thins to stay within the
	// kernel's limit (field.KernelMinSegmentRadii); a kit whose first turn
	// is lower still must be modelled the same way, not refused.
	s, err := spec.ParseSpec([]byte(`kit = "Short pin"
frequency_mhz = 12000.0
[coil]
shape = "cylindrical"
turns = 7.0
feed = "periphery"
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5
first_turn_height_mm = 0.7
[wire]
material = "copper-annealed"
diameter_mm = 0.5
[reflector]
shape = "disc"
`))
	if err != nil {
		t.Fatal(err)
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	e, err := NewSolverEvaluator(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	ins, _ := inputs(d)
	b, err := chain(d, ins, nominalValues(ins))
	if err != nil {
		t.Fatal(err)
	}
	// The whole coil moved from 1σ lower to 1σ higher in 0.1σ steps: the
	// pin shortens and lengthens, its modelled radius following.
	sigma := d.Spec.Tolerance.FirstTurnMM / limitSigmas
	for k := -10; k <= 10; k++ {
		kb := b
		kb.HeightDeltasMM = slices.Clone(b.HeightDeltasMM)
		for i := range kb.HeightDeltasMM {
			kb.HeightDeltasMM[i] += float64(k) / 10 * sigma
		}
		if _, err := e.Evaluate(kb); err != nil {
			t.Errorf("the first turn %+.1fσ: %v", float64(k)/10, err)
		}
	}
}
