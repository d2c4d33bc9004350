package touchstone

import (
	"bufio"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
)

// Point is S11 at one frequency.
type Point struct {
	// FrequencyHz is the frequency in hertz.
	FrequencyHz float64
	// S11 is the reflection coefficient against the reference impedance.
	S11 complex128
}

// Options tunes WriteS1P. The zero value writes MHz, real–imaginary pairs
// and a 50 Ω reference.
type Options struct {
	// ReferenceOhm is the reference impedance; zero means 50 Ω.
	ReferenceOhm float64
	// Comments are written first, one "!" line each (no line breaks).
	Comments []string
}

// FormatError reports data WriteS1P refuses.
type FormatError struct{ Problem string }

// Error describes the problem.
func (e *FormatError) Error() string { return "touchstone: " + e.Problem }

// WriteS1P writes pts as a one-port Touchstone file: frequencies in MHz,
// S11 as real and imaginary parts ("# MHz S RI R 50"). Frequencies must be
// positive, finite and strictly increasing; S11 finite.
func WriteS1P(w io.Writer, pts []Point, opt Options) error {
	z0 := opt.ReferenceOhm
	if z0 == 0 {
		z0 = 50
	}
	if !(z0 > 0) || math.IsInf(z0, 0) {
		return &FormatError{Problem: fmt.Sprintf("reference impedance %g Ω must be positive and finite", z0)}
	}
	prev := 0.0
	for i, p := range pts {
		if !(p.FrequencyHz > prev) || math.IsInf(p.FrequencyHz, 0) {
			return &FormatError{Problem: fmt.Sprintf("point %d: frequency %g Hz must be positive, finite and above the previous one", i, p.FrequencyHz)}
		}
		if math.IsNaN(real(p.S11)) || math.IsNaN(imag(p.S11)) || math.IsInf(real(p.S11), 0) || math.IsInf(imag(p.S11), 0) {
			return &FormatError{Problem: fmt.Sprintf("point %d: S11 is not finite", i)}
		}
		prev = p.FrequencyHz
	}
	bw := bufio.NewWriter(w)
	for _, c := range opt.Comments {
		if strings.ContainsAny(c, "\r\n") {
			return &FormatError{Problem: "a comment holds a line break"}
		}
		fmt.Fprintf(bw, "! %s\n", c)
	}
	fmt.Fprintf(bw, "# MHz S RI R %s\n", strconv.FormatFloat(z0, 'g', -1, 64))
	for _, p := range pts {
		fmt.Fprintf(bw, "%s %s %s\n", strconv.FormatFloat(p.FrequencyHz/1e6, 'f', 6, 64),
			strconv.FormatFloat(real(p.S11), 'f', 9, 64), strconv.FormatFloat(imag(p.S11), 'f', 9, 64))
	}
	return bw.Flush()
}
