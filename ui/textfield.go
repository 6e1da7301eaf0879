package ui

import (
	"image/color"
	"math"
	"strconv"
	"strings"
	"time"

	"nodelife/engine/scenario"
)

// FieldEvent is what a widget's Update did.
type FieldEvent int

// Field events. Anything but FieldIdle needs a redraw.
const (
	FieldIdle   FieldEvent = iota // nothing
	FieldEdited                   // the text, caret, selection or list changed
	FieldCommit                   // Enter, or a pick: check and apply the value
	FieldNudged                   // an arrow key stepped the value: apply it now
	FieldCancel                   // Escape: value restored, focus given up
	FieldNext                     // Tab: commit and move to the next field
	FieldPrev                     // Shift+Tab: commit and move to the previous field
)

// TextMode is what a TextField holds, which decides the characters it takes
// and what the arrow keys do.
type TextMode int

// The text modes.
const (
	NumberText   TextMode = iota // a number; arrows step it
	DateText                     // an ISO 8601 date; arrows step a day (Shift: a month)
	PositionText                 // "latitude, longitude" in degrees
	ZoneText                     // an IANA time zone name
)

// maxChars bounds what can be typed into a field of each mode.
var maxChars = [...]int{NumberText: 24, DateText: 10, PositionText: 32, ZoneText: 40}

// maxFieldChars is the longest number.
const maxFieldChars = 24

// TextField is the state of one typed value: its committed value, the text
// being edited, focus, selection and the reason a value was refused.
// Drawing is drawTextField's job; Update only changes state.
type TextField struct {
	Mode    TextMode
	Unit    string  // shown after the value, in the secondary ink
	Step    float64 // what an arrow key adds or takes (numbers); Shift: ten times
	Min     float64 // nudges stop at Min and Max
	Max     float64
	Integer bool // whole numbers only

	Value    string // the committed value as text
	Text     string // the text in the box; equals Value unless being edited
	Focused  bool
	Selected bool   // the whole text is selected: typing replaces it
	Caret    int    // byte offset of the caret in Text (Text is ASCII)
	Err      string // why Text was refused; "" if it was not
}

// SetValue sets the committed value; the text follows unless the field is
// being edited or shows a refused value.
func (f *TextField) SetValue(v string) {
	f.Value = v
	if !f.Focused && f.Err == "" {
		f.Text = v
		f.Caret = len(v)
	}
}

// Focus gives the field the keyboard with its whole text selected.
func (f *TextField) Focus() {
	f.Focused, f.Selected, f.Caret = true, true, len(f.Text)
}

// Blur takes the keyboard away.
func (f *TextField) Blur() {
	f.Focused, f.Selected = false, false
}

// Edited reports whether the text differs from the committed value, so that
// it has to be committed or cancelled.
func (f *TextField) Edited() bool { return f.Text != f.Value }

// Accept marks the text as committed: Value becomes what the engine now holds
// (normalized, e.g. "07" → "7") and any error goes away.
func (f *TextField) Accept(value string) {
	f.Value, f.Text, f.Err = value, value, ""
	f.Caret = len(value)
}

// Refuse marks the text as refused with the engine's reason.
func (f *TextField) Refuse(reason string) {
	f.Err = reason
	f.Selected = false
	f.Caret = len(f.Text)
}

// Revert puts the committed value back and forgets a refusal.
func (f *TextField) Revert() {
	f.Text, f.Err = f.Value, ""
	f.Caret = len(f.Text)
}

// Update applies the keys and characters of in to a focused field. Clicks are
// the Form's business. It stops at the first key that ends the edit (commit,
// cancel, move) and reports it.
func (f *TextField) Update(in *Input) FieldEvent {
	if !f.Focused {
		return FieldIdle
	}
	ev := FieldIdle
	for _, r := range in.Chars {
		if f.typeRune(r) {
			ev = FieldEdited
		}
	}
	for _, k := range in.Keys {
		switch k {
		case KeyEnter:
			return FieldCommit
		case KeyEscape:
			f.Revert()
			f.Blur()
			return FieldCancel
		case KeyTab:
			if in.Shift {
				return FieldPrev
			}
			return FieldNext
		case KeyUp, KeyDown:
			dir := 1.0
			if k == KeyDown {
				dir = -1
			}
			if f.nudge(dir, in.Shift) {
				return FieldNudged
			}
		case KeyBackspace, KeyDelete:
			switch {
			case f.Selected:
				f.Text, f.Caret, f.Selected = "", 0, false
			case k == KeyBackspace && f.Caret > 0:
				f.Text = f.Text[:f.Caret-1] + f.Text[f.Caret:]
				f.Caret--
			case k == KeyDelete && f.Caret < len(f.Text):
				f.Text = f.Text[:f.Caret] + f.Text[f.Caret+1:]
			}
			ev = FieldEdited
		case KeyLeft:
			if f.Selected {
				f.Caret = 0
			} else if f.Caret > 0 {
				f.Caret--
			}
			f.Selected = false
			ev = FieldEdited
		case KeyRight:
			if !f.Selected && f.Caret < len(f.Text) {
				f.Caret++
			} else {
				f.Caret = len(f.Text)
			}
			f.Selected = false
			ev = FieldEdited
		case KeyHome:
			f.Caret, f.Selected = 0, false
			ev = FieldEdited
		case KeyEnd:
			f.Caret, f.Selected = len(f.Text), false
			ev = FieldEdited
		case KeySelectAll:
			f.Selected = true
			ev = FieldEdited
		}
	}
	return ev
}

// typeRune inserts r if the mode takes it; every mode's text is ASCII. In a
// number a decimal comma becomes a point; a position keeps compass letters.
func (f *TextField) typeRune(r rune) bool {
	ok := false
	switch f.Mode {
	case NumberText:
		if r == ',' {
			r = '.'
		}
		ok = strings.ContainsRune("0123456789.-+eE", r)
	case DateText:
		ok = strings.ContainsRune("0123456789-", r)
	case PositionText:
		if r == '°' { // pasted degree signs go: the text stays ASCII, and degrees are the unit
			return false
		}
		ok = strings.ContainsRune("0123456789.,-+ NSEWnsew", r)
	case ZoneText:
		ok = r < 0x80 && (r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9' || strings.ContainsRune("/_-+", r))
	}
	if !ok {
		return false
	}
	if f.Selected {
		f.Text, f.Caret, f.Selected = "", 0, false
	}
	s := string(r)
	if len(f.Text)+len(s) > maxChars[f.Mode] {
		return false
	}
	f.Text = f.Text[:f.Caret] + s + f.Text[f.Caret:]
	f.Caret += len(s)
	return true
}

// nudge steps a number by dir × Step (Shift: ten steps) or a date by a day
// (Shift: a month); other modes do not step. It reports whether it stepped.
func (f *TextField) nudge(dir float64, shift bool) bool {
	switch f.Mode {
	case NumberText:
		if shift {
			dir *= 10
		}
		f.nudgeNumber(dir)
	case DateText:
		f.nudgeDate(int(dir), shift)
	default:
		return false
	}
	f.Caret, f.Selected = len(f.Text), false
	return true
}

// nudgeNumber steps the value by dir × Step, from the text if it is a number
// and from the committed value if not, and keeps it within Min and Max.
func (f *TextField) nudgeNumber(dir float64) {
	v, err := strconv.ParseFloat(strings.TrimSpace(f.Text), 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		v, err = strconv.ParseFloat(f.Value, 64)
		if err != nil {
			v = f.Min
		}
	}
	step := f.Step
	if step <= 0 {
		step = 1
	}
	// Land on a multiple of the step, so 4.3 nudged up by 1 becomes 5.
	n := v / step
	if dir > 0 {
		n = math.Floor(n+1e-9) + dir
	} else {
		n = math.Ceil(n-1e-9) + dir
	}
	v = math.Min(math.Max(n*step, f.Min), f.Max)
	if f.Integer {
		v = math.Round(v)
	}
	f.Text = FormatNumber(v)
}

// nudgeDate steps the date in the text (or the committed one) by dir days,
// or months with shift, within the scenario format's dates.
func (f *TextField) nudgeDate(dir int, months bool) {
	t, err := time.Parse(time.DateOnly, strings.TrimSpace(f.Text))
	if err != nil {
		if t, err = time.Parse(time.DateOnly, f.Value); err != nil {
			return
		}
	}
	if months {
		// The same day of the next month, or its last day (31 January → 28
		// February), not Go's normalized 3 March.
		first := time.Date(t.Year(), t.Month()+time.Month(dir), 1, 0, 0, 0, 0, time.UTC)
		last := first.AddDate(0, 1, -1).Day()
		t = first.AddDate(0, 0, min(t.Day(), last)-1)
	} else {
		t = t.AddDate(0, 0, dir)
	}
	lo, _ := time.Parse(time.DateOnly, scenario.MinDate)
	hi, _ := time.Parse(time.DateOnly, scenario.MaxDate)
	if t.Before(lo) {
		t = lo
	}
	if t.After(hi) {
		t = hi
	}
	f.Text = t.Format(time.DateOnly)
}

// FormatNumber writes v with no more digits than it needs, rounded to 9
// significant decimals so steps of 0.05 do not show binary noise.
func FormatNumber(v float64) string {
	r := math.Round(v*1e9) / 1e9
	if r == 0 {
		r = 0 // no "-0"
	}
	return strconv.FormatFloat(r, 'f', -1, 64)
}

// Field box padding, CSS px.
const boxPad = 8

// controlFrame paints a control's box: its fill and edge from its state.
func controlFrame(p *Painter, box Rect, hover, focused bool, err string, th Theme) {
	pal := th.Palette
	fill, edge, edgeW := pal.Panel, pal.Rule, 1.0
	switch {
	case err != "":
		fill, edge = pal.ErrorFill, pal.Flat
	case hover && !focused:
		edge = pal.InkSecondary
	}
	if focused {
		edge, edgeW = pal.Focus, 2
		if err != "" {
			edge = pal.Flat
		}
	}
	p.Fill(box, fill)
	p.Frame(box, edgeW, edge)
}

// drawTextField paints the value box of a field from its state: the text (or
// the refused text) and its unit, selection and caret.
func drawTextField(p *Painter, f *TextField, box Rect, hover bool, th Theme) {
	pal := th.Palette
	small, mono := th.labelStyle(), th.monoStyle()
	controlFrame(p, box, hover, f.Focused, f.Err, th)

	unitW := 0.0
	if f.Unit != "" {
		unitW = p.fonts.Advance(f.Unit, small) + 4
		p.Text(f.Unit, small, box.Right()-boxPad, box.Y+(box.H-small.LineHeight())/2, AlignRight, pal.InkSecondary)
	}
	room := box.W - 2*boxPad - unitW
	textW := p.fonts.Advance(f.Text, mono)
	shift := 0.0
	if f.Focused {
		shift = math.Max(textW-room, 0) // long text: show its end while typing
	}
	tx := box.X + boxPad - shift
	ty := box.Y + (box.H-mono.LineHeight())/2
	cp := p.Clip(Rect{box.X + boxPad, box.Y, room, box.H})
	if f.Focused && f.Selected && f.Text != "" {
		cp.Fill(Rect{tx - 1, ty + 1, textW + 2, mono.LineHeight() - 2}, selectionColor(pal))
	}
	cp.Text(f.Text, mono, tx, ty, AlignLeft, pal.Ink)
	if f.Focused && !f.Selected {
		cx := tx + p.fonts.Advance(f.Text[:f.Caret], mono)
		cp.VLine(cx, ty+2, ty+mono.LineHeight()-2, 1, pal.Ink)
	}
}

// selectionColor is a light tint of the focus colour behind selected text.
func selectionColor(pal Palette) color.NRGBA { return over(withAlpha(pal.Focus, 0.22), pal.Panel) }
