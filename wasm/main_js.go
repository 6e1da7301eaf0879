//go:build js

// Command wasm is the browser app: the ui package's planner on a canvas, with
// the JavaScript API of static/nodelife.js wired to it.
package main

import (
	"fmt"

	"github.com/hajimehoshi/ebiten/v2"

	"nodelife/engine/scenario"
	"nodelife/ui"
)

func main() {
	page := connect()
	o := ui.Options{Theme: themeFor(prefersDark()), OnFirstFrame: page.ready, Host: page, KeptOptions: page.savedOptions()}
	// The scenario kept from the last visit; one that no longer opens is set
	// aside and reported, and the demo shows instead.
	setAside := func(err error) {
		where := page.setAside()
		o.Scenario = nil
		o.Notice, o.NoticeError = fmt.Sprintf("The scenario kept in this browser could not be opened, so the demo is shown; "+
			"the old one was set aside (%s). %v", where, err), true
	}
	if saved := page.saved(); saved != nil {
		if _, err := scenario.Parse(saved); err != nil {
			setAside(err)
		} else {
			o.Scenario = saved
		}
	}
	app, err := ui.New(o)
	if err != nil && o.Scenario != nil {
		setAside(err)
		app, err = ui.New(o)
	}
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
