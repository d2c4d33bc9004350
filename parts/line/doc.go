// Package line holds the transmission-line formulas the matching strip is
// sized with: the impedance of a strip over a ground plane in air and its
// inverse, and the reflection of tapered lines by the theory of small
// reflections. Lengths are mm, impedances Ω.
package line
