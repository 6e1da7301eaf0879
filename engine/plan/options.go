package plan

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"

	"nodelife/engine/scenario"
)

// ComparisonFormat names the comparison's format and version.
const ComparisonFormat = "nodelife.comparison/1"

// The number of options a comparison takes: a side-by-side view stays
// readable up to four.
const (
	MinOptions = 2
	MaxOptions = 4
)

// Sentinels for errors.Is on an error from Compare.
var (
	ErrOptionCount = errors.New("wrong number of options")
	ErrCurrency    = errors.New("options name different currencies")
	ErrHorizon     = errors.New("options plan over different horizons")
)

// OptionError is a problem with one option of a comparison, at a scenario
// field: a value that differs from another option's, or one out of range.
type OptionError struct {
	Index int    // the option's place in the list, from 0
	Name  string // the option's name
	Path  string // the scenario field at fault, e.g. "cost.currency"
	Value string // its value, as JSON: "\"USD\"", "10"
	// Other is the place of the option whose value it must match, or -1;
	// OtherName and OtherValue are that option's name and value.
	Other      int
	OtherName  string
	OtherValue string
	Allowed    string // what is allowed
	Err        error  // one of the sentinels
}

func (e *OptionError) Error() string {
	return fmt.Sprintf("option %q: %s", e.Name, e.Message(func(int) string { return fmt.Sprintf("option %q", e.OtherName) }))
}

// Message is the problem without the option's own name, as "path: problem
// (allowed: …)"; label names the other option from its place, so that the
// command line can name its file instead.
func (e *OptionError) Message(label func(index int) string) string {
	if e.Other < 0 {
		return fmt.Sprintf("%s: %s is out of range (allowed: %s)", e.Path, e.Value, e.Allowed)
	}
	return fmt.Sprintf("%s: %s differs from %s in %s (allowed: %s)", e.Path, e.Value, e.OtherValue, label(e.Other), e.Allowed)
}

func (e *OptionError) Unwrap() error { return e.Err }

// Option is one variant to compare: a name, the scenario and its planned
// result (from Run, RunWith or a Planner).
type Option struct {
	Name     string
	Scenario scenario.Scenario
	Result   Result
}

// Comparison is two to four options side by side with their cost of
// ownership. Field names are the JSON keys of `nodelife compare --json`,
// documented in the README.
type Comparison struct {
	Format   string       `json:"format"`
	Currency string       `json:"currency"` // cost.currency, the same for every option
	Years    int          `json:"years"`    // plan.years, the same for every option
	Options  []OptionCost `json:"options"`
	// Cheapest names the option(s) with the lowest cost_total (totals that
	// round to the same cent tie); LongestLasting the one(s) whose first
	// cells last longest (lifetimes that round to the same whole day tie;
	// cells that outlive the plan beat any that do not, and tie with each
	// other).
	Cheapest       []string `json:"cheapest"`
	LongestLasting []string `json:"longest_lasting"`
	// Summary says which is cheapest and which lasts longest, in sentences.
	Summary []string `json:"summary"`
}

// OptionCost is one option's answer and its cost of ownership over the
// plan, in the comparison's currency.
type OptionCost struct {
	Name             string   `json:"name"`
	Chemistry        string   `json:"chemistry"` // cells.chemistry
	Form             string   `json:"form"`      // cells.form
	CellsPerSet      int      `json:"cells_per_set"`
	CellSets         int      `json:"cell_sets"`
	Harvester        string   `json:"harvester"` // harvest.kind
	HarvesterAreaCm2 float64  `json:"harvester_area_cm2"`
	LifetimeDays     *float64 `json:"lifetime_days"`
	Lifetime         string   `json:"lifetime"`
	FirstBrownout    *string  `json:"first_brownout"`
	Swaps            int      `json:"swaps"`
	FirstSwap        *string  `json:"first_swap"`
	BrownoutHours    float64  `json:"brownout_hours"`
	CostCells        float64  `json:"cost_cells"`
	CostHarvester    float64  `json:"cost_harvester"`
	CostVisits       float64  `json:"cost_visits"`
	CostTotal        float64  `json:"cost_total"`
	CostPerYear      float64  `json:"cost_per_year"`
	// Cautions are the result's cautions: a comparison must not hide them.
	Cautions []Caution `json:"cautions"`
}

// Compare sets two to four planned options side by side. Every option must
// name the same cost.currency and plan over the same plan.years; otherwise
// the error is an *OptionError naming the first option that differs and both
// values. An option with no name is called "option N" (N from 1).
//
// The cost of ownership is common practice for a first estimate: straight
// sums of what is bought and paid over the plan horizon, with no discounting,
// inflation, salvage value or spares. For each option, over Y = plan.years,
// with n = len(Result.Swaps) the swaps in the plan:
//
//	cells_per_set  = cells.series × cells.parallel
//	cell_sets      = 1 + n                       (the first set, then one per swap)
//	cost_cells     = cells_per_set × cell_sets × cost.cell
//	cost_harvester = cost.panel + A × cost.panel_per_cm2, if harvest.kind ≠ none, else 0
//	cost_visits    = n × cost.visit
//	cost_total     = cost_cells + cost_harvester + cost_visits
//	cost_per_year  = cost_total / Y
//
// where A is harvest.panel.area_cm2 for a panel and harvest.indoor.area_cm2
// for an indoor-light cell. One harvester serves the whole plan. Each swap is
// one site visit; the first installation is not counted as a visit (every
// option needs it, so it does not change the ranking), but its cells are.
func Compare(options []Option) (Comparison, error) {
	if n := len(options); n < MinOptions || n > MaxOptions {
		return Comparison{}, fmt.Errorf("plan: %w: %d given (allowed: %d to %d)", ErrOptionCount, n, MinOptions, MaxOptions)
	}
	name := func(i int) string {
		if options[i].Name == "" {
			return fmt.Sprintf("option %d", i+1)
		}
		return options[i].Name
	}
	first := options[0].Scenario
	c := Comparison{Format: ComparisonFormat, Currency: first.Cost.Currency, Years: first.Plan.Years}
	for i, o := range options {
		s := o.Scenario
		switch {
		case s.Cost.Currency != c.Currency:
			return Comparison{}, &OptionError{Index: i, Name: name(i), Path: "cost.currency", Err: ErrCurrency,
				Value: strconv.Quote(s.Cost.Currency), Other: 0, OtherName: name(0), OtherValue: strconv.Quote(c.Currency),
				Allowed: "one currency for every option"}
		case s.Plan.Years != c.Years:
			return Comparison{}, &OptionError{Index: i, Name: name(i), Path: "plan.years", Err: ErrHorizon,
				Value: strconv.Itoa(s.Plan.Years), Other: 0, OtherName: name(0), OtherValue: strconv.Itoa(c.Years),
				Allowed: "one horizon for every option"}
		case s.Plan.Years < 1:
			return Comparison{}, &OptionError{Index: i, Name: name(i), Path: "plan.years", Err: ErrHorizon,
				Value: strconv.Itoa(s.Plan.Years), Other: -1, Allowed: "at least 1 year"}
		}
		c.Options = append(c.Options, CostOf(name(i), s, o.Result))
	}
	cheap, long := bestOptions(c.Options, costKey), bestOptions(c.Options, lifeKey)
	c.Cheapest, c.LongestLasting = optionNames(c.Options, cheap), optionNames(c.Options, long)
	c.Summary = summarizeOptions(c, cheap, long)
	return c, nil
}

// CostOf applies the formulas of Compare to one option: its answer and cost
// of ownership in its own currency, for a view that shows one option alone.
func CostOf(name string, s scenario.Scenario, r Result) OptionCost {
	o := OptionCost{
		Name: name, Chemistry: s.Cells.Chemistry, Form: s.Cells.Form,
		Harvester:    s.Harvest.Kind,
		LifetimeDays: r.LifetimeDays, Lifetime: r.Lifetime, FirstBrownout: r.FirstBrownout,
		Swaps: len(r.Swaps), BrownoutHours: r.BrownoutHours,
		Cautions: r.Cautions,
	}
	if o.Cautions == nil {
		o.Cautions = []Caution{}
	}
	if o.Swaps > 0 {
		d := r.Swaps[0].Date
		o.FirstSwap = &d
	}
	o.CellsPerSet = s.Cells.Series * s.Cells.Parallel
	o.CellSets = 1 + o.Swaps
	o.CostCells = float64(o.CellsPerSet*o.CellSets) * s.Cost.Cell
	switch s.Harvest.Kind {
	case scenario.HarvestPanel:
		o.HarvesterAreaCm2 = s.Harvest.Panel.AreaCm2
	case scenario.HarvestIndoor:
		o.HarvesterAreaCm2 = s.Harvest.Indoor.AreaCm2
	}
	if s.Harvest.Kind != scenario.HarvestNone {
		o.CostHarvester = s.Cost.Panel + o.HarvesterAreaCm2*s.Cost.PanelPerCm2
	}
	o.CostVisits = float64(o.Swaps) * s.Cost.Visit
	o.CostTotal = o.CostCells + o.CostHarvester + o.CostVisits
	o.CostPerYear = o.CostTotal / float64(s.Plan.Years)
	return o
}

// toCents is a cost rounded to the cent, for ties.
func toCents(x float64) float64 { return math.Round(x * 100) }

// costKey orders options cheapest first: totals to the cent.
func costKey(o OptionCost) float64 { return -toCents(o.CostTotal) }

// lifeKey orders options longest-lasting first: whole days, with cells that
// outlive the plan above any that do not.
func lifeKey(o OptionCost) float64 {
	if o.LifetimeDays == nil {
		return math.Inf(1)
	}
	return math.Round(*o.LifetimeDays)
}

// bestOptions returns the indices of the options with the highest key, in order.
func bestOptions(opts []OptionCost, key func(OptionCost) float64) []int {
	top := math.Inf(-1)
	for _, o := range opts {
		top = max(top, key(o))
	}
	var idx []int
	for i, o := range opts {
		if key(o) == top {
			idx = append(idx, i)
		}
	}
	return idx
}

func optionNames(opts []OptionCost, idx []int) []string {
	names := make([]string, len(idx))
	for k, i := range idx {
		names[k] = opts[i].Name
	}
	return names
}

// summarizeOptions writes which options are cheapest and dearest, and which last
// longest, given the indices of the cheapest and longest-lasting.
func summarizeOptions(c Comparison, cheap, long []int) []string {
	money := func(x float64) string { return FormatMoney(x, c.Currency) }
	over := fmt.Sprintf("over %d %s", c.Years, countWord(c.Years, "year", "years"))
	n := len(c.Options)
	var out []string

	lo := c.Options[cheap[0]]
	if len(cheap) == n {
		out = append(out, fmt.Sprintf("All options cost the same %s: %s each, %s a year.",
			over, money(lo.CostTotal), money(lo.CostPerYear)))
	} else {
		dear := bestOptions(c.Options, func(o OptionCost) float64 { return toCents(o.CostTotal) })
		hi := c.Options[dear[0]]
		out = append(out,
			fmt.Sprintf("%s %s the cheapest %s: %s%s in all, %s a year.",
				quotedNames(optionNames(c.Options, cheap)), countWord(len(cheap), "is", "are"), over,
				money(lo.CostTotal), countWord(len(cheap), "", " each"), money(lo.CostPerYear)),
			fmt.Sprintf("%s %s the dearest: %s%s, %s more.",
				quotedNames(optionNames(c.Options, dear)), countWord(len(dear), "is", "are"),
				money(hi.CostTotal), countWord(len(dear), "", " each"), money(hi.CostTotal-lo.CostTotal)))
	}

	top := c.Options[long[0]]
	how := "go flat after " + top.Lifetime
	if top.LifetimeDays == nil {
		how = fmt.Sprintf("outlive the %d-year plan", c.Years)
	}
	switch {
	case len(long) == n:
		out = append(out, fmt.Sprintf("All options last as long: their first cells %s.", how))
	case len(long) > 1:
		out = append(out, fmt.Sprintf("%s last longest: their first cells %s.", quotedNames(optionNames(c.Options, long)), how))
	default:
		out = append(out, fmt.Sprintf("%s lasts longest: its first cells %s.", quotedNames(optionNames(c.Options, long)), how))
	}
	return out
}

// FormatMoney writes an amount with two decimals and the currency after it:
// "138.00 EUR".
func FormatMoney(x float64, currency string) string {
	if toCents(x) == 0 {
		x = 0 // no "-0.00"
	}
	return fmt.Sprintf("%.2f %s", x, currency)
}

// quotedNames writes names as `"A"`, `"A" and "B"` or `"A", "B" and "C"`.
func quotedNames(names []string) string {
	q := make([]string, len(names))
	for i, n := range names {
		q[i] = `"` + n + `"`
	}
	if len(q) == 1 {
		return q[0]
	}
	return strings.Join(q[:len(q)-1], ", ") + " and " + q[len(q)-1]
}

func countWord(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
