package spec

import (
	"fmt"
	"maps"
)

// CoaxSpec is the [coax] table: the feed line from the connector to the
// coil. The cable's diameters come from CoaxTypes() unless given here.
type CoaxSpec struct {
	Type     string  `toml:"type"`      // one of CoaxTypeIDs: "semi-rigid-141", "rg58", …
	LengthMM float64 `toml:"length_mm"` // connector to the reflector's back face, default 100 mm

	OuterDiameterMM      *float64 `toml:"outer_diameter_mm"`      // over the outer conductor or jacket (optional)
	DielectricDiameterMM *float64 `toml:"dielectric_diameter_mm"` // over the dielectric (optional)
	CentreDiameterMM     *float64 `toml:"centre_diameter_mm"`     // centre conductor (optional)
}

// CoaxType is the published data of one cable type, in mm. Braided is true
// for a braided outer conductor under a jacket (flared and soldered to the
// reflector), false for a solid tube (soldered as it is).
type CoaxType struct {
	Name       string
	Outer      float64 // over the outer conductor or jacket, mm
	Dielectric float64 // over the PTFE dielectric, mm
	Centre     float64 // centre conductor, mm
	Braided    bool
	// Impedance is the maker's nominal characteristic impedance, Ω.
	Impedance float64
	// Permittivity is the dielectric's relative permittivity.
	Permittivity float64
	Source       string
}

// FeedHoleMM returns the diameter in mm of the reflector hole the cable
// passes from behind: over a solid outer conductor, or over the dielectric
// of a braided cable (whose braid is flared and soldered to the back face),
// plus FeedHoleClearanceMM.
func (t CoaxType) FeedHoleMM() float64 {
	if t.Braided {
		return t.Dielectric + FeedHoleClearanceMM
	}
	return t.Outer + FeedHoleClearanceMM
}

// coaxTypes lists the cable types the spec accepts, by spec name;
// CoaxTypes and CoaxTypeByID hand out copies.
var coaxTypes = map[string]CoaxType{
	// Source: published cable data for 0.141 in semi-rigid (RG-402).
	"semi-rigid-141": {Name: "0.141 in semi-rigid (RG-402 class)", Outer: 3.58, Dielectric: 2.985, Centre: 0.92, Impedance: 50, Permittivity: 2.03,
		Source: "published 0.141 in semi-rigid cable data"},
	// From memory: 0.086 in semi-rigid (RG-405 class).
	"semi-rigid-086": {Name: "0.086 in semi-rigid (RG-405 class)", Outer: 2.197, Dielectric: 1.68, Centre: 0.511, Impedance: 50, Permittivity: 2.03,
		Source: "from memory; check the cable maker's sheet"},
	// Source: IS 11967 (Part 3/Sec 1) for jacket and dielectric; centre
	// conductor (7 × 0.17 mm strands, about 0.51 mm over the strands) from
	// memory.
	"rg316": {Name: "RG-316 braided", Outer: 2.49, Dielectric: 1.52, Centre: 0.51, Braided: true, Impedance: 50, Permittivity: 2.03,
		Source: "IS 11967 (Part 3/Sec 1); centre conductor from memory"},
	// Source: P. Harden, "Coaxial Cable Specifications" data sheet
	// (RG-58/U: solid 0.032 in centre, PE 0.116 in, jacket 0.193 in).
	"rg58": {Name: "RG-58/U braided", Outer: 4.90, Dielectric: 2.95, Centre: 0.81, Braided: true, Impedance: 50, Permittivity: 2.25,
		Source: "P. Harden, Coaxial Cable Specifications (0.032 / 0.116 / 0.193 in)"},
	// From memory: RG-142 (MIL-C-17), silver-plated copper-clad steel
	// centre 0.94 mm, PTFE 2.95 mm, double braid, FEP jacket 4.95 mm.
	"rg142": {Name: "RG-142 double-braided", Outer: 4.95, Dielectric: 2.95, Centre: 0.94, Braided: true, Impedance: 50, Permittivity: 2.03,
		Source: "from memory; check the cable maker's sheet"},
	// Source: P. Harden, "Coaxial Cable Specifications" data sheet
	// (RG-174: 7/34 centre 0.019 in, PE 0.060 in, jacket 0.101 in).
	"rg174": {Name: "RG-174 braided", Outer: 2.57, Dielectric: 1.52, Centre: 0.48, Braided: true, Impedance: 50, Permittivity: 2.25,
		Source: "P. Harden, Coaxial Cable Specifications (0.019 / 0.060 / 0.101 in)"},
}

// CoaxTypes returns the cable types the spec accepts, by spec name, a
// fresh map the caller may change.
func CoaxTypes() map[string]CoaxType { return maps.Clone(coaxTypes) }

// CoaxTypeByID returns the published data of the cable type with the spec
// name id.
func CoaxTypeByID(id string) (CoaxType, bool) {
	t, ok := coaxTypes[id]
	return t, ok
}

// CoaxTypeIDs returns the spec names of the cable types, in the order the
// reference spec lists them.
func CoaxTypeIDs() []string {
	return []string{"semi-rigid-141", "semi-rigid-086", "rg316", "rg58", "rg142", "rg174"}
}

func (x *CoaxSpec) validate(c *checker, _ *Spec) {
	c.oneOf("coax.type", &x.Type, "semi-rigid-141", CoaxTypeIDs()...)
	c.orDefault("coax.length_mm", &x.LengthMM, 100)
	c.within("coax.length_mm", x.LengthMM, 10, 5000, "mm")
	for _, kv := range []struct {
		key string
		v   *float64
	}{{"coax.outer_diameter_mm", x.OuterDiameterMM}, {"coax.dielectric_diameter_mm", x.DielectricDiameterMM}, {"coax.centre_diameter_mm", x.CentreDiameterMM}} {
		if kv.v != nil {
			c.within(kv.key, *kv.v, 0.1, 30, "mm")
		}
	}
	if _, ok := coaxTypes[x.Type]; !ok {
		return
	}
	t := x.Cable()
	if !(t.Centre < t.Dielectric && t.Dielectric < t.Outer) {
		c.fail("coax.dielectric_diameter_mm", num(t.Dielectric), fmt.Sprintf("must lie between the centre conductor (%s mm) and the outer diameter (%s mm)", num(t.Centre), num(t.Outer)),
			"check the three diameters against the cable maker's sheet")
	}
}

// Cable returns the cable data for the spec's type with any diameters the
// spec gives in place of the published ones. The spec must be validated.
func (x *CoaxSpec) Cable() CoaxType {
	t := coaxTypes[x.Type]
	set := func(dst *float64, v *float64) {
		if v != nil {
			*dst = *v
			t.Source = "diameters from the spec"
		}
	}
	set(&t.Outer, x.OuterDiameterMM)
	set(&t.Dielectric, x.DielectricDiameterMM)
	set(&t.Centre, x.CentreDiameterMM)
	return t
}
