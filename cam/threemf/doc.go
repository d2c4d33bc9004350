// Package threemf writes a mesh as a 3MF package (core specification,
// millimetre units).
package threemf
