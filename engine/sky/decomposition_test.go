package sky_test

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/sky"
)

func TestErbsDiffuseFraction(t *testing.T) {
	// REFERENCE-VALUES §4 [CALC] from the Erbs et al. (1982) correlation
	// (formula [SRC2]: pvlib and other implementations agree), printed to 4
	// decimals; tolerance 1e-4. At kt = 0.8 the lower (polynomial) piece
	// owns the breakpoint here, as in pvlib.
	cases := []struct{ kt, want float64 }{
		{0.1, 0.9910}, {0.2, 0.9820}, {0.22, 0.9802}, {0.3, 0.9486}, {0.4, 0.8400},
		{0.5, 0.6591}, {0.6, 0.4395}, {0.7, 0.2440}, {0.8, 0.1653}, {0.9, 0.165},
	}
	for _, c := range cases {
		got := sky.ErbsDiffuseFraction(c.kt)
		assert.Truef(t, withinAbsOrRel(got, c.want, 1e-4, 0), "ErbsDiffuseFraction(%g) = %.5f, want %.4f (tol 1e-4)", c.kt, got, c.want)
	}
	// Either side of each breakpoint (§4 [CALC], 5 decimals): 0.98020
	// (linear) at 0.22 and 0.97993 (polynomial) just above; 0.16527
	// (polynomial) at 0.80 and 0.165 just above.
	edges := []struct{ kt, want float64 }{
		{0.22, 0.98020}, {math.Nextafter(0.22, 1), 0.97993},
		{0.80, 0.16527}, {math.Nextafter(0.80, 1), 0.165},
	}
	for _, c := range edges {
		got := sky.ErbsDiffuseFraction(c.kt)
		assert.Truef(t, withinAbsOrRel(got, c.want, 5e-6, 0), "ErbsDiffuseFraction(%.17g) = %.6f, want %.5f", c.kt, got, c.want)
	}
	assert.Equal(t, 1.0, sky.ErbsDiffuseFraction(-0.1), "negative kt is treated as 0")
	assert.True(t, math.IsNaN(sky.ErbsDiffuseFraction(math.NaN())))
}

func TestErbsPvlibCases(t *testing.T) {
	// pvlib test_erbs and test_erbs_all_scalar [SRC2]: pvlib's Gon is
	// Spencer's series with 1366.1 W/m² (its default), so the same Gon is
	// passed here. Values printed to 9 digits; tolerance 1e-6 relative,
	// except the scalar case, which pvlib itself checks only to 1e-2
	// relative (its digits differ from the current Gon by 5e-5).
	cases := []struct {
		name         string
		ghi, zenith  float64
		doy          int
		dni, dhi, kt float64
		rel          float64
	}{
		{"2019-01-01, z 85°", 50, 85, 1, 96.7192672, 41.5703604, 0.405723511, 1e-6},
		{"2019-01-01, z 10°", 1000, 10, 1, 794.205651, 217.860117, 0.718132729, 1e-6},
		// Also REFERENCE-VALUES §4's regression case: DHI 170.8, DNI 842.0.
		{"2019-06-20, z 10°", 1000, 10, 171, 842.001578, 170.790318, 0.768214312, 1e-6},
		{"doy 180, z 10°", 1000, 10, 180, 842.358014, 170.439297, 0.768919470, 1e-2},
		{"night", 0, 120, 1, 0, 0, 0, 0},
	}
	for _, c := range cases {
		gon := 1366.1 * sky.SpencerFactor(c.doy)
		got := sky.Erbs(c.ghi, c.zenith, gon)
		kt := sky.ClearnessIndex(c.ghi, c.zenith, gon)
		assert.Truef(t, withinAbsOrRel(got.DNIWm2, c.dni, 1e-9, c.rel), "%s: DNI = %.6f, want %.6f", c.name, got.DNIWm2, c.dni)
		assert.Truef(t, withinAbsOrRel(got.DHIWm2, c.dhi, 1e-9, c.rel), "%s: DHI = %.6f, want %.6f", c.name, got.DHIWm2, c.dhi)
		assert.Truef(t, withinAbsOrRel(kt, c.kt, 1e-12, c.rel), "%s: kt = %.9f, want %.9f", c.name, kt, c.kt)
	}
	// pvlib test_erbs_min_cos_zenith_max_zenith, default limits, GHI 1 at
	// z = 90°, 2016-07-19 (day 201): kt = 0.01163776 (cos θz floored at
	// 0.065), DNI 0 beyond 87°, DHI = 1 [SRC2].
	gon := 1366.1 * sky.SpencerFactor(201)
	assert.InDelta(t, 0.01163776, sky.ClearnessIndex(1, 90, gon), 1e-8)
	got := sky.Erbs(1, 90, gon)
	assert.Equal(t, sky.Irradiance{GHIWm2: 1, DNIWm2: 0, DHIWm2: 1}, got)
}

func TestErbsClosureAndEdges(t *testing.T) {
	// The split always closes: GHI = DNI cos θz + DHI, and no component is
	// negative (zenith 0–95°, GHI 0–1400, Gon at the year's extremes).
	for z := 0.0; z <= 95; z += 0.5 {
		for ghi := 0.0; ghi <= 1400; ghi += 25 {
			for _, gon := range []float64{1316, 1413} {
				irr := sky.Erbs(ghi, z, gon)
				cz := math.Cos(z * math.Pi / 180)
				assert.InDeltaf(t, ghi, irr.DNIWm2*cz+irr.DHIWm2, 1e-9*max(ghi, 1), "closure at z %g GHI %g", z, ghi)
				assert.True(t, irr.DNIWm2 >= 0 && irr.DHIWm2 >= 0)
			}
		}
	}
	assert.Equal(t, sky.Irradiance{}, sky.Erbs(-5, 30, 1361), "negative GHI counts as 0")
	nan := sky.Erbs(math.NaN(), 30, 1361)
	assert.True(t, math.IsNaN(nan.GHIWm2) && math.IsNaN(nan.DNIWm2) && math.IsNaN(nan.DHIWm2))
	assert.True(t, math.IsNaN(sky.ClearnessIndex(100, math.NaN(), 1361)))
	assert.Equal(t, sky.MaxClearnessIndex, sky.ClearnessIndex(3000, 0, 1361), "kt is capped")
}

func TestDNIFromClosure(t *testing.T) {
	// pvlib test_dni [SRC2]: (GHI 100, DHI 50) at z 85° → 573.685662283,
	// at z 70° → 146.190220008. pvlib returns NaN for a negative result or
	// z > 88°; this engine returns 0 (no beam) there.
	assert.InDelta(t, 573.685662283, sky.DNIWm2(100, 50, 85), 1e-6)
	assert.InDelta(t, 146.190220008, sky.DNIWm2(100, 50, 70), 1e-6)
	assert.Equal(t, 0.0, sky.DNIWm2(90, 100, 80), "DHI > GHI gives no beam")
	assert.Equal(t, 0.0, sky.DNIWm2(100, 90, 100), "Sun below the horizon")
	assert.Equal(t, 0.0, sky.DNIWm2(100, 50, sky.MaxBeamZenithDeg))
	assert.True(t, math.IsNaN(sky.DNIWm2(math.NaN(), 50, 30)))
}
