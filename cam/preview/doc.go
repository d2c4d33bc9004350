// Package preview renders a shaded PNG picture of a mesh.
package preview
