// Package checktool finds the outside programs tests check outputs with
// (admesh, ezdxf, svgelements, rsvg, qpdf, poppler): a test whose checker
// is missing is skipped, or fails when COILWRIGHT_REQUIRE_TOOLS=1 demands
// every checker. It is for tests only.
package checktool

import (
	"os"
	"os/exec"
	"path/filepath"
	"testing"
)

// Python is the system Python that has the Debian python3-* modules.
const Python = "/usr/bin/python3"

// required reports whether COILWRIGHT_REQUIRE_TOOLS=1 makes a missing
// checker a failure.
func required() bool { return os.Getenv("COILWRIGHT_REQUIRE_TOOLS") == "1" }

// missing skips t, or fails it when every checker is required; what names
// the checker and the Debian package that brings it.
func missing(t testing.TB, what string, err error) {
	t.Helper()
	if required() {
		t.Fatalf("%s is required (COILWRIGHT_REQUIRE_TOOLS=1) but not usable: %v", what, err)
	}
	t.Skipf("%s not installed", what)
}

// Need returns the path of the named program, skipping t (or failing it
// under COILWRIGHT_REQUIRE_TOOLS=1) when it is not installed.
func Need(t testing.TB, name string) string {
	t.Helper()
	p, err := exec.LookPath(name)
	if err != nil {
		missing(t, name, err)
	}
	return p
}

// NeedPython returns the system Python, skipping t (or failing it under
// COILWRIGHT_REQUIRE_TOOLS=1) unless it can import module (e.g. "ezdxf",
// "svgelements").
func NeedPython(t testing.TB, module string) string {
	t.Helper()
	if err := exec.Command(Python, "-c", "import "+module).Run(); err != nil {
		missing(t, "python3-"+module, err)
	}
	return Python
}

// TempFile writes b to a file called name in a fresh test folder and
// returns its path.
func TempFile(t testing.TB, name string, b []byte) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(p, b, 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}
