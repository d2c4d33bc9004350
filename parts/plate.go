// The plate's layout: every hole through the reflector and every part that
// rests on one of its faces (the support rod's foot and its epoxy fillet,
// the rod screw's washer, the connector's flange or body, the mounting
// screws' washers, the matching strip's plan view), each as a circle or a
// square on the plate, and the pairs that come closer than their stated
// clearance. Two holes need a web of PlateWebMM between them; a part on a
// face needs FootprintClearMM from any hole and from any other part on the
// same face. Parts of one assembly (a screw hole and its washer, the
// flange's holes and body) are not checked against each other, nor is the
// strip against the hole its feed end joins.

package parts

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/parts/flat"
	"coilwright/parts/spec"
)

// PlateWebMM is the least web between two holes through the plate, mm.
// Common practice (no published source): about one sheet thickness or
// 1 mm, whichever is more; 1 mm is used (as for the plate's edge).
const PlateWebMM = flat.EdgeClearanceMM

// FootprintClearMM is the least gap between a part resting on a face and a
// hole or another part on that face, mm. Common practice (no published
// source): room for a fillet of solder or epoxy to stop short of it.
const FootprintClearMM = 0.5

// RodFilletLegMM is the epoxy fillet's leg round the rod's foot where the
// plate has room for it; MinRodFilletLegMM is the least leg that still
// holds the foot. Common practice (no published source).
const (
	RodFilletLegMM    = 2.0
	MinRodFilletLegMM = 0.5
)

// FlangeSideMM is the square flange of a four-hole flange jack, mm.
// From memory (connector vendors' drawings give 12.7 mm, 0.5 in).
const FlangeSideMM = 12.7

// BulkheadBodyMM is the across-corners size of a bulkhead jack's hex body
// and nut on the back face, mm. From memory: an 8 mm (5/16 in) hex, about
// 9.2 mm across corners.
const BulkheadBodyMM = 9.2

// mountingWasherRatio is a mounting screw's washer outside diameter over
// its clearance hole. Source: ISO 7089 (M3 washer Ø7 mm on a Ø3.2 mm
// clearance hole, ratio 2.19); taken as 2.2 for any hole size.
const mountingWasherRatio = 2.2

// washerODMM returns the outside diameter of the plain washer for a
// metric screw. Source: ISO 7089 (M3 7 mm, M4 9 mm, M5 10 mm).
func washerODMM(screw string) float64 {
	switch screw {
	case "M3":
		return 7
	case "M4":
		return 9
	case "M5":
		return 10
	}
	return 0
}

// PlateFace is the side of the plate a feature occupies.
type PlateFace int

const (
	// FaceThrough is a hole through the plate.
	FaceThrough PlateFace = iota
	// FaceFront is a part on the coil side.
	FaceFront
	// FaceBack is a part on the back, where the cable leaves.
	FaceBack
)

// String returns the face in words.
func (f PlateFace) String() string {
	switch f {
	case FaceThrough:
		return "through the plate"
	case FaceFront:
		return "on the coil side"
	case FaceBack:
		return "on the back"
	}
	return fmt.Sprintf("PlateFace(%d)", int(f))
}

// PlatePart is the assembly a feature belongs to.
type PlatePart int

const (
	// PartFeed is the feed cut-out and the connector or cable in it.
	PartFeed PlatePart = iota
	// PartRod is the support rod's foot and its screw.
	PartRod
	// PartMounting is one mounting hole and its washers.
	PartMounting
	// PartStrip is the matching strip's plan view.
	PartStrip
	// PartEdge is the plate's edge.
	PartEdge
)

// PlateFeature is one hole or footprint on the plate: a circle of Radius
// about Center, or, when Side > 0, a square of that side about Center
// turned by Angle.
type PlateFeature struct {
	Name   string
	Part   PlatePart
	Index  int // which mounting hole (0-based); 0 otherwise
	Face   PlateFace
	Center geom.Vec2
	Radius float64
	Side   float64
	Angle  float64
	// Joined marks the feed's pin hole and the connector's body, which the
	// strip's feed end meets by design.
	Joined bool
}

// reach returns the largest distance from the plate's centre that f
// covers.
func (f PlateFeature) reach() float64 {
	if f.Side > 0 {
		return f.Center.Len() + f.Side/math.Sqrt2
	}
	return f.Center.Len() + f.Radius
}

// gap returns the least distance between the edges of a and b (negative
// when they overlap). Two squares are taken as their circumscribed
// circles, which errs on the safe side.
func gap(a, b PlateFeature) float64 {
	if a.Side > 0 && b.Side == 0 {
		a, b = b, a
	}
	switch {
	case a.Side == 0 && b.Side == 0:
		return a.Center.Sub(b.Center).Len() - a.Radius - b.Radius
	case a.Side == 0:
		return squareDistance(a.Center, b) - a.Radius
	}
	return a.Center.Sub(b.Center).Len() - a.Side/math.Sqrt2 - b.Side/math.Sqrt2
}

// squareDistance returns the signed distance from p to the square
// feature s (negative inside).
// Source: Quilez, "2D distance functions" (signed distance to a box).
func squareDistance(p geom.Vec2, s PlateFeature) float64 {
	q := p.Sub(s.Center).Rotate(-s.Angle)
	h := s.Side / 2
	dx, dy := math.Abs(q.X)-h, math.Abs(q.Y)-h
	out := math.Hypot(math.Max(dx, 0), math.Max(dy, 0))
	return out + math.Min(math.Max(dx, dy), 0)
}

// PlateCollision is two features closer than their clearance.
type PlateCollision struct {
	A, B PlateFeature
	Gap  float64 // the distance between their edges, negative when they overlap
	Need float64 // the clearance asked for
}

// Error describes the collision in words.
func (c PlateCollision) Error() string {
	if c.B.Part == PartEdge {
		return fmt.Sprintf("the %s (%s) reaches %.2f mm past the plate's edge", c.A.Name, c.A.Face, -c.Gap)
	}
	if c.Gap < 0 {
		return fmt.Sprintf("the %s (%s) overlaps the %s (%s) by %.2f mm; at least %s mm between them is needed", c.A.Name, c.A.Face, c.B.Name, c.B.Face, -c.Gap, num(c.Need))
	}
	return fmt.Sprintf("the %s (%s) comes within %.2f mm of the %s (%s); at least %s mm between them is needed", c.A.Name, c.A.Face, c.Gap, c.B.Name, c.B.Face, num(c.Need))
}

// clearance returns the clearance a and b need, or false when the pair is
// not checked (one assembly, different faces, or the strip and the part
// its end joins).
func clearance(a, b PlateFeature) (float64, bool) {
	switch {
	case a.Part == b.Part && a.Index == b.Index:
		return 0, false
	case a.Face != FaceThrough && b.Face != FaceThrough && a.Face != b.Face:
		return 0, false
	case (a.Part == PartStrip && b.Joined) || (b.Part == PartStrip && a.Joined):
		return 0, false
	case a.Face == FaceThrough && b.Face == FaceThrough:
		return PlateWebMM, true
	}
	return FootprintClearMM, true
}

// PlateCollisions returns every pair of features closer than their
// clearance, and every footprint that leaves the plate, in feature order.
func PlateCollisions(fs []PlateFeature, in flat.ReflectorInput) []PlateCollision {
	var out []PlateCollision
	for i := range fs {
		for j := i + 1; j < len(fs); j++ {
			need, ok := clearance(fs[i], fs[j])
			if !ok {
				continue
			}
			if g := gap(fs[i], fs[j]); g < need-1e-9 {
				a, b := fs[i], fs[j]
				if b.Part < a.Part {
					a, b = b, a
				}
				out = append(out, PlateCollision{A: a, B: b, Gap: g, Need: need})
			}
		}
	}
	// Holes against the edge are the reflector's own check; footprints
	// must stay on the plate.
	edge := PlateFeature{Name: "plate's edge", Part: PartEdge}
	for _, f := range fs {
		if f.Face == FaceThrough || f.Part == PartStrip {
			continue
		}
		var g float64
		if in.Shape == flat.ReflectorSquare {
			g = -squareDistance(f.Center, PlateFeature{Side: in.Size}) - f.Radius
			if f.Side > 0 {
				g = in.Size/2 - (math.Max(math.Abs(f.Center.X), math.Abs(f.Center.Y)) + f.Side/math.Sqrt2)
			}
		} else {
			g = in.Size/2 - f.reach()
		}
		if g < -1e-9 {
			out = append(out, PlateCollision{A: f, B: edge, Gap: g})
		}
	}
	return out
}

// polar returns the point at radius r and angle a.
func polar(r, a float64) geom.Vec2 {
	s, c := math.Sincos(a)
	return geom.Vec2{X: r * c, Y: r * s}
}

// feedFeatures returns the feed cut-out's holes and the connector or
// cable's footprint on the back, for a feed at radius r and angle a.
// cableMM is the cable's outside diameter (coax feed).
func feedFeatures(f flat.FeedHole, r, a, cableMM float64) []PlateFeature {
	f = f.WithDefaults()
	c := polar(r, a)
	pin := PlateFeature{Name: "feed hole", Part: PartFeed, Face: FaceThrough, Center: c, Radius: f.Diameter / 2, Joined: true}
	switch f.Kind {
	case flat.FeedSMAFlange:
		out := []PlateFeature{pin}
		place := geom.Placement{Angle: a, Offset: c}
		for _, s := range []geom.Vec2{{X: 1, Y: 1}, {X: -1, Y: 1}, {X: -1, Y: -1}, {X: 1, Y: -1}} {
			out = append(out, PlateFeature{Name: "flange screw hole", Part: PartFeed, Face: FaceThrough,
				Center: place.Apply(s.Scale(f.ScrewPitch / 2)), Radius: f.ScrewDiameter / 2})
		}
		return append(out, PlateFeature{Name: "connector flange", Part: PartFeed, Face: FaceBack, Center: c, Side: FlangeSideMM, Angle: a, Joined: true})
	case flat.FeedSMABulkhead:
		return []PlateFeature{pin, {Name: "bulkhead jack's body", Part: PartFeed, Face: FaceBack, Center: c, Radius: BulkheadBodyMM / 2, Joined: true}}
	}
	return []PlateFeature{pin, {Name: "feed cable", Part: PartFeed, Face: FaceBack, Center: c, Radius: cableMM / 2, Joined: true}}
}

// roomAbout returns the largest radius about the centre that stays
// clearance away from every feature of fs on the given faces.
func roomAbout(fs []PlateFeature, faces ...PlateFace) float64 {
	room := math.Inf(1)
	probe := PlateFeature{}
	for _, f := range fs {
		for _, face := range faces {
			if f.Face == face {
				need := FootprintClearMM
				room = math.Min(room, gap(probe, f)-need)
			}
		}
	}
	return room
}

// rodPlateRoomMM returns the largest rod diameter whose foot, with the
// least epoxy fillet, clears the feed's holes: the room next to the feed.
func rodPlateRoomMM(fs []PlateFeature) float64 {
	return 2 * (roomAbout(fs, FaceThrough, FaceFront) - MinRodFilletLegMM)
}

// feedPlacement returns the feed point's radius and angle on the plate:
// on the axis for a centre feed, else under the coil's start (as
// Design.FeedPoint places it once the strip is known).
func feedPlacement(s *spec.Spec, c Coil) (r, a float64) {
	if s.Coil.Feed == "centre" {
		return 0, 0
	}
	return c.StartRadius, 0
}

// specFeedHole returns the feed cut-out the spec asks for and the cable's
// outside diameter.
func specFeedHole(s *spec.Spec) (flat.FeedHole, float64) {
	rs := &s.Reflector
	var f flat.FeedHole
	f = flat.FeedHole{Kind: flat.FeedKindByConnector(rs.Connector)}
	if f.Kind == flat.FeedCoax {
		f.Diameter = s.Coax.Cable().FeedHoleMM()
	}
	if rs.FeedHoleMM != nil {
		f.Diameter = *rs.FeedHoleMM
	}
	return f.WithDefaults(), s.Coax.Cable().Outer
}

// mountingFeatures returns the mounting holes and their washers on both
// faces.
func mountingFeatures(m flat.MountingHoles) []PlateFeature {
	var fs []PlateFeature
	for i := range m.Count {
		ctr := polar(m.PitchDiameter/2, m.Angle+2*math.Pi*float64(i)/float64(m.Count))
		name := fmt.Sprintf("mounting hole %d", i+1)
		fs = append(fs,
			PlateFeature{Name: name, Part: PartMounting, Index: i, Face: FaceThrough, Center: ctr, Radius: m.Diameter / 2},
			PlateFeature{Name: name + "'s washer", Part: PartMounting, Index: i, Face: FaceFront, Center: ctr, Radius: mountingWasherRatio * m.Diameter / 2},
			PlateFeature{Name: name + "'s washer", Part: PartMounting, Index: i, Face: FaceBack, Center: ctr, Radius: mountingWasherRatio * m.Diameter / 2})
	}
	return fs
}

// specMounting returns the mounting holes the spec asks for on a plate of
// the given size.
func specMounting(s *spec.Spec, size float64) flat.MountingHoles {
	rs := &s.Reflector
	return flat.MountingHoles{Count: rs.MountingHoles, Diameter: rs.MountingHoleMM,
		PitchDiameter: rs.MountingCircle(size), Angle: rs.MountingAngleDeg * math.Pi / 180}
}

// specPlateFeatures returns the feed's and mounting holes' features for a
// spec and its coil: what the rod's foot and screw must clear.
//
// A centre feed comes up on the axis through the rod's bored foot
// (RodFoot, sized by the rod chooser to pass the cable), so the rod need
// not clear the feed there: only the mounting holes are returned.
func specPlateFeatures(s *spec.Spec, c Coil) []PlateFeature {
	mounting := mountingFeatures(specMounting(s, s.Reflector.SizeMM(s.Wavelength())))
	if s.Coil.Feed == "centre" {
		return mounting
	}
	f, cable := specFeedHole(s)
	r, a := feedPlacement(s, c)
	return append(feedFeatures(f, r, a, cable), mounting...)
}

// PlateLayout is the plate's features, the rod's foot as fitted and the
// collisions left.
type PlateLayout struct {
	Features []PlateFeature
	// RodMM and FootMM are the rod's outside diameter and its foot's with
	// the epoxy fillet; FilletLegMM is the fillet's leg.
	RodMM, FootMM, FilletLegMM float64
	// ScrewHoleMM is the rod screw's clearance hole at the centre, 0 for
	// an epoxy foot; WasherMM its washer on the back.
	ScrewHoleMM, WasherMM float64
	Collisions            []PlateCollision
}

// newPlateLayout lays out the plate of in with the rod dc and the strip
// w (nil for none), on a coil c.
func newPlateLayout(in flat.ReflectorInput, dc DowelCut, w *flat.Wedge, c Coil, cableMM float64) PlateLayout {
	fs := append(feedFeatures(in.Feed, in.FeedRadius, in.FeedAngle, cableMM), mountingFeatures(in.Mounting)...)
	if w != nil {
		for _, st := range w.Stations {
			p := c.Point(st.Phi)
			fs = append(fs, PlateFeature{Name: "matching strip", Part: PartStrip, Face: FaceFront,
				Center: geom.Vec2{X: p.X, Y: p.Y}.Rotate(in.FeedAngle), Radius: st.Width / 2})
		}
	}
	pl := PlateLayout{}
	// A bored foot stands over a centre feed by design (RodFoot): it is
	// not a plate feature that must clear the feed.
	if !dc.OverFeed && dc.Foot == nil {
		// The fillet takes what room the foot leaves, up to its full leg.
		pl.RodMM = dc.DiameterMM
		leg := math.Min(RodFilletLegMM, roomAbout(fs, FaceThrough, FaceFront)-dc.DiameterMM/2)
		pl.FilletLegMM = math.Max(leg, MinRodFilletLegMM)
		pl.FootMM = dc.DiameterMM + 2*pl.FilletLegMM
		fs = append(fs, PlateFeature{Name: "support rod's foot and fillet", Part: PartRod, Face: FaceFront, Radius: pl.FootMM / 2})
		if mt := dc.Rod.Mount; mt.Screw != "" {
			pl.ScrewHoleMM, pl.WasherMM = mt.ClearMM, washerODMM(mt.Screw)
			fs = append(fs,
				PlateFeature{Name: "rod screw hole", Part: PartRod, Face: FaceThrough, Radius: mt.ClearMM / 2},
				PlateFeature{Name: mt.Screw + " washer", Part: PartRod, Face: FaceBack, Radius: pl.WasherMM / 2})
		}
	}
	pl.Features = fs
	pl.Collisions = PlateCollisions(fs, in)
	return pl
}
