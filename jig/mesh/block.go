package mesh

// A block worker samples one block of the grid and runs marching cubes over
// its cells; see the overview in mesher.go.

import (
	"math"
	"slices"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

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
	done []bool      // whether vals holds the point's value
	vert []int32     // local vertex per block edge slot, −1 when unset
	norm []geom.Vec3 // unit normal per local vertex, zero until needed
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
	sample := func(x, y, z int) float64 {
		k := x + bp*(y+bp*z)
		if w.done[k] {
			return w.vals[k]
		}
		w.done[k] = true
		v := w.s.Eval(g.point(i0+x, j0+y, k0+z))
		w.vals[k] = v
		if v < 0 {
			anyNeg = true
		} else {
			anyPos = true
		}
		return v
	}
	// Within the live sub-blocks, regions of 2³ cells are culled by the
	// value at their centre, itself a grid point: a region farther from
	// the surface than its half diagonal has every corner of the centre's
	// sign, so its cells hold no crossing, and a point that only dead
	// regions use is never needed.
	var region [regions * regions * regions]bool
	rh := float64(regionCells) * g.h / 2
	for r := range region {
		rx, ry, rz := r%regions, r/regions%regions, r/(regions*regions)
		if !live[rx/2+2*(ry/2)+4*(rz/2)] {
			continue
		}
		v := sample(regionCells*rx+1, regionCells*ry+1, regionCells*rz+1)
		region[r] = math.Abs(v) <= rh*math.Sqrt(3)*(1+1e-9)
	}
	for z := range bp {
		for y := range bp {
			for x := range bp {
				if regionUses(&region, x, y, z) {
					sample(x, y, z)
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
	// The patch is built in the worker's scratch and copied out at its
	// exact size, so blocks waiting to be merged hold no spare capacity.
	if w.p == nil {
		w.p = &patch{}
	}
	w.p.keys, w.p.pos, w.p.tris = w.p.keys[:0], w.p.pos[:0], w.p.tris[:0]
	w.norm = w.norm[:0]
	for z := range blockCells {
		for y := range blockCells {
			for x := range blockCells {
				if region[x/regionCells+regions*(y/regionCells+regions*(z/regionCells))] {
					w.cell(i0, j0, k0, x, y, z)
				}
			}
		}
	}
	if len(w.p.tris) == 0 {
		return nil
	}
	return &patch{keys: slices.Clone(w.p.keys), pos: slices.Clone(w.p.pos), tris: slices.Clone(w.p.tris)}
}

// regionCells is the edge of a culling region in cells (its centre is then a
// grid point), and regions the number of regions along a block's edge.
const (
	regionCells = 2
	regions     = blockCells / regionCells
)

// regionUses reports whether block point (x, y, z) is a corner of a cell in
// a live region.
func regionUses(region *[regions * regions * regions]bool, x, y, z int) bool {
	for rz := max(0, (z-1)/regionCells); rz <= min(regions-1, z/regionCells); rz++ {
		for ry := max(0, (y-1)/regionCells); ry <= min(regions-1, y/regionCells); ry++ {
			for rx := max(0, (x-1)/regionCells); rx <= min(regions-1, x/regionCells); rx++ {
				if region[rx+regions*(ry+regions*rz)] {
					return true
				}
			}
		}
	}
	return false
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
	w.norm = append(w.norm, geom.Vec3{})
	return idx
}
