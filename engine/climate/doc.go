// Package climate gives the air or room temperature a node sits in, hour by
// hour: a constant for an indoor space or a fixed-temperature room, and
// outdoors either monthly normals (mean daily minimum and maximum, month by
// month) shaped into days by Parton & Logan's diurnal curve, or — for
// scenarios written before monthly normals existed — a seasonal cosine from
// an annual mean and ranges. Built-in presets of our own give monthly normals,
// clearness and panel losses for six climate types.
//
// Times are local mean solar time (day of year and hour), so the daily
// minimum falls near sunrise and the maximum in the afternoon wherever the
// site is in its time zone. Any latitude is accepted: in polar day and night
// the diurnal curve falls back to a cosine.
package climate
