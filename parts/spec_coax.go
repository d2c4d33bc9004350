package parts

// CoaxSpec is the [coax] table: the feed line from the connector to the coil.
type CoaxSpec struct {
	Type     string  `toml:"type"`      // "semi-rigid-141", "semi-rigid-086" or "rg316"
	LengthMM float64 `toml:"length_mm"` // feed line length, default 100 mm
}

func (x *CoaxSpec) validate(c *checker, _ *Spec) {
	c.oneOf("coax.type", &x.Type, "semi-rigid-141", "semi-rigid-141", "semi-rigid-086", "rg316")
	if !c.has("coax.length_mm") && x.LengthMM == 0 {
		x.LengthMM = 100
	}
	c.within("coax.length_mm", x.LengthMM, 10, 5000, "mm")
}
