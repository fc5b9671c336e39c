package ui

import (
	"image"
	"tubewright/calc/sheet"

	"gioui.org/font"
	"gioui.org/io/key"
	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/text"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// Version is the build's version stamp, shown in the About line. Release
// builds set it with
//
//	go build -ldflags "-X tubewright/ui.Version=1.2.3" ./cmd/tubewright
var Version = "dev"

// readable is the widest a single column grows on large windows (see
// Page.Layout).
const readable = unit.Dp(760)

// App is the whole user interface: the catalog, the back stack of open
// screens and the top bar. Make one with NewApp and call Layout every frame.
type App struct {
	env     *Env
	screens map[sheet.ID]Screen
	stack   []sheet.ID
	entries []widget.Clickable
	list    widget.List
	back    widget.Clickable
	theme   themeToggle
	side    sideToggle
	welcome *Page
	bar     appBar
	home    appHome
}

// appHome holds the About line's text, made once, and the welcome pane's
// widgets and the Bench summary it shows, written again only when the
// Bench changes.
type appHome struct {
	about     string
	ws        []layout.Widget
	head      layout.Widget
	intro     layout.Widget
	carried   layout.Widget
	aboutW    layout.Widget
	benchKey  [4]float64
	benchFrom [2]string
	benchText string
}

// appBar holds the top bar's parts as widgets bound once (see layoutBar),
// and what they draw in this frame, so that a frame builds no closures.
type appBar struct {
	back, title, side, theme layout.Widget
	text                     string      // the title shown
	window                   image.Point // the window's size
}

// NewApp builds the app. invalidate asks the window for a frame (e.g.
// (*app.Window).Invalidate); it may be nil in tests.
func NewApp(invalidate func()) *App {
	a := &App{
		env:     NewEnv(invalidate),
		screens: make(map[sheet.ID]Screen),
		entries: make([]widget.Clickable, len(catalog)),
	}
	a.list.Axis = layout.Vertical
	a.env.open = a.Open
	a.welcome = NewPage(a.env)
	a.bar = appBar{back: a.layoutBack, title: a.layoutTitle, side: a.layoutSide, theme: a.layoutTheme}
	a.home.about = "Tubewright " + Version + ". Works offline: no network, no telemetry. " +
		"Each screen names the published methods it uses. Results that bear on safety come with cautions and " +
		"never replace local codes, standards or licensed practice."
	return a
}

// Env returns the environment shared by the app's screens.
func (a *App) Env() *Env { return a.env }

// Current returns the catalog ID of the screen on top, or "" when the
// catalog itself is showing.
func (a *App) Current() sheet.ID {
	if len(a.stack) == 0 {
		return ""
	}
	return a.stack[len(a.stack)-1]
}

// Depth returns the number of screens on the back stack.
func (a *App) Depth() int { return len(a.stack) }

// Screen returns the screen with the catalog ID id, building it on first
// use, or nil for an unknown ID.
func (a *App) Screen(id sheet.ID) Screen {
	if s, ok := a.screens[id]; ok {
		return s
	}
	e, ok := lookupEntry(id)
	if !ok {
		return nil
	}
	s := e.New(a.env)
	a.screens[id] = s
	return s
}

// Open pushes the screen with catalog ID id on the back stack. Unknown IDs
// and the screen already on top are ignored.
func (a *App) Open(id sheet.ID) {
	if id == a.Current() || a.Screen(id) == nil {
		return
	}
	a.leaveTop()
	a.stack = append(a.stack, id)
	a.enterTop()
	a.env.Invalidate()
}

// openRoot shows id as the only screen on the stack (a tap in the catalog).
func (a *App) openRoot(id sheet.ID) {
	if len(a.stack) == 1 && a.stack[0] == id {
		return
	}
	if a.Screen(id) == nil {
		return
	}
	a.leaveTop()
	a.stack = append(a.stack[:0], id)
	a.enterTop()
	a.env.Invalidate()
}

// Back pops the top screen and reports whether there was one.
func (a *App) Back() bool {
	if len(a.stack) == 0 {
		return false
	}
	a.leaveTop()
	a.stack = a.stack[:len(a.stack)-1]
	a.enterTop()
	a.env.Invalidate()
	return true
}

func (a *App) leaveTop() {
	if l, ok := a.Screen(a.Current()).(Leaver); ok {
		l.Leave()
	}
}

func (a *App) enterTop() {
	if e, ok := a.Screen(a.Current()).(Enterer); ok {
		e.Enter()
	}
}

// update handles the app's own events: Back (the Android key, browser
// history back, Escape on a keyboard, the Back button), the theme button
// and catalog taps. Escape while a text box had the focus in the last
// frame leaves the box, not the screen (see editorBox); the next Escape
// goes back.
func (a *App) update(gtx layout.Context) {
	typing := a.env.typing
	a.env.typing = false
	if a.back.Clicked(gtx) {
		a.Back()
	}
	a.theme.update(gtx, a.env)
	a.side.update(gtx, gtx.Constraints.Max)
	for i := range a.entries {
		if a.entries[i].Clicked(gtx) {
			a.openRoot(catalog[i].ID)
		}
	}
	// After the taps, so that a screen opened in this frame already claims
	// Back: the router keeps the filters asked for in the last frame.
	if len(a.stack) > 0 {
		// Only claim Back while a screen is open, so that at the catalog
		// the platform's Back leaves the app as people expect.
		for {
			ev, ok := gtx.Event(key.Filter{Name: key.NameBack}, key.Filter{Name: key.NameEscape})
			if !ok {
				break
			}
			ke, ok := ev.(key.Event)
			switch {
			case !ok || ke.State != key.Press:
			case ke.Name == key.NameEscape && typing:
				gtx.Execute(key.FocusCmd{})
				a.env.Invalidate()
			default:
				a.Back()
			}
		}
	}
}

// Layout handles events and draws the app into the whole window: the top
// bar, and below it the catalog beside the screen on wide windows (unless
// hidden), or the screen alone (the catalog when none is open).
func (a *App) Layout(gtx layout.Context) layout.Dimensions {
	a.update(gtx)
	fill(gtx, a.env.Colors.Background, gtx.Constraints.Max)
	gtx.Constraints.Min = gtx.Constraints.Max
	window := gtx.Constraints.Max
	wide := a.side.beside(gtx, window)
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions { return a.layoutBar(gtx, window) }),
		layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min = gtx.Constraints.Max
			if !wide {
				if s := a.Screen(a.Current()); s != nil {
					return a.layoutCentred(gtx, s)
				}
				return a.layoutCatalog(gtx, true)
			}
			side := sideWidth(gtx, window.X)
			return layout.Flex{}.Layout(gtx,
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints = layout.Exact(image.Pt(side, gtx.Constraints.Max.Y))
					fill(gtx, a.env.Colors.Surface, gtx.Constraints.Max)
					return a.layoutCatalog(gtx, false)
				}),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					sz := image.Pt(gtx.Dp(1), gtx.Constraints.Max.Y)
					fill(gtx, a.env.Colors.Divider, sz)
					return layout.Dimensions{Size: sz}
				}),
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints.Min = gtx.Constraints.Max
					if s := a.Screen(a.Current()); s != nil {
						return a.layoutCentred(gtx, s)
					}
					return a.layoutWelcome(gtx)
				}),
			)
		}),
	)
}

// layoutCentred draws the screen s at most screenMax wide, centred in the
// space it is given.
func (a *App) layoutCentred(gtx layout.Context, s Screen) layout.Dimensions {
	gtx.Constraints.Min = gtx.Constraints.Max
	return layout.N.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		w := min(gtx.Constraints.Max.X, gtx.Dp(screenMax))
		gtx.Constraints = layout.Exact(image.Pt(w, gtx.Constraints.Max.Y))
		return a.layoutScreen(gtx, s)
	})
}

// layoutBar draws the top bar of a window of size window: Back when a
// screen is open, the title, the list button (a screen open on a wide
// window) and the theme button. Its parts are widgets bound once in NewApp,
// and the children sit in an array on the stack, so an unchanged frame
// allocates nothing here.
func (a *App) layoutBar(gtx layout.Context, window image.Point) layout.Dimensions {
	a.bar.text = "Tubewright"
	if s := a.Screen(a.Current()); s != nil {
		a.bar.text = s.Title()
	}
	a.bar.window = window
	h := gtx.Dp(56)
	size := image.Pt(gtx.Constraints.Max.X, h)
	fill(gtx, a.env.Colors.Accent, size)
	gtx.Constraints = layout.Exact(size)
	var children [4]layout.FlexChild
	n := 0
	if len(a.stack) > 0 {
		children[n] = layout.Rigid(a.bar.back)
		n++
	}
	children[n] = layout.Flexed(1, a.bar.title)
	n++
	if len(a.stack) > 0 {
		// At home the catalog is the page itself: nothing to hide.
		children[n] = layout.Rigid(a.bar.side)
		n++
	}
	children[n] = layout.Rigid(a.bar.theme)
	n++
	layout.Flex{Alignment: layout.Middle}.Layout(gtx, children[:n]...)
	return layout.Dimensions{Size: size}
}

// layoutBack draws the bar's Back button.
func (a *App) layoutBack(gtx layout.Context) layout.Dimensions {
	b := material.Button(a.env.Theme, &a.back, "‹ Back")
	b.Background = a.env.Colors.Accent
	b.Color = a.env.Colors.OnAccent
	b.TextSize = unit.Sp(17)
	b.Inset = layout.Inset{Left: 12, Right: 16, Top: 10, Bottom: 10}
	b.CornerRadius = 0
	gtx.Constraints.Min.Y = gtx.Constraints.Max.Y
	return b.Layout(gtx)
}

// layoutTitle draws the bar's title, cut with "…" when it is too long.
func (a *App) layoutTitle(gtx layout.Context) layout.Dimensions {
	in := layout.Inset{Left: 16, Right: 16}
	if len(a.stack) > 0 {
		in.Left = 4
	}
	gtx.Constraints.Min.Y = gtx.Constraints.Max.Y
	return layout.W.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		gtx.Constraints.Min.Y = 0
		return in.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			l := material.Label(a.env.Theme, unit.Sp(20), a.bar.text)
			l.Color = a.env.Colors.OnAccent
			l.Font.Weight = font.SemiBold
			l.MaxLines = 1
			l.Truncator = "…"
			return l.Layout(gtx)
		})
	})
}

// layoutSide draws the bar's button that shows or hides the catalog.
func (a *App) layoutSide(gtx layout.Context) layout.Dimensions {
	return a.side.layout(gtx, a.env, a.bar.window)
}

// layoutTheme draws the bar's Dark/Bright button.
func (a *App) layoutTheme(gtx layout.Context) layout.Dimensions {
	return a.theme.layout(gtx, a.env)
}

// layoutCatalog draws the list of calculators; with about set it ends with
// the About line (the phone home page).
func (a *App) layoutCatalog(gtx layout.Context, about bool) layout.Dimensions {
	n := len(catalog)
	if about {
		n++
	}
	cur := a.Current()
	return material.List(a.env.Theme, &a.list).Layout(gtx, n, func(gtx layout.Context, i int) layout.Dimensions {
		if i == len(catalog) {
			return layout.UniformInset(16).Layout(gtx, a.aboutLine)
		}
		e := catalog[i]
		return a.entries[i].Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			semantic.DescriptionOp(e.Title).Add(gtx.Ops)
			m := op.Record(gtx.Ops)
			dims := layout.Inset{Left: 16, Right: 16, Top: 12, Bottom: 12}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Min.X = gtx.Constraints.Max.X
				return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						l := material.Label(a.env.Theme, unit.Sp(17), e.Title)
						l.Font.Weight = font.SemiBold
						l.Color = a.env.Colors.Text
						return l.Layout(gtx)
					}),
					layout.Rigid(layout.Spacer{Height: 2}.Layout),
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						l := material.Body2(a.env.Theme, e.Summary)
						l.Color = a.env.Colors.Muted
						return l.Layout(gtx)
					}),
				)
			})
			call := m.Stop()
			if e.ID == cur {
				fill(gtx, a.env.Colors.Selected, dims.Size)
			}
			call.Add(gtx.Ops)
			line := image.Pt(dims.Size.X, gtx.Dp(1))
			st := op.Offset(image.Pt(0, dims.Size.Y-line.Y)).Push(gtx.Ops)
			fill(gtx, a.env.Colors.Divider, line)
			st.Pop()
			return dims
		})
	})
}

// aboutLine draws the version stamp and the app's promises.
func (a *App) aboutLine(gtx layout.Context) layout.Dimensions {
	l := material.Body2(a.env.Theme, a.home.about)
	l.Color = a.env.Colors.Muted
	l.Alignment = text.Start
	return l.Layout(gtx)
}

// layoutWelcome fills the right pane of a wide window when no screen is open.
func (a *App) layoutWelcome(gtx layout.Context) layout.Dimensions {
	h := &a.home
	if h.head == nil {
		h.head = Heading(a.env, "Pick a calculator")
		h.intro = Para(a.env, "Choose a calculator from the list. Fields accept the units you have at hand: "+
			"bar, psi or MPa; K, °C or °F (type degC, degF); m, mm or in; Hz or kHz.")
		h.carried = func(gtx layout.Context) layout.Dimensions { return layoutPara(gtx, a.env, h.benchText) }
		h.aboutW = a.aboutLine
	}
	b := a.env.Bench
	key, from := [4]float64{b.Temperature, b.Pressure, b.Frequency, 1}, [2]string{b.Gas, b.FrequencyFrom}
	if key != h.benchKey || from != h.benchFrom {
		h.benchKey, h.benchFrom, h.benchText = key, from, ""
		if sum := b.Summary(); sum != "" {
			h.benchText = "Carried between screens: " + sum + "."
		}
	}
	h.ws = append(h.ws[:0], h.head, h.intro)
	if h.benchText != "" {
		h.ws = append(h.ws, h.carried)
	}
	h.ws = append(h.ws, h.aboutW)
	return a.welcome.Layout(gtx, h.ws...)
}
