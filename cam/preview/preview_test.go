package preview

import (
	"bytes"
	"image/png"
	"testing"

	"coilwright/cam/geom"
)

// cube is the 10 mm cube from the origin, faces counter-clockwise seen from
// outside.
func cube() *geom.Mesh {
	m := &geom.Mesh{}
	for c := range 8 {
		m.Vertices = append(m.Vertices, geom.Vec3{X: float64(c & 1 * 10), Y: float64(c >> 1 & 1 * 10), Z: float64(c >> 2 & 1 * 10)})
	}
	for _, q := range [6][4]uint32{{0, 4, 6, 2}, {1, 3, 7, 5}, {0, 1, 5, 4}, {2, 6, 7, 3}, {0, 2, 3, 1}, {4, 5, 7, 6}} {
		m.Faces = append(m.Faces, [3]uint32{q[0], q[1], q[2]}, [3]uint32{q[0], q[2], q[3]})
	}
	return m
}

func TestPreview(t *testing.T) {
	// Source: a cube of edge 10 mm holds 1000 mm³; a wrong winding in the
	// helper would show as a negative volume.
	if v := cube().Volume(); v != 1000 {
		t.Fatalf("cube helper volume %g, want 1000", v)
	}
	var a, b bytes.Buffer
	if err := WritePreview(&a, cube(), PreviewOptions{Size: 120}); err != nil {
		t.Fatal(err)
	}
	WritePreview(&b, cube(), PreviewOptions{Size: 120})
	if !bytes.Equal(a.Bytes(), b.Bytes()) {
		t.Error("two previews of one mesh differ")
	}
	img, err := png.Decode(&a)
	if err != nil {
		t.Fatal(err)
	}
	if s := img.Bounds().Size(); s.X != 120 || s.Y != 120 {
		t.Fatalf("size %v, want 120×120", s)
	}
	// The centre shows the part; a corner shows the background.
	if r, g, bl, _ := img.At(60, 60).RGBA(); r>>8 == uint32(previewBackground.R) && g>>8 == uint32(previewBackground.G) && bl>>8 == uint32(previewBackground.B) {
		t.Error("centre pixel is background")
	}
	if r, _, _, _ := img.At(0, 0).RGBA(); r>>8 != uint32(previewBackground.R) {
		t.Error("corner pixel is not background")
	}
}
