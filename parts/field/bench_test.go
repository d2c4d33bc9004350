package field

import "testing"

// BenchmarkDemoSweep is the 5.8 GHz demo's default 21-point sweep through
// the real mapping, plate model and ideal ground, geometry built each
// time.
func BenchmarkDemoSweep(b *testing.B) {
	d := demoDesign(b, "demo-5g8-cone")
	for _, c := range []struct {
		name string
		rm   ReflectorModel
	}{{"ideal", IdealGround}, {"plate", PlateModel}} {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			n := 0
			for b.Loop() {
				r, err := Sweep(d, Options{Reflector: c.rm})
				if err != nil {
					b.Fatal(err)
				}
				n = r.Unknowns
			}
			b.ReportMetric(float64(n), "unknowns")
		})
	}
}
