package cell

import (
	"math"
	"strings"
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
	// ranges, tested as ranges, not points), fraction per year at 20 °C.
	cases := []struct {
		id     string
		lo, hi float64
	}{
		{"li-socl2", 0.005, 0.02}, // §6.1: ≤1 %/yr (makers 0.5–1 %/yr); Linden 1–2 %/yr
		{"li-mno2", 0.005, 0.015}, // §6.1: ~0.5–1.5 %/yr
		{"alkaline", 0.02, 0.04},  // §6.1: 2–4 %/yr, BU-802b
		{"li-ion", 0.12, 0.60},    // §6.1: 1–5 %/month, BU-802b
		{"lifepo4", 0.12, 0.36},   // §6.1: 1–3 %/month, common practice
		{"nimh-lsd", 0.10, 0.30},  // §6.1: ~15 %/yr; "roughly 10–30 %/yr" in its ordering
		// Not in §6.1: makers claim 20 years' shelf life for FR6 cells, i.e.
		// about 0.5–2 %/yr (from memory).
		{"li-fes2", 0.005, 0.02},
	}
	for _, c := range cases {
		chem, ok := Lookup(c.id)
		require.True(t, ok, c.id)
		sd := chem.SelfDischargePerYear
		assert.Truef(t, sd >= c.lo && sd <= c.hi, "%s.SelfDischargePerYear = %g, want %g–%g", c.id, sd, c.lo, c.hi)
	}

	// Order, §6.1: standard NiMH ≫ Li-ion ≈ LSD-NiMH ≫ alkaline > Li-MnO₂ ≳
	// Li-SOCl₂. "≫" is taken as at least 3× (the ranges above are 3× apart
	// or more). LiFePO₄ (§6.1: 1–3 %/month) sits with Li-ion; Li-FeS₂, with
	// its 20-year shelf-life claim, between Li-SOCl₂ and alkaline.
	sd := func(id string) float64 {
		c, ok := Lookup(id)
		require.True(t, ok, id)
		return c.SelfDischargePerYear
	}
	for _, high := range []string{"li-ion", "nimh-lsd", "lifepo4"} {
		assert.Greaterf(t, sd(high), 3*sd("alkaline"), "%s ≫ alkaline", high)
	}
	assert.Greater(t, sd("alkaline"), sd("li-mno2"), "alkaline > li-mno2")
	assert.GreaterOrEqual(t, sd("li-mno2"), sd("li-socl2"), "li-mno2 ≳ li-socl2")
	assert.Greater(t, sd("alkaline"), sd("li-fes2"), "alkaline > li-fes2")
	assert.GreaterOrEqual(t, sd("li-fes2"), sd("li-socl2"), "li-fes2 ≳ li-socl2")
	// Li-ion ≈ LSD-NiMH: within 3× of each other (§6.1 puts both at roughly
	// 10–30 %/yr).
	ratio := sd("li-ion") / sd("nimh-lsd")
	assert.Truef(t, ratio > 1.0/3 && ratio < 3, "li-ion / nimh-lsd self-discharge = %g, want within 3×", ratio)

	// A hotter cell never self-discharges slower.
	for _, c := range Library() {
		prev := 0.0
		for temp := -40.0; temp <= 85; temp += 5 {
			rate := c.SelfDischargeAt(temp)
			assert.GreaterOrEqualf(t, rate, prev, "%s at %g °C", c.ID, temp)
			prev = rate
		}
		assert.InDelta(t, c.SelfDischargePerYear, c.SelfDischargeAt(20), 1e-15, c.ID)
		assert.Positive(t, c.ActivationEnergyJPerMol, c.ID)
	}
}

func TestUsableFraction(t *testing.T) {
	for _, c := range Library() {
		// The tables are relative to 20 °C, span −40 to +60 °C and are sorted.
		assert.Equal(t, 1.0, c.UsableFraction(20), c.ID)
		require.NotEmpty(t, c.CapacityVsTemp, c.ID)
		assert.LessOrEqual(t, c.CapacityVsTemp[0].TempC, -40.0, c.ID)
		assert.GreaterOrEqual(t, c.CapacityVsTemp[len(c.CapacityVsTemp)-1].TempC, 60.0, c.ID)
		for i := 1; i < len(c.CapacityVsTemp); i++ {
			assert.Greater(t, c.CapacityVsTemp[i].TempC, c.CapacityVsTemp[i-1].TempC, c.ID)
		}
		// Colder never gives more, from −60 °C up to 20 °C (REFERENCE-VALUES §6.2:
		// test monotonicity, not points).
		prev := 0.0
		for temp := -60.0; temp <= 20; temp += 0.5 {
			f := c.UsableFraction(temp)
			assert.GreaterOrEqualf(t, f, prev, "%s at %g °C", c.ID, temp)
			assert.Truef(t, f > 0 && f <= 1, "%s at %g °C: %g", c.ID, temp, f)
			prev = f
		}
		// Above 20 °C the fraction stays in (0, 1] too.
		for temp := 20.0; temp <= 80; temp += 0.5 {
			f := c.UsableFraction(temp)
			assert.Truef(t, f > 0 && f <= 1, "%s at %g °C: %g", c.ID, temp, f)
		}
		assert.Less(t, c.UsableFraction(-20), c.UsableFraction(20), c.ID)
		// Held at the end values beyond the table.
		assert.Equal(t, c.CapacityVsTemp[0].Fraction, c.UsableFraction(-100), c.ID)
		assert.Equal(t, c.CapacityVsTemp[len(c.CapacityVsTemp)-1].Fraction, c.UsableFraction(200), c.ID)
	}
	// REFERENCE-VALUES §6.2 ranges at 0 °C and −20 °C (common practice / from
	// memory; low-to-moderate drain).
	ranges := []struct {
		id           string
		at0, atMinus []float64
	}{
		{"li-socl2", []float64{0.90, 0.97}, []float64{0.70, 0.85}},
		{"li-mno2", []float64{0.90, 0.95}, []float64{0.60, 0.80}},
		{"alkaline", []float64{0.70, 0.85}, []float64{0.10, 0.40}},
		{"li-ion", []float64{0.85, 0.90}, []float64{0.60, 0.75}},
		{"lifepo4", []float64{0.80, 0.90}, []float64{0.55, 0.70}},
		{"nimh-lsd", []float64{0.85, 0.90}, []float64{0.50, 0.70}},
	}
	for _, r := range ranges {
		c, ok := Lookup(r.id)
		require.True(t, ok, r.id)
		f0, f20 := c.UsableFraction(0), c.UsableFraction(-20)
		assert.Truef(t, f0 >= r.at0[0] && f0 <= r.at0[1], "%s.UsableFraction(0) = %g, want %g–%g", r.id, f0, r.at0[0], r.at0[1])
		assert.Truef(t, f20 >= r.atMinus[0] && f20 <= r.atMinus[1], "%s.UsableFraction(-20) = %g, want %g–%g", r.id, f20, r.atMinus[0], r.atMinus[1])
	}
	// Lithium iron disulfide exists because it beats alkaline in the cold
	// (common practice; Linden & Reddy, Li/FeS₂ section).
	fes2, _ := Lookup("li-fes2")
	alk, _ := Lookup("alkaline")
	for _, temp := range []float64{-40, -20, 0} {
		assert.Greaterf(t, fes2.UsableFraction(temp), alk.UsableFraction(temp), "li-fes2 vs alkaline at %g °C", temp)
	}
	// Interpolation halfway between two rows, from a hand-made table.
	c := Chemistry{CapacityVsTemp: []TempPoint{{-20, 0.5}, {0, 0.9}, {20, 1}}}
	assert.InDelta(t, 0.7, c.UsableFraction(-10), 1e-12)
	assert.InDelta(t, 0.95, c.UsableFraction(10), 1e-12)
}

func TestLibraryComplete(t *testing.T) {
	want := []string{"alkaline", "li-fes2", "li-ion", "li-mno2", "li-socl2", "lifepo4", "nimh-lsd"}
	assert.Equal(t, want, IDs(), "the seven chemistries of issue 4, sorted")
	for _, id := range want {
		c, ok := Lookup(id)
		require.True(t, ok, id)
		assert.Equal(t, id, c.ID)
		assert.Equal(t, strings.ToLower(id), id, "identifiers are lower case")
		assert.NotEmpty(t, c.Name, id)
		assert.NotEmpty(t, c.Forms, id)
		assert.NotEmpty(t, c.Sources, id)
		assert.Greater(t, c.NominalV, c.CutoffV, id)
		assert.Greater(t, c.MeanDischargeV, c.CutoffV, id)
		assert.LessOrEqual(t, c.MeanDischargeV, c.NominalV, id)
		if !c.Primary {
			// BU-410: no charging of lithium-ion below 0 °C (REFERENCE-VALUES §6.3).
			assert.GreaterOrEqual(t, c.ChargeMinC, 0.0, id)
		}
	}
	_, ok := Lookup("li-SOCl2")
	assert.False(t, ok, "identifiers are lower case")
	// The three chemistries other packages and the CLI name keep their
	// identifiers, names and form names.
	for _, k := range []struct {
		id, name string
		forms    []string
	}{
		{"li-socl2", "lithium thionyl chloride (bobbin)", []string{"AA", "C", "D"}},
		{"alkaline", "alkaline zinc–manganese dioxide", []string{"AAA", "AA", "C", "D"}},
		{"li-ion", "lithium-ion (NMC/LCO)", []string{"18650", "21700"}},
	} {
		c, _ := Lookup(k.id)
		assert.Equal(t, k.name, c.Name)
		assert.Subset(t, c.FormNames(), k.forms, k.id)
	}
	// Library returns a fresh copy each call.
	a := Library()
	a[0].Forms[0].CapacityMAh = -1
	a[0].CapacityVsTemp[0].Fraction = -1
	b := Library()
	assert.Positive(t, b[0].Forms[0].CapacityMAh)
	assert.Positive(t, b[0].CapacityVsTemp[0].Fraction)
}

func TestPack(t *testing.T) {
	c, _ := Lookup("alkaline")
	p := Pack{Chem: c, Series: 2, Parallel: 3, CellCapacityMAh: 2850} // AA, low drain
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
