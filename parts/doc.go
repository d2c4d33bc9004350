// Package parts is the design: it turns a validated spec (parts/spec) into
// the coil path and its per-turn table, the published electrical estimates
// with their validity warnings, the springback-compensated former path
// (with the wire model in parts/wire), the support rod, the matching strip
// sized over the band, and where everything sits on the reflector plate
// (drawn by parts/flat), and it refuses a spec whose coil the parts cannot
// be made for. It is pure computation: no files, no printing.
//
// Lengths are millimetres and angles radians inside the package; degrees and
// MHz appear only in spec fields and report fields whose names carry the unit.
package parts
