package ui

import (
	"strings"
	"testing"
	"time"

	"tubewright/calc/sheet"
)

// Listen to the tube through both front ends: the recordings made by sox
// (testdata/gen_listen_sox.sh), a ring-down with its decay time and Q, a
// steady tone searched in a band, a 24-bit stereo file, and a bad input
// naming its key (a lowest frequency above half the sample rate). The
// paths are relative to the ui folder, where both the test and twcalc run.
// A file that is not a WAV recording is TestListenAgreeNotWAV below: the
// terminal names the positional file input FILE, not --file.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDListen, name: "sox ring-down", texts: map[string]string{"file": "../testdata/listen_sox_ring16.wav"}},
	agreeCase{id: sheet.IDListen, name: "sox tone in a band", texts: map[string]string{"file": "../testdata/listen_sox_sine16.wav",
		"lowest": "100 Hz", "highest": "2 kHz"}},
	agreeCase{id: sheet.IDListen, name: "24-bit stereo", texts: map[string]string{"file": "../testdata/listen_sox_sine24.wav"}},
	agreeCase{id: sheet.IDListen, name: "lowest above half the rate", texts: map[string]string{"file": "../testdata/listen_sox_sine16.wav",
		"lowest": "5 kHz"}, errKey: "lowest"},
)

// The agreement test types a case and lays out a few frames without
// waiting for background work: let the listen screen wait for its
// analysis (it still runs off the UI goroutine).
func init() { listenInlineWait = 20 * time.Second }

// TestListenAgreeNotWAV: a file that is not a WAV recording is refused by
// both front ends with the same reason, named as the file input: the
// terminal as FILE, the app by marking the path field.
func TestListenAgreeNotWAV(t *testing.T) {
	if testing.Short() {
		t.Skip("builds twcalc; skipped with -short")
	}
	s, _ := sheet.Lookup(sheet.IDListen)
	c := agreeCase{id: sheet.IDListen, name: "not a WAV", texts: map[string]string{"file": "../go.mod"}, errKey: "file"}
	term, stderr := runTerminal(t, s, c)
	if term != nil {
		t.Fatal("terminal gave a result for go.mod")
	}
	const reason = `not a WAV recording: the file starts with "module tubew", not RIFF…WAVE`
	if want := `twcalc: FILE "../go.mod": ` + reason; stderr != want {
		t.Errorf("terminal error %q, want %q", stderr, want)
	}
	f := runApp(t, s, c)
	fes := sheet.FieldErrors(f.Err())
	if len(fes) != 1 || fes[0].Key != "file" {
		t.Fatalf("app error %v, want one about the file", f.Err())
	}
	if got := f.Field("file").ErrorText(); !strings.HasSuffix(got, reason) {
		t.Errorf("app field error %q, want it to end with %q", got, reason)
	}
}
