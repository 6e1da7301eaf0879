package report

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"math"
	"strconv"
	"strings"

	"nodelife/engine/plan"
)

// The light palette of our design notes (UI.md).
const (
	colPanel   = "#FFFFFF"
	colRule    = "#D9D5CC"
	colInk     = "#1D2327"
	colInk2    = "#5B6770"
	colGrid    = "#ECE9E2"
	colBand    = "#2A7F86" // drawn at bandOpacity
	colMean    = "#1F6B72"
	colHarvest = "#D99A2B"
	colLoad    = "#5B6770"
	colSwap    = "#7A5BA6"
	colFlat    = "#B3372B"
	// The days under 12 h behind the plot: the strip's cold blue (tempCold)
	// at about 8 % over the panel, our choice. It stays lighter than the grid,
	// which shows through, and keeps the labels' contrast (the app's Light
	// theme has the same colour; ui/theme.go).
	colShort = "#F1F4F9"
)

const bandOpacity = "0.25" // UI.md: the band colour at 25 %

// The temperature strip's colours (UI.md) and the temperatures they stand
// for. 20 °C is the neutral of UI.md; the cold and hot ends, 30 K either
// side, are our choice: past them the colour saturates.
var (
	tempCold, tempMid, tempHot = [3]uint8{0x4B, 0x7B, 0xB5}, [3]uint8{0xE9, 0xE6, 0xDF}, [3]uint8{0xC0, 0x56, 0x3F}
)

const (
	tempColdC = -10.0
	tempMidC  = 20.0
	tempHotC  = 50.0
)

// fontFamily is the app's face when the reader has it, else the system's
// sans-serif: nothing is embedded or fetched.
const fontFamily = "Go, sans-serif"

// SVG draws the state-of-charge chart of r as a standalone SVG 1.1
// document: the scenario's name and lifetime, the daily state of charge
// (min–max band and mean line, %) with the reserve line, swap visits and
// the flat date over the plan's dates, the daily mean temperature at the
// cells as a colour strip (°C), and the energy harvested and used each
// calendar month as bars (Wh). Coordinates have one decimal; the output
// depends on nothing but r and o.
func SVG(r plan.Result, o SVGOptions) []byte {
	c := layout(r, o)
	w := &svgWriter{}
	W, H := strconv.Itoa(int(c.Width)), strconv.Itoa(int(c.Height))
	w.p(`<?xml version="1.0" encoding="UTF-8"?>` + "\n")
	w.p(`<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="%s" height="%s" viewBox="0 0 %s %s" font-family="%s" font-size="%d" fill="%s">`+"\n",
		W, H, W, H, fontFamily, labelSize, colInk)
	w.p("<title>%s</title>\n", esc("State of charge: "+strings.TrimSpace(r.Scenario)))
	w.p("<desc>%s</desc>\n", esc(sentenceText(c.sentence)))
	w.p(`<defs><linearGradient id="nodelife-temp-cold" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="%s"/><stop offset="1" stop-color="%s"/></linearGradient>`,
		rgb(tempCold), rgb(tempMid))
	w.p(`<linearGradient id="nodelife-temp-hot" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="%s"/><stop offset="1" stop-color="%s"/></linearGradient></defs>`+"\n",
		rgb(tempMid), rgb(tempHot))
	w.p(`<rect class="panel" x="0.5" y="0.5" width="%s" height="%s" fill="%s" stroke="%s"/>`+"\n",
		num(c.Width-1), num(c.Height-1), colPanel, colRule)

	c.drawHead(w)
	if len(c.days) == 0 || !c.Time.End.After(c.Time.Start) {
		w.text(c.Plot.X+c.Plot.W/2, c.Plot.Y+c.Plot.H/2, "no days to chart", bodySize, "middle", colInk2, "")
		w.p("</svg>\n")
		return w.b.Bytes()
	}
	c.drawPlot(w)
	c.drawStrip(w)
	c.drawBars(w)
	c.drawFoot(w)
	w.p("</svg>\n")
	return w.b.Bytes()
}

func (c *chart) drawHead(w *svgWriter) {
	w.p(`<text class="title" x="%s" y="%s" font-size="%d" font-weight="600">%s</text>`+"\n",
		num(pad), num(c.titleY), titleSize, esc(c.title))
	w.p(`<text class="lifetime" x="%s" y="%s" font-size="%d">`, num(pad), num(c.sentY), bodySize)
	for _, s := range c.sentence {
		if s.strong {
			w.p(`<tspan font-weight="600">%s</tspan>`, esc(s.text))
		} else {
			w.p(`<tspan fill="%s">%s</tspan>`, colInk2, esc(s.text))
		}
	}
	w.p("</text>\n")
	w.heading(c.socHeadY, socHeading, "")

	// The legend, right-aligned.
	x := c.Width - pad - c.legendWidth()
	cy := c.legendY - labelSize*0.35 // the middle of lower-case letters
	w.p(`<g class="legend">`)
	for _, it := range c.legend() {
		switch it {
		case "band":
			w.p(`<rect x="%s" y="%s" width="%d" height="10" fill="%s" fill-opacity="%s"/>`, num(x), num(cy-5), swatchW, colBand, bandOpacity)
		case "short": // outlined: the fill alone is too faint to see as a swatch
			w.p(`<rect x="%s" y="%s" width="%d" height="9" fill="%s" stroke="%s"/>`, num(x+0.5), num(cy-4.5), swatchW-1, colShort, colRule)
		case "mean":
			w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" stroke-width="2"/>`, num(x), num(cy), num(x+swatchW), num(cy), colMean)
		case "reserve":
			w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" stroke-dasharray="6 4"/>`, num(x), num(cy), num(x+swatchW), num(cy), colInk2)
		case "swap":
			w.diamond(x+swatchW/2, cy, colSwap)
		case "flat":
			w.triangle(x+swatchW/2, cy, colFlat)
		}
		w.text(x+swatchW+swatchGap, c.legendY, legendText[it], labelSize, "", colInk2, "")
		x += swatchW + swatchGap + textWidth(legendText[it], labelSize) + legendGap
	}
	w.p("</g>\n")
}

func (c *chart) drawPlot(w *svgWriter) {
	p := c.Plot
	// The days under 12 h, under everything else.
	if len(c.ShortDays) > 0 {
		w.p(`<g class="short-days" fill="%s" stroke="none">`, colShort)
		for _, sp := range c.ShortDays {
			w.p(`<rect x="%s" y="%s" width="%s" height="%s"/>`, num(sp.X0), num(p.Y), num(sp.X1-sp.X0), num(p.H))
		}
		w.p("</g>\n")
	}
	// Grid: value lines across, date lines down through the plot and the
	// bars, so the three parts read against the same dates.
	w.p(`<g class="grid" stroke="%s" stroke-width="1" shape-rendering="crispEdges">`, colGrid)
	for _, t := range c.YTicks {
		w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s"/>`, num(p.X), num(crisp(t.Pos)), num(p.Right()), num(crisp(t.Pos)))
	}
	for _, t := range c.XTicks {
		x := num(crisp(t.Pos))
		w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s"/>`, x, num(p.Y), x, num(p.Bottom()))
		w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s"/>`, x, num(c.Bars.Y), x, num(c.Bars.Bottom()))
	}
	w.p("</g>\n")

	// The band: forward along the daily maxima, back along the minima.
	var band, mean strings.Builder
	var lo []string
	for _, d := range c.days {
		if !finite(d.SoCMinPct) || !finite(d.SoCMaxPct) {
			continue
		}
		x := num(c.Time.DayX(d.t))
		sep := " "
		if band.Len() == 0 {
			sep = "M"
		} else if len(lo) == 1 {
			sep = " L"
		}
		band.WriteString(sep + x + "," + num(c.SoC.Y(clamp(d.SoCMaxPct, 0, 100))))
		lo = append(lo, x+","+num(c.SoC.Y(clamp(d.SoCMinPct, 0, 100))))
	}
	if len(lo) > 0 {
		for i := len(lo) - 1; i >= 0; i-- {
			if i == len(lo)-1 {
				band.WriteString(" L")
			} else {
				band.WriteString(" ")
			}
			band.WriteString(lo[i])
		}
		band.WriteString(" Z")
		w.p(`<path class="soc-band" d="%s" fill="%s" fill-opacity="%s" stroke="none"/>`+"\n", band.String(), colBand, bandOpacity)
	}
	n := 0
	for _, d := range c.days {
		if !finite(d.SoCMeanPct) {
			continue
		}
		switch n {
		case 0:
			mean.WriteString("M")
		case 1:
			mean.WriteString(" L")
		default:
			mean.WriteString(" ")
		}
		mean.WriteString(num(c.Time.DayX(d.t)) + "," + num(c.SoC.Y(clamp(d.SoCMeanPct, 0, 100))))
		n++
	}
	if n > 0 {
		w.p(`<path class="soc-mean" d="%s" fill="none" stroke="%s" stroke-width="2" stroke-linejoin="round"/>`+"\n", mean.String(), colMean)
	}

	// The reserve line and its label, right-aligned above it.
	if rp := c.o.ReservePct; rp > 0 && rp <= 100 {
		y := c.SoC.Y(rp)
		label := "reserve " + number(rp) + " %"
		w.p(`<g class="reserve"><line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" stroke-dasharray="6 4"/>`,
			num(p.X), num(crisp(y)), num(p.Right()), num(crisp(y)), colInk2)
		lw := textWidth(label, labelSize)
		w.patch(p.Right()-4-lw, y-labelSize-4, lw, labelSize+2)
		w.text(p.Right()-4, y-4, label, labelSize, "end", colInk2, "")
		w.p("</g>\n")
	}

	// Axes and tick labels.
	w.p(`<g class="axes" shape-rendering="crispEdges"><line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s"/><line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s"/></g>`+"\n",
		num(p.X), num(crisp(p.Bottom())), num(p.Right()), num(crisp(p.Bottom())), colInk2,
		num(crisp(p.X)), num(p.Y), num(crisp(p.X)), num(p.Bottom()), colRule)
	w.p(`<g class="y-ticks" fill="%s" text-anchor="end">`, colInk2)
	for _, t := range c.YTicks {
		w.p(`<text x="%s" y="%s">%s</text>`, num(p.X-8), num(t.Pos+labelSize*0.35), esc(t.Label))
	}
	w.p("</g>\n")
	w.p(`<g class="x-ticks" fill="%s" text-anchor="middle">`, colInk2)
	for _, t := range c.XTicks {
		w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" shape-rendering="crispEdges"/>`,
			num(crisp(t.Pos)), num(p.Bottom()), num(crisp(t.Pos)), num(p.Bottom()+4), colRule)
		if t.Label == "" { // no room beside the label before it
			continue
		}
		// Keep the first and last labels inside the plot's span.
		lw := textWidth(t.Label, labelSize)
		x := min(max(t.Pos, p.X+lw/2), p.Right()+8-lw/2)
		w.p(`<text x="%s" y="%s">%s</text>`, num(x), num(c.tickY), esc(t.Label))
	}
	w.p("</g>\n")

	// Markers: lines first, so every shape and label sits on top.
	for _, m := range c.marks {
		switch m.kind {
		case "swap":
			w.p(`<line class="swap-line" x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" stroke-dasharray="4 3"/>`+"\n",
				num(m.x), num(c.SwapLane.Y+laneH/2), num(m.x), num(p.Bottom()), colSwap)
		case "flat":
			w.p(`<line class="flat-line" x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s"/>`+"\n",
				num(m.x), num(c.FlatLane.Y+laneH/2), num(m.x), num(p.Bottom()), colFlat)
		}
	}
	for _, m := range c.marks {
		col, lane := colSwap, c.SwapLane
		if m.kind == "flat" {
			col, lane = colFlat, c.FlatLane
		}
		w.p(`<g class="%s" data-date="%s"><title>%s</title>`, m.kind, esc(m.date), esc(m.title))
		if m.kind == "flat" {
			w.triangle(m.x, lane.Y+laneH/2, col)
		} else {
			w.diamond(m.x, lane.Y+laneH/2, col)
		}
		if m.lane >= 0 {
			ly := c.SwapLane.Y + float64(m.lane)*laneH
			lw := textWidth(m.label, labelSize)
			w.patch(m.labelX-2, ly+2, lw+4, laneH-4)
			w.text(m.labelX, ly+laneH/2+labelSize*0.35, m.label, labelSize, "", col, "")
		}
		w.p("</g>\n")
	}
}

// drawStrip paints the daily mean temperature at the cells, a few days to
// a slice so that each slice is at least 2 px wide.
func (c *chart) drawStrip(w *svgWriter) {
	s := c.Strip
	note := "no temperatures"
	if finite(c.tempLo) {
		lo, hi := number(math.Round(c.tempLo)), number(math.Round(c.tempHi))
		if lo == hi {
			note = "daily mean " + lo + " throughout"
		} else {
			note = "daily mean " + lo + " to " + hi
		}
	}
	w.heading(c.stripY, tempHeading, note)
	// The key: cold end, neutral and hot end, right-aligned.
	const rampW = 40
	hot := number(tempHotC) + " °C"
	x := c.Width - pad - textWidth(hot, labelSize)
	w.p(`<g class="temp-key" fill="%s">`, colInk2)
	w.text(x, c.stripY, hot, labelSize, "", "", "")
	x -= rampW + 6
	w.p(`<rect x="%s" y="%s" width="%d" height="8" fill="url(#nodelife-temp-hot)"/>`, num(x), num(c.stripY-8), rampW)
	x -= 6
	w.text(x, c.stripY, number(tempMidC), labelSize, "end", "", "")
	x -= textWidth(number(tempMidC), labelSize) + 6 + rampW
	w.p(`<rect x="%s" y="%s" width="%d" height="8" fill="url(#nodelife-temp-cold)"/>`, num(x), num(c.stripY-8), rampW)
	w.text(x-6, c.stripY, number(tempColdC), labelSize, "end", "", "")
	w.p("</g>\n")

	per := max(1, int(math.Ceil(float64(len(c.days))*2/s.W)))
	w.p(`<g class="temp-strip" shape-rendering="crispEdges">`)
	for i := 0; i < len(c.days); i += per {
		j := min(i+per, len(c.days))
		sum, k := 0.0, 0
		for _, d := range c.days[i:j] {
			if finite(d.TempMeanC) {
				sum += d.TempMeanC
				k++
			}
		}
		if k == 0 {
			continue
		}
		// Whole-pixel edges, so neighbouring slices meet without a seam.
		x0 := math.Round(max(c.Time.X(c.days[i].t), s.X))
		x1 := math.Round(min(c.Time.X(c.days[j-1].t.AddDate(0, 0, 1)), s.Right()))
		if x1 <= x0 {
			continue
		}
		w.p(`<rect x="%s" y="%s" width="%s" height="%s" fill="%s"/>`, num(x0), num(s.Y), num(x1-x0), num(s.H), tempColour(sum/float64(k)))
	}
	w.p("</g>\n")
	w.p(`<rect x="%s" y="%s" width="%s" height="%s" fill="none" stroke="%s" shape-rendering="crispEdges"/>`+"\n",
		num(crisp(s.X)), num(crisp(s.Y)), num(s.W), num(s.H), colRule)
}

// drawBars paints each calendar month's harvest and load side by side.
func (c *chart) drawBars(w *svgWriter) {
	b := c.Bars
	note := ""
	if c.harvest == 0 {
		note = "no harvest in this scenario"
	}
	w.heading(c.barsY, barsHeading, note)
	// Legend, right-aligned.
	x := c.Width - pad - (10 + swatchGap + textWidth("harvest", labelSize) + legendGap + 10 + swatchGap + textWidth("load", labelSize))
	w.p(`<g class="bars-legend" fill="%s">`, colInk2)
	for _, it := range []struct{ name, col string }{{"harvest", colHarvest}, {"load", colLoad}} {
		w.p(`<rect x="%s" y="%s" width="10" height="10" fill="%s"/>`, num(x), num(c.barsY-9), it.col)
		w.text(x+10+swatchGap, c.barsY, it.name, labelSize, "", "", "")
		x += 10 + swatchGap + textWidth(it.name, labelSize) + legendGap
	}
	w.p("</g>\n")
	// Scale: the top value and zero.
	top := c.Energy.V1
	w.p(`<g class="bars-scale" fill="%s" text-anchor="end">`, colInk2)
	w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" shape-rendering="crispEdges"/>`, num(b.X), num(crisp(b.Y)), num(b.Right()), num(crisp(b.Y)), colGrid)
	w.p(`<text x="%s" y="%s">%s</text>`, num(b.X-8), num(b.Y+labelSize*0.35), esc(number(top)))
	w.p(`<text x="%s" y="%s">0</text>`, num(b.X-8), num(b.Bottom()+labelSize*0.35))
	w.p("</g>\n")
	w.p(`<g class="bars" shape-rendering="crispEdges">`)
	for _, m := range c.months {
		x0, x1 := c.Time.X(m.start), c.Time.X(m.end)
		g := (x1 - x0) * 0.12
		mid := (x0 + x1) / 2
		for _, bar := range []struct {
			class, col string
			l, r, wh   float64
		}{{"harvest", colHarvest, x0 + g, mid, m.harvestWh}, {"load", colLoad, mid, x1 - g, m.loadWh}} {
			y := c.Energy.Y(bar.wh)
			if !finite(bar.wh) || bar.wh <= 0 || b.Bottom()-y < 0.05 {
				continue
			}
			w.p(`<rect class="%s" x="%s" y="%s" width="%s" height="%s" fill="%s"><title>%s %s: %s Wh</title></rect>`,
				bar.class, num(bar.l), num(y), num(bar.r-bar.l), num(b.Bottom()-y), bar.col,
				m.start.Format("2006-01"), bar.class, strconv.FormatFloat(bar.wh, 'f', 3, 64))
		}
	}
	w.p("</g>\n")
	w.p(`<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="%s" shape-rendering="crispEdges"/>`+"\n",
		num(b.X), num(crisp(b.Bottom())), num(b.Right()), num(crisp(b.Bottom())), colInk2)
}

func (c *chart) drawFoot(w *svgWriter) {
	left := "A planning aid: confirm with the cell maker's datasheet and a field measurement."
	w.text(pad, c.footY, left, labelSize, "", colInk2, "")
	right := "nodelife · dates local to the site"
	if textWidth(left, labelSize)+24+textWidth(right, labelSize) <= c.Width-2*pad {
		w.text(c.Width-pad, c.footY, right, labelSize, "end", colInk2, "")
	}
}

func sentenceText(s []span) string {
	var b strings.Builder
	for _, p := range s {
		b.WriteString(p.text)
	}
	return b.String()
}

// tempColour is the strip's colour for a temperature, °C: cold blue to the
// neutral at 20 °C to warm red, linear in sRGB, saturating at the ends.
func tempColour(c float64) string {
	if c <= tempMidC {
		return rgb(mix(tempCold, tempMid, (c-tempColdC)/(tempMidC-tempColdC)))
	}
	return rgb(mix(tempMid, tempHot, (c-tempMidC)/(tempHotC-tempMidC)))
}

func mix(a, b [3]uint8, f float64) [3]uint8 {
	f = clamp(f, 0, 1)
	var out [3]uint8
	for i := range out {
		out[i] = uint8(math.Round(float64(a[i]) + (float64(b[i])-float64(a[i]))*f))
	}
	return out
}

func rgb(c [3]uint8) string { return fmt.Sprintf("#%02X%02X%02X", c[0], c[1], c[2]) }

// svgWriter collects the document.
type svgWriter struct{ b bytes.Buffer }

func (w *svgWriter) p(format string, args ...any) { fmt.Fprintf(&w.b, format, args...) }

// text writes one line of text at a baseline; anchor "" is the start,
// fill "" inherits, weight "" is regular.
func (w *svgWriter) text(x, y float64, s string, size int, anchor, fill, weight string) {
	w.p(`<text x="%s" y="%s"`, num(x), num(y))
	if size != labelSize {
		w.p(` font-size="%d"`, size)
	}
	if anchor != "" {
		w.p(` text-anchor="%s"`, anchor)
	}
	if fill != "" {
		w.p(` fill="%s"`, fill)
	}
	if weight != "" {
		w.p(` font-weight="%s"`, weight)
	}
	w.p(">%s</text>", esc(s))
}

// heading writes a part's heading at the left margin, and after it a note
// in the secondary ink, set where the renderer ends the heading.
func (w *svgWriter) heading(y float64, head, note string) {
	w.p(`<text class="heading" x="%s" y="%s" font-weight="600">%s`, num(pad), num(y), esc(head))
	if note != "" {
		w.p(`<tspan dx="12" font-weight="normal" fill="%s">%s</tspan>`, colInk2, esc(note))
	}
	w.p("</text>\n")
}

// patch is the panel colour behind a label that crosses lines.
func (w *svgWriter) patch(x, y, width, height float64) {
	w.p(`<rect x="%s" y="%s" width="%s" height="%s" fill="%s" fill-opacity="0.9"/>`, num(x), num(y), num(width), num(height), colPanel)
}

// diamond is the swap marker's shape.
func (w *svgWriter) diamond(x, y float64, col string) {
	w.p(`<path d="M%s,%s L%s,%s %s,%s %s,%s Z" fill="%s"/>`,
		num(x), num(y-markerR), num(x+markerR), num(y), num(x), num(y+markerR), num(x-markerR), num(y), col)
}

// triangle is the flat marker's shape, pointing down.
func (w *svgWriter) triangle(x, y float64, col string) {
	w.p(`<path d="M%s,%s L%s,%s %s,%s Z" fill="%s"/>`,
		num(x-markerR-0.5), num(y-markerR), num(x+markerR+0.5), num(y-markerR), num(x), num(y+markerR), col)
}

// num formats a coordinate with one decimal, without a "-0.0". The
// callers leave out non-finite values; should one slip through it is drawn
// at 0 rather than making the document invalid.
func num(x float64) string {
	if !finite(x) {
		return "0.0"
	}
	return fixed(x, 1)
}

// crisp puts a 1 px line on the middle of a pixel.
func crisp(v float64) float64 { return math.Floor(v) + 0.5 }

func clamp(x, lo, hi float64) float64 { return min(max(x, lo), hi) }

// number formats a label's value: up to two decimals, trailing zeros
// dropped, and a true minus sign.
func number(v float64) string {
	s := strconv.FormatFloat(math.Round(v*100)/100, 'f', -1, 64)
	if s == "-0" {
		s = "0"
	}
	return strings.Replace(s, "-", "−", 1)
}

// esc escapes text for XML character data and attribute values; characters
// XML does not allow become U+FFFD.
func esc(s string) string {
	var b strings.Builder
	_ = xml.EscapeText(&b, []byte(s)) // a strings.Builder never fails
	return b.String()
}
