package sky

import "math"

// StandardPressurePa is the standard sea-level atmospheric pressure (ISO 2533
// standard atmosphere), the reference of relative air mass.
const StandardPressurePa = 101325.0

// AirMassKastenYoung returns the relative optical air mass for an apparent
// (refracted) zenith angle z in degrees:
//
//	AM = 1 / (cos z + 0.50572 (96.07995 − z)^−1.6364)
//
// AM is about 1 at the zenith and 37.9 at the horizon. Above z = 90° the Sun
// is below the horizon and AM is undefined: the function returns NaN there,
// for a negative zenith angle and for NaN.
//
// Reference: F. Kasten and A. T. Young, "Revised optical air mass tables and
// approximation formula", Applied Optics 28(22), 4735–4738 (1989), the
// approximation formula (eq. 3 there, from memory).
func AirMassKastenYoung(apparentZenithDeg float64) float64 {
	z := apparentZenithDeg
	if !(z >= 0 && z <= 90) {
		return math.NaN()
	}
	return 1 / (math.Cos(z*deg2rad) + 0.50572*math.Pow(96.07995-z, -1.6364)) // Kasten & Young (1989)
}

// AbsoluteAirMass scales a relative air mass to site pressure:
// AM·p/101325 Pa (Kasten & Young 1989, pressure correction).
func AbsoluteAirMass(relativeAirMass, pressurePa float64) float64 {
	return relativeAirMass * pressurePa / StandardPressurePa
}
