package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"

	"coilwright/templates"
)

// calibratedDemo writes the 2.4 GHz demo spec into dir with its [wire]
// table naming the calibration file cal, and returns the spec's path.
func calibratedDemo(t *testing.T, dir, cal string) string {
	t.Helper()
	b, _ := templates.Demo("demo-2g4-cylinder.toml")
	b = bytes.Replace(b, []byte("[wire]\n"), []byte("[wire]\ncalibration = \""+cal+"\"\n"), 1)
	p := filepath.Join(dir, "spec.toml")
	if err := os.WriteFile(p, b, 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

func TestInputFilesMustBeSmallRegularFiles(t *testing.T) {
	dir := t.TempDir()
	fifo := filepath.Join(dir, "fifo.toml")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Fatal(err)
	}
	big := filepath.Join(dir, "big.toml")
	os.WriteFile(big, bytes.Repeat([]byte("# padding\n"), 110_000), 0o644)
	for _, tc := range []struct{ name, path, want string }{
		{"device", "/dev/zero", "is not a regular file"},
		{"pipe", fifo, "is not a regular file"},
		{"folder", dir, "is a folder"},
		{"2 MiB file", big, "larger than 1024 KiB"},
	} {
		t.Run("spec "+tc.name, func(t *testing.T) {
			code, _, errs := runCLI(t, "check", tc.path)
			if code != exitBadUse || !strings.Contains(errs, tc.want) {
				t.Errorf("exit %d, stderr %q", code, errs)
			}
		})
		t.Run("calibration "+tc.name, func(t *testing.T) {
			spec := calibratedDemo(t, t.TempDir(), tc.path)
			code, _, errs := runCLI(t, "check", spec)
			if code != exitBadUse || !strings.Contains(errs, tc.want) || !strings.Contains(errs, "wire.calibration = ") ||
				!strings.Contains(errs, "(line 18)") || !strings.Contains(errs, "fix: ") {
				t.Errorf("exit %d, stderr %q", code, errs)
			}
		})
	}
}

func TestCalibrationFileErrorsNameKeysNotValues(t *testing.T) {
	dir := t.TempDir()
	spec := calibratedDemo(t, dir, "cal.toml")
	cal := `material = "copper-annealed"
wire_diameter_mm = 2.0
effective_yield_mpa = 80.0
library_yield_mpa = 69.0
api_token = "s3cret-pasted-here"
`
	os.WriteFile(filepath.Join(dir, "cal.toml"), []byte(cal), 0o644)
	code, _, errs := runCLI(t, "check", spec)
	if code != exitBadUse || !strings.Contains(errs, "unknown key api_token (line 5)") ||
		!strings.Contains(errs, `wire.calibration = "cal.toml" (line 18)`) || !strings.Contains(errs, "fix: write the file again") {
		t.Errorf("exit %d, stderr %q", code, errs)
	}
	if strings.Contains(errs, "s3cret") {
		t.Errorf("the message repeats a value of the calibration file: %q", errs)
	}
}
