package spec

import (
	"maps"
	"slices"
	"testing"
)

// The tables below are handed out as copies: changing what one call
// returned must not change what the next call, or a lookup by id, sees.

func TestCoaxTypesAreCopies(t *testing.T) {
	want := maps.Clone(CoaxTypes()) // a snapshot of its own
	got := CoaxTypes()
	got["semi-rigid-141"] = CoaxType{Name: "changed", Outer: 99}
	delete(got, "rg58")
	got["invented"] = CoaxType{Name: "invented"}
	if again := CoaxTypes(); !maps.Equal(again, want) {
		t.Errorf("CoaxTypes changed by a caller: %v", again)
	}
	if c, ok := CoaxTypeByID("semi-rigid-141"); !ok || c != want["semi-rigid-141"] {
		t.Errorf("CoaxTypeByID(semi-rigid-141) = %+v, %v after a caller's change", c, ok)
	}
	if _, ok := CoaxTypeByID("invented"); ok {
		t.Error("a caller's new entry is found by CoaxTypeByID")
	}
	if len(want) != len(CoaxTypeIDs()) {
		t.Errorf("%d cable types, %d ids", len(want), len(CoaxTypeIDs()))
	}
}

func TestSheetMaterialsAreCopies(t *testing.T) {
	want := slices.Clone(SheetMaterials()) // a snapshot of its own
	got := SheetMaterials()
	got[0].ID, got[0].Conductivity = "changed", 1
	_ = append(got[:1], SheetMaterial{ID: "invented"})
	if again := SheetMaterials(); !slices.Equal(again, want) {
		t.Errorf("SheetMaterials changed by a caller: %v", again)
	}
	if m, ok := SheetMaterialByID(want[0].ID); !ok || m != want[0] {
		t.Errorf("SheetMaterialByID(%s) = %+v, %v after a caller's change", want[0].ID, m, ok)
	}
}

func TestConnectorsAreCopies(t *testing.T) {
	want := slices.Clone(Connectors()) // a snapshot of its own
	got := Connectors()
	got[1].Family, got[1].Mount = "changed", "changed"
	_ = append(got[:2], Connector{ID: "invented"})
	if again := Connectors(); !slices.Equal(again, want) {
		t.Errorf("Connectors changed by a caller: %v", again)
	}
	if c, ok := ConnectorByID(want[1].ID); !ok || c != want[1] {
		t.Errorf("ConnectorByID(%s) = %+v, %v after a caller's change", want[1].ID, c, ok)
	}
}
