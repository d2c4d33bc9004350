package em

import (
	"math"
	"math/cmplx"
	"testing"

	"coilwright/cam/geom"
)

// Tolerances of the far-field checks.
const (
	powerBalanceTol = 0.01  // radiated vs input power, relative
	polarisationTol = 1e-12 // circular components of an exact field
)

func TestCircularComponentsOfExplicitField(t *testing.T) {
	// Source: IEEE Std 145 with e^{+jωt}: a wave along +z with E ∝ x̂ − jŷ is
	// right-hand circular (E(t) = x̂ cos ωt + ŷ sin ωt turns clockwise seen
	// from behind, looking along the propagation).
	f := transverse([3]complex128{1, -1i, 0}, Direction{})
	if r, l := cmplx.Abs(f.Right()), cmplx.Abs(f.Left()); math.Abs(r-math.Sqrt2) > polarisationTol || l > polarisationTol {
		t.Errorf("x̂ − jŷ along +z: |E_R| = %g, |E_L| = %g; want √2, 0", r, l)
	}
	if ar := f.AxialRatio(); math.Abs(ar-1) > polarisationTol {
		t.Errorf("axial ratio %g, want 1", ar)
	}
	g := transverse([3]complex128{1, 1i, 0}, Direction{})
	if r, l := cmplx.Abs(g.Right()), cmplx.Abs(g.Left()); r > polarisationTol || math.Abs(l-math.Sqrt2) > polarisationTol {
		t.Errorf("x̂ + jŷ along +z: |E_R| = %g, |E_L| = %g; want 0, √2", r, l)
	}
	// The same right-hand wave sent along −z is x̂ + jŷ seen in the fixed
	// frame (the rotation reverses with the propagation direction); at θ = π
	// the formula must still call it right-handed.
	h := transverse([3]complex128{1, 1i, 0}, Direction{Theta: math.Pi})
	if r, l := cmplx.Abs(h.Right()), cmplx.Abs(h.Left()); math.Abs(r-math.Sqrt2) > 1e-9 || l > 1e-9 {
		t.Errorf("x̂ + jŷ along −z: |E_R| = %g, |E_L| = %g; want √2, 0", r, l)
	}
	if ar := (FarField{Theta: 1}).AxialRatio(); !math.IsInf(ar, 1) {
		t.Errorf("linear field axial ratio %g, want +Inf", ar)
	}
}

func TestRadiatedPowerEqualsInputPower(t *testing.T) {
	// Energy conservation: a lossless structure radiates all its input power.
	lossless := bentModel()
	lossless.Wires[0].Conductivity = 0
	for name, md := range map[string]Model{
		"dipole":   dipoleModel(500, 0.1, 40),
		"junction": lossless,
		"loop":     loopModel(100, 0.1, 24),
		"monopole": monopoleModel(250, 0.1, 20),
	} {
		t.Run(name, func(t *testing.T) {
			s := mustSolve(t, md, MeshOptions{}, lambda1m)
			if r := s.RadiatedPower(0) / s.InputPower(); math.Abs(r-1) > powerBalanceTol {
				t.Errorf("P_rad/P_in = %.5f", r)
			}
		})
	}
}

func TestLossLowersEfficiency(t *testing.T) {
	// Energy conservation with loss: P_rad (pattern integral) = P_in − P_loss.
	md := dipoleModel(50, 0.1, 10)
	md.Wires[0].Conductivity = 5.8e7 // copper. Source: IEC 60028 (100 % IACS).
	s := mustSolve(t, md, MeshOptions{}, lambda1m)
	eff := s.Efficiency()
	if !(eff < 1 && eff > 0) {
		t.Fatalf("efficiency %g, want in (0, 1)", eff)
	}
	if r := s.RadiatedPower(0) / (s.InputPower() - s.LossPower()); math.Abs(r-1) > powerBalanceTol {
		t.Errorf("P_rad/(P_in − P_loss) = %.5f", r)
	}
	// Source: Balanis ch. 2: loss resistance of a short dipole with a
	// triangular current, R_L = (L/3)·R_s/(2πa) with R_s = √(ωμ0/2σ); the
	// efficiency is R_r/(R_r + R_L). Allow 15 % on R_L (current shape).
	rs := math.Sqrt(2 * math.Pi * lambda1m * mu0 / (2 * 5.8e7))
	rl := 0.05 / 3 * rs / (2 * math.Pi * 1e-4)
	got := s.LossPower() / (0.5 * abs2(s.FeedCurrent))
	if math.Abs(got-rl)/rl > 0.15 {
		t.Errorf("loss resistance %.5f Ω, want %.5f", got, rl)
	}
}

// monopoleModel is a vertical wire of length l (mm) on the ground plane,
// radius a, n segments, fed at its base.
func monopoleModel(l, a float64, n int) Model {
	w := Wire{Radius: []float64{a}}
	for i := 0; i <= n; i++ {
		w.Points = append(w.Points, geom.Vec3{Z: l * float64(i) / float64(n)})
	}
	return Model{Wires: []Wire{w}, Ground: PerfectGround, Feed: Feed{Wire: 0, At: geom.Vec3{}}}
}

func TestQuarterWaveMonopoleIsHalfDipole(t *testing.T) {
	// Source: image theory, Balanis ch. 4: a monopole on an infinite plane
	// has half the impedance of the dipole of twice its length and twice its
	// directivity (+3.01 dB).
	d := mustSolve(t, dipoleModel(500, 0.1, 40), MeshOptions{}, lambda1m)
	m := mustSolve(t, monopoleModel(250, 0.1, 20), MeshOptions{}, lambda1m)
	if e := relErr(m.Impedance, d.Impedance/2); e > 0.01 {
		t.Errorf("monopole Z = %.3f, half dipole %.3f (%.3g relative)", m.Impedance, d.Impedance/2, e)
	}
	dd, dm := DB(directivity(d, Total)), DB(directivity(m, Total))
	if math.Abs(dm-dd-3.01) > 0.05 {
		t.Errorf("directivity monopole %.3f dBi, dipole %.3f dBi: difference %.3f dB, want 3.01", dm, dd, dm-dd)
	}
	if f := m.Field(Direction{Theta: 2}); f != (FarField{}) {
		t.Errorf("field below the ground plane %v, want zero", f)
	}
}

func TestHorizontalWireOverGround(t *testing.T) {
	// Source: image theory (Balanis ch. 4): a horizontal dipole at height h
	// over a perfect plane works against an oppositely fed image at −h and
	// sees Z = Z_self − Z_mutual(2h).
	h := 150.0
	wire := func(z float64) Wire {
		w := Wire{Radius: []float64{0.1}}
		for i := 0; i <= 40; i++ {
			w.Points = append(w.Points, geom.Vec3{X: -250 + 12.5*float64(i), Z: z})
		}
		return w
	}
	over := mustSolve(t, Model{Wires: []Wire{wire(h)}, Ground: PerfectGround, Feed: Feed{At: geom.Vec3{Z: h}}}, MeshOptions{}, lambda1m)
	self := mustSolve(t, dipoleModel(500, 0.1, 40), MeshOptions{}, lambda1m)
	if real(over.Impedance) >= real(self.Impedance) {
		// At h = 0.15 λ the image's mutual resistance is positive (Balanis
		// ch. 8, mutual impedance of parallel dipoles), so R drops.
		t.Errorf("R over ground %.2f, free %.2f: want lower", real(over.Impedance), real(self.Impedance))
	}
	if r := over.RadiatedPower(0) / over.InputPower(); math.Abs(r-1) > powerBalanceTol {
		t.Errorf("P_rad/P_in = %.5f", r)
	}
}
