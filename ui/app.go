package ui

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"runtime/debug"
	"slices"
	"sort"
	"sync"
	"time"

	"github.com/hajimehoshi/ebiten/v2"

	"nodelife/engine/plan"
	"nodelife/engine/report"
	"nodelife/engine/scenario"
	"nodelife/engine/weather"
)

// Host is the page around the app: what the app asks of it. Its methods are
// called on the app's goroutine outside the app's lock, so they may call the
// app back.
type Host interface {
	// Changed tells that the scenario or its answer changed: the scenario
	// file (to keep for the next visit) and the answer as plain text.
	Changed(scenarioJSON []byte, summary string)
	// Download offers data to the user as a file.
	Download(name, mimeType string, data []byte)
	// PickFile lets the user choose a scenario file, which the page hands
	// to App.Open.
	PickFile()
	// KeepOptions keeps the options kept for comparison for the next visit
	// (Options.KeptOptions), or forgets them when data is nil.
	KeepOptions(data []byte)
}

// Options configure an App. The zero value shows the demo in the light theme.
type Options struct {
	// Theme is the look; the zero Theme means Light().
	Theme Theme
	// Scenario is a scenario file to open; nil opens the built-in demo.
	Scenario []byte
	// Notice is a message to show across the page at start, e.g. why a
	// saved scenario could not be opened; NoticeError marks it a problem.
	Notice      string
	NoticeError bool
	// KeptOptions are the options kept at the last visit, as
	// Host.KeepOptions was given them; nil for none. Those that no longer
	// open are reported in the notice and left out.
	KeptOptions []byte
	// OnFirstFrame, if set, is called once after the first frame is drawn.
	OnFirstFrame func()
	// Host is the page; nil for none (downloads and the file picker do
	// nothing).
	Host Host
}

// App is the planner as an ebiten game. Its exported methods besides the
// ebiten ones (api.go) are safe to call from other goroutines, such as the
// browser's JavaScript callbacks.
type App struct {
	mu      sync.Mutex
	theme   Theme
	fonts   *Fonts
	scen    scenario.Scenario
	res     plan.Result
	resJSON []byte
	planner plan.Planner // reuses the site's table across node and cell edits
	answer  Answer
	form    *Form
	page    Page
	history History
	drag    struct {
		active bool
		from   scenario.Scenario // the scenario before the drag
	}
	advice     adviceJob
	menu       *Choice                    // the open header menu, or nil
	btnFocus   int                        // the page button with the keyboard (index into page.Buttons), or -1
	shortDays  []report.DaySpan           // the result's days under 12 h, for the chart
	kept       []keptOption               // scenarios kept to compare with this one
	weather    map[string]*weather.Series // weather files given this visit, by weatherKey
	waiting    *waiting                   // a scenario file waiting for its weather file
	showOpts   bool                       // the options view is showing
	notice     string
	noticeErr  bool
	sideScroll float64
	mouseX     float64
	mouseY     float64
	hoverStale bool // the read-out must be laid out again

	w, h, scale float64 // the window in CSS px and the device scale factor
	dirty       bool    // the screen must be drawn again
	white       *ebiten.Image
	onFirst     func()
	drawn       bool
	stats       Stats
	redraw      redrawClock // the last change from commit to frame
	failure     error       // a panic caught in Draw, returned by the next Update
	cursor      ebiten.CursorShapeType
	host        Host
	outbox      []func() // calls to the host, made after the lock is let go
	wantPNG     bool     // the chart is to be exported as a PNG at the next Draw
	repaint     []Rect   // regions to paint again when the rest of the screen stands
	pasted      []rune
	typed       string        // "path\x00text" last checked as it was typed
	tick        chan struct{} // closed at the next tick, for the advice's pacing
}

// Stats counts what the app has seen, for tests that must pace their input.
type Stats struct {
	Ticks    int64 `json:"ticks"`          // Updates run
	Frames   int64 `json:"frames"`         // frames actually drawn
	Presses  int64 `json:"mouse_presses"`  // primary button or touch presses
	Releases int64 `json:"mouse_releases"` // … and releases
	Keys     int64 `json:"keys"`           // special keys handled
	Chars    int64 `json:"chars"`          // characters typed
	Runs     int64 `json:"runs"`           // engine runs for a shown scenario
}

// New makes the app. It parses the fonts and runs the engine once.
func New(o Options) (*App, error) {
	if o.Theme == (Theme{}) {
		o.Theme = Light()
	}
	fonts, err := LoadFonts()
	if err != nil {
		return nil, err
	}
	s := scenario.Demo()
	if o.Scenario != nil {
		if s, err = scenario.Parse(o.Scenario); err != nil {
			return nil, err
		}
	}
	a := &App{theme: o.Theme, fonts: fonts, onFirst: o.OnFirstFrame, w: 1280, h: 720, scale: 1, host: o.Host,
		notice: o.Notice, noticeErr: o.NoticeError, hoverStale: true, btnFocus: -1}
	a.mouseX, a.mouseY = -1, -1
	a.redraw.commit(time.Now())
	r, err := a.run(s)
	// A kept scenario that names a weather file a new page does not have
	// waits for it, with the demo shown meanwhile.
	waits := needsWeather(err)
	if waits {
		s = scenario.Demo()
		r, err = a.run(s)
	}
	if err != nil {
		return nil, err
	}
	a.form = NewForm(s)
	a.restoreOptions(o.KeptOptions)
	a.setScenario(s, r)
	if waits {
		a.outbox = nil // the page is not told of the demo, so the kept scenario stays kept
		a.waitForWeather(o.Scenario, "The kept scenario")
	}
	return a, nil
}

// setScenario makes s and its result current, tells the page, and asks for
// the advice again. Call with a.mu held.
func (a *App) setScenario(s scenario.Scenario, r plan.Result) {
	a.stats.Runs++
	a.scen, a.res = s, r
	a.shortDays = shortDays(s, r.Daily)
	a.remarshal()
	a.answer = AnswerFor(s, r)
	if !a.drag.active {
		a.changed()
	}
	a.wantAdvice()
	a.layout()
	a.redraw.computed(a.stats.Runs, time.Now())
}

// remarshal writes the current result as JSON.
func (a *App) remarshal() {
	js, err := json.Marshal(a.res)
	if err != nil {
		panic("ui: result does not marshal: " + err.Error())
	}
	a.resJSON = js
}

// changed queues the page's change notice. Call with a.mu held.
func (a *App) changed() {
	if a.host == nil {
		return
	}
	data, summary := a.scen.JSON(), Summary(a.scen.Name, a.answer)
	if cs := comparisonSummary(a.optionsContent()); cs != "" {
		summary += " " + cs
	}
	a.outbox = append(a.outbox, func() { a.host.Changed(data, summary) })
}

// layout places everything for the current size and content and asks for a
// redraw. Call with a.mu held.
func (a *App) layout() {
	undo, redo := a.history.Depth()
	c := PageContent{Name: a.scen.Name, Result: a.res, ReservePct: a.scen.Plan.ReservePct, Answer: a.answer,
		Advice: a.advice.status, Notice: a.notice, NoticeError: a.noticeErr,
		CanUndo: undo > 0, CanRedo: redo > 0, SideScroll: a.sideScroll, ShortDays: a.shortDays}
	if a.showOpts {
		oc := a.optionsContent()
		c.Options = &oc
	}
	old := a.page.Buttons
	a.page = LayoutPage(a.w, a.h, c, a.fonts, a.theme, 1/a.scale)
	a.sideScroll = a.page.SideScroll
	a.keepButtonFocus(old)
	a.layoutForm()
	a.hoverStale = true
	a.dirty = true
}

// layoutForm places the inputs in their column, or takes them off the
// screen while the narrow options view hides them. Call with a.mu held.
func (a *App) layoutForm() {
	if a.page.Form.Empty() {
		a.form.Cancel()
		a.form.View = Rect{}
		return
	}
	a.form.Layout(a.page.Form, a.page.Screen, a.fonts, a.theme)
}

// resize takes a new window size (CSS px) and device scale factor.
func (a *App) resize(w, h, scale float64) {
	if w == a.w && h == a.h && scale == a.scale {
		return
	}
	a.w, a.h, a.scale = w, h, scale
	a.layout()
}

// setNotice shows msg across the page ("" removes it). Call with a.mu held.
func (a *App) setNotice(msg string, isErr bool) {
	if msg == a.notice && isErr == a.noticeErr {
		return
	}
	a.notice, a.noticeErr = msg, isErr
	a.layout()
}

// step applies one tick of input. Call with a.mu held.
func (a *App) step(in *Input) {
	a.stats.Ticks++
	if a.tick != nil {
		close(a.tick)
		a.tick = nil
	}
	if in.Pressed {
		a.stats.Presses++
	}
	if in.Released {
		a.stats.Releases++
	}
	a.stats.Keys += int64(len(in.Keys))
	a.stats.Chars += int64(len(in.Chars))

	// Shortcuts act on the whole app; the fields do not see them.
	keys := in.Keys[:0:0]
	for _, k := range in.Keys {
		switch k {
		case KeyUndo:
			a.undo(false)
		case KeyRedo:
			a.undo(true)
		case KeySave:
			a.act("save")
		case KeyOpen:
			a.act("open-file")
		default:
			keys = append(keys, k)
		}
	}
	in.Keys = keys

	// A press anywhere but on the focused button lets go of it.
	if in.Pressed && a.btnFocus >= 0 && !a.page.Buttons[a.btnFocus].At.Contains(in.MouseX, in.MouseY) {
		a.focusButton(-1)
	}
	// An open menu takes the pointer and keys first.
	if a.menuStep(in) {
		a.hover(in.MouseX, in.MouseY)
		return
	}
	// The notice's dismiss button and the header's buttons take a press.
	if in.Pressed && !a.page.Dismiss.Empty() && a.page.Dismiss.Contains(in.MouseX, in.MouseY) {
		a.setNotice("", false)
		in.Pressed = false
	}
	for i := range a.page.Buttons {
		b := &a.page.Buttons[i]
		if hv := b.At.Contains(in.MouseX, in.MouseY); hv != b.Hover {
			b.Hover, a.dirty = hv, true
		}
		if in.Pressed && b.Hover {
			in.Pressed = false
			if b.Enabled {
				a.act(b.ID) // may lay the page out again, buttons and all
				break
			}
		}
	}

	// The focused button takes its keys; the inputs get the rest.
	a.buttonKeys(in)

	var changed bool
	var edit *Edit
	if !a.page.Form.Empty() {
		a.form.Exits = len(tabOrder(a.page.Buttons)) > 0
		changed, edit = a.form.Update(in)
	}
	if edit != nil {
		a.form.Settle(a.apply(*edit), a.scen)
		changed = true
	}
	if a.checkTyping() {
		changed = true
	}
	// Tab past the last input (or Shift+Tab before the first), once the
	// input has let go, goes on to the buttons.
	if dir := a.form.TakeExit(); dir != 0 {
		if order := tabOrder(a.page.Buttons); len(order) > 0 {
			i := order[0]
			if dir < 0 {
				i = order[len(order)-1]
			}
			a.focusButton(i)
		}
		changed = true
	}
	if changed {
		a.layoutForm() // help and error lines may have changed
		a.dirty = true
	}

	// The scrolling column.
	if in.WheelY != 0 && a.page.Side.Contains(in.MouseX, in.MouseY) && a.form.OpenList() == nil {
		if y := clampScroll(a.sideScroll-in.WheelY*wheelLinePx, a.page.SideContent, a.page.Side.H); y != a.sideScroll {
			a.sideScroll = y
			a.layout()
		}
	}
	a.hover(in.MouseX, in.MouseY)
	a.maybeStartAdvice()
}

// The keyboard's Tab order is the header's buttons left to right, then the
// options view's while it shows, in reading order (keep and back, then each
// column's Edit and Remove), then the inputs while they show, and round
// again; Shift+Tab goes the other way. Disabled buttons are skipped. With
// nothing focused, Tab still starts at the first input and Shift+Tab at the
// last, as before the buttons joined the order: the inputs are what the
// keyboard is mostly for, and people and tests rely on it. So Shift+Tab from
// the first input reaches the last button and Tab from the last input the
// first header button. On a focused button Enter or Space acts, Escape lets
// go of it; a mouse press anywhere else lets go of it too. Only one thing
// has the keyboard: a button or an input.

// tabOrder lists the enabled buttons of bs in Tab order: by reading order,
// top to bottom, then left to right (the options view lays its buttons out
// from the right, so their order in bs is not the reading order).
func tabOrder(bs []Button) []int {
	var order []int
	for i, b := range bs {
		if b.Enabled {
			order = append(order, i)
		}
	}
	sort.SliceStable(order, func(p, q int) bool {
		r, s := bs[order[p]].At, bs[order[q]].At
		if math.Abs(r.Y-s.Y) > 1 { // a row's buttons share their top
			return r.Y < s.Y
		}
		return r.X < s.X
	})
	return order
}

// focusButton gives the keyboard to page button i, or to none with -1. A
// focused input lets go first: callers move the focus here only once the
// input has nothing typed to commit (Tab out of the rows commits, as Tab
// between rows does, before TakeExit reports it).
func (a *App) focusButton(i int) {
	if i >= 0 && a.form.Focused() != nil {
		a.form.Blur()
		a.layoutForm() // its help shrinks back to one line
	}
	a.markButton(i)
}

// markButton notes page button i (or none, -1) as the one with the keyboard,
// for step and for the focus ring.
func (a *App) markButton(i int) {
	for j := range a.page.Buttons {
		a.page.Buttons[j].Focused = j == i
	}
	a.btnFocus, a.dirty = i, true
}

// keepButtonFocus finds the focused button again after a layout replaced
// old, the buttons before: the one with the same ID (the same one of two
// alike, as the header's Options and the view's Back to the chart, else
// the first alike), else the next enabled one in the old Tab order that is
// still there, else none.
func (a *App) keepButtonFocus(old []Button) {
	i := a.btnFocus
	a.btnFocus = -1
	if i < 0 || i >= len(old) {
		return
	}
	// nth is which of the buttons with its ID button k of bs is.
	nth := func(bs []Button, k int) int {
		n := 0
		for j := range k {
			if bs[j].ID == bs[k].ID {
				n++
			}
		}
		return n
	}
	// find is the n-th new button with id, if it is enabled, or -1.
	find := func(id string, n int) int {
		for j, b := range a.page.Buttons {
			if b.ID != id {
				continue
			}
			if n == 0 {
				if b.Enabled {
					return j
				}
				return -1
			}
			n--
		}
		return -1
	}
	j := find(old[i].ID, nth(old, i))
	if j < 0 {
		j = find(old[i].ID, 0)
	}
	if j < 0 {
		order := tabOrder(old)
		for _, k := range order[slices.Index(order, i)+1:] {
			if j = find(old[k].ID, nth(old, k)); j >= 0 {
				break
			}
		}
	}
	a.markButton(j)
}

// buttonKeys gives this tick's keys to the focused button: Tab and
// Shift+Tab move along the Tab order, Enter or Space act, Escape lets go.
// Keys after one that moved the focus into the inputs stay in in for them;
// the rest are taken out. While the inputs are hidden (the narrow options
// view) and nothing is focused, Tab starts at the buttons.
func (a *App) buttonKeys(in *Input) {
	if a.btnFocus < 0 {
		if a.page.Form.Empty() && in.Has(KeyTab) {
			if order := tabOrder(a.page.Buttons); len(order) > 0 {
				i := order[0]
				if in.Shift {
					i = order[len(order)-1]
				}
				a.focusButton(i)
			}
			in.Keys, in.Chars = nil, nil
		}
		return
	}
	var rest []Key
	for n, k := range in.Keys {
		if a.menu != nil {
			break // it opened: it has the keyboard from the next tick
		}
		if a.btnFocus < 0 {
			rest = in.Keys[n:]
			break
		}
		switch k {
		case KeyTab:
			a.tabFromButton(in.Shift)
		case KeyEnter:
			a.pressButton()
		case KeyEscape:
			a.focusButton(-1)
		}
	}
	if a.btnFocus >= 0 && a.menu == nil && slices.Contains(in.Chars, ' ') {
		a.pressButton()
	}
	in.Keys = rest
	if a.form.Focused() == nil {
		in.Chars = nil
	}
}

// pressButton acts as a click on the focused button. A menu opened so has
// its first item highlighted, so Enter picks something at once.
func (a *App) pressButton() {
	a.act(a.page.Buttons[a.btnFocus].ID) // may lay the page out again
	if a.menu != nil {
		a.menu.Highlight = 0
	}
}

// tabFromButton moves the focus from the focused button to the next one in
// the Tab order (the previous one with back); past either end to the first
// or last input while the inputs show, else round the buttons.
func (a *App) tabFromButton(back bool) {
	order := tabOrder(a.page.Buttons)
	pos := slices.Index(order, a.btnFocus)
	next := pos + 1
	if back {
		next = pos - 1
	}
	if next >= 0 && next < len(order) {
		a.markButton(order[next])
		return
	}
	if !a.page.Form.Empty() && len(a.form.Rows) > 0 {
		a.markButton(-1)
		row := 0
		if back {
			row = len(a.form.Rows) - 1
		}
		a.form.FocusRow(row)
		a.layoutForm() // the row's help grows to its full text
		return
	}
	if back {
		a.markButton(order[len(order)-1])
	} else {
		a.markButton(order[0])
	}
}

// hover lays out the chart's read-out for the pointer at x, y.
func (a *App) hover(x, y float64) {
	if x == a.mouseX && y == a.mouseY && !a.hoverStale {
		return
	}
	a.mouseX, a.mouseY, a.hoverStale = x, y, false
	v := &a.page.chart
	inside := v.HoverArea().Contains(x, y) && a.form.OpenList() == nil && !a.form.Dragging() &&
		(a.page.Mode == Wide || a.page.Side.Contains(x, y))
	switch {
	case inside:
		a.page.hover = layoutHover(v, x, y, a.fonts, a.theme)
		a.dirty = true
	case a.page.hover.Day >= 0:
		a.page.hover = hoverView{Day: -1}
		a.dirty = true
	}
}

// apply checks an edit with the engine and, if it is good, recomputes. It
// returns the engine's reason for refusing it, or "". A slider's drag is one
// step of the history, recorded when it ends.
func (a *App) apply(e Edit) string {
	a.redraw.commit(time.Now())
	s, err := applyEdit(a.scen, e)
	if err != nil {
		return reason(err, e.Path)
	}
	same := bytes.Equal(s.JSON(), a.scen.JSON())
	if e.Drag && !a.drag.active {
		a.drag.active, a.drag.from = true, a.scen
	}
	if !e.Drag && a.drag.active { // the drag ends
		a.drag.active = false
		if !bytes.Equal(s.JSON(), a.drag.from.JSON()) {
			a.history.Record(a.drag.from)
		}
		if same {
			a.changed()
			a.layout()
			return ""
		}
	} else if same {
		return ""
	} else if !e.Drag {
		a.history.Record(a.scen)
	}
	r, err := a.run(s)
	if err != nil {
		return reason(err, e.Path)
	}
	if a.notice != "" && !a.noticeErr {
		a.notice = "" // an info notice is about what came before
	}
	a.setScenario(s, r)
	return ""
}

// undo takes a step back (or forward with redo) in the history.
func (a *App) undo(redo bool) {
	if a.drag.active || a.form.Dragging() {
		return
	}
	var s scenario.Scenario
	var ok bool
	if redo {
		s, ok = a.history.Redo(a.scen)
	} else {
		s, ok = a.history.Undo(a.scen)
	}
	if !ok {
		return
	}
	a.redraw.commit(time.Now())
	r, err := a.run(s)
	if err != nil {
		a.setNotice("That step cannot be shown: "+err.Error(), true)
		return
	}
	a.setScenario(s, r)
	a.form.Sync(s)
	a.form.Cancel() // a typed value or a refusal belonged to the scenario left
	a.layoutForm()
}

// Update is ebiten's tick: one input snapshot, handed to the widgets.
func (a *App) Update() (err error) {
	defer func() {
		if r := recover(); r != nil {
			err = fmt.Errorf("ui: %v\n%s", r, debug.Stack())
		}
	}()
	a.mu.Lock()
	if a.failure != nil {
		a.mu.Unlock()
		return a.failure
	}
	in := ReadInput(a.scale)
	in.Chars = append(in.Chars, a.pasted...)
	a.pasted = nil
	a.step(&in)
	shape, newShape := a.cursorShape(in.MouseX, in.MouseY), false
	if shape != a.cursor {
		a.cursor, newShape = shape, true
	}
	calls := a.outbox
	a.outbox = nil
	a.mu.Unlock()
	// Calls into ebiten and the page are made without the lock: a
	// JavaScript callback into the app (nodelife.debug(), a paste) waits
	// for the lock and holds the browser's event loop while it waits.
	if newShape {
		ebiten.SetCursorShape(shape)
	}
	for _, c := range calls {
		c()
	}
	return nil
}

// cursorShape is the pointer's shape over x, y: a text cursor over typed
// values, a hand over what acts on a click.
func (a *App) cursorShape(x, y float64) ebiten.CursorShapeType {
	if r := a.form.OpenList(); r != nil && r.Choice.List.Contains(x, y) {
		return ebiten.CursorShapePointer
	}
	if a.menu != nil && a.menu.List.Contains(x, y) {
		return ebiten.CursorShapePointer
	}
	if a.form.View.Contains(x, y) {
		for _, r := range a.form.Rows {
			switch {
			case r.Slider != nil && r.Slider.Hit(x, y):
				return ebiten.CursorShapePointer
			case r.Box.Contains(x, y) && r.Text != nil:
				return ebiten.CursorShapeText
			case r.Box.Contains(x, y):
				return ebiten.CursorShapePointer
			}
		}
	}
	for _, b := range a.page.Buttons {
		if b.Enabled && b.At.Contains(x, y) {
			return ebiten.CursorShapePointer
		}
	}
	if a.page.Dismiss.Contains(x, y) {
		return ebiten.CursorShapePointer
	}
	return ebiten.CursorShapeDefault
}

// Draw paints the screen when something changed and leaves it alone when not
// (the app runs with the screen kept between frames).
func (a *App) Draw(screen *ebiten.Image) {
	a.mu.Lock()
	first := false
	var png *pendingPNG
	func() {
		defer func() {
			if r := recover(); r != nil {
				a.failure = fmt.Errorf("ui: drawing: %v\n%s", r, debug.Stack())
			}
		}()
		if !a.dirty && len(a.repaint) > 0 && a.white != nil {
			// Only these regions changed: paint the page again inside them.
			p := NewPainter(screen, a.scale, a.fonts, a.white)
			for _, r := range a.repaint {
				if !r.Empty() {
					drawPage(p.Clip(r), &a.page, a.theme)
				}
			}
			a.repaint = nil
			a.stats.Frames++
			return
		}
		if !a.dirty {
			return
		}
		a.repaint = nil
		if a.white == nil {
			a.white = newWhitePixel()
		}
		if a.wantPNG {
			a.wantPNG = false
			png = a.paintChartPNG()
		}
		p := NewPainter(screen, a.scale, a.fonts, a.white)
		drawPage(p, &a.page, a.theme)
		if !a.page.Form.Empty() {
			drawForm(p, a.form, a.theme)
			drawFormOverlay(p, a.form, a.theme)
		}
		if a.menu != nil {
			drawChoiceList(p, a.menu, a.theme)
		}
		a.dirty = false
		a.stats.Frames++
		a.redraw.drew(a.stats.Frames, time.Now())
		first = !a.drawn
		a.drawn = true
	}()
	a.mu.Unlock()
	if png != nil {
		a.finishChartPNG(png) // reads pixels back: without the lock, as Update's calls
	}
	if first && a.onFirst != nil {
		a.onFirst()
	}
}

// LayoutF tells ebiten the screen size: the window in device pixels, so one
// screen pixel is one device pixel.
func (a *App) LayoutF(outsideW, outsideH float64) (float64, float64) {
	scale := 1.0
	if m := ebiten.Monitor(); m != nil {
		scale = m.DeviceScaleFactor()
	}
	if scale <= 0 {
		scale = 1
	}
	a.mu.Lock()
	a.resize(outsideW, outsideH, scale)
	a.mu.Unlock()
	return outsideW * scale, outsideH * scale
}

// Layout is required by ebiten.Game; ebiten calls LayoutF instead.
func (a *App) Layout(outsideW, outsideH int) (int, int) {
	w, h := a.LayoutF(float64(outsideW), float64(outsideH))
	return int(w), int(h)
}
