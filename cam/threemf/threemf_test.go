package threemf

import (
	"archive/zip"
	"bytes"
	"encoding/xml"
	"io"
	"slices"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

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
	if err := Write3MF(&buf, fixture.Tetra(), ThreeMFOptions{Name: "Kestrel <Test> & Co"}); err != nil {
		t.Fatal(err)
	}
	var again bytes.Buffer
	Write3MF(&again, fixture.Tetra(), ThreeMFOptions{Name: "Kestrel <Test> & Co"})
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
	for i, v := range fixture.Tetra().Vertices {
		if got := (geom.Vec3{X: o.Vertices[i].X, Y: o.Vertices[i].Y, Z: o.Vertices[i].Z}); got != v {
			t.Errorf("vertex %d = %v, want %v", i, got, v)
		}
	}
	for i, f := range fixture.Tetra().Faces {
		if got := [3]uint32{o.Triangles[i].V1, o.Triangles[i].V2, o.Triangles[i].V3}; got != f {
			t.Errorf("triangle %d = %v, want %v", i, got, f)
		}
	}
}
