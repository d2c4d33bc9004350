// Package geom holds the small value types shared by the design, former and
// writer packages: 2D and 3D vectors, boxes, polylines and triangle meshes.
// Lengths are millimetres and angles radians. It imports nothing from the
// project.
package geom
