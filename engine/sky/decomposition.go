package sky

import "math"

// Irradiance is sunlight on the horizontal split into its components, W/m²:
// global (GHI), direct normal (DNI) and diffuse horizontal (DHI). When
// consistent, GHI = DNI·cos θz + DHI.
type Irradiance struct {
	GHIWm2, DNIWm2, DHIWm2 float64
}

const (
	// MinCosZenith bounds cos θz from below when computing the clearness
	// index, so that kt stays finite near sunrise and sunset: 0.065 is
	// θz = 86.273°, pvlib's default min_cos_zenith for its Erbs function
	// (pvlib-python documentation, irradiance.erbs).
	MinCosZenith = 0.065
	// MaxBeamZenithDeg is the zenith angle beyond which a decomposition sets
	// the beam to 0: pvlib's default max_zenith = 87° for its Erbs function
	// (pvlib-python documentation, irradiance.erbs).
	MaxBeamZenithDeg = 87.0
	// MaxClearnessIndex caps kt; 2.0 is pvlib's default
	// max_clearness_index, which "allows for over-irradiance events
	// typically seen in sub-hourly data" (pvlib-python documentation,
	// irradiance.clearness_index).
	MaxClearnessIndex = 2.0
)

// ClearnessIndex returns kt = GHI / (Gon · max(cos θz, MinCosZenith)),
// clipped to [0, MaxClearnessIndex], for a geometric zenith angle zenithDeg
// and extraterrestrial normal irradiance normalWm2. The floor on cos θz also
// applies with the Sun below the horizon (twilight GHI), as in pvlib. NaN
// inputs give NaN.
//
// Reference: Duffie & Beckman, Solar Engineering of Thermal Processes,
// 4th ed. (2013), §2.9 (the hourly clearness index kT = I/I0; section
// number from memory).
func ClearnessIndex(ghiWm2, zenithDeg, normalWm2 float64) float64 {
	if math.IsNaN(ghiWm2) || math.IsNaN(zenithDeg) || math.IsNaN(normalWm2) {
		return math.NaN()
	}
	if ghiWm2 <= 0 || normalWm2 <= 0 {
		return 0
	}
	kt := ghiWm2 / (normalWm2 * max(math.Cos(zenithDeg*deg2rad), MinCosZenith))
	return min(kt, MaxClearnessIndex)
}

// ErbsDiffuseFraction returns the hourly diffuse fraction DHI/GHI of Erbs,
// Klein & Duffie (1982) as a function of the clearness index kt:
//
//	kt ≤ 0.22:         1 − 0.09 kt
//	0.22 < kt ≤ 0.80:  0.9511 − 0.1604 kt + 4.388 kt² − 16.638 kt³ + 12.336 kt⁴
//	kt > 0.80:         0.165
//
// The published function is slightly discontinuous; as in pvlib, the lower
// piece owns each breakpoint (kt = 0.22 gives 0.98020, not the polynomial's
// 0.97993; kt = 0.80 gives the polynomial's 0.16527, not 0.165). A negative
// kt is treated as 0; NaN gives NaN.
//
// Reference: D. G. Erbs, S. A. Klein and J. A. Duffie, "Estimation of the
// diffuse radiation fraction for hourly, daily and monthly-average global
// radiation", Solar Energy 28(4), 293–302 (1982); Duffie & Beckman,
// 4th ed. (2013), §2.10 (section number from memory).
func ErbsDiffuseFraction(kt float64) float64 {
	switch {
	case math.IsNaN(kt):
		return math.NaN()
	case kt <= 0:
		return 1
	case kt <= 0.22:
		return 1 - 0.09*kt
	case kt <= 0.80:
		return 0.9511 + kt*(-0.1604+kt*(4.388+kt*(-16.638+kt*12.336)))
	default:
		return 0.165
	}
}

// Erbs splits a global horizontal irradiance into direct normal and diffuse
// horizontal with ErbsDiffuseFraction: DHI = DF·GHI, DNI = (GHI − DHI)/cos θz.
// zenithDeg is the geometric zenith angle and normalWm2 the extraterrestrial
// normal irradiance (NormalWm2). Beyond MaxBeamZenithDeg the beam is 0 and
// all of GHI is diffuse, so GHI = DNI·cos θz + DHI always holds (pvlib
// instead keeps DHI = DF·GHI there). A negative GHI is treated as 0.
//
// Reference: Erbs, Klein & Duffie, Solar Energy 28(4), 293–302 (1982).
func Erbs(ghiWm2, zenithDeg, normalWm2 float64) Irradiance {
	if math.IsNaN(ghiWm2) || math.IsNaN(zenithDeg) || math.IsNaN(normalWm2) {
		n := math.NaN()
		return Irradiance{n, n, n}
	}
	ghi := max(ghiWm2, 0)
	if zenithDeg >= MaxBeamZenithDeg {
		return Irradiance{GHIWm2: ghi, DHIWm2: ghi}
	}
	dhi := ErbsDiffuseFraction(ClearnessIndex(ghi, zenithDeg, normalWm2)) * ghi
	return Irradiance{GHIWm2: ghi, DNIWm2: (ghi - dhi) / math.Cos(zenithDeg*deg2rad), DHIWm2: dhi}
}

// DNIWm2 returns the direct normal irradiance that closes GHI = DNI·cos θz +
// DHI, (GHI − DHI)/cos θz, or 0 when that is negative or the zenith angle is
// at or beyond MaxBeamZenithDeg (where dividing by cos θz amplifies
// measurement error without bound).
func DNIWm2(ghiWm2, dhiWm2, zenithDeg float64) float64 {
	if math.IsNaN(ghiWm2) || math.IsNaN(dhiWm2) || math.IsNaN(zenithDeg) {
		return math.NaN()
	}
	if zenithDeg >= MaxBeamZenithDeg {
		return 0
	}
	return max((ghiWm2-dhiWm2)/math.Cos(zenithDeg*deg2rad), 0)
}
