package spec

import (
	"math"
	"testing"
)

func TestDefaultStripThicknessSteps(t *testing.T) {
	// Common practice (no published source): 0.3 mm shim by default, in
	// 0.05 mm steps, with at least 0.1 mm of air under it.
	const tol = 1e-12
	for _, tc := range []struct {
		name       string
		room, want float64
	}{
		{"plenty of room", 1.0, 0.3},
		{"just room for 0.3 mm", 0.4, 0.3},
		{"room for 0.15 mm", 0.25, 0.15},
		{"room for 0.1 mm", 0.2, 0.1},
		{"no room keeps the thinnest", 0.1, 0.05},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := defaultStripThickness(tc.room); math.Abs(got-tc.want) > tol {
				t.Errorf("defaultStripThickness(%g) = %g mm, want %g", tc.room, got, tc.want)
			}
		})
	}
}
