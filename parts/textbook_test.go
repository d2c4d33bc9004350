package parts

import (
	"math"
	"testing"
)

// firstBelow returns the first angle from the axis, in degrees, at which
// the Kraus pattern falls below level (a field ratio), stepping by 0.001°.
func firstBelow(cl, sl, n, level float64) float64 {
	for th := 0.0; th < 90; th += 0.001 {
		if KrausHelixPattern(cl, sl, n, th*math.Pi/180) < level {
			return th
		}
	}
	return math.NaN()
}

// firstNull returns the first angle from the axis, in degrees, at which
// the Kraus pattern stops falling.
func firstNull(cl, sl, n float64) float64 {
	const step = 0.001
	for th := 0.0; th < 90; th += step {
		if KrausHelixPattern(cl, sl, n, (th+step)*math.Pi/180) > KrausHelixPattern(cl, sl, n, th*math.Pi/180) {
			return th
		}
	}
	return math.NaN()
}

func TestKrausHelixPattern(t *testing.T) {
	// Source: Kraus, Marhefka & Khan, 4th ed., ex. 8-5.2: N = 16, Cλ = 1,
	// Sλ = 0.25; the empirical beamwidths are HPBW 26.0° and FNBW
	// 115°/√4 = 57.5°. The array-factor pattern is the one those empirical
	// formulas were fitted to, so its beamwidths agree with them: the
	// first null closely, the half-power width within patternHPBWTol
	// (Kraus fits 52° to measured patterns; the ideal array is wider).
	const (
		nullTolDeg     = 1.5
		patternHPBWTol = 0.15
	)
	cl, sl, n := 1.0, 0.25, 16.0
	if e := KrausHelixPattern(cl, sl, n, 0); math.Abs(e-1) > 1e-9 {
		t.Errorf("on-axis field %v, want 1 (the sin(90°/n) factor normalises it)", e)
	}
	if fn := 2 * firstNull(cl, sl, n); math.Abs(fn-57.5) > nullTolDeg {
		t.Errorf("first-null beamwidth %.2f°, want 57.5° ± %g°", fn, nullTolDeg)
	}
	if hp := 2 * firstBelow(cl, sl, n, 1/math.Sqrt2); math.Abs(hp-26)/26 > patternHPBWTol {
		t.Errorf("half-power beamwidth %.2f°, want 26° within %g %%", hp, 100*patternHPBWTol)
	}
}

func TestCircularSplit(t *testing.T) {
	// From memory: an axial ratio of 3 dB leaves the cross-polar
	// circular component 15.3 dB below the co-polar one.
	ar := math.Pow(10, 3.0/20)
	co, cross := CircularSplitDB(ar)
	if d := cross - co; math.Abs(d-15.3) > 0.05 {
		t.Errorf("co/cross separation %.3f dB at AR 3 dB, want 15.3", d)
	}
	// The two components carry all the power between them.
	if s := math.Pow(10, -co/10) + math.Pow(10, -cross/10); math.Abs(s-1) > 1e-12 {
		t.Errorf("component powers sum to %v of the total, want 1", s)
	}
	if co, cross := CircularSplitDB(1); co != 0 || !math.IsInf(cross, 1) {
		t.Errorf("circular wave: co %v, cross %v, want 0 and +Inf", co, cross)
	}
}

func TestTextbookSweepMatchesReport(t *testing.T) {
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			d, err := NewDesign(mustParse(t, demoSpec(t, demo)))
			if err != nil {
				t.Fatal(err)
			}
			f0 := d.Spec.FrequencyMHz
			pts := d.TextbookSweep([]float64{0.97 * f0, f0, 1.03 * f0})
			p := pts[1]
			// At the design frequency the curves go through the report's
			// figures: the gain estimate and the strip's expected |Γ|.
			if math.Abs(p.GainDBic-d.Estimates.Gain.Value) > 1e-9 {
				t.Errorf("gain %.4f dBic at f0, report %.4f", p.GainDBic, d.Estimates.Gain.Value)
			}
			if math.Abs(p.Reflection-d.Patterns.Wedge.Reflection) > 1e-9 {
				t.Errorf("|Γ| %.5f at f0, strip %.5f", p.Reflection, d.Patterns.Wedge.Reflection)
			}
			if math.Abs(p.AxialRatioDB-20*math.Log10(d.Estimates.AxialRatio.Value)) > 1e-9 {
				t.Errorf("axial ratio %.4f dB at f0", p.AxialRatioDB)
			}
			co, cross := p.RHCPDBic, p.LHCPDBic
			if d.Coil.Hand == LeftHand {
				co, cross = cross, co
			}
			if !(co > cross) || co > p.GainDBic {
				t.Errorf("co-polar %.2f, cross-polar %.2f, total %.2f dBic", co, cross, p.GainDBic)
			}
			// The Kraus input resistance grows with frequency (R = 140·Cλ)
			// or falls (150/√Cλ), so the match moves off its design value.
			if pts[0].Reflection == p.Reflection || pts[2].Reflection == p.Reflection {
				t.Errorf("|Γ| does not change with frequency: %v", pts)
			}
		})
	}
}

func TestTextbookPatternPeaksOnAxis(t *testing.T) {
	d, err := NewDesign(mustParse(t, demoSpec(t, "demo-2g4-cylinder.toml")))
	if err != nil {
		t.Fatal(err)
	}
	f0 := d.Spec.FrequencyMHz
	thetas := []float64{0, math.Pi / 6, math.Pi / 2, math.Pi}
	r, l := d.TextbookPattern(f0, thetas, 40)
	p := d.TextbookSweep([]float64{f0})[0]
	if math.Abs(r[0]-p.RHCPDBic) > 1e-9 || math.Abs(l[0]-p.LHCPDBic) > 1e-9 {
		t.Errorf("on-axis levels %.3f/%.3f, sweep %.3f/%.3f", r[0], l[0], p.RHCPDBic, p.LHCPDBic)
	}
	for i := range thetas {
		if r[i] > r[0]+1e-9 || r[i] < r[0]-40-1e-9 {
			t.Errorf("RHCP %.2f dBic at %.0f°, outside peak %.2f and floor", r[i], thetas[i]*180/math.Pi, r[0])
		}
	}
}
