package kit

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"strconv"
	"strings"
	"testing"
)

// TestFieldFilesAgree writes the field outputs of the 5.8 GHz demo and
// reads them back: the Touchstone file (parsed by a small reader of its
// own, after the Touchstone 2.0 specification's version 1 syntax) must
// give the reflection sweep.csv holds, and design.json must carry the
// field block with the quoted gain.
// Source: IBIS Open Forum, Touchstone File Format Specification v2.0, 2009.
func TestFieldFilesAgree(t *testing.T) {
	k := demoKit(t, "demo-5g8-cone.toml", Options{})
	var m Memory
	if err := k.writeField(&m); err != nil {
		t.Fatal(err)
	}
	if err := k.writeDesign(&m); err != nil {
		t.Fatal(err)
	}
	s1p, ok1 := m.File("sweep.s1p")
	csvb, ok2 := m.File("sweep.csv")
	pat, ok3 := m.File("pattern.csv")
	if !ok1 || !ok2 || !ok3 {
		t.Fatalf("field files missing: %v", m.Names())
	}
	type row struct{ f, re, im float64 }
	var ts []row
	sc := bufio.NewScanner(bytes.NewReader(s1p))
	for sc.Scan() {
		line, _, _ := strings.Cut(sc.Text(), "!")
		f := strings.Fields(line)
		switch {
		case len(f) == 0:
		case f[0] == "#":
			if strings.Join(f[1:], " ") != "MHz S RI R 50" {
				t.Fatalf("option line %q", line)
			}
		default:
			var v [3]float64
			for i := range v {
				v[i], _ = strconv.ParseFloat(f[i], 64)
			}
			ts = append(ts, row{v[0], v[1], v[2]})
		}
	}
	recs, err := csv.NewReader(bytes.NewReader(csvb)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	col := map[string]int{}
	for i, h := range recs[0] {
		col[h] = i
	}
	for _, h := range []string{"frequency_mhz", "gamma_re", "gamma_im", "vswr", "realised_dbic", "axial_ratio_db"} {
		if _, ok := col[h]; !ok {
			t.Fatalf("sweep.csv has no column %s: %v", h, recs[0])
		}
	}
	if len(ts) != len(recs)-1 || len(ts) != k.Design.Spec.Solver.Points {
		t.Fatalf("%d Touchstone points, %d csv rows, %d asked", len(ts), len(recs)-1, k.Design.Spec.Solver.Points)
	}
	num := func(r []string, h string) float64 { v, _ := strconv.ParseFloat(r[col[h]], 64); return v }
	for i, r := range recs[1:] {
		p := ts[i]
		if math.Abs(p.f-num(r, "frequency_mhz")) > 1e-4 || math.Abs(p.re-num(r, "gamma_re")) > 1e-8 || math.Abs(p.im-num(r, "gamma_im")) > 1e-8 {
			t.Errorf("row %d: Touchstone %v, csv %v", i, p, r)
		}
		g := math.Hypot(p.re, p.im)
		if v := (1 + g) / (1 - g); math.Abs(v-num(r, "vswr")) > 1e-3 {
			t.Errorf("row %d: VSWR %.4f from S11, csv %s", i, v, r[col["vswr"]])
		}
	}
	if n := strings.Count(string(pat), "\n"); n != 1+2*181 {
		t.Errorf("pattern.csv has %d lines, want a header and two cuts of 181 (±180° every 2°)", n)
	}
	dj, _ := m.File("design.json")
	var rep struct {
		Quoted float64 `json:"quoted_gain_dbic"`
		Field  *struct {
			Unknowns int `json:"unknowns"`
			Centre   struct {
				Realised float64 `json:"realised_dbic"`
			} `json:"centre"`
		} `json:"field"`
		EIRP struct {
			Gain float64 `json:"gain_dbic"`
		} `json:"eirp"`
	}
	if err := json.Unmarshal(dj, &rep); err != nil {
		t.Fatal(err)
	}
	if rep.Field == nil || rep.Field.Unknowns == 0 || rep.Quoted != rep.Field.Centre.Realised || rep.EIRP.Gain != rep.Quoted {
		t.Errorf("design.json: quoted gain %.3f, field %+v, EIRP gain %.3f", rep.Quoted, rep.Field, rep.EIRP.Gain)
	}
	if md, _ := m.File("design.md"); !bytes.Contains(md, []byte("## Field solution")) || !bytes.Contains(md, []byte("No dielectrics")) {
		t.Error("design.md lacks the field solution section or its assumptions")
	}
}
