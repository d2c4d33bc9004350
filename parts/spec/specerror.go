package spec

import (
	"fmt"
	"strings"
)

// SpecError is one problem with a design spec: which key, where, what value,
// what rule it breaks and how to fix it. Line is 1-based, or 0 when the key is
// absent from the spec.
type SpecError struct {
	Key     string // dotted key, e.g. "coil.turns"
	Line    int    // line of the key in the spec; 0 when absent
	Value   string // the value as written, empty when absent
	Problem string // the rule broken, with the allowed range
	Fix     string // what to change
}

// Error formats e as `coil.turns = 0 (line 12): must be at least 1; fix: ...`.
func (e *SpecError) Error() string {
	var b strings.Builder
	b.WriteString(e.Key)
	if e.Value != "" {
		fmt.Fprintf(&b, " = %s", e.Value)
	}
	if e.Line > 0 {
		fmt.Fprintf(&b, " (line %d)", e.Line)
	} else if e.Value == "" {
		b.WriteString(" (not set)")
	}
	fmt.Fprintf(&b, ": %s", e.Problem)
	if e.Fix != "" {
		fmt.Fprintf(&b, "; fix: %s", e.Fix)
	}
	return b.String()
}

// SpecErrors is every problem found in one spec, in spec order. It is
// returned as an error only when non-empty.
type SpecErrors []*SpecError

// Error joins the problems, one a line.
func (es SpecErrors) Error() string {
	lines := make([]string, len(es))
	for i, e := range es {
		lines[i] = e.Error()
	}
	return strings.Join(lines, "\n")
}

// Unwrap returns the individual problems for errors.As and errors.Is.
func (es SpecErrors) Unwrap() []error {
	out := make([]error, len(es))
	for i, e := range es {
		out[i] = e
	}
	return out
}
