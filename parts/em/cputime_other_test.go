//go:build !linux

package em

import "time"

// cpuTime returns 0: the process CPU time is read on Linux only.
func cpuTime() time.Duration { return 0 }
