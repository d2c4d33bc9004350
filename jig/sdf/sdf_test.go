package sdf

import (
	"errors"
	"math"
	"math/rand/v2"
	"testing"

	"coilwright/cam/geom"
)

// exactTol is the agreement expected between two exact distance formulas, in mm.
const exactTol = 1e-9

func must[T any](t *testing.T) func(T, error) T {
	return func(v T, err error) T {
		t.Helper()
		if err != nil {
			t.Fatal(err)
		}
		return v
	}
}

func TestPrimitiveDistances(t *testing.T) {
	cyl := must[*Cylinder](t)(NewCylinder(5, 10))
	cone := must[*Cone](t)(NewCone(4, 3, 0))
	box := must[*Box](t)(NewBox(geom.Vec3{X: 2, Y: 4, Z: 6}))
	hex := must[*HexPrism](t)(NewHexPrism(10, 2))
	half := must[*HalfSpace](t)(NewHalfSpace(geom.Vec3{X: 1, Y: 1}, geom.Vec3{X: 1}))
	s2 := math.Sqrt2
	// Source: elementary geometry; each expected value is worked by hand in
	// the case name (Pythagoras on the nearest feature).
	cases := []struct {
		name string
		s    SDF3
		p    geom.Vec3
		want float64
	}{
		{"cylinder axis centre is radius deep", cyl, geom.Vec3{}, -5},
		{"cylinder side 2 mm out", cyl, geom.Vec3{X: 7}, 2},
		{"cylinder rim corner 3-4-5", cyl, geom.Vec3{X: 8, Z: 9}, 5},
		{"cylinder near cap inside", cyl, geom.Vec3{Z: 4.5}, -0.5},
		{"cone apex above by 1", cone, geom.Vec3{Z: 3}, 1},
		{"cone base centre below by 2", cone, geom.Vec3{Z: -4}, 2},
		// Side line from (3,−2) to (0,2): slope 4/3; point (3,2) lies 12/5 off it.
		{"cone beside apex off slant", cone, geom.Vec3{X: 3, Z: 2}, 12.0 / 5},
		{"box face", box, geom.Vec3{X: 3}, 2},
		{"box edge", box, geom.Vec3{X: 4, Y: 5}, math.Hypot(3, 3)},
		{"box centre", box, geom.Vec3{}, -1},
		{"hex flat", hex, geom.Vec3{Y: 7}, 2},
		// Corner at circumradius 5/cos30° = 10/√3 on the x axis.
		{"hex corner", hex, geom.Vec3{X: 7}, 7 - 10/math.Sqrt(3)},
		{"hex above centre", hex, geom.Vec3{Z: 3}, 2},
		{"half-space diagonal", half, geom.Vec3{X: 2, Y: 1}, 2 / s2},
		{"half-space inside", half, geom.Vec3{}, -1 / s2},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			if got := c.s.Eval(c.p); math.Abs(got-c.want) > exactTol {
				t.Errorf("Eval(%v) = %.12f, want %.12f", c.p, got, c.want)
			}
		})
	}
}

// TestLipschitz checks |f(p) − f(q)| ≤ |p − q| on random pairs for every
// shape, the property the mesher's culling relies on.
func TestLipschitz(t *testing.T) {
	const slack = 1e-6 // relative, for rounding and finite differences
	rng := rand.New(rand.NewPCG(1, 2))
	cyl := must[*Cylinder](t)(NewCylinder(5, 10))
	cone := must[*Cone](t)(NewCone(8, 6, 2))
	hex := must[*HexPrism](t)(NewHexPrism(6.35, 10))
	box := must[*Box](t)(NewBox(geom.Vec3{X: 4, Y: 4, Z: 4}))
	tri := must[*Polygon](t)(NewPolygon(geom.Polyline{{X: 1, Y: -3}, {X: 6, Y: 0}, {X: 1, Y: 4}}))
	rev := must[*Revolve](t)(NewRevolve(tri))
	circ := must[*Circle](t)(NewCircle(geom.Vec2{}, 0.8))
	sweep := must[*HelixSweep](t)(NewHelixSweep(testHelix(1), circ))
	uni := must[SDF3](t)(Union(1, cyl, Move(box, Translation(geom.Vec3{X: 5}))))
	dif := must[SDF3](t)(Difference(cyl, Cut{hex, 0.5}, Cut{sweep, 0.3}))
	inter := must[SDF3](t)(Intersection(0.5, cone, Move(box, RotationZ(0.3))))
	// A teardrop section: a circle and the 45° roof over it, whose union has
	// a roof edge inside the circle.
	k := 0.9 / math.Sqrt2
	roof := must[*Polygon](t)(NewPolygon(geom.Polyline{{X: -k, Y: k}, {X: k, Y: k}, {Y: 0.9 * math.Sqrt2}}))
	circ9 := must[*Circle](t)(NewCircle(geom.Vec2{}, 0.9))
	tear := must[SDF2](t)(Union2(circ9, roof))
	teardrop := must[*HelixSweep](t)(NewHelixSweep(testHelix(-1), tear))
	vg := must[*VGroove](t)(NewVGroove([][2]geom.Vec2{{{X: -3}, {X: 3, Y: 2}}, {{Y: -4}, {Y: 4}}}, 2, 0.6, 0.45))
	shapes := map[string]SDF3{
		"cylinder": cyl, "cone": cone, "hex": hex, "revolve": rev, "sweep": sweep,
		"smooth union": uni, "smooth difference": dif, "smooth intersection": inter,
		"offset": Offset(box, 0.7), "v-groove": vg, "teardrop sweep": teardrop,
	}
	for _, name := range []string{"cylinder", "cone", "hex", "revolve", "sweep", "smooth union", "smooth difference", "smooth intersection", "offset", "v-groove", "teardrop sweep"} {
		s := shapes[name]
		t.Run(name, func(t *testing.T) {
			for range 20000 {
				p := geom.Vec3{X: rng.Float64()*30 - 15, Y: rng.Float64()*30 - 15, Z: rng.Float64()*40 - 10}
				d := geom.Vec3{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}.Normalize().Scale(rng.Float64() * 0.5)
				q := p.Add(d)
				if diff := math.Abs(s.Eval(p) - s.Eval(q)); diff > d.Len()*(1+slack)+1e-9 {
					t.Fatalf("|f(%v) − f(%v)| = %g exceeds distance %g", p, q, diff, d.Len())
				}
			}
		})
	}
}

func TestRevolveMatchesCone(t *testing.T) {
	// The same frustum built two ways: the closed-form cone and a revolved
	// trapezoid (drawn symmetric about the axis) through the polygon distance.
	cone := must[*Cone](t)(NewCone(8, 6, 2))
	trap := must[*Polygon](t)(NewPolygon(geom.Polyline{{X: -6, Y: -4}, {X: 6, Y: -4}, {X: 2, Y: 4}, {X: -2, Y: 4}}))
	rev := must[*Revolve](t)(NewRevolve(trap))
	rng := rand.New(rand.NewPCG(3, 4))
	for range 5000 {
		p := geom.Vec3{X: rng.Float64()*20 - 10, Y: rng.Float64()*20 - 10, Z: rng.Float64()*16 - 8}
		if a, b := cone.Eval(p), rev.Eval(p); math.Abs(a-b) > exactTol {
			t.Fatalf("at %v cone %g, revolve %g", p, a, b)
		}
	}
}

func TestVGrooveAndOffset(t *testing.T) {
	vg := must[*VGroove](t)(NewVGroove([][2]geom.Vec2{{{X: -3}, {X: 3}}}, 2, 0.6, 0.45))
	box := must[*Box](t)(NewBox(geom.Vec3{X: 2, Y: 2, Z: 2}))
	// Source: the cut's definition: 0.6 mm deep on the line, 0.45 mm half
	// width at the face; the offset box's corner is a sphere of radius 0.5
	// about (1, 1, 1).
	cases := []struct {
		name string
		s    SDF3
		p    geom.Vec3
		want float64
	}{
		{"groove bottom on the line", vg, geom.Vec3{Z: 1.4}, 0},
		{"groove edge at the face", vg, geom.Vec3{Y: 0.45, Z: 2}, 0},
		{"rounded corner", Offset(box, 0.5), geom.Vec3{X: 1.5, Y: 1.5, Z: 1.5}, math.Sqrt(0.75) - 0.5},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			if got := c.s.Eval(c.p); math.Abs(got-c.want) > exactTol {
				t.Errorf("Eval(%v) = %g, want %g", c.p, got, c.want)
			}
		})
	}
}

func TestRigid(t *testing.T) {
	m := RotationX(0.7).Then(Translation(geom.Vec3{X: 1, Y: 2, Z: 3})).Then(RotationZ(-1.1))
	p := geom.Vec3{X: 0.3, Y: -2, Z: 5}
	if got := m.Inverse(m.Apply(p)); got.Sub(p).Len() > exactTol {
		t.Errorf("inverse of apply = %v, want %v", got, p)
	}
	f := Frame(geom.Vec3{X: 1}, geom.Vec3{Y: 1}, geom.Vec3{Z: 1})
	if got := f.Apply(geom.Vec3{X: 2}); got.Sub(geom.Vec3{X: 1, Y: 2}).Len() > exactTol {
		t.Errorf("frame carries x̂·2 to %v, want (1,2,0)", got)
	}
}

func TestArgErrors(t *testing.T) {
	cases := []struct {
		name string
		err  error
	}{
		{"cylinder radius 0", func() error { _, e := NewCylinder(0, 1); return e }()},
		{"cone both radii 0", func() error { _, e := NewCone(1, 0, 0); return e }()},
		{"box negative", func() error { _, e := NewBox(geom.Vec3{X: 1, Y: -1, Z: 1}); return e }()},
		{"polygon two points", func() error { _, e := NewPolygon(geom.Polyline{{}, {X: 1}}); return e }()},
		{"union of nothing", func() error { _, e := Union(0); return e }()},
		{"negative blend", func() error { _, e := Intersection(-1, &Box{}); return e }()},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var ae *ArgError
			if !errors.As(c.err, &ae) {
				t.Fatalf("got %v, want *ArgError", c.err)
			}
		})
	}
}
