//go:build !(linux || darwin || freebsd || netbsd || openbsd || dragonfly)

package cam

// dirLock is a no-op on systems without flock: concurrent builds into one
// folder are not detected there.
type dirLock struct{}

func lockDir(string) (*dirLock, error) { return &dirLock{}, nil }

func (l *dirLock) release() {}

// syncDir does nothing where folders cannot be synced.
func syncDir(string) error { return nil }
