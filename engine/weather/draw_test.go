package weather

import (
	"math"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
)

func days(start time.Time, n int) []time.Time {
	out := make([]time.Time, n)
	for i := range out {
		out[i] = start.AddDate(0, 0, i)
	}
	return out
}

func TestClearnessDrawsRepeatAndKeepTheMean(t *testing.T) {
	monthly := [12]float64{0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6, 0.55, 0.5, 0.45, 0.35, 0.08}
	ds := days(time.Date(2027, 1, 1, 0, 0, 0, 0, time.UTC), 365*50)
	a := ClearnessDraws(monthly, ds, 7)
	b := ClearnessDraws(monthly, ds, 7)
	assert.Equal(t, a, b, "same seed, same draws")
	assert.NotEqual(t, a, ClearnessDraws(monthly, ds, 8), "another seed, other draws")

	var sum, n [12]float64
	var lagNum, lagDen float64
	for i, d := range ds {
		m := d.Month() - 1
		assert.True(t, a[i] >= minClearness && a[i] <= maxClearness, "%v: %g", d, a[i])
		sum[m] += a[i]
		n[m]++
		if i > 0 && ds[i-1].Month() == d.Month() {
			lagNum += (a[i] - monthly[m]) * (a[i-1] - monthly[m])
		}
		lagDen += (a[i] - monthly[m]) * (a[i] - monthly[m])
	}
	// Over 50 years each month's drawn mean is within 0.005 of its mean:
	// the standard error of ~1500 correlated draws with σ ≤ 0.12 is about
	// 0.12 × √((1 + 0.3)/(1 − 0.3)) / √1500 ≈ 0.0042, and the reflection
	// keeps the distribution symmetric.
	for m := range monthly {
		assert.InDelta(t, monthly[m], sum[m]/n[m], 0.005, "month %d", m+1)
	}
	// The day-to-day correlation is the model's (≈ 0.3).
	assert.InDelta(t, DailyClearnessLag1, lagNum/lagDen, 0.05)
	// Spread: the draws vary day to day.
	var sd float64
	for i, d := range ds[:365] {
		sd += math.Pow(a[i]-monthly[d.Month()-1], 2)
	}
	assert.Greater(t, math.Sqrt(sd/365), 0.05)
}
