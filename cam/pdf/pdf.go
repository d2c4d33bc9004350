// Deterministic PDF documents from canvas pages.
//
// Pages are drawn with the canvas library (millimetres, y up) and
// rendered by its PDF writer, one PDF page per canvas. That writer stamps
// the wall-clock time in two places: the document's creation date, and the
// "modified" field of each embedded font's head table. WritePDF renders
// into memory, then edits both: the date becomes the one asked for (or is
// removed), and each font's modified time is set to its created time, with
// the font's checksums recomputed and its stream recompressed. The
// cross-reference offsets after each edit are shifted, so the same pages
// always give the same bytes. Fonts are embedded and subset by the canvas
// writer in the order first used, which is deterministic.

package pdf

import (
	"bytes"
	"compress/zlib"
	"encoding/binary"
	"fmt"
	"io"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"time"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"
)

// PageSize is a paper size in millimetres, portrait.
type PageSize struct {
	Name          string
	Width, Height float64
}

// The paper sizes documents are printed on.
var (
	// pageA4 is ISO 216 A4, 210 × 297 mm.
	pageA4 = PageSize{Name: "A4", Width: 210, Height: 297}
	// pageLetter is US Letter, 8.5 × 11 in (215.9 × 279.4 mm).
	pageLetter = PageSize{Name: "Letter", Width: 215.9, Height: 279.4}
)

// PageA4 returns ISO 216 A4, 210 × 297 mm.
func PageA4() PageSize { return pageA4 }

// PageLetter returns US Letter, 8.5 × 11 in (215.9 × 279.4 mm).
func PageLetter() PageSize { return pageLetter }

// PageSizeByName returns the paper size called name ("A4" or "Letter",
// any case).
func PageSizeByName(name string) (PageSize, error) {
	for _, p := range []PageSize{pageA4, pageLetter} {
		if strings.EqualFold(p.Name, name) {
			return p, nil
		}
	}
	return PageSize{}, fmt.Errorf("unknown paper size %q: use A4 or Letter", name)
}

// Page is one laid-out PDF page, ready for WritePDF; documents and template
// pages make them. A Page is not changed once made.
type Page struct{ c *canvas.Canvas }

// newPage returns an empty canvas the size of p, in millimetres with the
// origin at the bottom-left corner and y up.
func newPage(p PageSize) *canvas.Canvas { return canvas.New(p.Width, p.Height) }

// PDFOptions tunes WritePDF. The zero value writes no creation date, so
// the output depends only on the pages.
type PDFOptions struct {
	Title, Subject, Creator string
	// Created, when not zero, is written as the creation date in UTC. Pass
	// the time from SOURCE_DATE_EPOCH (see SourceDateEpoch) for
	// reproducible builds that still carry a date.
	Created time.Time
}

// maxSourceDateEpoch is 9999-12-31T23:59:59Z: a PDF date has a four-digit
// year. Source: ISO 32000-1:2008, §7.9.4 Dates.
const maxSourceDateEpoch = 253402300799

// clipEnv cuts an environment value echoed in a message to 40 bytes.
func clipEnv(v string) string {
	if len(v) > 40 {
		return v[:40] + "…"
	}
	return v
}

// SourceDateEpoch parses the value of the SOURCE_DATE_EPOCH convention
// (whole seconds since 1970-01-01 UTC). An empty value gives the zero
// time.
func SourceDateEpoch(v string) (time.Time, error) {
	if v == "" {
		return time.Time{}, nil
	}
	s, err := strconv.ParseInt(v, 10, 64)
	if err != nil || s < 0 || s > maxSourceDateEpoch {
		return time.Time{}, fmt.Errorf("SOURCE_DATE_EPOCH = %q: must be a whole number of seconds from 0 (1970) to %d (the end of 9999); unset it or give e.g. $(git log -1 --format=%%ct)",
			clipEnv(v), maxSourceDateEpoch)
	}
	return time.Unix(s, 0).UTC(), nil
}

// WritePDF renders pages (at least one) as a PDF document, one page each at
// its canvas size, and writes it to w. Same pages and options give the
// same bytes.
func WritePDF(w io.Writer, pages []Page, opt PDFOptions) error {
	if len(pages) == 0 {
		return fmt.Errorf("a PDF needs at least one page")
	}
	var buf bytes.Buffer
	first := pages[0].c
	o := pdf.DefaultOptions
	r := pdf.New(&buf, first.W, first.H, &o)
	r.SetInfo(opt.Title, opt.Subject, "", "", opt.Creator)
	for i, pg := range pages {
		p := pg.c
		if i > 0 {
			r.NewPage(p.W, p.H)
		}
		p.RenderTo(r)
	}
	if err := r.Close(); err != nil {
		return err
	}
	date := ""
	if !opt.Created.IsZero() {
		date = opt.Created.UTC().Format("D:20060102150405Z")
	}
	b := buf.Bytes()
	edits, err := fontEdits(b)
	if err != nil {
		return err
	}
	de, err := dateEdit(b, date)
	if err != nil {
		return err
	}
	out, err := applyEdits(b, append(edits, de))
	if err != nil {
		return err
	}
	_, err = w.Write(out)
	return err
}

// pdfEdit replaces bytes [start, end) of a rendered PDF with repl.
type pdfEdit struct {
	start, end int
	repl       []byte
}

// dateEdit returns the edit that sets the document information
// dictionary's /CreationDate to date, or removes it when date is empty.
func dateEdit(b []byte, date string) (pdfEdit, error) {
	key := []byte("/CreationDate(")
	start := bytes.LastIndex(b, key)
	if start < 0 {
		return pdfEdit{}, fmt.Errorf("PDF has no creation date to set")
	}
	n := bytes.IndexByte(b[start+len(key):], ')')
	if n < 0 {
		return pdfEdit{}, fmt.Errorf("PDF creation date is not terminated")
	}
	e := pdfEdit{start: start, end: start + len(key) + n + 1}
	if date != "" {
		e.repl = []byte("/CreationDate(" + date + ")")
	}
	return e, nil
}

var (
	fontFileRef  = regexp.MustCompile(`/FontFile[23]? (\d+) 0 R`)
	streamLength = regexp.MustCompile(`/Length (\d+)`)
)

// fontEdits returns one edit per embedded font program, replacing its
// stream with the same font whose head.modified equals head.created.
func fontEdits(b []byte) ([]pdfEdit, error) {
	var edits []pdfEdit
	seen := map[string]bool{}
	for _, m := range fontFileRef.FindAllSubmatch(b, -1) {
		ref := string(m[1])
		if seen[ref] {
			continue
		}
		seen[ref] = true
		head := []byte("\n" + ref + " 0 obj\n")
		at := bytes.Index(b, head)
		if at < 0 {
			return nil, fmt.Errorf("PDF font object %s not found", ref)
		}
		dictStart := at + len(head)
		sm := bytes.Index(b[dictStart:], []byte(">>stream\n"))
		if sm < 0 {
			return nil, fmt.Errorf("PDF font object %s has no stream", ref)
		}
		dict := b[dictStart : dictStart+sm+2]
		lm := streamLength.FindSubmatch(dict)
		if lm == nil || !bytes.Contains(dict, []byte("/Filter/FlateDecode")) {
			return nil, fmt.Errorf("PDF font object %s is not a compressed stream of known length", ref)
		}
		n, _ := strconv.Atoi(string(lm[1]))
		dataStart := dictStart + sm + len(">>stream\n")
		if dataStart+n > len(b) {
			return nil, fmt.Errorf("PDF font object %s runs past the end", ref)
		}
		zr, err := zlib.NewReader(bytes.NewReader(b[dataStart : dataStart+n]))
		if err != nil {
			return nil, err
		}
		font, err := io.ReadAll(zr)
		if err != nil {
			return nil, err
		}
		if err := pinFontModified(font); err != nil {
			return nil, err
		}
		var z bytes.Buffer
		zw := zlib.NewWriter(&z)
		zw.Write(font)
		if err := zw.Close(); err != nil {
			return nil, err
		}
		newDict := streamLength.ReplaceAll(dict, []byte(fmt.Sprintf("/Length %d", z.Len())))
		repl := append(append(newDict, "stream\n"...), z.Bytes()...)
		edits = append(edits, pdfEdit{start: dictStart, end: dataStart + n, repl: repl})
	}
	return edits, nil
}

// pinFontModified sets an SFNT font's head.modified to head.created and
// recomputes the head table's checksum and the font's checkSumAdjustment.
// Source: OpenType specification, "head — Font header table" and "Table
// directory" (checksums are the sum of big-endian uint32 words; the
// adjustment is 0xB1B0AFBA less the whole font's sum).
func pinFontModified(f []byte) error {
	if len(f) < 12 {
		return fmt.Errorf("embedded font too short")
	}
	num := int(binary.BigEndian.Uint16(f[4:]))
	for i := range num {
		rec := f[12+16*i:]
		if len(rec) < 16 || string(rec[:4]) != "head" {
			continue
		}
		off, ln := int(binary.BigEndian.Uint32(rec[8:])), int(binary.BigEndian.Uint32(rec[12:]))
		if ln < 36 || off+ln > len(f) {
			return fmt.Errorf("embedded font's head table is damaged")
		}
		h := f[off : off+ln]
		copy(h[28:36], h[20:28])
		binary.BigEndian.PutUint32(h[8:], 0)
		binary.BigEndian.PutUint32(rec[4:], sfntChecksum(f[off:min(len(f), off+(ln+3)&^3)]))
		binary.BigEndian.PutUint32(h[8:], 0xB1B0AFBA-sfntChecksum(f))
		return nil
	}
	return fmt.Errorf("embedded font has no head table")
}

// sfntChecksum sums b as big-endian uint32 words, zero-padding the tail.
func sfntChecksum(b []byte) uint32 {
	var s uint32
	for i := 0; i < len(b); i += 4 {
		var w [4]byte
		copy(w[:], b[i:])
		s += binary.BigEndian.Uint32(w[:])
	}
	return s
}

// applyEdits applies non-overlapping edits and moves every later
// cross-reference offset, and startxref, by the change in length before
// it.
func applyEdits(b []byte, edits []pdfEdit) ([]byte, error) {
	sort.Slice(edits, func(i, j int) bool { return edits[i].start < edits[j].start })
	var out []byte
	prev := 0
	for _, e := range edits {
		if e.start < prev {
			return nil, fmt.Errorf("overlapping PDF edits")
		}
		out = append(append(out, b[prev:e.start]...), e.repl...)
		prev = e.end
	}
	out = append(out, b[prev:]...)
	shift := func(off int) int {
		for _, e := range edits {
			if e.start < off {
				off += len(e.repl) - (e.end - e.start)
			}
		}
		return off
	}

	x := bytes.LastIndex(out, []byte("\nxref\n"))
	if x < 0 {
		return nil, fmt.Errorf("PDF has no cross-reference table")
	}
	line := out[x+len("\nxref\n"):]
	nl := bytes.IndexByte(line, '\n')
	var first, count int
	if _, err := fmt.Sscanf(string(line[:nl]), "%d %d", &first, &count); err != nil || first != 0 {
		return nil, fmt.Errorf("unexpected cross-reference header %q", line[:nl])
	}
	entries := line[nl+1:]
	const entryLen = 20 // "nnnnnnnnnn ggggg n \n"
	if len(entries) < count*entryLen {
		return nil, fmt.Errorf("cross-reference table is cut short")
	}
	for i := range count {
		e := entries[i*entryLen : (i+1)*entryLen]
		if e[17] != 'n' {
			continue
		}
		off, err := strconv.Atoi(string(e[:10]))
		if err != nil {
			return nil, fmt.Errorf("bad cross-reference entry %q", e)
		}
		copy(e[:10], fmt.Sprintf("%010d", shift(off)))
	}
	sx := bytes.LastIndex(out, []byte("startxref\n"))
	if sx < 0 {
		return nil, fmt.Errorf("PDF has no startxref")
	}
	tail := out[sx+len("startxref\n"):]
	nl = bytes.IndexByte(tail, '\n')
	pos, err := strconv.Atoi(string(tail[:nl]))
	if err != nil {
		return nil, fmt.Errorf("bad startxref %q", tail[:nl])
	}
	res := append([]byte{}, out[:sx+len("startxref\n")]...)
	res = strconv.AppendInt(res, int64(shift(pos)), 10)
	return append(res, tail[nl:]...), nil
}
