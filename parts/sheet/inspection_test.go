package sheet

import (
	"strings"
	"testing"

	"coilwright/parts"
	"coilwright/parts/cutlist"
)

func TestInspectionNoteGivesTheBasis(t *testing.T) {
	d, err := parts.NewDesign(mustParse(t, demoSpec(t, "demo-5g8-cone.toml")))
	if err != nil {
		t.Fatal(err)
	}
	tol := make([]float64, len(d.Turns))
	for i := range tol {
		tol[i] = 0.05 * float64(i+1)
	}
	const basis = "From the batch analysis."
	if err := d.UseInspectionTolerances(tol, basis); err != nil {
		t.Fatal(err)
	}
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	if b := NewBuildSheet(d, cl, ""); !strings.Contains(b.InspectionNote, basis) {
		t.Errorf("build sheet note %q does not give the basis", b.InspectionNote)
	}
}
