// Package cut plans cutting from stock: kerf-compensated outlines of a
// drawing, nests of parts on sheets (discs on a lattice, polygons slid
// together, interlocked in pairs) and the cuts of pieces from rods. Sizes
// are in mm.
package cut
