// Package kit is the pipeline: it turns a loaded, validated spec into the
// design, the planned former, the flat parts with their nests, and every
// output file of a build, written to a Sink in memory or on disk.
//
// New does all the planning that can refuse a spec (the design, the
// former's fit, the kerf offsets and nests, the batch's stock plans), so a
// spec that New accepts builds. Kit.Write then produces the files step by
// step; only the former's mesh is made there. Problems a maker can fix come
// back as *parts.SpecError values naming the spec key, its line and a fix.
// Nothing here reads or writes files itself, prints or exits.
package kit
