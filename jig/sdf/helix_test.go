package sdf

import (
	"math"
	"math/rand/v2"
	"sort"
	"testing"

	"coilwright/cam/geom"
)

// testHelix is a conical helix of 4 turns, radius 10 → 6 mm, rise 8 mm per
// turn, plus a slight radius wobble so r(φ) is not linear.
func testHelix(hand int) Helix {
	span := 4 * 2 * math.Pi
	return Helix{
		Radius: func(phi float64) float64 { return 10 - 4*phi/span + 0.3*math.Sin(phi/3) },
		Z:      func(phi float64) float64 { return 2 + 8*phi/(2*math.Pi) },
		Hand:   hand,
		Start:  0,
		End:    span,
	}
}

// bruteCurveDist returns the distance from p to the helix by dense sampling
// (2048 samples a turn) and golden-section refinement around the best
// sample: a search that shares nothing with the Newton foot finder.
func bruteCurveDist(h Helix, p geom.Vec3) float64 {
	n := int((h.End-h.Start)/(2*math.Pi)*2048) + 1
	step := (h.End - h.Start) / float64(n-1)
	best, bi := math.Inf(1), 0
	for i := range n {
		if d := h.Point(h.Start + float64(i)*step).Sub(p).Len(); d < best {
			best, bi = d, i
		}
	}
	a := math.Max(h.Start, h.Start+float64(bi-1)*step)
	b := math.Min(h.End, h.Start+float64(bi+1)*step)
	g := (math.Sqrt(5) - 1) / 2
	for range 60 {
		c, d := b-g*(b-a), a+g*(b-a)
		if h.Point(c).Sub(p).Len() < h.Point(d).Sub(p).Len() {
			b = d
		} else {
			a = c
		}
	}
	return math.Min(best, h.Point((a+b)/2).Sub(p).Len())
}

// TestHelixTubeAccuracy compares the round-profile sweep with the tube
// distance from a dense search, inside the sweep's reach, for both hands.
func TestHelixTubeAccuracy(t *testing.T) {
	const tol = 1e-6 // mm; Newton to 1e-10 rad, differences to ~1e-8 relative
	for _, hand := range []int{1, -1} {
		h := testHelix(hand)
		circ, _ := NewCircle(geom.Vec2{}, 0.7)
		s, err := NewHelixSweep(h, circ)
		if err != nil {
			t.Fatal(err)
		}
		rng := rand.New(rand.NewPCG(5, uint64(hand+2)))
		checked := 0
		for checked < 400 {
			// Away from the ends, whose flat caps differ from a tube's round ones.
			phi := h.Start + math.Pi + rng.Float64()*(h.End-h.Start-2*math.Pi)
			off := geom.Vec3{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}.Normalize().Scale(rng.Float64() * s.Reach())
			p := h.Point(phi).Add(off)
			want := bruteCurveDist(h, p)
			if want >= s.Reach() {
				continue
			}
			checked++
			want -= 0.7
			if capv := s.Reach() - s.extent; want > capv {
				want = capv // beyond the cap the sweep returns a lower bound
			}
			if got := s.Eval(p); math.Abs(got-want) > tol {
				t.Fatalf("hand %d at %v: got %.9f, dense search %.9f", hand, p, got, want)
			}
		}
	}
}

// TestHelixHand checks the centreline turns counter-clockwise seen from +z
// (right hand, rising) for Hand +1 and clockwise for −1.
func TestHelixHand(t *testing.T) {
	for _, c := range []struct {
		name string
		hand int
		sign float64
	}{{"right hand turns counter-clockwise", 1, 1}, {"left hand turns clockwise", -1, -1}} {
		t.Run(c.name, func(t *testing.T) {
			h := testHelix(c.hand)
			a, b := h.Point(0.1), h.Point(0.2)
			// Source: IEEE Std 145 hand convention; (a × b)·ẑ > 0 is a
			// counter-clockwise step seen from +z while z rises.
			if cz := a.X*b.Y - a.Y*b.X; math.Signbit(cz) != math.Signbit(c.sign) || !(b.Z > a.Z) {
				t.Errorf("step from %v to %v has turn %g, want sign %g and rising z", a, b, cz, c.sign)
			}
		})
	}
}

func TestHelixRejects(t *testing.T) {
	big, _ := NewCircle(geom.Vec2{}, 5)
	if _, err := NewHelixSweep(testHelix(1), big); err == nil {
		t.Error("a 5 mm profile on an 8 mm rise was accepted")
	}
	h := testHelix(1)
	h.Z = func(phi float64) float64 { return 3 }
	small, _ := NewCircle(geom.Vec2{}, 0.5)
	if _, err := NewHelixSweep(h, small); err == nil {
		t.Error("a flat helix was accepted")
	}
}

// TestHelixEvalBound checks the bounded evaluation against the full one:
// equal below the bound, between the bound and the full value above it.
func TestHelixEvalBound(t *testing.T) {
	const tol = 1e-12
	circ, _ := NewCircle(geom.Vec2{}, 0.7)
	s, err := NewHelixSweep(testHelix(-1), circ)
	if err != nil {
		t.Fatal(err)
	}
	rng := rand.New(rand.NewPCG(9, 10))
	skipped := 0
	for range 20000 {
		p := geom.Vec3{X: rng.Float64()*24 - 12, Y: rng.Float64()*24 - 12, Z: rng.Float64()*40 - 2}
		bound := rng.Float64()*3 - 1
		full, got := s.Eval(p), s.EvalBound(p, bound)
		switch {
		case full < bound && math.Abs(got-full) > tol:
			t.Fatalf("at %v bound %g: got %g, full %g", p, bound, got, full)
		case full >= bound && (got < bound-tol || got > full+tol):
			t.Fatalf("at %v bound %g: got %g outside [bound, full %g]", p, bound, got, full)
		}
		if got != full {
			skipped++
		}
	}
	if skipped == 0 {
		t.Error("the bound never saved an evaluation")
	}
}

// TestPhiOfZMatchesSearch holds the bucketed height lookup to a plain binary
// search over the same table, at random heights and at every table entry.
func TestPhiOfZMatchesSearch(t *testing.T) {
	circ, _ := NewCircle(geom.Vec2{}, 0.5)
	s, err := NewHelixSweep(testHelix(1), circ)
	if err != nil {
		t.Fatal(err)
	}
	want := func(z float64) float64 {
		i := sort.SearchFloat64s(s.zs, z)
		switch {
		case i == 0:
			return s.h.Start
		case i == len(s.zs):
			return s.h.End
		}
		f := (z - s.zs[i-1]) / (s.zs[i] - s.zs[i-1])
		return s.h.Start + (float64(i-1)+f)*s.dphi
	}
	rng := rand.New(rand.NewPCG(3, 4))
	zs := append([]float64{math.Inf(-1), math.Inf(1)}, s.zs...)
	for range 10000 {
		zs = append(zs, -5+45*rng.Float64())
	}
	for _, z := range zs {
		if got, w := s.phiOfZ(z), want(z); got != w {
			t.Fatalf("phiOfZ(%g) = %g, want %g", z, got, w)
		}
	}
}
