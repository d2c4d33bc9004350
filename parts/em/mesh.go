package em

import (
	"math"
	"runtime"
	"sort"
	"sync"
	"sync/atomic"

	"coilwright/cam/geom"
)

// half is one segment's part of a triangle basis function: the rising half
// (ξ/l, peak at the segment's end) or the falling half (1 − ξ/l, peak at its
// start), times sign (+1 when the function's current runs along the
// segment's direction).
type half struct {
	basis  int
	rising bool
	sign   float64
}

// pairList holds, for each test segment p, the near source segments q ≥ p
// and their static integrals (compressed rows: q[start[p]:start[p+1]]).
type pairList struct {
	start []int
	q     []int
	st    []staticMoments
}

// Mesh is the frequency-independent part of a solution: segments, basis
// functions, the feed, integration rules and the static near-pair
// integrals. Build it once with NewMesh and call Solve for each frequency.
// A Mesh is safe for concurrent use by Solve.
type Mesh struct {
	segs    []segment
	img     []segment // mirrored segments (PerfectGround only)
	halves  [][]half  // per segment
	nBasis  int
	ground  bool
	feedSeg int
	feedEnd int // 0: the gap is at the segment's start, 1: at its end
	voltage complex128
	rules   *rules
	near    pairList
	nearImg pairList
	wires   int
	workers int // MeshOptions.Workers; 0 means GOMAXPROCS
}

// Unknowns returns the number of basis functions (the matrix order).
func (m *Mesh) Unknowns() int { return m.nBasis }

// Segments returns the number of wire segments (images not counted).
func (m *Mesh) Segments() int { return len(m.segs) }

// NewMesh validates a model and builds its frequency-independent parts.
// Wires are used as given (see Subdivide to segment them). It returns a
// *GeometryError for a model it refuses.
func NewMesh(model Model, opt MeshOptions) (*Mesh, error) {
	minRadii := opt.MinSegmentRadii
	if minRadii == 0 {
		minRadii = DefaultMinSegmentRadii
	}
	tol := opt.JunctionTolerance
	if tol == 0 {
		tol = DefaultJunctionTolerance
	}
	if len(model.Wires) == 0 {
		return nil, &GeometryError{Kind: NoWires, Wire: -1, Segment: -1}
	}
	m := &Mesh{ground: model.Ground == PerfectGround, rules: newRules(opt.Quadrature), wires: len(model.Wires), workers: max(opt.Workers, 0)}
	const mm = 1e-3
	type end struct {
		seg, end int
		p        geom.Vec3 // mm
		wireEnd  bool
	}
	var ends []end
	for wi, w := range model.Wires {
		if err := checkWire(w, wi); err != nil {
			return nil, err
		}
		last := len(w.Points) - 2
		for i := 0; i+1 < len(w.Points); i++ {
			a, b := w.Points[i], w.Points[i+1]
			r := w.radius(i)
			if l := b.Sub(a).Len(); l < minRadii*r || l <= tol {
				return nil, &GeometryError{Kind: ShortSegment, Wire: wi, Segment: i, Value: l, Limit: max(minRadii*r, tol)}
			}
			if m.ground {
				for _, p := range []geom.Vec3{a, b} {
					if p.Z < -tol {
						return nil, &GeometryError{Kind: BelowGround, Wire: wi, Segment: i, Value: p.Z}
					}
				}
				onA, onB := math.Abs(a.Z) <= tol, math.Abs(b.Z) <= tol
				if (onA && onB) || (onA && i > 0) || (onB && i < last) {
					return nil, &GeometryError{Kind: TouchesGround, Wire: wi, Segment: i, Value: 0}
				}
			}
			s := newSegment(a.Scale(mm), b.Scale(mm), r*mm)
			s.wire, s.piece = wi, i
			if !math.IsInf(w.Conductivity, 1) {
				s.sigma = w.Conductivity
			}
			n := len(m.segs)
			m.segs = append(m.segs, s)
			ends = append(ends, end{n, 0, a, i == 0}, end{n, 1, b, i == last})
		}
	}

	// Merge coincident ends into nodes (union-find over a sweep in x).
	parent := make([]int, len(ends))
	for i := range parent {
		parent[i] = i
	}
	var find func(int) int
	find = func(i int) int {
		for parent[i] != i {
			parent[i] = parent[parent[i]]
			i = parent[i]
		}
		return i
	}
	order := make([]int, len(ends))
	for i := range order {
		order[i] = i
	}
	sort.SliceStable(order, func(i, j int) bool { return ends[order[i]].p.X < ends[order[j]].p.X })
	for ii, i := range order {
		for _, j := range order[ii+1:] {
			if ends[j].p.X-ends[i].p.X > tol {
				break
			}
			if ends[j].p.Sub(ends[i].p).Len() <= tol {
				ri, rj := find(i), find(j)
				if ri != rj {
					parent[max(ri, rj)] = min(ri, rj)
				}
			}
		}
	}
	groups := map[int][]int{}
	var roots []int
	for i := range ends {
		r := find(i)
		if _, ok := groups[r]; !ok {
			roots = append(roots, r)
		}
		groups[r] = append(groups[r], i)
	}

	// Basis functions, node by node in order of first end.
	m.halves = make([][]half, len(m.segs))
	add := func(e end, basis int, incoming bool) {
		rising := e.end == 1
		sign := 1.0
		if incoming != rising {
			sign = -1
		}
		m.halves[e.seg] = append(m.halves[e.seg], half{basis: basis, rising: rising, sign: sign})
	}
	for _, r := range roots {
		g := groups[r]
		if m.ground && math.Abs(ends[g[0]].p.Z) <= tol {
			for _, i := range g {
				add(ends[i], m.nBasis, false)
				m.nBasis++
			}
			continue
		}
		for _, i := range g[1:] {
			add(ends[g[0]], m.nBasis, true)
			add(ends[i], m.nBasis, false)
			m.nBasis++
		}
	}

	if err := m.placeFeed(model, tol); err != nil {
		return nil, err
	}
	if m.ground {
		m.img = make([]segment, len(m.segs))
		for i, s := range m.segs {
			m.img[i] = s.mirror()
		}
	}
	m.near = m.nearPairs(m.segs)
	if m.ground {
		m.nearImg = m.nearPairs(m.img)
	}
	return m, nil
}

// placeFeed finds the feed's gap segment and end.
func (m *Mesh) placeFeed(model Model, tol float64) error {
	f := model.Feed
	if f.Wire < 0 || f.Wire >= len(model.Wires) {
		return &GeometryError{Kind: FeedWire, Wire: -1, Segment: -1, Value: float64(f.Wire)}
	}
	m.voltage = f.Voltage
	if m.voltage == 0 {
		m.voltage = 1
	}
	best, bestD := -1, math.Inf(1)
	for i, p := range model.Wires[f.Wire].Points {
		if d := p.Sub(f.At).Len(); d < bestD {
			best, bestD = i, d
		}
	}
	if bestD > tol {
		return &GeometryError{Kind: FeedNotOnNode, Wire: f.Wire, Segment: -1, Value: bestD, Limit: tol}
	}
	first := -1
	for i, s := range m.segs {
		if s.wire == f.Wire {
			first = i
			break
		}
	}
	pieces := len(model.Wires[f.Wire].Points) - 1
	if best < pieces {
		m.feedSeg, m.feedEnd = first+best, 0
	} else {
		m.feedSeg, m.feedEnd = first+pieces-1, 1
	}
	if m.gapWeights() == nil {
		return &GeometryError{Kind: FeedOpenEnd, Wire: f.Wire, Segment: m.feedSeg - first}
	}
	return nil
}

// gapWeight is one basis function's value at the gap along the gap
// segment's direction (±1).
type gapWeight struct {
	basis int
	w     float64
}

// gapWeights returns the basis functions with a value at the gap, in basis
// order. Nil when none.
func (m *Mesh) gapWeights() []gapWeight {
	var out []gapWeight
	for _, h := range m.halves[m.feedSeg] {
		if h.rising == (m.feedEnd == 1) {
			out = append(out, gapWeight{h.basis, h.sign})
		}
	}
	sort.Slice(out, func(i, j int) bool { return out[i].basis < out[j].basis })
	return out
}

// nearPairs lists the pairs (p, q ≥ p) of m.segs against src that need the
// near treatment and computes their static integrals in parallel.
func (m *Mesh) nearPairs(src []segment) pairList {
	n := len(m.segs)
	pl := pairList{start: make([]int, n+1)}
	for p := range n {
		for q := p; q < n; q++ {
			if separation(&m.segs[p], &src[q]) < m.rules.nearRatio {
				pl.q = append(pl.q, q)
			}
		}
		pl.start[p+1] = len(pl.q)
	}
	pl.st = make([]staticMoments, len(pl.q))
	parallelFor(m.workers, n, func(p int) {
		for i := pl.start[p]; i < pl.start[p+1]; i++ {
			q := &src[pl.q[i]]
			pl.st[i] = staticPair(&m.segs[p], q, pairA2(&m.segs[p], q), &m.rules.de)
		}
	})
	return pl
}

// parallelFor calls fn(i) for i in [0, n) on at most workers goroutines
// (zero: GOMAXPROCS); with one it calls them in order on the calling
// goroutine. Each call must write only to its own pre-indexed output, so
// results do not depend on the number of cores.
func parallelFor(workers, n int, fn func(i int)) {
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	workers = min(workers, n)
	if workers <= 1 {
		for i := range n {
			fn(i)
		}
		return
	}
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for {
				i := int(next.Add(1) - 1)
				if i >= n {
					return
				}
				fn(i)
			}
		}()
	}
	wg.Wait()
}
