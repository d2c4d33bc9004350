package spec

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

// The range of a rod diameter the spec may give, mm: MinDowelMM to
// maxDowelMM.
const (
	MinDowelMM = 1.0
	maxDowelMM = 100.0
)

func (d *DowelSpec) validate(c *checker, _ *Spec) {
	c.oneOf("dowel.material", &d.Material, "ptfe", "ptfe", "nylon", "glass-fibre", "wood")
	if d.DiameterMM != nil {
		c.within("dowel.diameter_mm", *d.DiameterMM, MinDowelMM, maxDowelMM, "mm")
	}
	c.orDefault("dowel.clearance_mm", &d.ClearanceMM, DefaultDowelClearanceMM)
	c.within("dowel.clearance_mm", d.ClearanceMM, 0, 20, "mm")
}
