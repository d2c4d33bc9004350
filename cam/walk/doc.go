// Package walk is the one walk over a geom.Drawing that the drawing
// writers share: Prepare checks layer names and outlines text (from the
// embedded font), and Walk or Layer hands each shape to the writer's
// Shapes methods, refusing shapes no writer can draw.
package walk
