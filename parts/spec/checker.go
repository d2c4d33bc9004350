package spec

import (
	"fmt"
	"slices"
	"strconv"
	"strings"
)

// checker gathers spec problems while validation runs, each with the line
// its key was written on.
type checker struct {
	pos  positions
	errs SpecErrors
}

func (c *checker) has(key string) bool {
	_, ok := c.pos[key]
	return ok
}

func (c *checker) fail(key, value, problem, fix string) {
	c.errs = append(c.errs, &SpecError{Key: key, Line: c.pos[key], Value: clipValue(value), Problem: problem, Fix: fix})
}

// orDefault sets *v to def when the key is absent from the spec and *v is
// still zero (a Spec built in code leaves it zero).
func (c *checker) orDefault(key string, v *float64, def float64) {
	if !c.has(key) && *v == 0 {
		*v = def
	}
}

// within checks lo ≤ v ≤ hi.
func (c *checker) within(key string, v, lo, hi float64, unit string) bool {
	if v >= lo && v <= hi {
		return true
	}
	c.fail(key, num(v), fmt.Sprintf("must be between %s and %s %s", num(lo), num(hi), unit), fmt.Sprintf("set a value from %s to %s", num(lo), num(hi)))
	return false
}

// oneOf checks that v is one of the allowed words; an empty v takes def.
func (c *checker) oneOf(key string, v *string, def string, allowed ...string) bool {
	if *v == "" && def != "" && !c.has(key) {
		*v = def
	}
	if slices.Contains(allowed, *v) {
		return true
	}
	c.fail(key, strconv.Quote(*v), "must be one of "+quoteAll(allowed), fmt.Sprintf("write %s = %q", key[strings.LastIndex(key, ".")+1:], allowed[0]))
	return false
}

// exclusive checks that at most one of two alternative keys is given and,
// when required, that one is.
func (c *checker) exclusive(keyA string, a *float64, keyB string, b *float64, required bool) bool {
	switch {
	case a != nil && b != nil:
		c.fail(keyB, num(*b), "given together with "+keyA+"; give one or the other", "delete one of the two keys")
		return false
	case required && a == nil && b == nil:
		c.fail(keyA, "", "one of "+keyA+" or "+keyB+" is required", "add "+keyA[strings.LastIndex(keyA, ".")+1:]+" = ...")
		return false
	}
	return true
}

func (c *checker) result() error {
	if len(c.errs) == 0 {
		return nil
	}
	slices.SortStableFunc(c.errs, func(a, b *SpecError) int { return lineOrder(a.Line) - lineOrder(b.Line) })
	return c.errs
}

// lineOrder sorts absent keys (line 0) after written ones.
func lineOrder(l int) int {
	if l == 0 {
		return 1 << 30
	}
	return l
}

func quoteAll(words []string) string {
	q := make([]string, len(words))
	for i, w := range words {
		q[i] = strconv.Quote(w)
	}
	return strings.Join(q, ", ")
}

// num formats a float compactly for messages.
func num(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }
