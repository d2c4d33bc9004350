// Package designtest is for tests only: it turns the embedded demo specs
// and small spec texts into designs, failing the test on any error, for
// the packages that build on a parts.Design (cut list, sheet, report).
// Tests of package parts itself keep their own copies: they cannot
// import a package that imports parts.
package designtest

import (
	"fmt"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// DemoSpec returns the named embedded demo spec's bytes or fails t.
func DemoSpec(t testing.TB, name string) []byte {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	return b
}

// MustParse parses b or fails t.
func MustParse(t testing.TB, b []byte) *spec.Spec {
	t.Helper()
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatalf("ParseSpec: %v", err)
	}
	return s
}

// MustDesign parses text and works out its design, failing t on any
// error.
func MustDesign(t testing.TB, text string) *parts.Design {
	t.Helper()
	d, err := parts.NewDesign(MustParse(t, []byte(text)))
	if err != nil {
		t.Fatal(err)
	}
	return d
}

// DemoDesign works out the design of the named demo spec after edit (nil
// for none).
func DemoDesign(t testing.TB, name string, edit func(string) string) *parts.Design {
	t.Helper()
	text := string(DemoSpec(t, name))
	if edit != nil {
		text = edit(text)
	}
	return MustDesign(t, text)
}

// WithFeed returns an edit that sets a demo's feed (the demos are
// periphery-fed).
func WithFeed(feed string) func(string) string {
	return func(s string) string {
		return strings.Replace(s, `feed = "periphery"`, fmt.Sprintf("feed = %q", feed), 1)
	}
}
