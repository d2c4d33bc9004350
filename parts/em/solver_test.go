package em

import (
	"errors"
	"math"
	"math/cmplx"
	"runtime"
	"testing"

	"coilwright/cam/geom"
)

// Tolerances of the solver checks.
const (
	symmetryTol   = 1e-9 // relative asymmetry of Z (Galerkin reciprocity)
	quadratureTol = 1e-6 // relative change of Z_in with finer rules
)

// bentModel is a wire with a bend, a T junction and a thinner branch,
// to exercise junction basis functions and per-segment radii.
func bentModel() Model {
	main := Wire{Points: []geom.Vec3{{X: -200}, {X: -100}, {}, {X: 80, Z: 60}, {X: 160, Z: 120}}, Radius: []float64{1}, Conductivity: 5.8e7}
	branch := Wire{Points: []geom.Vec3{{}, {Y: 90}, {Y: 180, Z: 30}}, Radius: []float64{0.5, 0.3}}
	return Model{Wires: []Wire{main, branch}, Feed: Feed{Wire: 0, At: geom.Vec3{X: -100}}}
}

func TestMatrixIsComplexSymmetric(t *testing.T) {
	// Source: Harrington 1968: a Galerkin moment matrix of a reciprocal
	// structure is symmetric (reciprocity).
	for name, md := range map[string]Model{"dipole": dipoleModel(500, 1, 20), "junction": bentModel()} {
		t.Run(name, func(t *testing.T) {
			m, err := NewMesh(md, MeshOptions{})
			if err != nil {
				t.Fatal(err)
			}
			z := m.matrix(lambda1m)
			n := m.Unknowns()
			scale := 0.0
			for _, v := range z {
				scale = max(scale, cmplx.Abs(v))
			}
			for i := range n {
				for j := range i {
					if d := cmplx.Abs(z[i*n+j]-z[j*n+i]) / scale; d > symmetryTol {
						t.Fatalf("Z[%d,%d] vs Z[%d,%d]: relative asymmetry %.3g", i, j, j, i, d)
					}
				}
			}
		})
	}
}

func TestSameResultOnOneAndTwoCores(t *testing.T) {
	// Large enough to span several fill blocks and LU panels.
	md := dipoleModel(1500, 1, 150)
	md.Wires[0].Conductivity = 5.8e7
	run := func(procs int) *Solution {
		old := runtime.GOMAXPROCS(procs)
		defer runtime.GOMAXPROCS(old)
		return mustSolve(t, md, MeshOptions{}, lambda1m)
	}
	a, b := run(1), run(2)
	if math.Float64bits(real(a.Impedance)) != math.Float64bits(real(b.Impedance)) ||
		math.Float64bits(imag(a.Impedance)) != math.Float64bits(imag(b.Impedance)) {
		t.Fatalf("Z_in differs: %v vs %v", a.Impedance, b.Impedance)
	}
	for i := range a.Coefficients {
		if a.Coefficients[i] != b.Coefficients[i] {
			t.Fatalf("coefficient %d differs", i)
		}
	}
	if pa, pb := a.RadiatedPower(0), b.RadiatedPower(0); pa != pb {
		t.Fatalf("radiated power differs: %v vs %v", pa, pb)
	}
}

func TestSweepSameOnAnyWorkers(t *testing.T) {
	// A sweep factors its matrices one per worker, or shares the workers
	// in each factorisation when it has fewer matrices than workers, and
	// a caller may run it all on one goroutine (Workers: 1): every way
	// must give the same bits. (A run of equally spaced frequencies steps
	// its phases, so only a one-frequency sweep matches Solve's bits.)
	md := dipoleModel(1500, 1, 150)
	md.Wires[0].Conductivity = 5.8e7
	freqs := []float64{0.9 * lambda1m, 0.95 * lambda1m, lambda1m, 1.05 * lambda1m, 1.13 * lambda1m}
	sweep := func(procs, workers int, fs []float64) []*Solution {
		defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
		m, err := NewMesh(md, MeshOptions{Workers: workers})
		if err != nil {
			t.Fatal(err)
		}
		s, err := m.Sweep(fs)
		if err != nil {
			t.Fatal(err)
		}
		return s
	}
	same := func(name string, a, b []*Solution) {
		t.Helper()
		for i := range a {
			for j := range a[i].Coefficients {
				if a[i].Coefficients[j] != b[i].Coefficients[j] {
					t.Fatalf("%s: frequency %d, coefficient %d differs", name, i, j)
				}
			}
		}
	}
	ref := sweep(1, 0, freqs)
	same("2 cores", ref, sweep(2, 0, freqs))
	same("2 cores, 1 worker", ref, sweep(2, 1, freqs))
	same("3 workers on 2 cores", ref, sweep(2, 3, freqs))
	for _, f := range freqs[:2] {
		one := []*Solution{mustSolve(t, md, MeshOptions{Workers: 1}, f)}
		same("one frequency, 2 workers", one, sweep(2, 2, []float64{f}))
		same("one frequency, 1 core", one, sweep(1, 0, []float64{f}))
	}
}

func TestFinerQuadratureLeavesImpedance(t *testing.T) {
	// The rules, not the mesh, must have converged (EM.md §4).
	for name, md := range map[string]Model{
		"dipole 1e-4 λ":  dipoleModel(500, 0.1, 40),
		"dipole 1e-6 λ":  dipoleModel(500, 0.001, 40),
		"loop":           loopModel(100, 0.1, 24),
		"junction":       bentModel(),
		"thick, l = 3 a": dipoleModel(480, 4, 40),
	} {
		t.Run(name, func(t *testing.T) {
			a := mustSolve(t, md, MeshOptions{}, lambda1m)
			b := mustSolve(t, md, MeshOptions{Quadrature: 1}, lambda1m)
			if d := relErr(a.Impedance, b.Impedance); d > quadratureTol {
				t.Errorf("Z_in moved %.3g relative (%v → %v)", d, a.Impedance, b.Impedance)
			}
		})
	}
}

func TestGeometryErrors(t *testing.T) {
	straight := func(z0, z1, r float64) Wire {
		return Wire{Points: []geom.Vec3{{Z: z0}, {Z: z1}}, Radius: []float64{r}}
	}
	cases := []struct {
		name  string
		model Model
		kind  GeometryErrorKind
		wire  int
	}{
		{"no wires", Model{}, NoWires, -1},
		{"zero radius", Model{Wires: []Wire{straight(0, 10, 0)}}, BadRadius, 0},
		{"short segment", Model{Wires: []Wire{straight(1, 10, 0.1), straight(10, 10.1, 0.1)}}, ShortSegment, 1},
		{"below ground", Model{Ground: PerfectGround, Wires: []Wire{straight(-5, 10, 0.1)}}, BelowGround, 0},
		{"ground at interior point", Model{Ground: PerfectGround, Wires: []Wire{{
			Points: []geom.Vec3{{X: -10, Z: 5}, {}, {X: 10, Z: 5}}, Radius: []float64{0.1}}}}, TouchesGround, 0},
		{"feed off node", Model{Wires: []Wire{straight(0, 10, 0.1)}, Feed: Feed{At: geom.Vec3{Z: 5}}}, FeedNotOnNode, 0},
		{"feed at open end", Model{Wires: []Wire{straight(0, 10, 0.1)}, Feed: Feed{At: geom.Vec3{Z: 10}}}, FeedOpenEnd, 0},
		{"feed wire", Model{Wires: []Wire{straight(0, 10, 0.1)}, Feed: Feed{Wire: 3}}, FeedWire, -1},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, err := NewMesh(c.model, MeshOptions{})
			var ge *GeometryError
			if !errors.As(err, &ge) {
				t.Fatalf("got %v, want a *GeometryError", err)
			}
			if ge.Kind != c.kind || ge.Wire != c.wire {
				t.Errorf("got kind %d wire %d (%v), want kind %d wire %d", ge.Kind, ge.Wire, err, c.kind, c.wire)
			}
		})
	}
	t.Run("bad frequency", func(t *testing.T) {
		m, err := NewMesh(dipoleModel(500, 1, 10), MeshOptions{})
		if err != nil {
			t.Fatal(err)
		}
		var fe *FrequencyError
		if _, err := m.Solve(math.NaN()); !errors.As(err, &fe) {
			t.Errorf("got %v, want *FrequencyError", err)
		}
	})
	t.Run("singular matrix", func(t *testing.T) {
		// Two copies of the same wire joined at the feed node make two
		// identical basis functions.
		w := Wire{Points: []geom.Vec3{{Z: -250}, {Z: -125}, {}, {Z: 125}, {Z: 250}}, Radius: []float64{1}}
		m, err := NewMesh(Model{Wires: []Wire{w, w}, Feed: Feed{At: geom.Vec3{}}}, MeshOptions{})
		if err != nil {
			t.Fatal(err)
		}
		var se *SingularMatrixError
		if _, err := m.Solve(lambda1m); !errors.As(err, &se) {
			t.Errorf("got %v, want *SingularMatrixError", err)
		}
	})
}

func TestSubdivide(t *testing.T) {
	w := Wire{Points: []geom.Vec3{{}, {X: 10}, {X: 10, Y: 1}}, Radius: []float64{0.5, 0.2}}
	got, err := Subdivide(w, 3, 4)
	if err != nil {
		t.Fatal(err)
	}
	// Piece 0: 10 mm at most 3 mm → 4 segments of 2.5 mm (≥ 4·0.5 = 2 mm).
	// Piece 1: 1 mm, at most 3 mm → one segment (≥ 4·0.2 = 0.8 mm).
	if len(got.Points) != 6 || got.Points[4] != (geom.Vec3{X: 10}) || len(got.Radius) != 5 || got.Radius[4] != 0.2 {
		t.Fatalf("got %+v", got)
	}
	// The minimum wins: 10 mm at most 1 mm but no shorter than 4·0.5 mm.
	got, _ = Subdivide(Wire{Points: w.Points[:2], Radius: []float64{0.5}}, 1, 4)
	if len(got.Points) != 6 {
		t.Errorf("got %d points, want 6 (5 segments of 2 mm)", len(got.Points))
	}
}
