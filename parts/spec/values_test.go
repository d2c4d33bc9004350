package spec

import (
	"errors"
	"reflect"
	"strings"
	"testing"
	"unicode/utf8"
)

// withKey returns base with the dotted key set to the TOML value v (added
// or replaced) and the line it is on.
func withKey(key, v string) (string, int) {
	table, name := "", key
	if i := strings.LastIndex(key, "."); i >= 0 {
		table, name = key[:i], key[i+1:]
	}
	lines := strings.Split(base, "\n")
	header := -1
	for i, l := range lines {
		if l == "["+table+"]" {
			header = i
		}
		if strings.HasPrefix(l, name+" = ") && (table == "" && header < 0 || table != "" && header >= 0 && header == lastHeader(lines[:i])) {
			lines[i] = name + " = " + v
			return strings.Join(lines, "\n"), i + 1
		}
	}
	switch {
	case table == "":
		lines = append([]string{name + " = " + v}, lines...)
		return strings.Join(lines, "\n"), 1
	case header >= 0:
		lines = append(lines[:header+1], append([]string{name + " = " + v}, lines[header+1:]...)...)
		return strings.Join(lines, "\n"), header + 2
	}
	return base + "\n[" + table + "]\n" + name + " = " + v + "\n", len(lines) + 2
}

// lastHeader returns the index of the last table header in lines, or -1.
func lastHeader(lines []string) int {
	for i := len(lines) - 1; i >= 0; i-- {
		if strings.HasPrefix(lines[i], "[") {
			return i
		}
	}
	return -1
}

// floatKeys lists every dotted spec key that holds a number with a fraction.
func floatKeys() []string {
	var keys []string
	var walk func(t reflect.Type, prefix string)
	walk = func(t reflect.Type, prefix string) {
		for i := range t.NumField() {
			f := t.Field(i)
			name := tomlName(f)
			if name == "" || name == "-" || !f.IsExported() {
				continue
			}
			ft := f.Type
			if ft.Kind() == reflect.Pointer {
				ft = ft.Elem()
			}
			switch ft.Kind() {
			case reflect.Struct:
				walk(ft, prefix+name+".")
			case reflect.Float64:
				keys = append(keys, prefix+name)
			}
		}
	}
	walk(reflect.TypeOf(Spec{}), "")
	return keys
}

// findError returns the problem reported for key, or nil.
func findError(err error, key string) *SpecError {
	var es SpecErrors
	if !errors.As(err, &es) {
		return nil
	}
	for _, e := range es {
		if e.Key == key {
			return e
		}
	}
	return nil
}

func TestNonFiniteNumbersAreRefusedForEveryKey(t *testing.T) {
	keys := floatKeys()
	if len(keys) < 60 {
		t.Fatalf("found only %d number keys", len(keys))
	}
	for _, key := range keys {
		for _, v := range []string{"nan", "inf", "-inf", "+nan"} {
			src, line := withKey(key, v)
			_, err := ParseSpec([]byte(src))
			e := findError(err, key)
			if e == nil || e.Line != line || !strings.Contains(e.Problem, "finite") {
				t.Errorf("%s = %s (line %d): got %v", key, v, line, err)
			}
			var es SpecErrors
			if errors.As(err, &es) && len(es) != 1 {
				t.Errorf("%s = %s: %d problems reported, want only the non-finite one: %v", key, v, len(es), err)
			}
		}
	}
}

func TestKeysAreCaseSensitive(t *testing.T) {
	for _, tc := range []struct {
		name, add, key, fix string
		line                int
	}{
		{"wrong case after the right key", "[coil]\nturns = 5.0\nTurns = 12.0", "coil.Turns", "write turns", 0},
		{"wrong case of a table", "[Coax]\nlength_mm = 80.0", "Coax", "write coax", 0},
		{"wrong case at the top", "Quantity = 3", "Quantity", "write quantity", 0},
		{"misspelt", "[wire]\ndiameter_mn = 1.6", "wire.diameter_mn", "did you mean wire.diameter_mm", 0},
		{"inline table", "dowel = { Material = \"ptfe\" }", "dowel.Material", "write material", 0},
	} {
		t.Run(tc.name, func(t *testing.T) {
			src := base
			if strings.HasPrefix(tc.add, "[coil]") {
				src = strings.Replace(base, "turns = 5.0", "turns = 5.0\nTurns = 12.0", 1)
			} else if strings.HasPrefix(tc.add, "[") {
				src = base + "\n" + tc.add + "\n"
			} else if strings.HasPrefix(tc.add, "dowel") {
				src = strings.Replace(base, "quantity = 2", "quantity = 2\n"+tc.add, 1)
			} else {
				src = tc.add + "\n" + base
			}
			if strings.HasPrefix(tc.add, "[wire]") {
				src = strings.Replace(base, "diameter_mm = 1.6", "diameter_mn = 1.6", 1)
			}
			_, err := ParseSpec([]byte(src))
			e := findError(err, tc.key)
			if e == nil || !strings.Contains(e.Fix, tc.fix) || e.Line == 0 {
				t.Errorf("got %v, want %s refused with fix %q", err, tc.key, tc.fix)
			}
		})
	}
}

func TestTextValues(t *testing.T) {
	t.Run("control characters", func(t *testing.T) {
		for _, v := range []string{`"Kit\u0007Bell"`, `"Kit\u001b[2J"`, `"Kit\u202eevil"`, `"Kit\uffff"`} {
			src := strings.Replace(base, `kit = "Test Kit"`, "kit = "+v, 1)
			e := findError(parseErr(src), "kit")
			if e == nil || e.Line != 1 || !strings.Contains(e.Problem, "printable") {
				t.Errorf("kit = %s: got %v", v, e)
			}
		}
		src := strings.Replace(base, `material = "copper-annealed"`, `material = "copper-annealed\u0000"`, 1)
		if e := findError(parseErr(src), "wire.material"); e == nil {
			t.Error("a control character in wire.material was accepted")
		}
	})
	t.Run("length in characters", func(t *testing.T) {
		// 80 two-byte characters: 160 bytes, within the 80-character limit.
		kit := strings.Repeat("é", 80)
		if _, err := ParseSpec([]byte(strings.Replace(base, `"Test Kit"`, `"`+kit+`"`, 1))); err != nil {
			t.Errorf("an 80-character kit name was refused: %v", err)
		}
		e := findError(parseErr(strings.Replace(base, `"Test Kit"`, `"`+kit+`é"`, 1)), "kit")
		if e == nil || !strings.Contains(e.Problem, "80 characters") {
			t.Errorf("an 81-character kit name: %v", e)
		}
	})
	t.Run("long values are cut in messages", func(t *testing.T) {
		kit := strings.Repeat("x", 1<<20)
		e := findError(parseErr(strings.Replace(base, `"Test Kit"`, `"`+kit+`"`, 1)), "kit")
		if e == nil || utf8.RuneCountInString(e.Value) != maxEchoRunes+1 || !strings.HasSuffix(e.Value, "…") {
			t.Fatalf("value echoed as %d characters", utf8.RuneCountInString(e.Value))
		}
		if len(e.Error()) > 400 {
			t.Errorf("message is %d bytes", len(e.Error()))
		}
	})
}

// parseErr returns only the error of ParseSpec(src).
func parseErr(src string) error {
	_, err := ParseSpec([]byte(src))
	return err
}
