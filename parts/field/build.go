package field

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/parts"
	"coilwright/parts/em"
	"coilwright/parts/flat"
	"coilwright/parts/spec"
)

// Piece names of the conductor wire, in order from the feed.
const (
	PartPin   = "pin"   // the centre conductor rising from the reflector
	PartLead  = "lead"  // the rest of the feed lead (centre feed: the radial run)
	PartStrip = "strip" // the matching strip, radius w/4
	PartLink  = "link"  // from the strip's end up onto the wire
	PartCoil  = "coil"  // the winding
)

// Part names a run of polyline pieces [From, To) of the conductor wire.
type Part struct {
	Name     string
	From, To int
}

// Structure is a design mapped onto the solver: the wire model and what
// each part of it stands for. Wire 0 of Model is the conductor from the
// feed point through the lead, the strip and the winding; the plate grid's
// wires follow it in the plate model.
type Structure struct {
	Model     em.Model
	Reflector ReflectorModel
	// Parts splits wire 0's pieces into pin, lead, strip, link and coil.
	Parts []Part
	// PlateSpacing is the grid spacing (mm), PlateWires the number of grid
	// wires; zero for the ideal ground.
	PlateSpacing float64
	PlateWires   int
	// MaxSegment is the longest segment the subdivision allowed (mm).
	MaxSegment float64
	// TopMHz is the highest frequency the mesh was sized for.
	TopMHz float64
	// PinRadius is the feed pin's radius in the model (mm); CablePinRadius
	// is the cable's centre-conductor radius when the pin had to be
	// modelled thinner than it (zero otherwise).
	PinRadius, CablePinRadius float64

	design *parts.Design
}

// Conductor returns wire 0: lead, strip and coil as one wire.
func (st *Structure) Conductor() em.Wire { return st.Model.Wires[0] }

// Pieces returns the points and radii of the named part of the conductor
// (the points include both ends of the run).
func (st *Structure) Pieces(name string) ([]geom.Vec3, []float64) {
	w := st.Conductor()
	for _, p := range st.Parts {
		if p.Name == name {
			return w.Points[p.From : p.To+1], w.Radius[p.From:p.To]
		}
	}
	return nil, nil
}

// Build maps design d onto the solver with options opt: the geometry only,
// nothing solved. Errors are *spec.SpecError naming the key to change.
func Build(d *parts.Design, opt Options) (*Structure, error) {
	opt = opt.withDefaults()
	s := d.Spec
	top := opt.topMHz(s)
	lambda := spec.Wavelength(top)
	maxLen := lambda / opt.SegmentsPerWavelength
	st := &Structure{Reflector: opt.Reflector, MaxSegment: maxLen, TopMHz: top, design: d}
	a := s.Wire.DiameterMM / 2
	sigma := d.Wire.Material.Conductivity

	b := &chain{maxLen: maxLen, minRadii: opt.MinSegmentRadii}
	lead := d.FeedLead()
	b.start(lead[0])
	// The pin is the cable's centre conductor. Where it is shorter than
	// the kernel allows for its radius (a first turn very low over the
	// plate, a thick cable at a high frequency) it is modelled thinner, so
	// that its one segment stays usable; Assumptions says so.
	pin := lead[1].Sub(lead[0]).Len()
	st.PinRadius = s.Coax.Cable().Centre / 2
	if !(pin > 0) {
		return nil, &spec.SpecError{Key: "coil.first_turn_height_mm", Line: s.Line("coil.first_turn_height_mm"), Value: num(d.Coil.Z0),
			Problem: "the feed lead has no length above the reflector in the field model", Fix: "raise the first turn"}
	}
	if lim := pin / KernelMinSegmentRadii; st.PinRadius > lim {
		st.CablePinRadius, st.PinRadius = st.PinRadius, lim
	}
	b.straight(PartPin, lead[1], st.PinRadius, true)
	for _, p := range lead[2:] {
		b.straight(PartLead, p, a, false)
	}
	phi0 := 0.0
	if strip := d.StripCentreline(); len(strip) > 1 {
		b.strip(strip, d.Patterns.Wedge.Stations)
		phi0 = d.StripEnd()
	}
	b.coil(d.Coil, phi0, a, phi0 > 0)
	st.Parts = b.parts
	cond := em.Wire{Points: b.pts, Radius: b.radii, Conductivity: sigma}
	st.Model = em.Model{Wires: []em.Wire{cond}, Feed: em.Feed{Wire: 0, At: lead[0]}}
	if opt.Reflector == IdealGround {
		st.Model.Ground = em.PerfectGround
		return st, nil
	}
	g := em.PlateGrid{
		Shape:        em.Disc,
		Size:         s.Reflector.SizeMM(d.Wavelength),
		Spacing:      lambda / PlateSpacingPerWavelength,
		Join:         d.FeedPoint(),
		Conductivity: d.Patterns.Material.Conductivity,
	}
	if s.Reflector.Shape == "square" {
		g.Shape = em.Square
	}
	grid, err := g.Wires()
	if err != nil {
		return nil, st.specError(err)
	}
	st.PlateSpacing, st.PlateWires = g.Spacing, len(grid)
	st.Model.Wires = append(st.Model.Wires, grid...)
	return st, nil
}

// chain builds the conductor wire piece by piece.
type chain struct {
	maxLen, minRadii float64
	pts              []geom.Vec3
	radii            []float64
	parts            []Part
}

func (c *chain) start(p geom.Vec3) { c.pts = []geom.Vec3{p} }

func (c *chain) last() geom.Vec3 { return c.pts[len(c.pts)-1] }

// add appends the point p as the end of a piece of radius r in part name.
func (c *chain) add(name string, p geom.Vec3, r float64) {
	n := len(c.radii)
	if k := len(c.parts); k > 0 && c.parts[k-1].Name == name {
		c.parts[k-1].To = n + 1
	} else {
		c.parts = append(c.parts, Part{Name: name, From: n, To: n + 1})
	}
	c.pts = append(c.pts, p)
	c.radii = append(c.radii, r)
}

// count returns how many equal segments a run of length l and radius r
// gets: no longer than maxLen and, where the run allows, no shorter than
// minRadii radii (the minimum wins).
func (c *chain) count(l, r float64) int {
	n := int(math.Ceil(l / c.maxLen))
	if minLen := c.minRadii * r; n > 1 && l/float64(n) < minLen {
		n = int(math.Floor(l / minLen))
	}
	return max(n, 1)
}

// straight runs a straight wire of radius r from the last point to p;
// whole keeps it as one segment.
func (c *chain) straight(name string, p geom.Vec3, r float64, whole bool) {
	a := c.last()
	n := 1
	if !whole {
		n = c.count(p.Sub(a).Len(), r)
	}
	for j := 1; j <= n; j++ {
		q := p
		if j < n {
			q = a.Add(p.Sub(a).Scale(float64(j) / float64(n)))
		}
		c.add(name, q, r)
	}
}

// strip runs along the strip's centreline (one point per width station)
// with equal segments in arc length, each of radius w/4 from the width at
// its middle. Source: Butler, IEEE Trans. AP-30(4), 1982 (equivalent
// radius of a thin strip, w/4).
func (c *chain) strip(line geom.Path3, sts []flat.WedgeStation) {
	cum := make([]float64, len(line))
	for i := 1; i < len(line); i++ {
		cum[i] = cum[i-1] + line[i].Sub(line[i-1]).Len()
	}
	total := cum[len(cum)-1]
	at := func(s float64) (geom.Vec3, float64) {
		j := 1
		for j < len(line)-1 && cum[j] < s {
			j++
		}
		f := (s - cum[j-1]) / (cum[j] - cum[j-1])
		return line[j-1].Add(line[j].Sub(line[j-1]).Scale(f)), sts[j-1].Width + f*(sts[j].Width-sts[j-1].Width)
	}
	wmax := 0.0
	for _, st := range sts {
		wmax = math.Max(wmax, st.Width)
	}
	n := c.count(total, wmax/4)
	for j := 1; j <= n; j++ {
		p, _ := at(total * float64(j) / float64(n))
		_, w := at(total * (float64(j) - 0.5) / float64(n))
		c.add(PartStrip, p, w/4)
	}
}

// coil runs along the winding from φ0 to its end in chords of equal
// azimuth, radius a. With link set the first chord starts at the strip's
// end rather than on the wire at φ0: the link piece climbs from the strip
// onto the wire one segment along.
func (c *chain) coil(co parts.Coil, phi0, a float64, link bool) {
	span := co.Span() - phi0
	n := c.count(co.LengthBetween(phi0, co.Span()), a)
	if !link && c.last().Sub(co.Point(phi0)).Len() > 1e-9 {
		c.straight(PartLead, co.Point(phi0), a, false)
	}
	for j := 1; j <= n; j++ {
		name := PartCoil
		if link && j == 1 {
			name = PartLink
		}
		c.add(name, co.Point(phi0+span*float64(j)/float64(n)), a)
	}
}

// Assumptions returns what the model leaves out or simplifies, one
// sentence each, for every report of its results.
func (st *Structure) Assumptions() []string {
	out := []string{
		"Thin-wire moment method (reduced kernel, triangle basis, delta-gap source at the lead's base on the reflector).",
		"No dielectrics: the former, any support rod and the coax's jacket are left out; they lower the frequency of best match and gain.",
		"No current on the outside of the coax and no connector: a real feed without a choke or balun can differ.",
		"The matching strip is a round wire of equivalent radius w/4 along its centreline (Butler 1982); strips as wide as their height above the plate are only roughly modelled.",
	}
	if st.CablePinRadius > 0 {
		out = append(out, fmt.Sprintf("The feed pin is modelled %.3f mm in radius, thinner than the cable's %.3f mm centre conductor: at %.2f mm it is too short for the thin-wire kernel at full size.",
			st.PinRadius, st.CablePinRadius, st.PinLength()))
	}
	if st.Reflector == IdealGround {
		return append(out, "Reflector: an ideal infinite ground plane (image theory): no back lobe and no edge effects.")
	}
	return append(out, fmt.Sprintf("Reflector: the plate as a wire grid of %.2f mm spacing with equal-area wire radius (Ludwig 1987); holes and corner radii ignored.", st.PlateSpacing))
}

// PinLength returns the feed pin's length in the model, mm.
func (st *Structure) PinLength() float64 {
	p, _ := st.Pieces(PartPin)
	if len(p) < 2 {
		return 0
	}
	return p[1].Sub(p[0]).Len()
}
