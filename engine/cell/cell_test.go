package cell

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestArrheniusRatioReferenceTable(t *testing.T) {
	// REFERENCE-VALUES §6.4 [CALC]: rate(T)/rate(20 °C) with Ea = 52.9 kJ/mol
	// (the doubling from 25 to 35 °C, unrounded: 52.948 kJ/mol),
	// R = 8.314462618 J/(mol·K); published to 4–5 significant digits.
	// Tolerance: half a unit in the last printed digit, or 1e-4 relative (the
	// issue's bound), whichever is larger.
	cases := []struct{ tempC, want, unit float64 }{
		{-20, 0.0323, 1e-4}, {0, 0.2038, 1e-4}, {10, 0.4643, 1e-4}, {30, 2.0475, 1e-4},
		{40, 4.0045, 1e-4}, {45, 5.5126, 1e-4}, {60, 13.576, 1e-3},
	}
	for _, c := range cases {
		got := ArrheniusRatio(ArrheniusEaCommon, 20, c.tempC)
		tol := max(c.unit/2, 1e-4*c.want)
		assert.Truef(t, math.Abs(got-c.want) <= tol,
			"ArrheniusRatio(Ea, 20, %g) = %.6g, want %g (tol %g)", c.tempC, got, c.want, tol)
	}
	// REFERENCE-VALUES §6.4 [CALC]: other activation energies, k30/k20 and k40/k20
	// (1 eV = 96485.33212 J/mol, CODATA).
	const eV = 96485.33212
	for _, c := range []struct{ ea, k30, k40 float64 }{{0.5, 1.921, 3.540}, {0.6, 2.189, 4.558}, {0.7, 2.494, 5.869}} {
		assert.InDeltaf(t, c.k30, ArrheniusRatio(c.ea*eV, 20, 30), 0.0006, "k30/k20 at %g eV", c.ea)
		assert.InDeltaf(t, c.k40, ArrheniusRatio(c.ea*eV, 20, 40), 0.0006, "k40/k20 at %g eV", c.ea)
	}
	// The common-practice Ea doubles the rate from 25 to 35 °C (its definition),
	// and is 52.9 kJ/mol to the printed digits (§6.4).
	assert.InDelta(t, 2.0, ArrheniusRatio(ArrheniusEaCommon, 25, 35), 1e-12)
	assert.InDelta(t, 52.9e3, ArrheniusEaCommon, 50)
}

func TestSelfDischargeRangesAndOrder(t *testing.T) {
	// Ranges per REFERENCE-VALUES §6.1 (handbook and Battery University
	// ranges, tested as ranges, not points), per year at 20 °C.
	ranges := map[string][2]float64{
		"li-socl2": {0.005, 0.02}, // ≤1 %/yr; Linden 1–2 %/yr
		"alkaline": {0.02, 0.04},  // 2–4 %/yr, BU-802b
		"li-ion":   {0.12, 0.60},  // 1–5 %/month, BU-802b
	}
	for id, r := range ranges {
		c, ok := Lookup(id)
		require.True(t, ok, id)
		assert.GreaterOrEqual(t, c.SelfDischargePerYear, r[0], id)
		assert.LessOrEqual(t, c.SelfDischargePerYear, r[1], id)
	}
	// Order, §6.1: Li-ion ≫ alkaline > Li-SOCl₂.
	liion, _ := Lookup("li-ion")
	alk, _ := Lookup("alkaline")
	socl2, _ := Lookup("li-socl2")
	assert.Greater(t, liion.SelfDischargePerYear, 3*alk.SelfDischargePerYear)
	assert.Greater(t, alk.SelfDischargePerYear, socl2.SelfDischargePerYear)
	// A hotter cell never self-discharges slower.
	for _, c := range Library() {
		prev := 0.0
		for temp := -40.0; temp <= 85; temp += 5 {
			rate := c.SelfDischargeAt(temp)
			assert.GreaterOrEqualf(t, rate, prev, "%s at %g °C", c.ID, temp)
			prev = rate
		}
		assert.InDelta(t, c.SelfDischargePerYear, c.SelfDischargeAt(20), 1e-15, c.ID)
	}
}

func TestUsableFraction(t *testing.T) {
	for _, c := range Library() {
		// The tables are relative to 20 °C.
		assert.Equal(t, 1.0, c.UsableFraction(20), c.ID)
		// Colder never gives more, from −60 °C up to 20 °C (REFERENCE-VALUES §6.2:
		// test monotonicity, not points).
		prev := 0.0
		for temp := -60.0; temp <= 20; temp += 0.5 {
			f := c.UsableFraction(temp)
			assert.GreaterOrEqualf(t, f, prev, "%s at %g °C", c.ID, temp)
			assert.Truef(t, f > 0 && f <= 1, "%s at %g °C: %g", c.ID, temp, f)
			prev = f
		}
		assert.Less(t, c.UsableFraction(-20), c.UsableFraction(20), c.ID)
		// Held at the end values beyond the table.
		assert.Equal(t, c.CapacityVsTemp[0].Fraction, c.UsableFraction(-100), c.ID)
		assert.Equal(t, c.CapacityVsTemp[len(c.CapacityVsTemp)-1].Fraction, c.UsableFraction(200), c.ID)
	}
	// REFERENCE-VALUES §6.2 ranges at −20 °C (common practice / from memory).
	for id, r := range map[string][2]float64{"li-socl2": {0.70, 0.85}, "alkaline": {0.10, 0.40}, "li-ion": {0.60, 0.75}} {
		c, _ := Lookup(id)
		f := c.UsableFraction(-20)
		assert.Truef(t, f >= r[0] && f <= r[1], "%s at −20 °C: %g, want %g–%g", id, f, r[0], r[1])
	}
	// Interpolation halfway between two rows.
	c, _ := Lookup("li-socl2")
	assert.InDelta(t, (0.93+1)/2, c.UsableFraction(10), 1e-12)
}

func TestLibraryComplete(t *testing.T) {
	for _, id := range []string{"li-socl2", "alkaline", "li-ion"} {
		c, ok := Lookup(id)
		require.True(t, ok, id)
		assert.NotEmpty(t, c.Forms, id)
		assert.NotEmpty(t, c.Sources, id)
		assert.Greater(t, c.NominalV, c.CutoffV, id)
		assert.Greater(t, c.MeanDischargeV, c.CutoffV, id)
		assert.LessOrEqual(t, c.MeanDischargeV, c.NominalV, id)
		for i := 1; i < len(c.CapacityVsTemp); i++ {
			assert.Greater(t, c.CapacityVsTemp[i].TempC, c.CapacityVsTemp[i-1].TempC, id)
		}
		if !c.Primary {
			// BU-410: no charging of lithium-ion below 0 °C (REFERENCE-VALUES §6.3).
			assert.GreaterOrEqual(t, c.ChargeMinC, 0.0, id)
		}
	}
	_, ok := Lookup("li-SOCl2")
	assert.False(t, ok, "identifiers are lower case")
}

func TestPack(t *testing.T) {
	c, _ := Lookup("alkaline")
	p := Pack{Chem: c, Series: 2, Parallel: 3, CellCapacityMAh: 2850}
	assert.Equal(t, 3.0, p.NominalV())
	assert.Equal(t, 8550.0, p.CapacityMAh())
	// 6 cells × 2.85 Ah × 1.25 V.
	assert.InDelta(t, 6*2.85*1.25, p.EnergyWh(), 1e-12)
}

func TestThermalTable(t *testing.T) {
	for _, c := range Library() {
		th := NewThermal(c)
		for temp := -90.0; temp <= 110; temp += 0.37 {
			u, sd := th.At(temp)
			assert.InDeltaf(t, c.UsableFraction(temp), u, 1e-12, "%s usable at %g °C", c.ID, temp)
			assert.InEpsilonf(t, c.SelfDischargeAt(temp), sd, 2e-5, "%s self-discharge at %g °C", c.ID, temp)
		}
		// Exact on the grid, where the closed-form tests sit.
		for _, temp := range []float64{-20, 0, 20, 40} {
			u, sd := th.At(temp)
			assert.Equal(t, c.UsableFraction(temp), u)
			assert.Equal(t, c.SelfDischargeAt(temp), sd)
		}
	}
}
