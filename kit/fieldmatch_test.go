package kit

import (
	"strings"
	"testing"

	"coilwright/templates"
)

func TestFieldSolutionWarnsWhenTheBandIsMissed(t *testing.T) {
	// The 5.8 GHz demo fed at the centre: its radial lead spoils the match
	// the strip search finds over an ideal ground, and the plate model's
	// sweep must say so with the feed as the fix. Fed at the periphery (the
	// demo as shipped) it meets wedge.max_vswr and carries no such warning.
	b, _ := templates.Demo("demo-5g8-cone.toml")
	for _, tc := range []struct {
		feed string
		want bool
	}{{"periphery", false}, {"centre", true}} {
		t.Run(tc.feed+" feed", func(t *testing.T) {
			text := strings.Replace(string(b), `feed = "periphery"`, `feed = "`+tc.feed+`"`, 1)
			k, err := newKitText(t, text)
			if err != nil {
				t.Fatal(err)
			}
			var got string
			for _, w := range k.Design.Warnings {
				if w.Code == "field-match" {
					got = w.Message
				}
			}
			worst := k.Design.Field.Summary.Worst.VSWR
			if (got != "") != tc.want || (worst > k.Design.Spec.Wedge.MaxVSWR) != tc.want {
				t.Fatalf("worst in-band VSWR %.2f, warning %q; want a warning: %v", worst, got, tc.want)
			}
			if tc.want && !strings.Contains(got, `coil.feed = "periphery"`) {
				t.Errorf("warning %q gives no feed fix", got)
			}
		})
	}
}
