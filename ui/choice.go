package ui

import (
	"strings"
	"unicode"
	"unicode/utf8"
)

// Option is one value a Choice offers.
type Option struct {
	Value  string // what goes into the scenario
	Label  string // shown in the box and the list
	Detail string // shown after the label in the open list; may be ""
}

// Choice is the state of a pick from a short list: a drop-down, or with
// Segmented all options side by side. A pick is committed at once (the app
// checks it like a typed value); arrows on a closed drop-down or on segments
// pick the neighbour, as a native select does.
type Choice struct {
	Options   []Option
	Index     int  // the committed option; -1 when the value is none of them
	Segmented bool // options side by side; else a drop-down

	Focused   bool
	Open      bool // the drop-down's list is showing
	Highlight int  // the option under the keyboard or pointer in the open list
	HoverSeg  int  // the segment under the pointer, or -1
	Pending   int  // the pick waiting for the app's verdict, or -1
	Err       string

	List  Rect    // the open list, placed by Place
	ItemH float64 // height of one list item
}

// NewChoice returns a choice of options with value v committed.
func NewChoice(options []Option, v string, segmented bool) *Choice {
	c := &Choice{Options: options, Segmented: segmented, HoverSeg: -1, Pending: -1}
	c.SetValue(v)
	return c
}

// SetValue commits v; a value that is none of the options leaves no option
// chosen.
func (c *Choice) SetValue(v string) {
	c.Index = c.find(v)
}

func (c *Choice) find(v string) int {
	for i, o := range c.Options {
		if o.Value == v {
			return i
		}
	}
	return -1
}

// Value is the committed value, or "".
func (c *Choice) Value() string {
	if c.Index < 0 {
		return ""
	}
	return c.Options[c.Index].Value
}

// Label is the committed option's label, or "—".
func (c *Choice) Label() string {
	if c.Index < 0 {
		return "—"
	}
	return c.Options[c.Index].Label
}

// Focus gives the choice the keyboard.
func (c *Choice) Focus() { c.Focused = true }

// Blur takes the keyboard away and closes the list.
func (c *Choice) Blur() { c.Focused, c.Open = false, false }

// pick asks for option i: the app checks it and Settle answers.
func (c *Choice) pick(i int) FieldEvent {
	c.Open = false
	if i < 0 || i >= len(c.Options) || i == c.Index {
		return FieldEdited
	}
	c.Pending = i
	return FieldCommit
}

// Picked is the value of the pending pick.
func (c *Choice) Picked() string { return c.Options[c.Pending].Value }

// Settle takes the app's verdict on the pending pick: "" if it was applied.
func (c *Choice) Settle(reason string) {
	if c.Pending < 0 {
		return
	}
	if reason == "" {
		c.Index, c.Err = c.Pending, ""
	} else {
		c.Err = reason
	}
	c.Pending = -1
}

// Update applies the keys and typed characters of in to a focused choice.
// Pointer presses are Press's business.
func (c *Choice) Update(in *Input) FieldEvent {
	if !c.Focused || len(c.Options) == 0 {
		return FieldIdle
	}
	ev := FieldIdle
	for _, r := range in.Chars {
		if r == ' ' {
			if !c.Segmented && !c.Open {
				c.Open, c.Highlight, ev = true, max(c.Index, 0), FieldEdited
			}
			continue
		}
		// A letter jumps to the next option whose label starts with it.
		if i := c.startingWith(r); i >= 0 {
			if c.Open {
				c.Highlight, ev = i, FieldEdited
			} else {
				return c.pick(i)
			}
		}
	}
	last := len(c.Options) - 1
	for _, k := range in.Keys {
		switch k {
		case KeyTab:
			c.Open = false
			if in.Shift {
				return FieldPrev
			}
			return FieldNext
		case KeyEscape:
			if c.Open {
				c.Open = false
				return FieldEdited
			}
			c.Err = ""
			c.Blur()
			return FieldCancel
		case KeyEnter:
			if c.Open {
				return c.pick(c.Highlight)
			}
			if !c.Segmented {
				c.Open, c.Highlight = true, max(c.Index, 0)
				return FieldEdited
			}
		case KeyUp, KeyDown, KeyLeft, KeyRight, KeyHome, KeyEnd, KeyPageUp, KeyPageDown:
			from := c.Index
			if c.Open {
				from = c.Highlight
			}
			to := from
			switch k {
			case KeyUp, KeyLeft:
				to = max(from-1, 0)
			case KeyDown, KeyRight:
				to = min(from+1, last)
			case KeyHome, KeyPageUp:
				to = 0
			case KeyEnd, KeyPageDown:
				to = last
			}
			if c.Open {
				c.Highlight, ev = to, FieldEdited
				continue
			}
			if from < 0 {
				to = 0
			}
			return c.pick(to)
		}
	}
	return ev
}

// startingWith returns the first option after the current one whose label
// starts with r (any case), or -1.
func (c *Choice) startingWith(r rune) int {
	r = unicode.ToLower(r)
	from := c.Index
	if c.Open {
		from = c.Highlight
	}
	n := len(c.Options)
	for k := 1; k <= n; k++ {
		i := (from + k + n) % n
		first, _ := utf8.DecodeRuneInString(strings.ToLower(c.Options[i].Label))
		if first == r {
			return i
		}
	}
	return -1
}

// segment returns the segment of box under x, or -1.
func (c *Choice) segment(box Rect, x, y float64) int {
	if !box.Contains(x, y) || len(c.Options) == 0 {
		return -1
	}
	return min(int((x-box.X)/(box.W/float64(len(c.Options)))), len(c.Options)-1)
}

// item returns the list item under x, y, or -1.
func (c *Choice) item(x, y float64) int {
	if !c.Open || !c.List.Contains(x, y) {
		return -1
	}
	i := int((y - c.List.Y - listPad) / c.ItemH)
	if i < 0 || i >= len(c.Options) {
		return -1
	}
	return i
}

// Press handles a pointer press at x, y on the choice whose box is box: a
// segment picks, the drop-down's box opens or closes its list, an item of
// the open list picks. It reports FieldIdle when the press was not its own.
func (c *Choice) Press(box Rect, x, y float64) FieldEvent {
	if c.Open {
		if i := c.item(x, y); i >= 0 {
			return c.pick(i)
		}
		if box.Contains(x, y) {
			c.Open = false
			return FieldEdited
		}
		return FieldIdle
	}
	if !box.Contains(x, y) {
		return FieldIdle
	}
	if c.Segmented {
		return c.pick(c.segment(box, x, y))
	}
	c.Open, c.Highlight = true, max(c.Index, 0)
	return FieldEdited
}

// Hover follows the pointer over the segments or the open list; it reports
// whether anything visible changed.
func (c *Choice) Hover(box Rect, x, y float64) bool {
	if c.Open {
		if i := c.item(x, y); i >= 0 && i != c.Highlight {
			c.Highlight = i
			return true
		}
		return false
	}
	if c.Segmented {
		if s := c.segment(box, x, y); s != c.HoverSeg {
			c.HoverSeg = s
			return true
		}
	}
	return false
}

// List geometry, CSS px.
const (
	listItemH = 26
	listPad   = 4
	listGap   = 2 // box to list
)

// Place puts the open list under the box, or over it when there is no room
// below, inside screen, at least as wide as the box and as its widest item.
func (c *Choice) Place(box, screen Rect, m Measurer, th Theme) {
	c.ItemH = listItemH
	w := box.W
	body, small := th.bodyStyle(), th.labelStyle()
	for _, o := range c.Options {
		iw := 2*boxPad + 16 + 4 + m.Advance(o.Label, body)
		if o.Detail != "" {
			iw += 12 + m.Advance(o.Detail, small)
		}
		w = max(w, iw)
	}
	w = min(w, screen.W-16)
	h := float64(len(c.Options))*c.ItemH + 2*listPad
	x := min(box.X, screen.Right()-8-w)
	y := box.Bottom() + listGap
	if y+h > screen.Bottom()-8 && box.Y-listGap-h >= screen.Y+8 {
		y = box.Y - listGap - h
	}
	c.List = Rect{max(x, screen.X+8), y, w, h}
}

// drawChoice paints the control in box: segments, or the drop-down's box
// with the chosen label and a chevron.
func drawChoice(p *Painter, c *Choice, box Rect, hover bool, th Theme) {
	pal := th.Palette
	body, small := th.bodyStyle(), th.labelStyle()
	if c.Segmented {
		controlFrame(p, box, false, c.Focused, c.Err, th)
		n := len(c.Options)
		sw := box.W / float64(n)
		for i, o := range c.Options {
			r := Rect{box.X + float64(i)*sw, box.Y, sw, box.H}
			ink := pal.Ink
			switch {
			case i == c.Index:
				p.Fill(r.Inset(2), pal.Mean)
				ink = pal.Panel
			case i == c.HoverSeg:
				p.Fill(r.Inset(2), selectionColor(pal))
			}
			if i > 0 && i != c.Index && i-1 != c.Index {
				p.VLine(r.X, r.Y+6, r.Bottom()-6, 1, pal.Rule)
			}
			label := Elide(p.fonts, o.Label, small, sw-6)
			p.Text(label, small, r.X+sw/2, r.Y+(r.H-small.LineHeight())/2, AlignCenter, ink)
		}
		return
	}
	controlFrame(p, box, hover, c.Focused || c.Open, c.Err, th)
	chevW := 20.0
	label := Elide(p.fonts, c.Label(), body, box.W-2*boxPad-chevW)
	p.Text(label, body, box.X+boxPad, box.Y+(box.H-body.LineHeight())/2, AlignLeft, pal.Ink)
	cx, cy := box.Right()-boxPad-5, box.Y+box.H/2
	if c.Open {
		p.Polygon([]float64{cx - 4, cx + 4, cx}, []float64{cy + 2, cy + 2, cy - 3}, pal.InkSecondary)
	} else {
		p.Polygon([]float64{cx - 4, cx + 4, cx}, []float64{cy - 2, cy - 2, cy + 3}, pal.InkSecondary)
	}
}

// drawChoiceList paints an open list over everything else.
func drawChoiceList(p *Painter, c *Choice, th Theme) {
	if !c.Open {
		return
	}
	pal := th.Palette
	body, small := th.bodyStyle(), th.labelStyle()
	// A soft shadow, then the list.
	p.Fill(Rect{c.List.X + 2, c.List.Y + 3, c.List.W, c.List.H}, withAlpha(pal.Ink, 0.12))
	p.Fill(c.List, pal.Panel)
	p.Frame(c.List, 1, pal.InkSecondary)
	for i, o := range c.Options {
		r := Rect{c.List.X + 1, c.List.Y + listPad + float64(i)*c.ItemH, c.List.W - 2, c.ItemH}
		if i == c.Highlight {
			p.Fill(r, selectionColor(pal))
		}
		ty := r.Y + (r.H-body.LineHeight())/2
		if i == c.Index { // a dot marks the chosen option
			p.Dot(r.X+boxPad+4, r.Y+r.H/2, 3, pal.Mean)
		}
		x := r.X + boxPad + 16
		lw := p.fonts.Advance(o.Label, body)
		p.Text(o.Label, body, x, ty, AlignLeft, pal.Ink)
		if o.Detail != "" {
			room := r.Right() - boxPad - (x + lw + 12)
			ink := pal.InkSecondary
			if i == c.Highlight { // the secondary ink is too faint on the highlight
				ink = pal.Ink
			}
			p.Text(Elide(p.fonts, o.Detail, small, room), small, x+lw+12, r.Y+(r.H-small.LineHeight())/2, AlignLeft, ink)
		}
	}
}
