package mesh

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// TestSimplifyReduces checks that simplification removes most triangles
// where the surface is flat or gently curved.
func TestSimplifyReduces(t *testing.T) {
	cyl := must[*sdf.Cylinder](t)(sdf.NewCylinder(10, 40))
	cases := []struct {
		name      string
		s         sdf.SDF3
		opt       MeshOptions
		genus     int
		minFactor float64 // the measured factor with about a quarter of margin
	}{
		{"cylinder r 10 mm h 40 mm", cyl, MeshOptions{MinRadius: 10}, 0, 20},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			plain, err := Mesh(c.s, c.opt)
			if err != nil {
				t.Fatal(err)
			}
			c.opt.Simplify = true
			m, err := Mesh(c.s, c.opt)
			if err != nil {
				t.Fatal(err)
			}
			if _, err := CheckMesh(m, CheckOptions{Genus: c.genus}); err != nil {
				t.Fatal(err)
			}
			factor := float64(len(plain.Faces)) / float64(len(m.Faces))
			if factor < c.minFactor {
				t.Errorf("%d → %d triangles, %.1f× fewer; want at least %g×", len(plain.Faces), len(m.Faces), factor, c.minFactor)
			}
			t.Logf("%d → %d triangles (%.1f×)", len(plain.Faces), len(m.Faces), factor)
		})
	}
}

// TestDecimateKeepsManifold is a property test: seeded random blobs of
// balls and boxes are meshed coarsely and decimated with no distance limit,
// so that only the link condition and the face checks hold the mesh
// together, some vertices marked fixed. Each result must still be a closed,
// consistently oriented manifold with no pinched vertex or degenerate face,
// the same number of parts and the same Euler characteristic, and a
// positive volume.
func TestDecimateKeepsManifold(t *testing.T) {
	rng := rand.New(rand.NewPCG(1997, 1999))
	for i := range 40 {
		var parts []sdf.SDF3
		for range 2 + rng.IntN(5) {
			c := geom.Vec3{X: rng.Float64() * 10, Y: rng.Float64() * 10, Z: rng.Float64() * 10}
			size := 1.5 + rng.Float64()*3
			if rng.IntN(2) == 0 {
				parts = append(parts, sphere(t, c, size))
				continue
			}
			b := must[*sdf.Box](t)(sdf.NewBox(geom.Vec3{X: 2 * size, Y: size, Z: 1.5 * size}))
			parts = append(parts, sdf.Move(b, sdf.Translation(c)))
		}
		s := must[sdf.SDF3](t)(sdf.Union(0, parts...))
		cell := 0.4 + rng.Float64()*0.4
		t.Run(fmt.Sprintf("%02d %d shapes cell %.2f mm", i, len(parts), cell), func(t *testing.T) {
			m, err := Mesh(s, MeshOptions{Cell: cell})
			if err != nil {
				t.Fatal(err)
			}
			before, _ := CheckMesh(m, CheckOptions{})
			fixed := make([]bool, len(m.Vertices))
			for v := range fixed {
				fixed[v] = rng.IntN(10) == 0
			}
			decimate(m, fixed, s, math.Inf(1), 0)
			after, err := CheckMesh(m, CheckOptions{Components: before.Components, Genus: before.Components - before.Euler/2})
			if err != nil {
				t.Fatalf("%v\nbefore %+v\nafter %+v", err, before, after)
			}
			if after.Faces >= before.Faces/2 {
				t.Errorf("only %d of %d faces removed", before.Faces-after.Faces, before.Faces)
			}
		})
	}
}

// TestQuadricError checks the quadric's value against its definition: the
// sum of squared distances from the point to the planes (Garland &
// Heckbert, SIGGRAPH 1997, §5).
func TestQuadricError(t *testing.T) {
	const eps = 1e-12
	rng := rand.New(rand.NewPCG(5, 1997))
	for i := range 20 {
		var q quadric
		p := geom.Vec3{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		want := 0.0
		for range 1 + i%5 {
			n := geom.Vec3{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}.Normalize()
			d := rng.NormFloat64()
			pq := planeQuadric(n, d)
			q.add(&pq)
			dist := n.Dot(p) + d
			want += dist * dist
		}
		if got := q.eval(p); math.Abs(got-want) > eps*(1+want) {
			t.Errorf("case %d: quadric error %.15g, sum of squared distances %.15g", i, got, want)
		}
	}
}
