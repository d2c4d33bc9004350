package main

import "coilwright/parts"

// planBuild works out, writing nothing, every plan build makes on the way
// to its outputs and can refuse on: the cut list, the flat parts with their
// kerf and nests, and for a batch the stock cutting plans. check runs it so
// that a spec check passes does not fail build.
func planBuild(l *loadedSpec) error {
	cl, err := parts.NewCutList(l.Design)
	if err != nil {
		return err
	}
	cps, err := cutParts(l.Design)
	if err != nil {
		return err
	}
	if l.Spec.Quantity > 1 {
		if _, err := newBatchPlan(l.Design, cl, cps); err != nil {
			return err
		}
	}
	return nil
}
