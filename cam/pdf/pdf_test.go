package pdf

import (
	"bytes"
	"compress/zlib"
	"encoding/binary"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"os/exec"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"

	"coilwright/cam/checktool"
	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// templateDoc renders a two-part template: the plate on one page and a
// 250 mm disc that must be tiled.
func templateDoc(t *testing.T, page PageSize, opt PDFOptions) []byte {
	t.Helper()
	var big geom.Drawing
	big.Add("CUT", geom.Circle{Radius: 125})
	pages, err := TemplatePages([]TemplatePart{
		{Title: "Reflector", Notes: []string{"disc Ø 50 mm"}, Drawing: fixture.Plate()},
		{Title: "Large reflector", Drawing: big},
	}, TemplateOptions{Page: page, Heading: "Test kit", Warnings: []string{"FR-4: mill or shear only"}})
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := WritePDF(&buf, pages, opt); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}

func TestWritePDFDeterministic(t *testing.T) {
	a := templateDoc(t, PageA4(), PDFOptions{Title: "T"})
	b := templateDoc(t, PageA4(), PDFOptions{Title: "T"})
	if !bytes.Equal(a, b) {
		t.Error("two renders of the same pages differ")
	}
	if bytes.Contains(a, []byte("/CreationDate")) {
		t.Error("a creation date was written without one being asked for")
	}
	when := time.Date(2024, 5, 6, 7, 8, 9, 0, time.UTC)
	c := templateDoc(t, PageA4(), PDFOptions{Created: when})
	if !bytes.Contains(c, []byte("/CreationDate(D:20240506070809Z)")) {
		t.Error("creation date not written")
	}
	if !bytes.Equal(c, templateDoc(t, PageA4(), PDFOptions{Created: when})) {
		t.Error("two dated renders differ")
	}
}

func TestSourceDateEpoch(t *testing.T) {
	for _, tc := range []struct {
		in   string
		want time.Time
		ok   bool
	}{
		{"", time.Time{}, true},
		{"0", time.Unix(0, 0).UTC(), true},
		{"1714979289", time.Date(2024, 5, 6, 7, 8, 9, 0, time.UTC), true},
		{"-5", time.Time{}, false},
		// Source: `date -u -d @253402300799` prints Fri Dec 31 23:59:59 UTC 9999.
		{"253402300799", time.Date(9999, 12, 31, 23, 59, 59, 0, time.UTC), true},
		{"253402300800", time.Time{}, false},
		{"9223372036854775807", time.Time{}, false},
		{"soon", time.Time{}, false},
	} {
		t.Run(fmt.Sprintf("value %q", tc.in), func(t *testing.T) {
			got, err := SourceDateEpoch(tc.in)
			if (err == nil) != tc.ok || !got.Equal(tc.want) {
				t.Errorf("SourceDateEpoch(%q) = %v, %v", tc.in, got, err)
			}
		})
	}
}

func TestPDFExternal(t *testing.T) {
	qpdf := checktool.Need(t, "qpdf")
	pdfinfo := checktool.Need(t, "pdfinfo")
	pdftotext := checktool.Need(t, "pdftotext")
	pdffonts := checktool.Need(t, "pdffonts")
	for _, tc := range []struct {
		page  PageSize
		pages int
		size  string
	}{
		// The 250 mm disc (plus margins) needs 2 × 2 tiles on A4 and on
		// Letter, after the plate's own page.
		{PageA4(), 5, "595.276 x 841.89 pts (A4)"},
		{PageLetter(), 5, "612 x 792 pts (letter)"},
	} {
		t.Run(tc.page.Name, func(t *testing.T) {
			path := checktool.TempFile(t, "t.pdf", templateDoc(t, tc.page, PDFOptions{Title: "Test", Created: time.Unix(0, 0)}))
			out, err := exec.Command(qpdf, "--check", path).CombinedOutput()
			if err != nil || !strings.Contains(string(out), "No syntax or stream encoding errors") {
				t.Fatalf("qpdf --check: %v\n%s", err, out)
			}
			info, err := exec.Command(pdfinfo, path).Output()
			if err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(string(info), fmt.Sprintf("Pages:           %d\n", tc.pages)) || !strings.Contains(string(info), tc.size) {
				t.Errorf("pdfinfo:\n%s", info)
			}
			text, err := exec.Command(pdftotext, "-layout", path, "-").Output()
			if err != nil {
				t.Fatal(err)
			}
			for _, want := range []string{"Test kit", "Reflector", "50 mm: print at 100 %", "FR-4: mill or shear only", "tile row 2 of 2, column 2 of 2"} {
				if !strings.Contains(string(text), want) {
					t.Errorf("text lacks %q", want)
				}
			}
			fonts, err := exec.Command(pdffonts, path).Output()
			if err != nil {
				t.Fatal(err)
			}
			for _, l := range strings.Split(strings.TrimSpace(string(fonts)), "\n")[2:] {
				if f := strings.Fields(l); len(f) < 5 || f[len(f)-5] != "yes" {
					t.Errorf("font not embedded: %q", l)
				}
			}
		})
	}
}

// readPGM decodes a binary (P5) 8-bit greyscale image.
func readPGM(t *testing.T, b []byte) (w, h int, pix []byte) {
	t.Helper()
	var magic string
	var maxv int
	n, err := fmt.Sscan(string(b), &magic, &w, &h, &maxv)
	if err != nil || n != 4 || magic != "P5" || maxv != 255 {
		t.Fatalf("not an 8-bit PGM: %v", err)
	}
	return w, h, b[len(b)-w*h:]
}

func TestTemplateScaleBar(t *testing.T) {
	pdftoppm := checktool.Need(t, "pdftoppm")
	path := checktool.TempFile(t, "t.pdf", templateDoc(t, PageA4(), PDFOptions{}))
	// Render page 1 at 254 dpi (10 px per mm) in a band round the bar.
	const dpmm = 10
	o := ScaleBarOrigin()
	top := int((PageA4().Height - o.Y - scaleBarHeight - 1) * dpmm)
	band := int((scaleBarHeight + 2) * dpmm)
	base := strings.TrimSuffix(path, ".pdf")
	cmd := exec.Command(pdftoppm, "-r", "254", "-gray", "-f", "1", "-l", "1", "-singlefile",
		"-x", "0", "-y", strconv.Itoa(top), "-W", strconv.Itoa(int(PageA4().Width*dpmm)), "-H", strconv.Itoa(band), path, base)
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("pdftoppm: %v\n%s", err, out)
	}
	img, err := os.ReadFile(base + ".pgm")
	if err != nil {
		t.Fatal(err)
	}
	w, h, pix := readPGM(t, img)
	// runs returns the centre and length in px of each dark run in row y.
	runs := func(y int) (centres, lengths []float64) {
		row := pix[y*w : (y+1)*w]
		start := -1
		for x := 0; x <= w; x++ {
			dark := x < w && row[x] < 128
			if dark && start < 0 {
				start = x
			}
			if !dark && start >= 0 {
				centres = append(centres, float64(start+x-1)/2)
				lengths = append(lengths, float64(x-start))
				start = -1
			}
		}
		return centres, lengths
	}
	// Above the bar only the two end ticks show: their centres must be
	// 50 mm = 500 px apart, to a pixel.
	c, _ := runs(dpmm / 2)
	if len(c) != 2 || math.Abs(c[1]-c[0]-ScaleBarMM*dpmm) > 1 {
		t.Errorf("end ticks at %v px, want two 500 px apart (50 mm at 254 dpi)", c)
	}
	// Through the bar: one run of 500 px plus the ticks' half widths
	// (0.1 mm each side).
	_, l := runs(h / 2)
	if len(l) != 1 || math.Abs(l[0]-ScaleBarMM*dpmm-2) > 1 {
		t.Errorf("bar runs %v px, want one of about 502", l)
	}
}

func TestPDFFontTimestampPinned(t *testing.T) {
	// The embedded font's head.modified must equal head.created, and its
	// checksums must hold: the whole font sums to 0xB1B0AFBA (OpenType
	// specification, head table, checkSumAdjustment).
	b := templateDoc(t, PageA4(), PDFOptions{})
	m := regexp.MustCompile(`/FontFile2 (\d+) 0 R`).FindSubmatch(b)
	if m == nil {
		t.Fatal("no embedded TrueType font")
	}
	obj := bytes.Index(b, []byte("\n"+string(m[1])+" 0 obj\n"))
	data := b[bytes.Index(b[obj:], []byte(">>stream\n"))+obj+len(">>stream\n"):]
	zr, err := zlib.NewReader(bytes.NewReader(data))
	if err != nil {
		t.Fatal(err)
	}
	font, err := io.ReadAll(zr)
	if err != nil && !errors.Is(err, io.ErrUnexpectedEOF) {
		t.Fatal(err)
	}
	if sum := sfntChecksum(font); sum != 0xB1B0AFBA {
		t.Errorf("font checksum %#x, want 0xB1B0AFBA", sum)
	}
	num := int(binary.BigEndian.Uint16(font[4:]))
	sawHead := false
	for i := range num {
		rec := font[12+16*i:]
		off, ln := int(binary.BigEndian.Uint32(rec[8:])), int(binary.BigEndian.Uint32(rec[12:]))
		table := append([]byte{}, font[off:min(len(font), off+(ln+3)&^3)]...)
		if string(rec[:4]) == "head" {
			sawHead = true
			if !bytes.Equal(table[20:28], table[28:36]) {
				t.Errorf("head.modified %x differs from head.created %x", table[28:36], table[20:28])
			}
			binary.BigEndian.PutUint32(table[8:], 0) // summed without the adjustment
		}
		if got, want := sfntChecksum(table), binary.BigEndian.Uint32(rec[4:]); got != want {
			t.Errorf("table %q checksum %#x, directory says %#x", rec[:4], got, want)
		}
	}
	if !sawHead {
		t.Error("no head table")
	}
}
