//go:build !js

package store

import (
	"path/filepath"
	"testing"
)

// backends returns a fresh instance of every back end that runs here; the
// browser's runs in the js build of these tests (backends_js_test.go).
func backends(t *testing.T) map[string]Backend {
	t.Helper()
	f, err := NewFiles(filepath.Join(t.TempDir(), "data"))
	if err != nil {
		t.Fatal(err)
	}
	return map[string]Backend{"files": f, "memory": NewMemory()}
}
