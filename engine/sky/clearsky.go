package sky

import "math"

// HaurwitzGHIWm2 returns Haurwitz's clear-sky global horizontal irradiance
// for an apparent zenith angle z in degrees:
//
//	GHI = 1098 cos z exp(−0.059 / cos z)  W/m²
//
// and 0 when z ≥ 90° (Sun at or below the horizon). NaN gives NaN. The model
// has no site input (no turbidity, water vapour or altitude); Reno, Hansen &
// Stein rank it best among the models that need no atmospheric input (from
// memory).
//
// Reference: B. Haurwitz, "Insolation in relation to cloudiness and cloud
// density", J. Meteorology 2, 154–166 (1945) and "Insolation in relation to
// cloud type", J. Meteorology 3, 123–124 (1946); in the form of M. J. Reno,
// C. W. Hansen and J. S. Stein, "Global horizontal irradiance clear sky
// models: implementation and analysis", Sandia report SAND2012-2389 (2012).
func HaurwitzGHIWm2(apparentZenithDeg float64) float64 {
	z := apparentZenithDeg
	if math.IsNaN(z) {
		return math.NaN()
	}
	if z >= 90 || z <= -90 {
		return 0
	}
	c := math.Cos(z * deg2rad)
	return 1098 * c * math.Exp(-0.059/c)
}
