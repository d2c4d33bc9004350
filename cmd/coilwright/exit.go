package main

import (
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"

	"coilwright/cam"
	"coilwright/parts/spec"
)

// Exit codes.
const (
	exitOK      = 0
	exitFailure = 1
	exitBadUse  = 2 // bad input or usage
)

// usageError marks a command-line mistake (bad flag, wrong arguments).
type usageError struct{ err error }

func (u usageError) Error() string { return u.err.Error() }
func (u usageError) Unwrap() error { return u.err }

// inputError marks a problem with a file the user gave (spec, measurement).
type inputError struct {
	path string
	err  error
}

func (e inputError) Error() string {
	if e.path == "" {
		return e.err.Error()
	}
	return e.path + ": " + strings.ReplaceAll(e.err.Error(), "\n", "\n"+e.path+": ")
}
func (e inputError) Unwrap() error { return e.err }

// report prints err once on stderr and returns its exit code. It is the one
// place errors become exit codes.
func report(err error, stderr io.Writer) int {
	if err == nil {
		return exitOK
	}
	fmt.Fprintln(stderr, "coilwright:", err)
	var ue usageError
	var ie inputError
	var se *spec.SpecError
	var ses spec.SpecErrors
	switch {
	case errors.As(err, &ue), errors.As(err, &ie), errors.As(err, &se), errors.As(err, &ses),
		errors.Is(err, cam.ErrForeignFiles), errors.Is(err, cam.ErrExists):
		return exitBadUse
	}
	return exitFailure
}

// maxArgs returns an argument validator allowing at most n arguments,
// described by what (e.g. "one spec file").
func maxArgs(n int, what string) func(*cobra.Command, []string) error {
	return func(cmd *cobra.Command, args []string) error {
		if len(args) > n {
			return usageError{fmt.Errorf("%s takes at most %s, got %d arguments: %q", cmd.CommandPath(), what, len(args), args)}
		}
		return nil
	}
}

// exactArgs returns an argument validator requiring exactly n arguments.
func exactArgs(n int, what string) func(*cobra.Command, []string) error {
	return func(cmd *cobra.Command, args []string) error {
		if len(args) != n {
			return usageError{fmt.Errorf("%s needs %s, got %d arguments", cmd.CommandPath(), what, len(args))}
		}
		return nil
	}
}
