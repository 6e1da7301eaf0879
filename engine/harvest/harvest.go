package harvest

import "math"

// Panel is a small solar panel and its charger.
type Panel struct {
	AreaM2            float64
	Efficiency        float64 // at standard test conditions (1000 W/m², 25 °C cell)
	TempCoeffPerC     float64 // relative power change per °C above 25 °C, e.g. −0.004
	NOCTC             float64 // nominal operating cell temperature, °C
	ChargerEfficiency float64
}

// CellTempC is the panel's cell temperature under plane-of-array irradiance
// poaWm2 in air at ambientC, by the NOCT model:
//
//	Tc = Ta + (NOCT − 20 °C) · G / 800 W/m²
//
// (the simplified form, dropping the η/τα term, which is common practice for
// small panels).
//
// Reference: R. G. Ross, "Interface design considerations for terrestrial
// solar cell modules", Proc. 12th IEEE Photovoltaic Specialists Conf. (1976)
// 801–806; Duffie & Beckman, 4th ed. (2013), eq. 23.3.3 (from memory).
func (p Panel) CellTempC(ambientC, poaWm2 float64) float64 {
	return ambientC + (p.NOCTC-20)*max(poaWm2, 0)/800
}

// OutputW is the power into the cells' side of the charger:
//
//	P = A · G · η · (1 + γ (Tc − 25 °C)) · η_charger
//
// with G the effective plane-of-array irradiance (after incidence-angle,
// soiling and snow losses), the linear temperature coefficient γ of the
// panel's datasheet (common practice), never below zero.
func (p Panel) OutputW(effectivePOAWm2, ambientC float64) float64 {
	g := max(effectivePOAWm2, 0)
	tc := p.CellTempC(ambientC, g)
	return max(p.AreaM2*g*p.Efficiency*(1+p.TempCoeffPerC*(tc-25))*p.ChargerEfficiency, 0)
}

// IndoorCell is a photovoltaic cell for indoor light and its charger.
type IndoorCell struct {
	AreaM2            float64
	Efficiency        float64 // under the site's light source
	LuxPerWm2         float64 // luminous efficacy of that light, lm/W
	ChargerEfficiency float64
}

// OutputW is the power from illuminance lux:
//
//	P = A · (E_v / K) · η · η_charger
//
// with K the luminous efficacy of the light source (REFERENCE-VALUES §7:
// 280–350 lm/W for white LEDs and tri-phosphor fluorescent lamps, common
// practice).
func (c IndoorCell) OutputW(lux float64) float64 {
	return c.AreaM2 * max(lux, 0) / c.LuxPerWm2 * c.Efficiency * c.ChargerEfficiency
}

// HorizonDeg returns the obstruction elevation at azimuth azDeg (from north,
// clockwise) of a horizon profile sampled at len(profile) evenly spaced
// azimuths starting at north, interpolated linearly around the circle; 0 for
// an empty profile.
func HorizonDeg(profile []float64, azDeg float64) float64 {
	n := len(profile)
	if n == 0 || math.IsNaN(azDeg) {
		return 0
	}
	x := math.Mod(azDeg, 360)
	if x < 0 {
		x += 360
	}
	x *= float64(n) / 360
	i := int(x) % n
	f := x - math.Floor(x)
	return profile[i] + f*(profile[(i+1)%n]-profile[i])
}

// SnowCovered reports whether a panel at tiltDeg is under snow when the
// ground's snow depth is snowCm: any depth of 1 cm or more covers panels
// flatter than 60°, which shed snow slowly; steeper panels shed it (common
// practice — a deliberately simple rule, not a published snow-loss model).
func SnowCovered(snowCm, tiltDeg float64) bool {
	return snowCm >= 1 && tiltDeg < 60
}
