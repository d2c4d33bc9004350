package report

import (
	"math"

	"coilwright/parts"
)

// WireReport is the wire and springback section of the design report.
type WireReport struct {
	Material         string   `json:"material"` // library id
	MaterialName     string   `json:"material_name"`
	DiameterMM       float64  `json:"diameter_mm"`
	SpringbackModel  string   `json:"springback_model"` // "perfectly-plastic" or "hardening"
	YoungsModulusGPa float64  `json:"youngs_modulus_gpa"`
	YieldMPa         float64  `json:"yield_mpa"` // yield the model uses (calibrated when calibrated)
	LibraryYieldMPa  float64  `json:"library_yield_mpa"`
	Calibration      string   `json:"calibration,omitempty"` // calibration file as named in the spec
	Calibrated       bool     `json:"calibrated"`
	Elongation       float64  `json:"elongation"`       // fraction at break
	MaxOuterStrain   float64  `json:"max_outer_strain"` // largest outer-fibre strain on the former
	Solderability    string   `json:"solderability"`
	Cautions         []string `json:"cautions"`
	Source           string   `json:"source"`
	// ConductivityMSm is the conductivity the field solver uses, MS/m.
	ConductivityMSm    float64 `json:"conductivity_ms_per_m"`
	ConductivitySource string  `json:"conductivity_source"`
}

// FormerReport describes the springback-compensated former path.
type FormerReport struct {
	BaseDiameterMM float64 `json:"base_diameter_mm"` // wire centreline in the groove at the feed end
	TopDiameterMM  float64 `json:"top_diameter_mm"`  // wire centreline in the groove at the open end
	PitchMode      string  `json:"pitch_mode"`
	SpacingMM      float64 `json:"spacing_mm"`      // axial advance per turn at the feed end, held from the coil
	PitchAngleDeg  float64 `json:"pitch_angle_deg"` // pitch angle on the former at the feed end
}

// wireReport fills the report's wire section.
func wireReport(d *parts.Design) WireReport {
	w, m := d.Wire, d.Wire.Material
	r := WireReport{
		Material: m.ID, MaterialName: m.Name, DiameterMM: w.Diameter,
		SpringbackModel:  d.Spec.Wire.SpringbackModel,
		YoungsModulusGPa: m.YoungsModulus / 1000, YieldMPa: m.Yield, LibraryYieldMPa: w.LibraryYield,
		Calibration: d.Spec.Wire.Calibration, Calibrated: w.Calibration != nil,
		Elongation: m.Elongation, Solderability: string(m.Solderability), Cautions: []string{}, Source: m.Source,
		ConductivityMSm: m.Conductivity / 1e6, ConductivitySource: m.ConductivitySource,
	}
	for _, c := range m.Cautions {
		r.Cautions = append(r.Cautions, c.Text())
	}
	for _, t := range d.Turns {
		r.MaxOuterStrain = math.Max(r.MaxOuterStrain, t.OuterStrain)
	}
	return r
}

// formerReport fills the report's former section.
func formerReport(d *parts.Design) FormerReport {
	f := d.Former
	mode := "constant_spacing"
	if f.Mode == parts.ConstantAngle {
		mode = "constant_angle"
	}
	return FormerReport{
		BaseDiameterMM: 2 * f.StartRadius, TopDiameterMM: 2 * f.EndRadius, PitchMode: mode,
		SpacingMM: f.SpacingAt(0), PitchAngleDeg: f.PitchAngleAt(0) * 180 / math.Pi,
	}
}
