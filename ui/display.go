package ui

import "image/color"

// role names a palette colour, so laid-out items can be checked in tests
// without a theme and drawn with any theme.
type role int

const (
	roleInk role = iota
	roleSecondary
	roleFlat
	roleSwap
	rolePanel
	roleRule
	roleCautionFill
	roleCautionEdge
	roleAccent
	roleHarvest
	roleLoad
	roleBackground
	roleMean
)

func (p Palette) of(r role) color.NRGBA {
	switch r {
	case roleSecondary:
		return p.InkSecondary
	case roleFlat:
		return p.Flat
	case roleSwap:
		return p.Swap
	case rolePanel:
		return p.Panel
	case roleRule:
		return p.Rule
	case roleCautionFill:
		return p.CautionFill
	case roleCautionEdge:
		return p.CautionEdge
	case roleAccent:
		return p.Accent
	case roleHarvest:
		return p.Harvest
	case roleLoad:
		return p.Load
	case roleBackground:
		return p.Background
	case roleMean:
		return p.Mean
	}
	return p.Ink
}

// textItem is one laid-out line of text. Its line box is Bounds().
type textItem struct {
	s     string
	st    TextStyle
	x, y  float64 // y is the top of the line box; x depends on align
	align Align
	w     float64 // measured advance
	role  role
	patch bool // drawn on a patch of panel colour, over lines it crosses
}

// Bounds is the item's line box.
func (t textItem) Bounds() Rect {
	x := t.x
	switch t.align {
	case AlignRight:
		x -= t.w
	case AlignCenter:
		x -= t.w / 2
	}
	return Rect{x, t.y, t.w, t.st.LineHeight()}
}

// boxItem is a filled rectangle with an optional edge.
type boxItem struct {
	r          Rect
	fill, edge role
	edged      bool
}

// displayList is laid-out text and boxes: layout functions fill it, tests
// check it, drawList paints it.
type displayList struct {
	boxes []boxItem
	texts []textItem
}

func (d *displayList) text(m Measurer, s string, st TextStyle, x, y float64, align Align, r role) textItem {
	t := textItem{s: s, st: st, x: x, y: y, align: align, w: m.Advance(s, st), role: r}
	d.texts = append(d.texts, t)
	return t
}

func (d *displayList) box(r Rect, fill role) {
	d.boxes = append(d.boxes, boxItem{r: r, fill: fill})
}

// drawList paints a display list: boxes first, then text.
func drawList(p *Painter, d *displayList, pal Palette) {
	for _, b := range d.boxes {
		p.Fill(b.r, pal.of(b.fill))
		if b.edged {
			p.Frame(b.r, 1, pal.of(b.edge))
		}
	}
	for _, t := range d.texts {
		drawText(p, t, pal)
	}
}

func drawText(p *Painter, t textItem, pal Palette) {
	if t.patch {
		b := t.Bounds()
		p.Fill(Rect{b.X - 3, b.Y + 1, b.W + 6, b.H - 2}, pal.Panel)
	}
	p.Text(t.s, t.st, t.x, t.y, t.align, pal.of(t.role))
}
