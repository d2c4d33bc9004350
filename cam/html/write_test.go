package html

import (
	"bytes"
	"coilwright/cam/internal/fixture"
	"errors"
	"regexp"
	"strings"
	"testing"

	"coilwright/cam/checktool"

	xhtml "golang.org/x/net/html"
)

// golden compares got with testdata/name, rewriting the file under -update.
func golden(t *testing.T, name string, got []byte) { fixture.Golden(t, name, got) }

// checkStructure reports every tag not closed in order, every id used
// twice, every skipped heading level and every reference that leaves the
// page (see checktool.CheckHTML).
func checkStructure(t *testing.T, page []byte) { t.Helper(); checktool.CheckHTML(t, page) }

// externalRef finds any reference that could reach the network: a URL
// scheme other than data: in an attribute or CSS url().
var externalRef = regexp.MustCompile(`(?i)(?:src|href)\s*=\s*"(?:https?:|//|ftp:|file:)|url\(\s*['"]?(?:https?:|//)|@import`)

func TestWriteReport(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteReport(&buf, smallDocument(t), Options{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "small.html", buf.Bytes())
	page := buf.Bytes()
	checkStructure(t, page)
	if m := externalRef.Find(page); m != nil {
		t.Errorf("page references outside itself: %q", m)
	}
	doc, err := xhtml.Parse(bytes.NewReader(page))
	if err != nil {
		t.Fatal(err)
	}
	var (
		headings, captions, ths, figcaps, alts []string
		svgs                                   int
		scripts                                int
	)
	var walk func(n *xhtml.Node)
	walk = func(n *xhtml.Node) {
		if n.Type == xhtml.ElementNode {
			switch n.Data {
			case "h1", "h2", "h3":
				headings = append(headings, n.Data+" "+textOf(n))
			case "caption":
				captions = append(captions, textOf(n))
			case "th":
				ths = append(ths, textOf(n))
			case "figcaption":
				figcaps = append(figcaps, textOf(n))
			case "img":
				alts = append(alts, attrOf(n, "alt"))
			case "svg":
				svgs++
			case "script":
				scripts++
			}
		}
		for c := n.FirstChild; c != nil; c = c.NextSibling {
			walk(c)
		}
	}
	walk(doc)
	want := []string{"h1 Build report: demo <helix> & friends", "h2 Contents", "h2 Summary", "h2 Drawings", "h3 Pattern cuts",
		"h2 Per-turn table", "h2 Cautions", "h2 Warnings", "h2 Provenance"}
	if strings.Join(headings, "|") != strings.Join(want, "|") {
		t.Errorf("headings\n%q\nwant\n%q", headings, want)
	}
	if strings.Join(captions, "|") != "Turns" || strings.Join(ths, "|") != "Turn|Angle (°)|Height (mm)|1|2" {
		t.Errorf("table captions %q, header cells %q", captions, ths)
	}
	if len(figcaps) != 5 || svgs != 4 || len(alts) != 1 || alts[0] != "Former preview" {
		t.Errorf("%d figure captions, %d inline SVGs, img alts %q", len(figcaps), svgs, alts)
	}
	if scripts != 1 {
		t.Errorf("%d scripts, want 1 (the figure switch)", scripts)
	}
	for _, s := range []string{
		`A &#34;quoted&#34; &lt;b&gt;not bold&lt;/b&gt; &amp; escaped paragraph.`,
		`<strong>Warning:</strong> Pitch angle`,
		`id="fig-1-CUT"`, `id="fig-2-CUT"`,
		`<th scope="row">1</th><td class="num">0</td>`,
		`src="data:image/png;base64,iVBORw0KGgo`,
	} {
		if !bytes.Contains(page, []byte(s)) {
			t.Errorf("page lacks %q", s)
		}
	}
	if bytes.Contains(page, []byte("<?xml")) {
		t.Error("an XML declaration was inlined")
	}
}

func textOf(n *xhtml.Node) string {
	var b strings.Builder
	var walk func(*xhtml.Node)
	walk = func(n *xhtml.Node) {
		if n.Type == xhtml.TextNode {
			b.WriteString(n.Data)
		}
		for c := n.FirstChild; c != nil; c = c.NextSibling {
			walk(c)
		}
	}
	walk(n)
	return strings.TrimSpace(b.String())
}

func attrOf(n *xhtml.Node, key string) string {
	for _, a := range n.Attr {
		if a.Key == key {
			return a.Val
		}
	}
	return ""
}

func TestWriteReportWithPlots(t *testing.T) {
	var buf bytes.Buffer
	if err := WriteReport(&buf, sampleReport(t), Options{Paper: "A4"}); err != nil {
		t.Fatal(err)
	}
	checkStructure(t, buf.Bytes())
	if m := externalRef.Find(buf.Bytes()); m != nil {
		t.Errorf("page references outside itself: %q", m)
	}
	if !bytes.Contains(buf.Bytes(), []byte("@page { size: A4; }")) {
		t.Error("A4 page size not set")
	}
	// Each plot's title and description ids carry its figure's prefix.
	for _, s := range []string{`aria-labelledby="fig-1-title fig-1-desc"`, `id="fig-1-title"`, `url(#fig-1-clip-0)`} {
		if !bytes.Contains(buf.Bytes(), []byte(s)) {
			t.Errorf("page lacks %q", s)
		}
	}
}

func TestWriteReportRefuses(t *testing.T) {
	for _, tc := range []struct {
		name string
		doc  Document
		opt  Options
	}{
		{"no title", Document{}, Options{}},
		{"duplicate section id", Document{Title: "T", Sections: []Section{{ID: "a", Title: "A"}, {ID: "a", Title: "B"}}}, Options{}},
		{"too deep", Document{Title: "T", Sections: []Section{{Title: "A", Subsections: []Section{{Title: "B", Subsections: []Section{{Title: "C"}}}}}}}, Options{}},
		{"row too wide", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Table{Caption: "c", Header: []string{"x"}, Rows: [][]string{{"1", "2"}}}}}}}, Options{}},
		{"table without caption", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Table{Header: []string{"x"}}}}}}, Options{}},
		{"PNG without alt", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{PNG: []byte("\x89PNG")}}}}}, Options{}},
		{"script in SVG", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{SVG: []byte(`<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>`)}}}}}, Options{}},
		{"event attribute", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{SVG: []byte(`<svg xmlns="http://www.w3.org/2000/svg" onload="x()"/>`)}}}}}, Options{}},
		{"external image", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{SVG: []byte(`<svg xmlns="http://www.w3.org/2000/svg"><image href="https://example.invalid/a.png"/></svg>`)}}}}}, Options{}},
		{"external fill", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{SVG: []byte(`<svg xmlns="http://www.w3.org/2000/svg"><rect fill="url(https://example.invalid/#p)"/></svg>`)}}}}}, Options{}},
		{"not SVG", Document{Title: "T", Sections: []Section{{Title: "A", Blocks: []Block{Figure{SVG: []byte(`<html/>`)}}}}}, Options{}},
		{"unknown paper", Document{Title: "T"}, Options{Paper: "A3"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			err := WriteReport(&buf, tc.doc, tc.opt)
			var me *ModelError
			if !errors.As(err, &me) {
				t.Fatalf("error %v, want a ModelError", err)
			}
			if buf.Len() != 0 {
				t.Errorf("%d bytes written for a refused document", buf.Len())
			}
		})
	}
}

func TestSlug(t *testing.T) {
	for in, want := range map[string]string{"Per-turn table": "s-per-turn-table", "Cut list & batch plan": "s-cut-list-batch-plan", "2 cuts": "s-2-cuts"} {
		if got := slug(in); got != want {
			t.Errorf("slug(%q) = %q, want %q", in, got, want)
		}
	}
}
