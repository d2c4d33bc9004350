package tolerance

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"runtime"
	"testing"

	"coilwright/parts/report"
)

// zeroSpread sets every spread of the [tolerance] table to zero.
const zeroSpread = `[tolerance]
samples = 20
yield_cv = 0.0
wire_diameter_tol_mm = 0.0
turn_diameter_tol_mm = 0.0
turn_spacing_tol_mm = 0.0
first_turn_height_tol_mm = 0.0
strip_width_tol_mm = 0.0
strip_height_tol_mm = 0.0
kerf_tol_mm = 0.0
`

func TestZeroSpreadGivesNominal(t *testing.T) {
	d := demoDesign(t, "demo-5g8-cone.toml", zeroSpread)
	rep, err := Run(d, resonator{d}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	for _, k := range rep.Kits {
		if !k.Buildable || k.Figures != rep.Nominal {
			t.Fatalf("kit %d: %+v, want the nominal %+v", k.Index, k.Figures, rep.Nominal)
		}
		for i, dia := range k.DiametersMM {
			if dia != d.Turns[i].PredictedDiameterMM {
				t.Fatalf("kit %d turn %d: %g mm, want %g", k.Index, i+1, dia, d.Turns[i].PredictedDiameterMM)
			}
		}
	}
	if len(rep.Sensitivities) != 0 {
		t.Errorf("sensitivities without spread: %+v", rep.Sensitivities)
	}
}

func TestSamplerReproducesSpreads(t *testing.T) {
	// Bounds: the sample mean of N draws has standard error σ/√N and the
	// sample standard deviation about σ/√(2(N−1)) (normal theory; Source:
	// any statistics text, e.g. Kendall and Stuart, The Advanced Theory of
	// Statistics, vol. 1, ch. 10). Both are held to 4 standard errors. The
	// draws are seeded, so the test is deterministic; with other seeds it
	// would fail about once in 10⁴ runs.
	const n = 4000
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nyield_cv = 0.1\n")
	ins, err := inputs(d)
	if err != nil {
		t.Fatal(err)
	}
	vals := make([][]float64, n)
	for i := range vals {
		vals[i] = draw(ins, 7, i)
	}
	for j, in := range ins {
		mean, sd := 0.0, 0.0
		for _, v := range vals {
			mean += v[j]
		}
		mean /= n
		for _, v := range vals {
			sd += (v[j] - mean) * (v[j] - mean)
		}
		sd = math.Sqrt(sd / (n - 1))
		wantMean, wantSD := 0.0, in.sigma
		if in.kind == kindYield {
			wantMean = 1 // log-normal of mean 1 and CV σ: its SD is σ
		}
		seMean, seSD := in.sigma/math.Sqrt(n), in.sigma/math.Sqrt(2*(n-1))
		if in.kind == kindYield {
			// The log-normal's SD estimate is a little noisier than a
			// normal's (kurtosis); at CV 0.1 the excess kurtosis is 0.18,
			// widening the standard error by √(1 + κ/2) ≈ 1.05.
			seSD *= 1.05
		}
		if math.Abs(mean-wantMean) > 4*seMean {
			t.Errorf("%s: mean %g, want %g ± %g", in.info.Name, mean, wantMean, 4*seMean)
		}
		if math.Abs(sd-wantSD) > 4*seSD {
			t.Errorf("%s: sd %g, want %g ± %g", in.info.Name, sd, wantSD, 4*seSD)
		}
	}
}

func TestRunIsDeterministicAcrossCores(t *testing.T) {
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 64\nseed = 42\n")
	run := func(procs int) []byte {
		defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
		rep, err := Run(d, resonator{d}, Options{})
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
	one, two := run(1), run(2)
	if !bytes.Equal(one, two) {
		t.Error("the report differs between 1 and 2 cores")
	}
	if again := run(2); !bytes.Equal(two, again) {
		t.Error("the report differs between two runs")
	}
}

func TestSensitivityMatchesDirectDifference(t *testing.T) {
	// The reported effect of turn 2's diameter is a central difference
	// through the whole chain; here the same difference is taken directly
	// on the evaluator with a hand-made build, the nominal plus and minus
	// 1σ on turn 2 only. The stand-in's centre moves by
	// −f0·δ/(D₂·2) (its made-up law), which the direct difference must
	// reproduce to the interpolation grid.
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 10\n")
	rep, err := Run(d, resonator{d}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	ins, _ := inputs(d)
	var sigma float64
	for _, in := range ins {
		if in.kind == kindTurnDiameter && in.turn == 1 {
			sigma = in.sigma
		}
	}
	band := bandOf(d, Options{})
	at := func(delta float64) float64 {
		b, err := chain(d, ins, nominalValues(ins))
		if err != nil {
			t.Fatal(err)
		}
		b.DiametersMM[1] += delta
		b.DiameterDeltasMM[1] += delta
		r, _ := resonator{d}.Evaluate(b)
		f, err := figures(r, band)
		if err != nil {
			t.Fatal(err)
		}
		return f.CentreMHz
	}
	direct := limitSigmas * (at(sigma) - at(-sigma)) / 2
	exact := -limitSigmas * sigma * d.Spec.FrequencyMHz / (d.Turns[1].DiameterMM * 2)
	var got float64
	for _, s := range rep.Sensitivities {
		if s.Name == "turn 2 diameter" {
			got = s.CentreMHz
		}
	}
	// The fine grid reads the best match to half a step of 0.2·f0/800.
	step := 0.2 * d.Spec.FrequencyMHz / fineSteps
	if math.Abs(got-direct) > 1e-9 {
		t.Errorf("reported %g MHz, direct difference %g MHz", got, direct)
	}
	if math.Abs(direct-exact) > limitSigmas*step {
		t.Errorf("direct difference %g MHz, stand-in's law %g MHz", direct, exact)
	}
}

func TestInspectionNarrowsWithTighterTarget(t *testing.T) {
	d := demoDesign(t, "demo-5g8-cone.toml", "[tolerance]\nsamples = 400\n")
	band := func(target float64) report.ToleranceInspection {
		rep, err := Run(d, resonator{d}, Options{VSWRTarget: target})
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("VSWR %g: share %.2f, inspection %+v", target, rep.Share, rep.Inspection)
		return rep.Inspection
	}
	loose, tight := band(2.5), band(2.0)
	for i := range loose.ToleranceMM {
		if !(tight.ToleranceMM[i] < loose.ToleranceMM[i]) {
			t.Errorf("turn %d: ±%.3f mm at VSWR 2.0, not narrower than ±%.3f mm at 2.5", i+1, tight.ToleranceMM[i], loose.ToleranceMM[i])
		}
	}
}
