package geom

import (
	"math"
	"testing"
)

const tol = 1e-12

func TestMeshVolumeUnitCube(t *testing.T) {
	// A unit cube, outward-facing triangles: volume 1 mm³, and −1 when every
	// face is flipped (divergence theorem).
	m := Mesh{
		Vertices: []Vec3{{0, 0, 0}, {1, 0, 0}, {1, 1, 0}, {0, 1, 0}, {0, 0, 1}, {1, 0, 1}, {1, 1, 1}, {0, 1, 1}},
		Faces: [][3]uint32{
			{0, 2, 1}, {0, 3, 2}, {4, 5, 6}, {4, 6, 7},
			{0, 1, 5}, {0, 5, 4}, {1, 2, 6}, {1, 6, 5},
			{2, 3, 7}, {2, 7, 6}, {3, 0, 4}, {3, 4, 7},
		},
	}
	if v := m.Volume(); math.Abs(v-1) > tol {
		t.Errorf("volume %v, want 1", v)
	}
	if n := m.Normal(0); n != (Vec3{0, 0, -1}) {
		t.Errorf("bottom normal %v, want (0,0,-1)", n)
	}
	for i := range m.Faces {
		m.Faces[i][1], m.Faces[i][2] = m.Faces[i][2], m.Faces[i][1]
	}
	if v := m.Volume(); math.Abs(v+1) > tol {
		t.Errorf("flipped volume %v, want −1", v)
	}
	if b := m.Bounds(); b.Size() != (Vec3{1, 1, 1}) {
		t.Errorf("bounds %v", b)
	}
}

func TestPolylineAreaAndLength(t *testing.T) {
	sq := Polyline{{0, 0}, {2, 0}, {2, 2}, {0, 2}}
	if a := sq.Area(); math.Abs(a-4) > tol {
		t.Errorf("area %v, want 4 (counter-clockwise)", a)
	}
	if l := sq.Length(); math.Abs(l-6) > tol {
		t.Errorf("open length %v, want 6", l)
	}
	if r := (Vec2{1, 0}).Rotate(math.Pi / 2); math.Abs(r.X) > tol || math.Abs(r.Y-1) > tol {
		t.Errorf("rotate %v, want (0,1)", r)
	}
}
