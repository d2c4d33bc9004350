package plot

import (
	"coilwright/cam/internal/fixture"
	"os"
	"os/exec"
	"path/filepath"
	"testing"
)

// golden compares got with testdata/name, rewriting the file under -update.
func golden(t *testing.T, name string, got []byte) { fixture.Golden(t, name, got) }

// needTool returns the path of an external checker, skipping the test when
// it is missing unless COILWRIGHT_REQUIRE_TOOLS=1 demands it.
func needTool(t *testing.T, name string) string {
	t.Helper()
	p, err := exec.LookPath(name)
	if err != nil {
		if os.Getenv("COILWRIGHT_REQUIRE_TOOLS") == "1" {
			t.Fatalf("%s is required (COILWRIGHT_REQUIRE_TOOLS=1) but not installed", name)
		}
		t.Skipf("%s not installed", name)
	}
	return p
}

// needSvgelements skips (or fails) unless the system Python has
// svgelements, and returns the interpreter.
func needSvgelements(t *testing.T) string {
	t.Helper()
	const py = "/usr/bin/python3"
	if err := exec.Command(py, "-c", "import svgelements").Run(); err != nil {
		if os.Getenv("COILWRIGHT_REQUIRE_TOOLS") == "1" {
			t.Fatalf("python3-svgelements is required (COILWRIGHT_REQUIRE_TOOLS=1): %v", err)
		}
		t.Skip("python3-svgelements not installed")
	}
	return py
}

// writeTempFile writes b to a file called name in a fresh test folder.
func writeTempFile(t *testing.T, name string, b []byte) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(p, b, 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}
