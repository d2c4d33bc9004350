package kit

import (
	"bytes"
	"io"
	"testing"

	"coilwright/parts/spec"
	"coilwright/templates"
)

// demoKit plans the named embedded demo.
func demoKit(t testing.TB, name string, opt Options) *Kit {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	k, err := New(Source{Name: "demo:" + name, Bytes: b, Spec: s}, opt)
	if err != nil {
		t.Fatal(err)
	}
	return k
}

// TestReportJSONIsDesignJSON holds what check --json prints (the kit's
// report) to the design.json a build writes, panel blocks included.
func TestReportJSONIsDesignJSON(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			k := demoKit(t, demo, Options{Version: "test"})
			var m Memory
			if err := k.writeDesign(&m); err != nil {
				t.Fatal(err)
			}
			var got bytes.Buffer
			if err := k.WriteReportJSON(&got); err != nil {
				t.Fatal(err)
			}
			want, ok := m.File("design.json")
			if !ok {
				t.Fatal("no design.json written")
			}
			if !bytes.Equal(got.Bytes(), want) {
				t.Error("the report JSON differs from design.json")
			}
			if k.Report.Wedge == nil || k.Report.Wedge.Panel == nil {
				t.Error("the report has no wedge panel block")
			}
		})
	}
}

// TestMemoryRefusesTwice checks that a name cannot be added twice.
func TestMemoryRefusesTwice(t *testing.T) {
	var m Memory
	if err := m.Add("a", func(w io.Writer) error { return nil }); err != nil {
		t.Fatal(err)
	}
	if err := m.Add("a", func(w io.Writer) error { return nil }); err == nil {
		t.Error("a second file named a was accepted")
	}
}
