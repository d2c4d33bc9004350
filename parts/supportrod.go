// The support rod: which stocked rod or tube holds the coil, how much it
// loads the coil's field, what it weighs and how it is fixed to the
// reflector.
//
// The default is the thinnest stocked section that carries the coil: its
// outside diameter is at least the rod's length over MaxRodSlenderness
// (and never below the smallest stock size), and it passes inside the
// smallest turn with the clearance asked for. Where the material is
// stocked as a tube of that outside diameter, the tube is taken: it is as
// stiff for its weight and puts less dielectric inside the coil. When no
// section stiff enough passes inside the smallest turn, the largest that
// passes is taken with a warning.

package parts

import (
	"fmt"
	"math"
	"slices"
)

// MaxRodSlenderness is the largest length-to-diameter ratio of a default
// support rod. Common practice (no published source): a plastic or
// glass-fibre rod longer than about forty diameters bends visibly under a
// coil held sideways.
const MaxRodSlenderness = 40.0

// RodShiftWarnFraction is the estimated downward frequency shift from the
// rod's dielectric loading above which the design warns: a third of the
// ±3 % band the build sheet sweeps by default. Common practice (no
// published source).
const RodShiftWarnFraction = 0.01

// RodMaterial is one support-rod material: its relative permittivity, its
// density and the tubes it is stocked as.
type RodMaterial struct {
	ID           string
	Permittivity float64      // relative permittivity εr at microwave frequencies
	DensityGcm3  float64      // g/cm³
	Tubes        [][2]float64 // stocked tubes as {outside, bore} diameters in mm, ascending
}

// rodMaterials lists the support-rod materials the spec names.
//
// Permittivity: PTFE 2.1, glass-fibre rod 4–5 (4.5 taken), dry hardwood
// 2–3 (2.5 taken) from DOMAIN §9 [mem]; nylon (PA6, dry) 3.5 From memory
// (datasheets give 3–4 at 1 MHz–1 GHz). Density: PTFE 2.2, PA6 1.14,
// pultruded glass-fibre/epoxy 1.9, dry beech 0.7 g/cm³, From memory
// (material suppliers' datasheets). Tubes: PTFE tube 6/4, 8/6, 10/8, 12/10
// mm and pultruded glass-fibre tube 4/2 to 30/27 mm are catalogue sizes of
// plastics and model-making suppliers, From memory; nylon is stocked as
// flexible pneumatic hose, which does not carry a coil, and wood as solid
// dowel only.
func rodMaterials() []RodMaterial {
	return []RodMaterial{
		{ID: "ptfe", Permittivity: 2.1, DensityGcm3: 2.2, Tubes: [][2]float64{{6, 4}, {8, 6}, {10, 8}, {12, 10}}},
		{ID: "nylon", Permittivity: 3.5, DensityGcm3: 1.14},
		{ID: "glass-fibre", Permittivity: 4.5, DensityGcm3: 1.9, Tubes: [][2]float64{{4, 2}, {5, 3}, {6, 4}, {8, 6}, {10, 8}, {12, 10}, {14, 12}, {16, 14}, {20, 18}, {25, 22}, {30, 27}}},
		{ID: "wood", Permittivity: 2.5, DensityGcm3: 0.7},
	}
}

// LookupRodMaterial returns the support-rod material with the spec name id.
func LookupRodMaterial(id string) (RodMaterial, error) {
	for _, m := range rodMaterials() {
		if m.ID == id {
			return m, nil
		}
	}
	return RodMaterial{}, fmt.Errorf("no support-rod material %q", id)
}

// RodLoading is the first-order estimate of how the rod's dielectric
// lowers the coil's frequency: εeff ≈ 1 + (εr − 1)·F with the fill ratio F
// the rod's solid section over the area inside the coil's centreline,
// (d_out² − d_bore²)/D², and a shift of about 1 − 1/√εeff. From memory
// (DOMAIN §9): an upper-bound style estimate, not a published formula; the
// field is weakest on the axis, so the true shift is smaller.
type RodLoading struct {
	FillRatio       float64 // F, 0–1
	Permittivity    float64 // εr of the rod
	EffectivePerm   float64 // εeff
	ShiftFraction   float64 // estimated relative lowering of the design frequency
	HelixDiameterMM float64 // D used, the smallest centreline diameter, mm
}

// EstimateRodLoading returns the loading estimate of a rod of outside
// diameter outer and bore bore (0 for a solid rod), in mm, inside a coil
// of centreline diameter helix mm, of permittivity eps.
func EstimateRodLoading(outer, bore, helix, eps float64) RodLoading {
	f := math.Min(1, (outer*outer-bore*bore)/(helix*helix))
	ee := 1 + (eps-1)*f
	return RodLoading{FillRatio: f, Permittivity: eps, EffectivePerm: ee, ShiftFraction: 1 - 1/math.Sqrt(ee), HelixDiameterMM: helix}
}

// RodMount is how the rod's foot is fixed to the reflector.
type RodMount struct {
	Screw      string  // "M3", "M4" or "M5"; empty for an epoxy foot
	ClearMM    float64 // clearance hole in the reflector
	PilotMM    float64 // pilot hole in the rod's foot (or in its plug)
	PlugMM     float64 // a tube's foot is plugged with this much solid rod of its bore, mm; 0 for a rod
	MassG      float64 // rod mass the mount is sized for
	Basis      string  // the rule applied, in words
	Overloaded bool    // the rod is heavier than the largest mount here is sized for
}

// rodScrew is one screw size for the rod's foot: the largest rod mass it
// holds, the least solid diameter it threads into, its clearance hole
// (ISO 273, medium series) and its pilot (tapping size for plastics, a
// little over the ISO 2306 tap drill). Masses: common practice (no
// published source), a light screw for a light rod, checked with the
// antenna held sideways and a factor of three for knocks.
type rodScrew struct {
	name            string
	maxMassG        float64
	minSolidMM      float64
	clearMM, pilotM float64
}

func rodScrews() []rodScrew {
	return []rodScrew{
		{"M3", 150, 6, 3.2, 2.5},
		{"M4", 400, 8, 4.3, 3.3},
		{"M5", 1000, 10, 5.3, 4.2},
	}
}

// epoxyFootMaxG is the heaviest rod left on an epoxy fillet alone.
// Common practice (no published source).
const epoxyFootMaxG = 30.0

// tubePlugMM is the length of solid rod epoxied into a tube's foot to take
// the screw. Common practice (no published source): three screw lengths.
const tubePlugMM = 15.0

// SupportRod is a chosen support section and what follows from it.
type SupportRod struct {
	Material   RodMaterial
	OuterMM    float64 // outside diameter
	BoreMM     float64 // bore of a tube, 0 for a solid rod
	LengthMM   float64
	MinOuterMM float64 // the least outside diameter that carries the coil (length / MaxRodSlenderness)
	Slender    bool    // no section stiff enough passes inside the smallest turn
	Loading    RodLoading
	MassG      float64
	Mount      RodMount
}

// Tube reports whether the section is a tube.
func (r SupportRod) Tube() bool { return r.BoreMM > 0 }

// ChooseSupportRod picks the support section for a coil: material is the
// spec's dowel material, room the largest outside diameter that passes
// inside the smallest turn with the clearance, length the rod's length and
// helix the smallest centreline diameter, all in mm. given is a diameter
// fixed by the spec (a solid rod), or 0 to choose. It returns an error
// only when no stock size passes (the spec check refuses such a coil
// first).
func ChooseSupportRod(material string, room, length, helix, given float64) (SupportRod, error) {
	return chooseRod(material, room, length, helix, given, 0)
}

// chooseRod is ChooseSupportRod for a rod whose foot must clear a hole of
// diameter clear mm on the axis (0 for none): a tube whose bore passes it,
// or a solid rod that keeps MinRodWallMM round it once bored.
func chooseRod(material string, room, length, helix, given, clear float64) (SupportRod, error) {
	m, err := LookupRodMaterial(material)
	if err != nil {
		return SupportRod{}, err
	}
	r := SupportRod{Material: m, LengthMM: length, MinOuterMM: math.Max(dowelDiametersMM[0], length/MaxRodSlenderness)}
	if given > 0 {
		r.OuterMM = given
	} else {
		// The stocked outside diameters, rods and tubes together.
		sizes := slices.Clone(dowelDiametersMM)
		for _, t := range m.Tubes {
			sizes = append(sizes, t[0])
		}
		slices.Sort(sizes)
		sizes = slices.Compact(sizes)
		// clears reports whether a stocked section of outside diameter od
		// clears the hole: a tube by its bore, a rod by its wall.
		clears := func(od float64) bool {
			if clear == 0 {
				return true
			}
			for _, t := range m.Tubes {
				if t[0] == od && t[1] >= clear-rodFootFitTolMM {
					return true
				}
			}
			return od >= clear+2*MinRodWallMM-rodFootFitTolMM
		}
		var ok []float64
		for _, od := range sizes {
			if clears(od) {
				ok = append(ok, od)
			}
		}
		sizes = ok
		fits := -1
		for i, od := range sizes {
			if od > room+1e-9 {
				break
			}
			fits = i
		}
		if fits < 0 {
			return SupportRod{}, fmt.Errorf("no stock rod passes %.2f mm: the spec was not validated", room)
		}
		r.OuterMM = sizes[fits]
		for _, od := range sizes[:fits+1] {
			if od >= r.MinOuterMM-1e-9 {
				r.OuterMM = od
				break
			}
		}
		r.Slender = r.OuterMM < r.MinOuterMM-1e-9
		for _, t := range m.Tubes {
			if t[0] == r.OuterMM && (clear == 0 || t[1] >= clear-rodFootFitTolMM) {
				r.BoreMM = t[1]
			}
		}
	}
	r.Loading = EstimateRodLoading(r.OuterMM, r.BoreMM, helix, m.Permittivity)
	area := math.Pi / 4 * (r.OuterMM*r.OuterMM - r.BoreMM*r.BoreMM) // mm²
	r.MassG = m.DensityGcm3 * area * length / 1000
	r.Mount = mountFor(r, math.Inf(1))
	return r, nil
}

// mountFor sizes the rod's foot fixing to its mass: an epoxy fillet for a
// light or thin rod, else the smallest screw that holds the mass and
// threads into the solid section (a tube's plug) and whose washer, of
// outside diameter at most maxWasherMM, fits the plate's centre.
func mountFor(r SupportRod, maxWasherMM float64) RodMount {
	solid := r.OuterMM
	mt := RodMount{MassG: r.MassG}
	if r.Tube() {
		solid = r.BoreMM
		mt.PlugMM = tubePlugMM
	}
	screws := rodScrews()
	for _, sc := range screws {
		if r.MassG <= sc.maxMassG && solid >= sc.minSolidMM && washerODMM(sc.name) <= maxWasherMM {
			mt.Screw, mt.ClearMM, mt.PilotMM = sc.name, sc.clearMM, sc.pilotM
			mt.Basis = fmt.Sprintf("%s screw: holds up to %.0f g of rod and threads into %s mm of solid section or more", sc.name, sc.maxMassG, num(sc.minSolidMM))
			return mt
		}
	}
	mt.Basis = fmt.Sprintf("epoxy fillet: a rod of %.0f g or less", epoxyFootMaxG)
	if r.MassG > epoxyFootMaxG || r.MassG > screws[len(screws)-1].maxMassG {
		mt.Overloaded = true
		mt.Basis = fmt.Sprintf("no screw here holds %.0f g in a %s mm solid section", r.MassG, num(solid))
	}
	return mt
}

// RodNote is the cut list's note on the support: the rule that chose it,
// its weight and mount, and the dielectric-loading estimate.
func RodNote(dc DowelCut) string {
	r := dc.Rod
	why := "as the spec gives"
	if dc.Automatic {
		why = fmt.Sprintf("the thinnest stocked section at least 1/%g of its length (Ø%.1f mm) that passes inside the smallest turn", MaxRodSlenderness, r.MinOuterMM)
	}
	plug := ""
	if r.Mount.PlugMM > 0 {
		plug = fmt.Sprintf("; epoxy %s of Ø%s mm solid rod into its foot", mm(r.Mount.PlugMM), num(dc.BoreMM))
	}
	return fmt.Sprintf("%s (%.2f mm inside, %s mm clearance); about %.0f g%s; dielectric loading (first-order estimate): fill ratio %.3f, εeff %.3f, frequency lower by about %.1f %%; %s",
		why, dc.InnerTurnMM, num(dc.ClearanceMM), r.MassG, plug, r.Loading.FillRatio, r.Loading.EffectivePerm, 100*r.Loading.ShiftFraction, dc.MaterialAdvice)
}

// OutsideSupport says how a coil without a support rod is held. Common
// practice (no published source).
const OutsideSupport = "Hold the coil upright from outside, clear of the feed: low-loss spacers (offcuts of PTFE or glass-fibre) standing on the reflector against the outside of the turns, each turn fixed to them with a small bead of epoxy, or a sleeve of closed-cell foam round the coil. They are not in the cut list: cut them from what is to hand. Let the epoxy cure as the maker says."

// Description returns the support in one paragraph for the cut list: the
// section, its length, the rule that chose it, its mass and mount, and the
// dielectric-loading estimate; for a kit without a rod (OverFeed), why
// there is none and how the coil is held instead.
func (dc DowelCut) Description() string {
	if dc.OverFeed {
		return "None: the feed hole leaves no room at the reflector's centre for a rod's foot (see the rod-over-feed warning), so this kit has no support rod. " + OutsideSupport
	}
	return fmt.Sprintf("%s, %.1f mm long: %s. Mount: %s. The loading is a first-order estimate, εeff ≈ 1 + (εr − 1)·F with F the rod's share of the area inside the smallest turn; the field is weakest on the axis, so the true shift is smaller.",
		SectionWords(dc), dc.LengthMM, RodNote(dc), dc.Rod.Mount.Basis)
}

// SectionWords names the support section of dc: "Ø8 mm ptfe rod" or "Ø8/6 mm
// ptfe tube".
func SectionWords(dc DowelCut) string {
	if dc.BoreMM > 0 {
		return fmt.Sprintf("Ø%s/%s mm %s tube", num(dc.DiameterMM), num(dc.BoreMM), dc.Material)
	}
	return fmt.Sprintf("Ø%s mm %s rod", num(dc.DiameterMM), dc.Material)
}

// Support-rod allowance in mm. Common practice (no published source).
const (
	// DowelOverhangMM is how far the rod stands above the top turn.
	DowelOverhangMM = 5.0
)

// dowelDiametersMM are the support-rod diameters commonly stocked in
// PTFE, nylon, glass-fibre and wood, in mm, ascending. Common practice (no
// published source).
var dowelDiametersMM = []float64{3, 4, 5, 6, 8, 10, 12, 15, 16, 20, 25, 30, 35, 40, 50, 60, 80, 100}

// DowelDiametersMM returns the support-rod diameters commonly stocked, in
// mm, smallest first, as a fresh slice.
func DowelDiametersMM() []float64 { return slices.Clone(dowelDiametersMM) }

// DowelCut is the support rod for one coil.
type DowelCut struct {
	Material    string
	DiameterMM  float64
	LengthMM    float64
	ClearanceMM float64 // radial gap asked for
	InnerTurnMM float64 // inside diameter of the smallest relaxed turn
	Automatic   bool    // diameter chosen by ChooseSupportRod
	BoreMM      float64 // bore of a tube, 0 for a solid rod
	Rod         SupportRod
	// OverFeed is set when no stock rod's foot clears the feed at the
	// plate's centre (a small coil with a large feed hole): the kit has no
	// support rod. The cut list, batch plan, plate, side view and steps
	// leave it out and the coil is held from outside; the rod's sizes
	// above are those a rod for the coil alone would have, for reference.
	OverFeed       bool
	SlotWidthMM    float64 // slot across the foot for a centre feed's lead, else 0
	SlotDepthMM    float64
	Foot           *RodFoot // the bored foot over a centre feed; nil for a plain foot
	AbsorbsWater   bool     // wood: takes up water and detunes the coil
	MaterialAdvice string   // a sentence on the material choice
}

// smallestTurnRadius returns the smallest centreline radius of the coil:
// the radius is monotonic in azimuth, so it is at one of the two ends.
func smallestTurnRadius(c Coil) float64 { return math.Min(c.StartRadius, c.EndRadius) }

// NewDowelCut chooses the support rod of d: the stocked section that
// carries the coil, passes inside the smallest turn with the clearance
// asked for and whose foot clears the feed and mounting holes, its length,
// mount and (over a centre feed) bored foot, and a sentence on the
// material. It returns a spec error when no rod can clear a centre feed.
func NewDowelCut(d *Design) (DowelCut, error) {
	s := d.Spec
	wd := s.Wire.DiameterMM
	inner := 2*smallestTurnRadius(d.Coil) - wd
	dc := DowelCut{Material: s.Dowel.Material, ClearanceMM: s.Dowel.ClearanceMM, InnerTurnMM: inner}
	dc.LengthMM = d.Coil.Z0 + d.AxialLength + wd/2 + DowelOverhangMM
	given := 0.0
	if s.Dowel.DiameterMM != nil {
		given = *s.Dowel.DiameterMM // checkFit checked that it fits
	}
	// The rod's foot, with the least fillet, must also clear the feed and
	// mounting holes, and its screw's washer the parts on the back.
	plate := specPlateFeatures(s, d.Coil)
	room := inner - 2*dc.ClearanceMM
	if pr := rodPlateRoomMM(plate); pr >= dowelDiametersMM[0]-1e-9 || given > 0 {
		room = math.Min(room, pr)
	} else {
		dc.OverFeed = true
	}
	rod, err := ChooseSupportRod(s.Dowel.Material, room, dc.LengthMM, 2*smallestTurnRadius(d.Coil), given)
	if err != nil {
		return DowelCut{}, err
	}
	if w := 2 * roomAbout(plate, FaceThrough, FaceBack); washerODMM(rod.Mount.Screw) > w {
		rod.Mount = mountFor(rod, w)
	}
	dc.Rod, dc.DiameterMM, dc.BoreMM, dc.Automatic = rod, rod.OuterMM, rod.BoreMM, given == 0
	if err := fitCentreFeedRod(d, &dc, inner-2*dc.ClearanceMM); err != nil {
		return DowelCut{}, err
	}
	switch s.Dowel.Material {
	case "wood":
		dc.AbsorbsWater = true
		dc.MaterialAdvice = "wood takes up water, which raises its permittivity and loss and detunes the coil; use PTFE, nylon or glass-fibre rod, or seal the wood well"
	case "nylon":
		dc.MaterialAdvice = "nylon takes up a little water; PTFE or glass-fibre rod is steadier outdoors"
	default:
		dc.MaterialAdvice = "a low-loss rod that takes up little water"
	}
	return dc, nil
}
