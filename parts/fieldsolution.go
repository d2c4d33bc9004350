// The field solution a design carries once parts/field has solved it:
// per-frequency figures, the centre-frequency cuts and the summary the
// report, the build sheet and check quote.

package parts

import "fmt"

// FieldSolution is a design's field solution across the sweep.
type FieldSolution struct {
	// Reflector is the reflector model used ("plate" or "ideal").
	Reflector string `json:"reflector_model"`
	// Unknowns is the number of basis functions (the matrix order);
	// Segments the number of wire segments.
	Unknowns int `json:"unknowns"`
	Segments int `json:"segments"`
	// CableOhm is the impedance Γ is taken against.
	CableOhm float64 `json:"cable_ohm"`
	// PlateSpacingMM is the plate grid's spacing (plate model), and
	// MaxSegmentMM the longest segment the mesh allowed.
	PlateSpacingMM float64 `json:"plate_spacing_mm,omitempty"`
	MaxSegmentMM   float64 `json:"max_segment_mm"`
	// Assumptions lists what the model leaves out, for every report.
	Assumptions []string `json:"assumptions"`
	// RHCP is true for a right-hand coil: the co-polar component.
	RHCP   bool         `json:"rhcp"`
	Points []FieldPoint `json:"points"`
	// Centre is the solution at the spec's centre frequency.
	Centre FieldPoint `json:"centre"`
	// Cuts are the centre-frequency cuts at φ = 0 and φ = 90° (none with
	// Options.AxisOnly).
	Cuts    []FieldCut   `json:"cuts,omitempty"`
	Summary FieldSummary `json:"summary"`
}

// FieldPoint is the field solution at one frequency.
type FieldPoint struct {
	FrequencyMHz float64    `json:"frequency_mhz"`
	Impedance    complex128 `json:"-"`
	// ResistanceOhm and ReactanceOhm are Z_in at the feed.
	ResistanceOhm float64 `json:"resistance_ohm"`
	ReactanceOhm  float64 `json:"reactance_ohm"`
	// Reflection is Γ against the feed cable's impedance.
	Reflection   complex128 `json:"-"`
	GammaMag     float64    `json:"gamma_mag"`
	GammaRe      float64    `json:"gamma_re"`
	GammaIm      float64    `json:"gamma_im"`
	VSWR         float64    `json:"vswr"`
	ReturnLossDB float64    `json:"return_loss_db"`
	// AxisRHCPDBic and AxisLHCPDBic are the circular gains along +z.
	AxisRHCPDBic float64 `json:"axis_rhcp_dbic"`
	AxisLHCPDBic float64 `json:"axis_lhcp_dbic"`
	// AxialRatioDB is the axial ratio along +z.
	AxialRatioDB float64 `json:"axial_ratio_db"`
	// Efficiency is the radiation efficiency (conductor loss), 0..1.
	Efficiency float64 `json:"efficiency"`
	// The rest are zero with Options.AxisOnly.
	// PeakRHCPDBic and PeakLHCPDBic are each component's greatest gain;
	// PeakThetaDeg is the angle from the axis of the co-polar peak.
	PeakRHCPDBic float64 `json:"peak_rhcp_dbic"`
	PeakLHCPDBic float64 `json:"peak_lhcp_dbic"`
	PeakThetaDeg float64 `json:"peak_theta_deg"`
	// RealisedDBic is the co-polar peak gain times (1 − |Γ|²): what a
	// matched receiver on the cable sees.
	RealisedDBic float64 `json:"realised_dbic"`
	// HPBWDeg is the co-polar half-power beamwidth in the planes φ = 0 and
	// φ = 90°; 0 where the gain does not fall to half within the cut.
	HPBWDeg [2]float64 `json:"hpbw_deg"`
	// FrontToBackDB is the total gain along +z over that along −z (plate
	// model); 0 over the ideal ground, which has no back.
	FrontToBackDB float64 `json:"front_to_back_db"`
}

// AxisCoPolarDBic returns the on-axis gain of the coil's own hand (RHCP
// when rhcp is set).
func (p FieldPoint) AxisCoPolarDBic(rhcp bool) float64 {
	if rhcp {
		return p.AxisRHCPDBic
	}
	return p.AxisLHCPDBic
}

// PeakCoPolarDBic returns the peak gain of the coil's own hand.
func (p FieldPoint) PeakCoPolarDBic(rhcp bool) float64 {
	if rhcp {
		return p.PeakRHCPDBic
	}
	return p.PeakLHCPDBic
}

// FieldCut is a pattern cut in the plane through the axis at azimuth PhiDeg.
type FieldCut struct {
	PhiDeg  float64          `json:"phi_deg"`
	Samples []FieldCutSample `json:"samples"`
}

// FieldCutSample is one angle of a pattern cut, gains in dBic.
type FieldCutSample struct {
	ThetaDeg float64 `json:"theta_deg"` // signed angle from +z in the cut plane
	RHCPDBic float64 `json:"rhcp_dbic"`
	LHCPDBic float64 `json:"lhcp_dbic"`
}

// FieldSummary condenses the sweep for the report and check.
type FieldSummary struct {
	// BandLowMHz and BandHighMHz are the design's band (BandOf: the
	// spec's edges, or the centre frequency ± DefaultBandFraction).
	BandLowMHz  float64    `json:"band_low_mhz"`
	BandHighMHz float64    `json:"band_high_mhz"`
	Matched     FieldRange `json:"vswr_2"`
	Good        FieldRange `json:"vswr_1_5"`
	// Low, Centre and High are the figures at the band's edges and centre.
	Low    FieldFigures `json:"band_low"`
	Centre FieldFigures `json:"band_centre"`
	High   FieldFigures `json:"band_high"`
	// Worst is the in-band point (band edges and sweep points inside the
	// band) with the highest VSWR.
	Worst FieldFigures `json:"worst_in_band"`
	// Textbook figures for comparison and the solver's differences from
	// them at the centre frequency.
	TextbookGainDBic  float64 `json:"textbook_gain_dbic"`
	GainDifferenceDB  float64 `json:"gain_difference_db"`
	TextbookHPBWDeg   float64 `json:"textbook_hpbw_deg"`
	TextbookARDB      float64 `json:"textbook_axial_ratio_db"`
	TextbookInputOhm  float64 `json:"textbook_input_ohm"`
	ResistanceRatio   float64 `json:"resistance_ratio"` // solver R over the textbook R
	LargeDisagreement bool    `json:"large_disagreement"`
}

// FieldRange is a frequency range in MHz where the VSWR stays at or below a
// limit. Found is false when no sweep point meets the limit; OpenLow and
// OpenHigh say the range runs off the sweep's edge (it may extend further).
type FieldRange struct {
	Limit    float64 `json:"vswr_limit"`
	Found    bool    `json:"found"`
	LowMHz   float64 `json:"low_mhz"`
	HighMHz  float64 `json:"high_mhz"`
	OpenLow  bool    `json:"open_low"`
	OpenHigh bool    `json:"open_high"`
	// CoversBand is true when the range holds the whole band.
	CoversBand bool `json:"covers_band"`
}

// FieldFigures is the solution interpolated at one frequency.
type FieldFigures struct {
	FrequencyMHz  float64 `json:"frequency_mhz"`
	ResistanceOhm float64 `json:"resistance_ohm"`
	ReactanceOhm  float64 `json:"reactance_ohm"`
	VSWR          float64 `json:"vswr"`
	// AxisDBic is the co-polar gain on axis; RealisedDBic the co-polar
	// peak gain with mismatch (zero with Options.AxisOnly).
	AxisDBic     float64 `json:"axis_dbic"`
	RealisedDBic float64 `json:"realised_dbic"`
	AxialRatioDB float64 `json:"axial_ratio_db"`
}

// QuotedDBic returns the gain the outputs lead with from this solution:
// the realised co-polar peak gain at the centre frequency, dBic.
func (f *FieldSolution) QuotedDBic() float64 { return f.Centre.RealisedDBic }

// Text describes the range for reports: its edges, whether it covers the
// band, or that no sweep point meets the limit.
func (r FieldRange) Text() string {
	if !r.Found {
		return fmt.Sprintf("none in the sweep (VSWR above %s everywhere)", num(r.Limit))
	}
	s := fmt.Sprintf("%.0f–%.0f MHz", r.LowMHz, r.HighMHz)
	switch {
	case r.OpenLow && r.OpenHigh:
		s += " (the whole sweep)"
	case r.OpenLow:
		s += " (from the sweep's low edge)"
	case r.OpenHigh:
		s += " (to the sweep's high edge)"
	}
	if r.CoversBand {
		return s + ", covers the band"
	}
	return s + ", does not cover the band"
}
