// The reflector plate: a disc or a square with a feed hole where the coil
// starts, optional mounting holes on a pitch circle, and marks (centre
// cross, a tick at the coil's start angle with that angle written beside
// it, and the kit name) for the scribe or engrave layer. The plate's centre
// is the origin and the coil axis; angles run counter-clockwise from +x
// seen from the coil side.

package flat

import (
	"fmt"
	"math"
	"strings"
	"unicode"

	"coilwright/cam/geom"
	"coilwright/parts/spec"
)

// ReflectorShape is the plate's outline.
type ReflectorShape int

const (
	// ReflectorDisc is a round plate; Size is its diameter.
	ReflectorDisc ReflectorShape = iota
	// ReflectorSquare is a square plate; Size is its side.
	ReflectorSquare
)

// String returns the spec name of the shape.
func (s ReflectorShape) String() string {
	switch s {
	case ReflectorDisc:
		return "disc"
	case ReflectorSquare:
		return "square"
	}
	return fmt.Sprintf("ReflectorShape(%d)", int(s))
}

// FeedKind is what passes through the reflector at the feed.
type FeedKind int

const (
	// FeedCoax passes a coaxial cable through a round hole.
	FeedCoax FeedKind = iota
	// FeedSMAFlange mounts a four-hole flange jack: a round centre hole and
	// four screw holes on a square pattern.
	FeedSMAFlange
	// FeedSMABulkhead mounts a bulkhead jack in a D-shaped hole.
	FeedSMABulkhead
	// FeedNFlange mounts a four-hole N flange jack.
	FeedNFlange
	// FeedNBulkhead mounts an N bulkhead jack in a D-shaped hole.
	FeedNBulkhead
)

// flange reports whether the kind is a four-hole flange jack.
func (k FeedKind) flange() bool { return k == FeedSMAFlange || k == FeedNFlange }

// bulkhead reports whether the kind is a bulkhead jack in a D-hole.
func (k FeedKind) bulkhead() bool { return k == FeedSMABulkhead || k == FeedNBulkhead }

// FeedKindByConnector returns the feed kind of a reflector.connector
// spec name; anything else is a coax pigtail.
func FeedKindByConnector(id string) FeedKind {
	for k := FeedCoax; k <= FeedNBulkhead; k++ {
		if k.String() == id {
			return k
		}
	}
	return FeedCoax
}

// String returns the spec name of the feed kind.
func (k FeedKind) String() string {
	switch k {
	case FeedCoax:
		return "coax"
	case FeedSMAFlange:
		return "sma-flange"
	case FeedSMABulkhead:
		return "sma-bulkhead"
	case FeedNFlange:
		return "n-flange"
	case FeedNBulkhead:
		return "n-bulkhead"
	}
	return fmt.Sprintf("FeedKind(%d)", int(k))
}

// FeedHole sizes the feed cut-out in mm. Zero fields take the defaults of
// DefaultFeedHole for the kind.
type FeedHole struct {
	Kind FeedKind
	// Diameter is the round hole (coax, flange centre) or the D-hole's
	// diameter (bulkhead).
	Diameter float64
	// Flat is the D-hole's size across the flat, from the flat to the far
	// side of the circle (bulkhead only).
	Flat float64
	// ScrewPitch is the square pattern's hole spacing (flange only).
	ScrewPitch float64
	// ScrewDiameter is the flange screw holes' diameter (flange only).
	ScrewDiameter float64
}

// DefaultFeedHole returns the default cut-out for a feed kind.
func DefaultFeedHole(k FeedKind) FeedHole {
	switch k {
	case FeedSMAFlange:
		// From memory: four-hole flange jack, holes on 8.64 mm pitch, about
		// 12.7 mm square; centre spigot clearance and M2.5 clearance holes.
		return FeedHole{Kind: k, Diameter: 4.6, ScrewPitch: 8.64, ScrewDiameter: 2.7}
	case FeedSMABulkhead:
		// Source: connector vendor data: panel D-hole Ø 6.5 mm, 6.0 mm
		// across the flat.
		return FeedHole{Kind: k, Diameter: 6.5, Flat: 6.0}
	case FeedNFlange:
		// From memory: four-hole N flange jack, 25.4 mm square flange,
		// holes on 18.26 mm pitch for M3 or 4-40 screws; rear spigot
		// clearance. Check the connector's drawing.
		return FeedHole{Kind: k, Diameter: 10.5, ScrewPitch: 18.26, ScrewDiameter: 3.4}
	case FeedNBulkhead:
		// From memory: N bulkhead jack on a 5/8-24 UNEF thread, panel
		// D-hole about Ø 16.0 mm, 15.0 mm across the flat. Check the
		// connector's drawing.
		return FeedHole{Kind: k, Diameter: 16.0, Flat: 15.0}
	default:
		// The hole for 0.141 in semi-rigid, the spec's default cable.
		return FeedHole{Kind: FeedCoax, Diameter: spec.CoaxTypes()["semi-rigid-141"].FeedHoleMM()}
	}
}

// WithDefaults fills zero fields from the kind's defaults.
func (f FeedHole) WithDefaults() FeedHole {
	d := DefaultFeedHole(f.Kind)
	if f.Diameter == 0 {
		f.Diameter = d.Diameter
	}
	if f.Flat == 0 {
		f.Flat = d.Flat
	}
	if f.ScrewPitch == 0 {
		f.ScrewPitch = d.ScrewPitch
	}
	if f.ScrewDiameter == 0 {
		f.ScrewDiameter = d.ScrewDiameter
	}
	return f
}

// extent returns the radius about the feed point that the cut-out covers.
func (f FeedHole) extent() float64 {
	if f.Kind.flange() {
		return f.ScrewPitch/math.Sqrt2 + f.ScrewDiameter/2
	}
	return f.Diameter / 2
}

// MountingHoles places Count holes of Diameter mm evenly on a circle of
// PitchDiameter mm about the centre, the first at angle Angle (radians).
// Count 0 means none.
type MountingHoles struct {
	Count         int
	Diameter      float64
	PitchDiameter float64
	Angle         float64
}

// ReflectorInput is everything the plate's drawing needs. Lengths are mm,
// angles radians.
type ReflectorInput struct {
	Shape ReflectorShape
	// Size is the disc diameter or the square's side (> 0).
	Size float64
	// CornerRadius rounds a square's corners (0 ≤ r < Size/2).
	CornerRadius float64
	// FeedRadius and FeedAngle place the feed point (the coil's start) in
	// polar coordinates about the centre.
	FeedRadius, FeedAngle float64
	Feed                  FeedHole
	Mounting              MountingHoles
	// ScrewHole is the diameter of the support rod screw's clearance hole
	// at the centre, cut with the other holes; 0 for none.
	ScrewHole float64
	// RodFoot and RodFootFillet are the support rod's outside diameter and
	// the limit of its epoxy fillet, drawn as circles about the centre on
	// the mark layer; 0 for none.
	RodFoot, RodFootFillet float64
	// Label is the kit name written on the mark layer; Hand is a short tag
	// written after it (for example "RHCP"). Both may be empty.
	Label, Hand string
}

// Reflector is the computed plate: its validated input and drawing.
type Reflector struct {
	Input   ReflectorInput
	Drawing geom.Drawing
}

// EdgeClearanceMM is the least web left between any hole and the plate's
// edge or another hole, in mm.
// Common practice (no published source): about one sheet thickness or
// 1 mm, whichever is more; 1 mm is used.
const EdgeClearanceMM = 1.0

// NewReflector validates in and draws the plate. It returns an error when a
// hole falls outside the plate or two holes crowd each other.
func NewReflector(in ReflectorInput) (*Reflector, error) {
	in.Feed = in.Feed.WithDefaults()
	if !(in.Size > 0) {
		return nil, fmt.Errorf("reflector: size %g mm must be positive", in.Size)
	}
	if in.Shape == ReflectorSquare && (in.CornerRadius < 0 || in.CornerRadius >= in.Size/2) {
		return nil, fmt.Errorf("reflector: corner radius %g mm must lie in [0, %g)", in.CornerRadius, in.Size/2)
	}
	if f := in.Feed; f.Kind.bulkhead() && !(f.Flat > 0 && f.Flat < f.Diameter) {
		return nil, fmt.Errorf("reflector: D-hole size across the flat %g mm must lie between 0 and its diameter %g mm", f.Flat, f.Diameter)
	}
	// inscribed is the radius of the largest circle about the centre that
	// fits inside the plate.
	inscribed := in.Size / 2
	feed := polar(in.FeedRadius, in.FeedAngle)
	if r := in.FeedRadius + in.Feed.extent(); r > inscribed-EdgeClearanceMM {
		return nil, fmt.Errorf("reflector: the feed cut-out reaches %.2f mm from the centre, past the %.2f mm the plate allows; enlarge the plate", r, inscribed-EdgeClearanceMM)
	}
	if in.ScrewHole < 0 || in.RodFoot < 0 || in.RodFootFillet < 0 {
		return nil, fmt.Errorf("reflector: screw hole %g mm, rod %g mm and fillet %g mm must not be negative", in.ScrewHole, in.RodFoot, in.RodFootFillet)
	}
	if in.ScrewHole > 0 {
		if web := feed.Len() - in.Feed.extent() - in.ScrewHole/2; web < EdgeClearanceMM {
			return nil, fmt.Errorf("reflector: the %.2f mm screw hole at the centre leaves %.2f mm of web to the feed cut-out; at least %g mm is needed", in.ScrewHole, web, EdgeClearanceMM)
		}
	}
	m := in.Mounting
	if m.Count < 0 {
		return nil, fmt.Errorf("reflector: %d mounting holes", m.Count)
	}
	if m.Count > 0 {
		if !(m.Diameter > 0) || !(m.PitchDiameter > 0) {
			return nil, fmt.Errorf("reflector: mounting holes need a positive diameter and pitch diameter")
		}
		if m.PitchDiameter/2+m.Diameter/2 > inscribed-EdgeClearanceMM {
			return nil, fmt.Errorf("reflector: mounting holes on Ø %.2f mm reach past the plate's edge", m.PitchDiameter)
		}
		if m.Count > 1 {
			gap := m.PitchDiameter*math.Sin(math.Pi/float64(m.Count)) - m.Diameter
			if gap < EdgeClearanceMM {
				return nil, fmt.Errorf("reflector: %d mounting holes of Ø %.2f mm overlap on Ø %.2f mm", m.Count, m.Diameter, m.PitchDiameter)
			}
		}
		for i := range m.Count {
			c := polar(m.PitchDiameter/2, m.Angle+2*math.Pi*float64(i)/float64(m.Count))
			if c.Sub(feed).Len() < m.Diameter/2+in.Feed.extent()+EdgeClearanceMM {
				return nil, fmt.Errorf("reflector: mounting hole %d at %.1f° crowds the feed; turn the pattern (mounting angle) or change its diameter", i+1, (m.Angle+2*math.Pi*float64(i)/float64(m.Count))*180/math.Pi)
			}
		}
	}
	r := &Reflector{Input: in}
	r.draw()
	return r, nil
}

// polar returns the point at radius r and angle a.
func polar(r, a float64) geom.Vec2 {
	s, c := math.Sincos(a)
	return geom.Vec2{X: r * c, Y: r * s}
}

// draw fills r.Drawing from r.Input.
func (r *Reflector) draw() {
	in := r.Input
	var d geom.Drawing
	switch in.Shape {
	case ReflectorSquare:
		d.Add(LayerCut, squareOutline(in.Size, in.CornerRadius))
	default:
		d.Add(LayerCut, geom.Circle{Radius: in.Size / 2})
	}
	feed := polar(in.FeedRadius, in.FeedAngle)
	place := geom.Placement{Angle: in.FeedAngle, Offset: feed}
	switch f := in.Feed; {
	case f.Kind.flange():
		d.Add(LayerCut, geom.Circle{Center: feed, Radius: f.Diameter / 2})
		for _, s := range []geom.Vec2{{X: 1, Y: 1}, {X: -1, Y: 1}, {X: -1, Y: -1}, {X: 1, Y: -1}} {
			d.Add(LayerCut, geom.Circle{Center: place.Apply(s.Scale(f.ScrewPitch / 2)), Radius: f.ScrewDiameter / 2})
		}
	case f.Kind.bulkhead():
		d.Add(LayerCut, dHole(f.Diameter, f.Flat).Place(place))
	default:
		d.Add(LayerCut, geom.Circle{Center: feed, Radius: f.Diameter / 2})
	}
	for i := range in.Mounting.Count {
		a := in.Mounting.Angle + 2*math.Pi*float64(i)/float64(in.Mounting.Count)
		d.Add(LayerCut, geom.Circle{Center: polar(in.Mounting.PitchDiameter/2, a), Radius: in.Mounting.Diameter / 2})
	}
	if in.ScrewHole > 0 {
		d.Add(LayerCut, geom.Circle{Radius: in.ScrewHole / 2})
	}
	// The rod's place and how far its epoxy fillet may spread.
	for _, dia := range []float64{in.RodFoot, in.RodFootFillet} {
		if dia > 0 {
			d.Add(LayerMark, geom.Circle{Radius: dia / 2})
		}
	}

	// Marks scale with the plate; Common practice (no published source).
	cross := math.Min(5, in.Size/20)
	d.Add(LayerMark,
		geom.Line{A: geom.Vec2{X: -cross}, B: geom.Vec2{X: cross}},
		geom.Line{A: geom.Vec2{Y: -cross}, B: geom.Vec2{Y: cross}})
	tickIn := in.FeedRadius + in.Feed.extent() + 1
	tickOut := math.Min(tickIn+2*cross, in.Size/2-EdgeClearanceMM)
	if tickOut > tickIn {
		d.Add(LayerMark, geom.Line{A: polar(tickIn, in.FeedAngle), B: polar(tickOut, in.FeedAngle)})
	}
	textH := math.Min(4, in.Size/25)
	deg := math.Mod(in.FeedAngle*180/math.Pi+360, 360)
	d.Add(LayerMark, geom.Text{
		At:     polar(tickIn, in.FeedAngle).Add(polar(textH*0.6, in.FeedAngle+math.Pi/2)),
		Height: textH * 0.75, Angle: in.FeedAngle, Value: fmt.Sprintf("%.1f°", deg),
	})
	if label := joinLabel(in.Label, in.Hand); label != "" {
		// The name runs across the plate a quarter of its size below the
		// centre (opposite side from the feed's quarter), sized so its
		// approximate width fits within 60 % of the plate.
		n := float64(len([]rune(label)))
		h := math.Min(textH, 0.6*in.Size/(textAdvance*n))
		at := polar(in.Size/4, in.FeedAngle-math.Pi/2)
		d.Add(LayerMark, geom.Text{At: at, Height: h, Angle: in.FeedAngle, Value: label, Align: geom.AlignCenter})
	}
	r.Drawing = d
}

// textAdvance is the mean width of a character as a fraction of the cap
// height, to size text without the font. Common practice (no published
// source): about 0.6–0.75 for sans-serif capitals and digits.
const textAdvance = 0.75

// joinLabel joins the kit name and hand tag with a space, skipping empties
// and a tag the name already holds as a word.
func joinLabel(a, b string) string {
	switch {
	case a == "":
		return b
	case b == "":
		return a
	}
	for _, w := range strings.FieldsFunc(a, func(r rune) bool { return !unicode.IsLetter(r) && !unicode.IsDigit(r) }) {
		if strings.EqualFold(w, b) {
			return a
		}
	}
	return a + " " + b
}

// squareOutline returns a counter-clockwise square of the given side
// centred on the origin, its corners rounded to radius rc.
func squareOutline(side, rc float64) geom.Contour {
	h := side / 2
	if rc == 0 {
		return geom.Contour{Closed: true, Vertices: []geom.Vertex{
			{P: geom.Vec2{X: -h, Y: -h}}, {P: geom.Vec2{X: h, Y: -h}},
			{P: geom.Vec2{X: h, Y: h}}, {P: geom.Vec2{X: -h, Y: h}},
		}}
	}
	q := math.Tan(math.Pi / 8) // bulge of a quarter circle
	var c geom.Contour
	c.Closed = true
	for k := range 4 {
		rot := geom.Placement{Angle: float64(k) * math.Pi / 2}
		c.Vertices = append(c.Vertices,
			geom.Vertex{P: rot.Apply(geom.Vec2{X: -h + rc, Y: -h})},
			geom.Vertex{P: rot.Apply(geom.Vec2{X: h - rc, Y: -h}), Bulge: q})
	}
	return c
}

// dHole returns a D-shaped cut-out of the given diameter centred on the
// origin, its flat on the +y side at flat − d/2 from the centre.
func dHole(d, flat float64) geom.Contour {
	r := d / 2
	y := flat - r
	x := math.Sqrt(r*r - y*y)
	// The long arc runs counter-clockwise from (−x, y) round the bottom to
	// (x, y); its included angle is 2π less the short arc above the flat.
	theta := 2*math.Pi - 2*math.Atan2(x, y)
	return geom.Contour{Closed: true, Vertices: []geom.Vertex{
		{P: geom.Vec2{X: -x, Y: y}, Bulge: math.Tan(theta / 4)},
		{P: geom.Vec2{X: x, Y: y}},
	}}
}
