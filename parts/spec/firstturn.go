package spec

import "math"

// DefaultFirstTurnHeight returns the default height in mm of the wire
// centre above the reflector at the feed end: the underside of the wire
// 0.02 λ above the reflector, rounded to 0.1 mm. Common practice (no
// published source): the first quarter turn sits low over the reflector so
// the matching strip can bring the feed impedance down to 50 Ω.
func DefaultFirstTurnHeight(lambda, wireMM float64) float64 {
	return math.Round((0.02*lambda+wireMM/2)*10) / 10
}
