// Package flat draws the flat parts from plain values: the reflector plate
// (outline, feed cut-out, mounting and rod holes, marks) and the matching
// strip (widths along its taper, flat pattern), each as a drawing in mm.
// It knows nothing of the design that sizes them.
package flat
