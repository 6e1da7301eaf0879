package plan

import (
	"context"
	"fmt"
	"math"
	"sort"
	"strings"
	"time"

	"nodelife/engine/cell"
	"nodelife/engine/scenario"
	"nodelife/engine/sim"
	"nodelife/engine/weather"
)

// Advice is what a user acts on beyond the single answer: the weather risk,
// the sizing of a harvester and of the cells, the days of autonomy, and the
// inputs that move the answer most, with plain sentences.
type Advice struct {
	Weather   *WeatherRisk `json:"weather"`
	Panel     *Sizing      `json:"panel"`
	Cells     *CellSizing  `json:"cells"`
	Autonomy  Autonomy     `json:"autonomy"`
	Levers    []Lever      `json:"levers"`
	Sentences []string     `json:"sentences"`
}

// WeatherRisk summarises the drawn weather years. P90 is the lifetime the
// cells reach in 90 % of the drawn years (the 10th percentile), P50 the
// median, P10 the lifetime reached in only 10 % of them; null when that
// share of years outlives the plan.
type WeatherRisk struct {
	Draws                  int       `json:"draws"`
	Seed                   int       `json:"seed"`
	Sensitive              bool      `json:"weather_sensitive"` // false: every year the same (no harvest, lit indoors)
	LifetimeP90Days        *float64  `json:"lifetime_p90_days"`
	LifetimeP50Days        *float64  `json:"lifetime_p50_days"`
	LifetimeP10Days        *float64  `json:"lifetime_p10_days"`
	BrownoutBeforeSwapProb float64   `json:"brownout_before_swap_probability"`
	WorstWeek              WorstWeek `json:"worst_week"`
}

// WorstWeek is the seven days with the lowest mean state of charge in any
// drawn year, with the plan's swaps.
type WorstWeek struct {
	Start      string  `json:"start"`
	End        string  `json:"end"`
	SoCMeanPct float64 `json:"soc_mean_pct"`
	Draw       int     `json:"draw"`
}

// Sizing is the smallest harvester area, on the ISO 3 R10 ladder of
// preferred numbers, with which the first cells carry the node through the
// whole plan in a bad weather year (P90).
type Sizing struct {
	Works           bool     `json:"works"`
	AreaCm2         *float64 `json:"area_cm2"`
	NextSmallerCm2  *float64 `json:"next_smaller_cm2"` // the ladder step below, which fails
	MarginMinSoCPct *float64 `json:"margin_min_soc_pct"`
	Reason          string   `json:"reason,omitempty"`
	WeatherYearDraw int      `json:"weather_year_draw"` // −1: the typical year
	MaxAreaTriedCm2 float64  `json:"max_area_tried_cm2"`
	HarvesterField  string   `json:"harvester_field"`
	CurrentAreaCm2  float64  `json:"current_area_cm2"`
	CurrentIsEnough bool     `json:"current_is_enough"`
}

// CellSizing is the smallest pack of the scenario's chemistry (a form
// factor × cells in parallel) that carries the node through the plan in a
// bad weather year with the scenario's harvester.
type CellSizing struct {
	Works       bool    `json:"works"`
	Form        string  `json:"form,omitempty"`
	Parallel    int     `json:"parallel,omitempty"`
	CapacityMAh float64 `json:"capacity_mah,omitempty"`
	Reason      string  `json:"reason,omitempty"`
}

// Autonomy is how long full cells carry the node with no harvest at the
// worst time of year: usable energy at the day's mean temperature over the
// day's load, the smallest over the plan's first year.
type Autonomy struct {
	Days float64 `json:"days"`
	Date string  `json:"date"`
}

// Lever is the answer's change for one input's stated change.
type Lever struct {
	Input             string   `json:"input"` // the scenario path
	Label             string   `json:"label"`
	Change            string   `json:"change"`
	LifetimeDays      *float64 `json:"lifetime_days"`
	LifetimeChangePct *float64 `json:"lifetime_change_pct"`
	MinSoCChangePts   float64  `json:"min_soc_change_pts"`
}

// AdviceOptions tune Advise. The zero value draws the scenario's
// plan.weather_years with its plan.seed.
type AdviceOptions struct {
	// Progress, when set, is told how many of the runs are done.
	Progress func(done, total int)
	// Yield, when set, is called every 30 simulated days inside each run
	// (sim.Options.Yield), so a page can stay responsive.
	Yield func()
}

// r10 is the ISO 3 R10 series of preferred numbers, one decade.
var r10 = [10]float64{1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8}

// panelLadder is the R10 ladder from 1 to 10 000 cm².
func panelLadder() []float64 {
	var out []float64
	for dec := 1.0; dec < 10000; dec *= 10 {
		for _, x := range r10 {
			out = append(out, x*dec)
		}
	}
	return append(out, 10000)
}

// Advise works out the advice for a scenario and its typical-year result r.
// It runs the simulation many times (the weather draws, the searches, the
// levers); ctx cancels it between runs.
func Advise(ctx context.Context, s scenario.Scenario, in Inputs, r Result, o AdviceOptions) (Advice, error) {
	a := &adviser{ctx: ctx, s: s, in: in, base: r, progress: o.Progress, yield: o.Yield}
	return a.run()
}

type adviser struct {
	ctx      context.Context
	s        scenario.Scenario
	in       Inputs
	base     Result
	progress func(done, total int)
	yield    func()
	done     int
	total    int
	planners map[string]*Planner
}

func (a *adviser) tick() error {
	a.done++
	if a.progress != nil {
		a.progress(a.done, max(a.total, a.done))
	}
	return a.ctx.Err()
}

// simulate runs s (a variant of the scenario) with day factors.
func (a *adviser) simulate(s scenario.Scenario, factors []float64) (sim.Result, error) {
	if a.planners == nil {
		a.planners = map[string]*Planner{}
	}
	key := yearKey(s)
	p := a.planners[key]
	if p == nil {
		p = &Planner{Inputs: a.in}
		a.planners[key] = p
	}
	if err := p.ensureYear(s); err != nil {
		return sim.Result{}, err
	}
	r := sim.RunOpts(s, p.year, sim.Options{DayFactor: factors, Yield: a.yield})
	return r, a.tick()
}

func (a *adviser) run() (Advice, error) {
	s := a.s
	var adv Advice
	draws := s.Plan.WeatherYears
	sensitive := weatherSensitive(s)
	if !sensitive && draws > 0 {
		draws = 1
	}
	a.total = draws + 8 + 12 + 10 // draws, panel search, cell search, levers (estimates)

	// Weather draws.
	var factorSets [][]float64
	var drawn []sim.Result
	for i := range draws {
		var f []float64
		if sensitive {
			f = WeatherYear(s, i)
		}
		r, err := a.simulate(s, f)
		if err != nil {
			return adv, err
		}
		factorSets = append(factorSets, f)
		drawn = append(drawn, r)
	}
	badDraw, badFactors := -1, []float64(nil)
	if len(drawn) > 0 {
		adv.Weather = riskOf(s, a.base, drawn, sensitive)
		if sensitive {
			badDraw = pickBadYear(factorSets)
			badFactors = factorSets[badDraw]
		}
	}

	// Sizing.
	var err error
	if adv.Panel, err = a.sizePanel(badFactors, badDraw); err != nil {
		return adv, err
	}
	if adv.Cells, err = a.sizeCells(badFactors); err != nil {
		return adv, err
	}
	adv.Autonomy = autonomyOf(s, a.base)
	if adv.Levers, err = a.levers(); err != nil {
		return adv, err
	}
	adv.Sentences = sentences(s, a.base, adv)
	return adv, nil
}

// WeatherYear returns drawn weather year i of a scenario (its
// plan.seed): for each local day of the plan, the drawn daily clearness over
// the month's mean — the factor on that day's harvest and daylight.
func WeatherYear(s scenario.Scenario, i int) []float64 {
	var dates []time.Time
	for d := s.StartTime(); d.Before(s.EndTime()); d = d.AddDate(0, 0, 1) {
		dates = append(dates, d)
	}
	clear := s.Clearness()
	k := weather.ClearnessDraws(clear, dates, uint64(s.Plan.Seed)*1000003+uint64(i))
	f := make([]float64, len(k))
	for d := range k {
		f[d] = k[d] / clear[dates[d].Month()-1]
	}
	return f
}

// weatherSensitive reports whether drawn weather can change the answer:
// a harvester, or a node outdoors whose camera or LED follows the daylight.
func weatherSensitive(s scenario.Scenario) bool {
	if s.Harvest.Kind == scenario.HarvestPanel {
		return true
	}
	if s.Site.Placement != scenario.Outdoor {
		return false
	}
	return s.Harvest.Kind == scenario.HarvestIndoor || s.Node.Illuminator.PowerMW > 0 ||
		s.Node.Vision.SensorMW > 0 || s.Node.Vision.DarkFPS != nil
}

// pickBadYear returns the draw whose darkest 30 days (the lowest 30-day
// mean of daily factors) rank at the 10th percentile: a bad year, not the
// worst.
func pickBadYear(factorSets [][]float64) int {
	type rank struct {
		i     int
		worst float64
	}
	var ranks []rank
	for i, f := range factorSets {
		worst := math.Inf(1)
		var sum float64
		for d := range f {
			sum += f[d]
			if d >= 30 {
				sum -= f[d-30]
			}
			if d >= 29 {
				worst = min(worst, sum/30)
			}
		}
		ranks = append(ranks, rank{i, worst})
	}
	sort.Slice(ranks, func(a, b int) bool { return ranks[a].worst < ranks[b].worst })
	return ranks[len(ranks)/10].i
}

func riskOf(s scenario.Scenario, base Result, drawn []sim.Result, sensitive bool) *WeatherRisk {
	w := &WeatherRisk{Draws: len(drawn), Seed: s.Plan.Seed, Sensitive: sensitive}
	if !sensitive {
		w.Draws = s.Plan.WeatherYears
	}
	// Lifetimes, censored at the horizon.
	horizon := base.endTime().Sub(base.startTime()).Hours() / 24
	lifes := make([]float64, len(drawn))
	for i, r := range drawn {
		lifes[i] = math.Inf(1)
		if !r.Flat.IsZero() {
			lifes[i] = r.Flat.Sub(r.Start).Hours() / 24
		}
	}
	sort.Float64s(lifes)
	pick := func(q float64) *float64 {
		v := lifes[int(math.Floor(q*float64(len(lifes)-1)+0.5))]
		if math.IsInf(v, 1) || v >= horizon {
			return nil
		}
		return &v
	}
	w.LifetimeP90Days, w.LifetimeP50Days, w.LifetimeP10Days = pick(0.1), pick(0.5), pick(0.9)
	// A brown-out before the planned swap: the first cells of a drawn year
	// go flat before the typical plan's first visit (or before the end of a
	// plan with none), or the drawn plan itself browns out.
	deadline := base.endTime()
	if len(base.Swaps) > 0 {
		deadline, _ = time.ParseInLocation(time.DateOnly, base.Swaps[0].Date, s.Location())
	}
	var bad int
	for _, r := range drawn {
		if (!r.Flat.IsZero() && r.Flat.Before(deadline)) || r.BrownoutH > 0 {
			bad++
		}
	}
	w.BrownoutBeforeSwapProb = float64(bad) / float64(len(drawn))
	// The worst week.
	w.WorstWeek.SoCMeanPct = math.Inf(1)
	for i, r := range drawn {
		var sum float64
		for d := range r.Days {
			sum += r.Days[d].SoCMeanPct
			if d >= 7 {
				sum -= r.Days[d-7].SoCMeanPct
			}
			if d >= 6 && sum/7 < w.WorstWeek.SoCMeanPct {
				w.WorstWeek = WorstWeek{Start: r.Days[d-6].Date.Format(time.DateOnly), End: r.Days[d].Date.Format(time.DateOnly),
					SoCMeanPct: round3(sum / 7), Draw: i}
			}
		}
	}
	return w
}

// ok reports whether the first cells carry the node through the plan.
func ok(r sim.Result) bool { return r.Flat.IsZero() }

func (a *adviser) sizePanel(factors []float64, draw int) (*Sizing, error) {
	s := a.s
	var field string
	var current float64
	switch s.Harvest.Kind {
	case scenario.HarvestPanel:
		field, current = "harvest.panel.area_cm2", s.Harvest.Panel.AreaCm2
	case scenario.HarvestIndoor:
		field, current = "harvest.indoor.area_cm2", s.Harvest.Indoor.AreaCm2
	default:
		return nil, nil
	}
	z := &Sizing{HarvesterField: field, CurrentAreaCm2: current, WeatherYearDraw: draw}
	chem, _ := cell.Lookup(s.Cells.Chemistry)
	if chem.Primary {
		z.Reason = "primary cells cannot store the harvest: nights still drain them; choose a rechargeable chemistry to remove the visits"
		return z, nil
	}
	ladder := panelLadder() // up to 10 000 cm² for either harvester
	maxArea := ladder[len(ladder)-1]
	z.MaxAreaTriedCm2 = maxArea
	with := func(area float64) scenario.Scenario {
		v := s
		if field == "harvest.panel.area_cm2" {
			v.Harvest.Panel.AreaCm2 = area
		} else {
			v.Harvest.Indoor.AreaCm2 = area
		}
		return v
	}
	top, err := a.simulate(with(maxArea), factors)
	if err != nil {
		return nil, err
	}
	if !ok(top) {
		z.Reason = whyNoSize(s, top)
		return z, nil
	}
	hi, lo, best, err := a.smallestThatWorks(len(ladder), top, func(i int) scenario.Scenario { return with(ladder[i]) }, factors)
	if err != nil {
		return nil, err
	}
	area := ladder[hi]
	margin := round3(best.MinSoCPct)
	z.Works, z.AreaCm2, z.MarginMinSoCPct = true, &area, &margin
	if lo >= 0 {
		smaller := ladder[lo]
		z.NextSmallerCm2 = &smaller
	}
	z.CurrentIsEnough = current >= area
	return z, nil
}

// smallestThatWorks bisects n candidates, ordered from the smallest, for the
// smallest that works (ok), given that the largest does, with result top.
// It returns that candidate's index and result, and the index of the largest
// candidate below it that fails (-1 when the smallest works): ⌈log2 n⌉ runs,
// the answer being monotonic in the candidate's size.
func (a *adviser) smallestThatWorks(n int, top sim.Result, scen func(i int) scenario.Scenario, factors []float64) (works, fails int, best sim.Result, err error) {
	fails, works, best = -1, n-1, top
	for works-fails > 1 {
		mid := (fails + works) / 2
		r, err := a.simulate(scen(mid), factors)
		if err != nil {
			return 0, 0, sim.Result{}, err
		}
		if ok(r) {
			works, best = mid, r
		} else {
			fails = mid
		}
	}
	return works, fails, best, nil
}

// whyNoSize explains why even the largest harvester leaves the node short.
func whyNoSize(s scenario.Scenario, r sim.Result) string {
	chem := r.Pack.Chem
	switch r.FlatLimit {
	case sim.LimitTemperature:
		return fmt.Sprintf("the cells leave their rated range (%s: %.0f to %.0f °C) at this site", chem.Name, chem.OperatingMinC, chem.OperatingMaxC)
	case sim.LimitVoltage:
		return "the cells cannot hold the node's minimum voltage under its peak current"
	}
	// The longest run of days with (almost) no harvest before the failure.
	var run, longest int
	for _, d := range r.Days {
		if d.Date.After(r.Flat) {
			break
		}
		if d.HarvestWh < 0.05*d.LoadWh {
			run++
			longest = max(longest, run)
		} else {
			run = 0
		}
	}
	if longest >= 7 {
		return fmt.Sprintf("%d days in a row with almost no harvest (the polar night, or the sun behind the horizon) are longer than the cells can bridge", longest)
	}
	if r.TempMinC < chem.ChargeMinC {
		return fmt.Sprintf("charging is blocked below %.0f °C for too long: the cells run down through the cold spell", chem.ChargeMinC)
	}
	return "even the largest harvester cannot carry the node through the darkest stretch"
}

func (a *adviser) sizeCells(factors []float64) (*CellSizing, error) {
	s := a.s
	chem, _ := cell.Lookup(s.Cells.Chemistry)
	type cand struct {
		form     cell.Form
		parallel int
		mAh      float64
	}
	var cands []cand
	for _, f := range chem.Forms {
		for p := 1; p <= 8; p++ {
			cands = append(cands, cand{f, p, f.CapacityMAh * float64(p)})
		}
	}
	sort.SliceStable(cands, func(i, j int) bool { return cands[i].mAh < cands[j].mAh })
	with := func(c cand) scenario.Scenario {
		v := s
		v.Cells.Form, v.Cells.Parallel, v.Cells.CapacityMAh = c.form.Name, c.parallel, 0
		return v
	}
	last, err := a.simulate(with(cands[len(cands)-1]), factors)
	if err != nil {
		return nil, err
	}
	if !ok(last) {
		return &CellSizing{Reason: fmt.Sprintf("no %s pack up to %d cells in parallel carries the node through the plan without a visit", chem.Name, 8)}, nil
	}
	hi, _, _, err := a.smallestThatWorks(len(cands), last, func(i int) scenario.Scenario { return with(cands[i]) }, factors)
	if err != nil {
		return nil, err
	}
	c := cands[hi]
	return &CellSizing{Works: true, Form: c.form.Name, Parallel: c.parallel, CapacityMAh: c.mAh}, nil
}

func autonomyOf(s scenario.Scenario, r Result) Autonomy {
	pack := sim.PackFor(s)
	best := Autonomy{Days: math.Inf(1)}
	for i, d := range r.Daily {
		if i >= 366 {
			break
		}
		if d.LoadWh <= 0 {
			continue
		}
		days := pack.EnergyWh() * pack.Chem.UsableFraction(d.TempMeanC) / d.LoadWh
		if days < best.Days {
			best = Autonomy{Days: round3(days), Date: d.Date}
		}
	}
	if math.IsInf(best.Days, 1) {
		best.Days = 0
	}
	return best
}

// leverSpec is one input and its stated change.
type leverSpec struct {
	path, label, change string
	apply               func(s *scenario.Scenario)
	applies             func(s scenario.Scenario) bool
}

func leverSpecs() []leverSpec {
	times := func(f func(s *scenario.Scenario) *float64) func(s *scenario.Scenario) {
		return func(s *scenario.Scenario) { *f(s) *= 1.2 }
	}
	always := func(scenario.Scenario) bool { return true }
	return []leverSpec{
		{"node.vision.fps", "frame rate", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Vision.FPS }), func(s scenario.Scenario) bool { return s.Node.Vision.FPS > 0 }},
		{"node.vision.frame_uj", "energy per frame", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Vision.FrameUJ }), func(s scenario.Scenario) bool { return s.Node.Vision.FrameUJ > 0 }},
		{"node.events.per_hour", "events per hour", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Events.PerHour }), func(s scenario.Scenario) bool { return s.Node.Events.PerHour > 0 && s.Node.Events.Weekly == nil }},
		{"node.events.wake_mj", "energy per wake", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Events.WakeMJ }), func(s scenario.Scenario) bool { return s.Node.Events.WakeMJ > 0 }},
		{"node.sleep_uw", "sleep power", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.SleepUW }), func(s scenario.Scenario) bool { return s.Node.SleepUW > 0 }},
		{"node.illuminator.power_mw", "illuminator power", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Illuminator.PowerMW }), func(s scenario.Scenario) bool { return s.Node.Illuminator.PowerMW > 0 }},
		{"node.heartbeat.per_day", "heartbeats", "+20 %", times(func(s *scenario.Scenario) *float64 { return &s.Node.Heartbeat.PerDay }), func(s scenario.Scenario) bool { return s.Node.Heartbeat.PerDay > 0 }},
		{"site.temperature", "temperature", "−5 °C", coolBy5, func(s scenario.Scenario) bool { return s.Site.WeatherFile == "" }},
		{"cells.capacity_mah", "cell capacity", "+20 %", func(s *scenario.Scenario) {
			s.Cells.CapacityMAh = sim.PackFor(*s).CellCapacityMAh * 1.2
		}, always},
		{"harvest.area_cm2", "harvester area", "+20 %", func(s *scenario.Scenario) {
			s.Harvest.Panel.AreaCm2 *= 1.2
			s.Harvest.Indoor.AreaCm2 *= 1.2
		}, func(s scenario.Scenario) bool { return s.Harvest.Kind != scenario.HarvestNone }},
	}
}

// coolBy5 lowers the site's temperature by 5 °C, whatever describes it.
func coolBy5(s *scenario.Scenario) {
	s.Site.FixedTempC -= 5
	s.Site.IndoorTempC -= 5
	s.Site.OutdoorMeanC -= 5
	if s.Site.IndoorClosedTempC != nil {
		t := *s.Site.IndoorClosedTempC - 5
		s.Site.IndoorClosedTempC = &t
	}
	if tmin, tmax, ok := s.Normals(); ok {
		lo, hi := make([]float64, 12), make([]float64, 12)
		for i := range 12 {
			lo[i], hi[i] = tmin[i]-5, tmax[i]-5
		}
		s.Site.Climate.TminC, s.Site.Climate.TmaxC = lo, hi
	}
}

func (a *adviser) levers() ([]Lever, error) {
	base := a.base
	var out []Lever
	for _, l := range leverSpecs() {
		if !l.applies(a.s) {
			continue
		}
		v := a.s
		l.apply(&v)
		r, err := a.simulate(v, nil)
		if err != nil {
			return nil, err
		}
		lv := Lever{Input: l.path, Label: l.label, Change: l.change, MinSoCChangePts: round3(r.MinSoCPct - base.MinSoCPct)}
		if !r.Flat.IsZero() {
			days := round3(r.Flat.Sub(r.Start).Hours() / 24)
			lv.LifetimeDays = &days
		}
		if base.LifetimeDays != nil {
			life := base.endTime().Sub(base.startTime()).Hours() / 24 // at least the plan
			if lv.LifetimeDays != nil {
				life = *lv.LifetimeDays
			}
			pct := round3((life/(*base.LifetimeDays) - 1) * 100)
			lv.LifetimeChangePct = &pct
		}
		out = append(out, lv)
	}
	weight := func(l Lever) float64 {
		if l.LifetimeChangePct != nil {
			return math.Abs(*l.LifetimeChangePct)
		}
		return math.Abs(l.MinSoCChangePts)
	}
	sort.SliceStable(out, func(i, j int) bool { return weight(out[i]) > weight(out[j]) })
	return out, nil
}

func sentences(s scenario.Scenario, r Result, a Advice) []string {
	var out []string
	if n := len(r.Swaps); n > 0 {
		visits := "visits"
		if n == 1 {
			visits = "visit"
		}
		out = append(out, fmt.Sprintf("Plan %d %s to swap cells in the %d-year plan; the first on %s, when the cells come due on %s.",
			n, visits, s.Plan.Years, r.Swaps[0].Date, r.Swaps[0].Due))
	} else {
		out = append(out, fmt.Sprintf("No visit is needed in the %d-year plan.", s.Plan.Years))
	}
	if w := a.Weather; w != nil && w.Sensitive {
		p90 := "the whole plan"
		if w.LifetimeP90Days != nil {
			p90 = FormatSpan(r.startTime(), r.startTime().Add(time.Duration(*w.LifetimeP90Days*24*float64(time.Hour))))
		}
		out = append(out, fmt.Sprintf("In %d drawn weather years the first cells last at least %s in 90 %% of them; a brown-out before the planned swap happens in %.0f %%.",
			w.Draws, p90, w.BrownoutBeforeSwapProb*100))
	}
	if z := a.Panel; z != nil {
		switch {
		case z.Works:
			out = append(out, fmt.Sprintf("A %s cm² harvester carries the node through the plan in a bad weather year (P90), its state of charge never below %.0f %%; %s cm² does not.",
				fmtArea(*z.AreaCm2), *z.MarginMinSoCPct, fmtAreaPtr(z.NextSmallerCm2)))
		default:
			out = append(out, "No harvester size removes the visits: "+z.Reason+".")
		}
	}
	if c := a.Cells; c != nil && c.Works {
		out = append(out, fmt.Sprintf("The smallest %s pack that lasts the plan without a visit: %d × %s (%.0f mAh).",
			sim.PackFor(s).Chem.Name, c.Parallel, c.Form, c.CapacityMAh))
	}
	if a.Autonomy.Days > 0 && s.Harvest.Kind != scenario.HarvestNone { // without a harvester it is the lifetime
		out = append(out, fmt.Sprintf("Fully charged and with no harvest, the cells carry the node %.0f days at the worst time of year (%s).", a.Autonomy.Days, a.Autonomy.Date))
	}
	if len(a.Levers) > 0 {
		var parts []string
		for _, l := range a.Levers[:min(3, len(a.Levers))] {
			if l.LifetimeChangePct != nil {
				parts = append(parts, fmt.Sprintf("%s (%s → %+.0f %% life)", l.Label, l.Change, *l.LifetimeChangePct))
			} else {
				parts = append(parts, fmt.Sprintf("%s (%s → %+.1f points of lowest charge)", l.Label, l.Change, l.MinSoCChangePts))
			}
		}
		out = append(out, "What would change the answer most: "+strings.Join(parts, ", ")+".")
	}
	return out
}

func fmtArea(x float64) string { return strings.TrimSuffix(fmt.Sprintf("%.4g", x), ".0") }

func fmtAreaPtr(x *float64) string {
	if x == nil {
		return "a smaller one"
	}
	return fmtArea(*x)
}

// startTime and endTime read the result's dates back at local midnight.
func (r Result) startTime() time.Time { t, _ := time.Parse(time.DateOnly, r.Start); return t }
func (r Result) endTime() time.Time   { t, _ := time.Parse(time.DateOnly, r.End); return t }
