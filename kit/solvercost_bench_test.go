package kit

import (
	"testing"

	"coilwright/parts"
	"coilwright/parts/report"
	"coilwright/templates"
)

// resetSolverMemos empties the per-process caches of field solutions,
// strip searches and tolerance analyses, so the next New solves cold.
func resetSolverMemos() {
	fieldMemo = newMemo[*parts.FieldSolution](16)
	stripMemo = newMemo[*parts.StripSearch](16)
	toleranceMemo = newMemo[*report.ToleranceReport](8)
}

// BenchmarkSolverCost plans each demo with empty solver caches: the strip
// search, the field sweep and (where the spec asks) the tolerance analysis
// run every time, as in a cold build; the former is planned but not
// meshed and nothing is written, so the figure is the field solver's
// share of a build plus the small planning steps around it. It reports the
// process's CPU time per plan (all threads).
func BenchmarkSolverCost(b *testing.B) {
	for _, demo := range templates.Demos() {
		b.Run(demo, func(b *testing.B) {
			b.ReportAllocs()
			cpu0 := cpuTime()
			for b.Loop() {
				resetSolverMemos()
				demoKit(b, demo, Options{Version: "bench"})
			}
			b.ReportMetric(float64(cpuTime()-cpu0)/float64(b.N), "cpu-ns/op")
		})
	}
	resetSolverMemos()
}
