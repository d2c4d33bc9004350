package parts

import (
	"fmt"
	"math"

	"coilwright/parts/spec"
)

// minDowelClearanceMM is the least default clearance: on a coil too small
// for the smallest stock rod with DefaultDowelClearanceMM all round, the
// default closes down to this, in 0.05 mm steps, before the spec is
// refused. Common practice (no published source): below a quarter of a
// millimetre the released coil no longer slides on.
const minDowelClearanceMM = 0.25

// checkFit checks the rules of a validated spec that need the coil worked
// out: the wire must fit between neighbouring turns, a constant-angle cone
// must exist, and a given rod, or else the smallest stock rod, must pass
// inside the smallest turn (closing the default clearance down when that
// makes room; it mutates s.Dowel.ClearanceMM then). Problems come back as
// SpecErrors.
func checkFit(s *spec.Spec) error {
	var errs spec.SpecErrors
	fail := func(key, value, problem, fix string) {
		errs = append(errs, &spec.SpecError{Key: key, Line: s.Line(key), Value: value, Problem: problem, Fix: fix})
	}
	cs := &s.Coil
	coil, err := coilFromSpec(s)
	if err != nil {
		fail("coil.pitch_angle_deg", num(optional(cs.PitchAngleDeg)), err.Error(), "raise the pitch angle, add turns, or bring the two end sizes closer")
		return errs
	}
	gap := coil.MinSpacing() - s.Wire.DiameterMM
	if gap < spec.MinTurnGapMM {
		key, val := "coil.spacing_mm", optional(cs.SpacingMM)
		if cs.SpacingMM == nil {
			key, val = "coil.pitch_angle_deg", optional(cs.PitchAngleDeg)
		}
		fail(key, num(val), fmt.Sprintf("leaves %.2f mm between turns of %s mm wire (smallest spacing %.2f mm); at least %s mm is needed so turns do not touch",
			gap, num(s.Wire.DiameterMM), coil.MinSpacing(), num(spec.MinTurnGapMM)),
			fmt.Sprintf("make the spacing at least %.2f mm or use thinner wire", s.Wire.DiameterMM+spec.MinTurnGapMM))
	}
	d := &s.Dowel
	inner := 2*smallestTurnRadius(coil) - s.Wire.DiameterMM
	switch {
	case d.DiameterMM == nil:
		smallest := dowelDiametersMM[0]
		if inner-2*d.ClearanceMM >= smallest-1e-9 {
			break
		}
		if s.Line("dowel.clearance_mm") == 0 {
			if fit := math.Floor((inner-smallest)/2/0.05+1e-9) * 0.05; fit >= minDowelClearanceMM {
				d.ClearanceMM = fit
				break
			}
		}
		fix := fmt.Sprintf("reduce the clearance to at most %.2f mm, give a thinner dowel.diameter_mm, or support the coil from outside", (inner-smallest)/2)
		if inner < smallest {
			fix = fmt.Sprintf("give a rod thinner than the stock sizes: dowel.diameter_mm plus twice clearance_mm at most %.2f mm; or support the coil from outside", inner)
		}
		fail("dowel.clearance_mm", num(d.ClearanceMM), fmt.Sprintf("leaves %.2f mm inside the smallest turn (%.2f mm inside): no stock rod of %s mm or more fits", inner-2*d.ClearanceMM, inner, num(smallest)), fix)
	default:
		if room := inner - 2*d.ClearanceMM; *d.DiameterMM > room+1e-9 {
			fix := fmt.Sprintf("use a rod of at most %.1f mm, or omit diameter_mm to choose one", room)
			if room < spec.MinDowelMM {
				fix = fmt.Sprintf("reduce clearance_mm: the rod plus twice the clearance must stay within %.2f mm", inner)
			}
			fail("dowel.diameter_mm", num(*d.DiameterMM), fmt.Sprintf("does not pass inside the smallest turn (%.2f mm inside) with %s mm clearance all round", inner, num(d.ClearanceMM)), fix)
		}
	}
	if len(errs) == 0 {
		checkRodFoot(s, coil, fail)
	}
	if len(errs) > 0 {
		return errs
	}
	return nil
}

// checkRodFoot checks that the rod's foot, with the least epoxy fillet
// (MinRodFilletLegMM), clears the feed and mounting holes by
// FootprintClearMM when the spec gives the rod. A default rod that cannot
// clear them is left out of the plate with the "rod-over-feed" warning.
func checkRodFoot(s *spec.Spec, coil Coil, fail func(key, value, problem, fix string)) {
	room := rodPlateRoomMM(specPlateFeatures(s, coil))
	d := &s.Dowel
	what := fmt.Sprintf("its foot with a %s mm epoxy fillet must stay %s mm clear of the feed and mounting holes, which leaves room for a rod of at most %.2f mm", num(MinRodFilletLegMM), num(FootprintClearMM), room)
	switch {
	case d.DiameterMM != nil && *d.DiameterMM > room+1e-9:
		fix := fmt.Sprintf("use a rod of at most %.1f mm, or omit diameter_mm to choose one", math.Floor(room*10)/10)
		if room < spec.MinDowelMM {
			fix = "use a smaller feed hole or connector, or support the coil from outside"
		}
		fail("dowel.diameter_mm", num(*d.DiameterMM), "is too thick for the plate's centre: "+what, fix)
	}
}

// optional returns the value of an optional spec number, or 0 when it is
// absent.
func optional(p *float64) float64 {
	if p == nil {
		return 0
	}
	return *p
}
