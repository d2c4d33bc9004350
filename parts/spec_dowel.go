package parts

import "fmt"

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

func (d *DowelSpec) validate(c *checker, _ *Spec) {
	c.oneOf("dowel.material", &d.Material, "ptfe", "ptfe", "nylon", "glass-fibre", "wood")
	if d.DiameterMM != nil {
		c.within("dowel.diameter_mm", *d.DiameterMM, 1, 100, "mm")
	}
	c.orDefault("dowel.clearance_mm", &d.ClearanceMM, DefaultDowelClearanceMM)
	c.within("dowel.clearance_mm", d.ClearanceMM, 0, 20, "mm")
}

// validateFit checks that a given rod passes inside the smallest turn. It
// runs only on a spec whose fields are each valid.
func (d *DowelSpec) validateFit(c *checker, s *Spec) {
	coil, err := coilFromSpec(s)
	if err != nil || d.DiameterMM == nil {
		return
	}
	inner := 2*smallestTurnRadius(coil) - s.Wire.DiameterMM
	if room := inner - 2*d.ClearanceMM; *d.DiameterMM > room+1e-9 {
		c.fail("dowel.diameter_mm", num(*d.DiameterMM), fmt.Sprintf("does not pass inside the smallest turn (%.2f mm inside) with %s mm clearance all round", inner, num(d.ClearanceMM)),
			fmt.Sprintf("use a rod of at most %.1f mm, or omit diameter_mm to choose one", room))
	}
}
