// The commit protocol of an output folder.
//
// A build's files are first written in full to hidden temporary files in
// the folder and synced. The commit then:
//
//  1. checks that every output name is free or a regular file it may
//     replace, writes the new manifest to a temporary file and syncs the
//     folder;
//  2. writes the commit record (commitRecordName: each temporary file with
//     its final name and SHA-256, the manifest last, and the previous
//     build's outputs this one no longer makes) through a temporary file,
//     a sync and a rename, and syncs the folder — the decision point;
//  3. renames every temporary file into place, the manifest last, and syncs
//     the folder;
//  4. removes the previous outputs the record lists, and syncs the folder;
//  5. removes the commit record and syncs the folder.
//
// A failure or crash before the record is on disk leaves the previous set
// untouched (temporary files aside, which the next build removes). After
// it, the commit is decided: NewOutput finds the record and completes steps
// 3–5 from it before doing anything else, checking every file it finds in
// place against its recorded SHA-256. Either way, once a build has run in
// the folder, the manifest matches the folder's outputs byte for byte.

package cam

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"unicode"
	"unicode/utf8"
)

// commitRecordName is the hidden file holding a decided commit until it is
// complete.
const commitRecordName = ".coilwright-commit.json"

// commitRecord is a decided commit: what to rename and what to remove.
type commitRecord struct {
	Tool   string         `json:"tool"`
	Files  []recordedFile `json:"files"` // in rename order, the manifest last
	Remove []string       `json:"remove"`
}

// recordedFile is one temporary file and the name it takes.
type recordedFile struct {
	Temp   string `json:"temp"` // base name of the temporary file
	Name   string `json:"name"`
	SHA256 string `json:"sha256"`
}

// maxNameBytes is the longest output name accepted, the usual file-system
// limit on one name.
const maxNameBytes = 255

// validName reports whether name is a plain output name: one visible path
// element of valid UTF-8 with no control characters.
func validName(name string) bool {
	return name != "" && len(name) <= maxNameBytes && utf8.ValidString(name) &&
		!strings.HasPrefix(name, ".") && !strings.ContainsAny(name, `/\`) &&
		strings.IndexFunc(name, unicode.IsControl) < 0
}

// staleTemp matches the temporary files createTemp makes: ".NAME.tmp-PID-N".
var staleTemp = regexp.MustCompile(`^\..+\.tmp-[0-9]+-[0-9]+$`)

// removeStaleTemps removes the temporary files that interrupted builds left
// in dir. The caller holds the folder's lock, so no running build owns them.
func removeStaleTemps(dir string) error {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return err
	}
	removed := false
	for _, e := range entries {
		if staleTemp.MatchString(e.Name()) && e.Type().IsRegular() {
			if err := os.Remove(filepath.Join(dir, e.Name())); err != nil && !errors.Is(err, fs.ErrNotExist) {
				return err
			}
			removed = true
		}
	}
	if removed {
		return syncDir(dir)
	}
	return nil
}

// step runs the commit hook for one named step; nil hook, no failure.
func step(failAt func(string) error, name string) error {
	if failAt == nil {
		return nil
	}
	return failAt(name)
}

// commit carries out steps 1–5 for the staged files. The caller holds o.mu.
func (o *Output) commit(m Manifest) error {
	fail := func(err error) error {
		o.abortLocked()
		return err
	}
	m.Files = o.Files()
	b, err := json.MarshalIndent(m, "", "  ")
	if err != nil {
		return fail(err)
	}
	for _, s := range o.staged {
		if fi, err := os.Lstat(filepath.Join(o.dir, s.name)); err == nil && !fi.Mode().IsRegular() {
			return fail(fmt.Errorf("%s: cannot replace %s, which is not a regular file; move it away", o.dir, s.name))
		}
	}
	mf, err := createTemp(o.dir, ManifestName)
	if err != nil {
		return fail(err)
	}
	o.temps[mf.Name()] = true
	_, msum, err := fillTemp(mf, ManifestName, func(w io.Writer) error {
		_, err := w.Write(append(b, '\n'))
		return err
	})
	if err != nil {
		return fail(err)
	}
	rec := commitRecord{Tool: "coilwright"}
	for _, s := range o.staged {
		rec.Files = append(rec.Files, recordedFile{Temp: filepath.Base(s.tmp), Name: s.name, SHA256: s.sum})
	}
	rec.Files = append(rec.Files, recordedFile{Temp: filepath.Base(mf.Name()), Name: ManifestName, SHA256: msum})
	for name := range o.previous {
		if !o.names[name] {
			rec.Remove = append(rec.Remove, name)
		}
	}
	sort.Strings(rec.Remove)
	if err := step(o.failAt, "sync temporary files"); err != nil {
		return fail(err)
	}
	if err := syncDir(o.dir); err != nil {
		return fail(err)
	}
	rb, err := json.MarshalIndent(rec, "", "  ")
	if err != nil {
		return fail(err)
	}
	if err := step(o.failAt, "write commit record"); err != nil {
		return fail(err)
	}
	rtmp, _, _, err := writeTemp(o.dir, commitRecordName, func(w io.Writer) error {
		_, err := w.Write(rb)
		return err
	})
	if err != nil {
		return fail(err)
	}
	o.temps[rtmp] = true
	if err := step(o.failAt, "rename commit record"); err != nil {
		return fail(err)
	}
	if err := os.Rename(rtmp, filepath.Join(o.dir, commitRecordName)); err != nil {
		return fail(err)
	}
	// Decided: from here on the record is in place and the commit goes
	// forward, here or in the next NewOutput.
	delete(o.temps, rtmp)
	o.done = true
	err = step(o.failAt, "sync commit record")
	if err == nil {
		err = syncDir(o.dir)
	}
	if err == nil {
		err = finishCommit(o.dir, rec, o.failAt)
	}
	o.lock.release()
	o.lock = nil
	if err != nil {
		return fmt.Errorf("%s: commit interrupted (%w); the next build into this folder completes it", o.dir, err)
	}
	return nil
}

// finishCommit carries out steps 3–5 of a decided commit. It can run again
// after any failure: a file already renamed is checked against its hash.
func finishCommit(dir string, rec commitRecord, failAt func(string) error) error {
	for _, f := range rec.Files {
		if err := step(failAt, "rename "+f.Name); err != nil {
			return err
		}
		final := filepath.Join(dir, f.Name)
		err := os.Rename(filepath.Join(dir, f.Temp), final)
		if errors.Is(err, fs.ErrNotExist) {
			err = checkSum(final, f.SHA256)
		}
		if err != nil {
			return err
		}
	}
	if err := step(failAt, "sync renamed files"); err != nil {
		return err
	}
	if err := syncDir(dir); err != nil {
		return err
	}
	for _, name := range rec.Remove {
		if err := step(failAt, "remove "+name); err != nil {
			return err
		}
		p := filepath.Join(dir, name)
		if fi, err := os.Lstat(p); err == nil && fi.Mode().IsRegular() {
			if err := os.Remove(p); err != nil && !errors.Is(err, fs.ErrNotExist) {
				return err
			}
		}
	}
	if err := step(failAt, "sync removals"); err != nil {
		return err
	}
	if err := syncDir(dir); err != nil {
		return err
	}
	if err := step(failAt, "remove commit record"); err != nil {
		return err
	}
	if err := os.Remove(filepath.Join(dir, commitRecordName)); err != nil && !errors.Is(err, fs.ErrNotExist) {
		return err
	}
	return syncDir(dir)
}

// CommitRecordError reports a commit record that cannot be completed: it
// is not the tool's, or a file it names is neither waiting nor in place.
type CommitRecordError struct {
	Path    string
	Problem string
}

// Error names the record, the problem and the fix.
func (e *CommitRecordError) Error() string {
	return fmt.Sprintf("%s: an interrupted build's commit cannot be completed: %s; remove the folder's outputs and %s, then build again",
		e.Path, e.Problem, commitRecordName)
}

// recoverCommit completes the decided commit whose record dir holds, if
// any. The caller holds the folder's lock.
func recoverCommit(dir string, failAt func(string) error) error {
	path := filepath.Join(dir, commitRecordName)
	fi, err := os.Lstat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil
	}
	if err != nil {
		return err
	}
	if !fi.Mode().IsRegular() || fi.Size() > maxCommitRecordBytes {
		return &CommitRecordError{Path: path, Problem: "it is not a commit record"}
	}
	b, err := os.ReadFile(path)
	if err != nil {
		return err
	}
	var rec commitRecord
	if err := json.Unmarshal(b, &rec); err != nil || rec.Tool != "coilwright" || len(rec.Files) == 0 ||
		rec.Files[len(rec.Files)-1].Name != ManifestName {
		return &CommitRecordError{Path: path, Problem: "it is not a commit record"}
	}
	for _, f := range rec.Files {
		if !(validName(f.Name) || f.Name == ManifestName) || !staleTemp.MatchString(f.Temp) || strings.ContainsAny(f.Temp, `/\`) {
			return &CommitRecordError{Path: path, Problem: fmt.Sprintf("it names %q, not an output", f.Name)}
		}
	}
	for _, n := range rec.Remove {
		if !validName(n) {
			return &CommitRecordError{Path: path, Problem: fmt.Sprintf("it names %q, not an output", n)}
		}
	}
	if err := finishCommit(dir, rec, failAt); err != nil {
		var se *sumError
		if errors.As(err, &se) {
			return &CommitRecordError{Path: path, Problem: se.Error()}
		}
		return err
	}
	return nil
}

// maxCommitRecordBytes bounds the commit record read back: a few hundred
// bytes a file.
const maxCommitRecordBytes = 1 << 20

// sumError reports a file whose content is not what a commit recorded.
type sumError struct{ name string }

func (e *sumError) Error() string {
	return e.name + " is neither waiting to be renamed nor in place with the recorded content"
}

// checkSum checks that the file at path has the hex SHA-256 sum.
func checkSum(path, sum string) error {
	f, err := os.Open(path)
	if errors.Is(err, fs.ErrNotExist) {
		return &sumError{filepath.Base(path)}
	}
	if err != nil {
		return err
	}
	defer f.Close()
	h := sha256.New()
	if _, err := io.Copy(h, f); err != nil {
		return err
	}
	if hex.EncodeToString(h.Sum(nil)) != sum {
		return &sumError{filepath.Base(path)}
	}
	return nil
}
