package climate

import "math"

// Diurnal parameters of Parton & Logan (1981), Table 1, for air temperature
// at 150 cm screen height (from memory: a = 1.86 h, b = 2.20, c = −0.17 h).
const (
	PartonLoganA = 1.86  // h, lag of the maximum after solar noon
	PartonLoganB = 2.20  // nocturnal decay coefficient
	PartonLoganC = -0.17 // h, lag of the minimum after sunrise
)

// PartonLogan returns the air temperature at solar hour h (0–24) of a day
// with minimum tMin and maximum tMax (°C) whose sun rises at sunriseH and
// sets at sunsetH (solar hours):
//
//	day,   sunrise+c ≤ h ≤ sunset:  T = Tmin + (Tmax − Tmin)·sin(π·m / (Y + 2a))
//	night:                          T = (Tmin − Tsn·e^(−b) + (Tsn − Tmin)·e^(−b·n/Z)) / (1 − e^(−b))
//
// with m the hours since sunrise + c, Y the day length, Tsn the temperature
// at sunset, n the hours since sunset and Z the night length. The night form
// is the continuous one (it reaches Tmin at sunrise + c), after Wann, Yen &
// Gold (1985); Parton & Logan's own form leaves a step of (Tsn − Tmin)·e^(−b)
// there. The same day's minimum closes the night, as suits monthly normals.
//
// In polar day or night (no sunrise or sunset), and for days shorter than
// two hours, it falls back to a cosine with its minimum at 03:00 and maximum
// at 15:00 solar time (common practice).
//
// Reference: W. J. Parton and J. A. Logan, "A model for diurnal variation in
// soil and air temperature", Agricultural Meteorology 23 (1981) 205–216;
// W. Wann, D. Yen and H. J. Gold, "Evaluation and calibration of three models
// for daily cycle of air temperature", Agricultural and Forest Meteorology 34
// (1985) 121–128 (from memory).
func PartonLogan(tMin, tMax, sunriseH, sunsetH, h float64) float64 {
	day := sunsetH - sunriseH
	if math.IsNaN(day) || day < 2 || day > 22 {
		return (tMin+tMax)/2 - (tMax-tMin)/2*math.Cos(2*math.Pi*(h-3)/24)
	}
	a, b, c := PartonLoganA, PartonLoganB, PartonLoganC
	rise := sunriseH + c
	sun := func(m float64) float64 { return tMin + (tMax-tMin)*math.Sin(math.Pi*m/(day+2*a)) }
	if h >= rise && h <= sunsetH {
		return sun(h - rise) // Parton & Logan eq. 1
	}
	night := 24 - day + c // from sunset to the next minimum at sunrise + c
	n := h - sunsetH
	if n < 0 {
		n += 24
	}
	tsn := sun(sunsetH - rise)
	eb := math.Exp(-b)
	return (tMin - tsn*eb + (tsn-tMin)*math.Exp(-b*n/night)) / (1 - eb) // continuous form of eq. 2
}
