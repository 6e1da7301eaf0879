package ui

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// GeneralCaution is shown under every answer.
const GeneralCaution = "A planning aid: confirm with the cell maker's datasheet and a field measurement. " +
	"Primary cells must never be charged; lithium-ion cells never below 0 °C."

// Fact is one line of the answer: a label, a value and its unit.
type Fact struct {
	Label, Value, Unit string
}

// Answer is what the app says about a result, as text.
type Answer struct {
	Headline string // "Lasts 4 y 10 mo"
	Sub      string // "cell flat on 2032-01-12" or "outlives the 8-year plan"
	Flat     bool   // the cells go flat within the plan
	Facts    []Fact
	Cautions []string
}

// AnswerFor words the result of s.
func AnswerFor(s scenario.Scenario, r plan.Result) Answer {
	a := Answer{Headline: "Lasts " + r.Lifetime}
	if r.FirstBrownout != nil {
		a.Sub, a.Flat = "cell flat on "+*r.FirstBrownout, true
	} else {
		a.Sub = fmt.Sprintf("outlives the %d-year plan", s.Plan.Years)
	}
	first := Fact{Label: "First swap", Value: "none in the plan"}
	if len(r.Swaps) > 0 {
		first.Value = r.Swaps[0].Date
		if r.Swaps[0].Reason != "reserve" {
			first.Unit = "(" + r.Swaps[0].Reason + ")"
		}
	}
	temp := Fact{Label: "Cell temperature", Value: formatSig(r.TempMinC, 3), Unit: "°C"}
	if math.Round(r.TempMinC) != math.Round(r.TempMaxC) {
		temp.Value = fmt.Sprintf("%.0f to %.0f", r.TempMinC, r.TempMaxC)
	}
	a.Facts = []Fact{
		first,
		{Label: "Swaps in the plan", Value: strconv.Itoa(len(r.Swaps))},
		{Label: "Average load", Value: formatSig(r.AverageLoadMW, 3), Unit: "mW"},
		{Label: "Stored energy", Value: formatSig(r.PackWh, 3), Unit: "Wh"},
		temp,
	}
	for _, c := range r.Cautions {
		a.Cautions = append(a.Cautions, c.Message)
	}
	return a
}

// formatSig writes v with n significant digits and no trailing zeros:
// 1.48235 → "1.48", 66.5 → "66.5", 19 → "19".
func formatSig(v float64, n int) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'f', -1, 64)
	}
	digits := n - 1 - int(math.Floor(math.Log10(math.Abs(v))))
	if digits < 0 {
		digits = 0
	}
	s := strconv.FormatFloat(v, 'f', digits, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return s
}

// Answer block geometry, CSS px.
const (
	panelPad = 16 // inside panels
	factRowH = 22
	factGap  = 16 // between fact columns
	factColW = 180
)

// layoutAnswer lays out the headline and facts inside r (the panel, padding
// included) and returns the list and the height it needs. Facts flow into as
// many columns of at least factColW as fit.
func layoutAnswer(a Answer, r Rect, m Measurer, th Theme) (displayList, float64) {
	var d displayList
	in := r.Inset(panelPad)
	y := in.Y
	// The headline in the answer size, smaller if it would not fit.
	head := TextStyle{Medium, th.Type.Answer}
	for head.Size > th.Type.Head && m.Advance(a.Headline, head) > in.W {
		head.Size -= 4
	}
	d.text(m, Elide(m, a.Headline, head, in.W), head, in.X, y, AlignLeft, roleInk)
	y += head.LineHeight()
	subRole := roleSecondary
	if a.Flat {
		subRole = roleFlat
	}
	d.text(m, Elide(m, a.Sub, th.bodyStyle(), in.W), th.bodyStyle(), in.X, y, AlignLeft, subRole)
	y += th.bodyStyle().LineHeight() + 12

	cols := max(1, min(3, int((in.W+factGap)/(factColW+factGap))))
	colW := (in.W - float64(cols-1)*factGap) / float64(cols)
	rows := (len(a.Facts) + cols - 1) / cols
	label, value := th.labelStyle(), th.monoStyle()
	for i, f := range a.Facts {
		col, row := i/rows, i%rows // fill down the first column first
		x := in.X + float64(col)*(colW+factGap)
		fy := y + float64(row)*factRowH
		ly := fy + (factRowH-label.LineHeight())/2
		vy := fy + (factRowH-value.LineHeight())/2
		right := x + colW
		if f.Unit != "" {
			u := d.text(m, f.Unit, label, right, ly, AlignRight, roleSecondary)
			right -= u.w + 4
		}
		v := d.text(m, f.Value, value, right, vy, AlignRight, roleInk)
		d.text(m, Elide(m, f.Label, label, v.Bounds().X-x-8), label, x, ly, AlignLeft, roleSecondary)
		if below := i + 1; below < len(a.Facts) && below/rows == col { // a rule between facts of a column
			d.box(Rect{x, fy + factRowH - 0.5, colW, 1}, roleRule)
		}
	}
	y += float64(rows) * factRowH
	h := y + panelPad - r.Y
	d.boxes = append([]boxItem{{r: Rect{r.X, r.Y, r.W, h}, fill: rolePanel, edge: roleRule, edged: true}}, d.boxes...)
	return d, h
}

// layoutCautions lays out the amber box of the result's cautions inside r's
// width from r.Y, and returns the list and its height (0 with no cautions).
func layoutCautions(cs []string, r Rect, m Measurer, th Theme) (displayList, float64) {
	var d displayList
	if len(cs) == 0 {
		return d, 0
	}
	const pad, between = 12, 6
	small := th.labelStyle()
	title := TextStyle{Medium, th.Type.Label}
	x, w := r.X+pad, r.W-2*pad
	y := r.Y + pad
	d.text(m, "CAUTIONS", title, x, y, AlignLeft, roleInk)
	y += title.LineHeight() + 2
	bullet := m.Advance("•  ", small)
	for i, c := range cs {
		if i > 0 {
			y += between
		}
		d.text(m, "•", small, x, y, AlignLeft, roleInk)
		for _, line := range Wrap(m, c, small, w-bullet) {
			d.text(m, line, small, x+bullet, y, AlignLeft, roleInk)
			y += small.LineHeight()
		}
	}
	h := y + pad - r.Y
	d.boxes = append(d.boxes, boxItem{r: Rect{r.X, r.Y, r.W, h}, fill: roleCautionFill, edge: roleCautionEdge, edged: true})
	return d, h
}
