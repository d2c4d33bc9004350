package kit

import (
	"strings"
	"testing"
)

// lBand is a 1.27 GHz cylinder on a square aluminium plate with an N
// bulkhead jack: its former (about 344 mm) is taller than the default
// 250 mm print volume.
const lBand = `kit = "Test 1G27 Square"
frequency_mhz = 1270.0

[coil]
shape = "cylindrical"
turns = 6.0
hand = "RHCP"
base_circumference_lambda = 1.0
pitch_angle_deg = 13.0

[wire]
material = "copper-annealed"
diameter_mm = 3.0

[reflector]
shape = "square"
thickness_mm = 1.5
material = "aluminium"
connector = "n-bulkhead"

[coax]
type = "rg58"
length_mm = 300.0

[stock]
wire_rod_mm = 2000.0
`

// TestTallFormerIsSplit plans the 1.27 GHz kit: the former is split into
// sections that each print within the volume (peg included), the warning
// says so, and the build sheet's lock step opens with the assembly.
func TestTallFormerIsSplit(t *testing.T) {
	k := specKit(t, lBand)
	if k.Former.FitsPrinter || k.split == nil {
		t.Fatalf("a %.0f mm former: fits %v, split %v", k.Former.HeightMM, k.Former.FitsPrinter, k.split)
	}
	maxH := k.Source.Spec.Former.PrintHeightMM
	for _, s := range k.split.Sections {
		b := s.Solid.Bounds()
		if h := b.Max.Z - b.Min.Z; h > maxH+1e-9 {
			t.Errorf("section %d is %.1f mm tall, over %.0f mm", s.Number, h, maxH)
		}
	}
	found := false
	for _, w := range k.Design.Warnings {
		if w.Code == "former-size" {
			found = strings.Contains(w.Message, "former-1.stl") && strings.Contains(w.Message, "sections")
		}
	}
	if !found {
		t.Error("the former-size warning does not name the sections")
	}
	var m Memory
	if err := k.writeSheet(&m); err != nil {
		t.Fatal(err)
	}
	b, _ := m.File("build-sheet.md")
	md := string(b)
	for _, want := range []string{"printed as 2 sections", "N bulkhead jack", "cannot be soft-soldered", "fibre laser"} {
		if !strings.Contains(md, want) {
			t.Errorf("build sheet lacks %q", want)
		}
	}
	for _, bad := range []string{"Heat-shrink", "cable tie", "Solder the outer conductor all round"} {
		if strings.Contains(md, bad) {
			t.Errorf("build sheet says %q", bad)
		}
	}
}

// TestWideFormerSaysMandrel: a former wider than the printer is neither
// written nor split, and the lock step says to wind on a mandrel.
func TestWideFormerSaysMandrel(t *testing.T) {
	k := specKit(t, strings.Replace(lBand, "[stock]", "[former]\nprint_width_mm = 20.0\n\n[stock]", 1))
	if k.split != nil {
		t.Fatal("a former wider than the printer was split")
	}
	var m Memory
	if err := k.writeSheet(&m); err != nil {
		t.Fatal(err)
	}
	b, _ := m.File("build-sheet.md")
	if !strings.Contains(string(b), "No former is printed for this coil") || strings.Contains(string(b), "printed as 2 sections") {
		t.Error("the lock step does not say to wind on a mandrel")
	}
}
