package templates

import (
	"bytes"
	"io/fs"
	"testing"
)

// TestFSHandsOutCopies checks that changing the bytes read from FS, or
// from a demo, does not change what the next read returns.
func TestFSHandsOutCopies(t *testing.T) {
	want, err := fs.ReadFile(FS(), DefaultDemo)
	if err != nil {
		t.Fatal(err)
	}
	got, _ := fs.ReadFile(FS(), DefaultDemo)
	clear(got)
	if again, _ := fs.ReadFile(FS(), DefaultDemo); !bytes.Equal(again, want) {
		t.Error("a caller's change to the bytes read from FS reached the next read")
	}
	d, ok := Demo(DefaultDemo)
	if !ok || !bytes.Equal(d, want) {
		t.Fatalf("Demo(%s) differs from FS", DefaultDemo)
	}
	clear(d)
	if again, _ := Demo(DefaultDemo); !bytes.Equal(again, want) {
		t.Error("a caller's change to a demo's bytes reached the next Demo call")
	}
	r := Reference()
	clear(r)
	if bytes.Equal(Reference(), r) {
		t.Error("a caller's change to Reference reached the next call")
	}
}
