package sun

import (
	"math"
	"time"
)

// Position is where the Sun is seen from a site at one instant.
type Position struct {
	// ZenithDeg is the geometric zenith angle (no refraction), 0–180°.
	ZenithDeg float64
	// ElevationDeg is the apparent elevation, 90° − ZenithDeg plus NOAA's
	// refraction (RefractionDeg).
	ElevationDeg float64
	// RefractionDeg is the refraction added to the geometric elevation.
	RefractionDeg float64
	// AzimuthDeg is measured from north, clockwise (east 90°), in [0, 360).
	AzimuthDeg float64
	// HourAngleDeg is the local hour angle, negative in the morning, in
	// [−180, 180).
	HourAngleDeg float64
	// DeclinationDeg is the apparent declination.
	DeclinationDeg float64
	// EquationOfTimeMin is apparent minus mean solar time, in minutes.
	EquationOfTimeMin float64
	// DistanceAU is the Earth–Sun distance in astronomical units.
	DistanceAU float64
}

// ApparentZenithDeg is the refracted zenith angle, 90° − ElevationDeg: the
// input that air-mass and clear-sky formulas expect.
func (p Position) ApparentZenithDeg() float64 { return 90 - p.ElevationDeg }

// At returns the Sun's position at t's UTC instant, seen from latDeg (north
// positive) and lonDeg (east positive), with the NOAA solar calculator's
// equations (see EphemerisAtCentury):
//
//	true solar time TST = UTC minutes of the day + E + 4·lon  (minutes)
//	hour angle H = TST/4 − 180°
//
// then Horizontal for zenith and azimuth and Refraction for the apparent
// elevation. The observer is on the geoid (no parallax, 0.0024° at most).
//
// A latitude outside [−90°, 90°] or a NaN or infinite coordinate gives a
// Position whose fields are all NaN.
//
// Reference: NOAA ESRL Global Monitoring Division, Solar Calculator and
// "Solar Calculation Details"; Meeus, Astronomical Algorithms, 2nd ed. (1998),
// ch. 13 and 25.
func At(t time.Time, latDeg, lonDeg float64) Position {
	if !validLat(latDeg) || !finite(lonDeg) {
		return nanPosition()
	}
	eph := EphemerisAt(t)
	ha := hourAngleDeg(t, lonDeg, eph.EquationOfTimeMin)
	zen, az := Horizontal(latDeg, eph.DeclinationDeg, ha)
	refr := RefractionDeg(90 - zen)
	return Position{
		ZenithDeg:         zen,
		ElevationDeg:      90 - zen + refr,
		RefractionDeg:     refr,
		AzimuthDeg:        az,
		HourAngleDeg:      ha,
		DeclinationDeg:    eph.DeclinationDeg,
		EquationOfTimeMin: eph.EquationOfTimeMin,
		DistanceAU:        eph.DistanceAU,
	}
}

// hourAngleDeg is NOAA's hour angle: true solar time in minutes is the UTC
// minutes of the day plus the equation of time plus 4 minutes per degree of
// east longitude; the hour angle is TST/4 − 180°, here reduced to [−180, 180).
func hourAngleDeg(t time.Time, lonDeg, eotMin float64) float64 {
	u := t.UTC()
	h, m, s := u.Clock()
	minutes := float64(h*60+m) + (float64(s)+float64(u.Nanosecond())*1e-9)/60
	tst := minutes + eotMin + 4*lonDeg
	return wrap180(tst/4 - 180)
}

// Horizontal converts the Sun's declination and local hour angle at a
// latitude into the geometric zenith angle (0–180°) and the azimuth from
// north, clockwise, in [0, 360):
//
//	cos θz = sin φ sin δ + cos φ cos δ cos H                 (Meeus 13.6)
//	tan A  = −cos δ sin H / (sin δ cos φ − cos δ sin φ cos H) (Meeus 13.5, from north)
//
// Both come from the local east, north and up components of the Sun's unit
// vector, so the zenith is well conditioned near 0° and the azimuth is
// defined (if meaningless) at the poles. Duffie & Beckman's γs (from south,
// west positive) is AzimuthDeg − 180°.
//
// Reference: Meeus, Astronomical Algorithms, 2nd ed. (1998), eqs. 13.5–13.6;
// Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed. (2013),
// eqs. 1.6.5 and 1.6.6.
func Horizontal(latDeg, declDeg, hourAngleDeg float64) (zenithDeg, azimuthDeg float64) {
	sinPhi, cosPhi := math.Sincos(latDeg * deg2rad)
	sinDec, cosDec := math.Sincos(declDeg * deg2rad)
	sinH, cosH := math.Sincos(hourAngleDeg * deg2rad)
	east := -cosDec * sinH
	north := sinDec*cosPhi - cosDec*sinPhi*cosH
	up := sinPhi*sinDec + cosPhi*cosDec*cosH // Meeus 13.6
	zenithDeg = math.Atan2(math.Hypot(east, north), up) * rad2deg
	azimuthDeg = normDeg(math.Atan2(east, north) * rad2deg) // Meeus 13.5, from north
	return zenithDeg, azimuthDeg
}

// RefractionDeg returns NOAA's atmospheric refraction correction, in degrees,
// to add to a geometric elevation h (degrees). It is a standard atmosphere's
// (no pressure or temperature input):
//
//	h > 85°:            0
//	5° < h ≤ 85°:       (58.1/tan h − 0.07/tan³h + 0.000086/tan⁵h)/3600
//	−0.575° < h ≤ 5°:   (1735 − 518.2h + 103.4h² − 12.79h³ + 0.711h⁴)/3600
//	h ≤ −0.575°:        −20.772/tan h /3600
//
// The last branch uses the spreadsheet's and web code's −20.772; the
// "Solar Calculation Details" page prints −20.774 (0.01 % apart). The
// pieces meet to within 0.00003° at −0.575° and 0.0005° at 5°, and the
// correction drops from 0.0014° to 0 at 85°, as NOAA's does.
//
// Reference: NOAA ESRL Global Monitoring Division, "Solar Calculation
// Details" (atmospheric refraction) and NOAA_Solar_Calculations_day.xls.
func RefractionDeg(elevationDeg float64) float64 {
	h := elevationDeg
	switch {
	case math.IsNaN(h):
		return math.NaN()
	case h > 85:
		return 0
	case h > 5:
		te := math.Tan(h * deg2rad)
		return (58.1/te - 0.07/(te*te*te) + 0.000086/(te*te*te*te*te)) / 3600
	case h > -0.575:
		return (1735 + h*(-518.2+h*(103.4+h*(-12.79+h*0.711)))) / 3600
	default:
		return -20.772 / math.Tan(h*deg2rad) / 3600
	}
}

func validLat(latDeg float64) bool { return latDeg >= -90 && latDeg <= 90 } // false for NaN

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

func nanPosition() Position {
	n := math.NaN()
	return Position{n, n, n, n, n, n, n, n}
}
