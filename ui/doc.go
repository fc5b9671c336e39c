// Package ui is Tubewright's user interface: the app shell (a catalog of
// calculators, a back stack, phone and wide layouts), the shared widgets
// every calculator screen uses (unit-aware number fields, a gas picker,
// result rows with units, caution boxes, plots, background jobs) and the
// screens themselves, one file each.
//
// The package follows Gio's immediate-mode style: every control keeps its
// state in a struct made once and owned by its screen; each frame a screen
// first handles the events of its controls, then (if an input changed)
// recomputes by calling the calc and gasprops packages, then lays out.
// There is no physics here and there are no package-level widgets.
//
// Numbers reach the screen only through the units package's formatters, so
// every value carries its unit and a non-finite value is shown as "—" with
// a reason instead of NaN or Inf. Safety results are always drawn next to a
// Caution box.
//
// Screens are listed in catalog.go, one line each, and built once by a
// constructor func(*Env) Screen when first opened.
//
// # Adding a screen
//
// A screen is a struct made once by its constructor, holding its widgets:
//
//	type tubeScreen struct {
//		env     *Env
//		page    *Page
//		length  *Field    // NewField(env, "Tube length", units.DimLength, "250 mm")
//		ends    *Choice   // NewChoice(env, "Ends", keys, labels)
//		gas     *GasPicker
//		results *Results
//		caution *Caution  // on every screen whose numbers bear on safety
//		plot    *Plot
//		solve   *Job[resonator.Result] // for anything slower than a frame
//	}
//
// Its Layout calls Update on each control (which reports a user change),
// recomputes through the calc packages when something changed (filling
// Results, setting a field's SetError for a units.RangeError about it,
// putting what other screens can use on env.Bench), then lays the widgets
// out with s.page.Layout(gtx, ...). Enter (optional) runs when the screen
// comes to the top, e.g. to take env.Bench.Frequency. Tests drive screens
// through Gio's input router (see harness_test.go: retype, tap, shown) and
// picture them with shoot (screenshot_test.go).
package ui
