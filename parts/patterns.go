// Cut patterns of a design: the reflector plate and the matching wedge,
// worked out from the validated spec and the coil, with the cutting method
// and the label every cut file carries.

package parts

import (
	"fmt"

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
	dc, err := NewDowelCut(d)
	if err != nil {
		return nil, nil, err
	}
	p.Plate = newPlateLayout(in, dc, w, d.Coil, cable)
	if dc.OverFeed {
		warns = append(warns, Warning{Code: "rod-over-feed", Message: fmt.Sprintf(
			"the feed hole %.2f mm from the centre leaves no room at the plate's centre for the smallest stock rod (Ø%s mm) with a fillet and %s mm clearance: the kit has no support rod (the cut list, plate, side view and steps leave it out) and the coil is held from outside with low-loss spacers or foam; for a rod, use a thinner cable or a smaller feed hole",
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

// wedgeTaper returns the wedge's impedance profile to load resistance zl.
func wedgeTaper(w *spec.WedgeSpec, zl float64) line.Taper {
	t := line.Taper{Kind: line.TaperExponential, Z0: spec.WedgeFeedOhm, ZL: zl}
	if w.Taper == "klopfenstein" {
		t.Kind, t.GammaMax = line.TaperKlopfenstein, w.Ripple
	}
	return t
}
