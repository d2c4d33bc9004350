package mesh

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// must returns a function that unwraps a (value, error) pair or fails t.
func must[T any](t testing.TB) func(T, error) T {
	return func(v T, err error) T {
		t.Helper()
		if err != nil {
			t.Fatal(err)
		}
		return v
	}
}

func sphere(t testing.TB, c geom.Vec3, r float64) sdf.SDF3 {
	circ := must[*sdf.Circle](t)(sdf.NewCircle(geom.Vec2{}, r))
	return sdf.Move(must[*sdf.Revolve](t)(sdf.NewRevolve(circ)), sdf.Translation(c))
}

// TestMeshVolumes meshes solids of known volume, plain and simplified, and
// requires a closed, oriented manifold of the expected genus, every vertex
// and centroid within the tolerance, and the volume within 0.5 %; the box's
// sharp edges and corners must survive simplification so that it keeps its
// volume, and simplification must remove faces.
func TestMeshVolumes(t *testing.T) {
	const R, r, h = 10.0, 6.0, 25.0
	frustum := must[*sdf.Cone](t)(sdf.NewCone(h, R, r))
	torusProf := must[*sdf.Circle](t)(sdf.NewCircle(geom.Vec2{X: 8}, 3))
	torus := must[*sdf.Revolve](t)(sdf.NewRevolve(torusProf))
	twoBalls := must[sdf.SDF3](t)(sdf.Union(0, sphere(t, geom.Vec3{}, 4), sphere(t, geom.Vec3{X: 12}, 4)))
	box := must[*sdf.Box](t)(sdf.NewBox(geom.Vec3{X: 20, Y: 10, Z: 5}))
	cases := []struct {
		name   string
		s      sdf.SDF3
		want   float64
		relTol float64
		parts  int
		genus  int
	}{
		// Source: frustum volume πh(R² + Rr + r²)/3 (any geometry handbook).
		{"plain frustum", frustum, math.Pi * h * (R*R + R*r + r*r) / 3, 0.005, 1, 0},
		// Source: Pappus's theorem, V = 2π·8 · π·3².
		{"torus", torus, 2 * math.Pi * 8 * math.Pi * 9, 0.005, 1, 1},
		// Source: sphere volume 4πr³/3, twice.
		{"two spheres", twoBalls, 2 * 4 * math.Pi * 64 / 3, 0.005, 2, 0},
		// Source: box volume, length × width × height.
		{"box", box, 20 * 10 * 5, 0.005, 1, 0},
	}
	for _, c := range cases {
		plainFaces := 0
		for _, simplify := range []bool{false, true} {
			t.Run(fmt.Sprintf("%s simplified %v", c.name, simplify), func(t *testing.T) {
				m, err := Mesh(c.s, MeshOptions{Simplify: simplify})
				if err != nil {
					t.Fatal(err)
				}
				rep, err := CheckMesh(m, CheckOptions{Components: c.parts, Genus: c.genus, SDF: c.s, Tolerance: DefaultTolerance})
				if err != nil {
					t.Fatalf("%v\n%+v", err, rep)
				}
				if rel := math.Abs(rep.Volume-c.want) / c.want; rel > c.relTol {
					t.Errorf("volume %.3f mm³, want %.3f (off by %.3f %%)", rep.Volume, c.want, 100*rel)
				}
				if !simplify {
					plainFaces = len(m.Faces)
				} else if len(m.Faces) >= plainFaces {
					t.Errorf("%d faces simplified from %d", len(m.Faces), plainFaces)
				}
				t.Logf("%d faces, volume off by %.4f %%, vertex %.5f mm, centroid %.5f mm", rep.Faces,
					100*math.Abs(rep.Volume-c.want)/c.want, rep.MaxVertexDist, rep.MaxCentroidDist)
			})
		}
	}
}

// TestMeshAmbiguousFaces meshes a cloud of overlapping and touching balls
// on a coarse grid, where many cube faces have diagonal signs, and checks the
// result stays a closed, oriented manifold.
func TestMeshAmbiguousFaces(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 8))
	var balls []sdf.SDF3
	for range 40 {
		c := geom.Vec3{X: rng.Float64() * 10, Y: rng.Float64() * 10, Z: rng.Float64() * 10}
		balls = append(balls, sphere(t, c, 0.4+rng.Float64()*1.2))
	}
	s := must[sdf.SDF3](t)(sdf.Union(0, balls...))
	for _, cell := range []float64{0.37, 0.61, 0.9} {
		m, err := Mesh(s, MeshOptions{Cell: cell})
		if err != nil {
			t.Fatal(err)
		}
		// The parts and genus of a random cloud are unknown, so only the
		// local checks are read from the report.
		rep, _ := CheckMesh(m, CheckOptions{})
		if rep.OpenEdges+rep.OverusedEdges+rep.MisorientedEdges+rep.PinchedVertices+rep.DegenerateFaces != 0 {
			t.Errorf("cell %g: %+v", cell, rep)
		}
		if (rep.Euler % 2) != 0 {
			t.Errorf("cell %g: odd Euler characteristic %d for a closed oriented surface", cell, rep.Euler)
		}
	}
}

// TestMeshDeterministic checks one core and two give identical meshes.
func TestMeshDeterministic(t *testing.T) {
	s := must[sdf.SDF3](t)(sdf.Union(0.5, sphere(t, geom.Vec3{}, 3), sphere(t, geom.Vec3{X: 4}, 2)))
	a := must[*geom.Mesh](t)(Mesh(s, MeshOptions{Workers: 1}))
	b := must[*geom.Mesh](t)(Mesh(s, MeshOptions{Workers: 2}))
	if !slices.Equal(a.Vertices, b.Vertices) || !slices.Equal(a.Faces, b.Faces) {
		t.Error("meshes differ between one and two workers")
	}
}

func TestMeshRejects(t *testing.T) {
	half := must[*sdf.HalfSpace](t)(sdf.NewHalfSpace(geom.Vec3{X: 1, Y: 1}, geom.Vec3{}))
	if _, err := Mesh(half, MeshOptions{}); !errors.Is(err, ErrUnbounded) {
		t.Errorf("unbounded solid: got %v, want ErrUnbounded", err)
	}
	if _, err := Mesh(sphere(t, geom.Vec3{}, 1), MeshOptions{Tolerance: -1}); err == nil {
		t.Error("negative tolerance accepted")
	}
}

// TestCheckMeshFindsFaults breaks a good mesh in known ways.
func TestCheckMeshFindsFaults(t *testing.T) {
	good := must[*geom.Mesh](t)(Mesh(sphere(t, geom.Vec3{}, 2), MeshOptions{Tolerance: 0.1}))
	cases := []struct {
		name   string
		break_ func(m *geom.Mesh)
		field  func(r MeshReport) int
	}{
		{"dropped face opens three edges", func(m *geom.Mesh) { m.Faces = m.Faces[1:] }, func(r MeshReport) int { return r.OpenEdges }},
		{"flipped face misorients three edges", func(m *geom.Mesh) { f := &m.Faces[0]; f[0], f[1] = f[1], f[0] }, func(r MeshReport) int { return r.MisorientedEdges }},
		{"collapsed face", func(m *geom.Mesh) { f := &m.Faces[0]; f[2] = f[1] }, func(r MeshReport) int { return r.DegenerateFaces }},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m := &geom.Mesh{Vertices: slices.Clone(good.Vertices), Faces: slices.Clone(good.Faces)}
			c.break_(m)
			r, err := CheckMesh(m, CheckOptions{})
			if !errors.Is(err, ErrBadMesh) || c.field(r) == 0 {
				t.Errorf("not caught: %v %+v", err, r)
			}
		})
	}
}
