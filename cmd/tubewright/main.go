// Command tubewright is the Tubewright app: offline bench calculators for
// thermoacoustic engines, refrigerators and heat pumps, in one Gio window.
// It builds for the desktop (cgo) and for the browser (GOOS=js
// GOARCH=wasm). It makes no network access and sends no telemetry.
//
// Usage:
//
//	tubewright            open the app window
//	tubewright -version   print the version stamp and exit
//
// The version stamp is set at build time:
//
//	go build -ldflags "-X tubewright/ui.Version=1.2.3" ./cmd/tubewright
package main

import (
	"fmt"
	"log"
	"os"
	"runtime/debug"

	"gioui.org/app"
	"gioui.org/op"
	"gioui.org/unit"

	"tubewright/ui"
)

func main() {
	mark("tw-main")
	if len(os.Args) > 1 && (os.Args[1] == "-version" || os.Args[1] == "--version") {
		fmt.Println("tubewright", ui.Version)
		return
	}
	go func() {
		w := new(app.Window)
		w.Option(app.Title("Tubewright"), app.Size(unit.Dp(1024), unit.Dp(720)), app.MinSize(unit.Dp(320), unit.Dp(400)))
		if err := run(w); err != nil {
			log.Fatal(err)
		}
		os.Exit(0)
	}()
	app.Main()
}

// run is the window's event loop: one ui.App, laid out on every frame.
func run(w *app.Window) error {
	// No garbage collection until the first frame is out: building the app
	// and shaping its first screen allocate about 10 MB that a collection
	// would only scan (in the browser, where Go runs on one thread, that
	// delays the first frame).
	gcPercent := debug.SetGCPercent(-1)
	a := ui.NewApp(w.Invalidate)
	keeper, porter, listen := openStorage(w)
	a.UseKeeper(keeper, porter)
	mark("tw-app")
	var ops op.Ops
	first := true
	for {
		ev := w.Event()
		listen(ev)
		switch e := ev.(type) {
		case app.DestroyEvent:
			closeStorage(keeper)
			return e.Err
		case app.FrameEvent:
			gtx := app.NewContext(&ops, e)
			a.Layout(gtx)
			e.Frame(gtx.Ops)
			if first {
				first = false
				mark("tw-frame")
				debug.SetGCPercent(gcPercent)
			}
		}
	}
}
