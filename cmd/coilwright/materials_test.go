package main

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"coilwright/parts/wire"
)

// runCLI runs one command line in-process and returns its exit code,
// stdout and stderr.
func runCLI(t *testing.T, args ...string) (int, string, string) {
	t.Helper()
	var out, errb bytes.Buffer
	code := run(args, &out, &errb)
	return code, out.String(), errb.String()
}

func TestMaterialsCommand(t *testing.T) {
	t.Run("table lists every id", func(t *testing.T) {
		code, out, _ := runCLI(t, "materials")
		if code != exitOK {
			t.Fatalf("exit %d", code)
		}
		for _, id := range wire.MaterialIDs() {
			if !strings.Contains(out, id) {
				t.Errorf("table lacks %s", id)
			}
		}
	})
	t.Run("json", func(t *testing.T) {
		code, out, _ := runCLI(t, "materials", "--json")
		if code != exitOK {
			t.Fatalf("exit %d", code)
		}
		var rows []map[string]any
		if err := json.Unmarshal([]byte(out), &rows); err != nil {
			t.Fatal(err)
		}
		lib := wire.Materials()
		if len(rows) != len(lib) {
			t.Fatalf("%d rows, library has %d", len(rows), len(lib))
		}
		for i, r := range rows {
			// Source: the library row itself; GPa = MPa/1000.
			if r["id"] != lib[i].ID || r["youngs_modulus_gpa"] != lib[i].YoungsModulus/1000 ||
				r["yield_mpa"] != lib[i].Yield || r["source"] != lib[i].Source {
				t.Errorf("row %d = %v, library %+v", i, r, lib[i])
			}
		}
	})
	t.Run("one row in full", func(t *testing.T) {
		code, out, _ := runCLI(t, "materials", "aluminium-1350")
		if code != exitOK || !strings.Contains(out, "special flux") || !strings.Contains(out, "source") {
			t.Errorf("exit %d, output:\n%s", code, out)
		}
	})
	t.Run("unknown id", func(t *testing.T) {
		code, _, errs := runCLI(t, "materials", "unobtainium")
		if code != exitBadUse || !strings.Contains(errs, "copper-annealed") {
			t.Errorf("exit %d, stderr %q", code, errs)
		}
	})
}
