package svg

import (
	"bytes"
	"io"
	"testing"

	"coilwright/cam/internal/fixture"
)

func BenchmarkWriteSVG(b *testing.B) {
	d := fixture.Plate()
	var buf bytes.Buffer
	if err := WriteSVG(&buf, d, SVGOptions{}); err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(buf.Len()))
	b.ReportAllocs()
	for b.Loop() {
		if err := WriteSVG(io.Discard, d, SVGOptions{}); err != nil {
			b.Fatal(err)
		}
	}
}
