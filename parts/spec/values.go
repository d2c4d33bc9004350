package spec

import (
	"fmt"
	"math"
	"reflect"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"
)

// maxEchoRunes is the most characters of a value a SpecError repeats;
// longer values are cut and end in an ellipsis.
const maxEchoRunes = 60

// clipValue cuts v to maxEchoRunes characters with an ellipsis.
func clipValue(v string) string {
	if utf8.RuneCountInString(v) <= maxEchoRunes {
		return v
	}
	return string([]rune(v)[:maxEchoRunes]) + "…"
}

// textRuneOK reports whether r may appear in a text value: no control
// characters (which reach terminals raw and are not allowed in XML), no
// bidirectional controls (which reorder what a reader sees) and no
// noncharacters (not allowed in XML).
func textRuneOK(r rune) bool {
	return !unicode.IsControl(r) && !unicode.Is(unicode.Bidi_Control, r) && !unicode.Is(unicode.Noncharacter_Code_Point, r)
}

// checkValues refuses, for every key of s, numbers that are not finite
// (nan, inf) and text holding characters textRuneOK rejects. It runs
// before any other rule, which would otherwise misreport such values.
func (c *checker) checkValues(s *Spec) {
	c.walkValues(reflect.ValueOf(s).Elem(), "")
}

func (c *checker) walkValues(v reflect.Value, prefix string) {
	t := v.Type()
	for i := range t.NumField() {
		name := tomlName(t.Field(i))
		if name == "" || name == "-" || !t.Field(i).IsExported() {
			continue
		}
		key := prefix + name
		f := v.Field(i)
		if f.Kind() == reflect.Pointer {
			if f.IsNil() {
				continue
			}
			f = f.Elem()
		}
		switch f.Kind() {
		case reflect.Struct:
			c.walkValues(f, key+".")
		case reflect.Float64:
			if x := f.Float(); math.IsNaN(x) || math.IsInf(x, 0) {
				c.fail(key, num(x), "must be a finite number (nan and inf are not sizes)", "write a number, e.g. "+key[strings.LastIndex(key, ".")+1:]+" = 1.0")
			}
		case reflect.String:
			if i := strings.IndexFunc(f.String(), func(r rune) bool { return !textRuneOK(r) }); i >= 0 {
				r, _ := utf8.DecodeRuneInString(f.String()[i:])
				c.fail(key, strconv.Quote(f.String()), fmt.Sprintf("holds %U at character %d: text must be printable (no control or direction-control characters)",
					r, utf8.RuneCountInString(f.String()[:i])+1), "retype the text without it")
			}
		}
	}
}
