// Package parts turns a validated design spec into dimensioned parts: the
// wavelength, the coil path and its per-turn table, the published electrical
// estimates with their validity warnings, the wire material library and the
// springback model that sizes the winding former, and the parts later stages
// cut or print. It is pure computation: no files, no printing.
//
// Lengths are millimetres and angles radians inside the package; degrees and
// MHz appear only in spec fields and report fields whose names carry the unit.
package parts
