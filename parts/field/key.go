package field

import (
	"crypto/sha256"
	"encoding/binary"
	"hash"
	"math"

	"coilwright/parts"
)

// Key returns a digest of everything a sweep of st with opt depends on:
// the wires, ground and feed, the frequencies, the options and the design
// figures the summary compares against. Two structures with the same key
// give the same Result, so a caller may reuse one.
func (st *Structure) Key(opt Options) [32]byte {
	opt = opt.withDefaults()
	h := sha256.New()
	f := func(vs ...float64) {
		for _, v := range vs {
			writeFloat(h, v)
		}
	}
	d := st.design
	s := d.Spec
	f(float64(len(st.Model.Wires)), float64(st.Model.Ground), float64(st.Model.Feed.Wire), st.Model.Feed.At.X, st.Model.Feed.At.Y, st.Model.Feed.At.Z)
	f(real(st.Model.Feed.Voltage), imag(st.Model.Feed.Voltage))
	for _, w := range st.Model.Wires {
		f(float64(len(w.Points)), float64(len(w.Radius)), w.Conductivity)
		for _, p := range w.Points {
			f(p.X, p.Y, p.Z)
		}
		f(w.Radius...)
	}
	f(opt.Frequencies(s)...)
	f(s.FrequencyMHz, float64(d.Coil.Hand), float64(st.Reflector), b2f(opt.AxisOnly), st.PlateSpacing, st.MaxSegment)
	lo, hi := parts.BandMHz(s)
	e := d.Estimates
	f(lo, hi, e.Gain.Value, e.HPBW.Value, e.AxialRatio.Value, e.InputResistance.Value)
	var k [32]byte
	copy(k[:], h.Sum(nil))
	return k
}

func writeFloat(h hash.Hash, v float64) {
	var b [8]byte
	binary.LittleEndian.PutUint64(b[:], math.Float64bits(v))
	h.Write(b[:])
}

func b2f(b bool) float64 {
	if b {
		return 1
	}
	return 0
}
