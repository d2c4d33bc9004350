// Springback compensation of the design's coil.
//
// The spec gives the coil the maker wants after the wire is released (the
// relaxed coil). The former is a coil of the same kind whose end radii are
// the inverse springback of the relaxed end radii, wound at the same heights:
// the groove holds the axial spacing, so a constant-spacing former keeps the
// spacing and a constant-angle (equiangular) former takes the pitch angle
// that gives the same total height. Each turn is then run forward through
// the model at its middle: the predicted relaxed diameter shows how closely
// the interpolated former hits the target between its ends. The wire-path
// curvature is taken as that of a cylindrical helix with the local radius and
// spacing; a cone's slowly changing radius adds a term of order (dr/dφ)²/r²,
// below 10⁻³ for any coil the spec admits. A constant-angle former holds the
// coil's total height exactly but, its radii being smaller, its local spacing
// differs from the coil's by about a per cent towards the ends; the forward
// check uses the former's own spacing, which the released wire keeps.

package parts

import (
	"fmt"
	"math"
	"strings"

	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// Inspection tolerance of the relaxed centreline diameter. Common practice
// (no published source): about 1 % of the diameter keeps the circumference
// within 1 % of its design value, and calipers on a springy coil do not read
// better than about 0.2 mm.
const (
	InspectionFraction = 0.01
	InspectionFloorMM  = 0.2
)

// yieldScatter is the relative batch-to-batch scatter of drawn-wire yield
// used to judge whether an uncalibrated design needs a test coil. From
// memory: ±10 % is typical of one temper from different suppliers.
const yieldScatter = 0.10

// formerIterations bounds the end-radius iteration of a constant-angle
// former; formerSettle is its relative convergence threshold. The
// spacing's pull on the radius is weak, so it settles in a few rounds.
const (
	formerIterations = 50
	formerSettle     = 1e-13
)

// formerFitFraction is the share of the inspection tolerance the former's
// interpolation between its ends may use before the design warns.
const formerFitFraction = 0.25

// InspectionTolerance returns the default ± tolerance in mm on a relaxed
// centreline diameter of d mm: the larger of InspectionFloorMM and
// InspectionFraction·d.
func InspectionTolerance(d float64) float64 {
	return math.Max(InspectionFloorMM, InspectionFraction*d)
}

// WireDesign is the wire of a design and its springback model.
type WireDesign struct {
	// Material is the library row, its flow stress scaled to the calibrated
	// effective yield when a calibration is attached.
	Material wire.Material
	// LibraryYield is the library's yield for the material, MPa.
	LibraryYield float64
	// Diameter is the bare wire diameter, mm.
	Diameter float64
	// Hardening reports whether the model uses the material's hardening law.
	Hardening bool
	// Calibration is the attached calibration, or nil.
	Calibration *wire.Calibration
	// Model is the springback model of the wire.
	Model *wire.Springback
}

// newWireDesign builds the wire and its springback model from a validated spec.
func newWireDesign(s *spec.Spec) (WireDesign, error) {
	m, err := wire.LookupMaterial(s.Wire.Material)
	if err != nil {
		return WireDesign{}, err
	}
	w := WireDesign{LibraryYield: m.Yield, Diameter: s.Wire.DiameterMM, Hardening: s.Wire.Hardening(), Calibration: s.Wire.CalibrationData()}
	if w.Calibration != nil {
		if m, err = w.Calibration.Apply(m); err != nil {
			return WireDesign{}, err
		}
	}
	w.Material = m
	w.Model, err = wire.NewWireSpringback(m, w.Diameter, w.Hardening)
	return w, err
}

// compensateCoil returns the former coil that relaxes to target under
// model: same kind, hand, start height and total height, end radii
// compensated, and as many turns as make its groove as long as the target
// coil's wire. The wire keeps its length when it springs open: wound on
// the smaller former it needs a few degrees more than the target's turns,
// and released it unwinds by the difference. A constant-angle former's
// spacing depends on its own radii and turns, so its ends are compensated
// again at the spacing the former has there until the radii settle.
func compensateCoil(target Coil, model *wire.Springback) (Coil, error) {
	f := target
	s0, s1 := target.SpacingAt(0), target.SpacingAt(target.Span())
	want := target.Length()
	for range formerIterations {
		prev := f
		ws, err := model.Compensate(target.StartRadius, s0)
		if err != nil {
			return Coil{}, err
		}
		f.StartRadius = ws.FormerRadius
		f.EndRadius = f.StartRadius
		if target.EndRadius != target.StartRadius {
			we, err := model.Compensate(target.EndRadius, s1)
			if err != nil {
				return Coil{}, err
			}
			f.EndRadius = we.FormerRadius
		}
		f = holdLength(f, target.Height(), want)
		if math.Abs(f.StartRadius-prev.StartRadius) < formerSettle*f.StartRadius &&
			math.Abs(f.EndRadius-prev.EndRadius) < formerSettle*f.EndRadius &&
			math.Abs(f.Turns-prev.Turns) < formerSettle*f.Turns {
			return f, nil
		}
		s0, s1 = f.SpacingAt(0), f.SpacingAt(f.Span())
	}
	return f, nil
}

// holdLength returns f with its turns set so that its centreline is want
// mm long while its end radii and its height stay as they are: the
// spacing (constant spacing) or the pitch angle (constant angle) follows
// the turns. The length is nearly proportional to the turns, so the
// fixed-point step N ← N·want/L settles in a few rounds.
func holdLength(f Coil, height, want float64) Coil {
	for range formerIterations {
		f = withTurns(f, f.Turns*want/f.Length(), height)
		if math.Abs(f.Length()-want) < formerSettle*want {
			break
		}
	}
	return f
}

// withTurns returns f with n turns over the same height and end radii.
func withTurns(f Coil, n, height float64) Coil {
	f.Turns = n
	if f.Mode != ConstantAngle || f.EndRadius == f.StartRadius {
		f.Spacing = height / n
		return f
	}
	// On the cone, Z − Z0 = (r − r0)·cos θ0/sin θ0 with sin θ0 = k/tan α
	// (Dyson, IEEE Trans. AP-13, 1965). Holding the height H fixes
	// u = tan θ0 = (r1 − r0)/H, hence sin θ0 = u/√(1 + u²) and
	// tan α = k/sin θ0.
	u := (f.EndRadius - f.StartRadius) / height
	sinTheta := u / math.Sqrt(1+u*u)
	k := math.Log(f.EndRadius/f.StartRadius) / f.Span()
	f.PitchAngle = math.Atan(k / sinTheta)
	return f
}

// formerPhi returns the azimuth on the former that winds to azimuth phi
// of the relaxed coil: the same share of the winding.
func (d *Design) formerPhi(phi float64) float64 {
	return phi * d.Former.Turns / d.Coil.Turns
}

// springbackTurns fills the per-turn former, prediction and tolerance, and
// returns the design warnings the winding raises.
func (d *Design) springbackTurns() ([]Warning, error) {
	var warn []Warning
	add := func(code, format string, args ...any) {
		warn = append(warn, Warning{Code: code, Message: fmt.Sprintf(format, args...)})
	}
	w := d.Wire
	var strained []int
	maxStrain, worstFit := 0.0, 0.0
	worstFitTurn := 0
	for i := range d.Turns {
		t := &d.Turns[i]
		mid := (t.StartPhi + t.EndPhi) / 2
		rf := d.Former.Radius(d.formerPhi(mid))
		win, err := w.Model.Relax(rf, d.Former.SpacingAt(d.formerPhi(mid)))
		if err != nil {
			return nil, fmt.Errorf("turn %d: %w", t.Index, err)
		}
		t.FormerDiameterMM = 2 * rf
		t.PredictedDiameterMM = 2 * win.RelaxedRadius
		t.SpringbackMM = win.Springout()
		t.OuterStrain = win.OuterStrain
		t.ToleranceMM = InspectionTolerance(t.DiameterMM)
		if tol := d.Spec.Wire.InspectionToleranceMM; tol != nil {
			t.ToleranceMM = *tol
		}
		if len(win.Warnings) > 0 {
			strained = append(strained, t.Index)
		}
		maxStrain = math.Max(maxStrain, win.OuterStrain)
		if fit := math.Abs(t.PredictedDiameterMM-t.DiameterMM) / t.ToleranceMM; fit > worstFit {
			worstFit, worstFitTurn = fit, t.Index
		}
	}
	m := w.Material
	if len(strained) > 0 {
		add("wire-strain", "outer-fibre strain up to %.1f %% on the former exceeds %s's elongation %.1f %% (turns %s): the wire may crack or neck; use a softer temper or a thinner wire",
			100*maxStrain, m.ID, 100*m.Elongation, intList(strained))
	}
	if worstFit > formerFitFraction {
		add("former-fit", "turn %d: the former, interpolated between its compensated ends, relaxes %.0f %% of the inspection tolerance away from the target diameter",
			worstFitTurn, 100*worstFit)
	}
	for _, c := range m.Cautions {
		add("wire-"+string(c), "%s: %s", m.ID, c.Text())
	}
	if w.Hardening && m.Hardening.Kind == wire.HardeningNone {
		add("springback-model", "%s has no hardening law in the library: springback is modelled as perfectly plastic", m.ID)
	}
	if cal := w.Calibration; cal != nil {
		if math.Abs(cal.WireDiameter-w.Diameter) > spec.CalibrationDiameterSlack*w.Diameter {
			add("calibration-diameter", "calibration was made on %s mm wire, the spec winds %s mm: another gauge is another draw; calibrate this wire",
				num(cal.WireDiameter), num(w.Diameter))
		}
	} else if len(d.Turns) > 0 {
		if spread, err := d.yieldSpread(); err == nil && spread > d.Turns[0].ToleranceMM {
			add("springback-calibration", "a ±%.0f %% batch scatter in yield moves the relaxed diameter of turn 1 by ±%.2f mm, more than its ±%.2f mm tolerance: wind a test coil and run `coilwright calibrate`",
				100*yieldScatter, spread, d.Turns[0].ToleranceMM)
		}
	}
	return warn, nil
}

// yieldSpread returns half the change in turn 1's relaxed diameter, mm, when
// the wire's flow stress varies by ±yieldScatter on the same former.
func (d *Design) yieldSpread() (float64, error) {
	t := d.Turns[0]
	mid := (t.StartPhi + t.EndPhi) / 2
	var dia [2]float64
	for i, f := range []float64{1 - yieldScatter, 1 + yieldScatter} {
		s, err := wire.NewSpringback(d.Wire.Model.Section(), d.Wire.Model.Law().Scaled(f), 0)
		if err != nil {
			return 0, err
		}
		w, err := s.Relax(d.Former.Radius(d.formerPhi(mid)), d.Former.SpacingAt(d.formerPhi(mid)))
		if err != nil {
			return 0, err
		}
		dia[i] = 2 * w.RelaxedRadius
	}
	return (dia[1] - dia[0]) / 2, nil
}

// intList formats turn numbers as "1, 2, 5".
func intList(v []int) string {
	s := make([]string, len(v))
	for i, n := range v {
		s[i] = fmt.Sprint(n)
	}
	return strings.Join(s, ", ")
}
