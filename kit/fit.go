package kit

import (
	"fmt"
	"math"

	"coilwright/jig"
	"coilwright/parts"
	"coilwright/parts/spec"
)

// planFormer plans the former for d, adds the former-size warning to the
// design when the former is larger than the print volume, and turns the
// plan's fit problems into spec errors naming the key to change.
func planFormer(d *parts.Design) (jig.FormerPlan, error) {
	pl := jig.Plan(d)
	if !pl.FitsPrinter {
		d.Warnings = append(d.Warnings, formerSizeWarning(d.Spec, pl))
	}
	if len(pl.Problems) == 0 {
		return pl, nil
	}
	errs := make(spec.SpecErrors, len(pl.Problems))
	for i, p := range pl.Problems {
		errs[i] = fitError(d.Spec, pl, p)
	}
	return pl, errs
}

// fitError turns one fit problem into a spec error on the key a maker
// would change, with a fix.
func fitError(s *spec.Spec, pl jig.FormerPlan, p jig.FitProblem) *spec.SpecError {
	f := &s.Former
	e := &spec.SpecError{}
	switch p.Kind {
	case jig.FitGrooveSpacing:
		e.Key, e.Value = "coil.spacing_mm", deref(s.Coil.SpacingMM)
		if s.Coil.SpacingMM == nil {
			e.Key, e.Value = "coil.pitch_angle_deg", deref(s.Coil.PitchAngleDeg)
		}
		e.Problem = fmt.Sprintf("gives a smallest spacing of %.2f mm; the former's %.2f mm groove needs at least %.2f mm", p.Available, p.Groove, p.Needed)
		e.Fix = "raise the spacing or use thinner wire or less clearance"
	case jig.FitGrooveRadius:
		e.Key, e.Value = "wire.diameter_mm", num(s.Wire.DiameterMM)
		e.Problem = fmt.Sprintf("makes a %.2f mm groove too large for the former's %.2f mm smallest radius", p.Groove, p.Available)
		e.Fix = "use thinner wire or a wider coil"
	case jig.FitDriveWall:
		e.Key, e.Value = "former.hex_across_flats_mm", num(f.HexAcrossFlatsMM)
		if pl.Params.Drive == jig.ThroughBore {
			e.Key, e.Value = "former.bore_diameter_mm", num(pl.Params.BoreDiameter)
		}
		e.Problem = fmt.Sprintf("leaves a %.2f mm wall under the groove; at least %s mm is needed", p.Available, num(p.Needed))
		e.Fix = "use a smaller drive socket or bore"
	case jig.FitLockHole:
		e.Key, e.Value = "former.lock_hole_depth_mm", num(f.LockHoleDepthMM)
		e.Problem = fmt.Sprintf("gives %.2f mm of wire-lock hole; at least half a wire diameter (%s mm) is needed", p.Available, num(p.Needed))
		e.Fix = "deepen the hole, or use a smaller drive socket or bore"
	case jig.FitHexDepth:
		e.Key, e.Value = "former.hex_depth_mm", num(f.HexDepthMM)
		e.Problem = fmt.Sprintf("with the socket's roof and a %s mm wall needs a %.1f mm former; this one is %.1f mm tall", num(jig.MinWallMM), p.Needed, p.Available)
		e.Fix = `make the socket shallower, or set drive = "bore"`
	case jig.FitGrooveSweep:
		e.Key, e.Value = "coil.spacing_mm", deref(s.Coil.SpacingMM)
		if s.Coil.SpacingMM == nil {
			e.Key, e.Value = "coil.pitch_angle_deg", deref(s.Coil.PitchAngleDeg)
		}
		e.Problem = fmt.Sprintf("leaves the former's %.2f mm groove %.2f mm of room around its centre, lead-in and run-out included; its section needs %.2f mm", p.Groove, p.Available, p.Needed)
		e.Fix = "raise the spacing, use thinner wire, or shorten former.lead_in_deg and former.run_out_deg"
	case jig.FitFeedChannel:
		e.Key, e.Value = "coil.feed", s.Coil.Feed
		e.Problem = fmt.Sprintf("makes the former's lock hole the feed lead's channel, %.1f mm deep below the groove: with its end wall it reaches %.2f mm past the axis, but the groove bottom opposite is %.2f mm from the axis", pl.LockHoleMM, p.Needed, p.Available)
		e.Fix = `set feed = "periphery", or use a wire that springs back less, thinner wire or a wider coil`
	case jig.FitDriveDepth:
		e.Key, e.Value = "former.hex_depth_mm", num(f.HexDepthMM)
		e.Problem = fmt.Sprintf("with the socket's roof reaches %.1f mm from the former's end away from the feed; a centre feed's lead channel leaves %.1f mm before its %s mm wall", p.Needed, p.Available, num(jig.MinWallMM))
		e.Fix = fmt.Sprintf("make the socket at most %.0f mm deep, or set coil.feed = \"periphery\"", math.Floor(p.Available-(p.Needed-f.HexDepthMM)))
		if pl.Params.Drive == jig.ThroughBore {
			e.Key, e.Value = "former.bore_diameter_mm", num(pl.Params.BoreDiameter)
			e.Problem = fmt.Sprintf("needs a blind bore at least one diameter deep, %.1f mm with its roof, from the former's end away from the feed; a centre feed's lead channel leaves %.1f mm before its %s mm wall", p.Needed, p.Available, num(jig.MinWallMM))
			e.Fix = `use a thinner bore, or set coil.feed = "periphery"`
		}
	case jig.FitLettering:
		e.Key, e.Value = "former.flange_margin_mm", num(f.FlangeMarginMM)
		e.Problem = fmt.Sprintf("leaves room for %.1f mm letters on the flange; at least %s mm is needed", p.Available, num(p.Needed))
		e.Fix = "widen flange_margin_mm"
	default:
		e.Key, e.Value, e.Problem, e.Fix = "former", "", p.Error(), "change the [former] sizes"
	}
	e.Line = s.Line(e.Key)
	return e
}

// deref formats an optional spec number, or "" when it is absent.
func deref(v *float64) string {
	if v == nil {
		return ""
	}
	return num(*v)
}

// formerSizeWarning says that the former will not be printed.
func formerSizeWarning(s *spec.Spec, pl jig.FormerPlan) parts.Warning {
	f := &s.Former
	return parts.Warning{Code: "former-size", Message: fmt.Sprintf(
		"the winding former would be %.0f mm tall and %.0f mm across, more than the print volume of %s mm tall by %s mm across ([former] print_height_mm, print_width_mm): no former files are written; raise those limits if your printer takes it, or wind on a turned or segmented former to the diameters in the per-turn table",
		pl.HeightMM, pl.DiameterMM, num(f.PrintHeightMM), num(f.PrintWidthMM))}
}
