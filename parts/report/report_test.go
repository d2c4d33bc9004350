package report

import (
	"coilwright/parts/spec/spectest"
	"encoding/json"
	"math"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/designtest"
	"coilwright/parts/spec"
	"coilwright/parts/wire"
	"coilwright/templates"
)

var mustDesign = designtest.MustDesign

var specText = spectest.SpecText

const (
	cylinder5800    = spectest.Cylinder5800
	coneSpacing5800 = spectest.ConeSpacing5800
)

func TestReportFromDemo(t *testing.T) {
	b, ok := templates.Demo("demo-5g8-cone.toml")
	if !ok {
		t.Fatal("no demo demo-5g8-cone.toml")
	}
	r := New(mustDesign(t, string(b)))
	j, err := json.Marshal(r)
	if err != nil {
		t.Fatal(err)
	}
	// The demo's [reflector] is a 50 mm disc.
	for _, key := range []string{`"reflector":{"shape":"disc","diameter_mm":50`, `"wedge":{`, `"widths":[{"s_mm":0`} {
		if !strings.Contains(string(j), key) {
			t.Errorf("design.json lacks %s", key)
		}
	}
}

func TestReportWithoutPlate(t *testing.T) {
	// A 20 mm disc cannot hold a Ø 3.68 mm feed hole 8.75 mm from its
	// centre with 1 mm of web: the design stands without a plate, and so
	// does the report.
	text := strings.Replace(specText(5800, coneSpacing5800+"\nfeed = \"periphery\"", "material = \"copper-annealed\"\ndiameter_mm = 1.6"), "diameter_mm = 120.0", "diameter_mm = 20.0", 1)
	d := mustDesign(t, text)
	if d.Patterns.Reflector != nil {
		t.Fatal("a 20 mm plate holds the feed")
	}
	if r := New(d); r.Reflector != nil || r.Wedge == nil {
		t.Errorf("report reflector %v, wedge %v", r.Reflector, r.Wedge)
	}
}

func TestKlopfensteinWedge(t *testing.T) {
	d := mustDesign(t, specText(5800, coneSpacing5800, "material = \"copper-annealed\"\ndiameter_mm = 1.6")+"\n[wedge]\ntaper = \"klopfenstein\"\nripple = 0.05\n")
	r := New(d)
	// Source: Pozar §5.9, A = acosh(Γ0/Γm) with Γ0 = ½·ln(ZL/50).
	want := math.Acosh(math.Log(d.Patterns.WedgeLoadOhm/50) / 2 / 0.05)
	if r.Wedge == nil || math.Abs(r.Wedge.KlopfensteinA-want) > 1e-12 || r.Wedge.Taper != "klopfenstein" {
		t.Fatalf("wedge report %+v, want A = %g", r.Wedge, want)
	}
	// The profile steps by Γm in ln Z at the feed end, so the first
	// station asks for 50·e^0.05 Ω.
	if got := d.Patterns.Wedge.Stations[0].TargetOhm; math.Abs(got-50*math.Exp(0.05)) > 1e-3 {
		t.Errorf("feed station target %.4f Ω, want %.4f", got, 50*math.Exp(0.05))
	}
}

func TestReportWireCalibration(t *testing.T) {
	text := specText(5800, cylinder5800, `material = "brass-c26000-half-hard"
diameter_mm = 1.6
calibration = "batch.toml"`)
	m, _ := wire.LookupMaterial("brass-c26000-half-hard")
	cal, err := wire.Calibrate(m, 1.6, 1.6, false, []wire.CalibrationPoint{{FormerDiameter: 16.6, RelaxedDiameter: 18.2}})
	if err != nil {
		t.Fatal(err)
	}
	s, err := spec.ParseSpec([]byte(text))
	if err != nil {
		t.Fatal(err)
	}
	if err := s.AttachCalibration(cal); err != nil {
		t.Fatal(err)
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	r := New(d)
	if !r.Wire.Calibrated || r.Wire.Calibration != "batch.toml" || r.Wire.YieldMPa != cal.EffectiveYield {
		t.Errorf("report wire %+v", r.Wire)
	}
}

func TestReportWireFields(t *testing.T) {
	d := mustDesign(t, specText(5800, coneSpacing5800, `material = "copper-annealed"
diameter_mm = 1.6
inspection_tolerance_mm = 0.3`))
	b, err := json.Marshal(New(d))
	if err != nil {
		t.Fatal(err)
	}
	var r struct {
		Wire struct {
			Material   string  `json:"material"`
			DiameterMM float64 `json:"diameter_mm"`
		} `json:"wire"`
		Turns []map[string]float64 `json:"turns"`
	}
	if err := json.Unmarshal(b, &r); err != nil {
		t.Fatal(err)
	}
	if r.Wire.Material != "copper-annealed" || r.Wire.DiameterMM != 1.6 {
		t.Errorf("wire = %+v", r.Wire)
	}
	for _, tr := range r.Turns {
		for _, k := range []string{"target_diameter_mm", "former_diameter_mm", "springback_mm", "tolerance_mm", "predicted_diameter_mm"} {
			if _, ok := tr[k]; !ok {
				t.Errorf("turn lacks %s", k)
			}
		}
		if tr["tolerance_mm"] != 0.3 || !(tr["former_diameter_mm"] < tr["target_diameter_mm"]) {
			t.Errorf("turn %v", tr)
		}
	}
}
