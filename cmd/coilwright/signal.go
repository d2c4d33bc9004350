package main

import (
	"fmt"
	"io"
	"os"
	"os/signal"
	"syscall"

	"coilwright/cam"
)

// exitSignalBase is added to a signal's number for the exit status of a
// build it stopped, as shells report a process killed by that signal.
// Common practice (no published source).
const exitSignalBase = 128

// interruptOnSignal watches for SIGINT and SIGTERM while a build writes to
// out. On either, it interrupts out (removing its temporary files, and the
// folder when the build created it, unless the commit is already decided),
// says so on stderr and exits with 128 plus the signal's number. The
// returned function ends the watch.
func interruptOnSignal(out *cam.Output, stderr io.Writer) (stop func()) {
	ch := make(chan os.Signal, 1)
	signal.Notify(ch, os.Interrupt, syscall.SIGTERM)
	end := watchSignals(ch, out, stderr, os.Exit)
	return func() {
		signal.Stop(ch)
		end()
	}
}

// watchSignals is interruptOnSignal with the signal channel and the exit
// function given, for tests.
func watchSignals(ch <-chan os.Signal, out *cam.Output, stderr io.Writer, exit func(int)) (stop func()) {
	done := make(chan struct{})
	go func() {
		select {
		case sig := <-ch:
			out.Interrupt()
			fmt.Fprintf(stderr, "coilwright: %v: build into %s stopped; its temporary files are removed\n", sig, out.Dir())
			code := exitFailure
			if s, ok := sig.(syscall.Signal); ok {
				code = exitSignalBase + int(s)
			}
			exit(code)
		case <-done:
		}
	}()
	return func() { close(done) }
}
