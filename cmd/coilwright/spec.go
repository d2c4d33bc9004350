package main

import (
	"errors"
	"fmt"
	"strings"
	"time"

	"coilwright/kit"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// loadSpec reads and validates a spec from path, or the named embedded demo
// when demo is set. Problems in the spec come back as inputError.
func loadSpec(path, demo string) (*kit.Source, error) {
	var l kit.Source
	switch {
	case demo != "" && path != "":
		return nil, usageError{errors.New("give a spec file or --demo, not both")}
	case demo != "":
		if !strings.HasSuffix(demo, ".toml") {
			demo += ".toml"
		}
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
	s, err := spec.ParseSpec(l.Bytes)
	if err != nil {
		return nil, inputError{l.Name, err}
	}
	if err := attachCalibration(path, s); err != nil {
		return nil, inputError{l.Name, err}
	}
	l.Spec = s
	return &l, nil
}

// newKit plans the build of a loaded spec. Problems in the spec, found
// only once the design and its parts are worked out, come back as
// inputError naming the spec.
func newKit(l *kit.Source, created time.Time) (*kit.Kit, error) {
	k, err := kit.New(*l, kit.Options{Version: Version, Created: created})
	var se *spec.SpecError
	var ses spec.SpecErrors
	if errors.As(err, &se) || errors.As(err, &ses) {
		return nil, inputError{l.Name, err}
	}
	return k, err
}
