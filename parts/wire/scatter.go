// Batch-to-batch scatter of a material's yield.
//
// Drawn wire of one temper differs from lot to lot and supplier to
// supplier. Where the material's source gives a yield range, the range is
// taken as ±2 standard deviations about its middle; where it gives only a
// tensile range (mill limits), the yield is taken to scatter like the
// tensile strength. Common practice (no published source): a published
// range or mill limit spans about ±2σ of production, and yield and tensile
// strength of one temper move together.

package wire

import "fmt"

// yieldRange is a published yield range in MPa and its source.
type yieldRange struct {
	lo, hi float64
	source string
}

// yieldRanges returns the yield ranges the library's sources give, by id.
func yieldRanges() map[string]yieldRange {
	cu := yieldRange{70, 100, "annealed copper yield 70–100 MPa (ASTM B3 via supplier data)"}
	return map[string]yieldRange{
		"copper-annealed":        cu,
		"copper-silver-plated":   cu,
		"copper-enamelled":       cu,
		"brass-c26000-soft":      {110, 158, "C26000 annealed yield 110–158 MPa (supplier wire datasheet)"},
		"brass-cuzn37":           {390, 420, "CuZn37 quarter-hard Rp0.2 390–420 MPa (EN 12166, table partly unverified)"},
		"bronze-cusn6-half-hard": {390, 450, "CuSn6 half-hard Rp0.2 390–450 MPa (EN 12166)"},
		"steel-galvanised-soft":  {250, 350, "soft galvanised steel yield 250–350 MPa (from memory)"},
	}
}

// Scatter is a material's yield scatter from lot to lot.
type Scatter struct {
	// CV is the coefficient of variation of the yield (standard deviation
	// over mean), as a fraction.
	CV float64
	// Source says where the range came from and how it was read.
	Source string
}

// YieldScatter returns the lot-to-lot scatter of material m's yield: from
// its published yield range where the library's source gives one, else
// from its tensile range.
func YieldScatter(m Material) Scatter {
	if r, ok := yieldRanges()[m.ID]; ok {
		return Scatter{CV: rangeCV(r.lo, r.hi), Source: r.source + ", taken as ±2σ"}
	}
	return Scatter{CV: rangeCV(m.TensileMin, m.TensileMax),
		Source: fmt.Sprintf("tensile range %g–%g MPa taken as ±2σ of the yield (%s)", m.TensileMin, m.TensileMax, m.Source)}
}

// rangeCV returns the coefficient of variation of a quantity whose range
// lo–hi spans ±2σ about its middle: (hi − lo)/(4·mid).
func rangeCV(lo, hi float64) float64 {
	return (hi - lo) / (2 * (lo + hi))
}
