package main

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"github.com/spf13/cobra"

	"coilwright/parts/wire"
)

// materialsOptions are the flags of `coilwright materials`.
type materialsOptions struct {
	json bool
}

// materialJSON is one library row as `materials --json` prints it; field
// names carry their units.
type materialJSON struct {
	ID               string         `json:"id"`
	Name             string         `json:"name"`
	YoungsModulusGPa float64        `json:"youngs_modulus_gpa"`
	YieldMPa         float64        `json:"yield_mpa"`
	YieldBasis       string         `json:"yield_basis"`
	TensileMinMPa    float64        `json:"tensile_min_mpa"`
	TensileMaxMPa    float64        `json:"tensile_max_mpa"`
	Hardening        *hardeningJSON `json:"hardening"`
	Elongation       float64        `json:"elongation"`
	Solderability    string         `json:"solderability"`
	Cautions         []string       `json:"cautions"`
	Notes            string         `json:"notes,omitempty"`
	Source           string         `json:"source"`
}

// hardeningJSON is a strain-hardening law in `materials --json`.
type hardeningJSON struct {
	Law               string   `json:"law"` // "power" or "linear"
	KMPa              *float64 `json:"k_mpa,omitempty"`
	N                 *float64 `json:"n,omitempty"`
	TangentModulusMPa *float64 `json:"tangent_modulus_mpa,omitempty"`
}

func newMaterialsCmd() *cobra.Command {
	var o materialsOptions
	cmd := &cobra.Command{
		Use:   "materials [ID]",
		Short: "List the wire material library",
		Long: `materials prints the wire materials a spec's [wire] material key can name:
Young's modulus, yield, tensile range, elongation, solderability and
cautions. With an ID it prints that row in full, with its hardening law,
notes and sources. Figures marked "from memory" in a source were not
checked against a standard: calibrate from a test coil before a batch.`,
		Example: `  coilwright materials
  coilwright materials brass-c26000-half-hard
  coilwright materials --json | jq '.[].id'`,
		Args:              maxArgs(1, "one material id"),
		ValidArgsFunction: completeMaterialArg,
		RunE: func(cmd *cobra.Command, args []string) error {
			id := ""
			if len(args) == 1 {
				id = args[0]
			}
			return runMaterials(cmd.OutOrStdout(), id, o)
		},
	}
	cmd.Flags().BoolVar(&o.json, "json", false, "print the library as a JSON list")
	return cmd
}

func runMaterials(w io.Writer, id string, o materialsOptions) error {
	rows := wire.Materials()
	if id != "" {
		m, err := wire.LookupMaterial(id)
		if err != nil {
			return usageError{err}
		}
		rows = []wire.Material{m}
	}
	if o.json {
		out := make([]materialJSON, len(rows))
		for i, m := range rows {
			out[i] = toMaterialJSON(m)
		}
		enc := json.NewEncoder(w)
		enc.SetIndent("", "  ")
		return enc.Encode(out)
	}
	if id != "" {
		return printMaterial(w, rows[0])
	}
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "ID\tE GPa\tYIELD MPa\tTENSILE MPa\tELONG %\tHARDENING\tSOLDER\tCAUTIONS")
	for _, m := range rows {
		fmt.Fprintf(tw, "%s\t%.0f\t%.0f\t%.0f–%.0f\t%.1f\t%s\t%s\t%s\n", m.ID, m.YoungsModulus/1000, m.Yield,
			m.TensileMin, m.TensileMax, 100*m.Elongation, hardeningText(m.Hardening), m.Solderability, cautionIDs(m))
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	_, err := fmt.Fprintln(w, "\n`coilwright materials ID` shows a row's notes and sources.")
	return err
}

// printMaterial prints one library row in full.
func printMaterial(w io.Writer, m wire.Material) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "id\t%s\n", m.ID)
	fmt.Fprintf(tw, "name\t%s\n", m.Name)
	fmt.Fprintf(tw, "Young's modulus\t%.0f GPa\n", m.YoungsModulus/1000)
	fmt.Fprintf(tw, "yield\t%.0f MPa (%s)\n", m.Yield, m.YieldBasis)
	fmt.Fprintf(tw, "tensile\t%.0f–%.0f MPa\n", m.TensileMin, m.TensileMax)
	fmt.Fprintf(tw, "hardening\t%s\n", hardeningText(m.Hardening))
	fmt.Fprintf(tw, "elongation\t%.1f %%\n", 100*m.Elongation)
	fmt.Fprintf(tw, "solderability\t%s\n", m.Solderability)
	for _, c := range m.Cautions {
		fmt.Fprintf(tw, "caution\t%s\n", c.Text())
	}
	if m.Notes != "" {
		fmt.Fprintf(tw, "notes\t%s\n", m.Notes)
	}
	fmt.Fprintf(tw, "source\t%s\n", m.Source)
	return tw.Flush()
}

// hardeningText describes a hardening law in a few characters.
func hardeningText(h wire.Hardening) string {
	switch h.Kind {
	case wire.HardeningPowerLaw:
		return fmt.Sprintf("K %.0f MPa, n %.2f", h.K, h.N)
	case wire.HardeningLinear:
		return fmt.Sprintf("Et %.0f MPa", h.TangentModulus)
	}
	return "–"
}

// cautionIDs joins a material's caution ids, or "–".
func cautionIDs(m wire.Material) string {
	if len(m.Cautions) == 0 {
		return "–"
	}
	s := make([]string, len(m.Cautions))
	for i, c := range m.Cautions {
		s[i] = string(c)
	}
	return strings.Join(s, ",")
}

// toMaterialJSON converts a library row for --json.
func toMaterialJSON(m wire.Material) materialJSON {
	j := materialJSON{
		ID: m.ID, Name: m.Name, YoungsModulusGPa: m.YoungsModulus / 1000, YieldMPa: m.Yield, YieldBasis: m.YieldBasis,
		TensileMinMPa: m.TensileMin, TensileMaxMPa: m.TensileMax, Elongation: m.Elongation,
		Solderability: string(m.Solderability), Cautions: []string{}, Notes: m.Notes, Source: m.Source,
	}
	for _, c := range m.Cautions {
		j.Cautions = append(j.Cautions, string(c))
	}
	h := m.Hardening
	switch h.Kind {
	case wire.HardeningPowerLaw:
		j.Hardening = &hardeningJSON{Law: "power", KMPa: &h.K, N: &h.N}
	case wire.HardeningLinear:
		j.Hardening = &hardeningJSON{Law: "linear", TangentModulusMPa: &h.TangentModulus}
	}
	return j
}
