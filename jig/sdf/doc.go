// Package sdf is a small signed-distance kernel for solid modelling.
//
// A solid is an SDF3: Eval returns a signed distance bound in millimetres,
// negative inside, positive outside, zero on the surface, and Bounds returns
// a box that holds the whole solid. Every shape here is 1-Lipschitz: its value
// changes by at most the distance moved, so |Eval(p)| never exceeds the true
// distance from p to the surface by more than the accuracy stated on the
// shape. Exact shapes (the primitives, rigid transforms, sharp unions outside
// the solid) return the Euclidean distance itself; blends, differences and
// intersections return a lower bound on it whose sign is still exact.
//
// Profiles in the plane are SDF2 values with the same contract; Revolve and
// Extrude lift them into space, and HelixSweep carries one along a helix of
// any radius profile r(φ) and height z(φ), exactly for a round profile within
// its reach. Offset rounds a solid, VGroove engraves along lines, and Move
// applies a rigid motion. A shape that is costly away from itself may also
// implement Bounded, which Difference uses to skip work where a cut cannot
// change the result.
//
// Constructors check their arguments and return an *ArgError for a size that
// cannot make a solid. Shapes are immutable values, safe for concurrent use.
package sdf
