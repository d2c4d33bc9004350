package report

// ToleranceReport is the outcome of a batch tolerance analysis: the
// spreads simulated, the distribution of each antenna figure over the
// batch, the share of kits meeting the targets, the inputs ranked by how
// much they move the matched band, and the inspection tolerance per turn
// the analysis derives. Frequencies are MHz, lengths mm. It is a plain
// value; parts/tolerance fills it.
type ToleranceReport struct {
	Samples     int     `json:"samples"`
	Seed        uint64  `json:"seed"`
	VSWRTarget  float64 `json:"vswr_target"`
	BandLowMHz  float64 `json:"band_low_mhz"`
	BandHighMHz float64 `json:"band_high_mhz"`
	// Share is the fraction of simulated kits whose VSWR stays at or below
	// VSWRTarget across the whole band.
	Share float64 `json:"share_meeting_target"`
	// Unbuildable counts kits whose sampled wire takes no set on the
	// former; they count as not meeting the target.
	Unbuildable int `json:"unbuildable"`
	// Unmodelled counts kits the field model cannot represent (a sampled
	// geometry outside the thin-wire kernel's limits, such as a feed pin
	// too short to segment); they are left out of Share.
	// UnmodelledProblem is the first such kit's problem.
	Unmodelled        int    `json:"unmodelled,omitempty"`
	UnmodelledProblem string `json:"unmodelled_problem,omitempty"`
	// Nominal is the loop model's figures for the nominal design.
	Nominal ToleranceFigures `json:"nominal"`
	// Figures lists each antenna figure's distribution over the batch.
	Figures []ToleranceDistribution `json:"figures"`
	// Inputs lists the spreads simulated, with their sources.
	Inputs []ToleranceInput `json:"inputs"`
	// Sensitivities ranks the inputs by their share of the variance of the
	// worst VSWR in the band, largest first.
	Sensitivities []ToleranceSensitivity `json:"sensitivities"`
	// Inspection is the derived ± tolerance per turn.
	Inspection ToleranceInspection `json:"inspection"`
	// Model states the faster model used inside the loop and what it gives
	// up against the full model on the nominal design.
	Model ToleranceModel `json:"model"`
	// Kits holds every simulated kit, in sample order (tolerance.csv).
	Kits []ToleranceKit `json:"-"`
}

// ToleranceFigures are one kit's antenna figures from the loop model.
type ToleranceFigures struct {
	// CentreMHz is the frequency of best match (lowest VSWR).
	CentreMHz float64 `json:"centre_mhz"`
	// MatchInside reports whether the best match lies inside the swept
	// range; on its edge, CentreMHz is only a bound.
	MatchInside bool `json:"match_inside_sweep"`
	// MinVSWR is the VSWR there.
	MinVSWR float64 `json:"min_vswr"`
	// EdgeVSWR is the larger VSWR of the two band edges.
	EdgeVSWR float64 `json:"edge_vswr"`
	// WorstVSWR is the largest VSWR across the band.
	WorstVSWR float64 `json:"worst_vswr"`
	// GainDBic is the co-polar realised gain on axis at the spec's centre
	// frequency.
	GainDBic float64 `json:"gain_dbic"`
	// AxialRatioDB is the on-axis axial ratio at the centre frequency.
	AxialRatioDB float64 `json:"axial_ratio_db"`
}

// ToleranceDistribution summarises one figure over the buildable kits.
type ToleranceDistribution struct {
	Name string `json:"name"`
	Unit string `json:"unit"`
	// Nominal is the nominal design's value.
	Nominal float64 `json:"nominal"`
	Mean    float64 `json:"mean"`
	SD      float64 `json:"sd"`
	P5      float64 `json:"p5"`
	P50     float64 `json:"p50"`
	P95     float64 `json:"p95"`
	Min     float64 `json:"min"`
	Max     float64 `json:"max"`
	// Values are the kits' values in sample order (buildable kits only),
	// for histograms.
	Values []float64 `json:"-"`
}

// ToleranceInput is one spread the analysis samples.
type ToleranceInput struct {
	Name string `json:"name"` // in builder words, e.g. "turn 1 diameter"
	Key  string `json:"key"`  // the spec key that sets it
	// Limit is the ± limit (3σ) in Unit; for the yield it is 3 × the
	// coefficient of variation, in per cent.
	Limit  float64 `json:"limit"`
	Unit   string  `json:"unit"`
	Source string  `json:"source"`
}

// ToleranceSensitivity is one input's effect, by one-at-a-time finite
// differences of ±1σ about the nominal design.
type ToleranceSensitivity struct {
	Name string `json:"name"`
	// CentreMHz is the move of the matched-band centre for a +3σ change
	// (the input's ± limit); negative when it tunes down.
	CentreMHz float64 `json:"centre_shift_mhz"`
	// EdgeVSWR and WorstVSWR are the changes of the band-edge VSWR and
	// of the worst VSWR in the band for a +3σ change.
	EdgeVSWR  float64 `json:"edge_vswr_change"`
	WorstVSWR float64 `json:"worst_vswr_change"`
	// Share is the input's share of the linearised variance of the worst
	// VSWR in the band (what decides a kit's pass), 0–1; the ranking.
	Share float64 `json:"variance_share"`
	// CentreShare is its share of the linearised variance of the
	// matched-band centre, 0–1.
	CentreShare float64 `json:"centre_variance_share"`
	// Step is empty for a central difference; otherwise it says which
	// one-sided difference was taken and why.
	Step string `json:"step,omitempty"`
	// Unmodelled says why neither side could be solved (the effects are
	// then zero and not known).
	Unmodelled string `json:"unmodelled,omitempty"`
	// Words says it for a builder.
	Words string `json:"words"`
}

// ToleranceInspection is the inspection tolerance the analysis derives:
// the diameter band per turn within which Share of the simulated kits that
// pass inspection meet the VSWR target.
type ToleranceInspection struct {
	// Share is the share of inspected kits that must meet the target.
	Share float64 `json:"share"`
	// Reached reports whether some band reaches Share; when false the
	// table gives the band with the best share, Achieved.
	Reached  bool    `json:"reached"`
	Achieved float64 `json:"achieved_share"`
	// Accepted is the fraction of simulated kits the band accepts.
	Accepted float64 `json:"accepted_share"`
	// ToleranceMM is the ± band on each turn's relaxed centreline
	// diameter, mm, from the feed end.
	ToleranceMM []float64 `json:"tolerance_mm"`
	// Note explains the table for the build sheet.
	Note string `json:"note"`
}

// ToleranceModel describes the loop model and its accuracy against the
// full model on the nominal design.
type ToleranceModel struct {
	Description string `json:"description"`
	Points      int    `json:"points"`
	// FullCentreMHz, FullEdgeVSWR and FullGainDBic are the full model's
	// figures for the nominal design; zero when it did not run.
	FullCentreMHz float64 `json:"full_centre_mhz,omitempty"`
	FullEdgeVSWR  float64 `json:"full_edge_vswr,omitempty"`
	FullGainDBic  float64 `json:"full_gain_dbic,omitempty"`
	// CentreErrorMHz, EdgeVSWRError and GainErrorDB are loop model minus
	// full model on the nominal design.
	CentreErrorMHz float64 `json:"centre_error_mhz"`
	EdgeVSWRError  float64 `json:"edge_vswr_error"`
	GainErrorDB    float64 `json:"gain_error_db"`
	// The Corrected errors are the same after the loop model is
	// corrected to the full model: interpolation only.
	CorrectedCentreErrorMHz float64 `json:"corrected_centre_error_mhz"`
	CorrectedEdgeVSWRError  float64 `json:"corrected_edge_vswr_error"`
	CorrectedGainErrorDB    float64 `json:"corrected_gain_error_db"`
}

// ToleranceKit is one simulated kit: its sampled inputs (in the order of
// ToleranceReport.Inputs, in their units: mm deviations, the yield as a
// factor), the released turn diameters and its figures.
type ToleranceKit struct {
	Index       int
	Inputs      []float64
	DiametersMM []float64 // released centreline diameter per turn
	Figures     ToleranceFigures
	Buildable   bool
	// Unmodelled says why the field model could not solve the built kit
	// ("" when it did).
	Unmodelled string
	Meets      bool
}

// Solved reports whether the kit was built and solved, so that its
// Figures hold.
func (k ToleranceKit) Solved() bool { return k.Buildable && k.Unmodelled == "" }
