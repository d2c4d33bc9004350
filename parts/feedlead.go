// The feed end as built: where the cable's centre conductor leaves the
// reflector, the lead from there to the winding, and the matching strip's
// centreline. Every part of the program that needs the feed geometry (the
// feed hole, the strip, the former's start, the field model) takes it from
// here, so they cannot disagree.

package parts

import (
	"math"

	"coilwright/cam/geom"
)

// FeedPoint returns where the feed leaves the reflector's top face, in the
// plate's plane (mm, the coil's axis at the origin): the centre of the feed
// hole. A centre feed comes up on the axis; a periphery feed comes up under
// the start of the winding.
// Source: DOMAIN.md §9 (Kraus: axial vs peripheral feed).
func (d *Design) FeedPoint() geom.Vec2 {
	if d.Spec.Coil.Feed == "periphery" {
		s := d.FeedStart()
		return geom.Vec2{X: s.X, Y: s.Y}
	}
	return geom.Vec2{}
}

// FeedStart returns the point where the feed lead meets the coil's first
// conductor (mm, z up from the reflector's top face): on the matching
// strip's centreline at mid-thickness under the wire's start when the design
// has a strip, otherwise the wire's centre at the start of the winding.
func (d *Design) FeedStart() geom.Vec3 {
	if st := d.StripCentreline(); len(st) > 0 {
		return st[0]
	}
	return d.Coil.Point(0)
}

// FeedLead returns the feed lead as built, from the feed point on the
// reflector's top face (z = 0) to FeedStart:
//   - periphery: the centre conductor rises straight up under the start of
//     the winding (two points);
//   - centre: the centre conductor rises on the axis to FeedStart's height,
//     then the lead runs out radially to the start of the winding (three
//     points).
//
// Common practice (no published source): the lead is kept as short as the
// feed allows and runs at the height of the winding's start.
func (d *Design) FeedLead() geom.Path3 {
	s := d.FeedStart()
	if d.Spec.Coil.Feed == "periphery" {
		return geom.Path3{{X: s.X, Y: s.Y}, s}
	}
	return geom.Path3{{}, {Z: s.Z}, s}
}

// StripCentreline returns the matching strip's centreline at mid-thickness,
// one point per width station of Patterns.Wedge (mm, z up from the
// reflector's top face), and nil when the design has no strip. The strip
// lies under the wire: its centre is half the wire diameter and half the
// sheet thickness below the wire's centre.
func (d *Design) StripCentreline() geom.Path3 {
	if d.Patterns == nil || d.Patterns.Wedge == nil {
		return nil
	}
	t := d.Spec.Wedge.ThicknessMM
	out := make(geom.Path3, len(d.Patterns.Wedge.Stations))
	for i, st := range d.Patterns.Wedge.Stations {
		p := d.Coil.Point(st.Phi)
		p.Z = st.Height + t/2
		out[i] = p
	}
	return out
}

// StripEnd returns the winding angle (rad) at which the matching strip
// ends, 0 when the design has none.
func (d *Design) StripEnd() float64 {
	if d.Patterns == nil || d.Patterns.Wedge == nil || len(d.Patterns.Wedge.Stations) == 0 {
		return 0
	}
	st := d.Patterns.Wedge.Stations
	return math.Max(0, st[len(st)-1].Phi)
}

// CentreFed reports whether the cable comes up on the coil's axis (a
// centre feed) rather than under the start of the winding.
func (d *Design) CentreFed() bool { return d.Spec.Coil.Feed != "periphery" }

// FeedRise returns the height of the feed lead's vertical part, from the
// reflector's top face to FeedStart (mm).
func (d *Design) FeedRise() float64 { return d.FeedStart().Z }

// FeedRun returns the length of the feed lead's horizontal part, from the
// axis out to FeedStart (mm); zero for a periphery feed.
func (d *Design) FeedRun() float64 {
	if !d.CentreFed() {
		return 0
	}
	s := d.FeedStart()
	return math.Hypot(s.X, s.Y)
}

// FeedLength returns the length of the feed lead along FeedLead (mm).
func (d *Design) FeedLength() float64 { return d.FeedLead().Length() }

// FeedAngle returns the azimuth of FeedStart seen from the axis, radians
// counter-clockwise from +x: the direction a centre feed's lead runs and
// where a periphery feed's hole sits.
func (d *Design) FeedAngle() float64 {
	s := d.FeedStart()
	return math.Atan2(s.Y, s.X)
}
