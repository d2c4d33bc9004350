package tolerance

import (
	"encoding/json"
	"math"
	"testing"
)

func TestFiguresStayFiniteWhereTheSplineDipsNegative(t *testing.T) {
	// A resistance that swings from 1 Ω to 400 Ω and back makes the natural
	// cubic spline through it dip below zero between samples; a VSWR read
	// there must stay a finite, recordable number (design.json holds it).
	r := Response{
		FrequencyMHz: []float64{100, 110, 120, 130, 140},
		Impedance:    []complex128{1, 1, 400, 1, 1},
		GainDBic:     []float64{1, 1, 1, 1, 1},
		AxialRatioDB: []float64{1, 1, 1, 1, 1},
	}
	f, err := figures(r, Band{LowMHz: 100, CentreMHz: 120, HighMHz: 140, RefOhm: 50, VSWRTarget: 2})
	if err != nil {
		t.Fatal(err)
	}
	for name, v := range map[string]float64{"worst": f.WorstVSWR, "edge": f.EdgeVSWR, "min": f.MinVSWR} {
		if math.IsInf(v, 0) || math.IsNaN(v) || v > vswrCeiling {
			t.Errorf("%s VSWR %v: want finite and at most %v", name, v, vswrCeiling)
		}
	}
	if f.WorstVSWR != vswrCeiling {
		t.Errorf("worst VSWR %v: the dip should reach the ceiling %v", f.WorstVSWR, vswrCeiling)
	}
	if _, err := json.Marshal(f); err != nil {
		t.Fatal(err)
	}
}
