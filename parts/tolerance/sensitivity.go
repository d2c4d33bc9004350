package tolerance

import (
	"cmp"
	"fmt"
	"math"
	"slices"

	"coilwright/parts"
	"coilwright/parts/report"
)

// sensitivities returns the inputs' effects by one-at-a-time central
// differences of ±1σ about the nominal design, scaled to the ± limit
// (3σ), ranked by their share of the linearised variance of the worst
// VSWR in the band, which decides whether a kit passes (the squared 1σ
// effect over the sum of them: the first-order variance of a sum of
// independent effects). Inputs with no spread are left out.
func sensitivities(d *parts.Design, ev Evaluator, band Band, ins []input, nominal report.ToleranceFigures) ([]report.ToleranceSensitivity, error) {
	var idx []int
	for i, in := range ins {
		if in.sigma > 0 {
			idx = append(idx, i)
		}
	}
	type pair struct{ up, down report.ToleranceFigures }
	res := make([]pair, len(idx))
	errs := make([]error, 2*len(idx))
	parallelFor(2*len(idx), func(j int) {
		i := idx[j/2]
		z := 1.0
		if j%2 == 1 {
			z = -1
		}
		vals := nominalValues(ins)
		vals[i] = ins[i].value(z)
		s, err := solveAt(d, ev, band, ins, vals)
		errs[j] = err
		if j%2 == 0 {
			res[j/2].up = s.fig
		} else {
			res[j/2].down = s.fig
		}
	})
	for j, err := range errs {
		if err != nil {
			return nil, fmt.Errorf("tolerance: sensitivity of %s: %w", ins[idx[j/2]].info.Name, err)
		}
	}
	out := make([]report.ToleranceSensitivity, len(idx))
	total, totalC := 0.0, 0.0
	for j, i := range idx {
		dc := (res[j].up.CentreMHz - res[j].down.CentreMHz) / 2
		de := (res[j].up.EdgeVSWR - res[j].down.EdgeVSWR) / 2
		dw := (res[j].up.WorstVSWR - res[j].down.WorstVSWR) / 2
		out[j] = report.ToleranceSensitivity{Name: ins[i].info.Name,
			CentreMHz: limitSigmas * dc, EdgeVSWR: limitSigmas * de, WorstVSWR: limitSigmas * dw, Share: dw * dw, CentreShare: dc * dc}
		total += dw * dw
		totalC += dc * dc
	}
	inside := nominal.MatchInside
	for j, i := range idx {
		if total > 0 {
			out[j].Share /= total
		}
		if totalC > 0 {
			out[j].CentreShare /= totalC
		}
		out[j].Words = words(ins[i].info, out[j], inside)
	}
	slices.SortStableFunc(out, func(a, b report.ToleranceSensitivity) int { return cmp.Compare(b.Share, a.Share) })
	return out, nil
}

// words says an input's effect for a builder: "turn 1 diameter: +0.20 mm
// moves the matched band 40 MHz down and the worst VSWR in the band by
// +0.15 (30 % of its spread)". The band's move is left out when the
// nominal design's best match lies at the edge of the swept range, where
// it cannot be read.
func words(in report.ToleranceInput, s report.ToleranceSensitivity, centreInside bool) string {
	amount := fmt.Sprintf("%+.2f mm", in.Limit)
	if in.Unit == "%" {
		amount = fmt.Sprintf("%+.0f %%", in.Limit)
	}
	move := ""
	if centreInside {
		dir := "up"
		if s.CentreMHz < 0 {
			dir = "down"
		}
		move = fmt.Sprintf(" moves the matched band %.0f MHz %s and", math.Abs(s.CentreMHz), dir)
	}
	return fmt.Sprintf("%s: %s%s changes the worst VSWR in the band by %+.2f (%.0f %% of its spread)",
		in.Name, amount, move, s.WorstVSWR, 100*s.Share)
}
