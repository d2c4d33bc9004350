package kit

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"

	"coilwright/cam/touchstone"
	"coilwright/parts"
	"coilwright/parts/field"
)

// solveField runs the field solution when the spec's [solver] table asks
// for it and returns the design carrying it (d itself when it is off).
func solveField(d *parts.Design) (*parts.Design, error) {
	if !d.Spec.Solver.On() {
		return d, nil
	}
	opt := field.OptionsFromSpec(d.Spec)
	st, err := field.Build(d, opt)
	if err != nil {
		return nil, err
	}
	key := st.Key(opt)
	if r, ok := fieldMemo.get(key); ok {
		return d.WithField(r), nil
	}
	r, err := st.Sweep(opt)
	if err != nil {
		return nil, err
	}
	fieldMemo.put(key, r)
	return d.WithField(r), nil
}

// fieldMemo keeps the last few field solutions of this process by
// field.Structure.Key (a digest of everything a solution depends on), so a
// process that builds the same antenna again (check then build, tests,
// specs differing only in cutting or former keys) does not solve it
// again. The solution is a pure function of that key, so the output is the
// same either way.
var fieldMemo = newMemo[*parts.FieldSolution](16)

// writeField writes sweep.csv, pattern.csv and sweep.s1p when the field
// solution ran.
func (k *Kit) writeField(s Sink) error {
	f := k.Design.Field
	if f == nil {
		return nil
	}
	if err := s.Add("sweep.csv", func(w io.Writer) error { return writeSweepCSV(w, f) }); err != nil {
		return err
	}
	if err := s.Add("pattern.csv", func(w io.Writer) error { return writePatternCSV(w, f) }); err != nil {
		return err
	}
	return s.Add("sweep.s1p", func(w io.Writer) error {
		pts := make([]touchstone.Point, len(f.Points))
		for i, p := range f.Points {
			pts[i] = touchstone.Point{FrequencyHz: p.FrequencyMHz * 1e6, S11: p.Reflection}
		}
		return touchstone.WriteS1P(w, pts, touchstone.Options{ReferenceOhm: f.CableOhm, Comments: []string{
			k.Design.Spec.Kit + ": predicted S11 at the feed (field solution, " + f.Reflector + " reflector model)",
			fmt.Sprintf("%d unknowns; no dielectrics, no current on the outside of the coax", f.Unknowns),
		}})
	})
}

// sweepHeader is sweep.csv's header: one column per figure, units in the
// names.
var sweepHeader = []string{"frequency_mhz", "resistance_ohm", "reactance_ohm", "gamma_re", "gamma_im", "gamma_mag", "vswr", "return_loss_db",
	"axis_rhcp_dbic", "axis_lhcp_dbic", "peak_rhcp_dbic", "peak_lhcp_dbic", "peak_theta_deg", "realised_dbic", "axial_ratio_db",
	"hpbw_phi0_deg", "hpbw_phi90_deg", "front_to_back_db", "efficiency"}

func fmtF(v float64, prec int) string { return strconv.FormatFloat(v, 'f', prec, 64) }

func writeSweepCSV(w io.Writer, f *parts.FieldSolution) error {
	cw := csv.NewWriter(w)
	if err := cw.Write(sweepHeader); err != nil {
		return err
	}
	for _, p := range f.Points {
		row := []string{fmtF(p.FrequencyMHz, 4), fmtF(p.ResistanceOhm, 4), fmtF(p.ReactanceOhm, 4),
			fmtF(p.GammaRe, 9), fmtF(p.GammaIm, 9), fmtF(p.GammaMag, 9), fmtF(p.VSWR, 4), fmtF(p.ReturnLossDB, 3),
			fmtF(p.AxisRHCPDBic, 3), fmtF(p.AxisLHCPDBic, 3), fmtF(p.PeakRHCPDBic, 3), fmtF(p.PeakLHCPDBic, 3), fmtF(p.PeakThetaDeg, 2),
			fmtF(p.RealisedDBic, 3), fmtF(p.AxialRatioDB, 3), fmtF(p.HPBWDeg[0], 2), fmtF(p.HPBWDeg[1], 2), fmtF(p.FrontToBackDB, 2), fmtF(p.Efficiency, 5)}
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

func writePatternCSV(w io.Writer, f *parts.FieldSolution) error {
	cw := csv.NewWriter(w)
	if err := cw.Write([]string{"frequency_mhz", "phi_deg", "theta_deg", "rhcp_dbic", "lhcp_dbic"}); err != nil {
		return err
	}
	for _, c := range f.Cuts {
		for _, s := range c.Samples {
			if err := cw.Write([]string{fmtF(f.Centre.FrequencyMHz, 4), fmtF(c.PhiDeg, 1), fmtF(s.ThetaDeg, 1), fmtF(s.RHCPDBic, 3), fmtF(s.LHCPDBic, 3)}); err != nil {
				return err
			}
		}
	}
	cw.Flush()
	return cw.Error()
}
