package main

import (
	"bytes"
	"encoding/json"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	designreport "coilwright/parts/report"
	"coilwright/templates"
)

func readReport(t *testing.T, dir string) designreport.Report {
	t.Helper()
	b, err := os.ReadFile(filepath.Join(dir, "design.json"))
	if err != nil {
		t.Fatal(err)
	}
	var r designreport.Report
	if err := json.Unmarshal(b, &r); err != nil {
		t.Fatal(err)
	}
	return r
}

func TestPatternOutputs(t *testing.T) {
	for _, tc := range []struct {
		demo   string
		panels bool
	}{
		{"demo-5g8-cone.toml", true},      // quantity 6
		{"demo-2g4-cylinder.toml", false}, // quantity 1
	} {
		t.Run(tc.demo, func(t *testing.T) {
			dir := t.TempDir()
			buildDemo(t, tc.demo, dir)
			for _, name := range []string{"reflector.dxf", "reflector.svg", "wedge.dxf", "wedge.svg", "templates.pdf"} {
				if _, err := os.Stat(filepath.Join(dir, name)); err != nil {
					t.Errorf("missing %s", name)
				}
			}
			for _, name := range []string{"panel-reflector.dxf", "panel-reflector.svg", "panel-wedge.dxf", "panel-wedge.svg"} {
				if _, err := os.Stat(filepath.Join(dir, name)); (err == nil) != tc.panels {
					t.Errorf("%s present = %v, want %v", name, err == nil, tc.panels)
				}
			}
			r := readReport(t, dir)
			if r.Reflector == nil || r.Wedge == nil || len(r.Wedge.Widths) < 2 {
				t.Fatalf("design.json lacks the reflector or wedge: %+v %+v", r.Reflector, r.Wedge)
			}
			if r.Reflector.DiameterMM == nil && r.Reflector.SideMM == nil {
				t.Error("reflector has no size")
			}
			for _, p := range []*designreport.PanelReport{r.Reflector.Panel, r.Wedge.Panel} {
				if p == nil || p.PartsPerSheet < 1 || p.Sheets != (r.Quantity+p.PartsPerSheet-1)/p.PartsPerSheet {
					t.Errorf("panel %+v for %d parts", p, r.Quantity)
				}
			}
		})
	}
}

// ezdxfScript loads each DXF strictly, audits it, and prints its name,
// error and fix counts, layers and the first circle's radius.
const ezdxfScript = `
import sys, ezdxf
for f in sys.argv[1:]:
    d = ezdxf.readfile(f)
    a = d.audit()
    r = [e.dxf.radius for e in d.modelspace() if e.dxftype() == 'CIRCLE' and e.dxf.layer == 'CUT']
    print(f.rsplit('/', 1)[-1], len(a.errors), len(a.fixes), ','.join(sorted(l.dxf.name for l in d.layers)), repr(r[0]) if r else '-')
`

func TestPatternFilesExternal(t *testing.T) {
	py := checktool.NeedPython(t, "ezdxf")
	rsvg := checktool.Need(t, "rsvg-convert")
	pdfinfo := checktool.Need(t, "pdfinfo")
	qpdf := checktool.Need(t, "qpdf")
	pdftotext := checktool.Need(t, "pdftotext")
	dir := t.TempDir()
	buildDemo(t, "demo-5g8-cone.toml", dir)
	r := readReport(t, dir)

	var files []string
	for _, n := range []string{"reflector.dxf", "wedge.dxf", "panel-reflector.dxf", "panel-wedge.dxf"} {
		files = append(files, filepath.Join(dir, n))
	}
	out, err := exec.Command(py, append([]string{"-c", ezdxfScript}, files...)...).CombinedOutput()
	if err != nil {
		t.Fatalf("ezdxf: %v\n%s", err, out)
	}
	for _, line := range strings.Split(strings.TrimSpace(string(out)), "\n") {
		f := strings.Fields(line)
		if f[1] != "0" || f[2] != "0" || !strings.Contains(f[3], "CUT") || !strings.Contains(f[3], "MARK") {
			t.Errorf("ezdxf: %s", line)
		}
		if f[0] == "reflector.dxf" {
			// The CUT layer is the true part: half the 50 mm diameter, with
			// no kerf offset (a CAM applying its own cutter compensation
			// would otherwise cut a disc one kerf too large).
			got, _ := strconv.ParseFloat(f[4], 64)
			if want := *r.Reflector.DiameterMM / 2; math.Abs(got-want) > 1e-6 {
				t.Errorf("disc radius %.9f mm, want %.9f", got, want)
			}
			if strings.Contains(f[3], "TOOLPATH") {
				t.Errorf("a tool path was not asked for: %s", line)
			}
		}
	}

	size := regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)
	for _, tc := range []struct {
		name string
		w, h float64 // mm
	}{
		// The printed note (one 2.5 mm line, 5 mm pitch, under the disc)
		// makes the page taller and wider than the 50 mm disc plus the
		// SVG's 2 mm margins; see TestPatternNoteAndToolPath.
		// The sheet, and under it the printed note: one 2.5 mm line at a
		// 5 mm pitch and 2.5 mm below it, 7.5 mm in all.
		{"panel-reflector.svg", r.Reflector.Panel.SheetWidthMM, r.Reflector.Panel.SheetHeightMM + 7.5},
		{"panel-wedge.svg", r.Wedge.Panel.SheetWidthMM, r.Wedge.Panel.SheetHeightMM + 7.5},
	} {
		pdf := filepath.Join(t.TempDir(), tc.name+".pdf")
		if out, err := exec.Command(rsvg, "-f", "pdf", "-o", pdf, filepath.Join(dir, tc.name)).CombinedOutput(); err != nil {
			t.Fatalf("rsvg-convert %s: %v\n%s", tc.name, err, out)
		}
		info, _ := exec.Command(pdfinfo, pdf).Output()
		m := size.FindSubmatch(info)
		if m == nil {
			t.Fatalf("%s: no page size", tc.name)
		}
		w, _ := strconv.ParseFloat(string(m[1]), 64)
		h, _ := strconv.ParseFloat(string(m[2]), 64)
		if math.Abs(w-tc.w*72/25.4) > 0.002 || math.Abs(h-tc.h*72/25.4) > 0.002 {
			t.Errorf("%s renders %.3f × %.3f pt, want %.3f × %.3f", tc.name, w, h, tc.w*72/25.4, tc.h*72/25.4)
		}
	}

	tpl := filepath.Join(dir, "templates.pdf")
	if out, err := exec.Command(qpdf, "--check", tpl).CombinedOutput(); err != nil || !bytes.Contains(out, []byte("No syntax or stream encoding errors")) {
		t.Fatalf("qpdf --check: %v\n%s", err, out)
	}
	text, _ := exec.Command(pdftotext, tpl, "-").Output()
	for _, want := range []string{"Reflector", "Matching wedge", "For milling or shearing", "50 mm: print at 100 %", "true part outline, with no kerf allowance"} {
		if !bytes.Contains(text, []byte(want)) {
			t.Errorf("templates.pdf lacks %q", want)
		}
	}
}

func TestLaserGuardLabelsFiles(t *testing.T) {
	b, ok := templates.Demo("demo-2g4-cylinder.toml")
	if !ok {
		t.Fatal("no demo")
	}
	spec := filepath.Join(t.TempDir(), "laser.toml")
	if err := os.WriteFile(spec, append(b, []byte("\n[cutting]\nmethod = \"laser\"\n")...), 0o644); err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	var stdout, stderr bytes.Buffer
	if code := run([]string{"build", spec, "-o", dir}, &stdout, &stderr); code != 0 {
		t.Fatalf("build: exit %d: %s", code, stderr.String())
	}
	for _, name := range []string{"reflector.dxf", "reflector.svg"} {
		body, err := os.ReadFile(filepath.Join(dir, name))
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Contains(body, []byte("WARNING: laser cutting was asked for a halogenated laminate")) {
			t.Errorf("%s carries no laser warning", name)
		}
	}
	warned := false
	for _, w := range readReport(t, dir).Warnings {
		warned = warned || w.Code == "laser-halogenated"
	}
	if !warned {
		t.Error("design.json has no laser-halogenated warning")
	}
}

func TestR2000Option(t *testing.T) {
	py := checktool.NeedPython(t, "ezdxf")
	b, _ := templates.Demo("demo-5g8-cone.toml")
	spec := filepath.Join(t.TempDir(), "r2000.toml")
	if err := os.WriteFile(spec, append(b, []byte("\n[cutting]\ndxf = \"R2000\"\n")...), 0o644); err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	var stdout, stderr bytes.Buffer
	if code := run([]string{"build", spec, "-o", dir}, &stdout, &stderr); code != 0 {
		t.Fatalf("build: exit %d: %s", code, stderr.String())
	}
	const script = `
import sys, ezdxf
for f in sys.argv[1:]:
    d = ezdxf.readfile(f)
    a = d.audit()
    print(d.dxfversion, d.header.get('$INSUNITS', 0), len(a.errors), len(a.fixes))
`
	out, err := exec.Command(py, "-c", script, filepath.Join(dir, "reflector.dxf"), filepath.Join(dir, "panel-wedge.dxf")).CombinedOutput()
	if err != nil {
		t.Fatalf("ezdxf: %v\n%s", err, out)
	}
	for _, line := range strings.Split(strings.TrimSpace(string(out)), "\n") {
		if line != "AC1015 4 0 0" {
			t.Errorf("ezdxf: %q, want release 2000, $INSUNITS 4, no errors or fixes", line)
		}
	}
}

// ezdxfLayers loads a DXF strictly, audits it, and prints the error and
// fix counts, then each circle as "layer radius" and each layer's entity
// count as "layer count".
const ezdxfLayers = `
import sys, ezdxf, collections
d = ezdxf.readfile(sys.argv[1])
a = d.audit()
print(len(a.errors), len(a.fixes))
n = collections.Counter()
for e in d.modelspace():
    n[e.dxf.layer] += 1
    if e.dxftype() == 'CIRCLE' and abs(e.dxf.center[0]) < 1e-9 and abs(e.dxf.center[1]) < 1e-9:
        print('circle', e.dxf.layer, repr(e.dxf.radius))
for k in sorted(n):
    print('layer', k, n[k])
`

// TestPatternNoteAndToolPath builds the 5.8 GHz demo (a 50 mm disc, 1 mm
// mill kerf) with and without the tool path and reads reflector.dxf with
// ezdxf: the CUT outline is the true 25.000 mm radius in both; with
// tool_path the TOOLPATH layer carries it at 25.5 mm (radius plus half the
// kerf); every file carries its printed note, and the SVG names the
// layers it holds.
func TestPatternNoteAndToolPath(t *testing.T) {
	py := checktool.NeedPython(t, "ezdxf")
	b, _ := templates.Demo("demo-5g8-cone.toml")
	for _, tp := range []bool{false, true} {
		spec := filepath.Join(t.TempDir(), "tp.toml")
		extra := ""
		if tp {
			extra = "\n[cutting]\ntool_path = true\n"
		}
		if err := os.WriteFile(spec, append(b, extra...), 0o644); err != nil {
			t.Fatal(err)
		}
		dir := t.TempDir()
		var stdout, stderr bytes.Buffer
		if code := run([]string{"build", spec, "-o", dir}, &stdout, &stderr); code != 0 {
			t.Fatalf("build: exit %d: %s", code, stderr.String())
		}
		kerf := readReport(t, dir).Reflector.Cutting.KerfMM
		out, err := exec.Command(py, "-c", ezdxfLayers, filepath.Join(dir, "reflector.dxf")).CombinedOutput()
		if err != nil {
			t.Fatalf("ezdxf: %v\n%s", err, out)
		}
		lines := strings.Split(strings.TrimSpace(string(out)), "\n")
		if lines[0] != "0 0" {
			t.Errorf("tool_path %v: ezdxf audit: %s", tp, lines[0])
		}
		radii := map[string][]float64{}
		counts := map[string]int{}
		for _, l := range lines[1:] {
			f := strings.Fields(l)
			switch f[0] {
			case "circle":
				r, _ := strconv.ParseFloat(f[2], 64)
				radii[f[1]] = append(radii[f[1]], r)
			case "layer":
				counts[f[1]], _ = strconv.Atoi(f[2])
			}
		}
		// Source: the demo's reflector is a 50 mm disc; the kerf of a mill
		// is 1 mm by default (design.json). Tolerance 1e-6 mm: the DXF
		// writes more digits.
		const tol = 1e-6
		if r := radii["CUT"]; len(r) == 0 || math.Abs(r[0]-25) > tol {
			t.Errorf("tool_path %v: CUT circles about the centre %v, want the disc at 25.000 mm first", tp, r)
		}
		if counts["NOTE"] == 0 {
			t.Errorf("tool_path %v: no printed note on the NOTE layer", tp)
		}
		switch r := radii["TOOLPATH"]; {
		case !tp && counts["TOOLPATH"] != 0:
			t.Errorf("TOOLPATH written without being asked for")
		case tp && (len(r) == 0 || math.Abs(r[0]-(25+kerf/2)) > tol):
			t.Errorf("TOOLPATH circles about the centre %v, want %.3f mm first", r, 25+kerf/2)
		}
		svgBody, _ := os.ReadFile(filepath.Join(dir, "reflector.svg"))
		for _, want := range []string{`<g id="NOTE"`, "Layer CUT: the true part outline"} {
			if !bytes.Contains(svgBody, []byte(want)) {
				t.Errorf("tool_path %v: reflector.svg lacks %q", tp, want)
			}
		}
		if got := bytes.Contains(svgBody, []byte(`<g id="TOOLPATH"`)); got != tp {
			t.Errorf("tool_path %v: reflector.svg TOOLPATH group present %v", tp, got)
		}
	}
}
