// Inline SVG: a complete SVG document is checked and rewritten so it can
// sit inside the page. The XML prolog goes; every id (and each reference to
// one) gets the figure's prefix so ids stay unique across figures; and a
// document that could run code or fetch anything is refused.

package html

import (
	"bytes"
	"encoding/xml"
	"errors"
	"io"
	"strings"
)

// forbiddenSVG are elements an inline figure may not hold: they run code,
// embed other documents, or (style) would restyle the whole page.
var forbiddenSVG = map[string]bool{
	"script": true, "foreignObject": true, "iframe": true, "style": true,
	"object": true, "embed": true, "audio": true, "video": true,
}

// inlineSVG returns doc ready to inline: from its root element on, with ids
// prefixed by prefix, and the accessible name alt added to the root when
// it has no title. It refuses a document that is not well-formed, whose
// root is not svg, that holds a forbidden element or an event attribute,
// or that refers to anything outside itself.
func inlineSVG(doc []byte, prefix, alt string) ([]byte, error) {
	dec := xml.NewDecoder(bytes.NewReader(doc))
	var out bytes.Buffer
	depth := 0
	rootEnd := -1
	hasTitle := false
	prev := int64(0)
	for {
		tok, err := dec.RawToken()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return nil, errors.New("SVG is not well-formed: " + err.Error())
		}
		cur := dec.InputOffset()
		raw := doc[prev:cur]
		prev = cur
		switch t := tok.(type) {
		case xml.StartElement:
			if depth == 0 && t.Name.Local != "svg" {
				return nil, errors.New("root element is <" + t.Name.Local + ">, want <svg>")
			}
			if forbiddenSVG[t.Name.Local] {
				return nil, errors.New("SVG holds a <" + t.Name.Local + "> element")
			}
			if depth == 1 && t.Name.Local == "title" {
				hasTitle = true
			}
			for _, a := range t.Attr {
				if err := checkAttr(a); err != nil {
					return nil, err
				}
			}
			tag := prefixIDs(string(raw), prefix)
			if depth == 0 {
				rootEnd = out.Len() + len(tag)
				if strings.HasSuffix(tag, "/>") {
					rootEnd -= 2
				} else {
					rootEnd--
				}
			}
			out.WriteString(tag)
			// A self-closing tag comes back as a start and an end token
			// (the end with no bytes of its own), so depth stays right.
			depth++
		case xml.EndElement:
			depth--
			out.Write(raw)
		case xml.ProcInst, xml.Directive:
			if depth > 0 {
				return nil, errors.New("SVG holds a processing instruction or directive inside its root")
			}
		case xml.Comment:
			if depth > 0 {
				out.Write(raw)
			}
		case xml.CharData:
			if depth > 0 {
				out.Write(raw)
			}
		}
	}
	if rootEnd < 0 {
		return nil, errors.New("SVG has no root element")
	}
	b := out.Bytes()
	if !hasTitle && alt != "" {
		extra := ` role="img" aria-label="` + escape(alt) + `"`
		b = append(b[:rootEnd:rootEnd], append([]byte(extra), b[rootEnd:]...)...)
	}
	return b, nil
}

// checkAttr refuses event handlers and references out of the document.
func checkAttr(a xml.Attr) error {
	name := strings.ToLower(a.Name.Local)
	v := strings.TrimSpace(strings.ToLower(a.Value))
	switch {
	case strings.HasPrefix(name, "on"):
		return errors.New("SVG has an event attribute " + a.Name.Local)
	case name == "href" || name == "src":
		if !strings.HasPrefix(v, "#") && !strings.HasPrefix(v, "data:image/") {
			return errors.New("SVG refers outside itself: " + a.Name.Local + "=" + a.Value)
		}
	case strings.Contains(v, "url(") && !strings.Contains(v, "url(#"):
		return errors.New("SVG refers outside itself: " + a.Name.Local + "=" + a.Value)
	}
	return nil
}

// The id rewriting below scans a raw start tag for four patterns, in this
// order, each taken leftmost first and without overlap (the matches a
// regular expression's replace-all would take), with \s the whitespace
// class [\t\n\f\r ]:
//
//	\sid="VALUE"                          VALUE → prefix+VALUE
//	\s(xlink:)?href="#VALUE"              VALUE → prefix+VALUE
//	url(#VALUE)                           VALUE → prefix+VALUE
//	\saria-(labelledby|describedby)="IDS"  each id in IDS → prefix+id
//
// where VALUE runs to the first closing quote (or parenthesis) and IDS is
// split into ids by strings.Fields and joined again with single spaces.

var (
	idLeads    = []string{`id="`}
	hrefLeads  = []string{`xlink:href="#`, `href="#`}
	urlLeads   = []string{`url(#`}
	labelLeads = []string{`aria-labelledby="`, `aria-describedby="`}
)

// prefixIDs returns the raw start tag with every id it defines or refers to
// prefixed by prefix (taken literally). A tag with nothing to rewrite comes
// back as it is, uncopied.
func prefixIDs(tag, prefix string) string {
	prefixed := func(v string) string { return prefix + v }
	tag = rewriteValues(tag, true, idLeads, '"', prefixed)
	tag = rewriteValues(tag, true, hrefLeads, '"', prefixed)
	tag = rewriteValues(tag, false, urlLeads, ')', prefixed)
	return rewriteValues(tag, true, labelLeads, '"', func(v string) string {
		ids := strings.Fields(v)
		for i := range ids {
			ids[i] = prefix + ids[i]
		}
		return strings.Join(ids, " ")
	})
}

// rewriteValues returns s with the value of each match replaced by
// f(value). A match is, at some position, one whitespace byte of \s (when
// ws is set), then the first of leads found there, then a value holding no
// stop byte, then the stop byte. Matches are found left to right, the
// search going on after each match's stop byte, as a regular expression's
// replace-all does. s comes back unchanged, without copying, when nothing
// matches.
func rewriteValues(s string, ws bool, leads []string, stop byte, f func(string) string) string {
	var out strings.Builder
	last := 0 // s[:last] is written; stays 0 until the first match
	for i := 0; i < len(s); i++ {
		j := i
		if ws {
			if !isRESpace(s[i]) {
				continue
			}
			j++
		}
		k := -1
		for _, l := range leads {
			if strings.HasPrefix(s[j:], l) {
				k = j + len(l)
				break
			}
		}
		if k < 0 {
			continue
		}
		e := strings.IndexByte(s[k:], stop)
		if e < 0 {
			continue
		}
		if last == 0 {
			out.Grow(len(s) + 32)
		}
		out.WriteString(s[last:k])
		out.WriteString(f(s[k : k+e]))
		last = k + e // the stop byte is written with the next piece
		i = k + e    // the loop's i++ steps past the stop byte
	}
	if last == 0 {
		return s
	}
	out.WriteString(s[last:])
	return out.String()
}

// isRESpace reports whether c is in the \s class of Go's regular
// expressions: tab, newline, form feed, carriage return or space.
func isRESpace(c byte) bool {
	return c == ' ' || c == '\t' || c == '\n' || c == '\f' || c == '\r'
}
