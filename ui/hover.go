package ui

import (
	"fmt"
	"time"
)

// hoverView is the read-out for the plan day under the pointer: a line
// through the chart at the day and a box of its figures beside the pointer.
type hoverView struct {
	Day   int // index into the result's days; -1: no read-out
	X     float64
	MeanY float64 // the day's mean state of charge on the plot
	Box   Rect
	list  displayList
}

// Read-out geometry, CSS px.
const (
	hoverPad    = 8
	hoverOffset = 14 // pointer to box
	hoverRowGap = 2
)

// layoutHover lays out the read-out for the day under the pointer at px, py
// (which must be in v.HoverArea()), inside the chart's panel.
func layoutHover(v *chartView, px, py float64, m Measurer, th Theme) hoverView {
	h := hoverView{Day: -1}
	if len(v.days) == 0 {
		return h
	}
	h.Day = DayAt(v.Time, px, len(v.days))
	d := v.days[h.Day]
	t, err := time.Parse(time.DateOnly, d.Date)
	if err != nil {
		return hoverView{Day: -1}
	}
	h.X = v.Time.X(t.Add(12 * time.Hour))
	h.MeanY = v.SoC.Y(d.SoCMeanPct)

	small, num, head := th.labelStyle(), TextStyle{Mono, th.Type.Label}, th.headStyle()
	rows := [][3]string{
		{"state of charge", fmt.Sprintf("%.0f %%", d.SoCMeanPct), ""},
		{"cell temperature", formatTemp(d.TempMeanC), ""},
		{"harvest", formatSig(d.HarvestWh, 3) + " Wh", ""},
		{"load", formatSig(d.LoadWh, 3) + " Wh", ""},
	}
	// The day's range where it is more than a rounding.
	if lo, hi := fmt.Sprintf("%.0f", d.SoCMinPct), fmt.Sprintf("%.0f", d.SoCMaxPct); lo != hi {
		rows[0][2] = lo + "–" + hi + " %"
	}
	if lo, hi := formatTemp(d.TempMinC), formatTemp(d.TempMaxC); lo != hi {
		rows[1][2] = lo + " to " + hi
	}
	if d.HarvestWh == 0 && !v.HasHarvest {
		rows = append(rows[:2], rows[3])
	}
	labelW, valueW, rangeW := 0.0, 0.0, 0.0
	for _, r := range rows {
		labelW = max(labelW, m.Advance(r[0], small))
		valueW = max(valueW, m.Advance(r[1], num))
		rangeW = max(rangeW, m.Advance(r[2], small))
	}
	title := t.Format("Mon 2 Jan 2006")
	rangeGap := 0.0
	if rangeW > 0 {
		rangeGap = 12
	}
	w := max(labelW+12+valueW+rangeGap+rangeW, m.Advance(title, head)) + 2*hoverPad
	lh := small.LineHeight() + hoverRowGap
	hh := head.LineHeight() + 4 + float64(len(rows))*lh + 2*hoverPad - hoverRowGap

	// Right of and under the pointer; flipped to keep inside the panel.
	x, y := px+hoverOffset, py+hoverOffset
	if x+w > v.Panel.Right()-4 {
		x = px - hoverOffset - w
	}
	if y+hh > v.Panel.Bottom()-4 {
		y = py - hoverOffset - hh
	}
	x = max(x, v.Panel.X+4)
	y = max(y, v.Panel.Y+4)
	h.Box = Rect{x, y, w, hh}
	h.list.boxes = append(h.list.boxes, boxItem{r: h.Box, fill: rolePanel, edge: roleSecondary, edged: true})
	ty := y + hoverPad
	h.list.text(m, title, head, x+hoverPad, ty, AlignLeft, roleInk)
	ty += head.LineHeight() + 4
	for _, r := range rows {
		h.list.text(m, r[0], small, x+hoverPad, ty, AlignLeft, roleSecondary)
		h.list.text(m, r[1], num, x+hoverPad+labelW+12+valueW, ty, AlignRight, roleInk)
		if r[2] != "" {
			h.list.text(m, r[2], small, x+hoverPad+labelW+12+valueW+12, ty, AlignLeft, roleSecondary)
		}
		ty += lh
	}
	return h
}

// drawHover paints the read-out: the day's line through the chart, a ring on
// the mean, and the box.
func drawHover(p *Painter, h *hoverView, v *chartView, th Theme) {
	if h.Day < 0 {
		return
	}
	pal := th.Palette
	area := v.HoverArea()
	p.VLine(h.X, area.Y, area.Bottom(), 1, pal.InkSecondary)
	p.Dot(h.X, h.MeanY, 4.5, pal.Mean)
	p.Dot(h.X, h.MeanY, 2.5, pal.Panel)
	p.Fill(Rect{h.Box.X + 2, h.Box.Y + 3, h.Box.W, h.Box.H}, withAlpha(pal.Ink, 0.10))
	drawList(p, &h.list, pal)
}
