package pdf

import (
	"bytes"
	"os/exec"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/cam/internal/fixture"
)

// TestTemplateNotesStayOnPage sets a note longer than the page is wide and
// measures every word poppler finds against the page's right edge.
func TestTemplateNotesStayOnPage(t *testing.T) {
	pdftotext := checktool.Need(t, "pdftotext")
	long := strings.Repeat("FR-4 copper-clad glass-epoxy laminate disc, 1.60 mm thick; size 50.00 mm, kerf compensated. ", 3)
	pages, err := TemplatePages([]TemplatePart{{Title: "Reflector", Notes: []string{long}, Drawing: fixture.Plate()}},
		TemplateOptions{Page: PageA4(), Heading: "Test kit", Warnings: []string{long}})
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := WritePDF(&buf, pages, PDFOptions{}); err != nil {
		t.Fatal(err)
	}
	path := checktool.TempFile(t, "t.pdf", buf.Bytes())
	out, err := exec.Command(pdftotext, "-bbox", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	// Page width in points, and each word's right edge.
	pageW := PageA4().Width / 25.4 * 72
	right := pageW - templateMargin/25.4*72
	words := regexp.MustCompile(`<word xMin="[0-9.]+" yMin="[0-9.]+" xMax="([0-9.]+)"[^>]*>([^<]*)</word>`).FindAllStringSubmatch(string(out), -1)
	if len(words) < 30 {
		t.Fatalf("pdftotext found %d words", len(words))
	}
	for _, w := range words {
		x, _ := strconv.ParseFloat(w[1], 64)
		if x > right+0.5 {
			t.Errorf("word %q ends at x = %.1f pt, past the %.1f pt margin of a %.1f pt page", w[2], x, right, pageW)
		}
	}
	if n := strings.Count(string(out), ">compensated.<"); n != 6 {
		t.Errorf("%d copies of the note's last word, want 6 (three per note, both notes whole)", n)
	}
}
