package spec

import (
	"fmt"
	"math"
)

// FormerSpec is the [former] table: the printed winding former. Every size
// is in mm and every angle in degrees; an absent or zero key takes the
// default given beside it (a zero written in the spec stays zero where zero
// is allowed). The defaults suit a 0.4 mm FDM nozzle and 0.2 mm layers.
type FormerSpec struct {
	ClearanceMM       float64 `toml:"clearance_mm"`        // groove width over the wire, default 0.2, 0–1
	GrooveDepthRatio  float64 `toml:"groove_depth_ratio"`  // groove depth in wire diameters, default 0.6, 0.3–0.9
	GrooveProfile     string  `toml:"groove_profile"`      // "teardrop" (45° roof, default) or "round"
	LeadInDeg         float64 `toml:"lead_in_deg"`         // groove before the start, rising out, default 45, 0–180
	RunOutDeg         float64 `toml:"run_out_deg"`         // groove past the end, rising out, default 90, 0–360
	LockHoleDepthMM   float64 `toml:"lock_hole_depth_mm"`  // radial wire-lock hole below the groove, default 5, 1–30
	StopNotchMM       float64 `toml:"stop_notch_mm"`       // width of the stop notch at the end, default 1.2, 0.5–5
	FlangeMarginMM    float64 `toml:"flange_margin_mm"`    // flange beyond the core, default 7, 3–50
	FlangeThicknessMM float64 `toml:"flange_thickness_mm"` // default 4, 2–20
	FlatDepthMM       float64 `toml:"flat_depth_mm"`       // depth of each vice flat, default 1.5, 0–10
	ChamferMM         float64 `toml:"chamfer_mm"`          // 45° chamfer on outer edges, default 0.6, 0–3
	FilletMM          float64 `toml:"fillet_mm"`           // rounding of inner corners and groove lips, default 0.5, 0–3
	Drive             string  `toml:"drive"`               // "hex" (1/4 in socket, default) or "bore" (through-bore)
	HexAcrossFlatsMM  float64 `toml:"hex_across_flats_mm"` // socket across flats, default 6.6 (6.35 + clearance), 3–20
	HexDepthMM        float64 `toml:"hex_depth_mm"`        // socket depth, default 10, 3–50
	BoreDiameterMM    float64 `toml:"bore_diameter_mm"`    // through-bore, default the dowel diameter or 6.5, 1–100
	EngraveDepthMM    float64 `toml:"engrave_depth_mm"`    // depth of the flange lettering, default 0.6, 0.2–2
	TextHeightMM      float64 `toml:"text_height_mm"`      // flange letter height, default 3.5, 2–10
	EndMarginMM       float64 `toml:"end_margin_mm"`       // core beyond the groove at the free end, default 3, 0.5–50
	ToleranceMM       float64 `toml:"tolerance_mm"`        // mesh distance from the true surface, default 0.05, 0.01–0.5
	PrintHeightMM     float64 `toml:"print_height_mm"`     // tallest former the printer takes, default 250, 20–2000
	PrintWidthMM      float64 `toml:"print_width_mm"`      // widest former the printer takes, default 220, 20–2000
}

// Former defaults. Common practice (no published source).
const (
	DefaultFormerToleranceMM = 0.05
	hexDriveMM               = 6.35 // 1/4 inch hex drive across flats
)

func (f *FormerSpec) validate(c *checker, s *Spec) {
	def := c.orDefault
	def("former.clearance_mm", &f.ClearanceMM, 0.2)
	def("former.groove_depth_ratio", &f.GrooveDepthRatio, 0.6)
	def("former.lead_in_deg", &f.LeadInDeg, 45)
	def("former.run_out_deg", &f.RunOutDeg, 90)
	def("former.lock_hole_depth_mm", &f.LockHoleDepthMM, 5)
	def("former.stop_notch_mm", &f.StopNotchMM, 1.2)
	def("former.flange_margin_mm", &f.FlangeMarginMM, 7)
	def("former.flange_thickness_mm", &f.FlangeThicknessMM, 4)
	def("former.flat_depth_mm", &f.FlatDepthMM, 1.5)
	def("former.chamfer_mm", &f.ChamferMM, 0.6)
	def("former.fillet_mm", &f.FilletMM, 0.5)
	def("former.hex_across_flats_mm", &f.HexAcrossFlatsMM, hexDriveMM+0.25)
	def("former.hex_depth_mm", &f.HexDepthMM, 10)
	bore := 6.5
	if s.Dowel.DiameterMM != nil {
		bore = *s.Dowel.DiameterMM
	}
	def("former.bore_diameter_mm", &f.BoreDiameterMM, bore)
	def("former.engrave_depth_mm", &f.EngraveDepthMM, 0.6)
	def("former.text_height_mm", &f.TextHeightMM, 3.5)
	def("former.end_margin_mm", &f.EndMarginMM, 3)
	def("former.tolerance_mm", &f.ToleranceMM, DefaultFormerToleranceMM)
	// A common desktop FDM print volume, about 220 × 220 × 250 mm. Common
	// practice (no published source).
	def("former.print_height_mm", &f.PrintHeightMM, 250)
	def("former.print_width_mm", &f.PrintWidthMM, 220)
	c.oneOf("former.groove_profile", &f.GrooveProfile, "teardrop", "teardrop", "round")
	c.oneOf("former.drive", &f.Drive, "hex", "hex", "bore")
	for _, r := range []struct {
		key    string
		v      float64
		lo, hi float64
		unit   string
	}{
		{"former.clearance_mm", f.ClearanceMM, 0, 1, "mm"},
		{"former.groove_depth_ratio", f.GrooveDepthRatio, 0.3, 0.9, "wire diameters"},
		{"former.lead_in_deg", f.LeadInDeg, 0, 180, "degrees"},
		{"former.run_out_deg", f.RunOutDeg, 0, 360, "degrees"},
		{"former.lock_hole_depth_mm", f.LockHoleDepthMM, 1, 30, "mm"},
		{"former.stop_notch_mm", f.StopNotchMM, 0.5, 5, "mm"},
		{"former.flange_margin_mm", f.FlangeMarginMM, 3, 50, "mm"},
		{"former.flange_thickness_mm", f.FlangeThicknessMM, 2, 20, "mm"},
		{"former.flat_depth_mm", f.FlatDepthMM, 0, 10, "mm"},
		{"former.chamfer_mm", f.ChamferMM, 0, 3, "mm"},
		{"former.fillet_mm", f.FilletMM, 0, 3, "mm"},
		{"former.hex_across_flats_mm", f.HexAcrossFlatsMM, 3, 20, "mm"},
		{"former.hex_depth_mm", f.HexDepthMM, 3, 50, "mm"},
		{"former.bore_diameter_mm", f.BoreDiameterMM, 1, 100, "mm"},
		{"former.engrave_depth_mm", f.EngraveDepthMM, 0.2, 2, "mm"},
		{"former.text_height_mm", f.TextHeightMM, 2, 10, "mm"},
		{"former.end_margin_mm", f.EndMarginMM, 0.5, 50, "mm"},
		{"former.tolerance_mm", f.ToleranceMM, 0.01, 0.5, "mm"},
		{"former.print_height_mm", f.PrintHeightMM, 20, 2000, "mm"},
		{"former.print_width_mm", f.PrintWidthMM, 20, 2000, "mm"},
	} {
		if math.IsNaN(r.v) {
			c.fail(r.key, "NaN", "must be a number", "give a number")
			continue
		}
		c.within(r.key, r.v, r.lo, r.hi, r.unit)
	}
	if f.FlatDepthMM >= f.FlangeMarginMM {
		c.fail("former.flat_depth_mm", num(f.FlatDepthMM), fmt.Sprintf("must be less than flange_margin_mm = %s so the flats stay on the flange", num(f.FlangeMarginMM)), "make the flats shallower or the flange wider")
	}
	if 2*f.ChamferMM >= f.FlangeThicknessMM {
		c.fail("former.chamfer_mm", num(f.ChamferMM), fmt.Sprintf("must be less than half of flange_thickness_mm = %s", num(f.FlangeThicknessMM)), "use a smaller chamfer")
	}
	if f.EngraveDepthMM >= f.FlangeThicknessMM/2 {
		c.fail("former.engrave_depth_mm", num(f.EngraveDepthMM), fmt.Sprintf("must be less than half of flange_thickness_mm = %s", num(f.FlangeThicknessMM)), "engrave shallower")
	}
}
