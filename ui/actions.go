package ui

import (
	"fmt"
	"strings"
	"unicode"

	"nodelife/engine/report"
	"nodelife/engine/scenario"
)

// act runs a header action. Call with a.mu held.
func (a *App) act(id string) {
	switch id {
	case "undo":
		a.undo(false)
	case "redo":
		a.undo(true)
	case "open":
		a.openMenu("open", openItems)
	case "open-file":
		if a.host != nil {
			a.outbox = append(a.outbox, a.host.PickFile)
		}
	case "open-demo":
		if a.open(scenario.DemoJSON()) == nil {
			a.setNotice("Opened the demo. Ctrl+Z goes back to the scenario before it.", false)
		}
	case "save":
		a.download(fileName(a.scen.Name, ".json"), "application/json", a.scen.JSON())
	case "export":
		items := exportItems
		if len(a.kept) > 0 {
			items = append(items[:len(items):len(items)], exportOptionsItem)
		}
		a.openMenu("export", items)
	case "export-options":
		a.exportOptions()
	case "options":
		a.showOpts = !a.showOpts
		a.layout()
	case "keep":
		a.keep()
	default:
		var i int
		if _, err := fmt.Sscanf(id, "option-edit-%d", &i); err == nil {
			a.editKept(i)
		} else if _, err := fmt.Sscanf(id, "option-remove-%d", &i); err == nil {
			a.removeKept(i)
		}
	case "export-json":
		a.download(fileName(a.scen.Name, "-result.json"), "application/json", a.resJSON)
	case "export-svg":
		svg := report.SVG(a.res, report.SVGOptions{ReservePct: a.scen.Plan.ReservePct, Shading: report.ShadingFor(a.scen)})
		a.download(fileName(a.scen.Name, "-chart.svg"), "image/svg+xml", svg)
	case "export-png":
		a.wantPNG, a.dirty = true, true // painted and read back in the next Draw
	case "export-daily":
		a.download(fileName(a.scen.Name, "-daily.csv"), "text/csv", report.DailyCSV(a.res))
	case "export-swaps":
		a.download(fileName(a.scen.Name, "-swaps.csv"), "text/csv", report.SwapsCSV(a.res))
	}
}

// exportItems are the export menu's entries: an action and its label.
var exportItems = []Option{
	{Value: "export-json", Label: "Result", Detail: "JSON, as the command line gives it"},
	{Value: "export-svg", Label: "Chart", Detail: "SVG, for print and slides"},
	{Value: "export-png", Label: "Chart picture", Detail: "PNG, as sharp as the screen"},
	{Value: "export-daily", Label: "Daily rows", Detail: "CSV"},
	{Value: "export-swaps", Label: "Swap dates", Detail: "CSV"},
}

// exportOptionsItem is the export menu's entry for the options, while
// there are kept ones.
var exportOptionsItem = Option{Value: "export-options", Label: "Options", Detail: "JSON, the comparison"}

// openItems are the open menu's entries.
var openItems = []Option{
	{Value: "open-file", Label: "Scenario or weather file…", Detail: "JSON, EPW or TMY3; or drop it on the page"},
	{Value: "open-demo", Label: "The demo", Detail: "an invented store's shelf watcher"},
}

// openMenu shows a menu of items under the header button id. Call with
// a.mu held.
func (a *App) openMenu(id string, items []Option) {
	for _, b := range a.page.Buttons {
		if b.ID == id {
			m := &Choice{Options: items, Index: -1, Open: true, HoverSeg: -1, Pending: -1}
			m.Place(b.At, a.page.Screen, a.fonts, a.theme)
			if m.List.Right() > b.At.Right() { // right-aligned with its button
				m.List.X = max(b.At.Right()-m.List.W, 8)
			}
			a.menu, a.dirty = m, true
		}
	}
}

// menuStep gives this tick's input to an open menu: the pointer highlights,
// a press on an item acts, any other press or Escape closes it. It reports
// whether the menu took the input.
func (a *App) menuStep(in *Input) bool {
	m := a.menu
	if m == nil {
		return false
	}
	if m.Hover(Rect{}, in.MouseX, in.MouseY) {
		a.dirty = true
	}
	for _, k := range in.Keys {
		switch k {
		case KeyEscape:
			a.menu, a.dirty = nil, true
			return true
		case KeyUp:
			m.Highlight, a.dirty = max(m.Highlight-1, 0), true
		case KeyDown:
			m.Highlight, a.dirty = min(m.Highlight+1, len(m.Options)-1), true
		case KeyEnter:
			a.menu, a.dirty = nil, true
			a.act(m.Options[m.Highlight].Value)
			return true
		}
	}
	if in.Pressed {
		a.menu, a.dirty = nil, true
		if i := m.item(in.MouseX, in.MouseY); i >= 0 {
			a.act(m.Options[i].Value)
		}
		return true
	}
	return len(in.Keys) > 0
}

func (a *App) download(name, mime string, data []byte) {
	if a.host == nil {
		return
	}
	data = append([]byte(nil), data...)
	a.outbox = append(a.outbox, func() { a.host.Download(name, mime, data) })
}

// fileName makes a file name from a scenario's name: lower case, words
// joined by hyphens, at most 60 characters, then suffix.
func fileName(name, suffix string) string {
	var b strings.Builder
	dash := false
	for _, r := range strings.ToLower(name) {
		if unicode.IsLetter(r) || unicode.IsDigit(r) {
			if dash && b.Len() > 0 {
				b.WriteByte('-')
			}
			b.WriteRune(r)
			dash = false
			if b.Len() >= 60 {
				break
			}
			continue
		}
		dash = true
	}
	if b.Len() == 0 {
		b.WriteString("scenario")
	}
	return b.String() + suffix
}
