package ui

import (
	"testing"
)

// fonts parses the fonts once per test binary.
var sharedFonts *Fonts

func fonts(t *testing.T) *Fonts {
	t.Helper()
	if sharedFonts == nil {
		f, err := LoadFonts()
		if err != nil {
			t.Fatal(err)
		}
		sharedFonts = f
	}
	return sharedFonts
}

// newApp returns the demo app laid out at w × h CSS px, scale 1.
func newApp(t *testing.T, w, h float64) *App {
	t.Helper()
	a, err := New(Options{})
	if err != nil {
		t.Fatal(err)
	}
	a.resize(w, h, 1)
	return a
}

// Hand-made inputs.
func keys(k ...Key) *Input             { return &Input{MouseX: -1, MouseY: -1, Keys: k} }
func chars(s string) *Input            { return &Input{MouseX: -1, MouseY: -1, Chars: []rune(s)} }
func shiftKeys(k ...Key) *Input        { in := keys(k...); in.Shift = true; return in }
func press(x, y float64) *Input        { return &Input{MouseX: x, MouseY: y, Pressed: true} }
func release(x, y float64) *Input      { return &Input{MouseX: x, MouseY: y, Released: true} }
func center(r Rect) (float64, float64) { return r.X + r.W/2, r.Y + r.H/2 }

// click presses and releases on the centre of r, one tick each.
func click(a *App, r Rect) {
	x, y := center(r)
	a.step(press(x, y))
	a.step(release(x, y))
}

// tabTo presses Tab until the input at path has the keyboard. Tab goes
// round the inputs and the page's buttons, so once round is enough.
func tabTo(t *testing.T, a *App, path string) {
	t.Helper()
	for range len(a.form.Rows) + len(a.page.Buttons) + 1 {
		if r := a.form.Focused(); r != nil && r.Path == path {
			return
		}
		a.step(keys(KeyTab))
	}
	t.Fatalf("Tab never reaches %s", path)
}
