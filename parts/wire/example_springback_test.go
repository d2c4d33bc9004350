package wire_test

import (
	"fmt"

	"coilwright/parts/wire"
)

// A 1.6 mm half-hard brass wire is to relax to a 16.6 mm coil (wire
// centreline) with 11.46 mm between turns; the former must be smaller.
// The printed figures are the round-wire model's own [calc]; the model is
// checked against Gardiner's formula and the plasticity closed forms in
// springback_test.go.
func ExampleSpringback_Compensate() {
	m, err := wire.LookupMaterial("brass-c26000-half-hard")
	if err != nil {
		panic(err)
	}
	sb, err := wire.NewWireSpringback(m, 1.6, false)
	if err != nil {
		panic(err)
	}
	w, err := sb.Compensate(16.6/2, 11.46)
	if err != nil {
		panic(err)
	}
	fmt.Printf("wind at %.2f mm, springs out %.2f mm\n", 2*w.FormerRadius, w.Springout())
	// Output:
	// wind at 15.32 mm, springs out 1.28 mm
}

// Far from the elastic limit nothing sets: the error names the largest
// former radius that still does. The elastic-limit curvature is
// σy/(E·a) = 448/(110000·0.8) = 0.005091 1/mm (elastic bending, any
// strength-of-materials text) [calc].
func ExampleNoSetError() {
	m, _ := wire.LookupMaterial("brass-c26000-half-hard")
	sb, _ := wire.NewWireSpringback(m, 1.6, false)
	_, err := sb.Relax(250, 0)
	fmt.Println(err)
	// Output:
	// wire stays elastic on a former of radius 250 mm (wire-path curvature 0.004 1/mm, elastic limit 0.005091 1/mm): it takes no permanent set and springs back straight; wind at a radius below 196.4 mm or choose a softer wire
}
