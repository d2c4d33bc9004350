package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestConcurrentBuildsIntoOneFolder(t *testing.T) {
	// One build runs in a subprocess; a second into the same folder, while
	// it runs, is refused with a clear message; the first completes.
	dir := filepath.Join(t.TempDir(), "kit")
	c := coilwrightCmd("build", "-o", dir)
	var firstErr bytes.Buffer
	c.Stderr = &firstErr
	if err := c.Start(); err != nil {
		t.Fatal(err)
	}
	waitForTemp(t, dir)
	var stdout, stderr bytes.Buffer
	code := run([]string{"build", "-o", dir}, &stdout, &stderr)
	if code != exitFailure || !strings.Contains(stderr.String(), "being written by another coilwright build") {
		t.Errorf("second build: exit %d, stderr %q", code, stderr.String())
	}
	if err := c.Wait(); err != nil {
		t.Fatalf("first build: %v: %s", err, firstErr.String())
	}
	if code := run([]string{"build", "-o", dir}, &stdout, &stderr); code != exitOK {
		t.Errorf("rebuild after the first finished: exit %d: %s", code, stderr.String())
	}
}

func TestTamperedManifestIsReported(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "kit")
	var stdout, stderr bytes.Buffer
	if code := run([]string{"build", "--demo", "demo-2g4-cylinder.toml", "-o", dir}, &stdout, &stderr); code != exitOK {
		t.Fatalf("build: %s", stderr.String())
	}
	b, _ := os.ReadFile(filepath.Join(dir, "manifest.json"))
	b = bytes.Replace(b, []byte(`"name": "design.md"`), []byte(`"name": ".."`), 1)
	os.WriteFile(filepath.Join(dir, "manifest.json"), b, 0o644)
	os.Remove(filepath.Join(dir, "design.md"))
	stderr.Reset()
	if code := run([]string{"build", "--demo", "demo-2g4-cylinder.toml", "-o", dir}, &stdout, &stderr); code != exitOK {
		t.Fatalf("rebuild over a tampered manifest: %s", stderr.String())
	}
	if !strings.Contains(stderr.String(), `ignored 1 entries of the previous manifest that are not output names ("..")`) {
		t.Errorf("stderr %q does not report the ignored entry", stderr.String())
	}
}
