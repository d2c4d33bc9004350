package tolerance

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"runtime"
	"slices"
	"sync"

	"coilwright/parts"
	"coilwright/parts/report"
	"coilwright/parts/spec"
)

// Options tunes Run. The zero value takes everything from the spec.
type Options struct {
	// Samples overrides tolerance.samples when positive.
	Samples int
	// VSWRTarget overrides the spec's VSWR target when positive.
	VSWRTarget float64
	// RefOhm is the feed cable's impedance; zero means 50 Ω.
	RefOhm float64
}

// defaultRefOhm is the feed cable's impedance when Options leaves it out.
const defaultRefOhm = 50.0

// streamSalt separates the kits' PCG streams from the seed's own; any
// fixed odd constant will do.
const streamSalt = 0x9e3779b97f4a7c15

// Run simulates the batch of design d, solving each kit with ev, and
// returns the report. It fails when the nominal design cannot be solved.
// Kits whose wire takes no set on the former count as not meeting the
// target; kits the field model cannot represent (a geometry outside the
// thin-wire kernel's limits) are counted apart and left out of the share,
// and an input whose ±1σ step the model cannot represent on one side is
// differenced on the other. The result is the same on any number of cores.
func Run(d *parts.Design, ev Evaluator, opt Options) (*report.ToleranceReport, error) {
	if d == nil || ev == nil {
		return nil, errors.New("tolerance: nil design or evaluator")
	}
	ins, err := inputs(d)
	if err != nil {
		return nil, err
	}
	band := bandOf(d, opt)
	n := d.Spec.Tolerance.Samples
	if opt.Samples > 0 {
		n = opt.Samples
	}
	if n < 1 {
		return nil, fmt.Errorf("tolerance: %d samples", n)
	}
	seed := d.Spec.Tolerance.SeedValue()
	kits := make([]report.ToleranceKit, n)
	sens := newSensitivityRuns(ins)
	// Every solve of the analysis (the nominal design, the kits, the
	// sensitivities' ±1σ designs) is one job of one pool, so the
	// evaluator's solves can each run on one goroutine.
	var nominal solved
	var nominalErr error
	parallelFor(1+n+sens.jobs(), func(j int) {
		switch {
		case j == 0:
			nominal, nominalErr = solveAt(d, ev, band, ins, nominalValues(ins))
		case j <= n:
			kits[j-1] = solveKit(d, ev, band, ins, seed, j-1)
		default:
			sens.run(d, ev, band, ins, j-1-n)
		}
	})
	if nominalErr != nil {
		return nil, fmt.Errorf("tolerance: nominal design: %w", nominalErr)
	}
	rep := &report.ToleranceReport{Samples: n, Seed: seed, VSWRTarget: band.VSWRTarget,
		BandLowMHz: band.LowMHz, BandHighMHz: band.HighMHz, Nominal: nominal.fig, Kits: kits}
	for _, in := range ins {
		rep.Inputs = append(rep.Inputs, in.info)
	}
	met := 0
	for _, k := range kits {
		if k.Meets {
			met++
		}
		switch {
		case !k.Buildable:
			rep.Unbuildable++
		case k.Unmodelled != "":
			rep.Unmodelled++
			if rep.UnmodelledProblem == "" {
				rep.UnmodelledProblem = k.Unmodelled
			}
		}
	}
	// A kit the field model cannot represent is neither a pass nor a
	// failure: the share is of the kits that were built and solved or
	// could not be built.
	if judged := n - rep.Unmodelled; judged > 0 {
		rep.Share = float64(met) / float64(judged)
	}
	if m, ok := ev.(describer); ok {
		rep.Model = m.Describe(band)
	}
	rep.Figures = distributions(kits, nominal.fig)
	rep.Sensitivities = sens.result(ins, nominal.fig)
	rep.Inspection = inspection(d, kits, rep.Sensitivities, d.Spec.Tolerance.InspectionShare)
	return rep, nil
}

// describer is an Evaluator that can state its model and accuracy.
type describer interface {
	Describe(b Band) report.ToleranceModel
}

// bandOf returns the band and target a kit must meet: the design's band
// (parts.BandOf: the spec's edges, or the centre frequency ± 3 %).
func bandOf(d *parts.Design, opt Options) Band {
	s := d.Spec
	b := Band{CentreMHz: s.FrequencyMHz, RefOhm: defaultRefOhm, VSWRTarget: specTarget(s)}
	b.LowMHz, b.HighMHz = parts.BandMHz(s)
	if opt.RefOhm > 0 {
		b.RefOhm = opt.RefOhm
	}
	if opt.VSWRTarget > 0 {
		b.VSWRTarget = opt.VSWRTarget
	}
	return b
}

// solveKit draws kit i's inputs, builds and solves it; a kit that cannot
// be built or solved is marked so.
func solveKit(d *parts.Design, ev Evaluator, band Band, ins []input, seed uint64, i int) report.ToleranceKit {
	vals := draw(ins, seed, i)
	k := report.ToleranceKit{Index: i + 1, Inputs: vals}
	b, err := chain(d, ins, vals)
	k.Buildable = err == nil
	if err == nil {
		k.DiametersMM = b.DiametersMM
		var r Response
		if r, err = ev.Evaluate(b); err == nil {
			k.Figures, err = figures(r, band)
		}
		if err != nil {
			k.Unmodelled = modelProblem(err)
		}
	}
	k.Meets = k.Solved() && k.Figures.WorstVSWR <= band.VSWRTarget
	return k
}

// solved is a kit's build and figures.
type solved struct {
	build Build
	fig   report.ToleranceFigures
}

// solveAt builds and solves the kit with input values vals.
func solveAt(d *parts.Design, ev Evaluator, band Band, ins []input, vals []float64) (solved, error) {
	b, err := chain(d, ins, vals)
	if err != nil {
		return solved{}, err
	}
	r, err := ev.Evaluate(b)
	if err != nil {
		return solved{}, err
	}
	f, err := figures(r, band)
	return solved{build: b, fig: f}, err
}

// nominalValues returns every input at its nominal value.
func nominalValues(ins []input) []float64 {
	v := make([]float64, len(ins))
	for i, in := range ins {
		v[i] = in.nominal()
	}
	return v
}

// draw returns kit i's input values: one standard-normal draw per input,
// in input order, from the kit's own PCG stream.
func draw(ins []input, seed uint64, i int) []float64 {
	rng := rand.New(rand.NewPCG(seed, streamSalt^uint64(i)))
	v := make([]float64, len(ins))
	for j, in := range ins {
		v[j] = in.value(rng.NormFloat64())
	}
	return v
}

// parallelFor runs f(0..n-1) on GOMAXPROCS workers; each index is run
// once and writes only its own slot.
func parallelFor(n int, f func(i int)) {
	workers := min(runtime.GOMAXPROCS(0), n)
	var wg sync.WaitGroup
	next := make(chan int)
	for range workers {
		wg.Go(func() {
			for i := range next {
				f(i)
			}
		})
	}
	for i := range n {
		next <- i
	}
	close(next)
	wg.Wait()
}

// modelProblem says why the field model could not solve a kit, without
// naming a spec key: the kit's geometry is a sampled one, not the spec's.
func modelProblem(err error) string {
	var se *spec.SpecError
	if errors.As(err, &se) {
		return se.Problem
	}
	return err.Error()
}

// distributions summarises the solved kits' figures.
func distributions(kits []report.ToleranceKit, nominal report.ToleranceFigures) []report.ToleranceDistribution {
	type fig struct {
		name, unit string
		get        func(report.ToleranceFigures) float64
	}
	figs := []fig{
		{"matched-band centre", "MHz", func(f report.ToleranceFigures) float64 { return f.CentreMHz }},
		{"lowest VSWR", "", func(f report.ToleranceFigures) float64 { return f.MinVSWR }},
		{"band-edge VSWR", "", func(f report.ToleranceFigures) float64 { return f.EdgeVSWR }},
		{"worst VSWR in band", "", func(f report.ToleranceFigures) float64 { return f.WorstVSWR }},
		{"gain on axis", "dBic", func(f report.ToleranceFigures) float64 { return f.GainDBic }},
		{"axial ratio on axis", "dB", func(f report.ToleranceFigures) float64 { return f.AxialRatioDB }},
	}
	out := make([]report.ToleranceDistribution, len(figs))
	for i, f := range figs {
		var v []float64
		for _, k := range kits {
			if k.Solved() {
				v = append(v, f.get(k.Figures))
			}
		}
		out[i] = summarise(f.name, f.unit, v)
		out[i].Nominal = f.get(nominal)
	}
	return out
}

// summarise returns the mean, sample standard deviation and percentiles
// of v (linear interpolation between order statistics, Hyndman and Fan's
// definition 7).
func summarise(name, unit string, v []float64) report.ToleranceDistribution {
	d := report.ToleranceDistribution{Name: name, Unit: unit, Values: v}
	if len(v) == 0 {
		return d
	}
	sum := 0.0
	for _, x := range v {
		sum += x
	}
	d.Mean = sum / float64(len(v))
	if len(v) > 1 {
		ss := 0.0
		for _, x := range v {
			ss += (x - d.Mean) * (x - d.Mean)
		}
		d.SD = math.Sqrt(ss / float64(len(v)-1))
	}
	s := slices.Clone(v)
	slices.Sort(s)
	d.Min, d.Max = s[0], s[len(s)-1]
	d.P5, d.P50, d.P95 = quantile(s, 0.05), quantile(s, 0.5), quantile(s, 0.95)
	return d
}

// quantile returns the p-quantile of sorted s. Source: Hyndman and Fan,
// "Sample quantiles in statistical packages", Am. Stat. 50, 1996,
// definition 7.
func quantile(s []float64, p float64) float64 {
	h := p * float64(len(s)-1)
	i := int(math.Floor(h))
	if i >= len(s)-1 {
		return s[len(s)-1]
	}
	return s[i] + (h-float64(i))*(s[i+1]-s[i])
}
