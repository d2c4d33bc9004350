package jig

import (
	"bytes"
	"math"
	"testing"

	"coilwright/cam/geom"
	"coilwright/cam/stl"
	"coilwright/parts"
	"coilwright/parts/spec"
	"coilwright/templates"
)

// demoDesign designs an embedded demo spec with its feed set to feed.
func demoDesign(t testing.TB, name, feed string) *parts.Design {
	t.Helper()
	b, ok := templates.Demo(name)
	if !ok {
		t.Fatalf("no demo %s", name)
	}
	b = bytes.Replace(b, []byte(`feed = "periphery"`), []byte(`feed = "`+feed+`"`), 1)
	s, err := spec.ParseSpec(b)
	if err != nil {
		t.Fatal(err)
	}
	if s.Coil.Feed != feed {
		t.Fatalf("%s: feed %q, want %q", name, s.Coil.Feed, feed)
	}
	d, err := parts.NewDesign(s)
	if err != nil {
		t.Fatal(err)
	}
	return d
}

// TestCentreFeedChannel checks a centre-fed former on its solid: the lock
// hole is the feed lead's channel, empty along the lead's path from the
// wire centre at the start of the groove to 0.5 mm short of the lead's
// length Design.FeedRun (parts/feedlead.go, the lead as built), then solid
// for a wall beyond its end; the drive cut enters from the other end and
// leaves MinWall of solid on the axis before the channel.
func TestCentreFeedChannel(t *testing.T) {
	const (
		step  = 0.05 // mm between probes
		short = 0.5  // the channel may end this far short of the lead, mm (the task's agreement)
	)
	for _, demo := range []string{"demo-5g8-cone.toml", "demo-2g4-cylinder.toml"} {
		t.Run(demo, func(t *testing.T) {
			d := demoDesign(t, demo, "centre")
			pl := Plan(d)
			f, err := pl.Former()
			if err != nil {
				t.Fatal(err)
			}
			p := pl.Params
			lead := d.FeedRun()
			c := f.Centreline(0)
			in := geom.Vec3{X: -c.X, Y: -c.Y}.Scale(1 / math.Hypot(c.X, c.Y))
			for s := 0.0; s <= lead-short; s += step {
				if v := f.Solid.Eval(c.Add(in.Scale(s))); v <= 0 {
					t.Fatalf("the lead's path is blocked %.2f mm in from the wire centre (distance %.3f); the lead is %.2f mm", s, v, lead)
				}
			}
			// The channel ends LockHoleMM below the groove bottom; a wall
			// of lockFloor lies beyond it.
			end := p.Wire/2 + pl.LockHoleMM
			for s := end + step; s < end+lockFloor(p)-step; s += step {
				if v := f.Solid.Eval(c.Add(in.Scale(s))); v >= 0 {
					t.Fatalf("no wall beyond the channel's end: %.2f mm in from the wire centre is outside (distance %.3f)", s, v)
				}
			}
			// The drive cut: present at half its reach from its face, and
			// a wall of MinWall solid on the axis before the channel.
			a := (p.Wire + p.Clearance) / 2
			face, dir, near := f.Height, -1.0, c.Z+a*math.Sqrt2
			if f.Flipped {
				face, dir, near = 0, 1, c.Z-a
			}
			if v := f.Solid.Eval(geom.Vec3{Z: face + dir*pl.DriveMM/2}); v <= 0 {
				t.Errorf("no drive cut on the axis %.1f mm from its face (distance %.3f)", pl.DriveMM/2, v)
			}
			for s := step; s < p.MinWall-step; s += step {
				if v := f.Solid.Eval(geom.Vec3{Z: near - dir*s}); v >= 0 {
					t.Fatalf("the drive cut reaches %.2f mm from the channel (distance %.3f); the wall is %.1f mm", s, v, p.MinWall)
				}
			}
			t.Logf("lead %.2f mm, channel %.2f mm below the groove bottom, drive reaches %.1f mm from its face", lead, pl.LockHoleMM, pl.DriveMM)
		})
	}
}

// TestCentreFeedFormerDiffers meshes the 5.8 GHz demo's former for a
// centre and a periphery feed: the two are different solids, so their STL
// files must differ.
func TestCentreFeedFormerDiffers(t *testing.T) {
	var files [2][]byte
	for i, feed := range []string{"periphery", "centre"} {
		f, err := Plan(demoDesign(t, "demo-5g8-cone.toml", feed)).Former()
		if err != nil {
			t.Fatal(err)
		}
		m, err := f.Mesh(randomSpecTolerance)
		if err != nil {
			t.Fatal(err)
		}
		var b bytes.Buffer
		if err := stl.WriteSTL(&b, m, stl.STLOptions{}); err != nil {
			t.Fatal(err)
		}
		files[i] = b.Bytes()
	}
	if bytes.Equal(files[0], files[1]) {
		t.Error("the centre-fed and periphery-fed formers give the same STL bytes")
	}
}
