package jig

import (
	"math"
	"strconv"

	"coilwright/parts"
)

// FormerFromDesign builds the former for a design from its [former] table,
// its groove carrying the design's former path: the coil compensated for
// springback.
func FormerFromDesign(d *parts.Design) (*Former, error) {
	s := d.Spec
	f := &s.Former
	deg := math.Pi / 180
	p := FormerParams{
		Hand:            int(d.Former.Hand),
		Wire:            s.Wire.DiameterMM,
		Clearance:       f.ClearanceMM,
		GrooveDepth:     f.GrooveDepthRatio * s.Wire.DiameterMM,
		RoundGroove:     f.GrooveProfile == "round",
		LeadIn:          f.LeadInDeg * deg,
		RunOut:          f.RunOutDeg * deg,
		LockDepth:       f.LockHoleDepthMM,
		NotchWidth:      f.StopNotchMM,
		FlangeMargin:    f.FlangeMarginMM,
		FlangeThickness: f.FlangeThicknessMM,
		FlatDepth:       f.FlatDepthMM,
		Chamfer:         f.ChamferMM,
		Fillet:          f.FilletMM,
		HexAcrossFlats:  f.HexAcrossFlatsMM,
		HexDepth:        f.HexDepthMM,
		BoreDiameter:    f.BoreDiameterMM,
		EngraveDepth:    f.EngraveDepthMM,
		TextHeight:      f.TextHeightMM,
		EndMargin:       f.EndMarginMM,
		MinWall:         parts.MinFormerWallMM,
		Labels:          [2]string{d.Former.Hand.String(), FrequencyLabel(s.FrequencyMHz)},
	}
	if f.Drive == "bore" {
		p.Drive = ThroughBore
	}
	return NewFormer(d.Former, p)
}

// FrequencyLabel returns the frequency as engraved, to three significant
// figures: "5.8 GHz" from 1000 MHz up, "434 MHz" below.
func FrequencyLabel(mhz float64) string {
	unit := " MHz"
	if mhz >= 1000 {
		mhz, unit = mhz/1000, " GHz"
	}
	v, _ := strconv.ParseFloat(strconv.FormatFloat(mhz, 'g', 3, 64), 64)
	return strconv.FormatFloat(v, 'f', -1, 64) + unit
}
