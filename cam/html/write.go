// The page writer: one pass over the document, every piece of text
// escaped on the way out, figures inlined through inlineSVG or as data:
// URIs.

package html

import (
	"bufio"
	"bytes"
	"encoding/base64"
	"fmt"
	stdhtml "html"
	"image/png"
	"io"
	"strings"
	"unicode"
)

// Options tunes WriteReport. The zero value leaves the paper size to the
// printer settings (the page prints on A4 and Letter alike).
type Options struct {
	// Paper fixes the printed page size: "A4", "Letter" or empty.
	Paper string
}

// escape escapes s for text and double-quoted attribute values.
func escape(s string) string { return stdhtml.EscapeString(s) }

// writer writes one page and remembers the first error.
type writer struct {
	w       *bufio.Writer
	err     error
	ids     map[string]bool
	figures int
}

func (p *writer) printf(format string, args ...any) {
	if p.err == nil {
		_, p.err = fmt.Fprintf(p.w, format, args...)
	}
}

func (p *writer) write(b []byte) {
	if p.err == nil {
		_, p.err = p.w.Write(b)
	}
}

// WriteReport writes d as one self-contained HTML5 page to w. It returns a
// *ModelError for a document it cannot write (an empty title, a duplicate
// id, a subsection nested too deep, a row wider than its header, a figure
// with no picture or an unsafe SVG, a PNG without alt text) and any write
// error. Nothing is written when the document is refused.
func WriteReport(w io.Writer, d Document, opt Options) error {
	var buf bytes.Buffer
	p := &writer{w: bufio.NewWriter(&buf), ids: map[string]bool{}}
	if err := p.document(d, opt); err != nil {
		return err
	}
	if err := p.w.Flush(); err != nil {
		return err
	}
	_, err := w.Write(buf.Bytes())
	return err
}

func (p *writer) document(d Document, opt Options) error {
	if strings.TrimSpace(d.Title) == "" {
		return modelErr("document", "the title is empty")
	}
	lang := d.Lang
	if lang == "" {
		lang = "en"
	}
	var size string
	switch strings.ToLower(opt.Paper) {
	case "":
	case "a4":
		size = "A4"
	case "letter":
		size = "letter"
	default:
		return modelErr("options", "paper %q: use A4, Letter or leave it empty", opt.Paper)
	}
	ids := make([]string, len(d.Sections))
	for i, s := range d.Sections {
		id, err := p.claimID(s.ID, s.Title, "section "+fmt.Sprint(i+1))
		if err != nil {
			return err
		}
		ids[i] = id
	}
	p.printf("<!DOCTYPE html>\n<html lang=\"%s\">\n<head>\n<meta charset=\"utf-8\">\n", escape(lang))
	p.printf("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
	p.printf("<title>%s</title>\n<style>\n%s", escape(d.Title), pageCSS)
	if size != "" {
		p.printf("@page { size: %s; }\n", size)
	}
	p.printf("</style>\n</head>\n<body>\n<header>\n<h1>%s</h1>\n", escape(d.Title))
	if d.Subtitle != "" {
		p.printf("<p class=\"subtitle\">%s</p>\n", escape(d.Subtitle))
	}
	if len(d.Sections) > 0 {
		p.printf("<nav aria-label=\"Contents\">\n<h2 class=\"toc-title\" id=\"contents\">Contents</h2>\n<ol>\n")
		p.ids["contents"] = true
		for i, s := range d.Sections {
			p.printf("<li><a href=\"#%s\">%s</a></li>\n", escape(ids[i]), escape(s.Title))
		}
		p.printf("</ol>\n</nav>\n")
	}
	p.printf("</header>\n<main>\n")
	script := false
	for i, s := range d.Sections {
		sw, err := p.section(s, ids[i], 2, fmt.Sprintf("section %q", s.Title))
		if err != nil {
			return err
		}
		script = script || sw
	}
	p.printf("</main>\n")
	if d.Footer != "" {
		p.printf("<footer>\n<p>%s</p>\n</footer>\n", escape(d.Footer))
	}
	if script {
		p.printf("<script>\n%s</script>\n", switchScript)
	}
	p.printf("</body>\n</html>\n")
	return p.err
}

// claimID returns id (or one made from title) after checking it is free.
func (p *writer) claimID(id, title, where string) (string, error) {
	if strings.TrimSpace(title) == "" {
		return "", modelErr(where, "the title is empty")
	}
	if id == "" {
		id = slug(title)
		for n := 2; p.ids[id]; n++ {
			id = fmt.Sprintf("%s-%d", slug(title), n)
		}
	}
	if p.ids[id] || strings.ContainsFunc(id, unicode.IsSpace) {
		return "", modelErr(where, "id %q is taken or holds a space; give the section a unique ID", id)
	}
	p.ids[id] = true
	return id, nil
}

// slug turns a title into an id: lower-case letters and digits joined by
// hyphens, prefixed "s-" so it never starts with a digit.
func slug(title string) string {
	var b strings.Builder
	b.WriteString("s")
	hyphen := true
	for _, r := range strings.ToLower(title) {
		if (r >= 'a' && r <= 'z') || (r >= '0' && r <= '9') {
			if hyphen {
				b.WriteByte('-')
			}
			b.WriteRune(r)
			hyphen = false
		} else {
			hyphen = true
		}
	}
	return b.String()
}

// section writes s with an h<level> heading and reports whether it holds
// a FigureSwitch.
func (p *writer) section(s Section, id string, level int, where string) (bool, error) {
	p.printf("<section id=\"%s\" aria-labelledby=\"%s-h\">\n<h%d id=\"%s-h\">%s</h%d>\n", escape(id), escape(id), level, escape(id), escape(s.Title), level)
	p.ids[id+"-h"] = true
	script := false
	for i, b := range s.Blocks {
		sw, err := p.block(b, fmt.Sprintf("%s block %d", where, i+1))
		if err != nil {
			return false, err
		}
		script = script || sw
	}
	for i, sub := range s.Subsections {
		sw := fmt.Sprintf("%s subsection %d", where, i+1)
		if len(sub.Subsections) > 0 {
			return false, modelErr(sw, "subsections go one level deep (h3); flatten %q", sub.Title)
		}
		sid, err := p.claimID(sub.ID, sub.Title, sw)
		if err != nil {
			return false, err
		}
		s2, err := p.section(sub, sid, level+1, fmt.Sprintf("%s subsection %q", where, sub.Title))
		if err != nil {
			return false, err
		}
		script = script || s2
	}
	p.printf("</section>\n")
	return script, nil
}

// block writes one block and reports whether it is a FigureSwitch.
func (p *writer) block(b Block, where string) (bool, error) {
	switch b := b.(type) {
	case Paragraph:
		p.printf("<p>%s</p>\n", escape(b.Text))
	case Preformatted:
		p.printf("<pre>%s</pre>\n", escape(b.Text))
	case List:
		tag := "ul"
		if b.Ordered {
			tag = "ol"
		}
		p.printf("<%s>\n", tag)
		for _, it := range b.Items {
			p.printf("<li>%s</li>\n", escape(it))
		}
		p.printf("</%s>\n", tag)
	case Warnings:
		if len(b.Items) == 0 {
			p.printf("<p class=\"no-warnings\">No warnings.</p>\n")
			break
		}
		p.printf("<ul class=\"warnings\">\n")
		for _, it := range b.Items {
			p.printf("<li><strong>Warning:</strong> %s</li>\n", escape(it))
		}
		p.printf("</ul>\n")
	case Definitions:
		p.printf("<dl>\n")
		for _, it := range b.Items {
			p.printf("<dt>%s</dt>\n<dd>%s</dd>\n", escape(it.Term), escape(it.Detail))
		}
		p.printf("</dl>\n")
	case Table:
		return false, p.table(b, where)
	case Figure:
		return false, p.figure(b, where, "")
	case FigureSwitch:
		if len(b.Figures) == 0 {
			return false, modelErr(where, "a figure switch needs figures")
		}
		p.printf("<div class=\"switch\" data-label=\"%s\">\n", escape(b.Label))
		for i, f := range b.Figures {
			name := f.Name
			if name == "" {
				name = fmt.Sprintf("View %d", i+1)
			}
			if err := p.figure(f, fmt.Sprintf("%s figure %d", where, i+1), name); err != nil {
				return false, err
			}
		}
		p.printf("</div>\n")
		return len(b.Figures) > 1, nil
	case nil:
		return false, modelErr(where, "the block is nil")
	default:
		return false, modelErr(where, "unknown block type %T", b)
	}
	return false, nil
}

func (p *writer) table(t Table, where string) error {
	if len(t.Header) == 0 {
		return modelErr(where, "a table needs a header row")
	}
	if strings.TrimSpace(t.Caption) == "" {
		return modelErr(where, "a table needs a caption")
	}
	numeric := func(i int) string {
		if i < len(t.Numeric) && t.Numeric[i] {
			return " class=\"num\""
		}
		return ""
	}
	p.printf("<div class=\"table-wrap\">\n<table>\n<caption>%s</caption>\n<thead>\n<tr>", escape(t.Caption))
	for i, h := range t.Header {
		p.printf("<th scope=\"col\"%s>%s</th>", numeric(i), escape(h))
	}
	p.printf("</tr>\n</thead>\n<tbody>\n")
	for r, row := range t.Rows {
		if len(row) > len(t.Header) {
			return modelErr(where, "row %d has %d cells for %d header cells", r+1, len(row), len(t.Header))
		}
		p.printf("<tr>")
		for i := range t.Header {
			c := ""
			if i < len(row) {
				c = row[i]
			}
			if i == 0 && t.RowHeaders {
				p.printf("<th scope=\"row\"%s>%s</th>", numeric(i), escape(c))
				continue
			}
			p.printf("<td%s>%s</td>", numeric(i), escape(c))
		}
		p.printf("</tr>\n")
	}
	p.printf("</tbody>\n</table>\n</div>\n")
	return nil
}

// figure writes f; a non-empty name marks it as one view of a switch.
func (p *writer) figure(f Figure, where, name string) error {
	if (len(f.SVG) == 0) == (len(f.PNG) == 0) {
		return modelErr(where, "a figure needs either SVG or PNG, not both or neither")
	}
	p.figures++
	id := fmt.Sprintf("fig-%d", p.figures)
	if p.ids[id] {
		return modelErr(where, "id %q is taken", id)
	}
	p.ids[id] = true
	nameAttr := ""
	if name != "" {
		nameAttr = " data-name=\"" + escape(name) + "\""
	}
	p.printf("<figure id=\"%s\"%s>\n", id, nameAttr)
	if len(f.SVG) > 0 {
		svg, err := inlineSVG(f.SVG, id+"-", f.Alt)
		if err != nil {
			return modelErr(where, "%v", err)
		}
		p.write(svg)
		p.printf("\n")
	} else {
		if strings.TrimSpace(f.Alt) == "" {
			return modelErr(where, "a PNG figure needs alt text")
		}
		cfg, err := png.DecodeConfig(bytes.NewReader(f.PNG))
		if err != nil {
			return modelErr(where, "PNG: %v", err)
		}
		p.printf("<img src=\"data:image/png;base64,%s\" alt=\"%s\" width=\"%d\" height=\"%d\">\n",
			base64.StdEncoding.EncodeToString(f.PNG), escape(f.Alt), cfg.Width, cfg.Height)
	}
	if f.Caption != "" {
		p.printf("<figcaption>%s</figcaption>\n", escape(f.Caption))
	}
	p.printf("</figure>\n")
	return nil
}
