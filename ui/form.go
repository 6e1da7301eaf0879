package ui

import (
	"slices"
	"strconv"
	"strings"

	"nodelife/engine/scenario"
)

// Row is one input of the form: a label, its control (a typed value or a
// choice, a slider under some typed values) and a help line under it that
// shows the engine's reason instead when a value is refused.
type Row struct {
	Path     string
	Label    string // short name left of the control
	Help     string // what the input means, in full (see helpText)
	HelpLine string // … in the one line shown under it
	Text     *TextField
	Choice   *Choice
	Slider   *Slider // under a typed number, or nil

	Hover bool
	Row   Rect // label, control, slider and help: the click target
	Box   Rect // the control
	ctl   control
	help  []string
	label string // Label, shortened to fit if need be
}

// Err is why the row's value was refused, or "".
func (r *Row) Err() string {
	if r.Text != nil {
		return r.Text.Err
	}
	return r.Choice.Err
}

// Focused reports whether the row has the keyboard.
func (r *Row) Focused() bool {
	if r.Text != nil {
		return r.Text.Focused
	}
	return r.Choice.Focused
}

// Edited reports whether the row holds typed text not yet committed.
func (r *Row) Edited() bool { return r.Text != nil && r.Text.Edited() }

func (r *Row) focus() {
	if r.Text != nil {
		r.Text.Focus()
	} else {
		r.Choice.Focus()
	}
}

func (r *Row) blur() {
	if r.Text != nil {
		r.Text.Blur()
	} else {
		r.Choice.Blur()
	}
}

// Display is the row's value as shown: the typed text or the chosen label.
func (r *Row) Display() string {
	if r.Text != nil {
		return r.Text.Text
	}
	return r.Choice.Label()
}

// formGroup is a group as laid out.
type formGroup struct {
	title     string
	info      []string // the read-only line, long then short
	rows      []int
	titleAt   Rect // the title line
	infoLines []string
	infoAt    Rect
}

// Moves of the focus that wait for the app's verdict on an edit.
type focusMove int

const (
	moveNone focusMove = iota // stay
	moveNext                  // Tab
	movePrev                  // Shift+Tab
	moveTo                    // a click on another row (moves even if refused)
	moveBlur                  // a click outside every row (blurs even if refused)
)

// Form is the column of inputs: the rows in Tab order, which one has the
// keyboard, the hovered one, an open drop-down, a dragged slider and the
// scroll offset.
type Form struct {
	Rows    []*Row
	groups  []formGroup
	focus   int // index into Rows, or -1
	hover   int
	open    int // the row whose list is open, or -1
	drag    int // the row whose slider is being dragged, or -1
	pending struct {
		active bool
		row    int
		move   focusMove
		target int // for moveTo
	}
	View    Rect     // the column on screen
	Screen  Rect     // where an open list may go
	ScrollY float64  // how far the content is scrolled up
	Content float64  // the content's full height
	measure Measurer // from the last Layout, to place lists
	theme   Theme
	boxW    float64 // the control boxes' width in this layout
	// revealAfterLayout scrolls the focused row into view at the next
	// layout, which gives it its full help.
	revealAfterLayout bool
	// Exits makes Tab on the last row and Shift+Tab on the first leave the
	// rows instead of going round them, so the page's buttons can take the
	// keyboard (the app sets it; a form on its own goes round). TakeExit
	// tells which way the focus left.
	Exits  bool
	exited int // +1 after the last row, -1 before the first, 0 when not out
}

// place puts the open list beside its row.
func (f *Form) place() {
	if r := f.OpenList(); r != nil && f.measure != nil {
		r.Choice.Place(r.Box, f.Screen, f.measure, f.theme)
	}
}

// NewForm builds the rows for s.
func NewForm(s scenario.Scenario) *Form {
	f := &Form{focus: -1, hover: -1, open: -1, drag: -1}
	f.Rebuild(s)
	return f
}

// paths lists the inputs specsFor gives s.
func paths(s scenario.Scenario) []string {
	var ps []string
	for _, g := range specsFor(s) {
		for _, sp := range g.fields {
			ps = append(ps, sp.path)
		}
	}
	return ps
}

// Rebuild makes the rows for s anew (another placement shows another
// temperature, a harvester its area), keeping the focus on the same path and
// a refused value in a row that stays.
func (f *Form) Rebuild(s scenario.Scenario) {
	focusPath := ""
	if r := f.Focused(); r != nil {
		focusPath = r.Path
	}
	refused := map[string]*TextField{}
	for _, r := range f.Rows {
		if r.Text != nil && r.Text.Err != "" {
			refused[r.Path] = r.Text
		}
	}
	f.Rows, f.groups, f.focus, f.hover, f.open, f.drag = nil, nil, -1, -1, -1, -1
	f.pending.active = false
	for _, g := range specsFor(s) {
		fg := formGroup{title: g.title, info: groupInfo(g.title, s)}
		for _, sp := range g.fields {
			r := newRow(s, sp)
			if old := refused[sp.path]; old != nil {
				r.Text.Text, r.Text.Err = old.Text, old.Err
			}
			if sp.path == focusPath {
				f.focus = len(f.Rows)
				r.focus()
			}
			fg.rows = append(fg.rows, len(f.Rows))
			f.Rows = append(f.Rows, r)
		}
		f.groups = append(f.groups, fg)
	}
}

func newRow(s scenario.Scenario, sp fieldSpec) *Row {
	r := &Row{Path: sp.path, Label: sp.label, ctl: sp.ctl}
	r.HelpLine, r.Help = helpText(s, sp.path)
	v := valueText(s, sp.path)
	switch sp.ctl {
	case ctlDrop, ctlSegments:
		r.Choice = NewChoice(optionsFor(s, sp.path), v, sp.ctl == ctlSegments)
	default:
		t := &TextField{Step: sp.step}
		switch sp.ctl {
		case ctlDate:
			t.Mode = DateText
		case ctlPosition:
			t.Mode = PositionText
		case ctlZone:
			t.Mode = ZoneText
		}
		if sf, ok := scenario.FieldByPath(sp.path); ok {
			t.Min, t.Max, t.Integer = sf.Min, sf.Max, sf.Kind == scenario.Integer
		}
		t.Unit = unitFor(s, sp.path)
		t.SetValue(v)
		r.Text = t
		if sp.stops != nil {
			r.Slider = &Slider{Stops: sp.stops}
			r.Slider.Value, _ = parseNumber(v)
		}
	}
	return r
}

// parseNumber reads a number as a field shows it.
func parseNumber(s string) (float64, bool) {
	v, err := strconv.ParseFloat(strings.TrimSpace(s), 64)
	return v, err == nil
}

// Sync shows s: the committed values, the choices' options, the help lines
// and the sliders; rows come and go when s needs other inputs.
func (f *Form) Sync(s scenario.Scenario) {
	if !slices.Equal(paths(s), f.paths()) {
		f.Rebuild(s)
		return
	}
	for _, r := range f.Rows {
		v := valueText(s, r.Path)
		r.HelpLine, r.Help = helpText(s, r.Path)
		if r.Text != nil {
			r.Text.Unit = unitFor(s, r.Path) // a cost's follows the currency
			r.Text.SetValue(v)
			if r.Slider != nil && !r.Slider.Dragging {
				r.Slider.Value, _ = parseNumber(v)
			}
			continue
		}
		r.Choice.Options = optionsFor(s, r.Path)
		r.Choice.SetValue(v)
	}
	for i := range f.groups {
		f.groups[i].info = groupInfo(f.groups[i].title, s)
	}
}

func (f *Form) paths() []string {
	ps := make([]string, len(f.Rows))
	for i, r := range f.Rows {
		ps[i] = r.Path
	}
	return ps
}

// Focused returns the row with the keyboard, or nil.
func (f *Form) Focused() *Row {
	if f.focus < 0 {
		return nil
	}
	return f.Rows[f.focus]
}

// Row returns the row with the given path, or nil.
func (f *Form) Row(path string) *Row {
	for _, r := range f.Rows {
		if r.Path == path {
			return r
		}
	}
	return nil
}

// OpenList returns the row whose drop-down list is open, or nil.
func (f *Form) OpenList() *Row {
	if f.open < 0 {
		return nil
	}
	return f.Rows[f.open]
}

// Dragging reports whether a slider is being dragged.
func (f *Form) Dragging() bool { return f.drag >= 0 }

// Cancel drops a typed value not yet committed, a refusal and an open list:
// the rows show the committed values again.
func (f *Form) Cancel() {
	for _, r := range f.Rows {
		if r.Text != nil {
			r.Text.Revert()
			r.Text.Selected = r.Text.Focused
		} else {
			r.Choice.Open, r.Choice.Err, r.Choice.Pending = false, "", -1
		}
	}
	f.open = -1
	f.pending.active = false
}

// Update applies one tick of input. It reports whether anything visible
// changed, and an edit for the app to check when the user committed one; the
// app must then call Settle (or, for a slider's edit, Sync) before the next
// Update.
func (f *Form) Update(in *Input) (changed bool, edit *Edit) {
	mx, my := in.MouseX, in.MouseY
	// A dragged slider has the pointer to itself.
	if f.drag >= 0 {
		r := f.Rows[f.drag]
		switch r.Slider.Update(in) {
		case SliderMoved:
			r.Text.Text = FormatNumber(r.Slider.Value)
			return true, &Edit{Path: r.Path, Text: r.Text.Text, Drag: true}
		case SliderDropped:
			f.drag = -1
			return true, &Edit{Path: r.Path, Text: FormatNumber(r.Slider.Value)}
		}
		return false, nil
	}
	// An open list takes the pointer first; a press outside it closes it
	// and does nothing else.
	if f.open >= 0 {
		r := f.Rows[f.open]
		if r.Choice.Hover(r.Box, mx, my) {
			changed = true
		}
		if in.Pressed {
			switch r.Choice.Press(r.Box, mx, my) {
			case FieldCommit:
				f.open = -1
				return true, f.request(f.focus, moveNone, -1)
			case FieldIdle:
				r.Choice.Open = false
			}
			if !r.Choice.Open {
				f.open = -1
			}
			return true, nil
		}
	}
	// Hover.
	h := f.hit(mx, my)
	if h != f.hover {
		if f.hover >= 0 {
			f.Rows[f.hover].Hover = false
		}
		if h >= 0 {
			f.Rows[h].Hover = true
		}
		f.hover, changed = h, true
	}
	for i, r := range f.Rows {
		if r.Slider == nil || !r.Slider.Track.Within(f.View) {
			continue
		}
		switch r.Slider.Update(in) {
		case SliderRedraw:
			changed = true
			if r.Slider.Dragging {
				f.drag = i
			}
		case SliderMoved:
			f.drag = i
			r.Text.Text = FormatNumber(r.Slider.Value)
			return true, &Edit{Path: r.Path, Text: r.Text.Text, Drag: true}
		}
		if f.drag >= 0 {
			return true, nil
		}
	}
	if h >= 0 {
		if r := f.Rows[h]; r.Choice != nil && r.Choice.Hover(r.Box, mx, my) {
			changed = true
		}
	}
	// Scrolling.
	if in.WheelY != 0 && f.View.Contains(mx, my) && f.open < 0 {
		if f.scrollTo(f.ScrollY - in.WheelY*wheelLinePx) {
			changed = true
		}
	}
	// A press: focus a row (and work its choice), or leave the rows.
	if in.Pressed {
		switch {
		case h >= 0 && h == f.focus:
			r := f.Rows[h]
			if r.Text != nil && r.Text.Selected {
				r.Text.Selected, r.Text.Caret = false, len(r.Text.Text)
				changed = true
			}
			if e, ch := f.pressChoice(h, mx, my); e != nil || ch {
				return true, e
			}
		case h >= 0:
			if e := f.leave(moveTo, h); e != nil {
				return true, e
			}
			if e, _ := f.pressChoice(h, mx, my); e != nil {
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
	// Keys to the focused row; Tab with no focus starts at the first row.
	r := f.Focused()
	if r == nil {
		for _, k := range in.Keys {
			if k == KeyTab && len(f.Rows) > 0 {
				start := 0
				if in.Shift {
					start = len(f.Rows) - 1
				}
				f.focusOn(start)
				return true, nil
			}
		}
		return changed, nil
	}
	if r.Choice != nil {
		ev := r.Choice.Update(in)
		if r.Choice.Open {
			if f.open != f.focus {
				f.open = f.focus
				f.place()
			}
		} else {
			f.open = -1
		}
		switch ev {
		case FieldEdited:
			changed = true
		case FieldCommit:
			return true, f.request(f.focus, moveNone, -1)
		case FieldCancel:
			f.focus = -1
			changed = true
		case FieldNext:
			f.doMove(moveNext, -1)
			changed = true
		case FieldPrev:
			f.doMove(movePrev, -1)
			changed = true
		}
		return changed, nil
	}
	switch r.Text.Update(in) {
	case FieldIdle:
	case FieldEdited, FieldCancel:
		if !r.Text.Focused {
			f.focus = -1
		}
		changed = true
	case FieldCommit, FieldNudged:
		if r.Text.Edited() {
			return true, f.request(f.focus, moveNone, -1)
		}
		r.Text.Err = ""
		r.Text.Selected = true // Enter on an unchanged value: ready to retype
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

// pressChoice hands a press to row i's choice, if it has one: it returns an
// edit for a pick, and whether anything changed.
func (f *Form) pressChoice(i int, x, y float64) (*Edit, bool) {
	c := f.Rows[i].Choice
	if c == nil {
		return nil, false
	}
	ev := c.Press(f.Rows[i].Box, x, y)
	if c.Open {
		f.open = i
		f.place()
	} else if f.open == i {
		f.open = -1
	}
	switch ev {
	case FieldCommit:
		return f.request(i, moveNone, -1), true
	case FieldEdited:
		return nil, true
	}
	return nil, false
}

// leave moves the focus away from the focused row: at once if it holds no
// typed edit, else after the app has checked the edit, which leave returns.
func (f *Form) leave(move focusMove, target int) *Edit {
	if r := f.Focused(); r != nil {
		if r.Edited() {
			return f.request(f.focus, move, target)
		}
		if r.Text != nil {
			r.Text.Err = "" // back at the committed value
		}
	}
	f.doMove(move, target)
	return nil
}

func (f *Form) request(i int, move focusMove, target int) *Edit {
	r := f.Rows[i]
	f.pending.active, f.pending.row, f.pending.move, f.pending.target = true, i, move, target
	if r.Choice != nil {
		return &Edit{Path: r.Path, Text: r.Choice.Picked()}
	}
	return &Edit{Path: r.Path, Text: r.Text.Text}
}

// Settle takes the app's verdict on the last Edit: "" if it was applied,
// with s the scenario now shown, else the reason it was refused. A refused
// typed value keeps the focus for Enter and Tab; a click elsewhere still
// moves it, and the row keeps showing the refused text and reason.
func (f *Form) Settle(reason string, s scenario.Scenario) {
	if f.pending.active {
		f.pending.active = false
		r := f.Rows[f.pending.row]
		move, target := f.pending.move, f.pending.target
		switch {
		case reason == "" && r.Text != nil:
			r.Text.Accept(valueText(s, r.Path))
			if move == moveNone {
				r.Text.Selected = true
			}
			f.doMove(move, target)
		case reason == "":
			r.Choice.Settle("")
			f.doMove(move, target)
		case r.Text != nil:
			r.Text.Refuse(reason)
			if move == moveTo || move == moveBlur {
				f.doMove(move, target)
			}
		default:
			r.Choice.Settle(reason)
		}
	}
	if reason == "" {
		f.Sync(s)
	}
}

// doMove moves the focus at once: to the next or previous row (round the
// ends, or out of the rows with Exits), to row target, or off the rows.
func (f *Form) doMove(move focusMove, target int) {
	n := len(f.Rows)
	switch move {
	case moveNext:
		if f.Exits && f.focus == n-1 {
			f.exit(+1)
			return
		}
		f.focusOn((f.focus + 1) % n)
	case movePrev:
		if f.Exits && f.focus == 0 {
			f.exit(-1)
			return
		}
		f.focusOn((f.focus + n - 1) % n)
	case moveTo:
		f.focusOn(target)
	case moveBlur:
		if r := f.Focused(); r != nil {
			r.blur()
		}
		f.focus = -1
		f.open = -1
	}
}

// exit lets go of the focused row as a click outside the rows does, and
// notes the way out (+1 forward, -1 back) for TakeExit.
func (f *Form) exit(dir int) {
	f.doMove(moveBlur, -1)
	f.exited = dir
}

// TakeExit reports whether the focus left the rows by Tab (+1) or
// Shift+Tab (-1) since the last call, or 0, and forgets it.
func (f *Form) TakeExit() int {
	d := f.exited
	f.exited = 0
	return d
}

// FocusRow gives row i the keyboard, as Tab arriving at it does, letting go
// of the focused row (the caller makes sure that holds no typed edit).
func (f *Form) FocusRow(i int) { f.focusOn(i) }

// Blur takes the keyboard off the rows at once: a typed value not yet
// committed stays in its row as typed; Cancel drops it.
func (f *Form) Blur() { f.doMove(moveBlur, -1) }

// focusOn gives row i the keyboard and scrolls it into view.
func (f *Form) focusOn(i int) {
	if r := f.Focused(); r != nil {
		r.blur()
	}
	f.open = -1
	f.focus = i
	f.Rows[i].focus()
	f.reveal(i)
	f.revealAfterLayout = true // its help line grows to the full text
}

// hit returns the index of the row under x, y, or -1.
func (f *Form) hit(x, y float64) int {
	if !f.View.Contains(x, y) {
		return -1
	}
	for i, r := range f.Rows {
		if r.Row.Contains(x, y) {
			return i
		}
	}
	return -1
}

// scrollTo sets the scroll offset, kept within the content, and moves the
// rows with it. It reports whether anything moved.
func (f *Form) scrollTo(y float64) bool {
	y = max(0, min(y, f.Content-f.View.H))
	d := y - f.ScrollY
	if d == 0 {
		return false
	}
	f.ScrollY = y
	for _, r := range f.Rows {
		r.Box.Y -= d
		r.Row.Y -= d
		if r.Slider != nil {
			r.Slider.Track.Y -= d
		}
	}
	for i := range f.groups {
		f.groups[i].titleAt.Y -= d
		f.groups[i].infoAt.Y -= d
	}
	return true
}

// reveal scrolls so the row is in view.
func (f *Form) reveal(i int) {
	r := f.Rows[i].Row
	switch {
	case r.Y < f.View.Y:
		f.scrollTo(f.ScrollY - (f.View.Y - r.Y))
	case r.Bottom() > f.View.Bottom():
		f.scrollTo(f.ScrollY + (r.Bottom() - f.View.Bottom()))
	}
}

// Form geometry, CSS px, on the theme's 8 px grid.
const (
	boxW       = 152 // control box, at most
	minBoxW    = 120 // … and at least
	segBoxW    = 184 // segmented choices
	boxH       = 26
	sliderH    = 20 // the slider's row under the box
	helpGap    = 2  // box to help line
	rowGap     = 8  // help line to the next row
	titleGap   = 4  // group title (and info) to its first row
	groupGap   = 12 // last row of a group to the next title
	labelToBox = 8
)

// Form columns: a wide form splits its groups into two columns of at least
// formColMin, formColGap apart.
const (
	formColMin = 272
	formColGap = 32
)

// Layout places the groups and rows in view (the column's rectangle, split
// in two when it is wide enough) and returns the content's full height. Help
// and error lines wrap to the column; open lists stay inside screen.
func (f *Form) Layout(view, screen Rect, m Measurer, th Theme) float64 {
	f.View, f.Screen, f.measure, f.theme = view, screen, m, th
	cols := 1
	colW := view.W
	if view.W >= 2*formColMin+formColGap {
		cols, colW = 2, (view.W-formColGap)/2
	}
	// Boxes line up in a column: as wide as boxW, narrower if a label would
	// not fit beside them, but never under minBoxW.
	labelW := 0.0
	for _, r := range f.Rows {
		if r.ctl != ctlSegments {
			labelW = max(labelW, m.Advance(r.Label, th.bodyStyle()))
		}
	}
	f.boxW = min(max(colW-labelW-labelToBox, minBoxW), boxW)
	// Measure each group, then fill the first column up to about half.
	heights := make([]float64, len(f.groups))
	total := 0.0
	for gi := range f.groups {
		heights[gi] = f.layoutGroup(gi, view.X, 0, colW, m, th)
		total += heights[gi]
	}
	x, y := view.X, view.Y
	f.Content = 0
	used := 0.0
	for gi := range f.groups {
		if gi > 0 && cols == 2 && x == view.X && used+heights[gi]/2 > total/2 {
			f.Content = max(f.Content, y-groupGap-view.Y)
			x, y = view.X+colW+formColGap, view.Y
		}
		f.layoutGroup(gi, x, y, colW, m, th)
		y += heights[gi] + groupGap
		used += heights[gi]
	}
	f.Content = max(f.Content, y-groupGap-view.Y)
	// Keep the scroll offset valid for the new size.
	s := f.ScrollY
	f.ScrollY = 0
	f.scrollTo(s)
	if f.revealAfterLayout && f.focus >= 0 {
		f.reveal(f.focus)
	}
	f.revealAfterLayout = false
	f.place()
	return f.Content
}

// layoutGroup places group gi's title and rows from x, y in a column w wide
// and returns its height.
func (f *Form) layoutGroup(gi int, x, y, w float64, m Measurer, th Theme) float64 {
	label, small := th.labelStyle(), th.labelStyle()
	g := &f.groups[gi]
	top := y
	// The title, and the info beside it when it fits, else under it.
	titleW := m.Advance(strings.ToUpper(g.title), th.headStyle())
	g.titleAt = Rect{x, y, titleW, small.LineHeight()}
	y += small.LineHeight()
	g.infoLines = nil
	infoX := x + titleW + 8
	for _, info := range g.info {
		if m.Advance(info, small) <= x+w-infoX {
			g.infoLines = []string{info}
			g.infoAt = Rect{infoX, g.titleAt.Y, x + w - infoX, small.LineHeight()}
			break
		}
	}
	if g.infoLines == nil && len(g.info) > 0 {
		g.infoLines = Wrap(m, g.info[0], small, w)
		g.infoAt = Rect{x, y, w, float64(len(g.infoLines)) * small.LineHeight()}
		y += g.infoAt.H
	}
	y += titleGap
	for n, i := range g.rows {
		r := f.Rows[i]
		if n > 0 {
			y += rowGap
		}
		// One line of help, the full text while the row has the keyboard;
		// a refusal always in full. The line is written to fit the
		// narrowest column, so Elide only guards a narrower one.
		switch err := r.Err(); {
		case err != "":
			r.help = Wrap(m, err, label, w)
		case r.Focused():
			r.help = Wrap(m, r.Help, label, w)
		default:
			r.help = []string{Elide(m, r.HelpLine, label, w)}
		}
		bw := f.boxW
		if r.ctl == ctlSegments {
			bw = min(segBoxW, w-m.Advance(r.Label, th.bodyStyle())-labelToBox)
		}
		r.label = Elide(m, r.Label, th.bodyStyle(), w-bw-labelToBox)
		r.Box = Rect{x + w - bw, y, bw, boxH}
		h := float64(boxH)
		if r.Slider != nil {
			r.Slider.Track = Rect{x + 8, y + boxH + 4, w - 16, sliderH - 8}
			h += sliderH
		}
		h += helpGap + float64(len(r.help))*label.LineHeight()
		r.Row = Rect{x, y, w, h}
		y += h
	}
	return y - top
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
	for _, r := range f.Rows {
		if r.Row.Bottom() < f.View.Y || r.Row.Y > f.View.Bottom() {
			continue
		}
		drawRow(cp, r, th)
	}
	// A scroll bar when the content is taller than the column.
	if f.Content > f.View.H+0.5 {
		track := f.View.H
		thumb := max(track*f.View.H/f.Content, 24)
		y := f.View.Y + (track-thumb)*f.ScrollY/(f.Content-f.View.H)
		p.Fill(Rect{f.View.Right() + 4, y, 3, thumb}, pal.InkSecondary) // 3:1 and more against the page, as a control needs
	}
}

// drawFormOverlay paints an open list over everything else.
func drawFormOverlay(p *Painter, f *Form, th Theme) {
	if r := f.OpenList(); r != nil {
		drawChoiceList(p, r.Choice, th)
	}
}

// drawRow paints a row from its state: label, control, slider, and the help
// line or, in the error colour, the reason its value was refused.
func drawRow(p *Painter, r *Row, th Theme) {
	pal := th.Palette
	body, small := th.bodyStyle(), th.labelStyle()
	p.Text(r.label, body, r.Row.X, r.Box.Y+(boxH-body.LineHeight())/2, AlignLeft, pal.Ink)
	if r.Text != nil {
		drawTextField(p, r.Text, r.Box, r.Hover, th)
	} else {
		drawChoice(p, r.Choice, r.Box, r.Hover, th)
	}
	y := r.Box.Bottom() + helpGap
	if r.Slider != nil {
		drawSlider(p, r.Slider, th)
		y += sliderH
	}
	c := pal.InkSecondary
	if r.Err() != "" {
		c = pal.Flat
	}
	p.Lines(r.help, small, r.Row.X, y, c)
}

func (th Theme) labelStyle() TextStyle { return TextStyle{Regular, th.Type.Label} }
func (th Theme) headStyle() TextStyle  { return TextStyle{Medium, th.Type.Label} } // small caps heads
func (th Theme) bodyStyle() TextStyle  { return TextStyle{Regular, th.Type.Body} }
func (th Theme) monoStyle() TextStyle  { return TextStyle{Mono, th.Type.Body} }
