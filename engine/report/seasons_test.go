package report_test

import (
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
	"nodelife/engine/sun"
)

// Sites of the tests (coordinates from memory, to the hundredth of a degree).
const (
	osloLat, osloLon                  = 59.91, 10.75
	sydneyLat, sydneyLon              = -33.87, 151.21
	longyearbyenLat, longyearbyenLon  = 78.22, 15.65
	equatorLat, equatorLon            = 0.0, 32.58
	tenNorthLat, tenNorthLon          = 10.0, -1.5
	equinoxMarch2027, equinoxSept2027 = "2027-03-20", "2027-09-23" // from memory (UTC dates)
)

// daysFrom returns n plan days from start, with no values.
func daysFrom(t *testing.T, start string, n int) []plan.Day {
	t.Helper()
	d0, err := time.Parse(time.DateOnly, start)
	require.NoError(t, err)
	days := make([]plan.Day, n)
	for i := range days {
		days[i].Date = d0.AddDate(0, 0, i).Format(time.DateOnly)
	}
	return days
}

// inSpans says for each day whether one of spans holds it, checking that
// the spans are in order, apart and within the days.
func inSpans(t *testing.T, n int, spans []report.DaySpan) []bool {
	t.Helper()
	in := make([]bool, n)
	for i, sp := range spans {
		require.LessOrEqual(t, sp.First, sp.Last, "span %d", i)
		require.True(t, sp.First >= 0 && sp.Last < n, "span %d %+v outside %d days", i, sp, n)
		if i > 0 {
			require.Greater(t, sp.First, spans[i-1].Last+1, "spans %d and %d touch: not merged", i-1, i)
		}
		for j := sp.First; j <= sp.Last; j++ {
			in[j] = true
		}
	}
	return in
}

// daysApart is the number of days from a to b (dates).
func daysApart(t *testing.T, a, b string) int {
	t.Helper()
	ta, err := time.Parse(time.DateOnly, a)
	require.NoError(t, err)
	tb, err := time.Parse(time.DateOnly, b)
	require.NoError(t, err)
	return int(math.Round(tb.Sub(ta).Hours() / 24))
}

// agreesWithSunEvents checks the short days against the engine's sunrise
// and sunset (sun.Events, zenith 90.833°): a day under 11.5 h from sunrise
// to sunset must be short and one over 12.5 h must not. The half-hour
// margin covers the refraction and semidiameter the shading leaves out;
// polar night is short and polar day is not. It returns how many polar
// nights and polar days it saw.
func agreesWithSunEvents(t *testing.T, days []plan.Day, short []bool, lat, lon float64, zone string) (nights, polarDays int) {
	t.Helper()
	loc, err := time.LoadLocation(zone)
	require.NoError(t, err)
	for i, d := range days {
		date, err := time.ParseInLocation(time.DateOnly, d.Date, loc)
		require.NoError(t, err)
		ev, err := sun.Events(date, lat, lon, loc)
		require.NoError(t, err)
		switch {
		case ev.Polar == sun.PolarNight:
			nights++
			assert.True(t, short[i], "%s: polar night, not shaded", d.Date)
		case ev.Polar == sun.PolarDay:
			polarDays++
			assert.False(t, short[i], "%s: polar day, shaded", d.Date)
		case ev.DayLengthH < 11.5:
			assert.True(t, short[i], "%s: %.2f h of day, not shaded", d.Date, ev.DayLengthH)
		case ev.DayLengthH > 12.5:
			assert.False(t, short[i], "%s: %.2f h of day, shaded", d.Date, ev.DayLengthH)
		}
	}
	return nights, polarDays
}

func TestShortDaysOslo(t *testing.T) {
	// 2027: short from 1 January to about the March equinox and from about
	// the September equinox to 31 December.
	days := daysFrom(t, "2027-01-01", 365)
	spans := report.ShortDaySpans(days, osloLat, osloLon)
	require.Len(t, spans, 2, "spans %+v", spans)
	assert.Equal(t, 0, spans[0].First)
	assert.Equal(t, len(days)-1, spans[1].Last)
	lastShort, firstShort := days[spans[0].Last].Date, days[spans[1].First].Date
	t.Logf("Oslo 2027: short to %s and from %s", lastShort, firstShort)
	assert.LessOrEqual(t, math.Abs(float64(daysApart(t, equinoxMarch2027, lastShort))), 2.0,
		"last short day %s, March equinox %s", lastShort, equinoxMarch2027)
	assert.LessOrEqual(t, math.Abs(float64(daysApart(t, equinoxSept2027, firstShort))), 2.0,
		"first short day %s, September equinox %s", firstShort, equinoxSept2027)
	agreesWithSunEvents(t, days, inSpans(t, len(days), spans), osloLat, osloLon, "Europe/Oslo")

	// Over two years the winter across the new year is one span.
	days = daysFrom(t, "2027-01-01", 731)
	spans = report.ShortDaySpans(days, osloLat, osloLon)
	require.Len(t, spans, 3, "spans %+v", spans)
	assert.Equal(t, "2027", days[spans[1].First].Date[:4])
	assert.Equal(t, "2028", days[spans[1].Last].Date[:4])
}

func TestShortDaysSydney(t *testing.T) {
	// The southern hemisphere: short from about the March equinox to about
	// the September one.
	days := daysFrom(t, "2027-01-01", 365)
	spans := report.ShortDaySpans(days, sydneyLat, sydneyLon)
	require.Len(t, spans, 1, "spans %+v", spans)
	firstShort, lastShort := days[spans[0].First].Date, days[spans[0].Last].Date
	t.Logf("Sydney 2027: short from %s to %s", firstShort, lastShort)
	assert.LessOrEqual(t, math.Abs(float64(daysApart(t, equinoxMarch2027, firstShort))), 2.0,
		"first short day %s, March equinox %s", firstShort, equinoxMarch2027)
	assert.LessOrEqual(t, math.Abs(float64(daysApart(t, equinoxSept2027, lastShort))), 2.0,
		"last short day %s, September equinox %s", lastShort, equinoxSept2027)
	agreesWithSunEvents(t, days, inSpans(t, len(days), spans), sydneyLat, sydneyLon, "Australia/Sydney")
}

func TestShortDaysPolar(t *testing.T) {
	// Longyearbyen: polar night counts as short, polar day does not.
	days := daysFrom(t, "2027-01-01", 365)
	spans := report.ShortDaySpans(days, longyearbyenLat, longyearbyenLon)
	nights, polarDays := agreesWithSunEvents(t, days, inSpans(t, len(days), spans), longyearbyenLat, longyearbyenLon, "Arctic/Longyearbyen")
	assert.Greater(t, nights, 60, "polar nights at 78° N")
	assert.Greater(t, polarDays, 100, "polar days at 78° N")
}

func TestShortDaysEquatorAndBadDates(t *testing.T) {
	// On the equator the day is 12 h all year: nothing is shorter.
	days := daysFrom(t, "2027-01-01", 365)
	assert.Empty(t, report.ShortDaySpans(days, equatorLat, equatorLon))

	// A date that does not parse ends a span and is in none.
	days = daysFrom(t, "2027-01-01", 20)
	days[5].Date = "someday"
	spans := report.ShortDaySpans(days, osloLat, osloLon)
	assert.Equal(t, []report.DaySpan{{0, 4}, {6, 19}}, spans)
}

func TestShadingFor(t *testing.T) {
	site := func(lat float64, placement, harvest string) scenario.Scenario {
		s := scenario.Demo()
		s.Site.LatDeg, s.Site.LonDeg, s.Site.Placement, s.Harvest.Kind = lat, 12.5, placement, harvest
		return s
	}
	for _, c := range []struct {
		name string
		s    scenario.Scenario
		want bool
	}{
		{"Oslo outdoors", site(osloLat, scenario.Outdoor, scenario.HarvestNone), true},
		{"Oslo indoors with a panel", site(osloLat, scenario.Indoor, scenario.HarvestPanel), true},
		{"Oslo in a cold room with a panel", site(osloLat, scenario.Fixed, scenario.HarvestPanel), true},
		{"Oslo indoors, no harvester", site(osloLat, scenario.Indoor, scenario.HarvestNone), false},
		{"Oslo indoors, indoor-light cell", site(osloLat, scenario.Indoor, scenario.HarvestIndoor), false},
		{"Sydney outdoors", site(sydneyLat, scenario.Outdoor, scenario.HarvestPanel), true},
		{"Longyearbyen outdoors", site(longyearbyenLat, scenario.Outdoor, scenario.HarvestNone), true},
		{"equator outdoors with a panel", site(equatorLat, scenario.Outdoor, scenario.HarvestPanel), false},
		{"10° N outdoors with a panel", site(tenNorthLat, scenario.Outdoor, scenario.HarvestPanel), false},
		{"just inside the tropic", site(-23.4, scenario.Outdoor, scenario.HarvestPanel), false},
		{"just outside the tropic", site(23.5, scenario.Outdoor, scenario.HarvestPanel), true},
	} {
		sh := report.ShadingFor(c.s)
		assert.Equal(t, c.want, sh.ShortDays, c.name)
		assert.Equal(t, c.s.Site.LatDeg, sh.LatDeg, c.name)
		assert.Equal(t, c.s.Site.LonDeg, sh.LonDeg, c.name)
	}
	assert.Equal(t, report.Shading{}, report.Shading{}, "the zero value")
	assert.False(t, report.Shading{}.ShortDays, "the zero value shades nothing")
}

func TestSpansX(t *testing.T) {
	// 10 days from 2027-01-01 on 0..100 px: 10 px a day, from midnight.
	days := daysFrom(t, "2027-01-01", 10)
	s := report.TimeScale{Start: time.Date(2027, 1, 1, 0, 0, 0, 0, time.UTC), End: time.Date(2027, 1, 11, 0, 0, 0, 0, time.UTC), X0: 0, X1: 100}
	got := report.SpansX(days, []report.DaySpan{{0, 1}, {4, 4}, {8, 9}}, s)
	want := []report.XSpan{{0, 20}, {40, 50}, {80, 100}}
	require.Len(t, got, len(want))
	for i := range want {
		assert.InDelta(t, want[i].X0, got[i].X0, 1e-9, "span %d", i)
		assert.InDelta(t, want[i].X1, got[i].X1, 1e-9, "span %d", i)
	}
	// Clipped to the axis; out of range and reversed spans are left out.
	s.Start, s.End = s.Start.AddDate(0, 0, 1), s.End.AddDate(0, 0, -1) // 2 to 9 January, 12.5 px a day
	got = report.SpansX(days, []report.DaySpan{{0, 1}, {0, 0}, {9, 9}, {3, 2}, {-1, 2}, {5, 12}}, s)
	require.Len(t, got, 1, "%+v", got)
	assert.InDelta(t, 0, got[0].X0, 1e-9)
	assert.InDelta(t, 12.5, got[0].X1, 1e-9)
}

func TestSVGShortDays(t *testing.T) {
	r := handMade() // 2027 and 2028
	oslo := report.Shading{ShortDays: true, LatDeg: osloLat, LonDeg: osloLon}
	f := report.Layout(r, report.SVGOptions{Shading: oslo})
	// Three winters: Jan–Mar 2027, Sep 2027–Mar 2028, Sep–Dec 2028.
	require.Len(t, f.ShortDays, 3)
	assert.InDelta(t, f.Plot.X, f.ShortDays[0].X0, 1e-9)
	assert.InDelta(t, f.Plot.Right(), f.ShortDays[2].X1, 1e-9)
	root := parseSVG(t, report.SVG(r, report.SVGOptions{Shading: oslo}))
	g := root.find("g", "short-days")
	require.Len(t, g, 1)
	rects := g[0].find("rect", "")
	require.Len(t, rects, 3)
	for i, rc := range rects {
		x, _ := strconv.ParseFloat(rc.attr("x"), 64)
		w, _ := strconv.ParseFloat(rc.attr("width"), 64)
		y, _ := strconv.ParseFloat(rc.attr("y"), 64)
		h, _ := strconv.ParseFloat(rc.attr("height"), 64)
		assert.InDelta(t, f.ShortDays[i].X0, x, 0.06, "rect %d", i)
		assert.InDelta(t, f.ShortDays[i].X1-f.ShortDays[i].X0, w, 0.11, "rect %d", i)
		assert.InDelta(t, f.Plot.Y, y, 0.06, "rect %d", i)
		assert.InDelta(t, f.Plot.H, h, 0.06, "rect %d", i)
	}
	assert.Contains(t, root.find("g", "legend")[0].text(), "days under 12 h")
	// Under the grid and the curves: the bands come first in the document.
	doc := string(report.SVG(r, report.SVGOptions{Shading: oslo}))
	assert.Less(t, strings.Index(doc, `class="short-days"`), strings.Index(doc, `class="grid"`))
	assert.Less(t, strings.Index(doc, `class="short-days"`), strings.Index(doc, `class="soc-band"`))

	// Not asked for, or on the equator: no bands and no legend entry.
	for name, o := range map[string]report.SVGOptions{
		"zero":    {},
		"equator": {Shading: report.Shading{ShortDays: true, LatDeg: equatorLat, LonDeg: equatorLon}},
	} {
		root := parseSVG(t, report.SVG(r, o))
		assert.Empty(t, root.find("g", "short-days"), name)
		assert.NotContains(t, root.find("g", "legend")[0].text(), "days under 12 h", name)
		assert.Empty(t, report.Layout(r, o).ShortDays, name)
	}
}

func TestShortDaysEveryDayOverDecades(t *testing.T) {
	// ShortDaySpans skips the ephemeris where the declination's sign cannot
	// change; against the sign worked out on every day (δ at local mean
	// noon, as its doc says) it must agree, over 25 years, at sites east and
	// west, and on dates that jump about rather than follow one another.
	days := daysFrom(t, "2026-12-25", 25*366)
	jumpy := make([]plan.Day, 0, 400)
	for i := 0; i < len(days); i += 1 + (i*7919)%23 { // uneven steps
		jumpy = append(jumpy, days[i])
	}
	for i := 0; i+1 < len(jumpy); i += 3 { // and out of order
		jumpy[i], jumpy[i+1] = jumpy[i+1], jumpy[i]
	}
	for _, site := range [][2]float64{{osloLat, osloLon}, {sydneyLat, sydneyLon}, {longyearbyenLat, longyearbyenLon}, {45, -179.9}, {-60, 179.9}} {
		for name, ds := range map[string][]plan.Day{"daily": days, "jumpy": jumpy} {
			short := inSpans(t, len(ds), report.ShortDaySpans(ds, site[0], site[1]))
			for i, d := range ds {
				date, err := time.Parse(time.DateOnly, d.Date)
				require.NoError(t, err)
				noon := date.Add(12*time.Hour - time.Duration(site[1]/15*float64(time.Hour)))
				want := site[0]*sun.EphemerisAt(noon).DeclinationDeg < 0
				if short[i] != want {
					t.Errorf("%v, %s: %s shaded %v, want %v", site, name, d.Date, short[i], want)
				}
			}
		}
	}
}
