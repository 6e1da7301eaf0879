package sun

import "time"

const (
	// unixEpochJD is the Julian day of 1970-01-01T00:00:00Z (Meeus, ch. 7:
	// JD 2440587.5 is 1970 January 1.0).
	unixEpochJD = 2440587.5
	// j2000Unix is 2000-01-01T12:00:00Z in Unix seconds, the J2000.0 epoch
	// JD 2451545.0 taken on the UT scale (NOAA ignores ΔT = TT − UT).
	j2000Unix = 946728000
	// J2000 is the Julian day of the J2000.0 epoch (Meeus, eq. 25.1).
	J2000 = 2451545.0

	secondsPerDay     = 86400.0
	daysPerCentury    = 36525.0 // Julian century (Meeus, eq. 25.1)
	secondsPerCentury = secondsPerDay * daysPerCentury
)

// JulianDay returns the Julian day of t's UTC instant: days since noon UT,
// 1 January 4713 BC (Julian calendar), with the fraction of the day.
//
// Go's time package counts in the proleptic Gregorian calendar, so this is
// Meeus's eq. 7.1 with the Gregorian correction B = 2 − A + ⌊A/4⌋ applied at
// every date; it equals the astronomical Julian day from 15 October 1582 on
// and is exact to the float64 resolution (about 40 µs at the present epoch).
//
// Reference: J. Meeus, Astronomical Algorithms, 2nd ed. (Willmann-Bell,
// 1998), ch. 7.
func JulianDay(t time.Time) float64 {
	sec, ns := t.Unix(), t.Nanosecond()
	return unixEpochJD + (float64(sec)+float64(ns)*1e-9)/secondsPerDay
}

// JulianCentury returns the Julian centuries of 36525 days from J2000.0 to
// t's UTC instant, T = (JD − 2451545)/36525 (Meeus, eq. 25.1; NOAA uses UT for
// TT). It is computed from the seconds since the epoch, not from the Julian
// day, to keep the full float64 resolution.
func JulianCentury(t time.Time) float64 {
	sec, ns := t.Unix()-j2000Unix, t.Nanosecond()
	return (float64(sec) + float64(ns)*1e-9) / secondsPerCentury
}
