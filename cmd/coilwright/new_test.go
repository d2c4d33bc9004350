package main

import (
	"strings"
	"testing"
)

func TestNewRefusesAControlCharacterInTheKitName(t *testing.T) {
	code, out, errs := runCLI(t, "new", "--frequency-mhz", "5800", "--kit", "Bell\x07Kit")
	if code != exitBadUse || out != "" || !strings.Contains(errs, `--kit "Bell\aKit": holds a control character`) {
		t.Errorf("exit %d, stdout %q, stderr %q", code, out, errs)
	}
}
