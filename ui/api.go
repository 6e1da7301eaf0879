package ui

import (
	"context"
	"encoding/json"
	"fmt"
	"strings"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
	"nodelife/engine/weather"
)

// RunOptions choose what Run works out. The zero value is the whole plan.
type RunOptions struct {
	// NoAdvice leaves the advice out, as `nodelife plan --fast` does: one
	// simulation instead of the advice's many. Default false.
	NoAdvice bool
}

// Run plans a scenario file and returns the result as JSON: the same value
// `nodelife plan --json` prints for the file (`plan --json --fast` with
// o.NoAdvice). A bad file returns the engine's error, whose text is what the
// command line prints.
func Run(data []byte, o RunOptions) ([]byte, error) {
	s, err := scenario.Parse(data)
	if err != nil {
		return nil, err
	}
	var r plan.Result
	if o.NoAdvice {
		r, err = plan.RunWith(s, plan.Inputs{})
	} else {
		r, err = plan.Plan(context.Background(), s, plan.Inputs{}, plan.AdviceOptions{})
	}
	if err != nil {
		return nil, err
	}
	return json.Marshal(r)
}

// Load shows a scenario file and returns its result as JSON (without the
// advice, which follows in the background). A bad file returns the engine's
// error and leaves the app's scenario as it was. Load is a step of the undo
// history.
func (a *App) Load(data []byte) ([]byte, error) {
	a.mu.Lock()
	defer a.flush()
	if err := a.open(data); err != nil {
		return nil, err
	}
	return a.resJSON, nil
}

// Open shows a scenario file the user chose (by the file picker or by
// dropping it on the page), named name. A bad file is reported across the
// page, with the engine's words, and the scenario stays as it was.
//
// A file named .epw or .csv is a weather file (openWeather).
func (a *App) Open(data []byte, name string) error {
	a.mu.Lock()
	defer a.flush()
	if weather.FormatOf(name) != "" { // a weather file
		if err := a.openWeather(data, name); err != nil {
			a.setNotice(fmt.Sprintf("%s could not be used. %s", name, err), true)
			return err
		}
		return nil
	}
	if err := a.open(data); needsWeather(err) {
		a.waitForWeather(data, name)
		return err
	} else if err != nil {
		a.setNotice(fmt.Sprintf("%s could not be opened. %s", name, err), true)
		return err
	}
	a.setNotice("Opened "+name+". Ctrl+Z goes back to the scenario before it.", false)
	return nil
}

// open makes data the scenario. Call with a.mu held.
func (a *App) open(data []byte) error {
	a.redraw.commit(time.Now())
	s, err := scenario.Parse(data)
	if err != nil {
		return err
	}
	r, err := a.run(s)
	if err != nil {
		return err
	}
	if a.notice != "" && a.noticeErr {
		a.notice = ""
	}
	a.replace(s, r)
	return nil
}

// replace makes s, planned as r, the scenario on screen as one step of the
// history: the inputs are made anew for it and anything typed is dropped.
// Call with a.mu held.
func (a *App) replace(s scenario.Scenario, r plan.Result) {
	a.history.Record(a.scen)
	a.form.Cancel()
	a.form.Rebuild(s)
	a.setScenario(s, r)
}

// flush lets go of the lock and makes the calls to the host queued under it.
func (a *App) flush() {
	calls := a.outbox
	a.outbox = nil
	a.mu.Unlock()
	for _, c := range calls {
		c()
	}
}

// Paste types text into the focused field at the next tick, as the page's
// paste event delivers it.
func (a *App) Paste(text string) {
	a.mu.Lock()
	defer a.mu.Unlock()
	a.pasted = append(a.pasted, []rune(strings.Join(strings.Fields(text), " "))...)
}

// SetTheme changes the look, e.g. when the system turns dark.
func (a *App) SetTheme(th Theme) {
	a.mu.Lock()
	defer a.mu.Unlock()
	a.theme = th
	a.layout()
}

// ScenarioJSON is the current scenario as a scenario file.
func (a *App) ScenarioJSON() []byte {
	a.mu.Lock()
	defer a.mu.Unlock()
	return a.scen.JSON()
}

// ResultJSON is the current result as JSON (as Run returns it, with the
// advice once it is worked out).
func (a *App) ResultJSON() []byte {
	a.mu.Lock()
	defer a.mu.Unlock()
	return a.resJSON
}

// SliderDebug is a slider as tests see it.
type SliderDebug struct {
	Track Rect    `json:"track"`
	KnobX float64 `json:"knob_x"`
	Value float64 `json:"value"`
}

// Debug is the app's state for tests that drive it through real input.
type Debug struct {
	Stats
	Width  float64 `json:"width"` // the window, CSS px
	Height float64 `json:"height"`
	Scale  float64 `json:"scale"` // device scale factor
	Mode   string  `json:"mode"`  // "wide" or "narrow"
	Theme  string  `json:"theme"` // "light" or "dark"
	// Focus is the path of the input with the keyboard, or "".
	Focus    string `json:"focus"`
	Text     string `json:"text"`     // the focused input's text or chosen label
	Selected bool   `json:"selected"` // … wholly selected
	// Fields are the control boxes by path, CSS px from the window's top
	// left; only inputs scrolled into view are listed.
	Fields map[string]Rect `json:"fields"`
	// Values are what every input shows, by path.
	Values map[string]string `json:"values"`
	// Errors are the refused values' reasons by path.
	Errors map[string]string `json:"errors"`
	// Sliders are the sliders in view by path.
	Sliders map[string]SliderDebug `json:"sliders"`
	// List is the open drop-down's path and its items' boxes by value.
	List struct {
		Path  string          `json:"path"`
		Items map[string]Rect `json:"items"`
	} `json:"list"`
	Buttons map[string]Rect `json:"buttons"` // the header's enabled actions
	// FocusButton is the ID of the button with the keyboard, or "".
	FocusButton string          `json:"focus_button"`
	Menu        map[string]Rect `json:"menu"` // the open menu's items by action
	Undo        int             `json:"undo"` // steps that can be undone
	Redo        int             `json:"redo"` // … and redone
	Advice      struct {
		State string `json:"state"` // "waiting", "running", "done" or "failed"
		Done  int    `json:"done"`
		Total int    `json:"total"`
	} `json:"advice"`
	Notice  string `json:"notice"`
	Dismiss Rect   `json:"dismiss"` // the notice's dismiss button
	Hover   string `json:"hover"`   // the date of the chart's read-out, or ""
	Chart   Rect   `json:"chart"`   // the hover area: state of charge down to the bars
	Panel   Rect   `json:"panel"`   // the chart's whole panel, as the PNG export paints it
	// Options are the options view's column names, kept options first,
	// while the view shows; OptionsProblem says why they cannot be compared.
	Options        []string `json:"options"`
	OptionsProblem string   `json:"options_problem"`
	// Redraw is how long the last change took from its commit to the
	// screen, for the browser benchmarks.
	Redraw Redraw `json:"redraw"`
}

// Debug reports the app's state.
func (a *App) Debug() Debug {
	a.mu.Lock()
	defer a.mu.Unlock()
	d := Debug{Stats: a.stats, Width: a.w, Height: a.h, Scale: a.scale, Mode: "wide", Theme: "light",
		Fields: map[string]Rect{}, Values: map[string]string{}, Errors: map[string]string{},
		Sliders: map[string]SliderDebug{}, Buttons: map[string]Rect{}, Notice: a.notice, Dismiss: a.page.Dismiss}
	if a.page.Mode == Narrow {
		d.Mode = "narrow"
	}
	if a.theme.Palette == Dark().Palette {
		d.Theme = "dark"
	}
	for _, r := range a.form.Rows {
		if r.Box.Within(a.form.View) {
			d.Fields[r.Path] = r.Box
		}
		d.Values[r.Path] = r.Display()
		if e := r.Err(); e != "" {
			d.Errors[r.Path] = e
		}
		if s := r.Slider; s != nil && s.Track.Within(a.form.View) {
			d.Sliders[r.Path] = SliderDebug{Track: s.Track, KnobX: s.KnobX(), Value: s.Value}
		}
	}
	if r := a.form.Focused(); r != nil {
		d.Focus, d.Text = r.Path, r.Display()
		d.Selected = r.Text != nil && r.Text.Selected
	}
	if r := a.form.OpenList(); r != nil {
		c := r.Choice
		d.List.Path, d.List.Items = r.Path, map[string]Rect{}
		for i, o := range c.Options {
			d.List.Items[o.Value] = Rect{c.List.X + 1, c.List.Y + listPad + float64(i)*c.ItemH, c.List.W - 2, c.ItemH}
		}
	}
	for _, b := range a.page.Buttons {
		if b.Enabled {
			d.Buttons[b.ID] = b.At
		}
	}
	if a.btnFocus >= 0 {
		d.FocusButton = a.page.Buttons[a.btnFocus].ID
	}
	if m := a.menu; m != nil {
		d.Menu = map[string]Rect{}
		for i, o := range m.Options {
			d.Menu[o.Value] = Rect{m.List.X + 1, m.List.Y + listPad + float64(i)*m.ItemH, m.List.W - 2, m.ItemH}
		}
	}
	if a.page.options != nil {
		for _, k := range a.kept {
			d.Options = append(d.Options, k.Name())
		}
		d.Options = append(d.Options, currentName)
		d.OptionsProblem = a.page.options.Problem
	}
	d.Undo, d.Redo = a.history.Depth()
	d.Advice.State = [...]string{"waiting", "running", "done", "failed"}[a.advice.status.State]
	d.Advice.Done, d.Advice.Total = a.advice.status.Done, a.advice.status.Total
	if h := a.page.hover; h.Day >= 0 && h.Day < len(a.res.Daily) {
		d.Hover = a.res.Daily[h.Day].Date
	}
	d.Redraw = a.redraw.last
	d.Chart = a.page.chart.HoverArea()
	d.Panel = a.page.Chart
	if a.page.Mode == Narrow {
		d.Chart = intersect(d.Chart, a.page.Side)
	}
	return d
}

// intersect is the part of r inside o (empty when none).
func intersect(r, o Rect) Rect {
	x0, y0 := max(r.X, o.X), max(r.Y, o.Y)
	x1, y1 := min(r.Right(), o.Right()), min(r.Bottom(), o.Bottom())
	if x1 <= x0 || y1 <= y0 {
		return Rect{}
	}
	return Rect{x0, y0, x1 - x0, y1 - y0}
}
