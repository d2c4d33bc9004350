package jig

import (
	"fmt"

	"coilwright/cam/geom"
)

// glyphs is a single-stroke font for flange lettering on a 4 × 6 grid (x to
// the right, y up from the baseline), drawn with a round pen. It holds only
// what the labels need: digits, the point, the space and the letters of
// "RHCP", "LHCP", "MHz" and "GHz".
var glyphs = map[rune][][][2]float64{
	'0': {{{1, 0}, {3, 0}, {4, 1}, {4, 5}, {3, 6}, {1, 6}, {0, 5}, {0, 1}, {1, 0}}},
	'1': {{{1, 5}, {2, 6}, {2, 0}}, {{1, 0}, {3, 0}}},
	'2': {{{0, 5}, {1, 6}, {3, 6}, {4, 5}, {4, 4}, {0, 0}, {4, 0}}},
	'3': {{{0, 5}, {1, 6}, {3, 6}, {4, 5}, {4, 4}, {3, 3}, {1, 3}}, {{3, 3}, {4, 2}, {4, 1}, {3, 0}, {1, 0}, {0, 1}}},
	'4': {{{3, 0}, {3, 6}, {0, 2}, {4, 2}}},
	'5': {{{4, 6}, {0, 6}, {0, 3}, {3, 3}, {4, 2}, {4, 1}, {3, 0}, {0, 0}}},
	'6': {{{3, 6}, {1, 6}, {0, 5}, {0, 1}, {1, 0}, {3, 0}, {4, 1}, {4, 2}, {3, 3}, {0, 3}}},
	'7': {{{0, 6}, {4, 6}, {1, 0}}},
	'8': {{{1, 3}, {0, 4}, {0, 5}, {1, 6}, {3, 6}, {4, 5}, {4, 4}, {3, 3}, {1, 3}, {0, 2}, {0, 1}, {1, 0}, {3, 0}, {4, 1}, {4, 2}, {3, 3}}},
	'9': {{{4, 3}, {1, 3}, {0, 4}, {0, 5}, {1, 6}, {3, 6}, {4, 5}, {4, 1}, {3, 0}, {1, 0}}},
	'.': {{{2, 0}, {2, 0}}},
	' ': nil,
	'C': {{{4, 5}, {3, 6}, {1, 6}, {0, 5}, {0, 1}, {1, 0}, {3, 0}, {4, 1}}},
	'G': {{{4, 5}, {3, 6}, {1, 6}, {0, 5}, {0, 1}, {1, 0}, {3, 0}, {4, 1}, {4, 3}, {2, 3}}},
	'H': {{{0, 0}, {0, 6}}, {{4, 0}, {4, 6}}, {{0, 3}, {4, 3}}},
	'L': {{{0, 6}, {0, 0}, {4, 0}}},
	'M': {{{0, 0}, {0, 6}, {2, 3}, {4, 6}, {4, 0}}},
	'P': {{{0, 0}, {0, 6}, {3, 6}, {4, 5}, {4, 4}, {3, 3}, {0, 3}}},
	'R': {{{0, 0}, {0, 6}, {3, 6}, {4, 5}, {4, 4}, {3, 3}, {0, 3}}, {{2, 3}, {4, 0}}},
	// The z is a small letter at 3.5 of 6 units and narrower than the
	// capitals, so "GHz" does not read as "GHZ" on the flange.
	'z': {{{0.5, 3.5}, {3.5, 3.5}, {0.5, 0}, {3.5, 0}}},
}

// Font metrics in grid units.
const (
	glyphWidth   = 4.0
	glyphHeight  = 6.0
	glyphAdvance = 5.5
)

// glyphStrokes returns the segments of glyph r in grid units, or an error
// for a character the font lacks.
func glyphStrokes(r rune) ([][2]geom.Vec2, error) {
	lines, ok := glyphs[r]
	if !ok {
		return nil, fmt.Errorf("flange lettering has no glyph for %q", r)
	}
	var seg [][2]geom.Vec2
	for _, l := range lines {
		for i := 1; i < len(l); i++ {
			a, b := l[i-1], l[i]
			seg = append(seg, [2]geom.Vec2{{X: a[0], Y: a[1]}, {X: b[0], Y: b[1]}})
		}
	}
	return seg, nil
}
