//go:build linux || darwin || freebsd || netbsd || openbsd || dragonfly

package cam

import (
	"errors"
	"fmt"
	"os"
	"syscall"
)

// dirLock is an exclusive advisory lock (flock) on an output folder, held
// through an open descriptor of the folder itself so nothing is added to it.
type dirLock struct{ f *os.File }

// lockDir takes the lock on dir without waiting; a lock held by another
// build gives a *BusyError.
func lockDir(dir string) (*dirLock, error) {
	f, err := os.Open(dir)
	if err != nil {
		return nil, err
	}
	if err := syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB); err != nil {
		f.Close()
		if errors.Is(err, syscall.EWOULDBLOCK) {
			return nil, &BusyError{Dir: dir}
		}
		return nil, fmt.Errorf("locking %s: %w", dir, err)
	}
	return &dirLock{f: f}, nil
}

// release gives the lock up; a nil lock does nothing.
func (l *dirLock) release() {
	if l != nil && l.f != nil {
		l.f.Close() // closing the last descriptor releases the flock
		l.f = nil
	}
}

// syncDir makes the folder's entries (created, renamed, removed files)
// durable.
func syncDir(dir string) error {
	f, err := os.Open(dir)
	if err != nil {
		return err
	}
	defer f.Close()
	return f.Sync()
}
