package mesh

// The mesher turns a signed distance bound into a closed triangle mesh by
// narrow-band marching cubes on a uniform grid.
//
//  1. The solid's box, padded by two cells, is cut into blocks of 8³ cells.
//     A block whose centre lies farther from the surface than its half
//     diagonal cannot hold a sign change (the distance is 1-Lipschitz) and is
//     skipped; so is each of its eight sub-blocks of 4³ cells by the same
//     test, and so is each region of 2³ cells in the rest by the value at
//     its centre, a grid point; the points the remaining regions use are
//     sampled. Blocks are handed to
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
//     triangles across its shortest diagonals, never one lying on a cube
//     face (a neighbouring cell might use it too); a cycle that cannot be
//     cut so is fanned about a vertex inside the cell.
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
//  6. With MeshOptions.Simplify the welded mesh is then decimated by edge
//     collapses that keep it a closed manifold of the same topology and keep
//     the true distance at the points they sample within a share of the
//     tolerance (decimate.go). How many triangles it leaves on the demo
//     formers is reported by the former benchmarks in jig, and how far the
//     result lies from the surface by the former's accuracy test.
//
// Blocks are merged in index order, so the output is the same on any number
// of cores. Accuracy: vertices lie within 1e-4 cell of the surface (feature
// vertices within 0.01 cell, by Newton projection); face centroids carry the
// chord error s²/(8R) of curved parts, which the cell size from MeshOptions
// keeps within the tolerance for radii down to MinRadius. Features thinner
// than about two cells (fine lettering) can exceed it; the former's
// accuracy test in jig reports the demo former's figures.

import (
	"errors"
	"fmt"
	"math"
	"runtime"
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
	cellPerTolerance = 4
	// MaxCellPerTolerance is the largest grid cell, in tolerances, for a
	// caller that sizes the cell from its own smallest radius.
	MaxCellPerTolerance = 8
)

// simplifyShare is the part of the tolerance that simplification may use at
// the points it samples (centroids and new edge midpoints). The rest is
// room for the error between samples where a large face spans a feature,
// and keeps circle fits to the groove's mesh close enough for the former's
// pitch test, which half the tolerance did not. Chosen by trial (no
// published source).
const simplifyShare = 0.25

// rootTol is the distance, as a fraction of the cell, at which an edge
// crossing counts as found.
const rootTol = 1e-4

// blockCells is the edge of a block in cells.
const blockCells = 8

// MeshOptions controls Mesh. The zero value meshes at DefaultTolerance on
// every core, without simplification.
type MeshOptions struct {
	Tolerance float64 // largest wanted distance of the mesh from the surface, mm; 0 for DefaultTolerance
	MinRadius float64 // smallest radius of curvature of the smooth parts, mm; 0 if unknown
	Cell      float64 // grid cell edge in mm; 0 derives it from Tolerance and MinRadius
	Workers   int     // goroutines; 0 for GOMAXPROCS
	Simplify  bool    // collapse edges on smooth and flat parts while the mesh stays within Tolerance
}

// ErrUnbounded is returned by Mesh for a solid whose bounds are not finite.
var ErrUnbounded = errors.New("solid has infinite bounds")

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
		return nil, fmt.Errorf("mesh tolerance %g mm must be above 0", tol)
	}
	cell := opt.Cell
	switch {
	case cell == 0 && opt.MinRadius > 0:
		cell = min(math.Sqrt(4*tol*opt.MinRadius), MaxCellPerTolerance*tol)
	case cell == 0:
		cell = cellPerTolerance * tol
	}
	if !(cell > 0) || math.IsInf(cell, 0) {
		return nil, fmt.Errorf("mesh cell %g mm must be above 0", cell)
	}
	b := s.Bounds()
	for _, v := range []float64{b.Min.X, b.Min.Y, b.Min.Z, b.Max.X, b.Max.Y, b.Max.Z} {
		if math.IsInf(v, 0) || math.IsNaN(v) {
			return nil, ErrUnbounded
		}
	}
	g := newGrid(b, cell)
	if float64(g.np[0])*float64(g.np[1])*float64(g.np[2]) > maxGridPoints {
		return nil, fmt.Errorf("a %.3g mm cell over a %.0f×%.0f×%.0f mm solid needs too many grid points; raise the tolerance",
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
	m, feature := merge(&g, results)
	flipCreases(m, feature, s)
	if opt.Simplify {
		decimate(m, feature, s, simplifyShare*tol, workers)
	}
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
	tris [][3]int32
}

// merge welds the patches in block order into one mesh and marks the
// vertices placed inside cells (keys from featureBase on). Only a vertex on
// a grid edge lying in a block's boundary plane can occur in more than one
// patch, so only those go through the weld map.
func merge(g *grid, ps []*patch) (*geom.Mesh, []bool) {
	featureBase := g.featureBase()
	nv, nt := 0, 0
	for _, p := range ps {
		if p != nil {
			nv += len(p.keys)
			nt += len(p.tris)
		}
	}
	m := &geom.Mesh{Vertices: make([]geom.Vec3, 0, nv*3/4), Faces: make([][3]uint32, 0, nt)}
	index := make(map[uint64]uint32, nv/4)
	feature := make([]bool, 0, nv*3/4)
	var local []uint32
	for _, p := range ps {
		if p == nil {
			continue
		}
		local = local[:0]
		for i, k := range p.keys {
			shared := k < featureBase && g.onBlockFace(k)
			v, ok := uint32(0), false
			if shared {
				v, ok = index[k]
			}
			if !ok {
				v = uint32(len(m.Vertices))
				if shared {
					index[k] = v
				}
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

// onBlockFace reports whether the grid edge with key k lies in a plane
// between blocks, where the blocks on both sides can place its vertex.
func (g *grid) onBlockFace(k uint64) bool {
	a := int(k % 3)
	p := k / 3
	c := [3]int{int(p % uint64(g.np[0])), int(p / uint64(g.np[0]) % uint64(g.np[1])), int(p / (uint64(g.np[0]) * uint64(g.np[1])))}
	for b := range 3 {
		if b != a && c[b]%blockCells == 0 {
			return true
		}
	}
	return false
}
