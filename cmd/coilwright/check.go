package main

import (
	"fmt"
	"io"
	"text/tabwriter"
	"time"

	"github.com/spf13/cobra"
)

// checkOptions are the flags of `coilwright check`.
type checkOptions struct {
	json bool
	demo string
}

func newCheckCmd() *cobra.Command {
	var o checkOptions
	cmd := &cobra.Command{
		Use:   "check [SPEC]",
		Short: "Validate a design spec and print the design summary",
		Long: `check validates a design spec and prints the design summary: the coil,
the per-turn table, the estimates and any warnings. A spec with problems
lists every problem with its key and line and exits with status 2.`,
		Example: `  coilwright check kestrel.toml
  coilwright check --json kestrel.toml | jq .estimates.gain_dbic
  coilwright check --demo demo-2g4-cylinder.toml`,
		Args: maxArgs(1, "one spec file"),
		RunE: func(cmd *cobra.Command, args []string) error {
			if len(args) == 0 && o.demo == "" {
				return usageError{fmt.Errorf("check needs a spec file or --demo NAME")}
			}
			path := ""
			if len(args) == 1 {
				path = args[0]
			}
			return runCheck(cmd.OutOrStdout(), path, o)
		},
	}
	cmd.Flags().BoolVar(&o.json, "json", false, "print the design report as JSON (as in design.json)")
	cmd.Flags().StringVar(&o.demo, "demo", "", "check an embedded demo spec instead of a file")
	cmd.RegisterFlagCompletionFunc("demo", completeDemos)
	cmd.ValidArgsFunction = completeSpecFile
	return cmd
}

func runCheck(w io.Writer, path string, o checkOptions) error {
	l, err := loadSpec(path, o.demo)
	if err != nil {
		return err
	}
	k, err := newKit(l, time.Time{})
	if err != nil {
		return err
	}
	if o.json {
		return k.WriteReportJSON(w)
	}
	r := k.Report
	fmt.Fprintf(w, "%s: ok — %s\n", l.Name, r.Kit)
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "frequency\t%.1f MHz (λ %.3f mm)\n", r.FrequencyMHz, r.WavelengthMM)
	fmt.Fprintf(tw, "coil\t%s, %g turns, %s, %s feed\n", r.Shape, r.TurnCount, r.Hand, r.Feed)
	fmt.Fprintf(tw, "diameter\t%.2f mm base, %.2f mm top (wire centre)\n", r.BaseDiameterMM, r.TopDiameterMM)
	fmt.Fprintf(tw, "axial length\t%.2f mm\n", r.AxialLengthMM)
	fmt.Fprintf(tw, "wire length\t%.1f mm\n", r.WireLengthMM)
	fmt.Fprintf(tw, "gain\t%.1f dBic (%s)\n", r.Estimates.GainDBic, r.Estimates.GainFormula)
	fmt.Fprintf(tw, "beamwidth\t%.1f° half-power\n", r.Estimates.HPBWDeg)
	fmt.Fprintf(tw, "input resistance\t%.0f Ω\n", r.Estimates.InputResistanceOhm)
	fmt.Fprintf(tw, "axial ratio\t%.3f (%.2f dB)\n", r.Estimates.AxialRatio, r.Estimates.AxialRatioDB)
	tw.Flush()
	calibrated := ""
	if r.Wire.Calibrated {
		calibrated = " (calibrated)"
	}
	fmt.Fprintf(w, "\nwire: %s, %g mm, yield %.0f MPa%s; former %.2f–%.2f mm\n", r.Wire.Material, r.Wire.DiameterMM, r.Wire.YieldMPa,
		calibrated, r.Former.BaseDiameterMM, r.Former.TopDiameterMM)
	fmt.Fprintln(w, "\nturn  diameter mm  C/λ    pitch °  spacing mm  former mm  springback mm  tolerance mm")
	for _, t := range r.Turns {
		fmt.Fprintf(w, "%4d  %11.2f  %5.3f  %7.2f  %10.2f  %9.2f  %13.2f  %12.2f\n", t.Index, t.DiameterMM, t.CircumferenceLambda, t.PitchAngleDeg, t.SpacingMM,
			t.FormerDiameterMM, t.SpringbackMM, t.ToleranceMM)
	}
	printField(w, r.Field)
	if len(r.Warnings) > 0 {
		fmt.Fprintln(w, "\nwarnings:")
		for _, wr := range r.Warnings {
			fmt.Fprintf(w, "  %s: %s\n", wr.Code, wr.Message)
		}
	}
	return nil
}
