package sky_test

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/sky"
)

func TestLuxConversions(t *testing.T) {
	// REFERENCE-VALUES §7 table [CALC]: W/m² = lx / LER, printed to 3
	// decimals; tolerance 5e-4.
	cases := []struct{ lux, ler, want float64 }{
		{200, 280, 0.714}, {500, 280, 1.786}, {1000, 280, 3.571},
		{200, 300, 0.667}, {500, 300, 1.667}, {1000, 300, 3.333},
		{200, 330, 0.606}, {500, 330, 1.515}, {1000, 330, 3.030},
		{200, 350, 0.571}, {500, 350, 1.429}, {1000, 350, 2.857},
	}
	for _, c := range cases {
		got := sky.IrradianceFromLuxWm2(c.lux, c.ler)
		assert.Truef(t, withinAbsOrRel(got, c.want, 5e-4, 0), "IrradianceFromLuxWm2(%g, %g) = %.4f, want %.3f", c.lux, c.ler, got, c.want)
	}
	// Michael, Johnston & Moreno (2020) [SRC, abstract]: 1 sun outdoors =
	// 122 ± 1 klx.
	assert.InDelta(t, 122e3, sky.IlluminanceLx(1000, sky.DaylightLmPerW), 1e3)
	// §7: never convert indoor lux with the daylight factor. The same lux
	// under white LED light is 122/300 = 0.41 of the irradiance the daylight
	// factor would claim (so the daylight factor overstates it ~2.5×).
	ratio := sky.IrradianceFromLuxWm2(500, sky.IndoorWhiteLightLmPerW) / sky.IrradianceFromLuxWm2(500, sky.DaylightLmPerW)
	assert.InDelta(t, 0.41, ratio, 0.01)
	assert.InDelta(t, 1.667, sky.IrradianceFromLuxWm2(500, sky.IndoorWhiteLightLmPerW), 5e-4)
	assert.True(t, math.IsNaN(sky.IrradianceFromLuxWm2(500, 0)))
	assert.InDelta(t, 321.0, sky.IrradianceFromLuxWm2(sky.IlluminanceLx(321, 117), 117), 1e-12, "round trip")
}
