package store

import (
	"fmt"
	"sort"
	"sync"
)

// Memory keeps documents in memory: for tests, and as the last resort of
// a browser that refuses every kind of storage (the screen then says that
// nothing is kept).
type Memory struct {
	mu   sync.Mutex
	docs map[string][]byte
}

// NewMemory returns an empty memory backend.
func NewMemory() *Memory { return &Memory{docs: map[string][]byte{}} }

// Load implements Backend.
func (m *Memory) Load(name string) ([]byte, error) {
	if err := checkName(name); err != nil {
		return nil, err
	}
	m.mu.Lock()
	defer m.mu.Unlock()
	b, ok := m.docs[name]
	if !ok {
		return nil, fmt.Errorf("store: %s: %w", name, ErrNotFound)
	}
	return append([]byte(nil), b...), nil
}

// Save implements Backend.
func (m *Memory) Save(name string, data []byte) error {
	if err := checkName(name); err != nil {
		return err
	}
	m.mu.Lock()
	defer m.mu.Unlock()
	m.docs[name] = append([]byte(nil), data...)
	return nil
}

// Delete implements Backend.
func (m *Memory) Delete(name string) error {
	if err := checkName(name); err != nil {
		return err
	}
	m.mu.Lock()
	defer m.mu.Unlock()
	delete(m.docs, name)
	return nil
}

// Names implements Backend.
func (m *Memory) Names() ([]string, error) {
	m.mu.Lock()
	defer m.mu.Unlock()
	out := make([]string, 0, len(m.docs))
	for n := range m.docs {
		out = append(out, n)
	}
	sort.Strings(out)
	return out, nil
}

// Kind implements Backend.
func (m *Memory) Kind() string { return "memory only (nothing is kept after closing)" }

// Persistence implements Backend: nothing survives.
func (m *Memory) Persistence() Persistence { return PersistDenied }
