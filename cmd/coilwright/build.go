package main

import (
	"encoding/json"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"unicode"

	"github.com/spf13/cobra"

	"coilwright/cam"
	"coilwright/cam/pdf"
	"coilwright/templates"
)

// buildOptions are the flags of `coilwright build`.
type buildOptions struct {
	outDir   string
	force    bool
	demo     string
	json     bool
	progress io.Writer // step names go here as they start; nil for none
	stderr   io.Writer // where an interrupted build says so
}

func newBuildCmd() *cobra.Command {
	var o buildOptions
	cmd := &cobra.Command{
		Use:   "build [SPEC]",
		Short: "Build every output for a design spec",
		Long: `build validates a design spec and writes every output into one folder:
the design report (design.md, design.json) and manifest.json, which lists
each file with its size and SHA-256. With no SPEC it builds the embedded
demo. The default folder is out/<kit name>/. Outputs are deterministic and
written atomically; a failed build leaves the folder as it was. build
replaces its own earlier outputs but refuses a folder holding files it did
not make, unless --force is given.`,
		Example: `  coilwright build
  coilwright build kestrel.toml -o build/kestrel
  coilwright build --demo demo-2g4-cylinder.toml`,
		Args: maxArgs(1, "one spec file"),
		RunE: func(cmd *cobra.Command, args []string) error {
			path := ""
			if len(args) == 1 {
				path = args[0]
			}
			if path == "" && o.demo == "" {
				o.demo = templates.DefaultDemo
			}
			o.progress = terminal(cmd.ErrOrStderr())
			o.stderr = cmd.ErrOrStderr()
			return runBuild(cmd.OutOrStdout(), path, o)
		},
	}
	cmd.Flags().StringVarP(&o.outDir, "out", "o", "", "output folder (default out/<kit name>/)")
	cmd.Flags().BoolVar(&o.force, "force", false, "write into a folder that holds files coilwright did not make")
	cmd.Flags().StringVar(&o.demo, "demo", "", "build an embedded demo spec: "+strings.Join(templates.Demos(), ", "))
	cmd.Flags().BoolVar(&o.json, "json", false, "print the manifest as JSON instead of a summary")
	cmd.RegisterFlagCompletionFunc("demo", completeDemos)
	cmd.ValidArgsFunction = completeSpecFile
	return cmd
}

func runBuild(w io.Writer, path string, o buildOptions) error {
	l, err := loadSpec(path, o.demo)
	if err != nil {
		return err
	}
	created, err := pdf.SourceDateEpoch(os.Getenv("SOURCE_DATE_EPOCH"))
	if err != nil {
		return usageError{err}
	}
	dir := o.outDir
	if dir == "" {
		dir = filepath.Join("out", slug(l.Spec.Kit))
	}
	if fi, err := os.Stat(dir); err == nil && !fi.IsDir() {
		return usageError{fmt.Errorf("-o %s: is a file, not a folder; choose a new or empty folder", dir)}
	}
	k, err := newKit(l, created)
	if err != nil {
		return err
	}
	out, err := cam.NewOutput(dir, o.force)
	if err != nil {
		return err
	}
	if o.stderr != nil {
		defer interruptOnSignal(out, o.stderr)()
		if ig := out.Ignored(); len(ig) > 0 {
			fmt.Fprintf(o.stderr, "coilwright: %s: ignored %d entries of the previous manifest that are not output names (%s)\n",
				dir, len(ig), clipList(ig))
		}
	}
	var progress func(string)
	if o.progress != nil {
		progress = func(step string) { fmt.Fprintf(o.progress, "coilwright: %s…\n", step) }
	}
	if err := k.Write(out, progress); err != nil {
		out.Abort()
		return err
	}
	m := cam.Manifest{Tool: "coilwright", Version: Version, Spec: l.BaseName(), SpecSHA256: l.SHA256()}
	files := out.Files()
	if err := out.Commit(m); err != nil {
		return err
	}
	if o.json {
		m.Files = files
		enc := json.NewEncoder(w)
		enc.SetIndent("", "  ")
		return enc.Encode(m)
	}
	fmt.Fprintf(w, "%s: wrote %d files and manifest.json to %s\n", l.Name, len(files), dir)
	for _, f := range files {
		fmt.Fprintf(w, "  %-24s %9d bytes\n", f.Name, f.Size)
	}
	return nil
}

// terminal returns w when it is a terminal, for progress lines, and nil
// otherwise, so pipes, files and tests get no progress noise.
func terminal(w io.Writer) io.Writer {
	f, ok := w.(*os.File)
	if !ok {
		return nil
	}
	if fi, err := f.Stat(); err != nil || fi.Mode()&os.ModeCharDevice == 0 {
		return nil
	}
	return w
}

// slug turns a kit name into a folder name: lower case letters, digits and
// single hyphens.
func slug(name string) string {
	var b strings.Builder
	dash := false
	for _, r := range strings.ToLower(name) {
		if r < unicode.MaxASCII && (unicode.IsLetter(r) || unicode.IsDigit(r)) {
			if dash && b.Len() > 0 {
				b.WriteByte('-')
			}
			b.WriteRune(r)
			dash = false
		} else {
			dash = true
		}
	}
	if b.Len() == 0 {
		return "kit"
	}
	return b.String()
}
