package sheet

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/parts"
	"coilwright/parts/cutlist"
)

// SideView is the antenna seen from the side, from the −y side looking along +y (x to the right, so the view is not mirrored), in mm:
// x across (the coil's axis at x = 0), up the axis from the reflector's
// top face at y = 0. It carries the outlines a drawing needs and the
// dimensions to print.
type SideView struct {
	Wire geom.Polyline // wire centreline, x–z projection, from the feed end
	// Near and Far split Wire into the runs on the viewer's side of the
	// axis (y < 0) and behind it, so a drawing can tell them apart and
	// the hand shows.
	Near, Far      []geom.Polyline
	WireDiameter   float64
	ReflectorWidth float64 // across the plate
	ReflectorThick float64
	RodDiameter    float64 // 0 when the kit has no support rod
	RodLength      float64 // from the reflector's top face
	CoaxX          float64 // the feed point's x
	CoaxOuter      float64
	CableShown     float64 // feed cable drawn below the reflector
	Dimensions     []geom.Dimension
}

// sideSamples is the number of straight steps per turn in the side view.
const sideSamples = 96

// NewSideView returns the side view of design d with its cut list cl.
func NewSideView(d *parts.Design, cl *cutlist.CutList) SideView {
	c := d.Coil
	n := int(float64(sideSamples)*c.Turns) + 1
	wire := make(geom.Polyline, n+1)
	near := make([]bool, n+1)
	for i := range wire {
		p := c.Point(c.Span() * float64(i) / float64(n))
		wire[i] = geom.Vec2{X: p.X, Y: p.Z}
		near[i] = p.Y < 0
	}
	wd := d.Spec.Wire.DiameterMM
	size := d.Spec.Reflector.SizeMM(d.Wavelength)
	top := c.Z0 + d.AxialLength
	v := SideView{Wire: wire, WireDiameter: wd, ReflectorWidth: size, ReflectorThick: d.Spec.Reflector.ThicknessMM,
		RodDiameter: cl.Dowel.DiameterMM, RodLength: cl.Dowel.LengthMM, CoaxX: c.StartRadius, CoaxOuter: cl.Coax.Cable.Outer}
	if cl.Dowel.OverFeed {
		v.RodDiameter, v.RodLength = 0, 0
	}
	v.Near, v.Far = splitRuns(wire, near)
	rb, rt := c.StartRadius, c.EndRadius
	// Offsets scale with the drawing so the dimensions keep their spacing
	// once the figure is fitted to the page.
	u := math.Max(top, size) / 20
	cable := 2 * u
	v.CableShown = cable
	t := d.Spec.Reflector.ThicknessMM
	v.Dimensions = []geom.Dimension{
		{A: geom.Vec2{X: -rb, Y: c.Z0}, B: geom.Vec2{X: rb, Y: c.Z0}, Offset: -(c.Z0 + t + cable + u),
			Text: fmt.Sprintf("Ø%.2f base", 2*rb)},
		{A: geom.Vec2{X: -rt, Y: top}, B: geom.Vec2{X: rt, Y: top}, Offset: u + wd,
			Text: fmt.Sprintf("Ø%.2f top", 2*rt)},
		{A: geom.Vec2{X: size / 2, Y: 0}, B: geom.Vec2{X: size / 2, Y: top}, Offset: -1.5 * u,
			Text: fmt.Sprintf("%.1f plate to top wire centre", top)},
		{A: geom.Vec2{X: -size / 2, Y: 0}, B: geom.Vec2{X: -size / 2, Y: c.Z0}, Offset: 1.5 * u,
			Text: fmt.Sprintf("%.2f first turn", c.Z0)},
		{A: geom.Vec2{X: -size / 2, Y: -t}, B: geom.Vec2{X: size / 2, Y: -t}, Offset: -(cable + 3*u),
			Text: fmt.Sprintf("%.1f reflector", size)},
	}
	return v
}

// splitRuns cuts a polyline into runs of points alike in near, each run
// sharing its end point with the next so the line stays unbroken.
func splitRuns(pl geom.Polyline, near []bool) (nearRuns, farRuns []geom.Polyline) {
	start := 0
	for i := 1; i <= len(pl); i++ {
		if i < len(pl) && near[i] == near[start] {
			continue
		}
		run := append(geom.Polyline{}, pl[start:min(i+1, len(pl))]...)
		if near[start] {
			nearRuns = append(nearRuns, run)
		} else {
			farRuns = append(farRuns, run)
		}
		start = i
	}
	return nearRuns, farRuns
}
