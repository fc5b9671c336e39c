package sheet

import (
	"path/filepath"
	"reflect"
	"testing"

	"tubewright/calc/listen"
)

// TestListenToMatchesFile: a recording held in memory gives exactly the
// rows, warnings and cautions of the same recording read from its file
// (the app's microphone path and twcalc's file path cannot disagree), and
// a missing recording is blamed on the file input.
func TestListenToMatchesFile(t *testing.T) {
	t.Parallel()
	path := filepath.Join("..", "..", "testdata", "listen_sox_ring16.wav")
	want, err := listenSheet.Evaluate(map[string]string{"file": path, "lowest": "100 Hz"})
	if err != nil {
		t.Fatal(err)
	}
	rec, err := listen.ReadWAVFile(path)
	if err != nil {
		t.Fatal(err)
	}
	got, err := ListenTo(rec).Evaluate(map[string]string{"file": "microphone", "lowest": "100 Hz"})
	if err != nil {
		t.Fatal(err)
	}
	if !reflect.DeepEqual(got.Rows, want.Rows) || !reflect.DeepEqual(got.Warnings, want.Warnings) || !reflect.DeepEqual(got.Cautions, want.Cautions) {
		t.Errorf("in memory:\n%+v\nfrom the file:\n%+v", got, want)
	}
	if ListenTo(rec).ID != IDListen || listenSheet.Run == nil {
		t.Error("ListenTo changed the description's identity or its Run")
	}
	_, err = ListenTo(nil).Evaluate(map[string]string{"file": "microphone"})
	if fes := FieldErrors(err); len(fes) != 1 || fes[0].Key != "file" {
		t.Errorf("no recording: %v, want an error about file", err)
	}
}
