package store

import (
	"fmt"
	"strings"

	"tubewright/calc/units"
)

// Text renders a pass as plain text for printing or pasting into a lab
// book: the time, each item with its tick, note and numbers, then the
// cautions. Lines end in "\n".
func (p *Pass) Text() string {
	var b strings.Builder
	title := p.Title
	if title == "" {
		title = "Safety pass"
	}
	fmt.Fprintf(&b, "%s\n", title)
	fmt.Fprintf(&b, "Saved: %s\n", p.Time.Format("2006-01-02 15:04:05 -07:00"))
	if p.Rig != "" {
		fmt.Fprintf(&b, "Rig: %s\n", oneLine(p.Rig))
	}
	done := 0
	for _, it := range p.Items {
		if it.Done {
			done++
		}
	}
	fmt.Fprintf(&b, "Items ticked: %d of %d\n\n", done, len(p.Items))
	for i, it := range p.Items {
		mark := "[ ]"
		if it.Done {
			mark = "[x]"
		}
		fmt.Fprintf(&b, "%2d. %s %s\n", i+1, mark, oneLine(it.Title))
		if it.Note != "" {
			fmt.Fprintf(&b, "      Note: %s\n", oneLine(it.Note))
		}
		for _, in := range it.Inputs {
			fmt.Fprintf(&b, "      %s: %s\n", oneLine(in.Label), oneLine(in.Text))
		}
		for _, v := range it.Verdicts {
			fmt.Fprintf(&b, "      %s %s: %s\n", strings.ToUpper(oneLine(v.Outcome)), oneLine(v.Check), oneLine(v.Why))
		}
		for _, n := range it.Numbers {
			shown := n.Shown
			if shown == "" {
				shown = units.FormatSI(n.Value, n.Unit)
			}
			fmt.Fprintf(&b, "      %s: %s\n", oneLine(n.Name), oneLine(shown))
		}
		for _, c := range it.Cautions {
			fmt.Fprintf(&b, "      CAUTION: %s\n", oneLine(c))
		}
	}
	if p.Notes != "" {
		fmt.Fprintf(&b, "\nNotes: %s\n", oneLine(p.Notes))
	}
	b.WriteString("\nCAUTIONS\n")
	for _, c := range p.Cautions {
		fmt.Fprintf(&b, "- %s\n", oneLine(c))
	}
	return b.String()
}

// oneLine folds line breaks and other control characters into spaces so
// that a note cannot break the layout of the export.
func oneLine(s string) string {
	return strings.Map(func(r rune) rune {
		if r < 0x20 || r == 0x7f {
			return ' '
		}
		return r
	}, s)
}
