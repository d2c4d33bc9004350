package kit

import (
	"fmt"
	"io"

	"coilwright/cam/preview"
	"coilwright/cam/stl"
	"coilwright/cam/threemf"
	"coilwright/jig/mesh"
)

// writeFormer meshes the winding former and writes former.stl, former.3mf
// and former.png. The mesh is checked to be closed and consistently
// oriented before anything is written. A former larger than the spec's
// print volume is not made; the design carries a former-size warning.
func (k *Kit) writeFormer(out Sink) error {
	s := k.Source.Spec
	if k.split != nil {
		return k.writeSections(out)
	}
	if !k.Former.FitsPrinter {
		return nil
	}
	f, err := k.Former.Former()
	if err != nil {
		return err
	}
	m, err := f.Mesh(s.Former.ToleranceMM)
	if err != nil {
		return err
	}
	if _, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: f.Genus}); err != nil {
		return fmt.Errorf("former mesh: %w", err)
	}
	header := stlHeader("coilwright former: " + s.Kit)
	if err := out.Add("former.stl", func(w io.Writer) error {
		return stl.WriteSTL(w, m, stl.STLOptions{Header: header})
	}); err != nil {
		return err
	}
	if err := out.Add("former.3mf", func(w io.Writer) error {
		return threemf.Write3MF(w, m, threemf.ThreeMFOptions{Name: s.Kit})
	}); err != nil {
		return err
	}
	return out.Add("former.png", func(w io.Writer) error {
		return preview.WritePreview(w, m, preview.PreviewOptions{})
	})
}

// stlHeader cuts text to the 80 bytes an STL header holds without
// splitting a character.
func stlHeader(text string) string {
	if len(text) <= 80 {
		return text
	}
	n := 0
	for i := range text {
		if i > 80 {
			break
		}
		n = i
	}
	return text[:n]
}
