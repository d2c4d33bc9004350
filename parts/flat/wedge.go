// The matching wedge: a flat metal strip soldered under the first part of
// the coil's wire, forming an air microstrip line with the reflector.
//
// Along the wire's first segment (a quarter turn by default) the strip's
// lower face sits at h = z − d/2 − t above the reflector (z the wire
// centre height, d the wire diameter, t the sheet thickness). Stations are
// spaced equally in arc length; at each the target impedance comes from the
// chosen taper (50 Ω at the feed to the coil's input resistance at the far
// end) and the width from inverting Hammerstad–Jensen with the thickness
// correction. A width below the wire diameter is raised to it. The
// impedances the cut widths actually give are summed by the theory of small
// reflections to estimate the residual mismatch at the design wavelength.
//
// The flat pattern unrolls the strip's centreline with its true 3D step
// lengths and the turning of its plan view, and lays the width across it,
// half to each side. The real strip is a gently twisted ribbon; sheet this
// thin follows it when soldered.

package flat

import (
	"fmt"
	"math"
	"math/cmplx"

	"coilwright/cam/geom"
	"coilwright/parts/line"
)

// WedgeInput describes the wire segment a wedge follows and the line it
// must form. Lengths are mm, angles radians.
type WedgeInput struct {
	// Path returns the wire centreline at winding angle phi, with z measured
	// up from the reflector's top face; phi = 0 is the feed.
	Path func(phi float64) geom.Vec3
	// Span is the winding angle the wedge covers (> 0; π/2 when zero).
	Span float64
	// WireDiameter is the wire's diameter (> 0).
	WireDiameter float64
	// Thickness is the strip's sheet thickness (> 0).
	Thickness float64
	// Wavelength is the free-space design wavelength (> 0).
	Wavelength float64
	// Taper is the impedance profile: Z0 at the feed, ZL at the far end.
	Taper line.Taper
	// Stations is the number of width stations (≥ 2; 33 when zero).
	Stations int
}

// WedgeStation is one row of the wedge's width table.
type WedgeStation struct {
	S         float64 `json:"s_mm"`              // arc length from the feed along the centreline
	Phi       float64 `json:"-"`                 // winding angle, radians
	Height    float64 `json:"height_mm"`         // strip lower face above the reflector
	TargetOhm float64 `json:"target_ohm"`        // impedance the taper asks for
	Width     float64 `json:"width_mm"`          // strip width as cut
	Ohm       float64 `json:"realised_ohm"`      // impedance of the strip as cut
	Clamped   bool    `json:"clamped,omitempty"` // width raised to the wire diameter
}

// Wedge is a computed matching strip: its width table, flat pattern and
// expected mismatch. Lengths are mm.
type Wedge struct {
	Stations  []WedgeStation
	Length    float64 // centreline length
	FeedWidth float64 // width at the feed end
	EndWidth  float64 // width at the far end
	// Reflection is the estimated |Γ| at the feed at the design wavelength.
	Reflection float64
	// ElectricalLength is βℓ in radians (air line, β = 2π/λ).
	ElectricalLength float64
	// Outline is the closed flat pattern, counter-clockwise, with the feed
	// end's centre at the origin and the strip starting along +x.
	Outline  geom.Contour
	Warnings []string
	// Span is the winding angle the strip covers, radians.
	Span float64
}

// pathSamples is the number of steps used to measure the path's length.
const pathSamples = 2048

// NewWedge computes the wedge for in. It returns an error when the input is
// incomplete, the strip would touch the reflector, or an impedance cannot
// be reached.
func NewWedge(in WedgeInput) (*Wedge, error) {
	if in.Path == nil {
		return nil, fmt.Errorf("wedge: no wire path")
	}
	if in.Span == 0 {
		in.Span = math.Pi / 2
	}
	if in.Stations == 0 {
		in.Stations = 33
	}
	switch {
	case !(in.Span > 0):
		return nil, fmt.Errorf("wedge: span %g rad must be positive", in.Span)
	case !(in.WireDiameter > 0):
		return nil, fmt.Errorf("wedge: wire diameter %g mm must be positive", in.WireDiameter)
	case !(in.Thickness > 0):
		return nil, fmt.Errorf("wedge: sheet thickness %g mm must be positive", in.Thickness)
	case !(in.Wavelength > 0):
		return nil, fmt.Errorf("wedge: wavelength %g mm must be positive", in.Wavelength)
	case in.Stations < 2:
		return nil, fmt.Errorf("wedge: %d stations, need at least 2", in.Stations)
	}
	if err := in.Taper.Validate(); err != nil {
		return nil, fmt.Errorf("wedge: %w", err)
	}

	// Cumulative arc length on a fine grid of winding angles.
	phis := make([]float64, pathSamples+1)
	cum := make([]float64, pathSamples+1)
	prev := in.Path(0)
	for i := 1; i <= pathSamples; i++ {
		phis[i] = in.Span * float64(i) / pathSamples
		p := in.Path(phis[i])
		cum[i] = cum[i-1] + p.Sub(prev).Len()
		prev = p
	}
	total := cum[pathSamples]
	phiAt := func(s float64) float64 {
		j := 1
		for j < pathSamples && cum[j] < s {
			j++
		}
		f := (s - cum[j-1]) / (cum[j] - cum[j-1])
		return phis[j-1] + f*(phis[j]-phis[j-1])
	}

	w := &Wedge{Length: total, ElectricalLength: 2 * math.Pi * total / in.Wavelength, Span: in.Span}
	n := in.Stations - 1
	prof := make([]float64, in.Stations)
	for i := range in.Stations {
		s := total * float64(i) / float64(n)
		phi := phiAt(s)
		h := in.Path(phi).Z - in.WireDiameter/2 - in.Thickness
		if !(h > 0) {
			return nil, fmt.Errorf("wedge: at %.2f mm from the feed the strip would sit %.3f mm above the reflector; raise the wire's start height", s, h)
		}
		target := in.Taper.Impedance(float64(i) / float64(n))
		u, err := line.StripWidthRatio(target, in.Thickness/h)
		if err != nil {
			return nil, fmt.Errorf("wedge: at %.2f mm from the feed: %w", s, err)
		}
		st := WedgeStation{S: s, Phi: phi, Height: h, TargetOhm: target, Width: u * h}
		if st.Width < in.WireDiameter {
			st.Width, st.Clamped = in.WireDiameter, true
		}
		st.Ohm = line.AirStripImpedance(st.Width, h, in.Thickness)
		prof[i] = st.Ohm
		w.Stations = append(w.Stations, st)
	}
	w.FeedWidth = w.Stations[0].Width
	w.EndWidth = w.Stations[n].Width
	w.Reflection = cmplx.Abs(line.Reflection(in.Taper.Z0, in.Taper.ZL, prof, w.ElectricalLength))
	for _, st := range w.Stations {
		if st.Clamped {
			w.Warnings = append(w.Warnings, fmt.Sprintf("wedge widths from %.2f mm along are held at the wire diameter %.2f mm: the strip line there is higher in impedance than the taper asks", st.S, in.WireDiameter))
			break
		}
	}
	w.Outline = w.flatPattern(in)
	return w, nil
}

// flatPattern unrolls the centreline with its 3D step lengths and its plan
// view's turning, then offsets each station by half its width.
func (w *Wedge) flatPattern(in WedgeInput) geom.Contour {
	n := len(w.Stations)
	centre := make([]geom.Vec2, n)
	heading := make([]float64, n)
	// Plan-view heading of the path at each station from second-order
	// finite differences (one-sided at the ends of the span).
	const dphi = 1e-4
	for i, st := range w.Stations {
		var t geom.Vec3
		switch {
		case st.Phi-dphi < 0:
			t = in.Path(st.Phi + dphi).Scale(4).Sub(in.Path(st.Phi).Scale(3)).Sub(in.Path(st.Phi + 2*dphi))
		case st.Phi+dphi > in.Span:
			t = in.Path(st.Phi).Scale(3).Sub(in.Path(st.Phi - dphi).Scale(4)).Add(in.Path(st.Phi - 2*dphi))
		default:
			t = in.Path(st.Phi + dphi).Sub(in.Path(st.Phi - dphi))
		}
		heading[i] = math.Atan2(t.Y, t.X)
	}
	// Unwrap and rotate so the strip leaves the origin along +x.
	h0 := heading[0]
	for i := range heading {
		d := heading[i] - h0
		d -= 2 * math.Pi * math.Round(d/(2*math.Pi))
		if i > 0 {
			prevD := heading[i-1]
			for d-prevD > math.Pi {
				d -= 2 * math.Pi
			}
			for d-prevD < -math.Pi {
				d += 2 * math.Pi
			}
		}
		heading[i] = d
	}
	for i := 1; i < n; i++ {
		ds := w.Stations[i].S - w.Stations[i-1].S
		// A step of length ds turning by dt spans a chord ds·sin(dt/2)/(dt/2)
		// along the mean heading (exact for a circular step).
		a, dt := (heading[i]+heading[i-1])/2, heading[i]-heading[i-1]
		chord := ds
		if dt != 0 {
			chord = ds * math.Sin(dt/2) / (dt / 2)
		}
		centre[i] = centre[i-1].Add(geom.Vec2{X: math.Cos(a), Y: math.Sin(a)}.Scale(chord))
	}
	c := geom.Contour{Closed: true}
	left := func(i int) geom.Vec2 {
		return geom.Vec2{X: -math.Sin(heading[i]), Y: math.Cos(heading[i])}
	}
	for i := range n {
		c.Vertices = append(c.Vertices, geom.Vertex{P: centre[i].Add(left(i).Scale(-w.Stations[i].Width / 2))})
	}
	for i := n - 1; i >= 0; i-- {
		c.Vertices = append(c.Vertices, geom.Vertex{P: centre[i].Add(left(i).Scale(w.Stations[i].Width / 2))})
	}
	if geom.Polyline(c.Flatten(1)).Area() < 0 {
		for i, j := 0, len(c.Vertices)-1; i < j; i, j = i+1, j-1 {
			c.Vertices[i], c.Vertices[j] = c.Vertices[j], c.Vertices[i]
		}
	}
	return c
}

// Drawing returns the wedge's flat pattern on layer CUT and, on layer MARK,
// a short tick across the centreline near the feed end.
func (w *Wedge) Drawing() geom.Drawing {
	var d geom.Drawing
	d.Add(LayerCut, w.Outline)
	tick := math.Min(w.FeedWidth/4, 1)
	d.Add(LayerMark, geom.Line{A: geom.Vec2{X: tick, Y: -tick}, B: geom.Vec2{X: tick, Y: tick}})
	return d
}

// Layer names shared by every cut drawing.
const (
	// LayerCut holds the contours a tool cuts along.
	LayerCut = "CUT"
	// LayerMark holds scribe or engrave marks that are not cut through.
	LayerMark = "MARK"
)
