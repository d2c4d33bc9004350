// Package touchstone writes one-port network data as a Touchstone file
// (.s1p), so a predicted reflection can be overlaid on a network-analyser
// measurement.
//
// Source: IBIS Open Forum, Touchstone File Format Specification, version
// 2.0, 2009 (the version 1 syntax it keeps: "!" comments, one option line
// "# <unit> S <format> R <ohms>", then one line per frequency).
package touchstone
