package threemf

import (
	"archive/zip"
	"bufio"
	"compress/flate"
	"encoding/xml"
	"fmt"
	"io"
	"strconv"
	"strings"
	"time"

	"coilwright/cam/geom"
)

// A 3MF file is a ZIP package (3MF Core Specification 1.3, 3MF Consortium):
// [Content_Types].xml, _rels/.rels pointing at the model part, and
// 3D/3dmodel.model, an XML document in the core namespace holding one mesh
// object (vertices, then triangles by vertex index, counter-clockwise seen
// from outside) and a build item placing it. Every entry carries the same
// fixed timestamp so the bytes depend only on the mesh and the options.

// ThreeMFOptions controls Write3MF. The zero value names the object
// "object".
type ThreeMFOptions struct {
	Name string // object name, e.g. the kit; "" for "object"
}

// ThreeMFModelPath is the package path of the model part.
const ThreeMFModelPath = "3D/3dmodel.model"

// threeMFCoreNS is the 3MF core specification namespace.
const threeMFCoreNS = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02"

// zipEpoch is the timestamp of every package entry: the earliest a ZIP
// header can hold.
var zipEpoch = time.Date(1980, 1, 1, 0, 0, 0, 0, time.UTC)

const threeMFContentTypes = `<?xml version="1.0" encoding="UTF-8"?>
<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="model" ContentType="application/vnd.ms-package.3dmanufacturing-3dmodel+xml"/></Types>
`

const threeMFRels = `<?xml version="1.0" encoding="UTF-8"?>
<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Target="/` + ThreeMFModelPath + `" Id="rel0" Type="http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel"/></Relationships>
`

// Write3MF writes m as a 3MF package with unit millimetre to w. It does not
// modify m.
func Write3MF(w io.Writer, m *geom.Mesh, opt ThreeMFOptions) error {
	name := opt.Name
	if name == "" {
		name = "object"
	}
	z := zip.NewWriter(w)
	// The model part is large and regular; the fastest deflate level keeps
	// most of the gain at a fraction of the time.
	z.RegisterCompressor(zip.Deflate, func(w io.Writer) (io.WriteCloser, error) {
		return flate.NewWriter(w, flate.BestSpeed)
	})
	part := func(path string, body func(io.Writer) error) error {
		f, err := z.CreateHeader(&zip.FileHeader{Name: path, Method: zip.Deflate, Modified: zipEpoch})
		if err != nil {
			return err
		}
		return body(f)
	}
	str := func(s string) func(io.Writer) error {
		return func(w io.Writer) error { _, err := io.WriteString(w, s); return err }
	}
	if err := part("[Content_Types].xml", str(threeMFContentTypes)); err != nil {
		return err
	}
	if err := part("_rels/.rels", str(threeMFRels)); err != nil {
		return err
	}
	if err := part(ThreeMFModelPath, func(w io.Writer) error { return writeModel(w, m, name) }); err != nil {
		return err
	}
	return z.Close()
}

// writeModel writes the model XML. Coordinates are the shortest decimal
// that reads back as the same float32, as in the STL.
func writeModel(w io.Writer, m *geom.Mesh, name string) error {
	bw := bufio.NewWriterSize(w, 1<<16)
	var esc strings.Builder
	if err := xml.EscapeText(&esc, []byte(name)); err != nil {
		return err
	}
	fmt.Fprintf(bw, `<?xml version="1.0" encoding="UTF-8"?>
<model unit="millimeter" xml:lang="en-US" xmlns="%s">
<metadata name="Title">%s</metadata>
<metadata name="Application">coilwright</metadata>
<resources>
<object id="1" name="%s" type="model">
<mesh>
<vertices>
`, threeMFCoreNS, esc.String(), esc.String())
	buf := make([]byte, 0, 96)
	num := func(v float64) { buf = strconv.AppendFloat(buf, float64(float32(v)), 'f', -1, 32) }
	for _, v := range m.Vertices {
		buf = append(buf[:0], `<vertex x="`...)
		num(v.X)
		buf = append(buf, `" y="`...)
		num(v.Y)
		buf = append(buf, `" z="`...)
		num(v.Z)
		buf = append(buf, "\"/>\n"...)
		bw.Write(buf)
	}
	bw.WriteString("</vertices>\n<triangles>\n")
	for _, f := range m.Faces {
		buf = append(buf[:0], `<triangle v1="`...)
		buf = strconv.AppendUint(buf, uint64(f[0]), 10)
		buf = append(buf, `" v2="`...)
		buf = strconv.AppendUint(buf, uint64(f[1]), 10)
		buf = append(buf, `" v3="`...)
		buf = strconv.AppendUint(buf, uint64(f[2]), 10)
		buf = append(buf, "\"/>\n"...)
		bw.Write(buf)
	}
	bw.WriteString("</triangles>\n</mesh>\n</object>\n</resources>\n<build>\n<item objectid=\"1\"/>\n</build>\n</model>\n")
	return bw.Flush()
}
