package kit

import (
	"testing"

	"coilwright/templates"
)

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
				resetMemos()
				demoKit(b, demo, Options{Version: "bench"})
			}
			b.ReportMetric(float64(cpuTime()-cpu0)/float64(b.N), "cpu-ns/op")
		})
	}
	resetMemos()
}
