//go:build !js

package main

import (
	"bytes"
	"context"
	"fmt"
	"image/png"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/cdproto/browser"
	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/cdproto/input"
	"github.com/chromedp/chromedp"

	"nodelife/engine/scenario"
)

// Debian's Chromium; the flags are the ones that render ebiten's WebGL2
// canvas as root with no GPU (../shared/design/STACK.md).
const chromium = "/usr/bin/chromium"

// Bounds on waiting. Under software GL the page is ready after about 8 s.
const (
	readyTimeout  = 60 * time.Second
	stepTimeout   = 15 * time.Second
	adviceTimeout = 60 * time.Second
	testTimeout   = 170 * time.Second
)

// outDir holds the screenshots, at the repository root.
var outDir = filepath.Join("..", "test-output")

// TestBrowser drives the built app in headless Chromium: the JavaScript API
// against the command line, then the app through real pointer and keyboard
// events (paced to ebiten's ticks), files, storage and the system theme.
// Screenshots of each main state go to test-output/; look at them.
func TestBrowser(t *testing.T) {
	for _, f := range []string{"nodelife.wasm", "wasm_exec.js"} {
		if _, err := os.Stat(filepath.Join("..", "static", f)); err != nil {
			t.Fatalf("static/%s is missing: run `make wasm` first (%v)", f, err)
		}
	}
	if _, err := os.Stat(chromium); err != nil {
		t.Fatalf("%s is missing: apt-get install -y chromium (`make test` installs it)", chromium)
	}
	cli := buildCommand(t)
	url, stopServer := serveStatic(t)
	ctx := startBrowser(t)
	if err := os.MkdirAll(outDir, 0o755); err != nil {
		t.Fatal(err)
	}
	open(t, ctx, url, 1280, 720, 1)

	dir := t.TempDir()
	demoFile := filepath.Join(dir, "demo.json")
	if err := os.WriteFile(demoFile, scenario.DemoJSON(), 0o644); err != nil {
		t.Fatal(err)
	}

	t.Run("run matches plan --json", func(t *testing.T) {
		out, err := exec.Command(cli, "plan", "--json", demoFile).Output()
		if err != nil {
			t.Fatalf("nodelife plan --json: %v", err)
		}
		want := decode(t, out)
		demo := jsString(string(scenario.DemoJSON()))
		for _, arg := range []string{demo, "JSON.parse(" + demo + ")"} { // a string and an object
			got, err := eval[string](ctx, stepTimeout, `JSON.stringify(nodelife.run(`+arg+`))`)
			if err != nil {
				t.Fatal(err)
			}
			if path, ok := firstDifference(decode(t, []byte(got)), want, "result"); !ok {
				t.Errorf("nodelife.run(%.20s…) differs from `nodelife plan --json` at %s", arg, path)
			}
		}
	})

	t.Run("run without the advice matches plan --json --fast", func(t *testing.T) {
		out, err := exec.Command(cli, "plan", "--json", "--fast", demoFile).Output()
		if err != nil {
			t.Fatalf("nodelife plan --json --fast: %v", err)
		}
		want := decode(t, out)
		if _, ok := want.(map[string]any)["advice"]; ok {
			t.Fatal("`plan --fast` gave advice: the test expects none")
		}
		demo := jsString(string(scenario.DemoJSON()))
		got, err := eval[string](ctx, stepTimeout, `JSON.stringify(nodelife.run(`+demo+`, {advice: false}))`)
		if err != nil {
			t.Fatal(err)
		}
		if path, ok := firstDifference(decode(t, []byte(got)), want, "result"); !ok {
			t.Errorf("nodelife.run(demo, {advice: false}) differs from `nodelife plan --json --fast` at %s", path)
		}
		thrown, err := eval[string](ctx, stepTimeout, `(() => {
			try { nodelife.run(`+demo+`, {advice: "no"}); return "no error"; }
			catch (e) { return e.name + ": " + e.message; }
		})()`)
		if err != nil || !strings.HasPrefix(thrown, "TypeError: nodelife.run: options.advice") {
			t.Errorf(`run(demo, {advice: "no"}) threw %q (%v), want a TypeError about options.advice`, thrown, err)
		}
	})

	t.Run("bad input is refused with the engine's message", func(t *testing.T) {
		bad := demoWith(t, map[string]any{"cells.capacity_mah": -5})
		badFile := filepath.Join(dir, "bad.json")
		if err := os.WriteFile(badFile, bad, 0o644); err != nil {
			t.Fatal(err)
		}
		_, parseErr := scenario.Parse(bad)
		if parseErr == nil {
			t.Fatal("the engine takes capacity -5: the test needs a bad value")
		}
		want := parseErr.Error()
		// The command line prints the same text after the file name.
		var stderr strings.Builder
		cmd := exec.Command(cli, "plan", "--json", badFile)
		cmd.Stderr = &stderr
		if err := cmd.Run(); err == nil || !strings.Contains(stderr.String(), badFile+": "+want) {
			t.Errorf("command line on the bad file: %v, stderr %q; want %q after the file name", err, stderr.String(), want)
		}

		type refusal struct {
			Rejected  bool   `json:"rejected"`
			IsError   bool   `json:"isError"`
			Message   string `json:"message"`
			Unchanged bool   `json:"unchanged"`
		}
		got, err := eval[refusal](ctx, stepTimeout, `(async () => {
			const before = JSON.stringify(nodelife.scenario());
			try { await nodelife.load(`+jsString(string(bad))+`); return {rejected: false}; }
			catch (e) { return {rejected: true, isError: e instanceof Error, message: e.message,
				unchanged: JSON.stringify(nodelife.scenario()) === before}; }
		})()`)
		if err != nil {
			t.Fatal(err)
		}
		if !got.Rejected || !got.IsError || got.Message != want || !got.Unchanged {
			t.Errorf("load(bad): %+v; want a rejection with an Error %q and the scenario unchanged", got, want)
		}
		thrown, err := eval[string](ctx, stepTimeout, `(() => {
			try { nodelife.run(`+jsString(string(bad))+`); return "no error"; }
			catch (e) { return (e instanceof Error ? "" : "not an Error: ") + e.message; }
		})()`)
		if err != nil || thrown != want {
			t.Errorf("run(bad) threw %q (%v), want %q", thrown, err, want)
		}
	})

	t.Run("the answer and its advice are on the page", func(t *testing.T) {
		waitLong(t, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the demo's advice")
		waitFor(t, ctx, `(s => s.includes("lasts 4 y 10 mo") && s.includes("Plan 1 visit"))(document.getElementById("summary").textContent)`,
			"the lifetime and the advice in the page's live region")
		screenshot(t, ctx, "browser-demo-1280x720")
	})

	t.Run("edit the frame rate on the canvas", func(t *testing.T) {
		before, err := eval[float64](ctx, stepTimeout, `nodelife.result().lifetime_days`)
		if err != nil {
			t.Fatal(err)
		}
		if _, err := eval[bool](ctx, stepTimeout, `window.changes = [], nodelife.addEventListener("change", e => changes.push(e.detail.summary)), true`); err != nil {
			t.Fatal(err)
		}
		box := scrollInto(t, ctx, "node.vision.fps")
		click(t, ctx, box)
		if d := debugState(t, ctx); d.Focus != "node.vision.fps" || !d.Selected {
			t.Fatalf("after clicking the fps field: focus %q, selected %v", d.Focus, d.Selected)
		}
		key(t, ctx, "Backspace", "Backspace", 8)
		waitFor(t, ctx, `nodelife.debug().text === ""`, "the field to be empty after Backspace")
		if _, err := chromedp.Run(ctx, chromedp.KeyEvent("10")); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.debug().text === "10"`, "the typed 10 in the field")
		frames := debugState(t, ctx).Frames
		start := time.Now()
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, fmt.Sprintf(`nodelife.result().lifetime_days < %v && nodelife.debug().frames > %d`, before, frames),
			"a shorter lifetime on screen after fps 5 → 10")
		t.Logf("Enter to the redrawn curve, 8 years at 10-minute steps: %d ms (software GL, key pacing included)", time.Since(start).Milliseconds())
		if fps, err := eval[float64](ctx, stepTimeout, `nodelife.scenario().node.vision.fps`); err != nil || fps != 10 {
			t.Errorf("scenario().node.vision.fps = %v (%v), want 10", fps, err)
		}
		waitFor(t, ctx, `changes.length > 0 && changes[0].includes("lasts")`, "a change event with the new summary")

		// A value out of range is refused in place; the result stays.
		waitLong(t, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the advice after the edit")
		res, _ := eval[string](ctx, stepTimeout, `JSON.stringify(nodelife.result())`)
		if _, err := chromedp.Run(ctx, chromedp.KeyEvent("61")); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.debug().text === "61"`, "the typed 61 (the field was selected after Enter)")
		waitFor(t, ctx, `!!nodelife.debug().errors["node.vision.fps"]`, "61 fps marked as it is typed, before Enter")
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, `!!nodelife.debug().errors["node.vision.fps"]`, "the refusal of 61 fps")
		if same, _ := eval[bool](ctx, stepTimeout, `JSON.stringify(nodelife.result()) === `+jsString(res)); !same {
			t.Error("a refused value changed the result")
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-refused-1280x720")
		key(t, ctx, "Escape", "Escape", 27)
		waitFor(t, ctx, `(d => d.focus === "" && !d.errors["node.vision.fps"])(nodelife.debug())`, "Escape to restore the field")
	})

	t.Run("the read-out follows the pointer over the chart", func(t *testing.T) {
		d := debugState(t, ctx)
		move(t, ctx, d.Chart.X+d.Chart.W*0.3, d.Chart.Y+d.Chart.H*0.4, false)
		first := debugState(t, ctx).Hover
		move(t, ctx, d.Chart.X+d.Chart.W*0.6, d.Chart.Y+d.Chart.H*0.4, false)
		second := debugState(t, ctx).Hover
		if first == "" || second <= first {
			t.Errorf("read-out dates %q then %q moving right; want a later day", first, second)
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-hover-1280x720")
		move(t, ctx, 4, 4, false)
		waitFor(t, ctx, `nodelife.debug().hover === ""`, "the read-out to go with the pointer")
	})

	t.Run("pick a chemistry, undo and redo", func(t *testing.T) {
		box := scrollInto(t, ctx, "cells.chemistry")
		click(t, ctx, box)
		waitFor(t, ctx, `nodelife.debug().list.path === "cells.chemistry"`, "the chemistry list")
		d := debugState(t, ctx)
		item, ok := d.List.Items["li-ion"]
		if !ok {
			t.Fatalf("no li-ion in the list: %v", d.List.Items)
		}
		move(t, ctx, item.X+20, item.Y+item.H/2, false)
		drawn(t, ctx)
		screenshot(t, ctx, "browser-list-1280x720")
		undoBefore := d.Undo
		click(t, ctx, item)
		waitFor(t, ctx, `(s => s.cells.chemistry === "li-ion" && s.cells.form === "18650")(nodelife.scenario())`,
			"lithium-ion in a form it is made in")
		if d := debugState(t, ctx); d.List.Path != "" || d.Values["cells.chemistry"] != "Li-ion" || d.Undo != undoBefore+1 {
			t.Errorf("after the pick: list %q, chemistry shows %q, undo %d (was %d)", d.List.Path, d.Values["cells.chemistry"], d.Undo, undoBefore)
		}
		chord(t, ctx, modCtrl, "z", "KeyZ", 90)
		waitFor(t, ctx, `nodelife.scenario().cells.chemistry === "li-socl2"`, "Ctrl+Z to bring the chemistry back")
		if d := debugState(t, ctx); d.Values["cells.form"] != "D" || d.Redo != 1 {
			t.Errorf("after undo: form shows %q, redo %d", d.Values["cells.form"], d.Redo)
		}
		chord(t, ctx, modCtrl|modShift, "Z", "KeyZ", 90)
		waitFor(t, ctx, `nodelife.scenario().cells.chemistry === "li-ion"`, "Shift+Ctrl+Z to redo the pick")
		chord(t, ctx, modCtrl, "z", "KeyZ", 90)
		waitFor(t, ctx, `nodelife.scenario().cells.chemistry === "li-socl2"`, "Ctrl+Z again")
	})

	t.Run("drag the events slider", func(t *testing.T) {
		scrollInto(t, ctx, "node.events.per_hour")
		d := debugState(t, ctx)
		sl := d.Sliders["node.events.per_hour"]
		y := sl.Track.Y + sl.Track.H/2
		mouse(t, ctx, input.DispatchMouseEventTypeMousePressed, sl.KnobX, y, "mouse_presses")
		for _, f := range []float64{0.7, 0.8, 0.9} {
			move(t, ctx, sl.Track.X+f*sl.Track.W, y, true)
		}
		waitFor(t, ctx, `nodelife.debug().sliders["node.events.per_hour"].value > 100`, "the knob to follow the pointer")
		if got := debugState(t, ctx).Undo; got != d.Undo {
			t.Errorf("mid-drag: undo %d, want %d (a drag is one step, recorded at its end)", got, d.Undo)
		}
		mouse(t, ctx, input.DispatchMouseEventTypeMouseReleased, sl.Track.X+0.9*sl.Track.W, y, "mouse_releases")
		waitFor(t, ctx, fmt.Sprintf(`(d => d.undo === %d && d.values["node.events.per_hour"] === String(nodelife.scenario().node.events.per_hour))(nodelife.debug())`, d.Undo+1),
			"one undo step and the field showing the dragged value")
		if ev, _ := eval[float64](ctx, stepTimeout, `nodelife.scenario().node.events.per_hour`); ev <= 100 {
			t.Errorf("events per hour after the drag: %g", ev)
		}
	})

	t.Run("Tab to a header button and export by keyboard", func(t *testing.T) {
		if debugState(t, ctx).Focus != "" {
			key(t, ctx, "Escape", "Escape", 27)
		}
		dl := t.TempDir()
		if _, err := chromedp.CallBrowser(ctx, browser.SetDownloadBehavior, browser.SetDownloadBehaviorParams{
			Behavior: browser.SetDownloadBehaviorBehaviorAllow, DownloadPath: dl}); err != nil {
			t.Fatal(err)
		}
		// Tab starts at the first input; Shift+Tab from there goes back
		// along the header's buttons, right to left.
		key(t, ctx, "Tab", "Tab", 9)
		if d := debugState(t, ctx); d.Focus == "" || d.FocusButton != "" {
			t.Fatalf("Tab with nothing focused: input %q, button %q; want the first input", d.Focus, d.FocusButton)
		}
		var seen []string
		for len(seen) < 6 && (len(seen) == 0 || seen[len(seen)-1] != "export") {
			chord(t, ctx, modShift, "Tab", "Tab", 9)
			d := debugState(t, ctx)
			if d.Focus != "" || d.FocusButton == "" {
				t.Fatalf("Shift+Tab after %v: input %q, button %q; want a header button alone", seen, d.Focus, d.FocusButton)
			}
			seen = append(seen, d.FocusButton)
		}
		if seen[len(seen)-1] != "export" {
			t.Fatalf("Shift+Tab from the first input went through %v, never to export", seen)
		}
		t.Logf("Shift+Tab from the first input: %v", seen)
		drawn(t, ctx)
		screenshot(t, ctx, "browser-focus-button-1280x720")
		checkFocusRing(t, "browser-focus-button-1280x720", debugState(t, ctx).Buttons["export"])

		// Enter opens the menu on its first item, Down moves to the chart's
		// SVG, Enter exports it.
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, `!!nodelife.debug().menu`, "Enter on Export… to open its menu")
		key(t, ctx, "ArrowDown", "ArrowDown", 40)
		key(t, ctx, "Enter", "Enter", 13)
		files := waitFiles(t, dl, 1)
		if len(files) != 1 {
			t.Errorf("downloads %v, want one", namesOf(files))
		}
		for name, data := range files {
			if !strings.HasSuffix(name, "-chart.svg") || !strings.Contains(string(data[:min(len(data), 200)]), "<svg") {
				t.Errorf("Down, Enter in the export menu downloaded %s (%.40q), want the chart's SVG", name, data)
			}
		}
		if d := debugState(t, ctx); d.FocusButton != "export" {
			t.Errorf("after the export: button %q has the keyboard, want export", d.FocusButton)
		}
		key(t, ctx, "Escape", "Escape", 27)
		waitFor(t, ctx, `(d => d.focus_button === "" && d.focus === "" && !d.menu)(nodelife.debug())`, "Escape to let go of the button")
	})

	t.Run("advice works in the background without freezing the page", func(t *testing.T) {
		// Outdoors in the far north with a panel: the advice draws weather
		// years and searches panel and cell sizes, many runs.
		far := demoWith(t, map[string]any{"name": "Tromsø depot (invented): yard camera", "site.placement": "outdoor",
			"site.lat_deg": 69.65, "site.lon_deg": 18.96, "site.climate": map[string]any{"preset": "subarctic"},
			"harvest": map[string]any{"kind": "panel"}, "cells.chemistry": "li-ion", "cells.form": "18650",
			"plan.years": 3})
		if _, err := eval[any](ctx, stepTimeout, `nodelife.load(`+jsString(string(far))+`)`); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.debug().advice.state === "running" && nodelife.debug().advice.done > 0`, "the advice to start")
		screenshot(t, ctx, "browser-advice-running-1280x720")
		d := debugState(t, ctx)
		time.Sleep(time.Second)
		if d2 := debugState(t, ctx); d2.Advice.State == "running" && d2.Ticks-d.Ticks < 2 {
			t.Errorf("while the advice runs the app ticked %d times in a second: the page is frozen", d2.Ticks-d.Ticks)
		} else {
			t.Logf("while the advice ran the app ticked %d times in a second (%d of %d runs)", d2.Ticks-d.Ticks, d2.Advice.Done, d2.Advice.Total)
		}
		waitLong(t, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the advice to finish")
		if n, err := eval[int](ctx, stepTimeout, `nodelife.result().advice.sentences.length`); err != nil || n == 0 {
			t.Errorf("result().advice.sentences: %d (%v)", n, err)
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-outdoor-1280x720")
	})

	t.Run("paste a position with Ctrl+V", func(t *testing.T) {
		origin := strings.TrimSuffix(url, "/")
		for _, name := range []string{"clipboard-read", "clipboard-write"} {
			if _, err := chromedp.CallBrowser(ctx, browser.SetPermission, browser.SetPermissionParams{
				Permission: &browser.PermissionDescriptor{Name: name}, Setting: browser.PermissionSettingGranted, Origin: origin}); err != nil {
				t.Fatal(err)
			}
		}
		box := scrollInto(t, ctx, "site.position")
		click(t, ctx, box) // the page has the focus the clipboard needs
		if r, err := eval[string](ctx, stepTimeout, `navigator.clipboard.writeText("69.68° N, 18.94° E").then(() => "ok", e => String(e))`); r != "ok" {
			t.Fatalf("writing the clipboard: %q (%v)", r, err)
		}
		ctrl := input.DispatchKeyEventParams{Key: "Control", Code: "ControlLeft", WindowsVirtualKeyCode: 17, NativeVirtualKeyCode: 17}
		v := input.DispatchKeyEventParams{Key: "v", Code: "KeyV", WindowsVirtualKeyCode: 86, NativeVirtualKeyCode: 86, Modifiers: modCtrl}
		ctrl.Type, ctrl.Modifiers = input.DispatchKeyEventTypeRawKeyDown, modCtrl
		press(t, ctx, ctrl, false)
		v.Type = input.DispatchKeyEventTypeKeyDown
		press(t, ctx, v, false)
		waitFor(t, ctx, `nodelife.debug().text === "69.68 N, 18.94 E"`, "the pasted position in the field")
		v.Type = input.DispatchKeyEventTypeKeyUp
		press(t, ctx, v, false)
		ctrl.Type, ctrl.Modifiers = input.DispatchKeyEventTypeKeyUp, 0
		press(t, ctx, ctrl, false)
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, `(s => s.site.lat_deg === 69.68 && s.site.lon_deg === 18.94)(nodelife.scenario())`, "the pasted position in the scenario")
		key(t, ctx, "Escape", "Escape", 27)
	})

	t.Run("wide screen and dark theme", func(t *testing.T) {
		resize(t, ctx, 1920, 1080)
		screenshot(t, ctx, "browser-outdoor-1920x1080")
		setDark(t, ctx, true)
		waitFor(t, ctx, `nodelife.debug().theme === "dark"`, "the dark theme")
		d := debugState(t, ctx)
		move(t, ctx, d.Chart.X+d.Chart.W*0.45, d.Chart.Y+d.Chart.H*0.3, false)
		drawn(t, ctx)
		screenshot(t, ctx, "browser-dark-hover-1920x1080")
		setDark(t, ctx, false)
		waitFor(t, ctx, `nodelife.debug().theme === "light"`, "the light theme again")
		move(t, ctx, 4, 4, false)
		resize(t, ctx, 1280, 720)
	})

	openedName := "Brindle Market, Grünerløkka store: two cells, 2 fps"
	t.Run("open files by dropping them and with the picker", func(t *testing.T) {
		bad := demoWith(t, map[string]any{"cells.form": "9V"})
		_, parseErr := scenario.Parse(bad)
		if parseErr == nil {
			t.Fatal("the engine takes a 9V form: the test needs a bad file")
		}
		badFile := filepath.Join(dir, "store-12.json")
		os.WriteFile(badFile, bad, 0o644)
		name, _ := eval[string](ctx, stepTimeout, `nodelife.scenario().name`)
		drop(t, ctx, badFile)
		waitFor(t, ctx, `nodelife.debug().notice.includes("store-12.json could not be opened")`, "the bad file reported in the page")
		if d := debugState(t, ctx); !strings.Contains(d.Notice, parseErr.Error()) {
			t.Errorf("notice %q lacks the engine's words %q", d.Notice, parseErr.Error())
		}
		if got, _ := eval[string](ctx, stepTimeout, `nodelife.scenario().name`); got != name {
			t.Errorf("a bad file changed the scenario to %q", got)
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-bad-file-1280x720")

		good := demoWith(t, map[string]any{"name": openedName, "cells.parallel": 2, "node.vision.fps": 2})
		goodFile := filepath.Join(dir, "two-cells.json")
		os.WriteFile(goodFile, good, 0o644)
		if _, err := chromedp.Run(ctx, chromedp.SetUploadFiles(chromedp.ID("nodelife-file"), []string{goodFile})); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.scenario().name === `+jsString(openedName), "the picked file on screen")
		if d := debugState(t, ctx); !strings.HasPrefix(d.Notice, "Opened two-cells.json") || d.Values["cells.parallel"] != "2" {
			t.Errorf("after opening: notice %q, parallel %q", d.Notice, d.Values["cells.parallel"])
		}

		// A scenario and the weather file it names, picked together: the
		// weather is read first and the scenario opens with it. The test
		// file is the engine's (engine/weather/testdata/SOURCE.md).
		epw, err := filepath.Abs("../engine/weather/testdata/nsrdb-tmy3-725300-chicago-ohare.epw")
		if err != nil {
			t.Fatal(err)
		}
		yard := demoWith(t, map[string]any{"name": "yard with hourly weather", "site.placement": "outdoor",
			"harvest.kind": "panel", "site.weather_file": filepath.Base(epw)})
		yardFile := filepath.Join(dir, "yard.json")
		os.WriteFile(yardFile, yard, 0o644)
		if _, err := chromedp.Run(ctx, chromedp.SetUploadFiles(chromedp.ID("nodelife-file"), []string{yardFile, epw})); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.scenario().name === "yard with hourly weather"`, "the scenario that names a weather file, opened with it")
		if d := debugState(t, ctx); !strings.Contains(d.Notice, "Opened yard.json with") || d.Values["site.weather_file"] != filepath.Base(epw) {
			t.Errorf("after opening with weather: notice %q, weather row %q", d.Notice, d.Values["site.weather_file"])
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-weather-file-1280x720")
		chord(t, ctx, modCtrl, "z", "KeyZ", 90)
		waitFor(t, ctx, `nodelife.scenario().name === `+jsString(openedName), "undo back to the picked file")
	})

	t.Run("save and export download files", func(t *testing.T) {
		dl := t.TempDir()
		if _, err := chromedp.CallBrowser(ctx, browser.SetDownloadBehavior, browser.SetDownloadBehaviorParams{
			Behavior: browser.SetDownloadBehaviorBehaviorAllow, DownloadPath: dl}); err != nil {
			t.Fatal(err)
		}
		d := debugState(t, ctx)
		click(t, ctx, d.Buttons["save"])
		for _, item := range []string{"export-json", "export-svg", "export-png"} {
			click(t, ctx, d.Buttons["export"])
			waitFor(t, ctx, `!!nodelife.debug().menu`, "the export menu")
			menu, err := eval[map[string]rect](ctx, stepTimeout, `nodelife.debug().menu`)
			if err != nil {
				t.Fatal(err)
			}
			if item == "export-svg" {
				move(t, ctx, menu[item].X+20, menu[item].Y+menu[item].H/2, false)
				drawn(t, ctx)
				screenshot(t, ctx, "browser-export-menu-1280x720")
			}
			click(t, ctx, menu[item])
		}
		files := waitFiles(t, dl, 4)
		var saved, exported, svg, pic []byte
		for name, data := range files {
			switch {
			case strings.HasSuffix(name, "-chart.png"):
				pic = data
			case strings.HasSuffix(name, "-result.json"):
				exported = data
			case strings.HasSuffix(name, "-chart.svg"):
				svg = data
			case strings.HasSuffix(name, ".json"):
				saved = data
			}
		}
		if !strings.HasPrefix(string(svg), "<?xml") && !strings.HasPrefix(string(svg), "<svg") {
			t.Errorf("the exported chart starts %.60q", svg)
		}
		if s, err := scenario.Parse(saved); err != nil || s.Name != openedName {
			t.Errorf("the saved file %v: name %q (%v), want the scenario on screen", namesOf(files), s.Name, err)
		}
		if !strings.Contains(string(exported), `"format":"nodelife.result/1"`) {
			t.Errorf("the exported result starts %.60q", exported)
		}
		checkChartPNG(t, pic, d, "browser-export-chart-1280x720")
	})

	t.Run("compare options side by side", func(t *testing.T) {
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `(o => o && o.length === 1)(nodelife.debug().options)`, "the options view")
		click(t, ctx, debugState(t, ctx).Buttons["keep"])
		waitFor(t, ctx, `(o => o && o.length === 2)(nodelife.debug().options)`, "the kept option beside the current one")
		typeValue(t, ctx, "cells.parallel", "3")
		waitFor(t, ctx, `nodelife.scenario().cells.parallel === 3 && /Option A/.test(document.getElementById("summary").textContent)`,
			"the comparison in the live region after 3 cells in parallel")
		if d := debugState(t, ctx); d.OptionsProblem != "" || len(d.Options) != 2 {
			t.Errorf("options %v, problem %q", d.Options, d.OptionsProblem)
		}
		drawn(t, ctx)
		screenshot(t, ctx, "browser-options-1280x720")
		resize(t, ctx, 1920, 1080)
		drawn(t, ctx)
		screenshot(t, ctx, "browser-options-1920x1080")
		resize(t, ctx, 1280, 720)
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `nodelife.debug().options === null`, "the chart again")
		typeValue(t, ctx, "cells.parallel", "2")
	})

	t.Run("a reload finds the autosaved scenario", func(t *testing.T) {
		open(t, ctx, url, 1280, 720, 1)
		if got, _ := eval[string](ctx, stepTimeout, `nodelife.scenario().name`); got != openedName {
			t.Errorf("after a reload the scenario is %q, want the one opened before, %q", got, openedName)
		}
		if d := debugState(t, ctx); d.Values["node.vision.fps"] != "2" || d.Notice != "" {
			t.Errorf("after a reload: fps %q, notice %q", d.Values["node.vision.fps"], d.Notice)
		}
		// The option kept before is kept too; removing it forgets it.
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `(o => o && o.join() === "Option A,Current")(nodelife.debug().options)`, "the kept option after a reload")
		click(t, ctx, debugState(t, ctx).Buttons["option-remove-0"])
		waitFor(t, ctx, `(o => o && o.length === 1)(nodelife.debug().options) && !localStorage.getItem("nodelife.options")`,
			"the option removed and forgotten")
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `nodelife.debug().options === null`, "the chart again")
	})

	t.Run("a corrupt saved scenario is set aside and reported", func(t *testing.T) {
		const junk = `{"format": "nodelife.scenario/1", "cells": {"series": "two"`
		// The page keeps the scenario again when the advice is done: wait
		// for it, so that the junk stays.
		waitLong(t, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the advice")
		drawn(t, ctx) // the page hears of the advice at the next tick
		if _, err := eval[bool](ctx, stepTimeout, `localStorage.setItem("nodelife.scenario", `+jsString(junk)+`), true`); err != nil {
			t.Fatal(err)
		}
		open(t, ctx, url, 1280, 720, 1)
		d := debugState(t, ctx)
		if !strings.Contains(d.Notice, "could not be opened") || !strings.Contains(d.Notice, "nodelife.scenario.bad") {
			t.Errorf("notice %q; want the kept scenario reported and where it was set aside", d.Notice)
		}
		if got, _ := eval[string](ctx, stepTimeout, `localStorage.getItem("nodelife.scenario.bad")`); got != junk {
			t.Errorf("set aside: %q, want the corrupt text", got)
		}
		if got, _ := eval[string](ctx, stepTimeout, `nodelife.scenario().name`); got != scenario.Demo().Name {
			t.Errorf("after a corrupt save the scenario is %q, want the demo", got)
		}
		screenshot(t, ctx, "browser-corrupt-save-1280x720")
		click(t, ctx, dismissButton(t, ctx))
		waitFor(t, ctx, `nodelife.debug().notice === ""`, "Dismiss to remove the notice")
	})

	t.Run("narrow window on a high-DPI screen", func(t *testing.T) {
		// ebiten reads the device pixel ratio once per page: load the page
		// again in the new window.
		open(t, ctx, url, 760, 900, 2)
		waitFor(t, ctx, `nodelife.debug().mode === "narrow"`, "the narrow layout")
		screenshot(t, ctx, "browser-demo-760x900@2x")
		// The narrow column scrolls down to the advice and cautions.
		d := debugState(t, ctx)
		wheel(t, ctx, d.Chart.X+d.Chart.W/2, 400, 600)
		drawn(t, ctx)
		screenshot(t, ctx, "browser-scrolled-760x900@2x")
		// The chart's PNG is in device pixels, and whole though scrolled.
		dl := t.TempDir()
		if _, err := chromedp.CallBrowser(ctx, browser.SetDownloadBehavior, browser.SetDownloadBehaviorParams{
			Behavior: browser.SetDownloadBehaviorBehaviorAllow, DownloadPath: dl}); err != nil {
			t.Fatal(err)
		}
		d = debugState(t, ctx)
		click(t, ctx, d.Buttons["export"])
		waitFor(t, ctx, `!!nodelife.debug().menu`, "the export menu")
		menu, err := eval[map[string]rect](ctx, stepTimeout, `nodelife.debug().menu`)
		if err != nil {
			t.Fatal(err)
		}
		click(t, ctx, menu["export-png"])
		for _, data := range waitFiles(t, dl, 1) {
			checkChartPNG(t, data, d, "browser-export-chart-760x900@2x")
		}
		// The options view takes the whole width; the inputs come back
		// with the chart.
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `(o => o && o.length === 1)(nodelife.debug().options)`, "the options view")
		if d := debugState(t, ctx); len(d.Fields) != 0 {
			t.Errorf("the narrow options view shows inputs %v", namesOf(d.Fields))
		}
		click(t, ctx, debugState(t, ctx).Buttons["keep"])
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `nodelife.debug().options === null`, "the chart and the inputs again")
		typeValue(t, ctx, "cells.parallel", "3")
		click(t, ctx, debugState(t, ctx).Buttons["options"])
		waitFor(t, ctx, `(o => o && o.length === 2)(nodelife.debug().options)`, "two options side by side")
		drawn(t, ctx)
		screenshot(t, ctx, "browser-options-760x900@2x")
	})

	t.Run("opens offline from the service worker", func(t *testing.T) {
		waitFor(t, ctx, `navigator.serviceWorker.ready.then(() => caches.open("nodelife-v1"))
			.then(c => Promise.all(["index.html", "nodelife.js", "wasm_exec.js", "nodelife.wasm"].map(f => c.match(f))))
			.then(hits => hits.every(Boolean))`, "the service worker's copy of the app")
		stopServer()
		if _, err := eval[bool](ctx, stepTimeout, `window.oldPage = true`); err != nil {
			t.Fatal(err)
		}
		if err := chromedp.Do(ctx, chromedp.Navigate(url)); err != nil {
			t.Fatalf("reloading with the server stopped: %v", err)
		}
		if _, err := eval[bool](ctx, readyTimeout, `nodelife.ready.then(() => true)`); err != nil {
			t.Fatalf("offline: nodelife.ready: %v (page says: %s)", err, pageStatus(ctx))
		}
		// A new page, and the server really is gone: a file the worker never
		// kept cannot be fetched.
		state, err := eval[string](ctx, stepTimeout, `fetch("embed-example.html").then(() => "fetched", () => "failed")
			.then(f => (window.oldPage ? "old page, " : "new page, ") + f)`)
		if err != nil || state != "new page, failed" {
			t.Errorf("offline reload: %q (%v), want a new page with the network gone", state, err)
		}
	})
}

// checkChartPNG checks an exported chart picture: it decodes, and is the
// chart's panel in device pixels (rounded as the painter rounds). It keeps
// the file in test-output/ as name.png, to be looked at.
func checkChartPNG(t *testing.T, data []byte, d appDebug, name string) {
	t.Helper()
	if err := os.WriteFile(filepath.Join(outDir, name+".png"), data, 0o644); err != nil {
		t.Fatal(err)
	}
	img, err := png.Decode(bytes.NewReader(data))
	if err != nil {
		t.Fatalf("the chart's PNG (%d bytes) does not decode: %v", len(data), err)
	}
	wantW, wantH := int(math.Round(d.Panel.W*d.Scale)), int(math.Round(d.Panel.H*d.Scale))
	if b := img.Bounds(); b.Dx() != wantW || b.Dy() != wantH || wantW < 300 {
		t.Errorf("the chart's PNG is %d × %d, want the panel %v at %g×: %d × %d", b.Dx(), b.Dy(), d.Panel, d.Scale, wantW, wantH)
	}
}

// checkFocusRing checks the screenshot name (in outDir, taken at scale 1)
// for the focus ring around button b: the ring's colour in the gap over the
// button's top edge, and the page's background further out.
func checkFocusRing(t *testing.T, name string, b rect) {
	t.Helper()
	f, err := os.Open(filepath.Join(outDir, name+".png"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	img, err := png.Decode(f)
	if err != nil {
		t.Fatal(err)
	}
	near := func(x, y float64, want [3]int) bool {
		r, g, bl, _ := img.At(int(x), int(y)).RGBA()
		got := [3]int{int(r >> 8), int(g >> 8), int(bl >> 8)}
		for i := range got {
			if d := got[i] - want[i]; d < -24 || d > 24 {
				return false
			}
		}
		return true
	}
	ring := [3]int{0x1F, 0x6B, 0x72}       // the light theme's focus colour
	background := [3]int{0xF6, 0xF4, 0xEF} // … and its page
	x := b.X + b.W/2
	if !near(x, b.Y-2, ring) || !near(b.X-2, b.Y+b.H/2, ring) {
		t.Errorf("%s: no focus ring just outside the button at %v", name, b)
	}
	if !near(x, b.Y-6, background) {
		t.Errorf("%s: the ring around %v is wider than it should be", name, b)
	}
}

// waitFiles waits until dir holds n finished downloads and returns them.
func waitFiles(t *testing.T, dir string, n int) map[string][]byte {
	t.Helper()
	deadline := time.Now().Add(stepTimeout)
	for {
		files := map[string][]byte{}
		entries, _ := os.ReadDir(dir)
		for _, e := range entries {
			if strings.HasSuffix(e.Name(), ".crdownload") {
				continue
			}
			if data, err := os.ReadFile(filepath.Join(dir, e.Name())); err == nil && len(data) > 0 {
				files[e.Name()] = data
			}
		}
		if len(files) >= n {
			return files
		}
		if time.Now().After(deadline) {
			t.Fatalf("downloads: %v, want %d files", namesOf(files), n)
		}
		time.Sleep(50 * time.Millisecond)
	}
}

func namesOf[V any](m map[string]V) []string {
	var ks []string
	for k := range m {
		ks = append(ks, k)
	}
	return ks
}

// setDark switches the emulated system preference to dark or back.
func setDark(t *testing.T, ctx context.Context, dark bool) {
	t.Helper()
	v := "light"
	if dark {
		v = "dark"
	}
	err := chromedp.Do(ctx, chromedp.Func(func(ctx context.Context, tg *chromedp.Target) error {
		_, err := cdp.Call(ctx, tg, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{
			Features: []*emulation.MediaFeature{{Name: "prefers-color-scheme", Value: v}}})
		return err
	}))
	if err != nil {
		t.Fatal(err)
	}
}

// drop drags the file at path over the canvas and drops it, as a person
// drops a file from their desktop.
func drop(t *testing.T, ctx context.Context, path string) {
	t.Helper()
	data := &input.DragData{Items: []*input.DragDataItem{}, Files: []string{path}, DragOperationsMask: 1}
	for _, typ := range []input.DispatchDragEventType{input.DispatchDragEventTypeDragEnter, input.DispatchDragEventTypeDragOver, input.DispatchDragEventTypeDrop} {
		err := chromedp.Do(ctx, chromedp.Func(func(ctx context.Context, tg *chromedp.Target) error {
			_, err := cdp.Call(ctx, tg, input.DispatchDragEvent, input.DispatchDragEventParams{Type: typ, X: 600, Y: 300, Data: data})
			return err
		}))
		if err != nil {
			t.Fatalf("drag event %s: %v", typ, err)
		}
	}
}

// dismissButton is the notice's dismiss button.
func dismissButton(t *testing.T, ctx context.Context) rect {
	t.Helper()
	r, err := eval[rect](ctx, stepTimeout, `nodelife.debug().dismiss`)
	if err != nil || r.W == 0 {
		t.Fatalf("no dismiss button: %v %+v", err, r)
	}
	return r
}
