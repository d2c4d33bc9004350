// The wire material library.
//
// Each row gives what the springback model needs (Young's modulus, yield and,
// where known, a strain-hardening law) and what the build sheet needs
// (solderability, cautions). Every row names its source in a comment beside
// it and in Material.Source; values recalled without a checked source say so.
// Drawn wire varies from batch to batch far more than these single figures
// suggest: a calibration from one test coil (Calibration) corrects the yield.

package wire

import (
	"fmt"
	"slices"
	"strings"
)

// Solderability grades how readily a wire takes soft solder with an ordinary
// rosin flux.
type Solderability string

// Solderability grades, best first.
const (
	SolderExcellent Solderability = "excellent"
	SolderGood      Solderability = "good"
	SolderFair      Solderability = "fair"
	SolderPoor      Solderability = "poor"
)

// Caution is a material-specific warning a build must carry, by short id.
type Caution string

// Cautions a material can carry.
const (
	// CautionStiff says the wire is too stiff and springy to wind by hand on a
	// printed former.
	CautionStiff Caution = "stiff"
	// CautionSpecialFlux says ordinary rosin flux does not wet the wire.
	CautionSpecialFlux Caution = "special-flux"
	// CautionStripEnamel says the insulating enamel must be removed where the
	// wire is soldered.
	CautionStripEnamel Caution = "strip-enamel"
	// CautionRFLoss says the wire is magnetic and lossy at radio
	// frequencies.
	CautionRFLoss Caution = "rf-loss"
)

// Text returns the caution as a sentence for reports and build sheets.
func (c Caution) Text() string {
	switch c {
	case CautionStiff:
		return "unsuitable for hand winding: too stiff, and it springs back far off any printed former"
	case CautionSpecialFlux:
		return "needs a special flux to solder: ordinary rosin flux does not wet it"
	case CautionStripEnamel:
		return "strip the enamel before soldering, down to bright metal"
	case CautionRFLoss:
		return "magnetic and lossy at radio frequencies: the field solution's conductor loss (non-magnetic skin effect) is optimistic; a copper or plated wire radiates more of the power"
	}
	return string(c)
}

// Material is one wire material and temper. Stresses are in MPa (N/mm²),
// Elongation is a fraction (0.25 = 25 %). A Material is a value: the library
// hands out copies, so changing one does not change the library.
type Material struct {
	// ID is the short lowercase key used in specs, e.g. "copper-annealed".
	ID string
	// Name describes alloy and temper for people.
	Name string
	// YoungsModulus is E in MPa.
	YoungsModulus float64
	// Yield is the yield stress in MPa on YieldBasis.
	Yield float64
	// YieldBasis names how the yield was measured ("0.2 % proof",
	// "0.5 % extension under load").
	YieldBasis string
	// TensileMin and TensileMax give the tensile-strength range in MPa.
	TensileMin, TensileMax float64
	// Hardening is the strain-hardening law beyond yield; its Kind is
	// HardeningNone when no law is known (most cold-drawn tempers).
	Hardening Hardening
	// Elongation is the elongation at break as a fraction; the model warns
	// when a winding's outer-fibre strain exceeds it.
	Elongation float64
	// Conductivity is the electrical conductivity at 20 °C in S/m, used by
	// the field solver's skin-effect loss (ConductivityIACS × 58.0 MS/m).
	Conductivity float64
	// ConductivitySource cites the conductivity, or says it is from memory.
	ConductivitySource string
	// Magnetic marks a ferromagnetic wire: at radio frequencies its
	// permeability crowds the current into a thinner skin than the
	// non-magnetic loss model assumes, so the real loss is higher.
	Magnetic bool
	// Solderability grades the wire with rosin flux.
	Solderability Solderability
	// Cautions lists warnings a build with this wire must show.
	Cautions []Caution
	// Notes holds remarks for the maker.
	Notes string
	// Source cites the figures, or says they are from memory.
	Source string
}

// FlowLaw returns the material's uniaxial stress–strain law: elastic–
// perfectly plastic, or with its hardening law when hardening is true and the
// material has one.
func (m Material) FlowLaw(hardening bool) FlowLaw {
	l := FlowLaw{YoungsModulus: m.YoungsModulus, Yield: m.Yield}
	if hardening {
		l.Hardening = m.Hardening
	}
	return l
}

// HasCaution reports whether the material carries caution c.
func (m Material) HasCaution(c Caution) bool { return slices.Contains(m.Cautions, c) }

// UnknownMaterialError reports a material id that is not in the library.
type UnknownMaterialError struct {
	// ID is the id that was asked for.
	ID string
	// Valid lists the library's ids in library order.
	Valid []string
}

// Error names the unknown id and lists the valid ones.
func (e *UnknownMaterialError) Error() string {
	return fmt.Sprintf("unknown wire material %q: must be one of %s", e.ID, strings.Join(e.Valid, ", "))
}

// Materials returns the material library in a fixed order (coppers, brasses,
// bronzes, steels, aluminium). The slice and its rows are fresh copies.
func Materials() []Material { return materialTable() }

// MaterialIDs returns the library's ids in library order.
func MaterialIDs() []string {
	t := materialTable()
	ids := make([]string, len(t))
	for i, m := range t {
		ids[i] = m.ID
	}
	return ids
}

// LookupMaterial returns the library row with the given id, or an
// *UnknownMaterialError listing the valid ids.
func LookupMaterial(id string) (Material, error) {
	t := materialTable()
	for _, m := range t {
		if m.ID == id {
			return m, nil
		}
	}
	return Material{}, &UnknownMaterialError{ID: id, Valid: MaterialIDs()}
}

// Sources for the shared figures of several rows.
const (
	srcCopperE        = "E: Copper Development Association data for C11000/C10200"
	srcCopperYield    = "annealed yield 70–100 MPa: ASTM B3 via supplier data"
	srcKn             = "K, n: Kalpakjian & Schmid, Manufacturing Engineering and Technology, table of strength coefficient and strain-hardening exponent (annealed; from memory)"
	srcIACSCopper     = "100 % IACS = 58.0 MS/m: IEC 60028 (international annealed copper standard)"
	srcC26000Sigma    = "28 % IACS for C26000: Copper Development Association data, from memory"
	srcCuSn6Sigma     = "≈ 14 % IACS for CuSn6 (C51900): supplier data, from memory"
	srcStainlessSigma = "2.4 % IACS (resistivity ≈ 0.72 µΩ·m) for 304: supplier data, from memory"
	srcC26000         = "C26000 round wire, ASTM B134 tempers: supplier wire datasheet (E 16,000 ksi; yield at 0.5 % extension, nominal; tensile mill limits)"
)

// IACSConductivity is the conductivity of the international annealed
// copper standard, 100 % IACS, in S/m (resistivity 1/58 Ω·mm²/m at 20 °C).
// Source: IEC 60028.
const IACSConductivity = 58.0e6

// IACS returns the conductivity in S/m of a material quoted at pct % IACS.
// Source: IEC 60028 (the scale's definition).
func IACS(pct float64) float64 { return pct / 100 * IACSConductivity }

// annealedCopper returns the annealed-copper row that the silver-plated and
// enamelled rows build on.
func annealedCopper() Material {
	// Source: E — Copper Development Association; yield — ASTM B3 via
	// supplier data (70–100 MPa, lower end taken); tensile, elongation — from
	// memory; K, n — Kalpakjian & Schmid (from memory).
	return Material{
		ID: "copper-annealed", Name: "Copper, annealed (Cu-ETP, C11000)",
		YoungsModulus: 117000, Yield: 70, YieldBasis: "0.2 % proof",
		TensileMin: 200, TensileMax: 250,
		Hardening:  Hardening{Kind: HardeningPowerLaw, K: 315, N: 0.54},
		Elongation: 0.25, Solderability: SolderExcellent,
		Conductivity: IACS(100), ConductivitySource: srcIACSCopper,
		Notes:  "Soft and forgiving: springs back little, but dents and stretches if pulled hard.",
		Source: srcCopperE + "; " + srcCopperYield + "; tensile and elongation from memory; " + srcKn,
	}
}

// materialTable builds the library rows.
func materialTable() []Material {
	silver := annealedCopper()
	silver.ID = "copper-silver-plated"
	silver.Name = "Copper, silver-plated, annealed core (ASTM B298 class)"
	silver.Notes = "Mechanically the annealed copper core; the plating solders very easily and resists tarnish."
	silver.Source = "as copper-annealed (the thin plating is neglected): " + silver.Source
	silver.ConductivitySource = "as the copper core (silver, ≈ 105 % IACS, would lower the loss slightly where the plating is thicker than the skin depth): " + srcIACSCopper

	enamel := annealedCopper()
	enamel.ID = "copper-enamelled"
	enamel.Name = "Copper, enamelled winding wire, annealed core"
	enamel.Solderability = SolderGood
	enamel.Cautions = []Caution{CautionStripEnamel}
	enamel.Notes = "Mechanically the annealed copper core; enamel stiffness neglected. Solder-through grades still need tinning where joined."
	enamel.Source = "as copper-annealed (enamel neglected): " + enamel.Source
	enamel.ConductivitySource = "as the copper core: " + srcIACSCopper

	return []Material{
		annealedCopper(),
		{
			// From memory: half-hard copper wire yield and tensile range;
			// E from Copper Development Association data.
			ID: "copper-half-hard", Name: "Copper, half-hard drawn (C11000 H02)",
			YoungsModulus: 117000, Yield: 220, YieldBasis: "0.2 % proof",
			TensileMin: 260, TensileMax: 330,
			Elongation: 0.10, Solderability: SolderExcellent,
			Conductivity: IACS(98), ConductivitySource: "≈ 98 % IACS: cold drawing lowers conductivity a little; from memory",
			Notes:  "Holds its shape better than annealed copper; springs back noticeably.",
			Source: srcCopperE + "; yield, tensile and elongation from memory",
		},
		{
			// Source: tensile ≈ 460 MPa — ASTM B1 hard-drawn wire via
			// supplier data; yield and elongation from memory.
			ID: "copper-hard-drawn", Name: "Copper, hard-drawn (ASTM B1)",
			YoungsModulus: 117000, Yield: 380, YieldBasis: "0.2 % proof",
			TensileMin: 430, TensileMax: 470,
			Elongation: 0.015, Solderability: SolderExcellent,
			Conductivity: IACS(97), ConductivitySource: "≈ 97 % IACS: ASTM B1 minimum for hard-drawn wire, from memory",
			Notes:  "Stiff; large springback. Tensile elongation is small, so the strain warning fires on tight formers even though the wire usually bends without cracking.",
			Source: srcCopperE + "; tensile ≈ 460 MPa: ASTM B1 via supplier data; yield and elongation from memory",
		},
		silver,
		{
			// Source: C26000 wire datasheet, annealed: yield 110–158 MPa
			// (0.5 % ext.), tensile 330–372 MPa, E 16,000 ksi; mid yield taken.
			// Elongation from memory; K, n Kalpakjian & Schmid (from memory).
			ID: "brass-c26000-soft", Name: "Cartridge brass C26000 (CuZn30), annealed",
			YoungsModulus: 110000, Yield: 135, YieldBasis: "0.5 % extension under load",
			TensileMin: 330, TensileMax: 372,
			Hardening:  Hardening{Kind: HardeningPowerLaw, K: 895, N: 0.49},
			Elongation: 0.45, Solderability: SolderGood,
			Conductivity: IACS(28), ConductivitySource: srcC26000Sigma,
			Notes:  "Yield 110–158 MPa across suppliers; mid value taken.",
			Source: srcC26000 + "; elongation from memory; " + srcKn + " (70-30 brass)",
		},
		{
			// Source: C26000 wire datasheet, H01: yield 393 MPa (0.5 % ext.),
			// tensile 425–530 MPa. Elongation from memory.
			ID: "brass-c26000-quarter-hard", Name: "Cartridge brass C26000, quarter-hard (H01)",
			YoungsModulus: 110000, Yield: 393, YieldBasis: "0.5 % extension under load",
			TensileMin: 425, TensileMax: 530,
			Elongation: 0.20, Solderability: SolderGood,
			Conductivity: IACS(28), ConductivitySource: srcC26000Sigma,
			Source: srcC26000 + "; elongation from memory",
		},
		{
			// Source: C26000 wire datasheet, H02: yield 448 MPa (0.5 % ext.),
			// tensile 545–650 MPa. Elongation from memory.
			ID: "brass-c26000-half-hard", Name: "Cartridge brass C26000, half-hard (H02)",
			YoungsModulus: 110000, Yield: 448, YieldBasis: "0.5 % extension under load",
			TensileMin: 545, TensileMax: 650,
			Elongation: 0.08, Solderability: SolderGood,
			Conductivity: IACS(28), ConductivitySource: srcC26000Sigma,
			Source: srcC26000 + "; elongation from memory",
		},
		{
			// Source: C26000 wire datasheet, H04: yield 482 MPa nominal
			// (0.5 % ext.), tensile 700–810 MPa. Elongation from memory.
			ID: "brass-c26000-hard", Name: "Cartridge brass C26000, hard (H04)",
			YoungsModulus: 110000, Yield: 482, YieldBasis: "0.5 % extension under load",
			TensileMin: 700, TensileMax: 810,
			Elongation: 0.03, Solderability: SolderGood,
			Conductivity: IACS(28), ConductivitySource: srcC26000Sigma,
			Notes:  "The datasheet gives one nominal yield for all tempers from three-quarter hard up; real hard wire is likely stronger: calibrate from a test coil.",
			Source: srcC26000 + "; elongation from memory",
		},
		{
			// Source: EN 12166 CuZn37 (CW508L) wire, quarter-hard: Rp0.2
			// 390–420 MPa (table partly unverified); mid value taken. E, tensile
			// and elongation from memory.
			ID: "brass-cuzn37", Name: "Brass CuZn37 (CW508L) wire, quarter-hard (EN 12166)",
			YoungsModulus: 110000, Yield: 405, YieldBasis: "0.2 % proof",
			TensileMin: 440, TensileMax: 540,
			Elongation: 0.15, Solderability: SolderGood,
			Conductivity: IACS(27), ConductivitySource: "≈ 27 % IACS for CuZn37: supplier data, from memory",
			Notes:  "Common European yellow-brass wire; other tempers differ a lot.",
			Source: "Rp0.2 390–420 MPa: EN 12166 (table partly unverified); E, tensile and elongation from memory",
		},
		{
			// Source: EN 12166 CuSn6 (CW452K) half-hard: Rp0.2 390–450 MPa;
			// ASTM B159 / EN 12166 for E 103–110 GPa. Tensile and elongation
			// from memory.
			ID: "bronze-cusn6-half-hard", Name: "Phosphor bronze CuSn6 (C51900-like), half-hard (EN 12166)",
			YoungsModulus: 110000, Yield: 420, YieldBasis: "0.2 % proof",
			TensileMin: 500, TensileMax: 600,
			Elongation: 0.15, Solderability: SolderGood,
			Conductivity: IACS(14), ConductivitySource: srcCuSn6Sigma,
			Source: "Rp0.2 390–450 MPa: EN 12166; E 103–110 GPa: ASTM B159, EN 12166; tensile and elongation from memory",
		},
		{
			// From memory: spring-temper phosphor bronze wire, yield and tensile
			// (ASTM B159 spring temper, not re-checked).
			ID: "bronze-cusn6-spring", Name: "Phosphor bronze CuSn6, spring temper",
			YoungsModulus: 110000, Yield: 750, YieldBasis: "0.2 % proof",
			TensileMin: 850, TensileMax: 1000,
			Elongation: 0.02, Solderability: SolderGood,
			Conductivity: IACS(14), ConductivitySource: srcCuSn6Sigma,
			Notes:  "Very springy: expect a large springback and calibrate from a test coil.",
			Source: "E: ASTM B159, EN 12166; yield, tensile and elongation from memory (ASTM B159 spring temper)",
		},
		{
			// From memory: ASTM A641 soft-temper galvanised wire, yield
			// 250–350 MPa (mid taken), E 200 GPa, tensile and elongation;
			// K, n Kalpakjian & Schmid low-carbon steel (from memory).
			ID: "steel-galvanised-soft", Name: "Galvanised low-carbon steel wire, soft temper (ASTM A641)",
			YoungsModulus: 200000, Yield: 300, YieldBasis: "0.2 % proof",
			TensileMin: 345, TensileMax: 515,
			Hardening:  Hardening{Kind: HardeningPowerLaw, K: 530, N: 0.26},
			Elongation: 0.10, Solderability: SolderFair,
			Conductivity: IACS(10), ConductivitySource: "≈ 10 % IACS (resistivity ≈ 0.17 µΩ·m) for low-carbon steel; from memory; the zinc coat (≈ 28 % IACS) is neglected", Magnetic: true,
			Cautions: []Caution{CautionRFLoss},
			Notes:    "Zinc coat takes solder with an active flux; do not breathe zinc fume, and do not heat it to glowing. Steel has high RF loss: a plated or copper wire is better.",
			Source:   "E, yield, tensile and elongation from memory (ASTM A641 soft temper); " + srcKn + " (low-carbon steel)",
		},
		{
			// Source: ASTM A213 minima for 304: 0.2 % yield ≥ 205 MPa,
			// tensile ≥ 515 MPa; E 193 GPa. Upper tensile and elongation from
			// memory; K, n Kalpakjian & Schmid (from memory).
			ID: "stainless-304-annealed", Name: "Stainless steel 304, annealed",
			YoungsModulus: 193000, Yield: 205, YieldBasis: "0.2 % proof (specified minimum)",
			TensileMin: 515, TensileMax: 760,
			Hardening:  Hardening{Kind: HardeningPowerLaw, K: 1275, N: 0.45},
			Elongation: 0.40, Solderability: SolderPoor,
			Conductivity: IACS(2.4), ConductivitySource: srcStainlessSigma,
			Notes:  "The yield is the specified minimum; real annealed wire is usually stronger and hardens fast: calibrate. Needs an acid flux to solder.",
			Source: "E 193 GPa, yield ≥ 205 MPa, tensile ≥ 515 MPa: ASTM A213 minima; upper tensile and elongation from memory; " + srcKn,
		},
		{
			// From memory: ASTM A313 spring-temper 304 wire around 1.6 mm,
			// tensile about 1700–2000 MPa; yield taken as about 85 % of it.
			ID: "stainless-304-spring", Name: "Stainless steel 304, spring temper (ASTM A313)",
			YoungsModulus: 193000, Yield: 1500, YieldBasis: "0.2 % proof",
			TensileMin: 1700, TensileMax: 2000,
			Elongation: 0.01, Solderability: SolderPoor,
			Conductivity: IACS(2.4), ConductivitySource: srcStainlessSigma + "; cold-worked 304 is partly magnetic (from memory)", Magnetic: true,
			Cautions: []Caution{CautionStiff, CautionRFLoss},
			Notes:    "Do not use for a hand-wound helix.",
			Source:   "E 193 GPa: ASTM A213; yield, tensile and elongation from memory (ASTM A313 spring temper)",
		},
		{
			// Source: E ≈ 68 GPa for aluminium 1350; yield, tensile and
			// elongation from memory (1350-O); K, n for 1100-O, Kalpakjian &
			// Schmid (from memory), taken for the similar 1350.
			ID: "aluminium-1350", Name: "Aluminium 1350 (EC grade), annealed (1350-O)",
			YoungsModulus: 68000, Yield: 28, YieldBasis: "0.2 % proof",
			TensileMin: 55, TensileMax: 95,
			Hardening:  Hardening{Kind: HardeningPowerLaw, K: 180, N: 0.20},
			Elongation: 0.23, Solderability: SolderPoor,
			Conductivity: IACS(61.8), ConductivitySource: "61.8 % IACS: ASTM B609 minimum for 1350-O, from memory",
			Cautions: []Caution{CautionSpecialFlux},
			Notes:    "Light and soft; its oxide refuses ordinary solder. Clamp rather than solder where possible.",
			Source:   "E ≈ 68 GPa: published aluminium data; yield, tensile and elongation from memory (1350-O); " + srcKn + " (1100-O)",
		},
		enamel,
	}
}
