package tolerance

import (
	"math"
	"testing"

	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// demoDesign returns the design of an embedded demo, with extra TOML
// appended to its spec (e.g. a [tolerance] table).
func demoDesign(t testing.TB, name, extra string) *parts.Design {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	s, err := spec.ParseSpec(append(append([]byte{}, b...), "\n"+extra...))
	if err != nil {
		t.Fatalf("ParseSpec: %v", err)
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatalf("NewDesign: %v", err)
	}
	return d
}

// resonator is a stand-in for the field solver in tests of the statistics:
// a series resonance whose frequency falls as the turns grow and the coil
// rises, and whose resistance follows the strip width. Its figures are
// made up; only their smoothness and direction matter here.
type resonator struct {
	d *parts.Design
}

// resonatorQ is the stand-in's quality factor.
const resonatorQ = 10.0

func (r resonator) Evaluate(b Build) (Response, error) {
	f0 := r.d.Spec.FrequencyMHz
	shift := 0.0
	for i, dd := range b.DiameterDeltasMM {
		shift += dd / r.d.Turns[i].DiameterMM / float64(i+1)
	}
	fc := f0 * (1 - shift - 0.01*b.HeightDeltasMM[0] - 0.002*(b.HeightDeltasMM[len(b.HeightDeltasMM)-1]))
	rr := 50 * (1 + 0.5*b.StripWidthDeltaMM + 0.2*b.StripHeightDeltaMM)
	var out Response
	for k := range 7 {
		f := f0 * (0.9 + 0.2*float64(k)/6)
		x := 50 * resonatorQ * (f/fc - fc/f)
		out.FrequencyMHz = append(out.FrequencyMHz, f)
		out.Impedance = append(out.Impedance, complex(rr, x))
		out.GainDBic = append(out.GainDBic, 12-math.Abs(f-fc)/f0*10)
		out.AxialRatioDB = append(out.AxialRatioDB, 1+math.Abs(f-fc)/f0*20)
	}
	return out, nil
}
