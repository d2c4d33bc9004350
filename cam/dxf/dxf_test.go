package dxf

import (
	"bufio"
	"bytes"
	"math"
	"os/exec"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/cam/cut"
	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// dxfPairs parses an ASCII DXF into group code/value pairs, failing on a
// malformed code line.
func dxfPairs(t *testing.T, b []byte) [][2]string {
	t.Helper()
	sc := bufio.NewScanner(bytes.NewReader(b))
	var out [][2]string
	for sc.Scan() {
		code := strings.TrimSpace(sc.Text())
		if _, err := strconv.Atoi(code); err != nil {
			t.Fatalf("bad group code line %q", sc.Text())
		}
		if !sc.Scan() {
			t.Fatalf("group code %s without a value", code)
		}
		out = append(out, [2]string{code, sc.Text()})
	}
	return out
}

func TestWriteDXF(t *testing.T) {
	for _, tc := range []struct {
		name, file string
		opt        DXFOptions
		polyline   string
	}{
		{"release 12", "plate-r12.dxf", DXFOptions{}, "POLYLINE"},
		{"release 2000", "plate-r2000.dxf", DXFOptions{Version: DXFR2000, Comments: []string{"for milling or shearing"}}, "LWPOLYLINE"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			if err := WriteDXF(&buf, fixture.Plate(), tc.opt); err != nil {
				t.Fatal(err)
			}
			fixture.Golden(t, tc.file, buf.Bytes())
			pairs := dxfPairs(t, buf.Bytes())
			if last := pairs[len(pairs)-1]; last != [2]string{"0", "EOF"} {
				t.Errorf("last pair %v, want 0/EOF", last)
			}
			count := map[string]int{}
			layers := map[string]bool{}
			inLayer := false
			for _, p := range pairs {
				if p[0] == "0" {
					count[p[1]]++
					inLayer = p[1] == "LAYER"
				}
				if p[0] == "2" && inLayer {
					layers[p[1]] = true
					inLayer = false
				}
			}
			if count["CIRCLE"] != 2 || count["ARC"] != 1 || count["LINE"] != 2 || count[tc.polyline] < 2 {
				t.Errorf("entity counts %v", count)
			}
			if !layers["CUT"] || !layers["MARK"] {
				t.Errorf("layers declared %v, want CUT and MARK", layers)
			}
			if count["SECTION"] != count["ENDSEC"] {
				t.Errorf("%d sections, %d ends", count["SECTION"], count["ENDSEC"])
			}
		})
	}
	t.Run("bad layer name", func(t *testing.T) {
		var d geom.Drawing
		d.Add("cut lines", geom.Circle{Radius: 1})
		if err := WriteDXF(&bytes.Buffer{}, d, DXFOptions{}); err == nil {
			t.Error("accepted")
		}
	})
	t.Run("numbers", func(t *testing.T) {
		for v, want := range map[float64]string{0: "0.0", -1e-12: "0.0", 25.1: "25.1", 1.0 / 3: "0.333333333", -2: "-2.0"} {
			if got := dxfNum(v); got != want {
				t.Errorf("dxfNum(%g) = %q, want %q", v, got, want)
			}
		}
	})
}

// ezdxfCheck loads a DXF strictly with ezdxf, audits it and prints the
// version, $INSUNITS, error and fix counts, layer names and every
// circle's radius.
const ezdxfCheck = `
import sys, ezdxf
d = ezdxf.readfile(sys.argv[1])
a = d.audit()
print(d.dxfversion, d.header.get('$INSUNITS', 0), len(a.errors), len(a.fixes))
print(' '.join(sorted(l.dxf.name for l in d.layers)))
for e in d.modelspace():
    if e.dxftype() == 'CIRCLE':
        print('CIRCLE', e.dxf.layer, repr(e.dxf.radius))
`

func TestDXFExternal(t *testing.T) {
	py := checktool.NeedPython(t, "ezdxf")
	// After a 0.2 mm kerf the 25 mm disc's path is 25.1 mm and the
	// 1.84 mm hole's 1.74 mm (half the kerf each way).
	k, err := cut.ApplyKerf(fixture.Plate(), 0.2)
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name, version, units string
		opt                  DXFOptions
	}{
		{"release 12", "AC1009", "0", DXFOptions{}},
		{"release 2000", "AC1015", "4", DXFOptions{Version: DXFR2000}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			if err := WriteDXF(&buf, k, tc.opt); err != nil {
				t.Fatal(err)
			}
			out, err := exec.Command(py, "-c", ezdxfCheck, checktool.TempFile(t, "k.dxf", buf.Bytes())).CombinedOutput()
			if err != nil {
				t.Fatalf("ezdxf: %v\n%s", err, out)
			}
			lines := strings.Split(strings.TrimSpace(string(out)), "\n")
			if f := strings.Fields(lines[0]); f[0] != tc.version || f[1] != tc.units || f[2] != "0" || f[3] != "0" {
				t.Errorf("ezdxf reports %q, want %s, $INSUNITS %s, 0 errors, 0 fixes", lines[0], tc.version, tc.units)
			}
			if !strings.Contains(lines[1], "CUT") || !strings.Contains(lines[1], "MARK") {
				t.Errorf("layers %q", lines[1])
			}
			var radii []float64
			for _, l := range lines[2:] {
				f := strings.Fields(l)
				r, err := strconv.ParseFloat(f[2], 64)
				if err != nil {
					t.Fatal(err)
				}
				radii = append(radii, r)
			}
			// Common practice (no published source): half the 0.2 mm kerf
			// outside the 25 mm outline and inside the 1.84 mm hole, as in
			// TestApplyKerf. Radius tolerance after the kerf: 1e-6 mm.
			const radiusTol = 1e-6
			if len(radii) != 2 || math.Abs(radii[0]-25.1) > radiusTol || math.Abs(radii[1]-1.74) > radiusTol {
				t.Errorf("circle radii %v, want 25.1 and 1.74", radii)
			}
		})
	}
}
