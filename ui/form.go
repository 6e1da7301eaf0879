package ui

import (
	"strings"

	"nodelife/engine/scenario"
)

// formGroup is a group as laid out.
type formGroup struct {
	title     string
	info      []string // the read-only line, long then short
	fields    []int
	titleAt   Rect // the title line
	infoLines []string
	infoAt    Rect
}

// Edit is a value the user committed, for the app to check and apply. The app
// answers with Form.Settle.
type Edit struct {
	Path, Text string
}

// Moves of the focus that wait for the app's verdict on an edit.
type focusMove int

const (
	moveNone focusMove = iota // stay
	moveNext                  // Tab
	movePrev                  // Shift+Tab
	moveTo                    // a click on another field (moves even if refused)
	moveBlur                  // a click outside every field (blurs even if refused)
)

// Form is the column of editable numbers: the fields, which one has the
// keyboard, the hovered one and the scroll offset.
type Form struct {
	Fields  []*NumberField
	groups  []formGroup
	focus   int // index into Fields, or -1
	hover   int
	pending struct {
		active bool
		field  int
		move   focusMove
		target int // for moveTo
	}
	View    Rect    // the column on screen
	ScrollY float64 // how far the content is scrolled up
	Content float64 // the content's full height
}

// NewForm builds the fields for s.
func NewForm(s scenario.Scenario) *Form {
	f := &Form{focus: -1, hover: -1}
	f.Rebuild(s)
	return f
}

// Rebuild makes the fields for s anew (a loaded scenario may use another
// temperature field), keeping the focus on the same path if it still exists.
func (f *Form) Rebuild(s scenario.Scenario) {
	focusPath := ""
	if f.focus >= 0 {
		focusPath = f.Fields[f.focus].Path
	}
	f.Fields, f.groups, f.focus, f.hover = nil, nil, -1, -1
	f.pending.active = false
	for _, g := range specsFor(s) {
		fg := formGroup{title: g.title, info: groupInfo(g.title, s)}
		for _, sp := range g.fields {
			sf, ok := scenario.FieldByPath(sp.path)
			if !ok {
				panic("ui: unknown field " + sp.path)
			}
			nf := &NumberField{Path: sp.path, Label: sp.label, Unit: sf.Unit, Help: helpText(s, sf),
				Step: sp.step, Min: sf.Min, Max: sf.Max, Integer: sf.Kind == scenario.Integer}
			nf.SetValue(valueText(s, sp.path))
			if sp.path == focusPath {
				f.focus = len(f.Fields)
				nf.Focus()
			}
			fg.fields = append(fg.fields, len(f.Fields))
			f.Fields = append(f.Fields, nf)
		}
		f.groups = append(f.groups, fg)
	}
}

// SetValues refreshes the committed values and help from s after an edit was
// applied.
func (f *Form) SetValues(s scenario.Scenario) {
	for _, nf := range f.Fields {
		nf.SetValue(valueText(s, nf.Path))
		if sf, ok := scenario.FieldByPath(nf.Path); ok {
			nf.Help = helpText(s, sf)
		}
	}
	for i := range f.groups {
		f.groups[i].info = groupInfo(f.groups[i].title, s)
	}
}

// Focused returns the field with the keyboard, or nil.
func (f *Form) Focused() *NumberField {
	if f.focus < 0 {
		return nil
	}
	return f.Fields[f.focus]
}

// Field returns the field with the given path, or nil.
func (f *Form) Field(path string) *NumberField {
	for _, nf := range f.Fields {
		if nf.Path == path {
			return nf
		}
	}
	return nil
}

// Update applies one tick of input. It reports whether anything visible
// changed, and an edit for the app to check when the user committed one; the
// app must then call Settle before the next Update.
func (f *Form) Update(in *Input) (changed bool, edit *Edit) {
	// Hover.
	h := f.hit(in.MouseX, in.MouseY)
	if h != f.hover {
		if f.hover >= 0 {
			f.Fields[f.hover].Hover = false
		}
		if h >= 0 {
			f.Fields[h].Hover = true
		}
		f.hover, changed = h, true
	}
	// Scrolling.
	if in.WheelY != 0 && f.View.Contains(in.MouseX, in.MouseY) {
		if f.scrollTo(f.ScrollY - in.WheelY*40) {
			changed = true
		}
	}
	// A press: focus a field, or leave the fields.
	if in.Pressed {
		switch {
		case h >= 0 && h == f.focus:
			nf := f.Fields[h]
			if nf.Selected {
				nf.Selected, nf.Caret = false, len(nf.Text)
				changed = true
			}
		case h >= 0:
			if e := f.leave(moveTo, h); e != nil {
				return true, e
			}
			changed = true
		case f.focus >= 0:
			if e := f.leave(moveBlur, -1); e != nil {
				return true, e
			}
			changed = true
		}
	}
	// Keys to the focused field; Tab with no focus starts at the first field.
	nf := f.Focused()
	if nf == nil {
		for _, k := range in.Keys {
			if k == KeyTab && len(f.Fields) > 0 {
				start := 0
				if in.Shift {
					start = len(f.Fields) - 1
				}
				f.focusOn(start)
				return true, nil
			}
		}
		return changed, nil
	}
	switch nf.Update(in) {
	case FieldIdle:
	case FieldEdited, FieldCancel:
		if f.focus >= 0 && !f.Fields[f.focus].Focused {
			f.focus = -1
		}
		changed = true
	case FieldCommit, FieldNudged:
		if nf.Edited() {
			return true, f.request(moveNone, -1)
		}
		nf.Err = ""
		nf.Selected = true // Enter on an unchanged value: ready to retype
		changed = true
	case FieldNext:
		if e := f.leave(moveNext, -1); e != nil {
			return true, e
		}
		changed = true
	case FieldPrev:
		if e := f.leave(movePrev, -1); e != nil {
			return true, e
		}
		changed = true
	}
	return changed, nil
}

// leave moves the focus away from the focused field: at once if it holds no
// edit, else after the app has checked the edit, which leave returns.
func (f *Form) leave(move focusMove, target int) *Edit {
	if nf := f.Focused(); nf != nil {
		if nf.Edited() {
			return f.request(move, target)
		}
		nf.Err = "" // back at the committed value
	}
	f.doMove(move, target)
	return nil
}

func (f *Form) request(move focusMove, target int) *Edit {
	nf := f.Fields[f.focus]
	f.pending.active, f.pending.field, f.pending.move, f.pending.target = true, f.focus, move, target
	return &Edit{Path: nf.Path, Text: nf.Text}
}

// Settle takes the app's verdict on the last Edit: "" if it was applied (the
// app has already called SetValues), else the reason it was refused. A
// refused edit keeps the focus for Enter and Tab; a click elsewhere still
// moves it, and the field keeps showing the refused text and reason.
func (f *Form) Settle(reason string) {
	if !f.pending.active {
		return
	}
	f.pending.active = false
	nf := f.Fields[f.pending.field]
	if reason == "" {
		nf.Accept(nf.Value)
		if f.pending.move == moveNone {
			nf.Selected = true
		}
		f.doMove(f.pending.move, f.pending.target)
		return
	}
	nf.Refuse(reason)
	if f.pending.move == moveTo || f.pending.move == moveBlur {
		f.doMove(f.pending.move, f.pending.target)
	}
}

func (f *Form) doMove(move focusMove, target int) {
	n := len(f.Fields)
	switch move {
	case moveNext:
		f.focusOn((f.focus + 1) % n)
	case movePrev:
		f.focusOn((f.focus + n - 1) % n)
	case moveTo:
		f.focusOn(target)
	case moveBlur:
		if nf := f.Focused(); nf != nil {
			nf.Blur()
		}
		f.focus = -1
	}
}

func (f *Form) focusOn(i int) {
	if nf := f.Focused(); nf != nil {
		nf.Blur()
	}
	f.focus = i
	f.Fields[i].Focus()
	f.reveal(i)
}

// hit returns the index of the field whose row is under x, y, or -1.
func (f *Form) hit(x, y float64) int {
	if !f.View.Contains(x, y) {
		return -1
	}
	for i, nf := range f.Fields {
		if nf.Row.Contains(x, y) {
			return i
		}
	}
	return -1
}

// scrollTo sets the scroll offset, kept within the content, and moves the
// field rectangles with it. It reports whether anything moved.
func (f *Form) scrollTo(y float64) bool {
	y = max(0, min(y, f.Content-f.View.H))
	d := y - f.ScrollY
	if d == 0 {
		return false
	}
	f.ScrollY = y
	for _, nf := range f.Fields {
		nf.Box.Y -= d
		nf.Row.Y -= d
	}
	for i := range f.groups {
		f.groups[i].titleAt.Y -= d
		f.groups[i].infoAt.Y -= d
	}
	return true
}

// reveal scrolls so the field's row is in view.
func (f *Form) reveal(i int) {
	r := f.Fields[i].Row
	switch {
	case r.Y < f.View.Y:
		f.scrollTo(f.ScrollY - (f.View.Y - r.Y))
	case r.Bottom() > f.View.Bottom():
		f.scrollTo(f.ScrollY + (r.Bottom() - f.View.Bottom()))
	}
}

// Form geometry, CSS px, on the theme's 8 px grid.
const (
	boxW       = 128 // value box
	boxH       = 26
	helpGap    = 2 // box to help line
	rowGap     = 8 // help line to the next row
	titleGap   = 4 // group title (and info) to its first row
	groupGap   = 8 // last row of a group to the next title
	labelToBox = 8
)

// Layout places the groups and fields in view (the column's rectangle) and
// returns the content's full height. Help and error lines wrap to the column.
func (f *Form) Layout(view Rect, m Measurer, th Theme) float64 {
	f.View = view
	label, small := th.labelStyle(), th.labelStyle()
	y := view.Y
	for gi := range f.groups {
		g := &f.groups[gi]
		if gi > 0 {
			y += groupGap
		}
		// The title, and the info beside it when it fits, else under it.
		titleW := m.Advance(strings.ToUpper(g.title), th.headStyle())
		g.titleAt = Rect{view.X, y, titleW, small.LineHeight()}
		y += small.LineHeight()
		g.infoLines = nil
		infoX := view.X + titleW + 8
		for _, info := range g.info {
			if m.Advance(info, small) <= view.Right()-infoX {
				g.infoLines = []string{info}
				g.infoAt = Rect{infoX, g.titleAt.Y, view.Right() - infoX, small.LineHeight()}
				break
			}
		}
		if g.infoLines == nil && len(g.info) > 0 {
			g.infoLines = Wrap(m, g.info[0], small, view.W)
			g.infoAt = Rect{view.X, y, view.W, float64(len(g.infoLines)) * small.LineHeight()}
			y += g.infoAt.H
		}
		y += titleGap
		for _, i := range g.fields {
			nf := f.Fields[i]
			text := nf.Help
			if nf.Err != "" {
				text = nf.Err
			}
			nf.help = Wrap(m, text, label, view.W)
			nf.label = Elide(m, nf.Label, th.bodyStyle(), view.W-boxW-labelToBox)
			h := boxH + helpGap + float64(len(nf.help))*label.LineHeight()
			nf.Row = Rect{view.X, y, view.W, h}
			nf.Box = Rect{view.Right() - boxW, y, boxW, boxH}
			y += h + rowGap
		}
	}
	f.Content = y - rowGap - view.Y
	// Keep the scroll offset valid for the new size.
	s := f.ScrollY
	f.ScrollY = 0
	f.scrollTo(s)
	return f.Content
}

// drawForm paints the column.
func drawForm(p *Painter, f *Form, th Theme) {
	pal := th.Palette
	small := th.labelStyle()
	cp := p.Clip(f.View)
	for _, g := range f.groups {
		cp.Text(strings.ToUpper(g.title), th.headStyle(), g.titleAt.X, g.titleAt.Y, AlignLeft, pal.InkSecondary)
		cp.Lines(g.infoLines, small, g.infoAt.X, g.infoAt.Y, pal.InkSecondary)
	}
	for _, nf := range f.Fields {
		drawNumberField(cp, nf, th)
	}
	// A scroll bar when the content is taller than the column.
	if f.Content > f.View.H {
		track := f.View.H
		thumb := max(track*f.View.H/f.Content, 24)
		y := f.View.Y + (track-thumb)*f.ScrollY/(f.Content-f.View.H)
		p.Fill(Rect{f.View.Right() + 4, y, 3, thumb}, pal.Rule)
	}
}

func (th Theme) labelStyle() TextStyle { return TextStyle{Regular, th.Type.Label} }
func (th Theme) headStyle() TextStyle  { return TextStyle{Medium, th.Type.Label} } // small caps heads
func (th Theme) bodyStyle() TextStyle  { return TextStyle{Regular, th.Type.Body} }
func (th Theme) monoStyle() TextStyle  { return TextStyle{Mono, th.Type.Body} }
