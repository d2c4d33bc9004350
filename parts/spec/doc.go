// Package spec is the design spec a maker writes: one struct per TOML
// table, strict parsing with the line of every key, defaults, and the
// validation of each field and of the rules between fields that need no
// design worked out. Every problem is a *SpecError carrying the key, its
// line, the value, the rule and a fix. Frequencies are in MHz and angles
// in degrees here, in fields whose names carry the unit; everything else
// is in mm.
package spec
