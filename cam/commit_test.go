package cam

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"errors"
	"fmt"
	"maps"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

var errInjected = errors.New("injected failure")

// folderSet returns the outputs of dir as name → content after checking
// that manifest.json lists exactly the visible files, each byte for byte.
func folderSet(t *testing.T, dir string) map[string]string {
	t.Helper()
	b, err := os.ReadFile(filepath.Join(dir, ManifestName))
	if err != nil {
		t.Fatalf("no manifest: %v", err)
	}
	var m Manifest
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatal(err)
	}
	set := map[string]string{}
	for _, f := range m.Files {
		c, err := os.ReadFile(filepath.Join(dir, f.Name))
		if err != nil {
			t.Fatalf("manifest lists %s: %v", f.Name, err)
		}
		sum := sha256.Sum256(c)
		if hex.EncodeToString(sum[:]) != f.SHA256 || int64(len(c)) != f.Size {
			t.Fatalf("%s does not match the manifest", f.Name)
		}
		set[f.Name] = string(c)
	}
	for _, n := range listDir(t, dir) {
		if _, ok := set[n]; !ok && n != ManifestName && !strings.HasPrefix(n, ".") {
			t.Fatalf("%s is in the folder but not in the manifest", n)
		}
	}
	return set
}

func commitSet(t *testing.T, o *Output, set map[string]string) error {
	t.Helper()
	for name, content := range set {
		if err := o.Add(name, writeString(content)); err != nil {
			t.Fatal(err)
		}
	}
	return o.Commit(Manifest{Tool: "coilwright"})
}

func TestCommitSurvivesFailureAtEveryStep(t *testing.T) {
	oldSet := map[string]string{"a.txt": "old a", "b.txt": "old b", "gone.txt": "old gone"}
	newSet := map[string]string{"a.txt": "new a", "b.txt": "new b", "c.txt": "new c"}

	// Count the steps of one commit and of its recovery.
	var steps []string
	record := func(s string) error { steps = append(steps, s); return nil }
	dir := t.TempDir()
	o, _ := NewOutput(dir, false)
	commitSet(t, o, oldSet)
	o, _ = NewOutput(dir, false)
	o.failAt = record
	if err := commitSet(t, o, newSet); err != nil {
		t.Fatal(err)
	}
	if len(steps) < 10 {
		t.Fatalf("only %d commit steps seen: %v", len(steps), steps)
	}

	failAtN := func(n int) func(string) error {
		i := 0
		return func(string) error {
			i++
			if i == n {
				return errInjected
			}
			return nil
		}
	}
	for n := 1; n <= len(steps); n++ {
		t.Run(fmt.Sprintf("fail at %s", steps[n-1]), func(t *testing.T) {
			dir := t.TempDir()
			o, _ := NewOutput(dir, false)
			commitSet(t, o, oldSet)
			o, _ = NewOutput(dir, false)
			o.failAt = failAtN(n)
			if err := commitSet(t, o, newSet); !errors.Is(err, errInjected) {
				t.Fatalf("commit: %v", err)
			}
			_, err := os.Lstat(filepath.Join(dir, commitRecordName))
			decided := err == nil
			if !decided && !maps.Equal(folderSet(t, dir), oldSet) {
				t.Fatalf("undecided commit changed the folder: %v", folderSet(t, dir))
			}
			// The next run first fails during its own recovery at each
			// step, then recovers for good.
			for m := 1; decided; m++ {
				o, err := newOutput(dir, false, failAtN(m))
				if err == nil {
					o.Abort()
					break
				}
				if !errors.Is(err, errInjected) {
					t.Fatalf("recovery: %v", err)
				}
			}
			o, err = NewOutput(dir, false)
			if err != nil {
				t.Fatalf("next build: %v", err)
			}
			o.Abort()
			want := oldSet
			if decided {
				want = newSet
			}
			if got := folderSet(t, dir); !maps.Equal(got, want) {
				t.Fatalf("after recovery the folder holds %v, want %v", got, want)
			}
			for _, n := range listDir(t, dir) {
				if strings.HasPrefix(n, ".") {
					t.Errorf("%s left behind", n)
				}
			}
		})
	}
}

func TestCommitRefusingATargetLeavesTheOldSet(t *testing.T) {
	// A folder where one output's name is taken by a folder: the commit
	// fails, and must not have replaced any other output first.
	dir := t.TempDir()
	o, _ := NewOutput(dir, false)
	commitSet(t, o, map[string]string{"a.txt": "old a"})
	os.MkdirAll(filepath.Join(dir, "b.txt", "x"), 0o755)
	o, err := NewOutput(dir, true)
	if err != nil {
		t.Fatal(err)
	}
	if err := commitSet(t, o, map[string]string{"a.txt": "new a", "b.txt": "new b"}); err == nil {
		t.Fatal("replacing a folder with a file was not refused")
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "a.txt")); string(b) != "old a" {
		t.Errorf("a.txt = %q after a failed commit, want the previous build's", b)
	}
}

func TestTamperedCommitRecordIsRefused(t *testing.T) {
	for _, rec := range []string{
		`not json`,
		`{"tool":"coilwright","files":[{"temp":".x.tmp-1-0","name":"..","sha256":""},{"temp":".m.tmp-1-0","name":"manifest.json","sha256":""}]}`,
		`{"tool":"coilwright","files":[{"temp":"../../x","name":"a","sha256":""},{"temp":".m.tmp-1-0","name":"manifest.json","sha256":""}]}`,
		`{"tool":"coilwright","files":[{"temp":".m.tmp-1-0","name":"manifest.json","sha256":""}],"remove":[".."]}`,
	} {
		dir := t.TempDir()
		os.WriteFile(filepath.Join(dir, commitRecordName), []byte(rec), 0o644)
		_, err := NewOutput(dir, true)
		var ce *CommitRecordError
		if !errors.As(err, &ce) {
			t.Errorf("record %s: got %v, want a CommitRecordError", rec, err)
		}
		if _, err := os.Stat(filepath.Dir(dir)); err != nil {
			t.Fatal(err)
		}
	}
}

func TestStaleTemporaryFilesAreRemoved(t *testing.T) {
	// A build killed while writing leaves its temporary files; the next
	// build, with or without force, removes them and keeps anything else.
	for _, force := range []bool{false, true} {
		dir := t.TempDir()
		o, _ := NewOutput(dir, false)
		commitSet(t, o, map[string]string{"a.txt": "a"})
		o, _ = NewOutput(dir, false)
		o.Add("former.stl", writeString("half"))
		o.lock.release() // killed: no Abort
		stale := []string{".former.stl.tmp-4242-0", ".manifest.json.tmp-17-3", "..coilwright-commit.json.tmp-9-0"}
		for _, n := range stale {
			os.WriteFile(filepath.Join(dir, n), []byte("x"), 0o644)
		}
		os.Mkdir(filepath.Join(dir, ".keep.tmp-1-1"), 0o755) // a folder: not the tool's
		o, err := NewOutput(dir, force)
		if !force {
			var fe *ForeignFilesError
			if !errors.As(err, &fe) || len(fe.Names) != 1 || fe.Names[0] != ".keep.tmp-1-1" {
				t.Fatalf("want only the folder named as foreign, got %v", err)
			}
			os.Remove(filepath.Join(dir, ".keep.tmp-1-1"))
			if o, err = NewOutput(dir, false); err != nil {
				t.Fatalf("stale temporary files block the folder: %v", err)
			}
		} else if err != nil {
			t.Fatal(err)
		}
		o.Abort()
		for _, n := range listDir(t, dir) {
			if staleTemp.MatchString(n) && n != ".keep.tmp-1-1" {
				t.Errorf("force=%v: %s left behind", force, n)
			}
		}
	}
}

func TestInterruptRemovesTemporaryFiles(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "new", "kit")
	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	o.Add("a.txt", writeString("a"))
	o.Interrupt()
	if err := o.Add("b.txt", writeString("b")); !errors.Is(err, ErrInterrupted) {
		t.Errorf("Add after Interrupt: %v", err)
	}
	if err := o.Commit(Manifest{Tool: "coilwright"}); !errors.Is(err, ErrInterrupted) {
		t.Errorf("Commit after Interrupt: %v", err)
	}
	if got := listDir(t, parent); len(got) != 0 {
		t.Errorf("interrupted first build left %v", got)
	}
}

func TestSecondBuildIntoAFolderIsRefused(t *testing.T) {
	dir := t.TempDir()
	first, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	first.Add("a.txt", writeString("first"))
	_, err = NewOutput(dir, false)
	var be *BusyError
	if !errors.As(err, &be) || !errors.Is(err, ErrBusy) || !strings.Contains(err.Error(), "another coilwright build") {
		t.Fatalf("second build while the first runs: %v, want a BusyError", err)
	}
	if err := first.Commit(Manifest{Tool: "coilwright"}); err != nil {
		t.Fatal(err)
	}
	second, err := NewOutput(dir, false)
	if err != nil {
		t.Fatalf("build after the first finished: %v", err)
	}
	second.Abort()
	if _, err := NewOutput(dir, false); err != nil {
		t.Fatalf("Abort kept the lock: %v", err)
	}
}

func TestFailedFirstBuildRemovesItsFolder(t *testing.T) {
	parent := t.TempDir()
	os.Mkdir(filepath.Join(parent, "out"), 0o755)
	dir := filepath.Join(parent, "out", "kit", "v1")
	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	o.Add("a.txt", writeString("a"))
	o.Abort()
	if got := listDir(t, filepath.Join(parent, "out")); len(got) != 0 {
		t.Errorf("a failed first build left %v in out/", got)
	}
	// A folder that existed before stays.
	dir = filepath.Join(parent, "out")
	o, _ = NewOutput(dir, false)
	o.Abort()
	if _, err := os.Stat(dir); err != nil {
		t.Errorf("Abort removed a folder it did not create: %v", err)
	}
}

func TestTamperedManifestNamesAreIgnored(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "kit")
	os.Mkdir(dir, 0o755)
	os.WriteFile(filepath.Join(parent, "keep.txt"), []byte("keep"), 0o644)
	bad := []string{"..", ".", "../keep.txt", "sub/a", ".hidden", "a\x1b[2J", ""}
	var files []ManifestFile
	for _, n := range bad {
		files = append(files, ManifestFile{Name: n})
	}
	files = append(files, ManifestFile{Name: "design.md"})
	b, _ := json.Marshal(Manifest{Tool: "coilwright", Files: files})
	os.WriteFile(filepath.Join(dir, ManifestName), b, 0o644)
	os.WriteFile(filepath.Join(dir, "design.md"), []byte("old"), 0o644)

	o, err := NewOutput(dir, false)
	if err != nil {
		t.Fatal(err)
	}
	if got := o.Ignored(); len(got) != len(bad) {
		t.Errorf("ignored %q, want %q", got, bad)
	}
	o.Add("report.md", writeString("new"))
	if err := o.Commit(Manifest{Tool: "coilwright"}); err != nil {
		t.Fatalf("commit over a tampered manifest: %v", err)
	}
	if b, err := os.ReadFile(filepath.Join(parent, "keep.txt")); err != nil || string(b) != "keep" {
		t.Errorf("a file outside the folder was touched: %v", err)
	}
	if got := listDir(t, dir); len(got) != 2 || got[1] != "report.md" {
		t.Errorf("folder holds %v, want the manifest and report.md", got)
	}
}
