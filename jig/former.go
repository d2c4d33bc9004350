package jig

// The former is assembled as a signed distance bound in the coil's own frame
// (z from the reflector face, the wire centreline at radius r(φ), height
// z(φ)) and then carried into print coordinates:
//
//   - the core is a solid of revolution whose radius at the height of each
//     point of the centreline is r(φ) − d/2 + groove depth, so the wire,
//     lying on the groove bottom, has its centre on r(φ);
//   - the groove is a helix sweep of a round or teardrop section of radius
//     (d + clearance)/2 whose centre runs half the clearance outside r(φ),
//     continued before the start (lead-in) and past the end (run-out) while
//     rising out of the core;
//   - a flange at the coil's wide end carries two vice flats and the
//     lettering; the core meets it in a fillet;
//   - a radial wire-lock hole sits at the start and a stop notch at the end,
//     both with 45° roofs;
//   - the solid is turned so that the flange lies on the bed (z = 0) and the
//     core narrows upward, then the drive socket or bore and the lettering
//     are cut in print coordinates.
//
// Every roof facing the bed is at 45° or steeper from the horizontal when the
// teardrop profile is used, so the former prints upright without supports.

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/jig/mesh"
	"coilwright/jig/sdf"
)

// WirePath is the wire centreline a former is built for: its radius and
// height in mm at azimuth φ, for φ from 0 at the feed end to Span() radians,
// z measured from the reflector face and rising with φ.
type WirePath interface {
	Radius(phi float64) float64
	Z(phi float64) float64
	Span() float64
}

// Drive is how a former is turned while winding.
type Drive int

// The drives.
const (
	HexSocket   Drive = iota // blind 1/4 in hex socket from the flange face
	ThroughBore              // round bore along the whole axis
)

// FormerParams are a former's sizes in mm and angles in radians.
type FormerParams struct {
	Hand            int     // +1 right-hand, −1 left-hand
	Wire            float64 // bare wire diameter
	Clearance       float64 // groove diameter over the wire
	GrooveDepth     float64 // groove bottom below the core surface
	RoundGroove     bool    // full-round groove instead of the teardrop
	LeadIn, RunOut  float64 // groove extensions before the start and past the end, rad
	LockDepth       float64 // wire-lock hole depth below the groove bottom
	NotchWidth      float64 // stop notch width
	FlangeMargin    float64 // flange radius beyond the core
	FlangeThickness float64
	FlatDepth       float64 // depth of each vice flat
	Chamfer         float64 // 45° chamfer on outer edges
	Fillet          float64 // rounding of inner corners and groove lips
	Drive           Drive
	HexAcrossFlats  float64
	HexDepth        float64
	BoreDiameter    float64
	EngraveDepth    float64
	TextHeight      float64
	EndMargin       float64 // core beyond the groove at the free end
	MinWall         float64 // least wall left by holes
	Labels          [2]string
	// CentreFeed makes the wire-lock hole a centre feed's lead channel: it
	// runs LockDepth below the groove bottom, across the axis when the
	// lead is longer than the start's radius, and the drive cut enters
	// from the former's end away from the feed, stopping a wall short of
	// the channel.
	CentreFeed bool
	// BoreDepth is a blind bore's depth from its face to the foot of its
	// 45° conical roof, mm; 0 for a bore through the whole former.
	BoreDepth float64
}

// Former is a winding former in print coordinates: the flange face on z = 0,
// the axis on z, the core narrowing upward. It is not modified after
// NewFormer.
type Former struct {
	Solid     sdf.SDF3 // the former's distance bound, mm
	Genus     int      // through-holes: 1 with a through-bore, else 0
	Height    float64  // overall height, mm
	Flipped   bool     // the coil's +z runs downward in print coordinates
	shift     float64  // print z = ±coil z + shift
	path      WirePath
	hand      int
	minRadius float64
	minWall   float64
}

// Centreline returns the wire centreline point at azimuth φ in print
// coordinates, in mm.
func (f *Former) Centreline(phi float64) geom.Vec3 {
	r := f.path.Radius(phi)
	s, c := math.Sincos(phi)
	p := geom.Vec3{X: r * c, Y: float64(f.hand) * r * s, Z: f.path.Z(phi)}
	if f.Flipped {
		p.Y, p.Z = -p.Y, -p.Z
	}
	p.Z += f.shift
	return p
}

// Mesh meshes the former at the given tolerance in mm (0 for
// DefaultTolerance), with the grid sized for its smallest radius, and at
// most that radius and half its thinnest wall, so that no groove or wall is
// lost between samples, then simplifies the mesh within the tolerance
// (MeshOptions.Simplify).
func (f *Former) Mesh(tol float64) (*geom.Mesh, error) {
	return mesh.Mesh(f.Solid, f.MeshOptions(tol, true))
}

// MeshOptions returns the options Mesh uses at tolerance tol in mm (0 for
// DefaultTolerance), with or without simplification.
func (f *Former) MeshOptions(tol float64, simplify bool) mesh.MeshOptions {
	if tol == 0 {
		tol = mesh.DefaultTolerance
	}
	cell := min(math.Sqrt(4*tol*f.minRadius), mesh.MaxCellPerTolerance*tol, f.minWall/2, f.minRadius)
	return mesh.MeshOptions{Tolerance: tol, Cell: cell, Simplify: simplify}
}

// formerError reports a size that cannot make a former.
func formerError(format string, args ...any) error {
	return fmt.Errorf(format, args...)
}

// NewFormer builds the former for path with the sizes in p.
func NewFormer(path WirePath, p FormerParams) (*Former, error) {
	if p.Hand != 1 && p.Hand != -1 {
		return nil, formerError("hand %d must be +1 or −1", p.Hand)
	}
	span := path.Span()
	d := p.Wire
	a := (d + p.Clearance) / 2
	if !(d > 0) || !(span > 0) || !(p.GrooveDepth > 0) {
		return nil, formerError("wire %g mm, span %g rad and groove depth %g mm must be above 0", d, span, p.GrooveDepth)
	}
	rs, re := path.Radius(0), path.Radius(span)
	f := &Former{path: path, hand: p.Hand, Flipped: re > rs, minRadius: a, minWall: p.MinWall}
	if p.Fillet > 0 {
		f.minRadius = min(a, p.Fillet)
	}
	up := 1.0 // print up along coil z
	if f.Flipped {
		up = -1
	}
	coreR := func(phi float64) float64 { return path.Radius(phi) - d/2 + p.GrooveDepth }

	groove, err := grooveSweep(path, p, a, up)
	if err != nil {
		return nil, err
	}
	// Core profile samples from the flange end to the free end.
	prof := coreProfile(path, coreR)
	e := envelope(path, p)
	flangeFace, freeEnd, rWide := e.flangeFace, e.freeEnd, e.rWide
	core, err := revolveCore(prof, flangeFace-up*1, freeEnd, p.Chamfer)
	if err != nil {
		return nil, err
	}
	flange, err := newFlange(rWide+p.FlangeMargin, flangeFace, flangeFace-up*p.FlangeThickness, p)
	if err != nil {
		return nil, err
	}
	body, err := sdf.Union(p.Fillet*blendPerRadius, core, flange)
	if err != nil {
		return nil, err
	}
	driveR := p.driveRadius()
	if p.CentreFeed && !p.throughBore() {
		if room := channelRoom(path, p, e); p.driveReach() > room {
			return nil, formerError("the drive cut reaches %.1f mm from its face; %.1f mm fits before the lead channel", p.driveReach(), room)
		}
	}
	lock, err := lockHole(path, p, a, up, driveR)
	if err != nil {
		return nil, err
	}
	notch, err := stopNotch(path, p, a, up, coreR(span), driveR)
	if err != nil {
		return nil, err
	}
	body, err = sdf.Difference(body, sdf.Cut{Shape: groove, Blend: p.Fillet * blendPerRadius}, sdf.Cut{Shape: lock}, sdf.Cut{Shape: notch})
	if err != nil {
		return nil, err
	}

	// Into print coordinates: flange outer face on z = 0.
	outer := e.outer
	move := sdf.Translation(geom.Vec3{Z: -outer})
	f.shift = -outer
	if f.Flipped {
		move = sdf.RotationX(math.Pi).Then(sdf.Translation(geom.Vec3{Z: outer}))
		f.shift = outer
	}
	f.Height = e.height
	printed := sdf.Move(body, move)

	cuts := []sdf.Cut{}
	drive, err := driveCut(p, f.Height, driveR)
	if err != nil {
		return nil, err
	}
	if p.driveFromTop(f.Flipped) {
		drive = sdf.Move(drive, sdf.RotationX(math.Pi).Then(sdf.Translation(geom.Vec3{Z: f.Height})))
	}
	cuts = append(cuts, sdf.Cut{Shape: drive})
	if p.Drive == ThroughBore && p.BoreDepth == 0 {
		f.Genus = 1
	}
	text, err := lettering(p, rWide+p.Fillet, rWide+p.FlangeMargin-p.Chamfer, p.FlangeThickness)
	if err != nil {
		return nil, err
	}
	// One union per label, so that points away from the lettering test
	// two boxes instead of one per glyph.
	for _, label := range text {
		u, err := sdf.Union(0, label...)
		if err != nil {
			return nil, err
		}
		cuts = append(cuts, sdf.Cut{Shape: u})
	}
	f.Solid, err = sdf.Difference(printed, cuts...)
	if err != nil {
		return nil, err
	}
	return f, nil
}

// blendPerRadius converts a fillet radius into the quadratic smooth-minimum
// blend width: for two surfaces meeting square, the blend of width k bends
// with radius k/√2 at its middle (worked from the blend formula).
const blendPerRadius = math.Sqrt2

// slope returns dz/dφ at phi by a central difference.
func slope(z func(float64) float64, phi float64) float64 {
	const h = 1e-4
	return (z(phi+h) - z(phi-h)) / (2 * h)
}

// grooveSweep returns the groove: the section swept along the centreline
// pushed out by half the clearance, extended by the lead-in and run-out with
// a tenth of the end slope while its radius rises quadratically until the
// whole section has left the core.
func grooveSweep(path WirePath, p FormerParams, a, up float64) (sdf.SDF3, error) {
	prof, err := grooveSection(a, up, p.RoundGroove)
	if err != nil {
		return nil, err
	}
	s, err := sdf.NewHelixSweep(grooveHelix(path, p, a), prof)
	if err != nil {
		return nil, formerError("groove: %w", err)
	}
	return s, nil
}

// grooveHelix returns the path of the groove's centre: half the clearance
// outside the wire centreline, continued before the start and past the end
// at a tenth of the end slopes while rising out of the core.
func grooveHelix(path WirePath, p FormerParams, a float64) sdf.Helix {
	span := path.Span()
	rise := p.GrooveDepth + 1.5*a
	s0, s1 := slope(path.Z, 0), slope(path.Z, span)
	return sdf.Helix{
		Radius: func(phi float64) float64 {
			switch {
			case phi < 0:
				t := -phi / p.LeadIn
				return path.Radius(0) + p.Clearance/2 + rise*t*t
			case phi > span:
				t := (phi - span) / p.RunOut
				return path.Radius(span) + p.Clearance/2 + rise*t*t
			}
			return path.Radius(phi) + p.Clearance/2
		},
		Z: func(phi float64) float64 {
			switch {
			case phi < 0:
				return path.Z(0) + 0.1*s0*phi
			case phi > span:
				return path.Z(span) + 0.1*s1*(phi-span)
			}
			return path.Z(phi)
		},
		Hand:  p.Hand,
		Start: -p.LeadIn,
		End:   span + p.RunOut,
	}
}

// grooveSection returns the groove's section in the plane normal to the
// wire, X outward and Y up the coil axis: a circle of radius a, with, for the
// teardrop, the two tangents at 45° meeting at a√2 on the print-up side.
func grooveSection(a, up float64, round bool) (sdf.SDF2, error) {
	c, err := sdf.NewCircle(geom.Vec2{}, a)
	if err != nil || round {
		return c, err
	}
	k := a / math.Sqrt2
	roof, err := sdf.NewPolygon(geom.Polyline{{X: -k, Y: up * k}, {X: k, Y: up * k}, {X: 0, Y: up * a * math.Sqrt2}})
	if err != nil {
		return nil, err
	}
	return sdf.Union2(c, roof)
}

// coreProfile samples the core radius against height along the winding, 32
// samples a turn, dropping samples that a straight line through their
// neighbours already places within 2 µm (Douglas–Peucker).
func coreProfile(path WirePath, coreR func(float64) float64) geom.Polyline {
	span := path.Span()
	n := int(math.Ceil(span/(2*math.Pi)*32)) + 1
	pts := make(geom.Polyline, n)
	for i := range pts {
		phi := span * float64(i) / float64(n-1)
		pts[i] = geom.Vec2{X: coreR(phi), Y: path.Z(phi)}
	}
	return simplify(pts, 0.002)
}

// simplify keeps the end points and every point farther than tol from the
// chord of the run it lies in.
func simplify(p geom.Polyline, tol float64) geom.Polyline {
	if len(p) < 3 {
		return p
	}
	a, b := p[0], p[len(p)-1]
	ab := b.Sub(a)
	far, fi := -1.0, 0
	for i := 1; i < len(p)-1; i++ {
		d := math.Abs(ab.Cross(p[i].Sub(a))) / ab.Len()
		if d > far {
			far, fi = d, i
		}
	}
	if far <= tol {
		return geom.Polyline{a, b}
	}
	l := simplify(p[:fi+1], tol)
	return append(l[:len(l)-1], simplify(p[fi:], tol)...)
}

// revolveCore returns the core: the profile continued at constant radius to
// the heights zFlange (inside the flange) and zFree (the free end, with a
// chamfer), drawn symmetric about the axis and revolved.
func revolveCore(prof geom.Polyline, zFlange, zFree, chamfer float64) (sdf.SDF3, error) {
	// Order the profile from the flange to the free end.
	pts := append(geom.Polyline(nil), prof...)
	if math.Abs(pts[0].Y-zFlange) > math.Abs(pts[len(pts)-1].Y-zFlange) {
		for i, j := 0, len(pts)-1; i < j; i, j = i+1, j-1 {
			pts[i], pts[j] = pts[j], pts[i]
		}
	}
	dir := math.Copysign(1, zFree-zFlange)
	rf, rt := pts[0].X, pts[len(pts)-1].X
	half := geom.Polyline{{X: rf, Y: zFlange}}
	half = append(half, pts...)
	half = append(half, geom.Vec2{X: rt, Y: zFree - dir*chamfer}, geom.Vec2{X: rt - chamfer, Y: zFree})
	poly := make(geom.Polyline, 0, 2*len(half))
	poly = append(poly, half...)
	for i := len(half) - 1; i >= 0; i-- {
		poly = append(poly, geom.Vec2{X: -half[i].X, Y: half[i].Y})
	}
	g, err := sdf.NewPolygon(poly)
	if err != nil {
		return nil, formerError("core profile: %w", err)
	}
	return sdf.NewRevolve(g)
}

// newFlange returns the flange disc of radius r between the heights face
// (toward the core) and outer, chamfered on both rims and cut by two vice
// flats normal to x.
func newFlange(r, face, outer float64, p FormerParams) (sdf.SDF3, error) {
	z0, z1 := math.Min(face, outer), math.Max(face, outer)
	ch := p.Chamfer
	half := geom.Polyline{{X: 0, Y: z0}, {X: r - ch, Y: z0}, {X: r, Y: z0 + ch}, {X: r, Y: z1 - ch}, {X: r - ch, Y: z1}, {X: 0, Y: z1}}
	poly := append(geom.Polyline(nil), half[1:5]...)
	for i := 4; i >= 1; i-- {
		poly = append(poly, geom.Vec2{X: -half[i].X, Y: half[i].Y})
	}
	g, err := sdf.NewPolygon(poly)
	if err != nil {
		return nil, err
	}
	disc, err := sdf.NewRevolve(g)
	if err != nil {
		return nil, err
	}
	if p.FlatDepth <= 0 {
		return disc, nil
	}
	slab, err := sdf.NewBox(geom.Vec3{X: 2 * (r - p.FlatDepth), Y: 2*r + 2, Z: z1 - z0 + 2})
	if err != nil {
		return nil, err
	}
	return sdf.Intersection(0, disc, sdf.Move(slab, sdf.Translation(geom.Vec3{Z: (z0 + z1) / 2})))
}

// lockHole returns the radial wire-lock hole at the start: the groove's
// section carried straight in from outside the core to LockDepth below the
// groove bottom, stopping a wall short of the drive cut. A centre feed's
// channel shares no height with the drive cut; it may cross the axis, and
// stops a wall short of the groove on the far side.
func lockHole(path WirePath, p FormerParams, a, up, driveR float64) (sdf.SDF3, error) {
	bottom := path.Radius(0) - p.Wire/2
	inner := math.Max(bottom-p.LockDepth, driveR+lockFloor(p))
	if p.CentreFeed && !p.throughBore() {
		inner = bottom - p.LockDepth
		if far := farGrooveBottom(path, p); -inner+lockFloor(p) > far {
			return nil, formerError("the %.2f mm lead channel reaches %.2f mm past the axis, leaving less than %.2f mm under the %.2f mm groove bottom opposite", p.LockDepth, -inner, lockFloor(p), far)
		}
	}
	if bottom-inner < p.Wire/2 {
		return nil, formerError("only %.2f mm of wire-lock hole fits above the drive cut", bottom-inner)
	}
	prof, err := grooveSection(a, 1, p.RoundGroove)
	if err != nil {
		return nil, err
	}
	outer := path.Radius(0) + p.GrooveDepth + 1
	e, err := sdf.NewExtrude(prof, inner, outer)
	if err != nil {
		return nil, err
	}
	x := geom.Vec3{Y: up} // section X along the tangent, Y up the print
	return sdf.Move(e, sdf.Frame(geom.Vec3{Z: path.Z(0)}, x, geom.Vec3{X: 1})), nil
}

// lockFloor returns the material left between the wire-lock hole's end and
// the drive cut, mm: the least wall, and at least one wire radius so the
// bent tail cannot push through. Common practice (no published source).
func lockFloor(p FormerParams) float64 { return math.Max(p.MinWall, p.Wire/2) }

// stopNotch returns the stop at the end of the winding: a radial pocket one
// wire diameter below the groove bottom (less where the drive cut needs its
// wall), as wide as NotchWidth, reaching from below the groove to its top,
// with a 45° roof.
func stopNotch(path WirePath, p FormerParams, a, up, coreR, driveR float64) (sdf.SDF3, error) {
	span := path.Span()
	r := path.Radius(span)
	// One wire diameter below the groove bottom, a wall short of the drive.
	in, out := max(r-p.Wire/2-p.Wire, driveR+p.MinWall), coreR+1
	lo, hi := -(a + p.Wire), a
	prof, err := sdf.NewPolygon(geom.Polyline{{X: in, Y: lo}, {X: out, Y: lo}, {X: out, Y: hi + out - in}, {X: in, Y: hi}})
	if err != nil {
		return nil, err
	}
	e, err := sdf.NewExtrude(prof, -p.NotchWidth/2, p.NotchWidth/2)
	if err != nil {
		return nil, err
	}
	s, c := math.Sincos(span)
	er := geom.Vec3{X: c, Y: float64(p.Hand) * s}
	z := er.Cross(geom.Vec3{Z: 1}).Scale(up)
	return sdf.Move(e, sdf.Frame(geom.Vec3{Z: path.Z(span)}, er, z)), nil
}

// driveCut returns, in print coordinates, the hex socket (with a 45° conical
// roof and a chamfered mouth) or the through-bore (chamfered at both ends).
func driveCut(p FormerParams, height, driveR float64) (sdf.SDF3, error) {
	// The 45° mouth chamfer runs from the drive's outer radius plus the
	// chamfer at the face until it lies wholly inside the drive cut.
	ch := p.Chamfer
	inner := driveR - 0.3
	if p.Drive == HexSocket {
		inner = p.HexAcrossFlats/2 - 0.3
	}
	top := driveR + ch - inner
	mouth, err := sdf.NewCone(top+1, driveR+ch+1, inner)
	if err != nil {
		return nil, err
	}
	bottomCh := sdf.Move(mouth, sdf.Translation(geom.Vec3{Z: (top - 1) / 2}))
	if p.Drive == ThroughBore && p.BoreDepth > 0 {
		// A blind bore with the hex socket's 45° conical roof.
		tall := p.BoreDepth + driveR + 1
		bore, err := sdf.NewCylinder(driveR, tall)
		if err != nil {
			return nil, err
		}
		roof, err := sdf.NewCone(tall, driveR+tall, 0)
		if err != nil {
			return nil, err
		}
		blind, err := sdf.Intersection(0,
			sdf.Move(bore, sdf.Translation(geom.Vec3{Z: tall/2 - 1})),
			sdf.Move(roof, sdf.Translation(geom.Vec3{Z: p.BoreDepth + driveR - tall/2})))
		if err != nil {
			return nil, err
		}
		return sdf.Union(0, blind, bottomCh)
	}
	if p.Drive == ThroughBore {
		bore, err := sdf.NewCylinder(driveR, height+2)
		if err != nil {
			return nil, err
		}
		topCh := sdf.Move(mouth, sdf.RotationX(math.Pi).Then(sdf.Translation(geom.Vec3{Z: height - (top-1)/2})))
		return sdf.Union(0, sdf.Move(bore, sdf.Translation(geom.Vec3{Z: height / 2})), bottomCh, topCh)
	}
	if p.HexDepth+driveR > height-p.MinWall {
		return nil, formerError("a %.1f mm hex socket with its roof does not fit in a %.1f mm former", p.HexDepth, height)
	}
	// The socket's corners are rounded: a printed corner is round anyway,
	// and the round keeps clear of a bit's corner while it lies within the
	// clearance (a round of radius ρ sits ρ(2/√3 − 1) inside a sharp corner).
	// Its roof is the 45° cone through the top of the corners, clipped by the
	// hexagon, so no part of it faces the bed flatter than 45°.
	round := min(p.Fillet, p.HexAcrossFlats/10)
	tall := p.HexDepth + driveR + 1
	hex, err := sdf.NewHexPrism(p.HexAcrossFlats-2*round, tall-2*round)
	if err != nil {
		return nil, err
	}
	roof, err := sdf.NewCone(tall, driveR+tall, 0)
	if err != nil {
		return nil, err
	}
	socket, err := sdf.Intersection(0,
		sdf.Move(sdf.Offset(hex, round), sdf.Translation(geom.Vec3{Z: tall/2 - 1})),
		sdf.Move(roof, sdf.Translation(geom.Vec3{Z: p.HexDepth + driveR - tall/2})))
	if err != nil {
		return nil, err
	}
	return sdf.Union(0, socket, bottomCh)
}

// minTextHeight is the smallest letter height in mm that a 0.4 mm nozzle
// still engraves legibly. Common practice (no published source).
const minTextHeight = 1.5

// lettering returns the glyph cuts of the two labels, label by label,
// V-engraved into the flange face at height top, set along arcs midway
// between radii rIn and rOut: the first across the +y side reading
// clockwise, the second across the −y side reading anticlockwise, both
// upright for a reader at −y.
func lettering(p FormerParams, rIn, rOut, top float64) ([][]sdf.SDF3, error) {
	// The letters shrink to fit the ring and an arc of 150° on each side,
	// clear of the vice flats.
	const arc = 5 * math.Pi / 6
	rt := (rIn + rOut) / 2
	th := letterHeight(p, rIn, rOut)
	if th < minTextHeight {
		return nil, formerError("the flange leaves room for %.1f mm letters; at least %g mm is needed (widen flange_margin_mm)", th, minTextHeight)
	}
	scale := th / glyphHeight
	pen := max(0.3, 0.13*th) // half the width of a stroke at the face
	var out [][]sdf.SDF3
	for li, label := range p.Labels {
		runes := []rune(label)
		if len(runes) == 0 {
			continue
		}
		var glyphCuts []sdf.SDF3
		width := (float64(len(runes))*glyphAdvance - (glyphAdvance - glyphWidth)) * scale
		sign, centre := -1.0, math.Pi/2 // clockwise across the top
		if li == 1 {
			sign, centre = 1, -math.Pi/2
		}
		for i, r := range runes {
			seg, err := glyphStrokes(r)
			if err != nil {
				return nil, err
			}
			if len(seg) == 0 {
				continue
			}
			// Arc position of the glyph's centre.
			along := (float64(i)*glyphAdvance+glyphWidth/2)*scale - width/2
			psi := centre + sign*along/rt
			s, c := math.Sincos(psi)
			radial := geom.Vec2{X: c, Y: s}
			tan := geom.Vec2{X: -s, Y: c}.Scale(sign)
			upv := radial.Scale(-sign)
			place := func(g geom.Vec2) geom.Vec2 {
				return radial.Scale(rt).Add(tan.Scale((g.X - glyphWidth/2) * scale)).Add(upv.Scale((g.Y - glyphHeight/2) * scale))
			}
			for k := range seg {
				seg[k] = [2]geom.Vec2{place(seg[k][0]), place(seg[k][1])}
			}
			e, err := sdf.NewVGroove(seg, top, p.EngraveDepth, pen)
			if err != nil {
				return nil, err
			}
			glyphCuts = append(glyphCuts, e)
		}
		if len(glyphCuts) > 0 {
			out = append(out, glyphCuts)
		}
	}
	return out, nil
}

// letterHeight returns the letter height in mm that fits both labels on
// the flange ring between radii rIn and rOut: at most TextHeight, 0.8 mm
// inside the ring, and each label within an arc of 150°.
func letterHeight(p FormerParams, rIn, rOut float64) float64 {
	const arc = 5 * math.Pi / 6
	rt := (rIn + rOut) / 2
	th := min(p.TextHeight, rOut-rIn-0.8)
	for _, label := range p.Labels {
		if n := float64(len([]rune(label))); n > 0 {
			th = min(th, arc*rt*glyphHeight/(n*glyphAdvance-(glyphAdvance-glyphWidth)))
		}
	}
	return th
}
