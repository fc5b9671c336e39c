package ui

import (
	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/linear"
)

// editorUndo is the one change of the device editor that can be taken
// back: a part removed, or a device opened (a saved device, an example, a
// design) over the one shown. Undo is offered until the device changes
// again or another message takes its place. Taking back a removal puts
// the same part back where it was, with its fields as they were; taking
// back an open puts back the whole device shown before.
type editorUndo struct {
	what    string           // the message beside Undo
	part    *partEditor      // the removed part; nil for an open
	at      int              // the removed part's place
	wasOpen bool             // the removed part was expanded
	before  editorState      // the device before an open
	button  widget.Clickable // Undo
	fresh   bool             // made this frame: the change it offers to undo does not clear it
}

// editorState is everything of the editor's device that an open replaces.
type editorState struct {
	name, gas, pressure, ambient, hot, notes string
	parts                                    []*partEditor
	selected                                 int
}

// snapshot returns the editor's device as it is.
func (e *deviceEditor) snapshot() editorState {
	return editorState{
		name: e.name, gas: e.gas.Text(), pressure: e.pressure.Text(), ambient: e.ambient.Text(),
		hot: e.hotText, notes: e.notes, parts: append([]*partEditor(nil), e.parts...), selected: e.selected,
	}
}

// restore puts back a device taken by snapshot.
func (e *deviceEditor) restore(st editorState) {
	e.name = st.name
	if err := e.gas.SetText(st.gas); err != nil {
		e.gas = NewGasPicker(e.env, st.gas)
	}
	e.pressure.SetText(st.pressure)
	e.ambient.SetText(st.ambient)
	e.hotText, e.notes = st.hot, st.notes
	e.parts = append(e.parts[:0:0], st.parts...)
	e.selected = st.selected
	e.changed = true
}

// open replaces the editor's device with f, saying what in the device
// status line with Undo beside it.
func (e *deviceEditor) open(f *linear.DeviceFile, what string) {
	before := e.snapshot()
	e.set(f)
	e.saved.say(e, what, false)
	e.undo = &editorUndo{what: what, before: before, fresh: true}
}

// openExample replaces the editor's device with the built-in example
// name, with Undo.
func (e *deviceEditor) openExample(name string) error {
	f, err := exampleDevice(name)
	if err != nil {
		return err
	}
	e.open(f, "Loaded the example "+exampleWords(name)+".")
	return nil
}

// exampleWords names a built-in example for a message.
func exampleWords(name string) string {
	switch name {
	case "engine":
		return "engine"
	case "heatpump":
		return "heat pump"
	}
	return name
}

// removePart removes part i, offering Undo in its place.
func (e *deviceEditor) removePart(i int) {
	p := e.parts[i]
	what := "Removed " + partTitle(i, p.file()) + "."
	e.undo = &editorUndo{what: what, part: p, at: i, wasOpen: e.selected == i, fresh: true}
	e.parts = append(e.parts[:i], e.parts[i+1:]...)
	if e.selected == i {
		e.selected = -1
	} else if e.selected > i {
		e.selected--
	}
	e.changed = true
}

// takeBack undoes the change on offer.
func (e *deviceEditor) takeBack() {
	u := e.undo
	e.undo = nil
	if u.part == nil {
		e.restore(u.before)
		e.saved.say(e, "The device shown before is back.", false)
		return
	}
	at := min(u.at, len(e.parts))
	e.parts = append(e.parts, nil)
	copy(e.parts[at+1:], e.parts[at:])
	e.parts[at] = u.part
	switch {
	case u.wasOpen:
		e.selected = at
	case e.selected >= at:
		e.selected++
	}
	e.changed = true
}

// updateUndo handles a tap on Undo (before the editor's other events).
func (e *deviceEditor) updateUndo(gtx layout.Context) {
	if e.undo != nil && e.undo.button.Clicked(gtx) {
		e.takeBack()
	}
}

// settleUndo ends the frame: a change of the device other than the one on
// offer withdraws the offer.
func (e *deviceEditor) settleUndo(changed bool) {
	if e.undo == nil {
		return
	}
	if changed && !e.undo.fresh {
		e.undo = nil
		return
	}
	e.undo.fresh = false
}

// openUndo returns the Undo of an open whose message is what, or nil.
func (e *deviceEditor) openUndo(what string) *editorUndo {
	if u := e.undo; u != nil && u.part == nil && u.what == what && what != "" {
		return u
	}
	return nil
}

// removedBar draws the message of a removal with its Undo, in the place
// of the part removed.
func (e *deviceEditor) removedBar(gtx layout.Context) layout.Dimensions {
	u := e.undo
	if u == nil || u.part == nil {
		return layout.Dimensions{}
	}
	env := e.env
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return Described("Part removed", func(gtx layout.Context) layout.Dimensions {
		return background(gtx, env.Colors.Selected, env.Colors.Outline, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			return layout.UniformInset(10).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				dims := keepFlow(gtx,
					keepMessage(env, "Removed part", u.what, false),
					func(gtx layout.Context) layout.Dimensions {
						return keepButton(env, gtx, &u.button, "Undo", true)
					})
				dims.Size.X = max(dims.Size.X, gtx.Constraints.Min.X)
				return dims
			})
		})
	})(gtx)
}
