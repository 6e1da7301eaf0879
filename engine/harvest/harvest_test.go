package harvest

import (
	"fmt"
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestPanelByHand(t *testing.T) {
	p := Panel{AreaM2: 40e-4, Efficiency: 0.17, TempCoeffPerC: -0.004, NOCTC: 45, ChargerEfficiency: 0.8}
	// At NOCT conditions (800 W/m², 20 °C air) the cell sits at NOCT: the
	// model's definition.
	assert.InDelta(t, 45, p.CellTempC(20, 800), 1e-12)
	// Hand-computed: 1000 W/m² at 10 °C air → Tc = 10 + 25·1000/800 = 41.25 °C;
	// P = 0.004 m² · 1000 · 0.17 · (1 − 0.004·16.25) · 0.8 = 0.50864 W.
	assert.InDelta(t, 0.004*1000*0.17*(1-0.004*16.25)*0.8, p.OutputW(1000, 10), 1e-12)
	assert.InDelta(t, 0.50864, p.OutputW(1000, 10), 1e-5)
	assert.Zero(t, p.OutputW(-5, 10))
	// Hotter cells give less.
	assert.Less(t, p.OutputW(800, 35), p.OutputW(800, 5))
}

func TestIndoorCellByHand(t *testing.T) {
	// REFERENCE-VALUES §7 [CALC]: 500 lx at 300 lm/W is 1.667 W/m²; × 5 % ≈
	// 83 mW/m² (the section's "≈ 80 mW/m²"); 20 cm² and an 80 % charger give
	// 0.002 · 1.6667 · 0.05 · 0.8 = 133.3 µW.
	c := IndoorCell{AreaM2: 20e-4, Efficiency: 0.05, LuxPerWm2: 300, ChargerEfficiency: 0.8}
	assert.InDelta(t, 133.33e-6, c.OutputW(500), 1e-8)
	assert.Zero(t, c.OutputW(0))
}

func TestHorizon(t *testing.T) {
	profile := []float64{0, 10, 20, 10} // N, E, S, W
	cases := []struct{ az, want float64 }{{0, 0}, {90, 10}, {135, 15}, {180, 20}, {315, 5}, {360, 0}, {-45, 5}, {720 + 90, 10}}
	for _, c := range cases {
		assert.InDeltaf(t, c.want, HorizonDeg(profile, c.az), 1e-12, "azimuth %g", c.az)
	}
	assert.Zero(t, HorizonDeg(nil, 123))
	assert.Equal(t, 7.0, HorizonDeg([]float64{7}, 200))
}

func TestSnow(t *testing.T) {
	assert.True(t, SnowCovered(5, 30))
	assert.False(t, SnowCovered(0.5, 30))
	assert.False(t, SnowCovered(50, 75))
	assert.False(t, SnowCovered(math.NaN(), 30), "a file without snow depth never covers")
}

func ExamplePanel_OutputW() {
	p := Panel{AreaM2: 40e-4, Efficiency: 0.17, TempCoeffPerC: -0.004, NOCTC: 45, ChargerEfficiency: 0.8}
	for _, g := range []float64{200, 600, 1000} {
		fmt.Printf("%4.0f W/m² at 20 °C: %.0f mW\n", g, p.OutputW(g, 20)*1000)
	}
	// Hand-checked: Tc = 20 + 25·G/800; P = 0.004·G·0.17·(1 − 0.004(Tc − 25))·0.8.
	// Output:
	//  200 W/m² at 20 °C: 108 mW
	//  600 W/m² at 20 °C: 308 mW
	// 1000 W/m² at 20 °C: 487 mW
}
