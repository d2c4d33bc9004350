package sheet

import (
	"math"
	"regexp"
	"strings"
	"testing"

	"coilwright/cam/geom"
	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/flat"
)

// xband is a one-turn 10 GHz coil (λ = 29.98 mm): every turn is under
// 20 mm across, so 1 % of it is under the 0.2 mm caliper floor.
const xband = `kit = "Test 10G LHCP"
frequency_mhz = 10000.0

[coil]
shape = "cylindrical"
turns = 1.0
hand = "LHCP"
base_circumference_lambda = 1.0
pitch_angle_deg = 13.0

[wire]
material = "copper-annealed"
diameter_mm = 1.0
`

func TestTurnsText(t *testing.T) {
	for n, want := range map[float64]string{1: "1 turn", 5: "5 turns", 1.5: "1.5 turns", 0.75: "0.75 turns"} {
		if got := parts.TurnsText(n); got != want {
			t.Errorf("TurnsText(%g) = %q, want %q", n, got, want)
		}
	}
	d := mustDesign(t, xband)
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	b := NewBuildSheet(d, cl, strings.Repeat("0", 64))
	if all := sheetText(b); regexp.MustCompile(`(^|[^0-9.])1 turns`).MatchString(all) {
		t.Error(`the sheet of a one-turn coil says "1 turns"`)
	}
}

// sheetText joins everything a build sheet says.
func sheetText(b *BuildSheet) string {
	var sb strings.Builder
	sb.WriteString(b.Summary + "\n" + b.HandWords + "\n" + b.InspectionNote + "\n")
	for _, r := range append(append([]SheetRow{}, b.Design...), b.Materials...) {
		sb.WriteString(r.Label + ": " + r.Value + "\n")
	}
	for _, s := range b.Tools {
		sb.WriteString(s + "\n")
	}
	for _, c := range b.Cautions {
		sb.WriteString(c.Heading + ": " + c.Text + "\n")
	}
	for _, st := range b.Steps {
		sb.WriteString(st.Title + "\n" + strings.Join(st.Text, "\n") + "\n")
	}
	for _, w := range b.Warnings {
		sb.WriteString(w.Message + "\n")
	}
	return sb.String()
}

func TestReflectorLabelHandOnce(t *testing.T) {
	d := mustDesign(t, xband)
	l, _ := d.Patterns.Reflector.Drawing.Layer(flat.LayerMark)
	found := false
	for _, e := range l.Entities {
		if tx, ok := e.(geom.Text); ok && strings.Contains(tx.Value, "Test 10G") {
			found = true
			if strings.Count(tx.Value, "LHCP") != 1 {
				t.Errorf("reflector mark %q names the hand %d times", tx.Value, strings.Count(tx.Value, "LHCP"))
			}
		}
	}
	if !found {
		t.Error("no kit name on the reflector's mark layer")
	}
}

func TestStripShapeText(t *testing.T) {
	// A strip that widens between its ends: 1.90 mm at the feed, 4.29 mm
	// mid-length, 2.00 mm at the far end.
	w := &flat.Wedge{FeedWidth: 1.9, EndWidth: 2.0, Length: 14, Stations: []flat.WedgeStation{
		{S: 0, Width: 1.9}, {S: 7, Width: 4.29}, {S: 14, Width: 2.0}}}
	got := stripShapeText(w)
	for _, want := range []string{"1.90 mm wide at the feed end", "2.00 mm at the far end", "widest (4.29 mm) 7.0 mm from the feed end"} {
		if !strings.Contains(got, want) {
			t.Errorf("%q lacks %q", got, want)
		}
	}
	if strings.Contains(got, "narrow") {
		t.Errorf("%q says the strip narrows", got)
	}
	// A plain taper gets no middle figure.
	w = &flat.Wedge{FeedWidth: 3, EndWidth: 2, Stations: []flat.WedgeStation{{S: 0, Width: 3}, {S: 5, Width: 2.5}, {S: 10, Width: 2}}}
	if got := stripShapeText(w); strings.Contains(got, "widest") || strings.Contains(got, "narrowest") {
		t.Errorf("a monotone taper is described as %q", got)
	}
}

func TestInspectionNoteNamesTheGoverningTolerance(t *testing.T) {
	// 10 GHz: 1 % of a 9.5 mm turn is 0.095 mm, under the 0.2 mm floor.
	d := mustDesign(t, xband)
	note := inspectionNoteText(d)
	if !strings.Contains(note, "±0.2 mm on every turn") || !strings.Contains(note, "floor governs") {
		t.Errorf("10 GHz note does not say the floor governs: %q", note)
	}
	for _, row := range d.InspectionTable() {
		if row.ToleranceMM != parts.InspectionFloorMM {
			t.Errorf("turn %d tolerance %.3f, want the floor", row.Turn, row.ToleranceMM)
		}
	}
	// 435 MHz cylinder, λ = 689 mm: turns about 220 mm across, 1 % is
	// 2.2 mm, so the per cent governs every turn.
	big := strings.Replace(strings.Replace(xband, "10000.0", "435.0", 1), "diameter_mm = 1.0", "diameter_mm = 4.0", 1)
	big = strings.Replace(big, "turns = 1.0", "turns = 3.0", 1)
	note = inspectionNoteText(mustDesign(t, big))
	if !strings.Contains(note, "±1 % of each turn's diameter") || strings.Contains(note, "governs") {
		t.Errorf("435 MHz note: %q", note)
	}
}

func TestCoilHeightsDefined(t *testing.T) {
	d := mustDesign(t, xband)
	h := Heights(d)
	const tol = 1e-9
	if math.Abs(h.TopCentre-h.Axial-d.Coil.Z0) > tol || math.Abs(h.Overall-h.TopCentre-d.Spec.Wire.DiameterMM/2) > tol {
		t.Errorf("heights %+v do not step by the first turn height %.3f and half the wire %.3f", h, d.Coil.Z0, d.Spec.Wire.DiameterMM/2)
	}
	// The top wire centre is the highest z of the coil path.
	top := d.Coil.Point(d.Coil.Span()).Z
	if math.Abs(top-h.TopCentre) > 1e-6 {
		t.Errorf("path ends at z = %.4f, TopCentre %.4f", top, h.TopCentre)
	}
	text := h.Text()
	for _, v := range []float64{h.Axial, h.TopCentre, h.Overall} {
		if !strings.Contains(text, mm(v)) {
			t.Errorf("%q lacks %s", text, mm(v))
		}
	}
	cl, _ := cutlist.NewCutList(d)
	for _, dim := range NewSideView(d, cl).Dimensions {
		if strings.Contains(dim.Text, "top") && !strings.Contains(dim.Text, "wire centre") && !strings.Contains(dim.Text, "Ø") {
			t.Errorf("side-view height %q does not say what it measures to", dim.Text)
		}
	}
}
