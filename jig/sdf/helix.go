package sdf

import (
	"math"

	"coilwright/cam/geom"
)

// A HelixSweep carries a plane profile along a helix about the z axis whose
// radius r(φ) and height z(φ) are arbitrary smooth functions of the turning
// angle φ. The distance is found by local minimisation over the curve
// parameter:
//
//  1. The point's azimuth θ and a table of z(φ) give the two turns whose
//     crossings of the point's meridian bracket its height; their angles
//     θ + 2πk start two Newton searches for the minimum of |C(φ) − p|²,
//     each confined to its own turn (φ within ±π of the start) and to the
//     sweep's ends. r and z are tabulated at 256 points a turn when the
//     sweep is made and read back through Catmull–Rom cubics, which give
//     the value and both derivatives at once and are exact for quadratics;
//     the sweep is exact to that interpolated curve.
//  2. The nearer foot C(φ*) fixes a frame: T along the curve, u the radial
//     direction made normal to T, v = T × u turned to point up (+z). The
//     offset q = p − C(φ*) read in (u, v) is handed to the profile, and its
//     component along T past either end closes the sweep with a flat cap.
//
// Within the sweep's reach (half the least rise per turn or half the least
// radius, whichever is smaller) the foot found is the nearest point of the
// curve, so for a round profile the distance is the exact tube distance; the
// tests compare it with a dense search. Farther out the value is capped at
// reach − extent (extent is the profile's farthest point from its origin),
// which is a lower bound on the true distance, so the sweep stays a valid
// distance bound everywhere.

// Helix is a centreline wound about the z axis: the point at angle φ is
// (r cos φ, Hand·r sin φ, z) with r = Radius(φ) > 0 and z = Z(φ) rising
// strictly with φ, for φ from Start to End radians. Hand is +1 for a right-
// hand helix and −1 for a left-hand one.
type Helix struct {
	Radius     func(phi float64) float64
	Z          func(phi float64) float64
	Hand       int
	Start, End float64
}

// Point returns the centreline point at angle phi in mm.
func (h Helix) Point(phi float64) geom.Vec3 {
	s, c := math.Sincos(phi)
	r := h.Radius(phi)
	return geom.Vec3{X: r * c, Y: float64(h.Hand) * r * s, Z: h.Z(phi)}
}

// HelixSweep is a profile swept along a Helix. The profile's X runs outward
// from the axis and its Y upward, both in the plane normal to the curve.
type HelixSweep struct {
	h          Helix
	prof       SDF2
	extent     float64
	reach      float64
	zs, rs     []float64 // tabulated z and r, one entry per dphi from Start
	dphi       float64
	rmin, rmax float64
	zslope     float64        // largest |dz/dφ| in the table, mm/rad
	zlinErr    float64        // bound on |z − linear interpolation of the table|, mm
	zfirst     []int32        // per height bucket: first table entry at or above the bucket's floor
	zbucket    float64        // buckets per mm of height
	segs       []cubicSegment // per table step: the cubics curve reads
	b          geom.Box3
}

// helixSamples is the number of table samples per turn.
const helixSamples = 256

// NewHelixSweep returns prof swept along h. It checks that the radius stays
// above zero, that z rises strictly, and that the profile fits inside the
// sweep's reach so neighbouring turns cannot be confused.
func NewHelixSweep(h Helix, prof SDF2) (*HelixSweep, error) {
	if h.Hand != 1 && h.Hand != -1 {
		return nil, &ArgError{"helix", "hand", float64(h.Hand), "must be +1 (right) or −1 (left)"}
	}
	if !(h.End > h.Start) || math.IsInf(h.End-h.Start, 0) {
		return nil, &ArgError{"helix", "angle span", h.End - h.Start, "end must be above start"}
	}
	n := int(math.Ceil((h.End-h.Start)/(2*math.Pi)*helixSamples)) + 1
	s := &HelixSweep{h: h, prof: prof, zs: make([]float64, n), rs: make([]float64, n), dphi: (h.End - h.Start) / float64(n-1)}
	s.rmin, s.rmax = math.Inf(1), 0
	for i := range s.zs {
		phi := h.Start + float64(i)*s.dphi
		r := h.Radius(phi)
		if !(r > 0) || math.IsInf(r, 0) {
			return nil, &ArgError{"helix", "radius", r, "must be finite and above 0"}
		}
		s.rmin, s.rmax = min(s.rmin, r), max(s.rmax, r)
		s.rs[i] = r
		s.zs[i] = h.Z(phi)
		if i > 0 && !(s.zs[i] > s.zs[i-1]) {
			return nil, &ArgError{"helix", "z step", s.zs[i] - s.zs[i-1], "z must rise strictly with the angle"}
		}
	}
	rise := math.Inf(1)
	per := int(math.Round(2 * math.Pi / s.dphi)) // table samples per turn
	for i := 0; i+per < n; i++ {
		rise = min(rise, s.zs[i+per]-s.zs[i])
	}
	s.reach = min(rise, s.rmin) / 2
	pb := prof.Bounds()
	for _, c := range []geom.Vec2{pb.Min, pb.Max, {X: pb.Min.X, Y: pb.Max.Y}, {X: pb.Max.X, Y: pb.Min.Y}} {
		s.extent = max(s.extent, c.Len())
	}
	for i := 1; i < n; i++ {
		s.zslope = max(s.zslope, (s.zs[i]-s.zs[i-1])/s.dphi)
	}
	// The second difference bounds how far the slope between samples can
	// exceed the largest chord slope.
	for i := 1; i+1 < n; i++ {
		dd := math.Abs(s.zs[i+1] - 2*s.zs[i] + s.zs[i-1])
		s.zslope = max(s.zslope, (s.zs[i+1]-s.zs[i-1])/(2*s.dphi)+dd/s.dphi)
		// The cubic leaves the chord by at most about a quarter of the
		// second difference; a whole one is a safe margin.
		s.zlinErr = max(s.zlinErr, dd)
	}
	s.zlinErr += 1e-9
	s.indexHeights()
	s.segs = make([]cubicSegment, n-1)
	for i := range s.segs {
		s.segs[i] = cubicSegment{catmullRom(s.rs, i), catmullRom(s.zs, i)}
	}
	if s.extent >= s.reach {
		return nil, &ArgError{"helix sweep", "profile extent", s.extent,
			"profile must fit within half the rise per turn and half the radius"}
	}
	e := s.rmax + s.extent
	s.b = geom.Box3{
		Min: geom.Vec3{X: -e, Y: -e, Z: s.zs[0] - s.extent},
		Max: geom.Vec3{X: e, Y: e, Z: s.zs[n-1] + s.extent},
	}
	return s, nil
}

// Reach returns the distance from the centreline, in mm, within which Eval
// is the profile distance about the nearest curve point.
func (s *HelixSweep) Reach() float64 { return s.reach }

// Bounds returns the sweep's bounding box.
func (s *HelixSweep) Bounds() geom.Box3 { return s.b }

// EvalBound returns Eval(p) when that is below bound, else a value between
// bound and Eval(p). Far from the curve it answers from heights alone: a
// point of the curve within D of p has an azimuth within δ = 2·asin(D/2ρ')
// of p's (ρ' the smaller of p's radius and the curve's least), so its height
// lies within zslope·δ of a crossing of p's meridian, and p's height must be
// within D + zslope·δ of that crossing. The test is first tried with the
// larger angle πD/2ρ' (asin x ≤ πx/2 on [0, 1]), which passes less often
// but needs no arcsine.
func (s *HelixSweep) EvalBound(p geom.Vec3, bound float64) float64 {
	if bound <= -s.extent {
		return -s.extent // no point lies deeper than extent inside the profile
	}
	d := bound + s.extent // curve distance that matters
	q := geom.Vec3{X: p.X, Y: float64(s.h.Hand) * p.Y, Z: p.Z}
	rho := math.Hypot(q.X, q.Y)
	rr := min(rho, s.rmin)
	if bound > 0 && 2*rr > 2*d {
		theta := math.Atan2(q.Y, q.X)
		k := math.Floor((s.phiOfZ(q.Z) - theta) / (2 * math.Pi))
		if s.heightsApart(q.Z, theta, k, d, math.Pi*d/(2*rr)) ||
			s.heightsApart(q.Z, theta, k, d, 2*math.Asin(d/(2*rr))) {
			return bound
		}
		if s.far(q, rho) {
			return s.reach - s.extent
		}
		return s.near(q, rho, theta, k)
	}
	return s.Eval(p)
}

// heightsApart reports whether every crossing of the meridian at theta near
// turn k that lies within delta of the sweep's angles is farther in height
// from z than d + zslope·delta.
func (s *HelixSweep) heightsApart(z, theta, k, d, delta float64) bool {
	gap := math.Inf(1)
	for _, kk := range [2]float64{k, k + 1} {
		c := theta + 2*math.Pi*kk
		if c < s.h.Start-delta || c > s.h.End+delta {
			continue
		}
		gap = min(gap, math.Abs(z-s.zLinear(c))-s.zlinErr)
	}
	return gap-s.zslope*delta > d
}

// Eval returns the signed distance bound from p to the sweep.
func (s *HelixSweep) Eval(p geom.Vec3) float64 {
	q := geom.Vec3{X: p.X, Y: float64(s.h.Hand) * p.Y, Z: p.Z} // right-hand frame
	rho := math.Hypot(q.X, q.Y)
	if s.far(q, rho) {
		return s.reach - s.extent
	}
	theta := math.Atan2(q.Y, q.X)
	k := math.Floor((s.phiOfZ(q.Z) - theta) / (2 * math.Pi))
	return s.near(q, rho, theta, k)
}

// far reports whether the right-hand-frame point q at radius rho lies
// beyond the sweep's reach by its height and radius alone.
func (s *HelixSweep) far(q geom.Vec3, rho float64) bool {
	zlo, zhi := s.zs[0], s.zs[len(s.zs)-1]
	lb := max(max(zlo-q.Z, q.Z-zhi), max(s.rmin-rho, rho-s.rmax))
	return lb >= s.reach
}

// footPoint is a curve point with what the profile frame needs of it.
type footPoint struct {
	phi, r, r1, z, z1, sn, cs float64
}

// near returns the distance of the right-hand-frame point q, at radius rho
// and azimuth theta, whose height lies between the meridian crossings of
// turns k and k+1.
func (s *HelixSweep) near(q geom.Vec3, rho, theta, k float64) float64 {
	h := &s.h
	capv := s.reach - s.extent
	// The two crossings of p's meridian that bracket its height, nearer
	// first.
	var cs [2]float64
	var gaps [2]float64
	for i, kk := range [2]float64{k, k + 1} {
		cs[i] = theta + 2*math.Pi*kk
		gaps[i] = math.Abs(q.Z-s.zLinear(cs[i])) - s.zlinErr
	}
	if gaps[1] < gaps[0] {
		cs[0], cs[1], gaps[0], gaps[1] = cs[1], cs[0], gaps[1], gaps[0]
	}
	var best footPoint
	bestD := math.Inf(1)
	rr := min(rho, s.rmin)
	for i, c := range cs {
		if c < h.Start-math.Pi || c > h.End+math.Pi {
			continue
		}
		// A point of this turn nearer than bestD lies within δ of the
		// crossing in angle, so within zslope·δ of its height (see
		// EvalBound); when the height gap rules that out, skip the search.
		if i == 1 && bestD < 2*rr && gaps[i]-s.zslope*2*math.Asin(bestD/(2*rr)) > bestD {
			continue
		}
		lo, hi := max(h.Start, c-math.Pi), min(h.End, c+math.Pi)
		phi := s.foot(q, max(lo, min(hi, c)), lo, hi)
		f := footPoint{phi: phi}
		f.r, f.r1, _, f.z, f.z1, _ = s.curve(phi)
		f.sn, f.cs = math.Sincos(phi)
		if d := q.Sub(geom.Vec3{X: f.r * f.cs, Y: f.r * f.sn, Z: f.z}).Len(); d < bestD {
			best, bestD = f, d
		}
	}
	if bestD >= s.reach {
		return capv
	}
	return min(s.profileDist(q, &best), capv)
}

// curve returns r and z with their first and second derivatives at phi from
// the Catmull–Rom cubic through the four table entries around it; past the
// table's ends the end segments are extended. The cubics' coefficients are
// worked out once per segment when the sweep is made (cubicSegment).
func (s *HelixSweep) curve(phi float64) (r, r1, r2, z, z1, z2 float64) {
	x := (phi - s.h.Start) / s.dphi
	i := max(0, min(len(s.segs)-1, int(math.Floor(x))))
	t := x - float64(i)
	g := &s.segs[i]
	h := s.dphi
	r = ((g.r[0]*t+g.r[1])*t+g.r[2])*t + g.r[3]
	r1 = ((3*g.r[0]*t+2*g.r[1])*t + g.r[2]) / h
	r2 = (6*g.r[0]*t + 2*g.r[1]) / (h * h)
	z = ((g.z[0]*t+g.z[1])*t+g.z[2])*t + g.z[3]
	z1 = ((3*g.z[0]*t+2*g.z[1])*t + g.z[2]) / h
	z2 = (6*g.z[0]*t + 2*g.z[1]) / (h * h)
	return
}

// cubicSegment holds the Catmull–Rom cubics of r and z between two table
// entries as a, b, c and the value at the segment's start: v(t) =
// ((a·t + b)·t + c)·t + v₀ at fraction t of the step.
type cubicSegment struct {
	r, z [4]float64
}

// catmullRom returns the coefficients a, b, c and the start value of the
// Catmull–Rom cubic of tab between entries i and i+1. A missing neighbour
// at either end is extrapolated linearly.
func catmullRom(tab []float64, i int) [4]float64 {
	p1, p2 := tab[i], tab[i+1]
	p0 := 2*p1 - p2
	if i > 0 {
		p0 = tab[i-1]
	}
	p3 := 2*p2 - p1
	if i+2 < len(tab) {
		p3 = tab[i+2]
	}
	a := -0.5*p0 + 1.5*p1 - 1.5*p2 + 0.5*p3
	b := p0 - 2.5*p1 + 2*p2 - 0.5*p3
	c := -0.5*p0 + 0.5*p2
	return [4]float64{a, b, c, p1}
}

// foot runs Newton's method on g(φ) = ½|C(φ) − q|² from phi, keeping φ in
// [lo, hi], and returns the local minimiser. A step against a non-positive
// second derivative falls back to a short downhill step.
func (s *HelixSweep) foot(q geom.Vec3, phi, lo, hi float64) float64 {
	const maxStep, tol = 0.25, 1e-10
	for range 16 {
		r, r1, r2, z, z1, z2 := s.curve(phi)
		sn, cs := math.Sincos(phi)
		cx, cy, cz := r*cs-q.X, r*sn-q.Y, z-q.Z
		ax, ay := r1*cs-r*sn, r1*sn+r*cs
		bx, by := r2*cs-2*r1*sn-r*cs, r2*sn+2*r1*cs-r*sn
		g1 := cx*ax + cy*ay + cz*z1
		g2 := ax*ax + ay*ay + z1*z1 + cx*bx + cy*by + cz*z2
		step := -math.Copysign(maxStep, g1)
		if g2 > 0 {
			step = max(-maxStep, min(maxStep, -g1/g2))
		}
		next := max(lo, min(hi, phi+step))
		if math.Abs(next-phi) < tol {
			return next
		}
		phi = next
	}
	return phi
}

// profileDist reads q's offset from the foot f in the (u, v) frame and
// returns the profile distance, capped flat past the sweep's ends.
func (s *HelixSweep) profileDist(q geom.Vec3, f *footPoint) float64 {
	sn, cs := f.sn, f.cs
	d := q.Sub(geom.Vec3{X: f.r * cs, Y: f.r * sn, Z: f.z})
	t := geom.Vec3{X: f.r1*cs - f.r*sn, Y: f.r1*sn + f.r*cs, Z: f.z1}.Normalize()
	er := geom.Vec3{X: cs, Y: sn}
	u := er.Sub(t.Scale(er.Dot(t))).Normalize()
	v := t.Cross(u)
	if v.Z < 0 {
		v = v.Scale(-1)
	}
	d2 := s.prof.Eval(geom.Vec2{X: d.Dot(u), Y: d.Dot(v)})
	w := d.Dot(t)
	switch {
	case f.phi <= s.h.Start:
		return extrudeDist(d2, -w)
	case f.phi >= s.h.End:
		return extrudeDist(d2, w)
	}
	return d2
}

// zLinear returns the height at phi, clamped to the sweep's ends, by linear
// interpolation in the table: within zlinErr of the curve.
func (s *HelixSweep) zLinear(phi float64) float64 {
	x := (max(s.h.Start, min(s.h.End, phi)) - s.h.Start) / s.dphi
	i := max(0, min(len(s.zs)-2, int(x)))
	t := x - float64(i)
	return s.zs[i] + t*(s.zs[i+1]-s.zs[i])
}

// indexHeights buckets the heights of the z table evenly, one bucket per
// entry, so that phiOfZ starts its search next to the answer.
func (s *HelixSweep) indexHeights() {
	n := len(s.zs)
	z0 := s.zs[0]
	s.zbucket = float64(n) / (s.zs[n-1] - z0)
	s.zfirst = make([]int32, n+1)
	i := 0
	for b := range s.zfirst {
		for i < n && s.zs[i] < z0+float64(b)/s.zbucket {
			i++
		}
		s.zfirst[b] = int32(i)
	}
}

// phiOfZ returns the angle at which the centreline reaches height z, clamped
// to the sweep's ends, by linear interpolation in the z table.
func (s *HelixSweep) phiOfZ(z float64) float64 {
	n := len(s.zs)
	if z <= s.zs[0] {
		return s.h.Start
	}
	if !(z <= s.zs[n-1]) {
		return s.h.End
	}
	// The first entry at or above z: start from z's bucket and step to it
	// (the bucket only saves the search; the steps make it exact).
	b := min(max(int((z-s.zs[0])*s.zbucket), 0), n)
	i := int(s.zfirst[b])
	for i > 0 && s.zs[i-1] >= z {
		i--
	}
	for i < n && s.zs[i] < z {
		i++
	}
	t := (z - s.zs[i-1]) / (s.zs[i] - s.zs[i-1])
	return s.h.Start + (float64(i-1)+t)*s.dphi
}
