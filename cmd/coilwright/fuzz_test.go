package main

import (
	"encoding/json"
	"testing"

	"coilwright/kit"
	"coilwright/templates"
)

// FuzzSpecThroughOutputs runs every parsed spec through check's plan
// (kit.New) and every in-memory output step but the former's. A spec check
// passes must build; nothing may panic or hang.
func FuzzSpecThroughOutputs(f *testing.F) {
	f.Add(templates.Reference())
	for _, n := range templates.Demos() {
		b, _ := templates.Demo(n)
		f.Add(b)
	}
	f.Add([]byte("kit = \"k\"\nfrequency_mhz = 780.5\nquantity = 2\n[coil]\nshape = \"cylindrical\"\nturns = 7.0\nbase_circumference_lambda = 1.0\npitch_angle_deg = 12.5\n[wire]\nmaterial = \"copper-annealed\"\ndiameter_mm = 2.0\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		if len(data) > 8<<10 {
			return
		}
		l, err := loadBytes(data)
		if err != nil {
			return
		}
		if l.Spec.Wire.Calibration != "" || l.Spec.Quantity > 50 {
			return // a file to read, or a batch too large to plan quickly
		}
		k, err := kit.New(l, kit.Options{})
		if err != nil {
			return
		}
		if _, err := json.Marshal(k.Report); err != nil {
			t.Fatalf("design report does not encode: %v", err)
		}
		if err := buildInMemory(k); err != nil {
			t.Fatalf("check passes but build fails: %v", err)
		}
	})
}
