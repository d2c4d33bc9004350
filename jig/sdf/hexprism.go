package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// HexPrism is a solid regular hexagonal prism on the z axis, centred on the
// origin, with two flats normal to the y axis (corners on the x axis). Its
// distance is exact.
type HexPrism struct {
	apothem, half float64
}

// NewHexPrism returns a hexagonal prism measuring acrossFlats mm between
// opposite flats and height mm along z, both above zero.
func NewHexPrism(acrossFlats, height float64) (*HexPrism, error) {
	if err := positive("hex prism", "across flats", acrossFlats); err != nil {
		return nil, err
	}
	if err := positive("hex prism", "height", height); err != nil {
		return nil, err
	}
	return &HexPrism{acrossFlats / 2, height / 2}, nil
}

// Eval returns the exact signed distance from p to the prism. The point is
// folded into one 30° sector of the hexagon, where the nearest edge is the
// flat y = apothem.
//
// Source: the hexagonal-prism distance in I. Quilez, "distance functions"
// (iquilezles.org).
func (h *HexPrism) Eval(p geom.Vec3) float64 {
	const kx, ky, kz = -0.8660254037844386, 0.5, 0.5773502691896258
	x, y := math.Abs(p.X), math.Abs(p.Y)
	m := 2 * min(kx*x+ky*y, 0)
	x -= m * kx
	y -= m * ky
	cx := max(-kz*h.apothem, min(kz*h.apothem, x))
	a := math.Hypot(x-cx, y-h.apothem)
	if y < h.apothem {
		a = -a
	}
	return extrudeDist(a, math.Abs(p.Z)-h.half)
}

// Bounds returns the prism's bounding box.
func (h *HexPrism) Bounds() geom.Box3 {
	r := h.apothem * 2 / math.Sqrt(3)
	return geom.Box3{
		Min: geom.Vec3{X: -r, Y: -h.apothem, Z: -h.half},
		Max: geom.Vec3{X: r, Y: h.apothem, Z: h.half},
	}
}
