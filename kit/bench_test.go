package kit

import (
	"runtime/debug"
	"strings"
	"testing"

	"coilwright/parts/spec"
	"coilwright/templates"
)

// BenchmarkBuild plans and writes every output of each demo into memory:
// the whole build, former mesh included, as build does it less the disk.
// Every iteration starts from cold caches (resetMemos), so the field
// solution, strip search and tolerance analysis are worked out each time
// as a fresh process would.
//
// Two cases per demo: "geometry" is the demo with the field solution and
// the tolerance analysis off (spec, former mesh, patterns, sheet, plots),
// "full" is the demo as written. Besides wall time each reports the
// process's CPU time per build (user and system, all threads: the figure
// that holds on a busy machine) and the peak resident memory since the
// case began (on Linux the high-water mark is reset to the resident size
// after a collection that returns free memory to the system; elsewhere it
// is the process's peak so far, so run one case at a time).
func BenchmarkBuild(b *testing.B) {
	for _, demo := range templates.Demos() {
		for _, c := range []struct {
			name     string
			geometry bool
		}{{"geometry", true}, {"full", false}} {
			b.Run(strings.TrimSuffix(demo, ".toml")+"-"+c.name, func(b *testing.B) {
				b.ReportAllocs()
				resetMemos()
				debug.FreeOSMemory() // start the case from the heap the process needs
				resetPeakRSS()
				cpu0 := cpuTime()
				for b.Loop() {
					resetMemos()
					k := benchKit(b, demo, c.geometry)
					var m Memory
					if err := k.Write(&m, nil); err != nil {
						b.Fatal(err)
					}
				}
				b.ReportMetric(float64(cpuTime()-cpu0)/float64(b.N), "cpu-ns/op")
				if kb := peakRSSKB(); kb > 0 {
					b.ReportMetric(float64(kb)/1024, "peak-RSS-MB")
				}
			})
		}
	}
}

// benchKit plans the named demo; with geometry set, the field solution
// and the tolerance analysis are switched off as [solver] enabled = false
// and [tolerance] enabled = false would.
func benchKit(b *testing.B, name string, geometry bool) *Kit {
	b.Helper()
	if !geometry {
		return demoKit(b, name, Options{Version: "bench"})
	}
	src, ok := templates.Demo(name)
	if !ok {
		b.Fatalf("no demo %s", name)
	}
	s, err := spec.ParseSpec(src)
	if err != nil {
		b.Fatal(err)
	}
	off := false
	s.Solver.Enabled = &off
	s.Tolerance.Enabled = &off
	if s.Solver.On() || s.Tolerance.On() {
		b.Fatal("the solver or tolerance analysis is still on")
	}
	k, err := New(Source{Name: "demo:" + name, Bytes: src, Spec: s}, Options{Version: "bench"})
	if err != nil {
		b.Fatal(err)
	}
	return k
}

// resetMemos empties the per-process caches of field solutions, strip
// searches and tolerance analyses, as a fresh process starts.
func resetMemos() {
	fieldMemo.reset()
	stripMemo.reset()
	toleranceMemo.reset()
}

// reset empties the cache, as a fresh process starts with.
func (m *memo[V]) reset() {
	m.mu.Lock()
	defer m.mu.Unlock()
	m.keys, m.vals = nil, nil
}
