// A flat drawing for cutting: named layers of entities in millimetres, with
// y pointing up and angles counter-clockwise from +x in radians. The entity
// set is the one cutting machines and DXF share (circle, arc, line,
// polyline with bulges) plus text, which writers turn into outlines.

package geom

import "math"

// Entity is one drawing element. Bounds returns its extent in mm; Place
// returns a copy rotated and moved by p (the receiver is not changed).
type Entity interface {
	Bounds() Box2
	Place(p Placement) Entity
}

// Placement is a rigid motion of the plane: rotate counter-clockwise by
// Angle radians about the origin, then move by Offset (mm).
type Placement struct {
	Angle  float64
	Offset Vec2
}

// Apply returns the point v rotated by p.Angle and moved by p.Offset.
func (p Placement) Apply(v Vec2) Vec2 { return v.Rotate(p.Angle).Add(p.Offset) }

// Circle is a full circle of Radius mm (> 0) about Center.
type Circle struct {
	Center Vec2
	Radius float64
}

// Bounds returns the circle's bounding square.
func (c Circle) Bounds() Box2 {
	r := Vec2{c.Radius, c.Radius}
	return Box2{c.Center.Sub(r), c.Center.Add(r)}
}

// Place returns the circle moved by p.
func (c Circle) Place(p Placement) Entity { return Circle{p.Apply(c.Center), c.Radius} }

// Arc is the part of a circle of Radius mm about Center swept
// counter-clockwise from angle Start to angle End (radians, Start < End ≤
// Start + 2π).
type Arc struct {
	Center     Vec2
	Radius     float64
	Start, End float64
}

// Point returns the point of the arc's circle at angle a.
func (a Arc) Point(angle float64) Vec2 {
	s, c := math.Sincos(angle)
	return Vec2{a.Center.X + a.Radius*c, a.Center.Y + a.Radius*s}
}

// Bounds returns the arc's exact bounding box: its end points and every
// axis extreme its sweep passes.
func (a Arc) Bounds() Box2 {
	b := EmptyBox2().Extend(a.Point(a.Start)).Extend(a.Point(a.End))
	first := math.Ceil(a.Start / (math.Pi / 2))
	for k := first; k*math.Pi/2 <= a.End; k++ {
		b = b.Extend(a.Point(k * math.Pi / 2))
	}
	return b
}

// Place returns the arc rotated and moved by p.
func (a Arc) Place(p Placement) Entity {
	return Arc{p.Apply(a.Center), a.Radius, a.Start + p.Angle, a.End + p.Angle}
}

// Line is the straight segment from A to B.
type Line struct{ A, B Vec2 }

// Bounds returns the segment's bounding box.
func (l Line) Bounds() Box2 { return EmptyBox2().Extend(l.A).Extend(l.B) }

// Place returns the segment moved by p.
func (l Line) Place(p Placement) Entity { return Line{p.Apply(l.A), p.Apply(l.B)} }

// Vertex is a polyline corner P. Bulge describes the segment from P to the
// next vertex: 0 for a straight segment, otherwise tan(θ/4) of the arc's
// included angle θ, positive when the arc turns counter-clockwise (the DXF
// convention).
type Vertex struct {
	P     Vec2
	Bulge float64
}

// Contour is a polyline of straight and circular segments; when Closed the
// last vertex joins the first (with the last vertex's bulge).
type Contour struct {
	Vertices []Vertex
	Closed   bool
}

// Segments returns the number of segments in c.
func (c Contour) Segments() int {
	n := len(c.Vertices)
	if !c.Closed && n > 0 {
		return n - 1
	}
	return n
}

// Segment returns the end points and bulge of segment i (0 ≤ i <
// Segments()).
func (c Contour) Segment(i int) (p, q Vec2, bulge float64) {
	v := c.Vertices[i]
	return v.P, c.Vertices[(i+1)%len(c.Vertices)].P, v.Bulge
}

// Bounds returns the contour's exact bounding box, arcs included.
func (c Contour) Bounds() Box2 {
	b := EmptyBox2()
	for _, v := range c.Vertices {
		b = b.Extend(v.P)
	}
	for i := range c.Segments() {
		if p, q, bu := c.Segment(i); bu != 0 {
			b = b.Union(BulgeArc(p, q, bu).Bounds())
		}
	}
	return b
}

// Place returns a copy of the contour moved by p.
func (c Contour) Place(p Placement) Entity {
	out := Contour{Vertices: make([]Vertex, len(c.Vertices)), Closed: c.Closed}
	for i, v := range c.Vertices {
		out.Vertices[i] = Vertex{p.Apply(v.P), v.Bulge}
	}
	return out
}

// BulgeArc returns the counter-clockwise arc that a segment from p to q with
// the given non-zero bulge follows. For a negative bulge the segment runs
// clockwise, so the returned arc runs from q back to p.
func BulgeArc(p, q Vec2, bulge float64) Arc {
	theta := 4 * math.Atan(math.Abs(bulge))
	chord := q.Sub(p)
	c := chord.Len()
	r := c / (2 * math.Sin(theta/2))
	// Distance from the chord midpoint to the centre, signed towards the
	// left of p→q for a counter-clockwise arc of less than a half turn.
	d := r * math.Cos(theta/2)
	left := Vec2{-chord.Y / c, chord.X / c}
	if bulge < 0 {
		left = left.Scale(-1)
	}
	centre := p.Add(q).Scale(0.5).Add(left.Scale(d))
	from, to := p, q
	if bulge < 0 {
		from, to = q, p
	}
	start := math.Atan2(from.Y-centre.Y, from.X-centre.X)
	end := math.Atan2(to.Y-centre.Y, to.X-centre.X)
	for end <= start {
		end += 2 * math.Pi
	}
	return Arc{centre, r, start, end}
}

// TextAlign places text horizontally relative to its anchor point.
type TextAlign int

const (
	// AlignLeft starts the text at its anchor.
	AlignLeft TextAlign = iota
	// AlignCenter centres the text on its anchor.
	AlignCenter
	// AlignRight ends the text at its anchor.
	AlignRight
)

// Text is a single line of text whose baseline passes through At, with
// capital letters Height mm tall, turned counter-clockwise by Angle
// radians. Writers draw it as outlines.
type Text struct {
	At     Vec2
	Height float64
	Angle  float64
	Value  string
	Align  TextAlign
}

// textAdvance is the assumed mean advance of one character as a fraction of
// the cap height, used only for the approximate bounds of text.
const textAdvance = 0.75

// Bounds returns an approximate box around the text: the font is not known
// here, so each character is taken as textAdvance·Height wide.
func (t Text) Bounds() Box2 {
	w := textAdvance * t.Height * float64(len([]rune(t.Value)))
	x0 := 0.0
	switch t.Align {
	case AlignCenter:
		x0 = -w / 2
	case AlignRight:
		x0 = -w
	}
	p := Placement{t.Angle, t.At}
	b := EmptyBox2()
	for _, c := range []Vec2{{x0, -0.25 * t.Height}, {x0 + w, -0.25 * t.Height}, {x0, t.Height}, {x0 + w, t.Height}} {
		b = b.Extend(p.Apply(c))
	}
	return b
}

// Place returns the text moved and turned by p.
func (t Text) Place(p Placement) Entity {
	t.At = p.Apply(t.At)
	t.Angle += p.Angle
	return t
}

// Layer is a named group of entities. Names are upper-case ASCII letters,
// digits and underscores so every format can carry them unchanged.
type Layer struct {
	Name     string
	Entities []Entity
}

// Drawing is an ordered list of layers; writers emit layers and entities in
// this order.
type Drawing struct {
	Layers []Layer
}

// Add appends entities to the layer called name, creating the layer at the
// end when it does not exist yet. It mutates d.
func (d *Drawing) Add(name string, es ...Entity) {
	for i := range d.Layers {
		if d.Layers[i].Name == name {
			d.Layers[i].Entities = append(d.Layers[i].Entities, es...)
			return
		}
	}
	d.Layers = append(d.Layers, Layer{Name: name, Entities: es})
}

// Layer returns the layer called name and whether it exists.
func (d Drawing) Layer(name string) (Layer, bool) {
	for _, l := range d.Layers {
		if l.Name == name {
			return l, true
		}
	}
	return Layer{}, false
}

// Bounds returns the box around every entity of every layer (empty for an
// empty drawing).
func (d Drawing) Bounds() Box2 {
	b := EmptyBox2()
	for _, l := range d.Layers {
		for _, e := range l.Entities {
			b = b.Union(e.Bounds())
		}
	}
	return b
}

// Place returns a copy of the drawing with every entity moved by p.
func (d Drawing) Place(p Placement) Drawing {
	out := Drawing{Layers: make([]Layer, len(d.Layers))}
	for i, l := range d.Layers {
		es := make([]Entity, len(l.Entities))
		for j, e := range l.Entities {
			es[j] = e.Place(p)
		}
		out.Layers[i] = Layer{Name: l.Name, Entities: es}
	}
	return out
}

// Merge appends the layers of o to d, joining layers of the same name. It
// mutates d.
func (d *Drawing) Merge(o Drawing) {
	for _, l := range o.Layers {
		d.Add(l.Name, l.Entities...)
	}
}
