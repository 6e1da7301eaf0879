package plan

import (
	"encoding/json"
	"maps"
	"slices"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/scenario"
)

func TestFormatSpan(t *testing.T) {
	day := func(s string) time.Time {
		d, err := time.Parse(time.DateOnly, s)
		require.NoError(t, err)
		return d
	}
	cases := []struct{ a, b, want string }{
		{"2027-03-01", "2032-01-12", "4 y 10 mo"},
		{"2027-03-01", "2032-03-01", "5 y"},
		{"2027-03-01", "2032-02-28", "4 y 11 mo"}, // a day short of 5 years
		{"2027-01-31", "2027-02-28", "28 d"},      // no 31 February: not yet a month
		{"2027-01-31", "2027-03-03", "1 mo"},
		{"2027-01-01", "2027-01-13", "12 d"},
		{"2027-01-01", "2027-11-01", "10 mo"},
		{"2028-02-29", "2029-02-28", "11 mo"},
		{"2027-01-02", "2027-01-01", "0 d"},
	}
	for _, c := range cases {
		assert.Equalf(t, c.want, FormatSpan(day(c.a), day(c.b)), "FormatSpan(%s, %s)", c.a, c.b)
	}
}

func TestResultOfDemo(t *testing.T) {
	s := scenario.Demo()
	r := mustRun(t, s)
	require.NotNil(t, r.LifetimeDays)
	require.NotNil(t, r.FirstBrownout)
	start, _ := time.Parse(time.DateOnly, r.Start)
	// The flat date is the start plus the lifetime.
	flat := start.Add(time.Duration(*r.LifetimeDays * 24 * float64(time.Hour)))
	assert.Equal(t, flat.Format(time.DateOnly), *r.FirstBrownout)
	assert.Equal(t, FormatSpan(start, flat), r.Lifetime)
	require.NotEmpty(t, r.Swaps)
	assert.Less(t, r.Swaps[0].Date, *r.FirstBrownout, "the first swap comes before the cells go flat")
	assert.Equal(t, "reserve", r.Swaps[0].Reason)
	// The ledger in the result balances.
	e := r.EnergyWh
	in := e.Installed + e.Harvested - e.HarvestUnused - e.ChargeLoss
	out := e.Load + e.SelfDischarge + e.SwappedOut + e.Remaining
	assert.InEpsilon(t, in, out, 1e-9)
	var byComp float64
	for _, wh := range e.LoadByComponent {
		byComp += wh
	}
	assert.InEpsilon(t, e.Load, byComp, 1e-12)
	assert.Equal(t, []string{"events", "illuminator", "radio", "regulator", "sleep", "vision"}, slices.Sorted(maps.Keys(e.LoadByComponent)))
	// One daily row per day of the horizon.
	end, _ := time.Parse(time.DateOnly, r.End)
	assert.Len(t, r.Daily, int(end.Sub(start).Hours()/24+0.5))
	assert.Contains(t, codes(r), "lithium-primary")

	// The JSON keys are the documented ones.
	b, err := json.Marshal(r)
	require.NoError(t, err)
	var m map[string]any
	require.NoError(t, json.Unmarshal(b, &m))
	for _, k := range []string{"lifetime_days", "first_brownout", "swaps", "min_soc_pct", "energy_wh", "cautions", "daily"} {
		assert.Contains(t, m, k)
	}
	for _, k := range []string{"load", "self_discharge", "harvested", "harvest_unused", "charge_loss", "remaining", "load_by_component"} {
		assert.Contains(t, m["energy_wh"], k)
	}
}

func TestOutlivingCellsGiveNull(t *testing.T) {
	s := scenario.Demo()
	s.Plan.Years = 2
	b, err := json.Marshal(mustRun(t, s))
	require.NoError(t, err)
	var m map[string]any
	require.NoError(t, json.Unmarshal(b, &m))
	assert.Nil(t, m["lifetime_days"])
	assert.Nil(t, m["first_brownout"])
	assert.Equal(t, []any{}, m["swaps"])
	assert.Equal(t, "more than 2 y", m["lifetime"])
}

func TestCautions(t *testing.T) {
	s := scenario.Demo()
	s.Site.Placement, s.Site.FixedTempC = scenario.Fixed, -30
	s.Cells.Chemistry, s.Cells.Form = "alkaline", "D"
	r := mustRun(t, s)
	assert.Contains(t, codes(r), "outside-rated-temperature") // alkaline rated from −18 °C
	assert.Contains(t, codes(r), "cold-capacity")
	assert.NotContains(t, codes(r), "lithium-primary")

	s = scenario.Demo()
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	assert.Contains(t, codes(mustRun(t, s)), "rechargeable-without-harvest")
	assert.NotContains(t, codes(mustRun(t, s)), "outside-rated-temperature")
}

func codes(r Result) []string {
	var cs []string
	for _, c := range r.Cautions {
		cs = append(cs, c.Code)
	}
	return cs
}

func mustRun(t *testing.T, s scenario.Scenario) Result {
	t.Helper()
	r, err := Run(s)
	require.NoError(t, err)
	return r
}

func TestPlannerReusesTheSiteTable(t *testing.T) {
	var p Planner
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	a, err := p.Run(s)
	require.NoError(t, err)
	y := p.year
	s.Node.Vision.FPS = 8 // a node edit
	b, err := p.Run(s)
	require.NoError(t, err)
	assert.Same(t, y, p.year, "a node edit keeps the table")
	assert.Less(t, *b.LifetimeDays, *a.LifetimeDays)
	want, err := Run(s)
	require.NoError(t, err)
	assert.Equal(t, want, b, "the cached table gives the same answer")
	s.Site.OutdoorMeanC = -5 // a site edit
	_, err = p.Run(s)
	require.NoError(t, err)
	assert.NotSame(t, y, p.year, "a site edit rebuilds the table")
}

func TestWeatherFileMustBeGiven(t *testing.T) {
	s := scenario.Demo()
	s.Site.WeatherFile = "golden.csv"
	_, err := Run(s)
	var fe *scenario.FieldError
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "site.weather_file", fe.Path)
	assert.Equal(t, `site.weather_file: "golden.csv" is not loaded (allowed: a TMY3 (.csv) or EPW (.epw) file given with the scenario)`, err.Error())
}

func TestLimitsAndTheirCautions(t *testing.T) {
	// A 400 mA burst from one bobbin AA cell, rated for 200 mA pulses
	// (library): the pulse caution, a voltage end of life, brown-outs.
	s := scenario.Demo()
	s.Cells.Form = "AA"
	peak, minV := 400.0, 3.0
	s.Node.PeakMA, s.Node.MinInputV = &peak, &minV
	s.Plan.Years = 1
	r := mustRun(t, s)
	assert.Contains(t, codes(r), "pulse-current")
	assert.Contains(t, codes(r), "brownouts-in-plan")
	require.NotNil(t, r.EndOfLifeLimit)
	assert.Equal(t, "voltage", *r.EndOfLifeLimit)
	require.NotNil(t, r.PlannedBrownout)
	assert.Equal(t, "voltage", r.PlannedBrownout.Limit)
	assert.Greater(t, r.BrownoutHours, 0.0)

	// The demo's own node is within every limit: energy ends its cells.
	r = mustRun(t, scenario.Demo())
	assert.Equal(t, "energy", *r.EndOfLifeLimit)
	assert.Nil(t, r.PlannedBrownout)
	assert.NotContains(t, codes(r), "pulse-current")
	assert.Contains(t, codes(r), "lithium-primary")

	// Li-ion charged by a panel in a hot desert: charging stops above 45 °C.
	s = scenario.Demo()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 30, 31, "Africa/Cairo"
	s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "hot-desert"
	s.Harvest.Kind = scenario.HarvestPanel
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	s.Plan.Years = 1
	r = mustRun(t, s)
	assert.Greater(t, r.TempMaxC, 45.0, "the sun on the enclosure adds to 42 °C afternoons")
	assert.Contains(t, codes(r), "no-charge-when-hot")
	assert.Contains(t, codes(r), "lithium-transport")
	assert.Contains(t, codes(r), "solar-installation")
}

// Every node profile, at the demo's store, gives a plan in the trade's
// range: a mean draw between 0.1 and 10 mW (always-on vision of this class
// runs on the order of 1 mW; common practice) and a finite life on an AA
// cell.
func TestProfilesGiveSensiblePlans(t *testing.T) {
	for _, p := range scenario.Profiles() {
		s := scenario.Demo()
		s.Cells.Form, s.Plan.Years = "AA", 20 // small cells, long plan: every profile ends them
		require.True(t, scenario.ApplyProfile(&s, p.ID))
		r := mustRun(t, s)
		assert.Greater(t, r.AverageLoadMW, 0.1, p.ID)
		assert.Less(t, r.AverageLoadMW, 10.0, p.ID)
		assert.NotNil(t, r.LifetimeDays, p.ID)
		assert.InEpsilon(t, r.EnergyWh.Installed+r.EnergyWh.Harvested-r.EnergyWh.HarvestUnused-r.EnergyWh.ChargeLoss,
			r.EnergyWh.Load+r.EnergyWh.SelfDischarge+r.EnergyWh.SwappedOut+r.EnergyWh.CapacityFade+r.EnergyWh.Remaining, 1e-9, p.ID)
	}
}
