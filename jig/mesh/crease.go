package mesh

// Feature vertices and crease flips. A cycle whose vertices' normals differ by
// more than the feature angle spans a crease or a corner; it is fanned about
// a vertex where the tangent planes at its vertices meet (the least-squares
// point, pulled gently toward their mean so that it is defined along a
// crease), projected onto the surface. After merging, the shared diagonal of
// two fans in neighbouring cells is flipped onto the crease.
//
// Source: Kobbelt, Botsch, Schwanecke and Seidel, "Feature sensitive surface
// extraction from volume data", SIGGRAPH 2001.

import (
	"math"
	"slices"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// flipCreases swaps the diagonal of each pair of triangles that fan about
// feature vertices in neighbouring cells, when the feature-to-feature edge
// lies closer to the surface than the edge it replaces and neither triangle
// turns over. This lays edges along creases instead of across them
// (source: the edge flipping step of Kobbelt et al., SIGGRAPH 2001). Pairs are
// visited in key order, so the result is deterministic.
func flipCreases(m *geom.Mesh, feature []bool, s sdf.SDF3) {
	type side struct {
		face int32
		k    int8 // corner of the feature vertex in the face
	}
	opp := map[uint64][]side{}
	for fi, f := range m.Faces {
		for k := range 3 {
			if !feature[f[k]] {
				continue
			}
			a, b := f[(k+1)%3], f[(k+2)%3]
			key := uint64(min(a, b))<<32 | uint64(max(a, b))
			opp[key] = append(opp[key], side{int32(fi), int8(k)})
		}
	}
	keys := make([]uint64, 0, len(opp))
	for k, v := range opp {
		if len(v) == 2 {
			keys = append(keys, k)
		}
	}
	slices.Sort(keys)
	touched := make(map[int32]bool)
	made := make(map[uint64]bool)
	for _, key := range keys {
		p, q := opp[key][0], opp[key][1]
		if touched[p.face] || touched[q.face] {
			continue
		}
		f1, f2 := m.Faces[p.face], m.Faces[q.face]
		c1, a, b := f1[p.k], f1[(p.k+1)%3], f1[(p.k+2)%3]
		c2 := f2[q.k]
		if f2[(q.k+1)%3] != b || f2[(q.k+2)%3] != a {
			continue
		}
		ck := uint64(min(c1, c2))<<32 | uint64(max(c1, c2))
		if made[ck] {
			continue
		}
		v := m.Vertices
		old := math.Abs(s.Eval(v[a].Add(v[b]).Scale(0.5)))
		if math.Abs(s.Eval(v[c1].Add(v[c2]).Scale(0.5))) >= old {
			continue
		}
		n := faceCross(v, f1).Add(faceCross(v, f2))
		t1 := [3]uint32{c1, a, c2}
		t2 := [3]uint32{c2, b, c1}
		if faceCross(v, t1).Dot(n) <= 0 || faceCross(v, t2).Dot(n) <= 0 {
			continue
		}
		m.Faces[p.face], m.Faces[q.face] = t1, t2
		touched[p.face], touched[q.face] = true, true
		made[ck] = true
	}
}

// faceCross returns (b − a) × (c − a) for face f: twice its area along its
// normal.
func faceCross(v []geom.Vec3, f [3]uint32) geom.Vec3 {
	a := v[f[0]]
	return v[f[1]].Sub(a).Cross(v[f[2]].Sub(a))
}

// featureCos is the cosine of the largest angle between the surface normals
// at a cycle's vertices below which the cycle is fanned about a feature
// vertex instead of being cut along diagonals.
const featureCos = 0.9

// sharp reports whether the surface normals at the cycle's vertices differ
// by more than the feature angle.
func (w *blockWorker) sharp(c []int32) bool {
	for i := range c {
		for j := i + 1; j < len(c); j++ {
			if w.normal(c[i]).Dot(w.normal(c[j])) < featureCos {
				return true
			}
		}
	}
	return false
}

// fanAbout places a vertex where the tangent planes at the cycle's vertices
// meet (least squares, pulled gently toward their mean so that it is defined
// along a crease; source: Kobbelt et al., "Feature sensitive surface
// extraction from volume data", SIGGRAPH 2001) and fans the cycle about it.
// A point that falls outside the cell is replaced by the mean.
func (w *blockWorker) fanAbout(c []int32, ci, cj, ck, no int) {
	const pull = 0.05
	var mean geom.Vec3
	for _, i := range c {
		mean = mean.Add(w.p.pos[i])
	}
	mean = mean.Scale(1 / float64(len(c)))
	// Normal equations (AᵀA + pull·I) d = Aᵀr about the mean.
	var m [3][3]float64
	var rhs [3]float64
	for _, i := range c {
		n := w.normal(i)
		nv := [3]float64{n.X, n.Y, n.Z}
		r := n.Dot(w.p.pos[i].Sub(mean))
		for a := range 3 {
			for b := range 3 {
				m[a][b] += nv[a] * nv[b]
			}
			rhs[a] += nv[a] * r
		}
	}
	for a := range 3 {
		m[a][a] += pull
	}
	p := mean
	if d, ok := solve3(m, rhs); ok {
		q := mean.Add(geom.Vec3{X: d[0], Y: d[1], Z: d[2]})
		lo := w.g.point(ci, cj, ck)
		cell := geom.Box3{Min: lo, Max: lo.Add(geom.Vec3{X: w.g.h, Y: w.g.h, Z: w.g.h})}
		if cell.Enlarge(0.5 * w.g.h).Contains(q) {
			p = q
		}
	}
	p = w.project(p)
	idx := int32(len(w.p.pos))
	cellKey := (uint64(ck)*uint64(w.g.np[1])+uint64(cj))*uint64(w.g.np[0]) + uint64(ci)
	w.p.keys = append(w.p.keys, w.g.featureBase()+cellKey*4+uint64(no))
	w.p.pos = append(w.p.pos, p)
	w.norm = append(w.norm, geom.Vec3{})
	for i := range c {
		w.p.tris = append(w.p.tris, [3]int32{idx, c[i], c[(i+1)%len(c)]})
	}
}

// project moves p onto the surface by up to three Newton steps along the
// gradient when it lies more than a hundredth of a cell off it; a step that
// would leave the neighbourhood of p is not taken.
func (w *blockWorker) project(p geom.Vec3) geom.Vec3 {
	for range 3 {
		f := w.s.Eval(p)
		if math.Abs(f) < 0.01*w.g.h {
			break
		}
		g := w.gradient(p)
		l2 := g.Dot(g)
		if l2 < 0.25 {
			break
		}
		step := g.Scale(-f / l2)
		if step.Len() > w.g.h {
			break
		}
		p = p.Add(step)
	}
	return p
}

// solve3 solves m·x = r by Cramer's rule, reporting false for a singular m.
func solve3(m [3][3]float64, r [3]float64) ([3]float64, bool) {
	det := func(a [3][3]float64) float64 {
		return a[0][0]*(a[1][1]*a[2][2]-a[1][2]*a[2][1]) -
			a[0][1]*(a[1][0]*a[2][2]-a[1][2]*a[2][0]) +
			a[0][2]*(a[1][0]*a[2][1]-a[1][1]*a[2][0])
	}
	d := det(m)
	if math.Abs(d) < 1e-12 {
		return [3]float64{}, false
	}
	var x [3]float64
	for col := range 3 {
		a := m
		for row := range 3 {
			a[row][col] = r[row]
		}
		x[col] = det(a) / d
	}
	return x, true
}

// gradient returns the distance gradient at p by central differences.
func (w *blockWorker) gradient(p geom.Vec3) geom.Vec3 {
	e := w.g.h * 1e-3
	f := w.s.Eval
	return geom.Vec3{
		X: f(p.Add(geom.Vec3{X: e})) - f(p.Sub(geom.Vec3{X: e})),
		Y: f(p.Add(geom.Vec3{Y: e})) - f(p.Sub(geom.Vec3{Y: e})),
		Z: f(p.Add(geom.Vec3{Z: e})) - f(p.Sub(geom.Vec3{Z: e})),
	}.Scale(1 / (2 * e))
}

// normal returns the unit surface normal at local vertex i from forward
// differences a twentieth of a cell long, computed once per vertex. The
// vertex lies on the surface to within rootTol cells, so its own value is
// taken as zero, an error of at most rootTol/0.05 = 0.2 % in each component.
func (w *blockWorker) normal(i int32) geom.Vec3 {
	if n := w.norm[i]; n != (geom.Vec3{}) {
		return n
	}
	p := w.p.pos[i]
	e := w.g.h * 0.05
	n := geom.Vec3{
		X: w.s.Eval(p.Add(geom.Vec3{X: e})),
		Y: w.s.Eval(p.Add(geom.Vec3{Y: e})),
		Z: w.s.Eval(p.Add(geom.Vec3{Z: e})),
	}.Normalize()
	if n == (geom.Vec3{}) {
		n = geom.Vec3{Z: 1}
	}
	w.norm[i] = n
	return n
}
