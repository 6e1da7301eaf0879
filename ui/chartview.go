package ui

import (
	"fmt"
	"image/color"
	"math"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/report"
)

// marker is a dated mark above the plot with a label beside it.
type marker struct {
	X     float64
	Label string
}

// chartView is the chart laid out for one result: the state of charge with
// its markers, the cell temperature strip and the monthly harvest and load
// under it on the same time axis. Every position and text is decided here,
// so drawChart only paints and tests can check the geometry.
type chartView struct {
	Panel, Plot        Rect
	SwapLane, FlatLane Rect // rows above the plot for the markers
	Strip              Rect // the temperature strip, or empty when there is no room
	Bars               Rect // the monthly bars, or empty
	Time               TimeScale
	SoC                LinearScale
	Energy             LinearScale // Wh per day on the bars
	XTicks, YTicks     []Tick
	ShortDays          []report.XSpan // days under 12 h, shaded behind the plot
	Cols               []Column
	Months             []Month
	HasHarvest         bool
	HarvestCut         bool // harvest bars taller than the scale are cut at its top
	ReserveY           float64
	Swaps              []marker
	Flat               *marker
	Labels             displayList // titles, legends, tick and marker labels
	legend             []legendItem
	days               []plan.Day
}

type legendItem struct {
	kind string // "band", "mean", "short", "reserve", "harvest", "load"
	at   Rect   // the swatch
}

// Chart geometry, CSS px.
const (
	laneH        = 18
	markerR      = 4.5 // half-size of marker shapes
	minTickGapPx = 56  // between date ticks: a label plus air
	stripH       = 12
	partGap      = 14  // between the plot, the strip and the bars
	minBarsH     = 48  // the bars' plot, at least
	maxBarsH     = 120 // … and at most
)

// Temperatures at the ends and the middle of the strip's colour scale, °C:
// our choice, so that frost and heat stand out and 20 °C is neutral.
const (
	stripColdC = -20
	stripMildC = 20
	stripHotC  = 45
)

// HoverArea is where the pointer gets a read-out: the plot down to the bars.
func (v *chartView) HoverArea() Rect {
	bottom := v.Plot.Bottom()
	if !v.Bars.Empty() {
		bottom = v.Bars.Bottom()
	} else if !v.Strip.Empty() {
		bottom = v.Strip.Bottom()
	}
	return Rect{v.Plot.X, v.Plot.Y, v.Plot.W, bottom - v.Plot.Y}
}

// layoutChart lays out the chart of res, with its reserve line, in r.
// short are the days under 12 h to shade behind the plot (shortDays gives a
// scenario's once per result; the SVG chart shades the same days), nil for
// none. colW is the width of one band column (one device pixel is
// sharpest).
func layoutChart(r Rect, res plan.Result, reservePct float64, short []report.DaySpan, m Measurer, th Theme, colW float64) chartView {
	v := chartView{Panel: r, days: res.Daily}
	small := th.labelStyle()
	title := th.headStyle()
	in := r.Inset(panelPad)
	lh := small.LineHeight()

	// Title, and the legend on the same row when it fits, else under the axis.
	const socTitle = "State of charge, %"
	v.Labels.text(m, socTitle, title, in.X, in.Y, AlignLeft, roleInk)
	start, _ := time.Parse(time.DateOnly, res.Start)
	end, _ := time.Parse(time.DateOnly, res.End)
	// The days under 12 h, placed on a provisional axis first: whether any
	// are on the chart decides the legend, which decides the plot's width.
	v.ShortDays = report.SpansX(res.Daily, short, TimeScale{Start: start, End: end, X0: 0, X1: 1})
	socLegend := []legendName{{"band", "daily min–max"}, {"mean", "daily mean"}}
	if len(v.ShortDays) > 0 {
		socLegend = append(socLegend, legendName{"short", "days under 12 h"})
	}
	if reservePct > 0 {
		socLegend = append(socLegend, legendName{"reserve", "reserve"})
	}
	legendW := legendWidth(m, small, socLegend)
	legendBelow := m.Advance(socTitle, title)+24+legendW > in.W
	top := in.Y + lh + 8
	bottom := in.Bottom() - lh - 4 // date tick labels
	if legendBelow {               // on a row of its own under the title
		v.layoutLegend(m, small, socLegend, in.X, in.Y+lh+2)
		top += lh + 2
	} else {
		v.layoutLegend(m, small, socLegend, in.Right()-legendW, in.Y)
	}

	yLabelW := m.Advance("100", small) + 8
	plotX, plotW := in.X+yLabelW, in.W-yLabelW-4
	v.SwapLane = Rect{plotX, top, plotW, laneH}
	v.FlatLane = Rect{plotX, top + laneH, plotW, laneH}
	plotY := top + 2*laneH + 6

	// Under the plot, as room allows: the bars, then the strip, each with a
	// title row; the state of charge keeps at least minPlotH.
	const minPlotH = 120
	stripBlock := partGap + lh + 4 + stripH
	barsH := min(max((bottom-plotY)*0.24, minBarsH), maxBarsH)
	barsBlock := partGap + lh + 4 + barsH
	avail := bottom - plotY
	showStrip := avail-stripBlock >= minPlotH
	showBars := avail-stripBlock-barsBlock >= minPlotH
	if showBars {
		v.Bars = Rect{plotX, bottom - barsH, plotW, barsH}
		bottom -= barsBlock
	}
	if showStrip {
		v.Strip = Rect{plotX, bottom - stripH, plotW, stripH}
		bottom -= stripBlock
	}
	v.Plot = Rect{plotX, plotY, plotW, max(bottom-plotY, 0)}

	v.Time = TimeScale{Start: start, End: end, X0: v.Plot.X, X1: v.Plot.Right()}
	v.SoC = LinearScale{V0: 0, V1: 100, Y0: v.Plot.Bottom(), Y1: v.Plot.Y}
	if len(v.ShortDays) > 0 {
		v.ShortDays = report.SpansX(res.Daily, short, v.Time)
	}
	v.XTicks = DateAxis(v.Time, minTickGapPx, m, small)
	v.YTicks = PercentTicks(v.SoC, 2*lh)
	v.Cols = Columns(res.Daily, v.Time, colW)

	for _, t := range v.YTicks {
		v.Labels.text(m, t.Label, small, v.Plot.X-8, t.Pos-lh/2, AlignRight, roleSecondary)
	}
	axisY := v.Plot.Bottom()
	if !v.Bars.Empty() {
		axisY = v.Bars.Bottom()
	} else if !v.Strip.Empty() {
		axisY = v.Strip.Bottom()
	}
	for _, t := range v.XTicks {
		if t.Label == "" { // no room beside the label before it
			continue
		}
		x := t.Pos
		w := m.Advance(t.Label, small)
		// Keep the first and last labels inside the plot's span.
		x = min(max(x, v.Plot.X+w/2), v.Plot.Right()-w/2)
		v.Labels.text(m, t.Label, small, x, axisY+4, AlignCenter, roleSecondary)
	}
	v.layoutMarkers(res, m, th)
	v.withReserve(reservePct, m, th)
	if !v.Strip.Empty() {
		v.layoutStrip(res, m, th)
	}
	if !v.Bars.Empty() {
		v.layoutBars(res, m, th)
	}
	return v
}

// layoutMarkers places the swap markers on the upper lane and the first
// cells' flat date on the lower. The flat date and the first swap are
// labelled first and may use either lane; later swaps are labelled by date
// alone where there is room on the swap lane. A swap on the flat date shares
// the flat label.
func (v *chartView) layoutMarkers(res plan.Result, m Measurer, th Theme) {
	small := th.labelStyle()
	lh := small.LineHeight()
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
			what := "flat if not swapped"
			if res.EndOfLifeLimit != nil {
				switch *res.EndOfLifeLimit {
				case "voltage":
					what = "too weak if not swapped"
				case "temperature":
					what = "outside rated temperature"
				}
			}
			v.Flat = &marker{X: v.Time.X(t), Label: what + " · " + flatDate}
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

// layoutStrip titles the temperature strip with the coldest and warmest
// cell temperature of the plan.
func (v *chartView) layoutStrip(res plan.Result, m Measurer, th Theme) {
	small := th.labelStyle()
	y := v.Strip.Y - 4 - small.LineHeight()
	v.Labels.text(m, "Cell temperature, °C", th.headStyle(), v.Panel.X+panelPad, y, AlignLeft, roleInk)
	span := fmt.Sprintf("coldest %s, warmest %s", formatTemp(res.TempMinC), formatTemp(res.TempMaxC))
	v.Labels.text(m, span, small, v.Strip.Right(), y, AlignRight, roleSecondary)
}

// formatTemp writes a temperature to the whole degree with a true minus.
func formatTemp(c float64) string {
	s := fmt.Sprintf("%.0f", c)
	if s == "-0" {
		s = "0"
	}
	if s[0] == '-' {
		s = "−" + s[1:]
	}
	return s + " °C"
}

// layoutBars lays out the monthly harvest and load per day: a scale from 0 to
// a round maximum, a title and a legend.
func (v *chartView) layoutBars(res plan.Result, m Measurer, th Theme) {
	small := th.labelStyle()
	lh := small.LineHeight()
	v.Months = Months(res.Daily, v.Time)
	load, harvest := 0.0, 0.0
	for _, mo := range v.Months {
		load, harvest = max(load, mo.LoadWhPerDay), max(harvest, mo.HarvestWhPerDay)
	}
	v.HasHarvest = harvest > 0
	// A panel can harvest a hundred times the load in summer; on one scale
	// the load would vanish. What matters is whether the harvest covers the
	// load, so the scale stops at a few times the load and taller harvest
	// bars are cut (the read-out gives their value).
	top := NiceCeil(max(load, harvest))
	if load > 0 && harvest > harvestCutRatio*load {
		top, v.HarvestCut = NiceCeil(harvestScaleOfLoad*load), true
	}
	v.Energy = LinearScale{V0: 0, V1: top, Y0: v.Bars.Bottom(), Y1: v.Bars.Y}
	y := v.Bars.Y - 4 - lh
	title := "Load, Wh per day (monthly mean)"
	names := []legendName{{"load", "load"}}
	if v.HasHarvest {
		title = "Harvest and load, Wh per day (monthly mean)"
		names = []legendName{{"harvest", "harvest"}, {"load", "load"}}
		if v.HarvestCut {
			names[0].text = "harvest (cut at " + formatWh(top) + ")"
		}
	}
	tw := v.Labels.text(m, title, th.headStyle(), v.Panel.X+panelPad, y, AlignLeft, roleInk).w
	lw := legendWidth(m, small, names)
	if v.Panel.X+panelPad+tw+24+lw <= v.Bars.Right() {
		v.layoutLegend(m, small, names, v.Bars.Right()-lw, y)
	}
	// The scale's ends, inside the bars' height so they keep clear of the title.
	v.Labels.text(m, formatWh(top), small, v.Bars.X-8, v.Bars.Y-2, AlignRight, roleSecondary)
	v.Labels.text(m, "0", small, v.Bars.X-8, v.Bars.Bottom()-lh+2, AlignRight, roleSecondary)
}

// The bars' scale with a harvest far above the load: cut when the harvest
// passes harvestCutRatio times the load, at harvestScaleOfLoad times it (our
// choice: room to see a month's surplus or shortfall against the load).
const (
	harvestCutRatio    = 8
	harvestScaleOfLoad = 4
)

// formatWh writes an axis value in Wh with as few digits as it needs.
func formatWh(v float64) string { return formatSig(v, 2) }

type legendName struct{ kind, text string }

const (
	swatchW   = 18
	swatchGap = 6  // swatch to its text
	legendGap = 16 // between items
)

func legendWidth(m Measurer, st TextStyle, names []legendName) float64 {
	w := 0.0
	for i, it := range names {
		if i > 0 {
			w += legendGap
		}
		w += swatchW + swatchGap + m.Advance(it.text, st)
	}
	return w
}

func (v *chartView) layoutLegend(m Measurer, st TextStyle, names []legendName, x, y float64) {
	for _, it := range names {
		v.legend = append(v.legend, legendItem{kind: it.kind, at: Rect{x, y, swatchW, st.LineHeight()}})
		t := v.Labels.text(m, it.text, st, x+swatchW+swatchGap, y, AlignLeft, roleSecondary)
		x += swatchW + swatchGap + t.w + legendGap
	}
}

// tempColor is the strip's colour for a temperature: cold, mild and hot
// mixed linearly between stripColdC, stripMildC and stripHotC.
func tempColor(c float64, pal Palette) color.NRGBA {
	if c <= stripMildC {
		f := (c - stripColdC) / (stripMildC - stripColdC)
		return mix(pal.TempCold, pal.TempMild, math.Min(math.Max(f, 0), 1))
	}
	f := (c - stripMildC) / (stripHotC - stripMildC)
	return mix(pal.TempMild, pal.TempHot, math.Min(math.Max(f, 0), 1))
}

// mix is a + (b − a) f, channel by channel.
func mix(a, b color.NRGBA, f float64) color.NRGBA {
	l := func(x, y uint8) uint8 { return uint8(math.Round(float64(x) + (float64(y)-float64(x))*f)) }
	return color.NRGBA{l(a.R, b.R), l(a.G, b.G), l(a.B, b.B), 0xff}
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
	// The days under 12 h, under the grid and the curves.
	for _, sp := range v.ShortDays {
		p.Fill(Rect{sp.X0, plot.Y, sp.X1 - sp.X0, plot.H}, pal.ShortDays)
	}
	for _, t := range v.YTicks {
		p.HLine(plot.X, plot.Right(), t.Pos, 1, pal.Grid)
	}
	for _, t := range v.XTicks {
		p.VLine(t.Pos, plot.Y, plot.Bottom(), 1, pal.Grid)
		if !v.Bars.Empty() {
			p.VLine(t.Pos, v.Bars.Y, v.Bars.Bottom(), 1, pal.Grid)
		}
	}
	// The band and the mean, clipped to the plot.
	if n := len(v.Cols); n > 0 {
		xs, lo, hi, mean := make([]float64, 0, n), make([]float64, 0, n), make([]float64, 0, n), make([]float64, 0, n)
		for _, c := range v.Cols {
			xs = append(xs, c.X)
			lo = append(lo, v.SoC.Y(c.Min))
			hi = append(hi, v.SoC.Y(c.Max))
			mean = append(mean, v.SoC.Y(c.Mean))
		}
		cp := p.Clip(Rect{plot.X, plot.Y - 2, plot.W, plot.H + 4})
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

	// The temperature strip: one slice per column, in the column's mean.
	if s := v.Strip; !s.Empty() && len(v.Cols) > 0 {
		xs := make([]float64, 0, len(v.Cols)+1)
		colors := make([]color.NRGBA, 0, len(v.Cols))
		xs = append(xs, s.X)
		for i, c := range v.Cols {
			x1 := s.Right()
			if i+1 < len(v.Cols) {
				x1 = (c.X + v.Cols[i+1].X) / 2
			}
			xs = append(xs, x1)
			colors = append(colors, tempColor(c.TempMean, pal))
		}
		p.Columns(xs, s.Y, s.Bottom(), colors)
		p.Frame(s, 1, pal.Rule)
	}
	// The monthly bars: harvest left, load right, in each month's span.
	if b := v.Bars; !b.Empty() {
		p.HLine(b.X, b.Right(), b.Y, 1, pal.Grid)
		for _, mo := range v.Months {
			w := mo.X1 - mo.X0
			gap := math.Min(math.Max(w*0.15, 0.5), 3)
			if v.HasHarvest {
				half := (w - gap) / 2
				hy := max(v.Energy.Y(mo.HarvestWhPerDay), b.Y)
				p.Fill(Rect{mo.X0 + gap/2, hy, half, b.Bottom() - hy}, pal.Harvest)
				if mo.HarvestWhPerDay > v.Energy.V1 { // cut: a notch near the top
					p.Fill(Rect{mo.X0 + gap/2, b.Y + 3, half, 2}, pal.Panel)
				}
				p.Fill(Rect{mo.X0 + gap/2 + half, v.Energy.Y(mo.LoadWhPerDay), half, b.Bottom() - v.Energy.Y(mo.LoadWhPerDay)}, pal.Load)
			} else {
				p.Fill(Rect{mo.X0 + gap/2, v.Energy.Y(mo.LoadWhPerDay), w - gap, b.Bottom() - v.Energy.Y(mo.LoadWhPerDay)}, pal.Load)
			}
		}
		p.HLine(b.X, b.Right(), b.Bottom(), 1, pal.InkSecondary)
	}
	// Legend swatches.
	for _, it := range v.legend {
		cy := it.at.Y + it.at.H/2
		switch it.kind {
		case "band":
			p.Fill(Rect{it.at.X, cy - 5, it.at.W, 10}, pal.Band)
		case "mean":
			p.HLine(it.at.X, it.at.Right(), cy, 2, pal.Mean)
		case "short": // outlined: the fill alone is too faint to see as a swatch
			p.Fill(Rect{it.at.X, cy - 5, it.at.W, 10}, pal.ShortDays)
			p.Frame(Rect{it.at.X, cy - 5, it.at.W, 10}, 1, pal.Rule)
		case "reserve":
			p.DashedH(it.at.X, it.at.Right(), cy, 1, 6, 4, pal.Reserve)
		case "harvest":
			p.Fill(Rect{it.at.X + 4, cy - 5, 10, 10}, pal.Harvest)
		case "load":
			p.Fill(Rect{it.at.X + 4, cy - 5, 10, 10}, pal.Load)
		}
	}
	for _, t := range v.Labels.texts {
		drawText(p, t, pal)
	}
}
