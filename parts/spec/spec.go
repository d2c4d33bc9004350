package spec

import (
	"bytes"
	"errors"
	"fmt"
	"reflect"
	"sort"
	"strings"
	"unicode/utf8"

	toml "github.com/pelletier/go-toml/v2"
	"github.com/pelletier/go-toml/v2/unstable"
)

// Spec is one antenna design as written by its maker: the top-level keys and
// one struct per TOML table. Optional numbers are pointers (nil when absent).
// ParseSpec fills defaults and validates; a Spec built in code should be
// passed through Validate before use.
type Spec struct {
	Kit          string   `toml:"kit"`           // kit name, also the default output folder
	FrequencyMHz float64  `toml:"frequency_mhz"` // centre frequency, 100–30000 MHz
	BandLowMHz   *float64 `toml:"band_low_mhz"`  // optional lower band edge
	BandHighMHz  *float64 `toml:"band_high_mhz"` // optional upper band edge
	Quantity     int      `toml:"quantity"`      // kits in the batch, default 1

	Coil      CoilSpec      `toml:"coil"`
	Wire      WireSpec      `toml:"wire"`
	Reflector ReflectorSpec `toml:"reflector"`
	Dowel     DowelSpec     `toml:"dowel"`
	Coax      CoaxSpec      `toml:"coax"`
	RF        RFSpec        `toml:"rf"`
	Stock     StockSpec     `toml:"stock"`
	Wedge     WedgeSpec     `toml:"wedge"`
	Cutting   CuttingSpec   `toml:"cutting"`
	Former    FormerSpec    `toml:"former"`
	Solver    SolverSpec    `toml:"solver"`

	pos positions // where each key was written; empty for a Spec built in code
}

// Frequency limits of the spec, in MHz.
const (
	MinFrequencyMHz = 100.0
	MaxFrequencyMHz = 30000.0
	MaxQuantity     = 10000
)

// ParseSpec decodes a TOML design spec strictly (unknown keys, wrong types
// and syntax errors are errors), fills defaults and validates it. Every
// problem is reported as a *SpecError carrying the key and its line; several
// are returned together as SpecErrors.
func ParseSpec(data []byte) (*Spec, error) {
	pos, err := scanPositions(data)
	if err != nil {
		return nil, err
	}
	if errs := unknownKeys(data); len(errs) > 0 {
		return nil, errs
	}
	var s Spec
	dec := toml.NewDecoder(bytes.NewReader(data)).DisallowUnknownFields()
	if err := dec.Decode(&s); err != nil {
		return nil, decodeError(err, pos)
	}
	s.pos = pos
	if err := s.Validate(); err != nil {
		return nil, err
	}
	return &s, nil
}

// Validate fills defaults for absent keys and checks every range and
// cross-field rule, returning SpecErrors listing all problems, or nil. It
// mutates s (the defaults).
func (s *Spec) Validate() error {
	c := &checker{pos: s.pos}
	if c.checkValues(s); len(c.errs) > 0 {
		return c.result()
	}
	if strings.TrimSpace(s.Kit) == "" {
		c.fail("kit", "", "must name the kit", `add kit = "My Club 5G8 Cone"`)
	} else if utf8.RuneCountInString(s.Kit) > 80 {
		c.fail("kit", fmt.Sprintf("%q", s.Kit), "must be at most 80 characters", "shorten the kit name")
	}
	if !c.has("frequency_mhz") && s.FrequencyMHz == 0 {
		c.fail("frequency_mhz", "", fmt.Sprintf("is required: the centre frequency, %s to %s MHz", num(MinFrequencyMHz), num(MaxFrequencyMHz)), "add frequency_mhz = 5800.0")
	} else {
		c.within("frequency_mhz", s.FrequencyMHz, MinFrequencyMHz, MaxFrequencyMHz, "MHz")
	}
	if s.BandLowMHz != nil && s.BandHighMHz != nil && *s.BandLowMHz >= *s.BandHighMHz {
		c.fail("band_high_mhz", num(*s.BandHighMHz), fmt.Sprintf("must be above band_low_mhz = %s", num(*s.BandLowMHz)), "swap the band edges")
	}
	if s.BandLowMHz != nil && (*s.BandLowMHz > s.FrequencyMHz || *s.BandLowMHz < MinFrequencyMHz) {
		c.fail("band_low_mhz", num(*s.BandLowMHz), fmt.Sprintf("must lie between %s and frequency_mhz = %s", num(MinFrequencyMHz), num(s.FrequencyMHz)), "set the lower band edge at or below the centre frequency")
	}
	if s.BandHighMHz != nil && (*s.BandHighMHz < s.FrequencyMHz || *s.BandHighMHz > MaxFrequencyMHz) {
		c.fail("band_high_mhz", num(*s.BandHighMHz), fmt.Sprintf("must lie between frequency_mhz = %s and %s", num(s.FrequencyMHz), num(MaxFrequencyMHz)), "set the upper band edge at or above the centre frequency")
	}
	if !c.has("quantity") && s.Quantity == 0 {
		s.Quantity = 1
	}
	if s.Quantity < 1 || s.Quantity > MaxQuantity {
		c.fail("quantity", fmt.Sprint(s.Quantity), fmt.Sprintf("must be between 1 and %d", MaxQuantity), "give the number of kits to make")
	}
	s.Coil.validate(c, s)
	s.Wire.validate(c, s)
	s.Reflector.validate(c, s)
	s.Dowel.validate(c, s)
	s.Coax.validate(c, s)
	s.RF.validate(c, s)
	s.Stock.validate(c, s)
	s.Wedge.validate(c, s)
	s.Cutting.validate(c, s)
	s.Former.validate(c, s)
	s.Solver.validate(c, s)
	if len(c.errs) == 0 {
		s.Cutting.validateFit(c, s)
	}
	return c.result()
}

// Line returns the 1-based line on which the dotted key was written, or 0.
func (s *Spec) Line(key string) int { return s.pos[key] }

// Wavelength returns the free-space wavelength at the centre frequency in mm.
func (s *Spec) Wavelength() float64 { return Wavelength(s.FrequencyMHz) }

// positions maps each dotted key (and table name) to its 1-based line.
type positions map[string]int

// scanPositions walks the TOML syntax tree to record the line of every key.
// A syntax error is returned as a *SpecError with its line.
func scanPositions(data []byte) (positions, error) {
	pos := positions{}
	var p unstable.Parser
	p.Reset(data)
	var table []string
	for p.NextExpression() {
		e := p.Expression()
		switch e.Kind {
		case unstable.Table, unstable.ArrayTable:
			table = keyParts(e.Key())
			pos.record(strings.Join(table, "."), tableLine(&p, e))
		case unstable.KeyValue:
			k := append(append([]string{}, table...), keyParts(e.Key())...)
			line := 0
			it := e.Key()
			if it.Next() && it.Node().Raw.Length > 0 {
				line = p.Shape(it.Node().Raw).Start.Line
			}
			pos.record(strings.Join(k, "."), line)
		}
	}
	if err := p.Error(); err != nil {
		var pe *unstable.ParserError
		if errors.As(err, &pe) {
			line := 0
			if len(pe.Highlight) > 0 {
				line = p.Shape(p.Range(pe.Highlight)).Start.Line
			}
			key := strings.Join(pe.Key, ".")
			if key == "" {
				key = keyOnLine(data, line, table)
			}
			return nil, SpecErrors{{Key: key, Line: line, Problem: "TOML syntax error: " + pe.Message, Fix: "correct the syntax on that line"}}
		}
		return nil, SpecErrors{{Key: "spec", Problem: "TOML syntax error: " + err.Error(), Fix: "correct the syntax"}}
	}
	return pos, nil
}

// keyOnLine names the key a broken line was assigning, for a syntax error
// the parser reports without one: the bare or dotted key before the line's
// "=", under the current table. It returns "spec" when the line holds no
// such key (a broken table header, a stray value).
func keyOnLine(data []byte, line int, table []string) string {
	lines := strings.Split(string(data), "\n")
	if line < 1 || line > len(lines) {
		return "spec"
	}
	before, _, ok := strings.Cut(lines[line-1], "=")
	key := strings.TrimSpace(before)
	if !ok || key == "" || strings.IndexFunc(key, func(r rune) bool {
		return !(r == '_' || r == '-' || r == '.' || '0' <= r && r <= '9' || 'a' <= r && r <= 'z' || 'A' <= r && r <= 'Z')
	}) >= 0 {
		return "spec"
	}
	return strings.Join(append(append([]string{}, table...), key), ".")
}

// tableLine returns the line of a table header's first key part.
func tableLine(p *unstable.Parser, e *unstable.Node) int {
	it := e.Key()
	if it.Next() && it.Node().Raw.Length > 0 {
		return p.Shape(it.Node().Raw).Start.Line
	}
	return 0
}

func (pos positions) record(key string, line int) {
	if _, seen := pos[key]; !seen {
		pos[key] = line
	}
}

func keyParts(it unstable.Iterator) []string {
	var out []string
	for it.Next() {
		out = append(out, string(it.Node().Data))
	}
	return out
}

// decodeError turns a go-toml decode error into SpecErrors with lines.
func decodeError(err error, pos positions) error {
	var strict *toml.StrictMissingError
	if errors.As(err, &strict) {
		var out SpecErrors
		for i := range strict.Errors {
			e := &strict.Errors[i]
			key := strings.Join(e.Key(), ".")
			line, _ := e.Position()
			out = append(out, &SpecError{Key: key, Line: line, Problem: "unknown key", Fix: allowedKeysHint(e.Key())})
		}
		return out
	}
	var de *toml.DecodeError
	if errors.As(err, &de) {
		line, _ := de.Position()
		key := strings.Join(de.Key(), ".")
		if key == "" {
			key = "spec"
		}
		if line == 0 {
			line = pos[key]
		}
		return SpecErrors{{Key: key, Line: line, Problem: "wrong type: " + de.Error(), Fix: typeHint(de.Key())}}
	}
	return SpecErrors{{Key: "spec", Problem: err.Error(), Fix: "check the spec against `coilwright new`"}}
}

// fieldFor finds the struct field reached by a dotted TOML key path.
func fieldFor(path []string) (reflect.StructField, reflect.Type, bool) {
	t := reflect.TypeOf(Spec{})
	var f reflect.StructField
	for i, name := range path {
		found := false
		for j := 0; j < t.NumField(); j++ {
			sf := t.Field(j)
			if tomlName(sf) == name {
				f, found = sf, true
				break
			}
		}
		if !found {
			return f, t, false
		}
		if i < len(path)-1 {
			t = f.Type
			if t.Kind() != reflect.Struct {
				return f, t, false
			}
		}
	}
	return f, t, true
}

func tomlName(f reflect.StructField) string {
	name, _, _ := strings.Cut(f.Tag.Get("toml"), ",")
	return name
}

// allowedKeysHint lists the keys allowed where an unknown key was found.
func allowedKeysHint(path []string) string {
	_, t, _ := fieldFor(path[:len(path)-1])
	if len(path) == 1 {
		t = reflect.TypeOf(Spec{})
	}
	if t.Kind() != reflect.Struct {
		return "remove the key"
	}
	var names []string
	for j := 0; j < t.NumField(); j++ {
		if n := tomlName(t.Field(j)); n != "" {
			names = append(names, n)
		}
	}
	sort.Strings(names)
	where := "at the top level"
	if len(path) > 1 {
		where = "in [" + strings.Join(path[:len(path)-1], ".") + "]"
	}
	return fmt.Sprintf("remove or rename it; keys allowed %s: %s", where, strings.Join(names, ", "))
}

// typeHint says which TOML type a key takes.
func typeHint(path []string) string {
	f, _, ok := fieldFor(path)
	if !ok {
		return "check the value's type against `coilwright new`"
	}
	t := f.Type
	if t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	switch t.Kind() {
	case reflect.Float64:
		return "write a number, e.g. 5.0"
	case reflect.Int:
		return "write a whole number, e.g. 4"
	case reflect.String:
		return `write a quoted string, e.g. "text"`
	case reflect.Struct:
		return "write this as a [table]"
	}
	return "check the value's type against `coilwright new`"
}
