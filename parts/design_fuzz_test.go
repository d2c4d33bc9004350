package parts

import (
	"errors"
	"io/fs"
	"testing"

	"coilwright/parts/spec"
	"coilwright/templates"
)

func TestShippedSpecsParse(t *testing.T) {
	names, _ := fs.Glob(templates.FS(), "*.toml")
	if len(names) < 3 {
		t.Fatalf("found %d shipped specs, want the reference and two demos", len(names))
	}
	for _, n := range names {
		t.Run(n, func(t *testing.T) {
			b, _ := fs.ReadFile(templates.FS(), n)
			s := mustParse(t, b)
			if _, err := NewDesign(s); err != nil {
				t.Fatal(err)
			}
		})
	}
}

func FuzzParseSpec(f *testing.F) {
	f.Add([]byte(base))
	f.Add(templates.Reference())
	for _, n := range templates.Demos() {
		b, _ := templates.Demo(n)
		f.Add(b)
	}
	f.Add([]byte("kit = 1\n[coil]\nturns = 1e400"))
	f.Add([]byte("[coil.x]\n[[wire]]"))
	f.Fuzz(func(t *testing.T, data []byte) {
		s, err := spec.ParseSpec(data)
		if err != nil {
			if err.Error() == "" {
				t.Fatal("empty error message")
			}
			return
		}
		// A spec that parses either has a design or is refused with
		// spec errors a maker can act on.
		if _, err := NewDesign(s); err != nil {
			var se *spec.SpecError
			var ses spec.SpecErrors
			if !errors.As(err, &se) && !errors.As(err, &ses) {
				t.Fatalf("valid spec but no design, and not a spec error: %v", err)
			}
		}
	})
}
