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
	"sync"
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

// Output is a build's output folder while the build runs, holding the
// folder's lock. Each file is written in full to a hidden temporary file in
// the folder; Commit switches the folder to the new set of files (renaming
// them into place and removing outputs of the previous build that this one
// no longer makes) in a way that survives a crash; Abort removes the
// temporary files and leaves the folder as it was. An Output is not safe
// for concurrent use, except Interrupt.
type Output struct {
	dir      string
	previous map[string]bool // files the previous build recorded
	staged   []staged
	names    map[string]bool
	done     bool // committed: the staged files are in place

	lock    *dirLock   // held from NewOutput until Commit or Abort
	created []string   // folders NewOutput made, deepest first
	ignored []string   // manifest entries that are not plain output names
	mu      sync.Mutex // guards temps and interrupted against Interrupt
	temps   map[string]bool
	stopped bool                    // Interrupt ran: no new temporary files
	failAt  func(step string) error // test hook: fail the commit at a step
}

type staged struct {
	name, tmp string
	size      int64
	sum       string
}

// NewOutput prepares dir (creating it if needed) for a build and takes the
// folder's lock, which Commit or Abort releases; while another build holds
// it, NewOutput fails with a *BusyError. It first finishes a commit that an
// earlier, interrupted build had decided (see Commit) and removes the
// temporary files interrupted builds left. Unless force is set, it then
// fails with a *ForeignFilesError when dir holds a file that the manifest of
// a previous build does not list. Manifest entries that are not plain
// output names are ignored (see Ignored).
func NewOutput(dir string, force bool) (*Output, error) {
	return newOutput(dir, force, nil)
}

// newOutput is NewOutput with a hook that can fail the recovery of an
// interrupted commit at any step (nil in normal use).
func newOutput(dir string, force bool, failAt func(string) error) (*Output, error) {
	created, err := makeDir(dir)
	if err != nil {
		return nil, err
	}
	o := &Output{dir: dir, names: map[string]bool{}, created: created, temps: map[string]bool{}}
	if o.lock, err = lockDir(dir); err != nil {
		o.Abort()
		return nil, err
	}
	if err := o.prepare(force, failAt); err != nil {
		o.Abort()
		return nil, err
	}
	return o, nil
}

// prepare recovers the folder from interrupted builds and checks that every
// file in it is the tool's own, unless force is set.
func (o *Output) prepare(force bool, failAt func(string) error) error {
	if err := recoverCommit(o.dir, failAt); err != nil {
		return err
	}
	if err := removeStaleTemps(o.dir); err != nil {
		return err
	}
	prev, ignored, err := readManifestNames(o.dir)
	if err != nil {
		return err
	}
	o.previous, o.ignored = prev, ignored
	entries, err := os.ReadDir(o.dir)
	if err != nil {
		return err
	}
	var foreign []string
	for _, e := range entries {
		n := e.Name()
		if n == ManifestName && prev != nil || prev[n] && e.Type().IsRegular() {
			continue
		}
		foreign = append(foreign, n)
	}
	if len(foreign) > 0 && !force {
		sort.Strings(foreign)
		return &ForeignFilesError{Dir: o.dir, Names: foreign}
	}
	return nil
}

// makeDir creates dir and any missing parents, and returns the folders it
// created, deepest first.
func makeDir(dir string) ([]string, error) {
	var missing []string
	for d := filepath.Clean(dir); ; d = filepath.Dir(d) {
		if _, err := os.Lstat(d); !errors.Is(err, fs.ErrNotExist) {
			break
		}
		missing = append(missing, d)
		if filepath.Dir(d) == d {
			break
		}
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, err
	}
	return missing, nil
}

// readManifestNames returns the files a previous build listed, or nil when
// there is no manifest, and the listed names it ignores because they are
// not plain output names (see validName).
func readManifestNames(dir string) (map[string]bool, []string, error) {
	b, err := os.ReadFile(filepath.Join(dir, ManifestName))
	if errors.Is(err, fs.ErrNotExist) {
		return nil, nil, nil
	}
	if err != nil {
		return nil, nil, err
	}
	var m Manifest
	if err := json.Unmarshal(b, &m); err != nil || m.Tool != "coilwright" {
		return nil, nil, nil // not ours: the folder check treats it as foreign
	}
	names := map[string]bool{}
	var ignored []string
	for _, f := range m.Files {
		if validName(f.Name) {
			names[f.Name] = true
		} else {
			ignored = append(ignored, f.Name)
		}
	}
	return names, ignored, nil
}

// Ignored returns the entries of the previous build's manifest that are not
// plain output names (a path, ".", "..", a hidden or control-character
// name): NewOutput neither trusts nor removes them.
func (o *Output) Ignored() []string { return o.ignored }

// Dir returns the output folder.
func (o *Output) Dir() string { return o.dir }

// Add writes one output file through write into a temporary file and
// records its size and hash. The name must be a plain file name, used once.
func (o *Output) Add(name string, write func(io.Writer) error) error {
	if !validName(name) || name == ManifestName {
		return fmt.Errorf("cam: bad output name %q", name)
	}
	if o.names[name] {
		return fmt.Errorf("cam: output %q written twice", name)
	}
	f, err := o.newTemp(name)
	if err != nil {
		return err
	}
	size, sum, err := fillTemp(f, name, write)
	o.mu.Lock()
	defer o.mu.Unlock()
	if err != nil {
		delete(o.temps, f.Name())
		return err
	}
	if o.stopped {
		return ErrInterrupted
	}
	tmp := f.Name()
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
// and switches the folder from the previous build's set of files to this
// one's, then releases the folder's lock. The switch is crash-consistent
// (see commit.go): until its commit record is on disk a failure leaves the
// previous set; after it, Commit or the next NewOutput completes the new
// set.
func (o *Output) Commit(m Manifest) error {
	o.mu.Lock()
	defer o.mu.Unlock()
	if o.stopped {
		return ErrInterrupted
	}
	return o.commit(m)
}

// Abort removes every staged temporary file, and the folders NewOutput
// created, and releases the folder's lock; files already in the folder are
// left untouched. After Commit it only releases the lock.
func (o *Output) Abort() {
	o.mu.Lock()
	defer o.mu.Unlock()
	o.abortLocked()
}

// Interrupt is Abort for another goroutine (a signal handler): it waits
// for a running Commit to finish, aborts unless the commit is decided, and
// makes every later Add and Commit fail with ErrInterrupted.
func (o *Output) Interrupt() {
	o.mu.Lock()
	defer o.mu.Unlock()
	o.stopped = true
	o.abortLocked()
}

// ErrInterrupted is returned by Add and Commit after Interrupt.
var ErrInterrupted = errors.New("cam: build interrupted")

func (o *Output) abortLocked() {
	if !o.done {
		for p := range o.temps {
			os.Remove(p)
		}
		o.temps = map[string]bool{}
		o.staged = nil
		for _, d := range o.created {
			os.Remove(d) // only when empty: the folder may have gained other files
		}
	}
	o.lock.release()
	o.lock = nil
}

// newTemp creates a temporary file for name and records it, so that Abort
// and Interrupt can remove it while it is being written.
func (o *Output) newTemp(name string) (*os.File, error) {
	o.mu.Lock()
	defer o.mu.Unlock()
	if o.stopped {
		return nil, ErrInterrupted
	}
	f, err := createTemp(o.dir, name)
	if err != nil {
		return nil, err
	}
	o.temps[f.Name()] = true
	return f, nil
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
	size, sum, err := fillTemp(f, name, write)
	if err != nil {
		return "", 0, "", err
	}
	return f.Name(), size, sum, nil
}

// fillTemp writes the temporary file f for name through write, syncs and
// closes it, and returns its size and SHA-256; on failure it removes f.
func fillTemp(f *os.File, name string, write func(io.Writer) error) (int64, string, error) {
	h := sha256.New()
	cw := &countWriter{w: io.MultiWriter(f, h)}
	werr := write(cw)
	var serr error
	if werr == nil {
		serr = f.Sync()
	}
	cerr := f.Close()
	if werr != nil || serr != nil || cerr != nil {
		os.Remove(f.Name())
		return 0, "", fmt.Errorf("writing %s: %w", name, errors.Join(werr, serr, cerr))
	}
	return cw.n, hex.EncodeToString(h.Sum(nil)), nil
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
	return syncDir(filepath.Dir(path))
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
