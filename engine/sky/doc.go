// Package sky turns the Sun's position into irradiance: extraterrestrial
// irradiance and irradiation (normal, horizontal, daily and over an
// interval), air mass (Kasten & Young), clear-sky global horizontal
// irradiance (Haurwitz), the beam/diffuse split of measured or modelled
// global irradiance (Erbs et al.), plane-of-array irradiance on a tilted
// surface (isotropic Liu & Jordan, and Hay & Davies, with ground
// reflection), the angle of incidence and incidence-angle modifiers (ASHRAE,
// Martin & Ruiz), and conversions between irradiance and illuminance.
//
// Units are W/m² for irradiance, Wh/m² for irradiation (energy per area over
// an interval), degrees for angles, azimuths from north clockwise, lux for
// illuminance. Every function is pure; instants are time.Time parameters.
//
// Valid range: the formulas hold for the Sun above the horizon. Below it,
// irradiance functions return 0 (no beam, no clear-sky light, no
// extraterrestrial irradiation), air mass returns NaN (it is undefined
// there), and negative irradiance inputs are treated as 0. NaN inputs give
// NaN outputs; nothing panics.
package sky
