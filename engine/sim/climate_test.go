package sim

import (
	"math"
	"os"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/cell"
	"nodelife/engine/climate"
	"nodelife/engine/scenario"
	"nodelife/engine/weather"
)

// TestMonthlyNormalsReproduceGolden feeds the climate model the monthly mean
// daily minimum and maximum of the Golden, Colorado TMY3 file
// (../weather/testdata/SOURCE.md) and checks that the model's monthly mean
// temperature stays within 1.5 °C of the file's own (the bound; the
// Parton & Logan curve is not symmetric, so the mean of a day is not
// (min + max)/2).
func TestMonthlyNormalsReproduceGolden(t *testing.T) {
	f, err := os.Open("../weather/testdata/nsrdb-tmy3-724666-golden-co.csv")
	require.NoError(t, err)
	defer f.Close()
	w, err := weather.ReadTMY3("golden.csv", f)
	require.NoError(t, err)

	// The file's days (local standard time, hour-ending rows 1:00 … 24:00).
	type agg struct{ minSum, maxSum, tempSum, days, hours float64 }
	var months [12]agg
	var dayMin, dayMax float64
	for i, r := range w.Records {
		m := r.End.Add(-time.Minute).Month() - 1
		if i%24 == 0 {
			dayMin, dayMax = math.Inf(1), math.Inf(-1)
		}
		dayMin, dayMax = min(dayMin, r.TempC), max(dayMax, r.TempC)
		months[m].tempSum += r.TempC
		months[m].hours++
		if i%24 == 23 {
			months[m].minSum += dayMin
			months[m].maxSum += dayMax
			months[m].days++
		}
	}
	var model climate.Monthly
	model.LatDeg = w.Site.LatDeg
	for m := range months {
		model.TminC[m] = months[m].minSum / months[m].days
		model.TmaxC[m] = months[m].maxSum / months[m].days
	}
	// The model's monthly means, hour by hour over a non-leap year.
	var sums, counts [12]float64
	for d := 1; d <= 365; d++ {
		m := time.Date(2027, 1, d, 0, 0, 0, 0, time.UTC).Month() - 1
		for h := 0.5; h < 24; h++ {
			sums[m] += model.TempC(float64(d)+h/24, h)
			counts[m]++
		}
	}
	for m := range months {
		file := months[m].tempSum / months[m].hours
		got := sums[m] / counts[m]
		assert.InDeltaf(t, file, got, 1.5, "%s: model %.2f °C, file %.2f °C", time.Month(m+1), got, file)
	}
}

func TestPresetDrivesTheOutdoorYear(t *testing.T) {
	s := scenario.Demo()
	s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "cold-continental"
	s.Site.Enclosure.Absorptance = 0
	y := mustYear(s)
	p, _ := climate.LookupPreset("cold-continental")
	monthMean := func(m time.Month) (lo, hi float64) {
		lo, hi = math.Inf(1), math.Inf(-1)
		for d := row(m, 10); d < row(m, 20); d++ {
			for k := 0; k < y.PerDay; k++ {
				lo, hi = min(lo, y.TempC[d*y.PerDay+k]), max(hi, y.TempC[d*y.PerDay+k])
			}
		}
		return lo, hi
	}
	lo, hi := monthMean(time.January)
	assert.InDelta(t, p.TminC[0], lo, 1.5, "January minimum")
	assert.InDelta(t, p.TmaxC[0], hi, 1.5, "January maximum")
	lo, hi = monthMean(time.July)
	assert.InDelta(t, p.TminC[6], lo, 1.5)
	assert.InDelta(t, p.TmaxC[6], hi, 1.5)
	// The preset's months swap south of the equator.
	s.Site.LatDeg, s.Site.Timezone = -45, "Pacific/Auckland"
	y = mustYear(s)
	lo, hi = monthMean(time.July)
	assert.InDelta(t, p.TminC[0], lo, 1.5, "July in the south is January's cold")
	// Explicit normals override the preset month by month.
	s.Site.Climate.TminC = []float64{10, 10, 10, 10, 10, 10, 10, 10, 10, 10, 10, 10}
	s.Site.Climate.TmaxC = []float64{12, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12}
	y = mustYear(s)
	lo, hi = monthMean(time.July)
	assert.InDelta(t, 10, lo, 0.1)
	assert.InDelta(t, 12, hi, 0.1)
}

func TestSunWarmsTheEnclosure(t *testing.T) {
	// Faiman's heat-loss form: ΔT = α·G/U; a light-grey box (α = 0.5) at
	// 1000 W/m² with U = 25 W/(m²·K) runs 20 K above the air.
	assert.InDelta(t, 20, EnclosureRiseC(1000, 0.5, 25), 1e-12)
	assert.Zero(t, EnclosureRiseC(-3, 0.5, 25))
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	y := mustYear(s)
	var warmer int
	for i := range y.TempC {
		switch {
		case y.GHIWm2[i] == 0:
			require.Equal(t, y.TempC[i], y.CellTempC[i], "no sun, no rise")
		case y.CellTempC[i] > y.TempC[i]:
			warmer++
		}
	}
	assert.Greater(t, warmer, len(y.TempC)/4, "daytime slots run warmer")
	// Indoors the cells sit at the room's temperature.
	s.Site.Placement = scenario.Indoor
	y = mustYear(s)
	assert.Equal(t, y.TempC, y.CellTempC)
}

func TestIndoorSetback(t *testing.T) {
	s := scenario.Demo() // indoor 19 °C, open 07:00–21:00 Monday to Saturday
	closed := 12.0
	s.Site.IndoorClosedTempC = &closed
	s.Plan.Start, s.Plan.Years = "2027-01-04", 1 // a Monday
	r := Run(s)
	mon, sun := r.Days[0], r.Days[6]
	require.Equal(t, time.Monday, mon.Date.Weekday())
	assert.Equal(t, 12.0, mon.TempMinC)
	assert.Equal(t, 19.0, mon.TempMaxC)
	// 14 open hours at 19 °C, 10 closed at 12 °C.
	assert.InDelta(t, (14*19.0+10*12.0)/24, mon.TempMeanC, 1e-9)
	assert.Equal(t, 12.0, sun.TempMaxC, "closed all Sunday")
}

// Colder never lengthens an alkaline cell's life at the same load, from
// room temperature down (REFERENCE-VALUES §6.2: capacity falls in the cold;
// self-discharge slows, but far less than capacity is lost).
func TestColderNeverLongerForAlkaline(t *testing.T) {
	prev := math.Inf(1)
	for temp := 20.0; temp >= -30; temp -= 5 {
		s := fixedScenario("alkaline", "AA", temp)
		r := Run(s)
		require.False(t, r.Flat.IsZero(), "%g °C", temp)
		life := r.Flat.Sub(r.Start).Hours()
		assert.LessOrEqualf(t, life, prev, "at %g °C", temp)
		prev = life
	}
}

// Hotter never slows self-discharge (Arrhenius with a positive activation
// energy, REFERENCE-VALUES §6.4).
func TestHotterNeverSlowsSelfDischarge(t *testing.T) {
	for _, c := range cell.Library() {
		prev := 0.0
		for temp := -20.0; temp <= 60; temp += 10 {
			if temp < c.OperatingMinC || temp > c.OperatingMaxC {
				continue // outside the rating the node is down; see TestTemperatureLimitStopsTheNode
			}
			s := fixedScenario(c.ID, c.Forms[0].Name, temp)
			s.Plan.Years = 1
			s.Node.Vision.FPS, s.Node.Events.PerHour = 0, 0
			r := Run(s)
			assert.GreaterOrEqualf(t, r.Ledger.SelfDischargeWh, prev, "%s at %g °C", c.ID, temp)
			prev = r.Ledger.SelfDischargeWh
		}
	}
}
