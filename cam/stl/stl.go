package stl

import (
	"bufio"
	"encoding/binary"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"coilwright/cam/geom"
)

// Binary STL: an 80-byte header, a little-endian uint32 facet count, then
// per facet a float32 normal, three float32 vertices and a uint16 attribute
// word, 50 bytes in all. Coordinates are written as millimetres.

// STLOptions controls WriteSTL. The zero value writes the default header.
type STLOptions struct {
	Header string // header text, at most 80 bytes, not starting with "solid"; "" for DefaultSTLHeader
}

// DefaultSTLHeader is the header text WriteSTL uses when none is given.
const DefaultSTLHeader = "coilwright binary STL, millimetres"

const stlFacetSize = 50

// WriteSTL writes m as binary STL to w, one facet per face in face order,
// each with its unit normal. It does not modify m.
func WriteSTL(w io.Writer, m *geom.Mesh, opt STLOptions) error {
	h := opt.Header
	if h == "" {
		h = DefaultSTLHeader
	}
	if len(h) > 80 || strings.HasPrefix(h, "solid") {
		return fmt.Errorf("STL header %q must be at most 80 bytes and not start with \"solid\"", h)
	}
	if uint64(len(m.Faces)) > math.MaxUint32 {
		return fmt.Errorf("%d faces exceed the STL facet count", len(m.Faces))
	}
	bw := bufio.NewWriterSize(w, 1<<16)
	var head [84]byte
	copy(head[:], h)
	binary.LittleEndian.PutUint32(head[80:], uint32(len(m.Faces)))
	if _, err := bw.Write(head[:]); err != nil {
		return err
	}
	var rec [stlFacetSize]byte
	for _, f := range m.Faces {
		a, b, c := round32(m.Vertices[f[0]]), round32(m.Vertices[f[1]]), round32(m.Vertices[f[2]])
		// The normal of the facet as stored, from the rounded corners, so
		// that readers recomputing it find the same direction.
		n := b.Sub(a).Cross(c.Sub(a)).Normalize()
		vs := [4]geom.Vec3{n, a, b, c}
		for j, v := range vs {
			binary.LittleEndian.PutUint32(rec[12*j:], math.Float32bits(float32(v.X)))
			binary.LittleEndian.PutUint32(rec[12*j+4:], math.Float32bits(float32(v.Y)))
			binary.LittleEndian.PutUint32(rec[12*j+8:], math.Float32bits(float32(v.Z)))
		}
		if _, err := bw.Write(rec[:]); err != nil {
			return err
		}
	}
	return bw.Flush()
}

// round32 returns v with each coordinate rounded to float32.
func round32(v geom.Vec3) geom.Vec3 {
	return geom.Vec3{X: float64(float32(v.X)), Y: float64(float32(v.Y)), Z: float64(float32(v.Z))}
}

// ErrBadSTL is wrapped by ReadSTL's errors for input that is not binary STL.
var ErrBadSTL = errors.New("not a binary STL file")

// ReadSTL reads a binary STL file and returns its mesh with identical
// vertices welded (in order of first use) and the header text.
func ReadSTL(r io.Reader) (*geom.Mesh, string, error) {
	br := bufio.NewReader(r)
	var head [84]byte
	if _, err := io.ReadFull(br, head[:]); err != nil {
		return nil, "", fmt.Errorf("%w: %v", ErrBadSTL, err)
	}
	n := binary.LittleEndian.Uint32(head[80:])
	m := &geom.Mesh{}
	index := map[geom.Vec3]uint32{}
	var rec [stlFacetSize]byte
	for range n {
		if _, err := io.ReadFull(br, rec[:]); err != nil {
			return nil, "", fmt.Errorf("%w: truncated after %d facets: %v", ErrBadSTL, len(m.Faces), err)
		}
		var f [3]uint32
		for j := range 3 {
			o := 12 * (j + 1)
			v := geom.Vec3{
				X: float64(math.Float32frombits(binary.LittleEndian.Uint32(rec[o:]))),
				Y: float64(math.Float32frombits(binary.LittleEndian.Uint32(rec[o+4:]))),
				Z: float64(math.Float32frombits(binary.LittleEndian.Uint32(rec[o+8:]))),
			}
			k, ok := index[v]
			if !ok {
				k = uint32(len(m.Vertices))
				index[v] = k
				m.Vertices = append(m.Vertices, v)
			}
			f[j] = k
		}
		m.Faces = append(m.Faces, f)
	}
	if _, err := br.ReadByte(); err != io.EOF {
		return nil, "", fmt.Errorf("%w: data after the %d facets the header counts", ErrBadSTL, n)
	}
	return m, strings.TrimRight(string(head[:80]), "\x00"), nil
}
