package spec

import (
	"fmt"
	"math"
	"slices"
)

// ReflectorSpec is the [reflector] table: the ground plane behind the coil.
// With neither diameter_mm nor side_mm the size is chosen automatically.
type ReflectorSpec struct {
	Shape          string   `toml:"shape"`            // "disc" or "square"
	DiameterMM     *float64 `toml:"diameter_mm"`      // disc diameter
	SideMM         *float64 `toml:"side_mm"`          // square side
	ThicknessMM    float64  `toml:"thickness_mm"`     // sheet thickness, default 1.6 mm
	Material       string   `toml:"material"`         // sheet material id, default "fr4"
	CornerRadiusMM float64  `toml:"corner_radius_mm"` // square corners, default 0
	Connector      string   `toml:"connector"`        // one of Connectors(): "coax", "sma-flange", "n-bulkhead", …
	FeedHoleMM     *float64 `toml:"feed_hole_mm"`     // feed hole diameter, default from the coax or connector
	MountingHoles  int      `toml:"mounting_holes"`   // count, default 0
	MountingHoleMM float64  `toml:"mounting_hole_mm"` // diameter, default 3.2 mm
	// MountingCircleMM is the pitch circle of the mounting holes; default
	// the plate's inscribed circle less 12 mm.
	MountingCircleMM *float64 `toml:"mounting_circle_mm"`
	MountingAngleDeg float64  `toml:"mounting_angle_deg"` // first hole's angle, default 45°
}

// AutoReflectorLambda is the automatic reflector size in wavelengths (disc
// diameter or square side). Builders use 0.75–1.2 λ (from memory).
const AutoReflectorLambda = 1.0

// SheetMaterial is a plate or strip material the cutting outputs know.
type SheetMaterial struct {
	ID   string
	Name string
	// Halogenated marks laminates whose resin carries halogen flame
	// retardants: cutting them by laser releases toxic fumes.
	Halogenated bool
	// Reflective marks metals that reflect a CO₂ laser's 10.6 µm beam
	// and need a fibre laser to cut.
	Reflective bool
	// Joint is how the feed's outer conductor is grounded to a plate of
	// this material: "clad" (solder on the copper face), "solder" or
	// "clamp" (cannot be soft-soldered with ordinary flux).
	Joint string
	// Conductivity of the conducting face at 20 °C, S/m, for the field
	// solver's plate loss; ConductivitySource cites it.
	Conductivity       float64
	ConductivitySource string
	// Magnetic marks a ferromagnetic sheet (lossier at radio frequencies
	// than the non-magnetic loss model assumes).
	Magnetic bool
}

// sheetMaterials lists the reflector and wedge materials; SheetMaterials
// hands out copies.
// Source: Barontini et al., Ind. Eng. Chem. Res. 44, 2005 (brominated
// epoxy in FR-4 laminates).
//
// Conductivities as % IACS × 58.0 MS/m (Source: IEC 60028 for the scale).
var sheetMaterials = []SheetMaterial{
	{ID: "fr4", Name: "FR-4 copper-clad glass-epoxy laminate", Halogenated: true, Joint: "clad",
		Conductivity: 58.0e6, ConductivitySource: "copper cladding, 100 % IACS: IEC 60028"},
	{ID: "aluminium", Name: "aluminium sheet", Reflective: true, Joint: "clamp",
		Conductivity: 0.35 * 58.0e6, ConductivitySource: "alloy not specified: 5052 taken, ≈ 35 % IACS, the lower of common sheet alloys (from memory)"},
	{ID: "brass", Name: "brass sheet", Reflective: true, Joint: "solder",
		Conductivity: 0.28 * 58.0e6, ConductivitySource: "C26000, ≈ 28 % IACS: Copper Development Association data, from memory"},
	{ID: "copper", Name: "copper sheet", Reflective: true, Joint: "solder",
		Conductivity: 58.0e6, ConductivitySource: "annealed copper, 100 % IACS: IEC 60028"},
	{ID: "tinplate", Name: "tinplate (tinned steel)", Joint: "solder",
		Conductivity: 0.10 * 58.0e6, ConductivitySource: "low-carbon steel, ≈ 10 % IACS, from memory; the thin tin coat is neglected", Magnetic: true},
}

// Reflective and Joint above: common practice (no published source).
// Copper, brass and aluminium reflect most of a CO₂ laser's 10.6 µm beam,
// so hobby CO₂ cutters do not cut them and a fibre laser is used;
// aluminium's oxide film stops ordinary rosin or zinc-chloride flux from
// wetting it, so it is clamped or screwed rather than soft-soldered.

// SheetMaterials returns the reflector and wedge materials, a fresh copy
// the caller may change.
func SheetMaterials() []SheetMaterial { return slices.Clone(sheetMaterials) }

// SheetMaterialByID returns the material with the given id.
func SheetMaterialByID(id string) (SheetMaterial, bool) {
	for _, m := range sheetMaterials {
		if m.ID == id {
			return m, true
		}
	}
	return SheetMaterial{}, false
}

func sheetMaterialIDs() []string {
	ids := make([]string, len(sheetMaterials))
	for i, m := range sheetMaterials {
		ids[i] = m.ID
	}
	return ids
}

// Mounting-hole defaults. Common practice (no published source): M3
// clearance holes about 6 mm in from the edge.
const (
	DefaultMountingHoleMM   = 3.2
	mountingInsetMM         = 6.0
	DefaultMountingAngleDeg = 45.0
)

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
	c.orDefault("reflector.thickness_mm", &r.ThicknessMM, 1.6)
	c.within("reflector.thickness_mm", r.ThicknessMM, 0.05, 10, "mm")

	c.oneOf("reflector.material", &r.Material, "fr4", sheetMaterialIDs()...)
	c.oneOf("reflector.connector", &r.Connector, "coax", connectorIDs()...)
	size := r.SizeMM(s.Wavelength())
	if r.CornerRadiusMM != 0 {
		if r.Shape != "square" {
			c.fail("reflector.corner_radius_mm", num(r.CornerRadiusMM), `applies only to shape = "square"`, "delete it for a disc")
		} else if !(r.CornerRadiusMM > 0 && r.CornerRadiusMM < size/2) {
			c.fail("reflector.corner_radius_mm", num(r.CornerRadiusMM), fmt.Sprintf("must be above 0 and below half the side (%s mm)", num(size/2)), "give a smaller radius")
		}
	}
	if r.FeedHoleMM != nil {
		c.within("reflector.feed_hole_mm", *r.FeedHoleMM, 0.5, 30, "mm")
	}
	if r.MountingHoles < 0 || r.MountingHoles > 12 {
		c.fail("reflector.mounting_holes", fmt.Sprint(r.MountingHoles), "must be between 0 and 12", "give the number of mounting holes")
	}
	c.orDefault("reflector.mounting_hole_mm", &r.MountingHoleMM, DefaultMountingHoleMM)
	c.within("reflector.mounting_hole_mm", r.MountingHoleMM, 1, 20, "mm")
	if r.MountingCircleMM != nil {
		c.within("reflector.mounting_circle_mm", *r.MountingCircleMM, 2, 2000, "mm")
	}
	c.orDefault("reflector.mounting_angle_deg", &r.MountingAngleDeg, DefaultMountingAngleDeg)
	if math.IsNaN(r.MountingAngleDeg) || !c.within("reflector.mounting_angle_deg", r.MountingAngleDeg, -360, 360, "degrees") {
		return
	}
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

// MountingCircle returns the mounting holes' pitch-circle diameter in mm
// for a plate of the given size.
func (r *ReflectorSpec) MountingCircle(size float64) float64 {
	if r.MountingCircleMM != nil {
		return *r.MountingCircleMM
	}
	return size - 2*mountingInsetMM
}
