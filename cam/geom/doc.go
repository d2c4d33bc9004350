// Package geom holds the small value types shared by the design, former and
// writer packages: 2D and 3D vectors, boxes, polylines, triangle meshes and
// flat drawings (layers of circles, arcs, lines, bulged polylines and text).
// Lengths are millimetres and angles radians. It imports nothing from the
// project.
package geom
