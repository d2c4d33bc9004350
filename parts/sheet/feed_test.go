package sheet

import (
	"bytes"
	"fmt"
	"math"
	"strings"
	"testing"
)

func TestFeedChoiceMovesHoleAndLead(t *testing.T) {
	for _, name := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(name, func(t *testing.T) {
			c := demoDesign(t, name, withFeed("centre"))
			p := demoDesign(t, name, withFeed("periphery"))
			start := p.FeedStart()
			// Centre feed (DOMAIN §9, Kraus): the cable on the axis, the lead
			// up the axis to the start height, then straight out to the start.
			if h := c.Patterns.Reflector.Input; h.FeedRadius != 0 {
				t.Errorf("centre feed: hole %.3f mm from the axis, want 0", h.FeedRadius)
			}
			if l := c.FeedLead(); len(l) != 3 || l[0].Len() > feedTol || math.Abs(c.FeedRun()-c.Coil.StartRadius) > feedTol || l[2] != c.FeedStart() {
				t.Errorf("centre lead %+v", l)
			}
			// Periphery feed: the cable under the start, the lead straight down.
			if h := p.Patterns.Reflector.Input; math.Abs(h.FeedRadius-p.Coil.StartRadius) > feedTol {
				t.Errorf("periphery feed: hole %.3f mm from the axis, want the start radius %.3f mm", h.FeedRadius, p.Coil.StartRadius)
			}
			if l := p.FeedLead(); len(l) != 2 || p.FeedRun() != 0 || l[0].X != start.X || l[0].Z != 0 {
				t.Errorf("periphery lead %+v", l)
			}
			cc, pc := mustCutList(t, c), mustCutList(t, p)
			if cc.Wire.FeedLeadMM == pc.Wire.FeedLeadMM {
				t.Errorf("both feeds cut a %.2f mm lead", cc.Wire.FeedLeadMM)
			}
			if cc.Dowel.Foot == nil || pc.Dowel.Foot != nil {
				t.Errorf("rod foot: centre %+v, periphery %+v", cc.Dowel.Foot, pc.Dowel.Foot)
			}
			var a, b bytes.Buffer
			fmt.Fprintf(&a, "%v", c.Patterns.Reflector.Drawing)
			fmt.Fprintf(&b, "%v", p.Patterns.Reflector.Drawing)
			if a.String() == b.String() {
				t.Error("centre and periphery feeds draw the same reflector")
			}
			sc, sp := sheetText(NewBuildSheet(c, cc, strings.Repeat("0", 64))), sheetText(NewBuildSheet(p, pc, strings.Repeat("0", 64)))
			if !strings.Contains(sc, "centre cross: this coil is centre-fed") || strings.Contains(sp, "centre-fed") {
				t.Error("the build steps do not follow the feed choice")
			}
			if !strings.Contains(sc, "bored, not screwed") || strings.Contains(sp, "bored, not screwed") {
				t.Error("the rod's fixing does not follow the feed choice")
			}
		})
	}
}

func TestPanelJackIsMounted(t *testing.T) {
	d := demoDesign(t, "demo-5g8-cone.toml", func(s string) string {
		return strings.Replace(s, "[reflector]", "[reflector]\nconnector = \"sma-bulkhead\"", 1)
	})
	b := NewBuildSheet(d, mustCutList(t, d), strings.Repeat("0", 64))
	for _, st := range b.Steps {
		if st.Title == "Prepare and solder the coax" && !strings.Contains(strings.Join(st.Text, " "), "Mount the SMA jack") {
			t.Errorf("coax step does not mount the jack: %q", st.Text)
		}
	}
}
