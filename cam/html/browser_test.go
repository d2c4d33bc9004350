//go:build unix

package html

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"

	xhtml "golang.org/x/net/html"
)

// needChromium returns the path of Debian's chromium (see checktool).
func needChromium(t *testing.T) string { return checktool.Chromium(t) }

// needTool returns the path of an external checker (see checktool).
func needTool(t *testing.T, name string) string { return checktool.Need(t, name) }

// runChromium runs chromium headless on page (see checktool.RunChromium).
func runChromium(t *testing.T, chromium, page string, extra ...string) []byte {
	return checktool.RunChromium(t, chromium, page, extra...)
}

// writeSample writes the sample report for paper to a fresh folder and
// returns its path.
func writeSample(t *testing.T, paper string) string {
	t.Helper()
	var buf bytes.Buffer
	if err := WriteReport(&buf, sampleReport(t), Options{Paper: paper}); err != nil {
		t.Fatal(err)
	}
	p := filepath.Join(t.TempDir(), "report.html")
	if err := os.WriteFile(p, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// sampleHeadings are the section headings of sampleReport, in order.
var sampleHeadings = []string{"Plots", "Summary", "Drawings", "Pattern cuts", "Per-turn table", "Cautions", "Warnings", "Provenance"}

func TestReportInBrowserDOM(t *testing.T) {
	chromium := needChromium(t)
	page := writeSample(t, "")
	dom := runChromium(t, chromium, page, "--dump-dom")
	doc, err := xhtml.Parse(bytes.NewReader(dom))
	if err != nil {
		t.Fatal(err)
	}
	count := map[string]int{}
	var heads []string
	var pressed []string
	var walk func(*xhtml.Node)
	walk = func(n *xhtml.Node) {
		if n.Type == xhtml.ElementNode {
			count[n.Data]++
			if n.Data == "h2" || n.Data == "h3" {
				heads = append(heads, textOf(n))
			}
			if n.Data == "button" {
				pressed = append(pressed, textOf(n)+"="+attrOf(n, "aria-pressed"))
			}
		}
		for c := n.FirstChild; c != nil; c = c.NextSibling {
			walk(c)
		}
	}
	walk(doc)
	want := append([]string{"Contents"}, sampleHeadings...)
	if strings.Join(heads, "|") != strings.Join(want, "|") {
		t.Errorf("browser sees headings %q, want %q", heads, want)
	}
	// Sample report: 3 plots, 2 pattern cuts and a framed drawing (which
	// nests the drawing's own svg), then 3 drawing figures (one a PNG) and
	// 2 in the second switch; one table.
	for el, n := range map[string]int{"section": 8, "figure": 10, "figcaption": 10, "table": 1, "img": 1, "svg": 10, "dl": 1, "pre": 1} {
		if count[el] != n {
			t.Errorf("browser sees %d <%s>, want %d", count[el], el, n)
		}
	}
	// The switch script ran: one button per pattern cut, the first
	// pressed.
	if got := strings.Join(pressed, "|"); got != "Elevation=true|Azimuth=false|Elevation=true|Azimuth=false" {
		t.Errorf("switch buttons %q", got)
	}
}

// inkShare is the least share of a screenshot's pixels that must differ
// from white for the page to count as drawn.
const inkShare = 0.02

func TestReportInBrowserScreenshot(t *testing.T) {
	chromium := needChromium(t)
	page := writeSample(t, "")
	shot := filepath.Join(t.TempDir(), "shot.png")
	runChromium(t, chromium, page, "--screenshot="+shot, "--window-size=1200,1800")
	f, err := os.Open(shot)
	if err != nil {
		t.Fatalf("no screenshot: %v", err)
	}
	defer f.Close()
	img, err := png.Decode(f)
	if err != nil {
		t.Fatal(err)
	}
	if b := img.Bounds(); b.Dx() != 1200 || b.Dy() != 1800 {
		t.Errorf("screenshot %v, want 1200 × 1800", b)
	}
	if share := inked(img); share < inkShare {
		t.Errorf("only %.4f of the screenshot is not white", share)
	}
	if dir := os.Getenv("COILWRIGHT_KEEP_SCREENSHOT"); dir != "" {
		b, _ := os.ReadFile(shot)
		if err := os.WriteFile(filepath.Join(dir, "report-screenshot.png"), b, 0o644); err != nil {
			t.Error(err)
		}
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

var (
	pdfPages    = regexp.MustCompile(`(?m)^Pages:\s+(\d+)`)
	pdfPageSize = regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)
)

// Page count bounds of the printed sample report. It holds six plots and
// drawings each about half a page tall or more, so it cannot fit on fewer
// than minPages; more than maxPages would mean figures or tables forced
// onto pages of their own with large gaps.
const (
	minPages = 4
	maxPages = 10
)

// pageTolPt is the allowed difference in points from the paper size.
const pageTolPt = 1

func TestReportInBrowserPrint(t *testing.T) {
	chromium := needChromium(t)
	pdfinfo := needTool(t, "pdfinfo")
	pdftotext := needTool(t, "pdftotext")
	for _, tc := range []struct {
		paper string
		w, h  float64 // points
	}{
		// 210 × 297 mm and 8.5 × 11 in, at 72 points per inch.
		{"A4", 595.276, 841.89},
		{"Letter", 612, 792},
	} {
		t.Run(tc.paper, func(t *testing.T) {
			page := writeSample(t, tc.paper)
			pdf := filepath.Join(t.TempDir(), "report.pdf")
			runChromium(t, chromium, page, "--print-to-pdf="+pdf, "--no-pdf-header-footer")
			info, err := exec.Command(pdfinfo, pdf).CombinedOutput()
			if err != nil {
				t.Fatalf("pdfinfo: %v\n%s", err, info)
			}
			m := pdfPages.FindSubmatch(info)
			if m == nil {
				t.Fatalf("pdfinfo printed no page count:\n%s", info)
			}
			n, _ := strconv.Atoi(string(m[1]))
			if n < minPages || n > maxPages {
				t.Errorf("%d pages, want %d to %d", n, minPages, maxPages)
			}
			s := pdfPageSize.FindSubmatch(info)
			if s == nil {
				t.Fatalf("pdfinfo printed no page size:\n%s", info)
			}
			w, _ := strconv.ParseFloat(string(s[1]), 64)
			h, _ := strconv.ParseFloat(string(s[2]), 64)
			if abs(w-tc.w) > pageTolPt || abs(h-tc.h) > pageTolPt {
				t.Errorf("page %g × %g pt, want %g × %g", w, h, tc.w, tc.h)
			}
			text, err := exec.Command(pdftotext, "-layout", pdf, "-").CombinedOutput()
			if err != nil {
				t.Fatalf("pdftotext: %v\n%s", err, text)
			}
			// Headings in order in the printed text.
			// A heading stands alone on its line; table-of-contents
			// entries carry a number and share lines.
			rest := string(text)
			for _, hd := range append([]string{"Build report: demo <helix> & friends"}, sampleHeadings...) {
				loc := regexp.MustCompile(`(?m)^[ \f]*` + regexp.QuoteMeta(hd) + `[ ]*$`).FindStringIndex(rest)
				if loc == nil {
					t.Errorf("printed text lacks heading %q after the ones before it", hd)
					continue
				}
				rest = rest[loc[1]:]
			}
			// Both pattern cuts print, whatever the switch showed on screen.
			for _, cap := range []string{"Elevation cut, both circular components", "Azimuth cut, both circular components"} {
				if !strings.Contains(string(text), cap) {
					t.Errorf("printed text lacks %q", cap)
				}
			}
			if t.Failed() {
				t.Logf("pdfinfo:\n%s", info)
			}
		})
	}
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}
