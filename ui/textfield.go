package ui

import (
	"image/color"
	"math"
	"strconv"
	"strings"
)

// FieldEvent is what a NumberField's Update did.
type FieldEvent int

// Field events. Anything but FieldIdle needs a redraw.
const (
	FieldIdle   FieldEvent = iota // nothing
	FieldEdited                   // the text, caret or selection changed
	FieldCommit                   // Enter: check and apply the text
	FieldNudged                   // an arrow key stepped the value: apply the text now
	FieldCancel                   // Escape: text restored, focus given up
	FieldNext                     // Tab: commit and move to the next field
	FieldPrev                     // Shift+Tab: commit and move to the previous field
)

// maxFieldChars bounds what can be typed into a field.
const maxFieldChars = 24

// NumberField is the state of one editable number: its committed value, the
// text being edited, focus, selection and the reason a value was refused.
// Drawing is drawNumberField's job; Update only changes state.
type NumberField struct {
	Path    string  // JSON path of the value in the scenario
	Label   string  // short name shown left of the box
	Unit    string  // shown after the number, in the secondary ink
	Help    string  // one line under the box
	Step    float64 // what an arrow key adds or takes; Shift: ten times
	Min     float64 // nudges stop at Min and Max
	Max     float64
	Integer bool // whole numbers only

	Value    string // the committed value as text
	Text     string // the text in the box; equals Value unless being edited
	Focused  bool
	Selected bool   // the whole text is selected: typing replaces it
	Caret    int    // byte offset of the caret in Text (Text is ASCII)
	Err      string // why Text was refused; "" if it was not
	Hover    bool

	Box   Rect // the value box, placed by Form.Layout
	Row   Rect // label, box and help: the whole row, the click target
	help  []string
	label string // Label, shortened to fit if need be
}

// SetValue sets the committed value; the text follows unless the field is
// being edited.
func (f *NumberField) SetValue(v string) {
	f.Value = v
	if !f.Focused && f.Err == "" {
		f.Text = v
		f.Caret = len(v)
	}
}

// Focus gives the field the keyboard with its whole text selected.
func (f *NumberField) Focus() {
	f.Focused, f.Selected, f.Caret = true, true, len(f.Text)
}

// Blur takes the keyboard away.
func (f *NumberField) Blur() {
	f.Focused, f.Selected = false, false
}

// Edited reports whether the text differs from the committed value, so that
// it has to be committed or cancelled.
func (f *NumberField) Edited() bool { return f.Text != f.Value }

// Accept marks the text as committed: Value becomes what the engine now holds
// (normalized, e.g. "07" → "7") and any error goes away.
func (f *NumberField) Accept(value string) {
	f.Value, f.Text, f.Err = value, value, ""
	f.Caret = len(value)
}

// Refuse marks the text as refused with the engine's reason.
func (f *NumberField) Refuse(reason string) {
	f.Err = reason
	f.Selected = false
	f.Caret = len(f.Text)
}

// Update applies the keys and characters of in to a focused field. Clicks are
// the Form's business. It stops at the first key that ends the edit (commit,
// cancel, move) and reports it.
func (f *NumberField) Update(in *Input) FieldEvent {
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
			f.Text, f.Err = f.Value, ""
			f.Caret = len(f.Text)
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
			if in.Shift {
				dir *= 10
			}
			f.nudge(dir)
			return FieldNudged
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

// typeRune inserts r if it can be part of a number. A decimal comma becomes a
// point.
func (f *NumberField) typeRune(r rune) bool {
	if r == ',' {
		r = '.'
	}
	if !strings.ContainsRune("0123456789.-+eE", r) {
		return false
	}
	if f.Selected {
		f.Text, f.Caret, f.Selected = "", 0, false
	}
	if len(f.Text) >= maxFieldChars {
		return false
	}
	f.Text = f.Text[:f.Caret] + string(r) + f.Text[f.Caret:]
	f.Caret++
	return true
}

// nudge steps the value by dir × Step, from the text if it is a number and
// from the committed value if not, and keeps it within Min and Max.
func (f *NumberField) nudge(dir float64) {
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
	f.Caret, f.Selected = len(f.Text), false
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

// drawNumberField paints a field from its state: label, value box with the
// number and its unit, and the help line or, in the error colour, the reason
// its text was refused.
func drawNumberField(p *Painter, f *NumberField, th Theme) {
	pal := th.Palette
	body, small, mono := th.bodyStyle(), th.labelStyle(), th.monoStyle()
	p.Text(f.label, body, f.Row.X, f.Box.Y+(boxH-body.LineHeight())/2, AlignLeft, pal.Ink)

	fill, edge, edgeW := pal.Panel, pal.Rule, 1.0
	switch {
	case f.Err != "":
		fill, edge, edgeW = pal.ErrorFill, pal.Flat, 1
	case f.Hover && !f.Focused:
		edge = pal.InkSecondary
	}
	if f.Focused {
		edge, edgeW = pal.Focus, 2
		if f.Err != "" {
			edge = pal.Flat
		}
	}
	p.Fill(f.Box, fill)
	p.Frame(f.Box, edgeW, edge)

	unitW := 0.0
	if f.Unit != "" {
		unitW = p.fonts.Advance(f.Unit, small) + 4
		p.Text(f.Unit, small, f.Box.Right()-boxPad, f.Box.Y+(boxH-small.LineHeight())/2, AlignRight, pal.InkSecondary)
	}
	room := f.Box.W - 2*boxPad - unitW
	textW := p.fonts.Advance(f.Text, mono)
	shift := math.Max(textW-room, 0) // long text: show its end
	tx := f.Box.X + boxPad - shift
	ty := f.Box.Y + (boxH-mono.LineHeight())/2
	cp := p.Clip(Rect{f.Box.X + boxPad, f.Box.Y, room, f.Box.H})
	if f.Focused && f.Selected && f.Text != "" {
		cp.Fill(Rect{tx - 1, ty + 1, textW + 2, mono.LineHeight() - 2}, selectionColor(pal))
	}
	cp.Text(f.Text, mono, tx, ty, AlignLeft, pal.Ink)
	if f.Focused && !f.Selected {
		cx := tx + p.fonts.Advance(f.Text[:f.Caret], mono)
		cp.VLine(cx, ty+2, ty+mono.LineHeight()-2, 1, pal.Ink)
	}

	c := pal.InkSecondary
	if f.Err != "" {
		c = pal.Flat
	}
	p.Lines(f.help, small, f.Row.X, f.Box.Bottom()+helpGap, c)
}

// selectionColor is a light tint of the focus colour behind selected text.
func selectionColor(pal Palette) color.NRGBA { return over(withAlpha(pal.Focus, 0.22), pal.Panel) }
