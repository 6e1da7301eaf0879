// Package sun computes where the Sun is seen from a site on the Earth and when
// it rises, culminates and sets, with the NOAA solar calculator's equations:
// the low-accuracy solar coordinates of Meeus, Astronomical Algorithms
// (2nd ed., 1998, ch. 25 and 28), Smart's equation of time, and NOAA's
// piecewise atmospheric refraction. Angles are in degrees, azimuth from north
// clockwise, hour angle negative in the morning; instants are time.Time and
// the UTC instant is what counts (ΔT is ignored, as NOAA does).
//
// Valid range: NOAA states the equations are "very good for years between
// 1800 and 2100" and "sufficiently accurate for −1000 to 3000", with sunrise
// and sunset within a minute for |latitude| ≤ 72° (ten minutes beyond).
// Against a full ephemeris (astronomy-engine, 2000–2050, |latitude| < 65°,
// in the tests) positions agree within 0.015° in elevation and 0.04° in
// azimuth, and rise and set within 6 s. Julian days use the
// proleptic Gregorian calendar, so dates before 15 October 1582 are not the
// Julian-calendar dates of the astronomical literature.
//
// Outside the valid input range — a latitude beyond ±90° or any NaN or
// infinite coordinate — At returns a Position whose fields are all NaN, and
// Events returns a *CoordinateError; nothing panics. At the poles and in
// polar day and night, Events reports Polar "day" or "night" with zero rise
// and set times, never NaN or a made-up time.
package sun
