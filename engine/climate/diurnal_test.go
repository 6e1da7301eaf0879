package climate

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestPartonLoganShape(t *testing.T) {
	const tMin, tMax = 2.0, 14.0
	cases := []struct{ rise, set float64 }{{6, 18}, {4, 20}, {8.5, 15.5}, {3, 21}}
	for _, c := range cases {
		at := func(h float64) float64 { return PartonLogan(tMin, tMax, c.rise, c.set, h) }
		// Minimum at sunrise + c (Parton & Logan's definition of c).
		assert.InDelta(t, tMin, at(c.rise+PartonLoganC), 1e-9, "min at sunrise%+g", PartonLoganC)
		// Maximum at solar noon + a, when the day is symmetric about noon.
		if c.rise+c.set == 24 {
			peak := 12 + PartonLoganA + PartonLoganC // sin peaks at m = (Y + 2a)/2
			assert.InDelta(t, tMax, at(peak), 1e-6, "max %g h after sunrise", peak)
		}
		// Continuous at sunset and around midnight; bounded by min and max.
		assert.InDelta(t, at(c.set-1e-9), at(c.set+1e-9), 1e-6)
		assert.InDelta(t, at(24-1e-9), at(1e-9), 1e-6)
		assert.InDelta(t, at(c.rise+PartonLoganC-1e-9), at(c.rise+PartonLoganC+1e-9), 1e-6)
		lo, hi := math.Inf(1), math.Inf(-1)
		for h := 0.0; h < 24; h += 0.01 {
			v := at(h)
			lo, hi = min(lo, v), max(hi, v)
		}
		assert.GreaterOrEqual(t, lo, tMin-1e-9)
		assert.LessOrEqual(t, hi, tMax+1e-9)
		// Falls through the night.
		assert.Greater(t, at(c.set+1), at(c.set+3))
	}
}

func TestPartonLoganPolarFallback(t *testing.T) {
	nan := math.NaN()
	for _, c := range []struct{ rise, set float64 }{{nan, nan}, {0, 24}, {11.5, 12.5}} {
		assert.InDelta(t, -10.0, PartonLogan(-10, 0, c.rise, c.set, 3), 1e-9)
		assert.InDelta(t, 0.0, PartonLogan(-10, 0, c.rise, c.set, 15), 1e-9)
	}
}
