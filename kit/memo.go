package kit

import "sync"

// memo is a small most-recent cache of results that are pure functions of
// a SHA-256 key (a field solution, a strip search, a tolerance analysis),
// so a process that works out the same antenna again (check then build,
// tests) does not repeat the work. Values are shared and never modified.
// It is safe for concurrent use; its zero value is not: use newMemo.
type memo[V any] struct {
	mu   sync.Mutex
	size int
	keys [][32]byte
	vals []V
}

// newMemo returns an empty cache that keeps the last size results.
func newMemo[V any](size int) *memo[V] { return &memo[V]{size: size} }

// get returns the value stored under k and whether there was one.
func (m *memo[V]) get(k [32]byte) (V, bool) {
	m.mu.Lock()
	defer m.mu.Unlock()
	for i, key := range m.keys {
		if key == k {
			return m.vals[i], true
		}
	}
	var zero V
	return zero, false
}

// put stores v under k, dropping the oldest entry when full.
func (m *memo[V]) put(k [32]byte, v V) {
	m.mu.Lock()
	defer m.mu.Unlock()
	if len(m.keys) == m.size {
		m.keys, m.vals = m.keys[1:], m.vals[1:]
	}
	m.keys = append(m.keys, k)
	m.vals = append(m.vals, v)
}
