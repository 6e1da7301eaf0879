package sun

import (
	"errors"
	"fmt"
	"math"
	"time"
)

// SunriseZenithDeg is the geometric zenith angle of the Sun's centre at
// sunrise and sunset: 90° plus 0.833° for refraction at the horizon and the
// Sun's semidiameter (NOAA, "Solar Calculation Details").
const SunriseZenithDeg = 90.833

// Polar says whether a day has no sunrise and sunset because the Sun stays
// up ("day") or down ("night"). Its zero value "" is an ordinary day.
type Polar string

// Polar values.
const (
	NotPolar   Polar = ""
	PolarDay   Polar = "day"
	PolarNight Polar = "night"
)

// Day is the Sun's daily events at a site on one local calendar date.
type Day struct {
	// Date is local midnight at the start of the date, in the site's location.
	Date time.Time
	// SolarNoon is the transit (hour angle 0) nearest local clock noon.
	SolarNoon time.Time
	// Sunrise and Sunset are when the Sun's centre passes SunriseZenithDeg
	// before and after SolarNoon; both are the zero time.Time when Polar is
	// not "".
	Sunrise, Sunset time.Time
	// Polar is "day" or "night" when the Sun does not cross
	// SunriseZenithDeg on this date (judged at solar noon), else "".
	Polar Polar
	// DayLengthH is Sunset − Sunrise in hours: 24 in polar day, 0 in polar
	// night.
	DayLengthH float64
}

// ErrCoordinate is the sentinel wrapped by every *CoordinateError.
var ErrCoordinate = errors.New("sun: coordinate out of range")

// CoordinateError reports a latitude or longitude that is NaN, infinite or
// out of range, quoting the value.
type CoordinateError struct {
	Name  string  // "latitude" or "longitude"
	Value float64 // the value given
	Range string  // the valid range, e.g. "[-90, 90]"
}

func (e *CoordinateError) Error() string {
	return fmt.Sprintf("sun: %s %v out of range %s", e.Name, e.Value, e.Range)
}

// Unwrap returns ErrCoordinate.
func (e *CoordinateError) Unwrap() error { return ErrCoordinate }

// CheckSite returns a *CoordinateError unless latDeg is in [−90, 90] and
// lonDeg in [−180, 180].
func CheckSite(latDeg, lonDeg float64) error {
	if !validLat(latDeg) {
		return &CoordinateError{Name: "latitude", Value: latDeg, Range: "[-90, 90]"}
	}
	if !(lonDeg >= -180 && lonDeg <= 180) {
		return &CoordinateError{Name: "longitude", Value: lonDeg, Range: "[-180, 180]"}
	}
	return nil
}

// HourAngleAtZenithDeg returns the hour angle ω ≥ 0 at which the Sun, at
// declination declDeg, reaches zenithDeg at latitude latDeg:
//
//	cos ω = (cos θz − sin φ sin δ)/(cos φ cos δ)
//
// With θz = 90° this is Duffie & Beckman's sunset hour angle, cos ωs =
// −tan φ tan δ (eq. 1.6.10); with θz = 90.833° it is NOAA's
// HA_sunrise. The half-day is ω/15 hours. When the Sun never reaches
// zenithDeg, ω is 0 and polar is PolarNight; when it never leaves, ω is 180
// and polar is PolarDay. NaN inputs give NaN and NotPolar.
//
// Reference: Duffie & Beckman, Solar Engineering of Thermal Processes,
// 4th ed. (2013), eq. 1.6.10; NOAA "Solar Calculation Details".
func HourAngleAtZenithDeg(latDeg, declDeg, zenithDeg float64) (omegaDeg float64, polar Polar) {
	sinPhi, cosPhi := math.Sincos(latDeg * deg2rad)
	sinDec, cosDec := math.Sincos(declDeg * deg2rad)
	num := math.Cos(zenithDeg*deg2rad) - sinPhi*sinDec
	den := cosPhi * cosDec
	switch {
	case math.IsNaN(num) || math.IsNaN(den):
		return math.NaN(), NotPolar
	case num >= den: // cos ω ≥ 1 (den ≥ 0): the Sun never climbs to zenithDeg
		return 0, PolarNight
	case num <= -den: // cos ω ≤ −1: the Sun never sinks to zenithDeg
		return 180, PolarDay
	}
	return math.Acos(num/den) * rad2deg, NotPolar
}

// Events returns solar noon, sunrise and sunset on the calendar date that
// date falls on in loc, at latDeg, lonDeg. The times are in loc.
//
// Solar noon is found by Newton steps on the hour angle from local clock
// noon, and each of sunrise and sunset by iterating t ← t − (H(t) ∓
// ω(δ(t)))/15°/h, recomputing the declination and equation of time at the
// event itself (NOAA's web calculator does one such refinement, from
// memory; this iterates until a step is under 1 ms, at most 12 steps).
//
// Polar day and night are judged at solar noon from the declination there;
// on the rare transitional day when the Sun grazes the 90.833° circle, ω is
// clamped (a rise at the transit, or a rise and set 12 hours apart).
//
// A nil loc panics (as time.Date does); a bad coordinate returns a
// *CoordinateError.
//
// Reference: NOAA ESRL Global Monitoring Division, Solar Calculator
// (sunrise/sunset, zenith 90.833°) and "Solar Calculation Details";
// Meeus, Astronomical Algorithms, 2nd ed. (1998), ch. 15 (iterated rise and
// set).
func Events(date time.Time, latDeg, lonDeg float64, loc *time.Location) (Day, error) {
	if loc == nil {
		panic("sun: nil location")
	}
	if err := CheckSite(latDeg, lonDeg); err != nil {
		return Day{}, err
	}
	y, m, d := date.In(loc).Date()
	day := Day{Date: time.Date(y, m, d, 0, 0, 0, 0, loc)}

	noon := transit(time.Date(y, m, d, 12, 0, 0, 0, loc), lonDeg)
	day.SolarNoon = noon.In(loc)

	decl := EphemerisAt(noon).DeclinationDeg
	omega, polar := HourAngleAtZenithDeg(latDeg, decl, SunriseZenithDeg)
	switch polar {
	case PolarDay:
		day.Polar, day.DayLengthH = PolarDay, 24
		return day, nil
	case PolarNight:
		day.Polar, day.DayLengthH = PolarNight, 0
		return day, nil
	}
	rise := crossing(noon.Add(hours(-omega/15)), latDeg, lonDeg, -1)
	set := crossing(noon.Add(hours(omega/15)), latDeg, lonDeg, +1)
	day.Sunrise, day.Sunset = rise.In(loc), set.In(loc)
	day.DayLengthH = set.Sub(rise).Hours()
	return day, nil
}

const (
	maxIterations = 12
	convergedDeg  = 15.0 / 3600 / 1000 // 1 ms of hour angle
)

// transit refines t to the nearest instant where the hour angle is 0.
func transit(t time.Time, lonDeg float64) time.Time {
	for range maxIterations {
		ha := hourAngleDeg(t, lonDeg, EphemerisAt(t).EquationOfTimeMin)
		t = t.Add(hours(-ha / 15))
		if math.Abs(ha) < convergedDeg {
			break
		}
	}
	return t
}

// crossing refines t to where H = sign·ω(δ(t)): sign −1 for sunrise, +1 for
// sunset.
func crossing(t time.Time, latDeg, lonDeg, sign float64) time.Time {
	for range maxIterations {
		eph := EphemerisAt(t)
		ha := hourAngleDeg(t, lonDeg, eph.EquationOfTimeMin)
		omega, _ := HourAngleAtZenithDeg(latDeg, eph.DeclinationDeg, SunriseZenithDeg)
		diff := wrap180(ha - sign*omega)
		t = t.Add(hours(-diff / 15))
		if math.Abs(diff) < convergedDeg {
			break
		}
	}
	return t
}

// hours converts fractional hours to a Duration, rounded to the nanosecond.
func hours(h float64) time.Duration { return time.Duration(math.Round(h * float64(time.Hour))) }
