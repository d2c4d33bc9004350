package spec

// RFSpec is the [rf] table: the transmitter feeding the antenna, used only
// for the EIRP figure in the report.
type RFSpec struct {
	TxPowerDBm   *float64 `toml:"tx_power_dbm"`   // transmitter output, −30 to 60 dBm
	FeederLossDB float64  `toml:"feeder_loss_db"` // cable and connector loss, 0–20 dB
}

func (r *RFSpec) validate(c *checker, _ *Spec) {
	if r.TxPowerDBm != nil {
		c.within("rf.tx_power_dbm", *r.TxPowerDBm, -30, 60, "dBm")
	}
	c.within("rf.feeder_loss_db", r.FeederLossDB, 0, 20, "dB")
}
