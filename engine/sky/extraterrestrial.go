package sky

import (
	"math"
	"time"

	"nodelife/engine/sun"
)

// Solar constants, the mean total solar irradiance at 1 AU, W/m².
const (
	// SolarConstantWm2 is the engine's value. Kopp & Lean (2011) measured
	// 1360.8 ± 0.5 W/m² at solar minimum; 1361 is the rounded value (and the
	// IAU 2015 nominal solar irradiance, from memory).
	// Reference: G. Kopp and J. L. Lean, "A new, lower value of total solar
	// irradiance: Evidence and climate significance", Geophys. Res. Lett. 38,
	// L01706 (2011), doi:10.1029/2010GL045777.
	SolarConstantWm2 = 1361.0
	// SolarConstantWRCWm2 is the World Radiation Centre value used by Duffie
	// & Beckman's worked examples and by the NSRDB TMY3 ETR columns
	// (checked against the file's ETRN in this package's tests).
	SolarConstantWRCWm2 = 1367.0
)

// NormalWm2 returns the extraterrestrial irradiance on a surface normal to
// the Sun's rays, Gon = Gsc/R², for an Earth–Sun distance R in AU (use
// sun.Position.DistanceAU, NOAA's distance) and solar constant Gsc. This
// inverse square of the NOAA distance is the engine's eccentricity factor;
// SpencerFactor and CooperFactor are the textbook series, kept for checks.
func NormalWm2(distanceAU, solarConstantWm2 float64) float64 {
	return solarConstantWm2 / (distanceAU * distanceAU)
}

// SpencerFactor returns Spencer's (1971) Fourier series for (R0/R)², the
// eccentricity correction factor, on day n of the year:
//
//	1.000110 + 0.034221 cos B + 0.001280 sin B + 0.000719 cos 2B + 0.000077 sin 2B,  B = 360(n − 1)/365
//
// Reference: J. W. Spencer, "Fourier series representation of the position
// of the Sun", Search 2(5), 172 (1971); Duffie & Beckman, Solar Engineering of
// Thermal Processes, 4th ed. (2013), eq. 1.4.1b.
func SpencerFactor(dayOfYear int) float64 {
	b := 2 * math.Pi * float64(dayOfYear-1) / 365 // D&B eq. 1.4.2
	return 1.000110 + 0.034221*math.Cos(b) + 0.001280*math.Sin(b) +
		0.000719*math.Cos(2*b) + 0.000077*math.Sin(2*b) // D&B eq. 1.4.1b
}

// CooperFactor returns Duffie & Beckman's simple eccentricity factor
// 1 + 0.033 cos(360n/365) (D&B eq. 1.4.1a), the one their worked examples use.
func CooperFactor(dayOfYear int) float64 {
	return 1 + 0.033*math.Cos(2*math.Pi*float64(dayOfYear)/365) // D&B eq. 1.4.1a
}

// DailyHorizontalWhm2 returns the extraterrestrial irradiation on a
// horizontal surface over a whole day, in Wh/m², at latitude latDeg for a
// declination declDeg and extraterrestrial normal irradiance normalWm2 (both
// taken as constant through the day):
//
//	H0 = (24/π) Gon (cos φ cos δ sin ωs + (π ωs/180) sin φ sin δ)     (D&B eq. 1.10.3, in Wh)
//
// with the geometric sunset hour angle ωs (cos ωs = −tan φ tan δ, D&B eq.
// 1.6.10): ωs = 0 in polar night (H0 = 0) and 180° in polar day (H0 =
// 24 Gon sin φ sin δ). Multiply by 3600 for J/m².
//
// Reference: Duffie & Beckman, Solar Engineering of Thermal Processes,
// 4th ed. (2013), eqs. 1.6.10 and 1.10.3.
func DailyHorizontalWhm2(latDeg, declDeg, normalWm2 float64) float64 {
	if !validLat(latDeg) {
		return math.NaN()
	}
	ws, _ := sun.HourAngleAtZenithDeg(latDeg, declDeg, 90)
	return hourAngleIntegral(latDeg, declDeg, normalWm2, -ws, ws)
}

// IntervalHorizontalWhm2 returns the extraterrestrial irradiation on a
// horizontal surface between hour angles omega1Deg < omega2Deg, in Wh/m²,
// counting only the time the Sun is above the geometric horizon:
//
//	I0 = (12/π) Gon [cos φ cos δ (sin ω2 − sin ω1) + π(ω2 − ω1)/180 sin φ sin δ]  (D&B eq. 1.10.4, in Wh)
//
// evaluated over the parts of [ω1, ω2] inside [360k − ωs, 360k + ωs], so an
// interval may cross sunrise, sunset or midnight. Declination and Gon are
// constant over the interval.
//
// Reference: Duffie & Beckman, Solar Engineering of Thermal Processes,
// 4th ed. (2013), eq. 1.10.4.
func IntervalHorizontalWhm2(latDeg, declDeg, normalWm2, omega1Deg, omega2Deg float64) float64 {
	if !validLat(latDeg) || math.IsNaN(omega1Deg) || math.IsNaN(omega2Deg) || math.IsInf(omega1Deg, 0) || math.IsInf(omega2Deg, 0) {
		return math.NaN()
	}
	if omega2Deg <= omega1Deg {
		return 0
	}
	ws, _ := sun.HourAngleAtZenithDeg(latDeg, declDeg, 90)
	if math.IsNaN(ws) {
		return math.NaN()
	}
	total := 0.0
	kmin := math.Floor((omega1Deg + 180) / 360)
	kmax := math.Floor((omega2Deg + 180) / 360)
	for k := kmin; k <= kmax; k++ {
		a := max(omega1Deg, 360*k-ws)
		b := min(omega2Deg, 360*k+ws)
		if b > a {
			total += hourAngleIntegral(latDeg, declDeg, normalWm2, a, b)
		}
	}
	return total
}

// hourAngleIntegral is ∫ Gon cos θz dt from ω1 to ω2 in Wh/m² (1 h = 15°).
func hourAngleIntegral(latDeg, declDeg, normalWm2, w1Deg, w2Deg float64) float64 {
	sinPhi, cosPhi := math.Sincos(latDeg * deg2rad)
	sinDec, cosDec := math.Sincos(declDeg * deg2rad)
	return 12 / math.Pi * normalWm2 * (cosPhi*cosDec*(math.Sin(w2Deg*deg2rad)-math.Sin(w1Deg*deg2rad)) +
		(w2Deg-w1Deg)*deg2rad*sinPhi*sinDec) // D&B eq. 1.10.4 (eq. 1.10.3 with ω1 = −ωs, ω2 = ωs)
}

// DailyExtraterrestrialWhm2 returns DailyHorizontalWhm2 at latDeg with the
// NOAA declination and Gon = solarConstantWm2/R² taken at t. Pass the day's
// solar noon (sun.Events) or any instant of the day: the declination changes
// by at most about 0.4° a day (23.44° × 2π/365.24 at the equinoxes).
// A latitude outside [−90, 90] or NaN gives NaN.
func DailyExtraterrestrialWhm2(t time.Time, latDeg, solarConstantWm2 float64) float64 {
	p := sun.At(t, latDeg, 0)
	return DailyHorizontalWhm2(latDeg, p.DeclinationDeg, NormalWm2(p.DistanceAU, solarConstantWm2))
}

// IntervalExtraterrestrialWhm2 returns IntervalHorizontalWhm2 between the
// instants start and end (end after start, at most a day or so apart) at
// latDeg, lonDeg: ω1 is NOAA's hour angle at start, ω2 = ω1 + 15°/h × (end −
// start), and the declination and Gon = solarConstantWm2/R² are taken at the
// midpoint. Bad coordinates give NaN.
func IntervalExtraterrestrialWhm2(start, end time.Time, latDeg, lonDeg, solarConstantWm2 float64) float64 {
	p0 := sun.At(start, latDeg, lonDeg)
	mid := sun.At(start.Add(end.Sub(start)/2), latDeg, lonDeg)
	w1 := p0.HourAngleDeg
	w2 := w1 + 15*end.Sub(start).Hours()
	return IntervalHorizontalWhm2(latDeg, mid.DeclinationDeg, NormalWm2(mid.DistanceAU, solarConstantWm2), w1, w2)
}

// validLat reports whether latDeg is in [−90, 90] (false for NaN).
func validLat(latDeg float64) bool { return latDeg >= -90 && latDeg <= 90 }

const (
	deg2rad = math.Pi / 180
	rad2deg = 180 / math.Pi
)
