package jig

import "math"

// formerLandMM is the flange face's clearance from the groove, mm. Common
// practice (no published source).
const formerLandMM = 1.0

// extent is where a former's parts lie along the coil's axis (coil frame:
// z from the reflector face) and how wide its flange is, all in mm.
type extent struct {
	flipped            bool    // the coil widens upward, so it prints flange at its top
	zLo, zHi           float64 // lowest and highest point of the groove with its lead-in and run-out
	flangeFace         float64 // the flange's inner face
	outer              float64 // the flange's outer face, z = 0 in print coordinates
	freeEnd            float64 // the core's free end
	height             float64 // overall height along the axis
	rWide              float64 // core radius at the wide end
	flangeRadius       float64 // rWide plus the flange margin
	startBottom, floor float64 // groove bottom radius at the start, and its least value
}

// envelope works out the extent of the former for path with sizes p. The
// groove's lead-in and run-out leave the core at a tenth of the end slope;
// the land and flange sit at the wide end (so the former prints flange
// down) and the end margin at the other.
func envelope(path WirePath, p FormerParams) extent {
	span := path.Span()
	a := (p.Wire + p.Clearance) / 2
	rs, re := path.Radius(0), path.Radius(span)
	e := extent{flipped: re > rs}
	e.zLo = path.Z(0) - p.LeadIn*0.1*slope(path.Z, 0) - a*math.Sqrt2
	e.zHi = path.Z(span) + p.RunOut*0.1*slope(path.Z, span) + a*math.Sqrt2
	up := 1.0
	if !e.flipped {
		e.flangeFace = math.Min(0, e.zLo-formerLandMM)
		e.freeEnd = e.zHi + p.EndMargin
	} else {
		up = -1
		e.flangeFace = e.zHi + formerLandMM
		e.freeEnd = e.zLo - p.EndMargin
	}
	e.outer = e.flangeFace - up*p.FlangeThickness
	e.height = math.Abs(e.freeEnd - e.outer)
	e.rWide = math.Max(rs, re) - p.Wire/2 + p.GrooveDepth
	e.flangeRadius = e.rWide + p.FlangeMargin
	e.startBottom = rs - p.Wire/2
	e.floor = math.Min(rs, re) - p.Wire/2
	return e
}

// driveRadius returns the radius of the drive cut in mm: the hex socket's
// corner radius or the bore's radius.
func (p FormerParams) driveRadius() float64 {
	if p.Drive == HexSocket {
		return p.HexAcrossFlats / math.Sqrt(3)
	}
	return p.BoreDiameter / 2
}
