package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"coilwright/cam"
	"coilwright/templates"
)

// buildDemo runs `build --demo name -o dir` in-process and fails the test on
// a non-zero exit.
func buildDemo(t *testing.T, name, dir string) {
	t.Helper()
	var stdout, stderr bytes.Buffer
	if code := run([]string{"build", "--demo", name, "-o", dir}, &stdout, &stderr); code != 0 {
		t.Fatalf("build %s: exit %d: %s", name, code, stderr.String())
	}
}

func readManifest(t *testing.T, dir string) cam.Manifest {
	t.Helper()
	b, err := os.ReadFile(filepath.Join(dir, cam.ManifestName))
	if err != nil {
		t.Fatal(err)
	}
	var m cam.Manifest
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatal(err)
	}
	return m
}

// TestBuildIsDeterministic builds every demo twice into separate folders
// and requires byte-identical outputs, and a manifest that lists exactly
// the files in the folder.
func TestBuildIsDeterministic(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			a, b := t.TempDir(), t.TempDir()
			buildDemo(t, demo, a)
			buildDemo(t, demo, b)
			m := readManifest(t, a)
			var listed []string
			for _, f := range m.Files {
				listed = append(listed, f.Name)
			}
			entries, _ := os.ReadDir(a)
			var present []string
			for _, e := range entries {
				if e.Name() != cam.ManifestName {
					present = append(present, e.Name())
				}
			}
			sort.Strings(present)
			if len(present) != len(listed) {
				t.Fatalf("folder holds %v, manifest lists %v", present, listed)
			}
			for i := range present {
				if present[i] != listed[i] {
					t.Fatalf("folder holds %v, manifest lists %v", present, listed)
				}
			}
			for _, name := range append(present, cam.ManifestName) {
				x, _ := os.ReadFile(filepath.Join(a, name))
				y, _ := os.ReadFile(filepath.Join(b, name))
				if !bytes.Equal(x, y) {
					t.Errorf("%s differs between two builds of the same spec", name)
				}
			}
		})
	}
}

// TestDesignJSONFields checks the keys scripts rely on.
func TestDesignJSONFields(t *testing.T) {
	dir := t.TempDir()
	buildDemo(t, templates.DefaultDemo, dir)
	b, err := os.ReadFile(filepath.Join(dir, "design.json"))
	if err != nil {
		t.Fatal(err)
	}
	var d struct {
		FrequencyMHz *float64 `json:"frequency_mhz"`
		WavelengthMM *float64 `json:"wavelength_mm"`
		WireLengthMM *float64 `json:"wire_length_mm"`
		Turns        []struct {
			DiameterMM          *float64 `json:"diameter_mm"`
			CircumferenceLambda *float64 `json:"circumference_lambda"`
			PitchAngleDeg       *float64 `json:"pitch_angle_deg"`
		} `json:"turns"`
		Estimates struct {
			InputResistanceOhm *float64 `json:"input_resistance_ohm"`
			HPBWDeg            *float64 `json:"hpbw_deg"`
			GainDBic           *float64 `json:"gain_dbic"`
			GainFormula        string   `json:"gain_formula"`
			AxialRatio         *float64 `json:"axial_ratio"`
		} `json:"estimates"`
	}
	if err := json.Unmarshal(b, &d); err != nil {
		t.Fatal(err)
	}
	if d.FrequencyMHz == nil || d.WavelengthMM == nil || d.WireLengthMM == nil {
		t.Error("design.json lacks frequency_mhz, wavelength_mm or wire_length_mm")
	}
	if len(d.Turns) == 0 {
		t.Fatal("design.json has no turns")
	}
	for i, tr := range d.Turns {
		if tr.DiameterMM == nil || tr.CircumferenceLambda == nil || tr.PitchAngleDeg == nil {
			t.Errorf("turn %d lacks diameter_mm, circumference_lambda or pitch_angle_deg", i+1)
		}
	}
	e := d.Estimates
	if e.InputResistanceOhm == nil || e.HPBWDeg == nil || e.GainDBic == nil || e.GainFormula == "" || e.AxialRatio == nil {
		t.Errorf("estimates incomplete: %+v", e)
	}
}

func TestSlug(t *testing.T) {
	for in, want := range map[string]string{
		"Kestrel Ridge 5G8 Taper": "kestrel-ridge-5g8-taper",
		"  --A/B  ":               "a-b",
		"Ünïcode ☂":               "n-code",
		"":                        "kit",
	} {
		if got := slug(in); got != want {
			t.Errorf("slug(%q) = %q, want %q", in, got, want)
		}
	}
}

func TestBadSourceDateEpoch(t *testing.T) {
	// A malformed SOURCE_DATE_EPOCH is bad input: exit 2 before any file is
	// written.
	t.Setenv("SOURCE_DATE_EPOCH", "yesterday")
	dir := filepath.Join(t.TempDir(), "out")
	code, _, errs := runCLI(t, "build", "-o", dir)
	if code != exitBadUse || !strings.Contains(errs, "SOURCE_DATE_EPOCH") {
		t.Errorf("exit %d, stderr %q", code, errs)
	}
	if _, err := os.Stat(dir); err == nil {
		t.Error("the build made its output folder despite the bad SOURCE_DATE_EPOCH")
	}
}

func TestBuildIntoAFile(t *testing.T) {
	// -o naming a file is a usage mistake: exit 2, and the file is kept.
	file := filepath.Join(t.TempDir(), "notes.txt")
	if err := os.WriteFile(file, []byte("mine"), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, errs := runCLI(t, "build", "-o", file)
	if code != exitBadUse || !strings.Contains(errs, "is a file, not a folder") {
		t.Errorf("exit %d, stderr %q", code, errs)
	}
	if b, err := os.ReadFile(file); err != nil || string(b) != "mine" {
		t.Errorf("the file was touched: %q, %v", b, err)
	}
}

func TestWireBlankLongerThanTheRod(t *testing.T) {
	// Fifty turns of the demo cone make a wire blank over two metres, longer
	// than the default 1000 mm rod: a spec problem at its key, exit 2.
	b, _ := templates.Demo("demo-5g8-cone.toml")
	spec := filepath.Join(t.TempDir(), "long.toml")
	if err := os.WriteFile(spec, bytes.Replace(b, []byte("turns = 5.0"), []byte("turns = 50.0"), 1), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, errs := runCLI(t, "build", spec, "-o", filepath.Join(t.TempDir(), "out"))
	if code != exitBadUse || !strings.Contains(errs, "long.toml: stock.wire_rod_mm = 1000: is too short for one wire blank") || !strings.Contains(errs, "fix: set wire_rod_mm = ") {
		t.Errorf("exit %d, stderr %q", code, errs)
	}
}

// TestCheckJSONIsDesignJSON requires check --json to print exactly the
// design.json that build writes for the same spec.
func TestCheckJSONIsDesignJSON(t *testing.T) {
	dir := t.TempDir()
	buildDemo(t, "demo-2g4-cylinder.toml", dir)
	var stdout, stderr bytes.Buffer
	if code := run([]string{"check", "--json", "--demo", "demo-2g4-cylinder.toml"}, &stdout, &stderr); code != 0 {
		t.Fatalf("check: exit %d: %s", code, stderr.String())
	}
	want, err := os.ReadFile(filepath.Join(dir, "design.json"))
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(stdout.Bytes(), want) {
		t.Errorf("check --json differs from design.json:\n%s", stdout.String())
	}
}
