// Package parts is the design: it turns a validated spec (parts/spec) into
// the coil path and its per-turn table, the published electrical estimates
// with their validity warnings, the springback-compensated former path
// (with the wire model in parts/wire), the flat parts (reflector, matching
// wedge and its taper), the cut list and the build-sheet content, and it
// refuses a spec whose coil the parts cannot be made for. It is pure
// computation: no files, no printing.
//
// Lengths are millimetres and angles radians inside the package; degrees and
// MHz appear only in spec fields and report fields whose names carry the unit.
package parts
