package html

import (
	"math/rand"
	"regexp"
	"strings"
	"testing"
)

// The regular expressions prefixIDs replaced, kept as the reference its
// single scan must agree with byte for byte.
var (
	refIDAttr      = regexp.MustCompile(`(\sid=")([^"]*)(")`)
	refLabelAttrs  = regexp.MustCompile(`(\saria-(?:labelledby|describedby)=")([^"]*)(")`)
	refLocalHref   = regexp.MustCompile(`(\s(?:xlink:)?href="#)([^"]*)(")`)
	refLocalURLRef = regexp.MustCompile(`(url\(#)([^)]*)(\))`)
)

// refPrefixIDs is the former regular-expression rewrite of one start tag.
// (It expands $ in prefix as a template would; prefixIDs takes prefix
// literally, and the figure prefixes "fig-N-" hold no $.)
func refPrefixIDs(tag, prefix string) string {
	tag = refIDAttr.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
	tag = refLocalHref.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
	tag = refLocalURLRef.ReplaceAllString(tag, "${1}"+prefix+"${2}${3}")
	return refLabelAttrs.ReplaceAllStringFunc(tag, func(m string) string {
		p := refLabelAttrs.FindStringSubmatch(m)
		ids := strings.Fields(p[2])
		for i := range ids {
			ids[i] = prefix + ids[i]
		}
		return p[1] + strings.Join(ids, " ") + p[3]
	})
}

// tagPieces are the fragments random start tags are built from: every
// literal the patterns look for, their stop bytes, each whitespace byte
// (and \v, which \s leaves out), other quotes, multi-byte and invalid
// UTF-8, and plain text.
var tagPieces = []string{
	" id=\"", "id=\"", " href=\"#", " href=\"", "href=\"#", " xlink:href=\"#", "xlink:", " xlink:href=\"",
	"url(#", "url(", "url( #", ")", "(", "\"", "'", "#", "=",
	" aria-labelledby=\"", " aria-describedby=\"", " aria-label=\"", "aria-", "labelledby", "describedby",
	" ", "\t", "\n", "\f", "\r", "\v", "\u00a0", "\u2003", "é", "\xff", "\xc3",
	"a", "b1", "clip0", "fill=\"url(#g)\"", "<svg", "<path", "<use", "/>", ">", "$1", "fig-",
}

func randomTag(r *rand.Rand) string {
	var b strings.Builder
	n := 1 + r.Intn(14)
	for range n {
		b.WriteString(tagPieces[r.Intn(len(tagPieces))])
	}
	return b.String()
}

func TestPrefixIDsMatchesRegexpRewrite(t *testing.T) {
	tags := []string{
		`<svg xmlns="http://www.w3.org/2000/svg" id="root" viewBox="0 0 10 10">`,
		`<path id="p1" clip-path="url(#c1)" fill="url(#g1)" stroke="url(#g2)"/>`,
		`<use xlink:href="#p1" href="#p2"/>`,
		`<g aria-labelledby=" t1  t2	t3 " aria-describedby="d1">`,
		`<text id="x id="y" z">`,
		`<rect title='a id="b"' id="c"/>`,
		`<a href="#id=&quot;x">`,
		"<g\tid=\"a\"\nhref=\"#b\"\rxlink:href=\"#c\"\f aria-labelledby=\"d\">",
		`<g id="unclosed>`,
		`<g style="fill:url(#a) url(#b) url(#c">`,
		`<g aria-labelledby="url(#a) x">`,
		`<g>`, ``,
	}
	r := rand.New(rand.NewSource(14))
	for range 20000 {
		tags = append(tags, randomTag(r))
	}
	rewritten := 0
	for _, prefix := range []string{"fig-1-", "fig-12-", "", "p"} {
		for _, tag := range tags {
			got, want := prefixIDs(tag, prefix), refPrefixIDs(tag, prefix)
			if got != want {
				t.Fatalf("prefix %q, tag %q:\n got %q\nwant %q", prefix, tag, got, want)
			}
			if got != tag {
				rewritten++
			}
		}
	}
	// The random tags must exercise the rewriting, not only pass through.
	if rewritten < len(tags)/4 {
		t.Errorf("only %d of %d tags were rewritten", rewritten, 4*len(tags))
	}
}

func TestPrefixIDsLeavesPlainTagUncopied(t *testing.T) {
	tag := `<path d="M0 0L1 1" fill="none"/>`
	if got := prefixIDs(tag, "fig-1-"); got != tag {
		t.Fatalf("got %q, want the tag unchanged", got)
	}
	if allocs := testing.AllocsPerRun(100, func() { prefixIDs(tag, "fig-1-") }); allocs != 0 {
		t.Errorf("a tag with nothing to rewrite cost %v allocations, want 0", allocs)
	}
}

func FuzzPrefixIDs(f *testing.F) {
	for _, s := range []string{`<g id="a" href="#b" style="x:url(#c)" aria-labelledby="d e">`, "<g\fid=\"\"\v>"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, tag string) {
		if got, want := prefixIDs(tag, "fig-3-"), refPrefixIDs(tag, "fig-3-"); got != want {
			t.Fatalf("tag %q:\n got %q\nwant %q", tag, got, want)
		}
	})
}
