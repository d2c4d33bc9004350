// Package spectest holds, for tests only, the small valid spec that the
// spec, design and kit tests edit one key of. It imports nothing of the project, so the
// spec package's own tests can use it.
package spectest

import "fmt"

// Base is a valid 5.8 GHz conical spec, every other key left to its
// default. Tests change one key of it with strings.Replace; the line
// numbers their cases expect count from its first line, so keep its lines
// where they are.
const Base = `kit = "Test Kit"
frequency_mhz = 5800.0
quantity = 2

[coil]
shape = "conical"
turns = 5.0
hand = "RHCP"
base_diameter_mm = 17.5
top_diameter_mm = 12.5
pitch_angle_deg = 13.0

[wire]
material = "copper-annealed"
diameter_mm = 1.6
`

// SpecText returns a complete spec at freqMHz with the given [coil] and
// [wire] table bodies; the rest is an invented bench kit.
func SpecText(freqMHz float64, coil, wire string) string {
	return fmt.Sprintf(`kit = "Test Bench Kit"
frequency_mhz = %g

[coil]
%s

[wire]
%s

[reflector]
shape = "disc"
diameter_mm = 120.0
thickness_mm = 1.6

[dowel]
material = "ptfe"

[coax]
type = "semi-rigid-141"
length_mm = 100.0
`, freqMHz, coil, wire)
}

// Coil bodies at 5.8 GHz for SpecText: a one-wavelength cylinder, and a
// cone given by its diameters and pitch angle.
const (
	Cylinder5800 = `shape = "cylindrical"
turns = 6.0
base_circumference_lambda = 1.0
pitch_angle_deg = 12.5`
	ConeSpacing5800 = `shape = "conical"
turns = 5.0
base_diameter_mm = 17.5
top_diameter_mm = 12.5
pitch_angle_deg = 13.0`
)
