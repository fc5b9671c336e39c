package ui

// handDevice leaves a device document (the device file's JSON) for the
// Engine onset editor, which takes it when it next comes to the top of
// the back stack (onsetScreen.Enter): the design screen's "Open in Engine
// onset".
func (e *Env) handDevice(doc string) { e.handed = doc }

// takeHandedDevice returns the device document left for the onset editor
// and forgets it; ok is false when there is none.
func (e *Env) takeHandedDevice() (doc string, ok bool) {
	doc, e.handed = e.handed, ""
	return doc, doc != ""
}
