// Package stl writes and reads binary STL meshes, in mm.
package stl
