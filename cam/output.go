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
	"sort"
	"strings"
)

// ManifestName is the file in every output folder that records what the
// tool wrote there; a folder's files are the tool's only if listed in it.
const ManifestName = "manifest.json"

// Manifest records one build: the tool, the spec's hash and each output's
// name, size and SHA-256. Files are sorted by name.
type Manifest struct {
	Tool       string         `json:"tool"`
	Version    string         `json:"version"`
	Spec       string         `json:"spec"`
	SpecSHA256 string         `json:"spec_sha256"`
	Files      []ManifestFile `json:"files"`
}

// ManifestFile is one output in a Manifest.
type ManifestFile struct {
	Name   string `json:"name"`
	Size   int64  `json:"size"`
	SHA256 string `json:"sha256"`
}

// ErrForeignFiles is returned by NewOutput when the folder holds files the
// tool did not make.
var ErrForeignFiles = errors.New("output folder holds files coilwright did not make")

// ForeignFilesError lists the files in an output folder that no earlier
// build recorded in its manifest.
type ForeignFilesError struct {
	Dir   string
	Names []string
}

// Error names the folder and up to five of the files.
func (e *ForeignFilesError) Error() string {
	names := e.Names
	more := ""
	if len(names) > 5 {
		names, more = names[:5], fmt.Sprintf(" and %d more", len(e.Names)-5)
	}
	return fmt.Sprintf("%s holds files coilwright did not make (%s%s); choose an empty or new folder with -o, or pass --force to write there anyway",
		e.Dir, strings.Join(names, ", "), more)
}

// Is makes errors.Is(err, ErrForeignFiles) true.
func (e *ForeignFilesError) Is(target error) bool { return target == ErrForeignFiles }

// Output is a build's output folder while the build runs. Each file is
// written in full to a hidden temporary file in the folder; Commit renames
// them all into place and removes outputs of the previous build that this
// one no longer makes; Abort removes the temporary files and leaves the
// folder as it was. An Output is not safe for concurrent use.
type Output struct {
	dir      string
	previous map[string]bool // files the previous build recorded
	staged   []staged
	names    map[string]bool
	done     bool // committed: the staged files are in place
}

type staged struct {
	name, tmp string
	size      int64
	sum       string
}

// NewOutput prepares dir (creating it if needed) for a build. Unless force
// is set, it fails with a *ForeignFilesError when dir holds a file that the
// manifest of a previous build does not list.
func NewOutput(dir string, force bool) (*Output, error) {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, err
	}
	prev, err := readManifestNames(dir)
	if err != nil {
		return nil, err
	}
	entries, err := os.ReadDir(dir)
	if err != nil {
		return nil, err
	}
	var foreign []string
	for _, e := range entries {
		n := e.Name()
		if n == ManifestName && prev != nil || prev[n] {
			continue
		}
		foreign = append(foreign, n)
	}
	if len(foreign) > 0 && !force {
		sort.Strings(foreign)
		return nil, &ForeignFilesError{Dir: dir, Names: foreign}
	}
	return &Output{dir: dir, previous: prev, names: map[string]bool{}}, nil
}

// readManifestNames returns the files a previous build listed, or nil when
// there is no manifest.
func readManifestNames(dir string) (map[string]bool, error) {
	b, err := os.ReadFile(filepath.Join(dir, ManifestName))
	if errors.Is(err, fs.ErrNotExist) {
		return nil, nil
	}
	if err != nil {
		return nil, err
	}
	var m Manifest
	if err := json.Unmarshal(b, &m); err != nil || m.Tool != "coilwright" {
		return nil, nil // not ours: the folder check treats it as foreign
	}
	names := map[string]bool{}
	for _, f := range m.Files {
		if f.Name != "" && !strings.ContainsAny(f.Name, `/\`) {
			names[f.Name] = true
		}
	}
	return names, nil
}

// Dir returns the output folder.
func (o *Output) Dir() string { return o.dir }

// Add writes one output file through write into a temporary file and
// records its size and hash. The name must be a plain file name, used once.
func (o *Output) Add(name string, write func(io.Writer) error) error {
	if name == "" || name != filepath.Base(name) || strings.HasPrefix(name, ".") || name == ManifestName {
		return fmt.Errorf("cam: bad output name %q", name)
	}
	if o.names[name] {
		return fmt.Errorf("cam: output %q written twice", name)
	}
	tmp, size, sum, err := writeTemp(o.dir, name, write)
	if err != nil {
		return err
	}
	o.names[name] = true
	o.staged = append(o.staged, staged{name: name, tmp: tmp, size: size, sum: sum})
	return nil
}

// Files returns the staged (or committed) outputs sorted by name, for the
// manifest.
func (o *Output) Files() []ManifestFile {
	out := make([]ManifestFile, len(o.staged))
	for i, s := range o.staged {
		out[i] = ManifestFile{Name: s.name, Size: s.size, SHA256: s.sum}
	}
	sort.Slice(out, func(i, j int) bool { return out[i].Name < out[j].Name })
	return out
}

// Commit writes the manifest m (with Files filled from the staged outputs)
// and moves every staged file into place, then removes files the previous
// build made that this one did not. The manifest goes in last, so a folder
// is never described by a manifest newer than its files.
func (o *Output) Commit(m Manifest) error {
	m.Files = o.Files()
	b, err := json.MarshalIndent(m, "", "  ")
	if err != nil {
		o.Abort()
		return err
	}
	mtmp, _, _, err := writeTemp(o.dir, ManifestName, func(w io.Writer) error {
		_, err := w.Write(append(b, '\n'))
		return err
	})
	if err != nil {
		o.Abort()
		return err
	}
	for _, s := range o.staged {
		if err := os.Rename(s.tmp, filepath.Join(o.dir, s.name)); err != nil {
			os.Remove(mtmp)
			o.Abort()
			return err
		}
	}
	o.done = true
	if err := os.Rename(mtmp, filepath.Join(o.dir, ManifestName)); err != nil {
		return err
	}
	for name := range o.previous {
		if !o.names[name] {
			if err := os.Remove(filepath.Join(o.dir, name)); err != nil && !errors.Is(err, fs.ErrNotExist) {
				return err
			}
		}
	}
	return nil
}

// Abort removes every staged temporary file; files already in the folder
// are left untouched. After Commit it does nothing.
func (o *Output) Abort() {
	if o.done {
		return
	}
	for _, s := range o.staged {
		os.Remove(s.tmp)
	}
	o.staged = nil
}

// maxTempTries bounds the search for an unused temporary file name.
const maxTempTries = 1000

// createTemp creates a new hidden temporary file for name in dir with mode
// 0666 less the process umask, the mode os.Create gives, so that renamed
// outputs are as readable as any other file the user makes (os.CreateTemp
// would leave them 0600).
func createTemp(dir, name string) (*os.File, error) {
	for i := range maxTempTries {
		p := filepath.Join(dir, fmt.Sprintf(".%s.tmp-%d-%d", name, os.Getpid(), i))
		f, err := os.OpenFile(p, os.O_RDWR|os.O_CREATE|os.O_EXCL, 0o666)
		if !errors.Is(err, fs.ErrExist) {
			return f, err
		}
	}
	return nil, fmt.Errorf("cam: no free temporary name for %s in %s", name, dir)
}

// writeTemp writes a hidden temporary file for name in dir and returns its
// path, size and SHA-256; on failure nothing is left behind.
func writeTemp(dir, name string, write func(io.Writer) error) (string, int64, string, error) {
	f, err := createTemp(dir, name)
	if err != nil {
		return "", 0, "", err
	}
	h := sha256.New()
	cw := &countWriter{w: io.MultiWriter(f, h)}
	werr := write(cw)
	cerr := f.Close()
	if werr != nil || cerr != nil {
		os.Remove(f.Name())
		return "", 0, "", fmt.Errorf("writing %s: %w", name, errors.Join(werr, cerr))
	}
	return f.Name(), cw.n, hex.EncodeToString(h.Sum(nil)), nil
}

// ErrExists is returned by WriteFileAtomic when the file exists and
// replacing it was not asked for.
var ErrExists = errors.New("file exists")

// WriteFileAtomic writes one file through a temporary file in the same
// folder and a rename, so readers never see it half-written. An existing
// file is replaced only when replace is set; otherwise the error wraps
// ErrExists and nothing is written.
func WriteFileAtomic(path string, replace bool, write func(io.Writer) error) error {
	if _, err := os.Lstat(path); err == nil && !replace {
		return fmt.Errorf("%s: %w; choose another name or ask to replace it", path, ErrExists)
	}
	tmp, _, _, err := writeTemp(filepath.Dir(path), filepath.Base(path), write)
	if err != nil {
		return err
	}
	if err := os.Rename(tmp, path); err != nil {
		os.Remove(tmp)
		return err
	}
	return nil
}

type countWriter struct {
	w io.Writer
	n int64
}

func (c *countWriter) Write(p []byte) (int, error) {
	n, err := c.w.Write(p)
	c.n += int64(n)
	return n, err
}
