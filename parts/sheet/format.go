package sheet

import "strconv"

// num formats a number as a spec would write it: the shortest form that
// reads back exactly.
func num(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }
