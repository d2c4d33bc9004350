//go:build unix

package tolerance

import "syscall"

// processCPUSeconds returns the CPU time (user and system) this process
// has used: the benchmark reports it beside the wall time, which other
// work on a shared machine inflates.
func processCPUSeconds() float64 {
	var u syscall.Rusage
	if syscall.Getrusage(syscall.RUSAGE_SELF, &u) != nil {
		return 0
	}
	return float64(u.Utime.Sec+u.Stime.Sec) + float64(u.Utime.Usec+u.Stime.Usec)/1e6
}
