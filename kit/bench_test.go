package kit

import (
	"testing"

	"coilwright/templates"
)

// BenchmarkBuild plans and writes every output of each demo into memory:
// the whole build, former mesh included, as build does it less the disk.
// Besides wall time it reports the process's CPU time per build (user and
// system, all threads: the figure that holds on a busy machine) and the
// process's peak resident memory so far (run one demo at a time for its
// own figure).
func BenchmarkBuild(b *testing.B) {
	for _, demo := range templates.Demos() {
		b.Run(demo, func(b *testing.B) {
			b.ReportAllocs()
			cpu0 := cpuTime()
			for b.Loop() {
				k := demoKit(b, demo, Options{Version: "bench"})
				var m Memory
				if err := k.Write(&m, nil); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(cpuTime()-cpu0)/float64(b.N), "cpu-ns/op")
			if kb := peakRSSKB(); kb > 0 {
				b.ReportMetric(float64(kb)/1024, "peak-RSS-MB")
			}
		})
	}
}
