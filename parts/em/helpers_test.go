package em

import (
	"math"
	"math/cmplx"
	"testing"

	"coilwright/cam/geom"
)

// lambda1m is the frequency (Hz) whose free-space wavelength is 1 m, so
// lengths in millimetres read as thousandths of a wavelength.
const lambda1m = c0

// dipoleModel is a straight centre-fed wire along z of total length l (mm),
// radius a (mm), in n equal segments (n even).
func dipoleModel(l, a float64, n int) Model {
	w := Wire{Radius: []float64{a}}
	for i := 0; i <= n; i++ {
		w.Points = append(w.Points, geom.Vec3{Z: -l/2 + l*float64(i)/float64(n)})
	}
	return Model{Wires: []Wire{w}, Feed: Feed{Wire: 0, At: geom.Vec3{}}}
}

func mustSolve(t testing.TB, md Model, opt MeshOptions, f float64) *Solution {
	t.Helper()
	m, err := NewMesh(md, opt)
	if err != nil {
		t.Fatal(err)
	}
	s, err := m.Solve(f)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// loopModel is a regular n-gon loop in the xy plane with perimeter vertices
// on a circle of circumference c (mm), radius a, fed at vertex n/2.
func loopModel(c, a float64, n int) Model {
	r := c / (2 * math.Pi)
	w := Wire{Radius: []float64{a}}
	for i := 0; i <= n; i++ {
		s, co := math.Sincos(2 * math.Pi * float64(i%n) / float64(n))
		w.Points = append(w.Points, geom.Vec3{X: r * co, Y: r * s})
	}
	return Model{Wires: []Wire{w}, Feed: Feed{Wire: 0, At: w.Points[n/2]}}
}

// relErr returns |got − want|/|want|.
func relErr(got, want complex128) float64 { return cmplx.Abs(got-want) / cmplx.Abs(want) }

// directivity returns the peak directivity of c (linear) from the pattern
// integral.
func directivity(s *Solution, c Component) float64 {
	_, g := s.Peak(c)
	return g * s.InputPower() / s.RadiatedPower(0)
}
