package kit

import (
	"fmt"
	"io"
	"strings"

	"coilwright/cam/stl"
	"coilwright/cam/threemf"
	"coilwright/jig"
	"coilwright/jig/mesh"
	"coilwright/parts"
)

// planSplit plans a former taller than the print volume (but not wider)
// as sections that stack on the support rod, and says so in place of the
// former-size warning. A former that cannot be split keeps the warning.
func (k *Kit) planSplit() {
	s, pl := k.Source.Spec, k.Former
	if pl.FitsPrinter || len(pl.Problems) > 0 || pl.DiameterMM > s.Former.PrintWidthMM {
		return
	}
	if k.cutList.Dowel.OverFeed {
		k.Design.Warnings = append(k.Design.Warnings, parts.Warning{Code: "former-split", Message: "the former could not be split into sections: they stack on the support rod, and this kit has none (see rod-over-feed)"})
		return
	}
	// The sections ride on the rod: the former is bored for it, so the
	// lock hole and stop notch keep their wall from the rod; a centre
	// feed's bore is blind short of the lead channel (jig.FormerPlan.OnRod).
	rod := k.cutList.Dowel.DiameterMM
	onRod := pl.OnRod(rod)
	f, err := onRod.Former()
	var sp *jig.SplitPlan
	if err == nil {
		sp, err = f.Split(s.Former.PrintHeightMM, rod, onRod.Params)
	}
	if err != nil {
		k.Design.Warnings = append(k.Design.Warnings, parts.Warning{Code: "former-split", Message: "the former could not be split into sections: " + err.Error()})
		return
	}
	k.split, k.formerObj, k.onRod = sp, f, onRod
	for i, w := range k.Design.Warnings {
		if w.Code == "former-size" {
			k.Design.Warnings[i] = parts.Warning{Code: "former-size", Message: fmt.Sprintf(
				"the winding former is %.0f mm tall, more than the print volume's %s mm: it is written as %d sections (%s) of %.1f mm that stack on the Ø%s mm support rod, a key peg on each top face in the next one's socket",
				pl.HeightMM, num(s.Former.PrintHeightMM), len(sp.Sections), sectionNames(len(sp.Sections)), sp.Sections[0].Z1-sp.Sections[0].Z0, num(k.cutList.Dowel.DiameterMM))}
		}
	}
}

func sectionNames(n int) string {
	names := make([]string, n)
	for i := range names {
		names[i] = fmt.Sprintf("former-%d.stl", i+1)
	}
	return strings.Join(names, ", ")
}

// writeSections meshes each section of a split former, checks it, and
// writes former-N.stl and former-N.3mf.
func (k *Kit) writeSections(out Sink) error {
	s := k.Source.Spec
	opt := k.formerObj.MeshOptions(s.Former.ToleranceMM, true)
	for _, sec := range k.split.Sections {
		m, err := mesh.Mesh(sec.Solid, opt)
		if err != nil {
			return fmt.Errorf("former section %d: %w", sec.Number, err)
		}
		if _, err := mesh.CheckMesh(m, mesh.CheckOptions{Genus: sec.Genus}); err != nil {
			return fmt.Errorf("former section %d mesh: %w", sec.Number, err)
		}
		name := fmt.Sprintf("former-%d", sec.Number)
		header := stlHeader(fmt.Sprintf("coilwright former section %d of %d: %s", sec.Number, len(k.split.Sections), s.Kit))
		if err := out.Add(name+".stl", func(w io.Writer) error {
			return stl.WriteSTL(w, m, stl.STLOptions{Header: header})
		}); err != nil {
			return err
		}
		if err := out.Add(name+".3mf", func(w io.Writer) error {
			return threemf.Write3MF(w, m, threemf.ThreeMFOptions{Name: fmt.Sprintf("%s former section %d", s.Kit, sec.Number)})
		}); err != nil {
			return err
		}
	}
	return nil
}

// sectionAssembly is the paragraph the lock step opens with when the
// former is split.
func (k *Kit) sectionAssembly() string {
	sp := k.split
	n := len(sp.Sections)
	rod := ""
	for _, sec := range sp.Sections {
		if sec.Genus == 0 {
			// A centre feed's blind bore: the rod stops short of the
			// lead channel.
			rod = fmt.Sprintf(" The rod ends in section %d, which holds the feed lead's channel: its bore there is blind and stops a wall short of the channel, so push the rod home until it bottoms.", sec.Number)
		}
	}
	return fmt.Sprintf("This former is printed as %d sections, numbered on their top faces. Slide them onto the Ø%s mm support rod in order, section 1 (the flange) first, turning each until its socket drops over the key peg of the one below, and clamp the stack so the joints close: the groove runs on across each joint.%s Wind over the joints as if the former were one piece.",
		n, num(k.cutList.Dowel.DiameterMM), rod)
}

// printed returns the plan of the former as printed: bored for the
// support rod when it is split into sections.
func (k *Kit) printed() jig.FormerPlan {
	if k.split != nil {
		return k.onRod
	}
	return k.Former
}

// formerLead is the paragraph the lock step opens with when the former is
// not printed whole: the sections' assembly, or, for a former no printer
// section takes, winding on a turned mandrel instead.
func (k *Kit) formerLead() string {
	switch {
	case k.split != nil:
		return k.sectionAssembly()
	case !k.Former.FitsPrinter:
		return fmt.Sprintf("No former is printed for this coil: at %.0f mm across and %.0f mm tall it does not fit the print volume. Wind on a turned or built-up mandrel instead, its wire-centre diameters as in the Former (mm) column of design.md's wire and winding table, with a hole for the lock end at the start and a pencil line for the pitch; the steps below read the same with the mandrel in place of the former.",
			k.Former.DiameterMM, k.Former.HeightMM)
	}
	return ""
}
