package parts

// DowelSpec is the [dowel] table: the rod that supports the coil.
type DowelSpec struct {
	Material   string   `toml:"material"`    // "ptfe", "nylon", "glass-fibre" or "wood"
	DiameterMM *float64 `toml:"diameter_mm"` // omit for automatic
}

func (d *DowelSpec) validate(c *checker, _ *Spec) {
	c.oneOf("dowel.material", &d.Material, "ptfe", "ptfe", "nylon", "glass-fibre", "wood")
	if d.DiameterMM != nil {
		c.within("dowel.diameter_mm", *d.DiameterMM, 1, 100, "mm")
	}
}
