package spec

import (
	"strings"
	"testing"
)

func TestSheetMaterialConductivity(t *testing.T) {
	for _, m := range SheetMaterials() {
		// Source: physical sense: sheet metals lie between steel (≈ 5 MS/m)
		// and copper (58 MS/m, IEC 60028).
		if !(m.Conductivity >= 1e6 && m.Conductivity <= 58.0e6) {
			t.Errorf("%s: conductivity %g S/m out of range", m.ID, m.Conductivity)
		}
		if s := m.ConductivitySource; !(strings.Contains(s, "IEC") || strings.Contains(s, "from memory")) {
			t.Errorf("%s: conductivity source %q neither cites nor says from memory", m.ID, s)
		}
	}
}
