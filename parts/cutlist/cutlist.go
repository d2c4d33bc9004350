// The cut list: every piece of one kit cut to length, with the
// consumables and hardware.
//
// The wire blank is the coil's centreline arc length plus three
// allowances: the tail locked in the former's lock hole at the start of the groove,
// the feed lead at the feed end (a radial arm to the axis for a centre
// feed, then the drop from the wire centre to the top of the coax's
// dielectric stub), and a trim allowance squared off both ends. The support
// rod is the thinnest stocked rod or tube that carries the coil and passes
// inside the smallest relaxed turn with the given radial clearance
// (ChooseSupportRod), as long as the coil is high. The
// coax comes up through the reflector from behind. A solid outer
// conductor passes through the hole and ends flush with the top face; a
// braid ends at the back face, fanned out flat round the hole, and only
// the dielectric passes through. Either way it is soldered round the hole
// on the back face, the dielectric stands a little proud of the top face,
// and the centre conductor runs on up to the wire's centre height, where
// it is soldered beside the feed lead.

package cutlist

import (
	"fmt"
	"math"
	"slices"

	"coilwright/parts"
	"coilwright/parts/flat"
	"coilwright/parts/spec"
)

// Allowances and fits of the cut list, in mm. Common practice (no published
// source): values a kit assembler can work to with hand tools.
const (
	// MinLockTailMM is the least tail locked in the former's lock hole; the
	// tail is at least LockTailWires wire diameters long.
	MinLockTailMM = 10.0
	LockTailWires = 6.0
	// TrimPerEndMM is squared off each end of the blank after release.
	TrimPerEndMM = 5.0
	// FeedStandoffMM is how far the coax dielectric stands proud of the
	// reflector's top face, keeping the centre conductor off the hole edge.
	FeedStandoffMM = 0.5
	// MinCentreExposedMM is the least centre conductor left bare for the
	// solder joint with the feed lead.
	MinCentreExposedMM = 1.5
	// BraidFlareMM is the braid fanned out flat round the hole on the
	// reflector's back face (braided cable only).
	BraidFlareMM = 4.0
	// SleeveLengthMM is the heat-shrink sleeve over the cable where it
	// leaves the reflector's back face.
	SleeveLengthMM = 25.0
)

// leadChannelSlackMM is how much shorter than a centre feed's lead the
// former's lead channel may be and still set the lead's length: the
// rounding of the figures the cut list prints.
const leadChannelSlackMM = 0.05

// sleeveDiametersMM are the supplied diameters of 2:1 heat-shrink sleeving
// (1/16 to 1 in), in mm, ascending. Common practice (no published source).
var sleeveDiametersMM = []float64{1.6, 2.4, 3.2, 4.8, 6.4, 9.5, 12.7, 19.1, 25.4}

// CutList is one kit's pieces, consumables and hardware. Lengths are mm.
// It is a plain value built by NewCutList.
type CutList struct {
	Wire     WireBlank
	Dowel    parts.DowelCut
	Coax     CoaxCut
	Sleeve   SleeveCut
	Solder   Consumable
	Epoxy    Consumable
	Hardware []HardwareItem
	Warnings []parts.Warning
	Quantity int // kits in the batch
}

// WireBlank is the straight wire cut for one coil: LengthMM = ArcMM +
// LockTailMM + FeedLeadMM + TrimMM. Marks A and B bound the winding: A at
// the mouth of the former's lock hole, B at its stop notch.
type WireBlank struct {
	Material   string
	DiameterMM float64
	ArcMM      float64 // the former's groove from lock hole to stop notch, the winding's length (= design.json wire_length_mm, the wire keeping its length on release)
	MarkAMM    float64 // mark A from the lock end: trim, lock tail and feed lead
	MarkBMM    float64 // mark B from the lock end: MarkAMM + ArcMM
	LockTailMM float64 // locked in the former's lock hole at the start of the groove (the feed end)
	FeedLeadMM float64 // periphery feed: drop from the wire centre at the start to the top of the dielectric stub; centre feed: run from the wire centre at the start in to the axis
	TrimMM     float64 // squared off both ends after release
	LengthMM   float64 // the blank as cut
	// CentreFed is set for a centre feed: the former's lock hole is the
	// feed lead's channel, so the lock end, bent at mark A, is the feed
	// lead as built and is not cut down.
	CentreFed bool
}

// CoaxCut is the feed cable for one kit: the length to cut and the strip
// lengths at the reflector end.
type CoaxCut struct {
	Spec         string // spec type name
	Cable        spec.CoaxType
	FinishedMM   float64 // connector to the reflector's back face (coax.length_mm)
	ThroughMM    float64 // through the reflector, back face to top face
	ProudMM      float64 // dielectric above the top face
	CentreMM     float64 // bare centre conductor beyond the dielectric
	DielectricMM float64 // bare dielectric beyond the outer conductor: ProudMM, plus ThroughMM for a braid
	FlareMM      float64 // braid fanned out round the hole on the back face; 0 for a solid outer
	FeedHoleMM   float64 // feed hole in the reflector
	CutMM        float64 // FinishedMM + ThroughMM + ProudMM + CentreMM
	// Jack is the reflector.connector name ("sma-flange", "n-bulkhead", …) when a panel jack is mounted
	// in the reflector; the cable is then a jumper of FinishedMM with a
	// plug at each end, and the strip lengths are zero.
	Jack string
}

// SleeveCut is the heat-shrink sleeve for one kit: 2:1 sleeving whose
// supplied bore slides over the cable and whose recovered bore grips it.
type SleeveCut struct {
	SuppliedMM  float64
	RecoveredMM float64
	LengthMM    float64
}

// Consumable is an estimated amount of a material used up in assembly,
// with the working behind it.
type Consumable struct {
	Amount float64
	Unit   string // "mm" of solder wire, "mL" of mixed epoxy
	Basis  string
}

// HardwareItem is one bought part per kit.
type HardwareItem struct {
	Item  string
	Count int
	Note  string
}

// FitLockTail sets the lock end, the wire beyond mark A that is bent at a
// right angle and pushed into the former's lock hole, to the hole's depth
// holeMM below the groove bottom, or to the feed lead if that is longer
// (with a warning), and works out the blank and marks again: the lock end
// is later cut down to the feed lead, so it needs no trim of its own.
// For a centre feed the hole is the feed lead's channel and the lock end is
// the feed lead itself, as long as the lead.
func (cl *CutList) FitLockTail(holeMM float64) {
	w := &cl.Wire
	w.LockTailMM = holeMM
	if w.CentreFed {
		w.LockTailMM = w.FeedLeadMM
		if holeMM < w.FeedLeadMM-leadChannelSlackMM {
			cl.Warnings = append(cl.Warnings, parts.Warning{Code: "lock-hole-short",
				Message: fmt.Sprintf("the former's lead channel is %.1f mm deep but the feed lead runs %.1f mm in to the axis: the channel does not set the lead's length; cut the lock end to %.1f mm after release", holeMM, w.FeedLeadMM, w.FeedLeadMM)})
		}
	} else if w.FeedLeadMM > holeMM {
		w.LockTailMM = w.FeedLeadMM
		cl.Warnings = append(cl.Warnings, parts.Warning{Code: "lock-hole-short",
			Message: fmt.Sprintf("the former's lock hole is %.1f mm deep but the feed lead is cut %.1f mm from the lock end: deepen former.lock_hole_depth_mm or use a thinner drive", holeMM, w.FeedLeadMM)})
	}
	w.TrimMM = TrimPerEndMM
	w.LengthMM = w.LockTailMM + w.ArcMM + w.TrimMM
	w.MarkAMM = w.LockTailMM
	w.MarkBMM = w.MarkAMM + w.ArcMM
}

// NewCutList works out the cut list of one kit from a design.
func NewCutList(d *parts.Design) (*CutList, error) {
	s := d.Spec
	if s == nil {
		return nil, fmt.Errorf("design without a spec")
	}
	wd := s.Wire.DiameterMM
	cable := s.Coax.Cable()
	cl := &CutList{Quantity: s.Quantity}

	// Coax strip lengths at the reflector end.
	thick := s.Reflector.ThicknessMM
	drop := math.Max(d.Coil.Z0-FeedStandoffMM, 0)
	cx := CoaxCut{Spec: s.Coax.Type, Cable: cable, FinishedMM: s.Coax.LengthMM,
		ThroughMM: thick, ProudMM: FeedStandoffMM, DielectricMM: FeedStandoffMM,
		CentreMM:   math.Max(drop, MinCentreExposedMM),
		FeedHoleMM: cable.FeedHoleMM()}
	if cable.Braided {
		cx.FlareMM = BraidFlareMM
		cx.DielectricMM += thick
	}
	cx.CutMM = cx.FinishedMM + cx.ThroughMM + cx.ProudMM + cx.CentreMM
	if d.Patterns != nil {
		cx.FeedHoleMM = d.Patterns.Reflector.Input.Feed.Diameter
	}
	if j := s.Reflector.Connector; flat.FeedKindByConnector(j) != flat.FeedCoax {
		cx = CoaxCut{Spec: s.Coax.Type, Cable: cable, FinishedMM: s.Coax.LengthMM, CutMM: s.Coax.LengthMM, ThroughMM: thick, CentreMM: drop + FeedStandoffMM, FeedHoleMM: cx.FeedHoleMM, Jack: j}
	}
	cl.Coax = cx

	// Wire blank.
	w := WireBlank{Material: s.Wire.Material, DiameterMM: wd, ArcMM: d.Former.Length(),
		LockTailMM: math.Max(MinLockTailMM, LockTailWires*wd),
		FeedLeadMM: drop, TrimMM: 2 * TrimPerEndMM}
	if d.CentreFed() {
		// The lead runs out from the axis, over the centre conductor's tip.
		w.FeedLeadMM, w.CentreFed = d.FeedRun(), true
	}
	w.LengthMM = w.ArcMM + w.LockTailMM + w.FeedLeadMM + w.TrimMM
	w.MarkAMM = TrimPerEndMM + w.LockTailMM + w.FeedLeadMM
	w.MarkBMM = w.MarkAMM + w.ArcMM
	cl.Wire = w
	if w.CentreFed {
		// The lock end is the feed lead: no separate lead, no trim on it.
		cl.FitLockTail(w.FeedLeadMM)
	}

	dw, err := parts.NewDowelCut(d)
	if err != nil {
		return nil, err
	}
	cl.Dowel = dw

	sl, err := sleeveFor(cable.Outer)
	if err != nil {
		return nil, err
	}
	cl.Sleeve = sl
	cl.Solder = solderEstimate(d, cx, s.Stock.SolderWireMM)
	cl.Epoxy = epoxyEstimate(d, dw)
	cl.Hardware = hardware(d, cl)
	if drop < 2*wd && !d.CentreFed() {
		cl.Warnings = append(cl.Warnings, parts.Warning{Code: "short-feed-lead",
			Message: fmt.Sprintf("the wire centre is only %.1f mm above the %s: too little to bend a lead down; solder the %s to the side of the wire's start", drop, feedStub(cx).stub, feedStub(cx).pin)})
	}
	if dw.AbsorbsWater && !dw.OverFeed {
		cl.Warnings = append(cl.Warnings, parts.Warning{Code: "wood-dowel", Message: dw.MaterialAdvice})
	}
	if !dw.OverFeed {
		cl.Warnings = append(cl.Warnings, rodWarnings(d, dw)...)
	}
	return cl, nil
}

// rodWarnings returns the warnings the support rod raises: dielectric
// loading above RodShiftWarnFraction, a default rod more slender than
// MaxRodSlenderness, and a rod too heavy for any mount sized here.
func rodWarnings(d *parts.Design, dc parts.DowelCut) []parts.Warning {
	var w []parts.Warning
	r := dc.Rod
	if l := r.Loading; l.ShiftFraction > parts.RodShiftWarnFraction {
		fix := "give a thinner dowel.diameter_mm, or hold the coil with thin low-loss spacers outside the winding"
		if dc.Automatic {
			fix = "this is the thinnest stocked section that carries the coil: hold the coil with thin low-loss spacers outside the winding instead, or check where the best match falls with a sweep"
		}
		if d.Spec.Dowel.Material != "ptfe" {
			fix = "PTFE has the lowest permittivity of the rod materials; or " + fix
		}
		w = append(w, parts.Warning{Code: "rod-loading", Message: fmt.Sprintf("the %s fills %.1f %% of the area inside the smallest turn (εr %.1f): a first-order estimate lowers the frequency by about %.1f %% (%.0f MHz); %s",
			parts.SectionWords(dc), 100*l.FillRatio, l.Permittivity, 100*l.ShiftFraction, l.ShiftFraction*d.Spec.FrequencyMHz, fix)})
	}
	if r.Slender {
		w = append(w, parts.Warning{Code: "rod-slender", Message: fmt.Sprintf("a rod %s long needs about Ø%.0f mm to stay straight (%g diameters long at most), but only Ø%s mm passes inside the smallest turn: support the coil from outside as well", mm(r.LengthMM), r.MinOuterMM, parts.MaxRodSlenderness, num(r.OuterMM))})
	}
	if r.Mount.Overloaded {
		w = append(w, parts.Warning{Code: "rod-heavy", Message: fmt.Sprintf("the support rod weighs about %.0f g: %s; use a tube or a thinner rod, or mount it in a collar bolted to the reflector", r.MassG, r.Mount.Basis)})
	}
	return w
}

// sleeveFor picks the smallest 2:1 sleeve whose supplied bore is at least
// 1.2 times the cable's outside diameter (it must slide over the solder
// fillet) and whose recovered bore is at most 0.8 times it (it must grip).
// Common practice (no published source).
func sleeveFor(outer float64) (SleeveCut, error) {
	for _, dia := range sleeveDiametersMM {
		if dia >= 1.2*outer && dia/2 <= 0.8*outer {
			return SleeveCut{SuppliedMM: dia, RecoveredMM: dia / 2, LengthMM: SleeveLengthMM}, nil
		}
	}
	return SleeveCut{}, fmt.Errorf("no 2:1 heat-shrink size fits a %.2f mm cable", outer)
}

// solderEstimate adds up the fillets of the kit's three joints and turns
// the volume into a length of solder wire, doubled for tinning and waste.
// Fillets are right-angled triangles in section, volume leg²/2 per mm of
// seam. Common practice (no published source): a fillet leg of a quarter
// wire diameter along both sides of the first quarter turn on the
// matching strip, a half-section lap at the centre-conductor joint, and a
// 1 mm leg round the outer conductor at the reflector.
func solderEstimate(d *parts.Design, cx CoaxCut, solderWire float64) Consumable {
	wd := d.Spec.Wire.DiameterMM
	strip := d.Coil.LengthBetween(0, math.Pi/2)
	leg := wd / 4
	vStrip := 2 * leg * leg / 2 * strip
	vCentre := 0.5 * math.Pi * wd * wd / 4 * cx.CentreMM
	vOuter := 0.5 * math.Pi * cx.Cable.Outer
	vol := 2 * (vStrip + vCentre + vOuter)
	length := vol / (math.Pi * solderWire * solderWire / 4)
	return Consumable{Amount: math.Ceil(length/10) * 10, Unit: "mm",
		Basis: fmt.Sprintf("%.0f mm³ of fillet (matching strip, centre joint, outer conductor), doubled for tinning and waste, as Ø%s mm solder wire", vol/2, num(solderWire))}
}

// epoxyEstimate sizes two beads per started turn bridging the rod to the
// wire, each a block (clearance + wire) long and two wire diameters
// square, plus a fillet of 2 mm leg round the rod's foot, and adds half
// again for mixing waste. Common practice (no published source).
//
// A kit without a rod (OverFeed) has the beads only, from the outside
// supports to the wire, each two wire diameters long.
func epoxyEstimate(d *parts.Design, dw parts.DowelCut) Consumable {
	wd := d.Spec.Wire.DiameterMM
	beads := 2 * len(d.Turns)
	if dw.OverFeed {
		vol := 1.5 * float64(beads) * (2 * wd) * (2 * wd) * (2 * wd)
		return Consumable{Amount: math.Ceil(vol/1000*10) / 10, Unit: "mL",
			Basis: fmt.Sprintf("%d beads from the outside supports to the wire, plus half again for mixing waste", beads)}
	}
	gap := (dw.InnerTurnMM - dw.DiameterMM) / 2
	vBeads := float64(beads) * (gap + wd) * (2 * wd) * (2 * wd)
	vFoot := math.Pi * dw.DiameterMM * 2 * 2 / 2
	vol := 1.5 * (vBeads + vFoot)
	ml := math.Ceil(vol/1000*10) / 10
	return Consumable{Amount: ml, Unit: "mL",
		Basis: fmt.Sprintf("%d beads from rod to wire and a fillet round the rod's foot, plus half again for mixing waste", beads)}
}

// screwLengthsMM are the stocked lengths of M3 to M5 screws, mm. Common
// practice (no published source; ISO 4762 and ISO 7045 list these lengths).
var screwLengthsMM = []float64{6, 8, 10, 12, 16, 20, 25, 30}

func hardware(d *parts.Design, cl *CutList) []HardwareItem {
	s := d.Spec
	var hw []HardwareItem
	cable := cl.Coax.Cable
	if j, ok := spec.ConnectorByID(s.Reflector.Connector); ok && j.Mount != "pigtail" {
		hw = append(hw, HardwareItem{Item: j.Name, Count: 1, Note: "mounted in the reflector's feed cut-out; the feed cable plugs into it"})
	} else {
		hw = append(hw, HardwareItem{Item: "SMA connector to suit " + cable.Name, Count: 1,
			Note: "or a cable with the connector fitted; strip the connector end to the connector maker's dimensions"})
	}
	if mt := cl.Dowel.Rod.Mount; mt.Screw != "" && cl.Dowel.Foot == nil && !cl.Dowel.OverFeed {
		want := s.Reflector.ThicknessMM + 2*mt.PilotMM // about two thread diameters into the rod
		i, _ := slices.BinarySearch(screwLengthsMM, want)
		length := screwLengthsMM[min(i, len(screwLengthsMM)-1)]
		into := "the rod's foot"
		if mt.PlugMM > 0 {
			into = "the plug in the tube's foot"
		}
		hw = append(hw, HardwareItem{Item: fmt.Sprintf("%s × %s mm screw, nylon or stainless, with washer", mt.Screw, num(length)), Count: 1,
			Note: fmt.Sprintf("from behind the reflector into a %s mm pilot hole in %s; %s", num(mt.PilotMM), into, mt.Basis)})
	}
	if cl.Coax.Jack == "" {
		hw = append(hw, HardwareItem{Item: "cable tie, 2.5 mm wide", Count: 1, Note: "strain relief for the cable behind the reflector"})
		if m, _ := spec.SheetMaterialByID(s.Reflector.Material); m.Joint == "clamp" {
			hw = append(hw, HardwareItem{Item: "M3 solder tag (tinned ring terminal), M3 × 8 mm screw, nut and star washer", Count: 1,
				Note: "grounds the cable's outer conductor to the aluminium plate beside the feed hole"})
		}
	}
	return hw
}

// CutRow is one line of the cut list's table. Zero numbers are not
// applicable to the line.
type CutRow struct {
	Item     string
	Material string
	Size     string
	Count    int
	LengthMM float64 // length of each piece
	Amount   float64 // of a consumable, in Unit
	Unit     string
	Note     string
}

// Rows returns the cut list as table lines: the pieces cut to length, then
// the consumables, then the hardware.
func (cl *CutList) Rows() []CutRow {
	w, dw, cx, sl := cl.Wire, cl.Dowel, cl.Coax, cl.Sleeve
	rows := []CutRow{
		{Item: "wire blank", Material: w.Material, Size: fmt.Sprintf("Ø%s mm", num(w.DiameterMM)), Count: 1, LengthMM: w.LengthMM,
			Note: blankNote(w)},
		{Item: "support rod", Material: dw.Material, Size: rodSize(dw), Count: 1, LengthMM: dw.LengthMM,
			Note: parts.RodNote(dw)},
		{Item: "feed cable", Material: cx.Cable.Name, Size: fmt.Sprintf("Ø%s mm", num(cx.Cable.Outer)), Count: 1, LengthMM: cx.CutMM,
			Note: coaxNote(cx)},
		{Item: "solder", Material: "solder wire", Size: "", Amount: cl.Solder.Amount, Unit: cl.Solder.Unit, Note: cl.Solder.Basis},
		{Item: "epoxy", Material: "two-part epoxy, slow-setting", Amount: cl.Epoxy.Amount, Unit: cl.Epoxy.Unit, Note: cl.Epoxy.Basis},
	}
	if dw.OverFeed {
		rows = slices.Delete(rows, 1, 2)
	}
	if cx.Jack == "" {
		rows = slices.Insert(rows, len(rows)-2, CutRow{Item: "heat-shrink sleeve", Material: "2:1 polyolefin", Size: fmt.Sprintf("Ø%s → Ø%s mm", num(sl.SuppliedMM), num(sl.RecoveredMM)), Count: 1, LengthMM: sl.LengthMM,
			Note: "over the cable where it leaves the reflector's back face; slide it on before soldering"})
	}
	for _, h := range cl.Hardware {
		rows = append(rows, CutRow{Item: "hardware", Material: h.Item, Count: h.Count, Note: h.Note})
	}
	return rows
}

// blankNote sums the wire blank: with the lock end fitted to the former's
// hole (FitLockTail) the feed lead is cut from the lock end.
func blankNote(w WireBlank) string {
	fitted := math.Abs(w.LengthMM-(w.LockTailMM+w.ArcMM+w.TrimMM)) < 1e-9
	if fitted && w.CentreFed && w.LockTailMM <= w.FeedLeadMM {
		return fmt.Sprintf("lock end %.1f (bent at mark A into the former's lead channel; it is the feed lead, in to the axis) + winding %.1f + trim %.1f mm", w.LockTailMM, w.ArcMM, w.TrimMM)
	}
	if fitted {
		return fmt.Sprintf("lock end %.1f (bent into the lock hole, later cut to the %.1f mm feed lead) + winding %.1f + trim %.1f mm", w.LockTailMM, w.FeedLeadMM, w.ArcMM, w.TrimMM)
	}
	return fmt.Sprintf("winding %.1f + lock tail %.1f + feed lead %.1f + trim %.1f mm", w.ArcMM, w.LockTailMM, w.FeedLeadMM, w.TrimMM)
}

func coaxNote(cx CoaxCut) string {
	if cx.Jack != "" {
		return fmt.Sprintf("jumper from the %s jack on the reflector, %.1f mm with a plug fitted at each end", cx.Jack, cx.FinishedMM)
	}
	flare := "no braid flare (solid outer)"
	if cx.FlareMM > 0 {
		flare = fmt.Sprintf("braid flare %.1f mm", cx.FlareMM)
	}
	return fmt.Sprintf("%.1f mm to the reflector's back face + %.1f mm through it; bare centre %.1f mm, bare dielectric %.1f mm, %s; feed hole Ø%.2f mm", cx.FinishedMM, cx.ThroughMM, cx.CentreMM, cx.DielectricMM, flare, cx.FeedHoleMM)
}

// feedStub names what stands up through the plate at the feed: the
// coax's dielectric stub and centre conductor, or a jack's insulator and
// rear contact.
func feedStub(cx CoaxCut) struct{ stub, pin string } {
	if cx.Jack != "" {
		return struct{ stub, pin string }{"connector's insulator", "connector's rear contact"}
	}
	return struct{ stub, pin string }{"dielectric stub", "centre conductor"}
}

// rodSize is the cut list's size column for the support: "Ø8 mm" or
// "Ø8/6 mm tube".
func rodSize(dc parts.DowelCut) string {
	if dc.BoreMM > 0 {
		return fmt.Sprintf("Ø%s/%s mm tube", num(dc.DiameterMM), num(dc.BoreMM))
	}
	return fmt.Sprintf("Ø%s mm", num(dc.DiameterMM))
}
