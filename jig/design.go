package jig

import (
	"strconv"

	"coilwright/parts"
)

// FormerFromDesign plans the former for a design and builds it: Plan then
// FormerPlan.Former.
func FormerFromDesign(d *parts.Design) (*Former, error) { return Plan(d).Former() }

// FrequencyLabel returns the frequency as engraved, to three significant
// figures: "5.8 GHz" from 1000 MHz up, "434 MHz" below.
func FrequencyLabel(mhz float64) string {
	unit := " MHz"
	if mhz >= 1000 {
		mhz, unit = mhz/1000, " GHz"
	}
	v, _ := strconv.ParseFloat(strconv.FormatFloat(mhz, 'g', 3, 64), 64)
	return strconv.FormatFloat(v, 'f', -1, 64) + unit
}
