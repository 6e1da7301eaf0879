//go:build js

// Command wasm is the browser app: the ui package's planner on a canvas, with
// the JavaScript API of static/nodelife.js wired to it.
package main

import (
	"github.com/hajimehoshi/ebiten/v2"

	"nodelife/ui"
)

func main() {
	page := connect()
	app, err := ui.New(ui.Options{Theme: preferredTheme(), OnFirstFrame: page.ready})
	if err != nil {
		page.fail(err)
		return
	}
	page.serve(app)
	ebiten.SetScreenClearedEveryFrame(false) // the app redraws only what changed
	if err := ebiten.RunGame(app); err != nil {
		page.fail(err)
	}
}
