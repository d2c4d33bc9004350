// Sentences of the build sheet worked out from the design's numbers, so
// that what the sheet says (the strip's shape, which tolerance governs,
// which coil height is meant) follows the values rather than a fixed
// wording.

package sheet

import (
	"fmt"
	"strings"

	"coilwright/parts"
	"coilwright/parts/flat"
)

// stripShapeText describes the matching strip's widths as cut: the feed
// end, the far end, and the widest or narrowest point between them when
// that lies beyond both ends.
func stripShapeText(w *flat.Wedge) string {
	text := fmt.Sprintf("%s wide at the feed end and %s at the far end", mm2(w.FeedWidth), mm2(w.EndWidth))
	if len(w.Stations) < 3 {
		return text
	}
	hi, lo := w.Stations[0], w.Stations[0]
	for _, st := range w.Stations {
		if st.Width > hi.Width {
			hi = st
		}
		if st.Width < lo.Width {
			lo = st
		}
	}
	ends := [2]float64{w.FeedWidth, w.EndWidth}
	if hi.Width > max(ends[0], ends[1])+stripWidthNoteMM {
		text += fmt.Sprintf(", widest (%s) %s from the feed end", mm2(hi.Width), mm(hi.S))
	}
	if lo.Width < min(ends[0], ends[1])-stripWidthNoteMM {
		text += fmt.Sprintf(", narrowest (%s) %s from the feed end", mm2(lo.Width), mm(lo.S))
	}
	return text + "; follow the template's outline, not a straight taper"
}

// stripWidthNoteMM is how far a width between the strip's ends must pass
// both ends before the sheet mentions it: about what a file takes off in a
// stroke. Common practice (no published source).
const stripWidthNoteMM = 0.05

// inspectionNoteText says how to measure the turns and which tolerance
// governs each: the spec's, the per cent of the diameter, or the caliper
// floor.
func inspectionNoteText(d *parts.Design) string {
	note := "Measure each turn across its middle with calipers over the outside of the wire, at two places 90° apart, and write the mean in the blank column. "
	if t := d.Spec.Wire.InspectionToleranceMM; t != nil {
		return note + fmt.Sprintf("The tolerance, ±%s mm, is set in the spec.", num(*t))
	}
	if d.InspectionBasis != "" { // derived by the batch tolerance analysis
		return note + d.InspectionBasis
	}
	var floor, frac []string
	for _, t := range d.Turns {
		if parts.InspectionFraction*t.DiameterMM <= parts.InspectionFloorMM {
			floor = append(floor, fmt.Sprint(t.Index))
		} else {
			frac = append(frac, fmt.Sprint(t.Index))
		}
	}
	pct := num(100 * parts.InspectionFraction)
	why := fmt.Sprintf(" A turn 1 %% too large tunes about 1 %% low; calipers on a springy coil read no better than about %s mm.", num(parts.InspectionFloorMM))
	switch {
	case len(frac) == 0:
		return note + fmt.Sprintf("The tolerance is ±%s mm on every turn: %s %% of these small turns would be less than calipers can hold, so the %s mm floor governs.", num(parts.InspectionFloorMM), pct, num(parts.InspectionFloorMM)) + why
	case len(floor) == 0:
		return note + fmt.Sprintf("The tolerance is ±%s %% of each turn's diameter (more than the %s mm floor on every turn).", pct, num(parts.InspectionFloorMM)) + why
	}
	return note + fmt.Sprintf("The tolerance is ±%s %% of the turn's diameter on turns %s, and the %s mm floor on turns %s, where %s %% would be smaller.",
		pct, strings.Join(frac, ", "), num(parts.InspectionFloorMM), strings.Join(floor, ", "), pct) + why
}

// CoilHeights are the three heights of the coil the sheet quotes, each
// with the name it is printed under, mm.
type CoilHeights struct {
	// Axial is the coil's axial length: wire centre of the first turn's
	// start to wire centre of the last turn's end.
	Axial float64
	// TopCentre is from the reflector's top face to the top turn's wire
	// centre: first turn height plus the axial length.
	TopCentre float64
	// Overall is from the reflector's top face to the top of the wire,
	// what a rule stood on the plate reads.
	Overall float64
}

// Heights returns the three heights of the coil of d.
func Heights(d *parts.Design) CoilHeights {
	top := d.Coil.Z0 + d.AxialLength
	return CoilHeights{Axial: d.AxialLength, TopCentre: top, Overall: top + d.Spec.Wire.DiameterMM/2}
}

// Text writes the three heights with their definitions.
func (h CoilHeights) Text() string {
	return fmt.Sprintf("axial length %s (first to last wire centre); %s from the reflector's top face to the top turn's wire centre; overall %s from the reflector's top face to the top of the wire",
		mm(h.Axial), mm(h.TopCentre), mm(h.Overall))
}

// gainRow is the build sheet's gain row for d.
func gainRow(d *parts.Design) SheetRow {
	if d.Field != nil {
		return SheetRow{"Gain (field solution)", fmt.Sprintf("%.1f dBic realised at %s MHz; textbook estimate %.1f dBic (%s)",
			d.Field.QuotedDBic(), num(d.Spec.FrequencyMHz), d.Estimates.Gain.Value, d.Estimates.Gain.Formula)}
	}
	return SheetRow{"Gain (estimate)", fmt.Sprintf("%.1f dBic, %s", d.Estimates.Gain.Value, d.Estimates.Gain.Formula)}
}

// gainWord says how the quoted gain of d was found, for sentences.
func gainWord(d *parts.Design) string {
	if d.Field != nil {
		return "computed"
	}
	return "estimated"
}
