package plot

import (
	"bytes"
	"encoding/xml"
	"strconv"
	"strings"
	"testing"
)

// node is any SVG element read back from a plot.
type node struct {
	XMLName  xml.Name
	Attrs    []xml.Attr `xml:",any,attr"`
	Children []node     `xml:",any"`
	Text     string     `xml:",chardata"`
}

// parseSVG reads an SVG document back.
func parseSVG(t *testing.T, b []byte) node {
	t.Helper()
	var n node
	if err := xml.NewDecoder(bytes.NewReader(b)).Decode(&n); err != nil {
		t.Fatalf("plot is not well-formed XML: %v", err)
	}
	return n
}

// attr returns the value of attribute name, or "".
func (n node) attr(name string) string {
	for _, a := range n.Attrs {
		if a.Name.Local == name {
			return a.Value
		}
	}
	return ""
}

// num returns attribute name as a number, failing the test when it is not.
func (n node) num(t *testing.T, name string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(n.attr(name), 64)
	if err != nil {
		t.Fatalf("<%s class=%q> %s=%q: %v", n.XMLName.Local, n.attr("class"), name, n.attr(name), err)
	}
	return v
}

// hasClass reports whether n's class list holds every word of cls.
func (n node) hasClass(cls string) bool {
	have := strings.Fields(n.attr("class"))
	for _, w := range strings.Fields(cls) {
		found := false
		for _, h := range have {
			found = found || h == w
		}
		if !found {
			return false
		}
	}
	return true
}

// all returns every element under n (n included) of class cls, in
// document order.
func (n node) all(cls string) []node {
	var out []node
	if n.hasClass(cls) {
		out = append(out, n)
	}
	for _, c := range n.Children {
		out = append(out, c.all(cls)...)
	}
	return out
}

// texts returns the data-text of every element of class cls under n.
func (n node) texts(cls string) []string {
	var out []string
	for _, e := range n.all(cls) {
		out = append(out, e.attr("data-text"))
	}
	return out
}

// child returns the first direct child element called name.
func (n node) child(name string) (node, bool) {
	for _, c := range n.Children {
		if c.XMLName.Local == name {
			return c, true
		}
	}
	return node{}, false
}

// firstPoint returns the first point of SVG path data made by this package
// ("M x y L ...").
func firstPoint(t *testing.T, d string) (float64, float64) {
	t.Helper()
	f := strings.FieldsFunc(d, func(r rune) bool { return r == 'M' || r == 'L' || r == ' ' || r == 'Z' })
	if len(f) < 2 {
		t.Fatalf("path data %q has no point", d)
	}
	x, err1 := strconv.ParseFloat(f[0], 64)
	y, err2 := strconv.ParseFloat(f[1], 64)
	if err1 != nil || err2 != nil {
		t.Fatalf("path data %q: bad first point", d)
	}
	return x, y
}

// points returns every point of path data made by this package.
func points(t *testing.T, d string) [][2]float64 {
	t.Helper()
	f := strings.FieldsFunc(d, func(r rune) bool { return r == 'M' || r == 'L' || r == ' ' || r == 'Z' })
	var out [][2]float64
	for i := 0; i+1 < len(f); i += 2 {
		x, err1 := strconv.ParseFloat(f[i], 64)
		y, err2 := strconv.ParseFloat(f[i+1], 64)
		if err1 != nil || err2 != nil {
			t.Fatalf("path data %q: bad point %d", d, i/2)
		}
		out = append(out, [2]float64{x, y})
	}
	return out
}
