// Package font loads the embedded Go font family (regular and bold) once,
// for the text outlines of drawings and the text of PDF pages alike, so
// every machine draws and embeds the same letters.
package font

import (
	"fmt"
	"sync"

	"github.com/tdewolff/canvas"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goregular"
)

// Family returns the embedded Go family, regular and bold, parsed on first
// use and shared; callers must not change it.
var Family = sync.OnceValues(func() (*canvas.FontFamily, error) {
	f := canvas.NewFontFamily("Go")
	if err := f.LoadFont(goregular.TTF, 0, canvas.FontRegular); err != nil {
		return nil, fmt.Errorf("loading the embedded font: %w", err)
	}
	if err := f.LoadFont(gobold.TTF, 0, canvas.FontBold); err != nil {
		return nil, fmt.Errorf("loading the embedded bold font: %w", err)
	}
	return f, nil
})
