package spec

import (
	"fmt"
	"reflect"
	"sort"
	"strings"

	"github.com/pelletier/go-toml/v2/unstable"
)

// unknownKeys walks the TOML syntax tree of data, inline tables included,
// and reports every key that is not a spec key spelt exactly: TOML keys are
// case-sensitive, while the decoder would match "Turns" to turns. Each
// problem names the nearest valid key as the fix. data has already passed
// scanPositions, so it parses.
func unknownKeys(data []byte) SpecErrors {
	valid := specKeys()
	var errs SpecErrors
	check := func(path []string, line int) {
		key := strings.Join(path, ".")
		if valid[key] {
			return
		}
		errs = append(errs, &SpecError{Key: clipValue(key), Line: line, Problem: "unknown key (keys are case-sensitive)", Fix: nearestKeyFix(path, valid)})
	}
	var p unstable.Parser
	p.Reset(data)
	var table []string
	line := func(it unstable.Iterator) int {
		if it.Next() && it.Node().Raw.Length > 0 {
			return p.Shape(it.Node().Raw).Start.Line
		}
		return 0
	}
	var walk func(prefix []string, n *unstable.Node)
	walk = func(prefix []string, n *unstable.Node) {
		path := append(append([]string{}, prefix...), keyParts(n.Key())...)
		check(path, line(n.Key()))
		if v := n.Value(); v.Kind == unstable.InlineTable && valid[strings.Join(path, ".")] {
			for it := v.Children(); it.Next(); {
				walk(path, it.Node())
			}
		}
	}
	for p.NextExpression() {
		e := p.Expression()
		switch e.Kind {
		case unstable.Table, unstable.ArrayTable:
			table = keyParts(e.Key())
			check(table, line(e.Key()))
		case unstable.KeyValue:
			walk(table, e)
		}
	}
	sort.SliceStable(errs, func(i, j int) bool { return errs[i].Line < errs[j].Line })
	return errs
}

// specKeys returns every dotted key a spec may hold: the top-level keys,
// the table names and each table's keys.
func specKeys() map[string]bool {
	keys := map[string]bool{}
	var walk func(t reflect.Type, prefix string)
	walk = func(t reflect.Type, prefix string) {
		for i := range t.NumField() {
			name := tomlName(t.Field(i))
			if name == "" || name == "-" || !t.Field(i).IsExported() {
				continue
			}
			keys[prefix+name] = true
			if ft := t.Field(i).Type; ft.Kind() == reflect.Struct {
				walk(ft, prefix+name+".")
			}
		}
	}
	walk(reflect.TypeOf(Spec{}), "")
	return keys
}

// nearestKeyFix suggests the valid key nearest to an unknown one: first in
// the same table (or at the top level), by edit distance ignoring case.
func nearestKeyFix(path []string, valid map[string]bool) string {
	unknown := strings.Join(path, ".")
	best, bestD := "", -1
	for _, k := range sortedKeys(valid) {
		if strings.Count(k, ".") != strings.Count(unknown, ".") {
			continue
		}
		d := editDistance(strings.ToLower(k), strings.ToLower(unknown))
		if bestD < 0 || d < bestD {
			best, bestD = k, d
		}
	}
	name := path[len(path)-1]
	switch {
	case best != "" && strings.EqualFold(best, unknown):
		return fmt.Sprintf("keys are case-sensitive: write %s", best[strings.LastIndex(best, ".")+1:])
	case best != "" && bestD <= max(2, len(name)/3):
		return fmt.Sprintf("did you mean %s? Rename it, or remove it", best)
	}
	return allowedKeysHint(path)
}

func sortedKeys(m map[string]bool) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

// editDistance is the Levenshtein distance between a and b, in bytes.
// Source: V. I. Levenshtein, "Binary codes capable of correcting deletions,
// insertions and reversals", Soviet Physics Doklady 10(8), 1966; the
// two-row dynamic programme is the textbook one.
func editDistance(a, b string) int {
	prev := make([]int, len(b)+1)
	cur := make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(b)]
}
