package sim

import (
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/cell"
)

// testPack is a made-up single cell: 1 Ah at a mean 3.3 V (3.3 Wh), an OCV
// falling linearly from 3.6 V full to 3.0 V empty, 1 Ω at every temperature.
func testPack() cell.Pack {
	c := cell.Chemistry{ID: "test", Name: "test cell", NominalV: 3.3, MeanDischargeV: 3.3, CutoffV: 3.0,
		OperatingMinC: -20, OperatingMaxC: 60, ChargeMinC: 0, ChargeMaxC: 45, MaxChargeC: 1, ChargeEfficiency: 1,
		CapacityVsTemp: []cell.TempPoint{{TempC: 20, Fraction: 1}},
		OCV:            []cell.SoCPoint{{SoC: 0, V: 3.0}, {SoC: 1, V: 3.6}},
		Forms:          []cell.Form{{Name: "X", CapacityMAh: 1000, ResistanceMOhm: 1000, MaxContinuousMA: 500, MaxPulseMA: 1000}}}
	return cell.Pack{Chem: c, Form: c.Forms[0], Series: 1, Parallel: 1, CellCapacityMAh: 1000}
}

func env(load, harvest float64) *stepEnv {
	return &stepEnv{tempC: 20, tempOK: true, usable: 1, rOhm: 1, dtH: 1, loadWh: load, harvestWh: harvest}
}

// stepOf runs one whole step with e's voltage threshold set for m.
func stepOf(m *packModel, c *cellSet, e *stepEnv) stepResult {
	e.socMin = m.socMinAt(e.rOhm)
	var r stepResult
	m.step(c, e, 1, &r)
	return r
}

func TestVoltageLimitUnderPeak(t *testing.T) {
	// 0.5 A peak through 1 Ω drops 0.5 V: with a 3.2 V minimum the OCV must
	// stay above 3.7 V — never, so the very first step fails on voltage;
	// with a 3.0 V minimum the OCV must stay above 3.5 V, i.e. SoC above 5/6.
	m := newPackModel(testPack(), 0.5, 3.2)
	c := newCellSet(m.ratedWh)
	assert.Equal(t, LimitVoltage, stepOf(m, &c, env(0.01, 0)).limit)

	m = newPackModel(testPack(), 0.5, 3.0)
	c = newCellSet(m.ratedWh)
	steps := 0
	for ; steps < 1000; steps++ {
		if r := stepOf(m, &c, env(0.012, 0)); r.limit != "" {
			assert.Equal(t, LimitVoltage, r.limit)
			break
		}
	}
	// 3.3 Wh × (1 − 5/6) = 0.55 Wh at 0.012 Wh a step: 45.8 steps, so the
	// 46th step is the first below 5/6.
	assert.Equal(t, 46, steps+1)
}

func TestTemperatureLimitStopsTheNode(t *testing.T) {
	m := newPackModel(testPack(), 0.001, 2)
	c := newCellSet(m.ratedWh)
	e := env(0.5, 2)
	e.tempC, e.tempOK, e.sdWh = -30, false, 0.01
	r := stepOf(m, &c, e)
	assert.Equal(t, LimitTemperature, r.limit)
	assert.Zero(t, r.drawnWh, "the node is down")
	assert.Equal(t, 0.01, r.sdWh, "the cells still self-discharge")
	assert.Equal(t, 2.0, r.unusedWh, "the harvest is unused")
	assert.InDelta(t, m.ratedWh-0.01, c.storedWh, 1e-12)
}

func TestHarvestFeedsTheLoadFirst(t *testing.T) {
	m := newPackModel(testPack(), 0.001, 2)
	c := newCellSet(m.ratedWh)
	c.storedWh = 2
	r := stepOf(m, &c, env(0.3, 0.5))
	assert.Equal(t, 0.3, r.directWh)
	assert.Zero(t, r.drawnWh)
	assert.InDelta(t, 0.2, r.storedWh, 1e-12, "the surplus goes in (efficiency 1)")
	assert.InDelta(t, 2.2, c.storedWh, 1e-12)
}

func TestFadeShrinksCapacity(t *testing.T) {
	p := testPack()
	p.Chem.CalendarFadePerYear, p.Chem.FadeEaJPerMol, p.Chem.EndOfLife = 0.2, cell.ArrheniusEaCommon, 0.8
	m := newPackModel(p, 0.001, 2)
	c := newCellSet(m.ratedWh)
	e := env(0, 0)
	e.calFadePer = p.Chem.CalendarFadeAt(20) / HoursPerYear
	for range 8766 { // a year of hourly steps at 20 °C
		stepOf(m, &c, e)
	}
	assert.InDelta(t, 0.8, c.health, 1e-9, "20 % a year at 20 °C")
	assert.InDelta(t, 0.8*m.ratedWh, c.storedWh, 1e-9, "the energy above the capacity is lost")
	// Cycle fade: per equivalent full cycle drawn.
	p.Chem.CalendarFadePerYear, p.Chem.CycleFadePerCycle = 0, 0.001
	m = newPackModel(p, 0.001, 2)
	c = newCellSet(m.ratedWh)
	stepOf(m, &c, env(m.ratedWh/2, 0)) // half a cycle
	assert.InDelta(t, 1-0.0005, c.health, 1e-12)
}

func TestFlatWithinAStep(t *testing.T) {
	m := newPackModel(testPack(), 0.001, 2)
	c := newCellSet(m.ratedWh)
	c.storedWh = 0.25
	r := stepOf(m, &c, env(1, 0))
	assert.Equal(t, LimitEnergy, r.limit)
	assert.InDelta(t, 0.25, r.carried, 1e-12)
	assert.InDelta(t, 0.25, r.drawnWh, 1e-12)
	assert.InDelta(t, 0, c.storedWh, 1e-12)
}
