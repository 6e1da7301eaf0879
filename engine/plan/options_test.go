package plan

import (
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"slices"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
)

// moneyTol is the tolerance on costs: the sums are of a few products of
// short decimals, exact to far better than this.
const moneyTol = 1e-9

// handResult is a planned result written by hand: a lifetime in days (nil:
// the cells outlive the plan) and the visit dates of its swaps.
func handResult(lifetimeDays *float64, lifetime string, swapDates ...string) Result {
	r := Result{LifetimeDays: lifetimeDays, Lifetime: lifetime, Swaps: []Swap{}}
	for _, d := range swapDates {
		r.Swaps = append(r.Swaps, Swap{Date: d, Due: d, Reason: "reserve"})
	}
	return r
}

func lifeDays(d float64) *float64 { return &d }

// handOptions are three variants of the demo with results written by hand.
// The demo names no costs, so it has the defaults of fields.go: EUR, 9 a
// cell, 15 a harvester, 0.2 a cm², 120 a visit; plan.years is 8.
func handOptions() []Option {
	// A: the demo as it is: one lithium thionyl chloride D cell, no harvester.
	a := scenario.Demo()
	// B: two 18650 li-ion cells in parallel at 6.5 each, a 40 cm² panel.
	b := scenario.Demo()
	b.Site.Placement = scenario.Outdoor
	b.Cells.Chemistry, b.Cells.Form, b.Cells.Parallel = "li-ion", "18650", 2
	b.Harvest.Kind, b.Harvest.Panel.AreaCm2 = scenario.HarvestPanel, 40
	b.Cost.Cell = 6.5
	// C: two 18650 LiFePO4 cells in series at 5 each, a 25 cm² indoor-light
	// cell. The panel area stays at 40 cm²: only the indoor area counts.
	c := scenario.Demo()
	c.Cells.Chemistry, c.Cells.Form, c.Cells.Series = "lifepo4", "18650", 2
	c.Harvest.Kind, c.Harvest.Indoor.AreaCm2, c.Harvest.Panel.AreaCm2 = scenario.HarvestIndoor, 25, 40
	c.Cost.Cell = 5

	rb := handResult(nil, "more than 8 y")
	rb.BrownoutHours = 12.5
	return []Option{
		{Name: "D primary", Scenario: a, Result: handResult(lifeDays(1778.2), "4 y 10 mo", "2031-07-04")},
		{Name: "18650 + 40 cm² panel", Scenario: b, Result: rb},
		{Name: "indoor cell", Scenario: c, Result: handResult(lifeDays(700), "1 y 11 mo", "2028-12-04", "2030-10-01", "2032-08-02")},
	}
}

func TestCompareCosts(t *testing.T) {
	c, err := Compare(handOptions())
	require.NoError(t, err)
	assert.Equal(t, ComparisonFormat, c.Format)
	assert.Equal(t, "EUR", c.Currency)
	assert.Equal(t, 8, c.Years)

	type want struct {
		perSet, sets, swaps                     int
		area                                    float64
		cells, harvester, visits, total, yearly float64
		firstSwap                               string // "" for none
	}
	wants := []want{
		// A: 1×1 = 1 cell a set; 1 + 1 swap = 2 sets; 1 × 2 × 9 = 18.
		// No harvester: 0. Visits 1 × 120 = 120. Total 18 + 0 + 120 = 138;
		// 138 / 8 = 17.25 a year.
		{perSet: 1, sets: 2, swaps: 1, area: 0, cells: 18, harvester: 0, visits: 120, total: 138, yearly: 17.25, firstSwap: "2031-07-04"},
		// B: 1×2 = 2 cells a set; no swap, 1 set; 2 × 1 × 6.5 = 13. Panel
		// 15 + 40 × 0.2 = 23. Visits 0. Total 13 + 23 = 36; 36 / 8 = 4.5.
		{perSet: 2, sets: 1, swaps: 0, area: 40, cells: 13, harvester: 23, visits: 0, total: 36, yearly: 4.5},
		// C: 2×1 = 2 cells a set; 1 + 3 swaps = 4 sets; 2 × 4 × 5 = 40.
		// Indoor cell 15 + 25 × 0.2 = 20. Visits 3 × 120 = 360. Total
		// 40 + 20 + 360 = 420; 420 / 8 = 52.5.
		{perSet: 2, sets: 4, swaps: 3, area: 25, cells: 40, harvester: 20, visits: 360, total: 420, yearly: 52.5, firstSwap: "2028-12-04"},
	}
	require.Len(t, c.Options, len(wants))
	for i, w := range wants {
		o := c.Options[i]
		assert.Equalf(t, w.perSet, o.CellsPerSet, "%s: cells_per_set", o.Name)
		assert.Equalf(t, w.sets, o.CellSets, "%s: cell_sets", o.Name)
		assert.Equalf(t, w.swaps, o.Swaps, "%s: swaps", o.Name)
		assert.InDeltaf(t, w.area, o.HarvesterAreaCm2, moneyTol, "%s: harvester_area_cm2", o.Name)
		assert.InDeltaf(t, w.cells, o.CostCells, moneyTol, "%s: cost_cells", o.Name)
		assert.InDeltaf(t, w.harvester, o.CostHarvester, moneyTol, "%s: cost_harvester", o.Name)
		assert.InDeltaf(t, w.visits, o.CostVisits, moneyTol, "%s: cost_visits", o.Name)
		assert.InDeltaf(t, w.total, o.CostTotal, moneyTol, "%s: cost_total", o.Name)
		assert.InDeltaf(t, w.yearly, o.CostPerYear, moneyTol, "%s: cost_per_year", o.Name)
		if w.firstSwap == "" {
			assert.Nilf(t, o.FirstSwap, "%s: first_swap", o.Name)
		} else if assert.NotNilf(t, o.FirstSwap, "%s: first_swap", o.Name) {
			assert.Equalf(t, w.firstSwap, *o.FirstSwap, "%s: first_swap", o.Name)
		}
	}
	// What passes through from the scenario and the result.
	assert.Equal(t, "li-socl2", c.Options[0].Chemistry)
	assert.Equal(t, "D", c.Options[0].Form)
	assert.Equal(t, []string{"none", "panel", "indoor"}, []string{c.Options[0].Harvester, c.Options[1].Harvester, c.Options[2].Harvester})
	assert.Equal(t, 12.5, c.Options[1].BrownoutHours)
	assert.Nil(t, c.Options[1].LifetimeDays)
	assert.Equal(t, "more than 8 y", c.Options[1].Lifetime)
	assert.Equal(t, 1778.2, *c.Options[0].LifetimeDays)

	// B is cheapest (36 < 138 < 420) and lasts longest (it outlives the
	// plan); C is dearest, 420 − 36 = 384 more.
	assert.Equal(t, []string{"18650 + 40 cm² panel"}, c.Cheapest)
	assert.Equal(t, []string{"18650 + 40 cm² panel"}, c.LongestLasting)
	assert.Equal(t, []string{
		`"18650 + 40 cm² panel" is the cheapest over 8 years: 36.00 EUR in all, 4.50 EUR a year.`,
		`"indoor cell" is the dearest: 420.00 EUR, 384.00 EUR more.`,
		`"18650 + 40 cm² panel" lasts longest: its first cells outlive the 8-year plan.`,
	}, c.Summary)
}

func TestCompareTies(t *testing.T) {
	hand := handOptions()
	a, b, cc := hand[0], hand[1], hand[2]
	rename := func(o Option, name string) Option { o.Name = name; return o }
	// A2 is A with a lifetime 0.3 days shorter: the same whole day (1778).
	a2 := rename(a, "D primary, second batch")
	a2.Result = handResult(lifeDays(1777.9), "4 y 10 mo", "2031-07-04")

	cases := []struct {
		name    string
		opts    []Option
		cheap   []string
		longest []string
		summary []string
	}{{
		// Both 138 EUR (17.25 a year, see TestCompareCosts); both 1778 days.
		name: "all tie", opts: []Option{a, a2},
		cheap: []string{"D primary", "D primary, second batch"}, longest: []string{"D primary", "D primary, second batch"},
		summary: []string{
			"All options cost the same over 8 years: 138.00 EUR each, 17.25 EUR a year.",
			"All options last as long: their first cells go flat after 4 y 10 mo.",
		},
	}, {
		// B 36 is cheapest; A and A2 tie dearest at 138, 138 − 36 = 102 more.
		name: "dearest tie", opts: []Option{a, b, a2},
		cheap: []string{"18650 + 40 cm² panel"}, longest: []string{"18650 + 40 cm² panel"},
		summary: []string{
			`"18650 + 40 cm² panel" is the cheapest over 8 years: 36.00 EUR in all, 4.50 EUR a year.`,
			`"D primary" and "D primary, second batch" are the dearest: 138.00 EUR each, 102.00 EUR more.`,
			`"18650 + 40 cm² panel" lasts longest: its first cells outlive the 8-year plan.`,
		},
	}, {
		// B and B2 tie cheapest at 36 (4.50 a year) and both outlive the
		// plan; C is dearest at 420, 420 − 36 = 384 more. A (1778 d) lasts
		// longer than C (700 d) but neither outlives the plan.
		name: "cheapest and longest tie", opts: []Option{b, cc, rename(b, "B2"), a},
		cheap: []string{"18650 + 40 cm² panel", "B2"}, longest: []string{"18650 + 40 cm² panel", "B2"},
		summary: []string{
			`"18650 + 40 cm² panel" and "B2" are the cheapest over 8 years: 36.00 EUR each in all, 4.50 EUR a year.`,
			`"indoor cell" is the dearest: 420.00 EUR, 384.00 EUR more.`,
			`"18650 + 40 cm² panel" and "B2" last longest: their first cells outlive the 8-year plan.`,
		},
	}, {
		// A 138 against C 420: A is cheapest, C dearest by 282, and A's
		// 1778 days beat C's 700.
		name: "finite lifetimes", opts: []Option{cc, a},
		cheap: []string{"D primary"}, longest: []string{"D primary"},
		summary: []string{
			`"D primary" is the cheapest over 8 years: 138.00 EUR in all, 17.25 EUR a year.`,
			`"indoor cell" is the dearest: 420.00 EUR, 282.00 EUR more.`,
			`"D primary" lasts longest: its first cells go flat after 4 y 10 mo.`,
		},
	}}
	for _, tc := range cases {
		c, err := Compare(tc.opts)
		require.NoError(t, err, tc.name)
		assert.Equal(t, tc.cheap, c.Cheapest, tc.name)
		assert.Equal(t, tc.longest, c.LongestLasting, tc.name)
		assert.Equal(t, tc.summary, c.Summary, tc.name)
	}
}

func TestCompareOneYear(t *testing.T) {
	opts := handOptions()[:2]
	for i := range opts {
		opts[i].Scenario.Plan.Years = 1
	}
	c, err := Compare(opts)
	require.NoError(t, err)
	// A: 138 over 1 year is 138 a year; B 36. "year", not "years".
	assert.InDelta(t, 138, c.Options[0].CostPerYear, moneyTol)
	assert.Equal(t, `"18650 + 40 cm² panel" is the cheapest over 1 year: 36.00 EUR in all, 36.00 EUR a year.`, c.Summary[0])
	assert.Equal(t, `"18650 + 40 cm² panel" lasts longest: its first cells outlive the 1-year plan.`, c.Summary[2])
}

func TestCompareErrors(t *testing.T) {
	hand := handOptions()
	for _, n := range []int{0, 1, 5} {
		opts := slices.Repeat(hand[:1], n)
		_, err := Compare(opts)
		require.Errorf(t, err, "%d options", n)
		assert.ErrorIsf(t, err, ErrOptionCount, "%d options", n)
		assert.Containsf(t, err.Error(), fmt.Sprintf("%d given (allowed: 2 to 4)", n), "%d options", n)
	}

	opts := handOptions()
	opts[2].Scenario.Cost.Currency = "USD"
	_, err := Compare(opts)
	assert.ErrorIs(t, err, ErrCurrency)
	var oe *OptionError
	require.True(t, errors.As(err, &oe))
	assert.Equal(t, 2, oe.Index)
	assert.Equal(t, "cost.currency", oe.Path)
	assert.Equal(t, `option "indoor cell": cost.currency: "USD" differs from "EUR" in option "D primary" (allowed: one currency for every option)`, err.Error())
	files := []string{"a.json", "b.json", "c.json"}
	assert.Equal(t, `cost.currency: "USD" differs from "EUR" in a.json (allowed: one currency for every option)`,
		oe.Message(func(i int) string { return files[i] }))

	opts = handOptions()
	opts[1].Scenario.Plan.Years = 10
	_, err = Compare(opts)
	assert.ErrorIs(t, err, ErrHorizon)
	assert.Equal(t, `option "18650 + 40 cm² panel": plan.years: 10 differs from 8 in option "D primary" (allowed: one horizon for every option)`, err.Error())

	opts = handOptions()[:2]
	opts[0].Scenario.Plan.Years, opts[1].Scenario.Plan.Years = 0, 0
	_, err = Compare(opts)
	assert.ErrorIs(t, err, ErrHorizon)
	assert.Contains(t, err.Error(), "0 is out of range (allowed: at least 1 year)")
}

func TestCompareUnnamed(t *testing.T) {
	opts := handOptions()
	opts[1].Name = ""
	c, err := Compare(opts)
	require.NoError(t, err)
	assert.Equal(t, "option 2", c.Options[1].Name)
	assert.Equal(t, []string{"option 2"}, c.Cheapest)
}

// TestCompareDemoOptions compares planned variants of the demo. Swap counts
// come from the simulation; each is checked against what the lifetime
// allows before the costs are checked by hand.
func TestCompareDemoOptions(t *testing.T) {
	d := scenario.Demo()
	// An 18650 li-ion cell with a 40 cm² panel outdoors.
	panel := scenario.Demo()
	panel.Site.Placement = scenario.Outdoor
	panel.Cells.Chemistry, panel.Cells.Form = "li-ion", "18650"
	panel.Harvest.Kind, panel.Harvest.Panel.AreaCm2 = scenario.HarvestPanel, 40
	// The same cell with a 20 cm² indoor-light cell under the store's lights.
	indoor := scenario.Demo()
	indoor.Cells.Chemistry, indoor.Cells.Form = "li-ion", "18650"
	indoor.Harvest.Kind, indoor.Harvest.Indoor.AreaCm2 = scenario.HarvestIndoor, 20

	var opts []Option
	for _, o := range []struct {
		name string
		s    scenario.Scenario
	}{{"D primary", d}, {"18650 + 40 cm² panel", panel}, {"18650 + indoor cell", indoor}} {
		opts = append(opts, Option{Name: o.name, Scenario: o.s, Result: mustRun(t, o.s)})
	}
	c, err := Compare(opts)
	require.NoError(t, err)
	prim, pan, ind := c.Options[0], c.Options[1], c.Options[2]

	// The demo's cells go flat after 4 y 10 mo (ExampleRun), so one swap in
	// the 8-year plan; the fresh set, installed 2031-07-04, would need about
	// 4 y 10 mo again, past the plan's end on 2035-03-01.
	require.Equal(t, 1, prim.Swaps)
	// 1 cell × 2 sets × 9 = 18; 1 visit × 120 = 120; 138 in all; 17.25 a year.
	assert.InDelta(t, 18, prim.CostCells, moneyTol)
	assert.InDelta(t, 0, prim.CostHarvester, moneyTol)
	assert.InDelta(t, 120, prim.CostVisits, moneyTol)
	assert.InDelta(t, 138, prim.CostTotal, moneyTol)
	assert.InDelta(t, 17.25, prim.CostPerYear, moneyTol)

	// A 40 cm², 17 % panel peaks near 0.68 W against a 1.5 mW load, and a
	// full 18650 (10.8 Wh) carries the node about 300 days (10.8 Wh /
	// 35.6 mWh a day) through the months too cold to charge: no swap.
	require.Equal(t, 0, pan.Swaps)
	assert.Nil(t, pan.LifetimeDays)
	// 1 cell × 1 set × 9 = 9; panel 15 + 40 × 0.2 = 23; no visit; 32 in
	// all; 32 / 8 = 4 a year.
	assert.InDelta(t, 9, pan.CostCells, moneyTol)
	assert.InDelta(t, 23, pan.CostHarvester, moneyTol)
	assert.InDelta(t, 0, pan.CostVisits, moneyTol)
	assert.InDelta(t, 32, pan.CostTotal, moneyTol)
	assert.InDelta(t, 4, pan.CostPerYear, moneyTol)

	// 20 cm² at 5 % under 500 lx (about 0.17 mW while open) does not carry
	// the node: each set lasts at most the first set's lifetime (the
	// indoor temperature is constant), and visits come before the cells go
	// flat, so over 8 years (2922 days) at least ⌈2922 / lifetime⌉ sets.
	require.NotNil(t, ind.LifetimeDays)
	minSets := int(math.Ceil(2922 / *ind.LifetimeDays))
	assert.GreaterOrEqual(t, ind.CellSets, minSets)
	n := float64(ind.Swaps)
	// (1 + n) × 9 for cells; 15 + 20 × 0.2 = 19 for the indoor cell;
	// n × 120 for visits.
	assert.InDelta(t, (1+n)*9, ind.CostCells, moneyTol)
	assert.InDelta(t, 19, ind.CostHarvester, moneyTol)
	assert.InDelta(t, n*120, ind.CostVisits, moneyTol)
	assert.InDelta(t, (1+n)*9+19+n*120, ind.CostTotal, moneyTol)

	// The results' cautions come along: a lithium primary cell, a panel.
	assert.Contains(t, codesOfOption(prim), "lithium-primary")
	assert.Contains(t, codesOfOption(pan), "solar-installation")

	assert.Equal(t, []string{"18650 + 40 cm² panel"}, c.Cheapest)
	assert.Equal(t, []string{"18650 + 40 cm² panel"}, c.LongestLasting)
	assert.Equal(t, `"18650 + 40 cm² panel" is the cheapest over 8 years: 32.00 EUR in all, 4.00 EUR a year.`, c.Summary[0])
}

func TestComparisonJSONKeys(t *testing.T) {
	c, err := Compare(handOptions())
	require.NoError(t, err)
	b, err := json.Marshal(c)
	require.NoError(t, err)
	var m map[string]any
	require.NoError(t, json.Unmarshal(b, &m))
	assert.ElementsMatch(t, []string{"format", "currency", "years", "options", "cheapest", "longest_lasting", "summary"}, jsonKeys(m))
	o := m["options"].([]any)[1].(map[string]any)
	assert.ElementsMatch(t, []string{"name", "chemistry", "form", "cells_per_set", "cell_sets", "harvester", "harvester_area_cm2",
		"lifetime_days", "lifetime", "first_brownout", "swaps", "first_swap", "brownout_hours", "cautions",
		"cost_cells", "cost_harvester", "cost_visits", "cost_total", "cost_per_year"}, jsonKeys(o))
	// Cells that outlive the plan and no swap give null, not a missing key.
	assert.Nil(t, o["lifetime_days"])
	assert.Nil(t, o["first_swap"])
	assert.Equal(t, 36.0, o["cost_total"])
	assert.Equal(t, []any{}, o["cautions"]) // none in a hand-made result: [] not null
}

func codesOfOption(o OptionCost) []string {
	var cs []string
	for _, c := range o.Cautions {
		cs = append(cs, c.Code)
	}
	return cs
}

func jsonKeys(m map[string]any) []string {
	var ks []string
	for k := range m {
		ks = append(ks, k)
	}
	return ks
}

func TestFormatMoney(t *testing.T) {
	cases := []struct {
		x    float64
		want string
	}{
		{138, "138.00 EUR"},
		{4.375, "4.38 EUR"}, // exact in binary, a halfway case: to the even digit (strconv)
		{-0.001, "0.00 EUR"},
		{1234.5, "1234.50 EUR"},
	}
	for _, c := range cases {
		assert.Equalf(t, c.want, FormatMoney(c.x, "EUR"), "FormatMoney(%g)", c.x)
	}
}

func ExampleCompare() {
	primary := scenario.Demo()
	panel := scenario.Demo()
	panel.Site.Placement = scenario.Outdoor
	panel.Cells.Chemistry, panel.Cells.Form = "li-ion", "18650"
	panel.Harvest.Kind, panel.Harvest.Panel.AreaCm2 = scenario.HarvestPanel, 40
	var opts []Option
	for _, o := range []Option{{Name: "D cell", Scenario: primary}, {Name: "18650 + panel", Scenario: panel}} {
		r, err := Run(o.Scenario)
		if err != nil {
			panic(err)
		}
		o.Result = r
		opts = append(opts, o)
	}
	c, err := Compare(opts)
	if err != nil {
		panic(err)
	}
	for _, o := range c.Options {
		fmt.Printf("%-14s lasts %-14s swaps %d  %s\n", o.Name, o.Lifetime, o.Swaps, FormatMoney(o.CostTotal, c.Currency))
	}
	for _, s := range c.Summary {
		fmt.Println(s)
	}
	// Output:
	// D cell         lasts 4 y 10 mo      swaps 1  138.00 EUR
	// 18650 + panel  lasts more than 8 y  swaps 0  32.00 EUR
	// "18650 + panel" is the cheapest over 8 years: 32.00 EUR in all, 4.00 EUR a year.
	// "D cell" is the dearest: 138.00 EUR, 106.00 EUR more.
	// "18650 + panel" lasts longest: its first cells outlive the 8-year plan.
}
