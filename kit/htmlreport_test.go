//go:build unix

package kit

import (
	"bytes"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"sync"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/parts/sheet"
	"coilwright/parts/spec"
	"coilwright/templates"

	xhtml "golang.org/x/net/html"
)

// builtReport writes every file of the named demo, the spec text extra
// appended, and returns the kit, the sink and report.html's path on disk.
func builtReport(t *testing.T, demo, extra string) (*Kit, *Memory, string) {
	t.Helper()
	builtMu.Lock()
	defer builtMu.Unlock()
	key := demo + extra
	if c, ok := built[key]; ok {
		page, _ := c.m.File(reportPage)
		return c.k, c.m, checktool.TempFile(t, reportPage, page)
	}
	b, ok := templates.Demo(demo)
	if !ok {
		t.Fatalf("no demo %s", demo)
	}
	b = append(append([]byte{}, b...), extra...)
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	k, err := New(Source{Name: "demo:" + demo, Bytes: b, Spec: s}, Options{Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	var m Memory
	if err := k.Write(&m, nil); err != nil {
		t.Fatal(err)
	}
	page, ok := m.File(reportPage)
	if !ok {
		t.Fatal("no report.html")
	}
	built[key] = builtKit{k, &m}
	return k, &m, checktool.TempFile(t, reportPage, page)
}

// built caches the builds the report tests share: a build meshes the
// former, the slow part.
var (
	builtMu sync.Mutex
	built   = map[string]builtKit{}
)

type builtKit struct {
	k *Kit
	m *Memory
}

// reportOffline finds any reference that could reach the network.
var reportOffline = regexp.MustCompile(`(?i)(?:src|href)\s*=\s*"(?:https?:|//|ftp:|file:)|url\(\s*['"]?(?:https?:|//)|@import`)

func TestReportPageStructure(t *testing.T) {
	k, m, path := builtReport(t, "demo-5g8-cone.toml", "")
	page, _ := os.ReadFile(path)
	checktool.CheckHTML(t, page)
	if loc := reportOffline.Find(page); loc != nil {
		t.Errorf("report.html references outside itself: %q", loc)
	}
	// The cautions are the build sheet's, word for word (as HTML text).
	bs := sheet.NewBuildSheet(k.Design, k.cutList, k.Source.SHA256())
	for _, c := range bs.Cautions {
		if !bytes.Contains(page, []byte(htmlEscape(c.Text))) {
			t.Errorf("caution %q is not the build sheet's text", c.Heading)
		}
	}
	// Provenance lists every file written before the page with the size
	// and hash the sink holds.
	for _, name := range m.Names() {
		if name == reportPage {
			continue
		}
		b, _ := m.File(name)
		if !bytes.Contains(page, []byte(">"+name+"<")) || !bytes.Contains(page, []byte(">"+strconv.Itoa(len(b))+"<")) {
			t.Errorf("provenance lacks %s (%d bytes)", name, len(b))
		}
	}
	if !bytes.Contains(page, []byte(k.Source.SHA256())) {
		t.Error("provenance lacks the spec's SHA-256")
	}
	// The field solution's sweep table has a row per sweep point, its
	// VSWR as in sweep.csv (to two places), and the tolerance section
	// ranks every spread in the analysis's own words.
	for _, p := range k.Design.Field.Points {
		row := ">" + num(p.FrequencyMHz) + "</th>"
		i := bytes.Index(page, []byte(row))
		if i < 0 || !bytes.Contains(page[i:min(len(page), i+400)], []byte(">"+strconv.FormatFloat(p.VSWR, 'f', 2, 64)+"<")) {
			t.Errorf("sweep table lacks the row at %v MHz with VSWR %.2f", p.FrequencyMHz, p.VSWR)
		}
	}
	for _, s := range k.Tolerance().Sensitivities {
		if !bytes.Contains(page, []byte(htmlEscape(s.Words))) {
			t.Errorf("tolerance section lacks %q", s.Words)
		}
	}
	if n := bytes.Count(page, []byte("Batch spread: ")); n < len(toleranceHistograms(k.Tolerance())) {
		t.Errorf("%d histogram titles in the page, want at least %d", n, len(toleranceHistograms(k.Tolerance())))
	}
}

// htmlEscape escapes text as the page writer does.
func htmlEscape(s string) string {
	var b strings.Builder
	for _, r := range s {
		switch r {
		case '&':
			b.WriteString("&amp;")
		case '<':
			b.WriteString("&lt;")
		case '>':
			b.WriteString("&gt;")
		case '"':
			b.WriteString("&#34;")
		case '\'':
			b.WriteString("&#39;")
		default:
			b.WriteRune(r)
		}
	}
	return b.String()
}

func TestReportPageInBrowser(t *testing.T) {
	chromium := checktool.Chromium(t)
	k, _, path := builtReport(t, "demo-5g8-cone.toml", "")
	titles := k.reportSectionTitles()

	t.Run("dom", func(t *testing.T) {
		dom := checktool.RunChromium(t, chromium, path, "--dump-dom")
		doc, err := xhtml.Parse(bytes.NewReader(dom))
		if err != nil {
			t.Fatal(err)
		}
		count := map[string]int{}
		var heads []string
		var walk func(*xhtml.Node)
		walk = func(n *xhtml.Node) {
			if n.Type == xhtml.ElementNode {
				count[n.Data]++
				if n.Data == "h2" {
					heads = append(heads, strings.TrimSpace(nodeText(n)))
				}
			}
			for c := n.FirstChild; c != nil; c = c.NextSibling {
				walk(c)
			}
		}
		walk(doc)
		want := "Contents|" + strings.Join(titles, "|")
		if !strings.Contains(want, "|Plots|Field solution|Tolerance|Drawings|") {
			t.Fatalf("the demo's sections %q lack the field solution or the tolerance analysis", want)
		}
		if got := strings.Join(heads, "|"); got != want {
			t.Errorf("browser sees sections %q\nwant %q", got, want)
		}
		// Figures: match, gain, two pattern cuts, the tolerance
		// histograms, side, plan, former picture, two flat parts, two
		// nested sheets. Tables: the field solution's band figures and
		// sweep; the tolerance distributions, sensitivities and inspection
		// band; per-turn, springback, cut list, two rod plans, shopping
		// list, provenance.
		hist := len(toleranceHistograms(k.Tolerance()))
		for el, n := range map[string]int{"section": len(titles), "figure": 11 + hist, "table": 2 + 3 + 7, "img": 1} {
			if count[el] != n {
				t.Errorf("browser sees %d <%s>, want %d", count[el], el, n)
			}
		}
	})

	t.Run("screenshot", func(t *testing.T) {
		shot := filepath.Join(t.TempDir(), "shot.png")
		checktool.RunChromium(t, chromium, path, "--screenshot="+shot, "--window-size=1200,1800")
		f, err := os.Open(shot)
		if err != nil {
			t.Fatalf("no screenshot: %v", err)
		}
		defer f.Close()
		img, err := png.Decode(f)
		if err != nil {
			t.Fatal(err)
		}
		// At least 2 % of the pixels carry ink: text, plot lines, shading.
		const inkShare = 0.02
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
		if share := float64(n) / float64(b.Dx()*b.Dy()); share < inkShare {
			t.Errorf("only %.4f of the screenshot is inked", share)
		}
	})
}

var (
	reportPages    = regexp.MustCompile(`(?m)^Pages:\s+(\d+)`)
	reportPageSize = regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)
)

func TestReportPagePrints(t *testing.T) {
	chromium := checktool.Chromium(t)
	pdfinfo := checktool.Need(t, "pdfinfo")
	pdftotext := checktool.Need(t, "pdftotext")
	for _, tc := range []struct {
		demo, extra, paper string
		w, h               float64 // points: 210 × 297 mm and 8.5 × 11 in at 72 per inch
	}{
		{"demo-5g8-cone.toml", "", "A4", 595.276, 841.89},
		{"demo-2g4-cylinder.toml", "\n[cutting]\npaper = \"Letter\"\n", "Letter", 612, 792},
	} {
		t.Run(tc.paper, func(t *testing.T) {
			k, _, path := builtReport(t, tc.demo, tc.extra)
			pdf := filepath.Join(t.TempDir(), "report.pdf")
			checktool.RunChromium(t, chromium, path, "--print-to-pdf="+pdf, "--no-pdf-header-footer")
			info, err := exec.Command(pdfinfo, pdf).CombinedOutput()
			if err != nil {
				t.Fatalf("pdfinfo: %v\n%s", err, info)
			}
			pm := reportPages.FindSubmatch(info)
			sm := reportPageSize.FindSubmatch(info)
			if pm == nil || sm == nil {
				t.Fatalf("pdfinfo:\n%s", info)
			}
			// Ten plots and drawings, seven tables: at least 8 pages; more
			// than 30 would mean blocks pushed onto pages of their own.
			if n, _ := strconv.Atoi(string(pm[1])); n < 8 || n > 30 {
				t.Errorf("%d pages, want 8 to 30", n)
			}
			w, _ := strconv.ParseFloat(string(sm[1]), 64)
			h, _ := strconv.ParseFloat(string(sm[2]), 64)
			if d := w - tc.w; d > 1 || d < -1 {
				t.Errorf("page %g × %g pt, want %g × %g", w, h, tc.w, tc.h)
			}
			if d := h - tc.h; d > 1 || d < -1 {
				t.Errorf("page %g × %g pt, want %g × %g", w, h, tc.w, tc.h)
			}
			text, err := exec.Command(pdftotext, "-layout", pdf, "-").CombinedOutput()
			if err != nil {
				t.Fatalf("pdftotext: %v\n%s", err, text)
			}
			rest := string(text)
			for _, hd := range k.reportSectionTitles() {
				loc := regexp.MustCompile(`(?m)^[ \f]*` + regexp.QuoteMeta(hd) + `[ ]*$`).FindStringIndex(rest)
				if loc == nil {
					t.Errorf("printed text lacks heading %q after the ones before it", hd)
					continue
				}
				rest = rest[loc[1]:]
			}
		})
	}
}

// nodeText returns the text inside n.
func nodeText(n *xhtml.Node) string {
	if n.Type == xhtml.TextNode {
		return n.Data
	}
	var b strings.Builder
	for c := n.FirstChild; c != nil; c = c.NextSibling {
		b.WriteString(nodeText(c))
	}
	return b.String()
}
