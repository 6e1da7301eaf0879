package ui

import (
	"image/color"
	"math"
	"strings"
	"testing"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/report"
	"nodelife/engine/scenario"
)

func date(s string) time.Time {
	t, err := time.Parse(time.DateOnly, s)
	if err != nil {
		panic(err)
	}
	return t
}

func TestScales(t *testing.T) {
	ts := TimeScale{Start: date("2027-01-01"), End: date("2029-01-01"), X0: 100, X1: 500}
	if x := ts.X(date("2027-01-01")); x != 100 {
		t.Errorf("X(start) = %g, want 100", x)
	}
	if x := ts.X(date("2029-01-01")); x != 500 {
		t.Errorf("X(end) = %g, want 500", x)
	}
	// 2027-01-01 + 365 days of a 731-day span (2028 is a leap year).
	if x, want := ts.X(date("2028-01-01")), 100+400*365.0/731; math.Abs(x-want) > 1e-9 {
		t.Errorf("X(2028-01-01) = %g, want %g", x, want)
	}
	ls := LinearScale{V0: 0, V1: 100, Y0: 400, Y1: 100}
	if y := ls.Y(25); y != 325 {
		t.Errorf("Y(25) = %g, want 325 (y grows down)", y)
	}
}

func TestDateTicksYears(t *testing.T) {
	// The demo: 8 years from 2027-03-01 on a 600 px plot.
	ts := TimeScale{Start: date("2027-03-01"), End: date("2035-03-01"), X0: 40, X1: 640}
	ticks := DateTicks(ts, minTickGapPx)
	want := []string{"2028", "2029", "2030", "2031", "2032", "2033", "2034", "2035"}
	if len(ticks) != len(want) {
		t.Fatalf("%d ticks %v, want %v", len(ticks), ticks, want)
	}
	for i, tk := range ticks {
		if tk.Label != want[i] || !tk.Major || tk.Pos < ts.X0 || tk.Pos > ts.X1 {
			t.Errorf("tick %d: %+v, want label %s, major, inside the plot", i, tk, want[i])
		}
	}
	// A long horizon is never marked by the month, however wide.
	for _, tk := range DateTicks(TimeScale{Start: date("2027-03-01"), End: date("2035-03-01"), X0: 0, X1: 5000}, minTickGapPx) {
		if !tk.Major {
			t.Errorf("8 years on 5000 px: month tick %q", tk.Label)
		}
	}
}

func TestDateTicksMonthsOnShortHorizons(t *testing.T) {
	ts := TimeScale{Start: date("2027-03-01"), End: date("2028-03-01"), X0: 0, X1: 800}
	ticks := DateTicks(ts, minTickGapPx)
	var year, months int
	for i, tk := range ticks {
		if tk.Label == "2028" && tk.Major {
			year++
		} else if !tk.Major {
			months++
		}
		if i > 0 && tk.Pos-ticks[i-1].Pos < minTickGapPx {
			t.Errorf("ticks %q and %q only %g px apart", ticks[i-1].Label, tk.Label, tk.Pos-ticks[i-1].Pos)
		}
	}
	if year != 1 || months < 3 {
		t.Errorf("one year on 800 px: %d year ticks and %d month ticks (%v); want 1 and several", year, months, ticks)
	}
	if ticks[0].Label != "Mar" {
		t.Errorf("first tick %q, want the start month Mar", ticks[0].Label)
	}
}

func TestDateTicksCrowded(t *testing.T) {
	// 20 years on 300 px: one tick per 60 px at least, so every 5 years.
	ts := TimeScale{Start: date("2027-01-01"), End: date("2047-01-01"), X0: 0, X1: 300}
	ticks := DateTicks(ts, minTickGapPx)
	if len(ticks) == 0 {
		t.Fatal("no ticks")
	}
	for _, tk := range ticks {
		if tk.At.Year()%5 != 0 || tk.At.Month() != time.January {
			t.Errorf("tick %s: want 1 January of years divisible by 5", tk.At.Format(time.DateOnly))
		}
	}
}

func TestPercentTicks(t *testing.T) {
	tall := PercentTicks(LinearScale{V0: 0, V1: 100, Y0: 400, Y1: 0}, 32)
	short := PercentTicks(LinearScale{V0: 0, V1: 100, Y0: 100, Y1: 0}, 32)
	if len(tall) != 5 || tall[1].Label != "25" || tall[4].Pos != 0 {
		t.Errorf("400 px axis: %v, want 0, 25, 50, 75, 100 with 100 at the top", tall)
	}
	if len(short) != 3 || short[1].Label != "50" {
		t.Errorf("100 px axis: %v, want 0, 50, 100", short)
	}
}

func TestColumnsKeepExtremes(t *testing.T) {
	// 8 years of days with a saw-tooth state of charge and one deep dip.
	ts := TimeScale{Start: date("2027-03-01"), End: date("2035-03-01"), X0: 50, X1: 650}
	var days []plan.Day
	lowest, highest := math.Inf(1), math.Inf(-1)
	for d, i := ts.Start, 0; d.Before(ts.End); d, i = d.AddDate(0, 0, 1), i+1 {
		mean := 100 - float64(i%700)/7
		lo, hi := mean-0.5, mean+0.5
		if i == 1234 {
			lo = 3 // a dip on one day
		}
		lowest, highest = math.Min(lowest, lo), math.Max(highest, hi)
		days = append(days, plan.Day{Date: d.Format(time.DateOnly), SoCMinPct: lo, SoCMeanPct: mean, SoCMaxPct: hi})
	}
	cols := Columns(days, ts, 1)
	if len(cols) > 601 || len(cols) < 590 {
		t.Errorf("%d columns for 600 px at 1 px each", len(cols))
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	for i, c := range cols {
		lo, hi = math.Min(lo, c.Min), math.Max(hi, c.Max)
		if c.Mean < c.Min || c.Mean > c.Max {
			t.Errorf("column %d: mean %g outside %g..%g", i, c.Mean, c.Min, c.Max)
		}
		if i > 0 && c.X <= cols[i-1].X {
			t.Errorf("column %d at %g, not right of %g", i, c.X, cols[i-1].X)
		}
	}
	if lo != lowest || hi != highest {
		t.Errorf("columns span %g..%g, the days %g..%g: an extreme was lost", lo, hi, lowest, highest)
	}
}

func TestPlaceLabels(t *testing.T) {
	shapes := [][]float64{{100, 150, 400, 590}, {300}}
	either, first := []int{0, 1}, []int{0}
	wants := []LabelWant{
		{X: 300, W: 120, Lanes: []int{1, 0}}, // first pick: right of its marker on lane 1
		{X: 100, W: 80, Lanes: either},       // would cover the shape at 150: goes to lane 1
		{X: 150, W: 80, Lanes: first},        // right of its marker
		{X: 400, W: 80, Lanes: first},        // room on lane 0
		{X: 590, W: 80, Lanes: first},        // near the right edge: flips left of its marker
		{X: 595, W: 300, Lanes: either},      // too wide for any lane
		{X: 160, W: 20, Lanes: first},        // no room left on its only lane
	}
	got := PlaceLabels(wants, shapes, 0, 600, 5, 10)
	want := []LabelSpot{{305, 1}, {105, 1}, {155, 0}, {405, 0}, {505, 0}, {0, -1}, {0, -1}}
	for i := range want {
		if want[i].Lane < 0 {
			if got[i].Lane >= 0 {
				t.Errorf("label %d: placed at %+v, want hidden", i, got[i])
			}
			continue
		}
		if got[i] != want[i] {
			t.Errorf("label %d: %+v, want %+v", i, got[i], want[i])
		}
	}
	// A label never covers another marker's shape on its lane.
	got = PlaceLabels([]LabelWant{{X: 100, W: 80, Lanes: first}}, [][]float64{{100, 150}}, 0, 600, 5, 10)
	if got[0].Lane >= 0 {
		t.Errorf("label over the shape at 150: %+v", got[0])
	}
}

func TestChartOfTheDemo(t *testing.T) {
	s := scenario.Demo()
	r := mustPlan(t, s)
	v := layoutChart(Rect{300, 60, 620, 600}, r, s.Plan.ReservePct, nil, fonts(t), Light(), 1)
	if len(v.Swaps) != len(r.Swaps) || len(v.Swaps) == 0 {
		t.Fatalf("%d swap markers for %d swaps", len(v.Swaps), len(r.Swaps))
	}
	if v.Flat == nil {
		t.Fatal("no flat marker, but the demo's cells go flat")
	}
	// The flat date is after the first swap, both inside the plot.
	if !(v.Plot.X < v.Swaps[0].X && v.Swaps[0].X < v.Flat.X && v.Flat.X < v.Plot.Right()) {
		t.Errorf("swap at %g, flat at %g, plot %v", v.Swaps[0].X, v.Flat.X, v.Plot)
	}
	found := map[string]bool{}
	for _, tx := range v.Labels.texts {
		found[tx.s] = true
	}
	for _, want := range []string{"State of charge, %", "swap " + r.Swaps[0].Date, "flat if not swapped · " + *r.FirstBrownout, "100", "0", "2030"} {
		if !found[want] {
			t.Errorf("no label %q", want)
		}
	}
	if want := v.SoC.Y(10); v.ReserveY != want {
		t.Errorf("reserve line at %g, want %g", v.ReserveY, want)
	}
}

func TestChartSwapOnTheFlatDate(t *testing.T) {
	// With no reserve the cells are swapped when flat: one label for both.
	s := scenario.Demo()
	s.Plan.ReservePct, s.Plan.LeadDays, s.Plan.VisitDays = 0, 0, scenario.Weekdays()
	r := mustPlan(t, s)
	if len(r.Swaps) == 0 || r.FirstBrownout == nil || r.Swaps[0].Date != *r.FirstBrownout {
		t.Fatalf("swaps %v, flat %v: the test needs a swap on the flat date", r.Swaps, r.FirstBrownout)
	}
	v := layoutChart(Rect{300, 60, 620, 600}, r, 0, nil, fonts(t), Light(), 1)
	var labels []string
	for _, tx := range v.Labels.texts {
		if tx.role == roleSwap || tx.role == roleFlat || strings.HasPrefix(tx.s, "reserve") {
			labels = append(labels, tx.s)
		}
	}
	want := "flat, swap · " + *r.FirstBrownout
	if len(labels) == 0 || labels[0] != want {
		t.Errorf("marker labels %q, want %q first", labels, want)
	}
	for _, l := range labels {
		if strings.HasPrefix(l, "reserve") || l == "swap "+r.Swaps[0].Date {
			t.Errorf("label %q: a zero reserve has no line or legend, and the swap shares the flat label", l)
		}
	}
}

// farNorth is an outdoor lithium-ion node with a panel in the far north:
// the cells leave their rated range in winter and the summer harvest is
// far above the load.
func farNorth() scenario.Scenario {
	s := scenario.Demo()
	s.Site.Placement, s.Site.LatDeg, s.Site.LonDeg = scenario.Outdoor, 69.65, 18.96
	s.Site.Climate.Preset = "subarctic"
	s.Harvest.Kind = scenario.HarvestPanel
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	s.Plan.Years = 3
	return s
}

func TestChartBarsCutAFarLargerHarvest(t *testing.T) {
	s := farNorth()
	r := mustPlan(t, s)
	v := layoutChart(Rect{300, 60, 620, 600}, r, s.Plan.ReservePct, nil, fonts(t), Light(), 1)
	maxH, maxL := 0.0, 0.0
	for _, m := range v.Months {
		maxH, maxL = math.Max(maxH, m.HarvestWhPerDay), math.Max(maxL, m.LoadWhPerDay)
	}
	if !v.HasHarvest || maxH < harvestCutRatio*maxL {
		t.Fatalf("harvest %g, load %g Wh/day: the test needs a harvest far above the load", maxH, maxL)
	}
	if !v.HarvestCut || v.Energy.V1 >= maxH || v.Energy.V1 < maxL {
		t.Errorf("scale to %g with harvest up to %g and load up to %g: want it cut above the load", v.Energy.V1, maxH, maxL)
	}
	if !strings.Contains(joined(&v.Labels), "harvest (cut at "+formatWh(v.Energy.V1)+")") {
		t.Errorf("the legend does not say the harvest is cut: %q", joined(&v.Labels))
	}
	// Monthly means: one month per calendar month of the 3-year plan.
	if len(v.Months) != 36 || v.Months[0].X0 != v.Plot.X || math.Abs(v.Months[35].X1-v.Plot.Right()) > 1e-9 {
		t.Errorf("%d months from %g to %g, plot %v", len(v.Months), v.Months[0].X0, v.Months[len(v.Months)-1].X1, v.Plot)
	}
}

func TestChartNamesWhatEndsTheCells(t *testing.T) {
	s := farNorth()
	r := mustPlan(t, s)
	if r.EndOfLifeLimit == nil || *r.EndOfLifeLimit != "temperature" {
		t.Fatalf("end of life %v: the test needs cells stopped by the cold", r.EndOfLifeLimit)
	}
	v := layoutChart(Rect{300, 60, 620, 600}, r, s.Plan.ReservePct, nil, fonts(t), Light(), 1)
	if v.Flat == nil || !strings.HasPrefix(v.Flat.Label, "outside rated temperature") {
		t.Errorf("marker %+v; want it to say the cells are outside their rated temperature", v.Flat)
	}
	a := AnswerFor(s, r)
	if !strings.Contains(a.Sub, "outside their rated temperature") || strings.Contains(a.Sub, "flat") {
		t.Errorf("answer %q; want the temperature, not a flat cell", a.Sub)
	}
}

func TestNiceCeil(t *testing.T) {
	for _, c := range []struct{ v, want float64 }{{0.034, 0.05}, {0.05, 0.05}, {2.47, 2.5}, {3, 5}, {7, 10}, {0, 1}, {120, 200}} {
		if got := NiceCeil(c.v); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("NiceCeil(%g) = %g, want %g", c.v, got, c.want)
		}
	}
}

// outdoorAt is the demo node outdoors with a panel at a site, over two years.
func outdoorAt(lat, lon float64, zone, preset string) scenario.Scenario {
	s := scenario.Demo()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = lat, lon, zone
	s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, preset
	s.Harvest.Kind = scenario.HarvestPanel
	s.Plan.Years = 2
	return s
}

func TestChartShadesShortDays(t *testing.T) {
	oslo := outdoorAt(59.91, 10.75, "Europe/Oslo", "cold-continental")
	r := mustPlan(t, oslo)
	v := layoutChart(Rect{300, 60, 620, 600}, r, oslo.Plan.ReservePct, shortDays(oslo, r.Daily), fonts(t), Light(), 1)
	// From 2027-03-01 for two years: the end of one winter, a whole one and
	// the start of a third.
	if len(v.ShortDays) != 3 {
		t.Fatalf("%d shaded spans %v, want 3", len(v.ShortDays), v.ShortDays)
	}
	for i, sp := range v.ShortDays {
		if sp.X0 < v.Plot.X || sp.X1 > v.Plot.Right() || sp.X1 <= sp.X0 {
			t.Errorf("span %d %+v outside the plot %v or empty", i, sp, v.Plot)
		}
		if i > 0 && sp.X0 <= v.ShortDays[i-1].X1 {
			t.Errorf("span %d %+v not right of %+v", i, sp, v.ShortDays[i-1])
		}
	}
	// Midwinter is shaded, midsummer is not (the solstices, from memory).
	shaded := func(day string) bool {
		x := v.Time.DayX(date(day))
		for _, sp := range v.ShortDays {
			if sp.X0 <= x && x <= sp.X1 {
				return true
			}
		}
		return false
	}
	for _, d := range []string{"2027-03-05", "2027-12-21", "2028-12-21"} {
		if !shaded(d) {
			t.Errorf("%s not shaded in Oslo", d)
		}
	}
	for _, d := range []string{"2027-06-21", "2028-06-20", "2027-04-15", "2028-09-01"} {
		if shaded(d) {
			t.Errorf("%s shaded in Oslo", d)
		}
	}
	if !strings.Contains(joined(&v.Labels), "days under 12 h") {
		t.Errorf("no legend entry for the shading: %q", joined(&v.Labels))
	}
	legend := 0
	for _, it := range v.legend {
		if it.kind == "short" {
			legend++
		}
	}
	if legend != 1 {
		t.Errorf("%d legend swatches for the shading, want 1", legend)
	}

	// None in the tropics, none for an indoor node with no harvester, none
	// when the caller passes no site.
	tropics := outdoorAt(10, -1.5, "UTC", "humid-tropical")
	indoor := scenario.Demo() // indoors in Oslo, no harvester
	indoor.Plan.Years = 2
	for name, c := range map[string]struct {
		s     scenario.Scenario
		shade bool // the scenario's own days, or none passed
	}{
		"10° N outdoors": {tropics, true},
		"indoor demo":    {indoor, true},
		"no site":        {oslo, false},
	} {
		r := mustPlan(t, c.s)
		var short []report.DaySpan
		if c.shade {
			short = shortDays(c.s, r.Daily)
		}
		v := layoutChart(Rect{300, 60, 620, 600}, r, c.s.Plan.ReservePct, short, fonts(t), Light(), 1)
		if len(v.ShortDays) != 0 || strings.Contains(joined(&v.Labels), "days under 12 h") {
			t.Errorf("%s: shaded spans %v, labels %q; want none", name, v.ShortDays, joined(&v.Labels))
		}
	}
}

func TestShortDaysColour(t *testing.T) {
	// Faint, yet there: distinct from the panel; the grid still shows on
	// it; and labels drawn over the plot keep 4.5:1 (WCAG 2.1 AA) on it.
	for name, th := range map[string]Theme{"light": Light(), "dark": Dark()} {
		p := th.Palette
		if c := Contrast(p.ShortDays, p.Panel); c < 1.03 || c > 1.25 {
			t.Errorf("%s: shading against the panel %.3f:1, want faint but visible (1.03 to 1.25)", name, c)
		}
		if c := Contrast(p.Grid, p.ShortDays); c < 1.05 {
			t.Errorf("%s: grid on the shading %.3f:1, want at least 1.05", name, c)
		}
		for what, fg := range map[string]color.NRGBA{"ink": p.Ink, "secondary": p.InkSecondary, "reserve": p.Reserve, "swap": p.Swap, "flat": p.Flat} {
			if c := Contrast(fg, p.ShortDays); c < 4.5 {
				t.Errorf("%s: %s on the shading %.2f:1, want ≥ 4.5", name, what, c)
			}
		}
	}
}

func TestChartNamesTheStart(t *testing.T) {
	// The demo's 8 years from 2027-03-01: the axis names March 2027 at its
	// left end, however wide the chart, and no two date labels touch.
	s := scenario.Demo()
	r := mustPlan(t, s)
	for _, w := range []float64{360, 480, 620, 900, 1400} {
		v := layoutChart(Rect{0, 0, w, 600}, r, s.Plan.ReservePct, nil, fonts(t), Light(), 1)
		if len(v.XTicks) == 0 || !v.XTicks[0].At.Equal(date(r.Start)) || v.XTicks[0].Label != "Mar 2027" {
			t.Fatalf("%g px: ticks %v; want the first on the start, %s, labelled Mar 2027", w, v.XTicks, r.Start)
		}
		var boxes []Rect
		for i, tk := range v.XTicks {
			if i > 0 && tk.Pos-v.XTicks[i-1].Pos < minTickGapPx {
				t.Errorf("%g px: ticks %s and %s %.1f px apart", w, v.XTicks[i-1].At.Format(time.DateOnly), tk.At.Format(time.DateOnly), tk.Pos-v.XTicks[i-1].Pos)
			}
			if tk.Label == "" {
				continue
			}
			found := false
			for _, tx := range v.Labels.texts {
				if tx.s == tk.Label && tx.y > v.Plot.Bottom() && tx.role == roleSecondary {
					boxes, found = append(boxes, tx.Bounds()), true
					break
				}
			}
			if !found {
				t.Errorf("%g px: no label %q under the axis", w, tk.Label)
			}
		}
		if len(boxes) == 0 || boxes[0].X != v.Plot.X {
			t.Errorf("%g px: the start's label at %v, want its left edge on the plot's %g", w, boxes, v.Plot.X)
		}
		for i := 1; i < len(boxes); i++ {
			if boxes[i].X < boxes[i-1].Right() {
				t.Errorf("%g px: date labels %v and %v overlap", w, boxes[i-1], boxes[i])
			}
		}
		if len(boxes) < 3 {
			t.Errorf("%g px: only %d date labels", w, len(boxes))
		}
	}
}
