package parts

import (
	"math"
	"testing"
)

// TestSolverMatchFigures solves both demos, each feed, with the strip the
// line model sized, over an ideal ground across the band, and logs the
// figures. The solver is not yet used to size the strip: this measures
// how far the line model's strip is from the whole-antenna solution.
func TestSolverMatchFigures(t *testing.T) {
	if testing.Short() {
		t.Skip("solver sweep")
	}
	for _, name := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		for _, feed := range []string{"centre", "periphery"} {
			d := demoDesign(t, name, withFeed(feed))
			pts, err := solverMatch(d, d.Patterns.Wedge, bandFrequencies(d.Spec))
			if err != nil {
				t.Fatalf("%s %s: %v", name, feed, err)
			}
			for _, p := range pts {
				// A passive antenna over a lossless plane: Re Z > 0.
				if !(p.ZRe > 0) || math.IsNaN(p.VSWR) {
					t.Errorf("%s %s %.0f MHz: Z %.1f%+.1fj", name, feed, p.FrequencyMHz, p.ZRe, p.ZIm)
				}
			}
			t.Logf("%s %s: strip %.0f°, line-model worst VSWR %.2f, solver worst %.2f (Z %.0f%+.0fj at %.0f MHz … %.0f%+.0fj at %.0f MHz)",
				name, feed, d.Patterns.Wedge.Span*180/math.Pi, worstVSWR(d.Patterns.LineBand), worstVSWR(pts),
				pts[0].ZRe, pts[0].ZIm, pts[0].FrequencyMHz, pts[len(pts)-1].ZRe, pts[len(pts)-1].ZIm, pts[len(pts)-1].FrequencyMHz)
		}
	}
}
