package main

import (
	"bytes"
	"strings"
	"testing"

	"coilwright/parts/wire"
)

// TestCompletion checks the shell completions for --demo, --material and
// the materials argument.
func TestCompletion(t *testing.T) {
	for _, tc := range []struct {
		name string
		args []string
		want []string
	}{
		{"build --demo", []string{"__complete", "build", "--demo", "demo-2"}, []string{"demo-2g4-cylinder"}},
		{"check --demo", []string{"__complete", "check", "--demo", ""}, []string{"demo-2g4-cylinder", "demo-5g8-cone"}},
		{"calibrate --material", []string{"__complete", "calibrate", "--material", "copper-ann"}, []string{"copper-annealed"}},
		{"materials ID", []string{"__complete", "materials", ""}, wire.MaterialIDs()},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var stdout, stderr bytes.Buffer
			if code := run(tc.args, &stdout, &stderr); code != 0 {
				t.Fatalf("exit %d: %s", code, stderr.String())
			}
			var got []string
			for _, l := range strings.Split(strings.TrimSpace(stdout.String()), "\n") {
				if !strings.HasPrefix(l, ":") {
					got = append(got, l)
				}
			}
			if strings.Join(got, ",") != strings.Join(tc.want, ",") {
				t.Errorf("completions %q, want %q", got, tc.want)
			}
		})
	}
}

// TestDemoWithoutExtension checks that --demo takes the name with or
// without .toml, and names the spec the same way in both cases.
func TestDemoWithoutExtension(t *testing.T) {
	var a, b, stderr bytes.Buffer
	if code := run([]string{"check", "--demo", "demo-2g4-cylinder"}, &a, &stderr); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
	if code := run([]string{"check", "--demo", "demo-2g4-cylinder.toml"}, &b, &stderr); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
	if a.String() != b.String() {
		t.Error("check --demo differs with and without .toml")
	}
}

// TestUnknownCommand checks that a mistyped subcommand is a usage error.
func TestUnknownCommand(t *testing.T) {
	var stdout, stderr bytes.Buffer
	if code := run([]string{"buidl"}, &stdout, &stderr); code != exitBadUse {
		t.Errorf("exit %d, want %d: %s", code, exitBadUse, stderr.String())
	}
	if !strings.Contains(stderr.String(), "buidl") {
		t.Errorf("stderr %q does not name the command", stderr.String())
	}
}
