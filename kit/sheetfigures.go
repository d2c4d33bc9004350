// The build sheet's step figures, drawn from the design: the lock tail in
// the former's lock hole, the winding direction seen from the open end,
// the matching strip's flat pattern and its rise above the plate, the
// reflector's top face and the feed in section at the plate. Each figure
// is small, not to scale across figures, and carries its dimensions as
// text so a reader (and a test) finds the numbers on the page.

package kit

import (
	"fmt"
	"math"

	"coilwright/cam/geom"
	"coilwright/cam/pdf"
	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/flat"
	"coilwright/parts/sheet"
	"coilwright/parts/spec"
)

// stepFigureHeight is the most a step figure takes on the page, mm.
const stepFigureHeight = 62.0

// stepFigures returns the figures to print after the steps with the
// given titles, in the order the steps come.
func (k *Kit) stepFigures(b *sheet.BuildSheet) map[string][]pdf.Figure {
	d, cl := k.Design, k.cutList
	out := map[string][]pdf.Figure{}
	add := func(title string, f pdf.Figure, ok bool) {
		if ok {
			out[title] = append(out[title], f)
		}
	}
	add("Lock its end in the former", k.lockFigure(), k.Former.Path.StartRadius > 0)
	add("Lock its end in the former", windingFigure(d), true)
	if d.Patterns != nil && d.Patterns.Wedge != nil {
		add("Solder the wedge under the start of the winding", stripFigure(d.Patterns.Wedge), true)
	}
	if d.Patterns != nil && d.Patterns.Reflector != nil {
		add("Prepare the reflector", reflectorFigure(d), true)
	}
	add("feed", feedFigure(d, cl), true)
	return out
}

// arc returns n+1 points of the circle of radius r about c from angle a0
// to a1 (radians).
func arc(c geom.Vec2, r, a0, a1 float64, n int) geom.Polyline {
	pl := make(geom.Polyline, n+1)
	for i := range pl {
		a := a0 + (a1-a0)*float64(i)/float64(n)
		pl[i] = geom.Vec2{X: c.X + r*math.Cos(a), Y: c.Y + r*math.Sin(a)}
	}
	return pl
}

// arrowHead returns a closed triangle with its tip at tip pointing along
// dir, size long.
func arrowHead(tip, dir geom.Vec2, size float64) geom.Polyline {
	n := math.Hypot(dir.X, dir.Y)
	ux, uy := dir.X/n, dir.Y/n
	back := geom.Vec2{X: tip.X - ux*size, Y: tip.Y - uy*size}
	w := size * 0.35
	return geom.Polyline{tip, {X: back.X - uy*w, Y: back.Y + ux*w}, {X: back.X + uy*w, Y: back.Y - ux*w}}
}

func rect(x0, y0, x1, y1 float64) geom.Polyline {
	return geom.Polyline{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
}

// handSense is +1 when the wire turns counter-clockwise seen from the open
// end (right hand), −1 clockwise.
func handSense(d *parts.Design) float64 {
	if d.Coil.Hand == parts.LeftHand {
		return -1
	}
	return 1
}

func handTurn(d *parts.Design) string {
	if handSense(d) > 0 {
		return "counter-clockwise"
	}
	return "clockwise"
}

// lockFigure draws the start of the former's groove seen along the axis:
// the core, the radial lock hole, the wire in the groove and its lock tail
// bent at a right angle into the hole, mark A at the mouth.
func (k *Kit) lockFigure() pdf.Figure {
	d, p, w := k.Design, k.printed().Params, k.cutList.Wire
	wd := p.Wire
	r := k.Former.Path.StartRadius // wire centre in the groove
	bottom := r - wd/2
	core := bottom + p.GrooveDepth
	holeIn := r - k.lockRoom()
	half := (wd + p.Clearance) / 2
	sense := handSense(d)
	up := math.Pi / 2
	span := 0.9 // radians of groove drawn
	o := geom.Vec2{}
	// The mouth at the top; the tail runs down the hole towards the axis.
	// A tail longer than the hole is cut to the hole's depth first (the
	// lock end is cut down to the feed lead after winding anyway).
	tail, tailText, cutNote := w.LockTailMM, fmt.Sprintf("tail %.1f", w.LockTailMM), ""
	if note, cut := k.lockCut(); note != "" {
		tail = cut
		tailText = fmt.Sprintf("tail %.1f (cut from %.1f)", tail, w.LockTailMM)
		cutNote = " " + note
	}
	paths := []pdf.FigurePath{
		{Points: arc(o, core, up-1.3*span, up+1.3*span, 64), Gray: 0.8},
		{Points: arc(o, bottom, up-1.3*span, up+1.3*span, 64), Gray: 0.4, Dash: 1},
		{Points: rect(-half, holeIn, half, core+0.3), Closed: true, Fill: true, FillGray: 0.15, Gray: 0.8},
		{Points: arc(o, r, up, up+sense*span, 48), StrokeMM: wd, Gray: 0.7},
		{Points: geom.Polyline{{X: 0, Y: r}, {X: 0, Y: r - tail}}, StrokeMM: wd, Gray: 0.85},
	}
	// A short bar across the wire at the mouth: mark A.
	paths = append(paths, pdf.FigurePath{Points: geom.Polyline{{X: -1.6 * wd, Y: core}, {X: 1.6 * wd, Y: core}}, StrokeMM: 0.25 * wd, Gray: 1})
	dims := []geom.Dimension{
		{A: geom.Vec2{X: 0, Y: r}, B: geom.Vec2{X: 0, Y: r - tail}, Offset: sense * (half + 8*wd), Text: tailText},
		{A: geom.Vec2{X: 0, Y: core}, B: geom.Vec2{X: 0, Y: holeIn}, Offset: sense * (half + 3*wd), Text: fmt.Sprintf("hole %.1f deep", core-holeIn)},
	}
	end := arc(o, core+2.5*wd, up+sense*span, up+sense*span, 1)[0]
	labels := []pdf.FigureLabel{
		{At: geom.Vec2{X: 0, Y: core + 4*wd}, Text: "A", Size: 11, Bold: true, Center: true},
		{At: geom.Vec2{X: 0, Y: core + 2.2*wd}, Text: "mark A at the hole's mouth", Center: true},
		{At: end, Text: "wire on in the groove", Center: true},
		{At: geom.Vec2{X: sense * (half + 0.5*wd), Y: holeIn - 1.5*wd}, Text: "lock hole", Right: sense < 0},
	}
	caption := fmt.Sprintf("Lock tail, seen along the former's axis (mm, not to scale with the other figures): bend the lock end at a right angle at mark A and push it down the lock hole until mark A sits at the hole's mouth; the wire then runs along the groove.%s", cutNote)
	if w.CentreFed && cutNote == "" {
		// The channel runs in to the axis (and past it when the lead is
		// longer than the former's start radius): mark the axis.
		paths = append(paths, pdf.FigurePath{Points: geom.Polyline{{X: -2 * half, Y: 0}, {X: 2 * half, Y: 0}}, StrokeMM: 0.1, Gray: 1},
			pdf.FigurePath{Points: geom.Polyline{{X: 0, Y: -2 * half}, {X: 0, Y: 2 * half}}, StrokeMM: 0.1, Gray: 1})
		labels[3].Text = "lead channel"
		labels = append(labels, pdf.FigureLabel{At: geom.Vec2{X: -sense * (2*half + 0.5*wd), Y: 0}, Text: "axis", Right: sense > 0})
		dims[0].Text, dims[0].Offset = fmt.Sprintf("feed lead %.1f", tail), sense*(half+14*wd)
		labels[1].Text = "mark A at the channel's mouth"
		caption = "Lock end, seen along the former's axis (mm, not to scale with the other figures): this coil is centre-fed, so the lock hole is the feed lead's channel, running in to the axis. Bend the lock end at a right angle at mark A and push it down the channel until mark A sits at its mouth; the wire then runs along the groove, and the lock end is the feed lead."
	}
	return pdf.Figure{Paths: paths, Dimensions: dims, Labels: labels, Height: stepFigureHeight, Caption: caption}
}

// windingFigure draws the coil seen from its open end with the way the
// wire turns as it rises, the hand written on it.
func windingFigure(d *parts.Design) pdf.Figure {
	c := d.Coil
	sense := handSense(d)
	o := geom.Vec2{}
	rb, rt := c.StartRadius, c.EndRadius
	paths := []pdf.FigurePath{
		{Points: arc(o, rb, 0, 2*math.Pi, 96), Closed: true, Gray: 0.8, StrokeMM: d.Spec.Wire.DiameterMM},
	}
	if math.Abs(rt-rb) > 0.5 {
		paths = append(paths, pdf.FigurePath{Points: arc(o, rt, 0, 2*math.Pi, 96), Closed: true, Gray: 0.45, Dash: 1.2})
	}
	// The arrow: three quarters of a turn from the start, inside the coil.
	ra := 0.72 * math.Min(rb, rt)
	a1 := sense * 1.5 * math.Pi
	pts := arc(o, ra, 0, a1, 72)
	tip := pts[len(pts)-1]
	dir := geom.Vec2{X: -math.Sin(a1) * sense, Y: math.Cos(a1) * sense}
	size := 0.22 * ra
	paths = append(paths, pdf.FigurePath{Points: pts[:len(pts)-3], StrokeMM: 0.06 * ra, Gray: 1},
		pdf.FigurePath{Points: arrowHead(tip, dir, size), Closed: true, Fill: true, FillGray: 1, Gray: 1})
	// The start (feed end) at angle 0.
	paths = append(paths, pdf.FigurePath{Points: geom.Polyline{{X: rb - 0.12*rb, Y: 0}, {X: rb + 0.12*rb, Y: 0}}, StrokeMM: 0.04 * rb, Gray: 1})
	labels := []pdf.FigureLabel{
		{At: geom.Vec2{X: 0, Y: -0.15 * ra}, Text: d.Coil.Hand.String(), Size: 12, Bold: true, Center: true},
		{At: geom.Vec2{X: 0, Y: 1.3 * rb}, Text: "seen from the open end: " + handTurn(d) + " as it rises", Center: true},
		{At: geom.Vec2{X: rb * 1.2, Y: -0.05 * rb}, Text: "start (feed)"},
	}
	dims := []geom.Dimension{{A: geom.Vec2{X: -rb, Y: 0}, B: geom.Vec2{X: rb, Y: 0}, Offset: -1.25 * rb, Text: fmt.Sprintf("Ø%.2f wire centre at the base", 2*rb)}}
	return pdf.Figure{Paths: paths, Dimensions: dims, Labels: labels, Height: stepFigureHeight,
		Caption: fmt.Sprintf("Winding direction, seen from the open end looking down at the reflector: a %s coil turns %s as it rises away from the reflector. Wind the former the same way.", d.Coil.Hand, handTurn(d))}
}

// stripFigure draws the matching strip's flat pattern with its feed end
// marked, and under it the strip's rise above the plate along its length
// as it follows the first part of the turn.
func stripFigure(w *flat.Wedge) pdf.Figure {
	outline := w.Outline.Flatten(0.02)
	paths := []pdf.FigurePath{{Points: outline, Closed: true, Fill: true, FillGray: 0.2, Gray: 1}}
	box := geom.EmptyBox2()
	for _, p := range outline {
		box = box.Extend(p)
	}
	// The rise: heights of the strip's underside along s, drawn below the
	// pattern over the plate's top face.
	base := box.Min.Y - 2*w.FeedWidth - maxHeight(w)
	rise := make(geom.Polyline, len(w.Stations))
	for i, st := range w.Stations {
		rise[i] = geom.Vec2{X: st.S, Y: base + st.Height}
	}
	last := w.Stations[len(w.Stations)-1]
	paths = append(paths,
		pdf.FigurePath{Points: geom.Polyline{{X: -1, Y: base}, {X: last.S + 1, Y: base}}, StrokeMM: 0.15, Gray: 1},
		pdf.FigurePath{Points: rise, StrokeMM: 0.1, Gray: 0.85})
	first := w.Stations[0]
	// The outline runs down one side and back up the other: its first
	// and last vertices are the feed end's corners, the middle two the
	// far end's.
	v := w.Outline.Vertices
	n := len(v) / 2
	f0, f1, e0, e1 := v[0].P, v[len(v)-1].P, v[n-1].P, v[n].P
	feedMid := geom.Vec2{X: (f0.X + f1.X) / 2, Y: (f0.Y + f1.Y) / 2}
	dims := []geom.Dimension{
		{A: f0, B: f1, Offset: 0.8 * w.FeedWidth, Text: fmt.Sprintf("%.2f", w.FeedWidth)},
		{A: e0, B: e1, Offset: 0.8 * w.FeedWidth, Text: fmt.Sprintf("%.2f far end", w.EndWidth)},
		{A: geom.Vec2{X: first.S, Y: base}, B: geom.Vec2{X: first.S, Y: base + first.Height}, Offset: 0.8 * w.FeedWidth, Text: fmt.Sprintf("%.2f above the plate at the feed", first.Height)},
		{A: geom.Vec2{X: last.S, Y: base + last.Height}, B: geom.Vec2{X: last.S, Y: base}, Offset: 0.8 * w.FeedWidth, Text: fmt.Sprintf("%.2f at the far end", last.Height)},
	}
	labels := []pdf.FigureLabel{
		{At: geom.Vec2{X: feedMid.X, Y: feedMid.Y + 0.9*w.FeedWidth}, Text: "FEED END", Bold: true, Right: true},
		{At: geom.Vec2{X: (box.Min.X + box.Max.X) / 2, Y: box.Min.Y - 0.5*w.FeedWidth}, Text: fmt.Sprintf("%.2f along the centreline", w.Length), Center: true},
		{At: geom.Vec2{X: last.S / 2, Y: base - 0.45*w.FeedWidth}, Text: "plate's top face (strip's rise along its length)", Center: true},
	}
	return pdf.Figure{Paths: paths, Dimensions: dims, Labels: labels, Height: stepFigureHeight,
		Caption: fmt.Sprintf("Matching strip (mm): above, the flat pattern as cut, feed end at the left (the tick on the template); below, its underside's height above the plate along its length, at the same length scale. Bend it by hand to follow the underside of the first %.0f° of wire as the wire rises, its flat face parallel to the plate, the feed end at the feed.", last.Phi*180/math.Pi)}
}

func maxHeight(w *flat.Wedge) float64 {
	h := 0.0
	for _, st := range w.Stations {
		h = math.Max(h, st.Height)
	}
	return h
}

// reflectorFigure draws the plate's top face: its outline, the feed
// cut-out with the 0° tick, the winding direction from the feed, which
// face is copper on clad laminate, and where the ground joint goes.
func reflectorFigure(d *parts.Design) pdf.Figure {
	r := d.Patterns.Reflector
	in := r.Input
	var paths []pdf.FigurePath
	if l, ok := r.Drawing.Layer(flat.LayerCut); ok {
		for _, e := range l.Entities {
			switch e := e.(type) {
			case geom.Circle:
				paths = append(paths, pdf.FigurePath{Points: e.Flatten(0.05), Closed: true, Gray: 1, StrokeMM: 0.004 * in.Size})
			case geom.Contour:
				paths = append(paths, pdf.FigurePath{Points: e.Flatten(0.05), Closed: e.Closed, Gray: 1, StrokeMM: 0.004 * in.Size})
			}
		}
	}
	if len(paths) > 0 {
		paths[0].Fill, paths[0].FillGray = true, 0.12
	}
	s, c := math.Sincos(in.FeedAngle)
	feed := geom.Vec2{X: in.FeedRadius * c, Y: in.FeedRadius * s}
	sense := handSense(d)
	// Winding direction: an arc from the feed round the centre.
	ra := math.Max(in.FeedRadius, 0.3*in.Size)
	a1 := in.FeedAngle + sense*1.2
	pts := arc(geom.Vec2{}, ra, in.FeedAngle+sense*0.1, a1, 48)
	tip := pts[len(pts)-1]
	dir := geom.Vec2{X: -math.Sin(a1) * sense, Y: math.Cos(a1) * sense}
	size := 0.05 * in.Size
	paths = append(paths,
		pdf.FigurePath{Points: pts[:len(pts)-2], StrokeMM: 0.008 * in.Size, Gray: 0.7, Dash: 1.5},
		pdf.FigurePath{Points: arrowHead(tip, dir, size), Closed: true, Fill: true, FillGray: 0.7, Gray: 0.7})
	// 0° tick beyond the feed cut-out.
	tick0 := in.FeedRadius + 0.06*in.Size
	paths = append(paths, pdf.FigurePath{Points: geom.Polyline{{X: tick0 * c, Y: tick0 * s}, {X: (tick0 + 0.06*in.Size) * c, Y: (tick0 + 0.06*in.Size) * s}}, StrokeMM: 0.006 * in.Size, Gray: 1})
	mat, _ := spec.SheetMaterialByID(d.Spec.Reflector.Material)
	face := "top face (coil side)"
	joint := "ground joint: solder round the feed"
	switch mat.Joint {
	case "clad":
		face = "COPPER FACE UP (coil side)"
		joint = "ground joint: solder on the copper"
	case "clamp":
		face = "top face (coil side), aluminium: no solder"
		joint = "ground joint: clamped, not soldered"
	}
	t := 0.06 * in.Size
	labels := []pdf.FigureLabel{
		{At: geom.Vec2{X: 0, Y: in.Size/2 + 0.8*t}, Text: face, Bold: true, Center: true},
		{At: geom.Vec2{X: (tick0 + 0.16*in.Size) * c, Y: (tick0+0.16*in.Size)*s - 0.25*t}, Text: "0°", Bold: true, Center: true},
		{At: geom.Vec2{X: feed.X, Y: feed.Y + 1.6*t}, Text: joint, Center: true},
		{At: geom.Vec2{X: 0, Y: -0.5*in.Size - 0.3*in.Size}, Text: fmt.Sprintf("dashed arrow: the wire turns %s from the feed (%s)", handTurn(d), d.Coil.Hand), Center: true},
	}
	dims := []geom.Dimension{
		{A: geom.Vec2{X: -in.Size / 2, Y: -in.Size / 2}, B: geom.Vec2{X: in.Size / 2, Y: -in.Size / 2}, Offset: -0.08 * in.Size, Text: fmt.Sprintf("%.1f across", in.Size)},
		{A: geom.Vec2{}, B: feed, Offset: -0.12 * in.Size, Text: fmt.Sprintf("%.2f centre to feed", in.FeedRadius)},
	}
	return pdf.Figure{Paths: paths, Dimensions: dims, Labels: labels, Height: 80,
		Caption: fmt.Sprintf("Reflector top face, seen from the coil side (mm): feed cut-out on the 0° tick, %.2f mm from the centre; the dashed arrow is the way the wire turns from the feed as it rises.", in.FeedRadius)}
}

// feedFigure draws the feed in section at the plate: the cable (or the
// jack's contact) through the feed hole with its stripped lengths.
func feedFigure(d *parts.Design, cl *cutlist.CutList) pdf.Figure {
	cx := cl.Coax
	t := d.Spec.Reflector.ThicknessMM
	cab := cx.Cable
	hole := cx.FeedHoleMM / 2
	span := math.Max(2.2*cab.Outer, 6)
	if cx.Jack != "" {
		span = math.Max(span, 1.6*hole+4)
	}
	z0 := d.Coil.Z0
	wd := d.Spec.Wire.DiameterMM
	plate := func(x0, x1 float64) pdf.FigurePath {
		return pdf.FigurePath{Points: rect(x0, -t, x1, 0), Closed: true, Fill: true, FillGray: 0.45, Gray: 1}
	}
	paths := []pdf.FigurePath{plate(-span, -hole), plate(hole, span)}
	var dims []geom.Dimension
	var labels []pdf.FigureLabel
	below := -t - 1.5*cab.Outer
	if cx.Jack != "" {
		// The jack's body under the plate, its contact up through the hole.
		body := math.Max(hole*1.6, cab.Outer)
		paths = append(paths,
			pdf.FigurePath{Points: rect(-body, below, body, -t), Closed: true, Fill: true, FillGray: 0.3, Gray: 1},
			pdf.FigurePath{Points: rect(-cab.Centre/2, -t, cab.Centre/2, cx.CentreMM), Closed: true, Fill: true, FillGray: 0.8, Gray: 1})
		dims = append(dims, geom.Dimension{A: geom.Vec2{X: -cab.Centre / 2, Y: 0}, B: geom.Vec2{X: -cab.Centre / 2, Y: cx.CentreMM}, Offset: span * 0.45, Text: fmt.Sprintf("contact %.1f above the plate", cx.CentreMM)})
		labels = append(labels, pdf.FigureLabel{At: geom.Vec2{X: 0, Y: (below - t) / 2}, Text: "jack body under the plate", Center: true})
	} else {
		top := cx.ProudMM
		diel := cab.Dielectric / 2
		outerTop := 0.0
		if cx.FlareMM == 0 {
			outerTop = 0 // solid outer flush with the top face
		} else {
			outerTop = -t // braid stops at the back face
		}
		// Outer conductor (or jacket) below, dielectric, centre.
		paths = append(paths,
			pdf.FigurePath{Points: rect(-cab.Outer/2, below, cab.Outer/2, outerTop), Closed: true, Fill: true, FillGray: 0.35, Gray: 1},
			pdf.FigurePath{Points: rect(-diel, outerTop, diel, top), Closed: true, Fill: true, FillGray: 0.06, Gray: 0.8},
			pdf.FigurePath{Points: rect(-cab.Centre/2, below, cab.Centre/2, top+cx.CentreMM), Closed: true, Fill: true, FillGray: 0.8, Gray: 1})
		if cx.FlareMM > 0 {
			paths = append(paths,
				pdf.FigurePath{Points: geom.Polyline{{X: -cab.Outer / 2, Y: -t - 0.2}, {X: -cab.Outer/2 - cx.FlareMM, Y: -t - 0.2}}, StrokeMM: 0.35, Gray: 0.9},
				pdf.FigurePath{Points: geom.Polyline{{X: cab.Outer / 2, Y: -t - 0.2}, {X: cab.Outer/2 + cx.FlareMM, Y: -t - 0.2}}, StrokeMM: 0.35, Gray: 0.9})
			dims = append(dims, geom.Dimension{A: geom.Vec2{X: cab.Outer / 2, Y: -t}, B: geom.Vec2{X: cab.Outer/2 + cx.FlareMM, Y: -t}, Offset: -(2 * cab.Outer), Text: fmt.Sprintf("braid fanned %.1f", cx.FlareMM)})
		}
		dims = append(dims,
			geom.Dimension{A: geom.Vec2{X: -diel, Y: outerTop}, B: geom.Vec2{X: -diel, Y: top}, Offset: span*0.55 - diel, Text: fmt.Sprintf("dielectric %.1f", cx.DielectricMM)},
			geom.Dimension{A: geom.Vec2{X: -cab.Centre / 2, Y: top}, B: geom.Vec2{X: -cab.Centre / 2, Y: top + cx.CentreMM}, Offset: span*0.3 - cab.Centre/2, Text: fmt.Sprintf("bare centre %.1f", cx.CentreMM)},
		)
		labels = append(labels, pdf.FigureLabel{At: geom.Vec2{X: -cab.Outer/2 - 0.3, Y: below + 0.3*cab.Outer}, Text: cab.Name, Right: true})
	}
	// The wire's start above, at the first turn height.
	// The wire's start in section beside the centre conductor: it runs
	// across this section, along the turn.
	wx := cab.Centre/2 + wd/2
	paths = append(paths, pdf.FigurePath{Points: arc(geom.Vec2{X: wx, Y: z0}, wd/2, 0, 2*math.Pi, 32), Closed: true, Fill: true, FillGray: 0.7, Gray: 1})
	labels = append(labels, pdf.FigureLabel{At: geom.Vec2{X: wx + wd/2 + 0.3, Y: z0 + wd/2 + 0.2}, Text: "wire's start, in section"})
	dims = append(dims, geom.Dimension{A: geom.Vec2{X: wx, Y: 0}, B: geom.Vec2{X: wx, Y: z0}, Offset: -(span*0.8 - wx), Text: fmt.Sprintf("%.2f wire centre", z0)},
		geom.Dimension{A: geom.Vec2{X: -hole, Y: -t}, B: geom.Vec2{X: hole, Y: -t}, Offset: -(1.5*cab.Outer + 2), Text: fmt.Sprintf("hole Ø%.2f", 2*hole)})
	labels = append(labels, pdf.FigureLabel{At: geom.Vec2{X: span, Y: -t - 0.9*t - 0.6}, Text: fmt.Sprintf("plate, %.1f thick", t), Right: true})
	return pdf.Figure{Paths: paths, Dimensions: dims, Labels: labels, Height: stepFigureHeight,
		Caption: "Feed in section at the plate (mm): what is stripped to which length, and where the wire's start sits above it."}
}

// lockRoom returns how far the lock tail can reach from the wire's centre
// at the hole's mouth to the hole's bottom: half the wire and the hole's
// depth below the groove bottom as planned for the former as printed
// (jig.FormerPlan.LockHoleMM), mm.
func (k *Kit) lockRoom() float64 {
	pl := k.printed()
	return pl.Params.Wire/2 + pl.LockHoleMM
}

// lockCut returns the instruction to cut the lock end shorter when the
// hole does not take the whole tail, and the length to cut it to; empty
// when it does.
func (k *Kit) lockCut() (string, float64) {
	room, tail := k.lockRoom(), k.cutList.Wire.LockTailMM
	if tail <= room {
		return "", tail
	}
	cut := math.Floor(room*2) / 2
	return fmt.Sprintf("This lock hole takes only %.1f mm: cut the lock end to %.1f mm beyond mark A before pushing it in.", room, cut), cut
}
