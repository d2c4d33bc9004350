package field

import (
	"errors"
	"fmt"
	"strconv"

	"coilwright/parts/em"
	"coilwright/parts/spec"
)

// specError turns a solver error into a *spec.SpecError naming the spec
// key whose change cures it. Errors that are not the solver's pass through.
func (st *Structure) specError(err error) error {
	s := st.design.Spec
	mk := func(key, value, problem, fix string) error {
		return &spec.SpecError{Key: key, Line: s.Line(key), Value: value, Problem: problem, Fix: fix}
	}
	sizeKey := "reflector.diameter_mm"
	if s.Reflector.Shape == "square" {
		sizeKey = "reflector.side_mm"
	}
	var ge *em.GeometryError
	var se *em.SingularMatrixError
	var ne *em.NotFiniteError
	switch {
	case errors.As(err, &ge):
		part := st.partOf(ge)
		switch {
		case ge.Kind == em.ShortSegment && part == PartPin:
			return mk("coil.first_turn_height_mm", num(st.design.Coil.Z0), fmt.Sprintf("the field model cannot segment the feed %s: %v", part, ge),
				"raise the first turn so the lead is longer, or use a thinner wire or cable")
		case ge.Kind == em.ShortSegment && part == PartStrip:
			return mk("wedge.span_deg", "", "the field model cannot segment the matching strip: "+ge.Error(), "lengthen the strip (a larger span) or raise the first turn so it is narrower")
		case ge.Kind == em.ShortSegment:
			return mk("solver.segments_per_wavelength", "", "segments too short for the thin-wire kernel: "+ge.Error(), "use fewer segments per wavelength")
		case ge.Kind == em.BelowGround || ge.Kind == em.TouchesGround:
			return mk("coil.first_turn_height_mm", num(st.design.Coil.Z0), "the wire touches the reflector in the field model: "+ge.Error(), "raise the first turn")
		case ge.Kind == em.BadGrid:
			return mk(sizeKey, "", "the reflector cannot be modelled as a wire grid: "+ge.Error(), `make the plate larger, or set solver.reflector_model = "ideal"`)
		}
		return mk("coil.feed", "", "the field model of this feed is refused: "+ge.Error(), "check the feed and the first turn's height")
	case errors.As(err, &se):
		return mk("solver.segments_per_wavelength", "", fmt.Sprintf("the field solution failed at %.1f MHz: %v (wires overlap or a loop is shorted)", se.Frequency/1e6, se),
			"change the segment density, or check that no turns or strip touch")
	case errors.As(err, &ne):
		return mk("solver.segments_per_wavelength", "", fmt.Sprintf("the field solution failed at %.1f MHz: %v", ne.Frequency/1e6, ne), "change the segment density")
	}
	return err
}

// partOf names the conductor part a geometry error points at ("" for
// plate wires or errors not tied to a piece).
func (st *Structure) partOf(ge *em.GeometryError) string {
	if ge.Wire != 0 || ge.Segment < 0 {
		if ge.Wire > 0 {
			return "plate"
		}
		return ""
	}
	for _, p := range st.Parts {
		if ge.Segment >= p.From && ge.Segment < p.To {
			return p.Name
		}
	}
	return ""
}

// num formats a value for an error message.
func num(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }
