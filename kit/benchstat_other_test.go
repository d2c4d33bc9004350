//go:build !linux

package kit

import "time"

// cpuTime returns 0: the process CPU time is read on Linux only.
func cpuTime() time.Duration { return 0 }

// peakRSSKB returns 0: the peak resident size is read on Linux only.
func peakRSSKB() int { return 0 }

// resetPeakRSS does nothing: the peak resident size is reset on Linux only.
func resetPeakRSS() {}
