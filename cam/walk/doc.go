// Package walk is what every drawing writer shares: the one embedded font
// (parsed once), text turned into outline contours, the layer-name rule,
// and the one walk over a geom.Drawing that hands each writer its shapes.
package walk
