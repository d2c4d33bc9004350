package plot

import (
	"bytes"
	"errors"
	"math"
	"slices"
	"testing"
)

func TestWritePolarPattern(t *testing.T) {
	var buf bytes.Buffer
	p := samplePolar()
	if err := WritePolarPattern(&buf, p, PolarOptions{}); err != nil {
		t.Fatal(err)
	}
	golden(t, "polar.svg", buf.Bytes())
	doc := parseSVG(t, buf.Bytes())
	rings := doc.all("ring")
	if len(rings) != 3 {
		t.Fatalf("%d rings, want 3 (0, −10, −20 dB; −30 dB is the centre)", len(rings))
	}
	outer := rings[0]
	cx, cy, r := outer.num(t, "cx"), outer.num(t, "cy"), outer.num(t, "r")
	// Rings sit at (level − floor)/range of the outer radius, the floor
	// being 30 dB below the top.
	for i, want := range []float64{0, -10, -20} {
		if got := rings[i].num(t, "data-level"); got != want {
			t.Errorf("ring %d level %g, want %g", i, got, want)
		}
		if got, exp := rings[i].num(t, "r"), r*(want+30)/30; math.Abs(got-exp) > coordTol {
			t.Errorf("ring %g dB radius %.3f, want %.3f", want, got, exp)
		}
	}
	if got := doc.texts("ring-label"); !slices.Equal(got, []string{"0 dB", "−10 dB", "−20 dB"}) {
		t.Errorf("ring labels %q", got)
	}
	var angles []string
	for d := 0; d < 360; d += 30 {
		angles = append(angles, itoa(d)+"°")
	}
	if got := doc.texts("angle-label"); !slices.Equal(got, angles) {
		t.Errorf("angle labels %q, want %q", got, angles)
	}
	tr := doc.all("trace")
	if len(tr) != 2 {
		t.Fatalf("%d traces, want 2", len(tr))
	}
	// The RHCP trace starts at 0° at its 0 dB peak: the top of the outer
	// ring. The LHCP trace at 90° has −18 dB, 12 dB above the centre.
	x, y := firstPoint(t, tr[0].attr("d"))
	if math.Abs(x-cx) > coordTol || math.Abs(y-(cy-r)) > coordTol {
		t.Errorf("RHCP starts at (%.3f, %.3f), want (%.3f, %.3f)", x, y, cx, cy-r)
	}
	pts := points(t, tr[1].attr("d"))
	at90 := pts[45] // samples every 2°
	if want := cx + r*12/30; math.Abs(at90[0]-want) > coordTol || math.Abs(at90[1]-cy) > coordTol {
		t.Errorf("LHCP at 90° is (%.3f, %.3f), want (%.3f, %.3f)", at90[0], at90[1], want, cy)
	}
	if tr[0].attr("stroke-dasharray") == tr[1].attr("stroke-dasharray") || tr[0].attr("stroke") == tr[1].attr("stroke") {
		t.Errorf("the two components are not told apart by dash and colour")
	}
	if got := doc.texts("legend-label"); !slices.Equal(got, []string{"RHCP", "LHCP"}) {
		t.Errorf("legend %q", got)
	}

	t.Run("absolute levels in dBic", func(t *testing.T) {
		q := samplePolar()
		q.Unit, q.Top, q.Range, q.RingStep = "dBic", 15, 40, 10
		var b bytes.Buffer
		if err := WritePolarPattern(&b, q, PolarOptions{}); err != nil {
			t.Fatal(err)
		}
		got := parseSVG(t, b.Bytes()).texts("ring-label")
		if !slices.Equal(got, []string{"15 dBic", "5 dBic", "−5 dBic", "−15 dBic"}) {
			t.Errorf("ring labels %q", got)
		}
	})
	t.Run("bad range", func(t *testing.T) {
		q := samplePolar()
		q.RingStep = 40
		var ie *InputError
		if err := WritePolarPattern(&bytes.Buffer{}, q, PolarOptions{}); !errors.As(err, &ie) {
			t.Errorf("error %v, want an InputError", err)
		}
	})
}

func itoa(v int) string { return string(appendInt(nil, v)) }

func appendInt(b []byte, v int) []byte {
	if v >= 10 {
		b = appendInt(b, v/10)
	}
	return append(b, byte('0'+v%10))
}
