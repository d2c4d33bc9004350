package parts

import (
	"fmt"
	"math"
)

// DowelSpec is the [dowel] table: the rod that supports the coil.
type DowelSpec struct {
	Material    string   `toml:"material"`     // "ptfe", "nylon", "glass-fibre" or "wood"
	DiameterMM  *float64 `toml:"diameter_mm"`  // omit for automatic
	ClearanceMM float64  `toml:"clearance_mm"` // radial gap inside the smallest turn, default 1 mm
}

// DefaultDowelClearanceMM is the default radial gap between the rod and the
// inside of the smallest relaxed turn: enough to slide the released coil on
// and small enough for an epoxy bead to bridge. Common practice (no
// published source).
const DefaultDowelClearanceMM = 1.0

// The range of a rod diameter the spec may give, mm.
const (
	minDowelMM = 1.0
	maxDowelMM = 100.0
)

// minDowelClearanceMM is the least default clearance: on a coil too small
// for the smallest stock rod with DefaultDowelClearanceMM all round, the
// default closes down to this, in 0.05 mm steps, before the spec is
// refused. Common practice (no published source): below a quarter of a
// millimetre the released coil no longer slides on.
const minDowelClearanceMM = 0.25

func (d *DowelSpec) validate(c *checker, _ *Spec) {
	c.oneOf("dowel.material", &d.Material, "ptfe", "ptfe", "nylon", "glass-fibre", "wood")
	if d.DiameterMM != nil {
		c.within("dowel.diameter_mm", *d.DiameterMM, minDowelMM, maxDowelMM, "mm")
	}
	c.orDefault("dowel.clearance_mm", &d.ClearanceMM, DefaultDowelClearanceMM)
	c.within("dowel.clearance_mm", d.ClearanceMM, 0, 20, "mm")
}

// validateFit checks that a given rod, or else the smallest stock rod,
// passes inside the smallest turn, closing the default clearance down when
// that makes room. It runs only on a spec whose fields are each valid.
func (d *DowelSpec) validateFit(c *checker, s *Spec) {
	coil, err := coilFromSpec(s)
	if err != nil {
		return
	}
	inner := 2*smallestTurnRadius(coil) - s.Wire.DiameterMM
	if d.DiameterMM == nil {
		smallest := DowelDiametersMM()[0]
		if inner-2*d.ClearanceMM >= smallest-1e-9 {
			return
		}
		if !c.has("dowel.clearance_mm") {
			if fit := math.Floor((inner-smallest)/2/0.05+1e-9) * 0.05; fit >= minDowelClearanceMM {
				d.ClearanceMM = fit
				return
			}
		}
		fix := fmt.Sprintf("reduce the clearance to at most %.2f mm, give a thinner dowel.diameter_mm, or support the coil from outside", (inner-smallest)/2)
		if inner < smallest {
			fix = fmt.Sprintf("give a rod thinner than the stock sizes: dowel.diameter_mm plus twice clearance_mm at most %.2f mm; or support the coil from outside", inner)
		}
		c.fail("dowel.clearance_mm", num(d.ClearanceMM), fmt.Sprintf("leaves %.2f mm inside the smallest turn (%.2f mm inside): no stock rod of %s mm or more fits", inner-2*d.ClearanceMM, inner, num(smallest)), fix)
		return
	}
	if room := inner - 2*d.ClearanceMM; *d.DiameterMM > room+1e-9 {
		fix := fmt.Sprintf("use a rod of at most %.1f mm, or omit diameter_mm to choose one", room)
		if room < minDowelMM {
			fix = fmt.Sprintf("reduce clearance_mm: the rod plus twice the clearance must stay within %.2f mm", inner)
		}
		c.fail("dowel.diameter_mm", num(*d.DiameterMM), fmt.Sprintf("does not pass inside the smallest turn (%.2f mm inside) with %s mm clearance all round", inner, num(d.ClearanceMM)), fix)
	}
}
