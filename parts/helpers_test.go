package parts

import (
	"testing"

	"coilwright/parts/spec"
	"coilwright/parts/spec/spectest"
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

// base is a valid spec the bad-input cases edit; line numbers in the cases
// below count from its first line.
const base = spectest.Base

func demoDesign(t *testing.T, name string, edit func(string) string) *Design {
	t.Helper()
	text := string(demoSpec(t, name))
	if edit != nil {
		text = edit(text)
	}
	return mustDesign(t, text)
}
