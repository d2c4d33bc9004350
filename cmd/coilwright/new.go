package main

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"
	"text/template"
	"unicode"

	"github.com/spf13/cobra"

	"coilwright/kit"
	"coilwright/parts/spec"
	"coilwright/templates"
)

var starterTmpl = template.Must(template.ParseFS(templates.FS(), "starter.toml.tmpl"))

// newOptions are the flags of `coilwright new`.
type newOptions struct {
	frequencyMHz float64
	shape        string
	kit          string
	turns        float64
	hand         string
}

// starter is the data the starter-spec template is executed with.
type starter struct {
	Kit          string
	FrequencyMHz float64
	Shape        string
	Turns        float64
	Hand         string
	WireMM       float64
	// WireRodMM and DowelRodMM are stock lengths written only when the
	// default 1000 mm is too short for one piece.
	WireRodMM, DowelRodMM float64
}

func newNewCmd() *cobra.Command {
	var o newOptions
	cmd := &cobra.Command{
		Use:   "new",
		Short: "Print a starter design spec",
		Long: `new prints a design spec on stdout. With no flags it prints the reference
spec, every key explained. With --frequency-mhz it prints a starter spec
sized for that band and --shape, ready to edit and build.`,
		Example: `  coilwright new > reference.toml
  coilwright new --frequency-mhz 5800 --shape conical --kit "Hilltop 5G8" > hilltop.toml
  coilwright new --frequency-mhz 2440 --hand LHCP > lhcp.toml`,
		Args: exactArgs(0, "no arguments (use flags)"),
		RunE: func(cmd *cobra.Command, _ []string) error {
			sized := cmd.Flags().Changed("frequency-mhz")
			for _, f := range []string{"shape", "kit", "turns", "hand"} {
				if !sized && cmd.Flags().Changed(f) {
					return usageError{fmt.Errorf("--%s sizes a starter spec and needs --frequency-mhz, e.g. new --frequency-mhz 5800 --%s ...", f, f)}
				}
			}
			return runNew(cmd.OutOrStdout(), cmd.ErrOrStderr(), o, sized)
		},
	}
	cmd.Flags().Float64Var(&o.frequencyMHz, "frequency-mhz", 0, "centre frequency in MHz (100–30000)")
	cmd.Flags().StringVar(&o.shape, "shape", "cylindrical", `coil shape: "cylindrical" or "conical"`)
	cmd.Flags().StringVar(&o.kit, "kit", "", "kit name (default from the frequency)")
	cmd.Flags().Float64Var(&o.turns, "turns", 0, "number of turns (default 5 conical, 7 cylindrical)")
	cmd.Flags().StringVar(&o.hand, "hand", "RHCP", `winding hand and polarisation: "RHCP" or "LHCP"`)
	return cmd
}

// runNew prints the reference spec, or a sized starter spec. A starter that
// does not pass check (a coil too small for any stock support rod, say) is
// still printed, with its problems on stderr, as a start to edit.
func runNew(w, stderr io.Writer, o newOptions, sized bool) error {
	if !sized {
		_, err := w.Write(templates.Reference())
		return err
	}
	if !(o.frequencyMHz >= spec.MinFrequencyMHz && o.frequencyMHz <= spec.MaxFrequencyMHz) { // NaN fails too
		return usageError{fmt.Errorf("--frequency-mhz %g is outside %g–%g MHz", o.frequencyMHz, spec.MinFrequencyMHz, spec.MaxFrequencyMHz)}
	}
	if strings.IndexFunc(o.kit, unicode.IsControl) >= 0 {
		return usageError{fmt.Errorf("--kit %s: holds a control character; give printable text", clipQuote(o.kit))}
	}
	if o.shape != "cylindrical" && o.shape != "conical" {
		return usageError{fmt.Errorf(`--shape %q: use "cylindrical" or "conical"`, o.shape)}
	}
	if o.turns != 0 && !(o.turns >= spec.MinTurns && o.turns <= spec.MaxTurns) {
		return usageError{fmt.Errorf("--turns %g: must be between %g and %g (fractions allowed), e.g. --turns 6", o.turns, spec.MinTurns, spec.MaxTurns)}
	}
	if o.hand == "" {
		o.hand = "RHCP"
	}
	if o.hand != "RHCP" && o.hand != "LHCP" {
		return usageError{fmt.Errorf(`--hand %q: use "RHCP" or "LHCP"`, o.hand)}
	}
	st := starter{Kit: o.kit, FrequencyMHz: o.frequencyMHz, Shape: o.shape, Turns: o.turns, Hand: o.hand}
	if st.Kit == "" {
		st.Kit = fmt.Sprintf("Starter %g MHz %s", o.frequencyMHz, o.shape)
	}
	if st.Turns == 0 {
		st.Turns = 7
		if o.shape == "conical" {
			st.Turns = 5
		}
	}
	// Wire about 0.02 λ, inside the 0.006–0.05 λ the Kraus formulas assume
	// (from memory), rounded to a stock 0.1 mm and clamped to
	// the spec's range.
	lambda := spec.Wavelength(o.frequencyMHz)
	st.WireMM = math.Min(math.Max(math.Round(0.02*lambda*10)/10, spec.MinWireMM), spec.MaxWireMM)
	var buf bytes.Buffer
	if err := starterTmpl.Execute(&buf, st); err != nil {
		return err
	}
	// A large coil's wire blank or rod is longer than the default stock:
	// write the stock length that takes it, from the refusal's own figure.
	// The check stops at the first stock too short, so ask again for the
	// other.
	for range 2 {
		n := stockNeeds(buf.Bytes())
		if len(n) == 0 {
			break
		}
		st.WireRodMM = max(st.WireRodMM, n["stock.wire_rod_mm"])
		st.DowelRodMM = max(st.DowelRodMM, n["stock.dowel_rod_mm"])
		buf.Reset()
		if err := starterTmpl.Execute(&buf, st); err != nil {
			return err
		}
	}
	if err := checkStarter(buf.Bytes()); err != nil {
		fmt.Fprintf(stderr, "coilwright: the starter spec does not pass check yet; edit it first:\n%v\n", err)
	}
	_, err := w.Write(buf.Bytes())
	return err
}

// checkStarter runs a starter spec through what check runs: parsing, the
// design and the planning of every part.
func checkStarter(b []byte) error {
	s, err := spec.ParseSpec(b)
	if err != nil {
		return err
	}
	_, err = kit.New(kit.Source{Name: "starter", Bytes: b, Spec: s}, kit.Options{})
	return err
}

// stockNeeds returns, for each stock key a starter spec is refused on,
// the length its fix asks for.
func stockNeeds(b []byte) map[string]float64 {
	err := checkStarter(b)
	var errs spec.SpecErrors
	var one *spec.SpecError
	switch {
	case errors.As(err, &errs):
	case errors.As(err, &one):
		errs = spec.SpecErrors{one}
	default:
		return nil
	}
	out := map[string]float64{}
	for _, e := range errs {
		if e.Key != "stock.wire_rod_mm" && e.Key != "stock.dowel_rod_mm" {
			continue
		}
		var v float64
		if _, err := fmt.Sscanf(e.Fix[strings.Index(e.Fix, "=")+1:], "%g", &v); err == nil {
			out[e.Key] = v
		}
	}
	return out
}
