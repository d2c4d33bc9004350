// Package em is a thin-wire moment-method solver: wires, an optional perfect
// ground plane and frequencies in; currents, impedance and far fields out.
//
// Formulation: the mixed-potential electric-field integral equation on thin
// round wires, solved by Galerkin's method with triangle (rooftop) basis
// functions, one per interior node, k−1 per junction of k wire ends and one
// half-triangle per wire end on the ground plane, which its image completes.
// The kernel is the reduced (thin-wire) kernel G(R) = e^{−jkR}/(4πR) with
// R = √(|r−r′|² + a²). For near segment pairs the static terms 1/R and −k²R/2
// are integrated in closed form along the source segment and by
// double-exponential quadrature along the test segment (computed once per
// geometry); the smooth remainder and all far pairs use Gauss–Legendre
// rules. The source is a delta-gap voltage at a node. A perfect ground plane
// z = 0 is modelled by image theory; finite conductivity by the skin-effect
// surface impedance. The dense complex system is solved by a blocked LU
// factorisation with partial pivoting.
//
// Sources: R. F. Harrington, Field Computation by Moment Methods, 1968
// (triangle basis, Galerkin testing); C. A. Balanis, Antenna Theory, 3rd ed.,
// ch. 4 and 8; W. C. Gibson, The Method of Moments in Electromagnetics, 2008,
// thin-wire chapter (reduced kernel, singularity extraction); IEEE Std 145
// (polarisation and gain).
//
// Units: geometry in millimetres at the interface, metres inside; angles in
// radians; frequency in hertz; time convention e^{+jωt}. A Mesh holds all
// frequency-independent work (segments, basis functions, quadrature points,
// static near-pair integrals) and is reused across a sweep; a Solution holds
// one frequency's currents and answers far-field questions.
//
// Not modelled: dielectrics, currents on the outside of a feed cable,
// connectors. The package knows wires, grounds and frequencies, not antennas.
package em
