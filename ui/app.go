package ui

import (
	"encoding/json"
	"fmt"
	"runtime/debug"
	"sync"

	"github.com/hajimehoshi/ebiten/v2"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// Options configure an App. The zero value shows the demo in the light theme.
type Options struct {
	// Theme is the look; the zero Theme means Light().
	Theme Theme
	// Scenario is a scenario file to open; nil opens the built-in demo.
	Scenario []byte
	// OnFirstFrame, if set, is called once after the first frame is drawn.
	OnFirstFrame func()
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

	w, h, scale float64 // the window in CSS px and the device scale factor
	dirty       bool    // the screen must be drawn again
	white       *ebiten.Image
	onFirst     func()
	drawn       bool
	stats       Stats
	failure     error // a panic caught in Draw, returned by the next Update
	textCursor  bool
}

// Stats counts what the app has seen, for tests that must pace their input.
type Stats struct {
	Ticks    int64 `json:"ticks"`          // Updates run
	Frames   int64 `json:"frames"`         // frames actually drawn
	Presses  int64 `json:"mouse_presses"`  // primary button or touch presses
	Releases int64 `json:"mouse_releases"` // … and releases
	Keys     int64 `json:"keys"`           // special keys handled
	Chars    int64 `json:"chars"`          // characters typed
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
	a := &App{theme: o.Theme, fonts: fonts, onFirst: o.OnFirstFrame, w: 1280, h: 720, scale: 1}
	a.form = NewForm(s)
	r, err := a.planner.Run(s)
	if err != nil {
		return nil, err
	}
	a.setScenario(s, r)
	return a, nil
}

// setScenario makes s and its result current. Call with a.mu held.
func (a *App) setScenario(s scenario.Scenario, r plan.Result) {
	js, err := json.Marshal(r)
	if err != nil {
		panic("ui: result does not marshal: " + err.Error())
	}
	a.scen, a.res, a.resJSON = s, r, js
	a.answer = AnswerFor(s, r)
	a.layout()
}

// layout places everything for the current size and content and asks for a
// redraw. Call with a.mu held.
func (a *App) layout() {
	a.page = LayoutPage(a.w, a.h, a.scen.Name, a.res, a.scen.Plan.ReservePct, a.answer, a.fonts, a.theme, 1/a.scale)
	a.form.Layout(a.page.Form, a.fonts, a.theme)
	a.dirty = true
}

// resize takes a new window size (CSS px) and device scale factor.
func (a *App) resize(w, h, scale float64) {
	if w == a.w && h == a.h && scale == a.scale {
		return
	}
	a.w, a.h, a.scale = w, h, scale
	a.layout()
}

// step applies one tick of input. Call with a.mu held.
func (a *App) step(in *Input) {
	a.stats.Ticks++
	if in.Pressed {
		a.stats.Presses++
	}
	if in.Released {
		a.stats.Releases++
	}
	a.stats.Keys += int64(len(in.Keys))
	a.stats.Chars += int64(len(in.Chars))
	changed, edit := a.form.Update(in)
	if edit != nil {
		a.form.Settle(a.apply(*edit))
		changed = true
	}
	if changed {
		a.form.Layout(a.page.Form, a.fonts, a.theme) // help and error lines may have changed
		a.dirty = true
	}
}

// apply checks an edit with the engine and, if it is good, recomputes. It
// returns the engine's reason for refusing it, or "".
func (a *App) apply(e Edit) string {
	s, err := withValue(a.scen, e.Path, e.Text)
	if err != nil {
		return reason(err, e.Path)
	}
	r, err := a.planner.Run(s)
	if err != nil {
		return reason(err, e.Path)
	}
	a.form.SetValues(s)
	a.setScenario(s, r)
	return ""
}

// Update is ebiten's tick: one input snapshot, handed to the widgets.
func (a *App) Update() (err error) {
	defer func() {
		if r := recover(); r != nil {
			err = fmt.Errorf("ui: %v\n%s", r, debug.Stack())
		}
	}()
	a.mu.Lock()
	defer a.mu.Unlock()
	if a.failure != nil {
		return a.failure
	}
	in := ReadInput(a.scale)
	a.step(&in)
	if want := a.form.hover >= 0; want != a.textCursor {
		a.textCursor = want
		shape := ebiten.CursorShapeDefault
		if want {
			shape = ebiten.CursorShapeText
		}
		ebiten.SetCursorShape(shape)
	}
	return nil
}

// Draw paints the screen when something changed and leaves it alone when not
// (the app runs with the screen kept between frames).
func (a *App) Draw(screen *ebiten.Image) {
	a.mu.Lock()
	first := false
	func() {
		defer func() {
			if r := recover(); r != nil {
				a.failure = fmt.Errorf("ui: drawing: %v\n%s", r, debug.Stack())
			}
		}()
		if !a.dirty {
			return
		}
		if a.white == nil {
			a.white = newWhitePixel()
		}
		p := NewPainter(screen, a.scale, a.fonts, a.white)
		drawPage(p, &a.page, a.theme)
		drawForm(p, a.form, a.theme)
		a.dirty = false
		a.stats.Frames++
		first = !a.drawn
		a.drawn = true
	}()
	a.mu.Unlock()
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
