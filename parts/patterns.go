// Cut patterns of a design: the reflector plate and the matching wedge,
// worked out from the validated spec and the coil, with the cutting method
// and the label every cut file carries.

package parts

import (
	"fmt"
	"math"

	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/spec"
)

// Patterns is the design's flat parts and how they are to be cut. It is
// built by NewDesign and not mutated afterwards.
type Patterns struct {
	// Reflector is nil when the plate cannot hold its feed cut-out (see
	// the "reflector-fit" warning).
	Reflector *flat.Reflector
	Wedge     *flat.Wedge
	// WedgeLoadOhm is the resistance the wedge tapers to: the Kraus input
	// resistance on the first turn's circumference.
	WedgeLoadOhm float64
	// Material and WedgeMaterial are the sheet materials of the two parts.
	Material, WedgeMaterial spec.SheetMaterial
	// Method is the cutting method ("mill", "shear", "pcb-fab", "laser").
	Method string
	// Kerf is the width in mm the tool removes.
	Kerf float64
	// ToolPath is set when the cut files carry the tool-centre path on
	// a TOOLPATH layer beside the true outline.
	ToolPath bool
	// ReflectorLabel and WedgeLabel say how each part's files are meant to
	// be cut; every cut file and template of the part carries its label.
	ReflectorLabel, WedgeLabel string
	// ReflectorPaperLabel and WedgePaperLabel are the labels without the
	// cut files' layer convention, for the paper templates.
	ReflectorPaperLabel, WedgePaperLabel string
	// Plate is every hole and footprint on the reflector, the rod's foot
	// as fitted, and the collisions between them (kit refuses a spec with
	// any).
	Plate PlateLayout
	// LaserHalogen is set when laser cutting was asked for a halogenated
	// laminate: the files still come, with a warning on each.
	LaserHalogen bool
	// LineBand is the strip's line model across the band.
	LineBand []MatchPoint
}

// LaserHalogenWarning is the text put on every output when laser cutting
// is asked for a halogenated laminate.
const LaserHalogenWarning = "WARNING: laser cutting was asked for a halogenated laminate (FR-4). Its brominated resin gives off toxic fumes and chars under a laser: mill, saw or shear it with dust extraction and a mask, or order the plate from a PCB fab."

// newPatterns works out the reflector and wedge for d.
func newPatterns(d *Design) (*Patterns, []Warning, error) {
	s := d.Spec
	rs := &s.Reflector
	mat, ok := spec.SheetMaterialByID(rs.Material)
	if !ok {
		return nil, nil, fmt.Errorf("unknown reflector material %q", rs.Material)
	}
	wmat, ok := spec.SheetMaterialByID(s.Wedge.Material)
	if !ok {
		return nil, nil, fmt.Errorf("unknown wedge material %q", s.Wedge.Material)
	}
	p := &Patterns{Material: mat, WedgeMaterial: wmat, Method: s.Cutting.Method, Kerf: s.Cutting.Kerf(), ToolPath: s.Cutting.ToolPath}
	var warns []Warning
	p.ReflectorPaperLabel = p.label(mat)
	p.WedgePaperLabel = p.label(wmat)
	p.ReflectorLabel, p.WedgeLabel = p.fileLabel(p.ReflectorPaperLabel), p.fileLabel(p.WedgePaperLabel)
	if p.LaserHalogen {
		warns = append(warns, Warning{Code: "laser-halogenated", Message: LaserHalogenWarning})
	}

	p.WedgeLoadOhm = d.Turns[0].InputResistanceOhm
	w, band, miss, err := sizeWedge(d, p.WedgeLoadOhm)
	if err != nil {
		return nil, nil, err
	}
	p.Wedge, p.LineBand = w, band
	if miss != nil {
		warns = append(warns, *miss)
	}
	for _, m := range w.Warnings {
		warns = append(warns, Warning{Code: "wedge-width", Message: m})
	}

	size := rs.SizeMM(d.Wavelength)
	feed, cable := specFeedHole(s)
	in := flat.ReflectorInput{
		Size:     size,
		Label:    s.Kit,
		Hand:     d.Coil.Hand.String(),
		Feed:     feed,
		Mounting: specMounting(s, size),
	}
	in.FeedRadius, in.FeedAngle = feedPlacement(s, d.Coil)
	if rs.Shape == "square" {
		in.Shape, in.CornerRadius = flat.ReflectorSquare, rs.CornerRadiusMM
	}
	dc, err := dowelCut(d)
	if err != nil {
		return nil, nil, err
	}
	p.Plate = newPlateLayout(in, dc, w, d.Coil, cable)
	if dc.OverFeed {
		warns = append(warns, Warning{Code: "rod-over-feed", Message: fmt.Sprintf(
			"the feed hole %.2f mm from the centre leaves no room at the plate's centre for the smallest stock rod (Ø%s mm) with a fillet and %s mm clearance: no rod is placed on the reflector; support the coil from outside (foam or low-loss spacers), or use a thinner cable or a smaller feed hole",
			in.FeedRadius, num(dowelDiametersMM[0]), num(FootprintClearMM))})
	}
	in.ScrewHole, in.RodFoot, in.RodFootFillet = p.Plate.ScrewHoleMM, p.Plate.RodMM, p.Plate.FootMM
	refl, err := flat.NewReflector(in)
	if err != nil {
		// A plate too small for its feed cut-out is reported, not fatal:
		// the rest of the design stands, and no plate files are written.
		warns = append(warns, Warning{Code: "reflector-fit", Message: err.Error() + "; no reflector files are written"})
	}
	p.Reflector = refl
	return p, warns, nil
}

// label returns the cutting label for a part of material m, setting
// LaserHalogen when a laser was asked for a halogenated laminate.
func (p *Patterns) label(m spec.SheetMaterial) string {
	switch {
	case m.Halogenated && p.Method == "laser":
		p.LaserHalogen = true
		return LaserHalogenWarning
	case m.Halogenated:
		return fmt.Sprintf("For milling or shearing: %s is a halogenated laminate, not for laser cutting. %s, kerf %.2f mm.", m.Name, capitalise(methodName(p.Method)), p.Kerf)
	}
	if m.Reflective && p.Method == "laser" {
		return fmt.Sprintf("%s: for a fibre laser only (a CO2 laser's beam reflects off it), kerf %.2f mm.", capitalise(m.Name), p.Kerf)
	}
	return fmt.Sprintf("%s: labelled for %s, kerf %.2f mm.", capitalise(m.Name), methodName(p.Method), p.Kerf)
}

// fileLabel adds the cut files' layer convention to a part's label (not
// to the laser warning, which stands alone).
func (p *Patterns) fileLabel(label string) string {
	if label == LaserHalogenWarning {
		return label
	}
	return label + " " + KerfConvention(p.Kerf, p.ToolPath)
}

// KerfConvention says in words what a cut file's layers carry: the CUT
// layer is the true part outline, and with toolPath the TOOLPATH layer is
// the tool-centre path offset by half the kerf.
func KerfConvention(kerf float64, toolPath bool) string {
	if !toolPath {
		return fmt.Sprintf("CUT layer = true part outline, not offset for the kerf: set cutter compensation of %.2f mm (half the kerf) in your CAM.", kerf/2)
	}
	return fmt.Sprintf("CUT layer = true part outline; TOOLPATH layer = tool-centre path, offset %.2f mm (half the kerf) outside the part and inside its holes. Cut one of them, not both.", kerf/2)
}

// capitalise upper-cases the first ASCII letter of s.
func capitalise(s string) string {
	if s == "" || s[0] < 'a' || s[0] > 'z' {
		return s
	}
	return string(s[0]-'a'+'A') + s[1:]
}

// methodName returns a phrase for a cutting method.
func methodName(m string) string {
	switch m {
	case "shear":
		return "shearing"
	case "pcb-fab":
		return "a PCB fab (routed to the drawn outline)"
	case "laser":
		return "laser cutting"
	}
	return "milling"
}

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
	LineBand      []MatchPoint `json:"line_band"`
	LineWorstVSWR float64      `json:"line_worst_vswr"`
	LineModel     string       `json:"line_model"`
}

// LineModelNote states what the line model across the band is.
const LineModelNote = "Line model across the band: 50 Ω cable → the centre feed's horizontal lead as a round wire over the plate ((η0/2π)·acosh(h/a), if centre-fed) → the strip as cut (Hammerstad–Jensen per station) → the coil's input resistance by Kraus's formula on the first turn at each frequency (140·Cλ axial feed, 150/√Cλ peripheral); theory of small reflections with each frequency's phase. The vertical lead, the coil's reactance and coupling between turns are not in it."

// WedgeNote states what the wedge figures are.
const WedgeNote = "Widths from Hammerstad–Jensen (air, with thickness correction) along the strip's height above the reflector; mismatch from the theory of small reflections. Quasi-static line formulas applied to a strip of varying width and height: a first-order design aid."

// patternReports fills the reflector and wedge sections of r.
func (d *Design) patternReports(r *Report) {
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
		MaxVSWR: s.Wedge.MaxVSWR, SpanSized: s.Line("wedge.span_deg") == 0, LineBand: p.LineBand, LineWorstVSWR: worstVSWR(p.LineBand), LineModel: LineModelNote,
		FeedOhm: spec.WedgeFeedOhm, LoadOhm: p.WedgeLoadOhm, LengthMM: w.Length, FeedWidthMM: w.FeedWidth, EndWidthMM: w.EndWidth,
		ElectricalLengthRad: w.ElectricalLength, Reflection: w.Reflection, VSWR: line.VSWR(w.Reflection),
		Method: "Hammerstad–Jensen air microstrip; small-reflection mismatch", Note: WedgeNote, Widths: w.Stations,
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
func reflectorReport(p *Patterns, rs *spec.ReflectorSpec, size, lambda float64) *ReflectorReport {
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

// wedgeTaper returns the wedge's impedance profile to load resistance zl.
func wedgeTaper(w *spec.WedgeSpec, zl float64) line.Taper {
	t := line.Taper{Kind: line.TaperExponential, Z0: spec.WedgeFeedOhm, ZL: zl}
	if w.Taper == "klopfenstein" {
		t.Kind, t.GammaMax = line.TaperKlopfenstein, w.Ripple
	}
	return t
}
