// Package templates embeds the text the tool ships with: the reference and
// demo design specs, the starter-spec template and the report and
// build-sheet templates. Templates are parsed once, at start-up.
package templates
