package sky

import "math"

// Luminous efficacies of radiation, lumens per watt of radiant power, to
// convert between illuminance (lux) and irradiance (W/m²).
const (
	// DaylightLmPerW is outdoor global daylight: Michael, Johnston & Moreno
	// (2020) measured 1 sun (1000 W/m²) outdoors as 122 ± 1 klx, i.e. 122 lx
	// per W/m² (their LED solar simulator: 116 ± 3). Low sun and overcast
	// skies differ; their literature survey spans 21–131 lx per W/m².
	// Reference: Michael, Johnston and Moreno, "A conversion guide: solar
	// irradiance and lux illuminance", Journal of Measurements in
	// Engineering (2020), doi:10.21595/jme.2020.21667 (title from memory).
	DaylightLmPerW = 122.0
	// IndoorWhiteLightLmPerW is white phosphor LEDs and tri-phosphor
	// fluorescent lamps, which emit almost only in 400–700 nm: 280–350 lm/W,
	// 300 taken here (common practice), so 1000 lx ≈ 3.3 W/m². Never convert
	// indoor lux with the daylight value: 1000 lx would become 8.2 W/m²,
	// overstating the indoor irradiance about 2.5-fold (122 vs 300 lm/W).
	IndoorWhiteLightLmPerW = 300.0
)

// IlluminanceLx returns the illuminance, in lux, of an irradiance of
// irradianceWm2 with luminous efficacy lmPerW: E_v = K·E_e.
func IlluminanceLx(irradianceWm2, lmPerW float64) float64 { return irradianceWm2 * lmPerW }

// IrradianceFromLuxWm2 returns the irradiance, in W/m², of an illuminance of
// lux from a light source with luminous efficacy lmPerW: E_e = E_v/K. A
// lmPerW ≤ 0 gives NaN.
func IrradianceFromLuxWm2(lux, lmPerW float64) float64 {
	if !(lmPerW > 0) {
		return math.NaN()
	}
	return lux / lmPerW
}
