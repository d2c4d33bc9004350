package mesh

// Decimation by half-edge collapse, which moves a vertex r onto a
// neighbour k and drops the two faces on edge r–k.
//
// Every vertex carries the quadric of the planes of the faces first around
// it (Garland & Heckbert, "Surface simplification using quadric error
// metrics", SIGGRAPH 1997). The cost of moving r onto k is the quadric
// error of Q_r + Q_k at k, plus a small multiple of the squared edge length
// so that on flat parts, where every error is zero, short edges go first.
// Each vertex is queued at the cost of its cheapest move in an indexed heap
// ordered by cost and then by vertex index, so the result depends only on
// the input and not on the number of cores. The vertex at the top tries its
// cheapest moves in turn; a move is made only when
//
//  1. the link condition holds: the vertices adjacent to both r and k are
//     exactly the two opposite the edge (and the part is not a
//     tetrahedron), which keeps a closed 2-manifold of the same topology
//     with no pinched vertex or duplicate face (Dey, Edelsbrunner, Guha and
//     Nekhayev, "Topology preserving edge contraction", 1999; Hoppe et al.,
//     "Mesh optimization", SIGGRAPH 1993);
//  2. no face that moves turns its normal by more than acos(maxNormalTurn)
//     or becomes thinner than minQuality (or than it already was);
//  3. the true distance at the centroid of every moved face and at the
//     midpoint of every new edge stays within the limit.
//
// The kept vertex is an original one, so vertices stay where the mesher
// solved them onto the surface. Vertices the mesher placed on creases and
// corners may only be kept, or merged with each other, so sharp edges keep
// their vertices. After a move, k and its neighbours are queued again at
// their new costs (a vertex whose moves all failed comes back this way when
// its neighbourhood changes).
//
// The work is split into a fixed number of slabs along the mesh's longest
// axis. A vertex whose neighbours all lie in its own slab only ever touches
// faces and vertices of that slab, so the slabs' inner vertices are
// collapsed on all cores at once, each slab in its own queue; a serial pass
// over the whole mesh then takes the vertices along the slab borders. At the
// end the surviving vertices and faces are compacted in their original
// order.

import (
	"math"
	"runtime"
	"slices"
	"sync"
	"sync/atomic"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// Collapse limits. minQuality bounds the shape of a moved face by
// 4√3·area / (sum of squared edges), 1 for an equilateral triangle (a
// needle with a 3.3° tip at 0.1); a face already thinner may not get thinner,
// nor any face thinner than floorQuality, far above what CheckMesh counts
// as degenerate.
// maxNormalTurn is the cosine of the largest turn of a moved face's normal.
// lengthWeight orders collapses of equal quadric error by edge length.
// maxTries is how many of a vertex's cheapest moves are tried in turn.
// Common practice (no published source).
const (
	minQuality    = 0.1
	floorQuality  = 1e-5
	maxNormalTurn = 0.7
	lengthWeight  = 1e-4
	maxTries      = 2
)

// quadric is the symmetric 4×4 matrix Σ p·pᵀ of the planes p = (n, d),
// n·x + d = 0, stored as its upper triangle: vᵀQv is the sum of squared
// distances from v to the planes.
type quadric [10]float64

func planeQuadric(n geom.Vec3, d float64) quadric {
	return quadric{
		n.X * n.X, n.X * n.Y, n.X * n.Z, n.X * d,
		n.Y * n.Y, n.Y * n.Z, n.Y * d,
		n.Z * n.Z, n.Z * d,
		d * d,
	}
}

func (q *quadric) add(o *quadric) {
	for i := range q {
		q[i] += o[i]
	}
}

// eval returns vᵀQv for v = (p, 1).
func (q *quadric) eval(p geom.Vec3) float64 {
	x, y, z := p.X, p.Y, p.Z
	return q[0]*x*x + 2*q[1]*x*y + 2*q[2]*x*z + 2*q[3]*x +
		q[4]*y*y + 2*q[5]*y*z + 2*q[6]*y +
		q[7]*z*z + 2*q[8]*z + q[9]
}

// vertexHeap is an indexed 4-ary min-heap of vertices ordered by their
// best collapse cost and then by index; at[v] is v's slot or −1.
type vertexHeap struct {
	cost []float64 // per vertex
	at   []int32   // per vertex
	h    []uint32
}

func (q *vertexHeap) less(u, v uint32) bool {
	if q.cost[u] != q.cost[v] {
		return q.cost[u] < q.cost[v]
	}
	return u < v
}

func (q *vertexHeap) up(i int) {
	v := q.h[i]
	for i > 0 {
		p := (i - 1) / 4
		if !q.less(v, q.h[p]) {
			break
		}
		q.h[i] = q.h[p]
		q.at[q.h[i]] = int32(i)
		i = p
	}
	q.h[i] = v
	q.at[v] = int32(i)
}

func (q *vertexHeap) down(i int) {
	n := len(q.h)
	v := q.h[i]
	for {
		first := 4*i + 1
		if first >= n {
			break
		}
		j := first
		for k := first + 1; k < min(first+4, n); k++ {
			if q.less(q.h[k], q.h[j]) {
				j = k
			}
		}
		if !q.less(q.h[j], v) {
			break
		}
		q.h[i] = q.h[j]
		q.at[q.h[i]] = int32(i)
		i = j
	}
	q.h[i] = v
	q.at[v] = int32(i)
}

// set queues v at cost c, or moves it there.
func (q *vertexHeap) set(v uint32, c float64) {
	i := q.at[v]
	if i < 0 {
		q.cost[v] = c
		q.h = append(q.h, v)
		q.up(len(q.h) - 1)
		return
	}
	old := q.cost[v]
	q.cost[v] = c
	if c < old {
		q.up(int(i))
	} else {
		q.down(int(i))
	}
}

// remove takes v out of the queue if it is there.
func (q *vertexHeap) remove(v uint32) {
	i := q.at[v]
	if i < 0 {
		return
	}
	q.at[v] = -1
	last := q.h[len(q.h)-1]
	q.h = q.h[:len(q.h)-1]
	if last == v {
		return
	}
	q.h[i] = last
	q.at[last] = i
	q.up(int(i))
	q.down(int(q.at[last]))
}

// slabs is the number of slabs the mesh is cut into along its longest axis
// for the parallel pass; fixed, so that the result does not depend on the
// number of cores.
const slabs = 16

// decimator holds the mesh being simplified, shared by the workers.
type decimator struct {
	pos    []geom.Vec3
	faces  [][3]uint32
	dead   []bool    // per face
	vfaces [][]int32 // per vertex: its faces, dead ones dropped lazily
	q      []quadric
	own    []float64 // per vertex v: q[v].eval(pos[v]), kept with q[v]
	fixed  []bool    // per vertex: a crease or corner vertex
	gone   []bool    // per vertex: collapsed away
	slabOf []uint8   // per vertex
	locked []bool    // per vertex: has a neighbour in another slab
	queued []float64 // per vertex: queued cost
	target []uint32  // per vertex: the neighbour its queued cost moves it onto
	at     []int32   // per vertex: slot in its worker's queue, or −1
	s      sdf.SDF3
	tol    float64
}

// worker collapses edges in one slab, or, with slab −1, anywhere.
type worker struct {
	*decimator
	slab  int
	queue vertexHeap
	mark  []uint32 // per vertex: scratch marks for the link test
	epoch uint32
	opts  []option
	ring  []uint32
	ringK []uint32
	moved []int32
	newF  [][3]uint32
}

// decimate simplifies m in place, keeping it within tol of s's surface at
// the points the collapse test measures; fixed marks vertices (may be nil)
// that may only be merged with each other. The mesh is cut into slabs
// whose inner vertices are collapsed on up to workers goroutines (0 for
// GOMAXPROCS): a vertex all of whose neighbours lie in its slab touches only
// faces and vertices of that slab, so slabs do not interact. A serial pass
// over the whole mesh follows. The result is the same for the same input on
// any number of cores.
func decimate(m *geom.Mesh, fixed []bool, s sdf.SDF3, tol float64, workers int) {
	nv, nf := len(m.Vertices), len(m.Faces)
	if nf <= 4 {
		return
	}
	d := &decimator{
		pos:    m.Vertices,
		faces:  m.Faces,
		dead:   make([]bool, nf),
		q:      make([]quadric, nv),
		own:    make([]float64, nv),
		fixed:  fixed,
		gone:   make([]bool, nv),
		slabOf: make([]uint8, nv),
		locked: make([]bool, nv),
		queued: make([]float64, nv),
		target: make([]uint32, nv),
		at:     make([]int32, nv),
		s:      s,
		tol:    tol,
	}
	if d.fixed == nil {
		d.fixed = make([]bool, nv)
	}
	// Vertex → faces in one backing array; a list that grows reallocates.
	count := make([]int32, nv+1)
	for _, f := range m.Faces {
		for _, v := range f {
			count[v+1]++
		}
	}
	for i := range nv {
		count[i+1] += count[i]
	}
	// Each list gets twice its first length, room for the faces it gains.
	for i := range count {
		count[i] *= 2
	}
	back := make([]int32, count[nv])
	fill := slices.Clone(count[:nv])
	for fi, f := range m.Faces {
		n := faceCross(m.Vertices, f)
		l := n.Len()
		var pq quadric
		if l > 0 {
			n = n.Scale(1 / l)
			pq = planeQuadric(n, -n.Dot(m.Vertices[f[0]]))
		}
		for _, v := range f {
			back[fill[v]] = int32(fi)
			fill[v]++
			d.q[v].add(&pq)
		}
	}
	d.vfaces = make([][]int32, nv)
	for v := range nv {
		d.vfaces[v] = back[count[v]:fill[v]:count[v+1]]
		d.at[v] = -1
		d.own[v] = d.q[v].eval(d.pos[v])
	}
	d.cutSlabs(m)
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	var next atomic.Int64
	var wg sync.WaitGroup
	for range min(workers, slabs) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := d.newWorker()
			for {
				i := int(next.Add(1) - 1)
				if i >= slabs {
					return
				}
				w.slab = i
				w.run()
			}
		}()
	}
	wg.Wait()
	w := d.newWorker()
	w.slab = -1
	w.run()
	d.compact(m)
}

// cutSlabs assigns each vertex to one of the slabs along the longest axis
// of the mesh's box and locks the vertices with a neighbour in another.
func (d *decimator) cutSlabs(m *geom.Mesh) {
	b := m.Bounds()
	size := b.Size()
	axis := func(p geom.Vec3) float64 { return p.X - b.Min.X }
	length := size.X
	if size.Y > length {
		axis, length = func(p geom.Vec3) float64 { return p.Y - b.Min.Y }, size.Y
	}
	if size.Z > length {
		axis, length = func(p geom.Vec3) float64 { return p.Z - b.Min.Z }, size.Z
	}
	for v, p := range d.pos {
		d.slabOf[v] = uint8(min(max(int(axis(p)/length*slabs), 0), slabs-1))
	}
	for _, f := range d.faces {
		if d.slabOf[f[0]] != d.slabOf[f[1]] || d.slabOf[f[1]] != d.slabOf[f[2]] {
			d.locked[f[0]], d.locked[f[1]], d.locked[f[2]] = true, true, true
		}
	}
}

func (d *decimator) newWorker() *worker {
	return &worker{
		decimator: d,
		queue:     vertexHeap{cost: d.queued, at: d.at},
		mark:      make([]uint32, len(d.pos)),
	}
}

// run queues the worker's vertices and collapses until its queue is empty.
func (d *worker) run() {
	for v := range d.pos {
		if d.slab < 0 || int(d.slabOf[v]) == d.slab {
			d.update(uint32(v))
		}
	}
	for len(d.queue.h) > 0 {
		r := d.queue.h[0]
		d.queue.remove(r)
		d.options(r)
		for _, o := range d.opts[:min(len(d.opts), maxTries)] {
			if d.collapse(r, o.k) {
				break
			}
		}
	}
}

// cost returns the error of moving r onto k and whether that move is
// allowed at all: the quadric error of Q_r + Q_k at k (Q_k's own share is
// kept per vertex, as k does not move) plus the length term.
func (d *decimator) cost(r, k uint32) (float64, bool) {
	if d.fixed[r] && !d.fixed[k] {
		return 0, false
	}
	p := d.pos[k]
	e := d.pos[r].Sub(p)
	return max(d.q[r].eval(p)+d.own[k], 0) + lengthWeight*e.Dot(e), true
}

// option is a vertex r may be moved onto and the cost of that move.
type option struct {
	cost float64
	k    uint32
}

// options fills d.opts with the allowed moves of r, cheapest first, ties by
// index.
func (d *worker) options(r uint32) {
	d.opts = d.opts[:0]
	d.neighbours(r)
	for _, k := range d.ring {
		if c, ok := d.cost(r, k); ok {
			d.opts = append(d.opts, option{c, k})
		}
	}
	slices.SortFunc(d.opts, func(x, y option) int {
		switch {
		case x.cost < y.cost:
			return -1
		case x.cost > y.cost:
			return 1
		}
		return int(x.k) - int(y.k)
	})
}

// update queues v at the cost of its cheapest allowed move, or takes it
// out of the queue when it has none.
func (d *worker) update(v uint32) {
	if d.slab >= 0 && (int(d.slabOf[v]) != d.slab || d.locked[v]) {
		return // another slab's, or on the border
	}
	if !d.gone[v] {
		d.neighbours(v)
	}
	d.updateRing(v)
}

// updateRing is update for a vertex v of this worker whose neighbours
// d.ring already holds (any ring for a vertex that is gone).
func (d *worker) updateRing(v uint32) {
	if d.slab >= 0 && (int(d.slabOf[v]) != d.slab || d.locked[v]) {
		return
	}
	best := math.Inf(1)
	if !d.gone[v] {
		for _, k := range d.ring {
			if c, ok := d.cost(v, k); ok && c < best {
				best = c
				d.target[v] = k
			}
		}
	}
	if math.IsInf(best, 1) {
		d.queue.remove(v)
		return
	}
	d.queue.set(v, best)
}

// movedNext requeues v, a neighbour of k after r was moved onto k. Only v's
// cost onto k has changed, so a queued v whose cheapest move was onto
// neither needs just that one cost; any other v is updated in full (one
// whose moves all failed is tried again, as its neighbourhood changed).
func (d *worker) movedNext(v, r, k uint32) {
	if d.slab >= 0 && (int(d.slabOf[v]) != d.slab || d.locked[v]) {
		return
	}
	if d.at[v] < 0 || d.target[v] == r || d.target[v] == k {
		d.update(v)
		return
	}
	if c, ok := d.cost(v, k); ok && c < d.queued[v] {
		d.target[v] = k
		d.queue.set(v, c)
	}
}

// neighbours fills d.ring with the vertices sharing an edge with v, in the
// order they first appear in v's faces.
func (d *worker) neighbours(v uint32) {
	d.ring = d.ring[:0]
	e := d.nextEpoch()
	d.mark[v] = e
	for _, fi := range d.liveFaces(v) {
		for _, u := range d.faces[fi] {
			if d.mark[u] != e {
				d.mark[u] = e
				d.ring = append(d.ring, u)
			}
		}
	}
}

// nextEpoch starts a new round of marks and returns its value.
func (d *worker) nextEpoch() uint32 {
	if d.epoch >= math.MaxUint32-1 {
		clear(d.mark)
		d.epoch = 0
	}
	d.epoch++
	return d.epoch
}

// liveFaces drops dead faces from v's list and returns it.
func (d *decimator) liveFaces(v uint32) []int32 {
	fs := d.vfaces[v]
	n := 0
	for n < len(fs) && !d.dead[fs[n]] {
		n++ // nothing to move before the first dead face
	}
	for _, f := range fs[n:] {
		if !d.dead[f] {
			fs[n] = f
			n++
		}
	}
	d.vfaces[v] = fs[:n]
	return fs[:n]
}

// collapse moves r onto k if every test passes, reporting whether it did.
func (d *worker) collapse(r, k uint32) bool {
	fr := d.liveFaces(r)
	fk := d.liveFaces(k)
	// The two faces on edge r–k and their opposite vertices.
	var opp [2]uint32
	shared := 0
	d.moved = d.moved[:0]
	for _, fi := range fr {
		f := d.faces[fi]
		if f[0] == k || f[1] == k || f[2] == k {
			if shared == 2 {
				return false
			}
			for _, v := range f {
				if v != r && v != k {
					opp[shared] = v
				}
			}
			shared++
			continue
		}
		d.moved = append(d.moved, fi)
	}
	if shared != 2 || opp[0] == opp[1] || len(fr) == 3 && len(fk) == 3 {
		return false // a tetrahedron stays
	}
	// Link condition: the neighbours common to r and k are exactly the two
	// opposite vertices.
	if d.epoch >= math.MaxUint32-2 { // room for the two rounds below
		clear(d.mark)
		d.epoch = 0
	}
	inR := d.nextEpoch()
	for _, fi := range fr {
		for _, v := range d.faces[fi] {
			d.mark[v] = inR
		}
	}
	common := 0
	counted := d.nextEpoch()
	for _, fi := range fk {
		for _, v := range d.faces[fi] {
			if v != r && v != k && d.mark[v] == inR {
				d.mark[v] = counted // count each once
				common++
			}
		}
	}
	if common != 2 {
		return false
	}
	// Shape of each moved face.
	d.newF = d.newF[:0]
	for _, fi := range d.moved {
		old := d.faces[fi]
		nf := old
		for i := range nf {
			if nf[i] == r {
				nf[i] = k
			}
		}
		n0 := faceCross(d.pos, old)
		n1 := faceCross(d.pos, nf)
		l0, l1 := n0.Len(), n1.Len()
		if !(l1 > 0) || n0.Dot(n1) < maxNormalTurn*l0*l1 {
			return false
		}
		if quality(d.pos, nf) < max(floorQuality, min(minQuality, quality(d.pos, old))) {
			return false
		}
		d.newF = append(d.newF, nf)
	}
	// True distance at moved centroids and at midpoints of new edges.
	pk := d.pos[k]
	for _, f := range d.newF {
		c := d.pos[f[0]].Add(d.pos[f[1]]).Add(d.pos[f[2]]).Scale(1.0 / 3)
		if math.Abs(d.s.Eval(c)) > d.tol {
			return false
		}
		// The edge leaving k in f; each new edge is the leaving edge of
		// exactly one moved face.
		for i := range 3 {
			if f[i] == k {
				if o := f[(i+1)%3]; o != opp[0] && o != opp[1] {
					if math.Abs(d.s.Eval(pk.Add(d.pos[o]).Scale(0.5))) > d.tol {
						return false
					}
				}
			}
		}
	}
	// Apply.
	for _, fi := range fr {
		if !slices.Contains(d.moved, fi) {
			d.dead[fi] = true
		}
	}
	for i, fi := range d.moved {
		d.faces[fi] = d.newF[i]
		d.vfaces[k] = append(d.vfaces[k], fi)
	}
	d.gone[r] = true
	d.vfaces[r] = nil
	d.q[k].add(&d.q[r])
	d.own[k] = d.q[k].eval(d.pos[k])
	d.liveFaces(opp[0])
	d.liveFaces(opp[1])
	d.neighbours(k)
	ring := append(d.ringK[:0], d.ring...)
	d.ringK = ring
	d.updateRing(k) // d.ring is k's
	for _, v := range ring {
		d.movedNext(v, r, k)
	}
	return true
}

// quality returns 4√3·area / (sum of squared edges) of face f: 1 for an
// equilateral triangle, 0 for a degenerate one.
func quality(v []geom.Vec3, f [3]uint32) float64 {
	a, b, c := v[f[0]], v[f[1]], v[f[2]]
	s := b.Sub(a).Dot(b.Sub(a)) + c.Sub(b).Dot(c.Sub(b)) + a.Sub(c).Dot(a.Sub(c))
	if !(s > 0) {
		return 0
	}
	return 2 * math.Sqrt(3) * b.Sub(a).Cross(c.Sub(a)).Len() / s
}

// compact rewrites m with the surviving vertices and faces in their
// original order.
func (d *decimator) compact(m *geom.Mesh) {
	index := make([]uint32, len(d.pos))
	vs := m.Vertices[:0]
	for i, p := range d.pos {
		if !d.gone[i] {
			index[i] = uint32(len(vs))
			vs = append(vs, p)
		}
	}
	fs := m.Faces[:0]
	for i, f := range d.faces {
		if !d.dead[i] {
			fs = append(fs, [3]uint32{index[f[0]], index[f[1]], index[f[2]]})
		}
	}
	m.Vertices, m.Faces = slices.Clip(vs), slices.Clip(fs)
}
