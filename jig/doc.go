// Package jig models the printed winding former and plans its sizes.
//
// Plan sizes the former for a parts.Design once: the groove, the drive,
// the wire-lock hole, the lettering and the envelope, with the fit
// problems that stop it being made as typed values (which size, needed,
// available). FormerPlan.Former builds the former as a signed distance
// bound with the kernel in jig/sdf: a core that carries the wire's
// springback-compensated centreline in a groove of the right hand and
// pitch, a flange with vice flats and engraved lettering, a wire-lock
// hole, a stop notch and a drive socket or bore. Its coordinates are print
// coordinates in millimetres: the flange face on z = 0 and the core rising
// along +z. Former.Mesh meshes it with jig/mesh.
//
// Nothing here prints, writes files or panics on bad input; sizes that
// cannot make a former come back as errors.
package jig
