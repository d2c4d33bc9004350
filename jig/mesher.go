package jig

// The mesher turns a signed distance bound into a closed triangle mesh by
// narrow-band marching cubes on a uniform grid.
//
//  1. The solid's box, padded by two cells, is cut into blocks of 8³ cells.
//     A block whose centre lies farther from the surface than its half
//     diagonal cannot hold a sign change (the distance is 1-Lipschitz) and is
//     skipped; so is each of its eight sub-blocks of 4³ cells by the same
//     test, and the rest are sampled at every grid point. Blocks are handed to
//     all cores through an atomic counter and each writes only its own slot
//     of a pre-indexed result slice.
//  2. In each cell with corners of both signs (a zero value counts as
//     outside) every cube face yields zero, one or two segments joining the
//     crossings on its edges. A face with diagonal signs is resolved by the
//     asymptotic decider: the negative corners are joined when the product of
//     their values exceeds that of the positive ones, a test that depends only
//     on the face's four values and so is the same in both cells sharing the
//     face. Segments are oriented with the inside on their left seen from
//     outside the cube, chained into closed cycles and each cycle is cut into
//     triangles, always across its shortest diagonal.
//  3. Because neighbouring cells produce the same segment on a shared face
//     with opposite directions, and each crossing lies on exactly one cycle of
//     each cell around its edge, the union of the patches is a closed,
//     consistently oriented 2-manifold (Nielson & Hamann, "The asymptotic
//     decider", IEEE Visualization 1991, for the face rule).
//  4. A vertex belongs to one grid edge; its key is that edge's global index,
//     so vertices are welded exactly. Its position is the edge's root of the
//     true distance, found by the Illinois variant of regula falsi to within
//     a ten-thousandth of a cell and kept a thousandth of an edge away from
//     either end so no face collapses.
//  5. Where the surface normals at a cycle's vertices differ by more than
//     about 25°, a crease or corner runs through the cell: the cycle is
//     fanned about a vertex placed where the tangent planes meet, and after
//     merging, the diagonal between two such fans in neighbouring cells is
//     flipped onto the crease (Kobbelt et al., "Feature sensitive surface
//     extraction from volume data", SIGGRAPH 2001). Sharp edges are then
//     reproduced to the accuracy of the vertices instead of being cut off
//     by up to a third of a cell.
//
// Blocks are merged in index order, so the output is the same on any number
// of cores. Accuracy: vertices lie within 1e-4 cell of the surface (feature
// vertices within 0.01 cell, by Newton projection); face centroids carry the
// chord error s²/(8R) of curved parts, which the cell size from MeshOptions
// keeps within the tolerance for radii down to MinRadius. Features thinner
// than about two cells (fine lettering) can exceed it: at the 0.05 mm
// default the 5.8 GHz demo former measures 0.003 mm at vertices, 0.028 mm at
// face centroids, and 0.075 mm at centroids in its engraved lettering.

import (
	"errors"
	"fmt"
	"math"
	"runtime"
	"slices"
	"sync"
	"sync/atomic"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// DefaultTolerance is the mesh tolerance used when MeshOptions.Tolerance is
// zero, in mm.
const DefaultTolerance = 0.05

// Grid cell from tolerance. Creases and corners are rebuilt by feature
// vertices, so the error left is the chord error of curved parts: a facet
// of span s on a surface of radius R lies s²/(8R) inside it, and marching
// cubes facets span up to about √2 cells, so a cell of √(4·tol·R) keeps
// curved parts within tol. Without a known smallest radius the cell is
// cellPerTolerance tolerances.
const (
	cellPerTolerance    = 4
	maxCellPerTolerance = 8
)

// rootTol is the distance, as a fraction of the cell, at which an edge
// crossing counts as found.
const rootTol = 1e-4

// blockCells is the edge of a block in cells.
const blockCells = 8

// MeshOptions controls Mesh. The zero value meshes at DefaultTolerance on
// every core.
type MeshOptions struct {
	Tolerance float64 // largest wanted distance of the mesh from the surface, mm; 0 for DefaultTolerance
	MinRadius float64 // smallest radius of curvature of the smooth parts, mm; 0 if unknown
	Cell      float64 // grid cell edge in mm; 0 derives it from Tolerance and MinRadius
	Workers   int     // goroutines; 0 for GOMAXPROCS
}

// ErrUnbounded is returned by Mesh for a solid whose bounds are not finite.
var ErrUnbounded = errors.New("jig: solid has infinite bounds")

// maxGridPoints caps the grid size a mesh may ask for.
const maxGridPoints = 1 << 33

// Mesh returns the closed, outward-oriented triangle mesh of s's zero level
// set. The result is deterministic for a given s and options.
func Mesh(s sdf.SDF3, opt MeshOptions) (*geom.Mesh, error) {
	tol := opt.Tolerance
	if tol == 0 {
		tol = DefaultTolerance
	}
	if !(tol > 0) || math.IsInf(tol, 0) {
		return nil, fmt.Errorf("jig: mesh tolerance %g mm must be above 0", tol)
	}
	cell := opt.Cell
	switch {
	case cell == 0 && opt.MinRadius > 0:
		cell = min(math.Sqrt(4*tol*opt.MinRadius), maxCellPerTolerance*tol)
	case cell == 0:
		cell = cellPerTolerance * tol
	}
	if !(cell > 0) || math.IsInf(cell, 0) {
		return nil, fmt.Errorf("jig: mesh cell %g mm must be above 0", cell)
	}
	b := s.Bounds()
	for _, v := range []float64{b.Min.X, b.Min.Y, b.Min.Z, b.Max.X, b.Max.Y, b.Max.Z} {
		if math.IsInf(v, 0) || math.IsNaN(v) {
			return nil, ErrUnbounded
		}
	}
	g := newGrid(b, cell)
	if float64(g.np[0])*float64(g.np[1])*float64(g.np[2]) > maxGridPoints {
		return nil, fmt.Errorf("jig: a %.3g mm cell over a %.0f×%.0f×%.0f mm solid needs too many grid points; raise the tolerance",
			cell, b.Size().X, b.Size().Y, b.Size().Z)
	}
	workers := opt.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	nb := g.nb[0] * g.nb[1] * g.nb[2]
	results := make([]*patch, nb)
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := newBlockWorker(&g, s)
			for {
				i := int(next.Add(1) - 1)
				if i >= nb {
					return
				}
				results[i] = w.run(i)
			}
		}()
	}
	wg.Wait()
	m, feature := merge(results, g.featureBase())
	flipCreases(m, feature, s)
	return m, nil
}

// grid is the sampling lattice: point (i, j, k) sits at origin + (i, j, k)·h.
type grid struct {
	origin geom.Vec3
	h      float64
	nb     [3]int // blocks per axis
	np     [3]int // points per axis
}

// gridShift offsets the lattice from the solid's box by an irrational part
// of a cell, so that faces lying on round coordinates (a flange on z = 0)
// do not fall exactly on grid planes.
const gridShift = 0.3183098861837907

func newGrid(b geom.Box3, h float64) grid {
	b = b.Enlarge((2 + gridShift) * h)
	var g grid
	g.origin, g.h = b.Min, h
	size := b.Size()
	for a, l := range []float64{size.X, size.Y, size.Z} {
		g.nb[a] = max(1, int(math.Ceil(l/(h*blockCells))))
		g.np[a] = g.nb[a]*blockCells + 1
	}
	return g
}

// point returns the position of grid point (i, j, k).
func (g *grid) point(i, j, k int) geom.Vec3 {
	return geom.Vec3{
		X: g.origin.X + float64(i)*g.h,
		Y: g.origin.Y + float64(j)*g.h,
		Z: g.origin.Z + float64(k)*g.h,
	}
}

// edgeKey returns the global key of the grid edge leaving point (i, j, k)
// along axis a.
func (g *grid) edgeKey(i, j, k, a int) uint64 {
	return ((uint64(k)*uint64(g.np[1])+uint64(j))*uint64(g.np[0])+uint64(i))*3 + uint64(a)
}

// featureBase is the first key of vertices placed inside cells; keys below
// it name grid edges.
func (g *grid) featureBase() uint64 {
	return uint64(g.np[0]) * uint64(g.np[1]) * uint64(g.np[2]) * 3
}

// patch is one block's share of the mesh: vertices keyed by grid edge and
// triangles over the block's own vertex list.
type patch struct {
	keys []uint64
	pos  []geom.Vec3
	norm []geom.Vec3 // unit normal per vertex, zero until needed
	tris [][3]int32
}

// merge welds the patches in block order into one mesh and marks the
// vertices placed inside cells (keys from featureBase on).
func merge(ps []*patch, featureBase uint64) (*geom.Mesh, []bool) {
	nv, nt := 0, 0
	for _, p := range ps {
		if p != nil {
			nv += len(p.keys)
			nt += len(p.tris)
		}
	}
	m := &geom.Mesh{Vertices: make([]geom.Vec3, 0, nv*3/4), Faces: make([][3]uint32, 0, nt)}
	index := make(map[uint64]uint32, nv*3/4)
	var feature []bool
	var local []uint32
	for _, p := range ps {
		if p == nil {
			continue
		}
		local = local[:0]
		for i, k := range p.keys {
			v, ok := index[k]
			if !ok {
				v = uint32(len(m.Vertices))
				index[k] = v
				m.Vertices = append(m.Vertices, p.pos[i])
				feature = append(feature, k >= featureBase)
			}
			local = append(local, v)
		}
		for _, t := range p.tris {
			m.Faces = append(m.Faces, [3]uint32{local[t[0]], local[t[1]], local[t[2]]})
		}
	}
	return m, feature
}

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

// Cube tables. Corner c has offset (c&1, c>>1&1, c>>2&1). Each face lists its
// corners counter-clockwise seen from outside the cube.
var (
	cubeFaces = [6][4]int{
		{0, 4, 6, 2}, {1, 3, 7, 5}, // x = 0, x = 1
		{0, 1, 5, 4}, {2, 6, 7, 3}, // y = 0, y = 1
		{0, 2, 3, 1}, {4, 5, 7, 6}, // z = 0, z = 1
	}
	// cubeEdges lists each edge's lower corner and axis.
	cubeEdges [12][2]int
	// edgeOf maps a corner pair to its edge index.
	edgeOf [8][8]int
	// cubeEdgesShareFace tells whether two edges lie on one cube face.
	cubeEdgesShareFace [12][12]bool
)

func init() {
	n := 0
	for a := range 3 {
		for c := range 8 {
			if c&(1<<a) == 0 {
				cubeEdges[n] = [2]int{c, a}
				edgeOf[c][c|1<<a], edgeOf[c|1<<a][c] = n, n
				n++
			}
		}
	}
	for e1, a := range cubeEdges {
		for e2, b := range cubeEdges {
			for axis := range 3 {
				if axis != a[1] && axis != b[1] && a[0]>>axis&1 == b[0]>>axis&1 {
					cubeEdgesShareFace[e1][e2] = true
				}
			}
		}
	}
}

// blockWorker holds one goroutine's scratch space.
type blockWorker struct {
	g    *grid
	s    sdf.SDF3
	vals []float64
	done []bool  // whether vals holds the point's value
	vert []int32 // local vertex per block edge slot, −1 when unset
	p    *patch
}

const bp = blockCells + 1 // points per block edge

func newBlockWorker(g *grid, s sdf.SDF3) *blockWorker {
	w := &blockWorker{g: g, s: s, vals: make([]float64, bp*bp*bp), done: make([]bool, bp*bp*bp), vert: make([]int32, 3*bp*bp*bp)}
	return w
}

// run meshes block i and returns its patch, or nil when it holds no surface.
func (w *blockWorker) run(i int) *patch {
	g := w.g
	bi, bj, bk := i%g.nb[0], i/g.nb[0]%g.nb[1], i/(g.nb[0]*g.nb[1])
	i0, j0, k0 := bi*blockCells, bj*blockCells, bk*blockCells
	half := float64(blockCells) * g.h / 2
	c := g.point(i0, j0, k0).Add(geom.Vec3{X: half, Y: half, Z: half})
	if math.Abs(w.s.Eval(c)) > half*math.Sqrt(3)*(1+1e-9) {
		return nil
	}
	// Sub-blocks of half the block's edge are culled the same way; only the
	// points of the others are sampled, and only their cells meshed.
	const sub = blockCells / 2
	var live [8]bool
	for sb := range 8 {
		sx, sy, sz := sb&1*sub, sb>>1&1*sub, sb>>2&1*sub
		sh := float64(sub) * g.h / 2
		c := g.point(i0+sx, j0+sy, k0+sz).Add(geom.Vec3{X: sh, Y: sh, Z: sh})
		live[sb] = math.Abs(w.s.Eval(c)) <= sh*math.Sqrt(3)*(1+1e-9)
	}
	for j := range w.done {
		w.done[j] = false
	}
	anyNeg, anyPos := false, false
	for sb, ok := range live {
		if !ok {
			continue
		}
		sx, sy, sz := sb&1*sub, sb>>1&1*sub, sb>>2&1*sub
		for z := sz; z <= sz+sub; z++ {
			for y := sy; y <= sy+sub; y++ {
				for x := sx; x <= sx+sub; x++ {
					k := x + bp*(y+bp*z)
					if w.done[k] {
						continue
					}
					w.done[k] = true
					v := w.s.Eval(g.point(i0+x, j0+y, k0+z))
					w.vals[k] = v
					if v < 0 {
						anyNeg = true
					} else {
						anyPos = true
					}
				}
			}
		}
	}
	if !anyNeg || !anyPos {
		return nil
	}
	for j := range w.vert {
		w.vert[j] = -1
	}
	w.p = &patch{}
	for z := range blockCells {
		for y := range blockCells {
			for x := range blockCells {
				if live[x/sub+2*(y/sub)+4*(z/sub)] {
					w.cell(i0, j0, k0, x, y, z)
				}
			}
		}
	}
	if len(w.p.tris) == 0 {
		return nil
	}
	return w.p
}

// cell emits the triangles of local cell (x, y, z) in the block at
// (i0, j0, k0).
func (w *blockWorker) cell(i0, j0, k0, x, y, z int) {
	var v [8]float64
	mask := 0
	for c := range 8 {
		v[c] = w.vals[(x+c&1)+bp*((y+c>>1&1)+bp*(z+c>>2&1))]
		if v[c] < 0 {
			mask |= 1 << c
		}
	}
	if mask == 0 || mask == 255 {
		return
	}
	// next[e] is the crossing edge that follows edge e on its cycle.
	var next [12]int8
	for e := range next {
		next[e] = -1
	}
	for _, f := range cubeFaces {
		var outs, ins [4]int8 // crossing edge at walk position, or −1
		n := 0
		for q := range 4 {
			a, b := f[q], f[(q+1)%4]
			outs[q], ins[q] = -1, -1
			na, nb := v[a] < 0, v[b] < 0
			if na == nb {
				continue
			}
			n++
			if na {
				outs[q] = int8(edgeOf[a][b])
			} else {
				ins[q] = int8(edgeOf[a][b])
			}
		}
		switch n {
		case 2:
			var o, in int8 = -1, -1
			for q := range 4 {
				if outs[q] >= 0 {
					o = outs[q]
				}
				if ins[q] >= 0 {
					in = ins[q]
				}
			}
			next[o] = in
		case 4:
			// Asymptotic decider: join the negative corners when the
			// bilinear saddle is negative.
			var negProd, posProd float64 = 1, 1
			for q := range 4 {
				if v[f[q]] < 0 {
					negProd *= v[f[q]]
				} else {
					posProd *= v[f[q]]
				}
			}
			step := 3 // pair each out with the previous in: negatives apart
			if negProd > posProd {
				step = 1 // pair each out with the next in: negatives joined
			}
			for q := range 4 {
				if outs[q] >= 0 {
					next[outs[q]] = ins[(q+step)%4]
				}
			}
		}
	}
	var done [12]bool
	var cyc [12]int32
	var cycEdge [12]int8
	cycles := 0
	for e0 := range 12 {
		if next[e0] < 0 || done[e0] {
			continue
		}
		n := 0
		for e := int8(e0); !done[e]; e = next[e] {
			done[e] = true
			cyc[n] = w.vertex(i0, j0, k0, x, y, z, int(e), &v)
			cycEdge[n] = e
			n++
		}
		// Reverse so that normals point out of the solid.
		for i, j := 0, n-1; i < j; i, j = i+1, j-1 {
			cyc[i], cyc[j] = cyc[j], cyc[i]
			cycEdge[i], cycEdge[j] = cycEdge[j], cycEdge[i]
		}
		w.cycle(cyc[:n], cycEdge[:n], i0+x, j0+y, k0+z, cycles)
		cycles++
	}
}

// featureCos is the cosine of the largest angle between the surface normals
// at a cycle's vertices below which the cycle is fanned about a feature
// vertex instead of being cut along diagonals.
const featureCos = 0.9

// cycle emits the triangles of one crossing cycle of cell (ci, cj, ck).
// A cycle that spans a sharp edge or corner, or that cannot be cut without
// a diagonal lying on a cube face (which a neighbouring cell might also
// use), is fanned about a new vertex inside the cell; otherwise it is cut
// across its shortest allowed diagonals.
func (w *blockWorker) cycle(c []int32, edges []int8, ci, cj, ck, no int) {
	if w.sharp(c) {
		w.fanAbout(c, ci, cj, ck, no)
		return
	}
	pos := w.p.pos
	cc, ee := c, edges
	for len(cc) > 3 {
		best, bestL := -1, math.Inf(1)
		n := len(cc)
		for i := range cc {
			a, b := (i+n-1)%n, (i+1)%n
			if cubeEdgesShareFace[ee[a]][ee[b]] {
				continue
			}
			if l := pos[cc[a]].Sub(pos[cc[b]]).Len(); l < bestL {
				best, bestL = i, l
			}
		}
		if best < 0 {
			w.fanAbout(cc, ci, cj, ck, no)
			return
		}
		w.p.tris = append(w.p.tris, [3]int32{cc[(best+n-1)%n], cc[best], cc[(best+1)%n]})
		cc = append(cc[:best], cc[best+1:]...)
		ee = append(ee[:best], ee[best+1:]...)
	}
	w.p.tris = append(w.p.tris, [3]int32{cc[0], cc[1], cc[2]})
}

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
	w.p.norm = append(w.p.norm, geom.Vec3{})
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
	if n := w.p.norm[i]; n != (geom.Vec3{}) {
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
	w.p.norm[i] = n
	return n
}

// vertex returns the local index of the crossing on cube edge e of local cell
// (x, y, z), creating it on first use.
func (w *blockWorker) vertex(i0, j0, k0, x, y, z, e int, v *[8]float64) int32 {
	c, a := cubeEdges[e][0], cubeEdges[e][1]
	lx, ly, lz := x+c&1, y+c>>1&1, z+c>>2&1
	slot := (lx+bp*(ly+bp*lz))*3 + a
	if w.vert[slot] >= 0 {
		return w.vert[slot]
	}
	g := w.g
	gi, gj, gk := i0+lx, j0+ly, k0+lz
	pa := g.point(gi, gj, gk)
	d := geom.Vec3{}
	switch a {
	case 0:
		d.X = g.h
	case 1:
		d.Y = g.h
	case 2:
		d.Z = g.h
	}
	// Illinois regula falsi on [0, 1] along the edge, keeping the bracket;
	// it converges on the kinked distance near a crease where plain regula
	// falsi stalls at one end.
	lo, hi, flo, fhi := 0.0, 1.0, v[c], v[c|1<<a]
	t := lo + (hi-lo)*flo/(flo-fhi)
	side := 0
	for range 24 {
		f := w.s.Eval(pa.Add(d.Scale(t)))
		if math.Abs(f) < rootTol*g.h {
			break
		}
		if (f < 0) == (flo < 0) {
			lo, flo = t, f
			if side == -1 {
				fhi /= 2
			}
			side = -1
		} else {
			hi, fhi = t, f
			if side == 1 {
				flo /= 2
			}
			side = 1
		}
		t = lo + (hi-lo)*flo/(flo-fhi)
	}
	const edgeMargin = 1e-3
	t = max(edgeMargin, min(1-edgeMargin, t))
	idx := int32(len(w.p.pos))
	w.vert[slot] = idx
	w.p.keys = append(w.p.keys, g.edgeKey(gi, gj, gk, a))
	w.p.pos = append(w.p.pos, pa.Add(d.Scale(t)))
	w.p.norm = append(w.p.norm, geom.Vec3{})
	return idx
}
