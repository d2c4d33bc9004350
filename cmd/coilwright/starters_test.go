package main

import (
	"bufio"
	"bytes"
	"errors"
	"fmt"
	"io"
	"regexp"
	"strings"
	"testing"

	"coilwright/kit"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// referenceKeys returns every dotted key the reference spec documents,
// set or shown commented out: the keys a spec can set.
func referenceKeys(t *testing.T) map[string]bool {
	t.Helper()
	keys := map[string]bool{}
	table := ""
	tableRE := regexp.MustCompile(`^#?\s*\[([a-z_.]+)\]\s*$`)
	keyRE := regexp.MustCompile(`^#?\s*([a-z_]+)\s*=`)
	sc := bufio.NewScanner(bytes.NewReader(templates.Reference()))
	for sc.Scan() {
		line := strings.TrimSpace(sc.Text())
		if m := tableRE.FindStringSubmatch(line); m != nil {
			table = m[1] + "."
		} else if m := keyRE.FindStringSubmatch(line); m != nil {
			keys[table+m[1]] = true
		}
	}
	if len(keys) < 20 {
		t.Fatalf("found only %d keys in the reference spec", len(keys))
	}
	return keys
}

func TestStartersCheckThenBuild(t *testing.T) {
	// The starter specs `new` prints for a spread of bands, each shape,
	// one kit and a batch of three (which runs the tolerance analysis):
	// each must pass check as printed and then build (the former's meshing
	// aside, as in TestCheckPassesOnlyWhatBuildPasses); a refusal must be
	// spec errors, each naming a key the spec sets or can set, with a fix.
	// The 12 GHz batch is the case whose strip-chosen first turn was
	// refused by the tolerance analysis on a key the spec does not set.
	if testing.Short() {
		t.Skip("runs the field solver on a dozen starters")
	}
	keys := referenceKeys(t)
	cases := map[string][]float64{
		"cylindrical": {433, 5800, 12000, 24000},
		"conical":     {915, 2440, 10000},
	}
	passed := 0
	for _, shape := range []string{"cylindrical", "conical"} {
		for _, f := range cases[shape] {
			for _, q := range []int{1, 3} {
				t.Run(fmt.Sprintf("%s %g MHz quantity %d", shape, f, q), func(t *testing.T) {
					var buf bytes.Buffer
					if err := runNew(&buf, io.Discard, newOptions{frequencyMHz: f, shape: shape}, true); err != nil {
						t.Fatal(err)
					}
					src := strings.Replace(buf.String(), "quantity = 1", fmt.Sprintf("quantity = %d", q), 1)
					l, err := loadBytes([]byte(src))
					if err != nil {
						t.Fatalf("the starter does not parse: %v", err)
					}
					k, err := kit.New(l, kit.Options{})
					if err != nil {
						var one *spec.SpecError
						var many spec.SpecErrors
						var errs []*spec.SpecError
						switch {
						case errors.As(err, &many):
							errs = many
						case errors.As(err, &one):
							errs = []*spec.SpecError{one}
						default:
							t.Fatalf("check refuses without a spec error: %v", err)
						}
						for _, e := range errs {
							if !keys[e.Key] || e.Fix == "" {
								t.Errorf("refusal %q names %q (a key the spec can set: %v) with fix %q", e.Error(), e.Key, keys[e.Key], e.Fix)
							}
							if e.Line > 0 != (l.Spec.Line(e.Key) > 0) {
								t.Errorf("refusal %q gives line %d for a key the spec sets at line %d", e.Error(), e.Line, l.Spec.Line(e.Key))
							}
						}
						// These bands are what a starter is for: it must
						// pass as printed, or new would have said so.
						t.Errorf("check refuses the starter: %v", err)
						return
					}
					passed++
					if err := buildInMemory(k); err != nil {
						t.Errorf("check passes but build fails: %v\n%s", err, src)
					}
					for _, w := range k.Design.Warnings {
						if w.Code == "field-match" && strings.Contains(w.Message, "remove") {
							for _, key := range []string{"wedge.span_deg", "coil.first_turn_height_mm"} {
								if strings.Contains(w.Message, key) && l.Spec.Line(key) == 0 {
									t.Errorf("field-match tells to remove %s, which the spec does not set: %s", key, w.Message)
								}
							}
						}
					}
				})
			}
		}
	}
	if passed == 0 {
		t.Error("no starter passed check")
	}
}
