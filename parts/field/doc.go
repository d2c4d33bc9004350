// Package field maps a design onto the thin-wire solver and sweeps it
// across the band.
//
// The model is the antenna as released: the coil at its target diameters
// with its spacing held (parts.Design.Coil), the wire's real radius and
// conductivity, the feed lead as built (parts.Design.FeedLead), the
// matching strip as a round wire of equivalent radius w/4 along its
// centreline (Butler, "The equivalent radius of a narrow conducting strip",
// IEEE Trans. AP-30(4), 1982), and the reflector either as an ideal
// infinite ground (image theory) or as the actual plate, a wire grid of
// spacing at most a tenth of the shortest wavelength with grid wires of the
// equal-area radius (Ludwig, IEEE Trans. AP-35(9), 1987). The delta-gap
// source sits at the lead's base on the reflector.
//
// Building the geometry (Build) is kept apart from solving it (Solve,
// Sweep), so a tolerance study can perturb a design, rebuild and solve at a
// few frequencies. Solver and geometry failures come back as
// *spec.SpecError naming the key to change.
//
// Not modelled: dielectrics (former, support, coax jacket), current on the
// outside of the coax, the connector, holes in the plate and its corner
// radius, and the strip's true cross-section (thin-wire equivalent radius).
package field
