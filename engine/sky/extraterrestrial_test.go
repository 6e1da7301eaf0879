package sky_test

import (
	"math"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/sky"
	"nodelife/engine/sun"
)

func TestNormalIrradiance(t *testing.T) {
	// Gsc/R² at 1 AU is the solar constant.
	assert.Equal(t, sky.SolarConstantWm2, sky.NormalWm2(1, sky.SolarConstantWm2))
	// D&B eq. 1.4.1a with Gsc 1367, REFERENCE-VALUES §1d [CALC]:
	// n = 1 → 1412.10, n = 3 → 1412.05, n = 172 → 1322.62 W/m² (printed to
	// 0.01; tolerance 0.005).
	for _, c := range []struct {
		n    int
		want float64
	}{{1, 1412.10}, {3, 1412.05}, {172, 1322.62}} {
		got := sky.SolarConstantWRCWm2 * sky.CooperFactor(c.n)
		assert.Truef(t, withinAbsOrRel(got, c.want, 0.005, 0), "1367·CooperFactor(%d) = %.3f, want %.2f", c.n, got, c.want)
	}
	// Spencer's series with pvlib's default solar constant 1366.1 on
	// 2016-10-26 (day 300): 1383.636203 W/m² [SRC2: pvlib
	// test_get_extra_radiation]. Same formula, so 1e-6 relative.
	got := 1366.1 * sky.SpencerFactor(300)
	assert.Truef(t, withinAbsOrRel(got, 1383.636203, 0, 1e-6), "1366.1·SpencerFactor(300) = %.6f", got)
	// The engine's factor is 1/R² from the NOAA distance; Spencer's series
	// approximates it to better than 0.1 % (max 0.092 % found over
	// 1991–2005 daily; the bound used for the TMY3 check below).
	for d := range 366 {
		at := time.Date(2024, 1, 1, 19, 0, 0, 0, time.UTC).AddDate(0, 0, d)
		p := sun.At(at, 0, 0)
		ratio := sky.SpencerFactor(at.YearDay()) * p.DistanceAU * p.DistanceAU
		assert.InDeltaf(t, 1, ratio, 0.001, "Spencer vs 1/R² on %v", at)
	}
}

func TestDuffieBeckmanExtraterrestrial(t *testing.T) {
	// D&B Example 1.10.1: φ = 43°, 15 Apr (n = 105): H0 = 33.8 MJ/m²
	// [SRC2: SOILWAT2 test quoting the book]; [CALC] 33.77 with Gsc 1367,
	// 33.63 with 1361 (REFERENCE-VALUES §1d). The book uses Cooper's δ and
	// eccentricity factor and 1367 W/m². Tolerance 0.05 MJ/m².
	decl := sun.DeclinationCooperDeg(105)
	h0 := mj(sky.DailyHorizontalWhm2(43, decl, sky.SolarConstantWRCWm2*sky.CooperFactor(105)))
	assert.Truef(t, withinAbsOrRel(h0, 33.8, 0.05, 0), "D&B 1.10.1 H0 = %.3f MJ/m², want 33.8 (tol 0.05)", h0)
	h0 = mj(sky.DailyHorizontalWhm2(43, decl, sky.SolarConstantWm2*sky.CooperFactor(105)))
	assert.Truef(t, withinAbsOrRel(h0, 33.63, 0.005, 0), "H0 with 1361 = %.3f MJ/m², want 33.63 [CALC]", h0)

	// D&B Example 1.10.2: same day, 10–11 h solar time (ω −30° to −15°):
	// I0 = 3.79 MJ/m² (book, from memory; [CALC] 3.790 with 1367, 3.774
	// with 1361). Tolerance 0.01 MJ/m².
	i0 := mj(sky.IntervalHorizontalWhm2(43, decl, sky.SolarConstantWRCWm2*sky.CooperFactor(105), -30, -15))
	assert.Truef(t, withinAbsOrRel(i0, 3.79, 0.01, 0), "D&B 1.10.2 I0 = %.4f MJ/m², want 3.79 (tol 0.01)", i0)
	i0 = mj(sky.IntervalHorizontalWhm2(43, decl, sky.SolarConstantWm2*sky.CooperFactor(105), -30, -15))
	assert.Truef(t, withinAbsOrRel(i0, 3.774, 0.001, 0), "I0 with 1361 = %.4f MJ/m², want 3.774 [CALC]", i0)
}

func TestIntervalClipping(t *testing.T) {
	const lat, decl, gon = 43.0, 9.4, 1361.0
	daily := sky.DailyHorizontalWhm2(lat, decl, gon)
	ws, _ := sun.HourAngleAtZenithDeg(lat, decl, 90)
	cases := []struct {
		name   string
		w1, w2 float64
		want   float64
	}{
		{"whole day", -180, 180, daily},
		{"two days across midnight", -180, 540, 2 * daily},
		{"night only", ws + 1, 360 - ws - 1, 0},
		{"across sunset", 60, 150, sky.IntervalHorizontalWhm2(lat, decl, gon, 60, ws)},
		{"across sunrise", -150, -60, sky.IntervalHorizontalWhm2(lat, decl, gon, -ws, -60)},
		{"empty", 10, 10, 0},
		{"reversed", 20, 10, 0},
	}
	for _, c := range cases {
		got := sky.IntervalHorizontalWhm2(lat, decl, gon, c.w1, c.w2)
		assert.Truef(t, withinAbsOrRel(got, c.want, 1e-9, 1e-12), "%s: IntervalHorizontalWhm2(%g, %g) = %.6f, want %.6f", c.name, c.w1, c.w2, got, c.want)
	}
	// Polar day at 80° N with δ = 23°: H0 = 24·Gon·sin φ sin δ (D&B eq.
	// 1.10.3 with ωs = 180°); polar night at 80° S: 0.
	assert.InDelta(t, 24*gon*math.Sin(80*math.Pi/180)*math.Sin(23*math.Pi/180), sky.DailyHorizontalWhm2(80, 23, gon), 1e-9)
	assert.Equal(t, 0.0, sky.DailyHorizontalWhm2(-80, 23, gon))
	// Bad inputs give NaN, never a number.
	for _, v := range []float64{
		sky.DailyHorizontalWhm2(math.NaN(), 0, gon), sky.DailyHorizontalWhm2(91, 0, gon),
		sky.IntervalHorizontalWhm2(0, 0, gon, math.NaN(), 1), sky.IntervalHorizontalWhm2(0, 0, gon, 0, math.Inf(1)),
		sky.DailyExtraterrestrialWhm2(time.Unix(0, 0), math.NaN(), 1361),
		sky.IntervalExtraterrestrialWhm2(time.Unix(0, 0), time.Unix(3600, 0), 0, math.Inf(1), 1361),
	} {
		assert.True(t, math.IsNaN(v), "got %g, want NaN", v)
	}
}

func TestExtraterrestrialTimeBased(t *testing.T) {
	// 24 hourly intervals add up to the day's D&B eq. 1.10.3, which holds
	// δ at its noon value. δ drifts at most 0.2° in half a day, which at
	// 40° N near an equinox moves H0 by under 0.5 % [CALC: ∂H0/∂δ ≈
	// (π/2) sin φ / cos φ per radian at δ = 0], and the morning and evening
	// errors mostly cancel: tolerance 0.5 %.
	loc := time.FixedZone("MST", -7*3600)
	for _, date := range []time.Time{
		time.Date(2025, 3, 20, 0, 0, 0, 0, loc), time.Date(2025, 6, 21, 0, 0, 0, 0, loc),
		time.Date(2024, 2, 29, 0, 0, 0, 0, loc), time.Date(2025, 12, 21, 0, 0, 0, 0, loc),
	} {
		sum := 0.0
		for h := range 24 {
			start := date.Add(time.Duration(h) * time.Hour)
			sum += sky.IntervalExtraterrestrialWhm2(start, start.Add(time.Hour), 39.742, -105.179, sky.SolarConstantWm2)
		}
		day, err := sun.Events(date, 39.742, -105.179, loc)
		assert.NoError(t, err)
		daily := sky.DailyExtraterrestrialWhm2(day.SolarNoon, 39.742, sky.SolarConstantWm2)
		assert.InDeltaf(t, 1, sum/daily, 0.005, "%v: Σ hourly %.1f vs daily %.1f Wh/m²", date, sum, daily)
	}
}
