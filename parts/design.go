package parts

import (
	"fmt"
	"math"

	"coilwright/parts/spec"
)

// Design is everything worked out from one validated spec: the wavelength,
// the coil path, the per-turn table, the electrical estimates and the
// warnings. It is built once by NewDesign and not mutated afterwards.
type Design struct {
	Spec        *spec.Spec
	Wavelength  float64 // free-space wavelength at the centre frequency, mm
	Coil        Coil    // the relaxed wire centreline the maker is aiming for
	Turns       []Turn  // one row per started turn, from the feed end
	WireLength  float64 // centreline arc length of the winding, mm
	AxialLength float64 // axial length of the winding, mm
	Estimates   HelixEstimates
	Warnings    []Warning
	EIRP        *EIRPFigure // nil unless rf.tx_power_dbm is set

	// Former is the wire centreline in the former's groove: Coil
	// compensated for springback, same kind, heights held.
	Former Coil
	// Wire is the wire, its (calibrated) material and springback model.
	Wire WireDesign
	// Patterns is the reflector plate and the matching wedge.
	Patterns *Patterns
	// Field is the field solution, nil unless it ran (see WithField).
	Field *FieldSolution
	// InspectionBasis explains the per-turn inspection tolerances when a
	// tolerance analysis derived them; empty for the fixed rule.
	InspectionBasis string
	// StripSearch is the field solver's search for the matching strip,
	// nil unless it ran.
	StripSearch *StripSearch
}

// Turn is one row of the per-turn table, evaluated at the turn's middle
// azimuth. The last row of a fractional coil covers the part turn.
type Turn struct {
	Index               int     // 1-based from the feed end
	StartPhi, EndPhi    float64 // azimuth range, rad
	DiameterMM          float64 // centreline diameter at mid-turn, mm
	CircumferenceLambda float64 // π·D/λ
	PitchAngleDeg       float64 // local pitch angle, degrees
	SpacingMM           float64 // local axial advance per turn, mm
	HeightMM            float64 // centreline height above the reflector at mid-turn, mm
	WireMM              float64 // wire centreline length of this turn, mm
	InputResistanceOhm  float64 // Kraus estimate on this turn's circumference
	FormerDiameterMM    float64 // centreline diameter in the former's groove at mid-turn, mm
	PredictedDiameterMM float64 // relaxed diameter the model predicts from that former, mm
	SpringbackMM        float64 // predicted growth in diameter on release, mm
	ToleranceMM         float64 // ± inspection tolerance on the relaxed diameter, mm
	OuterStrain         float64 // outer-fibre bending strain on the former
}

// EIRPFigure is the radiated power the report quotes, with its inputs.
type EIRPFigure struct {
	TxPowerDBm   float64
	FeederLossDB float64
	GainDBic     float64
	EIRPDBm      float64
	EIRPmW       float64
}

// Warning is a design condition outside a formula's or a practice's range.
// Code is a stable short identifier for scripts.
type Warning struct {
	Code    string `json:"code"`
	Message string `json:"message"`
}

// Validity limits the warnings check. Source: Kraus, Antennas, 2nd ed.,
// ch. 7 (axial mode 3/4 < Cλ < 4/3, conductor 0.006–0.05 λ; from
// memory); pitch-angle and reflector limits are common practice (no
// published source).
const (
	MinAxialCl         = 0.75
	MaxAxialCl         = 4.0 / 3
	MinPitchWarnDeg    = 5.0
	MaxPitchWarnDeg    = 20.0
	MinAxialTurns      = 3.0
	MinWireLambda      = 0.006
	MaxWireLambda      = 0.05
	MinReflectorLambda = 0.5
)

// NewDesign works out the design from a validated spec. It fails only when
// the spec was not validated or is inconsistent.
func NewDesign(s *spec.Spec) (*Design, error) {
	if s == nil {
		return nil, fmt.Errorf("nil spec")
	}
	if err := checkFit(s); err != nil {
		return nil, err
	}
	coil, err := coilFromSpec(s)
	if err != nil {
		return nil, err
	}
	d := &Design{Spec: s, Wavelength: s.Wavelength(), Coil: coil}
	d.WireLength = coil.Length()
	d.AxialLength = coil.Height()
	d.Turns = turnTable(coil, d.Wavelength, s.Coil.Feed == "periphery")
	cl := 2 * math.Pi * coil.MeanRadius() / d.Wavelength
	sl := d.AxialLength / coil.Turns / d.Wavelength
	d.Estimates = EstimateHelix(cl, sl, coil.Turns, s.Coil.Feed == "periphery")
	if s.RF.TxPowerDBm != nil {
		g := d.Estimates.Gain.Value
		e := EIRP(*s.RF.TxPowerDBm, s.RF.FeederLossDB, g)
		d.EIRP = &EIRPFigure{TxPowerDBm: *s.RF.TxPowerDBm, FeederLossDB: s.RF.FeederLossDB, GainDBic: g, EIRPDBm: e, EIRPmW: DBmToMilliwatt(e)}
	}
	d.Warnings = d.warnings(cl)
	if d.Wire, err = newWireDesign(s); err != nil {
		return nil, &spec.SpecError{Key: "wire.material", Line: s.Line("wire.material"), Value: fmt.Sprintf("%q", s.Wire.Material),
			Problem: "no former can wind this coil: " + err.Error(), Fix: "choose a softer temper or a thicker wire, or a smaller pitch angle"}
	}
	if d.Former, err = compensateCoil(coil, d.Wire.Model); err != nil {
		if s.Wire.CalibrationData() != nil {
			return nil, &spec.SpecError{Key: "wire.calibration", Line: s.Line("wire.calibration"), Value: fmt.Sprintf("%q", s.Wire.Calibration),
				Problem: "with the calibrated yield no former can wind this coil: " + err.Error(), Fix: "check the calibration, or choose a softer temper or a thicker wire"}
		}
		return nil, &spec.SpecError{Key: "wire.material", Line: s.Line("wire.material"), Value: fmt.Sprintf("%q", s.Wire.Material),
			Problem: "no former can wind this coil: " + err.Error(), Fix: "choose a softer temper or a thicker wire, or a smaller pitch angle"}
	}
	sw, err := d.springbackTurns()
	if err != nil {
		return nil, err
	}
	d.Warnings = append(d.Warnings, sw...)
	p, warns, err := newPatterns(d)
	if err != nil {
		return nil, err
	}
	d.Patterns = p
	d.Warnings = append(d.Warnings, warns...)
	return d, nil
}

// turnTable evaluates the coil at the middle of each started turn.
func turnTable(c Coil, lambda float64, peripheral bool) []Turn {
	n := int(math.Ceil(c.Turns - 1e-9))
	rows := make([]Turn, n)
	for i := range rows {
		p0 := 2 * math.Pi * float64(i)
		p1 := math.Min(2*math.Pi*float64(i+1), c.Span())
		mid := (p0 + p1) / 2
		dia := 2 * c.Radius(mid)
		cl := math.Pi * dia / lambda
		rows[i] = Turn{
			Index: i + 1, StartPhi: p0, EndPhi: p1,
			DiameterMM:          dia,
			CircumferenceLambda: cl,
			PitchAngleDeg:       c.PitchAngleAt(mid) * 180 / math.Pi,
			SpacingMM:           c.SpacingAt(mid),
			HeightMM:            c.Z(mid),
			WireMM:              c.LengthBetween(p0, p1),
			InputResistanceOhm:  KrausInputResistance(cl, peripheral),
		}
	}
	return rows
}

func (d *Design) warnings(meanCl float64) []Warning {
	var w []Warning
	add := func(code, format string, args ...any) {
		w = append(w, Warning{Code: code, Message: fmt.Sprintf(format, args...)})
	}
	if meanCl < MinAxialCl || meanCl > MaxAxialCl {
		add("circumference", "mean circumference %.3f λ lies outside the axial-mode range %.2f–%.2f λ: the Kraus estimates do not hold", meanCl, MinAxialCl, MaxAxialCl)
	}
	for _, t := range d.Turns {
		if t.CircumferenceLambda < MinAxialCl || t.CircumferenceLambda > MaxAxialCl {
			add("turn-circumference", "turn %d: circumference %.3f λ lies outside %.2f–%.2f λ", t.Index, t.CircumferenceLambda, MinAxialCl, MaxAxialCl)
		}
		if t.PitchAngleDeg < MinPitchWarnDeg || t.PitchAngleDeg > MaxPitchWarnDeg {
			add("pitch-angle", "turn %d: pitch angle %.1f° lies outside %.0f–%.0f°", t.Index, t.PitchAngleDeg, MinPitchWarnDeg, MaxPitchWarnDeg)
		}
	}
	if d.Coil.StartRadius != d.Coil.EndRadius {
		add("conical", "conical coil: the Kraus estimates are evaluated on the mean circumference and per turn and hold only approximately (tapered helices trade some peak gain for bandwidth)")
	}
	if d.Coil.Turns < MinAxialTurns {
		add("turns", "%s is fewer than %s: the axial mode is weak and the estimates unreliable", TurnsText(d.Coil.Turns), num(MinAxialTurns))
	}
	wl := d.Spec.Wire.DiameterMM / d.Wavelength
	if wl < MinWireLambda || wl > MaxWireLambda {
		add("wire-diameter", "wire diameter %.4f λ lies outside %.3f–%.2f λ", wl, MinWireLambda, MaxWireLambda)
	}
	if r := d.Spec.Reflector.SizeMM(d.Wavelength) / d.Wavelength; r < MinReflectorLambda {
		add("reflector-size", "reflector %.2f λ across is smaller than %.1f λ: expect a strong back lobe", r, MinReflectorLambda)
	}
	if d.EIRP != nil {
		w = append(w, eirpWarning(d.EIRP))
	}
	return w
}
