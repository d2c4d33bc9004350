package preview

import (
	"image"
	"image/color"
	"image/png"
	"io"
	"math"

	"coilwright/cam/geom"
)

// The preview is a flat-shaded orthographic picture of a mesh: each face is
// lit by its normal against a fixed key light plus ambient light, and drawn
// into a depth buffer with 2×2 supersampling, then averaged down and encoded
// as PNG. Faces are visited in order and ties in depth keep the first face,
// so the picture depends only on the mesh and the options.

// PreviewOptions controls WritePreview. The zero value draws an 800 px
// square picture from DefaultViewFrom.
type PreviewOptions struct {
	Size     int       // picture width and height in pixels; 0 for 800
	ViewFrom geom.Vec3 // direction from the mesh towards the eye; zero for DefaultViewFrom
}

// DefaultViewFrom returns the view that looks down on the mesh from the front right, so an
// upright part shows its side and its top.
func DefaultViewFrom() geom.Vec3 { return geom.Vec3{X: 0.9, Y: -1.5, Z: 0.9} }

// Preview colours.
var (
	previewBackground = color.RGBA{245, 245, 242, 255}
	previewBase       = [3]float64{226, 122, 48} // filament orange
)

// WritePreview draws m and writes the picture to w as PNG. It does not
// modify m.
func WritePreview(w io.Writer, m *geom.Mesh, opt PreviewOptions) error {
	size := opt.Size
	if size <= 0 {
		size = 800
	}
	view := opt.ViewFrom
	if view == (geom.Vec3{}) {
		view = DefaultViewFrom()
	}
	img := renderMesh(m, size, view.Normalize())
	return (&png.Encoder{CompressionLevel: png.BestSpeed}).Encode(w, img)
}

// renderMesh rasterises m into a size × size picture seen from direction d.
func renderMesh(m *geom.Mesh, size int, d geom.Vec3) *image.RGBA {
	const ss = 2 // supersampling per axis
	n := size * ss
	// Camera frame: right = up × d, with up the z axis (or y when looking
	// straight down), and screen up = d × right.
	up := geom.Vec3{Z: 1}
	if math.Abs(d.Z) > 0.999 {
		up = geom.Vec3{Y: 1}
	}
	right := up.Cross(d).Normalize()
	sup := d.Cross(right)
	b := m.Bounds()
	c := b.Center()
	radius := b.Size().Len() / 2
	if radius == 0 {
		radius = 1
	}
	scale := float64(n) / (2 * radius * 1.08)
	light := geom.Vec3{X: 0.4, Y: -0.5, Z: 1}.Normalize()
	depth := make([]float64, n*n)
	for i := range depth {
		depth[i] = math.Inf(-1)
	}
	// Each sample keeps the index of the face it shows (−1 for the
	// background) and each face its colour: a quarter of the memory of a
	// colour per sample.
	face := make([]int32, n*n)
	for i := range face {
		face[i] = -1
	}
	faceRGB := make([][3]float64, len(m.Faces))
	var sx, sy, sz [3]float64
	for i, f := range m.Faces {
		nrm := m.Normal(i)
		if nrm.Dot(d) <= 0 {
			continue // faces away from the eye
		}
		shade := 0.35 + 0.65*math.Max(0, nrm.Dot(light))
		faceRGB[i] = [3]float64{previewBase[0] * shade, previewBase[1] * shade, previewBase[2] * shade}
		for k := range 3 {
			p := m.Vertices[f[k]].Sub(c)
			sx[k] = float64(n)/2 + p.Dot(right)*scale
			sy[k] = float64(n)/2 - p.Dot(sup)*scale
			sz[k] = p.Dot(d)
		}
		area := (sx[1]-sx[0])*(sy[2]-sy[0]) - (sx[2]-sx[0])*(sy[1]-sy[0])
		if area == 0 {
			continue
		}
		x0 := max(0, int(math.Floor(min(sx[0], sx[1], sx[2]))))
		x1 := min(n-1, int(math.Ceil(max(sx[0], sx[1], sx[2]))))
		y0 := max(0, int(math.Floor(min(sy[0], sy[1], sy[2]))))
		y1 := min(n-1, int(math.Ceil(max(sy[0], sy[1], sy[2]))))
		for y := y0; y <= y1; y++ {
			py := float64(y) + 0.5
			for x := x0; x <= x1; x++ {
				px := float64(x) + 0.5
				w0 := ((sx[1]-px)*(sy[2]-py) - (sx[2]-px)*(sy[1]-py)) / area
				w1 := ((sx[2]-px)*(sy[0]-py) - (sx[0]-px)*(sy[2]-py)) / area
				w2 := 1 - w0 - w1
				if w0 < 0 || w1 < 0 || w2 < 0 {
					continue
				}
				z := w0*sz[0] + w1*sz[1] + w2*sz[2]
				if j := y*n + x; z > depth[j] {
					depth[j], face[j] = z, int32(i)
				}
			}
		}
	}
	background := [3]float64{float64(previewBackground.R), float64(previewBackground.G), float64(previewBackground.B)}
	img := image.NewRGBA(image.Rect(0, 0, size, size))
	for y := range size {
		for x := range size {
			var s [3]float64
			for dy := range ss {
				for dx := range ss {
					c := background
					if fi := face[(y*ss+dy)*n+x*ss+dx]; fi >= 0 {
						c = faceRGB[fi]
					}
					s[0], s[1], s[2] = s[0]+c[0], s[1]+c[1], s[2]+c[2]
				}
			}
			q := float64(ss * ss)
			img.SetRGBA(x, y, color.RGBA{uint8(math.Round(s[0] / q)), uint8(math.Round(s[1] / q)), uint8(math.Round(s[2] / q)), 255})
		}
	}
	return img
}
