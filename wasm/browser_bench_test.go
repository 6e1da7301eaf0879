//go:build !js

package main

import (
	"context"
	"fmt"
	"os"
	"path/filepath"
	"testing"
	"time"

	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/input"
	"github.com/chromedp/chromedp"
)

// The browser benchmarks run the built app in the same headless Chromium as
// TestBrowser (software WebGL, no GPU): `make wasm`, then
//
//	go test -run '^$' -bench . -benchtime 3x ./wasm/
//
// Each reports its times in ms per operation besides ns/op.

// benchYears is the horizon of the benchmarks' scenario: the demo planned
// over 5 years at its 10-minute steps (the performance case).
const benchYears = 5

// BenchmarkEditToRedraw commits an edit of the frame rate with a real Enter
// key in the focused field (5 ↔ 6 fps) and waits for the redrawn curve.
//
//   - edit-to-frame-ms: the app's own clock, from the commit in the tick
//     that handled Enter to the end of drawing the first frame that shows
//     the new answer (nodelife.debug().redraw.to_frame_ms);
//   - compute-ms: the part of it before drawing: parse, the 5-year run, the
//     answer and the layout (redraw.compute_ms);
//   - wall-ms (and ns/op): from sending Enter to seeing that frame, as the
//     test sees it: adds the wait for the app's next tick and the 20 ms
//     polling.
//
// Typing the value and the previous edit's advice are outside the timer.
func BenchmarkEditToRedraw(b *testing.B) {
	ctx, url := benchBrowser(b)
	open(b, ctx, url, 1280, 720, 1)
	five := demoWith(b, map[string]any{"plan.years": benchYears})
	if _, err := eval[any](ctx, stepTimeout, `nodelife.load(`+jsString(string(five))+`)`); err != nil {
		b.Fatal(err)
	}
	if y, err := eval[float64](ctx, stepTimeout, `nodelife.scenario().plan.years`); err != nil || y != benchYears {
		b.Fatalf("plan.years = %v (%v), want %d", y, err, benchYears)
	}
	box := scrollInto(b, ctx, "node.vision.fps")
	click(b, ctx, box)
	if d := debugState(b, ctx); d.Focus != "node.vision.fps" || !d.Selected {
		b.Fatalf("after clicking the fps field: focus %q, selected %v", d.Focus, d.Selected)
	}
	enter := input.DispatchKeyEventParams{Key: "Enter", Code: "Enter", WindowsVirtualKeyCode: 13, NativeVirtualKeyCode: 13}

	var frameMs, computeMs, wallMs float64
	n := 0
	for b.Loop() {
		b.StopTimer()
		// The advice for the last edit runs between frames and would
		// delay the tick that takes Enter: let it finish first.
		waitLong(b, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the advice")
		fps := []string{"6", "5"}[n%2]
		if _, err := chromedp.Run(ctx, chromedp.KeyEvent(fps)); err != nil {
			b.Fatal(err)
		}
		waitFor(b, ctx, `nodelife.debug().text === `+jsString(fps), "the typed "+fps+" in the field")
		runs := debugState(b, ctx).Runs

		b.StartTimer()
		start := time.Now()
		enter.Type = input.DispatchKeyEventTypeKeyDown
		if err := dispatchKey(ctx, enter); err != nil {
			b.Fatal(err)
		}
		waitFor(b, ctx, fmt.Sprintf(`(r => r.run > %d && r.frame > 0)(nodelife.debug().redraw)`, runs), "the redrawn curve")
		wall := time.Since(start)
		b.StopTimer()

		r, err := eval[redraw](ctx, stepTimeout, `nodelife.debug().redraw`)
		if err != nil {
			b.Fatal(err)
		}
		if got, err := eval[string](ctx, stepTimeout, `String(nodelife.scenario().node.vision.fps)`); err != nil || got != fps {
			b.Fatalf("fps after Enter: %q (%v), want %s", got, err, fps)
		}
		frameMs += r.ToFrameMs
		computeMs += r.ComputeMs
		wallMs += float64(wall.Microseconds()) / 1000
		n++
		enter.Type = input.DispatchKeyEventTypeKeyUp
		press(b, ctx, enter, false)
		b.StartTimer()
	}
	b.ReportMetric(frameMs/float64(n), "edit-to-frame-ms/op")
	b.ReportMetric(computeMs/float64(n), "compute-ms/op")
	b.ReportMetric(wallMs/float64(n), "wall-ms/op")
}

// BenchmarkLoadToFirstChart loads the page again and again (a 5-year
// scenario kept in the browser, files from a loopback server and the
// browser's caches, after one load to warm them) and times it from the start
// of the navigation to nodelife.ready, the first frame with the chart, by the
// page's own performance marks:
//
//   - ready-ms: navigation start to the first frame;
//   - instantiate-ms: … to the WebAssembly module fetched and compiled;
//   - ns/op: as the test sees it, including the DevTools round trips;
//   - first-ready-ms: the first load, with a fresh profile and empty caches
//     (one sample, not an average).
func BenchmarkLoadToFirstChart(b *testing.B) {
	ctx, url := benchBrowser(b)
	open(b, ctx, url, 1280, 720, 1)
	first, err := eval[float64](ctx, stepTimeout, `performance.getEntriesByName("nodelife-ready")[0].startTime`)
	if err != nil {
		b.Fatal(err)
	}
	five := demoWith(b, map[string]any{"plan.years": benchYears})
	if _, err := eval[any](ctx, stepTimeout, `nodelife.load(`+jsString(string(five))+`)`); err != nil {
		b.Fatal(err)
	}
	waitFor(b, ctx, `JSON.parse(localStorage.getItem("nodelife.scenario") || "{}").plan.years === `+fmt.Sprint(benchYears),
		"the 5-year scenario kept for the next visit")

	var readyMs, instMs float64
	n := 0
	for b.Loop() {
		if err := chromedp.Do(ctx, chromedp.Navigate(url)); err != nil {
			b.Fatal(err)
		}
		m, err := eval[marks](ctx, readyTimeout, `nodelife.ready.then(() => ({
			ready: performance.getEntriesByName("nodelife-ready")[0].startTime,
			instantiated: performance.getEntriesByName("nodelife-instantiated")[0].startTime,
			years: nodelife.scenario().plan.years}))`)
		if err != nil {
			b.Fatalf("nodelife.ready: %v (page says: %s)", err, pageStatus(ctx))
		}
		if m.Years != benchYears {
			b.Fatalf("the reloaded page shows %d years, want the kept %d", m.Years, benchYears)
		}
		readyMs += m.Ready
		instMs += m.Instantiated
		n++
	}
	b.ReportMetric(readyMs/float64(n), "ready-ms/op")
	b.ReportMetric(instMs/float64(n), "instantiate-ms/op")
	b.ReportMetric(first, "first-ready-ms")
}

// BenchmarkAdviceInTheBackground shows an outdoor 5-year scenario with a
// panel (nodelife.load, as an edit) and times its advice, which the app
// works out between frames: weather years, panel and cell sizes, levers.
//
//   - advice-ms: from the load to the advice done, by the test's clock;
//   - load-ms: of which the load itself: the answer without the advice;
//   - longest-gap-ms: the longest time between two of the browser's
//     animation frames while the advice was worked out: how long the page
//     was held at worst, by a requestAnimationFrame loop in the page.
func BenchmarkAdviceInTheBackground(b *testing.B) {
	ctx, url := benchBrowser(b)
	open(b, ctx, url, 1280, 720, 1)
	var adviceMs, loadMs, gapMs float64
	n := 0
	for b.Loop() {
		b.StopTimer()
		waitLong(b, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the last advice")
		scen := demoWith(b, map[string]any{"plan.years": benchYears, "site.placement": "outdoor",
			"harvest.kind": "panel", "node.vision.fps": 5 + n%2})
		if _, err := eval[bool](ctx, stepTimeout, `(() => {
			if (window.gaps) window.gaps.on = false;
			const g = window.gaps = {max: 0, last: performance.now(), on: true};
			const f = (t) => { if (!g.on) return; g.max = Math.max(g.max, t - g.last); g.last = t; requestAnimationFrame(f); };
			requestAnimationFrame(f);
			return true; })()`); err != nil {
			b.Fatal(err)
		}
		b.StartTimer()
		start := time.Now()
		if _, err := eval[any](ctx, stepTimeout, `nodelife.load(`+jsString(string(scen))+`).then(() => {
			window.gaps.max = 0; window.gaps.last = performance.now(); })`); err != nil {
			b.Fatal(err)
		}
		loaded := time.Since(start)
		waitLong(b, ctx, adviceTimeout, `nodelife.debug().advice.state === "done"`, "the advice")
		took := time.Since(start)
		b.StopTimer()
		g, err := eval[float64](ctx, stepTimeout, `(window.gaps.on = false, window.gaps.max)`)
		if err != nil {
			b.Fatal(err)
		}
		adviceMs += float64(took.Microseconds()) / 1000
		loadMs += float64(loaded.Microseconds()) / 1000
		gapMs += g
		n++
		b.StartTimer()
	}
	b.ReportMetric(adviceMs/float64(n), "advice-ms/op")
	b.ReportMetric(gapMs/float64(n), "longest-gap-ms/op")
	b.ReportMetric(loadMs/float64(n), "load-ms/op")
}

// redraw is nodelife.debug().redraw (ui.Redraw).
type redraw struct {
	Run       int64   `json:"run"`
	ComputeMs float64 `json:"compute_ms"`
	ToFrameMs float64 `json:"to_frame_ms"`
	Frame     int64   `json:"frame"`
}

// marks are the page's performance marks, ms from the navigation start.
type marks struct {
	Ready        float64 `json:"ready"`
	Instantiated float64 `json:"instantiated"`
	Years        int     `json:"years"`
}

// benchBrowser checks what the browser benchmarks need, serves static/ and
// starts Chromium.
func benchBrowser(b *testing.B) (context.Context, string) {
	b.Helper()
	for _, f := range []string{"nodelife.wasm", "wasm_exec.js"} {
		if _, err := os.Stat(filepath.Join("..", "static", f)); err != nil {
			b.Fatalf("static/%s is missing: run `make wasm` first (%v)", f, err)
		}
	}
	if _, err := os.Stat(chromium); err != nil {
		b.Fatalf("%s is missing: apt-get install -y chromium", chromium)
	}
	url, _ := serveStatic(b)
	return startBrowser(b), url
}

// dispatchKey sends one key event without waiting for the app.
func dispatchKey(ctx context.Context, ev input.DispatchKeyEventParams) error {
	return chromedp.Do(ctx, chromedp.Func(func(ctx context.Context, tg *chromedp.Target) error {
		_, err := cdp.Call(ctx, tg, input.DispatchKeyEvent, ev)
		return err
	}))
}
