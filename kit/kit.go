package kit

import (
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"io"
	"path/filepath"
	"strings"
	"time"

	"coilwright/cam/pdf"
	"coilwright/jig"
	"coilwright/parts"
	"coilwright/parts/cutlist"
	"coilwright/parts/report"
	"coilwright/parts/spec"
)

// Source is a validated spec with where it came from and the bytes it was
// read from (the manifest and the build sheet record their SHA-256).
type Source struct {
	Name  string // file path, or "demo:NAME" for an embedded demo
	Bytes []byte
	Spec  *spec.Spec // parsed and validated, calibration attached
}

// SHA256 returns the hex SHA-256 of the spec's bytes.
func (s Source) SHA256() string {
	h := sha256.Sum256(s.Bytes)
	return hex.EncodeToString(h[:])
}

// BaseName returns the spec's file name without its folder, or
// "demo:NAME", as the manifest records it: the same file gives the same
// manifest however its path was typed.
func (s Source) BaseName() string {
	if strings.HasPrefix(s.Name, "demo:") {
		return s.Name
	}
	return filepath.Base(s.Name)
}

// Options are what a build records besides the spec. The zero value
// records no version and no creation time.
type Options struct {
	Version string    // tool version written into file comments and PDF metadata
	Created time.Time // creation time PDFs record; zero leaves it out
}

// Kit is one spec worked out for building: the design, the flat parts with
// their kerf offsets and nests, the cut list and batch plan, and the design
// report with its panel blocks. It is not modified after New.
type Kit struct {
	Source Source
	Design *parts.Design
	Former jig.FormerPlan // the former's sizes, drive and envelope
	Report report.Report  // as in design.json and check --json

	opt       Options
	parts     []cutPart
	cutList   *cutlist.CutList
	batch     *batchPlan     // nil for one kit
	templates []pdf.Page     // the 1:1 template pages, laid out once
	split     *jig.SplitPlan // sections of a former taller than the printer; nil when it fits or cannot be split
	formerObj *jig.Former    // the former split, when split is set
	onRod     jig.FormerPlan // its plan, bored for the support rod (FormerPlan.OnRod), when split is set

	// tolerance is the batch tolerance analysis; nil when it did not run.
	tolerance *report.ToleranceReport
}

// New works out the design for src and plans every part of the build.
// Problems in the spec come back as *parts.SpecError or parts.SpecErrors.
func New(src Source, opt Options) (*Kit, error) {
	d, err := parts.NewDesign(src.Spec)
	if err != nil {
		return nil, err
	}
	if d, err = searchStrip(d); err != nil {
		return nil, err
	}
	if d, err = solveField(d); err != nil {
		return nil, err
	}
	k := &Kit{Source: src, Design: d, opt: opt}
	if err := checkPlate(d); err != nil {
		return nil, err
	}
	if k.Former, err = planFormer(d); err != nil {
		return nil, err
	}
	if k.parts, err = cutParts(d); err != nil {
		return nil, err
	}
	if k.cutList, err = cutlist.NewCutList(d); err != nil {
		return nil, err
	}
	// A former split onto the support rod is bored for it: the lock end
	// is fitted to the hole as printed.
	k.planSplit()
	k.cutList.FitLockTail(k.printed().LockHoleMM)
	// The batch plan also checks that each piece fits its stock rod, so
	// one kit is planned too, and its plan kept only for a batch.
	bp, err := newBatchPlan(d, k.cutList, k.parts)
	if err != nil {
		return nil, err
	}
	if src.Spec.Quantity > 1 {
		k.batch = bp
	}
	if err := k.analyseTolerance(); err != nil {
		return nil, err
	}
	if k.templates, err = templatePages(d, k.parts); err != nil {
		return nil, err
	}
	k.Report = report.New(d)
	k.addPanels(&k.Report)
	k.Report.Tolerance = k.tolerance
	return k, nil
}

// Sink receives a build's files: Add calls write once with a writer for
// the named file. *cam.Output and *Memory are sinks.
type Sink interface {
	Add(name string, write func(io.Writer) error) error
}

// Step is one group of outputs.
type Step struct {
	Name  string // what it makes, e.g. "cut patterns"
	write func(*Kit, Sink) error
}

// Steps lists the output steps in the order Write runs them.
func Steps() []Step {
	return []Step{
		{"design report", (*Kit).writeDesign},
		{"cut list and build sheet", (*Kit).writeSheet},
		{"cut patterns", (*Kit).writePatterns},
		{"winding former", (*Kit).writeFormer},
		{"field solution", (*Kit).writeField},
		{"tolerance analysis", (*Kit).writeTolerance},
		{"plots", (*Kit).writePlots},
		{"report page", (*Kit).writeHTML},
	}
}

// Write adds every output file to s, step by step, calling progress (when
// not nil) with each step's name as it starts. An error names its step.
func (k *Kit) Write(s Sink, progress func(step string)) error {
	return k.WriteSteps(s, Steps(), progress)
}

// WriteSteps adds the files of the given steps to s, in the order given,
// calling progress (when not nil) with each step's name as it starts. The
// report page lists only what the steps before it wrote; a caller that
// leaves out a step (a quick check that skips the former's meshing) gets a
// report without it.
func (k *Kit) WriteSteps(s Sink, steps []Step, progress func(step string)) error {
	// The report page lists and embeds what the steps before it wrote.
	s = &recorder{next: s}
	for _, st := range steps {
		if progress != nil {
			progress(st.Name)
		}
		if err := st.write(k, s); err != nil {
			return fmt.Errorf("%s: %w", st.Name, err)
		}
	}
	return nil
}
