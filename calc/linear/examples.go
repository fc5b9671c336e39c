package linear

import (
	"bytes"
	"embed"
	"fmt"
	"sort"
	"strings"
)

//go:embed examples/*.json
var exampleFiles embed.FS

// ExampleNames lists the built-in example devices ("engine", "heatpump").
// They are invented for the demo and stand for no real apparatus.
func ExampleNames() []string {
	ents, err := exampleFiles.ReadDir("examples")
	if err != nil {
		panic("calc: embedded examples missing: " + err.Error())
	}
	var names []string
	for _, e := range ents {
		names = append(names, strings.TrimSuffix(e.Name(), ".json"))
	}
	sort.Strings(names)
	return names
}

// ExampleFile returns the text of a built-in example device file.
func ExampleFile(name string) ([]byte, error) {
	b, err := exampleFiles.ReadFile("examples/" + name + ".json")
	if err != nil {
		return nil, fmt.Errorf("no example device %q; examples: %s", name, strings.Join(ExampleNames(), ", "))
	}
	return b, nil
}

// Example parses a built-in example device.
func Example(name string) (*Device, error) {
	b, err := ExampleFile(name)
	if err != nil {
		return nil, err
	}
	return ParseDevice(bytes.NewReader(b))
}
