package parts

import (
	"strings"
	"testing"

	"coilwright/parts/spec"
	"coilwright/parts/wire"
)

// FuzzCalibrationIntoSpec parses a calibration file, attaches it to a
// spec for the same material and designs the coil: an attached
// calibration must give a design, and nothing may panic or hang.
func FuzzCalibrationIntoSpec(f *testing.F) {
	m, _ := wire.LookupMaterial("copper-annealed")
	cal, err := wire.Calibrate(m, 1.6, 0, false, []wire.CalibrationPoint{{FormerDiameter: 16.6, RelaxedDiameter: 16.9}})
	if err != nil {
		f.Fatal(err)
	}
	b, err := wire.MarshalCalibration(cal)
	if err != nil {
		f.Fatal(err)
	}
	f.Add(b)
	f.Add([]byte(strings.Replace(string(b), "effective_yield_mpa = ", "effective_yield_mpa = 1e25 #", 1)))
	f.Add([]byte("material = \"copper-annealed\"\nwire_diameter_mm = 1.6\neffective_yield_mpa = 4999.0\nlibrary_yield_mpa = 69.0\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		c, err := wire.ParseCalibration(data)
		if err != nil {
			return
		}
		src := strings.Replace(base, `material = "copper-annealed"`, "material = \""+c.Material+"\"\ncalibration = \"c.toml\"", 1)
		if c.Hardening {
			src = strings.Replace(src, "diameter_mm = 1.6", "diameter_mm = 1.6\nspringback_model = \"hardening\"", 1)
		}
		s, err := spec.ParseSpec([]byte(src))
		if err != nil {
			return // a material this spec cannot wind without calibration
		}
		if err := s.AttachCalibration(c); err != nil {
			return
		}
		if _, err := NewDesign(s); err != nil {
			t.Fatalf("calibration attached but no design: %v", err)
		}
	})
}
