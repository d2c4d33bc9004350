package parts

import (
	"fmt"
	"math"
)

// The quoted textbook gain is chosen continuously from the two published
// estimates: the lower of Kraus's revised directivity 12·Cλ²·N·Sλ and
// Emerson's fit, with the fit held at its value at the top of its range
// for longer coils.
//
// Kraus's form assumes a uniform travelling wave and overestimates long
// helices; Emerson's fit to numerical models with realistic current decay
// is lower there, and higher than Kraus's form for short helices. The
// lower of the two is continuous in Cλ, Sλ and N (the minimum of two
// continuous functions), so a tenth of a turn never moves the quoted gain
// by more than the formulas themselves do, and it takes the more cautious
// figure on each side of their crossing (near Lλ = 1.3 at Cλ = 1).
//
// Source for both forms: Kraus, Marhefka & Khan, Antennas and Wave
// Propagation, 4th ed., ex. 8-5.2; Emerson, "The gain of an axial-mode
// helix antenna", ARRL Antenna Compendium vol. 4, 1995.

// GainCapLambda is the axial length in wavelengths beyond which the quoted
// gain no longer rises: the top of the range Emerson's fit covers (range
// from memory). The fit itself turns over near 8.4 λ; holding it flat from
// 7 λ states the bound the fit supports rather than extrapolating.
const GainCapLambda = 7.0

// GainCapDBic returns the bound on the quoted textbook gain in dBic:
// Emerson's fit at GainCapLambda, 15.23 dBic [calc].
func GainCapDBic() float64 { return EmersonGain(GainCapLambda) }

// TextbookGain returns the quoted textbook gain in dBic of an axial-mode
// helix of circumference cl and spacing sl in wavelengths and n turns:
// min(10·log10(12·Cλ²·N·Sλ), Emerson(min(Lλ, GainCapLambda))). It is
// continuous in all three and never above GainCapDBic.
func TextbookGain(cl, sl, n float64) float64 {
	ll := n * sl
	return math.Min(DBi(KrausDirectivity(12, cl, n, sl)), EmersonGain(math.Min(ll, GainCapLambda)))
}

// textbookGain builds the headline gain estimate from the others in h.
func textbookGain(h HelixEstimates, cl, sl, n float64) Estimate {
	g := Estimate{Name: "gain (quoted)", Unit: "dBic",
		Value:   TextbookGain(cl, sl, n),
		Formula: fmt.Sprintf("G = min(12·Cλ²·N·Sλ in dB, Emerson fit at min(Lλ, %g)) (Kraus; Emerson)", GainCapLambda),
		Source:  krausSource + ", ex. 8-5.2; Emerson, ARRL Antenna Compendium vol. 4, 1995",
		Valid:   fmt.Sprintf("axial mode, 3/4 < Cλ < 4/3; held at %.2f dBic beyond Lλ = %g", GainCapDBic(), GainCapLambda),
		InRange: h.Directivity12.InRange || h.Emerson.InRange}
	return g
}
