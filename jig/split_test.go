package jig

import (
	"bytes"
	"errors"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilwright/cam/checktool"
	"coilwright/cam/geom"
	"coilwright/cam/stl"
	"coilwright/jig/mesh"
	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// splitTol is the mesh tolerance of the split test, mm: coarser than the
// default to keep the test quick; every check below scales with it.
const splitTol = 0.1

// TestSplitSectionsMeshAndJoin splits formers of the 2.4 GHz demo as if
// the printer took only 130 mm, meshes each section, checks each with
// CheckMesh and admesh, and checks that the outline of each joint face of
// the lower section lies on the upper section's within the tolerance, so
// the groove runs on across the joint: fed at the periphery (bored
// through for the rod), and fed at the centre, straight and widening
// upward (the former then prints flipped), each bored blind for the rod
// short of the lead channel (checkBlindSplit).
func TestSplitSectionsMeshAndJoin(t *testing.T) {
	if testing.Short() {
		t.Skip("meshes former sections")
	}
	const rod = 8.0 // mm
	t.Run("periphery feed", func(t *testing.T) {
		d, f := demoFormer(t, "demo-2g4-cylinder.toml")
		checkSplit(t, f, Plan(d).Params, rod)
	})
	for _, c := range []struct{ name, from, to string }{
		{"centre feed", "", ""},
		{"centre feed, widening upward", `shape = "cylindrical"`, "shape = \"conical\"\ntop_circumference_lambda = 1.15"},
	} {
		t.Run(c.name, func(t *testing.T) {
			d := demoDesign(t, "demo-2g4-cylinder.toml", "centre")
			if c.from != "" {
				b, _ := templates.Demo("demo-2g4-cylinder.toml")
				src := strings.Replace(strings.Replace(string(b), `feed = "periphery"`, `feed = "centre"`, 1), c.from, c.to, 1)
				s, err := spec.ParseSpec([]byte(src))
				if err != nil {
					t.Fatal(err)
				}
				if d, err = parts.NewDesign(s); err != nil {
					t.Fatal(err)
				}
			}
			pl := Plan(d).OnRod(rod)
			f, err := pl.Former()
			if err != nil {
				t.Fatal(err)
			}
			if f.Flipped != (c.from != "") {
				t.Fatalf("flipped %v", f.Flipped)
			}
			sp := checkSplit(t, f, pl.Params, rod)
			checkBlindSplit(t, f, pl, sp)
		})
	}
}

// checkSplit splits f, with sizes p, for a 130 mm print height on a rod
// of rod mm into two sections and checks their meshes and the joint.
func checkSplit(t *testing.T, f *Former, p FormerParams, rod float64) *SplitPlan {
	t.Helper()
	sp, err := f.Split(130, rod, p)
	if err != nil {
		t.Fatal(err)
	}
	if len(sp.Sections) != 2 {
		t.Fatalf("%d sections of a %.1f mm former for 130 mm, want 2", len(sp.Sections), f.Height)
	}
	meshes := make([]*geom.Mesh, len(sp.Sections))
	for i, s := range sp.Sections {
		if h := s.Solid.Bounds().Max.Z - s.Solid.Bounds().Min.Z; h > 130+1e-9 {
			t.Errorf("section %d is %.1f mm tall, over the 130 mm print height", s.Number, h)
		}
		opt := f.MeshOptions(splitTol, true)
		m, err := mesh.Mesh(s.Solid, opt)
		if err != nil {
			t.Fatal(err)
		}
		// Centroids in the engraved section number's V-strokes, two to
		// three cells wide, carry up to twice the tolerance (as on the
		// flange lettering); the rest is held to it below.
		if _, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: s.Genus, SDF: s.Solid, Tolerance: 2 * splitTol}); err != nil {
			t.Errorf("section %d: %v", s.Number, err)
		}
		admeshClean(t, m)
		meshes[i] = m
	}
	// The joint: the lower section's top face is at Z1 in its own frame
	// shifted by Z0; the upper's bottom face at 0 in its frame.
	lo := sp.Sections[0]
	// The joint: points on the true outline of the cut through the
	// uncut former at the joint plane (the core and the groove's notch),
	// every degree; each section's mesh must pass within the tolerance of
	// every one, so the two faces' edges meet within twice the tolerance
	// and the groove runs on across the joint.
	z := lo.Z1
	rIn := math.Min(f.path.Radius(0), f.path.Radius(f.path.Span())) - p.Wire/2 - 1
	rOut := math.Max(f.path.Radius(0), f.path.Radius(f.path.Span())) + p.GrooveDepth + 1
	var truth []geom.Vec3
	for deg := 0; deg < 360; deg++ {
		sn, cs := math.Sincos(float64(deg) * math.Pi / 180)
		at := func(r float64) geom.Vec3 { return geom.Vec3{X: r * cs, Y: r * sn, Z: z} }
		for r := rIn; r < rOut; r += 0.05 {
			if f.Solid.Eval(at(r)) < 0 && f.Solid.Eval(at(r+0.05)) >= 0 {
				a, b := r, r+0.05
				for range 40 {
					m := (a + b) / 2
					if f.Solid.Eval(at(m)) < 0 {
						a = m
					} else {
						b = m
					}
				}
				truth = append(truth, at((a+b)/2))
				break
			}
		}
	}
	if len(truth) < 300 {
		t.Fatalf("found the joint outline at %d of 360 angles", len(truth))
	}
	// In the groove's notch the plane meets the groove's wall at the
	// pitch angle ψ: a wedge of angle ψ meshed within the tolerance may
	// lose up to tol/sin ψ of its tip (worked from the wedge's geometry),
	// so there the limit is that; on the plain core it is the tolerance.
	psi := math.Inf(1)
	for phi := 0.0; phi <= f.path.Span(); phi += 0.01 {
		psi = math.Min(psi, math.Atan(math.Abs(slope(f.path.Z, phi))/f.path.Radius(phi)))
	}
	// The core is a solid of revolution: at the joint plane its radius
	// is the outline's largest, on a cone too, and outline points inside
	// it lie in the groove's notch.
	rCore := 0.0
	for _, q := range truth {
		rCore = math.Max(rCore, math.Hypot(q.X, q.Y))
	}
	rCore -= 0.05
	worst := 0.0
	for i, s := range sp.Sections {
		m := meshes[i]
		var tris [][3]geom.Vec3
		for _, fc := range m.Faces {
			var tri [3]geom.Vec3
			near := false
			for k := range 3 {
				v := m.Vertices[fc[k]]
				tri[k] = geom.Vec3{X: v.X, Y: v.Y, Z: v.Z + s.Z0}
				near = near || math.Abs(tri[k].Z-z) < 2
			}
			if near {
				tris = append(tris, tri)
			}
		}
		for _, q := range truth {
			best := math.Inf(1)
			for _, tr := range tris {
				best = math.Min(best, triDist(q, tr[0], tr[1], tr[2]))
			}
			limit := splitTol
			if math.Hypot(q.X, q.Y) < rCore {
				limit = splitTol / math.Sin(psi)
			}
			worst = math.Max(worst, best)
			if best > limit {
				t.Errorf("section %d's mesh passes %.3f mm from the joint outline at %v, more than %.3f mm", s.Number, best, q, limit)
				break
			}
		}
	}
	// The groove crosses the joint: the wire centre at the joint is
	// outside both solids by about half the wire.
	for phi := 0.0; phi < 2*math.Pi*7; phi += 0.01 {
		c := f.Centreline(phi)
		if math.Abs(c.Z-lo.Z1) > 0.05 {
			continue
		}
		for _, s := range sp.Sections {
			q := c.Sub(geom.Vec3{Z: s.Z0})
			if s.Solid.Eval(q) < p.Wire/2-splitTol {
				t.Errorf("section %d blocks the groove at the joint (%.3f mm from the wire centre)", s.Number, s.Solid.Eval(q))
			}
		}
	}
	t.Logf("%d sections, rod bore %.1f mm, key peg r %.2f mm at %.2f mm; joint outline within %.3f mm of both meshes (groove limit %.3f mm at ψ = %.1f°)", len(sp.Sections), sp.RodBore, sp.PegRadius, sp.PegAt, worst, splitTol/math.Sin(psi), psi*180/math.Pi)
	return sp
}

// checkBlindSplit checks a centre-fed former split on its rod, probing
// the sections' solids: the section holding the start of the groove keeps
// the whole lead channel (empty from the wire centre to the lead's
// length, pl.LockHoleMM below the groove bottom); the rod's bore is open
// along the axis through every other section and into that one from the
// joint for at least a bore diameter, and stops with MinWall of solid
// before the channel.
func checkBlindSplit(t *testing.T, f *Former, pl FormerPlan, sp *SplitPlan) {
	t.Helper()
	const step = 0.05 // mm between probes
	p := pl.Params
	c := f.Centreline(0)
	feed := sp.Sections[0]
	if f.Flipped {
		feed = sp.Sections[len(sp.Sections)-1]
	}
	if c.Z < feed.Z0 || c.Z > feed.Z1 {
		t.Fatalf("the groove starts at z %.2f mm, outside section %d (%.2f–%.2f mm)", c.Z, feed.Number, feed.Z0, feed.Z1)
	}
	if feed.Genus != 0 {
		t.Errorf("section %d holds the channel but has genus %d", feed.Number, feed.Genus)
	}
	local := func(sec Section, q geom.Vec3) float64 { return sec.Solid.Eval(q.Sub(geom.Vec3{Z: sec.Z0})) }
	in := geom.Vec3{X: -c.X, Y: -c.Y}.Scale(1 / math.Hypot(c.X, c.Y))
	lead := p.Wire/2 + pl.LockHoleMM
	for s := 0.0; s <= lead-step; s += step {
		if v := local(feed, c.Add(in.Scale(s))); v <= 0 {
			t.Fatalf("the channel in section %d is blocked %.2f mm in from the wire centre (distance %.3f); the lock end reaches %.2f mm", feed.Number, s, v, lead)
		}
	}
	// Along the axis: open through the other sections (away from the
	// joints' peg sockets, which lie off the axis) and into the feed
	// section for a bore diameter; solid for MinWall before the channel.
	a := (p.Wire + p.Clearance) / 2
	dir, near := 1.0, c.Z+a*math.Sqrt2 // from the channel towards the bore
	if f.Flipped {
		dir, near = -1, c.Z-a
	}
	for _, sec := range sp.Sections {
		if sec.Number == feed.Number {
			continue
		}
		for z := sec.Z0 + step; z < sec.Z1-step; z += step {
			if v := local(sec, geom.Vec3{Z: z}); v <= 0 {
				t.Fatalf("section %d is solid on the axis at z %.2f mm: the rod cannot pass", sec.Number, z)
			}
		}
	}
	joint := feed.Z1
	if f.Flipped {
		joint = feed.Z0
	}
	for s := step; s < sp.RodBore; s += step {
		if v := local(feed, geom.Vec3{Z: joint - dir*s}); v <= 0 {
			t.Fatalf("the rod's bore enters section %d only %.2f mm; it must hold the rod for %.1f mm", feed.Number, s, sp.RodBore)
		}
	}
	for s := step; s < p.MinWall-step; s += step {
		if v := local(feed, geom.Vec3{Z: near + dir*s}); v >= 0 {
			t.Fatalf("the rod's bore reaches %.2f mm from the channel (distance %.3f); the wall is %.1f mm", s, v, p.MinWall)
		}
	}
	t.Logf("section %d: channel %.2f mm from the wire centre, blind bore %.1f mm from the far end", feed.Number, lead, p.BoreDepth)
}

// admeshClean writes m as STL and holds admesh's report to a clean,
// closed mesh: no repairs of any kind, one part, every facet read, and
// admesh's volume equal to the mesh's.
// Source: admesh's report format; a clean mesh shows 0 in each repair
// counter and in the first column of disconnected facets.
func admeshClean(t *testing.T, m *geom.Mesh) {
	t.Helper()
	bin := checktool.Need(t, "admesh")
	path := filepath.Join(t.TempDir(), "mesh.stl")
	var buf bytes.Buffer
	if err := stl.WriteSTL(&buf, m, stl.STLOptions{}); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(bin, path).CombinedOutput()
	if err != nil {
		t.Fatalf("admesh: %v\n%s", err, out)
	}
	want := map[string]string{
		"Total disconnected facets": "0",
		"Degenerate facets":         "0",
		"Edges fixed":               "0",
		"Facets removed":            "0",
		"Facets added":              "0",
		"Facets reversed":           "0",
		"Backwards edges":           "0",
		"Normals fixed":             "0",
		"Number of parts":           "1",
		"Number of facets":          strconv.Itoa(len(m.Faces)),
	}
	for key, v := range want {
		got := regexp.MustCompile(regexp.QuoteMeta(key) + `\s*:\s*(\S+)`).FindSubmatch(out)
		if got == nil || string(got[1]) != v {
			t.Errorf("admesh %q = %q, want %s", key, got, v)
		}
	}
	vol := regexp.MustCompile(`Volume\s*:\s*(\S+)`).FindSubmatch(out)
	if vol == nil {
		t.Fatalf("no volume in admesh report:\n%s", out)
	}
	v, _ := strconv.ParseFloat(string(vol[1]), 64)
	// admesh sums in float32 from float32 corners; 1e-4 relative covers it.
	if math.Abs(v-m.Volume()) > 1e-4*m.Volume() {
		t.Errorf("admesh volume %g, mesh volume %g", v, m.Volume())
	}
}

// triDist returns the distance from p to the triangle a, b, c.
// Source: Ericson, Real-Time Collision Detection, 2005, §5.1.5 (closest
// point on a triangle by Voronoi regions).
func triDist(p, a, b, c geom.Vec3) float64 {
	ab, ac, ap := b.Sub(a), c.Sub(a), p.Sub(a)
	d1, d2 := ab.Dot(ap), ac.Dot(ap)
	if d1 <= 0 && d2 <= 0 {
		return p.Sub(a).Len()
	}
	bp := p.Sub(b)
	d3, d4 := ab.Dot(bp), ac.Dot(bp)
	if d3 >= 0 && d4 <= d3 {
		return p.Sub(b).Len()
	}
	vc := d1*d4 - d3*d2
	if vc <= 0 && d1 >= 0 && d3 <= 0 {
		return p.Sub(a.Add(ab.Scale(d1 / (d1 - d3)))).Len()
	}
	cp := p.Sub(c)
	d5, d6 := ab.Dot(cp), ac.Dot(cp)
	if d6 >= 0 && d5 <= d6 {
		return p.Sub(c).Len()
	}
	vb := d5*d2 - d1*d6
	if vb <= 0 && d2 >= 0 && d6 <= 0 {
		return p.Sub(a.Add(ac.Scale(d2 / (d2 - d6)))).Len()
	}
	va := d3*d6 - d5*d4
	if va <= 0 && d4-d3 >= 0 && d5-d6 >= 0 {
		return p.Sub(b.Add(c.Sub(b).Scale((d4 - d3) / ((d4 - d3) + (d5 - d6))))).Len()
	}
	den := 1 / (va + vb + vc)
	return p.Sub(a.Add(ab.Scale(vb * den)).Add(ac.Scale(vc * den))).Len()
}

// TestSplitRefusesShortRodEngagement cuts the centre-fed 2.4 GHz demo's
// former into sections so short that the blind rod bore, stopping a wall
// short of the lead channel, enters the section holding the channel less
// than a bore diameter: Split refuses it with a FitRodEngagement problem,
// and accepts the same former in two sections.
func TestSplitRefusesShortRodEngagement(t *testing.T) {
	const rod = 8.0 // mm
	pl := Plan(demoDesign(t, "demo-2g4-cylinder.toml", "centre")).OnRod(rod)
	f, err := pl.Former()
	if err != nil {
		t.Fatal(err)
	}
	if _, err := f.Split(130, rod, pl.Params); err != nil {
		t.Fatalf("two sections: %v", err)
	}
	// Sections a little taller than twice the 8 mm key peg (the shortest
	// Split makes) leave the bore less than a bore diameter in the first.
	_, err = f.Split(28, rod, pl.Params)
	var fp FitProblem
	if !errors.As(err, &fp) || fp.Kind != FitRodEngagement {
		t.Fatalf("28 mm sections: want a FitRodEngagement problem, got %v", err)
	}
	if fp.Available >= fp.Needed {
		t.Errorf("refused with %.2f mm of the %.2f mm needed", fp.Available, fp.Needed)
	}
	t.Log(err)
}
