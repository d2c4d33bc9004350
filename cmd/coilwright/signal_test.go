package main

import (
	"bytes"
	"errors"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

// coilwrightCmd runs this test binary as the coilwright command (TestMain
// dispatches on the program name).
func coilwrightCmd(args ...string) *exec.Cmd {
	return &exec.Cmd{Path: os.Args[0], Args: append([]string{"coilwright"}, args...)}
}

// waitForTemp polls dir until it holds a temporary output file.
func waitForTemp(t *testing.T, dir string) {
	t.Helper()
	for range 20000 {
		entries, _ := os.ReadDir(dir)
		for _, e := range entries {
			if strings.Contains(e.Name(), ".tmp-") {
				return
			}
		}
		time.Sleep(time.Millisecond)
	}
	t.Fatal("the build wrote no temporary file")
}

func TestSignalStopsBuildAndCleansUp(t *testing.T) {
	for _, sig := range []syscall.Signal{syscall.SIGINT, syscall.SIGTERM} {
		t.Run(sig.String(), func(t *testing.T) {
			dir := filepath.Join(t.TempDir(), "kit")
			c := coilwrightCmd("build", "-o", dir)
			var stderr bytes.Buffer
			c.Stderr = &stderr
			if err := c.Start(); err != nil {
				t.Fatal(err)
			}
			waitForTemp(t, dir)
			c.Process.Signal(sig)
			err := c.Wait()
			var ee *exec.ExitError
			if !errors.As(err, &ee) || ee.ExitCode() != exitSignalBase+int(sig) {
				t.Fatalf("exit: %v, want status %d; stderr %s", err, exitSignalBase+int(sig), stderr.String())
			}
			if _, err := os.Stat(dir); !errors.Is(err, os.ErrNotExist) {
				entries, _ := os.ReadDir(dir)
				t.Errorf("the stopped first build left its folder: %v", entries)
			}
		})
	}
}
