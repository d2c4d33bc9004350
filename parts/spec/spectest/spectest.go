// Package spectest holds, for tests only, the small valid spec that the
// spec, design and kit tests edit one key of. It imports nothing, so the
// spec package's own tests can use it.
package spectest

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
