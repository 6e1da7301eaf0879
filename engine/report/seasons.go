package report

import (
	"math"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
	"nodelife/engine/sun"
)

// Season shading: over a horizon of years at a column or so a day, night
// cannot be seen, so the charts shade the dark half of the year instead, the
// days shorter than 12 hours, as faint bands behind the state of charge.

// tropicDeg is the latitude of the tropics: the obliquity of the ecliptic,
// 23°26′21″ ≈ 23.44° at J2000.0 (Meeus, Astronomical Algorithms, 2nd ed.,
// eq. 22.2; the ε0 term of NOAA's solar equations, as in sun.EphemerisAt).
// It drifts by under 0.01° a century, far below what the rule needs.
const tropicDeg = 23.44

// Shading says whether to shade the days under 12 h behind the plot, and
// where the site is. The zero value shades nothing.
type Shading struct {
	ShortDays      bool    // shade the days under 12 h (see ShortDaySpans)
	LatDeg, LonDeg float64 // the site: degrees north and east
}

// ShadingFor is the shading of a scenario's charts. The rule: shade when
// the site is outside the tropics (|latitude| > 23.44°, the obliquity of the
// ecliptic, see tropicDeg) and the node meets the outdoor seasons, that is
// it is placed outdoors or it harvests with a solar panel (which is
// outdoors wherever the node is).
//
// Within the tropics the day stays within about 1.5 h of 12 h all year
// (the day-length formula of ShortDaySpans at φ = 23.44° and δ = ±23.44°
// gives 10.6 h and 13.4 h), so the bands would mark a difference the node
// hardly feels. An indoor or
// fixed-temperature node with no harvester or an indoor-light cell runs on
// lights and a heated or held room: the seasons outdoors do not bear on its
// energy or temperature, and bands would suggest they do.
func ShadingFor(s scenario.Scenario) Shading {
	lat := s.Site.LatDeg
	outdoors := s.Site.Placement == scenario.Outdoor || s.Harvest.Kind == scenario.HarvestPanel
	return Shading{
		ShortDays: math.Abs(lat) > tropicDeg && math.Abs(lat) <= 90 && outdoors,
		LatDeg:    lat,
		LonDeg:    s.Site.LonDeg,
	}
}

// DaySpan is a run of consecutive plan days, by index into the daily rows:
// First to Last, both included.
type DaySpan struct{ First, Last int }

// ShortDaySpans returns the runs of days whose day at latDeg, lonDeg is
// shorter than 12 hours, as index ranges into days. A day whose date does
// not parse (time.DateOnly) ends a run and is in none.
//
// The day is the time the Sun's centre is above the geometric horizon. Its
// length in hours is N = 2ω₀/15 with the sunset hour angle
//
//	cos ω₀ = −tan φ tan δ
//
// (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013,
// eqs. 1.6.10 and 1.6.11; sun.HourAngleAtZenithDeg at a zenith of 90°), so
// N < 12 h exactly when ω₀ < 90°, that is when φ and δ have opposite signs:
// the hemisphere's winter half, from equinox to equinox. That sign test is
// what is computed, so a site on the equator, where N is 12 h all year, has
// no short day, and rounding cannot make one. Polar night (the Sun never
// up) counts as short and polar day as not, as the formula's limits do.
//
// δ is the Sun's declination from NOAA's solar equations (sun.EphemerisAt)
// at the date's local mean noon, 12:00 UTC − lonDeg/15 h; the declination
// moves at most about 0.4° a day (maxDeclinationRate), so a few hours either way cannot move a day
// across the equinox except on the equinox day itself.
//
// Sunrise to sunset as NOAA reckons it (zenith 90.833°, for refraction and
// the Sun's semidiameter) is some minutes longer, so that day passes 12 h a
// few days before the spring equinox and falls under it a few days after the
// autumn one (sun.Events for 2027 at 59.91° N: on 18 March and 26 September,
// against equinoxes on 20 March and 23 September). The bands mark the
// astronomical half year, which begins and ends alike at every latitude.
func ShortDaySpans(days []plan.Day, latDeg, lonDeg float64) []DaySpan {
	var spans []DaySpan
	open := false
	// The sign of δ holds for |δ|/maxDeclinationRate days either side of
	// where it was last computed, so most days need no ephemeris.
	var known time.Time
	var knownDecl, holdsH float64
	for i, d := range days {
		t, err := time.Parse(time.DateOnly, d.Date)
		short := false
		if err == nil {
			noon := meanNoon(t, lonDeg)
			if known.IsZero() || math.Abs(noon.Sub(known).Hours()) >= holdsH {
				known, knownDecl = noon, sun.EphemerisAt(noon).DeclinationDeg
				holdsH = math.Abs(knownDecl) / maxDeclinationRate * 24
			}
			short = latDeg*knownDecl < 0
		}
		switch {
		case short && open:
			spans[len(spans)-1].Last = i
		case short:
			spans = append(spans, DaySpan{First: i, Last: i})
		}
		open = short
	}
	return spans
}

// maxDeclinationRate bounds how fast the Sun's declination changes, degrees
// a day. From sin δ = sin ε sin λ (Meeus, Astronomical Algorithms, 2nd ed.,
// eq. 25.7, as in sun.EphemerisAt), dδ/dλ = sin ε cos λ / cos δ ≤ sin ε,
// largest at the equinoxes; with the Sun's fastest motion in longitude,
// about 1.02° a day at perihelion (from memory), δ moves at most 0.398 ×
// 1.02 ≈ 0.41° a day. 0.5 leaves a margin.
const maxDeclinationRate = 0.5

// meanNoon is local mean noon, 12:00 UTC − lonDeg/15 h, of the calendar
// date of day (read in UTC).
func meanNoon(day time.Time, lonDeg float64) time.Time {
	y, m, d := day.Date()
	return time.Date(y, m, d, 12, 0, 0, 0, time.UTC).Add(time.Duration(-lonDeg / 15 * float64(time.Hour)))
}

// XSpan is a stretch of the x axis, X0 ≤ X1.
type XSpan struct{ X0, X1 float64 }

// SpansX places runs of days on s: each from the start (midnight) of its
// first day to the end of its last, clipped to X0..X1; runs wholly outside
// are left out. Both charts draw their bands with it.
func SpansX(days []plan.Day, spans []DaySpan, s TimeScale) []XSpan {
	lo, hi := min(s.X0, s.X1), max(s.X0, s.X1)
	var out []XSpan
	for _, sp := range spans {
		if sp.First < 0 || sp.Last >= len(days) || sp.First > sp.Last {
			continue
		}
		t0, err0 := time.ParseInLocation(time.DateOnly, days[sp.First].Date, s.Start.Location())
		t1, err1 := time.ParseInLocation(time.DateOnly, days[sp.Last].Date, s.Start.Location())
		if err0 != nil || err1 != nil {
			continue
		}
		x0 := max(s.X(t0), lo)
		x1 := min(s.X(t1.AddDate(0, 0, 1)), hi)
		if x1 > x0 {
			out = append(out, XSpan{x0, x1})
		}
	}
	return out
}
