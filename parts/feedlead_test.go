package parts

import (
	"fmt"
	"strings"
)

// withFeed returns an edit that sets the demo's feed.
func withFeed(feed string) func(string) string {
	return func(s string) string {
		return strings.Replace(s, `feed = "periphery"`, fmt.Sprintf("feed = %q", feed), 1)
	}
}

// feedTol is the tolerance on positions built from the coil's own numbers.
const feedTol = 1e-9
