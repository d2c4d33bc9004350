package parts

import (
	"testing"
)

func TestUseInspectionTolerances(t *testing.T) {
	d, err := NewDesign(mustParse(t, demoSpec(t, "demo-5g8-cone.toml")))
	if err != nil {
		t.Fatal(err)
	}
	tol := make([]float64, len(d.Turns))
	for i := range tol {
		tol[i] = 0.05 * float64(i+1)
	}
	const basis = "From the batch analysis."
	if err := d.UseInspectionTolerances(tol[:1], basis); err == nil {
		t.Error("accepted one tolerance for five turns")
	}
	if err := d.UseInspectionTolerances(tol, basis); err != nil {
		t.Fatal(err)
	}
	for i, r := range d.InspectionTable() {
		if r.ToleranceMM != tol[i] {
			t.Errorf("turn %d: ±%g mm on the inspection table, want ±%g", r.Turn, r.ToleranceMM, tol[i])
		}
	}
	// A tolerance set in the spec wins over the analysis.
	s := mustParse(t, append(demoSpec(t, "demo-5g8-cone.toml"), "\n[tolerance]\n"...))
	v := 0.3
	s.Wire.InspectionToleranceMM = &v
	d2, err := NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	if err := d2.UseInspectionTolerances(tol, basis); err != nil {
		t.Fatal(err)
	}
	if d2.Turns[0].ToleranceMM != v || d2.InspectionBasis != "" {
		t.Errorf("the spec's ±%g mm was replaced: ±%g mm, basis %q", v, d2.Turns[0].ToleranceMM, d2.InspectionBasis)
	}
}
