package kit

import (
	"os"
	"strconv"
	"strings"
	"syscall"
	"time"
)

// cpuTime returns the CPU time the process has used, user and system.
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

// peakRSSKB returns the process's peak resident set size in KiB from
// /proc/self/status (VmHWM), or 0 where that is not available.
func peakRSSKB() int {
	b, err := os.ReadFile("/proc/self/status")
	if err != nil {
		return 0
	}
	for line := range strings.SplitSeq(string(b), "\n") {
		if rest, ok := strings.CutPrefix(line, "VmHWM:"); ok {
			n, _ := strconv.Atoi(strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(rest), "kB")))
			return n
		}
	}
	return 0
}

// resetPeakRSS resets the process's peak resident set size (VmHWM) to the
// current size, so peakRSSKB then reports the peak since this call. Linux
// 4.0 and later: writing 5 to /proc/self/clear_refs.
// Source: Linux kernel documentation, Documentation/filesystems/proc.rst,
// "clear_refs".
func resetPeakRSS() {
	_ = os.WriteFile("/proc/self/clear_refs", []byte("5"), 0)
}
