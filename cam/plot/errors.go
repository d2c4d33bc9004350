package plot

import "fmt"

// InputError reports plot data that cannot be drawn: Field names the
// offending field (for example "Panels[1].Series[0].Values"), Problem says
// what is wrong and how to fix it.
type InputError struct {
	Field   string
	Problem string
}

// Error returns "plot: Field: Problem".
func (e *InputError) Error() string { return fmt.Sprintf("plot: %s: %s", e.Field, e.Problem) }

// inputErr builds an *InputError with a formatted problem.
func inputErr(field, format string, args ...any) error {
	return &InputError{Field: field, Problem: fmt.Sprintf(format, args...)}
}
