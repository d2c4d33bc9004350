package main

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"path/filepath"
	"strings"

	"coilwright/parts"
	"coilwright/templates"
)

// loadedSpec is a validated spec with its origin and the bytes it came from.
type loadedSpec struct {
	Name   string // file path, or "demo:NAME" for an embedded demo
	Bytes  []byte
	Spec   *parts.Spec
	Design *parts.Design
}

// SHA256 returns the hex SHA-256 of the spec's bytes.
func (l *loadedSpec) SHA256() string {
	h := sha256.Sum256(l.Bytes)
	return hex.EncodeToString(h[:])
}

// BaseName returns the spec's file name without its folder, or
// "demo:NAME", as the manifest records it: the same file gives the same
// manifest however its path was typed.
func (l *loadedSpec) BaseName() string {
	if strings.HasPrefix(l.Name, "demo:") {
		return l.Name
	}
	return filepath.Base(l.Name)
}

// loadSpec reads and validates a spec from path, or the named embedded demo
// when demo is set. Problems in the spec come back as inputError.
func loadSpec(path, demo string) (*loadedSpec, error) {
	var l loadedSpec
	switch {
	case demo != "" && path != "":
		return nil, usageError{errors.New("give a spec file or --demo, not both")}
	case demo != "":
		b, ok := templates.Demo(demo)
		if !ok {
			return nil, usageError{fmt.Errorf("no embedded demo %q; demos: %v", demo, templates.Demos())}
		}
		l.Name, l.Bytes = "demo:"+demo, b
	default:
		b, err := readInputFile(path)
		if errors.Is(err, errNotFound) {
			return nil, inputError{path, errors.New("no such file; write one with `coilwright new > spec.toml`")}
		}
		if err != nil {
			return nil, inputError{path, err}
		}
		l.Name, l.Bytes = path, b
	}
	s, err := parts.ParseSpec(l.Bytes)
	if err != nil {
		return nil, inputError{l.Name, err}
	}
	if err := attachCalibration(path, s); err != nil {
		return nil, inputError{l.Name, err}
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		return nil, inputError{l.Name, err}
	}
	l.Spec, l.Design = s, d
	return &l, nil
}
