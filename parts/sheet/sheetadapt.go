// The parts of the build sheet that follow what the spec chose: the plate
// material (which face takes the ground joint, or whether it can be
// soldered at all), the connector (panel jack or cable pigtail), the cable
// (solid or braided outer), the support rod's real gap and the cutting
// method's cautions.

package sheet

import (
	"fmt"
	"strings"

	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/spec"
)

// HazardLaserMetal is the caution for laser-cutting reflective metals.
// Common practice (no published source): copper, brass and aluminium
// reflect a CO₂ laser's 10.6 µm beam, so hobby CO₂ cutters do not cut
// them, and the reflection can damage the laser.
const HazardLaserMetal HazardID = "laser-metal"

// sheetChoice is what the spec chose that changes the sheet's words.
type sheetChoice struct {
	plate     spec.SheetMaterial
	strip     spec.SheetMaterial
	connector spec.Connector
	cable     spec.CoaxType
	method    string
}

func choiceOf(d *parts.Design, cl *cutlist.CutList) sheetChoice {
	s := d.Spec
	c := sheetChoice{cable: cl.Coax.Cable, method: s.Cutting.Method}
	c.plate, _ = spec.SheetMaterialByID(s.Reflector.Material)
	c.strip, _ = spec.SheetMaterialByID(s.Wedge.Material)
	var ok bool
	if c.connector, ok = spec.ConnectorByID(s.Reflector.Connector); !ok {
		c.connector, _ = spec.ConnectorByID("coax")
	}
	return c
}

// pigtail reports whether the cable passes through the plate (no jack).
func (c sheetChoice) pigtail() bool { return c.connector.Mount == "pigtail" }

// plateText is the paragraph of the reflector step on the plate's faces
// and its ground joint.
func (c sheetChoice) plateText() string {
	switch c.plate.Joint {
	case "clad":
		t := "This plate is copper-clad laminate: its copper face is the reflector. Put the copper face up, towards the coil; every height on this sheet is measured from the copper face, and the ground joint is soldered on the copper face."
		if c.pigtail() && c.cable.Braided {
			t += " A braided cable's braid is soldered to the back face, so use laminate clad on both faces and join the two copper faces at the feed: solder a short wire through a 1 mm hole drilled 3 mm from the feed hole, to both faces."
		}
		return t
	case "clamp":
		return "This plate is aluminium: it cannot be soft-soldered with ordinary flux, because its oxide film stops the solder wetting it. Do not try to solder to it. The ground joint is clamped: " + c.clampJoint() + " Scrape the aluminium bright under the clamp just before assembly, and seal the joint against water outdoors: aluminium against copper or brass corrodes when wet."
	}
	return fmt.Sprintf("This plate is %s and takes solder: clean it bright at the feed. A thick or large plate draws heat away: use a large iron tip at a high setting, or warm the plate first.", c.plate.Name)
}

// clampJoint says how the outer conductor meets an aluminium plate.
func (c sheetChoice) clampJoint() string {
	switch c.connector.Mount {
	case "bulkhead":
		return fmt.Sprintf("the %s's nut and lock washer clamp its body to the plate round the D-hole.", c.connector.Name)
	case "flange":
		return fmt.Sprintf("the %s's four screws, with star washers under the nuts, clamp its flange to the plate.", c.connector.Name)
	}
	return "the cable's outer conductor is soldered to a tinned M3 solder tag, and the tag is screwed to the plate with an M3 screw, nut and star washer 6 mm from the feed hole. A bulkhead connector (reflector.connector = \"n-bulkhead\" or \"sma-bulkhead\") clamps to the plate without any of this."
}

// feedSteps returns the paragraphs of the feed step: strip and solder a
// pigtail, or mount a panel jack. clearance is appended to the joint's
// paragraph.
func (c sheetChoice) feedSteps(cx cutlist.CoaxCut, clearance string) []string {
	if !c.pigtail() {
		mount := fmt.Sprintf("Fit the %s in the feed cut-out from behind, its mating face under the plate and its rear contact up through the hole.", c.connector.Name)
		switch c.connector.Mount {
		case "bulkhead":
			mount += " Fit the lock washer and nut from the coil side and tighten the nut with a spanner while holding the body."
		case "flange":
			mount += " Fit its four screws with nuts (star washers on an aluminium plate) and tighten them evenly."
		}
		joint := "The connector's body is grounded by its clamp; do not rely on solder alone."
		if c.plate.Joint != "clamp" {
			joint = "The clamp grounds the body; a solder fillet round the body on the plate's top face, where the connector's maker allows heat, makes the joint surer."
		}
		return []string{mount,
			fmt.Sprintf("Its rear contact must reach %s above the plate's top face, the wire's centre height: extend it with a short piece of the coil wire soldered to it if it is shorter, keeping it clear of the hole's edge.", mm(cx.CentreMM)),
			joint + clearance}
	}
	prep := fmt.Sprintf("Cut the cable to %s. At the reflector end, remove %s of outer conductor to leave %s of dielectric, then %s of dielectric to bare the centre conductor.",
		mm(cx.CutMM), mm(cx.DielectricMM+cx.CentreMM), mm(cx.DielectricMM), mm(cx.CentreMM))
	face := "top face"
	push := "Push the cable up through the feed hole from behind until its outer conductor is flush with the top face and the dielectric stands " + mm(cx.ProudMM) + " proud."
	if cx.FlareMM > 0 {
		prep = fmt.Sprintf("Cut the cable to %s. At the reflector end, strip the jacket back %s. Cut the braid off %s from the end and comb the %s left next to the jacket out straight. Remove %s of dielectric to bare the centre conductor.",
			mm(cx.CutMM), mm(cx.DielectricMM+cx.CentreMM+cx.FlareMM), mm(cx.DielectricMM+cx.CentreMM), mm(cx.FlareMM), mm(cx.CentreMM))
		push = "Push the cable up through the feed hole from behind until the braid meets the back face and the dielectric stands " + mm(cx.ProudMM) + " proud of the top face. Fan the braid out flat round the hole."
		face = "back face"
	}
	var joint string
	switch c.plate.Joint {
	case "clamp":
		joint = "Solder the outer conductor (the fanned braid, or the tube) to the solder tag, not to the aluminium, and screw the tag down as the reflector step says."
	case "clad":
		joint = "Solder the outer conductor all round the hole on the " + face + "'s copper."
	default:
		joint = "Solder the outer conductor all round the hole on the " + face + "."
	}
	return []string{"Slide the heat-shrink sleeve onto the cable first; it is shrunk near the end of the build.", prep, push + " " + joint + clearance}
}

// supportText is the epoxy step's paragraph on how the turns meet the
// rod, worded from the real radial gap.
func supportText(dw parts.DowelCut) string {
	if dw.OverFeed {
		return "This kit has no support rod: the feed hole leaves no room for a rod's foot at the reflector's centre. " + parts.OutsideSupport
	}
	gap := (dw.InnerTurnMM - dw.DiameterMM) / 2
	if gap <= epoxyBridgeMM {
		return fmt.Sprintf("The turns clear the Ø%s mm rod by %s all round. Put two small epoxy beads per turn between the rod and the wire, on opposite sides, without moving the turns. Let it cure as the maker says.", num(dw.DiameterMM), mm(gap))
	}
	return fmt.Sprintf("The turns stand %s off the Ø%s mm rod all round: too far for an epoxy bead to bridge. Cut two spacers per turn from offcut rod or PTFE, %s long, and epoxy each between the rod and the wire, on opposite sides, without moving the turns. Let it cure as the maker says.", mm(gap), num(dw.DiameterMM), mm(gap))
}

// epoxyBridgeMM is the widest gap a bead of thickened epoxy bridges
// without sagging. Common practice (no published source).
const epoxyBridgeMM = 3.0

// laserMetalHazard returns the caution for laser-cutting the kit's
// reflective metal parts, naming them.
func (c sheetChoice) laserMetalHazard() (Hazard, bool) {
	var names []string
	if c.plate.Reflective {
		names = append(names, "the reflector ("+c.plate.Name+")")
	}
	if c.strip.Reflective {
		names = append(names, "the matching strip ("+c.strip.Name+")")
	}
	if len(names) == 0 {
		return Hazard{}, false
	}
	what := names[0]
	if len(names) == 2 {
		what += " and " + names[1]
	}
	text := "If " + what + " is laser-cut, use a fibre laser: copper, brass and aluminium reflect a hobby CO2 laser's beam, which does not cut them and can reflect back into the laser. Shears, a saw or a mill cut them as well."
	if c.method == "laser" {
		text = "This kit is set for laser cutting: cut " + what + " on a fibre laser only. Copper, brass and aluminium reflect a hobby CO2 laser's beam, which does not cut them and can reflect back into the laser."
	}
	return Hazard{HazardLaserMetal, "Laser-cutting metal needs a fibre laser", text}, true
}

// rodMountSteps returns the build sheet's words for the rod's mount: the
// hole drilled in the reflector (with its leading space, or empty) and the
// step that fixes the rod.
func rodMountSteps(cl *cutlist.CutList) (hole, fix string) {
	dc := cl.Dowel
	if dc.OverFeed {
		return "", ""
	}
	mt := dc.Rod.Mount
	plug := ""
	if mt.PlugMM > 0 {
		plug = fmt.Sprintf("Epoxy %s of Ø%s mm solid rod into the tube's foot, flush with its end, and let it cure. ", mm(mt.PlugMM), num(dc.BoreMM))
	}
	if mt.Screw == "" {
		return "", fmt.Sprintf("%sLower the %s (about %.0f g) through the open top of the coil and epoxy its foot to the reflector's centre, in the inner circle marked there, with a fillet all round that stays inside the outer circle, clear of the feed hole.", plug, parts.SectionWords(dc), dc.Rod.MassG)
	}
	item := mt.Screw + " screw"
	for _, h := range cl.Hardware {
		if strings.HasPrefix(h.Item, mt.Screw) {
			item = h.Item
		}
	}
	hole = fmt.Sprintf(" The %s mm hole at the centre is for the rod's %s screw.", num(mt.ClearMM), mt.Screw)
	fix = fmt.Sprintf("%sDrill a %s mm pilot hole 8 mm deep in the centre of the %s's foot. Lower the %s (about %.0f g) through the open top of the coil onto the reflector's centre hole and fix it from behind with the %s.",
		plug, num(mt.PilotMM), map[bool]string{true: "tube", false: "rod"}[dc.BoreMM > 0], parts.SectionWords(dc), dc.Rod.MassG, item)
	return hole, fix
}
