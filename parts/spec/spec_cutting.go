package spec

import (
	"fmt"
	"math"
	"strings"
)

// CuttingSpec is the [cutting] table: how the reflector and wedge are cut,
// the sheet a batch is nested on, and the paper and DXF flavour of the
// outputs.
type CuttingSpec struct {
	Method        string   `toml:"method"`          // "mill", "shear", "pcb-fab" or "laser"
	KerfMM        *float64 `toml:"kerf_mm"`         // width the tool removes; default by method
	SheetWidthMM  float64  `toml:"sheet_width_mm"`  // stock sheet, default 300 mm (or enough for the reflector)
	SheetHeightMM float64  `toml:"sheet_height_mm"` // stock sheet, default 200 mm (or enough for the reflector)
	MarginMM      float64  `toml:"margin_mm"`       // clear border, default 5 mm
	SpacingMM     float64  `toml:"spacing_mm"`      // between parts' cut paths, default 3 mm
	Paper         string   `toml:"paper"`           // template paper, "A4" or "Letter"
	DXF           string   `toml:"dxf"`             // "R12" or "R2000"
	// ToolPath adds the tool-centre path (the CUT outline offset by half
	// the kerf) on a layer of its own, TOOLPATH; the CUT layer is always
	// the true part outline.
	ToolPath bool `toml:"tool_path"`
}

// Cutting defaults. Common practice (no published source): a 1 mm end mill
// for plates, about 0.15 mm for a fibre laser, no kerf for shears and for
// a board house (which routes to the drawn outline).
const (
	DefaultSheetWidthMM  = 300.0
	DefaultSheetHeightMM = 200.0
	DefaultMarginMM      = 5.0
	DefaultSpacingMM     = 3.0
)

// DefaultKerfMM returns the default kerf in mm for a cutting method.
func DefaultKerfMM(method string) float64 {
	switch method {
	case "mill":
		return 1.0
	case "laser":
		return 0.15
	}
	return 0
}

func (x *CuttingSpec) validate(c *checker, s *Spec) {
	c.oneOf("cutting.method", &x.Method, "mill", "mill", "shear", "pcb-fab", "laser")
	if x.KerfMM != nil {
		c.within("cutting.kerf_mm", *x.KerfMM, 0, 5, "mm")
	}
	c.orDefault("cutting.sheet_width_mm", &x.SheetWidthMM, DefaultSheetWidthMM)
	c.orDefault("cutting.sheet_height_mm", &x.SheetHeightMM, DefaultSheetHeightMM)
	c.orDefault("cutting.margin_mm", &x.MarginMM, DefaultMarginMM)
	c.orDefault("cutting.spacing_mm", &x.SpacingMM, DefaultSpacingMM)
	c.within("cutting.sheet_width_mm", x.SheetWidthMM, 20, 5000, "mm")
	c.within("cutting.sheet_height_mm", x.SheetHeightMM, 20, 5000, "mm")
	c.within("cutting.margin_mm", x.MarginMM, 0, 100, "mm")
	c.within("cutting.spacing_mm", x.SpacingMM, 0, 100, "mm")
	c.oneOf("cutting.paper", &x.Paper, "A4", "A4", "Letter")
	c.oneOf("cutting.dxf", &x.DXF, "R12", "R12", "R2000")
	if x.Method == "laser" && x.KerfMM != nil && *x.KerfMM == 0 {
		c.fail("cutting.kerf_mm", "0", "a laser always removes some material", fmt.Sprintf("give the measured kerf, about %s mm", num(DefaultKerfMM("laser"))))
	}
}

// sheetStepMM rounds up a default sheet enlarged to hold the reflector.
// Common practice (no published source): sheet is sold in round sizes.
const sheetStepMM = 10.0

// validateFit checks that one reflector, kerf included, fits the stock
// sheet inside its margins. A sheet side the spec leaves out grows to hold
// it (rounded up to sheetStepMM); one the spec gives that is too small is
// an error.
func (x *CuttingSpec) validateFit(c *checker, s *Spec) {
	size := s.Reflector.SizeMM(s.Wavelength())
	need := size + x.Kerf() + 2*x.MarginMM
	for _, side := range []struct {
		key string
		v   *float64
	}{{"cutting.sheet_width_mm", &x.SheetWidthMM}, {"cutting.sheet_height_mm", &x.SheetHeightMM}} {
		if *side.v >= need {
			continue
		}
		up := math.Ceil(need/sheetStepMM) * sheetStepMM
		if !c.has(side.key) {
			*side.v = up
			continue
		}
		c.fail(side.key, num(*side.v), fmt.Sprintf("is too small for the reflector: %.1f mm across, %s mm kerf and two %s mm margins need %.1f mm", size, num(x.Kerf()), num(x.MarginMM), need),
			fmt.Sprintf("set %s = %s or more, or leave it out to size the sheet to the reflector", side.key[strings.LastIndex(side.key, ".")+1:], num(up)))
	}
}

// Kerf returns the kerf in mm: the spec's value or the method's default.
func (x *CuttingSpec) Kerf() float64 {
	if x.KerfMM != nil {
		return *x.KerfMM
	}
	return DefaultKerfMM(x.Method)
}
