package stl

import (
	"bytes"
	"encoding/binary"
	"io"
	"math"
	"testing"

	"coilwright/cam/internal/fixture"
)

func TestSTLRoundTrip(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteSTL(&buf, fixture.Tetra(), STLOptions{}); err != nil {
		t.Fatal(err)
	}
	// Source: binary STL layout, 80 + 4 + 50 bytes per facet.
	if want := 84 + 4*50; buf.Len() != want {
		t.Fatalf("size %d, want %d", buf.Len(), want)
	}
	fixture.Golden(t, "tetra.stl", buf.Bytes())
	m, head, err := ReadSTL(bytes.NewReader(buf.Bytes()))
	if err != nil {
		t.Fatal(err)
	}
	if head != DefaultSTLHeader || len(m.Faces) != 4 || len(m.Vertices) != 4 {
		t.Fatalf("read back %q with %d vertices, %d faces", head, len(m.Vertices), len(m.Faces))
	}
	want := fixture.Tetra()
	for i, f := range m.Faces {
		for k := range 3 {
			if got, w := m.Vertices[f[k]], want.Vertices[want.Faces[i][k]]; got != w {
				t.Errorf("face %d corner %d = %v, want %v", i, k, got, w)
			}
		}
	}
	// First facet normal: face (0,2,1) lies in z = 0 facing −z.
	n := math.Float32frombits(binary.LittleEndian.Uint32(buf.Bytes()[84+8:]))
	if n != -1 {
		t.Errorf("first normal z = %g, want −1", n)
	}
	// Source: volume of a right tetrahedron, abc/6 = 1000 mm³.
	const volTol = 1e-9
	if v := m.Volume(); math.Abs(v-1000) > volTol {
		t.Errorf("volume %g, want 1000", v)
	}
}

func TestSTLRejects(t *testing.T) {
	if err := WriteSTL(io.Discard, fixture.Tetra(), STLOptions{Header: "solid x"}); err == nil {
		t.Error("header starting with solid accepted")
	}
	var buf bytes.Buffer
	WriteSTL(&buf, fixture.Tetra(), STLOptions{})
	if _, _, err := ReadSTL(bytes.NewReader(buf.Bytes()[:buf.Len()-7])); err == nil {
		t.Error("truncated STL accepted")
	}
}
