package sim

import (
	"testing"
	"time"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/scenario"
)

func TestYearLayout(t *testing.T) {
	s := scenario.Demo()
	s.Plan.StepMin = 10
	y := mustYear(s)
	assert.Equal(t, 10, y.ResMin)
	assert.Len(t, y.TempC, 366*144)
	at := func(v string) int {
		tm, err := time.Parse(time.RFC3339, v)
		if err != nil {
			t.Fatal(err)
		}
		return y.Index(tm)
	}
	assert.Equal(t, 0, at("2031-01-01T00:00:00Z"))
	assert.Equal(t, 59*144, at("2028-02-29T00:09:59Z"), "29 February has its own row")
	assert.Equal(t, 60*144+1, at("2031-03-01T00:10:00Z"), "1 March is row 60 in every year")
	assert.Equal(t, 365*144+143, at("2030-12-31T23:59:00Z"))
	assert.Equal(t, at("2031-03-01T00:10:00Z"), at("2031-03-01T01:10:00+01:00"), "rows follow UTC")
	// Steps that do not divide the day use the largest divisor of 1440 below them.
	for step, want := range map[int]int{1: 1, 7: 6, 10: 10, 11: 10, 25: 24, 45: 45, 50: 48, 60: 60} {
		assert.Equal(t, want, resolutionFor(step), "step %d", step)
	}
}

func TestYearOutdoorUsesSolarTime(t *testing.T) {
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	s.Site.OutdoorMeanC, s.Site.OutdoorAnnualRangeC, s.Site.OutdoorDailyRangeC = 0, 0, 10
	s.Site.LonDeg = 90 // solar time is UTC + 6 h
	y := mustYear(s)
	// The daily maximum is at 15:00 solar time = 09:00 UTC; the slot from
	// 08:55 to 09:05 is not on the grid, so look at 09:00–09:10 (midpoint 09:05).
	hot := y.TempC[row(6, 1)*y.PerDay+9*6]
	cold := y.TempC[row(6, 1)*y.PerDay+21*6]
	assert.InDelta(t, 5, hot, 0.01)
	assert.InDelta(t, -5, cold, 0.01)
}

func TestRunWithSharedYear(t *testing.T) {
	s := scenario.Demo()
	y := mustYear(s)
	a := RunWith(s, y)
	s.Node.Vision.FPS = 10 // a node edit leaves the site's table valid
	b := RunWith(s, y)
	assert.Equal(t, Run(s).Flat, b.Flat)
	assert.True(t, b.Flat.Before(a.Flat))
}

// BenchmarkNewYearOutdoor: a year of outdoor temperatures at 10-minute slots.
func BenchmarkNewYearOutdoor(b *testing.B) {
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	for b.Loop() {
		mustYear(s)
	}
}

// BenchmarkNewYearPanel: a year of sun positions, irradiance and panel
// output at 10-minute slots (52 704 slots).
func BenchmarkNewYearPanel(b *testing.B) {
	s := panelScenario(59.9, 10.75, "Europe/Oslo")
	for b.Loop() {
		mustYear(s)
	}
}

// BenchmarkRunPanel5y: 5 years at 10-minute steps with a panel, the site's
// table already built (an edit of the node or the cells).
func BenchmarkRunPanel5y(b *testing.B) {
	s := panelScenario(59.9, 10.75, "Europe/Oslo")
	y := mustYear(s)
	for b.Loop() {
		RunWith(s, y)
	}
}

func mustYear(s scenario.Scenario) *Year {
	y, err := NewYear(s, nil)
	if err != nil {
		panic(err)
	}
	return y
}

func TestSolarMonth(t *testing.T) {
	cases := []struct {
		row     int
		minutes float64
		want    time.Month
	}{
		{0, 0, time.January}, {0, -1, time.December}, {30, 1439, time.January}, {30, 1440, time.February},
		{59, 0, time.February}, {60, 0, time.March}, {365, 1440, time.January}, {365, 0, time.December},
	}
	for _, c := range cases {
		assert.Equal(t, c.want, solarMonth(c.row, c.minutes), "row %d %+g min", c.row, c.minutes)
	}
}

// One table serves every panel size: output is proportional to area.
func TestPanelTableScalesWithArea(t *testing.T) {
	s := panelScenario(45, 7, "Europe/Rome")
	s.Plan.Years = 1
	y := mustYear(s)
	for _, area := range []float64{1.25, 40, 630} {
		v := s
		v.Harvest.Panel.AreaCm2 = area
		own := Run(v)           // a table built for this area
		shared := RunWith(v, y) // the 40 cm² table, scaled
		assert.InEpsilon(t, own.Ledger.HarvestedWh, shared.Ledger.HarvestedWh, 1e-9, "%g cm²", area)
		assert.Equal(t, own.Flat, shared.Flat, "%g cm²", area)
	}
}

func TestYieldEveryThirtyDays(t *testing.T) {
	s := scenario.Demo()
	s.Plan.Start, s.Plan.Years = "2027-01-01", 1
	calls := 0
	r := RunOpts(s, mustYear(s), Options{Yield: func() { calls++ }})
	assert.Equal(t, 365/30, calls)
	assert.Equal(t, Run(s).Ledger, r.Ledger, "yielding changes nothing")
}
