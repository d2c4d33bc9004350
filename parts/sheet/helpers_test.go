package sheet

import (
	"testing"

	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/designtest"
)

var (
	demoSpec   = designtest.DemoSpec
	mustParse  = designtest.MustParse
	mustDesign = designtest.MustDesign
	demoDesign = designtest.DemoDesign
	withFeed   = designtest.WithFeed
)

// mustCutList works out d's cut list or fails t.
func mustCutList(t *testing.T, d *parts.Design) *cutlist.CutList {
	t.Helper()
	cl, err := cutlist.NewCutList(d)
	if err != nil {
		t.Fatal(err)
	}
	return cl
}

// feedTol is the tolerance on positions built from the coil's own numbers.
const feedTol = 1e-9
