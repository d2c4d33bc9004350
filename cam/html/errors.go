package html

import "fmt"

// ModelError reports a document that cannot be written: Where names the
// element (for example `section "Plots" block 2`), Problem says what is
// wrong and how to fix it.
type ModelError struct {
	Where   string
	Problem string
}

// Error returns "html: Where: Problem".
func (e *ModelError) Error() string { return fmt.Sprintf("html: %s: %s", e.Where, e.Problem) }

func modelErr(where, format string, args ...any) error {
	return &ModelError{Where: where, Problem: fmt.Sprintf(format, args...)}
}
