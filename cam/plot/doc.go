// Package plot draws engineering plots as SVG with the canvas library:
// charts against frequency, polar pattern cuts, histograms, and existing
// drawings framed at a stated scale.
//
// Every plot is laid out in millimetres (one SVG user unit is 1 mm, and
// the root element's width and height carry the mm unit, so a plot prints
// at its drawn size). Text is set in the embedded Go fonts and written as
// outlines traced with the canvas library, so every viewer draws the same
// letters and the bytes depend only on the input. Each outlined label
// keeps its words in a data-text attribute, and the root element carries a
// title and a description for readers that cannot see the picture.
//
// Series are told apart by dash pattern and by colour together, so colour
// never carries meaning alone.
package plot
