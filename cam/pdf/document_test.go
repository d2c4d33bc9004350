package pdf

import (
	"bytes"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/cam/geom"
)

// popplerText renders doc to a PDF and returns pdftotext's text, skipping
// when poppler is missing unless COILWRIGHT_REQUIRE_TOOLS=1.
func popplerText(t *testing.T, pages int, doc Document) string {
	t.Helper()
	tool := checktool.Need(t, "pdftotext")
	ps, err := doc.Pages()
	if err != nil {
		t.Fatal(err)
	}
	if pages > 0 && len(ps) != pages {
		t.Errorf("%d pages, want %d", len(ps), pages)
	}
	var buf bytes.Buffer
	if err := WritePDF(&buf, ps, PDFOptions{}); err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), "doc.pdf")
	if err := os.WriteFile(path, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(tool, "-layout", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	return string(out)
}

func TestDocumentTableRepeatsHeader(t *testing.T) {
	rows := make([][]string, 120)
	for i := range rows {
		rows[i] = []string{fmt.Sprint(i + 1), fmt.Sprintf("row %03d", i+1)}
	}
	doc := Document{Footer: "test", Blocks: []Block{
		Heading{Text: "Long table", Level: 2},
		Table{Widths: []float64{1, 3}, Header: []string{"Index", "Content"}, Rows: rows},
	}}
	text := popplerText(t, 0, doc)
	pages := strings.Split(text, "\f")
	var used int
	for _, p := range pages {
		if strings.TrimSpace(p) != "" {
			used++
		}
	}
	if used < 2 {
		t.Fatalf("120 rows fit on %d page", used)
	}
	if n := strings.Count(text, "Content"); n != used {
		t.Errorf("header printed %d times on %d pages", n, used)
	}
	for i := 1; i <= 120; i++ {
		if !strings.Contains(text, fmt.Sprintf("row %03d", i)) {
			t.Errorf("row %d lost", i)
		}
	}
	if !strings.Contains(text, fmt.Sprintf("page 1 of %d", used)) {
		t.Errorf("no page count in the footer")
	}
}

func TestDocumentHeadingKeptWithText(t *testing.T) {
	// Fill a page almost to the bottom, then a heading: it must move to
	// the next page with its paragraph rather than end a page.
	filler := strings.Repeat("Filler text to take up room on the page. ", 150)
	doc := Document{Blocks: []Block{
		Paragraph{Text: filler},
		Paragraph{Text: filler[:len(filler)/3]},
		Heading{Text: "Kept heading", Level: 3},
		Paragraph{Text: "Text under the kept heading."},
	}}
	text := popplerText(t, 0, doc)
	pages := strings.Split(text, "\f")
	for _, p := range pages {
		if strings.Contains(p, "Kept heading") && !strings.Contains(p, "Text under the kept heading") {
			t.Errorf("heading ends a page without its text")
		}
	}
}

func TestDocumentFigureAndBreaks(t *testing.T) {
	doc := Document{Page: PageLetter(), TrailingPages: 2, Blocks: []Block{
		Heading{Text: "First", Level: 1},
		PageBreak{},
		PageBreak{}, // a second break on a fresh page adds nothing
		Figure{Paths: []FigurePath{{Points: geom.Polyline{{X: 0, Y: 0}, {X: 40, Y: 0}, {X: 40, Y: 20}}, Closed: true}},
			Dimensions: []geom.Dimension{{A: geom.Vec2{X: 0, Y: 0}, B: geom.Vec2{X: 40, Y: 0}, Offset: -5, Text: "40.0 base"}},
			Height:     80, Caption: "A triangle."},
		List{Items: []string{"one", "two"}},
	}}
	text := popplerText(t, 2, doc)
	for _, want := range []string{"40.0 base", "A triangle.", "page 2 of 4"} {
		if !strings.Contains(text, want) {
			t.Errorf("text lacks %q", want)
		}
	}
}

func TestDocumentErrors(t *testing.T) {
	cases := []struct {
		name string
		doc  Document
	}{
		{"bad heading level", Document{Blocks: []Block{Heading{Text: "x", Level: 7}}}},
		{"empty figure", Document{Blocks: []Block{Figure{Height: 50}}}},
		{"table without columns", Document{Blocks: []Block{Table{}}}},
		{"paragraph taller than a page", Document{Blocks: []Block{Paragraph{Text: strings.Repeat("word ", 1500)}}}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			if _, err := c.doc.Pages(); err == nil {
				t.Error("no error")
			}
		})
	}
}

func TestDocumentIsDeterministic(t *testing.T) {
	doc := Document{Footer: "kit", Blocks: []Block{
		Heading{Text: "Title", Level: 1},
		Paragraph{Lead: "Caution.", Text: "Gloves on. Ø 1.6 mm ± 0.2 mm, 13°, λ.", Boxed: true},
		Table{Widths: []float64{1, 1}, Header: []string{"a", "b"}, Rows: [][]string{{"1", "2"}}},
	}}
	render := func() []byte {
		ps, err := doc.Pages()
		if err != nil {
			t.Fatal(err)
		}
		var buf bytes.Buffer
		if err := WritePDF(&buf, ps, PDFOptions{}); err != nil {
			t.Fatal(err)
		}
		return buf.Bytes()
	}
	if !bytes.Equal(render(), render()) {
		t.Error("two renders differ")
	}
}

func TestDocumentGroupStaysTogether(t *testing.T) {
	filler := strings.Repeat("Filler text to take up room on the page. ", 160)
	group := Group{Blocks: []Block{
		Heading{Text: "Grouped step", Level: 3},
		Paragraph{Lead: "Caution.", Text: strings.Repeat("Boxed caution text. ", 30), Boxed: true},
		Paragraph{Text: "Grouped first paragraph."},
	}}
	for _, share := range []int{2, 3, 4, 5} {
		t.Run(fmt.Sprintf("after 1/%d more filler", share), func(t *testing.T) {
			doc := Document{Blocks: []Block{Paragraph{Text: filler}, Paragraph{Text: filler[:len(filler)/share]}, group}}
			text := popplerText(t, 0, doc)
			for _, p := range strings.Split(text, "\f") {
				if strings.Contains(p, "Grouped step") != strings.Contains(p, "Grouped first paragraph") {
					t.Errorf("group split across pages")
				}
			}
		})
	}
}

func BenchmarkDocumentPages(b *testing.B) {
	rows := make([][]string, 40)
	for i := range rows {
		rows[i] = []string{fmt.Sprint(i + 1), "17.60", "± 0.20", ""}
	}
	var blocks []Block
	for i := range 14 {
		blocks = append(blocks, Group{Blocks: []Block{
			Heading{Text: fmt.Sprintf("Step %d. A step", i+1), Level: 3},
			Paragraph{Lead: "Caution.", Text: strings.Repeat("Wear gloves. ", 20), Boxed: true},
			Paragraph{Text: strings.Repeat("Do the work with care. ", 30)},
		}})
	}
	blocks = append(blocks, Table{Widths: []float64{1, 1, 1, 2}, Header: []string{"Turn", "Target", "Tolerance", "Measured"}, Rows: rows})
	doc := Document{Footer: "bench", Blocks: blocks}
	b.ReportAllocs()
	for b.Loop() {
		ps, err := doc.Pages()
		if err != nil {
			b.Fatal(err)
		}
		var buf bytes.Buffer
		if err := WritePDF(&buf, ps, PDFOptions{}); err != nil {
			b.Fatal(err)
		}
		b.SetBytes(int64(buf.Len()))
	}
}
