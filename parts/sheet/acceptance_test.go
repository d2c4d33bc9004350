package sheet

import (
	"fmt"
	"math"
	"strings"
	"testing"
)

func TestSeenThroughFeeder(t *testing.T) {
	// Source: Pozar, Microwave Engineering, 4th ed., §2.7: |Γ_in| =
	// |Γ_L|·e^(−2αℓ). 10 dB return loss is |Γ| = 0.3162, VSWR 1.925;
	// through 1 dB of feeder, 12 dB: |Γ| = 0.2512, VSWR 1.671.
	for _, c := range []struct{ rl, loss, want float64 }{{10, 0, 1.925}, {10, 1, 1.671}} {
		if got := seenThroughFeeder(c.rl, c.loss); math.Abs(got-c.want) > 0.001 {
			t.Errorf("seenThroughFeeder(%g, %g) = %.4f, want %.3f", c.rl, c.loss, got, c.want)
		}
	}
	// Source: Balanis §2.2.4: 2D²/λ; D = 100 mm at λ = 50 mm is 400 mm.
	if got := farFieldMM(100, 50); got != 400 {
		t.Errorf("farFieldMM = %g", got)
	}
}

func TestAcceptanceReadings(t *testing.T) {
	text := strings.NewReplacer("%MAT%", "brass", "%CONN%", "coax", "%CABLE%", "rg58", "%METHOD%", "mill").Replace(combo) + "\n[rf]\nfeeder_loss_db = 1.0\n"
	d := mustDesign(t, text)
	got := strings.Join(acceptanceText(d), "\n")
	g, _ := d.QuotedGain()
	for _, want := range []string{
		"SWR meter at the transmitter", "below 1.9 at the antenna", "below 1.67", // 1 dB feeder: see TestSeenThroughFeeder
		fmt.Sprintf("about %.0f dB above the dipole (its %.1f dBic", g-DipoleGainDBi-LinearToCircularLossDB, g),
		"opposite hand", "Above 2:",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("lacks %q:\n%s", want, got)
		}
	}
}
