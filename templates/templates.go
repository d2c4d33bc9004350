package templates

import (
	"embed"
	"io/fs"
	"sort"
	"strings"
)

//go:embed *.toml *.tmpl
var files embed.FS

// FS returns the read-only file system of every embedded file. Reading a
// file from it gives a fresh copy of the bytes.
func FS() fs.FS { return files }

// DefaultDemo is the demo spec that `build` uses when given no spec.
const DefaultDemo = "demo-5g8-cone.toml"

//go:embed reference.toml
var reference []byte

// Reference returns the fully commented reference spec, a fresh copy.
func Reference() []byte { return append([]byte(nil), reference...) }

// Demo returns the named embedded demo spec, or false when there is none.
func Demo(name string) ([]byte, bool) {
	b, err := fs.ReadFile(files, name)
	return b, err == nil && strings.HasPrefix(name, "demo-")
}

// Demos returns the names of the embedded demo specs, sorted.
func Demos() []string {
	names, _ := fs.Glob(files, "demo-*.toml")
	sort.Strings(names)
	return names
}
