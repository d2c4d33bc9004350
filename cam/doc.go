// Package cam is the staged, atomic output folder every build writes
// through, and its manifest. Each output format has its own writer package
// below it (dxf, svg, pdf, stl, threemf, preview), drawings are walked
// for them by walk, and cut plans kerf offsets, nests and rod cuts. None
// of them knows the design spec.
package cam
