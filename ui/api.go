package ui

import (
	"context"
	"encoding/json"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// Run plans a scenario file with its advice and returns the result as JSON:
// the same value `nodelife plan --json` prints for the file. A bad file returns the
// engine's error, whose text is what the command line prints.
func Run(data []byte) ([]byte, error) {
	s, err := scenario.Parse(data)
	if err != nil {
		return nil, err
	}
	r, err := plan.Plan(context.Background(), s, plan.Inputs{}, plan.AdviceOptions{})
	if err != nil {
		return nil, err
	}
	return json.Marshal(r)
}

// Load shows a scenario file and returns its result as JSON. A bad file
// returns the engine's error and leaves the app's scenario as it was.
func (a *App) Load(data []byte) ([]byte, error) {
	s, err := scenario.Parse(data)
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	defer a.mu.Unlock()
	r, err := a.planner.Run(s)
	if err != nil {
		return nil, err
	}
	a.form.Rebuild(s)
	a.setScenario(s, r)
	return a.resJSON, nil
}

// ScenarioJSON is the current scenario as a scenario file.
func (a *App) ScenarioJSON() []byte {
	a.mu.Lock()
	defer a.mu.Unlock()
	return a.scen.JSON()
}

// ResultJSON is the current result as JSON (as Run returns it).
func (a *App) ResultJSON() []byte {
	a.mu.Lock()
	defer a.mu.Unlock()
	return a.resJSON
}

// Debug is the app's state for tests that drive it through real input.
type Debug struct {
	Stats
	Width  float64 `json:"width"` // the window, CSS px
	Height float64 `json:"height"`
	Scale  float64 `json:"scale"` // device scale factor
	Mode   string  `json:"mode"`  // "wide" or "narrow"
	// Focus is the path of the field with the keyboard, or "".
	Focus    string `json:"focus"`
	Text     string `json:"text"`     // the focused field's text
	Selected bool   `json:"selected"` // … wholly selected
	// Fields are the value boxes by path, CSS px from the window's top left;
	// only fields scrolled into view are listed.
	Fields map[string]Rect `json:"fields"`
	// Errors are the refused values' reasons by path.
	Errors map[string]string `json:"errors"`
}

// Debug reports the app's state.
func (a *App) Debug() Debug {
	a.mu.Lock()
	defer a.mu.Unlock()
	d := Debug{Stats: a.stats, Width: a.w, Height: a.h, Scale: a.scale, Mode: "wide",
		Fields: map[string]Rect{}, Errors: map[string]string{}}
	if a.page.Mode == Narrow {
		d.Mode = "narrow"
	}
	for _, f := range a.form.Fields {
		if f.Box.Within(a.form.View) {
			d.Fields[f.Path] = f.Box
		}
		if f.Err != "" {
			d.Errors[f.Path] = f.Err
		}
	}
	if f := a.form.Focused(); f != nil {
		d.Focus, d.Text, d.Selected = f.Path, f.Text, f.Selected
	}
	return d
}
