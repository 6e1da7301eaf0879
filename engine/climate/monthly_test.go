package climate

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestMonthlyDayMinMax(t *testing.T) {
	var m Monthly
	for i := range 12 {
		m.TminC[i], m.TmaxC[i] = float64(i), float64(10+i)
	}
	// At each month's middle, that month's normals.
	for i, d := range midMonth {
		lo, hi := m.DayMinMax(d)
		assert.InDelta(t, float64(i), lo, 1e-9, "month %d", i+1)
		assert.InDelta(t, float64(10+i), hi, 1e-9, "month %d", i+1)
	}
	// Halfway from mid-December (11) to mid-January (0), across the new year.
	lo, _ := m.DayMinMax(365.5)
	assert.InDelta(t, 5.5, lo, 0.2)
	lo1, _ := m.DayMinMax(1)
	lo366, _ := m.DayMinMax(366)
	assert.InDelta(t, lo1, lo366, 0.5, "continuous over the new year")
}

func TestMonthlyDiurnal(t *testing.T) {
	m := Monthly{LatDeg: 45}
	for i := range 12 {
		m.TminC[i], m.TmaxC[i] = 0, 10
	}
	// Parton & Logan: minimum near sunrise, maximum in the afternoon.
	var lo, hi = math.Inf(1), math.Inf(-1)
	var loH, hiH float64
	for h := 0.0; h < 24; h += 0.05 {
		v := m.TempC(172+h/24, h) // 21 June: sunrise ≈ 04:25 solar time at 45° N
		if v < lo {
			lo, loH = v, h
		}
		if v > hi {
			hi, hiH = v, h
		}
	}
	assert.InDelta(t, 0, lo, 0.01)
	assert.InDelta(t, 10, hi, 0.01)
	assert.InDelta(t, 4.25, loH, 0.3, "minimum at sunrise − 0.17 h")
	assert.InDelta(t, 12+PartonLoganA+PartonLoganC, hiH, 0.3, "maximum 1.7 h after solar noon")
	// Polar night at 80° N in December: the cosine fallback, never NaN.
	polar := Monthly{LatDeg: 80, TminC: m.TminC, TmaxC: m.TmaxC}
	assert.InDelta(t, 0, polar.TempC(355, 3), 0.01)
	assert.InDelta(t, 10, polar.TempC(355, 15), 0.01)
}

func TestPresets(t *testing.T) {
	ids := map[string]bool{}
	for _, p := range Presets() {
		assert.False(t, ids[p.ID], "duplicate %s", p.ID)
		ids[p.ID] = true
		for i := range 12 {
			assert.LessOrEqual(t, p.TminC[i], p.TmaxC[i], "%s month %d", p.ID, i+1)
			assert.True(t, p.Clearness[i] > 0.2 && p.Clearness[i] < 0.8, "%s clearness", p.ID)
			assert.True(t, p.SoilingPct[i] >= 0 && p.SnowLossPct[i] <= 100)
		}
		assert.NotEmpty(t, p.Note)
	}
	for _, id := range []string{"cold-continental", "marine-temperate", "hot-desert", "humid-tropical", "subarctic"} {
		assert.True(t, ids[id], id)
	}
	// Ordering the names promise: the subarctic January is the coldest, the
	// desert July the hottest, the desert the clearest.
	sub, _ := LookupPreset("subarctic")
	desert, _ := LookupPreset("hot-desert")
	for _, p := range Presets() {
		assert.LessOrEqual(t, sub.TminC[0], p.TminC[0], p.ID)
		assert.GreaterOrEqual(t, desert.TmaxC[6], p.TmaxC[6], p.ID)
		assert.GreaterOrEqual(t, desert.Clearness[5], p.Clearness[5], p.ID)
	}
	// South of the equator the seasons swap.
	marine, _ := LookupPreset("marine-temperate")
	south := marine.ForLatitude(-40)
	assert.Equal(t, marine.TmaxC[6], south.TmaxC[0])
	assert.Equal(t, marine.SnowLossPct[0], south.SnowLossPct[6])
	assert.Equal(t, marine, marine.ForLatitude(40))
}
