package sky_test

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/sky"
)

func TestAirMassKastenYoung(t *testing.T) {
	// REFERENCE-VALUES §2: the formula's values [CALC], with pvlib's test
	// expectations for z = 0, 80 and 89.9 [SRC2]. Printed to 4 decimals;
	// tolerance 1e-4 (pvlib uses 1e-3). Pitfall §9.3: apparent zenith.
	// At 90° the formula gives 37.92, not the paper's tabulated 38.09.
	cases := []struct{ z, want float64 }{
		{0, 0.9997}, {30, 1.1540}, {45, 1.4126}, {48.19, 1.4980}, {60, 1.9943},
		{70, 2.9031}, {75, 3.8129}, {80, 5.5860}, {85, 10.3058}, {88, 19.4332},
		{89.9, 36.4668}, {90, 37.9196},
	}
	for _, c := range cases {
		got := sky.AirMassKastenYoung(c.z)
		assert.Truef(t, withinAbsOrRel(got, c.want, 1e-4, 0), "AirMassKastenYoung(%g) = %.5f, want %.4f (tol 1e-4)", c.z, got, c.want)
	}
	// Below the horizon the air mass is undefined: NaN, as for NaN input.
	for _, z := range []float64{90.001, 120, -1, math.NaN(), math.Inf(1)} {
		assert.Truef(t, math.IsNaN(sky.AirMassKastenYoung(z)), "AirMassKastenYoung(%g) must be NaN", z)
	}
	// Absolute air mass scales with pressure: AM·p/101325 Pa (§2).
	assert.InDelta(t, 1.9943*81500/101325, sky.AbsoluteAirMass(sky.AirMassKastenYoung(60), 81500), 1e-4)
}
