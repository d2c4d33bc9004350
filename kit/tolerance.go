package kit

import (
	"crypto/sha256"
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"strconv"

	"coilwright/cam/plot"
	"coilwright/parts/report"
	"coilwright/parts/spec"
	"coilwright/parts/tolerance"
)

// analyseTolerance runs the batch tolerance analysis when the spec asks
// for it, gives the design the derived inspection tolerances and keeps the
// report for the outputs. It runs in New, before anything reads the
// turns' tolerances.
func (k *Kit) analyseTolerance() error {
	d := k.Design
	if !d.Spec.Tolerance.On() {
		return nil
	}
	// The kit's name, the batch size, the transmitter and the stock rods
	// do not change the antenna: builds that differ only there share one
	// analysis.
	s := *d.Spec
	s.Kit, s.Quantity, s.RF, s.Stock = "", 0, spec.RFSpec{}, spec.StockSpec{}
	key, err := json.Marshal(struct {
		Spec        any
		Calibration any
	}{s, d.Wire.Calibration})
	if err != nil {
		return err
	}
	sum := sha256.Sum256(key)
	rep, ok := toleranceMemo.get(sum)
	if !ok {
		// The loop model is corrected to the field solution the pipeline
		// already has (nil when the spec turns the solver off).
		full := d.Field
		ev, err := tolerance.NewSolverEvaluator(d, full)
		if err != nil {
			return err
		}
		if rep, err = tolerance.Run(d, ev, tolerance.Options{}); err != nil {
			return err
		}
		toleranceMemo.put(sum, rep)
	}
	if rep.Inspection.Reached {
		if err := d.UseInspectionTolerances(rep.Inspection.ToleranceMM, rep.Inspection.Note); err != nil {
			return err
		}
	}
	k.tolerance = rep
	return nil
}

// toleranceMemo keeps the last few tolerance analyses of this process by
// the SHA-256 of the spec's fields that shape the antenna and the wire's
// calibration (the analysis is a pure function of them, seed included), so a process that builds the
// same design again (check then build, tests) does not run it again.
// The reports are shared and never modified.
var toleranceMemo = newMemo[*report.ToleranceReport](8)

// Tolerance returns the batch tolerance analysis, or nil when it did not
// run. The same value is in Report.Tolerance.
func (k *Kit) Tolerance() *report.ToleranceReport { return k.tolerance }

// writeTolerance writes tolerance.csv (every simulated kit) and the
// histograms of the matched-band centre and the worst VSWR in the band.
func (k *Kit) writeTolerance(s Sink) error {
	rep := k.tolerance
	if rep == nil {
		return nil
	}
	if err := s.Add("tolerance.csv", func(w io.Writer) error { return writeToleranceCSV(w, rep) }); err != nil {
		return err
	}
	for _, h := range toleranceHistograms(rep) {
		if err := s.Add(h.file, func(w io.Writer) error { return plot.WriteHistogram(w, h.hist, plot.ChartOptions{}) }); err != nil {
			return err
		}
	}
	return nil
}

// histogramBins guides the histograms' bar count: a batch of a hundred
// or more shows its shape at about fifteen bars. Common practice (no
// published source).
const histogramBins = 15

// toleranceChart is one histogram and its file name.
type toleranceChart struct {
	file string
	hist plot.Histogram
}

// toleranceHistograms returns the charts of the tolerance analysis.
func toleranceHistograms(rep *report.ToleranceReport) []toleranceChart {
	var out []toleranceChart
	note := fmt.Sprintf("%d simulated kits, %.0f %% meet VSWR ≤ %g across %g–%g MHz", rep.Samples, 100*rep.Share, rep.VSWRTarget, rep.BandLowMHz, rep.BandHighMHz)
	for _, f := range rep.Figures {
		if len(f.Values) == 0 {
			continue
		}
		var file string
		var markers []plot.Marker
		switch f.Name {
		case "matched-band centre":
			if !rep.Nominal.MatchInside {
				continue // on the sweep's edge: only a bound
			}
			file = "tolerance-centre.svg"
			markers = []plot.Marker{{Value: rep.BandLowMHz, Label: "band low"}, {Value: rep.BandHighMHz, Label: "band high"}, {Value: f.Nominal, Label: "nominal"}}
		case "worst VSWR in band":
			file = "tolerance-vswr.svg"
			markers = []plot.Marker{{Value: rep.VSWRTarget, Label: fmt.Sprintf("target %g", rep.VSWRTarget)}, {Value: f.Nominal, Label: "nominal"}}
		case "gain on axis":
			file = "tolerance-gain.svg"
			markers = []plot.Marker{{Value: f.P5, Label: "5 %"}, {Value: f.Nominal, Label: "nominal"}}
		default:
			continue
		}
		out = append(out, toleranceChart{file: file, hist: plot.Histogram{
			Title: "Batch spread: " + f.Name, Note: note, Label: f.Name, Unit: f.Unit, Values: f.Values, Markers: markers, Bins: histogramBins}})
	}
	return out
}

// writeToleranceCSV writes one row per simulated kit: its sampled inputs
// (deviations in mm, the yield as a factor), released turn diameters and
// figures. Units are in the header.
func writeToleranceCSV(w io.Writer, rep *report.ToleranceReport) error {
	cw := csv.NewWriter(w)
	head := []string{"kit", "buildable", "meets_target"}
	for _, in := range rep.Inputs {
		if in.Unit == "%" {
			head = append(head, in.Name+" (factor)")
		} else {
			head = append(head, in.Name+" deviation ("+in.Unit+")")
		}
	}
	turns := 0
	if len(rep.Kits) > 0 {
		for _, k := range rep.Kits {
			turns = max(turns, len(k.DiametersMM))
		}
	}
	for i := range turns {
		head = append(head, fmt.Sprintf("turn %d released diameter (mm)", i+1))
	}
	head = append(head, "centre (MHz)", "lowest VSWR", "band-edge VSWR", "worst VSWR", "gain (dBic)", "axial ratio (dB)")
	if err := cw.Write(head); err != nil {
		return err
	}
	g := func(v float64, prec int) string { return strconv.FormatFloat(v, 'f', prec, 64) }
	for _, k := range rep.Kits {
		row := []string{strconv.Itoa(k.Index), strconv.FormatBool(k.Buildable), strconv.FormatBool(k.Meets)}
		for _, v := range k.Inputs {
			row = append(row, g(v, 5))
		}
		for i := range turns {
			if i < len(k.DiametersMM) {
				row = append(row, g(k.DiametersMM[i], 4))
			} else {
				row = append(row, "")
			}
		}
		if k.Solved() {
			f := k.Figures
			row = append(row, g(f.CentreMHz, 1), g(f.MinVSWR, 3), g(f.EdgeVSWR, 3), g(f.WorstVSWR, 3), g(f.GainDBic, 2), g(f.AxialRatioDB, 2))
		} else {
			row = append(row, "", "", "", "", "", "")
		}
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}
