package main

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"coilwright/kit"
	"coilwright/parts/spec"
)

// buildInMemory runs every output step but the former's (whose meshing is
// slow and planned apart by jig.Plan) into memory.
func buildInMemory(k *kit.Kit) error {
	var m kit.Memory
	for _, st := range kit.Steps() {
		// The former is slow to mesh and the report page lists the files
		// written before it, so it runs only through Kit.Write.
		if st.Name == "winding former" || st.Name == "report page" {
			continue
		}
		if err := st.Write(k, &m); err != nil {
			return fmt.Errorf("%s: %w", st.Name, err)
		}
	}
	return nil
}

// loadBytes parses a spec held in memory.
func loadBytes(b []byte) (kit.Source, error) {
	s, err := spec.ParseSpec(b)
	return kit.Source{Name: "spec.toml", Bytes: b, Spec: s}, err
}

func TestCheckFindsTheStockRefusal(t *testing.T) {
	// A 780.5 MHz cylindrical starter needs a wire blank longer than the
	// default 1000 mm rod: fine for one kit, refused for a batch.
	var buf bytes.Buffer
	if err := runNew(&buf, io.Discard, newOptions{frequencyMHz: 780.5, shape: "cylindrical"}, true); err != nil {
		t.Fatal(err)
	}
	src := strings.Replace(buf.String(), "quantity = 1", "quantity = 2", 1)
	l, err := loadBytes([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	if _, err := kit.New(l, kit.Options{}); err == nil {
		t.Fatal("the plan no longer refuses the batch; pick another case")
	}
	p := filepath.Join(t.TempDir(), "uhf.toml")
	os.WriteFile(p, []byte(src), 0o644)
	code, _, errs := runCLI(t, "check", p)
	if code != exitBadUse || !strings.Contains(errs, "stock.wire_rod_mm = 1000: is too short") || !strings.Contains(errs, "fix: set wire_rod_mm = ") {
		t.Errorf("check: exit %d, stderr %q; want the stock.wire_rod_mm refusal", code, errs)
	}
}

func TestCheckPassesOnlyWhatBuildPasses(t *testing.T) {
	// Seeded random starter specs across the frequency range, both shapes,
	// batches of 1 to 12 and random rod stock: whenever check's plan
	// passes, every output step (the former aside) must succeed.
	rng := rand.New(rand.NewPCG(15, 2026))
	passed, refused := 0, 0
	for i := range 24 {
		freq := math.Round(100*math.Pow(300, rng.Float64())*10) / 10 // log-uniform over 100–30000 MHz
		shape := []string{"cylindrical", "conical"}[rng.IntN(2)]
		var buf bytes.Buffer
		if err := runNew(&buf, io.Discard, newOptions{frequencyMHz: freq, shape: shape}, true); err != nil {
			t.Fatal(err)
		}
		q := 1 + rng.IntN(12)
		src := strings.Replace(buf.String(), "quantity = 1", fmt.Sprintf("quantity = %d", q), 1)
		if rng.IntN(2) == 0 {
			src += fmt.Sprintf("\n[stock]\nwire_rod_mm = %.0f\ndowel_rod_mm = %.0f\n", 200+rng.Float64()*1800, 100+rng.Float64()*900)
		}
		l, err := loadBytes([]byte(src))
		if err != nil {
			continue // a starter that check refuses earlier
		}
		k, err := kit.New(l, kit.Options{})
		if err != nil {
			refused++
			continue
		}
		passed++
		if err := buildInMemory(k); err != nil {
			t.Errorf("spec %d (%.1f MHz %s, %d kits) passes check but build fails: %v\n%s", i, freq, shape, q, err, src)
		}
	}
	t.Logf("%d specs passed check and built, %d refused by check", passed, refused)
	if passed == 0 || refused == 0 {
		t.Errorf("the generator gave %d passing and %d refused specs; it should give both", passed, refused)
	}
}
