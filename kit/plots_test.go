package kit

import (
	"bytes"
	"encoding/xml"
	"math"
	"strconv"
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// svgNode is any SVG element read back from a plot.
type svgNode struct {
	XMLName  xml.Name
	Attrs    []xml.Attr `xml:",any,attr"`
	Children []svgNode  `xml:",any"`
	Text     string     `xml:",chardata"`
}

func (n svgNode) attr(name string) string {
	for _, a := range n.Attrs {
		if a.Name.Local == name {
			return a.Value
		}
	}
	return ""
}

func (n svgNode) num(t *testing.T, name string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(n.attr(name), 64)
	if err != nil {
		t.Fatalf("<%s class=%q> %s=%q: %v", n.XMLName.Local, n.attr("class"), name, n.attr(name), err)
	}
	return v
}

// all returns every element under n (n included) whose class is cls.
func (n svgNode) all(cls string) []svgNode {
	var out []svgNode
	if n.attr("class") == cls {
		out = append(out, n)
	}
	for _, c := range n.Children {
		out = append(out, c.all(cls)...)
	}
	return out
}

// texts returns the data-text of every element of class cls.
func (n svgNode) texts(cls string) []string {
	var out []string
	for _, e := range n.all(cls) {
		out = append(out, e.attr("data-text"))
	}
	return out
}

func parsePlot(t *testing.T, b []byte) svgNode {
	t.Helper()
	var n svgNode
	if err := xml.NewDecoder(bytes.NewReader(b)).Decode(&n); err != nil {
		t.Fatalf("plot is not well-formed XML: %v", err)
	}
	return n
}

// plotCoordTol is the largest difference in mm between a coordinate read
// back and the one expected: plots write coordinates to 0.01 mm.
const plotCoordTol = 0.006

// planPlots returns the demo's plots by file name.
func planPlots(t *testing.T, demo string) (*Kit, map[string][]byte, []string) {
	t.Helper()
	k := demoKit(t, demo, Options{Version: "test"})
	ps, err := k.plots()
	if err != nil {
		t.Fatal(err)
	}
	m := map[string][]byte{}
	var names []string
	for _, p := range ps {
		m[p.Name] = p.SVG
		names = append(names, p.Name)
	}
	return k, m, names
}

func TestPlotFiles(t *testing.T) {
	for demo, want := range map[string]string{
		// One kit: no nested sheets.
		"demo-2g4-cylinder.toml": "plot-match.svg plot-gain.svg plot-pattern-1.svg plot-pattern-2.svg plot-side.svg plot-plan.svg plot-reflector.svg plot-wedge.svg",
		// A batch of six adds each part's nested sheet.
		"demo-5g8-cone.toml": "plot-match.svg plot-gain.svg plot-pattern-1.svg plot-pattern-2.svg plot-side.svg plot-plan.svg plot-reflector.svg plot-wedge.svg plot-panel-reflector.svg plot-panel-wedge.svg",
	} {
		t.Run(demo, func(t *testing.T) {
			_, _, names := planPlots(t, demo)
			if got := strings.Join(names, " "); got != want {
				t.Errorf("plots %s\nwant  %s", got, want)
			}
		})
	}
}

func TestMatchPlotCoordinates(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			k, m, _ := planPlots(t, demo)
			doc := parsePlot(t, m["plot-match.svg"])
			e := k.electrical()
			areas := doc.all("plot-area")
			if len(areas) != 1 {
				t.Fatalf("%d plot areas, want 1", len(areas))
			}
			a := areas[0]
			ax, ay, aw, ah := a.num(t, "x"), a.num(t, "y"), a.num(t, "width"), a.num(t, "height")
			// The chart's mapping written out again: the plot range across,
			// VSWR 1 to matchVSWRMax up.
			xAt := func(f float64) float64 { return ax + (f-e.LowMHz)/(e.HighMHz-e.LowMHz)*aw }
			yAt := func(v float64) float64 { return ay + ah - (v-1)/(matchVSWRMax-1)*ah }
			near := func(what string, got, want float64) {
				t.Helper()
				if math.Abs(got-want) > plotCoordTol {
					t.Errorf("%s at %.3f mm, want %.3f", what, got, want)
				}
			}
			b := *k.Design.Spec.BandLowMHz
			h := *k.Design.Spec.BandHighMHz
			edges := doc.all("band-edge")
			if len(edges) != 2 {
				t.Fatalf("%d band edges, want 2", len(edges))
			}
			near("low band edge", edges[0].num(t, "x1"), xAt(b))
			near("high band edge", edges[1].num(t, "x1"), xAt(h))
			bands := doc.all("band")
			if len(bands) != 1 || bands[0].attr("data-low-mhz") != strconv.FormatFloat(b, 'f', -1, 64) {
				t.Fatalf("band rect %v", bands)
			}
			near("band shading start", bands[0].num(t, "x"), xAt(b))
			// The target is the VSWR the strip is sized for, [wedge]
			// max_vswr (1.5 by default in both demos), drawn at its value
			// on the VSWR axis.
			target := doc.all("target")
			if len(target) != 1 {
				t.Fatalf("%d target lines, want 1", len(target))
			}
			want := k.Design.Spec.Wedge.MaxVSWR
			near("target line", target[0].num(t, "y1"), yAt(want))
			if math.Abs(e.TargetVSWR-want) > 1e-9 || want != 1.5 {
				t.Errorf("target VSWR %.4f, want the spec's max_vswr %.4f (1.5 in the demos)", e.TargetVSWR, want)
			}
			for cls, want := range map[string]string{"axis-label y": "VSWR", "axis-label y2": "Return loss (dB)", "axis-label x": "Frequency (MHz)"} {
				if got := doc.texts(cls); len(got) != 1 || got[0] != want {
					t.Errorf("%s %q, want %q", cls, got, want)
				}
			}
			// Both demos run the field solution: the curves are its sweep,
			// point for point, and the note names the model.
			f := k.Design.Field
			if f == nil {
				t.Fatal("the demo ran no field solution")
			}
			if got := doc.texts("note"); len(got) != 1 || got[0] != "Field solution (method of moments, plate reflector model, "+strconv.Itoa(f.Unknowns)+" unknowns)" {
				t.Errorf("note %q does not name the field solution and its model", got)
			}
			var vswr svgNode
			for _, s := range doc.all("series") {
				if s.attr("data-name") == "VSWR" {
					vswr = s
				}
			}
			pts := pathPoints(t, vswr.attr("d"))
			if len(pts) != len(f.Points) {
				t.Fatalf("VSWR curve has %d points, the sweep %d", len(pts), len(f.Points))
			}
			for i, p := range f.Points {
				near("VSWR curve x", pts[i][0], xAt(p.FrequencyMHz))
				near("VSWR curve y", pts[i][1], yAt(p.VSWR))
			}
		})
	}
}

// pathPoints reads the vertices of an SVG path written as M/L commands.
func pathPoints(t *testing.T, d string) [][2]float64 {
	t.Helper()
	f := strings.FieldsFunc(d, func(r rune) bool { return r == 'M' || r == 'L' || r == ' ' })
	if len(f)%2 != 0 {
		t.Fatalf("path %q has an odd number of coordinates", d)
	}
	var out [][2]float64
	for i := 0; i < len(f); i += 2 {
		x, err1 := strconv.ParseFloat(f[i], 64)
		y, err2 := strconv.ParseFloat(f[i+1], 64)
		if err1 != nil || err2 != nil {
			t.Fatalf("path %q: %v %v", d, err1, err2)
		}
		out = append(out, [2]float64{x, y})
	}
	return out
}

// TestPlotsWithoutFieldSolution holds that a spec turning the solver off
// draws the textbook estimates, labelled as such, and that the gain plot
// and the pattern cuts follow the field solution when it ran.
func TestPlotsWithoutFieldSolution(t *testing.T) {
	b, _ := templates.Demo("demo-5g8-cone.toml")
	b = append(append([]byte{}, b...), "\n[solver]\nenabled = false\n"...)
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	k, err := New(Source{Name: "off", Bytes: b, Spec: s}, Options{Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	if k.Design.Field != nil {
		t.Fatal("the solver ran though the spec turns it off")
	}
	ps, err := k.plots()
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range ps[:4] { // match, gain, two pattern cuts
		doc := parsePlot(t, p.SVG)
		if got := doc.texts("note"); len(got) != 1 || !strings.HasPrefix(got[0], "Textbook estimate") {
			t.Errorf("%s: note %q does not say the curves are textbook estimates", p.Name, got)
		}
		if !strings.Contains(strings.ToLower(p.Caption), "textbook estimate") {
			t.Errorf("%s: caption %q does not say textbook", p.Name, p.Caption)
		}
	}
	if got := strings.Join(k.reportSectionTitles(), "|"); strings.Contains(got, fieldSectionTitle) {
		t.Errorf("report sections %q include the field solution, which did not run", got)
	}
	if e := k.electrical(); len(e.FreqMHz) != sweepPoints || !e.Estimate {
		t.Errorf("textbook curves: %d points, estimate %v", len(e.FreqMHz), e.Estimate)
	}

	if c := bandFigure(k.electrical()).Caption; !strings.Contains(c, "(textbook estimate)") {
		t.Errorf("band figure caption %q does not say textbook estimate", c)
	}

	// With the solver on, the gain curves, the cuts and the build sheet's
	// band figure are the solution's.
	on := demoKit(t, "demo-5g8-cone.toml", Options{Version: "test"})
	f := on.Design.Field
	e := on.electrical()
	fig := bandFigure(e)
	if !strings.Contains(fig.Caption, "(field solution, plate reflector model)") {
		t.Errorf("band figure caption %q does not name the field solution", fig.Caption)
	}
	if curve := fig.Paths[len(fig.Paths)-1].Points; len(curve) != len(f.Points) {
		t.Errorf("band figure curve has %d points, the sweep %d", len(curve), len(f.Points))
	} else {
		for i, p := range f.Points {
			// The figure's own mapping: VSWR 1 to bandFigVSWRMax over its height.
			if want := (math.Min(p.VSWR, bandFigVSWRMax) - 1) / (bandFigVSWRMax - 1) * bandFigH; math.Abs(curve[i].Y-want) > 1e-9 {
				t.Errorf("band figure point %d at %.4f, want %.4f", i, curve[i].Y, want)
			}
		}
	}
	if e.Estimate || len(e.RHCPDBic) != len(f.Points) {
		t.Fatalf("field curves: estimate %v, %d points", e.Estimate, len(e.RHCPDBic))
	}
	for i, p := range f.Points {
		if e.RHCPDBic[i] != p.AxisRHCPDBic || e.LHCPDBic[i] != p.AxisLHCPDBic || e.AxialRatioDB[i] != p.AxialRatioDB {
			t.Errorf("point %d: gain curves differ from the sweep", i)
		}
	}
	if len(e.Cuts) != len(f.Cuts) || e.CentreMHz != f.Centre.FrequencyMHz {
		t.Fatalf("%d cuts at %v MHz, the solution has %d at %v", len(e.Cuts), e.CentreMHz, len(f.Cuts), f.Centre.FrequencyMHz)
	}
	for i, c := range f.Cuts {
		for j, smp := range c.Samples {
			if e.Cuts[i].RHCPDBic[j] != smp.RHCPDBic || math.Abs(e.Cuts[i].AngleRad[j]-smp.ThetaDeg*math.Pi/180) > 1e-12 {
				t.Fatalf("cut %d sample %d differs from the solution", i, j)
			}
		}
	}
}

func TestGainAndPatternPlots(t *testing.T) {
	k, m, _ := planPlots(t, "demo-2g4-cylinder.toml")
	gain := parsePlot(t, m["plot-gain.svg"])
	styles := map[string]string{}
	for _, s := range gain.all("series") {
		styles[s.attr("data-name")] = s.attr("data-style") + " " + s.attr("stroke-dasharray")
	}
	if styles["RHCP"] == "" || styles["LHCP"] == "" || styles["RHCP"] == styles["LHCP"] || styles["Axial ratio"] == "" {
		t.Errorf("series styles %q: RHCP and LHCP must differ by dash as well as colour", styles)
	}
	if got := strings.Join(gain.texts("axis-label y"), "|"); got != "Gain (dBic)|Axial ratio (dB)" {
		t.Errorf("value axes %q", got)
	}
	// The textbook curves at the design frequency are the report's: the
	// LHCP coil's co-polar component is LHCP.
	p := k.Design.TextbookSweep([]float64{k.Design.Spec.FrequencyMHz})[0]
	if k.Design.Coil.Hand != parts.LeftHand || !(p.LHCPDBic > p.RHCPDBic) {
		t.Errorf("%s coil: RHCP %.1f, LHCP %.1f dBic", k.Design.Coil.Hand, p.RHCPDBic, p.LHCPDBic)
	}
	for _, name := range []string{"plot-pattern-1.svg", "plot-pattern-2.svg"} {
		doc := parsePlot(t, m[name])
		traces := doc.all("trace")
		if len(traces) != 2 || traces[0].attr("data-name") != "RHCP" || traces[1].attr("data-name") != "LHCP" || traces[0].attr("data-style") == traces[1].attr("data-style") {
			t.Errorf("%s: traces %v", name, traces)
		}
		rings := doc.texts("ring-label")
		if len(rings) < 4 || !strings.HasSuffix(rings[0], "dBic") {
			t.Errorf("%s: ring labels %q", name, rings)
		}
	}
	for _, name := range []string{"plot-side.svg", "plot-plan.svg", "plot-reflector.svg", "plot-wedge.svg"} {
		doc := parsePlot(t, m[name])
		if got := doc.texts("scale-note"); len(got) != 1 || !strings.HasPrefix(got[0], "Scale ") {
			t.Errorf("%s: scale note %q", name, got)
		}
	}
}

func TestMatchedBand(t *testing.T) {
	// A made-up V-shaped VSWR: 1 at 100 MHz, rising 0.1 per MHz; the
	// target 2 is crossed at 90 and 110 MHz.
	e := &electrical{TargetVSWR: 2}
	for f := 80.0; f <= 120; f += 4 {
		e.FreqMHz = append(e.FreqMHz, f)
		e.VSWR = append(e.VSWR, 1+0.1*math.Abs(f-100))
	}
	lo, hi, ok := e.matchedBand(100)
	if !ok || math.Abs(lo-90) > 1e-9 || math.Abs(hi-110) > 1e-9 {
		t.Errorf("matched band %v–%v (%v), want 90–110", lo, hi, ok)
	}
	e.TargetVSWR = 0.5
	if _, _, ok := e.matchedBand(100); ok {
		t.Error("a target below the best VSWR still gives a matched band")
	}
}
