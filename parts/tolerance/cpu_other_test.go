//go:build !unix

package tolerance

// processCPUSeconds is not measured off unix.
func processCPUSeconds() float64 { return 0 }
