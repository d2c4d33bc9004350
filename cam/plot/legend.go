package plot

// legendEntry is one item of a legend: a line or area swatch in a style,
// then its text.
type legendEntry struct {
	text  string
	style LineStyle
	area  bool
	// Placed by layoutLegend: row and left edge in mm.
	row int
	x   float64
}

// legendGapMM is the space between legend items.
const legendGapMM = 6

// layoutLegend places entries left to right between x0 and x1, wrapping to
// new rows, and returns the number of rows.
func layoutLegend(es []legendEntry, x0, x1 float64) (int, error) {
	if len(es) == 0 {
		return 0, nil
	}
	x, row := x0, 0
	for i := range es {
		tw, err := textWidth(es[i].text, labelCapMM, false)
		if err != nil {
			return 0, err
		}
		w := legendSwatchMM + 1.5 + tw
		if x > x0 && x+w > x1 {
			x, row = x0, row+1
		}
		es[i].row, es[i].x = row, x
		x += w + legendGapMM
	}
	return row + 1, nil
}

// drawLegend draws entries placed by layoutLegend with their first row's
// baseline region starting at top.
func drawLegend(d *svgDoc, es []legendEntry, x0, x1, top float64) {
	if len(es) == 0 {
		return
	}
	d.printf("<g class=\"legend\">\n")
	for _, e := range es {
		s := lineStyles[e.style]
		y := top + float64(e.row)*legendRowMM
		if e.area {
			d.printf("<rect class=\"swatch\" x=\"%s\" y=\"%s\" width=\"%s\" height=\"%s\" fill=\"%s\" fill-opacity=\"0.18\" stroke=\"%s\" stroke-width=\"%s\"%s/>\n",
				num(e.x), num(y-2.6), num(legendSwatchMM), num(3.2), s.colour, s.colour, num(gridWidthMM*2), dashAttr(s.dash))
		} else {
			d.printf("<line class=\"swatch\" data-style=\"%s\" x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\" stroke=\"%s\" stroke-width=\"%s\"%s/>\n",
				s.name, num(e.x), num(y-1.1), num(e.x+legendSwatchMM), num(y-1.1), s.colour, num(seriesWidthMM), dashAttr(s.dash))
		}
		d.text("legend-label", inkColour, label{text: e.text, capMM: labelCapMM, x: e.x + legendSwatchMM + 1.5, y: y})
	}
	d.printf("</g>\n")
}
