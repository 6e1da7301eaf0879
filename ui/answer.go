package ui

import (
	"fmt"
	"math"
	"sort"
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
	Alert              bool // the value is bad news (brown-outs in the plan)
}

// Share is one load component's part of the energy drawn.
type Share struct {
	Name string
	Wh   float64
	Pct  float64 // of the load, 0 to 100
}

// Answer is what the app says about a result, as text.
type Answer struct {
	Headline  string // the lifetime: "4 y 10 mo", "more than 8 y"
	Sub       string // "cells flat on 2032-01-12 if nobody swaps them" or "outlives the 8-year plan"
	Flat      bool   // the cells go flat within the plan
	FirstSwap string // the first visit's date, or "none in the plan"
	SwapNote  string // when the cells come due and why
	Facts     []Fact
	Energy    []Share  // largest first; components that drew nothing are left out
	Idle      []string // the components that drew nothing
	Advice    []string // the advice's sentences, once worked out
	Cautions  []string
}

// AnswerFor words the result of s.
func AnswerFor(s scenario.Scenario, r plan.Result) Answer {
	a := Answer{Headline: r.Lifetime}
	if r.FirstBrownout != nil {
		a.Sub, a.Flat = endOfLife(r, *r.FirstBrownout), true
	} else {
		a.Sub = fmt.Sprintf("outlives the %d-year plan", s.Plan.Years)
	}
	a.FirstSwap = "none in the plan"
	if len(r.Swaps) > 0 {
		sw := r.Swaps[0]
		a.FirstSwap = sw.Date
		why := map[string]string{"reserve": "at the " + FormatNumber(s.Plan.ReservePct) + " % reserve",
			"flat": "flat", "voltage": "too weak for the peak current", "fade": "aged to end of life"}[sw.Reason]
		if why == "" {
			why = sw.Reason
		}
		a.SwapNote = "the cells come due on " + sw.Due + ", " + why
	}
	temp := Fact{Label: "Cell temperature", Value: formatSig(r.TempMinC, 3), Unit: "°C"}
	if math.Round(r.TempMinC) != math.Round(r.TempMaxC) {
		temp.Value = fmt.Sprintf("%.0f to %.0f", r.TempMinC, r.TempMaxC)
	}
	a.Facts = []Fact{
		{Label: "Swaps in the plan", Value: strconv.Itoa(len(r.Swaps))},
	}
	if r.BrownoutHours > 0 {
		down := Fact{Label: "Down despite swaps", Value: formatSig(r.BrownoutHours, 3), Unit: "h", Alert: true}
		if r.PlannedBrownout != nil && r.PlannedBrownout.Limit == "temperature" {
			down.Label = "Down, too cold or hot"
		}
		a.Facts = append(a.Facts, down)
	}
	a.Facts = append(a.Facts, []Fact{
		{Label: "Average load", Value: formatSig(r.AverageLoadMW, 3), Unit: "mW"},
		{Label: "Stored energy", Value: formatSig(r.PackWh, 3), Unit: "Wh"},
		temp,
	}...)
	if r.EnergyWh.Harvested > 0 {
		a.Facts = append(a.Facts, Fact{Label: "Harvested", Value: formatSig(r.EnergyWh.Harvested, 3), Unit: "Wh"})
	}
	a.Energy, a.Idle = shares(r.EnergyWh)
	if r.Advice != nil {
		a.Advice = r.Advice.Sentences
	}
	for _, c := range r.Cautions {
		a.Cautions = append(a.Cautions, c.Message)
	}
	return a
}

// endOfLife says what happens to the first cells on date, by what ends
// their life.
func endOfLife(r plan.Result, date string) string {
	if r.EndOfLifeLimit != nil {
		switch *r.EndOfLifeLimit {
		case "voltage":
			return "cells too weak for the node's peak current on " + date + " if nobody swaps them"
		case "temperature":
			return "node down on " + date + ": the cells are outside their rated temperature"
		}
	}
	return "cells flat on " + date + " if nobody swaps them"
}

// shares splits the load by component, largest first, and names the
// components that drew nothing.
func shares(e plan.Energy) ([]Share, []string) {
	var out []Share
	var idle []string
	for name, wh := range e.LoadByComponent {
		if wh <= 0 || e.Load <= 0 {
			idle = append(idle, name)
			continue
		}
		out = append(out, Share{Name: name, Wh: wh, Pct: 100 * wh / e.Load})
	}
	sort.Slice(out, func(i, j int) bool {
		if out[i].Wh != out[j].Wh {
			return out[i].Wh > out[j].Wh
		}
		return out[i].Name < out[j].Name
	})
	sort.Strings(idle)
	return out, idle
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

// AdviceState is where the background advice stands.
type AdviceState int

// Advice states.
const (
	AdviceWaiting AdviceState = iota // the answer is new; the advice starts after it is on screen
	AdviceRunning                    // working: Done of Total runs
	AdviceDone                       // the sentences are in the answer
	AdviceFailed                     // Err says why
)

// AdviceStatus is what the advice block shows while there are no sentences.
type AdviceStatus struct {
	State       AdviceState
	Done, Total int
	Err         string
}

// Fraction is the share of the work done, 0 to 1.
func (s AdviceStatus) Fraction() float64 {
	if s.Total <= 0 {
		return 0
	}
	return math.Min(float64(s.Done)/float64(s.Total), 1)
}

// Answer block geometry, CSS px.
const (
	panelPad  = 16 // inside panels
	factRowH  = 21
	factGap   = 16 // between fact columns
	factColW  = 180
	shareRowH = 20
)

// sideBlocks is the side column laid out: one display list and where each
// block is.
type sideBlocks struct {
	list                             displayList
	Answer, Energy, Advice, Cautions Rect
	Slot                             Rect // room left after the answer, or empty
	Progress                         Rect // the advice's progress bar, or empty
}

// layoutSide lays out the answer, the cautions, the advice and the energy by
// component one under the other from r.Y in r's width, and returns them and
// the height they take. A slot of slotH (for the chart) is left after the
// answer when slotH > 0.
func layoutSide(a Answer, st AdviceStatus, r Rect, slotH float64, m Measurer, th Theme) (sideBlocks, float64) {
	var sb sideBlocks
	y := r.Y
	var h float64
	sb.Answer, h = layoutAnswer(&sb.list, a, Rect{r.X, y, r.W, 0}, m, th)
	y += h + blockGap
	if slotH > 0 {
		sb.Slot = Rect{r.X, y, r.W, slotH}
		y += slotH + blockGap
	}
	// The cautions come before the advice: they are short, and a reader
	// must not miss them below the fold.
	var cl displayList
	cl, h = layoutCautions(a.Cautions, Rect{r.X, y, r.W, 0}, m, th)
	if h > 0 {
		sb.Cautions = Rect{r.X, y, r.W, h}
		sb.list.boxes = append(sb.list.boxes, cl.boxes...)
		sb.list.texts = append(sb.list.texts, cl.texts...)
		y += h + blockGap
	}
	sb.Advice, sb.Progress, h = layoutAdvice(&sb.list, a, st, Rect{r.X, y, r.W, 0}, m, th)
	y += h + blockGap
	sb.Energy, h = layoutEnergy(&sb.list, a, Rect{r.X, y, r.W, 0}, m, th)
	y += h
	return sb, y - r.Y
}

// underPanel puts a panel box at r under the boxes laid out from index at:
// a block's panel is sized after its content.
func underPanel(d *displayList, at int, r Rect) {
	d.boxes = append(d.boxes[:at], append([]boxItem{{r: r, fill: rolePanel, edge: roleRule, edged: true}}, d.boxes[at:]...)...)
}

// layoutAnswer lays out the lifetime and the first swap in large type and
// the facts under them inside r (the panel, padding included); it returns
// the panel.
func layoutAnswer(d *displayList, a Answer, r Rect, m Measurer, th Theme) (Rect, float64) {
	boxAt := len(d.boxes)
	in := r.Inset(panelPad)
	y := in.Y
	caps := th.headStyle()
	d.text(m, "LASTS", caps, in.X, y, AlignLeft, roleSecondary)
	y += caps.LineHeight()
	// The lifetime in the answer size, smaller if it would not fit.
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
	for _, l := range Wrap(m, a.Sub, th.bodyStyle(), in.W) {
		d.text(m, l, th.bodyStyle(), in.X, y, AlignLeft, subRole)
		y += th.bodyStyle().LineHeight()
	}
	y += 12
	d.text(m, "FIRST SWAP", caps, in.X, y, AlignLeft, roleSecondary)
	y += caps.LineHeight()
	swap := TextStyle{Medium, th.Type.Head + 4}
	swapRole := roleSwap
	if a.FirstSwap == "none in the plan" {
		swap, swapRole = TextStyle{Medium, th.Type.Head}, roleInk
	}
	d.text(m, a.FirstSwap, swap, in.X, y, AlignLeft, swapRole)
	y += swap.LineHeight()
	if a.SwapNote != "" {
		for _, l := range Wrap(m, a.SwapNote, th.labelStyle(), in.W) {
			d.text(m, l, th.labelStyle(), in.X, y, AlignLeft, roleSecondary)
			y += th.labelStyle().LineHeight()
		}
	}
	y += 10

	cols := max(1, min(3, int((in.W+factGap)/(factColW+factGap))))
	colW := (in.W - float64(cols-1)*factGap) / float64(cols)
	rows := (len(a.Facts) + cols - 1) / cols
	label, value := th.labelStyle(), th.monoStyle()
	d.box(Rect{in.X, y - 0.5, in.W, 1}, roleRule)
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
		vr := roleInk
		if f.Alert {
			vr = roleFlat
		}
		v := d.text(m, f.Value, value, right, vy, AlignRight, vr)
		d.text(m, Elide(m, f.Label, label, v.Bounds().X-x-8), label, x, ly, AlignLeft, roleSecondary)
		if below := i + 1; below < len(a.Facts) && below/rows == col { // a rule between facts of a column
			d.box(Rect{x, fy + factRowH - 0.5, colW, 1}, roleRule)
		}
	}
	y += float64(rows) * factRowH
	p := Rect{r.X, r.Y, r.W, y + panelPad - 4 - r.Y}
	underPanel(d, boxAt, p)
	return p, p.H
}

// Names of the load components in our words (the keys of
// energy_wh.load_by_component).
var componentNames = map[string]string{
	"sleep": "sleep", "vision": "vision", "illuminator": "illuminator", "events": "host wakes",
	"radio": "radio", "regulator": "regulator",
}

func componentName(k string) string {
	if n, ok := componentNames[k]; ok {
		return n
	}
	return k
}

// layoutEnergy lays out where the energy goes: one bar per component, its
// length its share of the load, the share after it.
func layoutEnergy(d *displayList, a Answer, r Rect, m Measurer, th Theme) (Rect, float64) {
	boxAt := len(d.boxes)
	in := r.Inset(panelPad)
	y := in.Y
	caps, small := th.headStyle(), th.labelStyle()
	num := TextStyle{Mono, th.Type.Label}
	d.text(m, "WHERE THE ENERGY GOES", caps, in.X, y, AlignLeft, roleSecondary)
	y += caps.LineHeight() + 6
	nameW := 0.0
	for _, s := range a.Energy {
		nameW = max(nameW, m.Advance(componentName(s.Name), small))
	}
	pctW := m.Advance("100 %", num)
	barX := in.X + nameW + 10
	barW := in.Right() - pctW - 8 - barX
	for _, s := range a.Energy {
		ty := y + (shareRowH-small.LineHeight())/2
		d.text(m, componentName(s.Name), small, in.X, ty, AlignLeft, roleInk)
		w := max(barW*s.Pct/100, 1)
		d.box(Rect{barX, y + 5, barW, shareRowH - 10}, roleBackground)
		d.box(Rect{barX, y + 5, w, shareRowH - 10}, roleAccent)
		pct := fmt.Sprintf("%.0f %%", s.Pct)
		if s.Pct < 1 {
			pct = "<1 %"
		}
		d.text(m, pct, num, in.Right(), y+(shareRowH-num.LineHeight())/2, AlignRight, roleInk)
		y += shareRowH
	}
	if len(a.Idle) > 0 {
		names := make([]string, len(a.Idle))
		for i, k := range a.Idle {
			names[i] = componentName(k)
		}
		for _, l := range Wrap(m, "none drawn by: "+strings.Join(names, ", "), small, in.W) {
			d.text(m, l, small, in.X, y+2, AlignLeft, roleSecondary)
			y += small.LineHeight()
		}
	}
	p := Rect{r.X, r.Y, r.W, y + panelPad - r.Y}
	underPanel(d, boxAt, p)
	return p, p.H
}

// adviceWorking is what the advice block says while the advice is worked out.
const adviceWorking = "Working out the advice: weather years, panel and cell sizes, what matters most."

// layoutAdvice lays out the advice sentences, or its progress while it is
// worked out.
func layoutAdvice(d *displayList, a Answer, st AdviceStatus, r Rect, m Measurer, th Theme) (Rect, Rect, float64) {
	boxAt := len(d.boxes)
	in := r.Inset(panelPad)
	y := in.Y
	caps, small, body := th.headStyle(), th.labelStyle(), th.bodyStyle()
	d.text(m, "ADVICE", caps, in.X, y, AlignLeft, roleSecondary)
	y += caps.LineHeight() + 4
	var bar Rect
	switch {
	case len(a.Advice) > 0:
		bullet := m.Advance("•  ", body)
		for i, s := range a.Advice {
			if i > 0 {
				y += 6
			}
			d.text(m, "•", body, in.X, y, AlignLeft, roleInk)
			for _, l := range Wrap(m, s, body, in.W-bullet) {
				d.text(m, l, body, in.X+bullet, y, AlignLeft, roleInk)
				y += body.LineHeight()
			}
		}
	case st.State == AdviceFailed:
		for _, l := range Wrap(m, "The advice could not be worked out: "+st.Err, small, in.W) {
			d.text(m, l, small, in.X, y, AlignLeft, roleFlat)
			y += small.LineHeight()
		}
	default:
		for _, l := range Wrap(m, adviceWorking, small, in.W) {
			d.text(m, l, small, in.X, y, AlignLeft, roleSecondary)
			y += small.LineHeight()
		}
		y += 6
		bar = Rect{in.X, y, in.W, 4}
		d.box(bar, roleBackground)
		if f := st.Fraction(); f > 0 {
			d.box(Rect{in.X, y, in.W * f, 4}, roleAccent)
		}
		y += 4
		if st.State == AdviceRunning && st.Total > 0 {
			y += 4
			d.text(m, fmt.Sprintf("%d of about %d runs", st.Done, st.Total), small, in.X, y, AlignLeft, roleSecondary)
			y += small.LineHeight()
		}
	}
	p := Rect{r.X, r.Y, r.W, y + panelPad - r.Y}
	underPanel(d, boxAt, p)
	return p, bar, p.H
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
	title := th.headStyle()
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

// Summary is the answer as plain text, for the page's live region (screen
// readers) and for copying.
func Summary(name string, a Answer) string {
	var b strings.Builder
	fmt.Fprintf(&b, "%s: lasts %s; %s. First swap: %s", name, a.Headline, a.Sub, a.FirstSwap)
	if a.SwapNote != "" {
		fmt.Fprintf(&b, " (%s)", a.SwapNote)
	}
	b.WriteString(".")
	for _, f := range a.Facts {
		fmt.Fprintf(&b, " %s: %s", f.Label, f.Value)
		if f.Unit != "" {
			b.WriteString(" " + f.Unit)
		}
		b.WriteString(".")
	}
	if len(a.Energy) > 0 {
		parts := make([]string, len(a.Energy))
		for i, s := range a.Energy {
			parts[i] = fmt.Sprintf("%s %.0f %%", componentName(s.Name), s.Pct)
		}
		b.WriteString(" Energy: " + strings.Join(parts, ", ") + ".")
	}
	for _, s := range a.Advice {
		b.WriteString(" " + s)
	}
	for _, c := range a.Cautions {
		b.WriteString(" Caution: " + c)
	}
	return b.String()
}
