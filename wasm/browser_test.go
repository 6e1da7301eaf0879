//go:build !js

package main

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"net"
	"net/http"
	"os"
	"os/exec"
	"path/filepath"
	"reflect"
	"sort"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/input"
	"github.com/chromedp/chromedp"

	"nodelife/engine/scenario"
	"nodelife/static"
)

// Debian's Chromium; the flags are the ones that render ebiten's WebGL2
// canvas as root with no GPU (../shared/design/STACK.md).
const chromium = "/usr/bin/chromium"

// Bounds on waiting. Under software GL the page is ready after about 8 s.
const (
	readyTimeout = 60 * time.Second
	stepTimeout  = 15 * time.Second
	testTimeout  = 100 * time.Second
)

// TestBrowser drives the built app in headless Chromium: the JavaScript API
// against the command line, then one edit on the canvas with real mouse and
// keyboard events. Screenshots go to test-output/ at the repository root.
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
	outDir := filepath.Join("..", "test-output")
	if err := os.MkdirAll(outDir, 0o755); err != nil {
		t.Fatal(err)
	}

	if _, err := chromedp.Run(ctx, chromedp.EmulateViewport(1280, 720)); err != nil {
		t.Fatal(err)
	}
	if err := chromedp.Do(ctx, chromedp.Navigate(url)); err != nil {
		t.Fatal(err)
	}
	if _, err := eval[bool](ctx, readyTimeout, `nodelife.ready.then(() => true)`); err != nil {
		t.Fatalf("nodelife.ready: %v (page says: %s)", err, pageStatus(ctx))
	}

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

	t.Run("bad input is refused with the engine's message", func(t *testing.T) {
		bad := demoWith(t, "cells", "capacity_mah", -5)
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

	t.Run("edit the frame rate on the canvas", func(t *testing.T) {
		before, err := eval[float64](ctx, stepTimeout, `nodelife.result().lifetime_days`)
		if err != nil {
			t.Fatal(err)
		}
		screenshot(t, ctx, filepath.Join(outDir, "browser-before.png"))

		d := debugState(t, ctx)
		box, ok := d.Fields["node.vision.fps"]
		if !ok {
			t.Fatalf("the app lists no rectangle for node.vision.fps: %+v", d.Fields)
		}
		x, y := box.X+box.W/2, box.Y+box.H/2
		mouse(t, ctx, input.DispatchMouseEventTypeMousePressed, x, y, "mouse_presses")
		mouse(t, ctx, input.DispatchMouseEventTypeMouseReleased, x, y, "mouse_releases")
		if d := debugState(t, ctx); d.Focus != "node.vision.fps" || !d.Selected {
			t.Fatalf("after clicking the fps field: focus %q, selected %v", d.Focus, d.Selected)
		}
		key(t, ctx, "Backspace", "Backspace", 8)
		waitFor(t, ctx, `nodelife.debug().text === ""`, "the field to be empty after Backspace")
		if _, err := chromedp.Run(ctx, chromedp.KeyEvent("10")); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.debug().text === "10"`, "the typed 10 in the field")
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, fmt.Sprintf(`nodelife.result().lifetime_days < %v`, before), "a shorter lifetime after fps 5 → 10")
		frames := debugState(t, ctx).Frames
		waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().frames > %d || nodelife.debug().ticks > %d`, frames-1, debugState(t, ctx).Ticks+2),
			"the edit on screen")
		if fps, err := eval[float64](ctx, stepTimeout, `nodelife.scenario().node.vision.fps`); err != nil || fps != 10 {
			t.Errorf("scenario().node.vision.fps = %v (%v), want 10", fps, err)
		}
		screenshot(t, ctx, filepath.Join(outDir, "browser-after.png"))

		// A value out of range is refused in place; the result stays.
		after := debugState(t, ctx)
		res, _ := eval[string](ctx, stepTimeout, `JSON.stringify(nodelife.result())`)
		if _, err := chromedp.Run(ctx, chromedp.KeyEvent("61")); err != nil {
			t.Fatal(err)
		}
		waitFor(t, ctx, `nodelife.debug().text === "61"`, "the typed 61 (the field was selected after Enter)")
		key(t, ctx, "Enter", "Enter", 13)
		waitFor(t, ctx, `!!nodelife.debug().errors["node.vision.fps"]`, "the refusal of 61 fps")
		if same, _ := eval[bool](ctx, stepTimeout, `JSON.stringify(nodelife.result()) === `+jsString(res)); !same {
			t.Error("a refused value changed the result")
		}
		waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().frames > %d`, after.Frames), "the refusal on screen")
		screenshot(t, ctx, filepath.Join(outDir, "browser-refused.png"))
		key(t, ctx, "Escape", "Escape", 27)
		waitFor(t, ctx, `(d => d.focus === "" && !d.errors["node.vision.fps"])(nodelife.debug())`, "Escape to restore the field")
	})

	t.Run("narrow window on a high-DPI screen", func(t *testing.T) {
		// ebiten reads the device pixel ratio once per page: load the page
		// again in the new window.
		if _, err := chromedp.Run(ctx, chromedp.EmulateViewport(760, 900, chromedp.EmulateScale(2))); err != nil {
			t.Fatal(err)
		}
		if err := chromedp.Do(ctx, chromedp.Navigate(url)); err != nil {
			t.Fatal(err)
		}
		if _, err := eval[bool](ctx, readyTimeout, `nodelife.ready.then(() => true)`); err != nil {
			t.Fatalf("nodelife.ready: %v (page says: %s)", err, pageStatus(ctx))
		}
		waitFor(t, ctx, `(d => d.mode === "narrow" && d.scale === 2 && d.width === 760)(nodelife.debug())`, "the narrow layout at scale 2")
		screenshot(t, ctx, filepath.Join(outDir, "browser-narrow-2x.png"))
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

// buildCommand builds the command line tool into a temporary folder.
func buildCommand(t *testing.T) string {
	t.Helper()
	bin := filepath.Join(t.TempDir(), "nodelife")
	cmd := exec.Command("go", "build", "-o", bin, "..")
	cmd.Env = append(os.Environ(), "CGO_ENABLED=0")
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("go build ..: %v\n%s", err, out)
	}
	return bin
}

// serveStatic serves ../static on a free loopback port until stop.
func serveStatic(t *testing.T) (url string, stop func()) {
	t.Helper()
	ln, err := net.Listen("tcp", "127.0.0.1:0")
	if err != nil {
		t.Fatal(err)
	}
	srv := &http.Server{Handler: static.Handler(os.DirFS("../static"), nil)}
	go srv.Serve(ln)
	t.Cleanup(func() { srv.Close() })
	return "http://" + ln.Addr().String() + "/", func() { srv.Close() }
}

// startBrowser starts Chromium with a fresh profile and returns a context
// bounded by testTimeout.
func startBrowser(t *testing.T) context.Context {
	t.Helper()
	profile, err := os.MkdirTemp("", "nodelife-chromium-")
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { os.RemoveAll(profile) })
	actx, cancelAlloc := chromedp.NewExecAllocator(context.Background(),
		chromedp.ExecPath(chromium),
		chromedp.Flag("headless", "new"),
		chromedp.Flag("no-sandbox", true),
		chromedp.Flag("use-angle", "swiftshader"),
		chromedp.Flag("enable-unsafe-swiftshader", true),
		chromedp.Flag("disable-background-networking", true),
		chromedp.Flag("disable-component-update", true),
		chromedp.Flag("disable-sync", true),
		chromedp.Flag("no-first-run", true),
		chromedp.Flag("disable-quic", true),
		chromedp.UserDataDir(profile),
		chromedp.WindowSize(1280, 800),
	)
	t.Cleanup(cancelAlloc)
	bctx, cancelBrowser := chromedp.NewContext(actx)
	t.Cleanup(cancelBrowser)
	// Start the browser on a context without a deadline (a deadline on the
	// first Run would bound the browser's life), then bound the test.
	if err := chromedp.Do(bctx); err != nil {
		t.Fatalf("starting %s: %v", chromium, err)
	}
	ctx, cancel := context.WithTimeout(bctx, testTimeout)
	t.Cleanup(cancel)
	return ctx
}

// eval evaluates a JavaScript expression, awaiting a promise, within limit.
func eval[T any](ctx context.Context, limit time.Duration, js string) (T, error) {
	c, cancel := context.WithTimeout(ctx, limit)
	defer cancel()
	return chromedp.Run(c, chromedp.Evaluate[T](js, chromedp.EvalAwaitPromise))
}

// waitFor polls a JavaScript condition until it holds.
func waitFor(t *testing.T, ctx context.Context, cond, what string) {
	t.Helper()
	c, cancel := context.WithTimeout(ctx, stepTimeout)
	defer cancel()
	_, err := chromedp.Run(c, chromedp.Poll[bool](cond, chromedp.WithPollingInterval(20*time.Millisecond)))
	if err != nil {
		t.Fatalf("waiting for %s (%s): %v; app state %+v", what, cond, err, debugState(t, ctx))
	}
}

type rect struct{ X, Y, W, H float64 }

// appDebug is the part of nodelife.debug() the test reads.
type appDebug struct {
	Ticks    int64             `json:"ticks"`
	Frames   int64             `json:"frames"`
	Presses  int64             `json:"mouse_presses"`
	Releases int64             `json:"mouse_releases"`
	Keys     int64             `json:"keys"`
	Focus    string            `json:"focus"`
	Text     string            `json:"text"`
	Selected bool              `json:"selected"`
	Fields   map[string]rect   `json:"fields"`
	Errors   map[string]string `json:"errors"`
	Width    float64           `json:"width"`
	Height   float64           `json:"height"`
	Scale    float64           `json:"scale"`
	Mode     string            `json:"mode"`
}

func debugState(t *testing.T, ctx context.Context) appDebug {
	t.Helper()
	d, err := eval[appDebug](ctx, stepTimeout, `nodelife.debug()`)
	if err != nil {
		t.Fatalf("nodelife.debug(): %v", err)
	}
	return d
}

// mouse dispatches one left-button event and waits until the app has counted
// it: ebiten samples the button once a tick, so a release sent in the same
// tick as its press would hide the press.
func mouse(t *testing.T, ctx context.Context, typ input.DispatchMouseEventType, x, y float64, counter string) {
	t.Helper()
	before, err := eval[int64](ctx, stepTimeout, `nodelife.debug().`+counter)
	if err != nil {
		t.Fatal(err)
	}
	if _, err := chromedp.Run(ctx, chromedp.MouseEvent(typ, x, y, chromedp.ButtonLeft, chromedp.ClickCount(1))); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().%s > %d`, counter, before), "the app to see the mouse "+string(typ))
}

// key presses a special key: key down, wait until the app has handled it,
// key up, wait for the next tick.
func key(t *testing.T, ctx context.Context, name, code string, vk int64) {
	t.Helper()
	d := debugState(t, ctx)
	ev := input.DispatchKeyEventParams{Type: input.DispatchKeyEventTypeKeyDown, Key: name, Code: code, WindowsVirtualKeyCode: vk, NativeVirtualKeyCode: vk}
	if err := dispatchKey(ctx, ev); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().keys > %d`, d.Keys), "the app to handle "+name)
	ticks := debugState(t, ctx).Ticks
	ev.Type = input.DispatchKeyEventTypeKeyUp
	if err := dispatchKey(ctx, ev); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().ticks > %d`, ticks), "a tick after releasing "+name)
}

func dispatchKey(ctx context.Context, ev input.DispatchKeyEventParams) error {
	return chromedp.Do(ctx, chromedp.Func(func(ctx context.Context, tg *chromedp.Target) error {
		_, err := cdp.Call(ctx, tg, input.DispatchKeyEvent, ev)
		return err
	}))
}

func screenshot(t *testing.T, ctx context.Context, path string) {
	t.Helper()
	png, err := chromedp.Run(ctx, chromedp.CaptureScreenshot())
	if err != nil {
		t.Fatalf("screenshot: %v", err)
	}
	if err := os.WriteFile(path, png, 0o644); err != nil {
		t.Fatal(err)
	}
	t.Logf("screenshot: %s", path)
}

// pageStatus is what the page's status element says, for failure messages.
func pageStatus(ctx context.Context) string {
	s, err := eval[string](ctx, 5*time.Second, `(document.getElementById("status") || {}).innerText || "(nothing)"`)
	if err != nil {
		return "(unreadable: " + err.Error() + ")"
	}
	return s
}

// jsString quotes s as a JavaScript string literal.
func jsString(s string) string {
	q, _ := json.Marshal(s)
	return string(q)
}

func decode(t *testing.T, data []byte) any {
	t.Helper()
	var v any
	if err := json.Unmarshal(data, &v); err != nil {
		t.Fatalf("decoding %.80s…: %v", data, err)
	}
	return v
}

// firstDifference compares decoded JSON and names the first path where a and
// b differ.
func firstDifference(a, b any, path string) (string, bool) {
	switch x := a.(type) {
	case map[string]any:
		y, ok := b.(map[string]any)
		if !ok || len(x) != len(y) {
			return fmt.Sprintf("%s (%d keys vs %v)", path, len(x), keysOf(b)), false
		}
		for _, k := range keysOf(x) {
			if p, ok := firstDifference(x[k], y[k], path+"."+k); !ok {
				return p, false
			}
		}
		return "", true
	case []any:
		y, ok := b.([]any)
		if !ok || len(x) != len(y) {
			return fmt.Sprintf("%s (length %d vs %v)", path, len(x), b), false
		}
		for i := range x {
			if p, ok := firstDifference(x[i], y[i], fmt.Sprintf("%s[%d]", path, i)); !ok {
				return p, false
			}
		}
		return "", true
	}
	if !reflect.DeepEqual(a, b) {
		return fmt.Sprintf("%s: %v vs %v", path, a, b), false
	}
	return "", true
}

func keysOf(v any) []string {
	m, _ := v.(map[string]any)
	var ks []string
	for k := range m {
		ks = append(ks, k)
	}
	sort.Strings(ks)
	return ks
}

// demoWith returns the demo scenario file with one value replaced.
func demoWith(t *testing.T, obj, key string, v any) []byte {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal(scenario.DemoJSON(), &m); err != nil {
		t.Fatal(err)
	}
	o, ok := m[obj].(map[string]any)
	if !ok {
		t.Fatal(errors.New("demo has no object " + obj))
	}
	o[key] = v
	data, err := json.MarshalIndent(m, "", "  ")
	if err != nil {
		t.Fatal(err)
	}
	return data
}
