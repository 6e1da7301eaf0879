package ui

import (
	"fmt"

	"nodelife/engine/report"

	"nodelife/engine/plan"
)

// LayoutMode is how the page is arranged for its width.
type LayoutMode int

const (
	// Wide (at least WideMin CSS px): inputs | chart | answer, advice and cautions.
	Wide LayoutMode = iota
	// Narrow: inputs | answer over chart over advice and cautions, scrolling.
	Narrow
)

// In either mode the options view takes the place of the chart and the
// answer; in the narrow one it takes the inputs' place too, for room.

// Page geometry, CSS px, on the 8 px grid.
const (
	WideMin       = 1100 // narrower windows use the Narrow arrangement
	headerH       = 48
	formWideW     = 304
	formTwoColW   = 2*formColMin + formColGap // two columns of inputs …
	formTwoColMin = 1600                      // … in windows at least this wide
	formNarrowW   = 272
	answerWideW   = 320
	columnGap     = 24 // between the inputs and the rest
	blockGap      = 16 // between panels
	minChartH     = 200
	narrowChartH  = 440 // the chart's least height in the narrow column
	footerPadY    = 8
	buttonH       = 28
	buttonPadX    = 12
	buttonGap     = 8
	noticePadY    = 8
	scrollBarSide = 4 // a scroll bar's gap beside its column
)

// Button is one of the header's actions.
type Button struct {
	ID      string // "open", "save", "export", "options", "undo", "redo"; the options view's own
	Label   string
	At      Rect
	Enabled bool
	Hover   bool
	Active  bool // a toggle that is on: the view it shows is showing
	Focused bool // it has the keyboard: Enter or Space acts
}

// PageContent is what a page shows besides the inputs.
type PageContent struct {
	Name        string // the scenario's
	Result      plan.Result
	ReservePct  float64
	Answer      Answer
	Advice      AdviceStatus
	Notice      string // a message across the page, or ""
	NoticeError bool   // … that reports a problem
	CanUndo     bool
	CanRedo     bool
	SideScroll  float64          // how far the scrolling column is scrolled up
	ShortDays   []report.DaySpan // the days under 12 h to shade behind the chart
	// Options, when not nil, is shown in the options view instead of the
	// chart and the answer.
	Options *OptionsContent
}

// Page is the whole screen laid out: the regions and the display lists of
// the static blocks. The form lays itself out in Form; the chart in chart.
type Page struct {
	Mode                             LayoutMode
	Screen, Header, Notice, Footer   Rect
	Form, Chart                      Rect
	Side                             Rect // the scrolling column's window
	SideScroll, SideContent          float64
	Answer, Energy, Advice, Cautions Rect // the blocks, where they are now
	Progress                         Rect // the advice's progress bar, or empty
	Dismiss                          Rect // the notice's dismiss button
	Buttons                          []Button
	header, footer, notice           displayList
	side                             displayList
	chart                            chartView
	hover                            hoverView
	options                          *optionsView // the options view, when it shows
}

// LayoutPage arranges a screen of w × h CSS px. colW is the chart's band
// column width (one device pixel).
func LayoutPage(w, h float64, c PageContent, m Measurer, th Theme, colW float64) Page {
	pg := Page{Screen: Rect{0, 0, w, h}, hover: hoverView{Day: -1}}
	margin := th.Space.Margin
	small := th.labelStyle()

	// Footer: the general caution, wrapped to the width, and beside it when
	// they fit the key hints, or while the advice is worked out, how far it
	// is. A bar along the footer's top edge shows that progress at any width.
	right := KeyHints
	running := c.Advice.State == AdviceRunning
	if running {
		right = fmt.Sprintf("Working out the advice · %.0f %%", 100*c.Advice.Fraction())
	}
	oneLine := m.Advance(GeneralCaution, small)+24+max(m.Advance(right, small), m.Advance(KeyHints, small)) <= w-2*margin
	lines := Wrap(m, GeneralCaution, small, w-2*margin)
	fh := float64(len(lines))*small.LineHeight() + 2*footerPadY
	rest, footer := pg.Screen.CutBottom(fh)
	pg.Footer = footer
	pg.footer.box(Rect{footer.X, footer.Y, footer.W, 1}, roleRule)
	if running {
		pg.footer.box(Rect{footer.X, footer.Y, footer.W * c.Advice.Fraction(), 2}, roleAccent)
	}
	for i, l := range lines {
		pg.footer.text(m, l, small, margin, footer.Y+footerPadY+float64(i)*small.LineHeight(), AlignLeft, roleSecondary)
	}
	if oneLine {
		pg.footer.text(m, right, small, w-margin, footer.Y+footerPadY, AlignRight, roleSecondary)
	}

	// Header: the app's name, the scenario's and the actions.
	header, body := rest.CutTop(headerH)
	pg.Header = header
	pg.layoutHeader(c, m, th)

	// A notice across the page.
	if c.Notice != "" {
		var nh float64
		pg.notice, nh, pg.Dismiss = layoutNotice(c.Notice, c.NoticeError, Rect{margin, body.Y + blockGap, w - 2*margin, 0}, m, th)
		pg.Notice = Rect{margin, body.Y + blockGap, w - 2*margin, nh}
		_, body = body.CutTop(blockGap + nh)
	}

	body = Rect{body.X + margin, body.Y + blockGap, body.W - 2*margin, body.H - blockGap - blockGap}
	if c.Options != nil {
		pg.Mode = Narrow
		view := body
		if w >= WideMin {
			pg.Mode = Wide
			fw := float64(formWideW)
			if w >= formTwoColMin {
				fw = formTwoColW
			}
			pg.Form, view = body.CutLeft(fw)
			_, view = view.CutLeft(columnGap)
		}
		ov := layoutOptions(view, *c.Options, m, th)
		pg.options = &ov
		pg.Buttons = append(pg.Buttons, ov.Buttons...)
		return pg
	}
	if w >= WideMin {
		pg.Mode = Wide
		fw := float64(formWideW)
		if w >= formTwoColMin {
			fw = formTwoColW
		}
		form, rest := body.CutLeft(fw)
		_, rest = rest.CutLeft(columnGap)
		chart, side := rest.CutRight(answerWideW)
		chart.W -= blockGap + scrollBarSide
		pg.Form, pg.Chart, pg.Side = form, chart, side
		blocks, content := layoutSide(c.Answer, c.Advice, Rect{side.X, side.Y, side.W, 0}, 0, m, th)
		pg.SideContent = content
		pg.SideScroll = clampScroll(c.SideScroll, content, side.H)
		if pg.SideScroll != 0 {
			blocks, _ = layoutSide(c.Answer, c.Advice, Rect{side.X, side.Y - pg.SideScroll, side.W, 0}, 0, m, th)
		}
		pg.setSide(blocks)
	} else {
		pg.Mode = Narrow
		form, rest := body.CutLeft(formNarrowW)
		_, right := rest.CutLeft(columnGap)
		right.W -= scrollBarSide + 4
		pg.Form, pg.Side = form, right
		// The answer, then the chart as tall as the rest of the window (at
		// least narrowChartH), then the advice and cautions further down.
		blocks, _ := layoutSide(c.Answer, c.Advice, Rect{right.X, right.Y, right.W, 0}, 0, m, th)
		chartH := max(right.Bottom()-blocks.Answer.Bottom()-blockGap, narrowChartH)
		_, content := layoutSide(c.Answer, c.Advice, Rect{right.X, right.Y, right.W, 0}, chartH, m, th)
		pg.SideContent = content
		pg.SideScroll = clampScroll(c.SideScroll, content, right.H)
		blocks, _ = layoutSide(c.Answer, c.Advice, Rect{right.X, right.Y - pg.SideScroll, right.W, 0}, chartH, m, th)
		pg.Chart = blocks.Slot
		pg.setSide(blocks)
	}
	pg.chart = layoutChart(pg.Chart, c.Result, c.ReservePct, c.ShortDays, m, th, colW)
	return pg
}

func (pg *Page) setSide(b sideBlocks) {
	pg.side = b.list
	pg.Answer, pg.Energy, pg.Advice, pg.Cautions, pg.Progress = b.Answer, b.Energy, b.Advice, b.Cautions, b.Progress
}

func clampScroll(y, content, view float64) float64 {
	return max(0, min(y, content-view))
}

// KeyHints tells how to use the keyboard, shown in the footer when there is room.
const KeyHints = "Tab next · Enter applies · Esc cancels · ↑↓ step · Ctrl+Z undo"

// headerButtons are the header's actions, in order.
var headerButtons = []struct{ id, label string }{
	{"open", "Open…"}, {"save", "Save"}, {"export", "Export…"}, {"options", "Options"}, {"undo", "Undo"}, {"redo", "Redo"},
}

func (pg *Page) layoutHeader(c PageContent, m Measurer, th Theme) {
	h := pg.Header
	margin := th.Space.Margin
	brand := TextStyle{Regular, 16}
	title := TextStyle{Medium, 16}
	label := th.labelStyle()
	y := h.Y + (h.H-brand.LineHeight())/2
	pg.header.box(Rect{h.X, h.Bottom() - 1, h.W, 1}, roleRule)
	b := pg.header.text(m, "nodelife", brand, margin, y, AlignLeft, roleSecondary)
	x := margin + b.w + 12

	// The buttons from the right; a wider gap before undo and redo.
	right := h.Right() - margin
	by := h.Y + (h.H-buttonH)/2
	pg.Buttons = nil
	for i := len(headerButtons) - 1; i >= 0; i-- {
		hb := headerButtons[i]
		bw := m.Advance(hb.label, label) + 2*buttonPadX
		r := Rect{right - bw, by, bw, buttonH}
		enabled := true
		switch hb.id {
		case "undo":
			enabled = c.CanUndo
		case "redo":
			enabled = c.CanRedo
		}
		pg.Buttons = append([]Button{{ID: hb.id, Label: hb.label, At: r, Enabled: enabled,
			Active: hb.id == "options" && c.Options != nil}}, pg.Buttons...)
		right = r.X - buttonGap
		if hb.id == "undo" {
			right -= 8
		}
	}
	room := right - 16 - x
	pg.header.text(m, Elide(m, c.Name, title, room), title, x, y, AlignLeft, roleInk)
}

// layoutNotice lays out a message across the page with a dismiss button at
// its right.
func layoutNotice(msg string, isErr bool, r Rect, m Measurer, th Theme) (displayList, float64, Rect) {
	var d displayList
	small := th.labelStyle()
	dw := m.Advance("Dismiss", small) + 2*buttonPadX
	lines := Wrap(m, msg, th.bodyStyle(), r.W-2*12-dw-12)
	h := float64(len(lines))*th.bodyStyle().LineHeight() + 2*noticePadY
	fill, edge := rolePanel, roleRule
	if isErr {
		fill, edge = roleCautionFill, roleCautionEdge
	}
	d.boxes = append(d.boxes, boxItem{r: Rect{r.X, r.Y, r.W, h}, fill: fill, edge: edge, edged: true})
	for i, l := range lines {
		d.text(m, l, th.bodyStyle(), r.X+12, r.Y+noticePadY+float64(i)*th.bodyStyle().LineHeight(), AlignLeft, roleInk)
	}
	dismiss := Rect{r.Right() - 8 - dw, r.Y + (h-24)/2, dw, 24}
	d.text(m, "Dismiss", small, dismiss.X+dismiss.W/2, dismiss.Y+(24-small.LineHeight())/2, AlignCenter, roleInk)
	return d, h, dismiss
}

// drawPage paints everything but the form.
func drawPage(p *Painter, pg *Page, th Theme) {
	pal := th.Palette
	p.Fill(pg.Screen, pal.Background)
	drawList(p, &pg.header, pal)
	if pg.options != nil {
		drawList(p, &pg.options.list, pal)
	}
	for _, b := range pg.Buttons {
		drawButton(p, b, th)
	}
	drawList(p, &pg.footer, pal)
	if !pg.Notice.Empty() {
		drawList(p, &pg.notice, pal)
		p.Frame(pg.Dismiss, 1, pal.InkSecondary)
	}
	if pg.options != nil {
		return
	}
	side := p.Clip(pg.Side)
	if pg.Mode == Wide {
		drawChart(p, &pg.chart, th)
		drawHover(p.Clip(pg.Chart), &pg.hover, &pg.chart, th)
	} else {
		drawChart(side, &pg.chart, th)
		drawHover(side.Clip(pg.Chart), &pg.hover, &pg.chart, th)
	}
	drawList(side, &pg.side, pal)
	if pg.SideContent > pg.Side.H {
		track := pg.Side.H
		thumb := max(track*pg.Side.H/pg.SideContent, 24)
		y := pg.Side.Y + (track-thumb)*pg.SideScroll/(pg.SideContent-pg.Side.H)
		p.Fill(Rect{pg.Side.Right() + scrollBarSide, y, 3, thumb}, pal.InkSecondary) // 3:1 and more against the page, as a control needs
	}
}

// drawButton paints a header button: a framed label, darker while hovered,
// quiet when it cannot act, ringed while it has the keyboard.
func drawButton(p *Painter, b Button, th Theme) {
	pal := th.Palette
	small := th.labelStyle()
	ink, edge := pal.Ink, pal.Rule
	if b.Hover && b.Enabled {
		edge = pal.InkSecondary
		p.Fill(b.At, pal.Panel)
	}
	if b.Active { // on: an accent frame and underline
		edge = pal.Accent
		p.Fill(Rect{b.At.X, b.At.Bottom() - 3, b.At.W, 3}, pal.Accent)
	}
	if !b.Enabled {
		ink = pal.InkSecondary
	}
	p.Frame(b.At, 1, edge)
	if b.Focused {
		// The ring goes outside the frame, a pixel off it, so it reads as
		// the fields' focus colour without hiding the label, the frame or
		// an active toggle's underline. Buttons are buttonGap apart, so it
		// never touches a neighbour.
		p.Frame(b.At.Inset(-focusRingOut), focusRingW, pal.Focus)
	}
	p.Text(b.Label, small, b.At.X+b.At.W/2, b.At.Y+(b.At.H-small.LineHeight())/2, AlignCenter, ink)
}

// A focused button's ring: its width, and how far its outer edge stands
// off the button's frame, CSS px.
const (
	focusRingW   = 2
	focusRingOut = 3
)
