package plot

// LineStyle picks how a series is drawn. Each style differs from every
// other in both dash pattern and colour, so a series stays identifiable in
// grey print and to readers who do not tell the colours apart. The zero
// value means "the next style in order".
type LineStyle int

// The line styles, in the order series take them.
const (
	StyleAuto       LineStyle = iota // the series' position picks the style
	StyleSolid                       // blue, solid
	StyleDashed                      // vermilion, long dashes
	StyleDotted                      // bluish green, dots
	StyleDashDot                     // reddish purple, dash-dot
	StyleLongDash                    // orange, long dash and short gap
	StyleDashDotDot                  // grey, dash-dot-dot
)

// lineStyles holds the stroke of each style. The colours are the
// colour-blind-safe set of Okabe and Ito (2008), darkened where needed so
// each reaches at least 3:1 contrast on white.
// Source: Okabe & Ito, "Color Universal Design", 2008.
var lineStyles = [...]struct {
	name, colour, dash string
}{
	StyleSolid:      {"solid", "#0072b2", ""},
	StyleDashed:     {"dashed", "#d55e00", "3 1.5"},
	StyleDotted:     {"dotted", "#007a5a", "0.6 1"},
	StyleDashDot:    {"dash-dot", "#b0508a", "3 1 0.6 1"},
	StyleLongDash:   {"long-dash", "#a86a00", "6 1.5"},
	StyleDashDotDot: {"dash-dot-dot", "#666666", "3 1 0.6 1 0.6 1"},
}

// numStyles is how many distinct styles there are.
const numStyles = len(lineStyles) - 1

// resolve returns the style to draw the i-th series (from 0) with.
func (s LineStyle) resolve(i int) LineStyle {
	if s > StyleAuto && int(s) <= numStyles {
		return s
	}
	return LineStyle(i%numStyles + 1)
}

// valid reports whether s is StyleAuto or one of the named styles.
func (s LineStyle) valid() bool { return s >= StyleAuto && int(s) <= numStyles }
