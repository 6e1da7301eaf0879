package sun

import (
	"math"
	"time"
)

// Ephemeris is the Sun's geocentric position and the quantities derived on the
// way, for one instant, as the NOAA solar calculator computes them. Angles are
// in degrees, reduced to [0, 360) where they are longitudes or anomalies.
type Ephemeris struct {
	JulianCentury        float64 // T, Julian centuries from J2000.0 (UT)
	MeanLongitudeDeg     float64 // L0, geometric mean longitude (Meeus 25.2)
	MeanAnomalyDeg       float64 // M, mean anomaly (Meeus 25.3)
	Eccentricity         float64 // e, of the Earth's orbit (Meeus 25.4)
	EquationOfCenterDeg  float64 // C, equation of the centre
	TrueLongitudeDeg     float64 // ☉ = L0 + C
	TrueAnomalyDeg       float64 // v = M + C
	DistanceAU           float64 // R, Earth–Sun distance (Meeus 25.5)
	NodeLongitudeDeg     float64 // Ω, the Moon's ascending node, as used for nutation
	ApparentLongitudeDeg float64 // λ, corrected for nutation and aberration
	MeanObliquityDeg     float64 // ε0, mean obliquity of the ecliptic (Meeus 22.2)
	ObliquityDeg         float64 // ε, obliquity corrected for nutation (Meeus 25.8)
	RightAscensionDeg    float64 // α, apparent (Meeus 25.6)
	DeclinationDeg       float64 // δ, apparent (Meeus 25.7)
	EquationOfTimeMin    float64 // E, apparent minus mean solar time, minutes
}

// EphemerisAt returns the Sun's ephemeris at t's UTC instant.
func EphemerisAt(t time.Time) Ephemeris { return EphemerisAtCentury(JulianCentury(t)) }

// EphemerisAtCentury returns the Sun's ephemeris at T Julian centuries from
// J2000.0.
//
// The equations are Meeus's low-accuracy solar coordinates as written in
// NOAA's solar calculator spreadsheet (NOAA_Solar_Calculations_day.xls, the
// "Solar Calculation Details" page), with the equation of time in Smart's
// form (Meeus 28.3) using the corrected obliquity, times 4 min/°:
//
//	L0 = 280.46646 + T(36000.76983 + 0.0003032T)
//	M  = 357.52911 + T(35999.05029 − 0.0001537T)
//	e  = 0.016708634 − T(0.000042037 + 0.0000001267T)
//	C  = (1.914602 − T(0.004817 + 0.000014T)) sin M + (0.019993 − 0.000101T) sin 2M + 0.000289 sin 3M
//	R  = 1.000001018(1 − e²)/(1 + e cos v)
//	Ω  = 125.04 − 1934.136T
//	λ  = ☉ − 0.00569 − 0.00478 sin Ω
//	ε0 = 23°26′21.448″ − 46.8150″T − 0.00059″T² + 0.001813″T³
//	ε  = ε0 + 0.00256 cos Ω
//	α  = atan2(cos ε sin λ, cos λ),  δ = asin(sin ε sin λ)
//	E  = y sin 2L0 − 2e sin M + 4ey sin M cos 2L0 − ½y² sin 4L0 − (5/4)e² sin 2M,  y = tan²(ε/2)
//
// Reference: J. Meeus, Astronomical Algorithms, 2nd ed. (Willmann-Bell,
// 1998), eqs. 22.2, 25.2–25.8, 28.3; NOAA ESRL Global Monitoring Division,
// Solar Calculator and "Solar Calculation Details" (spreadsheet equations).
func EphemerisAtCentury(T float64) Ephemeris {
	l0 := normDeg(280.46646 + T*(36000.76983+T*0.0003032)) // Meeus 25.2
	m := 357.52911 + T*(35999.05029-T*0.0001537)           // Meeus 25.3
	e := 0.016708634 - T*(0.000042037+T*0.0000001267)      // Meeus 25.4
	mr := m * deg2rad
	// Equation of the centre (Meeus ch. 25, after eq. 25.4).
	c := math.Sin(mr)*(1.914602-T*(0.004817+T*0.000014)) +
		math.Sin(2*mr)*(0.019993-T*0.000101) +
		math.Sin(3*mr)*0.000289
	trueLong := l0 + c
	v := m + c
	r := 1.000001018 * (1 - e*e) / (1 + e*math.Cos(v*deg2rad))     // Meeus 25.5
	omega := 125.04 - 1934.136*T                                   // Meeus ch. 25, below 25.8
	lambda := trueLong - 0.00569 - 0.00478*math.Sin(omega*deg2rad) // Meeus ch. 25, apparent λ
	seconds := 21.448 - T*(46.8150+T*(0.00059-T*0.001813))         // Meeus 22.2
	eps0 := 23 + (26+seconds/60)/60
	eps := eps0 + 0.00256*math.Cos(omega*deg2rad) // Meeus 25.8
	lr, er := lambda*deg2rad, eps*deg2rad
	alpha := math.Atan2(math.Cos(er)*math.Sin(lr), math.Cos(lr)) // Meeus 25.6
	delta := math.Asin(math.Sin(er) * math.Sin(lr))              // Meeus 25.7

	// Smart's equation of time, Meeus 28.3, with NOAA's corrected ε.
	y := math.Tan(er / 2)
	y *= y
	l0r := l0 * deg2rad
	eot := y*math.Sin(2*l0r) - 2*e*math.Sin(mr) + 4*e*y*math.Sin(mr)*math.Cos(2*l0r) -
		0.5*y*y*math.Sin(4*l0r) - 1.25*e*e*math.Sin(2*mr)

	return Ephemeris{
		JulianCentury:        T,
		MeanLongitudeDeg:     l0,
		MeanAnomalyDeg:       normDeg(m),
		Eccentricity:         e,
		EquationOfCenterDeg:  c,
		TrueLongitudeDeg:     normDeg(trueLong),
		TrueAnomalyDeg:       normDeg(v),
		DistanceAU:           r,
		NodeLongitudeDeg:     normDeg(omega),
		ApparentLongitudeDeg: normDeg(lambda),
		MeanObliquityDeg:     eps0,
		ObliquityDeg:         eps,
		RightAscensionDeg:    normDeg(alpha * rad2deg),
		DeclinationDeg:       delta * rad2deg,
		EquationOfTimeMin:    4 * eot * rad2deg, // 4 minutes of time per degree
	}
}

// DeclinationCooperDeg returns Cooper's (1969) approximation of the solar
// declination on day n of the year (1 = 1 January), δ = 23.45 sin(360(284 +
// n)/365) degrees. It is the textbook formula behind the worked examples of
// Duffie & Beckman; the engine itself uses the NOAA declination of
// EphemerisAt, which differs from it by up to 1.1° (compared day by day
// over 2023).
//
// Reference: P. I. Cooper, "The absorption of radiation in solar stills",
// Solar Energy 12(3), 333–346 (1969); Duffie & Beckman, Solar Engineering of
// Thermal Processes, 4th ed. (2013), eq. 1.6.1a.
func DeclinationCooperDeg(dayOfYear int) float64 {
	return 23.45 * math.Sin(360*float64(284+dayOfYear)/365*deg2rad) // D&B eq. 1.6.1a
}

const (
	deg2rad = math.Pi / 180
	rad2deg = 180 / math.Pi
)

// normDeg reduces an angle to [0, 360).
func normDeg(a float64) float64 {
	a = math.Mod(a, 360)
	if a < 0 {
		a += 360
	}
	if a >= 360 { // -tiny + 360 rounds to 360
		a = 0
	}
	return a
}

// wrap180 reduces an angle to [−180, 180).
func wrap180(a float64) float64 {
	return normDeg(a+180) - 180
}
