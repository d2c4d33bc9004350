package jig

import (
	"slices"
	"testing"

	"coilwright/jig/mesh"
	"coilwright/templates"
)

// TestSimplifyFormer checks that simplification removes most triangles of
// the long cylindrical demo former, whose surface is mostly flat or gently
// curved, and leaves a mesh that passes every check.
func TestSimplifyFormer(t *testing.T) {
	_, f := demoFormer(t, "demo-2g4-cylinder.toml")
	// A coarse 0.2 mm tolerance keeps the test quick. The least factor is
	// the measured one with about a quarter of margin.
	const minFactor = 20
	opt := f.MeshOptions(0.2, false)
	plain, err := mesh.Mesh(f.Solid, opt)
	if err != nil {
		t.Fatal(err)
	}
	opt.Simplify = true
	m, err := mesh.Mesh(f.Solid, opt)
	if err != nil {
		t.Fatal(err)
	}
	if _, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: f.Genus}); err != nil {
		t.Fatal(err)
	}
	factor := float64(len(plain.Faces)) / float64(len(m.Faces))
	if factor < minFactor {
		t.Errorf("%d → %d triangles, %.1f× fewer; want at least %d×", len(plain.Faces), len(m.Faces), factor, minFactor)
	}
}

// TestSimplifyDeterministic simplifies the demo former's mesh made on one
// core and on two, and requires the same vertices and faces in the same
// order.
func TestSimplifyDeterministic(t *testing.T) {
	_, f := demoFormer(t, templates.DefaultDemo)
	const cell = 0.5 // coarse, to keep the test quick
	a, err := mesh.Mesh(f.Solid, mesh.MeshOptions{Cell: cell, Workers: 1, Simplify: true})
	if err != nil {
		t.Fatal(err)
	}
	b, err := mesh.Mesh(f.Solid, mesh.MeshOptions{Cell: cell, Workers: 2, Simplify: true})
	if err != nil {
		t.Fatal(err)
	}
	plain, err := mesh.Mesh(f.Solid, mesh.MeshOptions{Cell: cell, Workers: 2})
	if err != nil {
		t.Fatal(err)
	}
	if len(a.Faces) >= len(plain.Faces) {
		t.Fatalf("nothing simplified: %d faces from %d", len(a.Faces), len(plain.Faces))
	}
	if !slices.Equal(a.Vertices, b.Vertices) || !slices.Equal(a.Faces, b.Faces) {
		t.Error("the simplified mesh differs between one and two workers")
	}
}
