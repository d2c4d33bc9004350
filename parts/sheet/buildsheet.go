// The build sheet's content, independent of its format: the cover facts,
// the design table, tools and materials, the cautions, the numbered steps
// (each repeating the cautions it needs), the inspection table and the
// closing note. Numbers are written into the text here, once, so the
// Markdown and PDF sheets say the same thing.

package sheet

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/flat"
	"coilwright/parts/line"
	"coilwright/parts/spec"
)

// HazardID names one caution of the build sheet.
type HazardID string

// The cautions every build sheet carries. Sources: UK HSE,
// "Solderers — asthma" and INDG248 (rosin flux fume, lead); EU-OSHA
// OSHwiki, "Occupational exposure to epoxy resins", and HSE (epoxy skin
// sensitisation); Barontini et al., Ind. Eng. Chem. Res. 44, 2005
// (brominated fumes from heated FR-4); the e.i.r.p. definition of the ITU
// Radio Regulations (EIRP = P − loss + G). Eye protection when cutting
// hard wire and the burn precautions are common practice (no published
// source).
const (
	HazardSolder   HazardID = "solder"
	HazardBurns    HazardID = "burns"
	HazardEpoxy    HazardID = "epoxy"
	HazardEyes     HazardID = "eyes"
	HazardLaminate HazardID = "laminate"
	HazardRF       HazardID = "rf"
)

// Hazard is one safety caution: a heading the sheet prints in full and
// again at each step that needs it, and its text.
type Hazard struct {
	ID      HazardID
	Heading string
	Text    string
}

// Step is one numbered assembly step.
type Step struct {
	Number   int
	Title    string
	Text     []string // paragraphs, in order
	Cautions []Hazard // repeated from the cautions section
}

// SheetRow is one label and value of a build-sheet table.
type SheetRow struct {
	Label string
	Value string
}

// BuildSheet is everything a kit's build sheet says. It is a plain value
// built by NewBuildSheet.
type BuildSheet struct {
	Kit        string
	SpecSHA256 string
	Hand       string // "RHCP" or "LHCP"
	HandWords  string // how to see the hand on the coil
	Summary    string // one line under the title
	Paper      string // "A4" or "Letter"
	Quantity   int

	Design     []SheetRow
	Tools      []string
	Materials  []SheetRow
	Cautions   []Hazard
	Steps      []Step
	Inspection []parts.InspectionRow
	// InspectionNote says how to measure and where the tolerance comes from.
	InspectionNote string
	Warnings       []parts.Warning
	Closing        []string

	View SideView
}

// ReturnLossTargetDB is the return loss across the band a finished
// antenna should reach: 10 dB, a VSWR of about 1.9. Common practice (no
// published source).
const ReturnLossTargetDB = 10.0

// NewBuildSheet assembles the build sheet of a design from its cut list.
// specSHA256 is the hex hash of the spec's bytes, printed on the cover.
func NewBuildSheet(d *parts.Design, cl *cutlist.CutList, specSHA256 string) *BuildSheet {
	s := d.Spec
	var strip *flat.Wedge
	if d.Patterns != nil {
		strip = d.Patterns.Wedge
	}
	b := &BuildSheet{Kit: s.Kit, SpecSHA256: specSHA256, Hand: d.Coil.Hand.String(), Paper: s.Cutting.Paper,
		Quantity: s.Quantity, Inspection: d.InspectionTable()}
	b.HandWords = handWords(d.Coil.Hand)
	b.View = NewSideView(d, cl)
	b.Summary = fmt.Sprintf("%s MHz %s helix, %s, %s", num(s.FrequencyMHz), s.Coil.Shape, parts.TurnsText(d.Coil.Turns), b.Hand)
	b.Design = designRows(d, cl)
	b.Tools = tools(s, choiceOf(d, cl))
	b.Materials = materials(s, cl)
	b.Cautions = cautions(d, choiceOf(d, cl))
	b.Steps = steps(d, cl, strip, b.Cautions)
	b.InspectionNote = inspectionNoteText(d)
	b.Warnings = append(append([]parts.Warning{}, d.Warnings...), cl.Warnings...)
	b.Closing = []string{
		"This sheet is a guide for careful hobby construction, not professional advice. Follow the local regulations, electrical and workshop codes, and the conditions of any licence that apply where you build and transmit; where they differ from this sheet, they win.",
		"Transmitting needs the right to use the band: check the power and EIRP limits for your country and licence class, or have a licensed operator check the station.",
		"Handle solder, flux, epoxy and laminate as their makers' safety data sheets say, and dispose of offcuts and waste as your local rules require.",
	}
	return b
}

func handWords(h parts.Hand) string {
	if h == parts.LeftHand {
		return "left-hand winding, against an ordinary screw thread: seen from the open end, looking down at the reflector, the wire turns clockwise as it rises"
	}
	return "right-hand winding, like an ordinary screw thread: seen from the open end, looking down at the reflector, the wire turns counter-clockwise as it rises"
}

func mm(v float64) string  { return fmt.Sprintf("%.1f mm", v) }
func mm2(v float64) string { return fmt.Sprintf("%.2f mm", v) }

func designRows(d *parts.Design, cl *cutlist.CutList) []SheetRow {
	s := d.Spec
	band := parts.BandOf(s).Text(s.FrequencyMHz)
	rows := []SheetRow{
		{"Centre frequency", fmt.Sprintf("%s MHz (wavelength %.2f mm)", num(s.FrequencyMHz), d.Wavelength)},
		{"Band", band},
		{"Hand", fmt.Sprintf("%s (%s winding)", d.Coil.Hand, map[parts.Hand]string{parts.RightHand: "right-hand", parts.LeftHand: "left-hand"}[d.Coil.Hand])},
		{"Coil", fmt.Sprintf("%s, %s, %s feed", s.Coil.Shape, parts.TurnsText(d.Coil.Turns), s.Coil.Feed)},
		{"Diameter (wire centre)", fmt.Sprintf("%s at the base, %s at the top", mm2(2*d.Coil.StartRadius), mm2(2*d.Coil.EndRadius))},
		{"Pitch", fmt.Sprintf("%.1f° at the first turn, %.2f mm per turn at the first turn", d.Turns[0].PitchAngleDeg, d.Turns[0].SpacingMM)},
		{"First turn height", fmt.Sprintf("%s, wire centre above the reflector", mm2(d.Coil.Z0))},
		{"Coil height", Heights(d).Text()},
		{"Wire", fmt.Sprintf("%s, Ø%s mm; winding %s, blank %s", s.Wire.Material, num(s.Wire.DiameterMM), mm(cl.Wire.ArcMM), mm(cl.Wire.LengthMM))},
		{"Reflector", fmt.Sprintf("%s, %s across, %s mm thick", s.Reflector.Shape, mm(s.Reflector.SizeMM(d.Wavelength)), num(s.Reflector.ThicknessMM))},
		{"Support rod", supportRow(cl.Dowel)},
		{"Feed cable", feedRow(d, cl)},
		gainRow(d),
		{"Half-power beamwidth (estimate)", fmt.Sprintf("%.0f°", d.Estimates.HPBW.Value)},
	}
	if d.EIRP != nil {
		rows = append(rows, SheetRow{"EIRP", fmt.Sprintf("%.1f dBm (%.0f mW) with %s dBm in and %s dB feeder loss", d.EIRP.EIRPDBm, d.EIRP.EIRPmW, num(d.EIRP.TxPowerDBm), num(d.EIRP.FeederLossDB))})
	}
	return rows
}

func tools(s *spec.Spec, c sheetChoice) []string {
	t := []string{
		"The printed winding former for this kit (check its hand mark reads " + s.Coil.Hand + ")",
		"Safety glasses; nitrile gloves; fume extractor or a fan drawing fumes away",
		"Temperature-controlled soldering iron with a stand; flux; solder wire Ø" + num(s.Stock.SolderWireMM) + " mm",
		"Side cutters or wire cutters rated for the wire; flat-nose pliers; a fine file",
		"Steel rule; calipers reading to 0.05 mm; fine marker",
		"Drill with 2.5 mm and feed-hole drills; deburring tool",
		"Mixing cup and stick for epoxy",
		"Multimeter; vector network analyser (VNA) covering the band with a calibration kit, or an SWR meter (see the final checks)",
	}
	switch {
	case !c.pigtail():
		t = append(t, "Spanner or nut driver to fit the connector's nut or screws")
	case c.cable.Braided:
		t = append(t, "Coax stripping tool or a sharp knife", "Hot-air tool or heat gun for heat-shrink")
	default:
		t = append(t, "Small pipe cutter and a sharp knife for the semi-rigid cable", "Hot-air tool or heat gun for heat-shrink")
	}
	if c.plate.Joint == "clamp" {
		t = append(t, "Screwdriver and 5.5 mm spanner for the M3 clamp hardware")
	}
	return t
}

// supportSteps is the epoxy step's text: the rod's fixing (screw), how
// the turns meet it and the rod's material advice, or for a kit without a
// rod how the coil is held instead.
func supportSteps(screw string, dc parts.DowelCut) []string {
	if dc.OverFeed {
		return []string{supportText(dc)}
	}
	return []string{screw, supportText(dc), "Support rod: " + dc.MaterialAdvice + "."}
}

// supportRow is the summary's support rod: the section and its length, or
// none when the feed leaves it no room (OverFeed).
func supportRow(dc parts.DowelCut) string {
	if dc.OverFeed {
		return "none: the feed hole leaves no room for its foot; the coil is held from outside"
	}
	return fmt.Sprintf("%s × %s", parts.SectionWords(dc), mm(dc.LengthMM))
}

func materials(s *spec.Spec, cl *cutlist.CutList) []SheetRow {
	rows := []SheetRow{
		{"Wire blank", fmt.Sprintf("%s, Ø%s mm, %s", cl.Wire.Material, num(cl.Wire.DiameterMM), mm(cl.Wire.LengthMM))},
		{"Support rod", fmt.Sprintf("%s, %s", parts.SectionWords(cl.Dowel), mm(cl.Dowel.LengthMM))},
		{"Feed cable", fmt.Sprintf("%s, cut %s", cl.Coax.Cable.Name, mm(cl.Coax.CutMM))},
		{"Heat-shrink", fmt.Sprintf("2:1 sleeve Ø%s mm (shrinks to Ø%s mm), %s", num(cl.Sleeve.SuppliedMM), num(cl.Sleeve.RecoveredMM), mm(cl.Sleeve.LengthMM))},
		{"Reflector", fmt.Sprintf("%s %s, %s mm thick, cut from the template", s.Reflector.Shape, plateName(s), num(s.Reflector.ThicknessMM))},
		{"Matching strip", fmt.Sprintf("%s %s mm thick, cut from the template", stripName(s), num(s.Wedge.ThicknessMM))},
		{"Solder", fmt.Sprintf("about %s mm of Ø%s mm wire", num(cl.Solder.Amount), num(s.Stock.SolderWireMM))},
		{"Epoxy", fmt.Sprintf("about %s mL mixed, slow-setting", num(cl.Epoxy.Amount))},
	}
	if cl.Coax.Jack != "" {
		// A panel jack: the cable is a ready-made jumper, nothing to shrink.
		rows[2] = SheetRow{"Feed cable", fmt.Sprintf("%s jumper, %s, with a plug at each end (not cut from the kit)", cl.Coax.Cable.Name, mm(cl.Coax.FinishedMM))}
		rows = append(rows[:3], rows[4:]...)
	}
	if cl.Dowel.OverFeed {
		rows = slices.Delete(rows, 1, 2) // no support rod
	}
	for _, h := range cl.Hardware {
		rows = append(rows, SheetRow{"Hardware", fmt.Sprintf("%d × %s", h.Count, h.Item)})
	}
	return rows
}

// plateName is the reflector's sheet material as the sheet names it.
func plateName(s *spec.Spec) string {
	if m, ok := spec.SheetMaterialByID(s.Reflector.Material); ok {
		return m.Name
	}
	return "sheet"
}

func cautions(d *parts.Design, c sheetChoice) []Hazard {
	gain, _ := d.QuotedGain()
	rf := fmt.Sprintf("This antenna concentrates power: its "+gainWord(d)+" gain is %.1f dBic, so EIRP (dBm) = transmitter power (dBm) − feeder loss (dB) + %.1f dB.", gain, gain)
	if e := d.EIRP; e != nil {
		rf += fmt.Sprintf(" With %s dBm in and %s dB loss that is %.1f dBm (%.0f mW).", num(e.TxPowerDBm), num(e.FeederLossDB), e.EIRPDBm, e.EIRPmW)
	}
	rf += " EIRP limits depend on the band, the country and the licence; some rules allow only tens of milliwatts. Stay within the limit that applies to you, and keep people out of the main beam, in front of the open end, while transmitting."
	hz := []Hazard{
		{HazardSolder, "Soldering fumes and lead",
			"Rosin flux fume causes occupational asthma: work with fume extraction or a fan drawing the plume away, and keep your head out of it. Lead in solder harms you when swallowed: no food or drink at the bench, and wash your hands after soldering. Lead-free solder is preferred."},
		{HazardBurns, "Burns",
			"The iron tip and a hot-air tool's nozzle are hotter than 300 °C, and the reflector, coax and wire stay hot for a minute after a joint. Keep the iron in its stand and switch tools off after use, hold parts in pliers or a clamp, and wear eye protection against flux and solder spatter."},
		{HazardEpoxy, "Epoxy skin sensitisation",
			"Uncured epoxy resin and hardener are skin sensitisers: once sensitised, always sensitised. Wear nitrile gloves, mix in a ventilated place, and wash skin with soap and water, never with solvent."},
		{HazardEyes, "Eye protection when cutting wire",
			"Cut ends of hard or springy wire fly off at speed, and so do drilling chips. Wear safety glasses, cover the cut with a hand or a cloth, and hold the offcut when cutting."},
		{HazardLaminate, "Laminate dust and no laser on FR-4",
			"If the reflector is cut from glass-epoxy laminate (FR-4), never cut it on a hobby CO2 laser: it gives off toxic brominated fumes and chars. Saw, shear or mill it with dust extraction and a dust mask, with a sharp tool at a slow feed so the resin does not scorch and fume, or order it from a circuit-board maker. Sheet copper or brass is a safer reflector."},
		{HazardRF, "RF exposure and EIRP limits", rf},
	}
	// The laminate caution only where the kit has laminate; the metal
	// laser caution beside it where it has reflective metal.
	var out []Hazard
	for _, h := range hz {
		if h.ID == HazardLaminate && !c.plate.Halogenated && !c.strip.Halogenated {
			continue
		}
		out = append(out, h)
		if h.ID == HazardLaminate || (h.ID == HazardEyes && !c.plate.Halogenated && !c.strip.Halogenated) {
			if lm, ok := c.laserMetalHazard(); ok {
				out = append(out, lm)
			}
		}
	}
	return out
}

// pick returns the cautions with the given IDs, in that order.
func pick(all []Hazard, ids ...HazardID) []Hazard {
	var out []Hazard
	for _, id := range ids {
		for _, c := range all {
			if c.ID == id {
				out = append(out, c)
			}
		}
	}
	return out
}

func steps(d *parts.Design, cl *cutlist.CutList, strip *flat.Wedge, all []Hazard) []Step {
	s := d.Spec
	w := cl.Wire
	cx := cl.Coax
	// The former's lock hole sits at the start of the groove (the coil's
	// feed end) and its stop notch at the end; the flange is at the feed end
	// unless the coil widens away from the feed, when the former is printed
	// the other way up.
	marks := fmt.Sprintf("Mark the blank at %s from one end (mark A: the start of the winding; the end before it is the lock end, which goes into the former's lock hole and is later cut down to the feed lead) and at %s from the same end, %s further on: the length of the former's groove from the lock hole to the stop notch (mark B: the end of the winding, at the stop notch). The %s beyond mark B is trim.",
		mm(w.MarkAMM), mm(w.MarkBMM), mm(w.ArcMM), mm(cutlist.TrimPerEndMM))
	lockText := fmt.Sprintf("Bend the lock end at a right angle at mark A, so that its %s stands straight out from the blank. Push it into the lock hole at the start of the groove, %%s, until the bend at mark A sits at the mouth of the hole and the blank lies along the groove.", mm(w.LockTailMM))
	trimText := fmt.Sprintf("Cut the lock end off %s beyond mark A: that stub is the feed lead. Cut the other end at mark B. File the cut ends smooth.", mm(w.FeedLeadMM))
	if w.CentreFed {
		// The former's lock hole is the lead's channel: the lock end is
		// the feed lead, bent and sized on the former.
		marks = strings.Replace(marks, "which goes into the former's lock hole and is later cut down to the feed lead", "which goes into the former's lead channel and is the feed lead", 1)
		lockText = fmt.Sprintf("Bend the lock end at a right angle at mark A, towards the axis, so that its %s stands straight out from the blank. Push it into the lead channel at the start of the groove, %%s, until the bend at mark A sits at the channel's mouth and the blank lies along the groove: the channel runs in to the axis and sets the feed lead's bend, length and direction.", mm(w.LockTailMM))
		trimText = fmt.Sprintf("The lock end, %s beyond mark A, is the feed lead: leave it as the former set it. Cut the other end at mark B and file it smooth.", mm(w.LockTailMM))
	}
	unwind := (d.Former.Turns - d.Coil.Turns) * 360
	lockAt, windTo := "at the flange end of the former, the coil's feed end", "towards the free end of the former"
	if d.Former.EndRadius > d.Former.StartRadius {
		lockAt, windTo = "at the free end of the former, away from the flange: this coil widens away from its feed, so the former is printed feed end up", "towards the flange"
	}
	band := parts.BandOf(s).Text(s.FrequencyMHz)
	strip1 := "Cut the matching strip from its 1:1 template and file its edges smooth."
	strip2 := "Tin the strip and the underside of the winding's start. Solder the strip along the underside of the winding's start, its wide end at the feed and its flat face parallel to the reflector."
	expect := fmt.Sprintf("The matching strip is sized for a VSWR of at most %s (return loss at least %.1f dB) across the band; accept the antenna if the return loss is at least %s dB across it.", num(s.Wedge.MaxVSWR), line.ReturnLossDB((s.Wedge.MaxVSWR-1)/(s.Wedge.MaxVSWR+1)), num(ReturnLossTargetDB))
	clearance := ""
	if strip != nil && len(strip.Stations) > 0 {
		under := fmt.Sprintf("the first %.0f° of the winding", strip.Span*180/math.Pi)
		strip2 = "Tin the strip and the underside of " + under + ". Solder the strip along the underside of " + under + ", its wide end at the feed and its flat face parallel to the reflector."
		strip1 = fmt.Sprintf("Cut the matching strip from its 1:1 template: %s long, %s. File its edges smooth.", mm(strip.Length), stripShapeText(strip))
		clearance = fmt.Sprintf(" The strip's underside is only %s above the reflector at the feed: keep the solder there flat.", mm2(strip.Stations[0].Height))
		if band := d.Patterns.LineBand; len(band) > 1 {
			lo, hi := band[0], band[len(band)-1]
			expect += fmt.Sprintf(" The strip's line model gives VSWR %.2f at %s MHz and %.2f at %s MHz, worst %.2f in the band.", lo.VSWR, num(lo.FrequencyMHz), hi.VSWR, num(hi.FrequencyMHz), parts.WorstVSWR(band))
		}
	}
	expect += " If the best point is low in frequency, the turns are too large; if high, too small. If the return loss falls short across the band, raise or lower the strip's far end a fraction of a millimetre at a time and sweep again."
	ch := choiceOf(d, cl)
	coaxSteps := ch.feedSteps(cx, clearance)
	lead := fmt.Sprintf("At the coil's start, bend the feed lead straight down, parallel to the axis: it is %s long and ends just above the coax's dielectric.", mm(w.FeedLeadMM))
	if w.FeedLeadMM < 2*w.DiameterMM {
		lead = fmt.Sprintf("The wire's start sits only %s above the coax's dielectric, too little to bend a lead: leave the start straight; the centre conductor is soldered to its side in the step that solders the coil.", mm(w.FeedLeadMM))
	}
	rodHole, screw := rodMountSteps(cl)
	feedAt := "at the template's feed mark"
	standCoil := "Stand the coil over the reflector with its start beside the bare centre conductor and its axis over the reflector's centre."
	if d.CentreFed() {
		feedAt = "at the centre cross: this coil is centre-fed, so the cable comes up on the axis"
		lead = fmt.Sprintf("At the coil's start the feed lead runs at a right angle towards the axis, parallel to the reflector, as the former's lead channel bent it (straighten it back to that if it moved on release): it runs %s in to the axis, where it lies on the tip of the cable's centre conductor.", mm(d.FeedRun()))
		standCoil = fmt.Sprintf("Stand the coil over the reflector with its axis over the centre, the feed lead's end resting on the tip of the centre conductor and the lead running out along the template's tick at %.1f°.", math.Mod(d.FeedAngle()*180/math.Pi+360, 360))
		if f := cl.Dowel.Foot; f != nil {
			rodHole = ""
			screw = fmt.Sprintf("The rod stands over the feed, so its foot is bored, not screwed: drill a Ø%.1f mm hole %s deep up the centre of its foot, and saw a slot %s wide and as deep across one side of the foot. Lower the rod through the open top of the coil over the feed, the slot over the lead so the lead passes out through it without touching, and epoxy the foot to the reflector round the feed (keep epoxy off the joint).",
				f.BoreMM, mm(f.BoreDepthMM), mm(f.SlotWidthMM))
		}
	}
	wireNotes := ""
	for _, c := range d.Wire.Material.Cautions {
		wireNotes += " This wire: " + c.Text() + "."
	}
	list := []Step{
		{Title: "Straighten and clean the wire", Text: []string{
			fmt.Sprintf("Cut a %s blank of %s, Ø%s mm wire. Roll it straight under a flat board, or stretch it slightly, until it lies flat on the bench without rocking.", mm(w.LengthMM), w.Material, num(w.DiameterMM)),
			"Clean it bright with a fine abrasive pad and wipe it with alcohol. Enamelled wire must be stripped where it will be soldered." + wireNotes,
			marks,
		}, Cautions: pick(all, HazardEyes)},
		{Title: "Lock its end in the former", Text: []string{
			fmt.Sprintf(lockText, lockAt),
			"Check the hand mark on the former: this coil is " + d.Coil.Hand.String() + ", " + handWords(d.Coil.Hand) + ".",
		}},
		{Title: "Wind under tension", Text: []string{
			"Lay the wire into the groove turn by turn, pulling it tight with steady tension so it seats at the bottom of the groove all the way round. Do not let it ride up on the groove wall.",
			fmt.Sprintf("Wind the %.2f turns of the groove %s until mark B reaches the stop notch at its end.", d.Former.Turns, windTo),
		}},
		{Title: "Hold and overbend", Text: []string{
			"Hold the wire at mark B for about ten seconds, then press every turn once more into its groove with a thumb, a little tighter than it lies, to set the bend.",
		}},
		{Title: "Release", Text: []string{
			fmt.Sprintf("Let go of the end at mark B slowly and let the coil open up on the former: it springs out to its relaxed size and, keeping its length, unwinds by about %.0f° to %s. Free the lock end and twist the coil off along the groove.", unwind, parts.TurnsText(d.Coil.Turns)),
		}},
		{Title: "Measure each turn against the inspection table", Text: []string{
			"Measure every turn across its middle, over the outside of the wire, and write the reading in the inspection table at the end of this sheet.",
			"A turn outside the tolerance can be eased open or closed by hand. If every turn is large by about the same amount, this batch of wire springs back more than expected: recalibrate the former from a measured test coil before winding the rest of the batch.",
		}},
		{Title: "Trim and form the feed lead", Text: []string{
			trimText,
			lead,
		}, Cautions: pick(all, HazardEyes)},
		{Title: "Prepare the reflector", Text: []string{
			fmt.Sprintf("Cut the %s reflector from its 1:1 template, in %s mm sheet. Drill the Ø%.2f mm feed hole %s.%s", s.Reflector.Shape, num(s.Reflector.ThicknessMM), cx.FeedHoleMM, feedAt, rodHole),
			"Deburr both faces.",
			ch.plateText(),
		}, Cautions: pick(all, HazardLaminate, HazardLaserMetal, HazardEyes)},
		{Title: "Prepare and solder the coax", Text: coaxSteps, Cautions: pick(all, HazardSolder, HazardBurns)},
		{Title: "Solder the wedge under the start of the winding", Text: []string{strip1, strip2},
			Cautions: pick(all, HazardSolder, HazardBurns)},
		{Title: "Solder the coil", Text: []string{
			standCoil,
			fmt.Sprintf("Solder the centre conductor to the feed lead and the strip's feed end. Check with a spacer that the first turn's wire centre is %s above the reflector and that no part of the wire or strip touches the reflector.", mm2(d.Coil.Z0)),
		}, Cautions: pick(all, HazardSolder, HazardBurns)},
		{Title: "Epoxy and support", Text: supportSteps(screw, cl.Dowel), Cautions: pick(all, HazardEpoxy)},
		{Title: "Heat-shrink", Text: []string{
			"Slide the sleeve up against the reflector's back face, over the cable's joint, and shrink it evenly with the hot-air tool. Fix the cable to the reflector with the cable tie.",
		}, Cautions: pick(all, HazardBurns)},
		{Title: "Final checks", Text: []string{
			"Compare the antenna with the side view: hand, turn count, first turn height and overall height (" + mm(Heights(d).Overall) + " from the reflector's top face to the top of the wire).",
			"With the multimeter, check there is no continuity between the connector's centre pin and its body: the coil and strip must not touch the reflector.",
			fmt.Sprintf("Calibrate the vector network analyser (VNA) at the end of its test cable, connect the antenna, point it at open sky away from metal, and sweep the return loss (S11) across %s.", band),
			expect,
			"Before transmitting, work out the EIRP and check the limit that applies to you.",
		}, Cautions: pick(all, HazardRF)},
		{Title: "Checks without a network analyser", Text: acceptanceText(d), Cautions: pick(all, HazardRF)},
	}
	if cx.Jack != "" {
		// A panel jack has no cable at the plate to shrink or tie.
		for i := range list {
			if list[i].Title == "Heat-shrink" {
				list = append(list[:i], list[i+1:]...)
				break
			}
		}
		for i := range list {
			if list[i].Title == "Prepare and solder the coax" {
				list[i].Title = "Mount the " + ch.connector.Name
			}
			for j, t := range list[i].Text {
				list[i].Text[j] = strings.NewReplacer("Solder the centre conductor to", "Solder the connector's rear contact to", "the coax's dielectric", "the connector's insulator", "the bare centre conductor", "the connector's rear contact", "the centre conductor is soldered", "the connector's rear contact is soldered").Replace(t)
			}
		}
	}
	shrink, coil := 0, 0
	for i := range list {
		list[i].Number = i + 1
		switch list[i].Title {
		case "Heat-shrink":
			shrink = i + 1
		case "Solder the coil":
			coil = i + 1
		}
	}
	if coil > 0 {
		for i := range list {
			for j, t := range list[i].Text {
				list[i].Text[j] = strings.ReplaceAll(t, "in the step that solders the coil", fmt.Sprintf("in step %d", coil))
			}
		}
	}
	if shrink > 0 {
		for i := range list {
			for j, t := range list[i].Text {
				list[i].Text[j] = strings.ReplaceAll(t, "it is shrunk near the end of the build", fmt.Sprintf("it is shrunk in step %d", shrink))
			}
		}
	}
	return list
}

// feedRow is the design table's feed: the cable to the plate, or the
// panel jack and its jumper.
func feedRow(d *parts.Design, cl *cutlist.CutList) string {
	if j, ok := spec.ConnectorByID(d.Spec.Reflector.Connector); ok && j.Mount != "pigtail" {
		return fmt.Sprintf("%s on the reflector; %s jumper, %s", j.Name, cl.Coax.Cable.Name, mm(cl.Coax.FinishedMM))
	}
	return fmt.Sprintf("%s, %s to the reflector", cl.Coax.Cable.Name, mm(cl.Coax.FinishedMM))
}

// stripName is the matching strip's sheet material as the sheet names it.
func stripName(s *spec.Spec) string {
	if m, ok := spec.SheetMaterialByID(s.Wedge.Material); ok {
		return m.Name + ","
	}
	return "thin copper or brass sheet,"
}
