package parts

import (
	"math"
	"testing"
)

// Tolerances for published worked examples, which print 3–4 figures.
const (
	degTol   = 0.05
	ratioTol = 1e-12
	dbTol    = 0.005
)

func TestKrausWorkedExample(t *testing.T) {
	// Source: Kraus, Marhefka & Khan, Antennas and Wave Propagation, 4th
	// ed., ex. 8-5.2: N = 16, Cλ = 1, Sλ = 0.25 gives HPBW 26.0°,
	// AR = 33/32 and D = 48 (16.8 dBi) in the 12 form.
	e := EstimateHelix(1, 0.25, 16, false)
	t.Run("half-power beamwidth", func(t *testing.T) {
		if math.Abs(e.HPBW.Value-26.0) > degTol {
			t.Errorf("HPBW = %.3f°, want 26.0°", e.HPBW.Value)
		}
	})
	t.Run("axial ratio", func(t *testing.T) {
		if math.Abs(e.AxialRatio.Value-33.0/32) > ratioTol {
			t.Errorf("AR = %v, want 33/32", e.AxialRatio.Value)
		}
	})
	t.Run("first-null beamwidth", func(t *testing.T) {
		// Source: Kraus, Antennas, 2nd ed., ch. 7: FNBW ≈ 115°/(Cλ·√(N·Sλ))
		// = 115°/√4 = 57.5° for this helix [calc].
		if math.Abs(e.FNBW.Value-57.5) > degTol {
			t.Errorf("FNBW = %.3f°, want 57.5°", e.FNBW.Value)
		}
	})
	t.Run("directivity 12 form", func(t *testing.T) {
		if d := KrausDirectivity(12, 1, 16, 0.25); math.Abs(d-48) > 1e-12 {
			t.Errorf("D = %v, want 48", d)
		}
		if math.Abs(e.Directivity12.Value-16.812) > dbTol {
			t.Errorf("D = %.3f dBi, want 16.812 (10·log10 48)", e.Directivity12.Value)
		}
	})
}

func TestKrausDirectivityTenTurns(t *testing.T) {
	// Source: Kraus, Marhefka & Khan, 4th ed., ex. 8-5.3: N = 10,
	// Sλ = 0.236, Cλ = 1 gives D = 28.3.
	if d := KrausDirectivity(12, 1, 10, 0.236); math.Abs(d-28.3) > 0.05 {
		t.Errorf("D = %.3f, want 28.3", d)
	}
}

func TestEmersonAgainstKraus(t *testing.T) {
	// Source: Emerson, ARRL Antenna Compendium vol. 4, 1995, and Kraus's
	// D ≈ 15 Cλ² N Sλ [calc]: at Lλ = 2.217 Emerson's fit gives 12.60 dBi
	// where the 15 form gives 15.22 dBi (Cλ = 1).
	if g := EmersonGain(2.217); math.Abs(g-12.60) > dbTol {
		t.Errorf("Emerson(2.217) = %.4f dBi, want 12.60", g)
	}
	if d := DBi(KrausDirectivity(15, 1, 10, 0.2217)); math.Abs(d-15.22) > dbTol {
		t.Errorf("Kraus-15 = %.4f dBi, want 15.22", d)
	}
}

func TestEstimatesChooseGain(t *testing.T) {
	t.Run("Emerson inside its range", func(t *testing.T) {
		e := EstimateHelix(1, 0.2217, 12, false) // Lλ 2.66, α 12.5°
		if e.Gain.Formula != e.Emerson.Formula || !e.Gain.InRange {
			t.Errorf("gain formula %q, want Emerson's", e.Gain.Formula)
		}
	})
	t.Run("12 form below Emerson's range", func(t *testing.T) {
		e := EstimateHelix(1, 0.2217, 5, false) // Lλ 1.1
		if e.Gain.Formula != e.Directivity12.Formula {
			t.Errorf("gain formula %q, want the 12 form", e.Gain.Formula)
		}
	})
}

func TestInputResistance(t *testing.T) {
	// Source: Kraus, Antennas, 2nd ed., ch. 7 (from memory):
	// R ≈ 140·Cλ axial feed, 150/√Cλ peripheral.
	if r := KrausInputResistance(1, false); r != 140 {
		t.Errorf("axial R(1) = %v, want 140", r)
	}
	if r := KrausInputResistance(0.81, true); math.Abs(r-150/0.9) > 1e-9 {
		t.Errorf("peripheral R(0.81) = %v, want %v", r, 150/0.9)
	}
}

func TestEIRP(t *testing.T) {
	// Source: e.i.r.p. definition, ITU Radio Regulations, Article 1:
	// EIRP(dBm) = P_tx − feeder loss + G; 14 dBm is 25.12 mW.
	if e := EIRP(14, 1, 11); e != 24 {
		t.Errorf("EIRP = %v dBm, want 24", e)
	}
	if mw := DBmToMilliwatt(14); math.Abs(mw-25.1189) > 1e-3 {
		t.Errorf("14 dBm = %v mW, want 25.1189", mw)
	}
}
