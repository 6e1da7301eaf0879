package sky_test

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/sky"
)

func TestIAMASHRAE(t *testing.T) {
	// pvlib test_ashrae, b = 0.05 [SRC2]; pvlib's assert_allclose default
	// rtol 1e-7.
	cases := []struct{ aoi, want float64 }{
		{-90, 0}, {-67.5, 0.9193437}, {-45, 0.97928932}, {-22.5, 0.99588039}, {0, 1},
		{22.5, 0.99588039}, {45, 0.97928932}, {67.5, 0.9193437}, {89, 0}, {90, 0},
	}
	for _, c := range cases {
		got := sky.IAMASHRAE(c.aoi, sky.ASHRAEB0)
		assert.Truef(t, withinAbsOrRel(got, c.want, 1e-12, 1e-7), "IAMASHRAE(%g) = %.8f, want %.8f", c.aoi, got, c.want)
	}
	assert.True(t, math.IsNaN(sky.IAMASHRAE(math.NaN(), sky.ASHRAEB0)))
	assert.Equal(t, 0.0, sky.IAMASHRAE(120, sky.ASHRAEB0))
}

func TestIAMMartinRuiz(t *testing.T) {
	// pvlib test_martin_ruiz [SRC2]: aoi 45°, a_r 0.16 → 0.98986965; a_r
	// 0.18: ±60° → 0.9414631, 0 → 1, ±100° → 0, Inf → 0, NaN → NaN.
	// pvlib's assert_allclose default rtol 1e-7.
	assert.InDelta(t, 0.98986965, sky.IAMMartinRuiz(45, sky.MartinRuizAr), 1e-7)
	for _, c := range []struct{ aoi, want float64 }{
		{-100, 0}, {-60, 0.9414631}, {0, 1}, {60, 0.9414631}, {100, 0}, {math.Inf(1), 0},
	} {
		got := sky.IAMMartinRuiz(c.aoi, 0.18)
		assert.Truef(t, withinAbsOrRel(got, c.want, 1e-12, 1e-7), "IAMMartinRuiz(%g, 0.18) = %.8f, want %.8f", c.aoi, got, c.want)
	}
	assert.True(t, math.IsNaN(sky.IAMMartinRuiz(math.NaN(), 0.18)))
	assert.True(t, math.IsNaN(sky.IAMMartinRuiz(30, 0)), "a_r must be positive")
	// Both modifiers fall monotonically from 1 at normal incidence.
	prevA, prevM := 1.0, 1.0
	for aoi := 0.0; aoi <= 90; aoi += 0.5 {
		a, m := sky.IAMASHRAE(aoi, sky.ASHRAEB0), sky.IAMMartinRuiz(aoi, sky.MartinRuizAr)
		assert.True(t, a <= prevA && m <= prevM && a >= 0 && m >= 0, "at %g°: %g, %g", aoi, a, m)
		prevA, prevM = a, m
	}
}
