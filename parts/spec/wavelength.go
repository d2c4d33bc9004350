package spec

// SpeedOfLight is c in m/s, exact by definition of the metre.
// Source: SI Brochure, 9th ed., BIPM 2019, §2.3.1.
const SpeedOfLight = 299792458.0

// FreeSpaceImpedance is η0 in ohms. Source: CODATA 2018.
const FreeSpaceImpedance = 376.730313668

// Wavelength returns the free-space wavelength in mm at fMHz megahertz.
func Wavelength(fMHz float64) float64 {
	return SpeedOfLight / (fMHz * 1e6) * 1e3
}
