// Package sheet writes the build sheet's content from a design and its cut
// list: the summary and design rows, tools and materials, hazards, the
// numbered steps adapted to the materials and connector, the acceptance
// checks and the side view. It returns plain values; the layout is the
// writers' job.
package sheet
