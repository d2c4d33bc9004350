// Calibration of the springback model from measured test coils.
//
// Drawn wire varies from batch to batch, so the library yield is only a
// starting point. A maker winds a few turns on a former of known centreline
// diameter, releases them and measures the relaxed centreline diameter. The
// fit scales the material's plastic flow stress (yield, and the hardening law
// with it) by a factor f until the mean of the model's relaxed diameters
// equals the mean of the measurements: the least-squares fit when all coils
// share one former. Each predicted diameter increases with f, from the former
// diameter (f → 0) to infinity (where the wire stops taking a set on the
// tightest former), so the fit is one bracketed root. The effective yield
// f·σy is what the calibration file keeps.

package wire

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"slices"
	"strconv"

	"github.com/pelletier/go-toml/v2"
)

// calibrationRelTol is the relative tolerance of the fitted flow factor.
const calibrationRelTol = 1e-12

// calibrationFarFactor flags a fitted yield more than this factor away from
// the library's (either way) as suspicious. From memory: drawn-wire yields
// scatter by tens of per cent between batches, not by factors of two.
const calibrationFarFactor = 1.5

// calibrationReadingMM is the reading uncertainty of a measured coil
// diameter. Common practice (no published source): calipers on a springy
// coil read to about ±0.05 mm.
const calibrationReadingMM = 0.05

// calibrationLooseFraction is the relative yield uncertainty beyond which
// the fit warns that the test coil springs back too little to calibrate.
const calibrationLooseFraction = 0.10

// CalibrationPoint is one measured test coil.
type CalibrationPoint struct {
	// FormerDiameter is the diameter of the wire centreline on the former, mm.
	FormerDiameter float64 `toml:"former_diameter_mm" json:"former_diameter_mm"`
	// RelaxedDiameter is the measured centreline diameter after release, mm
	// (outside diameter minus one wire diameter).
	RelaxedDiameter float64 `toml:"relaxed_diameter_mm" json:"relaxed_diameter_mm"`
	// PredictedDiameter is the calibrated model's relaxed diameter, mm; it is
	// filled in by Calibrate.
	PredictedDiameter float64 `toml:"predicted_diameter_mm" json:"predicted_diameter_mm"`
}

// Calibration is a fitted effective yield for one material and wire, as kept
// in a calibration file.
type Calibration struct {
	// Material is the library id of the wire material.
	Material string `toml:"material" json:"material"`
	// WireDiameter is the test wire's diameter, mm.
	WireDiameter float64 `toml:"wire_diameter_mm" json:"wire_diameter_mm"`
	// Spacing is the axial spacing per turn of the test coils, mm (zero for
	// a flat ring).
	Spacing float64 `toml:"spacing_mm" json:"spacing_mm"`
	// Hardening records whether the fit used the material's hardening law.
	Hardening bool `toml:"hardening" json:"hardening"`
	// EffectiveYield is the fitted yield in MPa; the flow stress of the
	// library's law is scaled by EffectiveYield/Material.Yield.
	EffectiveYield float64 `toml:"effective_yield_mpa" json:"effective_yield_mpa"`
	// LibraryYield is the library yield in MPa the fit started from.
	LibraryYield float64 `toml:"library_yield_mpa" json:"library_yield_mpa"`
	// ResidualRMS is the root-mean-square difference between measured and
	// predicted relaxed diameters, mm.
	ResidualRMS float64 `toml:"residual_rms_mm" json:"residual_rms_mm"`
	// YieldUncertainty is the ± change in the fitted yield, MPa, that a
	// ±calibrationReadingMM error in the mean measured diameter causes.
	YieldUncertainty float64 `toml:"yield_uncertainty_mpa" json:"yield_uncertainty_mpa"`
	// Points is the number of measured coils.
	Points int `toml:"points" json:"points"`
	// Measurements lists the coils with the fitted prediction for each.
	Measurements []CalibrationPoint `toml:"measurement" json:"measurements"`
	// Warnings holds remarks on the fit; not stored in the file.
	Warnings []string `toml:"-" json:"warnings,omitempty"`
}

// Factor returns the flow-stress factor EffectiveYield/LibraryYield.
func (c Calibration) Factor() float64 { return c.EffectiveYield / c.LibraryYield }

// Calibrate fits the effective yield of material m from test coils of wire
// diameter d mm wound with axial spacing mm per turn (zero for flat rings).
// hardening selects the law as for NewWireSpringback. Every former diameter
// (wire centreline, mm) must exceed d, and every measured relaxed diameter
// must exceed its former diameter.
func Calibrate(m Material, d, spacing float64, hardening bool, pts []CalibrationPoint) (Calibration, error) {
	if len(pts) == 0 {
		return Calibration{}, errors.New("calibrate: need at least one measured coil")
	}
	base, err := NewWireSpringback(m, d, hardening)
	if err != nil {
		return Calibration{}, fmt.Errorf("calibrate: %w", err)
	}
	kmin := math.Inf(1) // loosest former curvature: the first to stop setting
	var meas float64
	for i, p := range pts {
		if p.FormerDiameter > 0 && !(p.FormerDiameter > d) {
			return Calibration{}, fmt.Errorf("calibrate: coil %d: former diameter %g mm must exceed the wire diameter %g mm: give the wire centreline diameter on the former (rod diameter plus one wire diameter)",
				i+1, p.FormerDiameter, d)
		}
		if err := checkHelix("former", p.FormerDiameter/2, spacing); err != nil {
			return Calibration{}, fmt.Errorf("calibrate: coil %d: %w", i+1, err)
		}
		if !(p.RelaxedDiameter > p.FormerDiameter) || math.IsInf(p.RelaxedDiameter, 0) {
			return Calibration{}, fmt.Errorf("calibrate: coil %d: relaxed diameter %g mm must exceed the former diameter %g mm: a released coil never shrinks (measure the centreline: outside diameter minus one wire diameter)",
				i+1, p.RelaxedDiameter, p.FormerDiameter)
		}
		kmin = math.Min(kmin, HelixCurvature(p.FormerDiameter/2, spacing))
		meas += p.RelaxedDiameter
	}
	meas /= float64(len(pts))
	law := base.Law()
	c := base.Section().HalfDepth()
	model := func(f float64) (*Springback, error) {
		return NewSpringback(base.Section(), law.Scaled(f), m.Elongation)
	}
	// fmax: the factor at which the loosest former stops setting the wire.
	fmax, err := findRoot(func(f float64) float64 { return law.Scaled(f).ElasticLimit()/c - kmin }, 0, upperFactor(law, kmin*c), 1e-15)
	if err != nil {
		return Calibration{}, fmt.Errorf("calibrate: %w", err)
	}
	predict := func(f float64) ([]float64, error) {
		s, err := model(f)
		if err != nil {
			return nil, err
		}
		out := make([]float64, len(pts))
		for i, p := range pts {
			w, err := s.Relax(p.FormerDiameter/2, spacing)
			if err != nil {
				return nil, err
			}
			out[i] = 2 * w.RelaxedRadius
		}
		return out, nil
	}
	var ferr error
	g := func(f float64) float64 {
		ds, err := predict(f)
		if err != nil {
			ferr = err
			return math.NaN()
		}
		sum := 0.0
		for _, v := range ds {
			sum += v
		}
		return sum/float64(len(ds)) - meas
	}
	// Close to fmax the relaxed curvature vanishes into rounding, so the
	// upper end of the bracket backs off from it until the predicted coils
	// are larger than the measured ones.
	lo, hi := fmax*1e-9, 0.0
	if !(g(lo) < 0) {
		return Calibration{}, fmt.Errorf("calibrate: the measured coils are too close to the former diameter to fit a yield")
	}
	for delta := 0.5; delta > 1e-9 && hi == 0; delta /= 10 {
		v := g(fmax * (1 - delta))
		if math.IsNaN(v) {
			break
		}
		if v > 0 {
			hi = fmax * (1 - delta)
		}
	}
	if hi == 0 {
		return Calibration{}, fmt.Errorf("calibrate: the measured coils spring out more than this material can on the tightest former: check the material, the wire diameter and that the diameters are centreline values")
	}
	f, err := findRoot(g, lo, hi, calibrationRelTol*fmax)
	if err != nil {
		if ferr != nil {
			err = ferr
		}
		return Calibration{}, fmt.Errorf("calibrate: no yield fits the measurements: %w", err)
	}
	ds, err := predict(f)
	if err != nil {
		return Calibration{}, fmt.Errorf("calibrate: %w", err)
	}
	cal := Calibration{Material: m.ID, WireDiameter: d, Spacing: spacing, Hardening: hardening,
		EffectiveYield: f * m.Yield, LibraryYield: m.Yield, Points: len(pts)}
	ss := 0.0
	for i, p := range pts {
		p.PredictedDiameter = ds[i]
		cal.Measurements = append(cal.Measurements, p)
		ss += (ds[i] - p.RelaxedDiameter) * (ds[i] - p.RelaxedDiameter)
	}
	cal.ResidualRMS = math.Sqrt(ss / float64(len(pts)))
	// Sensitivity of the mean predicted diameter to the yield, by a central
	// difference; the reading error of a mean of n coils falls as 1/√n.
	const h = 1e-4
	if gp, gm := g(f*(1+h)), g(f*(1-h)); gp > gm {
		slope := (gp - gm) / (2 * h * f * m.Yield) // mm per MPa
		cal.YieldUncertainty = calibrationReadingMM / math.Sqrt(float64(len(pts))) / slope
	}
	if cal.YieldUncertainty > calibrationLooseFraction*cal.EffectiveYield {
		cal.Warnings = append(cal.Warnings, fmt.Sprintf(
			"the test coil springs back so little that a %.2f mm misreading moves the fitted yield by ±%.0f MPa (%.0f %%): wind on a larger former or measure more coils",
			calibrationReadingMM, cal.YieldUncertainty, 100*cal.YieldUncertainty/cal.EffectiveYield))
	}
	if f > calibrationFarFactor || f < 1/calibrationFarFactor {
		cal.Warnings = append(cal.Warnings, fmt.Sprintf(
			"fitted yield %.0f MPa is %.2f× the library's %.0f MPa: check the material, the wire diameter and that the diameters are centreline values",
			cal.EffectiveYield, f, m.Yield))
	}
	return cal, nil
}

// upperFactor returns a flow factor at which the law's elastic-limit strain
// exceeds strain: the upper end of the bracket for the set limit.
func upperFactor(law FlowLaw, strain float64) float64 {
	f := 1.0
	for law.Scaled(f).ElasticLimit() <= strain && f < math.MaxFloat64/4 {
		f *= 2
	}
	return f
}

// Apply returns m with its flow stress scaled to the calibrated effective
// yield. It fails when the calibration was made for another material.
func (c Calibration) Apply(m Material) (Material, error) {
	if c.Material != m.ID {
		return Material{}, fmt.Errorf("calibration is for material %q, not %q", c.Material, m.ID)
	}
	if err := c.validate(); err != nil {
		return Material{}, err
	}
	l := m.FlowLaw(true).Scaled(c.EffectiveYield / m.Yield)
	m.Yield, m.Hardening = l.Yield, l.Hardening
	return m, nil
}

// validate checks the values a file can carry.
func (c Calibration) validate() error {
	if err := c.validateRanges(); err != nil {
		return err
	}
	switch {
	case c.Material == "":
		return errors.New("calibration: material is missing")
	case !(c.WireDiameter > 0):
		return fmt.Errorf("calibration: wire_diameter_mm = %g: must be positive", c.WireDiameter)
	case !(c.EffectiveYield > 0) || math.IsInf(c.EffectiveYield, 0):
		return fmt.Errorf("calibration: effective_yield_mpa = %g: must be positive", c.EffectiveYield)
	case !(c.Spacing >= 0):
		return fmt.Errorf("calibration: spacing_mm = %g: must be zero or positive", c.Spacing)
	case !(c.ResidualRMS >= 0):
		return fmt.Errorf("calibration: residual_rms_mm = %g: must be zero or positive", c.ResidualRMS)
	}
	if _, err := LookupMaterial(c.Material); err != nil {
		return fmt.Errorf("calibration: %w", err)
	}
	return nil
}

// MarshalCalibration returns c as a calibration file (TOML), with the
// yield rounded to 0.001 MPa and diameters to 0.0001 mm.
func MarshalCalibration(c Calibration) ([]byte, error) {
	round := func(v float64, places int) float64 {
		r, _ := strconv.ParseFloat(strconv.FormatFloat(v, 'f', places, 64), 64)
		return r
	}
	c.EffectiveYield = round(c.EffectiveYield, 3)
	c.ResidualRMS = round(c.ResidualRMS, 4)
	c.YieldUncertainty = round(c.YieldUncertainty, 1)
	c.Measurements = slices.Clone(c.Measurements)
	for i := range c.Measurements {
		c.Measurements[i].PredictedDiameter = round(c.Measurements[i].PredictedDiameter, 4)
	}
	var b bytes.Buffer
	b.WriteString("# Springback calibration: fitted effective yield of one wire batch.\n")
	enc := toml.NewEncoder(&b)
	if err := enc.Encode(c); err != nil {
		return nil, fmt.Errorf("calibration: %w", err)
	}
	return b.Bytes(), nil
}

// ParseCalibration decodes and checks a calibration file. Unknown keys are
// errors.
func ParseCalibration(data []byte) (Calibration, error) {
	var c Calibration
	if len(data) > maxCalibrationBytes {
		return Calibration{}, fmt.Errorf("calibration: %d bytes is too large for a calibration file", len(data))
	}
	dec := toml.NewDecoder(bytes.NewReader(data)).DisallowUnknownFields()
	if err := dec.Decode(&c); err != nil {
		return Calibration{}, calibrationDecodeError(err)
	}
	if err := c.validate(); err != nil {
		return Calibration{}, err
	}
	return c, nil
}
