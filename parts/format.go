package parts

import (
	"fmt"
	"strconv"
)

// num formats a number as a spec would write it: the shortest form that
// reads back exactly.
func num(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }

// TurnsText writes a number of turns with its noun: "1 turn", "5 turns",
// "1.5 turns".
func TurnsText(n float64) string {
	if n == 1 {
		return "1 turn"
	}
	return num(n) + " turns"
}

// mm formats a length in mm to a tenth.
func mm(v float64) string { return fmt.Sprintf("%.1f mm", v) }
