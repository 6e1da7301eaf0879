package sim

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
)

// withDayHarvest returns the scenario's Year with a harvest of dayW from 06:00
// to 18:00 UTC every day and none at night.
func withDayHarvest(s scenario.Scenario, dayW float64) *Year {
	y := mustYear(s)
	y.HarvestW = make([]float64, len(y.TempC))
	for i := range y.HarvestW {
		if m := (i % y.PerDay) * y.ResMin; m >= 360 && m < 1080 {
			y.HarvestW[i] = dayW
		}
	}
	return y
}

func TestHarvestRechargesInsideTheChargeWindow(t *testing.T) {
	s := fixedScenario("li-ion", "18650", 20)
	s.Plan.Years, s.Plan.ReservePct = 3, 10
	loadW := Run(s).LoadW.Total()
	// By day the harvest is four times the load: the surplus covers the night.
	r := RunWith(s, withDayHarvest(s, 4*loadW))
	assert.True(t, r.Flat.IsZero(), "recharged cells never go flat")
	assert.Empty(t, r.Swaps)
	assert.Greater(t, r.MinSoCPct, 90.0)
	l := r.Ledger
	assert.InDelta(t, 0, l.Imbalance(), 1e-9)
	assert.Greater(t, l.HarvestUnusedWh, 0.0, "full cells leave harvest unused")
	// Half the hours carry harvest at 4× load: harvested = 2 × load over the horizon.
	assert.InEpsilon(t, 2*l.LoadWh.Total(), l.HarvestedWh, 1e-3)
	// Charge loss is the charge inefficiency (1 − 0.95) of what the cells
	// accepted: the harvest less what stayed unused and what fed the load
	// directly (half the load: the daytime half of every day).
	accepted := l.HarvestedWh - l.HarvestUnusedWh - 0.5*l.LoadWh.Total()
	assert.InEpsilon(t, 0.05, l.ChargeLossWh/accepted, 1e-6)
}

func TestNoChargingBelowFreezing(t *testing.T) {
	// BU-410 (REFERENCE-VALUES §6.3): no lithium-ion charging below 0 °C.
	s := fixedScenario("li-ion", "18650", -5)
	s.Plan.Years, s.Plan.ReservePct = 5, 0
	loadW := Run(s).LoadW.Total()
	r := RunWith(s, withDayHarvest(s, 4*loadW))
	l := r.Ledger
	assert.InDelta(t, 0, l.Imbalance(), 1e-9)
	assert.Zero(t, l.ChargeLossWh, "nothing was charged")
	// All of the surplus is unused: harvest by day beyond the load.
	assert.InEpsilon(t, l.HarvestedWh-0.5*l.LoadWh.Total(), l.HarvestUnusedWh, 1e-3)
	// The cells carry the night alone and go flat: usable / (load/2 + self-discharge).
	require.False(t, r.Flat.IsZero())
	pack := PackFor(s)
	usable := pack.EnergyWh() * pack.Chem.UsableFraction(-5)
	wantH := usable / (loadW/2 + pack.Chem.SelfDischargeAt(-5)*pack.EnergyWh()/HoursPerYear)
	assert.InEpsilon(t, wantH, r.Flat.Sub(r.Start).Hours(), 0.01)
}

func TestPrimaryCellsAreNeverCharged(t *testing.T) {
	s := fixedScenario("li-socl2", "AA", 20)
	s.Plan.Years, s.Plan.ReservePct = 3, 10
	loadW := Run(s).LoadW.Total()
	r := RunWith(s, withDayHarvest(s, 4*loadW))
	l := r.Ledger
	assert.InDelta(t, 0, l.Imbalance(), 1e-9)
	assert.Zero(t, l.ChargeLossWh)
	assert.InEpsilon(t, l.HarvestedWh-0.5*l.LoadWh.Total(), l.HarvestUnusedWh, 1e-3)
	// The harvest still carries the load by day, so the cells last twice as long
	// as without it (less self-discharge, which does not halve).
	plain := Run(s)
	assert.Greater(t, r.Flat.Sub(r.Start).Hours(), 1.9*plain.Flat.Sub(plain.Start).Hours())
}

func TestFullCellsTakeNoMore(t *testing.T) {
	s := fixedScenario("li-ion", "18650", 20)
	s.Plan.Years, s.Plan.ReservePct = 1, 0
	s.Node.Vision.FPS, s.Node.Events.PerHour, s.Node.SleepUW = 0, 0, 0
	// With no load, a harvest of 100 W can only make up self-discharge: full
	// cells take nothing more.
	y := mustYear(s)
	y.HarvestW = make([]float64, len(y.TempC))
	for i := range y.HarvestW {
		y.HarvestW[i] = 100
	}
	r := RunWith(s, y)
	l := r.Ledger
	assert.InDelta(t, 0, l.Imbalance(), 1e-9)
	// Full cells store nothing more: everything but self-discharge make-up is unused.
	assert.InEpsilon(t, l.SelfDischargeWh/0.95, l.HarvestedWh-l.HarvestUnusedWh, 1e-6)
}

func TestChargerRules(t *testing.T) {
	liion := PackFor(fixedScenario("li-ion", "18650", 20))
	c := newCharger(liion)
	// The charge rate limit is MaxChargeC × rated capacity × nominal voltage
	// (0.5 C standard charge, common practice); the efficiency the library's.
	full := liion.EnergyWh()
	maxW := liion.Chem.MaxChargeC * liion.CapacityMAh() / 1000 * liion.NominalV()
	eff := liion.Chem.ChargeEfficiency
	require.Greater(t, maxW, 1.0, "cases below assume a rate limit above 1 W")
	cases := []struct {
		name                  string
		e, surplus, temp, dtH float64
		stored, lost, unused  float64
	}{
		{"within every limit", full / 2, 1, 20, 1, eff, 1 - eff, 0},
		{"rate limit", 0, maxW + 5, 20, 1, maxW * eff, maxW * (1 - eff), 5},
		{"rate limit, short step", 0, maxW, 20, 1.0 / 6, maxW / 6 * eff, maxW / 6 * (1 - eff), maxW * 5 / 6},
		{"room limit", full - eff, 5, 20, 1, eff, 1 - eff, 4},
		{"full", full, 5, 20, 1, 0, 0, 5},
		{"below 0 °C (BU-410)", full / 2, 1, -0.1, 1, 0, 0, 1},
		{"above 45 °C (BU-410)", full / 2, 1, 45.1, 1, 0, 0, 1},
		{"at 0 °C", full / 2, 1, 0, 1, eff, 1 - eff, 0},
		{"no surplus", full / 2, 0, 20, 1, 0, 0, 0},
	}
	for _, k := range cases {
		stored, lost, unused := c.charge(k.e, full, k.surplus, k.temp, k.dtH)
		assert.InDeltaf(t, k.stored, stored, 1e-12, "%s: stored", k.name)
		assert.InDeltaf(t, k.lost, lost, 1e-12, "%s: lost", k.name)
		assert.InDeltaf(t, k.unused, unused, 1e-12, "%s: unused", k.name)
	}
	// A faded pack fills to its reduced capacity.
	stored, _, _ := c.charge(0.7*full, 0.8*full, 5, 20, 1)
	assert.InDelta(t, 0.1*full, stored, 1e-12)
	primary := newCharger(PackFor(fixedScenario("li-socl2", "D", 20)))
	stored, lost, unused := primary.charge(1, 60, 3, 20, 1)
	assert.Equal(t, [3]float64{0, 0, 3}, [3]float64{stored, lost, unused}, "primary cells are never charged")
}
