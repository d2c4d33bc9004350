package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"text/tabwriter"

	"github.com/spf13/cobra"

	"coilwright/cam"
	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// calibrateOptions are the flags of `coilwright calibrate`.
type calibrateOptions struct {
	material  string
	wireMM    float64
	formerMM  float64
	measured  []float64
	spacingMM float64
	outside   bool
	model     string
	out       string
	force     bool
	json      bool
}

// defaultCalibrationFile is the file calibrate writes without -o.
const defaultCalibrationFile = "wire-calibration.toml"

func newCalibrateCmd() *cobra.Command {
	o := calibrateOptions{model: spec.ModelPerfectlyPlastic}
	cmd := &cobra.Command{
		Use:   "calibrate --material ID --wire-mm D --former-mm F --measured-mm M[,M...]",
		Short: "Fit the wire's effective yield from a measured test coil",
		Long: `calibrate corrects the springback model for one batch of wire. Wind a few
turns of the wire on a rod or a printed former, release them, and measure
the relaxed coil across the wire centres (or give outside diameters with
--outside). calibrate fits the effective yield that makes the model predict
the measured coils, prints the fit and its residual, and writes a small
calibration file. Name that file in the spec's [wire] table
(calibration = "FILE") and build again: the former is compensated with the
calibrated yield.

--former-mm is the diameter of the wire centreline on the former: the rod
diameter plus one wire diameter. Several --measured-mm values (repeat the
flag or separate with commas) are averaged by a least-squares fit.`,
		Example: `  coilwright calibrate --material brass-c26000-half-hard --wire-mm 1.6 --former-mm 16.6 --measured-mm 17.9,18.0
  coilwright calibrate --material copper-annealed --wire-mm 2 --former-mm 38 --measured-mm 40.4 --outside -o batch7.toml`,
		Args: exactArgs(0, "no arguments (use flags)"),
		RunE: func(cmd *cobra.Command, _ []string) error {
			return runCalibrate(cmd.OutOrStdout(), o)
		},
	}
	f := cmd.Flags()
	f.StringVar(&o.material, "material", "", "wire material `ID` (list them with coilwright materials)")
	f.Float64Var(&o.wireMM, "wire-mm", 0, "bare wire diameter, mm")
	f.Float64Var(&o.formerMM, "former-mm", 0, "wire centreline diameter on the former, mm")
	f.Float64SliceVar(&o.measured, "measured-mm", nil, "measured relaxed diameter(s), mm (centreline unless --outside)")
	f.Float64Var(&o.spacingMM, "spacing-mm", 0, "axial spacing per turn of the test coil, mm (default: close-wound, one wire diameter)")
	f.BoolVar(&o.outside, "outside", false, "the measured diameters are outside diameters: subtract one wire diameter")
	f.StringVar(&o.model, "model", o.model, `springback model: "perfectly-plastic" or "hardening" (match the spec's springback_model)`)
	f.StringVarP(&o.out, "out", "o", defaultCalibrationFile, "calibration file to write")
	f.BoolVar(&o.force, "force", false, "replace the calibration file if it exists")
	f.BoolVar(&o.json, "json", false, "print the fit as JSON")
	cmd.RegisterFlagCompletionFunc("material", completeMaterials)
	return cmd
}

// isDir reports whether path names an existing folder.
func isDir(path string) bool {
	fi, err := os.Stat(path)
	return err == nil && fi.IsDir()
}

// calibrationJSON is the fit as `calibrate --json` prints it.
type calibrationJSON struct {
	File string `json:"file"`
	wire.Calibration
	Factor   float64  `json:"factor"`
	Warnings []string `json:"warnings"`
}

func runCalibrate(w io.Writer, o calibrateOptions) error {
	switch {
	case o.material == "":
		return usageError{errors.New("calibrate needs --material ID (see `coilwright materials`)")}
	case !(o.wireMM > 0):
		return usageError{fmt.Errorf("--wire-mm %g: must be above 0 mm; give the bare wire diameter, e.g. --wire-mm 1.6", o.wireMM)}
	case !(o.formerMM > o.wireMM):
		return usageError{fmt.Errorf("--former-mm %g: must be above --wire-mm; give the wire centreline diameter on the former (rod diameter plus one wire diameter), e.g. --former-mm 16.6", o.formerMM)}
	case len(o.measured) == 0:
		return usageError{errors.New("calibrate needs at least one --measured-mm value")}
	case !(o.spacingMM >= 0):
		return usageError{fmt.Errorf("--spacing-mm %g must be zero (close-wound) or positive", o.spacingMM)}
	case o.model != spec.ModelPerfectlyPlastic && o.model != spec.ModelHardening:
		return usageError{fmt.Errorf("--model %q: use %q or %q", o.model, spec.ModelPerfectlyPlastic, spec.ModelHardening)}
	}
	if dir := filepath.Dir(o.out); !isDir(dir) {
		return usageError{fmt.Errorf("-o %s: folder %s does not exist; create it or choose another path", o.out, dir)}
	}
	m, err := wire.LookupMaterial(o.material)
	if err != nil {
		return usageError{err}
	}
	spacing := o.spacingMM
	if spacing == 0 {
		spacing = o.wireMM
	}
	pts := make([]wire.CalibrationPoint, len(o.measured))
	for i, v := range o.measured {
		if o.outside {
			v -= o.wireMM
		}
		pts[i] = wire.CalibrationPoint{FormerDiameter: o.formerMM, RelaxedDiameter: v}
	}
	cal, err := wire.Calibrate(m, o.wireMM, spacing, o.model == spec.ModelHardening, pts)
	if err != nil {
		return inputError{err: err}
	}
	data, err := wire.MarshalCalibration(cal)
	if err != nil {
		return err
	}
	if err := cam.WriteFileAtomic(o.out, o.force, func(fw io.Writer) error {
		_, err := fw.Write(data)
		return err
	}); err != nil {
		if errors.Is(err, cam.ErrExists) {
			return fmt.Errorf("%w (--force replaces it)", err)
		}
		return err
	}
	if o.json {
		j := calibrationJSON{File: o.out, Calibration: cal, Factor: cal.Factor(), Warnings: cal.Warnings}
		if j.Warnings == nil {
			j.Warnings = []string{}
		}
		enc := json.NewEncoder(w)
		enc.SetIndent("", "  ")
		return enc.Encode(j)
	}
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "material\t%s, %g mm wire, %s model\n", m.ID, o.wireMM, o.model)
	fmt.Fprintf(tw, "effective yield\t%.1f ± %.1f MPa (library %.0f MPa, factor %.3f)\n", cal.EffectiveYield, cal.YieldUncertainty, m.Yield, cal.Factor())
	fmt.Fprintf(tw, "residual\t%.3f mm RMS over %d coil(s)\n", cal.ResidualRMS, cal.Points)
	for _, p := range cal.Measurements {
		fmt.Fprintf(tw, "coil\tformer %.2f mm → measured %.2f mm, model %.2f mm\n", p.FormerDiameter, p.RelaxedDiameter, p.PredictedDiameter)
	}
	fmt.Fprintf(tw, "wrote\t%s\n", o.out)
	if err := tw.Flush(); err != nil {
		return err
	}
	for _, s := range cal.Warnings {
		fmt.Fprintf(w, "warning: %s\n", s)
	}
	_, err = fmt.Fprintf(w, "Add calibration = %q to the spec's [wire] table.\n", o.out)
	return err
}
