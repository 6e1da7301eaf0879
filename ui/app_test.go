package ui

import (
	"bytes"
	"context"
	"encoding/json"
	"strings"
	"testing"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

func lifetimeDays(t *testing.T, resJSON []byte) float64 {
	t.Helper()
	var r struct {
		LifetimeDays *float64 `json:"lifetime_days"`
	}
	if err := json.Unmarshal(resJSON, &r); err != nil {
		t.Fatal(err)
	}
	if r.LifetimeDays == nil {
		t.Fatal("lifetime_days is null")
	}
	return *r.LifetimeDays
}

// demoWith returns the demo scenario file with one value replaced.
func demoWith(t *testing.T, obj, key string, v any) []byte {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal(scenario.DemoJSON(), &m); err != nil {
		t.Fatal(err)
	}
	m[obj].(map[string]any)[key] = v
	data, err := json.Marshal(m)
	if err != nil {
		t.Fatal(err)
	}
	return data
}

func TestAppEditFrameRateByMouseAndKeys(t *testing.T) {
	a := newApp(t, 1280, 720)
	before := lifetimeDays(t, a.ResultJSON())
	box, ok := a.Debug().Fields["node.vision.fps"]
	if !ok {
		t.Fatal("no fps field on screen")
	}
	click(a, box)
	if d := a.Debug(); d.Focus != "node.vision.fps" || !d.Selected {
		t.Fatalf("after the click: focus %q selected %v", d.Focus, d.Selected)
	}
	a.step(keys(KeyBackspace))
	a.step(chars("10"))
	a.step(keys(KeyEnter))
	after := lifetimeDays(t, a.ResultJSON())
	if !(after < before) {
		t.Errorf("fps 5 → 10: lifetime %g → %g days; want shorter", before, after)
	}
	s, err := scenario.Parse(a.ScenarioJSON())
	if err != nil || s.Node.Vision.FPS != 10 {
		t.Errorf("scenario after the edit: fps %v, err %v; want 10", s.Node.Vision.FPS, err)
	}
	// The result shown is the engine's for the edited scenario.
	want, _ := json.Marshal(mustPlan(t, s))
	if !bytes.Equal(a.ResultJSON(), want) {
		t.Error("the app's result differs from plan.Run of its scenario")
	}
	if d := a.Debug(); d.Presses != 1 || d.Releases != 1 || d.Keys != 2 || d.Chars != 2 || d.Ticks != 5 {
		t.Errorf("counters %+v; want 1 press, 1 release, 2 keys, 2 chars, 5 ticks", d.Stats)
	}
}

func TestAppRefusesABadValueAndKeepsTheResult(t *testing.T) {
	a := newApp(t, 1280, 720)
	before := append([]byte(nil), a.ResultJSON()...)
	click(a, a.Debug().Fields["node.vision.fps"])
	a.step(chars("61"))
	a.step(keys(KeyEnter))

	_, err := scenario.Parse(demoWith(t, "node", "vision", map[string]any{"fps": 61, "frame_uj": 200}))
	if err == nil {
		t.Fatal("the engine takes 61 fps: the test needs a value out of range")
	}
	want := strings.TrimPrefix(err.Error(), "node.vision.fps: ")
	if got := a.Debug().Errors["node.vision.fps"]; got != want {
		t.Errorf("reason shown %q, want the engine's %q", got, want)
	}
	if !bytes.Equal(a.ResultJSON(), before) {
		t.Error("a refused value changed the result")
	}
	if f := a.form.Row("node.vision.fps"); f.Text.Text != "61" || !f.Focused() {
		t.Errorf("the refused field: Text %q Focused %v; want the bad text kept in place, focused", f.Text.Text, f.Focused())
	}
}

func TestAppClearsCapacityToTheRatedValue(t *testing.T) {
	a := newApp(t, 1280, 720)
	tabTo(t, a, "cells.capacity_mah")
	a.step(chars("9500"))
	a.step(keys(KeyEnter))
	s, _ := scenario.Parse(a.ScenarioJSON())
	if s.Cells.CapacityMAh != 9500 {
		t.Fatalf("capacity after typing 9500: %v", s.Cells.CapacityMAh)
	}
	a.step(keys(KeySelectAll, KeyBackspace))
	a.step(keys(KeyEnter))
	s, _ = scenario.Parse(a.ScenarioJSON())
	if s.Cells.CapacityMAh != 0 {
		t.Errorf("capacity after clearing: %v, want unset (0)", s.Cells.CapacityMAh)
	}
	if f := a.form.Row("cells.capacity_mah"); f.Text.Text != "19000" {
		t.Errorf("cleared capacity shows %q, want the D cell's rated 19000", f.Text.Text)
	}
}

func TestAppNudgeRecomputes(t *testing.T) {
	a := newApp(t, 1280, 720)
	before := lifetimeDays(t, a.ResultJSON())
	click(a, a.Debug().Fields["node.events.per_hour"])
	a.step(keys(KeyUp))
	if after := lifetimeDays(t, a.ResultJSON()); !(after < before) {
		t.Errorf("events 12 → 13 by arrow: lifetime %g → %g; want shorter", before, after)
	}
}

func TestRunMatchesTheEngine(t *testing.T) {
	full, err := plan.Plan(context.Background(), scenario.Demo(), plan.Inputs{}, plan.AdviceOptions{})
	if err != nil {
		t.Fatal(err)
	}
	fast, err := plan.RunWith(scenario.Demo(), plan.Inputs{})
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		o    RunOptions
		want plan.Result
		what string // the command line's equivalent
	}{
		{RunOptions{}, full, "plan --json"},
		{RunOptions{NoAdvice: true}, fast, "plan --json --fast"},
	} {
		got, err := Run(scenario.DemoJSON(), c.o)
		if err != nil {
			t.Fatal(err)
		}
		want, _ := json.Marshal(c.want)
		if !bytes.Equal(got, want) {
			t.Errorf("Run(demo, %+v) differs from `nodelife %s`", c.o, c.what)
		}
		if hasAdvice := bytes.Contains(got, []byte(`"advice":{`)); hasAdvice == c.o.NoAdvice {
			t.Errorf("Run(demo, %+v): advice present %v", c.o, hasAdvice)
		}
	}
	bad := demoWith(t, "cells", "capacity_mah", -5)
	_, want2 := scenario.Parse(bad)
	for _, o := range []RunOptions{{}, {NoAdvice: true}} {
		if _, err := Run(bad, o); err == nil || want2 == nil || err.Error() != want2.Error() {
			t.Errorf("Run(bad, %+v) error %v, want the engine's %v", o, err, want2)
		}
	}
}

func TestLoadBadScenarioKeepsTheCurrentOne(t *testing.T) {
	a := newApp(t, 1280, 720)
	scen, res := a.ScenarioJSON(), a.ResultJSON()
	bad := demoWith(t, "cells", "capacity_mah", -5)
	_, want := scenario.Parse(bad)
	if _, err := a.Load(bad); err == nil || err.Error() != want.Error() {
		t.Fatalf("Load(bad) error %v, want %v", err, want)
	}
	if !bytes.Equal(a.ScenarioJSON(), scen) || !bytes.Equal(a.ResultJSON(), res) {
		t.Error("a refused Load changed the scenario or the result")
	}
}

func TestLoadShowsTheScenario(t *testing.T) {
	a := newApp(t, 1280, 720)
	out := demoWith(t, "site", "placement", "outdoor")
	res, err := a.Load(out)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(res, a.ResultJSON()) {
		t.Error("Load's result is not the app's result")
	}
	if _, ok := a.Debug().Fields["site.outdoor_mean_c"]; !ok {
		t.Errorf("outdoor scenario: no outdoor temperature field; fields %v", a.Debug().Fields)
	}
	if !a.dirty {
		t.Error("Load did not ask for a redraw")
	}
}

func mustPlan(t *testing.T, s scenario.Scenario) plan.Result {
	t.Helper()
	r, err := plan.Run(s)
	if err != nil {
		t.Fatal(err)
	}
	return r
}
