//go:build unix

package checktool

import (
	"bytes"
	"context"
	"errors"
	"os/exec"
	"strings"
	"syscall"
	"testing"
	"time"
)

// BrowserTimeout bounds one headless browser run, so a hung browser fails
// the test instead of stalling CI.
const BrowserTimeout = 90 * time.Second

// Chromium returns the path of Debian's chromium, skipping t (or failing it
// under COILWRIGHT_REQUIRE_TOOLS=1) when it is not installed.
func Chromium(t testing.TB) string { t.Helper(); return Need(t, "chromium") }

// RunChromium runs chromium headless on the local file page with extra
// arguments and a fresh profile, offline-minded (no background fetches, no
// updates), and returns what it printed on stdout. The whole process group
// is killed when BrowserTimeout passes.
func RunChromium(t testing.TB, chromium, page string, extra ...string) []byte {
	t.Helper()
	ctx, cancel := context.WithTimeout(context.Background(), BrowserTimeout)
	defer cancel()
	args := []string{
		"--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
		"--disable-background-networking", "--disable-component-update", "--disable-sync",
		"--disable-dev-shm-usage", "--hide-scrollbars",
		"--user-data-dir=" + t.TempDir(),
	}
	args = append(args, extra...)
	args = append(args, "file://"+page)
	cmd := exec.CommandContext(ctx, chromium, args...)
	cmd.SysProcAttr = &syscall.SysProcAttr{Setpgid: true}
	cmd.Cancel = func() error { return syscall.Kill(-cmd.Process.Pid, syscall.SIGKILL) }
	cmd.WaitDelay = 5 * time.Second
	var stdout, stderr bytes.Buffer
	cmd.Stdout, cmd.Stderr = &stdout, &stderr
	err := cmd.Run()
	if errors.Is(ctx.Err(), context.DeadlineExceeded) {
		t.Fatalf("chromium did not finish within %v\n%s", BrowserTimeout, tail(stderr.String()))
	}
	if err != nil {
		t.Fatalf("chromium: %v\n%s", err, tail(stderr.String()))
	}
	return stdout.Bytes()
}

// tail returns the last lines of a long log.
func tail(s string) string {
	lines := strings.Split(strings.TrimSpace(s), "\n")
	if len(lines) > 20 {
		lines = lines[len(lines)-20:]
	}
	return strings.Join(lines, "\n")
}
