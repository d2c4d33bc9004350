package em

import "coilwright/cam/geom"

// Ground selects what lies below the wires.
type Ground int

const (
	// FreeSpace: no ground; the wires radiate into all space.
	FreeSpace Ground = iota
	// PerfectGround: an infinite perfectly conducting plane z = 0, modelled
	// by image theory. Wires must lie in z ≥ 0 and may end on the plane.
	PerfectGround
)

// Feed is a delta-gap voltage source at a node of one wire. The gap drives
// current along the wire's point order: at the wire's first point into the
// wire, at an interior point onward along it, at its last point out of its
// end (into a junction or the ground plane).
type Feed struct {
	// Wire indexes Model.Wires.
	Wire int
	// At is the node in millimetres: one of the wire's points (an end at a
	// junction or on the ground plane, or an interior point).
	At geom.Vec3
	// Voltage is the gap voltage in volts; zero means 1 V.
	Voltage complex128
}

// Model is the wire structure to solve: wires, an optional ground and one
// feed. Wire ends that coincide (within MeshOptions.JunctionTolerance) are
// joined; with PerfectGround, wire ends on z = 0 connect to the plane.
type Model struct {
	Wires  []Wire
	Ground Ground
	Feed   Feed
}

// MeshOptions tunes NewMesh. The zero value is the default.
type MeshOptions struct {
	// MinSegmentRadii is the shortest segment allowed, in wire radii. The
	// reduced kernel breaks down for segments shorter than about two radii;
	// zero means DefaultMinSegmentRadii.
	MinSegmentRadii float64
	// JunctionTolerance is the distance in millimetres within which points
	// are the same node; zero means DefaultJunctionTolerance.
	JunctionTolerance float64
	// Quadrature raises every integration rule by this many levels (0 is
	// the default rule set; used to show the rules have converged).
	Quadrature int
	// Workers is the most goroutines the mesh's work (building it, filling,
	// factoring, pattern searches) runs on at one time: 1 runs it all on
	// the calling goroutine, for callers that solve many meshes in
	// parallel themselves; zero means GOMAXPROCS. The results do not
	// depend on it.
	Workers int
}

// DefaultMinSegmentRadii is the shortest segment NewMesh accepts, in
// radii. Common practice (no published source): the reduced kernel is
// usable down to about two radii; four radii or more is preferred, which
// Subdivide aims for.
const DefaultMinSegmentRadii = 2.0

// DefaultJunctionTolerance is the distance (mm) within which two points are
// one node.
const DefaultJunctionTolerance = 1e-3
