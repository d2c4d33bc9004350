package kit

import (
	"crypto/sha256"
	"slices"

	"coilwright/parts"
	"coilwright/parts/field"
)

// searchStrip lets the whole-antenna solution choose the matching strip
// when the spec's [solver] table is on, and returns the design rebuilt
// with the chosen strip and carrying the search's record (d itself when
// the solver is off). The line model's match warning gives way to the
// search's figure.
func searchStrip(d *parts.Design) (*parts.Design, error) {
	s := d.Spec
	if !s.Solver.On() {
		return d, nil
	}
	st, err := field.Build(d, field.Options{Reflector: field.IdealGround})
	if err != nil {
		return nil, err
	}
	k := st.Key(field.Options{Reflector: field.IdealGround})
	h := sha256.New()
	h.Write(k[:])
	for _, given := range []bool{s.Line("wedge.span_deg") > 0, s.Line("coil.first_turn_height_mm") > 0} {
		h.Write([]byte{map[bool]byte{true: 1}[given]})
	}
	var key [32]byte
	copy(key[:], h.Sum(nil))
	r, ok := stripMemo.get(key)
	if !ok {
		if _, r, err = field.SearchStrip(s); err != nil {
			return nil, err
		}
		if r == nil {
			return d, nil
		}
		stripMemo.put(key, r)
	}
	c := *s
	if !r.SpanGiven {
		c.Wedge.SolvedSpanDeg = r.SpanDeg
	}
	if !r.HeightGiven {
		hh := r.FirstTurnHeightMM
		c.Coil.FirstTurnHeightMM = &hh
	}
	nd, err := parts.NewDesign(&c)
	if err != nil {
		return nil, err
	}
	nd.StripSearch = r
	nd.Warnings = slices.DeleteFunc(nd.Warnings, func(w parts.Warning) bool { return w.Code == "match" })
	if w := field.StripSearchWarning(s, r); w != nil {
		nd.Warnings = append(nd.Warnings, *w)
	}
	return nd, nil
}

// stripMemo keeps the last few strip searches of this process by a digest
// of the starting geometry and which values the spec gave: the search is a
// pure function of them.
var stripMemo = newMemo[*parts.StripSearch](16)
