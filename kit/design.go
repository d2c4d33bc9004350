package kit

import (
	"encoding/json"
	"fmt"
	"io"
	"text/template"

	"coilwright/parts"
	"coilwright/templates"
)

var designTmpl = template.Must(template.New("design.md.tmpl").Funcs(reportFuncs).ParseFS(templates.FS(), "design.md.tmpl"))

// reportFuncs are the number formats the Markdown templates use.
var reportFuncs = template.FuncMap{
	"f0":    func(v float64) string { return fmt.Sprintf("%.0f", v) },
	"f1":    func(v float64) string { return fmt.Sprintf("%.1f", v) },
	"f2":    func(v float64) string { return fmt.Sprintf("%.2f", v) },
	"f3":    func(v float64) string { return fmt.Sprintf("%.3f", v) },
	"g":     func(v float64) string { return fmt.Sprintf("%g", v) },
	"deref": func(p *float64) float64 { return *p },
	"pct":   func(v float64) float64 { return 100 * v },
	"turns": parts.TurnsText,
	"signed": func(v float64) string {
		if v < 0 {
			return fmt.Sprintf("− %.1f", -v)
		}
		return fmt.Sprintf("+ %.1f", v)
	},
	"inc": func(i int) int { return i + 1 },
}

// WriteReportJSON writes the design report as indented JSON: the content
// of design.json, and what check --json prints.
func (k *Kit) WriteReportJSON(w io.Writer) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(k.Report)
}

// writeDesign writes design.md and design.json.
func (k *Kit) writeDesign(s Sink) error {
	if err := s.Add("design.json", k.WriteReportJSON); err != nil {
		return err
	}
	return s.Add("design.md", func(w io.Writer) error { return designTmpl.Execute(w, k.Report) })
}
