// Package wire models the wire a helix is wound from: the material library,
// the flow law and cross-section, springback of a bent wire and its
// compensation, and the calibration of a material from measured coils.
// All sizes are in mm and stresses in MPa.
package wire
