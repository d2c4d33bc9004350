// The match from the whole-antenna field solution: the coil as released,
// the feed lead as built and the matching strip, over an ideal ground
// plane, solved by the thin-wire moment method at each frequency of the
// band.
//
// Modelling assumptions (stated in the report): the strip and the wire
// soldered on it are one conductor along the wire's centreline whose
// radius a gives, as a round wire over the plate at the wire's height z,
// the impedance the strip has there: (η0/2π)·acosh(z/a) = Z_strip, never
// thinner than the wire (TEM air lines of equal impedance have equal
// inductance and capacitance per length). The delta-gap source sits where
// the lead meets the plate; dielectrics, the cable's outside and the
// connector are not modelled.

package parts

import (
	"math"

	"coilwright/cam/geom"
	"coilwright/parts/em"
	"coilwright/parts/spec"
)

// solverSegmentsPerWave is the segment density along the wire: λ/20 at
// the band's top, never shorter than solverMinSegmentRadii radii. Common
// practice (no published source).
const (
	solverSegmentsPerWave = 20
	solverMinSegmentRadii = 4
)

// copperConductivity is annealed copper, S/m. Source: IEC 60028
// (100 % IACS).
const copperConductivity = 5.8e7

// solverStripRadii is the least strip segment length in equivalent radii:
// above the kernel's two-radius limit with a margin.
const solverStripRadii = 2.2

const spectrumZ = spec.FreeSpaceImpedance

// matchModel builds the wire model of d's coil, lead and strip w over an
// ideal ground, segmented for frequencies up to fMaxMHz.
func matchModel(d *Design, w *Wedge, fMaxMHz float64) (em.Model, error) {
	a := d.Spec.Wire.DiameterMM / 2
	step := math.Max(spec.Wavelength(fMaxMHz)/solverSegmentsPerWave, solverMinSegmentRadii*a)
	pts := append([]geom.Vec3{}, d.Lead.Path...)
	var radii []float64
	for i := 1; i < len(pts); i++ {
		radii = append(radii, a)
	}
	span := d.Coil.Span()
	eqRadius := func(phi float64) float64 {
		z := d.Coil.Z(phi)
		return math.Max(a, z/math.Cosh(w.impedanceAt(d.Coil.LengthBetween(0, phi))*2*math.Pi/spectrumZ))
	}
	// The strip: segments no shorter than solverStripRadii of the largest
	// equivalent radius on them, so the kernel holds.
	amax := a
	for i := 0; i <= 32; i++ {
		amax = math.Max(amax, eqRadius(w.Span*float64(i)/32))
	}
	ns := max(1, int(math.Floor(w.Length/math.Max(step, solverStripRadii*amax))))
	for i := 1; i <= ns; i++ {
		p0, p1 := w.Span*float64(i-1)/float64(ns), w.Span*float64(i)/float64(ns)
		pts = append(pts, d.Coil.Point(p1))
		radii = append(radii, eqRadius((p0+p1)/2))
	}
	rest := d.WireLength - w.Length
	n := max(1, int(math.Ceil(rest/step)))
	for i := 1; i <= n; i++ {
		pts = append(pts, d.Coil.Point(w.Span+(span-w.Span)*float64(i)/float64(n)))
		radii = append(radii, a)
	}
	wire := em.Wire{Points: pts, Radius: radii, Conductivity: copperConductivity}
	return em.Model{Wires: []em.Wire{wire}, Ground: em.PerfectGround, Feed: em.Feed{At: pts[0]}}, nil
}

// solverMatch sweeps the model of d with strip w across freqs (MHz) and
// returns the match at each against the 50 Ω cable.
func solverMatch(d *Design, w *Wedge, freqs []float64) ([]MatchPoint, error) {
	md, err := matchModel(d, w, freqs[len(freqs)-1])
	if err != nil {
		return nil, err
	}
	m, err := em.NewMesh(md, em.MeshOptions{})
	if err != nil {
		return nil, err
	}
	hz := make([]float64, len(freqs))
	for i, f := range freqs {
		hz[i] = f * 1e6
	}
	sols, err := m.Sweep(hz)
	if err != nil {
		return nil, err
	}
	out := make([]MatchPoint, len(freqs))
	for i, s := range sols {
		g := em.Reflection(s.Impedance, complex(spec.WedgeFeedOhm, 0))
		out[i] = MatchPoint{FrequencyMHz: freqs[i], ZRe: real(s.Impedance), ZIm: imag(s.Impedance), Reflection: math.Hypot(real(g), imag(g)), VSWR: em.VSWR(g)}
	}
	return out, nil
}
