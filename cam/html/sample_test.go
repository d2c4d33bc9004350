package html

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
	"math"
	"testing"

	"coilwright/cam/plot"
)

// Demo content for the tests: a report on a made-up kit with real plots
// drawn from demo curves.

// tinyPNG returns a small PNG picture: a dark disc on a light ground.
func tinyPNG(t *testing.T) []byte {
	t.Helper()
	img := image.NewRGBA(image.Rect(0, 0, 48, 32))
	for y := range 32 {
		for x := range 48 {
			c := color.RGBA{240, 240, 236, 255}
			if math.Hypot(float64(x)-24, float64(y)-16) < 12 {
				c = color.RGBA{200, 100, 40, 255}
			}
			img.Set(x, y, c)
		}
	}
	var b bytes.Buffer
	if err := png.Encode(&b, img); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

// partSVG is a small part drawing as cam's drawing writer makes them: its
// layer ids repeat in every such drawing.
const partSVG = `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="54mm" height="54mm" viewBox="0 0 54 54">
<!-- units: mm -->
<title>Reflector &amp; plate</title>
<g id="CUT" fill="none" stroke="#ff0000" stroke-width="0.3">
<circle cx="27" cy="27" r="25"/>
</g>
<g id="MARK" fill="none" stroke="#0000ff" stroke-width="0.3">
<path d="M 22 27 L 32 27"/>
</g>
</svg>
`

// smallDocument is a report touching every block type with little data,
// for the golden file and the structure tests.
func smallDocument(t *testing.T) Document {
	return Document{
		Title:    "Build report: demo <helix> & friends",
		Subtitle: "Right-hand helix, 430–440 MHz",
		Sections: []Section{
			{Title: "Summary", Blocks: []Block{
				Paragraph{Text: `A "quoted" <b>not bold</b> & escaped paragraph.`},
				Definitions{Items: []Definition{{Term: "Hand", Detail: "RHCP"}, {Term: "Band", Detail: "430–440 MHz"}}},
			}},
			{Title: "Drawings", Blocks: []Block{
				Figure{SVG: []byte(partSVG), Caption: "Reflector at 1:1"},
				Figure{SVG: []byte(partSVG), Caption: "The same drawing again: its ids must not clash"},
				Figure{PNG: tinyPNG(t), Alt: "Former preview", Caption: "Preview of the former"},
			}, Subsections: []Section{
				{Title: "Pattern cuts", Blocks: []Block{FigureSwitch{Label: "Pattern cut", Figures: []Figure{
					{SVG: []byte(partSVG), Name: "Elevation", Caption: "Elevation cut"},
					{SVG: []byte(partSVG), Name: "Azimuth", Caption: "Azimuth cut"},
				}}}},
			}},
			{Title: "Per-turn table", Blocks: []Block{
				Table{Caption: "Turns", Header: []string{"Turn", "Angle (°)", "Height (mm)"}, RowHeaders: true, Numeric: []bool{false, true, true},
					Rows: [][]string{{"1", "0", "0.0"}, {"2", "360", "52.4"}}},
			}},
			{Title: "Cautions", Blocks: []Block{List{Items: []string{"Wear eye protection when cutting wire.", "Deburr the reflector edge."}}}},
			{Title: "Warnings", Blocks: []Block{Warnings{Items: []string{"Pitch angle 16° is outside 12–15°."}}}},
			{Title: "Provenance", Blocks: []Block{Preformatted{Text: "spec sha256  0123abcd…\n<manifest>"}}},
		},
		Footer: "Made by coilwright (test build)",
	}
}

// plotSVG renders one plot with write into bytes.
func plotSVG(t *testing.T, write func(*bytes.Buffer) error) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := write(&b); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

// sampleReport is a fuller report with real plots, for the browser tests.
func sampleReport(t *testing.T) Document {
	t.Helper()
	var fs, sw, rh, lh, ar []float64
	for f := 400.0; f <= 480; f++ {
		u := (f - 436) / 40
		fs = append(fs, f)
		sw = append(sw, 1.2+30*u*u)
		rh = append(rh, 12-4*u*u)
		lh = append(lh, -8+6*u*u)
		ar = append(ar, 1.2+5*u*u)
	}
	band := []plot.Band{{LowMHz: 430, HighMHz: 440, Label: "Band"}}
	match := plotSVG(t, func(b *bytes.Buffer) error {
		return plot.WriteFrequencyChart(b, plot.FrequencyChart{
			Title: "VSWR", Note: "Textbook estimate (demo data)", Bands: band,
			Panels: []plot.Panel{{Left: plot.YAxis{Label: "VSWR", Min: 1, Max: 6},
				Series:  []plot.Series{{Name: "VSWR", FreqMHz: fs, Values: sw}},
				Targets: []plot.Target{{Value: 2, Label: "Target VSWR 2"}}}},
		}, plot.ChartOptions{})
	})
	gain := plotSVG(t, func(b *bytes.Buffer) error {
		return plot.WriteFrequencyChart(b, plot.FrequencyChart{
			Title: "Gain and axial ratio", Bands: band,
			Panels: []plot.Panel{
				{Left: plot.YAxis{Label: "Gain", Unit: "dBic"}, Series: []plot.Series{{Name: "RHCP", Unit: "dBic", FreqMHz: fs, Values: rh}, {Name: "LHCP", Unit: "dBic", FreqMHz: fs, Values: lh}}},
				{Left: plot.YAxis{Label: "Axial ratio", Unit: "dB"}, Series: []plot.Series{{Name: "Axial ratio", Unit: "dB", FreqMHz: fs, Values: ar}}},
			},
		}, plot.ChartOptions{})
	})
	var cuts []Figure
	for _, cut := range []string{"Elevation", "Azimuth"} {
		var a, r, l []float64
		for k := 0; k < 360; k += 3 {
			th := float64(k) * math.Pi / 180
			a = append(a, th)
			r = append(r, 60*math.Log10(math.Max((1+math.Cos(th))/2, 1e-3)))
			l = append(l, -18+10*math.Log10(0.2+0.8*math.Abs(math.Sin(th))))
		}
		svg := plotSVG(t, func(b *bytes.Buffer) error {
			return plot.WritePolarPattern(b, plot.PolarPattern{Title: cut + " cut at 436 MHz", Note: "0 dB = RHCP peak (demo data)",
				Traces: []plot.Trace{{Name: "RHCP", AngleRad: a, Level: r, Closed: true}, {Name: "LHCP", AngleRad: a, Level: l, Closed: true}}}, plot.PolarOptions{})
		})
		cuts = append(cuts, Figure{SVG: svg, Name: cut, Caption: cut + " cut, both circular components"})
	}
	part := plotSVG(t, func(b *bytes.Buffer) error {
		return plot.WriteDrawing(b, plot.Drawing{Title: "Reflector", SVG: []byte(partSVG), Scale: 1}, plot.DrawingOptions{})
	})
	d := smallDocument(t)
	d.Sections = append([]Section{{Title: "Plots", Blocks: []Block{
		Figure{SVG: match, Caption: "VSWR across the band, with the matching target"},
		Figure{SVG: gain, Caption: "Gain of both hands and axial ratio"},
		FigureSwitch{Label: "Pattern cut", Figures: cuts},
		Figure{SVG: part, Caption: "Reflector, full size"},
	}}}, d.Sections...)
	return d
}
