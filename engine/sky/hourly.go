package sky

import "math"

// CollaresPereiraRablRt returns r_t, the ratio of the global irradiation in
// the hour centred on hour angle omegaDeg to the day's global irradiation, for
// a day whose sunset hour angle is omegaSDeg (geometric, D&B eq. 1.6.10):
//
//	r_t = (π/24)(a + b cos ω)(cos ω − cos ωs) / (sin ωs − (π ωs/180) cos ωs)
//	a = 0.409 + 0.5016 sin(ωs − 60°),  b = 0.6609 − 0.4767 sin(ωs − 60°)
//
// It is 0 when the sun is below the horizon (cos ω < cos ωs) and in polar
// night (ωs = 0). Divided by one hour it is the mean-day global irradiance
// at that hour angle as a share of the daily total, which is how the engine
// spreads a daily irradiation over shorter steps.
//
// Reference: M. Collares-Pereira and A. Rabl, "The average distribution of
// solar radiation — correlations between diffuse and hemispherical and
// between daily and hourly insolation values", Solar Energy 22 (1979)
// 155–164; Duffie & Beckman, 4th ed. (2013), eq. 2.13.2 (equation number from
// memory).
func CollaresPereiraRablRt(omegaDeg, omegaSDeg float64) float64 {
	if math.IsNaN(omegaDeg) || math.IsNaN(omegaSDeg) {
		return math.NaN()
	}
	if omegaSDeg <= 0 {
		return 0 // polar night
	}
	ws := omegaSDeg * math.Pi / 180
	w := omegaDeg * math.Pi / 180
	cosW, cosWs := math.Cos(w), math.Cos(ws)
	if cosW <= cosWs {
		return 0
	}
	s := math.Sin(ws - math.Pi/3)
	a := 0.409 + 0.5016*s
	b := 0.6609 - 0.4767*s
	return math.Pi / 24 * (a + b*cosW) * (cosW - cosWs) / (math.Sin(ws) - ws*cosWs)
}
