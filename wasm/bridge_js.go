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
// JavaScript side can throw a real Error.
type page struct {
	hooks js.Value // {ready(), fail(message)} from nodelife.js, or undefined
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

// serve registers the bridge functions for app.
func (p *page) serve(app *ui.App) {
	if p.hooks.IsUndefined() {
		return
	}
	bridge := map[string]any{
		"run": js.FuncOf(func(_ js.Value, args []js.Value) any {
			return reply(ui.Run([]byte(arg(args))))
		}),
		"load": js.FuncOf(func(_ js.Value, args []js.Value) any {
			return reply(app.Load([]byte(arg(args))))
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
func (p *page) ready() {
	if !p.hooks.IsUndefined() {
		p.hooks.Call("_ready")
	}
}

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

func arg(args []js.Value) string {
	if len(args) == 0 || args[0].Type() != js.TypeString {
		return ""
	}
	return args[0].String()
}

func reply(data []byte, err error) any {
	if err != nil {
		return map[string]any{"error": err.Error()}
	}
	return map[string]any{"json": string(data)}
}

// preferredTheme follows the browser's light or dark preference.
func preferredTheme() ui.Theme {
	mm := js.Global().Get("matchMedia")
	if mm.Type() == js.TypeFunction && js.Global().Call("matchMedia", "(prefers-color-scheme: dark)").Get("matches").Bool() {
		return ui.Dark()
	}
	return ui.Light()
}
