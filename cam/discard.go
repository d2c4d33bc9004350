package cam

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
)

// NewDiscardOutput returns an Output that writes nothing: Add runs each
// writer into a hash, so Files reports sizes and SHA-256 sums as a real
// build would, and Commit fails. It lets a caller run every output step in
// memory, to test or to check that all of them succeed.
func NewDiscardOutput() *Output {
	return &Output{names: map[string]bool{}, temps: map[string]bool{}, discard: true}
}

// errDiscardCommit is returned by Commit on a discarding Output.
var errDiscardCommit = errors.New("cam: a discarding output cannot be committed")

// hashWrite runs write into a hash and returns the size and hex SHA-256 of
// what it wrote.
func hashWrite(name string, write func(io.Writer) error) (int64, string, error) {
	h := sha256.New()
	cw := &countWriter{w: h}
	if err := write(cw); err != nil {
		return 0, "", fmt.Errorf("writing %s: %w", name, err)
	}
	return cw.n, hex.EncodeToString(h.Sum(nil)), nil
}
