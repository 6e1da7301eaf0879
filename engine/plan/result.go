package plan

import (
	"context"
	"fmt"
	"math"
	"time"

	"nodelife/engine/load"
	"nodelife/engine/scenario"
	"nodelife/engine/sim"
	"nodelife/engine/weather"
)

// ResultFormat names the result's format and version.
const ResultFormat = "nodelife.result/1"

// Result is the answer for one scenario. Field names are the JSON keys of
// `nodelife plan --json`, documented in the README.
type Result struct {
	Format        string   `json:"format"`
	Scenario      string   `json:"scenario"`
	Start         string   `json:"start"`
	End           string   `json:"end"`
	LifetimeDays  *float64 `json:"lifetime_days"`
	Lifetime      string   `json:"lifetime"`
	FirstBrownout *string  `json:"first_brownout"`
	// EndOfLifeLimit is what ended the first cells: "energy", "voltage" or
	// "temperature"; null if they outlive the plan.
	EndOfLifeLimit  *string   `json:"end_of_life_limit"`
	BrownoutHours   float64   `json:"brownout_hours"`
	PlannedBrownout *Brownout `json:"planned_brownout"`
	Swaps           []Swap    `json:"swaps"`
	MinSoCPct       float64   `json:"min_soc_pct"`
	PackWh          float64   `json:"pack_wh"`
	PackMAh         float64   `json:"pack_mah"`
	PackV           float64   `json:"pack_v"`
	AverageLoadMW   float64   `json:"average_load_mw"`
	TempMinC        float64   `json:"temp_min_c"`
	TempMaxC        float64   `json:"temp_max_c"`
	EnergyWh        Energy    `json:"energy_wh"`
	Cautions        []Caution `json:"cautions"`
	// Advice is there when the result was planned with advice (Plan).
	Advice *Advice `json:"advice,omitempty"`
	Daily  []Day   `json:"daily"`
}

// Brownout is the first time the planned cells, swapped as planned, could
// not carry the node.
type Brownout struct {
	Date  string `json:"date"`
	Limit string `json:"limit"` // "voltage" or "temperature"
}

// Swap is one planned change of cells.
type Swap struct {
	Date   string `json:"date"`   // the visit day
	Due    string `json:"due"`    // when the cells come due; the visit is lead days or more before
	Reason string `json:"reason"` // why they come due
}

// Energy is the ledger over the horizon, Wh.
type Energy struct {
	Installed       float64            `json:"installed"`
	Load            float64            `json:"load"`
	LoadByComponent map[string]float64 `json:"load_by_component"`
	SelfDischarge   float64            `json:"self_discharge"`
	Harvested       float64            `json:"harvested"`
	HarvestUnused   float64            `json:"harvest_unused"`
	ChargeLoss      float64            `json:"charge_loss"`
	SwappedOut      float64            `json:"swapped_out"`
	CapacityFade    float64            `json:"capacity_fade"`
	Remaining       float64            `json:"remaining"`
}

// Day is one local day of the planned cells.
type Day struct {
	Date       string  `json:"date"`
	SoCMinPct  float64 `json:"soc_min_pct"`
	SoCMeanPct float64 `json:"soc_mean_pct"`
	SoCMaxPct  float64 `json:"soc_max_pct"`
	TempMinC   float64 `json:"temp_min_c"`
	TempMeanC  float64 `json:"temp_mean_c"`
	TempMaxC   float64 `json:"temp_max_c"`
	HarvestWh  float64 `json:"harvest_wh"`
	LoadWh     float64 `json:"load_wh"`
}

// Caution is a warning the user must see, with a stable code.
type Caution struct {
	Code    string `json:"code"`
	Message string `json:"message"`
}

// Inputs are the files a scenario names, read by the caller: the engine
// never opens files itself, so the command line and the browser supply them.
type Inputs struct {
	// Weather is the file named by site.weather_file, or nil.
	Weather *weather.Series
}

// Run simulates a scenario that names no files and builds its result. A
// scenario that names a weather file gives an error at site.weather_file;
// use RunWith.
func Run(s scenario.Scenario) (Result, error) {
	return RunWith(s, Inputs{})
}

// Plan simulates the scenario and works out its advice: the answer as
// `nodelife plan` gives it. It runs the simulation many times; ctx cancels
// it and o.Progress follows it.
func Plan(ctx context.Context, s scenario.Scenario, in Inputs, o AdviceOptions) (Result, error) {
	r, err := RunWith(s, in)
	if err != nil {
		return r, err
	}
	a, err := Advise(ctx, s, in, r, o)
	if err != nil {
		return r, err
	}
	r.Advice = &a
	return r, nil
}

// RunWith simulates the scenario with the files it names.
func RunWith(s scenario.Scenario, in Inputs) (Result, error) {
	p := Planner{Inputs: in}
	return p.Run(s)
}

// FromSim builds the result of a finished simulation.
func FromSim(s scenario.Scenario, r sim.Result) Result {
	out := Result{
		Format:        ResultFormat,
		Scenario:      s.Name,
		Start:         r.Start.Format(time.DateOnly),
		End:           r.End.Format(time.DateOnly),
		Swaps:         []Swap{},
		MinSoCPct:     r.MinSoCPct,
		PackWh:        r.Pack.EnergyWh(),
		PackMAh:       r.Pack.CapacityMAh(),
		PackV:         r.Pack.NominalV(),
		AverageLoadMW: r.LoadW.Total() * 1e3,
		TempMinC:      r.TempMinC,
		TempMaxC:      r.TempMaxC,
		Cautions:      Cautions(s, r),
		Daily:         make([]Day, len(r.Days)),
	}
	if r.Flat.IsZero() {
		out.Lifetime = "more than " + FormatSpan(r.Start, r.End)
	} else {
		days := r.Flat.Sub(r.Start).Hours() / 24
		date := r.Flat.Format(time.DateOnly)
		limit := r.FlatLimit
		out.LifetimeDays, out.FirstBrownout, out.EndOfLifeLimit = &days, &date, &limit
		out.Lifetime = FormatSpan(r.Start, r.Flat)
	}
	out.BrownoutHours = r.BrownoutH
	if !r.PlannedBrownout.IsZero() {
		out.PlannedBrownout = &Brownout{Date: r.PlannedBrownout.Format(time.DateOnly), Limit: r.PlannedBrownoutLimit}
	}
	for _, sw := range r.Swaps {
		out.Swaps = append(out.Swaps, Swap{Date: sw.Time.Format(time.DateOnly), Due: sw.Due.Format(time.DateOnly), Reason: sw.Reason})
	}
	l := r.Ledger
	out.EnergyWh = Energy{
		Installed: l.InstalledWh, Load: l.LoadWh.Total(), SelfDischarge: l.SelfDischargeWh,
		Harvested: l.HarvestedWh, HarvestUnused: l.HarvestUnusedWh, ChargeLoss: l.ChargeLossWh,
		SwappedOut: l.SwappedOutWh, CapacityFade: l.FadeWh, Remaining: l.RemainingWh,
		LoadByComponent: map[string]float64{},
	}
	for c := load.Component(0); c < load.NumComponents; c++ {
		out.EnergyWh.LoadByComponent[c.String()] = l.LoadWh[c]
	}
	for i, d := range r.Days {
		out.Daily[i] = Day{Date: d.Date.Format(time.DateOnly),
			SoCMinPct: round3(d.SoCMinPct), SoCMeanPct: round3(d.SoCMeanPct), SoCMaxPct: round3(d.SoCMaxPct),
			TempMinC: round3(d.TempMinC), TempMeanC: round3(d.TempMeanC), TempMaxC: round3(d.TempMaxC),
			HarvestWh: round6(d.HarvestWh), LoadWh: round6(d.LoadWh)}
	}
	return out
}

func round3(x float64) float64 { return math.Round(x*1e3) / 1e3 }
func round6(x float64) float64 { return math.Round(x*1e6) / 1e6 }

// FormatSpan writes the calendar time from a to b as "4 y 7 mo", "7 mo" or,
// under a month, "12 d". Whole months are counted on the calendar; a part
// month is dropped.
func FormatSpan(a, b time.Time) string {
	if b.Before(a) {
		return "0 d"
	}
	months := (b.Year()-a.Year())*12 + int(b.Month()-a.Month())
	if a.AddDate(0, months, 0).After(b) {
		months--
	}
	if months < 1 {
		return fmt.Sprintf("%d d", int(b.Sub(a).Hours()/24))
	}
	y, mo := months/12, months%12
	switch {
	case y == 0:
		return fmt.Sprintf("%d mo", mo)
	case mo == 0:
		return fmt.Sprintf("%d y", y)
	}
	return fmt.Sprintf("%d y %d mo", y, mo)
}
