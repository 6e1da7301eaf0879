package sun_test

import (
	"errors"
	"math"
	"math/rand/v2"
	"testing"
	"time"
	_ "time/tzdata" // America/Denver for the DST case, also under js/wasm

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/sun"
)

func TestEventsSPAExample(t *testing.T) {
	// Reda & Andreas (2004), Table A5.1 [SRC]: transit 11:46:04.97, sunrise
	// 06:12:43.46 LST. REFERENCE-VALUES §1a gives the NOAA-port tolerances:
	// transit 2 s, sunrise 60 s.
	day, err := sun.Events(spaTime, spaLat, spaLon, mst)
	require.NoError(t, err)
	assert.Equal(t, time.Date(2003, 10, 17, 0, 0, 0, 0, mst), day.Date)
	assert.Equal(t, sun.NotPolar, day.Polar)
	cases := []struct {
		name           string
		got, want, tol float64 // seconds since local midnight
	}{
		{"transit vs SPA", clock(day.SolarNoon, mst), hms(11, 46, 4.97), 2},
		{"sunrise vs SPA", clock(day.Sunrise, mst), hms(6, 12, 43.46), 60},
		// An independent NOAA-equation port iterated to the event time
		// [CALC, REFERENCE-VALUES §1a]: sunrise 06:12:43.40, the 17 Oct
		// sunset 17:18:50.8. 1 s covers different stopping rules.
		{"sunrise vs iterated NOAA port", clock(day.Sunrise, mst), hms(6, 12, 43.40), 1},
		{"sunset vs iterated NOAA port", clock(day.Sunset, mst), hms(17, 18, 50.8), 1},
	}
	for _, c := range cases {
		assert.Truef(t, withinAbsOrRel(c.got, c.want, c.tol, 0), "Events(SPA) %s = %.2f s, want %.2f (tol %g s)", c.name, c.got, c.want, c.tol)
	}
	// Pitfall §9.1: SPA's published sunset, 00:20:19.19 UT = 17:20:19.19
	// LST, is the evening of 16 Oct local time. The 17 Oct sunset must not
	// be that (it is about 88 s earlier).
	assert.Greater(t, math.Abs(clock(day.Sunset, mst)-hms(17, 20, 19.19)), 60.0,
		"17 Oct sunset must not equal SPA's 17:20:19, which is 16 Oct's")
	prev, err := sun.Events(spaTime.AddDate(0, 0, -1), spaLat, spaLon, mst)
	require.NoError(t, err)
	// 16 Oct sunset: SPA 17:20:19.19 [SRC] (60 s NOAA tolerance) and the
	// iterated NOAA port 17:20:18.4 [CALC] (1 s).
	assert.InDelta(t, hms(17, 20, 19.19), clock(prev.Sunset, mst), 60)
	assert.InDelta(t, hms(17, 20, 18.4), clock(prev.Sunset, mst), 1)
}

// noaaSinglePass is the NOAA spreadsheet's non-iterated noon, sunrise and
// sunset for the date of at, with the declination and equation of time
// evaluated at the instant at (REFERENCE-VALUES §1c):
//
//	noon = 720 − 4·lon − EoT + 60·TZ min;  rise/set = noon ∓ 4·HA_sunrise
func noaaSinglePass(at time.Time, lat, lon, tzHours float64) (noon, rise, set float64) {
	p := sun.At(at, lat, lon)
	ha, _ := sun.HourAngleAtZenithDeg(lat, p.DeclinationDeg, sun.SunriseZenithDeg)
	noonMin := 720 - 4*lon - p.EquationOfTimeMin + 60*tzHours
	return noonMin * 60, (noonMin - 4*ha) * 60, (noonMin + 4*ha) * 60
}

func TestNOAASinglePassEvents(t *testing.T) {
	// REFERENCE-VALUES §1c [CALC], the NOAA spreadsheet's own (non-iterated)
	// times. They check HourAngleAtZenithDeg and the equation of time
	// against the spreadsheet; Events, which iterates, must stay within
	// NOAA's stated minute of them.
	mdt := time.FixedZone("UTC-6", -6*3600)
	cases := []struct {
		name                 string
		at                   time.Time
		lat, lon, tz         float64
		loc                  *time.Location
		noon, rise, set, tol float64
	}{
		// SPA case evaluated at 12:30:30: 11:46:04.07, 06:12:59.9, 17:19:08.3
		// (printed to 0.1 s; tolerance 0.1 s).
		{"SPA case", spaTime, spaLat, spaLon, -7, mst, hms(11, 46, 4.07), hms(6, 12, 59.9), hms(17, 19, 8.3), 0.1},
		// Spreadsheet-default-style case, 2010-06-21 12:00 at UTC−6:
		// 13:01:49, 05:31:22, 20:32:15 (printed to 1 s; tolerance 1 s).
		{"2010-06-21", time.Date(2010, 6, 21, 12, 0, 0, 0, mdt), 40, -105, -6, mdt, hms(13, 1, 49), hms(5, 31, 22), hms(20, 32, 15), 1},
	}
	for _, c := range cases {
		noon, rise, set := noaaSinglePass(c.at, c.lat, c.lon, c.tz)
		assert.InDeltaf(t, c.noon, noon, c.tol, "%s single-pass noon", c.name)
		assert.InDeltaf(t, c.rise, rise, c.tol, "%s single-pass sunrise", c.name)
		assert.InDeltaf(t, c.set, set, c.tol, "%s single-pass sunset", c.name)

		day, err := sun.Events(c.at, c.lat, c.lon, c.loc)
		require.NoError(t, err)
		// NOAA: sunrise/sunset "accurate to within a minute" for |lat| < 72°
		// [SRC]; iterating moves them by less than that.
		assert.InDeltaf(t, c.noon, clock(day.SolarNoon, c.loc), 60, "%s iterated noon", c.name)
		assert.InDeltaf(t, c.rise, clock(day.Sunrise, c.loc), 60, "%s iterated sunrise", c.name)
		assert.InDeltaf(t, c.set, clock(day.Sunset, c.loc), 60, "%s iterated sunset", c.name)
	}
}

func TestSunsetHourAngleDuffieBeckman(t *testing.T) {
	// D&B Example 1.6.3: φ = 43°, 16 Mar (n = 75): ωs = 87.8°, sunrise 6:09
	// solar time, day length 11.70 h (book [SRC2]; [CALC] 87.74°, 06:09.0,
	// 11.70 h). Tolerance 0.06° (half a printed unit plus 0.01°) and 1 min.
	ws, polar := sun.HourAngleAtZenithDeg(43, sun.DeclinationCooperDeg(75), 90)
	assert.Equal(t, sun.NotPolar, polar)
	assert.InDelta(t, 87.8, ws, 0.06, "ωs")
	sunriseSolarMin := (12 - ws/15) * 60
	assert.InDelta(t, 6*60+9, sunriseSolarMin, 1, "sunrise, solar time")
	assert.InDelta(t, 11.70, 2*ws/15, 0.006, "day length N = (2/15)ωs")

	// Day lengths with Cooper's δ and no refraction, REFERENCE-VALUES §1d
	// [CALC]: N = (2/15) acos(−tan φ tan δ). Tolerance 1e-3 h (printed
	// digits).
	for _, c := range []struct {
		lat          float64
		jun21, dec21 float64
	}{
		{40, 14.846, 9.154}, {43, 15.181, 8.819}, {60, 18.494, 5.506},
	} {
		wJun, _ := sun.HourAngleAtZenithDeg(c.lat, sun.DeclinationCooperDeg(172), 90)
		wDec, _ := sun.HourAngleAtZenithDeg(c.lat, sun.DeclinationCooperDeg(355), 90)
		assert.InDeltaf(t, c.jun21, 2*wJun/15, 1e-3, "day length at %g° on 21 Jun", c.lat)
		assert.InDeltaf(t, c.dec21, 2*wDec/15, 1e-3, "day length at %g° on 21 Dec", c.lat)
	}
}

func TestEventsPolar(t *testing.T) {
	// 78° N (Svalbard) has the midnight Sun in June and polar night in
	// December: the 90.833° circle needs |δ| > 90 − 78 − 0.833 = 11.17°,
	// which |δ| ≈ 23.4° at the solstices exceeds. Mirror at 78° S, and the
	// poles themselves.
	cet := time.FixedZone("UTC+1", 3600)
	jun := time.Date(2024, 6, 21, 0, 0, 0, 0, time.UTC)
	dec := time.Date(2024, 12, 21, 0, 0, 0, 0, time.UTC)
	cases := []struct {
		lat, lon float64
		date     time.Time
		want     sun.Polar
	}{
		{78.22, 15.65, jun, sun.PolarDay}, {78.22, 15.65, dec, sun.PolarNight},
		{-78, 166.7, jun, sun.PolarNight}, {-78, 166.7, dec, sun.PolarDay},
		{90, 0, jun, sun.PolarDay}, {90, 0, dec, sun.PolarNight},
		{-90, 0, jun, sun.PolarNight}, {-90, 0, dec, sun.PolarDay},
	}
	for _, c := range cases {
		day, err := sun.Events(c.date, c.lat, c.lon, cet)
		require.NoError(t, err)
		assert.Equalf(t, c.want, day.Polar, "Events(%v, %g).Polar", c.date, c.lat)
		assert.Truef(t, day.Sunrise.IsZero() && day.Sunset.IsZero(), "polar day at %g has rise/set %v/%v", c.lat, day.Sunrise, day.Sunset)
		want := 0.0
		if c.want == sun.PolarDay {
			want = 24
		}
		assert.Equal(t, want, day.DayLengthH)
		assert.False(t, day.SolarNoon.IsZero(), "solar noon is still defined")
	}
	// At 78° N the Sun sets again by mid-September (|δ| < 11.17° after
	// about 24 Aug [CALC from the NOAA declination]).
	day, err := sun.Events(time.Date(2024, 9, 15, 0, 0, 0, 0, time.UTC), 78.22, 15.65, cet)
	require.NoError(t, err)
	assert.Equal(t, sun.NotPolar, day.Polar)
	assert.True(t, day.DayLengthH > 0 && day.DayLengthH < 24)
}

func TestEventsEquinoxEquatorLeapDayDST(t *testing.T) {
	// Equator at the March equinox: ω = acos(cos 90.833°/cos δ) ≈ 90.833°,
	// so the day is 2 × 90.833/15 = 12.111 h [CALC by hand]; 0.005 h
	// covers δ ≤ 0.4° that day.
	day, err := sun.Events(time.Date(2024, 3, 20, 12, 0, 0, 0, time.UTC), 0, 0, time.UTC)
	require.NoError(t, err)
	assert.InDelta(t, 2*90.833/15, day.DayLengthH, 0.005)

	// Leap day: the date is kept, and in late February at 40° N the
	// sunrise gets earlier every day, so 29 Feb falls between 28 Feb and
	// 1 Mar (monotonic; no formula needed).
	loc := time.FixedZone("MST", -7*3600)
	var rises [3]float64
	for i, d := range []int{28, 29, 30} { // 30 Feb normalises to 1 Mar
		day, err := sun.Events(time.Date(2024, 2, d, 0, 0, 0, 0, loc), 39.742, -105.179, loc)
		require.NoError(t, err)
		rises[i] = clock(day.Sunrise, loc)
		if d == 29 {
			assert.Equal(t, time.Date(2024, 2, 29, 0, 0, 0, 0, loc), day.Date)
		}
	}
	assert.True(t, rises[0] > rises[1] && rises[1] > rises[2], "sunrises %v", rises)

	// DST: on 10 Mar 2024 Denver's clocks jump at 02:00. The events are
	// instants, so the day length changes smoothly (about +2.2 min/day at
	// 40° N in March [CALC]) while the clock sunrise moves an hour later.
	den, err := time.LoadLocation("America/Denver")
	require.NoError(t, err)
	before, err := sun.Events(time.Date(2024, 3, 9, 0, 0, 0, 0, den), 39.742, -105.179, den)
	require.NoError(t, err)
	after, err := sun.Events(time.Date(2024, 3, 10, 0, 0, 0, 0, den), 39.742, -105.179, den)
	require.NoError(t, err)
	assert.Equal(t, time.Date(2024, 3, 10, 0, 0, 0, 0, den), after.Date)
	assert.InDelta(t, 2.2/60, after.DayLengthH-before.DayLengthH, 1.0/60)
	shift := clock(after.Sunrise, den) - clock(before.Sunrise, den)
	assert.True(t, shift > 55*60 && shift < 60*60, "clock sunrise shift %v s", shift)
}

func TestEventsInvalid(t *testing.T) {
	at := time.Date(2024, 6, 21, 0, 0, 0, 0, time.UTC)
	for _, c := range []struct {
		lat, lon float64
		name     string
	}{
		{math.NaN(), 0, "latitude"}, {math.Inf(1), 0, "latitude"}, {-90.5, 0, "latitude"},
		{0, math.NaN(), "longitude"}, {0, math.Inf(-1), "longitude"}, {0, 180.5, "longitude"},
	} {
		day, err := sun.Events(at, c.lat, c.lon, time.UTC)
		require.Errorf(t, err, "Events(lat %g, lon %g)", c.lat, c.lon)
		assert.True(t, errors.Is(err, sun.ErrCoordinate))
		var ce *sun.CoordinateError
		require.True(t, errors.As(err, &ce))
		assert.Equal(t, c.name, ce.Name)
		assert.Equal(t, sun.Day{}, day)
	}
	assert.PanicsWithValue(t, "sun: nil location", func() { _, _ = sun.Events(at, 0, 0, nil) })
	ws, polar := sun.HourAngleAtZenithDeg(math.NaN(), 0, 90)
	assert.True(t, math.IsNaN(ws))
	assert.Equal(t, sun.NotPolar, polar)
}

func TestEventsProperties(t *testing.T) {
	// Random dates 1901–2099 and sites, fixed seed, zone UTC+round(lon/15).
	rng := rand.New(rand.NewPCG(17, 10))
	for range 3000 {
		lat := rng.Float64()*180 - 90
		lon := rng.Float64()*360 - 180
		loc := time.FixedZone("", int(math.Round(lon/15))*3600)
		date := time.Date(1901+rng.IntN(199), time.January, 1+rng.IntN(365), rng.IntN(24), 0, 0, 0, loc)
		day, err := sun.Events(date, lat, lon, loc)
		require.NoError(t, err)
		y, m, d := date.Date()
		require.Equal(t, time.Date(y, m, d, 0, 0, 0, 0, loc), day.Date)
		// Solar noon: the hour angle is 0 there (to the 1 ms stopping rule).
		assert.InDeltaf(t, 0, sun.At(day.SolarNoon, lat, lon).HourAngleDeg, 1e-4, "HA at noon, %v %g %g", date, lat, lon)
		switch day.Polar {
		case sun.PolarDay:
			assert.Equal(t, 24.0, day.DayLengthH)
			assert.True(t, day.Sunrise.IsZero() && day.Sunset.IsZero())
			// The Sun is above the 90.833° circle at noon and midnight.
			assert.Less(t, sun.At(day.SolarNoon.Add(12*time.Hour), lat, lon).ZenithDeg, sun.SunriseZenithDeg+0.5)
		case sun.PolarNight:
			assert.Equal(t, 0.0, day.DayLengthH)
			assert.True(t, day.Sunrise.IsZero() && day.Sunset.IsZero())
			assert.Greater(t, sun.At(day.SolarNoon, lat, lon).ZenithDeg, sun.SunriseZenithDeg-0.5)
		default:
			assert.True(t, day.Sunrise.Before(day.SolarNoon) || day.Sunrise.Equal(day.SolarNoon))
			assert.True(t, day.SolarNoon.Before(day.Sunset) || day.SolarNoon.Equal(day.Sunset))
			assert.True(t, day.DayLengthH >= 0 && day.DayLengthH <= 24, "day length %g", day.DayLengthH)
			if math.Abs(lat) < 65 {
				// Iterated to the event: the geometric zenith there is
				// 90.833° (1e-4° is 1 ms of hour angle and then some).
				for _, ev := range []time.Time{day.Sunrise, day.Sunset} {
					z := sun.At(ev, lat, lon).ZenithDeg
					assert.InDeltaf(t, sun.SunriseZenithDeg, z, 1e-4, "zenith at event %v, lat %g lon %g", ev, lat, lon)
				}
			}
		}
		if t.Failed() {
			t.Fatalf("Events(%v, %g, %g) = %+v", date, lat, lon, day)
		}
	}
}
