package svg

import (
	"bytes"
	"encoding/xml"
	"math"
	"os/exec"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
	"coilwright/cam/walk"
)

// svgDoc is the part of an SVG file the tests read back.
type svgDoc struct {
	Width  string `xml:"width,attr"`
	Height string `xml:"height,attr"`
	Groups []struct {
		ID      string `xml:"id,attr"`
		Circles []struct {
			R string `xml:"r,attr"`
		} `xml:"circle"`
		Paths []struct {
			D string `xml:"d,attr"`
		} `xml:"path"`
	} `xml:"g"`
}

func TestWriteSVG(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteSVG(&buf, fixture.Plate(), SVGOptions{Title: "Test plate", Comments: []string{"for milling -- or shearing"}}); err != nil {
		t.Fatal(err)
	}
	fixture.Golden(t, "plate.svg", buf.Bytes())
	var doc svgDoc
	if err := xml.Unmarshal(buf.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	// 50 mm disc plus DefaultSVGMargin each side.
	if doc.Width != "54mm" || doc.Height != "54mm" {
		t.Errorf("page %s × %s, want 54mm × 54mm", doc.Width, doc.Height)
	}
	if len(doc.Groups) != 2 || doc.Groups[0].ID != "CUT" || doc.Groups[1].ID != "MARK" {
		t.Fatalf("groups %+v", doc.Groups)
	}
	if c := doc.Groups[0].Circles; len(c) != 2 || c[0].R != "25" {
		t.Errorf("cut circles %+v", c)
	}
	if n := len(doc.Groups[1].Paths); n < 3+5 {
		t.Errorf("%d mark paths, want 3 plus the letters' outlines", n)
	}
	t.Run("sheet frame", func(t *testing.T) {
		var b bytes.Buffer
		frame := geom.Box2{Max: geom.Vec2{X: 300, Y: 200}}
		if err := WriteSVG(&b, fixture.Plate(), SVGOptions{Frame: &frame}); err != nil {
			t.Fatal(err)
		}
		if !bytes.Contains(b.Bytes(), []byte(`width="300mm" height="200mm" viewBox="0 0 300 200"`)) {
			t.Errorf("frame not used:\n%.300s", b.String())
		}
	})
}

// pdfPageSize matches pdfinfo's page size line.
var pdfPageSize = regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)

func TestSVGExternal(t *testing.T) {
	rsvg := checktool.Need(t, "rsvg-convert")
	pdfinfo := checktool.Need(t, "pdfinfo")
	for _, tc := range []struct {
		name string
		d    geom.Drawing
		opt  SVGOptions
		w, h float64 // expected page in mm
	}{
		{"part framed by its bounds", fixture.Plate(), SVGOptions{}, 54, 54},
		{"sheet frame", fixture.Plate(), SVGOptions{Frame: &geom.Box2{Max: geom.Vec2{X: 300, Y: 200}}}, 300, 200},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			if err := WriteSVG(&buf, tc.d, tc.opt); err != nil {
				t.Fatal(err)
			}
			svg := checktool.TempFile(t, "p.svg", buf.Bytes())
			pdf := svg + ".pdf"
			if out, err := exec.Command(rsvg, "-f", "pdf", "-o", pdf, svg).CombinedOutput(); err != nil {
				t.Fatalf("rsvg-convert: %v\n%s", err, out)
			}
			out, err := exec.Command(pdfinfo, pdf).Output()
			if err != nil {
				t.Fatal(err)
			}
			m := pdfPageSize.FindSubmatch(out)
			if m == nil {
				t.Fatalf("no page size in\n%s", out)
			}
			w, _ := strconv.ParseFloat(string(m[1]), 64)
			h, _ := strconv.ParseFloat(string(m[2]), 64)
			// 1 mm = 72/25.4 pt (PDF user units); pdfinfo prints 3 decimals.
			const ptTol = 0.002
			if math.Abs(w-tc.w*72/25.4) > ptTol || math.Abs(h-tc.h*72/25.4) > ptTol {
				t.Errorf("rendered page %.3f × %.3f pt, want %.3f × %.3f", w, h, tc.w*72/25.4, tc.h*72/25.4)
			}
		})
	}
}

// svgelementsCount parses an SVG with svgelements and prints the ids of
// its groups and the number of paths and circles it kept (it silently
// drops a path whose data it cannot read).
const svgelementsCount = `
import sys, svgelements as s
svg = s.SVG.parse(sys.argv[1])
els = list(svg.elements())
print(' '.join(sorted(e.id for e in els if isinstance(e, s.Group) and e.id)))
print(sum(1 for e in els if isinstance(e, (s.Path, s.Circle))))
`

func TestSVGElementsKeepsEveryShape(t *testing.T) {
	py := checktool.NeedPython(t, "svgelements")
	d, err := walk.ExpandText(fixture.Plate())
	if err != nil {
		t.Fatal(err)
	}
	want := 0
	for _, l := range d.Layers {
		want += len(l.Entities)
	}
	var buf bytes.Buffer
	if err := WriteSVG(&buf, fixture.Plate(), SVGOptions{}); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(py, "-c", svgelementsCount, checktool.TempFile(t, "p.svg", buf.Bytes())).CombinedOutput()
	if err != nil {
		t.Fatalf("svgelements: %v\n%s", err, out)
	}
	lines := strings.Split(strings.TrimSpace(string(out)), "\n")
	if lines[0] != "CUT MARK" || lines[1] != strconv.Itoa(want) {
		t.Errorf("svgelements sees groups %q and %s shapes, want CUT MARK and %d", lines[0], lines[1], want)
	}
}
