package tolerance

import (
	"cmp"
	"fmt"
	"math"
	"slices"

	"coilwright/parts"
	"coilwright/parts/report"
)

// sensitivityRuns holds the one-at-a-time solves behind the inputs'
// sensitivities: for each input with a spread (idx), the nominal design
// with that input moved +1σ (even slots) and −1σ (odd slots). Its jobs
// are run by the caller's pool, each writing only its own slot.
type sensitivityRuns struct {
	idx []int
	res []sensitivitySide
}

// sensitivitySide is one ±1σ solve: its figures, or why it could not be
// built or solved.
type sensitivitySide struct {
	fig report.ToleranceFigures
	err error
}

// newSensitivityRuns lists the inputs with a spread.
func newSensitivityRuns(ins []input) *sensitivityRuns {
	var idx []int
	for i, in := range ins {
		if in.sigma > 0 {
			idx = append(idx, i)
		}
	}
	return &sensitivityRuns{idx: idx, res: make([]sensitivitySide, 2*len(idx))}
}

// jobs returns the number of solves: two per input with a spread.
func (s *sensitivityRuns) jobs() int { return len(s.res) }

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
	s.res[j] = sensitivitySide{fig: sol.fig, err: err}
}

// result returns the inputs' effects by one-at-a-time central
// differences of ±1σ about the nominal design, scaled to the ± limit
// (3σ), ranked by their share of the linearised variance of the worst
// VSWR in the band, which decides whether a kit passes (the squared 1σ
// effect over the sum of them: the first-order variance of a sum of
// independent effects). Inputs with no spread are left out. Where the kit
// one side of the nominal cannot be built or modelled, the difference is
// taken one-sided, from the nominal to the other side, and the input says
// so; where neither side can, the input carries no effect and says why.
// Every job must have run.
func (s *sensitivityRuns) result(ins []input, nominal report.ToleranceFigures) []report.ToleranceSensitivity {
	idx, res := s.idx, s.res
	out := make([]report.ToleranceSensitivity, len(idx))
	total, totalC := 0.0, 0.0
	for j, i := range idx {
		up, down := res[2*j], res[2*j+1]
		out[j].Name = ins[i].info.Name
		var hi, lo report.ToleranceFigures
		switch {
		case up.err == nil && down.err == nil:
			hi, lo = up.fig, down.fig
		case up.err == nil:
			hi, lo = up.fig, nominal
			out[j].Step = "one-sided (nominal to +1σ): the −1σ kit cannot be solved: " + modelProblem(down.err)
		case down.err == nil:
			hi, lo = nominal, down.fig
			out[j].Step = "one-sided (−1σ to nominal): the +1σ kit cannot be solved: " + modelProblem(up.err)
		default:
			out[j].Unmodelled = modelProblem(up.err)
			continue
		}
		// A central difference spans 2σ, a one-sided one σ.
		span := 2.0
		if out[j].Step != "" {
			span = 1
		}
		dc := (hi.CentreMHz - lo.CentreMHz) / span
		de := (hi.EdgeVSWR - lo.EdgeVSWR) / span
		dw := (hi.WorstVSWR - lo.WorstVSWR) / span
		out[j].CentreMHz, out[j].EdgeVSWR, out[j].WorstVSWR = limitSigmas*dc, limitSigmas*de, limitSigmas*dw
		out[j].Share, out[j].CentreShare = dw*dw, dc*dc
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
	return out
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
	if s.Unmodelled != "" {
		return fmt.Sprintf("%s: not found: neither the −1σ nor the +1σ kit can be solved (%s)", in.Name, s.Unmodelled)
	}
	w := fmt.Sprintf("%s: %s%s changes the worst VSWR in the band by %+.2f (%.0f %% of its spread)",
		in.Name, amount, move, s.WorstVSWR, 100*s.Share)
	if s.Step != "" {
		w += "; " + s.Step
	}
	return w
}
