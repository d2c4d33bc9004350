package geom

import (
	"math"
	"testing"
)

// geomTol is the tolerance in mm for exact constructions.
const geomTol = 1e-12

func near(a, b Vec2, tol float64) bool { return a.Sub(b).Len() <= tol }

func TestBulgeArc(t *testing.T) {
	// Source: DXF reference (bulge = tan(θ/4), positive counter-clockwise):
	// a quarter-circle from (1,0) to (0,1) about the origin has bulge
	// tan(π/8).
	q := math.Tan(math.Pi / 8)
	tests := []struct {
		name   string
		p, q   Vec2
		bulge  float64
		centre Vec2
		radius float64
	}{
		{"quarter turn counter-clockwise", Vec2{1, 0}, Vec2{0, 1}, q, Vec2{0, 0}, 1},
		{"quarter turn clockwise", Vec2{0, 1}, Vec2{1, 0}, -q, Vec2{0, 0}, 1},
		{"half circle", Vec2{-2, 0}, Vec2{2, 0}, 1, Vec2{0, 0}, 2},
		{"three quarters", Vec2{0, -1}, Vec2{-1, 0}, math.Tan(3 * math.Pi / 8), Vec2{0, 0}, 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			a := BulgeArc(tc.p, tc.q, tc.bulge)
			if !near(a.Center, tc.centre, 1e-9) || math.Abs(a.Radius-tc.radius) > 1e-9 {
				t.Fatalf("centre %v radius %g, want %v %g", a.Center, a.Radius, tc.centre, tc.radius)
			}
			from, to := tc.p, tc.q
			if tc.bulge < 0 {
				from, to = to, from
			}
			if !near(a.Point(a.Start), from, 1e-9) || !near(a.Point(a.End), to, 1e-9) {
				t.Errorf("arc runs %v → %v, want %v → %v", a.Point(a.Start), a.Point(a.End), from, to)
			}
		})
	}
}

func TestArcBounds(t *testing.T) {
	a := Arc{Vec2{0, 0}, 2, -math.Pi / 4, math.Pi / 2}
	b := a.Bounds()
	// The sweep passes angle 0 (x = 2) and ends at π/2, the point (0, 2).
	want := Box2{Vec2{0, -math.Sqrt2}, Vec2{2, 2}}
	if !near(b.Min, want.Min, 1e-9) || !near(b.Max, want.Max, 1e-9) {
		t.Errorf("Bounds() = %v, want %v", b, want)
	}
}

func TestPlaceKeepsShape(t *testing.T) {
	c := Contour{Vertices: []Vertex{{Vec2{0, 0}, 0}, {Vec2{4, 0}, 0.3}, {Vec2{4, 3}, 0}}, Closed: true}
	p := Placement{Angle: 0.7, Offset: Vec2{10, -5}}
	moved := c.Place(p).(Contour)
	const areaTol = 1e-9
	if d := math.Abs(moved.Flatten(0.01).Area() - c.Flatten(0.01).Area()); d > areaTol {
		t.Errorf("area changed by %g mm²", d)
	}
	if !near(moved.Vertices[0].P, Vec2{10, -5}, geomTol) {
		t.Errorf("origin moved to %v", moved.Vertices[0].P)
	}
}

func TestFlattenTolerance(t *testing.T) {
	for _, tol := range []float64{0.1, 0.01, 0.001} {
		pts := Circle{Vec2{3, 4}, 25}.Flatten(tol)
		for i := range pts {
			mid := pts[i].Add(pts[(i+1)%len(pts)]).Scale(0.5)
			if s := 25 - mid.Sub(Vec2{3, 4}).Len(); s > tol+geomTol {
				t.Fatalf("tol %g: sagitta %g", tol, s)
			}
		}
	}
}

func TestDrawingAdd(t *testing.T) {
	var d Drawing
	d.Add("CUT", Circle{Radius: 1})
	d.Add("MARK", Line{})
	d.Add("CUT", Circle{Radius: 2})
	if len(d.Layers) != 2 || len(d.Layers[0].Entities) != 2 || d.Layers[1].Name != "MARK" {
		t.Errorf("layers %+v", d.Layers)
	}
	if b := d.Bounds(); !near(b.Min, Vec2{-2, -2}, geomTol) || !near(b.Max, Vec2{2, 2}, geomTol) {
		t.Errorf("Bounds() = %v", b)
	}
}
