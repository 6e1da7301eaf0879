package ui

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
)

// host records what the app asks of the page.
type host struct {
	changed   [][]byte
	summaries []string
	downloads []string // name: first bytes
	picks     int
	options   []string // what KeepOptions was given, in order
}

func (h *host) Changed(s []byte, summary string) {
	h.changed = append(h.changed, s)
	h.summaries = append(h.summaries, summary)
}
func (h *host) Download(name, mime string, data []byte) {
	h.downloads = append(h.downloads, name+": "+string(data[:min(len(data), 40)]))
}
func (h *host) PickFile()               { h.picks++ }
func (h *host) KeepOptions(data []byte) { h.options = append(h.options, string(data)) }

// newHosted is the demo app with a recording host, laid out at 1280×720.
func newHosted(t *testing.T) (*App, *host) {
	t.Helper()
	h := &host{}
	a, err := New(Options{Host: h})
	if err != nil {
		t.Fatal(err)
	}
	a.resize(1280, 720, 1)
	return a, h
}

// tick runs one tick as Update does: the input, then the host's calls.
func tick(a *App, in *Input) {
	a.mu.Lock()
	a.step(in)
	a.flush()
}

func TestAppUndoRedo(t *testing.T) {
	a, _ := newHosted(t)
	demo := string(a.ScenarioJSON())
	tabTo(t, a, "node.vision.fps")
	a.step(chars("10"))
	a.step(keys(KeyEnter))
	tabTo(t, a, "cells.chemistry")
	a.step(keys(KeyDown)) // the next chemistry, at once
	edited := string(a.ScenarioJSON())
	if d := a.Debug(); d.Undo != 2 || d.Redo != 0 || edited == demo {
		t.Fatalf("after two edits: undo %d redo %d", d.Undo, d.Redo)
	}
	tick(a, keys(KeyUndo))
	tick(a, keys(KeyUndo))
	if got := string(a.ScenarioJSON()); got != demo {
		t.Errorf("two undos: not the demo again")
	}
	if a.Debug().Values["node.vision.fps"] != "5" {
		t.Errorf("the fps field after undo shows %q, want 5", a.Debug().Values["node.vision.fps"])
	}
	tick(a, keys(KeyUndo)) // nothing left: nothing happens
	tick(a, keys(KeyRedo))
	tick(a, keys(KeyRedo))
	if got := string(a.ScenarioJSON()); got != edited {
		t.Error("two redos: not the edited scenario again")
	}
	// The header's buttons do the same.
	click(a, a.Debug().Buttons["undo"])
	if d := a.Debug(); d.Undo != 1 || d.Redo != 1 {
		t.Errorf("the undo button: undo %d redo %d, want 1 1", d.Undo, d.Redo)
	}
	if _, ok := a.Debug().Buttons["redo"]; !ok {
		t.Error("redo is not enabled after an undo")
	}
}

func TestAppUndoDropsATypedValue(t *testing.T) {
	a, _ := newHosted(t)
	tabTo(t, a, "node.vision.fps")
	a.step(chars("10"))
	a.step(keys(KeyEnter))
	a.step(chars("61"))
	a.step(keys(KeyEnter)) // refused
	tick(a, keys(KeyUndo))
	d := a.Debug()
	if d.Values["node.vision.fps"] != "5" || len(d.Errors) != 0 {
		t.Errorf("undo over a refused value: fps shows %q, errors %v; want 5 and none", d.Values["node.vision.fps"], d.Errors)
	}
}

func TestAppSliderDragIsOneUndoStep(t *testing.T) {
	a, h := newHosted(t)
	before := lifetimeDays(t, a.ResultJSON())
	sl := a.Debug().Sliders["node.events.per_hour"]
	y := sl.Track.Y + sl.Track.H/2
	tick(a, &Input{MouseX: sl.KnobX, MouseY: y, Pressed: true, Down: true})
	for _, f := range []float64{0.7, 0.8, 0.9} {
		tick(a, &Input{MouseX: sl.Track.X + f*sl.Track.W, MouseY: y, Down: true})
	}
	if a.Debug().Undo != 0 || len(h.changed) != 1 {
		t.Errorf("while dragging: undo %d, %d change notices; want 0 and only the first", a.Debug().Undo, len(h.changed))
	}
	tick(a, &Input{MouseX: sl.Track.X + 0.9*sl.Track.W, MouseY: y, Released: true})
	s, _ := scenario.Parse(a.ScenarioJSON())
	want := eventsStops[int(0.9*float64(len(eventsStops)-1)+0.5)]
	if s.Node.Events.PerHour != want || a.Debug().Values["node.events.per_hour"] != FormatNumber(want) {
		t.Errorf("events per hour after the drag: %g, field %q; want %g", s.Node.Events.PerHour, a.Debug().Values["node.events.per_hour"], want)
	}
	if after := lifetimeDays(t, a.ResultJSON()); !(after < before) {
		t.Errorf("more events: lifetime %g → %g", before, after)
	}
	if a.Debug().Undo != 1 || len(h.changed) != 2 {
		t.Errorf("after the drag: undo %d, %d change notices; want 1 and 2", a.Debug().Undo, len(h.changed))
	}
	tick(a, keys(KeyUndo))
	if s, _ := scenario.Parse(a.ScenarioJSON()); s.Node.Events.PerHour != 12 {
		t.Errorf("undo after the drag: %g events per hour, want the demo's 12", s.Node.Events.PerHour)
	}
}

func TestAppHostGetsChangesAndFiles(t *testing.T) {
	a, h := newHosted(t)
	tick(a, &Input{})
	if len(h.changed) != 1 || !strings.Contains(h.summaries[0], "lasts 4 y 10 mo") {
		t.Fatalf("at start: %d change notices, summary %q", len(h.changed), h.summaries)
	}
	tabTo(t, a, "plan.years")
	a.step(chars("6"))
	tick(a, keys(KeyEnter))
	if len(h.changed) != 2 || !bytes.Contains(h.changed[1], []byte(`"years": 6`)) {
		t.Errorf("after an edit: %d notices, last %s", len(h.changed), h.changed[len(h.changed)-1])
	}
	tick(a, keys(KeySave))
	for _, item := range []string{"export-json", "export-svg", "export-daily", "export-swaps"} {
		click(a, a.Debug().Buttons["export"])
		menu := a.Debug().Menu
		if menu == nil {
			t.Fatal("the export button opened no menu")
		}
		x, y := center(menu[item])
		tick(a, press(x, y))
		tick(a, release(x, y))
		if a.Debug().Menu != nil {
			t.Errorf("%s: the menu stays open", item)
		}
	}
	tick(a, keys(KeyOpen)) // Ctrl+O: the file picker at once
	want := []string{
		"brindle-market-grünerløkka-store-shelf-watcher-aisle-4.json: {",
		"brindle-market-grünerløkka-store-shelf-watcher-aisle-4-result.json: {\"format\":\"nodelife.result/1\"",
		"brindle-market-grünerløkka-store-shelf-watcher-aisle-4-chart.svg: <",
		"brindle-market-grünerløkka-store-shelf-watcher-aisle-4-daily.csv: date,soc_min_pct",
		"brindle-market-grünerløkka-store-shelf-watcher-aisle-4-swaps.csv: date,due,reason",
	}
	if len(h.downloads) != len(want) || h.picks != 1 {
		t.Fatalf("save, four exports, open: downloads %q, picks %d", h.downloads, h.picks)
	}
	for i, w := range want {
		if !strings.HasPrefix(h.downloads[i], w) {
			t.Errorf("download %d: %q, want it to start %q", i, h.downloads[i], w)
		}
	}
	// Escape closes the menu without acting.
	click(a, a.Debug().Buttons["export"])
	tick(a, keys(KeyEscape))
	if a.Debug().Menu != nil || len(h.downloads) != len(want) {
		t.Errorf("Escape on the menu: menu %v, %d downloads", a.Debug().Menu, len(h.downloads))
	}
}

func TestAppOpenFile(t *testing.T) {
	a, _ := newHosted(t)
	bad := demoWith(t, "cells", "capacity_mah", -5)
	_, want := scenario.Parse(bad)
	if err := a.Open(bad, "store-12.json"); err == nil {
		t.Fatal("a bad file opened")
	}
	if d := a.Debug(); !strings.Contains(d.Notice, "store-12.json") || !strings.Contains(d.Notice, want.Error()) {
		t.Errorf("notice %q; want the file's name and the engine's words %q", d.Notice, want.Error())
	}
	if a.page.Notice.Empty() || a.page.Dismiss.Empty() {
		t.Fatal("the notice is not on the page")
	}
	checkTexts(t, "notice", &a.page.notice, a.page.Notice)
	good := demoWith(t, "node", "vision", map[string]any{"fps": 2, "frame_uj": 200})
	if err := a.Open(good, "slow.json"); err != nil {
		t.Fatal(err)
	}
	if d := a.Debug(); d.Values["node.vision.fps"] != "2" || !strings.HasPrefix(d.Notice, "Opened slow.json") || d.Undo != 1 {
		t.Errorf("after opening: fps %q notice %q undo %d", d.Values["node.vision.fps"], d.Notice, d.Undo)
	}
	click(a, a.page.Dismiss)
	if a.Debug().Notice != "" || !a.page.Notice.Empty() {
		t.Error("Dismiss left the notice")
	}
}

func TestAppSavedScenarioNotice(t *testing.T) {
	a, err := New(Options{Notice: "The scenario kept in this browser could not be opened.", NoticeError: true})
	if err != nil {
		t.Fatal(err)
	}
	a.resize(1280, 720, 1)
	if a.page.Notice.Empty() || a.page.Form.Y < a.page.Notice.Bottom() {
		t.Errorf("notice %v, form %v: the notice must sit above the columns", a.page.Notice, a.page.Form)
	}
}

func TestAppPickAndSegmentsByPointer(t *testing.T) {
	a, _ := newHosted(t)
	// Outdoors by the placement's first segment; then a climate from its list.
	pl := a.Debug().Fields["site.placement"]
	click(a, Rect{pl.X, pl.Y, pl.W / 3, pl.H})
	s, _ := scenario.Parse(a.ScenarioJSON())
	if s.Site.Placement != scenario.Outdoor {
		t.Fatalf("placement %q after clicking the first segment", s.Site.Placement)
	}
	click(a, a.Debug().Fields["site.climate.preset"])
	d := a.Debug()
	if d.List.Path != "site.climate.preset" {
		t.Fatalf("no list open after clicking the climate: %+v", d.List)
	}
	click(a, d.List.Items["subarctic"])
	s, _ = scenario.Parse(a.ScenarioJSON())
	if s.Site.Climate.Preset != "subarctic" || a.Debug().List.Path != "" {
		t.Errorf("climate %q, list %q; want subarctic and the list closed", s.Site.Climate.Preset, a.Debug().List.Path)
	}
	if v := a.Debug().Values["site.climate.preset"]; v != "subarctic" {
		t.Errorf("the climate shows %q", v)
	}
}

func TestAppPasteAPosition(t *testing.T) {
	a, _ := newHosted(t)
	tabTo(t, a, "site.position")
	a.Paste("69.65° N,\n 18.96° E")
	a.mu.Lock()
	in := Input{Chars: a.pasted}
	a.pasted = nil
	a.mu.Unlock()
	a.step(&in)
	a.step(keys(KeyEnter))
	s, _ := scenario.Parse(a.ScenarioJSON())
	if s.Site.LatDeg != 69.65 || s.Site.LonDeg != 18.96 {
		t.Errorf("pasted position: %g, %g", s.Site.LatDeg, s.Site.LonDeg)
	}
}

func TestAppHoverReadout(t *testing.T) {
	a, _ := newHosted(t)
	area := a.Debug().Chart
	tick(a, &Input{MouseX: area.X + area.W/2, MouseY: area.Y + area.H/3})
	d := a.Debug()
	if d.Hover == "" {
		t.Fatal("no read-out over the chart")
	}
	h := a.page.hover
	if !h.Box.Within(a.page.Chart) {
		t.Errorf("read-out %v leaves the chart %v", h.Box, a.page.Chart)
	}
	checkTexts(t, "read-out", &h.list, h.Box)
	text := joined(&h.list)
	for _, want := range []string{"state of charge", "cell temperature", "load", "°C", "Wh"} {
		if !strings.Contains(text, want) {
			t.Errorf("read-out %q lacks %q", text, want)
		}
	}
	// The day follows the pointer; off the chart the read-out goes.
	tick(a, &Input{MouseX: area.Right() - 2, MouseY: area.Y + 10})
	if later := a.Debug().Hover; later <= d.Hover {
		t.Errorf("pointer to the right: %s, was %s", later, d.Hover)
	}
	tick(a, &Input{MouseX: 5, MouseY: 5})
	if a.Debug().Hover != "" {
		t.Error("the read-out stays with the pointer off the chart")
	}
}

func TestAppAdviceInTheBackground(t *testing.T) {
	a, h := newHosted(t)
	if a.Debug().Advice.State != "waiting" {
		t.Fatalf("advice %+v before the first frame", a.Debug().Advice)
	}
	a.advice.now = true
	tick(a, &Input{})
	if st := a.Debug().Advice.State; st != "running" && st != "done" {
		t.Fatalf("advice %q after a tick", st)
	}
	// A change cancels it and asks again; the old job's answer is dropped.
	tabTo(t, a, "plan.years")
	a.step(chars("6"))
	a.step(keys(KeyEnter))
	waitAdvice(t, a)
	var r struct {
		Advice *struct{ Sentences []string } `json:"advice"`
		End    string                        `json:"end"`
	}
	if err := json.Unmarshal(a.ResultJSON(), &r); err != nil || r.Advice == nil || len(r.Advice.Sentences) == 0 {
		t.Fatalf("no advice in the result: %v", err)
	}
	if !strings.Contains(r.Advice.Sentences[0], "6-year plan") {
		t.Errorf("advice %q is not the 6-year plan's", r.Advice.Sentences[0])
	}
	side := joined(&a.page.side)
	if !strings.Contains(side, r.Advice.Sentences[0][:20]) {
		t.Errorf("the advice is not on the page: %q", side)
	}
	tick(a, &Input{})
	if last := h.summaries[len(h.summaries)-1]; !strings.Contains(last, r.Advice.Sentences[0]) {
		t.Errorf("the summary lacks the advice: %q", last)
	}
}

// waitAdvice waits for the background advice to finish.
func waitAdvice(t *testing.T, a *App) {
	t.Helper()
	deadline := time.Now().Add(30 * time.Second)
	for {
		tick(a, &Input{})
		a.mu.Lock()
		st, done := a.advice.status.State, a.advice.done
		a.mu.Unlock()
		if st == AdviceDone || st == AdviceFailed {
			return
		}
		if done != nil {
			select {
			case <-done:
			case <-time.After(time.Until(deadline)):
				t.Fatal("the advice did not finish")
			}
		}
		if time.Now().After(deadline) {
			t.Fatal("the advice did not finish")
		}
	}
}

func TestSummary(t *testing.T) {
	a, _ := newHosted(t)
	got := Summary(a.scen.Name, a.answer)
	for _, want := range []string{a.scen.Name, "lasts 4 y 10 mo", "2032-01-12", "First swap: 2031-07-04", "Average load: 1.48 mW", "vision 67 %", "Caution:"} {
		if !strings.Contains(got, want) {
			t.Errorf("summary %q lacks %q", got, want)
		}
	}
}

func TestAppOpenMenu(t *testing.T) {
	a, h := newHosted(t)
	tabTo(t, a, "plan.years")
	a.step(chars("6"))
	a.step(keys(KeyEnter))
	choose := func(item string) {
		click(a, a.Debug().Buttons["open"])
		x, y := center(a.Debug().Menu[item])
		tick(a, press(x, y))
		tick(a, release(x, y))
	}
	choose("open-file")
	if h.picks != 1 {
		t.Errorf("Scenario file…: %d pickers", h.picks)
	}
	choose("open-demo")
	if got := string(a.ScenarioJSON()); got != string(scenario.Demo().JSON()) || !strings.HasPrefix(a.Debug().Notice, "Opened the demo") {
		t.Errorf("The demo: notice %q; scenario is the demo: %v", a.Debug().Notice, got == string(scenario.Demo().JSON()))
	}
	tick(a, keys(KeyUndo))
	if s, _ := scenario.Parse(a.ScenarioJSON()); s.Plan.Years != 6 {
		t.Errorf("undo after opening the demo: %d-year plan, want the edited 6", s.Plan.Years)
	}
}

func TestAppProgressRepaintsOnlyItsRegions(t *testing.T) {
	a, _ := newHosted(t)
	a.mu.Lock()
	defer a.mu.Unlock()
	a.advice.status = AdviceStatus{State: AdviceRunning, Done: 1, Total: 40}
	a.layout() // the advice has started: drawn in full once
	a.dirty = false
	a.advice.status.Done = 3
	a.layoutProgress()
	assert.False(t, a.dirty, "a progress step alone does not repaint the page")
	require.Len(t, a.repaint, 2)
	assert.Equal(t, a.page.Footer, a.repaint[0])
	assert.True(t, a.repaint[1].Within(a.page.Advice) && !a.repaint[1].Empty(), "the advice block, as far as it shows")
	assert.Contains(t, joined(&a.page.footer), "8 %", "the footer says how far (3 of 40)")

	// Anything else waiting to be drawn, or an open menu, repaints it all.
	a.repaint, a.dirty = nil, true
	a.advice.status.Done = 10
	a.layoutProgress()
	assert.True(t, a.dirty)
	a.dirty = false
	a.menu = &Choice{}
	a.layoutProgress()
	assert.True(t, a.dirty, "a menu over the page")
}
