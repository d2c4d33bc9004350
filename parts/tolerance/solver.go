package tolerance

import (
	"fmt"
	"math"
	"slices"
	"strconv"

	"coilwright/parts"
	"coilwright/parts/em"
	"coilwright/parts/field"
	"coilwright/parts/report"
)

// The loop model. Each kit is solved over an ideal ground at LoopPoints
// frequencies of the full sweep (its first and last and evenly between)
// plus the centre frequency, on a coarser mesh of LoopSegmentsPerWavelength
// (never under the solver's four radii). When the full model's solution of
// the nominal design is given, every kit's impedance, gain and axial ratio
// are corrected by the full model's difference from the loop model on the
// nominal design at those frequencies (an additive correction: the loop
// model supplies the change a kit's errors make, the full model the level;
// output space mapping, Bandler et al., "Space
// mapping: the state of the art", IEEE Trans. MTT-52(1), 2004). The
// impedance between the frequencies is interpolated by splines. What this
// gives up is measured on the nominal design (Describe).
const (
	LoopPoints                = 4
	LoopSegmentsPerWavelength = 12.0
)

// SolverEvaluator solves kits with the field solver over an ideal ground
// at a few frequencies. The nominal geometry is built once; each kit
// moves its points (turn diameters and heights, the strip with the wire
// it is soldered under, the lead's run to it) and radii (wire and strip
// width) and is solved without rebuilding.
type SolverEvaluator struct {
	d    *parts.Design
	st   *field.Structure
	opt  field.Options
	rhcp bool
	// moved lists the conductor's point indices on the strip and the
	// winding with their azimuths; onStrip marks the strip's.
	moved   []int
	phi     []float64
	onStrip []bool
	// lead lists the lead's points after the pin with their fraction of
	// the way from the pin's top to the lead's end, which follows the
	// strip or the winding.
	lead     []int
	leadFrac []float64
	leadEnd  int
	// wireSeg and stripSeg list the segments of the wire's radius (lead,
	// link, coil) and of the strip; pinSeg is the feed pin's one segment
	// (-1 when there is none) and pinRadius the cable's centre conductor's
	// radius, which the model thins on a short pin as field.Build does.
	wireSeg, stripSeg []int
	pinSeg            int
	pinRadius         float64
	// mids and bounds are the turns' middle and boundary azimuths.
	mids, bounds []float64
	// full is the full model's response of the nominal design (nil when
	// not given); loop the loop model's, uncorrected; corr the correction
	// added to each kit's response, at the loop's frequencies.
	full, loop *Response
	corr       Response
	unknowns   int
	fullModel  string
}

// NewSolverEvaluator builds design d's geometry for the loop model. full,
// when not nil, is the full model's solution of the nominal design; the
// loop model is then corrected to it (see LoopPoints). Errors are the field
// solver's (*spec.SpecError naming the key to change).
func NewSolverEvaluator(d *parts.Design, full *field.Result) (*SolverEvaluator, error) {
	rhcp := d.Coil.Hand == parts.RightHand
	var all []float64
	if full != nil {
		for _, p := range full.Points {
			all = append(all, p.FrequencyMHz)
		}
	} else {
		all = field.Options{}.Frequencies(d.Spec)
	}
	freqs := loopFrequencies(all, d.Spec.FrequencyMHz)
	opt := field.Options{Reflector: field.IdealGround, AxisOnly: true, FrequenciesMHz: freqs, SegmentsPerWavelength: LoopSegmentsPerWavelength}
	st, err := field.Build(d, opt)
	if err != nil {
		return nil, err
	}
	e := &SolverEvaluator{d: d, st: st, opt: opt, rhcp: rhcp, leadEnd: -1, pinSeg: -1, pinRadius: st.PinRadius}
	if st.CablePinRadius > 0 {
		e.pinRadius = st.CablePinRadius
	}
	w := st.Conductor()
	hand := float64(d.Coil.Hand)
	prev, last := 0.0, -1
	var leadFrom int
	for _, p := range st.Parts {
		for s := p.From; s < p.To; s++ {
			switch p.Name {
			case field.PartStrip:
				e.stripSeg = append(e.stripSeg, s)
			case field.PartLead, field.PartLink, field.PartCoil:
				e.wireSeg = append(e.wireSeg, s)
			}
		}
		switch p.Name {
		case field.PartPin:
			leadFrom = p.To
			if p.To == p.From+1 {
				e.pinSeg = p.From
			}
		case field.PartLead:
			for i := p.From + 1; i <= p.To; i++ {
				e.lead = append(e.lead, i)
			}
			e.leadEnd = p.To
		case field.PartStrip, field.PartLink, field.PartCoil:
			for i := p.From; i <= p.To; i++ {
				if i == last {
					continue
				}
				q := w.Points[i]
				// Unwrap: points advance well under half a turn apiece.
				phi := prev + math.Remainder(math.Atan2(hand*q.Y, q.X)-prev, 2*math.Pi)
				e.moved, e.phi = append(e.moved, i), append(e.phi, phi)
				e.onStrip = append(e.onStrip, p.Name == field.PartStrip || (p.Name == field.PartLink && i == p.From))
				prev, last = phi, i
			}
		}
	}
	if len(e.moved) == 0 {
		return nil, fmt.Errorf("tolerance: the solver's model has no winding")
	}
	if e.leadEnd >= 0 {
		a, b := w.Points[leadFrom], w.Points[e.leadEnd]
		for _, i := range e.lead {
			e.leadFrac = append(e.leadFrac, w.Points[i].Sub(a).Len()/b.Sub(a).Len())
		}
	}
	e.mids = make([]float64, len(d.Turns))
	for i, t := range d.Turns {
		e.mids[i] = (t.StartPhi + t.EndPhi) / 2
	}
	e.bounds = make([]float64, len(d.Turns)+1)
	for i := range e.bounds {
		e.bounds[i] = math.Min(2*math.Pi*float64(i), d.Coil.Span())
	}
	r, err := st.Sweep(opt)
	if err != nil {
		return nil, err
	}
	// Run solves many kits in parallel: each kit's sweep then runs on
	// the goroutine that asks for it, so the work is parallel at one
	// level only (the result does not depend on it).
	e.opt.Workers = 1
	e.unknowns = r.Unknowns
	loop := response(append(slices.Clone(r.Points), r.Centre), rhcp)
	e.loop = &loop
	e.corr = Response{FrequencyMHz: loop.FrequencyMHz, Impedance: make([]complex128, len(loop.FrequencyMHz)),
		GainDBic: make([]float64, len(loop.FrequencyMHz)), AxialRatioDB: make([]float64, len(loop.FrequencyMHz))}
	if full != nil {
		f := response(append(slices.Clone(full.Points), full.Centre), rhcp)
		e.full = &f
		e.fullModel = full.Reflector
		for i, fr := range loop.FrequencyMHz {
			j := slices.Index(f.FrequencyMHz, fr)
			if j < 0 {
				return nil, fmt.Errorf("tolerance: the full model has no solution at %g MHz", fr)
			}
			e.corr.Impedance[i] = f.Impedance[j] - loop.Impedance[i]
			e.corr.GainDBic[i] = f.GainDBic[j] - loop.GainDBic[i]
			e.corr.AxialRatioDB[i] = f.AxialRatioDB[j] - loop.AxialRatioDB[i]
		}
	}
	return e, nil
}

// loopFrequencies picks LoopPoints of the full sweep's frequencies (its
// ends and evenly between), leaving out one on the centre frequency, which
// the solver adds.
func loopFrequencies(all []float64, centre float64) []float64 {
	var out []float64
	n := len(all)
	for k := range min(LoopPoints, n) {
		i := 0
		if LoopPoints > 1 {
			i = int(math.Round(float64(k) * float64(n-1) / float64(LoopPoints-1)))
		}
		if f := all[i]; f != centre && !slices.Contains(out, f) {
			out = append(out, f)
		}
	}
	return out
}

// Describe states the loop model and compares it, uncorrected, with the
// full model on the nominal design; after the correction the two agree at
// the loop's frequencies and differ only by the interpolation between
// them, also stated.
func (e *SolverEvaluator) Describe(b Band) report.ToleranceModel {
	m := report.ToleranceModel{Points: len(e.loop.FrequencyMHz)}
	m.Description = fmt.Sprintf("ideal ground, %d frequencies (%s MHz), about %g segments per wavelength (%d unknowns), impedance interpolated by splines",
		m.Points, joinMHz(e.loop.FrequencyMHz), LoopSegmentsPerWavelength, e.unknowns)
	if e.full == nil {
		m.Description += "; the full model did not run, so the loop model's figures are not corrected and its accuracy is not known"
		return m
	}
	full, err1 := figures(*e.full, b)
	loop, err2 := figures(*e.loop, b)
	corrected, err3 := figures(e.corrected(*e.loop), b)
	if err1 != nil || err2 != nil || err3 != nil {
		return m
	}
	m.FullCentreMHz, m.FullEdgeVSWR, m.FullGainDBic = full.CentreMHz, full.EdgeVSWR, full.GainDBic
	m.CentreErrorMHz, m.EdgeVSWRError, m.GainErrorDB = loop.CentreMHz-full.CentreMHz, loop.EdgeVSWR-full.EdgeVSWR, loop.GainDBic-full.GainDBic
	m.CorrectedCentreErrorMHz, m.CorrectedEdgeVSWRError, m.CorrectedGainErrorDB = corrected.CentreMHz-full.CentreMHz, corrected.EdgeVSWR-full.EdgeVSWR, corrected.GainDBic-full.GainDBic
	m.Description += fmt.Sprintf("; corrected to the full model (%s reflector, %d frequencies) on the nominal design. Uncorrected, the loop model is off by %+.0f MHz in the best match, %+.2f in band-edge VSWR and %+.2f dB in gain; corrected, by %+.0f MHz, %+.3f and %+.3f dB (interpolation only)",
		e.fullModel, len(e.full.FrequencyMHz), m.CentreErrorMHz, m.EdgeVSWRError, m.GainErrorDB, m.CorrectedCentreErrorMHz, m.CorrectedEdgeVSWRError, m.CorrectedGainErrorDB)
	return m
}

// corrected adds the correction to a loop-model response.
func (e *SolverEvaluator) corrected(r Response) Response {
	out := Response{FrequencyMHz: r.FrequencyMHz, Impedance: slices.Clone(r.Impedance), GainDBic: slices.Clone(r.GainDBic), AxialRatioDB: slices.Clone(r.AxialRatioDB)}
	for i := range out.FrequencyMHz {
		out.Impedance[i] += e.corr.Impedance[i]
		out.GainDBic[i] += e.corr.GainDBic[i]
		out.AxialRatioDB[i] = math.Max(0, out.AxialRatioDB[i]+e.corr.AxialRatioDB[i])
	}
	return out
}

// joinMHz lists frequencies as "5368, 5544, …".
func joinMHz(fs []float64) string {
	s := ""
	for i, f := range fs {
		if i > 0 {
			s += ", "
		}
		s += strconv.FormatFloat(f, 'f', 0, 64)
	}
	return s
}

// Evaluate moves the nominal geometry to kit b and solves it on the
// calling goroutine.
func (e *SolverEvaluator) Evaluate(b Build) (Response, error) {
	w0 := e.st.Conductor()
	w := em.Wire{Points: slices.Clone(w0.Points), Radius: slices.Clone(w0.Radius), Conductivity: w0.Conductivity}
	for j, i := range e.moved {
		p := w.Points[i]
		r := math.Hypot(p.X, p.Y)
		f := (r + linear(e.mids, b.DiameterDeltasMM, e.phi[j])/2) / r
		p.X, p.Y = p.X*f, p.Y*f
		p.Z += linear(e.bounds, b.HeightDeltasMM, e.phi[j])
		if e.onStrip[j] {
			p.Z += b.StripHeightDeltaMM
		}
		w.Points[i] = p
	}
	if e.leadEnd >= 0 {
		shift := w.Points[e.leadEnd].Sub(w0.Points[e.leadEnd])
		for k, i := range e.lead[:len(e.lead)-1] {
			w.Points[i] = w0.Points[i].Add(shift.Scale(e.leadFrac[k]))
		}
	}
	a := b.WireDiameterMM / 2
	for _, s := range e.wireSeg {
		w.Radius[s] = a
	}
	for _, s := range e.stripSeg {
		w.Radius[s] += b.StripWidthDeltaMM / 4
	}
	if s := e.pinSeg; s >= 0 {
		// A kit whose first turn sits lower has a shorter pin: model it
		// thinner as field.Build models a short pin, so that its one
		// segment stays within the kernel's limits.
		l := w.Points[s+1].Sub(w.Points[s]).Len()
		r := math.Min(e.pinRadius, l/field.KernelMinSegmentRadii)
		if r*field.KernelMinSegmentRadii > l { // rounding: keep l ≥ the kernel's limit
			r = math.Nextafter(r, 0)
		}
		w.Radius[s] = r
	}
	st := *e.st
	st.Model.Wires = append([]em.Wire{w}, e.st.Model.Wires[1:]...)
	r, err := st.Sweep(e.opt)
	if err != nil {
		return Response{}, err
	}
	return e.corrected(response(append(slices.Clone(r.Points), r.Centre), e.rhcp)), nil
}

// response orders solver points by frequency into a Response, dropping
// repeats.
func response(pts []field.Point, rhcp bool) Response {
	slices.SortStableFunc(pts, func(a, b field.Point) int {
		switch {
		case a.FrequencyMHz < b.FrequencyMHz:
			return -1
		case a.FrequencyMHz > b.FrequencyMHz:
			return 1
		}
		return 0
	})
	pts = slices.CompactFunc(pts, func(a, b field.Point) bool { return a.FrequencyMHz == b.FrequencyMHz })
	var out Response
	for _, p := range pts {
		out.FrequencyMHz = append(out.FrequencyMHz, p.FrequencyMHz)
		out.Impedance = append(out.Impedance, p.Impedance)
		out.GainDBic = append(out.GainDBic, p.AxisCoPolarDBic(rhcp))
		out.AxialRatioDB = append(out.AxialRatioDB, p.AxialRatioDB)
	}
	return out
}
