package plot

import (
	"bytes"
	"testing"
)

func BenchmarkWriteFrequencyChart(b *testing.B) {
	c := sampleGainChart()
	var buf bytes.Buffer
	b.ReportAllocs()
	for b.Loop() {
		buf.Reset()
		if err := WriteFrequencyChart(&buf, c, ChartOptions{}); err != nil {
			b.Fatal(err)
		}
	}
	b.SetBytes(int64(buf.Len()))
}

func BenchmarkWritePolarPattern(b *testing.B) {
	p := samplePolar()
	var buf bytes.Buffer
	b.ReportAllocs()
	for b.Loop() {
		buf.Reset()
		if err := WritePolarPattern(&buf, p, PolarOptions{}); err != nil {
			b.Fatal(err)
		}
	}
	b.SetBytes(int64(buf.Len()))
}
