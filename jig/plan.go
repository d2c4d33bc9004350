package jig

import (
	"errors"
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/parts"
)

// Former fit limits in mm. The wall and land minima are three 0.4 mm
// perimeters. Common practice (no published source).
const (
	MinWallMM       = 1.2 // least wall left by the groove, holes and drive cut
	MinGrooveLandMM = 0.8 // least land between neighbouring grooves
)

// FitKind names the size of a former that does not fit.
type FitKind int

// The fit problems Plan finds.
const (
	FitGrooveSpacing FitKind = iota // turns closer than the groove and its land need
	FitGrooveRadius                 // groove too large for the former's smallest radius
	FitDriveWall                    // drive cut leaves too thin a wall under the groove
	FitLockHole                     // wire-lock hole shallower than half a wire diameter
	FitHexDepth                     // hex socket with its roof deeper than the former allows
	FitLettering                    // flange too narrow for legible letters
	FitGrooveSweep                  // groove section wider than the winding leaves room for, lead-in and run-out included
	FitFeedChannel                  // centre feed: the lead channel crosses the axis too far for a wall under the groove opposite
	FitDriveDepth                   // centre feed: the drive cut from the far end reaches too close to the lead channel
	FitRodEngagement                // centre feed, split: the rod's blind bore enters the section holding the lead channel too little
)

// FitProblem is one size the former cannot be made with: which size, what
// it needs and what the design leaves, in mm.
type FitProblem struct {
	Kind      FitKind
	Needed    float64 // mm the former needs
	Available float64 // mm the design leaves
	Groove    float64 // groove width in mm, for the groove problems
}

// Error describes the problem in the former's own terms.
func (p FitProblem) Error() string {
	switch p.Kind {
	case FitGrooveSpacing:
		return fmt.Sprintf("the former's %.2f mm groove needs turns at least %.2f mm apart; the smallest spacing is %.2f mm", p.Groove, p.Needed, p.Available)
	case FitGrooveRadius:
		return fmt.Sprintf("the former's %.2f mm groove needs a radius of %.2f mm; the smallest is %.2f mm", p.Groove, p.Needed, p.Available)
	case FitDriveWall:
		return fmt.Sprintf("the drive cut leaves a %.2f mm wall under the groove; at least %.2f mm is needed", p.Available, p.Needed)
	case FitLockHole:
		return fmt.Sprintf("%.2f mm of wire-lock hole fits above the drive cut; at least %.2f mm is needed", p.Available, p.Needed)
	case FitHexDepth:
		return fmt.Sprintf("the hex socket with its roof and wall needs %.1f mm of the %.1f mm former", p.Needed, p.Available)
	case FitGrooveSweep:
		return fmt.Sprintf("the groove's section reaches %.2f mm from its centre; the winding, with its lead-in and run-out, leaves %.2f mm", p.Needed, p.Available)
	case FitLettering:
		return fmt.Sprintf("the flange leaves room for %.1f mm letters; at least %.1f mm is needed", p.Available, p.Needed)
	case FitFeedChannel:
		return fmt.Sprintf("the feed lead's channel with its end wall reaches %.2f mm past the axis; the groove bottom opposite is %.2f mm from it", p.Needed, p.Available)
	case FitRodEngagement:
		return fmt.Sprintf("the support rod's blind bore enters the section holding the feed lead's channel %.1f mm; at least %.1f mm is needed to hold the rod and clear the key peg", p.Available, p.Needed)
	case FitDriveDepth:
		return fmt.Sprintf("the drive cut with its roof reaches %.1f mm from the end away from the feed; %.1f mm fits before the feed lead's channel and its wall", p.Needed, p.Available)
	}
	return fmt.Sprintf("former size %d: needs %.2f mm, has %.2f mm", p.Kind, p.Needed, p.Available)
}

// FormerPlan is the former planned for a design: the path its groove
// carries, its sizes, its envelope and the fit problems that stop it being
// made. It is the one place the former's sizes are worked out; the design
// report, check and build all read it.
type FormerPlan struct {
	Path       parts.Coil   // the springback-compensated wire centreline
	Params     FormerParams // sizes, with the drive chosen
	HeightMM   float64      // overall height along the axis
	DiameterMM float64      // flange diameter
	// FitsPrinter reports whether the former fits the spec's print volume
	// ([former] print_height_mm, print_width_mm); one that does not is not
	// meshed.
	FitsPrinter bool
	// DriveChanged reports that the default hex socket did not fit and a
	// through-bore as wide as the walls allow was planned instead.
	DriveChanged bool
	// LockHoleMM is the depth of the wire-lock hole below the groove
	// bottom as modelled: the lock end the hole takes when the wire is bent
	// into it at a right angle. For a centre feed the hole is the feed
	// lead's channel and this is the lead's length, Design.FeedRun.
	LockHoleMM float64
	// DriveMM is how far the drive cut reaches along the axis from its
	// face, its roof included; 0 for a through-bore. A centre feed's drive
	// cut enters from the end away from the feed (Params.CentreFeed).
	DriveMM  float64
	Problems []FitProblem // empty when the former can be made
}

// Plan sizes the former for d from its [former] table: the groove must fit
// between turns with a land and stay clear of the axis, the drive cut must
// leave a wall under the groove and room for the wire-lock hole, the hex
// socket must fit the height and the lettering the flange. When the spec
// does not name a drive and the default hex socket does not fit, the plan
// falls back to a through-bore as wide as the walls allow. A centre feed's
// lock hole is the feed lead's channel, Design.FeedRun deep, and its drive
// cut is blind from the other end (planCentreFeed).
func Plan(d *parts.Design) FormerPlan {
	s := d.Spec
	f := &s.Former
	deg := math.Pi / 180
	wire := s.Wire.DiameterMM
	p := FormerParams{
		Hand:            int(d.Former.Hand),
		Wire:            wire,
		Clearance:       f.ClearanceMM,
		GrooveDepth:     f.GrooveDepthRatio * wire,
		RoundGroove:     f.GrooveProfile == "round",
		LeadIn:          f.LeadInDeg * deg,
		RunOut:          f.RunOutDeg * deg,
		LockDepth:       f.LockHoleDepthMM,
		NotchWidth:      f.StopNotchMM,
		FlangeMargin:    f.FlangeMarginMM,
		FlangeThickness: f.FlangeThicknessMM,
		FlatDepth:       f.FlatDepthMM,
		Chamfer:         f.ChamferMM,
		Fillet:          f.FilletMM,
		HexAcrossFlats:  f.HexAcrossFlatsMM,
		HexDepth:        f.HexDepthMM,
		BoreDiameter:    f.BoreDiameterMM,
		EngraveDepth:    f.EngraveDepthMM,
		TextHeight:      f.TextHeightMM,
		EndMargin:       f.EndMarginMM,
		MinWall:         MinWallMM,
		Labels:          [2]string{d.Former.Hand.String(), FrequencyLabel(s.FrequencyMHz)},
	}
	if f.Drive == "bore" {
		p.Drive = ThroughBore
	}
	if d.CentreFed() {
		// The lock end is the feed lead: the hole takes all of it.
		p.CentreFeed, p.LockDepth = true, d.FeedRun()
	}
	path := d.Former
	pl := FormerPlan{Path: path, Params: p}
	a := (wire + p.Clearance) / 2
	e := envelope(path, p)
	pl.HeightMM, pl.DiameterMM = e.height, 2*e.flangeRadius
	pl.FitsPrinter = pl.HeightMM <= f.PrintHeightMM && pl.DiameterMM <= f.PrintWidthMM

	// The teardrop's mouth spans a(1 + √2) along the axis; the swept
	// groove needs 3.5 groove radii of spacing and of radius to tell
	// neighbouring turns apart.
	needS := math.Max(a*(1+math.Sqrt2)+MinGrooveLandMM, 3.5*a)
	if sp := path.MinSpacing(); sp < needS {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitGrooveSpacing, Needed: needS, Available: sp, Groove: 2 * a})
	}
	rmin := math.Min(path.StartRadius, path.EndRadius)
	if 3.5*a > rmin {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitGrooveRadius, Needed: 3.5 * a, Available: rmin, Groove: 2 * a})
		return pl
	}
	return planDrive(pl, e, s.Line("former.drive") != 0, s.Line("former.bore_diameter_mm") != 0)
}

// OnRod returns the plan of the same former printed in sections that stack
// on a support rod rodMM thick (Former.Split): its drive cut is the rod's
// bore, rodMM plus twice JointClearanceMM wide, and the wire-lock hole,
// the drive's reach and the fit problems are planned again around it. A
// periphery feed's bore runs through every section and its lock hole stops
// a wall short of it. A centre feed's bore is blind from the end away from
// the feed and stops a wall short of the lead channel, so the channel keeps
// the whole feed lead and the rod ends in the section that holds it.
func (pl FormerPlan) OnRod(rodMM float64) FormerPlan {
	q := pl
	q.Params.Drive, q.Params.BoreDiameter, q.Params.BoreDepth = ThroughBore, rodMM+2*JointClearanceMM, 0
	q.DriveChanged, q.LockHoleMM, q.DriveMM = false, 0, 0
	q.Problems = nil
	for _, p := range pl.Problems {
		if p.Kind == FitGrooveSpacing || p.Kind == FitGrooveRadius {
			q.Problems = append(q.Problems, p)
		}
	}
	if len(q.Problems) > 0 {
		return q
	}
	return planDrive(q, envelope(q.Path, q.Params), true, true)
}

// planDrive plans the drive cut and the wire-lock hole of a former whose
// groove fits, then the groove sweep and the lettering. driveNamed and
// boreNamed report that the spec names the drive and the bore's diameter,
// which are then kept; otherwise a hex socket that does not fit the walls
// falls back to a bore as wide as they allow.
func planDrive(pl FormerPlan, e extent, driveNamed, boreNamed bool) FormerPlan {
	p, wire := pl.Params, pl.Params.Wire
	if p.CentreFeed {
		return planCentreFeed(pl, e, driveNamed, boreNamed)
	}
	// Room for the drive: a wall under the groove everywhere and a
	// wire-lock hole of at least one wire diameter at the start.
	room := math.Min(e.floor-MinWallMM, e.startBottom-MinWallMM-wire)
	if p.Drive == HexSocket && !driveNamed && p.driveRadius() > room {
		pl.Params.Drive, pl.DriveChanged = ThroughBore, true
		if !boreNamed {
			// Half a millimetre inside the limit, on a 0.1 mm step.
			pl.Params.BoreDiameter = math.Max(1, math.Min(p.BoreDiameter, math.Floor(20*(room-0.5))/10))
		}
		p = pl.Params
	}
	driveR := p.driveRadius()
	if wall := e.floor - driveR; wall < MinWallMM {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitDriveWall, Needed: MinWallMM, Available: wall})
		return pl
	}
	// The wire-lock hole stops a wall short of the drive cut; it must still
	// take half a wire diameter of wire.
	avail := math.Min(p.LockDepth, e.startBottom-driveR-lockFloor(p))
	pl.LockHoleMM = avail
	if avail < wire/2 {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitLockHole, Needed: wire / 2, Available: avail})
	}
	if p.Drive == HexSocket && p.HexDepth+driveR > e.height-MinWallMM {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitHexDepth, Needed: p.HexDepth + driveR + MinWallMM, Available: e.height})
	}
	if p.Drive == HexSocket {
		pl.DriveMM = p.HexDepth + driveR
	}
	return planGrooveAndLetters(pl, e)
}

// planGrooveAndLetters adds the groove-sweep and lettering problems, the
// last checks of every plan.
func planGrooveAndLetters(pl FormerPlan, e extent) FormerPlan {
	p, path := pl.Params, pl.Path
	a := (p.Wire + p.Clearance) / 2
	if len(pl.Problems) == 0 {
		if _, err := grooveSweep(path, p, a, 1); err != nil {
			pl.Problems = append(pl.Problems, grooveSweepProblem(path, p, a))
		}
	}
	if th := letterHeight(p, e.rWide+p.Fillet, e.flangeRadius-p.Chamfer); th < minTextHeight {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitLettering, Needed: minTextHeight, Available: th})
	}
	return pl
}

// planCentreFeed plans the drive and the lead channel of a centre-fed
// former. The channel, LockDepth (the feed lead's length) below the groove
// bottom, may cross the axis; it must leave lockFloor under the groove
// bottom opposite. The drive cut enters from the end away from the feed
// and must stop MinWall short of the channel, so a through-bore becomes a
// blind bore as deep as that allows, and the default hex socket that does
// not fit the walls falls back to such a bore.
func planCentreFeed(pl FormerPlan, e extent, driveNamed, boreNamed bool) FormerPlan {
	p, path := &pl.Params, pl.Path
	if room := e.floor - MinWallMM; p.Drive == HexSocket && !driveNamed && p.driveRadius() > room {
		p.Drive, pl.DriveChanged = ThroughBore, true
		if !boreNamed {
			// Half a millimetre inside the limit, on a 0.1 mm step.
			p.BoreDiameter = math.Max(1, math.Min(p.BoreDiameter, math.Floor(20*(room-0.5))/10))
		}
	}
	driveR := p.driveRadius()
	if wall := e.floor - driveR; wall < MinWallMM {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitDriveWall, Needed: MinWallMM, Available: wall})
		return pl
	}
	reach := channelRoom(path, *p, e)
	if p.Drive == ThroughBore {
		// As deep as the channel's wall allows, on a 0.1 mm step, and at
		// least one bore diameter deep to hold its rod. Common practice
		// (no published source).
		p.BoreDepth = math.Floor(10*(reach-driveR)) / 10
		if p.BoreDepth < 2*driveR {
			pl.Problems = append(pl.Problems, FitProblem{Kind: FitDriveDepth, Needed: 3 * driveR, Available: reach})
			p.BoreDepth = 0
		}
	} else if p.HexDepth+driveR > reach {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitDriveDepth, Needed: p.HexDepth + driveR, Available: reach})
	}
	pl.DriveMM = p.driveReach()
	pl.LockHoleMM = p.LockDepth
	// The channel's end lies LockDepth below the start's groove bottom:
	// past the axis when the lead is longer than that radius.
	past := p.LockDepth - e.startBottom
	if far := farGrooveBottom(path, *p); past+lockFloor(*p) > far {
		pl.Problems = append(pl.Problems, FitProblem{Kind: FitFeedChannel, Needed: past + lockFloor(*p), Available: far})
	}
	return planGrooveAndLetters(pl, e)
}

// Former builds the planned former. It refuses a plan with fit problems,
// returning them joined.
func (pl FormerPlan) Former() (*Former, error) {
	if len(pl.Problems) > 0 {
		errs := make([]error, len(pl.Problems))
		for i, p := range pl.Problems {
			errs[i] = p
		}
		return nil, errors.Join(errs...)
	}
	return NewFormer(pl.Path, pl.Params)
}

// grooveSweepProblem measures why the groove cannot be swept: how far its
// section reaches from its centre, against half the least rise over one
// turn of the groove (lead-in and run-out included) or half its least
// radius, sampled every degree.
func grooveSweepProblem(path WirePath, p FormerParams, a float64) FitProblem {
	h := grooveHelix(path, p, a)
	const step = math.Pi / 180
	turn := int(math.Round(2 * math.Pi / step))
	var zs []float64
	rmin := math.Inf(1)
	for phi := h.Start; phi <= h.End; phi += step {
		zs = append(zs, h.Z(phi))
		rmin = math.Min(rmin, h.Radius(phi))
	}
	rise := math.Inf(1)
	for i := 0; i+turn < len(zs); i++ {
		rise = math.Min(rise, zs[i+turn]-zs[i])
	}
	extent := 0.0
	if prof, err := grooveSection(a, 1, p.RoundGroove); err == nil {
		b := prof.Bounds()
		for _, c := range []geom.Vec2{b.Min, b.Max, {X: b.Min.X, Y: b.Max.Y}, {X: b.Max.X, Y: b.Min.Y}} {
			extent = math.Max(extent, c.Len())
		}
	}
	return FitProblem{Kind: FitGrooveSweep, Needed: extent, Available: math.Min(rise, rmin) / 2, Groove: 2 * a}
}
