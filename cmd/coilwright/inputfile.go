package main

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
)

// maxInputBytes caps the size of a spec or calibration file read: such a
// file is a few kilobytes.
const maxInputBytes = 1 << 20

// errNotFound marks an input file that does not exist.
var errNotFound = errors.New("no such file")

// readInputFile reads a spec or calibration file. Anything but a regular
// file (a device, a pipe, a folder) is refused before it is opened for
// reading, and so is a file larger than maxInputBytes.
func readInputFile(path string) ([]byte, error) {
	fi, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, errNotFound
	}
	if err != nil {
		return nil, err
	}
	if err := regularInput(fi); err != nil {
		return nil, err
	}
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	if fi, err = f.Stat(); err != nil {
		return nil, err
	}
	if err := regularInput(fi); err != nil { // replaced since the first look
		return nil, err
	}
	b, err := io.ReadAll(io.LimitReader(f, maxInputBytes+1))
	if err != nil {
		return nil, err
	}
	if len(b) > maxInputBytes {
		return nil, fmt.Errorf("larger than %d KiB: not a spec or calibration file; give the right file", maxInputBytes>>10)
	}
	return b, nil
}

// regularInput refuses anything but a regular file of at most
// maxInputBytes.
func regularInput(fi fs.FileInfo) error {
	switch {
	case fi.IsDir():
		return errors.New("is a folder, not a file; give the file's name")
	case !fi.Mode().IsRegular():
		return fmt.Errorf("is not a regular file (%v); give a file on disk", fi.Mode().Type())
	case fi.Size() > maxInputBytes:
		return fmt.Errorf("larger than %d KiB: not a spec or calibration file; give the right file", maxInputBytes>>10)
	}
	return nil
}
