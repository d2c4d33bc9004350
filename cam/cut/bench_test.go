package cut

import (
	"math"
	"testing"

	"coilwright/cam/internal/fixture"
)

func BenchmarkNestPolygon(b *testing.B) {
	poly := fixture.Strip(8.2, math.Pi/2, 4.6, 2.7)
	for _, size := range []struct {
		name string
		s    Sheet
	}{
		{"sheet 100 mm", Sheet{Width: 100, Height: 100, Margin: 5, Spacing: 2}},
		{"sheet 300 mm", Sheet{Width: 300, Height: 200, Margin: 5, Spacing: 2}},
	} {
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := NestPolygon(poly, 10, size.s, NestOptions{Interlock: true}); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
