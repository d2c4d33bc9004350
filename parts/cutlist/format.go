package cutlist

import (
	"fmt"
	"strconv"
)

// num formats a number as a spec would write it: the shortest form that
// reads back exactly.
func num(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }

// mm formats a length in mm to a tenth.
func mm(v float64) string { return fmt.Sprintf("%.1f mm", v) }
