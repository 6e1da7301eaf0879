package report

import (
	"math"
	"time"
)

// Rect is an axis-aligned rectangle in SVG user units (CSS px), y down.
type Rect struct{ X, Y, W, H float64 }

// Right is the rectangle's right edge.
func (r Rect) Right() float64 { return r.X + r.W }

// Bottom is the rectangle's bottom edge.
func (r Rect) Bottom() float64 { return r.Y + r.H }

// TimeScale maps calendar time onto x: Start onto X0 and End onto X1.
type TimeScale struct {
	Start, End time.Time
	X0, X1     float64
}

// X returns the x of t; a scale with no span puts every instant at X0.
func (s TimeScale) X(t time.Time) float64 {
	span := s.End.Sub(s.Start).Seconds()
	if span <= 0 {
		return s.X0
	}
	return s.X0 + (s.X1-s.X0)*t.Sub(s.Start).Seconds()/span
}

// DayX returns the x of the middle (noon) of the day that starts at day:
// the chart plots each day's values there.
func (s TimeScale) DayX(day time.Time) float64 { return s.X(day.Add(12 * time.Hour)) }

// LinearScale maps values onto y: V0 onto Y0 and V1 onto Y1.
type LinearScale struct {
	V0, V1 float64
	Y0, Y1 float64
}

// Y returns the y of v; a scale with V0 == V1 puts every value at Y0.
func (s LinearScale) Y(v float64) float64 {
	if s.V1 == s.V0 {
		return s.Y0
	}
	return s.Y0 + (s.Y1-s.Y0)*(v-s.V0)/(s.V1-s.V0)
}

// Tick is one labelled mark on an axis.
type Tick struct {
	At    time.Time // on a date axis
	Value float64   // on a value axis
	Pos   float64   // x on a date axis, y on a value axis
	Label string
	Major bool // 1 January on a date axis
}

// monthTicksMaxMonths is the longest horizon given month ticks; beyond
// three years (our choice) they crowd the years out.
const monthTicksMaxMonths = 36.5

// tickStepsMonths are the date tick spacings tried, finest first.
var tickStepsMonths = []int{1, 2, 3, 6, 12, 24, 60}

// DateTicks returns ticks on the first of the month from s.Start to s.End
// (inclusive), as fine as minGapPx between ticks allows. On horizons up to
// monthTicksMaxMonths they may fall on any month: 1 January is Major and
// labelled with the year, other months with their short name. Longer
// horizons get year ticks only. Dates are taken in s.Start's location.
// The SVG chart and the app's canvas chart both use it.
func DateTicks(s TimeScale, minGapPx float64) []Tick {
	months := s.End.Sub(s.Start).Hours() / 24 / (365.25 / 12)
	if months <= 0 || s.X1 <= s.X0 {
		return nil
	}
	pxPerMonth := (s.X1 - s.X0) / months
	step := tickStepsMonths[len(tickStepsMonths)-1]
	for _, st := range tickStepsMonths {
		if st < 12 && months > monthTicksMaxMonths {
			continue
		}
		if float64(st)*pxPerMonth >= minGapPx {
			step = st
			break
		}
	}
	loc := s.Start.Location()
	t := time.Date(s.Start.Year(), s.Start.Month(), 1, 0, 0, 0, 0, loc)
	if t.Before(s.Start) {
		t = t.AddDate(0, 1, 0)
	}
	var ticks []Tick
	for ; !t.After(s.End); t = t.AddDate(0, 1, 0) {
		if step >= 12 {
			if t.Month() != time.January || t.Year()%(step/12) != 0 {
				continue
			}
		} else if (int(t.Month())-1)%step != 0 {
			continue
		}
		tk := Tick{At: t, Pos: s.X(t), Label: t.Format("Jan"), Major: t.Month() == time.January}
		if tk.Major {
			tk.Label = t.Format("2006")
		}
		ticks = append(ticks, tk)
	}
	return ticks
}

// dateLabelGapPx is the least air between two date labels, px.
const dateLabelGapPx = 6

// DateAxis is DateTicks with the start of the axis named, for a chart whose
// date labels are centred on their ticks and kept within X0..X1. width
// gives a label's width in px.
//
// When the first tick is at s.Start it is labelled with its month and year
// ("Mar 2027"; a 1 January tick keeps its year, "2027"). Otherwise a tick
// at s.Start (x = X0) with the start's month and year comes first, in place
// of the first tick when that is nearer than minGapPx, so that the ticks
// stay at least minGapPx apart. Then, left to right, a label that would
// come within dateLabelGapPx of the label before it is left empty: its tick
// and grid line stay, and the start's name always shows. The SVG chart and
// the app's canvas chart both use it, so they name the same dates.
func DateAxis(s TimeScale, minGapPx float64, width func(label string) float64) []Tick {
	ticks := DateTicks(s, minGapPx)
	if !s.End.After(s.Start) || s.X1 <= s.X0 {
		return ticks
	}
	switch {
	case len(ticks) > 0 && ticks[0].At.Equal(s.Start):
		ticks[0].Label = startLabel(s.Start)
	default:
		start := Tick{At: s.Start, Pos: s.X0, Label: startLabel(s.Start),
			Major: s.Start.Month() == time.January && s.Start.Day() == 1}
		if len(ticks) > 0 && ticks[0].Pos-s.X0 < minGapPx {
			ticks = ticks[1:]
		}
		ticks = append([]Tick{start}, ticks...)
	}
	right := math.Inf(-1) // the right edge of the last label kept
	for i := range ticks {
		w := width(ticks[i].Label)
		l := min(max(ticks[i].Pos-w/2, s.X0), s.X1-w)
		if i > 0 && l < right+dateLabelGapPx {
			ticks[i].Label = ""
			continue
		}
		right = l + w
	}
	return ticks
}

// startLabel names the month and year of t, or the year alone on 1 January
// as DateTicks labels its ticks.
func startLabel(t time.Time) string {
	if t.Month() == time.January && t.Day() == 1 {
		return t.Format("2006")
	}
	return t.Format("Jan 2006")
}

// dateTicks is DateAxis for the SVG chart, with its label widths.
func dateTicks(s TimeScale, minGapPx float64) []Tick {
	return DateAxis(s, minGapPx, func(label string) float64 { return textWidth(label, labelSize) })
}

// PercentTicks returns ticks on a 0–100 % axis: every 25 % when they are at
// least minGapPx apart, else every 50 %.
func PercentTicks(s LinearScale, minGapPx float64) []Tick {
	step := 25.0
	if math.Abs(s.Y(0)-s.Y(25)) < minGapPx {
		step = 50
	}
	var ticks []Tick
	for v := 0.0; v <= 100; v += step {
		ticks = append(ticks, Tick{Value: v, Pos: s.Y(v), Label: number(v)})
	}
	return ticks
}

// niceCeil returns the smallest of 1, 1.5, 2, 2.5, 3, 4, 5, 6, 8 times a
// power of ten that is at least v (common practice for axis tops); 1 for
// v ≤ 0 or not finite.
func niceCeil(v float64) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10} {
		// A relative tolerance keeps 3 from rounding up to 4.
		if m*p >= v*(1-1e-12) {
			return m * p
		}
	}
	return 10 * p
}

// textWidth estimates the advance of s in a generic sans-serif face at
// size px. Renderers pick different faces, so the estimate leans wide: the
// per-glyph widths are rounded up from common sans-serif metrics (from
// memory, in em: narrow punctuation and i, l about 0.28, digits and most
// lower case 0.56, upper case 0.68, m and w 0.85) and 6 % is added.
func textWidth(s string, size float64) float64 {
	em := 0.0
	for _, c := range s {
		switch {
		case c == ' ' || c == '.' || c == ',' || c == ':' || c == ';' || c == '\'' ||
			c == 'i' || c == 'l' || c == 'j' || c == '|' || c == '!' || c == '·' || c == 'I':
			em += 0.28
		case c == 'f' || c == 't' || c == 'r' || c == '(' || c == ')' || c == '-':
			em += 0.38
		case c == 'm' || c == 'w' || c == 'M' || c == 'W' || c == '%' || c == '—':
			em += 0.85
		case c >= 'A' && c <= 'Z':
			em += 0.68
		case c > 0x2e7f: // CJK and other wide scripts
			em += 1
		default:
			em += 0.56
		}
	}
	return em * size * 1.06
}

// strongWidth estimates the advance of s set in the chart's heading weight
// (600), which common sans-serif faces draw up to about 18 % wider (from
// memory: DejaVu Sans Bold against DejaVu Sans, the widest common pair).
func strongWidth(s string, size float64) float64 { return textWidth(s, size) * 1.18 }
