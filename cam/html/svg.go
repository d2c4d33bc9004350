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
	"regexp"
	"strings"
)

// forbiddenSVG are elements an inline figure may not hold: they run code,
// embed other documents, or (style) would restyle the whole page.
var forbiddenSVG = map[string]bool{
	"script": true, "foreignObject": true, "iframe": true, "style": true,
	"object": true, "embed": true, "audio": true, "video": true,
}

var (
	idAttr      = regexp.MustCompile(`(\sid=")([^"]*)(")`)
	labelAttrs  = regexp.MustCompile(`(\saria-(?:labelledby|describedby)=")([^"]*)(")`)
	localHref   = regexp.MustCompile(`(\s(?:xlink:)?href="#)([^"]*)(")`)
	localURLRef = regexp.MustCompile(`(url\(#)([^)]*)(\))`)
)

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
			tag := string(raw)
			tag = idAttr.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
			tag = localHref.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
			tag = localURLRef.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
			tag = labelAttrs.ReplaceAllStringFunc(tag, func(m string) string {
				p := labelAttrs.FindStringSubmatch(m)
				ids := strings.Fields(p[2])
				for i := range ids {
					ids[i] = prefix + ids[i]
				}
				return p[1] + strings.Join(ids, " ") + p[3]
			})
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
