package ui

import (
	"fmt"
	"math"
	"time"

	"nodelife/engine/plan"
)

// marker is a dated mark above the plot with a label beside it.
type marker struct {
	X     float64
	Label string
}

// chartView is the state-of-charge chart laid out for one result: every
// position and text is decided here, so drawChart only paints and tests can
// check the geometry.
type chartView struct {
	Panel, Plot        Rect
	SwapLane, FlatLane Rect // rows above the plot for the markers
	Time               TimeScale
	SoC                LinearScale
	XTicks, YTicks     []Tick
	Cols               []Column
	ReserveY           float64
	Swaps              []marker
	Flat               *marker
	Labels             displayList // title, legend, tick and marker labels
	legendAt           Rect        // where the legend's swatches start
	legend             []legendItem
}

type legendItem struct {
	kind string // "band", "mean", "reserve"
	at   Rect   // the swatch
}

// Chart geometry, CSS px.
const (
	laneH        = 18
	markerR      = 4.5 // half-size of marker shapes
	minTickGapPx = 56  // between date ticks: a label plus air
)

// layoutChart lays out the chart of res, with its reserve line, in r. colW
// is the width of one band column (one device pixel is sharpest).
func layoutChart(r Rect, res plan.Result, reservePct float64, m Measurer, th Theme, colW float64) chartView {
	v := chartView{Panel: r}
	small := th.labelStyle()
	title := TextStyle{Medium, th.Type.Label}
	in := r.Inset(panelPad)
	lh := small.LineHeight()

	// Title, and the legend on the same row when it fits, else under the axis.
	v.Labels.text(m, "State of charge, %", title, in.X, in.Y, AlignLeft, roleInk)
	legendW := legendWidth(m, small, reservePct > 0)
	legendBelow := m.Advance("State of charge, %", title)+24+legendW > in.W
	top := in.Y + lh + 8
	bottom := in.Bottom() - lh - 4 // x tick labels
	if legendBelow {
		bottom -= lh + 8
		v.legendAt = Rect{in.X, in.Bottom() - lh, legendW, lh}
	} else {
		v.legendAt = Rect{in.Right() - legendW, in.Y, legendW, lh}
	}
	v.layoutLegend(m, small, reservePct > 0)

	yLabelW := m.Advance("100", small) + 8
	v.SwapLane = Rect{in.X + yLabelW, top, in.W - yLabelW, laneH}
	v.FlatLane = Rect{in.X + yLabelW, top + laneH, in.W - yLabelW, laneH}
	v.Plot = Rect{in.X + yLabelW, top + 2*laneH + 6, in.W - yLabelW - 4, 0}
	v.Plot.H = max(bottom-v.Plot.Y, 0)

	start, _ := time.Parse(time.DateOnly, res.Start)
	end, _ := time.Parse(time.DateOnly, res.End)
	v.Time = TimeScale{Start: start, End: end, X0: v.Plot.X, X1: v.Plot.Right()}
	v.SoC = LinearScale{V0: 0, V1: 100, Y0: v.Plot.Bottom(), Y1: v.Plot.Y}
	v.XTicks = DateTicks(v.Time, minTickGapPx)
	v.YTicks = PercentTicks(v.SoC, 2*lh)
	v.Cols = Columns(res.Daily, v.Time, colW)

	for _, t := range v.YTicks {
		v.Labels.text(m, t.Label, small, v.Plot.X-8, t.Pos-lh/2, AlignRight, roleSecondary)
	}
	for _, t := range v.XTicks {
		x := t.Pos
		w := m.Advance(t.Label, small)
		// Keep the first and last labels inside the plot's span.
		x = min(max(x, v.Plot.X+w/2), v.Plot.Right()-w/2)
		v.Labels.text(m, t.Label, small, x, v.Plot.Bottom()+4, AlignCenter, roleSecondary)
	}

	// Swap markers on the upper lane, the first cells' flat date on the
	// lower. The flat date and the first swap are labelled first and may use
	// either lane; later swaps are labelled by date alone where there is room
	// on the swap lane. A swap on the flat date shares the flat label.
	lanes := []Rect{v.SwapLane, v.FlatLane}
	shapes := make([][]float64, 2)
	type want struct {
		LabelWant
		label string
		role  role
	}
	var wants []want
	flatDate := ""
	if res.FirstBrownout != nil {
		if t, err := time.Parse(time.DateOnly, *res.FirstBrownout); err == nil {
			flatDate = *res.FirstBrownout
			v.Flat = &marker{X: v.Time.X(t), Label: "flat if not swapped · " + flatDate}
			shapes[1] = append(shapes[1], v.Flat.X)
		}
	}
	first := true
	var swapWants []want
	for _, sw := range res.Swaps {
		t, err := time.Parse(time.DateOnly, sw.Date)
		if err != nil {
			continue
		}
		mk := marker{X: v.Time.X(t), Label: sw.Date}
		shapes[0] = append(shapes[0], mk.X)
		lanesOK := []int{0}
		switch {
		case sw.Date == flatDate:
			v.Flat.Label = "flat, swap · " + flatDate
			mk.Label = ""
		case first:
			mk.Label = "swap " + sw.Date
			lanesOK = []int{0, 1}
		}
		first = false
		v.Swaps = append(v.Swaps, mk)
		if mk.Label != "" {
			swapWants = append(swapWants, want{LabelWant{mk.X, m.Advance(mk.Label, small), lanesOK}, mk.Label, roleSwap})
		}
	}
	if v.Flat != nil {
		wants = append(wants, want{LabelWant{v.Flat.X, m.Advance(v.Flat.Label, small), []int{1, 0}}, v.Flat.Label, roleFlat})
	}
	wants = append(wants, swapWants...)
	lw := make([]LabelWant, len(wants))
	for i, w := range wants {
		lw[i] = w.LabelWant
	}
	for i, sp := range PlaceLabels(lw, shapes, v.SwapLane.X, v.SwapLane.Right(), markerR+4, 12) {
		if sp.Lane < 0 {
			continue
		}
		v.Labels.text(m, wants[i].label, small, sp.Left, lanes[sp.Lane].Y+(laneH-lh)/2, AlignLeft, wants[i].role)
		v.Labels.texts[len(v.Labels.texts)-1].patch = true // over the lines it crosses
	}
	v.withReserve(reservePct, m, th)
	return v
}

// withReserve adds the reserve line and its label; a zero reserve (swap when
// flat) is the axis itself and gets neither.
func (v *chartView) withReserve(pct float64, m Measurer, th Theme) {
	v.ReserveY = math.NaN()
	if pct <= 0 {
		return
	}
	small := th.labelStyle()
	v.ReserveY = v.SoC.Y(pct)
	label := fmt.Sprintf("reserve %s %%", FormatNumber(pct))
	t := textItem{s: label, st: small, x: v.Plot.Right() - 4, y: v.ReserveY - small.LineHeight() - 1,
		align: AlignRight, w: m.Advance(label, small), role: roleSecondary, patch: true}
	v.Labels.texts = append(v.Labels.texts, t)
}

var legendNames = []struct{ kind, text string }{
	{"band", "daily min–max"},
	{"mean", "daily mean"},
	{"reserve", "reserve"},
}

const (
	swatchW   = 18
	swatchGap = 6  // swatch to its text
	legendGap = 16 // between items
)

func legendWidth(m Measurer, st TextStyle, reserve bool) float64 {
	w := 0.0
	for i, it := range legendNames {
		if it.kind == "reserve" && !reserve {
			continue
		}
		if i > 0 {
			w += legendGap
		}
		w += swatchW + swatchGap + m.Advance(it.text, st)
	}
	return w
}

func (v *chartView) layoutLegend(m Measurer, st TextStyle, reserve bool) {
	x := v.legendAt.X
	for _, it := range legendNames {
		if it.kind == "reserve" && !reserve {
			continue
		}
		v.legend = append(v.legend, legendItem{kind: it.kind, at: Rect{x, v.legendAt.Y, swatchW, v.legendAt.H}})
		t := v.Labels.text(m, it.text, st, x+swatchW+swatchGap, v.legendAt.Y, AlignLeft, roleSecondary)
		x += swatchW + swatchGap + t.w + legendGap
	}
}

// drawChart paints the chart from its view.
func drawChart(p *Painter, v *chartView, th Theme) {
	pal := th.Palette
	p.Fill(v.Panel, pal.Panel)
	p.Frame(v.Panel, 1, pal.Rule)
	plot := v.Plot
	if plot.Empty() {
		return
	}
	for _, t := range v.YTicks {
		p.HLine(plot.X, plot.Right(), t.Pos, 1, pal.Grid)
	}
	for _, t := range v.XTicks {
		p.VLine(t.Pos, plot.Y, plot.Bottom(), 1, pal.Grid)
		p.VLine(t.Pos, plot.Bottom(), plot.Bottom()+3, 1, pal.Rule)
	}
	// The band and the mean, clipped to the plot.
	if n := len(v.Cols); n > 0 {
		xs, lo, hi, mean := make([]float64, 0, n+2), make([]float64, 0, n+2), make([]float64, 0, n+2), make([]float64, 0, n+2)
		for _, c := range v.Cols {
			xs = append(xs, c.X)
			lo = append(lo, v.SoC.Y(c.Min))
			hi = append(hi, v.SoC.Y(c.Max))
			mean = append(mean, v.SoC.Y(c.Mean))
		}
		cp := p.Clip(Rect{plot.X, plot.Y - 2, plot.W, plot.H + 4})
		// A column as wide as a device pixel: widen single-day jumps so
		// they still show.
		cp.Band(xs, lo, hi, pal.Band)
		cp.Polyline(xs, mean, 2, pal.Mean)
	}
	if !math.IsNaN(v.ReserveY) {
		p.DashedH(plot.X, plot.Right(), v.ReserveY, 1, 6, 4, pal.Reserve)
	}
	// Swaps: a dashed line through the plot and a diamond on the lane.
	for _, mk := range v.Swaps {
		p.DashedV(mk.X, v.SwapLane.Y+laneH/2, plot.Bottom(), 1, 4, 3, pal.Swap)
		cy := v.SwapLane.Y + laneH/2
		p.Polygon([]float64{mk.X, mk.X + markerR, mk.X, mk.X - markerR}, []float64{cy - markerR, cy, cy + markerR, cy}, pal.Swap)
	}
	// The first cells' flat date: a solid line and a downward triangle.
	if mk := v.Flat; mk != nil {
		cy := v.FlatLane.Y + laneH/2
		p.VLine(mk.X, cy, plot.Bottom(), 1, pal.Flat)
		p.Polygon([]float64{mk.X - markerR - 0.5, mk.X + markerR + 0.5, mk.X}, []float64{cy - markerR, cy - markerR, cy + markerR}, pal.Flat)
	}
	// Axes.
	p.HLine(plot.X, plot.Right(), plot.Bottom(), 1, pal.InkSecondary)
	p.VLine(plot.X, plot.Y, plot.Bottom(), 1, pal.Rule)
	// Legend swatches.
	for _, it := range v.legend {
		cy := it.at.Y + it.at.H/2
		switch it.kind {
		case "band":
			p.Fill(Rect{it.at.X, cy - 5, it.at.W, 10}, pal.Band)
		case "mean":
			p.HLine(it.at.X, it.at.Right(), cy, 2, pal.Mean)
		case "reserve":
			p.DashedH(it.at.X, it.at.Right(), cy, 1, 6, 4, pal.Reserve)
		}
	}
	for _, t := range v.Labels.texts {
		drawText(p, t, pal)
	}
}
