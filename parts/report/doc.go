// Package report is the design report's content: the summary written to
// design.json and design.md (coil, turns, estimates, wire, former, plate
// and strip sections, warnings), with the field solution, the strip search
// and the batch tolerance analysis it carries when they ran.
package report
