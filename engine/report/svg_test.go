package report_test

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/report"
	"nodelife/engine/scenario"
)

// node is an element of a parsed SVG document.
type node struct {
	XMLName xml.Name
	Attrs   []xml.Attr `xml:",any,attr"`
	Nodes   []node     `xml:",any"`
	Text    string     `xml:",chardata"`
}

func (n node) attr(name string) string {
	for _, a := range n.Attrs {
		if a.Name.Local == name {
			return a.Value
		}
	}
	return ""
}

// text is the element's text with its children's.
func (n node) text() string {
	s := n.Text
	for _, c := range n.Nodes {
		s += c.text()
	}
	return s
}

// find returns the elements under n (n included) with a tag and, if class
// is not "", that class.
func (n node) find(tag, class string) []node {
	var out []node
	if n.XMLName.Local == tag && (class == "" || n.attr("class") == class) {
		out = append(out, n)
	}
	for _, c := range n.Nodes {
		out = append(out, c.find(tag, class)...)
	}
	return out
}

// parseSVG walks the document with encoding/xml's decoder, then reads it
// into a tree.
func parseSVG(t *testing.T, doc []byte) node {
	t.Helper()
	d := xml.NewDecoder(bytes.NewReader(doc))
	for {
		_, err := d.Token()
		if err != nil {
			require.ErrorContains(t, err, "EOF", "the SVG is not well-formed XML")
			break
		}
	}
	var root node
	require.NoError(t, xml.Unmarshal(doc, &root))
	require.Equal(t, "svg", root.XMLName.Local)
	require.Equal(t, "http://www.w3.org/2000/svg", root.XMLName.Space)
	return root
}

// handMade is a small result: 2027 and 2028, the mean falling 0.1 % a day
// from 100 %, the band ±2 % around it (at most 100 %), a swap on 2027-07-01 and another on
// 2028-05-01, cells flat on 2027-10-15. Harvest 0.5 Wh a day in January,
// none after; load 0.25 Wh a day. The numbers are invented for the test.
func handMade() plan.Result {
	start := time.Date(2027, 1, 1, 0, 0, 0, 0, time.UTC)
	end := start.AddDate(2, 0, 0)
	fb := "2027-10-15"
	r := plan.Result{Scenario: "Test node", Start: "2027-01-01", End: "2029-01-01",
		Lifetime: "9 mo", FirstBrownout: &fb,
		Swaps: []plan.Swap{{Date: "2027-07-01", Due: "2027-07-15", Reason: "reserve"},
			{Date: "2028-05-01", Due: "2028-05-15", Reason: "reserve"}}}
	for i, d := 0, start; d.Before(end); i, d = i+1, d.AddDate(0, 0, 1) {
		mean := 100 - 0.1*float64(i)
		h := 0.0
		if d.Month() == time.January && d.Year() == 2027 {
			h = 0.5
		}
		r.Daily = append(r.Daily, plan.Day{Date: d.Format(time.DateOnly),
			SoCMinPct: mean - 2, SoCMeanPct: mean, SoCMaxPct: math.Min(mean+2, 100),
			TempMinC: -5, TempMeanC: 0, TempMaxC: 5, HarvestWh: h, LoadWh: 0.25})
	}
	return r
}

func demoResult(t *testing.T) plan.Result {
	t.Helper()
	r, err := plan.Run(scenario.Demo())
	require.NoError(t, err)
	return r
}

func TestSVGDocument(t *testing.T) {
	for name, o := range map[string]report.SVGOptions{
		"zero options": {},
		"1280 × 720":   {Width: 1280, Height: 720, ReservePct: 10},
		"too small":    {Width: 10, Height: 10},
	} {
		root := parseSVG(t, report.SVG(handMade(), o))
		f := report.Layout(handMade(), o)
		w, h := strconv.Itoa(int(f.Width)), strconv.Itoa(int(f.Height))
		assert.Equal(t, w, root.attr("width"), name)
		assert.Equal(t, h, root.attr("height"), name)
		assert.Equal(t, "0 0 "+w+" "+h, root.attr("viewBox"), name)
		assert.Contains(t, root.attr("font-family"), "sans-serif", name)
		// Standalone: nothing fetched from elsewhere.
		for _, tag := range []string{"image", "use", "a", "style", "script", "foreignObject"} {
			assert.Empty(t, root.find(tag, ""), "%s: <%s> in the document", name, tag)
		}
	}
	assert.Equal(t, float64(report.DefaultWidth), report.Layout(handMade(), report.SVGOptions{}).Width)
	assert.Equal(t, float64(report.DefaultHeight), report.Layout(handMade(), report.SVGOptions{}).Height)
	small := report.Layout(handMade(), report.SVGOptions{Width: 10, Height: 10})
	assert.Equal(t, float64(report.MinWidth), small.Width)
	assert.Equal(t, float64(report.MinHeight), small.Height)
}

func TestSVGElements(t *testing.T) {
	r := handMade()
	root := parseSVG(t, report.SVG(r, report.SVGOptions{ReservePct: 15}))
	require.Len(t, root.find("path", "soc-band"), 1)
	require.Len(t, root.find("path", "soc-mean"), 1)
	assert.Equal(t, "Test node", root.find("text", "title")[0].text())
	assert.Contains(t, root.find("text", "lifetime")[0].text(), "Lasts 9 mo")

	swaps := root.find("g", "swap")
	require.Len(t, swaps, len(r.Swaps), "one marker per swap")
	for i, g := range swaps {
		assert.Equal(t, r.Swaps[i].Date, g.attr("data-date"))
		require.Len(t, g.find("text", ""), 1, "swap %s has room for its label", r.Swaps[i].Date)
		assert.Contains(t, g.find("text", "")[0].text(), r.Swaps[i].Date)
		assert.Contains(t, g.find("title", "")[0].text(), "due "+r.Swaps[i].Due)
	}
	flat := root.find("g", "flat")
	require.Len(t, flat, 1)
	assert.Contains(t, flat[0].find("text", "")[0].text(), "2027-10-15")

	// Ticks: the years at their 1 January, 2027 named on the first tick.
	var ticks []string
	for _, g := range root.find("g", "x-ticks") {
		for _, tx := range g.find("text", "") {
			ticks = append(ticks, tx.text())
		}
	}
	assert.Contains(t, ticks, "2028")
	assert.Contains(t, ticks, "2029")
	assert.Contains(t, ticks[0], "2027")
	var yticks []string
	for _, tx := range root.find("g", "y-ticks")[0].find("text", "") {
		yticks = append(yticks, tx.text())
	}
	assert.Equal(t, []string{"0", "25", "50", "75", "100"}, yticks)

	reserve := root.find("g", "reserve")
	require.Len(t, reserve, 1)
	assert.Equal(t, "reserve 15 %", reserve[0].find("text", "")[0].text())
	// Units on every part's heading.
	var heads []string
	for _, h := range root.find("text", "heading") {
		heads = append(heads, h.Text) // the heading without its note
	}
	assert.Equal(t, []string{"State of charge, %", "Temperature at the cells, °C", "Harvest and load, Wh per month"}, heads)
	// 24 months, each with a load bar; harvest only in January 2027.
	assert.Len(t, root.find("rect", "load"), 24)
	assert.Len(t, root.find("rect", "harvest"), 1)
	assert.Len(t, root.find("g", "legend"), 1)
	assert.Contains(t, root.find("text", "heading")[1].text(), "daily mean 0 throughout")
}

func TestSVGDemo(t *testing.T) {
	r := demoResult(t)
	root := parseSVG(t, report.SVG(r, report.SVGOptions{ReservePct: 10}))
	swaps := root.find("g", "swap")
	require.Len(t, swaps, len(r.Swaps))
	for i, g := range swaps {
		assert.Contains(t, g.text(), r.Swaps[i].Date)
	}
	require.Len(t, root.find("g", "flat"), 1)
	assert.Contains(t, root.find("g", "flat")[0].text(), *r.FirstBrownout)
	ticks := root.find("g", "x-ticks")[0].text()
	// An 8-year plan from 2027-03-01: every 1 January from 2028 to 2035.
	for y := 2028; y <= 2035; y++ {
		assert.Contains(t, ticks, strconv.Itoa(y))
	}
}

func TestSVGManySwaps(t *testing.T) {
	// A swap every 30 days for two years: too crowded for every label, but
	// each swap keeps its marker and its date.
	r := handMade()
	r.Swaps = nil
	for d := time.Date(2027, 2, 1, 0, 0, 0, 0, time.UTC); d.Year() < 2029; d = d.AddDate(0, 0, 30) {
		r.Swaps = append(r.Swaps, plan.Swap{Date: d.Format(time.DateOnly), Due: d.Format(time.DateOnly), Reason: "reserve"})
	}
	root := parseSVG(t, report.SVG(r, report.SVGOptions{}))
	swaps := root.find("g", "swap")
	require.Len(t, swaps, len(r.Swaps))
	labelled := 0
	for i, g := range swaps {
		assert.Contains(t, g.find("title", "")[0].text(), r.Swaps[i].Date)
		labelled += len(g.find("text", ""))
	}
	assert.Less(t, labelled, len(r.Swaps), "labels of crowded swaps are left out")
}

func TestSVGEscapes(t *testing.T) {
	r := handMade()
	r.Scenario = `Gate <3> & "north" 'dock'`
	r.Swaps[0].Reason = `<reason> & "why"`
	doc := report.SVG(r, report.SVGOptions{})
	root := parseSVG(t, doc)
	assert.Equal(t, r.Scenario, root.find("text", "title")[0].text())
	assert.Equal(t, "State of charge: "+r.Scenario, root.find("title", "")[0].text())
	assert.NotContains(t, string(doc), "<3>")
	assert.Contains(t, string(doc), "Gate &lt;3&gt; &amp; &#34;north&#34;")

	// Characters XML cannot carry do not break the document.
	r.Scenario = "bell\x07 and nul\x00"
	parseSVG(t, report.SVG(r, report.SVGOptions{}))
}

func TestSVGDeterministic(t *testing.T) {
	r := demoResult(t)
	a := report.SVG(r, report.SVGOptions{ReservePct: 10})
	b := report.SVG(r, report.SVGOptions{ReservePct: 10})
	assert.True(t, bytes.Equal(a, b), "two calls give different bytes")
	assert.NotContains(t, string(a), "NaN")
	assert.NotContains(t, string(a), "e+", "numbers in exponent form")
}

// points reads the coordinates of a path written as "M x,y L x,y x,y … [Z]".
func points(t *testing.T, d string) [][2]float64 {
	t.Helper()
	var out [][2]float64
	for _, f := range strings.Fields(d) {
		f = strings.TrimLeft(f, "ML")
		if f == "Z" || f == "" {
			continue
		}
		xs, ys, ok := strings.Cut(f, ",")
		require.True(t, ok, "point %q", f)
		x, err := strconv.ParseFloat(xs, 64)
		require.NoError(t, err)
		y, err := strconv.ParseFloat(ys, 64)
		require.NoError(t, err)
		out = append(out, [2]float64{x, y})
	}
	return out
}

// Coordinates are written with one decimal.
const tolPx = 0.05 + 1e-9

func TestSVGGeometry(t *testing.T) {
	r := handMade()
	o := report.SVGOptions{Width: 1000, Height: 600, ReservePct: 10}
	f := report.Layout(r, o)
	root := parseSVG(t, report.SVG(r, o))
	day := func(i int) time.Time {
		d, err := time.Parse(time.DateOnly, r.Daily[i].Date)
		require.NoError(t, err)
		return d
	}
	n := len(r.Daily)

	mean := points(t, root.find("path", "soc-mean")[0].attr("d"))
	require.Len(t, mean, n, "one point a day")
	for _, c := range []struct {
		name string
		got  [2]float64
		i    int
	}{{"first", mean[0], 0}, {"last", mean[n-1], n - 1}} {
		wantX, wantY := f.Time.DayX(day(c.i)), f.SoC.Y(r.Daily[c.i].SoCMeanPct)
		assert.InDelta(t, wantX, c.got[0], tolPx, "%s mean point x", c.name)
		assert.InDelta(t, wantY, c.got[1], tolPx, "%s mean point y", c.name)
	}
	// The first day is plotted half a day in; the scale spans the plot.
	assert.InDelta(t, f.Plot.X+f.Plot.W*0.5/731, mean[0][0], tolPx) // 2027 and 2028: 731 days
	assert.Equal(t, f.Plot.X, f.Time.X(f.Time.Start))
	assert.Equal(t, f.Plot.Right(), f.Time.X(f.Time.End))
	assert.Equal(t, f.Plot.Bottom(), f.SoC.Y(0))
	assert.Equal(t, f.Plot.Y, f.SoC.Y(100))

	// The band runs forward along the maxima and back along the minima.
	band := points(t, root.find("path", "soc-band")[0].attr("d"))
	require.Len(t, band, 2*n)
	assert.InDelta(t, f.SoC.Y(r.Daily[0].SoCMaxPct), band[0][1], tolPx)
	assert.InDelta(t, f.SoC.Y(r.Daily[n-1].SoCMinPct), band[n][1], tolPx)
	assert.InDelta(t, f.SoC.Y(r.Daily[0].SoCMinPct), band[2*n-1][1], tolPx)

	// Swap lines at their dates; the reserve line at its level.
	for i, l := range root.find("line", "swap-line") {
		d, _ := time.Parse(time.DateOnly, r.Swaps[i].Date)
		x, _ := strconv.ParseFloat(l.attr("x1"), 64)
		assert.InDelta(t, f.Time.X(d), x, tolPx, "swap %s", r.Swaps[i].Date)
	}
	y, _ := strconv.ParseFloat(root.find("g", "reserve")[0].find("line", "")[0].attr("y1"), 64)
	assert.InDelta(t, f.SoC.Y(10), y, 1, "reserve line within a pixel (drawn on a pixel's middle)")

	// January 2027's bars: 31 days × 0.5 Wh harvest and × 0.25 Wh load.
	for _, c := range []struct {
		class string
		wh    float64
	}{{"harvest", 31 * 0.5}, {"load", 31 * 0.25}} {
		bar := root.find("rect", c.class)[0]
		top, _ := strconv.ParseFloat(bar.attr("y"), 64)
		h, _ := strconv.ParseFloat(bar.attr("height"), 64)
		assert.InDelta(t, f.Energy.Y(c.wh), top, tolPx, "%s bar top", c.class)
		assert.InDelta(t, f.Bars.Bottom(), top+h, 2*tolPx, "%s bar bottom", c.class)
	}
	// 15.5 Wh, the largest month, is under the axis top (a nice value).
	assert.Equal(t, 20.0, f.Energy.V1)

	// The parts stack without overlap inside the document.
	assert.Less(t, f.Plot.Bottom(), f.Strip.Y)
	assert.Less(t, f.Strip.Bottom(), f.Bars.Y)
	assert.Less(t, f.Bars.Bottom(), f.Height)
	assert.Less(t, f.FlatLane.Bottom(), f.Plot.Y)
	assert.Greater(t, f.Plot.H, 0.5*f.Height-200, "the plot keeps most of the room")
}

func TestSVGShortPlanMonthTicks(t *testing.T) {
	r := handMade()
	r.End = "2027-07-01"
	r.Daily = r.Daily[:181] // January to June 2027
	r.Swaps, r.FirstBrownout = nil, nil
	root := parseSVG(t, report.SVG(r, report.SVGOptions{}))
	var got []string
	for _, tx := range root.find("g", "x-ticks")[0].find("text", "") {
		got = append(got, tx.text())
	}
	assert.Equal(t, []string{"2027", "Feb", "Mar", "Apr", "May", "Jun", "Jul"}, got)
	assert.Empty(t, root.find("g", "swap"))
	assert.Empty(t, root.find("g", "flat"))
}

func TestSVGOddInput(t *testing.T) {
	// No days at all.
	root := parseSVG(t, report.SVG(plan.Result{}, report.SVGOptions{}))
	assert.Contains(t, root.text(), "no days to chart")

	// Non-finite values and a date that does not parse are left out.
	r := handMade()
	r.Daily[10].SoCMeanPct = math.NaN()
	r.Daily[11].TempMeanC = math.Inf(1)
	r.Daily[12].HarvestWh = math.Inf(1)
	r.Daily[13].Date = "someday"
	r.Daily[14].SoCMaxPct = 150 // out of range: drawn at the plot's edge
	r.Start, r.End = "", ""     // the days' span stands in
	doc := report.SVG(r, report.SVGOptions{})
	root = parseSVG(t, doc)
	f := report.Layout(r, report.SVGOptions{})
	for _, p := range points(t, root.find("path", "soc-band")[0].attr("d")) {
		assert.GreaterOrEqual(t, p[1], f.Plot.Y-tolPx)
	}
	assert.NotContains(t, string(doc), "NaN")
	assert.NotContains(t, string(doc), "Inf")
	mean := points(t, root.find("path", "soc-mean")[0].attr("d"))
	assert.Len(t, mean, len(r.Daily)-2)
}

func TestSVGLongTitle(t *testing.T) {
	r := handMade()
	r.Scenario = strings.Repeat("a long name ", 30)
	root := parseSVG(t, report.SVG(r, report.SVGOptions{}))
	title := root.find("text", "title")[0].text()
	assert.True(t, strings.HasSuffix(title, "…"), "title %q is not shortened", title)
	assert.Less(t, len(title), len(r.Scenario))
	// The full name stays in the document's title.
	assert.Contains(t, root.find("title", "")[0].text(), strings.TrimSpace(r.Scenario))
}

func ExampleSVG() {
	doc := report.SVG(handMade(), report.SVGOptions{Width: 800, Height: 500, ReservePct: 10})
	lines := strings.SplitN(string(doc), "\n", 3)
	fmt.Println(lines[0])
	fmt.Println(strings.Count(string(doc), `<g class="swap"`), "swap markers")
	// Output:
	// <?xml version="1.0" encoding="UTF-8"?>
	// 2 swap markers
}

func ExampleLayout() {
	f := report.Layout(handMade(), report.SVGOptions{})
	fmt.Printf("plot from x %.0f to %.0f px; 100 %% at y %.0f, 0 %% at y %.0f\n",
		f.Time.X(f.Time.Start), f.Time.X(f.Time.End), f.SoC.Y(100), f.SoC.Y(0))
	// Output:
	// plot from x 56 to 936 px; 100 % at y 142, 0 % at y 313
}
