package wire

import (
	"errors"
	"regexp"
	"strings"
	"testing"
)

func TestMaterialLibrary(t *testing.T) {
	// Source: the rows a maker asks for: coppers, C26000 tempers, CuZn37,
	// CuSn6, galvanised steel, stainless 304, aluminium 1350, enamelled copper.
	required := []string{
		"copper-annealed", "copper-half-hard", "copper-hard-drawn", "copper-silver-plated",
		"brass-c26000-soft", "brass-c26000-quarter-hard", "brass-c26000-half-hard", "brass-c26000-hard",
		"brass-cuzn37", "bronze-cusn6-half-hard", "bronze-cusn6-spring",
		"steel-galvanised-soft", "stainless-304-annealed", "stainless-304-spring",
		"aluminium-1350", "copper-enamelled",
	}
	for _, id := range required {
		if _, err := LookupMaterial(id); err != nil {
			t.Errorf("missing %s: %v", id, err)
		}
	}
	idForm := regexp.MustCompile(`^[a-z0-9]+(-[a-z0-9]+)*$`)
	seen := map[string]bool{}
	for _, m := range Materials() {
		t.Run(m.ID, func(t *testing.T) {
			if seen[m.ID] {
				t.Errorf("duplicate id")
			}
			seen[m.ID] = true
			if !idForm.MatchString(m.ID) {
				t.Errorf("id %q is not lowercase words joined by hyphens", m.ID)
			}
			if m.Name == "" || m.YieldBasis == "" || m.Solderability == "" {
				t.Errorf("name, yield basis or solderability missing")
			}
			if m.Source == "" || !(strings.Contains(m.Source, "ASTM") || strings.Contains(m.Source, "EN ") ||
				strings.Contains(m.Source, "from memory") || strings.Contains(m.Source, "data")) {
				t.Errorf("source %q neither cites nor says from memory", m.Source)
			}
			// Source: physical sense: E of metals is 40–250 GPa, the yield is
			// below the tensile strength, elongation is a fraction.
			if !(m.YoungsModulus >= 40000 && m.YoungsModulus <= 250000) {
				t.Errorf("E = %g MPa out of range", m.YoungsModulus)
			}
			if !(m.Yield > 0 && m.Yield < m.TensileMax && m.TensileMin <= m.TensileMax) {
				t.Errorf("yield %g, tensile %g–%g MPa inconsistent", m.Yield, m.TensileMin, m.TensileMax)
			}
			if !(m.Elongation > 0 && m.Elongation < 1) {
				t.Errorf("elongation %g is not a fraction", m.Elongation)
			}
			if err := m.FlowLaw(true).Validate(); err != nil {
				t.Error(err)
			}
		})
	}
	t.Run("flags", func(t *testing.T) {
		tests := []struct {
			id string
			c  Caution
		}{
			{"stainless-304-spring", CautionStiff},
			{"aluminium-1350", CautionSpecialFlux},
			{"copper-enamelled", CautionStripEnamel},
		}
		for _, tc := range tests {
			m, _ := LookupMaterial(tc.id)
			if !m.HasCaution(tc.c) {
				t.Errorf("%s lacks caution %s", tc.id, tc.c)
			}
		}
		if m, _ := LookupMaterial("stainless-304-annealed"); m.HasCaution(CautionStiff) {
			t.Errorf("annealed stainless flagged stiff")
		}
	})
}

func TestLookupMaterialUnknown(t *testing.T) {
	_, err := LookupMaterial("unobtainium")
	var ue *UnknownMaterialError
	if !errors.As(err, &ue) {
		t.Fatalf("err = %v, want *UnknownMaterialError", err)
	}
	if !strings.Contains(err.Error(), "copper-annealed") || !strings.Contains(err.Error(), "unobtainium") {
		t.Errorf("message %q should name the id and the valid ids", err)
	}
}

func TestMaterialsAreCopies(t *testing.T) {
	a := Materials()
	a[0].Yield = 1
	for i := range a {
		if a[i].ID == "copper-enamelled" {
			a[i].Cautions[0] = "changed"
		}
	}
	b, _ := LookupMaterial(a[0].ID)
	if b.Yield == 1 {
		t.Error("changing a returned row changed the library")
	}
	e, _ := LookupMaterial("copper-enamelled")
	if e.Cautions[0] != CautionStripEnamel {
		t.Error("changing a returned caution changed the library")
	}
}

func TestMaterialConductivity(t *testing.T) {
	// Source: IEC 60028: 100 % IACS is 1/58 Ω·mm²/m, 58.0 MS/m.
	if got := IACS(100); got != 58.0e6 {
		t.Fatalf("IACS(100) = %g S/m, want 58.0e6", got)
	}
	for _, m := range Materials() {
		// Source: physical sense: metal wire conductivities lie between
		// stainless steel (≈ 1.4 MS/m) and silver (≈ 63 MS/m).
		if !(m.Conductivity >= 1e6 && m.Conductivity <= 63e6) {
			t.Errorf("%s: conductivity %g S/m out of range", m.ID, m.Conductivity)
		}
		if s := m.ConductivitySource; s == "" || !(strings.Contains(s, "IEC") || strings.Contains(s, "ASTM") ||
			strings.Contains(s, "from memory") || strings.Contains(s, "data")) {
			t.Errorf("%s: conductivity source %q neither cites nor says from memory", m.ID, s)
		}
		if m.Magnetic != m.HasCaution(CautionRFLoss) {
			t.Errorf("%s: magnetic %v but rf-loss caution %v", m.ID, m.Magnetic, m.HasCaution(CautionRFLoss))
		}
	}
	if m, _ := LookupMaterial("copper-annealed"); m.Conductivity != 58.0e6 {
		t.Errorf("annealed copper %g S/m, want 58.0e6 (IEC 60028)", m.Conductivity)
	}
	if m, _ := LookupMaterial("steel-galvanised-soft"); !m.Magnetic {
		t.Errorf("galvanised steel not marked magnetic")
	}
}
