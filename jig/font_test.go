package jig

import "testing"

// TestLowerCaseZ holds the flange's "GHz" and "MHz" to a z that reads as a
// small letter: no taller than 60 % of the capitals and narrower than
// them. Common practice (no published source): a sans-serif x-height is
// about half to two thirds of the cap height.
func TestLowerCaseZ(t *testing.T) {
	top, wide := 0.0, 0.0
	for _, l := range glyphs['z'] {
		for _, p := range l {
			top = max(top, p[1])
			wide = max(wide, p[0])
		}
	}
	if top > 0.6*glyphHeight {
		t.Errorf("z is %.1f of %.0f units tall: it reads as a capital", top, glyphHeight)
	}
	if wide >= glyphWidth {
		t.Errorf("z is as wide as the capitals (%.1f units)", wide)
	}
	if got := FrequencyLabel(1270); got != "1.27 GHz" {
		t.Errorf("FrequencyLabel(1270) = %q", got)
	}
}
