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
	"coilwright/parts"
	"coilwright/templates"
)

func readReport(t *testing.T, dir string) parts.Report {
	t.Helper()
	b, err := os.ReadFile(filepath.Join(dir, "design.json"))
	if err != nil {
		t.Fatal(err)
	}
	var r parts.Report
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
			for _, p := range []*parts.PanelReport{r.Reflector.Panel, r.Wedge.Panel} {
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
	kerf := r.Reflector.Cutting.KerfMM

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
			// The disc's cut path: half the 50 mm diameter plus half the kerf.
			got, _ := strconv.ParseFloat(f[4], 64)
			if want := *r.Reflector.DiameterMM/2 + kerf/2; math.Abs(got-want) > 1e-6 {
				t.Errorf("disc radius %.9f mm, want %.9f", got, want)
			}
		}
	}

	size := regexp.MustCompile(`Page size:\s+([0-9.]+) x ([0-9.]+) pts`)
	for _, tc := range []struct {
		name string
		w, h float64 // mm
	}{
		// Disc plus the kerf, plus the SVG's 2 mm margin each side.
		{"reflector.svg", 50 + kerf + 4, 50 + kerf + 4},
		{"panel-reflector.svg", r.Reflector.Panel.SheetWidthMM, r.Reflector.Panel.SheetHeightMM},
		{"panel-wedge.svg", r.Wedge.Panel.SheetWidthMM, r.Wedge.Panel.SheetHeightMM},
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
	for _, want := range []string{"Reflector", "Matching wedge", "For milling or shearing", "50 mm: print at 100 %"} {
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
