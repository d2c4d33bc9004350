// Cutting stock: pieces of given lengths cut from rods of one length.
//
// Every piece takes its length plus one kerf from its rod, and each rod
// loses its end trim (the damaged end squared off) before the first cut,
// so a rod's usable length is its length less the trim. Pieces are sorted
// longest first and each goes into the first rod with room (first-fit
// decreasing). When that uses more rods than the lower bound
// ceil(Σ(piece + kerf) / usable) and there are few pieces, an exact
// branch-and-bound search over the same decreasing order looks for a plan
// with fewer rods; it skips rods with equal room and, for equal pieces,
// rods before the one the previous equal piece went into, and gives up
// after a fixed number of nodes.

package cut

import (
	"errors"
	"fmt"
	"math"
	"sort"
)

// Piece is one length to cut, in mm, with the label of the part it makes.
type Piece struct {
	Label  string
	Length float64
}

// Rod is the stock the pieces are cut from, in mm: Length as bought, Kerf
// lost per cut, EndTrim squared off once per rod. Length − EndTrim must be
// positive.
type Rod struct {
	Length  float64
	Kerf    float64
	EndTrim float64
}

// Usable returns the rod length left after the end trim, mm.
func (r Rod) Usable() float64 { return r.Length - r.EndTrim }

// RodCuts is one rod's cutting pattern: the pieces from the trimmed end,
// and the offcut left over (mm).
type RodCuts struct {
	Pieces []Piece
	Offcut float64
}

// StockPlan is a cutting plan for one stock: the rods in order, each with
// its pieces, and the totals. Lengths are mm.
type StockPlan struct {
	Rod        Rod
	Rods       []RodCuts
	Pieces     int     // pieces cut
	Demand     float64 // sum of the piece lengths
	KerfLoss   float64 // one kerf per piece
	TrimLoss   float64 // one end trim per rod
	Bought     float64 // rods × rod length
	Waste      float64 // Bought − Demand
	LowerBound int     // ceil((Demand + KerfLoss) / usable length)
	Optimal    bool    // the rod count is proved least
}

// WastePercent returns the share of the bought length not made into
// pieces, in percent (0 when nothing is bought).
func (p StockPlan) WastePercent() float64 {
	if p.Bought == 0 {
		return 0
	}
	return 100 * p.Waste / p.Bought
}

// ErrPieceTooLong is returned when a piece and its kerf exceed a rod's
// usable length.
var ErrPieceTooLong = errors.New("piece longer than the rod")

// exactLimit is the most pieces the exact search is tried on, and
// nodeLimit the most search nodes it visits.
const (
	exactLimit = 24
	nodeLimit  = 200000
)

// fitTol absorbs rounding when a piece exactly fills a rod, mm.
const fitTol = 1e-9

// PlanStock cuts pieces from rods of one kind. It returns an error for a
// bad rod, a non-positive piece, or a piece that does not fit a rod; the
// pieces slice is not modified.
func PlanStock(pieces []Piece, rod Rod) (StockPlan, error) {
	usable := rod.Usable()
	if !(rod.Length > 0) || !(usable > 0) || rod.Kerf < 0 || rod.EndTrim < 0 {
		return StockPlan{}, fmt.Errorf("rod %g mm with %g mm end trim and %g mm kerf has no usable length", rod.Length, rod.EndTrim, rod.Kerf)
	}
	order := make([]Piece, len(pieces))
	copy(order, pieces)
	sort.SliceStable(order, func(i, j int) bool { return order[i].Length > order[j].Length })
	plan := StockPlan{Rod: rod, Pieces: len(order)}
	for _, p := range order {
		if !(p.Length > 0) {
			return StockPlan{}, fmt.Errorf("piece %q is %g mm long", p.Label, p.Length)
		}
		if p.Length+rod.Kerf > usable+fitTol {
			return StockPlan{}, fmt.Errorf("%q, %.1f mm plus %.1f mm kerf, is longer than the rod's usable %.1f mm: %w", p.Label, p.Length, rod.Kerf, usable, ErrPieceTooLong)
		}
		plan.Demand += p.Length
		plan.KerfLoss += rod.Kerf
	}
	plan.LowerBound = int(math.Ceil((plan.Demand+plan.KerfLoss)/usable - fitTol))
	take := func(p Piece) float64 { return p.Length + rod.Kerf }

	assign := firstFit(order, usable, take)
	bins := maxBin(assign) + 1
	plan.Optimal = bins <= plan.LowerBound
	if !plan.Optimal && len(order) <= exactLimit {
		if better, proved := exactPack(order, usable, take, bins); better != nil {
			assign = better
			bins = maxBin(assign) + 1
			plan.Optimal = proved
		} else {
			plan.Optimal = proved
		}
	}

	plan.Rods = make([]RodCuts, bins)
	for i, b := range assign {
		plan.Rods[b].Pieces = append(plan.Rods[b].Pieces, order[i])
	}
	for i := range plan.Rods {
		used := 0.0
		for _, p := range plan.Rods[i].Pieces {
			used += take(p)
		}
		plan.Rods[i].Offcut = math.Max(usable-used, 0)
	}
	plan.TrimLoss = float64(bins) * rod.EndTrim
	plan.Bought = float64(bins) * rod.Length
	plan.Waste = plan.Bought - plan.Demand
	return plan, nil
}

func maxBin(assign []int) int {
	m := -1
	for _, b := range assign {
		m = max(m, b)
	}
	return m
}

// firstFit puts each piece, in the given order, into the first rod with
// room and returns each piece's rod index.
func firstFit(order []Piece, usable float64, take func(Piece) float64) []int {
	assign := make([]int, len(order))
	var room []float64
	for i, p := range order {
		t := take(p)
		b := 0
		for b < len(room) && room[b]+fitTol < t {
			b++
		}
		if b == len(room) {
			room = append(room, usable)
		}
		room[b] -= t
		assign[i] = b
	}
	return assign
}

// exactPack searches for an assignment into fewer than bins rods. It
// returns the best assignment found (nil when none beats bins) and whether
// the search finished, which proves the result least.
func exactPack(order []Piece, usable float64, take func(Piece) float64, bins int) ([]int, bool) {
	n := len(order)
	best := bins
	var bestAssign []int
	assign := make([]int, n)
	room := make([]float64, 0, n)
	nodes := 0
	// remaining[i] is the total take of pieces i..n-1.
	remaining := make([]float64, n+1)
	for i := n - 1; i >= 0; i-- {
		remaining[i] = remaining[i+1] + take(order[i])
	}
	var search func(i int) bool
	search = func(i int) bool {
		nodes++
		if nodes > nodeLimit {
			return false
		}
		if i == n {
			if len(room) < best {
				best = len(room)
				bestAssign = append(bestAssign[:0], assign...)
			}
			return true
		}
		free := 0.0
		for _, r := range room {
			free += r
		}
		extra := int(math.Ceil((remaining[i]-free)/usable - fitTol))
		if len(room)+max(extra, 0) >= best {
			return true
		}
		t := take(order[i])
		first := 0
		if i > 0 && order[i-1].Length == order[i].Length {
			first = assign[i-1]
		}
		tried := map[float64]bool{}
		for b := first; b < len(room); b++ {
			if room[b]+fitTol < t || tried[room[b]] {
				continue
			}
			tried[room[b]] = true
			room[b] -= t
			assign[i] = b
			ok := search(i + 1)
			room[b] += t
			if !ok {
				return false
			}
		}
		if len(room)+1 < best {
			room = append(room, usable-t)
			assign[i] = len(room) - 1
			ok := search(i + 1)
			room = room[:len(room)-1]
			if !ok {
				return false
			}
		}
		return true
	}
	finished := search(0)
	return bestAssign, finished
}
