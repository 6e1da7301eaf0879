package report

import (
	"math"
	"strconv"
	"strings"
	"time"

	"nodelife/engine/plan"
)

// Chart sizes, CSS px. The default is a 16:9 slide or page width; below the
// minimum the three parts of the chart no longer fit with legible labels.
const (
	DefaultWidth  = 960
	DefaultHeight = 540
	MinWidth      = 640
	MinHeight     = 480
	MaxWidth      = 4096
	MaxHeight     = 4096
)

// SVGOptions adjusts the chart. The zero value draws a DefaultWidth ×
// DefaultHeight chart with no reserve line.
type SVGOptions struct {
	// Width and Height are the document's size in CSS px; 0 takes the
	// default, and other values are kept within MinWidth..MaxWidth and
	// MinHeight..MaxHeight.
	Width, Height int
	// ReservePct draws a dashed line at this state of charge, %: the level
	// at which the plan swaps the cells. 0 (the default) draws none.
	ReservePct float64
	// Shading shades the days under 12 h behind the plot; ShadingFor gives
	// a scenario's. The zero value shades nothing.
	Shading Shading
}

// Frame is the chart's geometry: where its parts are and the scales every
// mark is placed with. SVG draws with the Frame that Layout returns.
type Frame struct {
	Width, Height float64
	Plot          Rect        // the state-of-charge plot
	SwapLane      Rect        // the row above the plot with the swap markers
	FlatLane      Rect        // the row below it with the flat marker
	Strip         Rect        // the temperature strip
	Bars          Rect        // the monthly harvest and load bars
	Time          TimeScale   // x of every part: the plan's start to its end
	SoC           LinearScale // state of charge, %, onto Plot: 0 at the bottom, 100 at the top
	Energy        LinearScale // energy, Wh per month, onto Bars: 0 at the bottom
	XTicks        []Tick      // date ticks
	YTicks        []Tick      // state-of-charge ticks
	ShortDays     []XSpan     // the days under 12 h, shaded behind the plot
}

// Text sizes, px: labels and body from our design notes (UI.md); the title
// between body and section heads, as a chart title sits below a page's heads.
const (
	labelSize = 12
	bodySize  = 14
	titleSize = 18
)

// Spacing, px, on the app's 8 px grid.
const (
	pad          = 16  // around the document
	gutter       = 40  // left of the plots, for value labels
	laneH        = 18  // a marker row
	markerR      = 4.5 // half-size of marker shapes
	minTickGapPx = 56  // between date ticks: a label plus air
	stripH       = 14  // the temperature strip
	headH        = 16  // a part's heading row
)

// chart is a Frame with everything drawn in it decided.
type chart struct {
	Frame
	r        plan.Result
	o        SVGOptions
	days     []day
	months   []month
	maxWh    float64 // largest monthly harvest or load
	harvest  float64 // harvested over the plan, Wh
	tempLo   float64 // coldest and warmest daily mean, °C; NaN without data
	tempHi   float64
	short    []DaySpan // runs of days under 12 h that o.Shading asks to shade
	marks    []mark
	title    string
	sentence []span
	titleY   float64 // baselines
	sentY    float64
	socHeadY float64
	legendY  float64 // baseline of the legend row
	tickY    float64 // baseline of the date labels
	stripY   float64 // baseline of the strip's heading
	barsY    float64 // baseline of the bars' heading
	footY    float64
}

type day struct {
	t time.Time
	plan.Day
}

type month struct {
	key               int       // year × 12 + month
	start, end        time.Time // clipped to the plan
	harvestWh, loadWh float64
}

// mark is a swap or the flat date, with its label's place.
type mark struct {
	kind   string // "swap" or "flat"
	x      float64
	date   string
	title  string  // the tooltip: what the mark means in full
	label  string  // shown when there is room
	labelX float64 // left edge of the label
	lane   int     // 0 the swap lane, 1 the flat lane, -1 not shown
}

// span is a run of text in one style.
type span struct {
	text   string
	strong bool
}

// Layout returns the geometry SVG draws r with under o.
func Layout(r plan.Result, o SVGOptions) Frame { return layout(r, o).Frame }

func layout(r plan.Result, o SVGOptions) *chart {
	c := &chart{r: r, o: o}
	c.Width = float64(clampInt(o.Width, DefaultWidth, MinWidth, MaxWidth))
	c.Height = float64(clampInt(o.Height, DefaultHeight, MinHeight, MaxHeight))
	c.readDays()
	if sh := o.Shading; sh.ShortDays {
		// Kept when some of them fall within the time axis.
		spans := ShortDaySpans(r.Daily, sh.LatDeg, sh.LonDeg)
		if len(SpansX(r.Daily, spans, TimeScale{Start: c.Time.Start, End: c.Time.End, X0: 0, X1: 1})) > 0 {
			c.short = spans
		}
	}
	W, H := c.Width, c.Height

	// From the top: title, the lifetime sentence, the plot's heading and
	// legend, the marker lanes, the plot.
	y := float64(pad)
	c.titleY = y + titleSize*0.8
	y += titleSize + 8
	c.sentY = y + bodySize*0.8
	y += bodySize + 20
	c.socHeadY = y + labelSize*0.8
	c.legendY = c.socHeadY
	if strongWidth(socHeading, labelSize)+24+c.legendWidth() > W-2*pad {
		y += headH + 4
		c.legendY = y + labelSize*0.8
	}
	y += headH + 4
	plotX := float64(pad + gutter)
	plotW := W - pad - 8 - plotX // room for the last date label's overhang
	// The marker lanes, when there are markers.
	lane := 0.0
	if len(r.Swaps) > 0 || r.FirstBrownout != nil {
		lane = laneH
	}
	c.SwapLane = Rect{plotX, y, plotW, lane}
	c.FlatLane = Rect{plotX, y + lane, plotW, lane}
	c.Plot = Rect{X: plotX, Y: y + 2*lane + 10, W: plotW}

	// From the bottom: the footer, the bars and their heading, the strip and
	// its heading, the date labels.
	b := H - pad
	c.footY = b - 3
	b -= labelSize + 20
	barsH := math.Round(min(max(0.12*H, 56), 120))
	c.Bars = Rect{plotX, b - barsH, plotW, barsH}
	b -= barsH + 8
	c.barsY = b - 4
	b -= headH + 16
	c.Strip = Rect{plotX, b - stripH, plotW, stripH}
	b -= stripH + 8
	c.stripY = b - 4
	b -= headH + 16
	c.tickY = b - 2
	b -= labelSize + 8
	c.Plot.H = max(b-c.Plot.Y, 0)

	c.Time.X0, c.Time.X1 = c.Plot.X, c.Plot.Right()
	c.ShortDays = SpansX(r.Daily, c.short, c.Time)
	c.SoC = LinearScale{V0: 0, V1: 100, Y0: c.Plot.Bottom(), Y1: c.Plot.Y}
	c.YTicks = PercentTicks(c.SoC, 2*labelSize+8)
	c.XTicks = dateTicks(c.Time, minTickGapPx)
	c.readMonths()
	top := niceCeil(c.maxWh)
	c.Energy = LinearScale{V0: 0, V1: top, Y0: c.Bars.Bottom(), Y1: c.Bars.Y}
	c.layoutText()
	c.layoutMarks()
	return c
}

func clampInt(v, def, lo, hi int) int {
	if v == 0 {
		return def
	}
	return min(max(v, lo), hi)
}

// readDays parses the daily dates and sets the time scale: the plan's start
// and end, or the span of its days when those do not parse.
func (c *chart) readDays() {
	for _, d := range c.r.Daily {
		t, err := time.Parse(time.DateOnly, d.Date)
		if err != nil {
			continue
		}
		c.days = append(c.days, day{t, d})
	}
	start, errS := time.Parse(time.DateOnly, c.r.Start)
	end, errE := time.Parse(time.DateOnly, c.r.End)
	if n := len(c.days); n > 0 && (errS != nil || errE != nil || !end.After(start)) {
		start, end = c.days[0].t, c.days[n-1].t.AddDate(0, 0, 1)
	}
	c.Time = TimeScale{Start: start, End: end}
	c.tempLo, c.tempHi = math.NaN(), math.NaN()
	for _, d := range c.days {
		if finite(d.TempMeanC) {
			c.tempLo = minNaN(c.tempLo, d.TempMeanC)
			c.tempHi = maxNaN(c.tempHi, d.TempMeanC)
		}
	}
}

// readMonths sums harvest and load by calendar month over the plan.
func (c *chart) readMonths() {
	for _, d := range c.days {
		if d.t.Before(c.Time.Start) || !d.t.Before(c.Time.End) {
			continue
		}
		key := d.t.Year()*12 + int(d.t.Month())
		if n := len(c.months); n == 0 || c.months[n-1].key != key {
			first := time.Date(d.t.Year(), d.t.Month(), 1, 0, 0, 0, 0, time.UTC)
			end := first.AddDate(0, 1, 0)
			if end.After(c.Time.End) {
				end = c.Time.End
			}
			if first.Before(c.Time.Start) {
				first = c.Time.Start
			}
			c.months = append(c.months, month{key: key, start: first, end: end})
		}
		m := &c.months[len(c.months)-1]
		if finite(d.HarvestWh) {
			m.harvestWh += d.HarvestWh
			c.harvest += d.HarvestWh
		}
		if finite(d.LoadWh) {
			m.loadWh += d.LoadWh
		}
	}
	for _, m := range c.months {
		c.maxWh = max(c.maxWh, m.harvestWh, m.loadWh)
	}
}

// layoutText writes the title and the lifetime sentence, shortened to fit.
func (c *chart) layoutText() {
	room := c.Width - 2*pad
	c.title = fit(c.r.Scenario, titleSize, room)
	if c.title == "" {
		c.title = "State of charge"
	}
	var parts [][]span
	if c.r.Lifetime != "" {
		if c.r.FirstBrownout != nil {
			parts = append(parts, []span{{"Lasts " + c.r.Lifetime, true}, {": cells flat on " + *c.r.FirstBrownout + " if nobody swaps them", false}})
		} else {
			parts = append(parts, []span{{"Lasts " + c.r.Lifetime, true}, {": the cells outlive the plan", false}})
		}
	}
	switch n := len(c.r.Swaps); n {
	case 0:
		parts = append(parts, []span{{"no swap in the plan", false}})
	default:
		parts = append(parts, []span{{"first swap " + c.r.Swaps[0].Date, false}})
		word := "swaps"
		if n == 1 {
			word = "swap"
		}
		parts = append(parts, []span{{strconv.Itoa(n) + " " + word + " from " + c.r.Start + " to " + c.r.End, false}})
	}
	// Drop trailing parts until the sentence fits.
	for len(parts) > 0 {
		var s []span
		for i, p := range parts {
			if i > 0 {
				s = append(s, span{sep, false})
			}
			s = append(s, p...)
		}
		if spansWidth(s, bodySize) <= room || len(parts) == 1 {
			c.sentence = merge(s)
			break
		}
		parts = parts[:len(parts)-1]
	}
}

// merge joins neighbouring spans of one style, so that no space sits at
// the edge of a tspan: renderers may collapse it there.
func merge(s []span) []span {
	var out []span
	for _, p := range s {
		if n := len(out); n > 0 && out[n-1].strong == p.strong {
			out[n-1].text += p.text
			continue
		}
		out = append(out, p)
	}
	return out
}

func spansWidth(s []span, size float64) float64 {
	w := 0.0
	for _, p := range s {
		if p.strong {
			w += strongWidth(p.text, size)
		} else {
			w += textWidth(p.text, size)
		}
	}
	return w
}

// sep joins the parts of the sentence.
const sep = " · "

// Headings of the chart's three parts.
const (
	socHeading  = "State of charge, %"
	tempHeading = "Temperature at the cells, °C"
	barsHeading = "Harvest and load, Wh per month"
)

// fit shortens s, set in the heading weight, with an ellipsis until it is
// at most room wide.
func fit(s string, size, room float64) string {
	s = strings.TrimSpace(s)
	if strongWidth(s, size) <= room {
		return s
	}
	r := []rune(s)
	for len(r) > 0 && strongWidth(string(r)+"…", size) > room {
		r = r[:len(r)-1]
	}
	return strings.TrimSpace(string(r)) + "…"
}

// layoutMarks places the swap and flat markers and their labels. The flat
// date is labelled first, then the first swap, then the others, each on
// the first lane with room beside its marker, right of it or else left,
// clear of other labels and marker shapes. A mark with no room for its
// label keeps its tooltip; the sentence gives the first swap and the count.
func (c *chart) layoutMarks() {
	inRange := func(t time.Time) bool { return !t.Before(c.Time.Start) && !t.After(c.Time.End) }
	flatDate := ""
	var flat *mark
	if fb := c.r.FirstBrownout; fb != nil {
		if t, err := time.Parse(time.DateOnly, *fb); err == nil && inRange(t) {
			flatDate = *fb
			flat = &mark{kind: "flat", x: c.Time.X(t), date: *fb,
				title: "first cells flat on " + *fb + " if nobody swaps them",
				label: "flat if not swapped · " + *fb}
		}
	}
	var swaps []mark
	for i, sw := range c.r.Swaps {
		t, err := time.Parse(time.DateOnly, sw.Date)
		if err != nil || !inRange(t) {
			continue
		}
		m := mark{kind: "swap", x: c.Time.X(t), date: sw.Date,
			title: "swap " + sw.Date + " (cells due " + sw.Due + ", " + sw.Reason + ")", label: sw.Date}
		if i == 0 {
			m.label = "swap " + sw.Date
		}
		if sw.Date == flatDate {
			flat.label = "flat, swap · " + flatDate
			m.label = ""
		}
		swaps = append(swaps, m)
	}
	// Obstacles per lane: the marker shapes on it. A label may cross a
	// marker line; it is drawn on a patch of the panel colour.
	var obstacles [2][]float64
	for _, m := range swaps {
		obstacles[0] = append(obstacles[0], m.x)
	}
	if flat != nil {
		obstacles[1] = append(obstacles[1], flat.x)
		c.marks = append(c.marks, *flat)
	}
	c.marks = append(c.marks, swaps...)
	var taken [2][][2]float64
	var swapLines []float64
	lo, hi := float64(pad), c.Width-pad
	const gap = 12 // between labels on a lane
	clear := markerR + 4
	// A swap's label on the lower lane must not cross another swap's line
	// either, or it could be read as that swap's.
	for _, m := range swaps {
		swapLines = append(swapLines, m.x)
	}
	fits := func(m *mark, lane int, l, w float64) bool {
		if l < lo || l+w > hi {
			return false
		}
		for _, sp := range taken[lane] {
			if l < sp[1]+gap && sp[0] < l+w+gap {
				return false
			}
		}
		in := func(x float64) bool { return x != m.x && l < x+clear && x-clear < l+w }
		for _, x := range obstacles[lane] {
			if in(x) {
				return false
			}
		}
		if m.kind == "swap" && lane == 1 {
			for _, x := range swapLines {
				if in(x) {
					return false
				}
			}
		}
		return true
	}
	for i := range c.marks {
		m := &c.marks[i]
		m.lane = -1
		if m.label == "" {
			continue
		}
		lanes := []int{0, 1}
		if m.kind == "flat" {
			lanes = []int{1, 0}
		}
		w := textWidth(m.label, labelSize)
	place:
		for _, lane := range lanes {
			for _, l := range []float64{m.x + clear, m.x - clear - w} {
				if fits(m, lane, l, w) {
					m.lane, m.labelX = lane, l
					taken[lane] = append(taken[lane], [2]float64{l, l + w})
					break place
				}
			}
		}
	}
}

// legend items of the state-of-charge plot, in order.
func (c *chart) legend() []string {
	items := []string{"band", "mean"}
	if len(c.short) > 0 {
		items = append(items, "short")
	}
	if c.o.ReservePct > 0 {
		items = append(items, "reserve")
	}
	if len(c.r.Swaps) > 0 {
		items = append(items, "swap")
	}
	if c.r.FirstBrownout != nil {
		items = append(items, "flat")
	}
	return items
}

var legendText = map[string]string{
	"band":    "daily min–max",
	"mean":    "daily mean",
	"short":   "days under 12 h",
	"reserve": "reserve",
	"swap":    "swap visit",
	"flat":    "cells flat",
}

const (
	swatchW   = 18
	swatchGap = 6  // swatch to its text
	legendGap = 16 // between items
)

func (c *chart) legendWidth() float64 {
	w := 0.0
	for i, it := range c.legend() {
		if i > 0 {
			w += legendGap
		}
		w += swatchW + swatchGap + textWidth(legendText[it], labelSize)
	}
	return w
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

func minNaN(a, b float64) float64 {
	if math.IsNaN(a) {
		return b
	}
	return min(a, b)
}

func maxNaN(a, b float64) float64 {
	if math.IsNaN(a) {
		return b
	}
	return max(a, b)
}
