// Textbook curves: the published axial-mode formulas evaluated across
// frequency, for plots drawn when no field solution is available.
//
// At frequency f the coil's circumference and spacing in wavelengths scale
// as f/f0. The gain is the estimate the report leads with, the axial ratio
// Kraus's on-axis (2N+1)/(2N), split into circular components with the
// axial-ratio relation. The match is the matching strip's realised
// impedance steps, summed by the theory of small reflections at the
// strip's electrical length at f, into the first turn's Kraus input
// resistance at f. The pattern is Kraus's array-factor pattern of N turns
// with the increased-directivity phase velocity and a cos θ element
// factor; it is the same in every plane through the axis.

package parts

import (
	"math"
	"math/cmplx"

	"coilwright/parts/line"
	"coilwright/parts/spec"
)

// TextbookPoint is the textbook estimate at one frequency.
type TextbookPoint struct {
	FrequencyMHz float64
	Reflection   float64 // |Γ| at the feed through the matching strip
	VSWR         float64
	ReturnLossDB float64 // −20·log10|Γ|, positive
	GainDBic     float64 // total gain estimate (both components)
	RHCPDBic     float64 // right-hand circular component on the axis
	LHCPDBic     float64 // left-hand circular component on the axis
	AxialRatioDB float64 // on-axis axial ratio, 20·log10 AR
}

// CircularSplitDB returns how many dB the co-polar and cross-polar
// circular components lie below the total for a wave of axial ratio ar
// (≥ 1, as a ratio): with ρ = (AR+1)/(AR−1) the co-polar field over the
// cross-polar one, the co-polar share of the power is ρ²/(1+ρ²). A
// perfectly circular wave (ar = 1) has no cross-polar component: its loss
// is +Inf.
// Source: Balanis, Antenna Theory, 3rd ed., §2.12 (polarization; the
// relation between axial ratio and circular components from memory).
func CircularSplitDB(ar float64) (coLossDB, crossLossDB float64) {
	if ar <= 1 {
		return 0, math.Inf(1)
	}
	rho := (ar + 1) / (ar - 1)
	return 10 * math.Log10(1+1/(rho*rho)), 10 * math.Log10(1+rho*rho)
}

// KrausHelixPattern returns the normalised far-field magnitude of an
// axial-mode helix of n turns, circumference cl and spacing sl in
// wavelengths, at angle theta (radians) from its axis:
// |sin(π/2n)·cos θ·sin(nψ/2)/sin(ψ/2)| with ψ = 2π(Sλ·cos θ − Lλ/p),
// Lλ = √(Cλ² + Sλ²) the turn length and p = Lλ/(Sλ + (2n+1)/(2n)) the
// increased-directivity phase velocity. It is 1 on the axis.
// Source: Kraus, Antennas, 2nd ed., ch. 7 (the helix pattern as an array
// of n turns; from memory).
func KrausHelixPattern(cl, sl, n, theta float64) float64 {
	ll := math.Hypot(cl, sl)
	p := ll / (sl + (2*n+1)/(2*n))
	psi := 2 * math.Pi * (sl*math.Cos(theta) - ll/p)
	s := math.Sin(psi / 2)
	af := n // the limit of sin(nψ/2)/sin(ψ/2) as ψ/2 → kπ
	if math.Abs(s) > 1e-12 {
		af = math.Sin(n*psi/2) / s
	}
	return math.Abs(math.Sin(math.Pi/(2*n)) * math.Cos(theta) * af)
}

// lambdaScale returns the factor by which lengths in wavelengths grow at
// frequency fMHz over the design frequency.
func (d *Design) lambdaScale(fMHz float64) float64 { return fMHz / d.Spec.FrequencyMHz }

// textbookShape returns the mean circumference and spacing in wavelengths
// at the design frequency, as the report's estimates use them.
func (d *Design) textbookShape() (cl, sl float64) {
	return 2 * math.Pi * d.Coil.MeanRadius() / d.Wavelength, d.AxialLength / d.Coil.Turns / d.Wavelength
}

// TextbookSweep returns the textbook estimate at each frequency in MHz.
// At the design frequency the gain and axial ratio equal the report's
// estimates and the reflection the matching strip's.
func (d *Design) TextbookSweep(freqsMHz []float64) []TextbookPoint {
	cl0, sl0 := d.textbookShape()
	peripheral := d.Spec.Coil.Feed == "periphery"
	out := make([]TextbookPoint, len(freqsMHz))
	for i, f := range freqsMHz {
		k := d.lambdaScale(f)
		e := EstimateHelix(cl0*k, sl0*k, d.Coil.Turns, peripheral)
		ar := e.AxialRatio.Value
		coLoss, crossLoss := CircularSplitDB(ar)
		p := TextbookPoint{FrequencyMHz: f, GainDBic: e.Gain.Value, AxialRatioDB: 20 * math.Log10(ar)}
		co, cross := e.Gain.Value-coLoss, e.Gain.Value-crossLoss
		p.RHCPDBic, p.LHCPDBic = co, cross
		if d.Coil.Hand == LeftHand {
			p.RHCPDBic, p.LHCPDBic = cross, co
		}
		p.Reflection = d.stripReflection(k, peripheral)
		p.VSWR = line.VSWR(p.Reflection)
		p.ReturnLossDB = line.ReturnLossDB(p.Reflection)
		out[i] = p
	}
	return out
}

// stripReflection returns |Γ| at the feed at lambdaScale k: the matching
// strip's realised impedances at its electrical length scaled by k, into
// the first turn's input resistance at k.
func (d *Design) stripReflection(k float64, peripheral bool) float64 {
	w := d.Patterns.Wedge
	prof := make([]float64, len(w.Stations))
	for i, st := range w.Stations {
		prof[i] = st.Ohm
	}
	load := KrausInputResistance(d.Turns[0].CircumferenceLambda*k, peripheral)
	return cmplx.Abs(line.Reflection(spec.WedgeFeedOhm, load, prof, w.ElectricalLength*k))
}

// TextbookPattern returns the co-polar and cross-polar levels in dBic at
// each angle theta (radians from the axis) at frequency fMHz, as the right-
// and left-hand circular components: the Kraus pattern scaled to the
// on-axis components of TextbookSweep, the axial ratio held at its on-axis
// value. Levels below floorDB under the peak are raised to it.
func (d *Design) TextbookPattern(fMHz float64, thetas []float64, floorDB float64) (rhcp, lhcp []float64) {
	cl0, sl0 := d.textbookShape()
	k := d.lambdaScale(fMHz)
	pt := d.TextbookSweep([]float64{fMHz})[0]
	top := math.Max(pt.RHCPDBic, pt.LHCPDBic)
	rhcp, lhcp = make([]float64, len(thetas)), make([]float64, len(thetas))
	for i, th := range thetas {
		e := KrausHelixPattern(cl0*k, sl0*k, d.Coil.Turns, th)
		rel := math.Inf(-1)
		if e > 0 {
			rel = 20 * math.Log10(e)
		}
		rhcp[i] = math.Max(pt.RHCPDBic+rel, top-floorDB)
		lhcp[i] = math.Max(pt.LHCPDBic+rel, top-floorDB)
	}
	return rhcp, lhcp
}
