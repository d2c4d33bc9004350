package main

import (
	"strconv"
	"strings"
	"unicode/utf8"
)

// maxEchoRunes is the most characters of a user's value a message repeats.
const maxEchoRunes = 60

// clipQuote quotes s for a message, escaping control characters and
// cutting it to maxEchoRunes characters with an ellipsis.
func clipQuote(s string) string {
	if utf8.RuneCountInString(s) > maxEchoRunes {
		s = string([]rune(s)[:maxEchoRunes]) + "…"
	}
	return strconv.Quote(s)
}

// clipList quotes up to five names with clipQuote, and counts the rest.
func clipList(names []string) string {
	var q []string
	for i, n := range names {
		if i == 5 {
			q = append(q, strconv.Itoa(len(names)-5)+" more")
			break
		}
		q = append(q, clipQuote(n))
	}
	return strings.Join(q, ", ")
}
