package field

import (
	"math"

	"coilwright/parts"
	"coilwright/parts/em"
)

// CutStep is the angular step of the centre-frequency pattern cuts, 2°.
const CutStep = 2 * math.Pi / 180

// CableOhm is the feed cable's characteristic impedance. Every cable type
// the spec accepts is a 50 Ω line. Source: published cable data (RG-402,
// RG-405, RG-316 are 50 Ω types).
const CableOhm = 50.0

// Sweep maps design d onto the solver and solves it across the sweep and
// at the centre frequency. Errors are *spec.SpecError naming the key to
// change.
func Sweep(d *parts.Design, opt Options) (*Result, error) {
	st, err := Build(d, opt)
	if err != nil {
		return nil, err
	}
	return st.Sweep(opt)
}

// Sweep solves a built structure at opt's frequencies and the design's
// centre frequency.
func (st *Structure) Sweep(opt Options) (*Result, error) {
	opt = opt.withDefaults()
	d := st.design
	m, err := em.NewMesh(st.Model, em.MeshOptions{MinSegmentRadii: KernelMinSegmentRadii, Workers: opt.Workers})
	if err != nil {
		return nil, st.specError(err)
	}
	freqs := opt.Frequencies(d.Spec)
	hz := make([]float64, len(freqs)+1)
	for i, f := range freqs {
		hz[i] = f * 1e6
	}
	hz[len(freqs)] = d.Spec.FrequencyMHz * 1e6
	sols, err := m.Sweep(hz)
	if err != nil {
		return nil, st.specError(err)
	}
	rhcp := d.Coil.Hand == parts.RightHand
	back := st.Reflector == PlateModel
	r := &Result{Reflector: st.Reflector.String(), Unknowns: m.Unknowns(), Segments: m.Segments(), CableOhm: CableOhm, RHCP: rhcp,
		PlateSpacingMM: st.PlateSpacing, MaxSegmentMM: st.MaxSegment, Assumptions: st.Assumptions()}
	pts := make([]Point, len(sols))
	parallel(opt.Workers, len(sols), func(i int) {
		pts[i] = networkPoint(sols[i], CableOhm)
		if !opt.AxisOnly {
			patternPoint(&pts[i], sols[i], rhcp, back)
		}
	})
	if err := checkFinite(pts); err != nil {
		return nil, st.specError(err)
	}
	r.Points, r.Centre = pts[:len(freqs)], pts[len(freqs)]
	if !opt.AxisOnly {
		c := sols[len(freqs)]
		for _, phi := range []float64{0, 90} {
			cp := c.Cut(phi*math.Pi/180, CutStep)
			cut := Cut{PhiDeg: phi, Samples: make([]CutSample, len(cp))}
			for i, s := range cp {
				cut.Samples[i] = CutSample{ThetaDeg: math.Round(s.Theta*180/math.Pi*1e6) / 1e6, RHCPDBic: dBic(s.Right), LHCPDBic: dBic(s.Left)}
			}
			r.Cuts = append(r.Cuts, cut)
		}
	}
	r.Summary = summarise(r, d)
	return r, nil
}

// checkFinite refuses a point with a NaN or infinite figure.
func checkFinite(pts []Point) error {
	for _, p := range pts {
		for _, v := range []float64{p.ResistanceOhm, p.ReactanceOhm, p.GammaMag, p.AxisRHCPDBic, p.AxisLHCPDBic, p.Efficiency,
			p.PeakRHCPDBic, p.PeakLHCPDBic, p.RealisedDBic, p.HPBWDeg[0], p.HPBWDeg[1], p.FrontToBackDB} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return &em.NotFiniteError{Frequency: p.FrequencyMHz * 1e6, Quantity: "a far-field figure"}
			}
		}
	}
	return nil
}
