package wire

import (
	"errors"
	"fmt"
	"strings"

	"github.com/pelletier/go-toml/v2"
)

// calibrationDecodeError describes a calibration file that does not decode
// by its keys and lines only: the file may hold a value pasted by mistake,
// and messages never repeat values.
func calibrationDecodeError(err error) error {
	var sm *toml.StrictMissingError
	if errors.As(err, &sm) {
		var keys []string
		for i := range sm.Errors {
			e := &sm.Errors[i]
			line, _ := e.Position()
			keys = append(keys, fmt.Sprintf("%s (line %d)", strings.Join(e.Key(), "."), line))
		}
		return fmt.Errorf("calibration: unknown key %s", strings.Join(keys, ", "))
	}
	var de *toml.DecodeError
	if errors.As(err, &de) {
		line, _ := de.Position()
		key := strings.Join(de.Key(), ".")
		if key == "" {
			return fmt.Errorf("calibration: not a TOML file: syntax error on line %d", line)
		}
		return fmt.Errorf("calibration: %s (line %d) has the wrong type", key, line)
	}
	return errors.New("calibration: not a calibration file")
}
