package parts

// ReflectorSpec is the [reflector] table: the ground plane behind the coil.
// With neither diameter_mm nor side_mm the size is chosen automatically.
type ReflectorSpec struct {
	Shape       string   `toml:"shape"`        // "disc" or "square"
	DiameterMM  *float64 `toml:"diameter_mm"`  // disc diameter
	SideMM      *float64 `toml:"side_mm"`      // square side
	ThicknessMM float64  `toml:"thickness_mm"` // sheet thickness, default 1.6 mm
}

// AutoReflectorLambda is the automatic reflector size in wavelengths (disc
// diameter or square side). Builders use 0.75–1.2 λ; DOMAIN §2, from memory.
const AutoReflectorLambda = 1.0

func (r *ReflectorSpec) validate(c *checker, s *Spec) {
	c.oneOf("reflector.shape", &r.Shape, "disc", "disc", "square")
	if r.Shape == "disc" && r.SideMM != nil {
		c.fail("reflector.side_mm", num(*r.SideMM), `applies only to shape = "square"`, "use diameter_mm for a disc")
	}
	if r.Shape == "square" && r.DiameterMM != nil {
		c.fail("reflector.diameter_mm", num(*r.DiameterMM), `applies only to shape = "disc"`, "use side_mm for a square")
	}
	for _, kv := range []struct {
		key string
		v   *float64
	}{{"reflector.diameter_mm", r.DiameterMM}, {"reflector.side_mm", r.SideMM}} {
		if kv.v != nil {
			c.within(kv.key, *kv.v, 5, 2000, "mm")
		}
	}
	if !c.has("reflector.thickness_mm") && r.ThicknessMM == 0 {
		r.ThicknessMM = 1.6
	}
	c.within("reflector.thickness_mm", r.ThicknessMM, 0.05, 10, "mm")
}

// SizeMM returns the reflector's diameter (disc) or side (square) in mm,
// choosing AutoReflectorLambda wavelengths when the spec gives none.
func (r *ReflectorSpec) SizeMM(lambda float64) float64 {
	switch {
	case r.DiameterMM != nil:
		return *r.DiameterMM
	case r.SideMM != nil:
		return *r.SideMM
	}
	return AutoReflectorLambda * lambda
}
