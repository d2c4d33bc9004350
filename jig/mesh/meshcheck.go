package mesh

// CheckMesh verifies a triangle mesh without trusting the mesher: it sorts
// every face edge by its vertex pair to find edges used by one face, by more
// than two, or twice in the same direction; walks each vertex's ring of
// faces to find pinched vertices; counts vertex-connected components with a
// union-find; and compares the Euler characteristic V − E + F with
// 2·(components − genus). With a distance function it also measures how far
// the vertices and the face centroids lie from the true surface.

import (
	"errors"
	"fmt"
	"math"
	"runtime"
	"slices"
	"strings"
	"sync"

	"coilwright/cam/geom"
	"coilwright/jig/sdf"
)

// CheckOptions says what CheckMesh expects. The zero value expects one
// component of genus 0 and measures no distances.
type CheckOptions struct {
	Components int      // expected connected parts; 0 means 1
	Genus      int      // expected total genus (number of through-holes)
	SDF        sdf.SDF3 // when set, vertex and centroid distances are measured
	Tolerance  float64  // largest allowed |SDF| at vertices and centroids, mm; 0 skips the limit
}

// MeshReport is what CheckMesh measured on a mesh.
type MeshReport struct {
	Vertices, Faces, Edges int
	OpenEdges              int     // edges with one face
	OverusedEdges          int     // edges with more than two faces
	MisorientedEdges       int     // edges whose two faces run them the same way
	PinchedVertices        int     // vertices whose faces do not form one fan
	DegenerateFaces        int     // faces with a repeated vertex or no area
	UnusedVertices         int     // vertices no face uses
	Components             int     // vertex-connected parts
	Euler                  int     // V − E + F
	Volume                 float64 // enclosed volume, mm³
	MaxVertexDist          float64 // largest |SDF| at a vertex, mm (0 without SDF)
	MaxCentroidDist        float64 // largest |SDF| at a face centroid, mm (0 without SDF)
}

// ErrBadMesh is wrapped by the error CheckMesh returns for a failed check.
var ErrBadMesh = errors.New("mesh check failed")

// degenerateRatio is the area ratio below which a face counts as collapsed:
// twice its area against the square of its longest edge.
const degenerateRatio = 1e-10

// CheckMesh measures m and returns the report and, when any check fails, an
// error wrapping ErrBadMesh that lists every failure. It does not modify m.
func CheckMesh(m *geom.Mesh, opt CheckOptions) (MeshReport, error) {
	r := MeshReport{Vertices: len(m.Vertices), Faces: len(m.Faces)}
	nv := uint32(len(m.Vertices))
	type half struct {
		key uint64 // lower vertex << 32 | upper vertex
		fwd bool   // runs from lower to upper
	}
	hs := make([]half, 0, 3*len(m.Faces))
	used := make([]bool, nv)
	for _, f := range m.Faces {
		for k := range 3 {
			a, b := f[k], f[(k+1)%3]
			if a >= nv || b >= nv {
				return r, fmt.Errorf("%w: face refers to vertex %d of %d", ErrBadMesh, max(a, b), nv)
			}
			used[a] = true
			lo, hi := min(a, b), max(a, b)
			hs = append(hs, half{uint64(lo)<<32 | uint64(hi), a < b})
		}
		if degenerate(m, f) {
			r.DegenerateFaces++
		}
	}
	slices.SortFunc(hs, func(x, y half) int {
		switch {
		case x.key < y.key:
			return -1
		case x.key > y.key:
			return 1
		}
		return 0
	})
	for i := 0; i < len(hs); {
		j := i
		fwd := 0
		for j < len(hs) && hs[j].key == hs[i].key {
			if hs[j].fwd {
				fwd++
			}
			j++
		}
		r.Edges++
		switch n := j - i; {
		case n == 1:
			r.OpenEdges++
		case n > 2:
			r.OverusedEdges++
		case fwd != 1:
			r.MisorientedEdges++
		}
		i = j
	}
	for _, u := range used {
		if !u {
			r.UnusedVertices++
		}
	}
	r.PinchedVertices = pinched(m)
	r.Components = components(m)
	r.Euler = len(m.Vertices) - r.Edges - r.UnusedVertices + len(m.Faces)
	r.Volume = m.Volume()
	if opt.SDF != nil {
		r.MaxVertexDist, r.MaxCentroidDist = surfaceDistances(m, opt.SDF)
	}
	return r, r.verdict(opt)
}

// verdict lists the failed checks as one error, or nil.
func (r MeshReport) verdict(opt CheckOptions) error {
	var fails []string
	count := func(n int, what string) {
		if n != 0 {
			fails = append(fails, fmt.Sprintf("%d %s", n, what))
		}
	}
	count(r.OpenEdges, "open edges")
	count(r.OverusedEdges, "edges shared by more than two faces")
	count(r.MisorientedEdges, "edges run the same way by both faces")
	count(r.PinchedVertices, "pinched vertices")
	count(r.DegenerateFaces, "degenerate faces")
	count(r.UnusedVertices, "unused vertices")
	wantParts := max(opt.Components, 1)
	if r.Components != wantParts {
		fails = append(fails, fmt.Sprintf("%d components, want %d", r.Components, wantParts))
	}
	if want := 2 * (wantParts - opt.Genus); r.Euler != want {
		fails = append(fails, fmt.Sprintf("Euler characteristic %d, want %d for genus %d", r.Euler, want, opt.Genus))
	}
	if !(r.Volume > 0) {
		fails = append(fails, fmt.Sprintf("volume %g mm³ is not positive", r.Volume))
	}
	if opt.Tolerance > 0 {
		if r.MaxVertexDist > opt.Tolerance {
			fails = append(fails, fmt.Sprintf("a vertex lies %.4f mm off the surface (limit %g)", r.MaxVertexDist, opt.Tolerance))
		}
		if r.MaxCentroidDist > opt.Tolerance {
			fails = append(fails, fmt.Sprintf("a face centroid lies %.4f mm off the surface (limit %g)", r.MaxCentroidDist, opt.Tolerance))
		}
	}
	if len(fails) == 0 {
		return nil
	}
	return fmt.Errorf("%w: %s", ErrBadMesh, strings.Join(fails, "; "))
}

// degenerate reports whether face f repeats a vertex or has no area.
func degenerate(m *geom.Mesh, f [3]uint32) bool {
	if f[0] == f[1] || f[1] == f[2] || f[0] == f[2] {
		return true
	}
	a, b, c := m.Vertices[f[0]], m.Vertices[f[1]], m.Vertices[f[2]]
	l := math.Max(b.Sub(a).Len(), math.Max(c.Sub(b).Len(), a.Sub(c).Len()))
	return !(b.Sub(a).Cross(c.Sub(a)).Len() > degenerateRatio*l*l)
}

// pinched counts vertices whose incident faces do not make a single fan:
// around a manifold vertex the edges opposite it, each run from the face's
// next vertex to its last, chain into exactly one closed loop.
func pinched(m *geom.Mesh) int {
	nv := len(m.Vertices)
	start := make([]int32, nv+1)
	for _, f := range m.Faces {
		for _, v := range f {
			start[v+1]++
		}
	}
	for i := range nv {
		start[i+1] += start[i]
	}
	fill := slices.Clone(start[:nv])
	ring := make([][2]uint32, 3*len(m.Faces)) // (next, last) per incident face
	for _, f := range m.Faces {
		for k, v := range f {
			ring[fill[v]] = [2]uint32{f[(k+1)%3], f[(k+2)%3]}
			fill[v]++
		}
	}
	bad := 0
	for v := range nv {
		r := ring[start[v]:start[v+1]]
		if len(r) == 0 {
			continue
		}
		// Follow next → last links from the first face; a single loop
		// visits every face once.
		seen, cur := 1, r[0][1]
		for cur != r[0][0] && seen <= len(r) {
			found := false
			for _, e := range r {
				if e[0] == cur {
					cur, found = e[1], true
					break
				}
			}
			if !found {
				break
			}
			seen++
		}
		if cur != r[0][0] || seen != len(r) {
			bad++
		}
	}
	return bad
}

// components counts vertex-connected parts among used vertices.
func components(m *geom.Mesh) int {
	parent := make([]int32, len(m.Vertices))
	for i := range parent {
		parent[i] = int32(i)
	}
	var find func(int32) int32
	find = func(x int32) int32 {
		for parent[x] != x {
			parent[x] = parent[parent[x]]
			x = parent[x]
		}
		return x
	}
	used := make([]bool, len(m.Vertices))
	for _, f := range m.Faces {
		for k := range 3 {
			used[f[k]] = true
			a, b := find(int32(f[k])), find(int32(f[(k+1)%3]))
			if a != b {
				parent[a] = b
			}
		}
	}
	n := 0
	for i := range parent {
		if used[i] && find(int32(i)) == int32(i) {
			n++
		}
	}
	return n
}

// surfaceDistances returns the largest |s| over the vertices and over the
// face centroids, evaluated on every core.
func surfaceDistances(m *geom.Mesh, s sdf.SDF3) (float64, float64) {
	workers := runtime.GOMAXPROCS(0)
	vmax := make([]float64, workers)
	cmax := make([]float64, workers)
	var wg sync.WaitGroup
	for w := range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := w; i < len(m.Vertices); i += workers {
				vmax[w] = math.Max(vmax[w], math.Abs(s.Eval(m.Vertices[i])))
			}
			for i := w; i < len(m.Faces); i += workers {
				f := m.Faces[i]
				c := m.Vertices[f[0]].Add(m.Vertices[f[1]]).Add(m.Vertices[f[2]]).Scale(1.0 / 3)
				cmax[w] = math.Max(cmax[w], math.Abs(s.Eval(c)))
			}
		}()
	}
	wg.Wait()
	return slices.Max(vmax), slices.Max(cmax)
}
