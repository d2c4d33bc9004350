// Package cam turns geometry into bytes and files: mesh and drawing
// writers, kerf offsets, nesting, stock planning, and the staged, atomic
// output folder every build writes through. It knows nothing of the design
// spec.
package cam
