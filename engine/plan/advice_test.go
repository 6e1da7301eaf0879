package plan

import (
	"context"
	"errors"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
	"nodelife/engine/sim"
)

// panelNode is an outdoor li-ion node with a panel in a snowy continental
// climate at 60° N, on a cell too small to bridge the winter alone: the
// weather decides how small the panel may be.
func panelNode() scenario.Scenario {
	s := scenario.Demo()
	s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "cold-continental"
	s.Harvest.Kind = scenario.HarvestPanel
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "14500"
	s.Plan.Years, s.Plan.WeatherYears = 2, 20
	return s
}

func advise(t *testing.T, s scenario.Scenario) (Result, Advice) {
	t.Helper()
	r, err := Plan(context.Background(), s, Inputs{}, AdviceOptions{})
	require.NoError(t, err)
	require.NotNil(t, r.Advice)
	return r, *r.Advice
}

// The returned panel carries the node through the plan in the bad weather
// year and the ladder step below does not (the check).
func TestPanelSizingIsTheSmallestThatWorks(t *testing.T) {
	s := panelNode()
	_, a := advise(t, s)
	z := a.Panel
	require.NotNil(t, z)
	require.True(t, z.Works, "%+v", z)
	require.NotNil(t, z.NextSmallerCm2)
	factors := WeatherYear(s, z.WeatherYearDraw)
	run := func(area float64) sim.Result {
		v := s
		v.Harvest.Panel.AreaCm2 = area
		y, err := sim.NewYear(v, nil)
		require.NoError(t, err)
		return sim.RunOpts(v, y, sim.Options{DayFactor: factors})
	}
	assert.True(t, run(*z.AreaCm2).Flat.IsZero(), "%g cm² must carry the node", *z.AreaCm2)
	assert.False(t, run(*z.NextSmallerCm2).Flat.IsZero(), "%g cm² must not", *z.NextSmallerCm2)
	// Ladder neighbours: the ISO 3 R10 step below.
	assert.InDelta(t, *z.AreaCm2/1.26, *z.NextSmallerCm2, *z.AreaCm2*0.03)
}

func TestNoPanelSizeWorks(t *testing.T) {
	// Svalbard: a polar night of months; no panel carries an 18650 through it.
	s := panelNode()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 78.2, 15.6, "Arctic/Longyearbyen"
	s.Site.Climate.Preset = "subarctic"
	s.Plan.WeatherYears = 3
	_, a := advise(t, s)
	require.NotNil(t, a.Panel)
	assert.False(t, a.Panel.Works)
	assert.NotEmpty(t, a.Panel.Reason)
	// Primary cells cannot store harvest at all.
	s = panelNode()
	s.Cells.Chemistry, s.Cells.Form = "li-socl2", "AA"
	_, a = advise(t, s)
	assert.False(t, a.Panel.Works)
	assert.Contains(t, a.Panel.Reason, "primary cells")
}

func TestWeatherDrawsRepeat(t *testing.T) {
	s := panelNode()
	s.Harvest.Panel.AreaCm2 = 2 // small: the winter decides
	s.Plan.Years = 3
	_, a := advise(t, s)
	_, b := advise(t, s)
	assert.Equal(t, a.Weather, b.Weather, "same seed, same answer")
	s.Plan.Seed = 99
	_, c := advise(t, s)
	assert.NotEqual(t, a.Weather.WorstWeek, c.Weather.WorstWeek, "another seed, other years")
	w := a.Weather
	assert.True(t, w.Sensitive)
	// P90 (reached in 90 % of the years) never above P50, nor P50 above P10.
	if w.LifetimeP90Days != nil && w.LifetimeP50Days != nil {
		assert.LessOrEqual(t, *w.LifetimeP90Days, *w.LifetimeP50Days)
	}
	if w.LifetimeP50Days != nil && w.LifetimeP10Days != nil {
		assert.LessOrEqual(t, *w.LifetimeP50Days, *w.LifetimeP10Days)
	}
	if w.LifetimeP90Days == nil {
		assert.Nil(t, w.LifetimeP50Days, "if 90 % outlive the plan, so do half")
	}
	assert.True(t, w.BrownoutBeforeSwapProb >= 0 && w.BrownoutBeforeSwapProb <= 1)
}

func TestLeverSigns(t *testing.T) {
	r, a := advise(t, scenario.Demo())
	require.NotNil(t, r.LifetimeDays)
	byInput := map[string]Lever{}
	for _, l := range a.Levers {
		byInput[l.Input] = l
	}
	require.Contains(t, byInput, "node.vision.fps")
	require.Contains(t, byInput, "cells.capacity_mah")
	assert.Less(t, *byInput["node.vision.fps"].LifetimeChangePct, 0.0, "more frames, shorter life")
	assert.Greater(t, *byInput["cells.capacity_mah"].LifetimeChangePct, 0.0, "more capacity, longer life")
	// Ranked by the size of the change.
	for i := 1; i < len(a.Levers); i++ {
		prev, cur := a.Levers[i-1].LifetimeChangePct, a.Levers[i].LifetimeChangePct
		assert.GreaterOrEqual(t, abs(*prev), abs(*cur))
	}
	assert.NotEmpty(t, a.Sentences)
	assert.Greater(t, a.Autonomy.Days, 0.0)
	require.NotNil(t, a.Cells)
	assert.True(t, a.Cells.Works)
}

func TestAdviceCancels(t *testing.T) {
	ctx, cancel := context.WithCancel(context.Background())
	s := panelNode()
	var calls int
	_, err := Plan(ctx, s, Inputs{}, AdviceOptions{Progress: func(done, total int) {
		calls++
		if done == 3 {
			cancel()
		}
	}})
	assert.True(t, errors.Is(err, context.Canceled))
	assert.Equal(t, 3, calls, "stopped at the next run")
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

func BenchmarkWeather100Years(b *testing.B) {
	s := panelNode()
	s.Plan.Years, s.Plan.WeatherYears = 5, 100
	r, _ := Run(s)
	for b.Loop() {
		a := &adviser{ctx: context.Background(), s: s, base: r}
		for i := range s.Plan.WeatherYears {
			if _, err := a.simulate(s, WeatherYear(s, i)); err != nil {
				b.Fatal(err)
			}
		}
	}
}

func BenchmarkPanelSizing(b *testing.B) {
	s := panelNode()
	s.Plan.Years = 5
	r, _ := Run(s)
	f := WeatherYear(s, 0)
	for b.Loop() {
		a := &adviser{ctx: context.Background(), s: s, base: r}
		if _, err := a.sizePanel(f, 0); err != nil {
			b.Fatal(err)
		}
	}
}

// Days of autonomy speak of bridging a spell without harvest: the sentence
// is for nodes with a harvester (without one, it would repeat the lifetime).
func TestAutonomySentenceOnlyWithAHarvester(t *testing.T) {
	_, a := advise(t, scenario.Demo())
	for _, line := range a.Sentences {
		assert.NotContains(t, line, "with no harvest", "the demo has no harvester")
	}
	s := panelNode()
	s.Plan.WeatherYears = 2
	_, a = advise(t, s)
	var found bool
	for _, line := range a.Sentences {
		found = found || strings.Contains(line, "with no harvest")
	}
	assert.True(t, found, "%q", a.Sentences)
}
