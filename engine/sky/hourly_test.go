package sky

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestCollaresPereiraRabl(t *testing.T) {
	// Recomputed [CALC, by hand and in a separate Python session] for
	// Madison's mean January day (φ = 43°, δ = −20.9°, D&B Table 1.6.1):
	// cos ωs = 0.356093, ωs = 69.1396°; a = 0.488674, b = 0.585181; at
	// 10:30 solar time (ω = −22.5°) r_t = 0.151564.
	ws := math.Acos(-math.Tan(43*math.Pi/180)*math.Tan(-20.9*math.Pi/180)) * 180 / math.Pi
	assert.InDelta(t, 69.1396, ws, 1e-4)
	assert.InDelta(t, 0.151564, CollaresPereiraRablRt(-22.5, ws), 1e-6)
	assert.Equal(t, CollaresPereiraRablRt(-22.5, ws), CollaresPereiraRablRt(22.5, ws), "symmetric about noon")
	assert.Zero(t, CollaresPereiraRablRt(75, ws), "after sunset")
	assert.Zero(t, CollaresPereiraRablRt(0, 0), "polar night")
	assert.True(t, math.IsNaN(CollaresPereiraRablRt(math.NaN(), ws)))

	// Over a whole day the hourly ratios add up to about one (the correlation
	// was fitted to hourly data, not forced to close; common practice: within
	// a few per cent), from short winter days to polar day.
	for _, wsDeg := range []float64{40, 69.14, 90, 110, 140, 180} {
		var sum float64
		for w := -180.0 + 0.05; w < 180; w += 0.1 {
			sum += CollaresPereiraRablRt(w, wsDeg) * 0.1 / 15 // ω moves 15° an hour
		}
		assert.InDelta(t, 1, sum, 0.05, "ωs = %g°: daily sum %g", wsDeg, sum)
	}
}
