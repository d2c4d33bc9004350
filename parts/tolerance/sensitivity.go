package tolerance

import (
	"cmp"
	"fmt"
	"math"
	"slices"

	"coilwright/parts"
)

// sensitivities returns the inputs' effects by one-at-a-time central
// differences of ±1σ about the nominal design, scaled to the ± limit
// (3σ), ranked by their share of the linearised variance of the
// matched-band centre (the squared 1σ effect over the sum of them: the
// first-order variance of a sum of independent effects). Inputs with no
// spread are left out.
func sensitivities(d *parts.Design, ev Evaluator, band Band, ins []input, nominal parts.ToleranceFigures) ([]parts.ToleranceSensitivity, error) {
	var idx []int
	for i, in := range ins {
		if in.sigma > 0 {
			idx = append(idx, i)
		}
	}
	type pair struct{ up, down parts.ToleranceFigures }
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
	out := make([]parts.ToleranceSensitivity, len(idx))
	total := 0.0
	for j, i := range idx {
		dc := (res[j].up.CentreMHz - res[j].down.CentreMHz) / 2
		de := (res[j].up.EdgeVSWR - res[j].down.EdgeVSWR) / 2
		out[j] = parts.ToleranceSensitivity{Name: ins[i].info.Name,
			CentreMHz: limitSigmas * dc, EdgeVSWR: limitSigmas * de, Share: dc * dc}
		total += dc * dc
	}
	for j, i := range idx {
		if total > 0 {
			out[j].Share /= total
		}
		out[j].Words = words(ins[i].info, out[j])
	}
	slices.SortStableFunc(out, func(a, b parts.ToleranceSensitivity) int { return cmp.Compare(b.Share, a.Share) })
	return out, nil
}

// words says an input's effect for a builder: "turn 1 diameter: +0.20 mm
// moves the matched band 40 MHz down; band-edge VSWR +0.15".
func words(in parts.ToleranceInput, s parts.ToleranceSensitivity) string {
	dir := "up"
	if s.CentreMHz < 0 {
		dir = "down"
	}
	amount := fmt.Sprintf("+%.2f mm", in.Limit)
	if in.Unit == "%" {
		amount = fmt.Sprintf("+%.0f %%", in.Limit)
	}
	return fmt.Sprintf("%s: %s moves the matched band %.0f MHz %s; band-edge VSWR %+.2f (%.0f %% of the spread of the band centre)",
		in.Name, amount, math.Abs(s.CentreMHz), dir, s.EdgeVSWR, 100*s.Share)
}
