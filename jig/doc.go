// Package jig models the printed winding former and meshes it.
//
// The former is a signed distance bound built with the kernel in jig/sdf
// (NewFormer, or FormerFromDesign from a parts.Design): a core that carries
// the wire's springback-compensated centreline in a groove of the right hand
// and pitch, a flange with vice flats and engraved lettering, a wire-lock
// hole, a stop notch and a drive socket or bore. Its coordinates are print
// coordinates in millimetres: the flange face on z = 0 and the core rising
// along +z.
//
// Mesh turns any bounded distance bound into a closed, outward-oriented,
// welded triangle mesh (narrow-band marching cubes with feature vertices),
// deterministic on any number of cores; with MeshOptions.Simplify it then
// collapses edges on smooth and flat parts (quadric-ordered, under the link
// condition, checked against the true distance), which Former.Mesh does.
// CheckMesh verifies such a mesh
// independently: edge use and orientation, pinched vertices, degenerate
// faces, the Euler characteristic of the expected genus, volume, and the
// distance of vertices and face centroids from the model.
//
// Nothing here prints, writes files or panics on bad input; sizes that
// cannot make a former come back as errors.
package jig
