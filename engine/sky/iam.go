package sky

import "math"

// ASHRAEB0 is the usual coefficient of the ASHRAE incidence-angle modifier
// for glass-covered modules: 0.05 is pvlib's default "b", "typical values
// are on the order of 0.05" (pvlib-python documentation, iam.ashrae).
const ASHRAEB0 = 0.05

// MartinRuizAr is the usual angular-loss coefficient of the Martin & Ruiz
// modifier: 0.16 is pvlib's default a_r for flat-plate modules, "generally on
// the order of 0.08 to 0.25" (pvlib-python documentation, iam.martin_ruiz).
const MartinRuizAr = 0.16

// IAMASHRAE returns the ASHRAE incidence-angle modifier, the beam
// transmittance relative to normal incidence, at angle of incidence aoiDeg:
//
//	K(θ) = 1 − b0 (1/cos θ − 1)
//
// clipped to [0, 1]; 0 for |θ| ≥ 90°. NaN gives NaN.
//
// Reference: A. F. Souka and H. H. Safwat, "Determination of the optimum
// orientations for the double-exposure, flat-plate collector and its
// reflectors", Solar Energy 10(4), 170–174 (1966); ASHRAE Standard 93-77;
// Duffie & Beckman, 4th ed. (2013), §6.17 (section number from memory).
func IAMASHRAE(aoiDeg, b0 float64) float64 {
	if math.IsNaN(aoiDeg) || math.IsNaN(b0) {
		return math.NaN()
	}
	if math.Abs(aoiDeg) >= 90 {
		return 0
	}
	k := 1 - b0*(1/math.Cos(aoiDeg*deg2rad)-1)
	return max(0, min(1, k))
}

// IAMMartinRuiz returns the Martin & Ruiz incidence-angle modifier at angle
// of incidence aoiDeg with angular-loss coefficient ar:
//
//	K(θ) = (1 − exp(−cos θ / ar)) / (1 − exp(−1/ar))
//
// 1 at normal incidence, 0 for |θ| ≥ 90°. NaN gives NaN; ar ≤ 0 gives NaN.
//
// Reference: N. Martin and J. M. Ruiz, "Calculation of the PV modules angular
// losses under field conditions by means of an analytical model", Solar
// Energy Materials and Solar Cells 70(1), 25–38 (2001), eq. 4 (as 1 − K) and
// its corrigendum.
func IAMMartinRuiz(aoiDeg, ar float64) float64 {
	if math.IsNaN(aoiDeg) || !(ar > 0) {
		return math.NaN()
	}
	if math.Abs(aoiDeg) >= 90 {
		return 0
	}
	return -math.Expm1(-math.Cos(aoiDeg*deg2rad)/ar) / -math.Expm1(-1/ar) // Martin & Ruiz eq. 4
}
