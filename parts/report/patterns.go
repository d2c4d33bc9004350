package report

import (
	"math"

	"coilwright/parts"
	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/spec"
)

// ReflectorReport is the reflector plate in design.json.
type ReflectorReport struct {
	Shape            string       `json:"shape"`
	DiameterMM       *float64     `json:"diameter_mm,omitempty"`
	SideMM           *float64     `json:"side_mm,omitempty"`
	CornerRadiusMM   float64      `json:"corner_radius_mm,omitempty"`
	SizeLambda       float64      `json:"size_lambda"`
	ThicknessMM      float64      `json:"thickness_mm"`
	Material         string       `json:"material"`
	Connector        string       `json:"connector"`
	FeedHoleMM       float64      `json:"feed_hole_mm"`
	FeedRadiusMM     float64      `json:"feed_radius_mm"`
	FeedAngleDeg     float64      `json:"feed_angle_deg"`
	MountingHoles    int          `json:"mounting_holes"`
	MountingHoleMM   float64      `json:"mounting_hole_mm,omitempty"`
	MountingCircleMM float64      `json:"mounting_circle_mm,omitempty"`
	Cutting          CutReport    `json:"cutting"`
	Panel            *PanelReport `json:"panel,omitempty"`
}

// CutReport is how a part is cut.
type CutReport struct {
	Method string  `json:"method"`
	KerfMM float64 `json:"kerf_mm"`
	Label  string  `json:"label"`
}

// PanelReport is a batch nested on sheets; the command fills it from the
// nesting.
type PanelReport struct {
	SheetWidthMM  float64 `json:"sheet_width_mm"`
	SheetHeightMM float64 `json:"sheet_height_mm"`
	MarginMM      float64 `json:"margin_mm"`
	SpacingMM     float64 `json:"spacing_mm"`
	Quantity      int     `json:"quantity"`
	PartsPerSheet int     `json:"parts_per_sheet"`
	Sheets        int     `json:"sheets"`
}

// WedgeReport is the matching wedge in design.json.
type WedgeReport struct {
	Material            string              `json:"material"`
	ThicknessMM         float64             `json:"thickness_mm"`
	Taper               string              `json:"taper"`
	Ripple              float64             `json:"ripple,omitempty"`
	KlopfensteinA       float64             `json:"klopfenstein_a,omitempty"`
	SpanDeg             float64             `json:"span_deg"`
	FeedOhm             float64             `json:"feed_ohm"`
	LoadOhm             float64             `json:"load_ohm"`
	LengthMM            float64             `json:"length_mm"`
	FeedWidthMM         float64             `json:"feed_width_mm"`
	EndWidthMM          float64             `json:"end_width_mm"`
	ElectricalLengthRad float64             `json:"electrical_length_rad"`
	Reflection          float64             `json:"reflection"`
	VSWR                float64             `json:"vswr"`
	ReturnLossDB        float64             `json:"return_loss_db"`
	Method              string              `json:"method"`
	Note                string              `json:"note"`
	Widths              []flat.WedgeStation `json:"widths"`
	Cutting             CutReport           `json:"cutting"`
	Panel               *PanelReport        `json:"panel,omitempty"`
	// MaxVSWR is the target across the band; SpanSized says the span was
	// chosen to meet it rather than given.
	MaxVSWR   float64 `json:"max_vswr"`
	SpanSized bool    `json:"span_sized"`
	// LineBand is the line model across the band; LineWorstVSWR its worst.
	LineBand      []parts.MatchPoint `json:"line_band"`
	LineWorstVSWR float64            `json:"line_worst_vswr"`
	LineModel     string             `json:"line_model"`
}

// lineModelNote states what the line model across the band is.
const lineModelNote = "Line model across the band: 50 Ω cable → the centre feed's horizontal lead as a round wire over the plate ((η0/2π)·acosh(h/a), if centre-fed) → the strip as cut (Hammerstad–Jensen per station) → the coil's input resistance by Kraus's formula on the first turn at each frequency (140·Cλ axial feed, 150/√Cλ peripheral); theory of small reflections with each frequency's phase. The vertical lead, the coil's reactance and coupling between turns are not in it."

// wedgeNote states what the wedge figures are.
const wedgeNote = "Widths from Hammerstad–Jensen (air, with thickness correction) along the strip's height above the reflector; mismatch from the theory of small reflections. Quasi-static line formulas applied to a strip of varying width and height: a first-order design aid."

// patternReports fills the reflector and wedge sections of r from d.
func patternReports(d *parts.Design, r *Report) {
	p := d.Patterns
	if p == nil {
		return
	}
	s := d.Spec
	rs := &s.Reflector
	size := rs.SizeMM(d.Wavelength)
	if p.Reflector != nil {
		r.Reflector = reflectorReport(p, rs, size, d.Wavelength)
	}
	w := p.Wedge
	wr := &WedgeReport{
		Material: s.Wedge.Material, ThicknessMM: s.Wedge.ThicknessMM, Taper: s.Wedge.Taper, SpanDeg: w.Span * 180 / math.Pi,
		MaxVSWR: s.Wedge.MaxVSWR, SpanSized: s.Line("wedge.span_deg") == 0, LineBand: p.LineBand, LineWorstVSWR: parts.WorstVSWR(p.LineBand), LineModel: lineModelNote,
		FeedOhm: spec.WedgeFeedOhm, LoadOhm: p.WedgeLoadOhm, LengthMM: w.Length, FeedWidthMM: w.FeedWidth, EndWidthMM: w.EndWidth,
		ElectricalLengthRad: w.ElectricalLength, Reflection: w.Reflection, VSWR: line.VSWR(w.Reflection),
		Method: "Hammerstad–Jensen air microstrip; small-reflection mismatch", Note: wedgeNote, Widths: w.Stations,
		Cutting: CutReport{Method: p.Method, KerfMM: p.Kerf, Label: p.WedgeLabel},
	}
	if w.Reflection > 0 {
		wr.ReturnLossDB = line.ReturnLossDB(w.Reflection)
	}
	if s.Wedge.Taper == "klopfenstein" {
		wr.Ripple = s.Wedge.Ripple
		wr.KlopfensteinA = line.KlopfensteinA(spec.WedgeFeedOhm, p.WedgeLoadOhm, s.Wedge.Ripple)
	}
	r.Wedge = wr
}

// reflectorReport describes the plate of p for design.json.
func reflectorReport(p *parts.Patterns, rs *spec.ReflectorSpec, size, lambda float64) *ReflectorReport {
	in := p.Reflector.Input
	rr := &ReflectorReport{
		Shape: rs.Shape, ThicknessMM: rs.ThicknessMM, Material: rs.Material, Connector: rs.Connector,
		SizeLambda: size / lambda, FeedHoleMM: in.Feed.Diameter, FeedRadiusMM: in.FeedRadius,
		FeedAngleDeg: in.FeedAngle * 180 / math.Pi, MountingHoles: in.Mounting.Count,
		Cutting: CutReport{Method: p.Method, KerfMM: p.Kerf, Label: p.ReflectorLabel},
	}
	if in.Mounting.Count > 0 {
		rr.MountingHoleMM, rr.MountingCircleMM = in.Mounting.Diameter, in.Mounting.PitchDiameter
	}
	if rs.Shape == "square" {
		rr.SideMM, rr.CornerRadiusMM = &size, rs.CornerRadiusMM
	} else {
		rr.DiameterMM = &size
	}
	return rr
}
