package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// inputsDoc is the name of the document of last inputs in a Backend.
const inputsDoc = "inputs"

// inputsFormat and inputsVersion mark the document of last inputs.
const (
	inputsFormat  = "tubewright-inputs"
	inputsVersion = 1
)

// keptInputs is the document of last inputs: each calculator's input texts
// as typed, by input key (the keys of its description).
type keptInputs struct {
	Format      string                       `json:"format"`
	Version     int                          `json:"version"`
	Saved       time.Time                    `json:"saved"`
	Calculators map[string]map[string]string `json:"calculators"`
}

// errInputsSetAside marks the report of a damaged inputs document that was
// kept under another name.
var errInputsSetAside = errors.New("set aside")

// loadInputs reads the last inputs. A missing document is none; a damaged
// one, or one of a newer version, is kept under a dated name (never written
// over) and reported, and the calculators start from their defaults.
func loadInputs(b store.Backend) (map[sheet.ID]map[string]string, error) {
	data, err := b.Load(inputsDoc)
	if errors.Is(err, store.ErrNotFound) {
		return nil, nil
	}
	if err != nil {
		return nil, fmt.Errorf("your last inputs could not be read: %v", err)
	}
	m, perr := parseInputs(data)
	if perr == nil {
		return m, nil
	}
	aside := "inputs-damaged-" + time.Now().UTC().Format("20060102-150405")
	if err := b.Save(aside, data); err != nil {
		return nil, fmt.Errorf("your last inputs could not be read (%v) nor kept aside (%v); the calculators start from their defaults", perr, err)
	}
	if err := b.Delete(inputsDoc); err != nil {
		return nil, fmt.Errorf("your last inputs could not be read (%v); a copy is kept as %q; the calculators start from their defaults", perr, aside)
	}
	return nil, fmt.Errorf("your last inputs could not be read (%v); they were kept as %q and the calculators started from their defaults: %w", perr, aside, errInputsSetAside)
}

// parseInputs reads the document of last inputs, refusing anything else.
func parseInputs(data []byte) (map[sheet.ID]map[string]string, error) {
	if len(data) > store.MaxLibraryBytes {
		return nil, fmt.Errorf("%d bytes, more than %d MB", len(data), store.MaxLibraryBytes>>20)
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	var doc keptInputs
	if err := dec.Decode(&doc); err != nil {
		return nil, fmt.Errorf("not a document of last inputs: %v", err)
	}
	if doc.Format != inputsFormat {
		return nil, fmt.Errorf("format %q, want %q", doc.Format, inputsFormat)
	}
	if doc.Version < 1 || doc.Version > inputsVersion {
		return nil, fmt.Errorf("format version %d; this app reads up to %d", doc.Version, inputsVersion)
	}
	out := make(map[sheet.ID]map[string]string, len(doc.Calculators))
	for id, t := range doc.Calculators {
		if id == "" || t == nil {
			return nil, fmt.Errorf("calculator %q has no inputs", id)
		}
		out[sheet.ID(id)] = t
	}
	return out, nil
}

// marshalInputs writes the document of last inputs.
func marshalInputs(m map[sheet.ID]map[string]string) ([]byte, error) {
	doc := keptInputs{Format: inputsFormat, Version: inputsVersion, Saved: time.Now().UTC(), Calculators: map[string]map[string]string{}}
	for id, t := range m {
		doc.Calculators[string(id)] = t
	}
	return json.MarshalIndent(doc, "", "  ")
}
