package parts

import (
	"fmt"
	"math"
)

// WireSpec is the [wire] table: the wire the coil is wound from.
type WireSpec struct {
	Material   string  `toml:"material"`    // material id from the library
	DiameterMM float64 `toml:"diameter_mm"` // bare wire diameter, 0.2–6 mm
}

// Limits of the [wire] table, in mm.
const (
	MinWireMM = 0.2
	MaxWireMM = 6.0
)

func (w *WireSpec) validate(c *checker, s *Spec) {
	if w.Material == "" {
		c.fail("wire.material", "", "is required", `add material = "copper-annealed" to [wire]`)
	}
	if !c.has("wire.diameter_mm") && w.DiameterMM == 0 {
		c.fail("wire.diameter_mm", "", fmt.Sprintf("is required: %s to %s mm", num(MinWireMM), num(MaxWireMM)), "add diameter_mm = 1.0 to [wire]")
		return
	}
	if math.IsNaN(w.DiameterMM) || !c.within("wire.diameter_mm", w.DiameterMM, MinWireMM, MaxWireMM, "mm") {
		return
	}
}
