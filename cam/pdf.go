// Deterministic PDF documents from canvas pages.
//
// Pages are drawn with the canvas library (millimetres, y up) and
// rendered by its PDF writer, one PDF page per canvas. That writer stamps
// the wall-clock time as the creation date; WritePDF renders into memory,
// replaces the date with the one asked for (or removes it), and shifts the
// cross-reference offsets that follow, so the same pages always give the
// same bytes. Fonts are embedded and subset by the canvas writer in the
// order first used, which is deterministic.

package cam

import (
	"bytes"
	"fmt"
	"io"
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
	// PageA4 is ISO 216 A4, 210 × 297 mm.
	PageA4 = PageSize{Name: "A4", Width: 210, Height: 297}
	// PageLetter is US Letter, 8.5 × 11 in (215.9 × 279.4 mm).
	PageLetter = PageSize{Name: "Letter", Width: 215.9, Height: 279.4}
)

// PageSizeByName returns the paper size called name ("A4" or "Letter",
// any case).
func PageSizeByName(name string) (PageSize, error) {
	for _, p := range []PageSize{PageA4, PageLetter} {
		if strings.EqualFold(p.Name, name) {
			return p, nil
		}
	}
	return PageSize{}, fmt.Errorf("cam: unknown paper size %q: use A4 or Letter", name)
}

// NewPage returns an empty canvas the size of p, in millimetres with the
// origin at the bottom-left corner and y up.
func NewPage(p PageSize) *canvas.Canvas { return canvas.New(p.Width, p.Height) }

// PDFOptions tunes WritePDF. The zero value writes no creation date, so
// the output depends only on the pages.
type PDFOptions struct {
	Title, Subject, Creator string
	// Created, when not zero, is written as the creation date in UTC. Pass
	// the time from SOURCE_DATE_EPOCH (see SourceDateEpoch) for
	// reproducible builds that still carry a date.
	Created time.Time
}

// SourceDateEpoch parses the value of the SOURCE_DATE_EPOCH convention
// (whole seconds since 1970-01-01 UTC). An empty value gives the zero
// time.
func SourceDateEpoch(v string) (time.Time, error) {
	if v == "" {
		return time.Time{}, nil
	}
	s, err := strconv.ParseInt(v, 10, 64)
	if err != nil || s < 0 {
		return time.Time{}, fmt.Errorf("SOURCE_DATE_EPOCH = %q: must be a whole number of seconds since 1970", v)
	}
	return time.Unix(s, 0).UTC(), nil
}

// WritePDF renders pages (at least one) as a PDF document, one page each at
// its canvas size, and writes it to w. Same pages and options give the
// same bytes.
func WritePDF(w io.Writer, pages []*canvas.Canvas, opt PDFOptions) error {
	if len(pages) == 0 {
		return fmt.Errorf("cam: a PDF needs at least one page")
	}
	var buf bytes.Buffer
	first := pages[0]
	o := pdf.DefaultOptions
	r := pdf.New(&buf, first.W, first.H, &o)
	r.SetInfo(opt.Title, opt.Subject, "", "", opt.Creator)
	for i, p := range pages {
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
	out, err := setCreationDate(buf.Bytes(), date)
	if err != nil {
		return err
	}
	_, err = w.Write(out)
	return err
}

// setCreationDate replaces the document information dictionary's
// /CreationDate entry with date (removing it when date is empty) and moves
// every later cross-reference offset and startxref by the change in length.
func setCreationDate(b []byte, date string) ([]byte, error) {
	key := []byte("/CreationDate(")
	start := bytes.LastIndex(b, key)
	if start < 0 {
		return nil, fmt.Errorf("cam: PDF has no creation date to set")
	}
	n := bytes.IndexByte(b[start+len(key):], ')')
	if n < 0 {
		return nil, fmt.Errorf("cam: PDF creation date is not terminated")
	}
	end := start + len(key) + n + 1
	repl := ""
	if date != "" {
		repl = "/CreationDate(" + date + ")"
	}
	delta := len(repl) - (end - start)
	out := make([]byte, 0, len(b)+delta)
	out = append(out, b[:start]...)
	out = append(out, repl...)
	out = append(out, b[end:]...)

	x := bytes.LastIndex(out, []byte("\nxref\n"))
	if x < 0 {
		return nil, fmt.Errorf("cam: PDF has no cross-reference table")
	}
	line := out[x+len("\nxref\n"):]
	nl := bytes.IndexByte(line, '\n')
	var first, count int
	if _, err := fmt.Sscanf(string(line[:nl]), "%d %d", &first, &count); err != nil || first != 0 {
		return nil, fmt.Errorf("cam: unexpected cross-reference header %q", line[:nl])
	}
	entries := line[nl+1:]
	const entryLen = 20 // "nnnnnnnnnn ggggg n \n"
	for i := range count {
		e := entries[i*entryLen : (i+1)*entryLen]
		if e[17] != 'n' {
			continue
		}
		off, err := strconv.Atoi(string(e[:10]))
		if err != nil {
			return nil, fmt.Errorf("cam: bad cross-reference entry %q", e)
		}
		if off > start {
			copy(e[:10], fmt.Sprintf("%010d", off+delta))
		}
	}
	sx := bytes.LastIndex(out, []byte("startxref\n"))
	if sx < 0 {
		return nil, fmt.Errorf("cam: PDF has no startxref")
	}
	tail := out[sx+len("startxref\n"):]
	nl = bytes.IndexByte(tail, '\n')
	pos, err := strconv.Atoi(string(tail[:nl]))
	if err != nil {
		return nil, fmt.Errorf("cam: bad startxref %q", tail[:nl])
	}
	res := append([]byte{}, out[:sx+len("startxref\n")]...)
	res = strconv.AppendInt(res, int64(pos+delta), 10)
	return append(res, tail[nl:]...), nil
}
