package sheet

import (
	"fmt"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/spec"
	"coilwright/templates"
)

func demoSpec(t *testing.T, name string) []byte {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	return b
}

func mustParse(t *testing.T, b []byte) *spec.Spec {
	t.Helper()
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatalf("ParseSpec: %v", err)
	}
	return s
}

// mustDesign parses text and works out its design, failing the test on
// any error.
func mustDesign(t *testing.T, text string) *parts.Design {
	t.Helper()
	d, err := parts.NewDesign(mustParse(t, []byte(text)))
	if err != nil {
		t.Fatal(err)
	}
	return d
}

// demoDesign works out the design of the named demo spec after edit (nil
// for none).
func demoDesign(t *testing.T, name string, edit func(string) string) *parts.Design {
	t.Helper()
	text := string(demoSpec(t, name))
	if edit != nil {
		text = edit(text)
	}
	return mustDesign(t, text)
}

// mustCutList works out d's cut list or fails t.
func mustCutList(t *testing.T, d *parts.Design) *cutlist.CutList {
	t.Helper()
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	return cl
}

// withFeed returns an edit that sets the demo's feed.
func withFeed(feed string) func(string) string {
	return func(s string) string {
		return strings.Replace(s, `feed = "periphery"`, fmt.Sprintf("feed = %q", feed), 1)
	}
}

// feedTol is the tolerance on positions built from the coil's own numbers.
const feedTol = 1e-9
