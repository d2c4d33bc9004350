package report

import (
	"math"

	"coilwright/parts"
)

// Report is the design summary written to design.json and design.md. Field
// names carry their units; it is a plain value derived from a Design.
type Report struct {
	Kit          string   `json:"kit"`
	FrequencyMHz float64  `json:"frequency_mhz"`
	BandLowMHz   *float64 `json:"band_low_mhz,omitempty"`
	BandHighMHz  *float64 `json:"band_high_mhz,omitempty"`
	// Band says the band the design is matched and judged over (BandOf),
	// for design.md; design.json carries the spec's edges above.
	Band                    string           `json:"-"`
	WavelengthMM            float64          `json:"wavelength_mm"`
	Quantity                int              `json:"quantity"`
	Shape                   string           `json:"shape"`
	Hand                    string           `json:"hand"`
	Feed                    string           `json:"feed"`
	PitchMode               string           `json:"pitch_mode"`
	TurnCount               float64          `json:"turn_count"`
	BaseDiameterMM          float64          `json:"base_diameter_mm"`
	TopDiameterMM           float64          `json:"top_diameter_mm"`
	FirstTurnHeightMM       float64          `json:"first_turn_height_mm"`
	AxialLengthMM           float64          `json:"axial_length_mm"`
	WireLengthMM            float64          `json:"wire_length_mm"`
	MeanCircumferenceLambda float64          `json:"mean_circumference_lambda"`
	MeanSpacingLambda       float64          `json:"mean_spacing_lambda"`
	Wire                    WireReport       `json:"wire"`
	Former                  FormerReport     `json:"former"`
	Turns                   []TurnReport     `json:"turns"`
	Estimates               Estimates        `json:"estimates"`
	EIRP                    *EIRPReport      `json:"eirp,omitempty"`
	Reflector               *ReflectorReport `json:"reflector,omitempty"`
	Wedge                   *WedgeReport     `json:"wedge,omitempty"`
	Warnings                []parts.Warning  `json:"warnings"`
	// QuotedGainDBic is the gain the report leads with (the field
	// solution's realised gain in dBic when it ran, else the textbook
	// estimate) and QuotedGainSource says which.
	QuotedGainDBic   float64              `json:"quoted_gain_dbic"`
	QuotedGainSource string               `json:"quoted_gain_source"`
	Field            *parts.FieldSolution `json:"field,omitempty"`
	// Tolerance is the batch tolerance analysis; nil when it did not run.
	Tolerance   *ToleranceReport   `json:"tolerance,omitempty"`
	StripSearch *parts.StripSearch `json:"strip_search,omitempty"`
}

// TurnReport is one row of the per-turn table in the report.
type TurnReport struct {
	Index               int     `json:"index"`
	DiameterMM          float64 `json:"diameter_mm"`
	CircumferenceLambda float64 `json:"circumference_lambda"`
	PitchAngleDeg       float64 `json:"pitch_angle_deg"`
	SpacingMM           float64 `json:"spacing_mm"`
	HeightMM            float64 `json:"height_mm"`
	WireMM              float64 `json:"wire_mm"`
	InputResistanceOhm  float64 `json:"input_resistance_ohm"`
	TargetDiameterMM    float64 `json:"target_diameter_mm"`    // relaxed centreline diameter aimed for (= diameter_mm)
	FormerDiameterMM    float64 `json:"former_diameter_mm"`    // centreline diameter in the former's groove
	PredictedDiameterMM float64 `json:"predicted_diameter_mm"` // relaxed diameter the springback model predicts from the former
	SpringbackMM        float64 `json:"springback_mm"`         // predicted growth in diameter on release
	ToleranceMM         float64 `json:"tolerance_mm"`          // ± inspection tolerance on the relaxed diameter
}

// Estimates is the report's electrical summary: the headline figures a
// script reads, and every formula with its source and validity.
type Estimates struct {
	InputResistanceOhm float64          `json:"input_resistance_ohm"`
	HPBWDeg            float64          `json:"hpbw_deg"`
	FNBWDeg            float64          `json:"fnbw_deg"`
	GainDBic           float64          `json:"gain_dbic"`
	GainFormula        string           `json:"gain_formula"`
	Directivity15DBic  float64          `json:"directivity_15_dbic"`
	Directivity12DBic  float64          `json:"directivity_12_dbic"`
	AxialRatio         float64          `json:"axial_ratio"`
	AxialRatioDB       float64          `json:"axial_ratio_db"`
	Formulas           []parts.Estimate `json:"formulas"`
}

// EIRPReport is the radiated-power figure with its inputs and caution.
type EIRPReport struct {
	TxPowerDBm   float64 `json:"tx_power_dbm"`
	FeederLossDB float64 `json:"feeder_loss_db"`
	GainDBic     float64 `json:"gain_dbic"`
	EIRPDBm      float64 `json:"eirp_dbm"`
	EIRPmW       float64 `json:"eirp_mw"`
	Caution      string  `json:"caution"`
}

// eirpCaution is the regulatory caution printed with every EIRP figure.
const eirpCaution = "EIRP limits depend on the band, the country and your licence. Check the rules that apply where you transmit, stay within them, and keep people out of the main beam while transmitting."

// New returns the design summary of d for design.json and design.md.
func New(d *parts.Design) Report {
	s := d.Spec
	e := d.Estimates
	r := Report{
		Kit: s.Kit, FrequencyMHz: s.FrequencyMHz, BandLowMHz: s.BandLowMHz, BandHighMHz: s.BandHighMHz,
		Band:         parts.BandOf(s).Text(s.FrequencyMHz),
		WavelengthMM: d.Wavelength, Quantity: s.Quantity,
		Shape: s.Coil.Shape, Hand: d.Coil.Hand.String(), Feed: s.Coil.Feed, PitchMode: s.Coil.PitchMode,
		TurnCount:               d.Coil.Turns,
		BaseDiameterMM:          2 * d.Coil.StartRadius,
		TopDiameterMM:           2 * d.Coil.EndRadius,
		FirstTurnHeightMM:       d.Coil.Z0,
		AxialLengthMM:           d.AxialLength,
		WireLengthMM:            d.WireLength,
		MeanCircumferenceLambda: 2 * math.Pi * d.Coil.MeanRadius() / d.Wavelength,
		MeanSpacingLambda:       d.AxialLength / d.Coil.Turns / d.Wavelength,
		Estimates: Estimates{
			InputResistanceOhm: e.InputResistance.Value,
			HPBWDeg:            e.HPBW.Value,
			FNBWDeg:            e.FNBW.Value,
			GainDBic:           e.Gain.Value,
			GainFormula:        e.Gain.Formula,
			Directivity15DBic:  e.Directivity15.Value,
			Directivity12DBic:  e.Directivity12.Value,
			AxialRatio:         e.AxialRatio.Value,
			AxialRatioDB:       20 * math.Log10(e.AxialRatio.Value),
			Formulas:           e.All(),
		},
		Wire:     wireReport(d),
		Former:   formerReport(d),
		Warnings: d.Warnings,
	}
	if r.Warnings == nil {
		r.Warnings = []parts.Warning{}
	}
	for _, t := range d.Turns {
		r.Turns = append(r.Turns, TurnReport{
			Index: t.Index, DiameterMM: t.DiameterMM, CircumferenceLambda: t.CircumferenceLambda,
			PitchAngleDeg: t.PitchAngleDeg, SpacingMM: t.SpacingMM, HeightMM: t.HeightMM,
			WireMM: t.WireMM, InputResistanceOhm: t.InputResistanceOhm,
			TargetDiameterMM: t.DiameterMM, FormerDiameterMM: t.FormerDiameterMM, PredictedDiameterMM: t.PredictedDiameterMM,
			SpringbackMM: t.SpringbackMM, ToleranceMM: t.ToleranceMM,
		})
	}
	patternReports(d, &r)
	if d.EIRP != nil {
		f := d.EIRP
		r.EIRP = &EIRPReport{TxPowerDBm: f.TxPowerDBm, FeederLossDB: f.FeederLossDB, GainDBic: f.GainDBic, EIRPDBm: f.EIRPDBm, EIRPmW: f.EIRPmW, Caution: eirpCaution}
	}
	r.QuotedGainDBic, r.QuotedGainSource = d.QuotedGain()
	r.Field = d.Field
	r.StripSearch = d.StripSearch
	return r
}
