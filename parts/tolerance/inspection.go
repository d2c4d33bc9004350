package tolerance

import (
	"fmt"
	"math"
	"slices"
	"strconv"

	"coilwright/parts"
	"coilwright/parts/report"
)

// Inspection band search. The band on turn i is k·w_i mm, with weights w_i
// inversely proportional to the turn's effect on the worst VSWR in the
// band (normalised to an RMS of 1) so every turn's band moves it alike, held within a factor weightSpan of each other so an insensitive
// turn does not get an unusable band; k steps by bandStepMM. A band must
// accept at least minAcceptedShare of the simulated kits (and minAccepted
// kits) for its pass share to count. Common practice (no published
// source) for the factor and the minimum.
const (
	bandStepMM       = 0.005
	weightSpan       = 3.0
	minAcceptedShare = 0.05
	minAccepted      = 10
	// bandRoundMM is what the band is rounded down to: the build sheet
	// prints hundredths.
	bandRoundMM = 0.01
)

// inspection derives the ± band on each turn's released diameter within
// which the share of accepted simulated kits meeting the target is at
// least share: the widest such band, or the band with the best share when
// none reaches it.
func inspection(d *parts.Design, kits []report.ToleranceKit, sens []report.ToleranceSensitivity, share float64) report.ToleranceInspection {
	n := len(d.Turns)
	w := bandWeights(n, sens)
	out := report.ToleranceInspection{Share: share, ToleranceMM: make([]float64, n)}
	kMax := 0.0
	for _, k := range kits {
		if !k.Solved() {
			continue
		}
		for i, t := range d.Turns {
			kMax = math.Max(kMax, math.Abs(k.DiametersMM[i]-t.DiameterMM)/w[i])
		}
	}
	need := max(minAccepted, int(math.Ceil(minAcceptedShare*float64(len(kits)))))
	best, bestShare, bestAcc := 0.0, -1.0, 0.0
	found := false
	for k := bandStepMM; ; k += bandStepMM {
		k = math.Min(k, kMax)
		acc, met := 0, 0
		for _, kit := range kits {
			if !accepted(d, kit, w, k) {
				continue
			}
			acc++
			if kit.Meets {
				met++
			}
		}
		if acc >= need {
			s := float64(met) / float64(acc)
			if s >= share {
				best, bestShare, bestAcc, found = k, s, float64(acc)/float64(len(kits)), true
			} else if !found && s > bestShare {
				best, bestShare, bestAcc = k, s, float64(acc)/float64(len(kits))
			}
		}
		if k >= kMax {
			break
		}
	}
	out.Reached, out.Achieved, out.Accepted = found, math.Max(bestShare, 0), bestAcc
	for i := range out.ToleranceMM {
		out.ToleranceMM[i] = math.Max(bandRoundMM, math.Floor(best*w[i]/bandRoundMM)*bandRoundMM)
	}
	out.Note = inspectionNote(out, d)
	return out
}

// accepted reports whether every turn of kit lies within k·w_i of its
// target diameter. A kit that could not be built or solved is never
// accepted.
func accepted(d *parts.Design, kit report.ToleranceKit, w []float64, k float64) bool {
	if !kit.Solved() {
		return false
	}
	for i, t := range d.Turns {
		if math.Abs(kit.DiametersMM[i]-t.DiameterMM) > k*w[i] {
			return false
		}
	}
	return true
}

// bandWeights returns each turn's band weight from the turn-diameter
// effects on the worst VSWR: inverse to the effect, RMS-normalised, held within
// weightSpan of the smallest. Turns without a sensitivity weigh 1.
func bandWeights(n int, sens []report.ToleranceSensitivity) []float64 {
	g := make([]float64, n)
	for _, s := range sens {
		var t int
		if _, err := fmt.Sscanf(s.Name, "turn %d diameter", &t); err == nil && t >= 1 && t <= n {
			g[t-1] = math.Abs(s.WorstVSWR)
		}
	}
	w := make([]float64, n)
	ss, cnt := 0.0, 0
	for i, v := range g {
		if v > 0 {
			w[i] = 1 / v
			ss += w[i] * w[i]
			cnt++
		}
	}
	if cnt == 0 {
		for i := range w {
			w[i] = 1
		}
		return w
	}
	rms := math.Sqrt(ss / float64(cnt))
	lo := math.Inf(1)
	for i := range w {
		if w[i] > 0 {
			w[i] /= rms
			lo = math.Min(lo, w[i])
		}
	}
	for i := range w {
		if w[i] == 0 || w[i] > weightSpan*lo {
			w[i] = weightSpan * lo
		}
	}
	return w
}

// inspectionNote explains the derived tolerances for the build sheet.
func inspectionNote(in report.ToleranceInspection, d *parts.Design) string {
	if !in.Reached {
		return fmt.Sprintf("No diameter band makes %.0f %% of the inspected kits meet the VSWR target (the best reaches %.0f %%): the nominal design or the other spreads (strip, height, spacing) limit the batch, so the turns keep the fixed tolerance.",
			100*in.Share, 100*in.Achieved)
	}
	note := fmt.Sprintf("The tolerances come from the batch tolerance analysis: of the simulated kits whose turns all lie within them, %.0f %% meet the VSWR target across the band (at least %.0f %% asked).",
		100*in.Achieved, 100*in.Share)
	if slices.Min(in.ToleranceMM) < parts.InspectionFloorMM {
		note += fmt.Sprintf(" Some bands are finer than the ±%s mm calipers read on a springy coil: measuring diameters cannot sort these kits; hold the spreads that matter most (see the ranking) instead.",
			strconv.FormatFloat(parts.InspectionFloorMM, 'f', -1, 64))
	}
	return note
}
