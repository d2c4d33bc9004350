// The feed lead as built: where the cable comes through the reflector and
// the path of the conductor from there to the start of the winding.
//
// With a centre (axial) feed the cable comes up through the plate on the
// coil's axis; its centre conductor stands up to the height of the wire's
// start and the wire's own lead runs straight out, parallel to the plate,
// to the start of the winding. With a periphery feed the cable comes up
// under the start of the winding and the lead drops straight down to it.
// The reflector's feed hole, the cut list's lead length, the former's lock
// hole, the build steps and the field model all read this one definition.
// Source: Kraus, Marhefka & Khan, Antennas and Wave Propagation, 4th ed.,
// §8-5 (axial and peripheral feeds; from memory).

package parts

import (
	"math"

	"coilwright/cam/geom"
)

// FeedLead is the conductor from the reflector to the start of the
// winding. Lengths are mm, z up from the reflector's top face, x and y in
// the coil's frame (the plate's centre and the coil's axis at the origin).
type FeedLead struct {
	// Centre is true for a centre (axial) feed, false for a periphery feed.
	Centre bool
	// Hole is the centre of the feed hole on the plate.
	Hole geom.Vec2
	// Path runs from the feed point on the plate (z = 0, at Hole) to the
	// start of the winding; every point of it is a corner of the lead.
	Path []geom.Vec3
	// Rise is the vertical part, from the plate to the wire's start height.
	Rise float64
	// Run is the horizontal part, from the axis out to the start of the
	// winding (zero for a periphery feed).
	Run float64
}

// NewFeedLead returns the lead of coil c for a centre feed (centre true)
// or a periphery feed.
func NewFeedLead(c Coil, centre bool) FeedLead {
	start := c.Point(0)
	l := FeedLead{Centre: centre, Rise: start.Z}
	if centre {
		l.Run = math.Hypot(start.X, start.Y)
		l.Path = []geom.Vec3{{}, {Z: start.Z}, start}
		return l
	}
	l.Hole = geom.Vec2{X: start.X, Y: start.Y}
	l.Path = []geom.Vec3{{X: start.X, Y: start.Y}, start}
	return l
}

// Length returns the length of the lead's path.
func (l FeedLead) Length() float64 { return l.Rise + l.Run }

// Angle returns the azimuth of the start of the winding seen from the
// axis, radians counter-clockwise from +x: the direction a centre feed's
// lead runs and where a periphery feed's hole sits.
func (l FeedLead) Angle() float64 {
	s := l.Path[len(l.Path)-1]
	return math.Atan2(s.Y, s.X)
}
