package kit

import (
	"testing"

	"coilwright/templates"
)

// BenchmarkBuild plans and writes every output of each demo into memory:
// the whole build, former mesh included, as build does it less the disk.
func BenchmarkBuild(b *testing.B) {
	for _, demo := range templates.Demos() {
		b.Run(demo, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				k := demoKit(b, demo, Options{Version: "bench"})
				var m Memory
				if err := k.Write(&m, nil); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
