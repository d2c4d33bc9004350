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
// returns the report. It fails when the nominal design cannot be solved;
// kits that cannot be built or solved count as not meeting the target.
// The result is the same on any number of cores.
func Run(d *parts.Design, ev Evaluator, opt Options) (*parts.ToleranceReport, error) {
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
	kits := make([]parts.ToleranceKit, n)
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
	rep := &parts.ToleranceReport{Samples: n, Seed: seed, VSWRTarget: band.VSWRTarget,
		BandLowMHz: band.LowMHz, BandHighMHz: band.HighMHz, Nominal: nominal.fig, Kits: kits}
	for _, in := range ins {
		rep.Inputs = append(rep.Inputs, in.info)
	}
	met := 0
	for _, k := range kits {
		if k.Meets {
			met++
		}
		if !k.Buildable {
			rep.Unbuildable++
		}
	}
	rep.Share = float64(met) / float64(n)
	if m, ok := ev.(describer); ok {
		rep.Model = m.Describe(band)
	}
	rep.Figures = distributions(kits, nominal.fig)
	if rep.Sensitivities, err = sens.result(ins, nominal.fig); err != nil {
		return nil, err
	}
	rep.Inspection = inspection(d, kits, rep.Sensitivities, d.Spec.Tolerance.InspectionShare)
	return rep, nil
}

// describer is an Evaluator that can state its model and accuracy.
type describer interface {
	Describe(b Band) parts.ToleranceModel
}

// bandOf returns the band and target a kit must meet: the spec's band
// edges, or the centre frequency alone when it gives none.
func bandOf(d *parts.Design, opt Options) Band {
	s := d.Spec
	b := Band{LowMHz: s.FrequencyMHz, CentreMHz: s.FrequencyMHz, HighMHz: s.FrequencyMHz, RefOhm: defaultRefOhm, VSWRTarget: specTarget(s)}
	if s.BandLowMHz != nil {
		b.LowMHz = *s.BandLowMHz
	}
	if s.BandHighMHz != nil {
		b.HighMHz = *s.BandHighMHz
	}
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
func solveKit(d *parts.Design, ev Evaluator, band Band, ins []input, seed uint64, i int) parts.ToleranceKit {
	vals := draw(ins, seed, i)
	k := parts.ToleranceKit{Index: i + 1, Inputs: vals}
	b, err := chain(d, ins, vals)
	if err == nil {
		k.DiametersMM = b.DiametersMM
		var r Response
		if r, err = ev.Evaluate(b); err == nil {
			k.Figures, err = figures(r, band)
		}
	}
	k.Buildable = err == nil
	k.Meets = k.Buildable && k.Figures.WorstVSWR <= band.VSWRTarget
	return k
}

// solved is a kit's build and figures.
type solved struct {
	build Build
	fig   parts.ToleranceFigures
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

// distributions summarises the buildable kits' figures.
func distributions(kits []parts.ToleranceKit, nominal parts.ToleranceFigures) []parts.ToleranceDistribution {
	type fig struct {
		name, unit string
		get        func(parts.ToleranceFigures) float64
	}
	figs := []fig{
		{"matched-band centre", "MHz", func(f parts.ToleranceFigures) float64 { return f.CentreMHz }},
		{"lowest VSWR", "", func(f parts.ToleranceFigures) float64 { return f.MinVSWR }},
		{"band-edge VSWR", "", func(f parts.ToleranceFigures) float64 { return f.EdgeVSWR }},
		{"worst VSWR in band", "", func(f parts.ToleranceFigures) float64 { return f.WorstVSWR }},
		{"gain on axis", "dBic", func(f parts.ToleranceFigures) float64 { return f.GainDBic }},
		{"axial ratio on axis", "dB", func(f parts.ToleranceFigures) float64 { return f.AxialRatioDB }},
	}
	out := make([]parts.ToleranceDistribution, len(figs))
	for i, f := range figs {
		var v []float64
		for _, k := range kits {
			if k.Buildable {
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
func summarise(name, unit string, v []float64) parts.ToleranceDistribution {
	d := parts.ToleranceDistribution{Name: name, Unit: unit, Values: v}
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
