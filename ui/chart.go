package ui

import (
	"math"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/report"
	"nodelife/engine/scenario"
)

// The chart's scales and ticks are the engine's (engine/report), so the
// canvas chart and the exported SVG and PNG mark the same dates.
type (
	// TimeScale maps calendar time onto x.
	TimeScale = report.TimeScale
	// LinearScale maps a value range onto a pixel range (Y0 for V0, Y1 for V1).
	LinearScale = report.LinearScale
	// Tick is one labelled mark on an axis.
	Tick = report.Tick
)

// DateTicks returns month or year ticks as fine as minGapPx allows; see
// report.DateTicks.
func DateTicks(s TimeScale, minGapPx float64) []Tick { return report.DateTicks(s, minGapPx) }

// DateAxis returns DateTicks with the start named on the first label, as
// wide as m measures the labels in st; see report.DateAxis, which the SVG
// chart uses too.
func DateAxis(s TimeScale, minGapPx float64, m Measurer, st TextStyle) []Tick {
	return report.DateAxis(s, minGapPx, func(label string) float64 { return m.Advance(label, st) })
}

// PercentTicks returns ticks every 25 % or, on a short axis, 50 %; see
// report.PercentTicks.
func PercentTicks(s LinearScale, minGapPx float64) []Tick { return report.PercentTicks(s, minGapPx) }

// Column is the days that fall in one pixel column of the chart: the lowest
// and highest state of charge and the mean of the daily means, in %, the
// same for the cell temperature, °C, and the days' indexes.
type Column struct {
	X                          float64 // the column's centre
	Min, Mean, Max             float64
	TempMin, TempMean, TempMax float64
	First, Last                int // indexes of the first and last day in it
}

// Columns bins the daily summaries into columns colW wide along s, so a long
// horizon draws one band slice per column and keeps every extreme.
func Columns(days []plan.Day, s TimeScale, colW float64) []Column {
	var cols []Column
	n := 0
	cur := -1
	finish := func() {
		if n > 0 {
			c := &cols[len(cols)-1]
			c.Mean /= float64(n)
			c.TempMean /= float64(n)
		}
	}
	for di, d := range days {
		t, err := time.ParseInLocation(time.DateOnly, d.Date, s.Start.Location())
		if err != nil {
			continue
		}
		x := s.X(t.Add(12 * time.Hour)) // the day's middle
		i := int(math.Floor((x - s.X0) / colW))
		if i != cur {
			finish()
			cols = append(cols, Column{X: s.X0 + (float64(i)+0.5)*colW, Min: d.SoCMinPct, Max: d.SoCMaxPct,
				TempMin: d.TempMinC, TempMax: d.TempMaxC, First: di})
			cur, n = i, 0
		}
		c := &cols[len(cols)-1]
		c.Min = math.Min(c.Min, d.SoCMinPct)
		c.Max = math.Max(c.Max, d.SoCMaxPct)
		c.Mean += d.SoCMeanPct
		c.TempMin = math.Min(c.TempMin, d.TempMinC)
		c.TempMax = math.Max(c.TempMax, d.TempMaxC)
		c.TempMean += d.TempMeanC
		c.Last = di
		n++
	}
	finish()
	return cols
}

// Month is one calendar month of the plan: its span on the time axis and
// the harvest and load per day over the days of it in the plan.
type Month struct {
	Start           time.Time
	X0, X1          float64
	HarvestWhPerDay float64
	LoadWhPerDay    float64
	Days            int
}

// Months gathers the daily rows by calendar month. Daily means, not sums,
// keep a part month at either end of the plan comparable with the others.
func Months(days []plan.Day, s TimeScale) []Month {
	var ms []Month
	loc := s.Start.Location()
	for _, d := range days {
		t, err := time.ParseInLocation(time.DateOnly, d.Date, loc)
		if err != nil {
			continue
		}
		first := time.Date(t.Year(), t.Month(), 1, 0, 0, 0, 0, loc)
		if len(ms) == 0 || !ms[len(ms)-1].Start.Equal(first) {
			ms = append(ms, Month{Start: first})
		}
		m := &ms[len(ms)-1]
		m.HarvestWhPerDay += d.HarvestWh
		m.LoadWhPerDay += d.LoadWh
		m.Days++
	}
	for i := range ms {
		m := &ms[i]
		m.HarvestWhPerDay /= float64(m.Days)
		m.LoadWhPerDay /= float64(m.Days)
		from := m.Start
		if from.Before(s.Start) {
			from = s.Start
		}
		to := m.Start.AddDate(0, 1, 0)
		if to.After(s.End) {
			to = s.End
		}
		m.X0, m.X1 = s.X(from), s.X(to)
	}
	return ms
}

// NiceCeil is the smallest of 1, 2, 2.5, 5 × 10ⁿ at or above v (v > 0), an
// axis maximum that reads easily (common practice for chart axes).
func NiceCeil(v float64) float64 {
	if v <= 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, f := range []float64{1, 2, 2.5, 5, 10} {
		if f*p >= v*(1-1e-12) {
			return f * p
		}
	}
	return 10 * p
}

// DayAt is the index of the plan day under x on s, within 0..n-1.
func DayAt(s TimeScale, x float64, n int) int {
	if n <= 0 || s.X1 <= s.X0 {
		return 0
	}
	days := s.End.Sub(s.Start).Hours() / 24
	i := int(math.Floor((x - s.X0) / (s.X1 - s.X0) * days))
	return min(max(i, 0), n-1)
}

// LabelSpot is where a marker's label goes: its left edge and lane, or
// Lane -1 when there is no room for it.
type LabelSpot struct {
	Left float64
	Lane int
}

// LabelWant asks for a label of width W beside a marker at X, on the first
// of Lanes with room for it.
type LabelWant struct {
	X, W  float64
	Lanes []int
}

// PlaceLabels puts marker labels on lanes in the order given (so the first
// have the first pick). A label starts pad right of its marker, or ends pad
// left of it when it would cross hi; it must stay within lo..hi, keep gap
// from labels already placed on its lane, and not cover a marker shape
// drawn on that lane (shapes[lane] lists their x; a marker's own shape does
// not count).
func PlaceLabels(wants []LabelWant, shapes [][]float64, lo, hi, pad, gap float64) []LabelSpot {
	taken := make([][][2]float64, len(shapes)) // occupied spans per lane
	spots := make([]LabelSpot, len(wants))
	fits := func(lane int, l, w, own float64) bool {
		if l < lo || l+w > hi {
			return false
		}
		for _, sp := range taken[lane] {
			if l < sp[1]+gap && sp[0] < l+w+gap {
				return false
			}
		}
		for _, x := range shapes[lane] {
			if x != own && l < x+pad && x-pad < l+w {
				return false
			}
		}
		return true
	}
	for i, w := range wants {
		spots[i] = LabelSpot{Lane: -1}
		l := w.X + pad
		if l+w.W > hi {
			l = w.X - pad - w.W
		}
		for _, lane := range w.Lanes {
			if fits(lane, l, w.W, w.X) {
				spots[i] = LabelSpot{Left: l, Lane: lane}
				taken[lane] = append(taken[lane], [2]float64{l, l + w.W})
				break
			}
		}
	}
	return spots
}

// shortDays are the days of a scenario's result to shade as under 12 h,
// by the charts' rule (report.ShadingFor), or nil. The app works them out
// once per result: they do not change with the layout.
func shortDays(s scenario.Scenario, days []plan.Day) []report.DaySpan {
	sh := report.ShadingFor(s)
	if !sh.ShortDays {
		return nil
	}
	return report.ShortDaySpans(days, sh.LatDeg, sh.LonDeg)
}
