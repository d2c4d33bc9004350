package plot

import (
	"bytes"
	"image"
	"image/png"
	"math"
	"os"
	"os/exec"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// pdfPageSize matches pdfinfo's page size line.
var pdfPageSize = regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)

// ptPerMM converts millimetres to PostScript points (72 per inch).
const ptPerMM = 72 / 25.4

// pageTolPt is the allowed difference in points between the page size
// pdfinfo reports and the plot's size (pdfinfo prints three decimals).
const pageTolPt = 0.01

// inkShare is the least share of pixels that must differ from white for
// a rendered plot to count as drawn.
const inkShare = 0.01

// samplePlots returns every sample plot as SVG bytes by name.
func samplePlots(t *testing.T) map[string][]byte {
	t.Helper()
	out := map[string][]byte{}
	var b bytes.Buffer
	for name, c := range map[string]FrequencyChart{"match": sampleMatchChart(), "gain": sampleGainChart()} {
		b.Reset()
		if err := WriteFrequencyChart(&b, c, ChartOptions{}); err != nil {
			t.Fatal(err)
		}
		out[name] = bytes.Clone(b.Bytes())
	}
	b.Reset()
	if err := WritePolarPattern(&b, samplePolar(), PolarOptions{}); err != nil {
		t.Fatal(err)
	}
	out["polar"] = bytes.Clone(b.Bytes())
	b.Reset()
	if err := WriteHistogram(&b, sampleHistogram(), ChartOptions{}); err != nil {
		t.Fatal(err)
	}
	out["histogram"] = bytes.Clone(b.Bytes())
	b.Reset()
	if err := WriteDrawing(&b, Drawing{Title: "Plate", SVG: []byte(sampleDrawingSVG), Scale: 0.5}, DrawingOptions{}); err != nil {
		t.Fatal(err)
	}
	out["drawing"] = bytes.Clone(b.Bytes())
	return out
}

// TestPlotsRenderWithRsvg renders each plot with librsvg: to PDF, where
// pdfinfo must report the page size the root element states in mm, and to
// PNG, which must not be blank.
func TestPlotsRenderWithRsvg(t *testing.T) {
	rsvg := needTool(t, "rsvg-convert")
	pdfinfo := needTool(t, "pdfinfo")
	for name, svg := range samplePlots(t) {
		t.Run(name, func(t *testing.T) {
			root := parseSVG(t, svg)
			wmm, _ := strconv.ParseFloat(strings.TrimSuffix(root.attr("width"), "mm"), 64)
			hmm, _ := strconv.ParseFloat(strings.TrimSuffix(root.attr("height"), "mm"), 64)
			in := writeTempFile(t, name+".svg", svg)
			pdf := in + ".pdf"
			if out, err := exec.Command(rsvg, "-f", "pdf", "-o", pdf, in).CombinedOutput(); err != nil {
				t.Fatalf("rsvg-convert: %v\n%s", err, out)
			}
			info, err := exec.Command(pdfinfo, pdf).CombinedOutput()
			if err != nil {
				t.Fatalf("pdfinfo: %v\n%s", err, info)
			}
			m := pdfPageSize.FindSubmatch(info)
			if m == nil {
				t.Fatalf("pdfinfo printed no page size:\n%s", info)
			}
			w, _ := strconv.ParseFloat(string(m[1]), 64)
			h, _ := strconv.ParseFloat(string(m[2]), 64)
			if math.Abs(w-wmm*ptPerMM) > pageTolPt || math.Abs(h-hmm*ptPerMM) > pageTolPt {
				t.Errorf("page %g × %g pt, want %.3f × %.3f (%g × %g mm)", w, h, wmm*ptPerMM, hmm*ptPerMM, wmm, hmm)
			}
			pngPath := in + ".png"
			if out, err := exec.Command(rsvg, "-f", "png", "-d", "72", "-p", "72", "-o", pngPath, in).CombinedOutput(); err != nil {
				t.Fatalf("rsvg-convert: %v\n%s", err, out)
			}
			f, err := os.Open(pngPath)
			if err != nil {
				t.Fatal(err)
			}
			defer f.Close()
			img, err := png.Decode(f)
			if err != nil {
				t.Fatal(err)
			}
			if share := inked(img); share < inkShare {
				t.Errorf("only %.4f of the picture is not white", share)
			}
		})
	}
}

// inked returns the share of img's pixels that are not white.
func inked(img image.Image) float64 {
	b := img.Bounds()
	n := 0
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			r, g, bl, _ := img.At(x, y).RGBA()
			if r < 0xf000 || g < 0xf000 || bl < 0xf000 {
				n++
			}
		}
	}
	return float64(n) / float64(b.Dx()*b.Dy())
}

// svgelementsScript prints, for every path element with a class, the
// class and the number of segments svgelements parsed from it, and the
// title it read.
const svgelementsScript = `
import sys, svgelements
doc = svgelements.SVG.parse(sys.argv[1])
for e in doc.elements():
    if isinstance(e, svgelements.Path):
        c = e.values.get('class')
        if c:
            print(c.replace(' ', '.'), len(e.segments()))
`

// TestPlotsParseWithSvgelements checks that svgelements reads every series,
// trace and outlined label of each plot with its path data intact:
// svgelements drops a path with bad data silently, so every element the
// plot holds must come back with segments.
func TestPlotsParseWithSvgelements(t *testing.T) {
	py := needSvgelements(t)
	for name, svg := range samplePlots(t) {
		t.Run(name, func(t *testing.T) {
			in := writeTempFile(t, name+".svg", svg)
			out, err := exec.Command(py, "-c", svgelementsScript, in).CombinedOutput()
			if err != nil {
				t.Fatalf("svgelements: %v\n%s", err, out)
			}
			got := map[string]int{}
			for _, line := range strings.Split(strings.TrimSpace(string(out)), "\n") {
				f := strings.Fields(line)
				if len(f) != 2 {
					continue
				}
				if n, _ := strconv.Atoi(f[1]); n < 2 {
					t.Errorf("%s parsed with %d segments", f[0], n)
				}
				got[f[0]]++
			}
			root := parseSVG(t, svg)
			for _, cls := range []string{"series", "trace", "envelope", "tick-label", "title", "legend-label"} {
				want := 0
				for _, e := range root.all(cls) {
					if e.XMLName.Local == "path" {
						want++
					}
				}
				have := 0
				for k, n := range got {
					if strings.Contains("."+k+".", "."+cls+".") {
						have += n
					}
				}
				if have != want {
					t.Errorf("svgelements read %d %s paths, the file holds %d", have, cls, want)
				}
			}
		})
	}
}
