package main

import (
	"archive/zip"
	"bytes"
	"encoding/xml"
	"image/png"
	"io"
	"os"
	"path/filepath"
	"testing"

	"coilwright/cam/stl"
	"coilwright/cam/threemf"
	"coilwright/templates"
)

// TestBuildWritesFormer builds the default demo twice and checks the former
// files: the STL reads back, the 3MF is a ZIP whose model XML parses with
// millimetre units and the kit's name, the PNG decodes, and both builds are
// byte for byte the same.
func TestBuildWritesFormer(t *testing.T) {
	var runs [2]map[string][]byte
	for i := range runs {
		dir := filepath.Join(t.TempDir(), "out")
		if err := runBuild(io.Discard, "", buildOptions{outDir: dir, demo: templates.DefaultDemo}); err != nil {
			t.Fatal(err)
		}
		runs[i] = map[string][]byte{}
		for _, name := range []string{"former.stl", "former.3mf", "former.png"} {
			b, err := os.ReadFile(filepath.Join(dir, name))
			if err != nil {
				t.Fatal(err)
			}
			runs[i][name] = b
		}
	}
	for name, b := range runs[0] {
		if !bytes.Equal(b, runs[1][name]) {
			t.Errorf("%s differs between two builds", name)
		}
	}
	m, _, err := stl.ReadSTL(bytes.NewReader(runs[0]["former.stl"]))
	if err != nil {
		t.Fatal(err)
	}
	if len(m.Faces) == 0 || !(m.Volume() > 0) {
		t.Errorf("STL has %d faces, volume %g", len(m.Faces), m.Volume())
	}
	tmf := runs[0]["former.3mf"]
	zr, err := zip.NewReader(bytes.NewReader(tmf), int64(len(tmf)))
	if err != nil {
		t.Fatal(err)
	}
	var model struct {
		Unit    string `xml:"unit,attr"`
		Objects []struct {
			Name      string     `xml:"name,attr"`
			Triangles []struct{} `xml:"mesh>triangles>triangle"`
		} `xml:"resources>object"`
	}
	found := false
	for _, f := range zr.File {
		if f.Name != threemf.ThreeMFModelPath {
			continue
		}
		r, err := f.Open()
		if err != nil {
			t.Fatal(err)
		}
		if err := xml.NewDecoder(r).Decode(&model); err != nil {
			t.Fatalf("model XML: %v", err)
		}
		found = true
	}
	if !found || model.Unit != "millimeter" || len(model.Objects) != 1 || model.Objects[0].Name != "Kestrel Ridge 5G8 Taper" ||
		len(model.Objects[0].Triangles) != len(m.Faces) {
		t.Errorf("3MF model: found %v, unit %q, %d objects", found, model.Unit, len(model.Objects))
	}
	if _, err := png.Decode(bytes.NewReader(runs[0]["former.png"])); err != nil {
		t.Errorf("former.png: %v", err)
	}
}
