package cam

import (
	"archive/zip"
	"bytes"
	"encoding/binary"
	"encoding/xml"
	"image/png"
	"io"
	"math"
	"slices"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// tetra is a right tetrahedron with legs 10, 20 and 30 mm, faces
// counter-clockwise seen from outside.
func tetra() *geom.Mesh {
	return &geom.Mesh{
		Vertices: []geom.Vec3{{}, {X: 10}, {Y: 20}, {Z: 30}},
		Faces:    [][3]uint32{{0, 2, 1}, {0, 1, 3}, {0, 3, 2}, {1, 2, 3}},
	}
}

func TestSTLRoundTrip(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteSTL(&buf, tetra(), STLOptions{}); err != nil {
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
	want := tetra()
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
	if err := WriteSTL(io.Discard, tetra(), STLOptions{Header: "solid x"}); err == nil {
		t.Error("header starting with solid accepted")
	}
	var buf bytes.Buffer
	WriteSTL(&buf, tetra(), STLOptions{})
	if _, _, err := ReadSTL(bytes.NewReader(buf.Bytes()[:buf.Len()-7])); err == nil {
		t.Error("truncated STL accepted")
	}
}

// model3MF mirrors the parts of the 3MF core schema the tests read.
type model3MF struct {
	XMLName xml.Name `xml:"http://schemas.microsoft.com/3dmanufacturing/core/2015/02 model"`
	Unit    string   `xml:"unit,attr"`
	Objects []struct {
		ID       string `xml:"id,attr"`
		Name     string `xml:"name,attr"`
		Vertices []struct {
			X float64 `xml:"x,attr"`
			Y float64 `xml:"y,attr"`
			Z float64 `xml:"z,attr"`
		} `xml:"mesh>vertices>vertex"`
		Triangles []struct {
			V1 uint32 `xml:"v1,attr"`
			V2 uint32 `xml:"v2,attr"`
			V3 uint32 `xml:"v3,attr"`
		} `xml:"mesh>triangles>triangle"`
	} `xml:"resources>object"`
	Items []struct {
		ObjectID string `xml:"objectid,attr"`
	} `xml:"build>item"`
}

func Test3MFRoundTrip(t *testing.T) {
	var buf bytes.Buffer
	if err := Write3MF(&buf, tetra(), ThreeMFOptions{Name: "Kestrel <Test> & Co"}); err != nil {
		t.Fatal(err)
	}
	var again bytes.Buffer
	Write3MF(&again, tetra(), ThreeMFOptions{Name: "Kestrel <Test> & Co"})
	if !bytes.Equal(buf.Bytes(), again.Bytes()) {
		t.Error("two writes of one mesh differ")
	}
	zr, err := zip.NewReader(bytes.NewReader(buf.Bytes()), int64(buf.Len()))
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	var modelXML []byte
	for _, f := range zr.File {
		names = append(names, f.Name)
		if f.Name == ThreeMFModelPath {
			r, _ := f.Open()
			modelXML, _ = io.ReadAll(r)
		}
	}
	// Source: 3MF Core Specification 1.3, §2 (package parts).
	if want := []string{"[Content_Types].xml", "_rels/.rels", "3D/3dmodel.model"}; !slices.Equal(names, want) {
		t.Fatalf("parts %v, want %v", names, want)
	}
	fixture.Golden(t, "tetra.model", modelXML)
	var m model3MF
	if err := xml.Unmarshal(modelXML, &m); err != nil {
		t.Fatal(err)
	}
	if m.Unit != "millimeter" || len(m.Objects) != 1 || m.Objects[0].Name != "Kestrel <Test> & Co" || len(m.Items) != 1 || m.Items[0].ObjectID != m.Objects[0].ID {
		t.Fatalf("model header wrong: %+v", m)
	}
	o := m.Objects[0]
	for i, v := range tetra().Vertices {
		if got := (geom.Vec3{X: o.Vertices[i].X, Y: o.Vertices[i].Y, Z: o.Vertices[i].Z}); got != v {
			t.Errorf("vertex %d = %v, want %v", i, got, v)
		}
	}
	for i, f := range tetra().Faces {
		if got := [3]uint32{o.Triangles[i].V1, o.Triangles[i].V2, o.Triangles[i].V3}; got != f {
			t.Errorf("triangle %d = %v, want %v", i, got, f)
		}
	}
}

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
