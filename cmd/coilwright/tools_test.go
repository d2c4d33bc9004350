package main

import (
	"os"
	"os/exec"
	"testing"
)

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

// needEzdxf returns the system Python, skipping (or failing, as needTool
// does) unless it has ezdxf.
func needEzdxf(t *testing.T) string {
	t.Helper()
	const py = "/usr/bin/python3"
	if err := exec.Command(py, "-c", "import ezdxf").Run(); err != nil {
		if os.Getenv("COILWRIGHT_REQUIRE_TOOLS") == "1" {
			t.Fatalf("python3-ezdxf is required (COILWRIGHT_REQUIRE_TOOLS=1): %v", err)
		}
		t.Skip("python3-ezdxf not installed")
	}
	return py
}
