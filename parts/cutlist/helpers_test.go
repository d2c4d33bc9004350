package cutlist

import (
	"coilwright/parts"
	"coilwright/parts/designtest"
	"coilwright/parts/spec"
)

var (
	demoSpec   = designtest.DemoSpec
	mustParse  = designtest.MustParse
	demoDesign = designtest.DemoDesign
	withFeed   = designtest.WithFeed
)

// designSpec parses src and works out its design, returning the first
// error.
func designSpec(src []byte) (*spec.Spec, error) {
	s, err := spec.ParseSpec(src)
	if err != nil {
		return nil, err
	}
	if _, err := parts.NewDesign(s); err != nil {
		return nil, err
	}
	return s, nil
}
