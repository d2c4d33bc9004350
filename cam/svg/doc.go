// Package svg writes a geom.Drawing as an SVG file at true size: one group
// per layer, drawing coordinates (mm, y up) mapped to SVG user units of
// 1 mm (y down), text as outlines.
package svg
