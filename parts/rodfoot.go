// The support rod's foot over a centre feed.
//
// A rod on the coil's axis stands exactly where a centre-fed cable comes
// through the plate and where its lead runs out to the winding. The rod is
// kept on the axis (it is what holds the turns) and its foot is made to
// clear the feed: a blind hole up its axis as wide as the feed hole, as
// deep as the top of the lead, and a slot across one side of the foot for
// the lead to run out through. Such a foot cannot take a screw at the
// centre (the centre is the feed hole), so it is bonded to the plate round
// the feed. A rod too thin to keep a wall round that hole is stepped up to
// a thicker stocked rod that still fits inside the coil; when none fits,
// the spec is refused with a fix. A periphery feed leaves the axis free:
// the rod's foot is plain and screwed from behind.
//
// Common practice (no published source): a centre-fed helix is commonly
// wound on a dielectric tube or bored rod, the connector inside it and the
// lead brought out through the wall.

package parts

import (
	"fmt"

	"coilwright/parts/spec"
)

// Rod-foot sizes in mm. Common practice (no published source): a bored
// plastic rod keeps at least about 1 mm of wall; the lead's slot and the
// bore's depth allow half a millimetre round the wire and its solder.
const (
	MinRodWallMM    = 1.0
	RodFootClearMM  = 0.5
	rodFootFitTolMM = 1e-9
)

// RodFoot is how the support rod's foot clears a centre feed.
type RodFoot struct {
	BoreMM      float64 // blind hole up the rod's axis, diameter
	BoreDepthMM float64 // its depth from the rod's foot
	SlotWidthMM float64 // slot across one side of the foot for the lead
	WallMM      float64 // rod wall left round the bore
}

// centreFeedFoot returns the foot a rod of diameter rod mm needs over the
// centre feed of d.
func centreFeedFoot(d *Design, rod float64) RodFoot {
	hole := d.Spec.Coax.Cable().FeedHoleMM()
	if d.Patterns != nil && d.Patterns.Reflector != nil {
		hole = d.Patterns.Reflector.Input.Feed.Diameter
	}
	wd := d.Spec.Wire.DiameterMM
	return RodFoot{
		BoreMM:      hole,
		BoreDepthMM: d.FeedRise() + wd/2 + RodFootClearMM,
		SlotWidthMM: wd + RodFootClearMM,
		WallMM:      (rod - hole) / 2,
	}
}

// fitCentreFeedRod makes the rod of dc clear a centre feed: it fills the
// slot sizes and, for an automatic rod too thin to keep MinRodWallMM round
// the bore, steps up to the thinnest stocked rod that does and still fits
// room mm. It returns a spec error when no rod can.
func fitCentreFeedRod(d *Design, dc *DowelCut, room float64) error {
	if !d.CentreFed() {
		return nil
	}
	s := d.Spec
	foot := centreFeedFoot(d, dc.DiameterMM)
	if dc.BoreMM >= foot.BoreMM-rodFootFitTolMM {
		// A tube already clears the cable: the foot needs only the slot.
		foot.BoreMM, foot.WallMM = dc.BoreMM, (dc.DiameterMM-dc.BoreMM)/2
		dc.Foot = &foot
		dc.SlotWidthMM, dc.SlotDepthMM = foot.SlotWidthMM, foot.BoreDepthMM
		return nil
	}
	need := foot.BoreMM + 2*MinRodWallMM
	if foot.WallMM < MinRodWallMM-rodFootFitTolMM {
		if !dc.Automatic {
			return &spec.SpecError{Key: "dowel.diameter_mm", Line: s.Line("dowel.diameter_mm"), Value: num(dc.DiameterMM),
				Problem: fmt.Sprintf("stands on the axis where the centre feed's cable comes through: its foot must be bored Ø%.2f mm for the cable and keep a %s mm wall, so it must be at least %.2f mm thick", foot.BoreMM, num(MinRodWallMM), need),
				Fix:     fmt.Sprintf("give a rod of %.2f–%.2f mm, omit diameter_mm to choose one, or set coil.feed = \"periphery\"", need, room)}
		}
		rod, err := chooseRod(s.Dowel.Material, room, dc.LengthMM, 2*smallestTurnRadius(d.Coil), 0, foot.BoreMM)
		if err != nil {
			return &spec.SpecError{Key: "coil.feed", Line: s.Line("coil.feed"), Value: fmt.Sprintf("%q", s.Coil.Feed),
				Problem: fmt.Sprintf("puts the cable on the axis, where the support rod stands: a rod bored Ø%.2f mm for it with a %s mm wall must be at least %.2f mm thick, and only %.2f mm fits inside the smallest turn", foot.BoreMM, num(MinRodWallMM), need, room),
				Fix:     "set coil.feed = \"periphery\", use a thinner cable (coax.type) or a larger coil, or reduce dowel.clearance_mm"}
		}
		dc.Rod, dc.DiameterMM, dc.BoreMM = rod, rod.OuterMM, rod.BoreMM
		return fitCentreFeedRod(d, dc, room) // the rod chosen clears the cable
	}
	dc.Foot = &foot
	dc.SlotWidthMM, dc.SlotDepthMM = foot.SlotWidthMM, foot.BoreDepthMM
	return nil
}
