package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"coilwright/cam"
	"coilwright/templates"
)

func TestManifestRecordsTheSpecFileNameOnly(t *testing.T) {
	dir := t.TempDir()
	b, _ := templates.Demo("demo-2g4-cylinder.toml")
	spec := filepath.Join(dir, "sub", "a.toml")
	os.MkdirAll(filepath.Dir(spec), 0o755)
	os.WriteFile(spec, b, 0o644)
	out := filepath.Join(dir, "out")
	if code, _, errs := runCLI(t, "build", spec, "-o", out); code != exitOK {
		t.Fatalf("build: %s", errs)
	}
	mb, err := os.ReadFile(filepath.Join(out, cam.ManifestName))
	if err != nil {
		t.Fatal(err)
	}
	var m cam.Manifest
	json.Unmarshal(mb, &m)
	if m.Spec != "a.toml" || strings.Contains(string(mb), dir) {
		t.Errorf("manifest records the spec as %q; want its file name only, and no folder", m.Spec)
	}
}

func TestSourceDateEpochOutOfRangeIsRefused(t *testing.T) {
	t.Setenv("SOURCE_DATE_EPOCH", "253402300800")
	out := filepath.Join(t.TempDir(), "out")
	code, _, errs := runCLI(t, "build", "--demo", "demo-2g4-cylinder.toml", "-o", out)
	if code != exitBadUse || !strings.Contains(errs, "SOURCE_DATE_EPOCH") || !strings.Contains(errs, "end of 9999") {
		t.Errorf("exit %d, stderr %q", code, errs)
	}
	if _, err := os.Stat(out); err == nil {
		t.Error("a refused build made its folder")
	}
}
