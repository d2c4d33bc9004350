package checktool

import (
	"bytes"
	"errors"
	"io"
	"strings"
	"testing"

	xhtml "golang.org/x/net/html"
)

// voidElements are the HTML elements that have no end tag.
// Source: WHATWG HTML Living Standard, §13.1.2 "Elements" (void elements).
var voidElements = map[string]bool{
	"area": true, "base": true, "br": true, "col": true, "embed": true, "hr": true, "img": true,
	"input": true, "link": true, "meta": true, "source": true, "track": true, "wbr": true,
}

// CheckHTML tokenizes page and reports every tag that is not closed
// in order, every id used twice, every heading that skips a level, and
// every reference that leaves the page.
func CheckHTML(t testing.TB, page []byte) {
	t.Helper()
	z := xhtml.NewTokenizer(bytes.NewReader(page))
	var stack []string
	ids := map[string]bool{}
	lastHeading := 0
	for {
		tt := z.Next()
		if tt == xhtml.ErrorToken {
			break
		}
		tok := z.Token()
		switch tt {
		case xhtml.StartTagToken, xhtml.SelfClosingTagToken:
			for _, a := range tok.Attr {
				switch a.Key {
				case "id":
					if ids[a.Val] {
						t.Errorf("id %q used twice", a.Val)
					}
					ids[a.Val] = true
				case "src", "href", "xlink:href", "action", "poster", "srcset":
					// A data: URI is inside the page (its base64 may hold
					// "//"); anything else must be a fragment.
					if !strings.HasPrefix(a.Val, "data:") && (!strings.HasPrefix(a.Val, "#") || strings.Contains(a.Val, "//")) {
						t.Errorf("<%s %s=%.60q> leaves the page", tok.Data, a.Key, a.Val)
					}
				}
			}
			if len(tok.Data) == 2 && tok.Data[0] == 'h' && tok.Data[1] >= '1' && tok.Data[1] <= '6' {
				level := int(tok.Data[1] - '0')
				if level > lastHeading+1 {
					t.Errorf("<%s> follows <h%d>: a heading level is skipped", tok.Data, lastHeading)
				}
				lastHeading = level
			}
			if tt == xhtml.StartTagToken && !voidElements[tok.Data] {
				stack = append(stack, tok.Data)
			}
		case xhtml.EndTagToken:
			if len(stack) == 0 || stack[len(stack)-1] != tok.Data {
				t.Fatalf("</%s> closes %v", tok.Data, stack)
			}
			stack = stack[:len(stack)-1]
		}
	}
	if z.Err() != nil && !errors.Is(z.Err(), io.EOF) {
		t.Errorf("tokenizer: %v", z.Err())
	}
	if len(stack) != 0 {
		t.Errorf("left open: %v", stack)
	}
}
