package tolerance

import (
	"testing"

	"coilwright/parts/field"
)

// BenchmarkBatch runs the whole analysis (batch, sensitivities, inspection
// band) with the field solver on the demos; the full model's solution,
// which the pipeline has anyway, is worked out before the loop.
func BenchmarkBatch(b *testing.B) {
	for _, c := range []struct {
		name, demo string
		samples    int
	}{{"5g8/500", "demo-5g8-cone.toml", 500}, {"2g4/100", "demo-2g4-cylinder.toml", 100}} {
		b.Run(c.name, func(b *testing.B) {
			d := demoDesign(b, c.demo, "")
			full, err := field.Sweep(d, field.Options{AxisOnly: true})
			if err != nil {
				b.Fatal(err)
			}
			ev, err := NewSolverEvaluator(d, full)
			if err != nil {
				b.Fatal(err)
			}
			b.ReportAllocs()
			var share float64
			cpu0 := processCPUSeconds()
			for b.Loop() {
				rep, err := Run(d, ev, Options{Samples: c.samples})
				if err != nil {
					b.Fatal(err)
				}
				share = rep.Share
			}
			b.ReportMetric(100*share, "%meet")
			b.ReportMetric((processCPUSeconds()-cpu0)/float64(b.N), "cpu-s/op")
		})
	}
}
