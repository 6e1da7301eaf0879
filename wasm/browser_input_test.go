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
	"testing"
	"time"

	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/input"
	"github.com/chromedp/chromedp"

	"nodelife/engine/scenario"
	"nodelife/static"
)

// buildCommand builds the command line tool into a temporary folder.
func buildCommand(t testing.TB) string {
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
func serveStatic(t testing.TB) (url string, stop func()) {
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
func startBrowser(t testing.TB) context.Context {
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

// open loads url in a w × h window at scale and waits for the first frame.
func open(t testing.TB, ctx context.Context, url string, w, h int64, scale float64) {
	t.Helper()
	if _, err := chromedp.Run(ctx, chromedp.EmulateViewport(w, h, chromedp.EmulateScale(scale))); err != nil {
		t.Fatal(err)
	}
	start := time.Now()
	if err := chromedp.Do(ctx, chromedp.Navigate(url)); err != nil {
		t.Fatal(err)
	}
	if _, err := eval[bool](ctx, readyTimeout, `nodelife.ready.then(() => true)`); err != nil {
		t.Fatalf("nodelife.ready: %v (page says: %s)", err, pageStatus(ctx))
	}
	t.Logf("page load to the first chart at %d×%d: %.1f s (software GL)", w, h, time.Since(start).Seconds())
	waitFor(t, ctx, fmt.Sprintf(`(d => d.width === %d && d.scale === %g && d.frames > 0)(nodelife.debug())`, w, scale),
		fmt.Sprintf("the app at %d px, scale %g", w, scale))
}

// resize changes the window and waits until the app has drawn it.
func resize(t testing.TB, ctx context.Context, w, h int64) {
	t.Helper()
	if _, err := chromedp.Run(ctx, chromedp.EmulateViewport(w, h)); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().width === %d && nodelife.debug().height === %d`, w, h), "the new window size")
	drawn(t, ctx)
}

// eval evaluates a JavaScript expression, awaiting a promise, within limit.
func eval[T any](ctx context.Context, limit time.Duration, js string) (T, error) {
	c, cancel := context.WithTimeout(ctx, limit)
	defer cancel()
	return chromedp.Run(c, chromedp.Evaluate[T](js, chromedp.EvalAwaitPromise))
}

// waitFor polls a JavaScript condition until it holds.
func waitFor(t testing.TB, ctx context.Context, cond, what string) {
	t.Helper()
	waitLong(t, ctx, stepTimeout, cond, what)
}

func waitLong(t testing.TB, ctx context.Context, limit time.Duration, cond, what string) {
	t.Helper()
	c, cancel := context.WithTimeout(ctx, limit)
	defer cancel()
	_, err := chromedp.Run(c, chromedp.Poll[bool](cond, chromedp.WithPollingInterval(20*time.Millisecond)))
	if err != nil {
		t.Fatalf("waiting for %s (%s): %v; app state %+v", what, cond, err, debugState(t, ctx))
	}
}

type rect struct{ X, Y, W, H float64 }

func (r rect) center() (float64, float64) { return r.X + r.W/2, r.Y + r.H/2 }

type slider struct {
	Track rect    `json:"track"`
	KnobX float64 `json:"knob_x"`
	Value float64 `json:"value"`
}

// appDebug is the part of nodelife.debug() the test reads.
type appDebug struct {
	Ticks    int64             `json:"ticks"`
	Frames   int64             `json:"frames"`
	Presses  int64             `json:"mouse_presses"`
	Releases int64             `json:"mouse_releases"`
	Keys     int64             `json:"keys"`
	Chars    int64             `json:"chars"`
	Runs     int64             `json:"runs"`
	Width    float64           `json:"width"`
	Scale    float64           `json:"scale"`
	Mode     string            `json:"mode"`
	Theme    string            `json:"theme"`
	Focus    string            `json:"focus"`
	Text     string            `json:"text"`
	Selected bool              `json:"selected"`
	Fields   map[string]rect   `json:"fields"`
	Values   map[string]string `json:"values"`
	Errors   map[string]string `json:"errors"`
	Sliders  map[string]slider `json:"sliders"`
	List     struct {
		Path  string          `json:"path"`
		Items map[string]rect `json:"items"`
	} `json:"list"`
	Buttons map[string]rect `json:"buttons"`
	// FocusButton is the ID of the button with the keyboard, or "".
	FocusButton string `json:"focus_button"`
	Undo        int    `json:"undo"`
	Redo        int    `json:"redo"`
	Advice      struct {
		State string `json:"state"`
		Done  int    `json:"done"`
		Total int    `json:"total"`
	} `json:"advice"`
	Notice string `json:"notice"`
	Hover  string `json:"hover"`
	Chart  rect   `json:"chart"`
	Panel  rect   `json:"panel"` // the chart's whole panel
	// Options are the options view's columns while it shows.
	Options        []string `json:"options"`
	OptionsProblem string   `json:"options_problem"`
}

func debugState(t testing.TB, ctx context.Context) appDebug {
	t.Helper()
	d, err := eval[appDebug](ctx, stepTimeout, `nodelife.debug()`)
	if err != nil {
		t.Fatalf("nodelife.debug(): %v", err)
	}
	return d
}

// drawn waits until the app has drawn a frame after this moment.
func drawn(t testing.TB, ctx context.Context) {
	t.Helper()
	d := debugState(t, ctx)
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().ticks > %d + 1`, d.Ticks), "two more ticks")
}

func dispatchMouse(ctx context.Context, ev input.DispatchMouseEventParams) error {
	return chromedp.Do(ctx, chromedp.Func(func(ctx context.Context, tg *chromedp.Target) error {
		_, err := cdp.Call(ctx, tg, input.DispatchMouseEvent, ev)
		return err
	}))
}

// mouse dispatches one left-button event and waits until the app has counted
// it: ebiten samples the button once a tick, so a release sent in the same
// tick as its press would hide the press.
func mouse(t testing.TB, ctx context.Context, typ input.DispatchMouseEventType, x, y float64, counter string) {
	t.Helper()
	before, err := eval[int64](ctx, stepTimeout, `nodelife.debug().`+counter)
	if err != nil {
		t.Fatal(err)
	}
	ev := input.DispatchMouseEventParams{Type: typ, X: x, Y: y, Button: input.MouseButtonLeft, ClickCount: 1}
	if typ == input.DispatchMouseEventTypeMousePressed {
		ev.Buttons = 1
	}
	if err := dispatchMouse(ctx, ev); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().%s > %d`, counter, before), "the app to see the mouse "+string(typ))
}

// click presses and releases the left button on the centre of r.
func click(t testing.TB, ctx context.Context, r rect) {
	t.Helper()
	x, y := r.center()
	mouse(t, ctx, input.DispatchMouseEventTypeMousePressed, x, y, "mouse_presses")
	mouse(t, ctx, input.DispatchMouseEventTypeMouseReleased, x, y, "mouse_releases")
}

// move moves the pointer (with the left button held if held) and waits for
// the app's next tick.
func move(t testing.TB, ctx context.Context, x, y float64, held bool) {
	t.Helper()
	ticks := debugState(t, ctx).Ticks
	ev := input.DispatchMouseEventParams{Type: input.DispatchMouseEventTypeMouseMoved, X: x, Y: y}
	if held {
		ev.Button, ev.Buttons = input.MouseButtonLeft, 1
	}
	if err := dispatchMouse(ctx, ev); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().ticks > %d`, ticks), "a tick after moving the pointer")
}

// wheel turns the mouse wheel at x, y by dy CSS px (down is positive).
func wheel(t testing.TB, ctx context.Context, x, y, dy float64) {
	t.Helper()
	move(t, ctx, x, y, false)
	ticks := debugState(t, ctx).Ticks
	// The protocol wants deltaX with every wheel event, and a zero is left
	// out of the message: a sideways turn of a millionth of a pixel.
	ev := input.DispatchMouseEventParams{Type: input.DispatchMouseEventTypeMouseWheel, X: x, Y: y, DeltaX: 1e-6, DeltaY: dy}
	if err := dispatchMouse(ctx, ev); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().ticks > %d + 1`, ticks), "ticks after the wheel")
}

// scrollInto turns the wheel over the input column until the input at path
// is in view: down first, then up, so the search does not depend on which
// inputs happen to be in view (the map of them has no order).
func scrollInto(t testing.TB, ctx context.Context, path string) rect {
	t.Helper()
	for _, dy := range []float64{240, -240} {
		for range 12 {
			d := debugState(t, ctx)
			if r, ok := d.Fields[path]; ok {
				if _, isSlider := d.Sliders[path]; isSlider || !hasSlider(path) {
					return r
				}
			}
			x := 0.0
			for _, r := range d.Fields {
				x = max(x, r.X) // every input of the column starts at about the same x
			}
			wheel(t, ctx, x+4, 300, dy)
		}
	}
	t.Fatalf("%s never came into view: %+v", path, debugState(t, ctx).Fields)
	return rect{}
}

func hasSlider(path string) bool {
	return path == "node.vision.fps" || path == "node.events.per_hour"
}

// key presses a special key: key down, wait until the app has handled it,
// key up, wait for the next tick.
func key(t testing.TB, ctx context.Context, name, code string, vk int64) {
	t.Helper()
	chord(t, ctx, 0, name, code, vk)
}

// Modifier bits of the DevTools protocol's key events.
const (
	modCtrl  = 2
	modShift = 8
)

// chord holds the modifiers in mods (as real key presses, which ebiten
// reads, in turn), presses the key, and lets go of everything in reverse.
func chord(t testing.TB, ctx context.Context, mods int64, name, code string, vk int64) {
	t.Helper()
	type k struct {
		key, code string
		vk        int64
	}
	var held []k
	var m int64
	for _, mod := range []struct {
		bit int64
		k   k
	}{{modCtrl, k{"Control", "ControlLeft", 17}}, {modShift, k{"Shift", "ShiftLeft", 16}}} {
		if mods&mod.bit == 0 {
			continue
		}
		m |= mod.bit
		press(t, ctx, input.DispatchKeyEventParams{Type: input.DispatchKeyEventTypeRawKeyDown, Key: mod.k.key, Code: mod.k.code,
			WindowsVirtualKeyCode: mod.k.vk, NativeVirtualKeyCode: mod.k.vk, Modifiers: m}, false)
		held = append(held, mod.k)
	}
	ev := input.DispatchKeyEventParams{Type: input.DispatchKeyEventTypeKeyDown, Key: name, Code: code, WindowsVirtualKeyCode: vk, NativeVirtualKeyCode: vk, Modifiers: m}
	press(t, ctx, ev, true)
	ev.Type = input.DispatchKeyEventTypeKeyUp
	press(t, ctx, ev, false)
	for i := len(held) - 1; i >= 0; i-- {
		m &^= []int64{modCtrl, modShift}[i]
		h := held[i]
		press(t, ctx, input.DispatchKeyEventParams{Type: input.DispatchKeyEventTypeKeyUp, Key: h.key, Code: h.code,
			WindowsVirtualKeyCode: h.vk, NativeVirtualKeyCode: h.vk, Modifiers: m}, false)
	}
}

// press dispatches one key event and waits for the app: until it counts a
// special key (counted), else for its next tick.
func press(t testing.TB, ctx context.Context, ev input.DispatchKeyEventParams, counted bool) {
	t.Helper()
	d := debugState(t, ctx)
	if err := dispatchKey(ctx, ev); err != nil {
		t.Fatal(err)
	}
	if counted {
		waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().keys > %d`, d.Keys), "the app to handle "+ev.Key)
		return
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().ticks > %d`, d.Ticks), "a tick after "+string(ev.Type)+" "+ev.Key)
}

func screenshot(t testing.TB, ctx context.Context, name string) {
	t.Helper()
	png, err := chromedp.Run(ctx, chromedp.CaptureScreenshot())
	if err != nil {
		t.Fatalf("screenshot: %v", err)
	}
	path := filepath.Join(outDir, name+".png")
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

func decode(t testing.TB, data []byte) any {
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

// demoWith returns the demo scenario file with values replaced: path
// "cells.capacity_mah" and the like, value any JSON value.
func demoWith(t testing.TB, values map[string]any) []byte {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal(scenario.DemoJSON(), &m); err != nil {
		t.Fatal(err)
	}
	for path, v := range values {
		scenario.SetPath(m, path, v)
	}
	data, err := json.MarshalIndent(m, "", "  ")
	if err != nil {
		t.Fatal(errors.New("demoWith: " + err.Error()))
	}
	return data
}

// typeValue types value into the input at path with real key events and
// applies it with Enter.
func typeValue(t testing.TB, ctx context.Context, path, value string) {
	t.Helper()
	if debugState(t, ctx).Focus != "" { // a click on a focused field places the caret: let go of it first
		key(t, ctx, "Escape", "Escape", 27)
		waitFor(t, ctx, `nodelife.debug().focus === ""`, "Escape to let go of the field")
	}
	click(t, ctx, scrollInto(t, ctx, path))
	waitFor(t, ctx, fmt.Sprintf(`(d => d.focus === %q && d.selected)(nodelife.debug())`, path), "the field "+path+" selected")
	key(t, ctx, "Backspace", "Backspace", 8)
	if _, err := chromedp.Run(ctx, chromedp.KeyEvent(value)); err != nil {
		t.Fatal(err)
	}
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().text === %q`, value), "the typed "+value)
	key(t, ctx, "Enter", "Enter", 13)
	waitFor(t, ctx, fmt.Sprintf(`nodelife.debug().values[%q] === %q`, path, value), path+" applied")
}
