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

// dateTicks is DateTicks for the SVG chart, which also names the first
// year on the first tick when it is not in January and there is room.
func dateTicks(s TimeScale, minGapPx float64) []Tick {
	ticks := DateTicks(s, minGapPx)
	// Name the first year on the first tick when its label has room: the
	// chart keeps a label within the plot, so one at the start reaches
	// right by its full width.
	if len(ticks) > 0 && ticks[0].At.Month() != time.January {
		label := ticks[0].At.Format("Jan 2006")
		w := textWidth(label, labelSize)
		right := max(ticks[0].Pos-w/2, s.X0) + w
		if len(ticks) == 1 || right+6 <= ticks[1].Pos-textWidth(ticks[1].Label, labelSize)/2 {
			ticks[0].Label = label
		}
	}
	return ticks
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
