package cam

import (
	"errors"
	"fmt"
)

// ErrBusy is returned by NewOutput when another build holds the folder.
var ErrBusy = errors.New("output folder is in use by another build")

// BusyError reports an output folder locked by another running build.
type BusyError struct{ Dir string }

// Error names the folder and what to do.
func (e *BusyError) Error() string {
	return fmt.Sprintf("%s is being written by another coilwright build; wait for it to finish, or build into another folder with -o", e.Dir)
}

// Is makes errors.Is(err, ErrBusy) true.
func (e *BusyError) Is(target error) bool { return target == ErrBusy }
