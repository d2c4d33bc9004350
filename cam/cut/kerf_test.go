package cut

import (
	"math"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/internal/fixture"
)

// kerfTol is the tolerance in mm on offset distances and radii.
const kerfTol = 1e-9

// segDist returns the distance from x to segment i of c (line or arc).
func segDist(c geom.Contour, i int, x geom.Vec2) float64 {
	p, q, b := c.Segment(i)
	if b == 0 {
		d := q.Sub(p)
		t := math.Max(0, math.Min(1, x.Sub(p).Dot(d)/d.Dot(d)))
		return x.Sub(p.Add(d.Scale(t))).Len()
	}
	a := geom.BulgeArc(p, q, b)
	ang := math.Atan2(x.Y-a.Center.Y, x.X-a.Center.X)
	for ang < a.Start {
		ang += 2 * math.Pi
	}
	if ang <= a.End {
		return math.Abs(x.Sub(a.Center).Len() - a.Radius)
	}
	return math.Min(x.Sub(p).Len(), x.Sub(q).Len())
}

// boundaryDist returns the distance from x to the contour c.
func boundaryDist(c geom.Contour, x geom.Vec2) float64 {
	d := math.Inf(1)
	for i := range c.Segments() {
		d = math.Min(d, segDist(c, i, x))
	}
	return d
}

// checkOffset samples the offset contour and checks every sample lies
// |d| from the original and on the expected side.
func checkOffset(t *testing.T, orig, off geom.Contour, d float64) {
	t.Helper()
	origPoly := orig.Flatten(1e-5)
	for _, x := range off.Flatten(1e-4) {
		if got := boundaryDist(orig, x); math.Abs(got-math.Abs(d)) > 1e-6 {
			t.Fatalf("point %v lies %.9f mm from the original, want %g", x, got, math.Abs(d))
		}
		if inside := PointInPolygon(x, origPoly); inside != (d < 0) {
			t.Fatalf("point %v on the wrong side (inside = %v, offset %g)", x, inside, d)
		}
	}
}

func square(s float64) geom.Contour {
	return geom.Contour{Closed: true, Vertices: []geom.Vertex{
		{P: geom.Vec2{X: 0, Y: 0}}, {P: geom.Vec2{X: s, Y: 0}}, {P: geom.Vec2{X: s, Y: s}}, {P: geom.Vec2{X: 0, Y: s}},
	}}
}

func TestOffsetContour(t *testing.T) {
	t.Run("square grows with round corners", func(t *testing.T) {
		// Source: Steiner's formula for a convex region offset by d:
		// A(d) = A + P·d + π·d² (e.g. Santaló, Integral Geometry, 1976).
		off, err := OffsetContour(square(10), 1)
		if err != nil {
			t.Fatal(err)
		}
		want := 100 + 40 + math.Pi
		if got := geom.Polyline(off.Flatten(1e-6)).Area(); math.Abs(got-want) > 1e-4 {
			t.Errorf("area %.6f mm², want %.6f", got, want)
		}
		checkOffset(t, square(10), off, 1)
	})
	t.Run("square shrinks with sharp corners", func(t *testing.T) {
		off, err := OffsetContour(square(10), -1)
		if err != nil {
			t.Fatal(err)
		}
		if got := geom.Polyline(off.Flatten(1e-6)).Area(); math.Abs(got-64) > 1e-9 {
			t.Errorf("area %.9f mm², want 64", got)
		}
		checkOffset(t, square(10), off, -1)
	})
	t.Run("clockwise input gives the same result", func(t *testing.T) {
		cw := reverseContour(square(10))
		off, err := OffsetContour(cw, 1)
		if err != nil {
			t.Fatal(err)
		}
		if got := geom.Polyline(off.Flatten(1e-6)).Area(); math.Abs(got-(140+math.Pi)) > 1e-4 {
			t.Errorf("area %.6f mm²", got)
		}
	})
	t.Run("D-hole shrinks", func(t *testing.T) {
		// SMA bulkhead D-hole, Ø 6.5 mm with 6.0 mm across the flat.
		y, r := 2.75, 3.25
		x := math.Sqrt(r*r - y*y)
		theta := 2*math.Pi - 2*math.Atan2(x, y)
		dh := geom.Contour{Closed: true, Vertices: []geom.Vertex{
			{P: geom.Vec2{X: -x, Y: y}, Bulge: math.Tan(theta / 4)}, {P: geom.Vec2{X: x, Y: y}},
		}}
		for _, d := range []float64{-0.1, 0.1} {
			off, err := OffsetContour(dh, d)
			if err != nil {
				t.Fatal(err)
			}
			checkOffset(t, dh, off, d)
		}
	})
	t.Run("concave polygon both ways", func(t *testing.T) {
		// An L-shaped plate with one concave corner.
		l := geom.Contour{Closed: true, Vertices: []geom.Vertex{
			{P: geom.Vec2{X: 0, Y: 0}}, {P: geom.Vec2{X: 20, Y: 0}}, {P: geom.Vec2{X: 20, Y: 8}},
			{P: geom.Vec2{X: 8, Y: 8}}, {P: geom.Vec2{X: 8, Y: 20}}, {P: geom.Vec2{X: 0, Y: 20}},
		}}
		for _, d := range []float64{-0.5, 0.5} {
			off, err := OffsetContour(l, d)
			if err != nil {
				t.Fatal(err)
			}
			checkOffset(t, l, off, d)
		}
	})
	t.Run("curved strip like a wedge", func(t *testing.T) {
		poly := fixture.Strip(8.2, math.Pi/2, 4.6, 2.7)
		c := geom.Contour{Closed: true}
		for _, p := range poly {
			c.Vertices = append(c.Vertices, geom.Vertex{P: p})
		}
		for _, d := range []float64{-0.5, -0.075, 0.075, 0.5} {
			off, err := OffsetContour(c, d)
			if err != nil {
				t.Fatal(err)
			}
			checkOffset(t, c, off, d)
		}
	})
	t.Run("arc too small", func(t *testing.T) {
		c := geom.Contour{Closed: true, Vertices: []geom.Vertex{{P: geom.Vec2{X: -1}, Bulge: 1}, {P: geom.Vec2{X: 1}, Bulge: 1}}}
		if _, err := OffsetContour(c, -2); err == nil {
			t.Error("a circle of radius 1 shrunk by 2 was accepted")
		}
	})
}

func TestApplyKerf(t *testing.T) {
	var d geom.Drawing
	d.Add("CUT", geom.Circle{Radius: 25}, geom.Circle{Center: geom.Vec2{X: 8}, Radius: 1.84}, square(4).Place(geom.Placement{Offset: geom.Vec2{X: -10, Y: -2}}))
	d.Add("MARK", geom.Line{A: geom.Vec2{X: -1}, B: geom.Vec2{X: 1}})
	k, err := ApplyKerf(d, 0.2)
	if err != nil {
		t.Fatal(err)
	}
	cut, _ := k.Layer("CUT")
	// Common practice (no published source): the tool path runs half a
	// kerf outside an outline and half a kerf inside a hole, so a 0.2 mm
	// kerf gives 25 + 0.1, 1.84 − 0.1 and a 4 − 0.2 mm square.
	if r := cut.Entities[0].(geom.Circle).Radius; math.Abs(r-25.1) > kerfTol {
		t.Errorf("outline radius %.9f, want 25.1", r)
	}
	if r := cut.Entities[1].(geom.Circle).Radius; math.Abs(r-1.74) > kerfTol {
		t.Errorf("hole radius %.9f, want 1.74", r)
	}
	if a := geom.Polyline(cut.Entities[2].(geom.Contour).Flatten(1e-6)).Area(); math.Abs(a-3.8*3.8) > 1e-9 {
		t.Errorf("square hole area %.9f, want %.9f", a, 3.8*3.8)
	}
	mark, _ := k.Layer("MARK")
	if mark.Entities[0] != d.Layers[1].Entities[0] {
		t.Error("MARK layer changed")
	}
	t.Run("open path refused", func(t *testing.T) {
		var o geom.Drawing
		o.Add("CUT", geom.Line{B: geom.Vec2{X: 1}})
		if _, err := ApplyKerf(o, 0.2); err == nil {
			t.Error("accepted")
		}
	})
}

func TestOffsetRefusesFolding(t *testing.T) {
	// A 1 mm wide slot cannot be shrunk by 0.6 mm each side.
	slot := geom.Contour{Closed: true, Vertices: []geom.Vertex{
		{P: geom.Vec2{X: 0, Y: 0}}, {P: geom.Vec2{X: 10, Y: 0}}, {P: geom.Vec2{X: 10, Y: 1}}, {P: geom.Vec2{X: 0, Y: 1}},
	}}
	if _, err := OffsetContour(slot, -0.6); err == nil {
		t.Error("a fold was accepted")
	}
	if _, err := OffsetContour(slot, -0.4); err != nil {
		t.Errorf("a 0.4 mm shrink of a 1 mm slot: %v", err)
	}
}
