package spec

// StockSpec is the [stock] table: the rod stock a batch is cut from and
// the cuts' losses. The build sheet prints on [cutting] paper, like the
// templates it carries.
type StockSpec struct {
	WireRodMM    float64 `toml:"wire_rod_mm"`    // straight wire rod length as bought, default 1000 mm
	DowelRodMM   float64 `toml:"dowel_rod_mm"`   // support rod length as bought, default 1000 mm
	WireKerfMM   float64 `toml:"wire_kerf_mm"`   // wire lost per cut, default 0.5 mm
	DowelKerfMM  float64 `toml:"dowel_kerf_mm"`  // saw kerf per dowel cut, default 1.5 mm
	EndTrimMM    float64 `toml:"end_trim_mm"`    // damaged end squared off each rod, default 5 mm
	SolderWireMM float64 `toml:"solder_wire_mm"` // solder wire diameter, default 0.8 mm
}

// Defaults of the [stock] table. Common practice (no published source):
// straight wire and plastic rod are commonly sold in 1 m lengths; a fine
// hand saw cuts a 1.5 mm kerf; wire cutters crush about half a millimetre
// that the trim allowance then squares off.
const (
	DefaultRodMM       = 1000.0
	DefaultWireKerfMM  = 0.5
	DefaultDowelKerfMM = 1.5
	DefaultEndTrimMM   = 5.0
	DefaultSolderMM    = 0.8
)

func (st *StockSpec) validate(c *checker, _ *Spec) {
	c.orDefault("stock.wire_rod_mm", &st.WireRodMM, DefaultRodMM)
	c.orDefault("stock.dowel_rod_mm", &st.DowelRodMM, DefaultRodMM)
	c.orDefault("stock.wire_kerf_mm", &st.WireKerfMM, DefaultWireKerfMM)
	c.orDefault("stock.dowel_kerf_mm", &st.DowelKerfMM, DefaultDowelKerfMM)
	c.orDefault("stock.end_trim_mm", &st.EndTrimMM, DefaultEndTrimMM)
	c.orDefault("stock.solder_wire_mm", &st.SolderWireMM, DefaultSolderMM)
	c.within("stock.wire_rod_mm", st.WireRodMM, 50, 100000, "mm") // up to a 100 m reel
	c.within("stock.dowel_rod_mm", st.DowelRodMM, 50, 10000, "mm")
	c.within("stock.wire_kerf_mm", st.WireKerfMM, 0, 10, "mm")
	c.within("stock.dowel_kerf_mm", st.DowelKerfMM, 0, 10, "mm")
	c.within("stock.end_trim_mm", st.EndTrimMM, 0, 100, "mm")
	c.within("stock.solder_wire_mm", st.SolderWireMM, 0.2, 3, "mm")
}
