// Package tolerance samples a batch of kits from the manufacturing spreads
// and reports what the spread does to the antennas.
//
// Each kit draws one standard-normal number per input (the wire's yield
// and diameter, each turn's winding error in diameter and spacing, the
// first turn's height, the matching strip's width and height, the kerf)
// from its own PCG stream, seeded by the spec's seed and the kit's index,
// so a kit's draw never depends on how many cores run the batch. The
// chain then follows the build: the former is fixed (it was compensated
// for the nominal yield), so a wire of another yield or diameter relaxes
// to other turn diameters, which the springback model gives turn by turn;
// the winding errors add to those. The perturbed antenna goes to an
// Evaluator (the field solver over an ideal ground at a few frequencies);
// its impedance is interpolated across the band to find the frequency of
// best match, the band-edge and worst VSWR, and the gain and axial ratio
// at the centre frequency. Kits are evaluated in parallel into
// pre-indexed slots.
//
// A kit the field model cannot represent (a sampled geometry outside the
// thin-wire kernel's limits) is counted apart and left out of the share;
// it is a limit of the model, not of the spec, so it never refuses one.
//
// Sensitivities are one-at-a-time central differences of ±1σ about the
// nominal design (one-sided where one side cannot be solved), ranked by
// their share of the linearised variance of the worst VSWR in the band. The inspection tolerance per turn is the widest
// diameter band, allotted between turns inversely to their sensitivity,
// within which the wanted share of the simulated kits passing inspection
// meets the VSWR target.
package tolerance
