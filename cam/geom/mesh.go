package geom

// Mesh is an indexed triangle mesh in millimetres. Each face lists three
// indices into Vertices, counter-clockwise seen from outside, so the
// right-hand normal points out of the solid.
type Mesh struct {
	Vertices []Vec3
	Faces    [][3]uint32
}

// Normal returns the unit outward normal of face i (zero for a degenerate
// face).
func (m *Mesh) Normal(i int) Vec3 {
	f := m.Faces[i]
	a, b, c := m.Vertices[f[0]], m.Vertices[f[1]], m.Vertices[f[2]]
	return b.Sub(a).Cross(c.Sub(a)).Normalize()
}

// Volume returns the signed volume enclosed by the mesh in mm³, positive for
// a closed mesh oriented outward (divergence theorem over the faces).
func (m *Mesh) Volume() float64 {
	var v float64
	for _, f := range m.Faces {
		a, b, c := m.Vertices[f[0]], m.Vertices[f[1]], m.Vertices[f[2]]
		v += a.Dot(b.Cross(c))
	}
	return v / 6
}

// Bounds returns the smallest box holding every vertex; the zero box for an
// empty mesh.
func (m *Mesh) Bounds() Box3 {
	if len(m.Vertices) == 0 {
		return Box3{}
	}
	b := Box3{m.Vertices[0], m.Vertices[0]}
	for _, p := range m.Vertices[1:] {
		b.Min, b.Max = b.Min.Min(p), b.Max.Max(p)
	}
	return b
}
