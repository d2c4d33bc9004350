package tolerance

import (
	"cmp"
	"fmt"
	"math"
	"slices"

	"coilwright/parts"
)

// sensitivityRuns holds the one-at-a-time solves behind the inputs'
// sensitivities: for each input with a spread (idx), the nominal design
// with that input moved +1σ and −1σ. Its jobs are run by the caller's
// pool, each writing only its own slot.
type sensitivityRuns struct {
	idx  []int
	res  []sensitivityPair
	errs []error
}

type sensitivityPair struct{ up, down parts.ToleranceFigures }

// newSensitivityRuns lists the inputs with a spread.
func newSensitivityRuns(ins []input) *sensitivityRuns {
	var idx []int
	for i, in := range ins {
		if in.sigma > 0 {
			idx = append(idx, i)
		}
	}
	return &sensitivityRuns{idx: idx, res: make([]sensitivityPair, len(idx)), errs: make([]error, 2*len(idx))}
}

// jobs returns the number of solves: two per input with a spread.
func (s *sensitivityRuns) jobs() int { return 2 * len(s.idx) }

// run solves job j: input idx[j/2] moved +1σ (j even) or −1σ (j odd).
func (s *sensitivityRuns) run(d *parts.Design, ev Evaluator, band Band, ins []input, j int) {
	i := s.idx[j/2]
	z := 1.0
	if j%2 == 1 {
		z = -1
	}
	vals := nominalValues(ins)
	vals[i] = ins[i].value(z)
	sol, err := solveAt(d, ev, band, ins, vals)
	s.errs[j] = err
	if j%2 == 0 {
		s.res[j/2].up = sol.fig
	} else {
		s.res[j/2].down = sol.fig
	}
}

// result returns the inputs' effects by one-at-a-time central
// differences of ±1σ about the nominal design, scaled to the ± limit
// (3σ), ranked by their share of the linearised variance of the worst
// VSWR in the band, which decides whether a kit passes (the squared 1σ
// effect over the sum of them: the first-order variance of a sum of
// independent effects). Inputs with no spread are left out. Every job
// must have run.
func (s *sensitivityRuns) result(ins []input, nominal parts.ToleranceFigures) ([]parts.ToleranceSensitivity, error) {
	idx, res, errs := s.idx, s.res, s.errs
	for j, err := range errs {
		if err != nil {
			return nil, fmt.Errorf("tolerance: sensitivity of %s: %w", ins[idx[j/2]].info.Name, err)
		}
	}
	out := make([]parts.ToleranceSensitivity, len(idx))
	total, totalC := 0.0, 0.0
	for j, i := range idx {
		dc := (res[j].up.CentreMHz - res[j].down.CentreMHz) / 2
		de := (res[j].up.EdgeVSWR - res[j].down.EdgeVSWR) / 2
		dw := (res[j].up.WorstVSWR - res[j].down.WorstVSWR) / 2
		out[j] = parts.ToleranceSensitivity{Name: ins[i].info.Name,
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
	slices.SortStableFunc(out, func(a, b parts.ToleranceSensitivity) int { return cmp.Compare(b.Share, a.Share) })
	return out, nil
}

// words says an input's effect for a builder: "turn 1 diameter: +0.20 mm
// moves the matched band 40 MHz down and the worst VSWR in the band by
// +0.15 (30 % of its spread)". The band's move is left out when the
// nominal design's best match lies at the edge of the swept range, where
// it cannot be read.
func words(in parts.ToleranceInput, s parts.ToleranceSensitivity, centreInside bool) string {
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
