package jig

import "math"

// A centre feed's lead runs radially from the start of the winding in to
// the axis, so the former's wire-lock hole at the start is the lead's own
// channel: the bent lock end lies in it, and the channel sets the lead's
// right-angle bend, its length and its direction. A drive cut on the axis
// cannot share the channel's height, so it enters from the former's other
// end and stops a wall short of the channel.

// throughBore reports whether the drive cut is a bore through the whole
// former.
func (p FormerParams) throughBore() bool { return p.Drive == ThroughBore && p.BoreDepth == 0 }

// driveFromTop reports whether the drive cut enters from the former's top
// in print coordinates (its free end) instead of the flange face: for a
// centre feed whose feed end is at the flange.
func (p FormerParams) driveFromTop(flipped bool) bool {
	return p.CentreFeed && !flipped && !p.throughBore()
}

// driveReach returns how far a blind drive cut reaches along the axis from
// its face, its 45° roof included, mm; +Inf for a through-bore.
func (p FormerParams) driveReach() float64 {
	switch {
	case p.Drive == HexSocket:
		return p.HexDepth + p.driveRadius()
	case p.BoreDepth > 0:
		return p.BoreDepth + p.driveRadius()
	}
	return math.Inf(1)
}

// channelRoom returns how far a drive cut may reach along the axis from
// its face, roof included, and still leave MinWall before a centre feed's
// lead channel, mm.
func channelRoom(path WirePath, p FormerParams, e extent) float64 {
	a := (p.Wire + p.Clearance) / 2
	lo, hi := -a, a*math.Sqrt2 // the channel's section across the print's up axis
	if p.RoundGroove {
		hi = a
	}
	zc := path.Z(0) - e.outer // the channel's centre in print coordinates
	if e.flipped {
		zc = e.outer - path.Z(0)
		return zc + lo - p.MinWall
	}
	return e.height - (zc + hi) - p.MinWall
}

// farGrooveBottom returns the groove bottom's radius across the axis from
// the start of the winding, where a lead channel longer than the start's
// radius ends, mm: the lesser of the start's and the half turn's.
func farGrooveBottom(path WirePath, p FormerParams) float64 {
	return math.Min(path.Radius(0), path.Radius(math.Min(math.Pi, path.Span()))) - p.Wire/2
}
