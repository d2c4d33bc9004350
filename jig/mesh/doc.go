// Package mesh turns any bounded signed distance bound (jig/sdf) into a
// closed, outward-oriented, welded triangle mesh and checks such meshes.
//
// Mesh runs narrow-band marching cubes with feature vertices,
// deterministic on any number of cores; with MeshOptions.Simplify it then
// collapses edges on smooth and flat parts (quadric-ordered, under the
// link condition, checked against the true distance). CheckMesh verifies a
// mesh independently: edge use and orientation, pinched vertices,
// degenerate faces, the Euler characteristic of the expected genus,
// volume, and the distance of vertices and face centroids from the model.
//
// It knows nothing of what it meshes. Nothing here prints, writes files or
// panics on bad input.
package mesh
