package sim

import (
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
)

func withPeak(s scenario.Scenario, peakMA, minV float64) scenario.Scenario {
	s.Node.PeakMA, s.Node.MinInputV = &peakMA, &minV
	return s
}

func TestVoltageUnderPeakEndsLifeEarly(t *testing.T) {
	base := fixedScenario("li-socl2", "AA", 20)
	energy := Run(base)
	require.Equal(t, LimitEnergy, energy.FlatLimit)
	// A 100 mA burst through a bobbin AA cell drops about a quarter of a
	// volt (library resistance): a node that needs 3.2 V under it stops
	// while energy remains.
	volt := Run(withPeak(base, 100, 3.2))
	require.Equal(t, LimitVoltage, volt.FlatLimit)
	assert.True(t, volt.Flat.Before(energy.Flat))
	assert.True(t, volt.Flat.After(volt.Start.Add(24*time.Hour)), "but not at once: fresh cells hold it")
	// The cold raises the cells' resistance, so the same node stops sooner.
	cold := withPeak(fixedScenario("li-socl2", "AA", -30), 100, 3.2)
	coldR := Run(cold)
	assert.Equal(t, LimitVoltage, coldR.FlatLimit)
	assert.True(t, coldR.Flat.Before(volt.Flat))
	// With swaps planned, a voltage failure of worn cells is a swap.
	planned := withPeak(base, 100, 3.2)
	planned.Plan.ReservePct = 1
	p := Run(planned)
	require.NotEmpty(t, p.Swaps)
	assert.Equal(t, ReasonVoltage, p.Swaps[0].Reason)
	assert.Zero(t, p.BrownoutH)
	assert.InDelta(t, 0, p.Ledger.Imbalance(), 1e-9)
}

func TestFreshCellsTooWeakBrownOut(t *testing.T) {
	// 400 mA from one bobbin AA cell (rated 200 mA pulses) cannot hold 3 V
	// even when new: swapping does not help, so the plan records brown-outs.
	s := withPeak(fixedScenario("li-socl2", "AA", 20), 400, 3.0)
	s.Plan.Years, s.Plan.ReservePct = 1, 10
	r := Run(s)
	assert.Equal(t, LimitVoltage, r.FlatLimit)
	assert.Equal(t, r.Start, r.Flat)
	for _, sw := range r.Swaps {
		assert.NotEqual(t, ReasonVoltage, sw.Reason, "no swap for a failure fresh cells share")
	}
	assert.Equal(t, LimitVoltage, r.PlannedBrownoutLimit)
	assert.InDelta(t, r.End.Sub(r.Start).Hours(), r.BrownoutH, 1)
}

func TestTooColdForTheChemistry(t *testing.T) {
	// Alkaline cells are rated down to −18 °C (library): at −25 °C the node
	// is down from the start, whatever the swaps.
	s := fixedScenario("alkaline", "D", -25)
	s.Plan.Years, s.Plan.ReservePct = 1, 10
	r := Run(s)
	assert.Equal(t, LimitTemperature, r.FlatLimit)
	assert.Equal(t, LimitTemperature, r.PlannedBrownoutLimit)
	assert.InDelta(t, r.End.Sub(r.Start).Hours(), r.BrownoutH, 1)
	assert.Zero(t, r.Ledger.LoadWh.Total(), "the node never ran")
	assert.InDelta(t, 0, r.Ledger.Imbalance(), 1e-9)
}

func TestRechargeablesFadeToEndOfLife(t *testing.T) {
	// A panel keeps li-ion cells topped up for years; calendar and cycle fade
	// (3 %/yr at 20 °C and 500 cycles to 80 %, library) bring them to the
	// 80 % end of life, when the plan replaces them.
	s := panelScenario(45, 7, "Europe/Rome")
	s.Site.OutdoorMeanC, s.Site.OutdoorAnnualRangeC = 14, 18
	s.Plan.Years, s.Plan.ReservePct = 15, 5
	r := Run(s)
	var fades int
	for _, sw := range r.Swaps {
		if sw.Reason == ReasonFade {
			fades++
		}
	}
	assert.GreaterOrEqual(t, fades, 1, "swaps: %v", r.Swaps)
	assert.Greater(t, r.Ledger.FadeWh, 0.0)
	assert.InDelta(t, 0, r.Ledger.Imbalance(), 1e-9)
}
