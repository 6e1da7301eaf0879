// Package climate gives the temperature the node's cells sit at, hour by hour,
// from the site's placement: a constant for an indoor space or a
// fixed-temperature room, and for outdoor nodes a seasonal curve.
//
// The outdoor curve in this version is the first harmonic of the annual cycle
// plus a daily cosine (common practice): coldest in mid-January (mid-July in
// the southern hemisphere), warmest at 15:00 local time. Monthly normals, a
// published diurnal method, sun on the enclosure and typical-year weather
// files replace it later; the scenario fields it reads keep their meaning.
// Any latitude and temperature is accepted; the caller bounds them.
package climate
