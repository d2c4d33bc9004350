// Package dxf writes a geom.Drawing as an ASCII DXF file (R12 or R2000),
// in mm, one DXF layer per drawing layer, text as outlines.
package dxf
