// Acceptance checks for builders without a network analyser: an SWR
// meter at the transmitter, and received signal strength against a
// reference antenna, each with the reading to expect from this design and
// what the other readings mean.

package sheet

import (
	"fmt"
	"math"

	"coilwright/parts"
	"coilwright/parts/line"
)

// DipoleGainDBi is a half-wave dipole's gain over isotropic.
// Source: Balanis, Antenna Theory, 3rd ed., §4.6 (D = 1.643, 2.15 dBi).
const DipoleGainDBi = 2.15

// LinearToCircularLossDB is the polarisation loss between a linearly
// polarised wave and a circularly polarised antenna, 3 dB.
// Source: Balanis, Antenna Theory, 3rd ed., §2.12.2 (polarisation loss
// factor 0.5).
const LinearToCircularLossDB = 3.0

// seenThroughFeeder returns the VSWR a meter reads at the transmitter end
// of a feeder of lossDB (one way) when the antenna's own return loss is
// rlDB: the reflection crosses the feeder twice, so the return loss seen
// is rlDB + 2·lossDB.
// Source: Pozar, Microwave Engineering, 4th ed., §2.7 (lossy line: Γ at
// the input is Γ_L·e^(−2αℓ)).
func seenThroughFeeder(rlDB, lossDB float64) float64 {
	return line.VSWR(math.Pow(10, -(rlDB+2*lossDB)/20))
}

// farFieldMM is the far-field (Fraunhofer) distance 2D²/λ for an antenna
// of largest dimension dMM at wavelength lambdaMM.
// Source: Balanis, Antenna Theory, 3rd ed., §2.2.4.
func farFieldMM(dMM, lambdaMM float64) float64 { return 2 * dMM * dMM / lambdaMM }

// acceptanceText returns the paragraphs of the no-analyser check.
func acceptanceText(d *parts.Design) []string {
	s := d.Spec
	loss := 0.0
	if s.RF.FeederLossDB > 0 {
		loss = s.RF.FeederLossDB
	}
	vswr := line.VSWR(math.Pow(10, -ReturnLossTargetDB/20))
	seen := seenThroughFeeder(ReturnLossTargetDB, loss)
	swr := fmt.Sprintf("SWR meter at the transmitter: put a through-line SWR meter rated for %s MHz between the transmitter and the antenna's cable, transmit at the lowest power that moves the meter, and read the SWR at the band's ends and centre. A good antenna reads below %.1f at the antenna", num(s.FrequencyMHz), vswr)
	if loss > 0 {
		swr += fmt.Sprintf("; through the %s dB feeder the meter reads lower, below %.2f, because the reflection crosses the feeder twice", num(loss), seen)
	}
	swr += ". Below 1.5: well matched. 1.5 to 2: usable. Above 2: look for a short at the feed, the strip touching the plate, a poor ground joint, or a coil tuned off the band. A reading that barely changes across the band, or a low reading that rises when the cable is shortened, means cable loss is hiding a mismatch."
	lambda := d.Wavelength
	size := math.Max(Heights(d).Overall, s.Reflector.SizeMM(lambda))
	far := math.Max(farFieldMM(size, lambda), 10*lambda)
	g, _ := d.QuotedGain()
	lin := g - DipoleGainDBi - LinearToCircularLossDB
	rss := fmt.Sprintf("Received signal against a reference antenna: set up a steady source in the band at least %.1f m away (the far-field distance 2D²/λ, and no less than ten wavelengths), in the open, antennas at the same height. Read its strength on a receiver with a signal-strength reading in dB, first with a half-wave dipole (%.2f dBi) parallel to the source's polarisation, then with this antenna pointed at the source. From a linearly polarised source, expect this antenna to read about %s the dipole (its %.1f dBic, less the dipole's %.2f dBi and the %.0f dB a circular antenna loses to a linear wave).",
		far/1000, DipoleGainDBi, dbAbove(lin), g, DipoleGainDBi, LinearToCircularLossDB)
	rss += fmt.Sprintf(" From a %s source, expect about %s the dipole; a source of the opposite hand reads far lower, typically 15 dB or more below the right hand (from memory), which checks the winding hand. Turning this antenna about its axis should change the reading from a linear source by no more than a few dB; a large change means the coil radiates poorly polarised. Reading several dB less than expected: check the hand, the turn sizes and the feed.", d.Coil.Hand, dbAbove(g-DipoleGainDBi))
	return []string{swr, rss}
}

// dbAbove writes a level difference as "N dB above" or "N dB below".
func dbAbove(v float64) string {
	if v < 0 {
		return fmt.Sprintf("%.0f dB below", -v)
	}
	return fmt.Sprintf("%.0f dB above", v)
}
