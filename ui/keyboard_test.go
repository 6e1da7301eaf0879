package ui

import (
	"encoding/json"
	"strings"
	"testing"

	"nodelife/engine/scenario"
)

// focusOf names what has the keyboard: "input PATH", "button LABEL" (the
// label tells the header's Options from the view's Back to the chart, which
// share an ID), or "" for nothing. It also checks that the debug state
// agrees and that an input and a button never both have it.
func focusOf(t *testing.T, a *App) string {
	t.Helper()
	d := a.Debug()
	var got []string
	if d.Focus != "" {
		got = append(got, "input "+d.Focus)
	}
	if a.btnFocus >= 0 {
		b := a.page.Buttons[a.btnFocus]
		if d.FocusButton != b.ID || !b.Enabled {
			t.Errorf("button %q (enabled %v) has the keyboard; Debug says %q", b.ID, b.Enabled, d.FocusButton)
		}
		for i, o := range a.page.Buttons {
			if o.Focused != (i == a.btnFocus) {
				t.Errorf("button %q drawn focused: %v", o.ID, o.Focused)
			}
		}
		got = append(got, "button "+b.Label)
	} else if d.FocusButton != "" {
		t.Errorf("no button has the keyboard; Debug says %q", d.FocusButton)
	}
	if len(got) > 1 {
		t.Errorf("two things have the keyboard: %q", got)
	}
	return strings.Join(got, " and ")
}

// walk presses Tab (Shift+Tab with back) once per entry of want and checks
// where the keyboard goes each time.
func walk(t *testing.T, a *App, back bool, want ...string) {
	t.Helper()
	for i, w := range want {
		in := keys(KeyTab)
		if back {
			in = shiftKeys(KeyTab)
		}
		tick(a, in)
		if got := focusOf(t, a); got != w {
			t.Fatalf("Tab %d (back %v): %q has the keyboard, want %q", i+1, back, got, w)
		}
	}
}

// tabToButton presses Tab until the button labelled label has the keyboard.
func tabToButton(t *testing.T, a *App, label string) {
	t.Helper()
	for range len(a.form.Rows) + len(a.page.Buttons) + 1 {
		if focusOf(t, a) == "button "+label {
			return
		}
		tick(a, keys(KeyTab))
	}
	t.Fatalf("Tab never reaches the button %s", label)
}

func TestKeyboardTabOrder(t *testing.T) {
	a, _ := newHosted(t)
	first, last := "input "+a.form.Rows[0].Path, "input "+a.form.Rows[len(a.form.Rows)-1].Path
	// With nothing focused Tab starts at the first input, as it always did.
	walk(t, a, false, first)
	// Backwards: the header's enabled buttons right to left (undo and redo
	// have nothing to do yet), then round to the last input.
	walk(t, a, true, "button Options", "button Export…", "button Save", "button Open…", last)
	// Forwards from the last input: the header left to right, then the
	// inputs again.
	walk(t, a, false, "button Open…", "button Save", "button Export…", "button Options", first)

	// Once there is something to undo, Undo joins the order.
	tabTo(t, a, "plan.years")
	tick(a, chars("6"))
	tick(a, keys(KeyEnter))
	tabTo(t, a, a.form.Rows[0].Path)
	walk(t, a, true, "button Undo", "button Options")
}

func TestKeyboardButtonsAct(t *testing.T) {
	a, h := newHosted(t)
	tabToButton(t, a, "Save")
	tick(a, keys(KeyEnter))
	tick(a, chars(" "))
	if len(h.downloads) != 2 || !strings.HasSuffix(strings.SplitN(h.downloads[1], ":", 2)[0], ".json") {
		t.Fatalf("Enter and Space on Save: downloads %q, want the scenario twice", h.downloads)
	}
	// Export… opens its menu with the first item ready for Enter; Down and
	// Enter pick the second, the chart as SVG.
	walk(t, a, false, "button Export…")
	tick(a, keys(KeyEnter))
	if a.menu == nil || a.menu.Highlight != 0 || a.Debug().Menu == nil {
		t.Fatalf("Enter on Export…: menu %+v, want it open with its first item highlighted", a.menu)
	}
	tick(a, keys(KeyDown))
	tick(a, keys(KeyEnter))
	if len(h.downloads) != 3 || !strings.Contains(h.downloads[2], "-chart.svg: <") {
		t.Fatalf("Down, Enter in the export menu: downloads %q, want the chart's SVG last", h.downloads)
	}
	if a.menu != nil || focusOf(t, a) != "button Export…" {
		t.Errorf("after the pick: menu %v, focus %q; want the menu closed and Export… still focused", a.menu, focusOf(t, a))
	}
	// Escape in a menu closes it; on the button it lets go of the button.
	tick(a, keys(KeyEnter))
	tick(a, keys(KeyEscape))
	if a.menu != nil || focusOf(t, a) != "button Export…" {
		t.Errorf("Escape in the menu: menu %v, focus %q", a.menu, focusOf(t, a))
	}
	tick(a, keys(KeyEscape))
	if got := focusOf(t, a); got != "" {
		t.Errorf("Escape on the button: %q keeps the keyboard", got)
	}
	if len(h.downloads) != 3 {
		t.Errorf("Escape acted: downloads %q", h.downloads)
	}
	// Enter on Open… and on its first item asks for the file picker.
	tabToButton(t, a, "Open…")
	tick(a, keys(KeyEnter))
	tick(a, keys(KeyEnter))
	if h.picks != 1 {
		t.Errorf("Enter, Enter on Open…: %d file pickers, want 1", h.picks)
	}
	// The debug state names the focused button.
	js, _ := json.Marshal(a.Debug())
	if !strings.Contains(string(js), `"focus_button":"open"`) {
		t.Errorf("debug state %.200s… lacks focus_button open", js)
	}
}

func TestKeyboardOptionsView(t *testing.T) {
	a, _ := newHosted(t)
	first := "input " + a.form.Rows[0].Path
	tabToButton(t, a, "Options")
	// The toggle keeps the keyboard as the view comes and goes.
	for _, shows := range []bool{true, false, true} {
		tick(a, keys(KeyEnter))
		if a.showOpts != shows || focusOf(t, a) != "button Options" {
			t.Fatalf("Enter on Options: view %v, focus %q; want %v and Options", a.showOpts, focusOf(t, a), shows)
		}
	}
	// The view's buttons come after the header's, in reading order.
	walk(t, a, false, "button Keep as an option", "button Back to the chart", first)
	walk(t, a, true, "button Back to the chart", "button Keep as an option")
	tick(a, keys(KeyEnter))
	if len(a.kept) != 1 || focusOf(t, a) != "button Keep as an option" {
		t.Fatalf("Enter on Keep: %d kept, focus %q", len(a.kept), focusOf(t, a))
	}
	walk(t, a, false, "button Back to the chart", "button Edit", "button Remove", first)
	// Back to the chart goes; the header's Options, which it stands for,
	// takes the keyboard.
	walk(t, a, true, "button Remove", "button Edit", "button Back to the chart")
	tick(a, keys(KeyEnter))
	if a.showOpts || focusOf(t, a) != "button Options" {
		t.Errorf("Enter on Back to the chart: view %v, focus %q; want the chart and Options", a.showOpts, focusOf(t, a))
	}
}

func TestKeyboardFocusMovesOnFromAButtonThatGoes(t *testing.T) {
	a, _ := newHosted(t)
	// Keep is disabled once three options are kept: Back to the chart,
	// next in the order, takes the keyboard.
	tabToButton(t, a, "Options")
	tick(a, keys(KeyEnter))
	walk(t, a, false, "button Keep as an option")
	for n, years := range []string{"6", "7", ""} {
		tick(a, keys(KeyEnter))
		if len(a.kept) != n+1 {
			t.Fatalf("Enter on Keep: %d kept, want %d", len(a.kept), n+1)
		}
		if years != "" {
			if r := a.apply(Edit{Path: "plan.years", Text: years}); r != "" {
				t.Fatal(r)
			}
			a.form.Sync(a.scen)
		}
	}
	if got := focusOf(t, a); got != "button Back to the chart" {
		t.Errorf("Keep disabled: %q has the keyboard, want Back to the chart", got)
	}
	// Undo until there is nothing left: Redo, next, takes the keyboard.
	walk(t, a, true, "button Undo")
	for range 2 {
		tick(a, keys(KeyEnter))
	}
	if d := a.Debug(); d.Undo != 0 || focusOf(t, a) != "button Redo" {
		t.Errorf("Enter on Undo till none is left: undo %d, focus %q; want 0 and Redo", d.Undo, focusOf(t, a))
	}
	// Removing the only kept option's column: nothing after it, so nothing
	// keeps the keyboard.
	tabToButton(t, a, "Remove")
	for len(a.kept) > 1 {
		tick(a, keys(KeyEnter))
	}
	if got := focusOf(t, a); got != "button Remove" {
		t.Fatalf("Remove with more kept: %q, want the next column's Remove", got)
	}
	tick(a, keys(KeyEnter))
	if len(a.kept) != 0 || focusOf(t, a) != "" {
		t.Errorf("the last Remove: %d kept, focus %q; want none and none", len(a.kept), focusOf(t, a))
	}
}

func TestKeyboardTabOutOfTheInputsCommits(t *testing.T) {
	a, _ := newHosted(t)
	last := a.form.Rows[len(a.form.Rows)-1]
	if last.Text == nil {
		t.Fatalf("the last input %s is not typed: the test needs one", last.Path)
	}
	// A typed value not yet applied is applied as Tab leaves for the header.
	tabTo(t, a, last.Path)
	tick(a, chars("75"))
	tick(a, keys(KeyTab))
	if got := focusOf(t, a); got != "button Open…" {
		t.Errorf("Tab from the last input: %q has the keyboard, want Open…", got)
	}
	if d := a.Debug(); d.Values[last.Path] != "75" || d.Undo != 1 || len(d.Errors) != 0 {
		t.Errorf("Tab from the last input after typing 75: shows %q, undo %d, errors %v", d.Values[last.Path], d.Undo, d.Errors)
	}
	if js := string(a.scen.JSON()); !strings.Contains(js, "75") {
		t.Errorf("the scenario lacks the typed 75: %s", js)
	}
	// A refused one keeps the keyboard in its input, as Tab between inputs
	// does.
	walk(t, a, true, "input "+last.Path)
	tick(a, chars("99999999999"))
	tick(a, keys(KeyTab))
	if got := focusOf(t, a); got != "input "+last.Path || a.Debug().Errors[last.Path] == "" {
		t.Errorf("Tab on a refused value: focus %q, errors %v; want it kept with the reason", got, a.Debug().Errors)
	}
}

func TestKeyboardPressLetsGoOfAButton(t *testing.T) {
	a, h := newHosted(t)
	// A press on the focused button acts and keeps it.
	tabToButton(t, a, "Save")
	tick(a, press(center(a.Debug().Buttons["save"])))
	if len(h.downloads) != 1 || focusOf(t, a) != "button Save" {
		t.Errorf("a press on the focused Save: downloads %q, focus %q", h.downloads, focusOf(t, a))
	}
	// A press anywhere else lets go: on empty page, on an input, on a menu
	// item.
	tick(a, press(center(a.page.Footer)))
	if got := focusOf(t, a); got != "" {
		t.Errorf("a press on the footer: %q keeps the keyboard", got)
	}
	tabToButton(t, a, "Save")
	path := "" // an input in view: Tab scrolled the column on its way
	for _, r := range a.form.Rows {
		if _, ok := a.Debug().Fields[r.Path]; ok && r.Text != nil && path == "" {
			path = r.Path
		}
	}
	tick(a, press(center(a.Debug().Fields[path])))
	if got := focusOf(t, a); got != "input "+path {
		t.Errorf("a press on %s: %q has the keyboard", path, got)
	}
	tabToButton(t, a, "Export…")
	tick(a, keys(KeyEnter))
	tick(a, press(center(a.Debug().Menu["export-json"])))
	if got := focusOf(t, a); got != "" || len(h.downloads) != 2 || a.menu != nil {
		t.Errorf("a press on a menu item: focus %q, downloads %q, menu %v", got, h.downloads, a.menu)
	}
}

func TestKeyboardNarrowOptionsView(t *testing.T) {
	a, _ := newHosted(t)
	a.resize(760, 900, 1)
	walk(t, a, false, "input "+a.form.Rows[0].Path)
	walk(t, a, true, "button Options")
	tick(a, keys(KeyEnter))
	if !a.page.Form.Empty() || !a.showOpts {
		t.Fatal("the narrow options view shows the inputs")
	}
	// The inputs are hidden: Tab goes round the buttons only.
	walk(t, a, false, "button Keep as an option", "button Back to the chart", "button Open…")
	walk(t, a, true, "button Back to the chart")
	tick(a, keys(KeyEscape))
	walk(t, a, false, "button Open…")
	tick(a, keys(KeyEscape))
	walk(t, a, true, "button Back to the chart")
	// Back: the header's Options keeps the keyboard, and the inputs are
	// in the order again.
	tick(a, keys(KeyEnter))
	if got := focusOf(t, a); got != "button Options" || a.page.Form.Empty() {
		t.Fatalf("Enter on Back to the chart: focus %q, inputs shown %v", got, !a.page.Form.Empty())
	}
	walk(t, a, false, "input "+a.form.Rows[0].Path)
}

// An input that had the keyboard when the narrow options view hid it lets
// go when Tab moves to the buttons.
func TestKeyboardHiddenInputLetsGo(t *testing.T) {
	a, _ := newHosted(t)
	a.resize(760, 900, 1)
	tabTo(t, a, "plan.years")
	tick(a, chars("9"))
	a.act("options")
	walk(t, a, false, "button Open…")
	s, _ := scenario.Parse(a.ScenarioJSON())
	if s.Plan.Years == 9 {
		t.Error("a value typed before the view hid its input was applied")
	}
}
