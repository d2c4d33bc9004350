package touchstone

import (
	"bufio"
	"bytes"
	"errors"
	"math/cmplx"
	"strconv"
	"strings"
	"testing"
)

// readS1P is an independent reader of the subset WriteS1P writes: "!"
// comments, one option line (frequency unit, parameter S, format RI,
// reference), then frequency/real/imaginary triples.
// Source: IBIS Open Forum, Touchstone File Format Specification v2.0, 2009.
func readS1P(t *testing.T, b []byte) (unit string, z0 float64, pts []Point) {
	t.Helper()
	sc := bufio.NewScanner(bytes.NewReader(b))
	scale := map[string]float64{"HZ": 1, "KHZ": 1e3, "MHZ": 1e6, "GHZ": 1e9}
	opt := false
	for sc.Scan() {
		line := sc.Text()
		if i := strings.IndexByte(line, '!'); i >= 0 {
			line = line[:i]
		}
		f := strings.Fields(line)
		if len(f) == 0 {
			continue
		}
		if f[0] == "#" {
			if opt {
				t.Fatal("second option line")
			}
			opt = true
			if len(f) != 6 || strings.ToUpper(f[2]) != "S" || strings.ToUpper(f[3]) != "RI" || strings.ToUpper(f[4]) != "R" {
				t.Fatalf("option line %q", line)
			}
			unit = f[1]
			var err error
			if z0, err = strconv.ParseFloat(f[5], 64); err != nil {
				t.Fatal(err)
			}
			continue
		}
		if !opt || len(f) != 3 {
			t.Fatalf("data line %q before the option line or not three numbers", line)
		}
		var v [3]float64
		for i := range v {
			var err error
			if v[i], err = strconv.ParseFloat(f[i], 64); err != nil {
				t.Fatal(err)
			}
		}
		pts = append(pts, Point{FrequencyHz: v[0] * scale[strings.ToUpper(unit)], S11: complex(v[1], v[2])})
	}
	return unit, z0, pts
}

func TestWriteS1PRoundTrip(t *testing.T) {
	in := []Point{{5367.5e6, complex(-0.25, 0.125)}, {5800e6, complex(0.1, -0.3333333333)}, {6247.5e6, 0}}
	var b bytes.Buffer
	if err := WriteS1P(&b, in, Options{Comments: []string{"test"}}); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "# MHz S RI R 50\n") || !strings.HasPrefix(b.String(), "! test\n") {
		t.Fatalf("header:\n%s", b.String())
	}
	unit, z0, out := readS1P(t, b.Bytes())
	if unit != "MHz" || z0 != 50 || len(out) != len(in) {
		t.Fatalf("read %s %g %d points", unit, z0, len(out))
	}
	for i := range in {
		// 6 decimals in MHz and 9 in S: the written precision.
		if d := out[i].FrequencyHz - in[i].FrequencyHz; d > 1 || d < -1 {
			t.Errorf("point %d frequency off by %g Hz", i, d)
		}
		if d := cmplx.Abs(out[i].S11 - in[i].S11); d > 1e-9 {
			t.Errorf("point %d S11 off by %g", i, d)
		}
	}
}

func TestWriteS1PRefuses(t *testing.T) {
	for _, tc := range []struct {
		name string
		pts  []Point
		opt  Options
	}{
		{"decreasing", []Point{{2e9, 0}, {1e9, 0}}, Options{}},
		{"zero frequency", []Point{{0, 0}}, Options{}},
		{"nan", []Point{{1e9, cmplx.NaN()}}, Options{}},
		{"bad reference", []Point{{1e9, 0}}, Options{ReferenceOhm: -50}},
		{"comment break", []Point{{1e9, 0}}, Options{Comments: []string{"a\nb"}}},
	} {
		var fe *FormatError
		if err := WriteS1P(&bytes.Buffer{}, tc.pts, tc.opt); !errors.As(err, &fe) {
			t.Errorf("%s: got %v, want a *FormatError", tc.name, err)
		}
	}
}
