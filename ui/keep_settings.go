package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"time"

	"tubewright/ui/store"
)

// settingsDoc is the name of the document of app settings in a Backend:
// today only the theme chosen with the top bar's button, kept across
// restarts on every platform (a file on desktop and Android, IndexedDB in
// the browser).
const settingsDoc = "settings"

// settingsFormat and settingsVersion mark the document of app settings.
const (
	settingsFormat  = "tubewright-settings"
	settingsVersion = 1
)

// The themes a user can choose; "" follows the system's setting.
const (
	themeDark   = "dark"
	themeBright = "bright"
)

// keptSettings is the document of app settings.
type keptSettings struct {
	Format  string `json:"format"`
	Version int    `json:"version"`
	// Theme is themeDark or themeBright when the user chose one with the
	// theme button; "" follows the system.
	Theme string `json:"theme,omitempty"`
}

// loadSettings reads the app settings. A missing document is none; a
// damaged one is kept under a dated name (never written over) and
// reported, and the app starts with the system's theme.
func loadSettings(b store.Backend) (keptSettings, error) {
	data, err := b.Load(settingsDoc)
	if errors.Is(err, store.ErrNotFound) {
		return keptSettings{}, nil
	}
	if err != nil {
		return keptSettings{}, fmt.Errorf("your app settings could not be read: %v", err)
	}
	s, perr := parseSettings(data)
	if perr == nil {
		return s, nil
	}
	aside := "settings-damaged-" + time.Now().UTC().Format("20060102-150405")
	if err := b.Save(aside, data); err != nil {
		return keptSettings{}, fmt.Errorf("your app settings could not be read (%v) nor kept aside (%v)", perr, err)
	}
	if err := b.Delete(settingsDoc); err != nil {
		return keptSettings{}, fmt.Errorf("your app settings could not be read (%v); a copy is kept as %q", perr, aside)
	}
	return keptSettings{}, fmt.Errorf("your app settings could not be read (%v); they were kept as %q", perr, aside)
}

// parseSettings reads the document of app settings, refusing anything
// else.
func parseSettings(data []byte) (keptSettings, error) {
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	var s keptSettings
	if err := dec.Decode(&s); err != nil {
		return keptSettings{}, fmt.Errorf("not a document of app settings: %v", err)
	}
	if s.Format != settingsFormat {
		return keptSettings{}, fmt.Errorf("format %q, want %q", s.Format, settingsFormat)
	}
	if s.Version < 1 || s.Version > settingsVersion {
		return keptSettings{}, fmt.Errorf("format version %d; this app reads up to %d", s.Version, settingsVersion)
	}
	switch s.Theme {
	case "", themeDark, themeBright:
	default:
		return keptSettings{}, fmt.Errorf("theme %q, want %q or %q", s.Theme, themeDark, themeBright)
	}
	return s, nil
}

// Theme returns the theme the user chose (themeDark or themeBright), and
// false before the load or when none was chosen.
func (k *Keeper) Theme() (string, bool) {
	if !k.Loaded() {
		return "", false
	}
	k.mu.Lock()
	defer k.mu.Unlock()
	return k.settings.Theme, k.settings.Theme != ""
}

// SetTheme records the theme the user chose, written at once (a choice
// made before the load wins over the one loaded).
func (k *Keeper) SetTheme(theme string) {
	k.mu.Lock()
	k.settings.Theme = theme
	k.settingsDirty = true
	k.mu.Unlock()
	k.poke()
}

// writeSettings writes the app settings when they changed; a failure is
// kept to be shown and the write is tried again at the next change.
func (k *Keeper) writeSettings() {
	k.mu.Lock()
	b := k.backend
	if !k.settingsDirty || b == nil {
		k.mu.Unlock()
		return
	}
	s := k.settings
	k.settingsDirty = false
	k.mu.Unlock()
	s.Format, s.Version = settingsFormat, settingsVersion
	data, err := json.MarshalIndent(s, "", "  ")
	if err == nil {
		err = b.Save(settingsDoc, data)
	}
	k.mu.Lock()
	if err != nil {
		k.settingsErr = fmt.Errorf("your theme could not be saved: %v", err)
		k.settingsDirty = true
	} else {
		k.settingsErr = nil
	}
	k.mu.Unlock()
}
