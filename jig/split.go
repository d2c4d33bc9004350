// Splitting a former too tall for the printer into sections that stack on
// the support rod: the former is cut by planes across its axis, each
// section keeps its part of the groove (so the groove runs on across each
// joint as the one model's surface), a bore takes the rod, and an
// off-axis peg on each section's top face fits a socket in the next one's
// bottom face so the sections can only go together one way round. Each
// section's number is engraved on its top face beside the bore.
//
// A centre-fed former's lock hole is the feed lead's channel, in to the
// axis and perhaps past it, so the rod cannot pass the section that holds
// the channel: the former's own bore (FormerPlan.OnRod) is blind from the
// end away from the feed and stops a wall short of the channel. The rod
// runs through every other section and ends in that one's blind bore,
// which must be deep enough to hold it and to keep the channel clear of
// the key peg and its socket at the joint.

package jig

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// Joint sizes, mm. Common practice (no published source): a 0.2 mm
// radial clearance is a sliding fit on a hobby FDM printer; the peg is as
// long as it is wide, and no thinner than 2 mm, which prints cleanly.
const (
	// JointClearanceMM is the radial clearance of the rod in the bore and
	// of the peg in its socket.
	JointClearanceMM = 0.2
	// jointPegMinMM and jointPegMaxMM bound the peg's radius.
	jointPegMinMM = 1.0
	jointPegMaxMM = 4.0
)

// Section is one printable piece of a split former.
type Section struct {
	Number int     // 1 at the flange
	Z0, Z1 float64 // the piece's span along the whole former's print z, mm
	// Solid is the piece in its own print coordinates: its bottom face
	// on z = 0. Its top peg stands PegHeight above Z1 − Z0.
	Solid sdf.SDF3
	Genus int // through-holes: 1 (the rod's bore), 0 for the section a blind bore ends in
}

// SplitPlan is how a former is cut into sections.
type SplitPlan struct {
	Sections  []Section
	RodBore   float64 // bore diameter, mm
	PegRadius float64 // key peg radius, mm
	PegAt     float64 // the peg's distance from the axis, mm
	PegHeight float64 // mm
}

// Split cuts the former into the fewest sections of equal height that
// each print within maxHeight (the peg included), on a rod of rodDiameter
// mm; p are the former's sizes, its drive the rod's bore (FormerPlan.OnRod).
// It refuses a rod that leaves no wall under the groove and a former
// already short enough, and for a centre feed's blind bore, one that enters
// the section holding the lead channel too little (a FitProblem of kind
// FitRodEngagement).
func (f *Former) Split(maxHeight, rodDiameter float64, p FormerParams) (*SplitPlan, error) {
	if !(maxHeight > 0) || !(rodDiameter > 0) {
		return nil, formerError("split: print height %g mm and rod %g mm must be above 0", maxHeight, rodDiameter)
	}
	// The smallest groove bottom radius: the bore and the peg must stay a
	// wall inside it.
	span := f.path.Span()
	bottom := math.Min(f.path.Radius(0), f.path.Radius(span)) - p.Wire/2
	boreR := rodDiameter/2 + JointClearanceMM
	room := bottom - p.MinWall - (boreR + p.MinWall)
	if room < 2*jointPegMinMM {
		return nil, formerError("split: a %.1f mm rod leaves %.2f mm between its bore and the groove for the key peg; at least %.1f mm is needed", rodDiameter, room, 2*jointPegMinMM)
	}
	sp := &SplitPlan{RodBore: 2 * boreR}
	sp.PegRadius = math.Min(jointPegMaxMM, room/2-JointClearanceMM)
	sp.PegAt = boreR + p.MinWall + room/2
	sp.PegHeight = 2 * sp.PegRadius
	n := int(math.Ceil(f.Height / (maxHeight - sp.PegHeight)))
	if n < 2 {
		return nil, formerError("split: the %.1f mm former already prints within %.1f mm", f.Height, maxHeight)
	}
	h := f.Height / float64(n)
	if h < 2*sp.PegHeight {
		return nil, formerError("split: %.1f mm sections are too short for a %.1f mm key peg", h, sp.PegHeight)
	}
	bore, err := sdf.NewCylinder(boreR, 2*f.Height+10)
	if err != nil {
		return nil, err
	}
	// A blind bore (a centre feed) is the former's own; it ends in the
	// section at the feed end, feed.
	feed, blind := -1, p.CentreFeed && !p.throughBore()
	if blind {
		if feed, err = blindBoreSection(f, p, n, h, sp); err != nil {
			return nil, err
		}
	}
	// The key sits on the side away from the coil's start, clear of the
	// lock hole at the flange end.
	pegX := geom.Vec3{X: -sp.PegAt}
	for i := range n {
		z0, z1 := float64(i)*h, float64(i+1)*h
		lo, err := sdf.NewHalfSpace(geom.Vec3{Z: -1}, geom.Vec3{Z: z0})
		if err != nil {
			return nil, err
		}
		hi, err := sdf.NewHalfSpace(geom.Vec3{Z: 1}, geom.Vec3{Z: z1})
		if err != nil {
			return nil, err
		}
		slab, err := sdf.Intersection(0, f.Solid, lo, hi)
		if err != nil {
			return nil, err
		}
		body := slab
		if i < n-1 {
			peg, err := sdf.NewCylinder(sp.PegRadius, sp.PegHeight+1)
			if err != nil {
				return nil, err
			}
			// From 1 mm inside the top face to PegHeight above it.
			body, err = sdf.Union(0, slab, sdf.Move(peg, sdf.Translation(pegX.Add(geom.Vec3{Z: z1 + (sp.PegHeight-1)/2}))))
			if err != nil {
				return nil, err
			}
		}
		var cuts []sdf.Cut
		if !blind {
			cuts = append(cuts, sdf.Cut{Shape: bore})
		}
		if i > 0 {
			depth := sp.PegHeight + JointClearanceMM
			socket, err := sdf.NewCylinder(sp.PegRadius+JointClearanceMM, 2*depth)
			if err != nil {
				return nil, err
			}
			cuts = append(cuts, sdf.Cut{Shape: sdf.Move(socket, sdf.Translation(pegX.Add(geom.Vec3{Z: z0})))})
		}
		num, err := sectionNumber(i+1, z1, boreR, sp, p)
		if err != nil {
			return nil, err
		}
		cuts = append(cuts, num...)
		solid, err := sdf.Difference(body, cuts...)
		if err != nil {
			return nil, err
		}
		genus := 1
		if i == feed {
			genus = 0
		}
		sp.Sections = append(sp.Sections, Section{Number: i + 1, Z0: z0, Z1: z1, Genus: genus,
			Solid: sdf.Move(solid, sdf.Translation(geom.Vec3{Z: -z0}))})
	}
	return sp, nil
}

// blindBoreSection returns the index of the section a centre feed's blind
// rod bore ends in, the one at the feed end, among n sections h mm tall,
// after checking that the bore enters it, to the foot of its roof, at
// least a bore diameter (to hold the rod; common practice, no published
// source) and at least the key peg's socket depth, so that the peg and
// its socket at the joint stay on the rod's side of the bore's end, clear
// of the channel beyond it.
func blindBoreSection(f *Former, p FormerParams, n int, h float64, sp *SplitPlan) (int, error) {
	// The bore enters from the end away from the feed: the top in print
	// coordinates unless the former is flipped.
	feed, enter := 0, h-(f.Height-p.BoreDepth)
	if f.Flipped {
		feed, enter = n-1, p.BoreDepth-(f.Height-h)
	}
	need := math.Max(sp.RodBore, sp.PegHeight+JointClearanceMM)
	if enter < need {
		return 0, FitProblem{Kind: FitRodEngagement, Needed: need, Available: enter}
	}
	return feed, nil
}

// sectionNumber returns the V-engraved cuts of a section's number on its
// top face at z, set beside the bore on the side opposite the peg.
func sectionNumber(n int, z, boreR float64, sp *SplitPlan, p FormerParams) ([]sdf.Cut, error) {
	text := fmt.Sprint(n)
	th := math.Min(p.TextHeight, 0.8*(sp.PegAt-boreR)*2)
	th = math.Max(th, minTextHeight)
	scale := th / glyphHeight
	pen := max(0.3, 0.13*th)
	x0 := boreR + p.MinWall + pen
	var cuts []sdf.Cut
	for i, r := range text {
		seg, err := glyphStrokes(r)
		if err != nil {
			return nil, err
		}
		for k := range seg {
			for j := range 2 {
				g := seg[k][j]
				seg[k][j] = geom.Vec2{X: x0 + (float64(i)*glyphAdvance+g.X)*scale, Y: (g.Y - glyphHeight/2) * scale}
			}
		}
		g, err := sdf.NewVGroove(seg, z, p.EngraveDepth, pen)
		if err != nil {
			return nil, err
		}
		cuts = append(cuts, sdf.Cut{Shape: g})
	}
	return cuts, nil
}
