package cam

import (
	"errors"
	"io"
	"os"
	"path/filepath"
	"sort"
	"testing"
)

func writeString(s string) func(io.Writer) error {
	return func(w io.Writer) error { _, err := io.WriteString(w, s); return err }
}

func listDir(t *testing.T, dir string) []string {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, e := range entries {
		names = append(names, e.Name())
	}
	sort.Strings(names)
	return names
}

func TestOutputCommit(t *testing.T) {
	dir := t.TempDir()
	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	if err := o.Add("b.txt", writeString("bee")); err != nil {
		t.Fatal(err)
	}
	if err := o.Add("a.txt", writeString("ay")); err != nil {
		t.Fatal(err)
	}
	if err := o.Commit(Manifest{Tool: "coilwright"}); err != nil {
		t.Fatal(err)
	}
	if got := listDir(t, dir); len(got) != 3 || got[0] != "a.txt" || got[2] != ManifestName {
		t.Fatalf("folder holds %v", got)
	}
	// Source: SHA-256 of "ay" from coreutils sha256sum (printf 'ay' | sha256sum).
	const sumAy = "69d61997a241e97931db9dd1cfcef218041a752485f5f7956b09766287682da3"
	files := o.Files()
	if files[0].Name != "a.txt" || files[0].Size != 2 || files[0].SHA256 != sumAy {
		t.Errorf("manifest entry %+v", files[0])
	}
}

func TestOutputAbortLeavesFolderAsItWas(t *testing.T) {
	dir := t.TempDir()
	o, _ := NewOutput(dir, false)
	o.Add("a.txt", writeString("one"))
	o.Commit(Manifest{Tool: "coilwright"})
	before := listDir(t, dir)

	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	o.Add("a.txt", writeString("two"))
	if err := o.Add("c.txt", func(io.Writer) error { return errors.New("disk on fire") }); err == nil {
		t.Fatal("a failing writer was not reported")
	}
	o.Abort()
	if after := listDir(t, dir); len(after) != len(before) {
		t.Fatalf("folder changed on abort: %v → %v", before, after)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "a.txt")); string(b) != "one" {
		t.Errorf("a.txt = %q after abort, want the earlier build's", b)
	}
}

func TestOutputRefusesForeignFiles(t *testing.T) {
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "mine.txt"), []byte("keep"), 0o644)
	_, err := NewOutput(dir, false)
	var fe *ForeignFilesError
	if !errors.As(err, &fe) || !errors.Is(err, ErrForeignFiles) || fe.Names[0] != "mine.txt" {
		t.Fatalf("want a ForeignFilesError naming mine.txt, got %v", err)
	}
	if _, err := NewOutput(dir, true); err != nil {
		t.Fatalf("force: %v", err)
	}
}

func TestOutputRemovesItsStaleFiles(t *testing.T) {
	dir := t.TempDir()
	o, _ := NewOutput(dir, false)
	o.Add("panel.dxf", writeString("old"))
	o.Add("design.md", writeString("old"))
	o.Commit(Manifest{Tool: "coilwright"})

	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatalf("rebuilding over its own outputs: %v", err)
	}
	o.Add("design.md", writeString("new"))
	o.Commit(Manifest{Tool: "coilwright"})
	if got := listDir(t, dir); len(got) != 2 || got[0] != "design.md" {
		t.Errorf("folder holds %v, want design.md and the manifest", got)
	}
}

func TestOutputRejectsBadNames(t *testing.T) {
	o, _ := NewOutput(t.TempDir(), false)
	for _, n := range []string{"", "../x", "a/b", ".hidden", ManifestName} {
		if err := o.Add(n, writeString("x")); err == nil {
			t.Errorf("Add(%q) accepted", n)
		}
	}
	o.Add("x", writeString("x"))
	if err := o.Add("x", writeString("x")); err == nil {
		t.Error("a name used twice was accepted")
	}
}

func TestWriteFileAtomic(t *testing.T) {
	p := filepath.Join(t.TempDir(), "cal.toml")
	if err := WriteFileAtomic(p, false, writeString("v1")); err != nil {
		t.Fatal(err)
	}
	if err := WriteFileAtomic(p, false, writeString("v2")); !errors.Is(err, ErrExists) {
		t.Fatalf("overwrite without replace: %v", err)
	}
	if err := WriteFileAtomic(p, true, func(io.Writer) error { return errors.New("boom") }); err == nil {
		t.Fatal("failing writer not reported")
	}
	if b, _ := os.ReadFile(p); string(b) != "v1" {
		t.Errorf("file = %q after a failed replace, want v1", b)
	}
	if got := listDir(t, filepath.Dir(p)); len(got) != 1 {
		t.Errorf("temporary files left behind: %v", got)
	}
}

func TestWrittenFilesGetTheUsualMode(t *testing.T) {
	// Outputs get the mode os.Create gives (0666 less the umask), not the
	// 0600 of a temporary file: compare with a file made by os.WriteFile.
	dir := t.TempDir()
	ref := filepath.Join(dir, "ref.txt")
	if err := os.WriteFile(ref, []byte("x"), 0o666); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "out.txt")
	if err := WriteFileAtomic(out, false, func(w io.Writer) error { _, err := w.Write([]byte("x")); return err }); err != nil {
		t.Fatal(err)
	}
	want, err := os.Stat(ref)
	if err != nil {
		t.Fatal(err)
	}
	got, err := os.Stat(out)
	if err != nil {
		t.Fatal(err)
	}
	if got.Mode().Perm() != want.Mode().Perm() {
		t.Errorf("written file mode %v, want %v as os.WriteFile gives", got.Mode().Perm(), want.Mode().Perm())
	}
}
