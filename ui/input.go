package ui

import (
	"runtime"

	"github.com/hajimehoshi/ebiten/v2"
	"github.com/hajimehoshi/ebiten/v2/inpututil"
)

// wheelLinePx is how far one line of the wheel scrolls a column, CSS px.
const wheelLinePx = 40

// Key is a special key the widgets act on.
type Key int

// The special keys.
const (
	KeyNone Key = iota
	KeyEnter
	KeyEscape
	KeyTab // with Input.Shift: backwards
	KeyBackspace
	KeyDelete
	KeyLeft
	KeyRight
	KeyUp
	KeyDown
	KeyHome
	KeyEnd
	KeyPageUp
	KeyPageDown
	KeySelectAll // Ctrl+A or Cmd+A
	KeyUndo      // Ctrl+Z or Cmd+Z
	KeyRedo      // Shift+Ctrl+Z, Shift+Cmd+Z or Ctrl+Y
	KeyOpen      // Ctrl+O or Cmd+O
	KeySave      // Ctrl+S or Cmd+S
)

// Input is everything the user did in one tick, in CSS pixels. It is built
// from ebiten in one place, ReadInput; widgets only read it, so tests make
// their own.
type Input struct {
	MouseX, MouseY float64 // pointer position
	Pressed        bool    // the primary button or a touch went down this tick
	Released       bool    // … and came up this tick
	Down           bool    // the primary button or a touch is held
	WheelY         float64 // wheel turned this tick, in lines; positive is up
	Shift          bool    // held during this tick
	Keys           []Key   // special keys pressed this tick, repeats included
	Chars          []rune  // characters typed (or pasted) this tick, in order
}

// Has reports whether k was pressed this tick.
func (in *Input) Has(k Key) bool {
	for _, x := range in.Keys {
		if x == k {
			return true
		}
	}
	return false
}

var keyMap = map[ebiten.Key]Key{
	ebiten.KeyEnter: KeyEnter, ebiten.KeyNumpadEnter: KeyEnter,
	ebiten.KeyEscape: KeyEscape, ebiten.KeyTab: KeyTab,
	ebiten.KeyBackspace: KeyBackspace, ebiten.KeyDelete: KeyDelete,
	ebiten.KeyArrowLeft: KeyLeft, ebiten.KeyArrowRight: KeyRight,
	ebiten.KeyArrowUp: KeyUp, ebiten.KeyArrowDown: KeyDown,
	ebiten.KeyHome: KeyHome, ebiten.KeyEnd: KeyEnd,
	ebiten.KeyPageUp: KeyPageUp, ebiten.KeyPageDown: KeyPageDown,
}

// Shortcuts with Ctrl (or Cmd on a Mac) held.
var commandMap = map[ebiten.Key]Key{
	ebiten.KeyA: KeySelectAll, ebiten.KeyZ: KeyUndo, ebiten.KeyY: KeyRedo,
	ebiten.KeyO: KeyOpen, ebiten.KeyS: KeySave,
}

// Key repeat for held editing and arrow keys, in ticks at ebiten's 60 ticks a
// second: start after 0.5 s, then 15 a second (common desktop defaults).
const (
	repeatDelayTicks    = 30
	repeatIntervalTicks = 4
)

// ReadInput takes this tick's input from ebiten. scale is the device scale
// factor: ebiten reports the pointer in screen pixels, the app works in CSS
// pixels. It is the only function in the app that calls ebiten's input API.
func ReadInput(scale float64) Input {
	var in Input
	x, y := ebiten.CursorPosition()
	in.MouseX, in.MouseY = float64(x)/scale, float64(y)/scale
	in.Pressed = inpututil.IsMouseButtonJustPressed(ebiten.MouseButtonLeft)
	in.Released = inpututil.IsMouseButtonJustReleased(ebiten.MouseButtonLeft)
	in.Down = ebiten.IsMouseButtonPressed(ebiten.MouseButtonLeft)
	// A touch acts as the primary button at the touch point.
	for _, id := range ebiten.AppendTouchIDs(nil) {
		tx, ty := ebiten.TouchPosition(id)
		in.MouseX, in.MouseY = float64(tx)/scale, float64(ty)/scale
		in.Down = true
		break
	}
	for _, id := range inpututil.AppendJustPressedTouchIDs(nil) {
		tx, ty := ebiten.TouchPosition(id)
		in.MouseX, in.MouseY = float64(tx)/scale, float64(ty)/scale
		in.Pressed = true
		break
	}
	for _, id := range inpututil.AppendJustReleasedTouchIDs(nil) {
		tx, ty := inpututil.TouchPositionInPreviousTick(id)
		in.MouseX, in.MouseY = float64(tx)/scale, float64(ty)/scale
		in.Released = true
		break
	}

	_, in.WheelY = ebiten.Wheel()
	if runtime.GOOS == "js" {
		// A browser's wheel event comes in CSS px (about 100 a notch), not
		// lines: scale it to the widgets' 40 px lines, so a notch scrolls
		// about 100 px rather than to the end of the column.
		in.WheelY /= wheelLinePx
	}
	in.Shift = ebiten.IsKeyPressed(ebiten.KeyShift)
	command := ebiten.IsKeyPressed(ebiten.KeyControl) || ebiten.IsKeyPressed(ebiten.KeyMeta)
	for _, k := range inpututil.AppendPressedKeys(nil) {
		d := inpututil.KeyPressDuration(k)
		repeat := d == 1 || d >= repeatDelayTicks && (d-repeatDelayTicks)%repeatIntervalTicks == 0
		if !repeat {
			continue
		}
		if key, ok := commandMap[k]; ok && command {
			if d == 1 {
				if key == KeyUndo && in.Shift {
					key = KeyRedo
				}
				in.Keys = append(in.Keys, key)
			}
			continue
		}
		if key, ok := keyMap[k]; ok && (d == 1 || repeatable(key)) {
			in.Keys = append(in.Keys, key)
		}
	}
	// With Ctrl or Cmd held a letter is a shortcut, not a character (ebiten
	// reports it as both).
	if !command {
		in.Chars = ebiten.AppendInputChars(nil)
	}
	return in
}

func repeatable(k Key) bool {
	switch k {
	case KeyBackspace, KeyDelete, KeyLeft, KeyRight, KeyUp, KeyDown, KeyPageUp, KeyPageDown:
		return true
	}
	return false
}
