package dxf

import (
	"bytes"
	"io"
	"testing"

	"coilwright/cam/internal/fixture"
)

func BenchmarkWriteDXF(b *testing.B) {
	d := fixture.Plate()
	var buf bytes.Buffer
	if err := WriteDXF(&buf, d, DXFOptions{}); err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(buf.Len()))
	b.ReportAllocs()
	for b.Loop() {
		if err := WriteDXF(io.Discard, d, DXFOptions{}); err != nil {
			b.Fatal(err)
		}
	}
}
