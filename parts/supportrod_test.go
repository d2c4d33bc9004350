package parts

import (
	"math"
	"testing"
)

func TestRodLoadingEstimate(t *testing.T) {
	// Source: the first-order model of DOMAIN §9 [mem], worked by hand
	// [calc]: a Ø35 mm PTFE rod (εr 2.1) in a coil of 39 mm centreline
	// diameter fills F = (35/39)² = 0.80539; εeff = 1 + 1.1·F = 1.88593,
	// shift 1 − 1/√εeff = 0.27182. A Ø8/6 mm tube in a 40 mm coil fills
	// (64 − 36)/1600 = 0.0175; εeff 1.01925, shift 0.009487.
	const tol = 1e-5
	cases := []struct {
		name                    string
		outer, bore, helix, eps float64
		fill, shift             float64
	}{
		{"solid PTFE, nearly full", 35, 0, 39, 2.1, 0.80539, 0.27182},
		{"PTFE tube", 8, 6, 40, 2.1, 0.0175, 0.009487},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			l := EstimateRodLoading(c.outer, c.bore, c.helix, c.eps)
			if math.Abs(l.FillRatio-c.fill) > tol || math.Abs(l.ShiftFraction-c.shift) > tol {
				t.Errorf("fill %.5f shift %.6f, want %.5f and %.6f", l.FillRatio, l.ShiftFraction, c.fill, c.shift)
			}
		})
	}
}

func TestRodMass(t *testing.T) {
	// Density × volume [calc]: a Ø60 mm solid PTFE rod (2.2 g/cm³,
	// From memory) 483 mm long weighs 2.2 × π/4 × 6² × 48.3 = 3004 g.
	r, err := ChooseSupportRod("ptfe", 70, 483, 80, 60)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.MassG-3004.3) > 0.5 {
		t.Errorf("mass %.1f g, want 3004.3", r.MassG)
	}
	if !r.Mount.Overloaded || r.Mount.Screw != "" {
		t.Errorf("a 3 kg rod got %q (%s), want no single screw", r.Mount.Screw, r.Mount.Basis)
	}
}

func TestDefaultRodIsThinAndLoadsLittle(t *testing.T) {
	// The largest rod that fits put a Ø35 mm PTFE rod inside the 2.4 GHz
	// demo (27 % estimated shift, see TestRodLoadingEstimate). The default
	// must now be the thinnest section that carries the coil, a tube where
	// one is stocked, with its mount sized to its mass.
	for _, demo := range []string{"demo-2g4-cylinder.toml", "demo-5g8-cone.toml"} {
		t.Run(demo, func(t *testing.T) {
			d := demoDesign(t, demo, nil)
			dc, err := NewDowelCut(d)
			if err != nil {
				t.Fatal(err)
			}
			r := dc.Rod
			if r.OuterMM > math.Max(DowelDiametersMM()[0], r.LengthMM/MaxRodSlenderness)+8 {
				t.Errorf("rod Ø%.1f mm for a %.0f mm length", r.OuterMM, r.LengthMM)
			}
			if r.Loading.ShiftFraction > 0.05 {
				t.Errorf("estimated shift %.1f %%", 100*r.Loading.ShiftFraction)
			}
			if len(r.Material.Tubes) > 0 {
				for _, tb := range r.Material.Tubes {
					if tb[0] == r.OuterMM && !r.Tube() {
						t.Errorf("a Ø%g/%g tube is stocked; chose a solid rod", tb[0], tb[1])
					}
				}
			}
			// The largest stock rod that fits, as chosen before.
			room := dc.InnerTurnMM - 2*dc.ClearanceMM
			largest := 0.0
			for _, od := range DowelDiametersMM() {
				if od <= room {
					largest = od
				}
			}
			old := EstimateRodLoading(largest, 0, 2*smallestTurnRadius(d.Coil), r.Material.Permittivity)
			if largest > r.OuterMM && r.Loading.ShiftFraction > old.ShiftFraction/2 {
				t.Errorf("shift %.2f %%, the largest rod's %.2f %%", 100*r.Loading.ShiftFraction, 100*old.ShiftFraction)
			}
			t.Logf("largest rod that fits: Ø%g mm, fill %.3f, shift %.2f %%", largest, old.FillRatio, 100*old.ShiftFraction)
			t.Logf("%s: Ø%g/%g mm, %.0f mm, %.1f g, fill %.4f, shift %.2f %%, mount %q", demo, r.OuterMM, r.BoreMM, r.LengthMM, r.MassG, r.Loading.FillRatio, 100*r.Loading.ShiftFraction, r.Mount.Screw)
		})
	}
}
