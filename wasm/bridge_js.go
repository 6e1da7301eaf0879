//go:build js

package main

import (
	"encoding/json"
	"syscall/js"

	"nodelife/ui"
)

// page is the connection to static/nodelife.js, which defines the public API
// (window.nodelife) on top of the plain functions registered here: each takes
// and returns strings, and reports an error as {error: message} so the
// JavaScript side can throw a real Error. page is also the app's ui.Host:
// autosave, the live summary, downloads and the file picker are the page's.
type page struct {
	hooks js.Value // nodelife.js's hooks (_connect, _ready, _fail, …), or undefined
}

// connect finds the page's nodelife object and its hooks.
func connect() *page {
	p := &page{hooks: js.Undefined()}
	nl := js.Global().Get("nodelife")
	if nl.Type() == js.TypeObject && nl.Get("_connect").Type() == js.TypeFunction {
		p.hooks = nl
	}
	return p
}

// call calls hook name if the page has it.
func (p *page) call(name string, args ...any) js.Value {
	if p.hooks.IsUndefined() || p.hooks.Get(name).Type() != js.TypeFunction {
		return js.Undefined()
	}
	return p.hooks.Call(name, args...)
}

// saved is the scenario the page kept from the last visit, or nil.
func (p *page) saved() []byte {
	v := p.call("_saved")
	if v.Type() != js.TypeString || v.String() == "" {
		return nil
	}
	return []byte(v.String())
}

// savedOptions are the options the page kept from the last visit, or nil.
func (p *page) savedOptions() []byte {
	v := p.call("_savedOptions")
	if v.Type() != js.TypeString || v.String() == "" {
		return nil
	}
	return []byte(v.String())
}

// KeepOptions keeps the options kept for comparison for the next visit
// (ui.Host); nil forgets them.
func (p *page) KeepOptions(data []byte) { p.call("_keepOptions", string(data)) }

// setAside moves the kept scenario out of the way, so a bad one is not
// read again, and returns where it went.
func (p *page) setAside() string {
	v := p.call("_setAside")
	if v.Type() != js.TypeString {
		return ""
	}
	return v.String()
}

// Changed keeps the scenario for the next visit and mirrors the answer into
// the page (ui.Host).
func (p *page) Changed(scenarioJSON []byte, summary string) {
	p.call("_changed", string(scenarioJSON), summary)
}

// Download offers data as a file (ui.Host). The bytes go over as a
// Uint8Array, so binary files (the chart's PNG) arrive unchanged.
func (p *page) Download(name, mimeType string, data []byte) {
	body := js.Global().Get("Uint8Array").New(len(data))
	js.CopyBytesToJS(body, data)
	p.call("_download", name, mimeType, body)
}

// PickFile opens the page's file picker (ui.Host).
func (p *page) PickFile() { p.call("_pick") }

// serve registers the bridge functions for app.
func (p *page) serve(app *ui.App) {
	if p.hooks.IsUndefined() {
		return
	}
	bridge := map[string]any{
		"run": js.FuncOf(func(_ js.Value, args []js.Value) any {
			// The second argument is false for the answer without the advice.
			noAdvice := len(args) > 1 && args[1].Type() == js.TypeBoolean && !args[1].Bool()
			return reply(ui.Run([]byte(arg(args, 0)), ui.RunOptions{NoAdvice: noAdvice}))
		}),
		"load": js.FuncOf(func(_ js.Value, args []js.Value) any {
			return reply(app.Load([]byte(arg(args, 0))))
		}),
		"open": js.FuncOf(func(_ js.Value, args []js.Value) any {
			return reply(nil, app.Open([]byte(arg(args, 0)), arg(args, 1)))
		}),
		"paste": js.FuncOf(func(_ js.Value, args []js.Value) any {
			app.Paste(arg(args, 0))
			return nil
		}),
		"theme": js.FuncOf(func(_ js.Value, args []js.Value) any {
			app.SetTheme(themeFor(len(args) > 0 && args[0].Truthy()))
			return nil
		}),
		"scenario": js.FuncOf(func(js.Value, []js.Value) any {
			return reply(app.ScenarioJSON(), nil)
		}),
		"result": js.FuncOf(func(js.Value, []js.Value) any {
			return reply(app.ResultJSON(), nil)
		}),
		"debug": js.FuncOf(func(js.Value, []js.Value) any {
			return reply(json.Marshal(app.Debug()))
		}),
	}
	p.hooks.Call("_connect", js.ValueOf(bridge))
}

// ready tells the page the first frame is on screen.
func (p *page) ready() { p.call("_ready") }

// fail shows err in the page (and the console).
func (p *page) fail(err error) {
	js.Global().Get("console").Call("error", "nodelife: "+err.Error())
	if !p.hooks.IsUndefined() {
		p.hooks.Call("_fail", err.Error())
		return
	}
	doc := js.Global().Get("document")
	div := doc.Call("createElement", "pre")
	div.Set("textContent", "nodelife could not start: "+err.Error())
	doc.Get("body").Call("prepend", div)
}

func arg(args []js.Value, i int) string {
	if len(args) <= i || args[i].Type() != js.TypeString {
		return ""
	}
	return args[i].String()
}

func reply(data []byte, err error) any {
	if err != nil {
		return map[string]any{"error": err.Error()}
	}
	return map[string]any{"json": string(data)}
}

// prefersDark reads the browser's light or dark preference.
func prefersDark() bool {
	mm := js.Global().Get("matchMedia")
	return mm.Type() == js.TypeFunction && js.Global().Call("matchMedia", "(prefers-color-scheme: dark)").Get("matches").Bool()
}

func themeFor(dark bool) ui.Theme {
	if dark {
		return ui.Dark()
	}
	return ui.Light()
}
