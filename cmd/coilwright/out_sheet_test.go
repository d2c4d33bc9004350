package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"flag"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"

	"coilwright/cam/checktool"
	"coilwright/parts/cutlist"
	"coilwright/parts/spec"
	"coilwright/templates"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

func runTool(t *testing.T, name string, args ...string) string {
	t.Helper()
	out, err := exec.Command(checktool.Need(t, name), args...).CombinedOutput()
	if err != nil {
		t.Fatalf("%s %v: %v\n%s", name, args, err, out)
	}
	return string(out)
}

// buildSpec builds the spec text in a temporary folder and returns it.
func buildSpec(t *testing.T, spec string) string {
	t.Helper()
	dir := t.TempDir()
	path := filepath.Join(dir, "spec.toml")
	if err := os.WriteFile(path, []byte(spec), 0o644); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "out")
	var stdout, stderr bytes.Buffer
	if code := run([]string{"build", path, "-o", out}, &stdout, &stderr); code != 0 {
		t.Fatalf("build: exit %d: %s", code, stderr.String())
	}
	return out
}

func demoText(t *testing.T, name string) string {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	return string(b)
}

// requiredStepTitles are the steps every build sheet must carry, in order.
var requiredStepTitles = []string{
	"Straighten and clean the wire",
	"Lock its end in the former",
	"Wind under tension",
	"Hold and overbend",
	"Release",
	"Measure each turn against the inspection table",
	"Trim and form the feed lead",
	"Prepare the reflector",
	"Prepare and solder the coax",
	"Solder the wedge under the start of the winding",
	"Solder the coil",
	"Epoxy and support",
	"Heat-shrink",
	"Final checks",
}

// requiredCautions are the caution headings every build sheet must carry
// (soldering, epoxy, wire cutting, laminate, RF).
var requiredCautions = []string{
	"Soldering fumes and lead",
	"Burns",
	"Epoxy skin sensitisation",
	"Eye protection when cutting wire",
	"Laminate dust and no laser on FR-4",
	"RF exposure and EIRP limits",
}

// normalise joins a PDF's text into one line of single spaces, so phrases
// broken across lines still match.
func normalise(s string) string { return strings.Join(strings.Fields(s), " ") }

func TestBuildSheetPDFText(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			dir := t.TempDir()
			buildDemo(t, demo, dir)
			pdf := filepath.Join(dir, "build-sheet.pdf")
			runTool(t, "qpdf", "--check", pdf)
			text := normalise(runTool(t, "pdftotext", pdf, "-"))
			md, err := os.ReadFile(filepath.Join(dir, "build-sheet.md"))
			if err != nil {
				t.Fatal(err)
			}
			last := -1
			for i, title := range requiredStepTitles {
				want := "Step " + strconv.Itoa(i+1) + ". " + title
				at := strings.Index(text, want)
				if at < 0 {
					t.Errorf("PDF lacks %q", want)
					continue
				}
				if at < last {
					t.Errorf("PDF has %q out of order", want)
				}
				last = at
				if !bytes.Contains(md, []byte("### "+want)) {
					t.Errorf("Markdown lacks %q", want)
				}
			}
			cautions := strings.Index(text, "Cautions — read before step 1")
			step1 := strings.Index(text, "Step 1. ")
			if cautions < 0 || cautions > step1 {
				t.Errorf("cautions section missing or after step 1")
			}
			for _, h := range requiredCautions {
				if n := strings.Count(text, h); n < 2 {
					t.Errorf("PDF shows caution %q %d times, want it in the cautions section and at a step", h, n)
				}
				if !bytes.Contains(md, []byte("### "+h)) {
					t.Errorf("Markdown lacks caution %q", h)
				}
			}
			for _, want := range []string{"Spec SHA-256", "Hand: ", "Inspection table", "Closing note", "local regulations", "licence", "vector network analyser", "return loss", "1:1 templates"} {
				if !strings.Contains(text, want) {
					t.Errorf("PDF lacks %q", want)
				}
			}
			fonts := runTool(t, "pdffonts", pdf)
			for _, line := range strings.Split(fonts, "\n")[2:] {
				if f := strings.Fields(line); len(f) >= 5 && f[len(f)-5] != "yes" {
					t.Errorf("font not embedded: %s", line)
				}
			}
		})
	}
}

func TestBuildSheetPaperSize(t *testing.T) {
	for _, c := range []struct {
		paper, want string
	}{
		// Source: ISO 216 A4 is 210 × 297 mm = 595.276 × 841.89 pt; US
		// Letter is 8.5 × 11 in = 612 × 792 pt; pdfinfo names both.
		{"A4", "595.276 x 841.89 pts (A4)"},
		{"Letter", "612 x 792 pts (letter)"},
	} {
		t.Run(c.paper, func(t *testing.T) {
			spec := demoText(t, templates.DefaultDemo) + "\n[cutting]\npaper = \"" + c.paper + "\"\n"
			dir := buildSpec(t, spec)
			info := runTool(t, "pdfinfo", filepath.Join(dir, "build-sheet.pdf"))
			m := regexp.MustCompile(`(?m)^Page size:\s+(.*)$`).FindStringSubmatch(info)
			if m == nil || m[1] != c.want {
				t.Errorf("pdfinfo page size %q, want %q", m, c.want)
			}
			pages := regexp.MustCompile(`(?m)^Pages:\s+(\d+)$`).FindStringSubmatch(info)
			if pages == nil {
				t.Fatalf("pdfinfo shows no page count:\n%s", info)
			}
			// Every page is the same size.
			all := runTool(t, "pdfinfo", "-f", "1", "-l", pages[1], filepath.Join(dir, "build-sheet.pdf"))
			if n := strings.Count(all, c.want); strconv.Itoa(n) != pages[1] {
				t.Errorf("%d of %s pages are %s", n, pages[1], c.want)
			}
		})
	}
}

func TestBuildSheetCreationDate(t *testing.T) {
	// SOURCE_DATE_EPOCH = 1700000000 is 2023-11-14 22:13:20 UTC.
	t.Setenv("SOURCE_DATE_EPOCH", "1700000000")
	dir := t.TempDir()
	buildDemo(t, templates.DefaultDemo, dir)
	info := runTool(t, "pdfinfo", "-isodates", filepath.Join(dir, "build-sheet.pdf"))
	if !strings.Contains(info, "2023-11-14T22:13:20") {
		t.Errorf("creation date not taken from SOURCE_DATE_EPOCH:\n%s", info)
	}
}

func readCSV(t *testing.T, path string) []map[string]string {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	recs, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	var out []map[string]string
	for _, r := range recs[1:] {
		m := map[string]string{}
		for i, h := range recs[0] {
			m[h] = r[i]
		}
		out = append(out, m)
	}
	return out
}

func atof(t *testing.T, s string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("not a number: %q", s)
	}
	return v
}

// csvTol is the rounding of one-decimal CSV figures, mm.
const csvTol = 0.05 + 1e-9

func TestWireBlankMatchesDesignJSON(t *testing.T) {
	for _, demo := range templates.Demos() {
		t.Run(demo, func(t *testing.T) {
			dir := t.TempDir()
			buildDemo(t, demo, dir)
			var dj struct {
				WireLengthMM      float64 `json:"wire_length_mm"`
				FirstTurnHeightMM float64 `json:"first_turn_height_mm"`
				BaseDiameterMM    float64 `json:"base_diameter_mm"`
				Feed              string  `json:"feed"`
			}
			b, _ := os.ReadFile(filepath.Join(dir, "design.json"))
			if err := json.Unmarshal(b, &dj); err != nil {
				t.Fatal(err)
			}
			var blank map[string]string
			for _, r := range readCSV(t, filepath.Join(dir, "cutlist.csv")) {
				if r["item"] == "wire blank" {
					blank = r
				}
			}
			if blank == nil {
				t.Fatal("cutlist.csv has no wire blank")
			}
			// Allowances as the cut list defines them: the lock end, bent
			// into the former's lock hole and as deep as the planned hole
			// (or the feed lead it is later cut to, if that is longer),
			// and the trim at the free end.
			l, err := loadSpec("", demo)
			if err != nil {
				t.Fatal(err)
			}
			k, err := newKit(l, time.Time{})
			if err != nil {
				t.Fatal(err)
			}
			lead := dj.FirstTurnHeightMM - cutlist.FeedStandoffMM
			if dj.Feed == "centre" {
				// A centre feed's lead runs in from the start to the axis.
				lead = dj.BaseDiameterMM / 2
			}
			want := dj.WireLengthMM + math.Max(k.Former.LockHoleMM, lead) + cutlist.TrimPerEndMM
			if got := atof(t, blank["length_mm"]); math.Abs(got-want) > csvTol {
				t.Errorf("blank %.1f mm, design.json arc %.3f mm + allowances = %.3f mm", got, dj.WireLengthMM, want)
			}
			md, _ := os.ReadFile(filepath.Join(dir, "cutlist.md"))
			if !bytes.Contains(md, []byte(blank["length_mm"])) {
				t.Errorf("cutlist.md does not show the blank %s mm", blank["length_mm"])
			}
		})
	}
}

func TestBatchPlanFromCSV(t *testing.T) {
	for _, q := range []int{2, 6, 17} {
		t.Run(strconv.Itoa(q)+" kits", func(t *testing.T) {
			src := strings.Replace(demoText(t, templates.DefaultDemo), "quantity = 6", "quantity = "+strconv.Itoa(q), 1)
			dir := buildSpec(t, src)
			s, _ := spec.ParseSpec([]byte(src))
			usable := map[string]float64{
				"wire blank":  s.Stock.WireRodMM - s.Stock.EndTrimMM,
				"support rod": s.Stock.DowelRodMM - s.Stock.EndTrimMM,
			}
			cuts := map[string]int{}
			pieces := map[string]int{}
			for _, r := range readCSV(t, filepath.Join(dir, "batch.csv")) {
				item := r["stock"]
				switch r["row"] {
				case "cut":
					cuts[item]++
					n := atof(t, r["pieces"])
					used := n * (atof(t, r["piece_mm"]) + atof(t, r["kerf_mm"]))
					pieces[item] += int(n)
					if used > usable[item]+n*csvTol {
						t.Errorf("%s rod %s over-cut: %.1f mm on %.1f mm usable", item, r["rod"], used, usable[item])
					}
				case "total":
					rods := int(atof(t, r["rods"]))
					total := atof(t, r["pieces"]) * (atof(t, r["piece_mm"]) + atof(t, r["kerf_mm"]))
					if limit := int(math.Ceil(total/usable[item])) + 1; rods > limit {
						t.Errorf("%s: %d rods, more than ceil(total/usable)+1 = %d", item, rods, limit)
					}
					if rods != cuts[item] {
						t.Errorf("%s: total says %d rods, %d cut rows", item, rods, cuts[item])
					}
					if pieces[item] != q {
						t.Errorf("%s: %d pieces cut for %d kits", item, pieces[item], q)
					}
					waste := atof(t, r["bought_mm"]) - atof(t, r["demand_mm"])
					if math.Abs(waste-atof(t, r["waste_mm"])) > 2*csvTol || math.Abs(100*waste/atof(t, r["bought_mm"])-atof(t, r["waste_percent"])) > 0.1 {
						t.Errorf("%s: waste figures disagree: %v", item, r)
					}
				}
			}
			for _, n := range []string{"batch.md", "batch.csv"} {
				if _, err := os.Stat(filepath.Join(dir, n)); err != nil {
					t.Error(err)
				}
			}
		})
	}
}

func TestNoBatchForOneKit(t *testing.T) {
	dir := t.TempDir()
	buildDemo(t, "demo-2g4-cylinder.toml", dir)
	m := readManifest(t, dir)
	names := map[string]bool{}
	for _, f := range m.Files {
		names[f.Name] = true
	}
	for _, n := range []string{"cutlist.csv", "cutlist.md", "build-sheet.pdf", "build-sheet.md"} {
		if !names[n] {
			t.Errorf("manifest lacks %s", n)
		}
	}
	if names["batch.csv"] || names["batch.md"] {
		t.Error("a one-kit build wrote a batch plan")
	}
}

// TestSheetGolden compares the text outputs of the default demo with the
// files in testdata/golden: the cut list, batch plan and build sheet, and
// the field solver's numbers (the sweep, the centre-frequency pattern cuts,
// the Touchstone file and the tolerance batch), so a change to any of them
// shows as a diff. Run with -update to rewrite them.
func TestSheetGolden(t *testing.T) {
	dir := t.TempDir()
	buildDemo(t, templates.DefaultDemo, dir)
	for _, name := range []string{"cutlist.csv", "cutlist.md", "batch.csv", "batch.md", "build-sheet.md",
		"sweep.csv", "pattern.csv", "sweep.s1p", "tolerance.csv"} {
		t.Run(name, func(t *testing.T) {
			got, err := os.ReadFile(filepath.Join(dir, name))
			if err != nil {
				t.Fatal(err)
			}
			golden := filepath.Join("testdata", "golden", name)
			if *update {
				if err := os.MkdirAll(filepath.Dir(golden), 0o755); err != nil {
					t.Fatal(err)
				}
				if err := os.WriteFile(golden, got, 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(golden)
			if err != nil {
				t.Fatalf("%v (run go test -update)", err)
			}
			if !bytes.Equal(got, want) {
				t.Errorf("%s differs from %s; run go test -update and review the diff", name, golden)
			}
		})
	}
}
