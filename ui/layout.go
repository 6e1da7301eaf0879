package ui

import (
	"nodelife/engine/plan"
)

// LayoutMode is how the page is arranged for its width.
type LayoutMode int

const (
	// Wide (at least WideMin CSS px): fields | chart | answer and cautions.
	Wide LayoutMode = iota
	// Narrow: fields | answer over chart over cautions.
	Narrow
)

// Page geometry, CSS px, on the 8 px grid.
const (
	WideMin     = 1100 // narrower windows use the Narrow arrangement
	headerH     = 48
	formWideW   = 288
	formNarrowW = 264
	answerWideW = 304
	columnGap   = 24 // between the fields and the rest
	blockGap    = 16 // between panels
	minChartH   = 200
	footerPadY  = 8
)

// Page is the whole screen laid out: the regions and the display lists of
// the static blocks. The form lays itself out in Form; the chart in chart.
type Page struct {
	Mode             LayoutMode
	Screen           Rect
	Header, Footer   Rect
	Form, Chart      Rect
	Answer, Cautions Rect
	header, footer   displayList
	answer, cautions displayList
	chart            chartView
}

// LayoutPage arranges a screen of w × h CSS px for a scenario's name, result
// and answer. colW is the chart's band column width (one device pixel).
func LayoutPage(w, h float64, name string, res plan.Result, reservePct float64, a Answer, m Measurer, th Theme, colW float64) Page {
	pg := Page{Screen: Rect{0, 0, w, h}}
	margin := th.Space.Margin
	small := th.labelStyle()

	// Footer: the general caution, wrapped to the width.
	lines := Wrap(m, GeneralCaution, small, w-2*margin)
	fh := float64(len(lines))*small.LineHeight() + 2*footerPadY
	rest, footer := pg.Screen.CutBottom(fh)
	pg.Footer = footer
	pg.footer.box(Rect{footer.X, footer.Y, footer.W, 1}, roleRule)
	for i, l := range lines {
		pg.footer.text(m, l, small, margin, footer.Y+footerPadY+float64(i)*small.LineHeight(), AlignLeft, roleSecondary)
	}

	// Header: the app's name and the scenario's, and key hints when they fit.
	header, body := rest.CutTop(headerH)
	pg.Header = header
	pg.layoutHeader(name, m, th)

	body = Rect{body.X + margin, body.Y + blockGap, body.W - 2*margin, body.H - blockGap - blockGap}
	if w >= WideMin {
		pg.Mode = Wide
		form, rest := body.CutLeft(formWideW)
		_, rest = rest.CutLeft(columnGap)
		chart, side := rest.CutRight(answerWideW)
		chart.W -= blockGap
		pg.Form, pg.Chart = form, chart
		var ah, ch float64
		pg.answer, ah = layoutAnswer(a, Rect{side.X, side.Y, side.W, 0}, m, th)
		pg.Answer = Rect{side.X, side.Y, side.W, ah}
		cy := pg.Answer.Bottom() + blockGap
		pg.cautions, ch = layoutCautions(a.Cautions, Rect{side.X, cy, side.W, 0}, m, th)
		pg.Cautions = Rect{side.X, cy, side.W, ch}
	} else {
		pg.Mode = Narrow
		form, rest := body.CutLeft(formNarrowW)
		_, right := rest.CutLeft(columnGap)
		pg.Form = form
		var ah, ch float64
		pg.answer, ah = layoutAnswer(a, Rect{right.X, right.Y, right.W, 0}, m, th)
		pg.Answer = Rect{right.X, right.Y, right.W, ah}
		// Cautions at the bottom of the column, the chart between.
		_, ch = layoutCautions(a.Cautions, Rect{right.X, 0, right.W, 0}, m, th)
		cy := right.Bottom() - ch
		chartTop := pg.Answer.Bottom() + blockGap
		chartH := cy - blockGap - chartTop
		if ch == 0 {
			chartH = right.Bottom() - chartTop
		}
		if chartH < minChartH { // short window: keep the chart usable, cautions go lower
			chartH = minChartH
			cy = chartTop + chartH + blockGap
		}
		pg.Chart = Rect{right.X, chartTop, right.W, chartH}
		pg.cautions, ch = layoutCautions(a.Cautions, Rect{right.X, cy, right.W, 0}, m, th)
		pg.Cautions = Rect{right.X, cy, right.W, ch}
	}
	pg.chart = layoutChart(pg.Chart, res, reservePct, m, th, colW)
	return pg
}

// KeyHints tells how to edit, shown in the header when there is room.
const KeyHints = "Click a value, type, Enter to apply · Esc cancels · Tab next · ↑↓ step"

func (pg *Page) layoutHeader(name string, m Measurer, th Theme) {
	h := pg.Header
	margin := th.Space.Margin
	brand := TextStyle{Regular, 16}
	title := TextStyle{Medium, 16}
	small := th.labelStyle()
	y := h.Y + (h.H-brand.LineHeight())/2
	pg.header.box(Rect{h.X, h.Bottom() - 1, h.W, 1}, roleRule)
	b := pg.header.text(m, "nodelife", brand, margin, y, AlignLeft, roleSecondary)
	x := margin + b.w + 12
	room := h.Right() - margin - x
	hintW := m.Advance(KeyHints, small)
	if nameW := m.Advance(name, title); nameW+24+hintW <= room {
		pg.header.text(m, KeyHints, small, h.Right()-margin, h.Y+(h.H-small.LineHeight())/2, AlignRight, roleSecondary)
		room -= hintW + 24
	}
	pg.header.text(m, Elide(m, name, title, room), title, x, y, AlignLeft, roleInk)
}

// drawPage paints everything but the form.
func drawPage(p *Painter, pg *Page, th Theme) {
	pal := th.Palette
	p.Fill(pg.Screen, pal.Background)
	drawList(p, &pg.header, pal)
	drawList(p, &pg.footer, pal)
	drawChart(p, &pg.chart, th)
	drawList(p, &pg.answer, pal)
	drawList(p, &pg.cautions, pal)
}
