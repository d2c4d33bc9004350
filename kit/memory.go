package kit

import (
	"bytes"
	"fmt"
	"io"
)

// Memory is a Sink that keeps each file's bytes in memory, in the order
// they were added. Its zero value is empty and ready to use.
type Memory struct {
	names []string
	files map[string][]byte
}

// Add writes the named file into memory. A name added twice is an error.
func (m *Memory) Add(name string, write func(io.Writer) error) error {
	if _, ok := m.files[name]; ok {
		return fmt.Errorf("%s added twice", name)
	}
	var b bytes.Buffer
	if err := write(&b); err != nil {
		return fmt.Errorf("%s: %w", name, err)
	}
	if m.files == nil {
		m.files = map[string][]byte{}
	}
	m.names = append(m.names, name)
	m.files[name] = b.Bytes()
	return nil
}

// Names returns the names of the files added, in order.
func (m *Memory) Names() []string { return append([]string(nil), m.names...) }

// File returns the bytes of the named file and whether it was added. The
// slice is the sink's own; callers must not change it.
func (m *Memory) File(name string) ([]byte, bool) {
	b, ok := m.files[name]
	return b, ok
}
