package parts

import "math"

// Estimate is one published electrical estimate with the formula it came
// from and where that formula is valid.
type Estimate struct {
	Name    string  `json:"name"`    // what is estimated, e.g. "input resistance"
	Value   float64 `json:"value"`   // in Unit
	Unit    string  `json:"unit"`    // "ohm", "deg", "dBic", "ratio"
	Formula string  `json:"formula"` // the formula as written, with its author
	Source  string  `json:"source"`  // where it is published
	Valid   string  `json:"valid"`   // the range in which the source trusts it
	InRange bool    `json:"in_range"`
}

// HelixEstimates holds the axial-mode estimates for a helix of N turns with
// circumference Cλ and spacing Sλ (both in wavelengths).
type HelixEstimates struct {
	InputResistance Estimate
	HPBW            Estimate // half-power beamwidth
	FNBW            Estimate // first-null beamwidth
	Directivity15   Estimate // Kraus's original 15 Cλ² N Sλ, in dBic
	Directivity12   Estimate // revised 12 Cλ² N Sλ, in dBic
	Emerson         Estimate // gain fit over axial length, dBic
	AxialRatio      Estimate
	Gain            Estimate // the gain the report leads with: TextbookGain, continuous and capped, dBic
}

// All returns the estimates in report order.
func (h HelixEstimates) All() []Estimate {
	return []Estimate{h.InputResistance, h.HPBW, h.FNBW, h.Directivity15, h.Directivity12, h.Emerson, h.AxialRatio}
}

const krausSource = "Kraus, Marhefka & Khan, Antennas and Wave Propagation, 4th ed., §8-5"

// KrausInputResistance returns the input resistance in ohms of an
// axial-mode helix: 140·Cλ for an axial (centre) feed, 150/√Cλ for a
// peripheral feed. From memory (Kraus, Antennas, 2nd ed., ch. 7), ±20 %
// for 0.8 ≤ Cλ ≤ 1.2.
func KrausInputResistance(cl float64, peripheral bool) float64 {
	if peripheral {
		return 150 / math.Sqrt(cl)
	}
	return 140 * cl
}

// KrausHPBW returns the half-power beamwidth in degrees, 52°/(Cλ√(N Sλ)).
// Source: Kraus, Marhefka & Khan, 4th ed., §8-5, ex. 8-5.2.
func KrausHPBW(cl, n, sl float64) float64 { return 52 / (cl * math.Sqrt(n*sl)) }

// KrausFNBW returns the first-null beamwidth in degrees, 115°/(Cλ√(N Sλ)).
// Source: Kraus, Antennas, 2nd ed., ch. 7.
func KrausFNBW(cl, n, sl float64) float64 { return 115 / (cl * math.Sqrt(n*sl)) }

// KrausDirectivity returns the directivity (a ratio, not dB) k·Cλ²·N·Sλ with
// k = 15 (original) or 12 (revised). Source: Kraus, Marhefka & Khan, 4th
// ed., ex. 8-5.2 (12 form); Kraus, Antennas, 2nd ed. (15 form).
func KrausDirectivity(k, cl, n, sl float64) float64 { return k * cl * cl * n * sl }

// AxialRatio returns the on-axis axial ratio (2N + 1)/(2N) of an
// axial-mode helix with increased-directivity phase velocity.
// Source: Kraus, Marhefka & Khan, 4th ed., ex. 8-5.2.
func AxialRatio(n float64) float64 { return (2*n + 1) / (2 * n) }

// EmersonGain returns the gain in dBic of an axial-mode helix of axial
// length Lλ wavelengths: 10.25 + 1.22·Lλ − 0.0726·Lλ². Source: Emerson,
// "The gain of an axial-mode helix antenna", ARRL Antenna Compendium vol.
// 4, 1995; range 2 ≤ Lλ ≤ 7 from memory.
func EmersonGain(ll float64) float64 { return 10.25 + 1.22*ll - 0.0726*ll*ll }

// DBi converts a power ratio to decibels (dBi, or dBic for a circularly
// polarised gain against an isotropic circularly polarised antenna).
func DBi(ratio float64) float64 { return 10 * math.Log10(ratio) }

// The pitch-angle range, in radians, in which the Kraus beamwidth,
// directivity and axial-ratio formulas hold: 12° to 14°. Source: Kraus,
// Antennas, 2nd ed., ch. 7 (from memory).
const (
	minEstimatePitch = 12 * math.Pi / 180
	maxEstimatePitch = 14 * math.Pi / 180
)

// EstimateHelix evaluates the published axial-mode formulas for a helix of
// n turns, circumference cl and spacing sl in wavelengths.
func EstimateHelix(cl, sl, n float64, peripheral bool) HelixEstimates {
	inCl := cl >= MinAxialCl && cl <= MaxAxialCl
	alpha := math.Atan(sl / cl) // tan α = Sλ/Cλ, radians
	inShape := inCl && alpha >= minEstimatePitch && alpha <= maxEstimatePitch && n > MinAxialTurns
	var h HelixEstimates
	h.InputResistance = Estimate{Name: "input resistance", Value: KrausInputResistance(cl, peripheral), Unit: "ohm",
		Formula: "R = 140·Cλ (Kraus, axial feed)", Source: "Kraus, Antennas, 2nd ed., ch. 7 (from memory)",
		Valid: "0.8 ≤ Cλ ≤ 1.2, ±20 %", InRange: cl >= 0.8 && cl <= 1.2}
	if peripheral {
		h.InputResistance.Formula = "R = 150/√Cλ (Kraus, peripheral feed)"
	}
	h.HPBW = Estimate{Name: "half-power beamwidth", Value: KrausHPBW(cl, n, sl), Unit: "deg",
		Formula: "HPBW = 52°/(Cλ·√(N·Sλ)) (Kraus)", Source: krausSource,
		Valid: "3/4 < Cλ < 4/3, 12° ≤ α ≤ 14°, N > 3", InRange: inShape}
	h.FNBW = Estimate{Name: "first-null beamwidth", Value: KrausFNBW(cl, n, sl), Unit: "deg",
		Formula: "FNBW = 115°/(Cλ·√(N·Sλ)) (Kraus)", Source: krausSource,
		Valid: h.HPBW.Valid, InRange: h.HPBW.InRange}
	h.Directivity15 = Estimate{Name: "directivity (original)", Value: DBi(KrausDirectivity(15, cl, n, sl)), Unit: "dBic",
		Formula: "D = 15·Cλ²·N·Sλ (Kraus)", Source: "Kraus, Antennas, 2nd ed., ch. 7",
		Valid: h.HPBW.Valid + "; overestimates long helices", InRange: h.HPBW.InRange}
	h.Directivity12 = Estimate{Name: "directivity (revised)", Value: DBi(KrausDirectivity(12, cl, n, sl)), Unit: "dBic",
		Formula: "D = 12·Cλ²·N·Sλ (Kraus)", Source: krausSource + ", ex. 8-5.2",
		Valid: h.HPBW.Valid + "; overestimates long helices", InRange: h.HPBW.InRange}
	ll := n * sl
	h.Emerson = Estimate{Name: "gain (fit)", Value: EmersonGain(ll), Unit: "dBic",
		Formula: "G = 10.25 + 1.22·Lλ − 0.0726·Lλ² (Emerson)", Source: "Emerson, ARRL Antenna Compendium vol. 4, 1995",
		Valid: "2 ≤ Lλ ≤ 7 (range from memory), 12.5° pitch, Cλ ≈ 1", InRange: ll >= 2 && ll <= 7 && inCl}
	h.AxialRatio = Estimate{Name: "axial ratio", Value: AxialRatio(n), Unit: "ratio",
		Formula: "AR = (2N + 1)/(2N) (Kraus)", Source: krausSource + ", ex. 8-5.2",
		Valid: h.HPBW.Valid, InRange: h.HPBW.InRange}
	h.Gain = textbookGain(h, cl, sl, n)
	return h
}

// EIRP returns the effective isotropic radiated power in dBm:
// P_tx − feeder loss + G. Source: the e.i.r.p. definition of the ITU Radio
// Regulations, Article 1 (article number from memory).
func EIRP(txDBm, lossDB, gainDBi float64) float64 { return txDBm - lossDB + gainDBi }

// DBmToMilliwatt converts dBm to mW.
func DBmToMilliwatt(dbm float64) float64 { return math.Pow(10, dbm/10) }
