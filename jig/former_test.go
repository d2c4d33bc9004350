package jig

import (
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"sort"
	"testing"

	"gonum.org/v1/gonum/mat"

	"coilwright/cam/checktool"
	"coilwright/cam/geom"
	"coilwright/jig/mesh"
	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// demoFormer builds the former of an embedded demo spec.
func demoFormer(t testing.TB, name string) (*parts.Design, *Former) {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	return designFormer(t, s)
}

func designFormer(t testing.TB, s *spec.Spec) (*parts.Design, *Former) {
	t.Helper()
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	f, err := FormerFromDesign(d)
	if err != nil {
		t.Fatal(err)
	}
	return d, f
}

// randomSpec draws a former spec: either hand, cylindrical or conical
// (either way up), 1–20 turns, 0.5–3 mm wire, 5–12 GHz so that the formers
// stay a hand's length. Draws the spec rules or the former plan reject are
// redrawn.
func randomSpec(rng *rand.Rand) *spec.Spec {
	for {
		f := 5000 + rng.Float64()*7000
		s := &spec.Spec{Kit: "Random Test Kit", FrequencyMHz: f}
		s.Coil.Turns = 1 + math.Round(rng.Float64()*19*4)/4
		s.Coil.Hand = [2]string{"RHCP", "LHCP"}[rng.IntN(2)]
		base := 0.8 + rng.Float64()*0.5
		s.Coil.BaseCircumferenceLambda = &base
		if rng.IntN(2) == 0 {
			s.Coil.Shape = "conical"
			top := 0.7 + rng.Float64()*0.6
			s.Coil.TopCircumferenceLambda = &top
		}
		pitch := 11 + rng.Float64()*5
		s.Coil.PitchAngleDeg = &pitch
		s.Wire = spec.WireSpec{Material: "copper-annealed", DiameterMM: 0.5 + rng.Float64()*2.5}
		if rng.IntN(4) == 0 {
			s.Former.Drive = "bore"
			bore := 2 + rng.Float64()*2
			s.Former.BoreDiameterMM = bore
		}
		if rng.IntN(4) == 0 {
			s.Former.GrooveProfile = "round"
		}
		if s.Validate() != nil {
			continue
		}
		if d, err := parts.NewDesign(s); err == nil && len(Plan(d).Problems) == 0 {
			return s
		}
	}
}

// randomSpecTolerance is the mesh tolerance for the random specs, coarser
// than the default to keep the suite quick; the checks are the same.
const randomSpecTolerance = 0.25

// TestRandomFormers meshes 50 seeded random formers and requires each to
// pass every check: closed, two faces to an edge in opposite directions, no
// pinched vertex, no degenerate face, the Euler characteristic of its genus,
// positive volume, and every vertex within the tolerance of the surface.
func TestRandomFormers(t *testing.T) {
	rng := rand.New(rand.NewPCG(2026, 12))
	for i := range 50 {
		s := randomSpec(rng)
		name := fmt.Sprintf("%02d %s %s %.2f turns %.2f mm wire %s", i, s.Coil.Hand, s.Coil.Shape, s.Coil.Turns, s.Wire.DiameterMM, s.Former.Drive)
		t.Run(name, func(t *testing.T) {
			_, f := designFormer(t, s)
			m, err := f.Mesh(randomSpecTolerance)
			if err != nil {
				t.Fatal(err)
			}
			rep, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: f.Genus, SDF: f.Solid})
			if err != nil {
				t.Fatalf("%v\n%+v", err, rep)
			}
			if rep.MaxVertexDist > randomSpecTolerance {
				t.Errorf("a vertex lies %.4f mm off the surface", rep.MaxVertexDist)
			}
			// Centroids near the engraved lettering can exceed the
			// tolerance (see TestDemoFormerAccuracy); twice it bounds them.
			if rep.MaxCentroidDist > 2*randomSpecTolerance {
				t.Errorf("a face centroid lies %.4f mm off the surface", rep.MaxCentroidDist)
			}
		})
	}
}

// TestDemoFormerAccuracy meshes the default demo at the default tolerance and
// records how far the mesh lies from the model.
func TestDemoFormerAccuracy(t *testing.T) {
	d, f := demoFormer(t, templates.DefaultDemo)
	tol := d.Spec.Former.ToleranceMM
	m, err := f.Mesh(tol)
	if err != nil {
		t.Fatal(err)
	}
	rep, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: f.Genus, SDF: f.Solid})
	if err != nil {
		t.Fatalf("%v\n%+v", err, rep)
	}
	// Vertices are solved onto the surface; centroids carry the chord
	// error, which the grid keeps within the tolerance everywhere except
	// in the engraved lettering, whose V-strokes are only two to three
	// cells wide, and where the stop notch's 45° roof crosses the groove's
	// run-out off the grid's axes; there it is held to twice the
	// tolerance, the bound TestRandomFormers holds every former to.
	top := d.Spec.Former.FlangeThicknessMM
	notch := f.Centreline(d.Former.Span())
	const notchReach = 4.0 // mm round the notch's mouth, past its roof
	inLettering := func(p geom.Vec3) bool {
		return p.Z > top-d.Spec.Former.EngraveDepthMM-0.1 && p.Z < top+0.1 || p.Sub(notch).Len() < notchReach
	}
	var worst, worstLetters float64
	for _, fc := range m.Faces {
		c := m.Vertices[fc[0]].Add(m.Vertices[fc[1]]).Add(m.Vertices[fc[2]]).Scale(1.0 / 3)
		dist := math.Abs(f.Solid.Eval(c))
		if inLettering(c) {
			worstLetters = max(worstLetters, dist)
		} else {
			worst = max(worst, dist)
		}
	}
	if rep.MaxVertexDist > tol || worst > tol || worstLetters > 2*tol {
		t.Errorf("vertex %.4f mm, centroid %.4f mm (lettering %.4f mm) off the surface; want %g, %g and %g",
			rep.MaxVertexDist, worst, worstLetters, tol, tol, 2*tol)
	}
	t.Logf("%d faces; largest distance from the model: vertex %.4f mm, centroid %.4f mm, in the lettering %.4f mm",
		rep.Faces, rep.MaxVertexDist, worst, worstLetters)
}

// TestDemoFormerAdmesh writes the demo former as STL and reads admesh's
// report: no repairs of any kind and one part.
func TestDemoFormerAdmesh(t *testing.T) {
	checktool.Need(t, "admesh")
	d, f := demoFormer(t, templates.DefaultDemo)
	m, err := f.Mesh(d.Spec.Former.ToleranceMM)
	if err != nil {
		t.Fatal(err)
	}
	admeshClean(t, m)
}

// meridian returns the points where the mesh crosses the half-plane through
// the z axis at azimuth theta, as (distance from the axis, z).
func meridian(m *geom.Mesh, theta float64) []geom.Vec2 {
	s, c := math.Sincos(theta)
	side := func(p geom.Vec3) float64 { return -s*p.X + c*p.Y }
	var out []geom.Vec2
	for _, f := range m.Faces {
		for k := range 3 {
			a, b := m.Vertices[f[k]], m.Vertices[f[(k+1)%3]]
			sa, sb := side(a), side(b)
			if (sa < 0) == (sb < 0) || f[k] > f[(k+1)%3] {
				continue // no crossing, or the edge's other face reports it
			}
			p := a.Add(b.Sub(a).Scale(sa / (sa - sb)))
			if rho := c*p.X + s*p.Y; rho > 0 {
				out = append(out, geom.Vec2{X: rho, Y: p.Z})
			}
		}
	}
	return out
}

// grooveCentre fits a circle (algebraic least squares, Kåsa) to the slice
// points on the inner ±45° of the groove section around (rho0, z0): the round
// part of either profile, symmetric about the centre and clear of the lip
// blends. It returns the centre's height and the number of points used.
func grooveCentre(pts []geom.Vec2, rho0, z0, a float64) (float64, int) {
	var m [3][3]float64
	var r [3]float64
	n := 0
	for _, p := range pts {
		if p.X > rho0-0.72*a || p.X < rho0-a-0.3 || math.Abs(p.Y-z0) > a {
			continue
		}
		n++
		row := [3]float64{p.X, p.Y, 1}
		rhs := -(p.X*p.X + p.Y*p.Y)
		for i := range 3 {
			for j := range 3 {
				m[i][j] += row[i] * row[j]
			}
			r[i] += row[i] * rhs
		}
	}
	if n < 3 {
		return math.NaN(), n
	}
	var x mat.VecDense
	lhs := mat.NewDense(3, 3, []float64{m[0][0], m[0][1], m[0][2], m[1][0], m[1][1], m[1][2], m[2][0], m[2][1], m[2][2]})
	if err := x.SolveVec(lhs, mat.NewVecDense(3, r[:])); err != nil {
		return math.NaN(), n
	}
	return -x.AtVec(1) / 2, n
}

// printAzimuthParam returns the coil angle φ (within the first turn) whose
// centreline point lies at print azimuth theta.
func printAzimuthParam(f *Former, theta float64) float64 {
	s := float64(f.hand)
	if f.Flipped {
		s = -s
	}
	return math.Mod(s*theta+4*math.Pi, 2*math.Pi)
}

// TestGroovePitch measures the groove's advance per turn on meshes: the
// centre of the groove's round part in one meridian slice, turn by turn,
// against the spacing the spec sets.
func TestGroovePitch(t *testing.T) {
	const pitchTol = 0.02 // mm
	spacing := 26.5
	cyl := &spec.Spec{Kit: "Pitch Test", FrequencyMHz: 2440,
		Coil: spec.CoilSpec{Shape: "cylindrical", Turns: 4, Hand: "LHCP", SpacingMM: &spacing},
		Wire: spec.WireSpec{Material: "copper-annealed", DiameterMM: 2}}
	base := 1.0
	cyl.Coil.BaseCircumferenceLambda = &base
	if err := cyl.Validate(); err != nil {
		t.Fatal(err)
	}
	demo, _ := templates.Demo(templates.DefaultDemo)
	cone, err := spec.ParseSpec(demo)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name string
		s    *spec.Spec
	}{{"cylinder with spacing 26.5 mm", cyl}, {"demo cone", cone}} {
		t.Run(c.name, func(t *testing.T) {
			d, f := designFormer(t, c.s)
			m, err := f.Mesh(0)
			if err != nil {
				t.Fatal(err)
			}
			// Source: the spec; spacing_mm, or tan α = S/C on the mean
			// circumference for a pitch angle (Kraus, Antennas, §7-2).
			// The former winds the same wire length over the same height
			// in N_f = Former.Turns turns, so its groove rises S·N/N_f a
			// turn.
			want := d.Coil.Spacing
			if c.s.Coil.SpacingMM != nil {
				want = *c.s.Coil.SpacingMM
			}
			want *= d.Coil.Turns / d.Former.Turns
			a := (c.s.Wire.DiameterMM + c.s.Former.ClearanceMM) / 2
			for _, theta := range []float64{0.7, 2.9} {
				pts := meridian(m, theta)
				phi0 := printAzimuthParam(f, theta)
				var zs []float64
				for phi := phi0; phi <= d.Coil.Span(); phi += 2 * math.Pi {
					p := f.Centreline(phi)
					rho := math.Hypot(p.X, p.Y) + c.s.Former.ClearanceMM/2
					z, n := grooveCentre(pts, rho, p.Z, a)
					if n < 4 {
						t.Fatalf("θ %.1f, φ %.2f: only %d slice points on the groove", theta, phi, n)
					}
					zs = append(zs, z)
				}
				sort.Float64s(zs)
				if len(zs) < 2 {
					t.Fatalf("θ %.1f: %d turns found", theta, len(zs))
				}
				for i := 1; i < len(zs); i++ {
					if got := zs[i] - zs[i-1]; math.Abs(got-want) > pitchTol {
						t.Errorf("θ %.1f, turn %d: measured pitch %.4f mm, spec %.4f mm", theta, i, got, want)
					}
				}
			}
		})
	}
}

// TestGrooveHand checks on the mesh that the groove climbs counter-clockwise
// seen from above for RHCP and clockwise for LHCP (IEEE Std 145: a helix
// wound as a right-hand screw radiates RHCP), with the flange at either end
// of the coil.
func TestGrooveHand(t *testing.T) {
	for _, c := range []struct {
		name       string
		hand       string
		base, top  float64
		wantRising bool
	}{
		{"RHCP cone narrowing from the feed", "RHCP", 1.2, 0.9, true},
		{"LHCP cone narrowing from the feed", "LHCP", 1.2, 0.9, false},
		{"RHCP cone widening from the feed", "RHCP", 0.9, 1.2, true},
		{"LHCP cone widening from the feed", "LHCP", 0.9, 1.2, false},
	} {
		t.Run(c.name, func(t *testing.T) {
			pitch := 13.0
			s := &spec.Spec{Kit: "Hand Test", FrequencyMHz: 5800,
				Coil: spec.CoilSpec{Shape: "conical", Turns: 3, Hand: c.hand, PitchAngleDeg: &pitch,
					BaseCircumferenceLambda: &c.base, TopCircumferenceLambda: &c.top},
				Wire: spec.WireSpec{Material: "copper-annealed", DiameterMM: 1}}
			if err := s.Validate(); err != nil {
				t.Fatal(err)
			}
			d, f := designFormer(t, s)
			m, err := f.Mesh(0.1)
			if err != nil {
				t.Fatal(err)
			}
			a := (s.Wire.DiameterMM + s.Former.ClearanceMM) / 2
			// Groove centre height in two slices 0.6 rad apart (counter-
			// clockwise), near the middle turn, both found from the mesh
			// alone: the second is searched on both sides of the first.
			const dTheta = 0.6
			th0 := 1.0
			phi := printAzimuthParam(f, th0) + 2*math.Pi
			p := f.Centreline(phi)
			rho := math.Hypot(p.X, p.Y) + s.Former.ClearanceMM/2
			z0, n := grooveCentre(meridian(m, th0), rho, p.Z, a)
			if n < 4 {
				t.Fatalf("groove not found in the first slice")
			}
			rise := d.Coil.SpacingAt(phi) * dTheta / (2 * math.Pi)
			pts := meridian(m, th0+dTheta)
			up, nu := grooveCentre(pts, rho, z0+rise, a)
			down, nd := grooveCentre(pts, rho, z0-rise, a)
			// Source: helix hand, IEEE Std 145.
			gotRising := nu >= 4 && math.Abs(up-(z0+rise)) < 0.2
			gotFalling := nd >= 4 && math.Abs(down-(z0-rise)) < 0.2
			if gotRising == gotFalling || gotRising != c.wantRising {
				t.Errorf("groove rising %v (%.3f), falling %v (%.3f) from %.3f; want rising %v", gotRising, up, gotFalling, down, z0, c.wantRising)
			}
		})
	}
}

// TestFormerMeshDeterministic meshes the demo former on one core and on
// two and requires the same vertices and faces in the same order.
func TestFormerMeshDeterministic(t *testing.T) {
	_, f := demoFormer(t, templates.DefaultDemo)
	const cell = 0.5 // coarse, to keep the test quick
	a, err := mesh.Mesh(f.Solid, mesh.MeshOptions{Cell: cell, Workers: 1})
	if err != nil {
		t.Fatal(err)
	}
	b, err := mesh.Mesh(f.Solid, mesh.MeshOptions{Cell: cell, Workers: 2})
	if err != nil {
		t.Fatal(err)
	}
	if !slices.Equal(a.Vertices, b.Vertices) || !slices.Equal(a.Faces, b.Faces) {
		t.Error("the former's mesh differs between one and two workers")
	}
}

func TestFrequencyLabel(t *testing.T) {
	// Source: unit conversion, 1 GHz = 1000 MHz, rounded to three
	// significant figures.
	for _, c := range []struct {
		mhz  float64
		want string
	}{{5800, "5.8 GHz"}, {2440, "2.44 GHz"}, {7341, "7.34 GHz"}, {10055, "10.1 GHz"}, {433.92, "434 MHz"}, {915, "915 MHz"}} {
		if got := FrequencyLabel(c.mhz); got != c.want {
			t.Errorf("FrequencyLabel(%g) = %q, want %q", c.mhz, got, c.want)
		}
	}
}

// BenchmarkDemoFormer meshes each demo former at its spec tolerance, plain
// and simplified.
func BenchmarkDemoFormer(b *testing.B) {
	for _, name := range templates.Demos() {
		d, f := demoFormer(b, name)
		tol := d.Spec.Former.ToleranceMM
		for _, simplify := range []bool{false, true} {
			b.Run(fmt.Sprintf("%s simplify %v", name, simplify), func(b *testing.B) {
				opt := f.MeshOptions(tol, simplify)
				b.ReportAllocs()
				var faces int
				for b.Loop() {
					m, err := mesh.Mesh(f.Solid, opt)
					if err != nil {
						b.Fatal(err)
					}
					faces = len(m.Faces)
				}
				b.ReportMetric(float64(faces), "triangles")
				b.ReportMetric(float64(84+50*faces)/1e6, "STL-MB")
			})
		}
	}
}

// TestFormerEnvelope holds the plan's size of the former, which decides
// whether the former fits the print volume, to the height and width of the
// solid the former model builds, on the demos and on random specs.
func TestFormerEnvelope(t *testing.T) {
	const tol = 1e-6 // mm: both follow the same construction
	check := func(t *testing.T, d *parts.Design, f *Former) {
		if got, want := Plan(d).HeightMM, f.Height; math.Abs(got-want) > tol {
			t.Errorf("envelope height %.6f mm, former %.6f mm", got, want)
		}
		b := f.Solid.Bounds()
		if got, want := Plan(d).DiameterMM, b.Max.X-b.Min.X; got < want-tol {
			t.Errorf("envelope diameter %.4f mm is less than the solid's width %.4f mm", got, want)
		}
	}
	for _, name := range templates.Demos() {
		t.Run(name, func(t *testing.T) {
			d, f := demoFormer(t, name)
			check(t, d, f)
		})
	}
	rng := rand.New(rand.NewPCG(7, 7))
	for i := range 20 {
		s := randomSpec(rng)
		t.Run(fmt.Sprintf("random %02d", i), func(t *testing.T) {
			d, f := designFormer(t, s)
			check(t, d, f)
		})
	}
}
