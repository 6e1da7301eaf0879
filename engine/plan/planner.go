package plan

import (
	"encoding/json"

	"nodelife/engine/scenario"
	"nodelife/engine/sim"
)

// Planner runs scenario after scenario with the same inputs, reusing the
// site's environment table (sun, sky, weather and temperature for a year)
// while the site, the harvester and the step stay the same — as they do when
// a user edits the node or the cells. The zero value is ready to use with no
// input files. A Planner is not safe for concurrent use.
type Planner struct {
	Inputs Inputs
	key    string
	year   *sim.Year
}

// Run plans s, as RunWith(s, p.Inputs) would.
func (p *Planner) Run(s scenario.Scenario) (Result, error) {
	if err := p.ensureYear(s); err != nil {
		return Result{}, err
	}
	r := FromSim(s, sim.RunWith(s, p.year))
	r.Cautions = append(r.Cautions, inputCautions(s, p.Inputs)...)
	return r, nil
}

// ensureYear builds the site's table for s unless the cached one fits.
func (p *Planner) ensureYear(s scenario.Scenario) error {
	key := yearKey(s)
	if p.year == nil || key != p.key {
		y, err := sim.NewYear(s, p.Inputs.Weather)
		if err != nil {
			return err
		}
		p.year, p.key = y, key
	}
	return nil
}

// SetInputs replaces the input files and forgets the cached table.
func (p *Planner) SetInputs(in Inputs) {
	p.Inputs, p.year, p.key = in, nil, ""
}

// yearKey is what a sim.Year depends on: not the panel's area, which the
// run scales the table's output by.
func yearKey(s scenario.Scenario) string {
	s.Harvest.Panel.AreaCm2 = 0
	b, err := json.Marshal(struct {
		Site    scenario.Site
		Harvest scenario.Harvest
		StepMin int
	}{s.Site, s.Harvest, s.Plan.StepMin})
	if err != nil {
		panic("plan: " + err.Error())
	}
	return string(b)
}
