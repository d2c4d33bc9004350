package flat

import (
	"math"
	"testing"

	"coilwright/cam/geom"
	"coilwright/parts/line"
)

// helixPath returns a right-hand helix of radius r whose centreline starts
// at height z0 and rises rise mm per quarter turn.
func helixPath(r, z0, rise float64) func(float64) geom.Vec3 {
	return func(phi float64) geom.Vec3 {
		return geom.Vec3{X: r * math.Cos(phi), Y: r * math.Sin(phi), Z: z0 + rise*phi/(math.Pi/2)}
	}
}

// demoWedge is a 5.8 GHz wedge: λ = 51.6884 mm (c/f), helix
// circumference one wavelength, 1 mm wire, 0.2 mm sheet, strip 1 mm above
// the reflector at the feed, a quarter-turn rise of a 12.5° helix
// (Sλ = tan 12.5° = 0.2217) and a 140 Ω load (Kraus axial feed, Cλ = 1).
func demoWedge(t *testing.T, kind line.TaperKind) *Wedge {
	t.Helper()
	const lambda = 51.6884
	r := lambda / (2 * math.Pi)
	w, err := NewWedge(WedgeInput{
		Path:         helixPath(r, 1+0.5+0.2, 0.2217*lambda/4),
		WireDiameter: 1,
		Thickness:    0.2,
		Wavelength:   lambda,
		Taper:        line.Taper{Kind: kind, Z0: 50, ZL: 140, GammaMax: 0.05},
	})
	if err != nil {
		t.Fatal(err)
	}
	return w
}

func TestWedgeWidthTable(t *testing.T) {
	w := demoWedge(t, line.TaperExponential)
	// ohmTol is the tolerance in ohms between the taper and the cut widths.
	const ohmTol = 1e-6
	for _, st := range w.Stations {
		if !st.Clamped && math.Abs(st.Ohm-st.TargetOhm) > ohmTol {
			t.Errorf("s = %.2f mm: width %.4f mm gives %.6f Ω, taper asks %.6f Ω", st.S, st.Width, st.Ohm, st.TargetOhm)
		}
	}
	if first := w.Stations[0]; math.Abs(first.Ohm-50) > ohmTol || math.Abs(first.Height-1) > 1e-9 {
		t.Errorf("feed station %+v, want 50 Ω at 1 mm", first)
	}
	t.Run("impedance rises towards the coil", func(t *testing.T) {
		for i := 1; i < len(w.Stations); i++ {
			if w.Stations[i].Ohm <= w.Stations[i-1].Ohm {
				t.Errorf("impedance falls at s = %.2f mm", w.Stations[i].S)
			}
		}
	})
	t.Run("common practice size", func(t *testing.T) {
		// Common practice (no published source): a 5.8 GHz wedge is about
		// 10 mm long and about 5 mm wide at the feed end; loose ±40 % check.
		const loose = 0.4
		if math.Abs(w.Length/10-1) > loose {
			t.Errorf("length %.2f mm, expected about 10 mm", w.Length)
		}
		if math.Abs(w.FeedWidth/5-1) > loose {
			t.Errorf("feed width %.2f mm, expected about 5 mm", w.FeedWidth)
		}
		t.Logf("length %.2f mm, feed width %.3f mm, end width %.3f mm, |Γ| = %.3f (βℓ = %.3f)", w.Length, w.FeedWidth, w.EndWidth, w.Reflection, w.ElectricalLength)
	})
}

func TestWedgeResidualMatchesClosedForm(t *testing.T) {
	// With every width cut as asked, the strip is an exact exponential taper,
	// so the estimate must equal Pozar's closed form (Microwave Engineering,
	// 4th ed., §5.9) for the same βℓ.
	w := demoWedge(t, line.TaperExponential)
	for _, st := range w.Stations {
		if st.Clamped {
			t.Skip("demo wedge clamps a width; closed form does not apply")
		}
	}
	const gTol = 5e-3
	want := line.ExponentialReflection(50, 140, w.ElectricalLength)
	if math.Abs(w.Reflection-want) > gTol {
		t.Errorf("|Γ| = %.4f, closed form %.4f", w.Reflection, want)
	}
}

func TestWedgeFlatPattern(t *testing.T) {
	t.Run("flat helix unrolls to its arc", func(t *testing.T) {
		// A strip at constant height follows a circle of the helix radius:
		// every centreline point lies r from the circle's centre (0, r).
		const r = 10.0
		w, err := NewWedge(WedgeInput{
			Path: helixPath(r, 2, 0), WireDiameter: 1, Thickness: 0.1, Wavelength: 100,
			Taper: line.Taper{Kind: line.TaperExponential, Z0: 50, ZL: 100},
		})
		if err != nil {
			t.Fatal(err)
		}
		n := len(w.Stations)
		const posTol = 1e-4
		for i := range n {
			a, b := w.Outline.Vertices[i].P, w.Outline.Vertices[2*n-1-i].P
			mid := a.Add(b).Scale(0.5)
			if d := mid.Sub(geom.Vec2{X: 0, Y: r}).Len(); math.Abs(d-r) > posTol {
				t.Fatalf("station %d centre %.6f mm from the arc centre, want %g", i, d, r)
			}
			if wd := a.Sub(b).Len(); math.Abs(wd-w.Stations[i].Width) > 1e-9 {
				t.Fatalf("station %d width %.6f, table %.6f", i, wd, w.Stations[i].Width)
			}
		}
		if math.Abs(w.Length-r*math.Pi/2) > 1e-3 {
			t.Errorf("length %.5f mm, want %.5f", w.Length, r*math.Pi/2)
		}
	})
	t.Run("area equals the integral of width", func(t *testing.T) {
		w := demoWedge(t, line.TaperKlopfenstein)
		var integral float64
		for i := 1; i < len(w.Stations); i++ {
			a, b := w.Stations[i-1], w.Stations[i]
			integral += (a.Width + b.Width) / 2 * (b.S - a.S)
		}
		area := geom.Polyline(w.Outline.Flatten(1)).Area()
		if area <= 0 || math.Abs(area/integral-1) > 0.01 {
			t.Errorf("outline area %.4f mm², ∫w ds = %.4f mm²", area, integral)
		}
	})
}

func TestWedgeRejects(t *testing.T) {
	base := WedgeInput{
		Path: helixPath(8, 1.7, 2.8), WireDiameter: 1, Thickness: 0.2, Wavelength: 51.7,
		Taper: line.Taper{Kind: line.TaperExponential, Z0: 50, ZL: 140},
	}
	tests := []struct {
		name string
		edit func(*WedgeInput)
	}{
		{"strip on the reflector", func(in *WedgeInput) { in.Path = helixPath(8, 0.6, 2.8) }},
		{"no path", func(in *WedgeInput) { in.Path = nil }},
		{"no thickness", func(in *WedgeInput) { in.Thickness = 0 }},
		{"bad taper", func(in *WedgeInput) { in.Taper.ZL = -1 }},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			in := base
			tc.edit(&in)
			if _, err := NewWedge(in); err == nil {
				t.Error("accepted")
			}
		})
	}
}
