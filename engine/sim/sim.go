package sim

import (
	"math"
	"sync"
	"time"

	"nodelife/engine/cell"
	"nodelife/engine/harvest"
	"nodelife/engine/load"
	"nodelife/engine/scenario"
)

// HoursPerYear is the Julian year, 365.25 days, the unit of self-discharge
// rates.
const HoursPerYear = 365.25 * 24

// Why a swap happened.
const (
	ReasonReserve = "reserve" // the state of charge fell to the reserve
	ReasonFlat    = "flat"    // the cells went flat before reaching the reserve
	ReasonVoltage = "voltage" // the voltage under the node's peak current fell below its minimum
	ReasonFade    = "fade"    // rechargeable cells faded to their end-of-life capacity
)

// Swap is one change of cells.
type Swap struct {
	Time   time.Time // the start of the visit day
	Due    time.Time // when the cells came due (Reason); Time is lead days or more before
	Reason string
}

// Ledger is where the energy went over the horizon, in Wh.
type Ledger struct {
	InstalledWh     float64 // energy of every cell set put in, the first included
	HarvestedWh     float64
	HarvestUnusedWh float64        // not stored: primary cells, outside the charge window, above the charge rate, full cells
	ChargeLossWh    float64        // lost to charge inefficiency
	LoadWh          load.Breakdown // the load the cells and harvest carried, by component
	SelfDischargeWh float64
	SwappedOutWh    float64 // left in cells taken out at swaps
	FadeWh          float64 // stored energy lost when fading capacity fell below it
	RemainingWh     float64 // left in the cells at the end
}

// Imbalance returns (in − out) relative to the energy that entered
// (installed + harvested): zero to rounding.
func (l Ledger) Imbalance() float64 {
	in := l.InstalledWh + l.HarvestedWh - l.HarvestUnusedWh - l.ChargeLossWh
	out := l.LoadWh.Total() + l.SelfDischargeWh + l.SwappedOutWh + l.FadeWh + l.RemainingWh
	return (in - out) / (l.InstalledWh + l.HarvestedWh)
}

// Day summarises one local calendar day.
type Day struct {
	Date                             time.Time // local midnight
	SoCMinPct, SoCMeanPct, SoCMaxPct float64
	TempMinC, TempMeanC, TempMaxC    float64
	HarvestWh, LoadWh                float64 // delivered by the harvester; drawn by the node
}

// Result is one run over the horizon.
type Result struct {
	Start, End time.Time
	Step       time.Duration
	Pack       cell.Pack
	LoadW      load.Breakdown // the node's mean power from the cells over the horizon, by component
	// Flat is when the first cell set, never swapped, can no longer carry
	// the node, and FlatLimit why (LimitEnergy, LimitVoltage or
	// LimitTemperature); zero and "" if it outlives the horizon.
	Flat      time.Time
	FlatLimit string
	// PlannedBrownout is the first time the planned cells could not carry
	// the node although swapped as planned (too cold, or the voltage of
	// fresh cells too low), and PlannedBrownoutLimit why; BrownoutH is how
	// many hours that happened in all.
	PlannedBrownout      time.Time
	PlannedBrownoutLimit string
	BrownoutH            float64
	Swaps                []Swap
	Ledger               Ledger
	Days                 []Day
	MinSoCPct            float64
	TempMinC             float64
	TempMaxC             float64
}

// PackFor returns the pack a scenario describes. It panics on a scenario that
// scenario.Parse would have rejected.
func PackFor(s scenario.Scenario) cell.Pack {
	chem, ok := cell.Lookup(s.Cells.Chemistry)
	if !ok {
		panic("sim: unknown chemistry " + s.Cells.Chemistry)
	}
	form, ok := chem.Form(s.Cells.Form)
	if !ok {
		panic("sim: unknown form " + s.Cells.Form)
	}
	capMAh := form.CapacityMAh
	if s.Cells.CapacityMAh > 0 {
		capMAh = s.Cells.CapacityMAh
	}
	return cell.Pack{Chem: chem, Form: form, Series: s.Cells.Series, Parallel: s.Cells.Parallel, CellCapacityMAh: capMAh}
}

// Run simulates a scenario that names no weather file over its horizon. It
// panics on one that does; use NewYear and RunWith for those.
func Run(s scenario.Scenario) Result {
	y, err := NewYear(s, nil)
	if err != nil {
		panic("sim: " + err.Error())
	}
	return RunWith(s, y)
}

// RunWith simulates the scenario with a prepared environment table, which
// must come from NewYear of a scenario with the same site, harvester and
// step.
func RunWith(s scenario.Scenario, y *Year) Result {
	return RunOpts(s, y, Options{})
}

// Options adjust a run.
type Options struct {
	// DayFactor, when set, scales the harvest and the daylight of each
	// local day of the horizon (index 0 is the plan's first day): a drawn
	// weather year's daily clearness over the monthly mean.
	DayFactor []float64
	// Yield, when set, is called after every 30 simulated days, so a caller
	// sharing one thread with a user interface (WebAssembly) can let it run.
	Yield func()
}

// state is everything a run changes, so a day's start can be kept and
// returned to when a swap must move back to an earlier visit day.
type state struct {
	planned, first        cellSet
	firstDone, firstSplit bool
	flat                  time.Time
	flatLimit             string
	ledger                Ledger
	demandWh              load.Breakdown
	horizonH              float64
	days, swaps           int
	minSoC, tMin, tMax    float64
	brownoutH             float64
	brownoutAt            time.Time
	brownoutLimit         string
	t, utcDay             time.Time
	utcMin                int
	lastSwapDay           int // day index of the last swap, −1 before any
}

// snapshots holds day-start snapshot buffers for reuse across runs.
var snapshots = sync.Pool{New: func() any { return new([]state) }}

// RunOpts simulates the scenario with a prepared environment table and
// options.
func RunOpts(s scenario.Scenario, y *Year, o Options) Result {
	start, end := s.StartTime(), s.EndTime()
	step := time.Duration(s.Plan.StepMin) * time.Minute
	stepH := step.Hours()
	pack := PackFor(s)
	chem := pack.Chem
	ratedWh := pack.EnergyWh()
	lp := LoadParams(s, pack.NominalV())
	reserve := s.Plan.ReservePct / 100
	m := newPackModel(pack, NodePeakMA(s)/1000, s.NodeMinInputV(pack.CutoffV()))
	visits := newVisitRule(s.Plan)
	lead := s.Plan.LeadDays
	// An indoor-light cell sees the site's lights (or daylight outdoors).
	var indoorCell *harvest.IndoorCell
	if s.Harvest.Kind == scenario.HarvestIndoor {
		c := s.Harvest.Indoor
		indoorCell = &harvest.IndoorCell{AreaM2: c.AreaCm2 * 1e-4, Efficiency: c.Efficiency,
			LuxPerWm2: c.LuxPerWm2, ChargerEfficiency: s.Harvest.ChargerEfficiency}
	}
	outdoor := s.Site.Placement == scenario.Outdoor
	open := newOpenHours(s.Site.Hours)
	loc := s.Location()
	// An indoor setback: a different temperature while the site is closed.
	setback := s.Site.Placement == scenario.Indoor && s.Site.IndoorClosedTempC != nil
	var closedC float64
	if setback {
		closedC = *s.Site.IndoorClosedTempC
	}

	// The horizon's local days (sized up front: a run is repeated many times
	// by the advice, and growing the slices is most of its garbage).
	dayStarts := make([]time.Time, 0, int(end.Sub(start).Hours()/24)+2)
	for d := start; d.Before(end); d = d.AddDate(0, 0, 1) {
		dayStarts = append(dayStarts, d)
	}
	dayStarts = append(dayStarts, end)
	nDays := len(dayStarts) - 1

	r := Result{Start: start, End: end, Step: step, Pack: pack, Days: make([]Day, 0, nDays)}
	st := state{planned: newCellSet(ratedWh), first: newCellSet(ratedWh),
		minSoC: 100, tMin: math.Inf(1), tMax: math.Inf(-1), lastSwapDay: -1}
	st.ledger.InstalledWh = ratedWh
	st.t = start
	st.utcDay = start.UTC().Truncate(24 * time.Hour)
	st.utcMin = int(start.UTC().Sub(st.utcDay) / time.Minute)
	// A snapshot of the state at each day's start, to go back to a visit
	// day. The advice runs the same horizon a hundred times and more, so
	// the buffer is reused; every day's entry is written before it is read.
	buf := snapshots.Get().(*[]state)
	defer snapshots.Put(buf)
	if cap(*buf) < nDays {
		*buf = make([]state, nDays)
	}
	snaps := (*buf)[:nDays]

	// The load's conditions and its power, recomputed when they change.
	var lastCond load.Conditions
	var loadW load.Breakdown
	var loadTotalW float64
	// Hours at the current load, demanded and served, added into the
	// totals by component when the load changes.
	var demandH, servedH float64
	flush := func() {
		for k := range loadW {
			st.demandWh[k] += loadW[k] * demandH
			st.ledger.LoadWh[k] += loadW[k] * servedH
		}
		demandH, servedH = 0, 0
	}
	// Temperature-dependent values, recomputed only when the temperature moves.
	thermal := cell.NewThermal(chem)
	r20 := pack.ResistanceOhm(20)
	panelScale := 1.0 // the table's panel to this scenario's
	if y.PanelAreaCm2 > 0 {
		panelScale = s.Harvest.Panel.AreaCm2 / y.PanelAreaCm2
	}
	var lastT float64
	var e stepEnv
	forget := func() { lastT, lastCond = math.NaN(), load.Conditions{Hour: -1} }
	forget()

	// Until the plan first swaps, the first cells are the planned cells: one
	// set is stepped for both. At the first swap the first cells split off
	// with the planned cells' state and run on their own.
	justSplit := false
	firstFrom := func(res *stepResult, day time.Time, at, dt time.Duration) {
		st.flat = day.Add(at) // voltage and temperature fail from the step's start
		if res.limit == LimitEnergy {
			st.flat = day.Add(at + time.Duration(res.carried*float64(dt)))
		}
		st.flatLimit = res.limit
		st.firstDone = true
	}
	// swap replaces the planned cells at instant at.
	swap := func(at, due time.Time, reason string, dayIdx int) {
		if !st.firstSplit && !st.firstDone {
			st.first, st.firstSplit, justSplit = st.planned, true, true
		}
		r.Swaps = append(r.Swaps[:st.swaps], Swap{Time: at, Due: due, Reason: reason})
		st.swaps++
		st.ledger.SwappedOutWh += st.planned.storedWh
		st.ledger.InstalledWh += ratedWh
		st.planned = newCellSet(ratedWh)
		st.lastSwapDay = dayIdx
	}
	var res, rest, fr stepResult // reused every step
	account := func(res *stepResult) {
		st.ledger.SelfDischargeWh += res.sdWh
		st.ledger.ChargeLossWh += res.lostWh
		st.ledger.HarvestUnusedWh += res.unusedWh
		st.ledger.FadeWh += res.fadeWh
	}
	brownout := func(at time.Time, h float64, limit string) {
		if st.brownoutAt.IsZero() {
			st.brownoutAt, st.brownoutLimit = at, limit
		}
		st.brownoutH += h
	}
	// visitFor returns the day on which to swap cells that are due at due:
	// the latest allowed visit day at least the lead time before, after the
	// last swap; −1 when there is none (then the swap happens when due).
	visitFor := func(due time.Time, dueDay int) int {
		latest := due.AddDate(0, 0, -lead)
		for di := dueDay; di > st.lastSwapDay && di >= 0; di-- {
			if !dayStarts[di].After(latest) && visits.allowed(dayStarts[di]) {
				return di
			}
		}
		return -1
	}

	stepMin := s.Plan.StepMin
	for di := 0; di < nDays; di++ {
		if o.Yield != nil && di%30 == 29 {
			o.Yield()
		}
		day, next := dayStarts[di], dayStarts[di+1]
		flush()
		snaps[di] = st
		factor := 1.0
		if o.DayFactor != nil && di < len(o.DayFactor) {
			factor = o.DayFactor[di]
		}
		rowBase := row(st.utcDay.Month(), st.utcDay.Day()) * y.PerDay
		into := st.t.Sub(day)                    // the first step's offset into the day
		regular := next.Sub(day) == 24*time.Hour // no clock change today
		weekday := day.Weekday()
		weekdayMon := (int(weekday) + 6) % 7 // Monday 0
		steps := int((next.Sub(st.t) + step - 1) / step)
		d := Day{Date: day, SoCMinPct: math.Inf(1), SoCMaxPct: math.Inf(-1),
			TempMinC: math.Inf(1), TempMaxC: math.Inf(-1)}
		var socSum, tempSum float64
		toEnd := end.Sub(day)
		rewind, rewindReason := -1, ""
		var rewindDue time.Time
		for k := range steps {
			at := into + time.Duration(k)*step // step start, from local midnight
			dt, dtH := step, stepH
			if rest := toEnd - at; rest < dt {
				dt, dtH = rest, rest.Hours() // the horizon's last step
			}
			idx := rowBase + st.utcMin/y.ResMin
			if st.utcMin += stepMin; st.utcMin >= 1440 {
				st.utcMin -= 1440
				st.utcDay = st.utcDay.AddDate(0, 0, 1)
				rowBase = row(st.utcDay.Month(), st.utcDay.Day()) * y.PerDay
			}
			T := y.CellTempC[idx]
			if setback && !open.isOpen(weekday, localMinute(day, at, regular, loc)) {
				T = closedC
			}
			if T != lastT {
				lastT = T
				v := thermal.All(T)
				e.usable = v.Usable
				e.tempC, e.tempOK = T, T >= chem.OperatingMinC && T <= chem.OperatingMaxC
				e.rOhm = r20 * v.ResistanceFactor
				e.socMin = m.socMinAt(e.rOhm)
				e.trappedNew, e.socPerWhNew = ratedWh*(1-e.usable), 100/(ratedWh*e.usable)
				e.sdWh = v.SelfDischargeYr * ratedWh / HoursPerYear // per hour, scaled below
				e.calFadePer = v.CalendarFadeYr / HoursPerYear
			}
			// The node's load in this step's conditions.
			minute := localMinute(day, at, regular, loc)
			cond := load.Conditions{Weekday: weekdayMon, Hour: minute / 60, Open: open.isOpen(weekday, minute)}
			if outdoor {
				cond.Lux = y.LuxOutdoor[idx]
				if factor != 1 && cond.Lux > twilightFloorLux {
					cond.Lux = max(cond.Lux*factor, twilightFloorLux) // daylight scales, twilight does not
				}
			} else {
				cond.Lux = open.lux(s.Site.Lighting, weekday, minute)
			}
			if cond != lastCond {
				flush()
				lastCond = cond
				loadW, loadTotalW = lp.CellWTotal(cond)
			}
			demandH += dtH
			st.horizonH += dtH

			se := e // this step's copy, per-hour rates scaled to dt
			se.dtH = dtH
			se.sdWh *= dtH
			se.calFadePer *= dtH
			se.loadWh = loadTotalW * dtH

			// Harvest: a panel from the site's table, an indoor-light cell
			// from the lights (or daylight outdoors).
			switch {
			case y.HarvestW != nil:
				se.harvestWh = y.HarvestW[idx] * dtH * factor * panelScale
			case indoorCell != nil:
				se.harvestWh = indoorCell.OutputW(cond.Lux) * dtH
			}
			st.ledger.HarvestedWh += se.harvestWh
			d.HarvestWh += se.harvestWh
			d.LoadWh += se.loadWh

			// The planned cells. When they come due (flat within the step,
			// the voltage under the peak failing where fresh cells would
			// hold it, faded to end of life, or at the reserve), the swap
			// moves back to a visit day: the run returns to that day's start.
			m.step(&st.planned, &se, 1, &res)
			account(&res)
			justSplit = false
			if !st.firstDone && !st.firstSplit && res.limit != "" {
				firstFrom(&res, day, at, dt)
			}
			served := res.carried
			due, reason := time.Time{}, ""
			switch res.limit {
			case LimitEnergy:
				due, reason = day.Add(at+time.Duration(res.carried*float64(dt))), ReasonFlat
			case LimitVoltage:
				if m.freshHolds(&se) {
					due, reason = day.Add(at+dt), ReasonVoltage
				} else {
					brownout(day.Add(at), dtH, LimitVoltage)
				}
			case LimitTemperature:
				brownout(day.Add(at), dtH, LimitTemperature)
			}
			if reason == "" && m.fading && st.planned.health <= chem.EndOfLife {
				due, reason = day.Add(at+dt), ReasonFade
			}
			soc := m.socPct(&st.planned, &e)
			if reason == "" && reserve > 0 && soc <= reserve*100 {
				due, reason = day.Add(at+dt), ReasonReserve
			}
			if reason != "" {
				if vd := visitFor(due, di); vd >= 0 {
					rewind, rewindReason, rewindDue = vd, reason, due
					break
				}
				// No visit day can come first: swap when due.
				swap(due, due, reason, di)
				if res.limit == LimitEnergy {
					m.step(&st.planned, &se, 1-res.carried, &rest)
					account(&rest)
					served += rest.carried * (1 - res.carried)
				}
				soc = m.socPct(&st.planned, &e)
			}
			servedH += served * dtH

			// The first cells, left alone until they cannot carry the node.
			if !st.firstDone && st.firstSplit && !justSplit {
				if m.step(&st.first, &se, 1, &fr); fr.limit != "" {
					firstFrom(&fr, day, at, dt)
				}
			}

			d.SoCMinPct = min(d.SoCMinPct, soc)
			d.SoCMaxPct = max(d.SoCMaxPct, soc)
			socSum += soc
			d.TempMinC = min(d.TempMinC, T)
			d.TempMaxC = max(d.TempMaxC, T)
			tempSum += T
		}
		if rewind >= 0 {
			// Back to the start of the visit day, and swap there.
			flush()
			st = snaps[rewind]
			r.Days = r.Days[:st.days]
			forget()
			swap(dayStarts[rewind], rewindDue, rewindReason, rewind)
			di = rewind - 1
			continue
		}
		st.t = st.t.Add(time.Duration(steps) * step)
		if steps > 0 {
			d.SoCMeanPct = socSum / float64(steps)
			d.TempMeanC = tempSum / float64(steps)
			st.minSoC = min(st.minSoC, d.SoCMinPct)
			st.tMin = min(st.tMin, d.TempMinC)
			st.tMax = max(st.tMax, d.TempMaxC)
			r.Days = append(r.Days[:st.days], d)
			st.days++
		}
	}
	flush()
	r.Swaps = r.Swaps[:st.swaps]
	r.Ledger = st.ledger
	for k := range st.demandWh {
		r.LoadW[k] = st.demandWh[k] / st.horizonH
	}
	r.Ledger.RemainingWh = st.planned.storedWh
	r.Flat, r.FlatLimit = st.flat, st.flatLimit
	r.MinSoCPct, r.TempMinC, r.TempMaxC = st.minSoC, st.tMin, st.tMax
	r.BrownoutH, r.PlannedBrownout, r.PlannedBrownoutLimit = st.brownoutH, st.brownoutAt, st.brownoutLimit
	return r
}

// charger moves harvest into cells: never into primary cells; only inside the
// chemistry's charge temperature window; at most at its maximum charge rate
// (C-rate × rated capacity × nominal voltage); at its charge efficiency; and
// never past full.
type charger struct {
	can        bool
	minC, maxC float64
	maxW       float64
	eff        float64
}

func newCharger(p cell.Pack) charger {
	c := p.Chem
	return charger{can: !c.Primary && c.MaxChargeC > 0, minC: c.ChargeMinC, maxC: c.ChargeMaxC,
		maxW: c.MaxChargeC * p.CapacityMAh() / 1000 * p.NominalV(), eff: c.ChargeEfficiency}
}

// charge offers surplusWh over dtH hours at tempC to cells holding e Wh of a
// capacity of fullWh. It returns the energy stored, lost to charge
// inefficiency, and left unused.
func (c charger) charge(e, fullWh, surplusWh, tempC, dtH float64) (stored, lost, unused float64) {
	if surplusWh <= 0 {
		return 0, 0, 0
	}
	if !c.can || tempC < c.minC || tempC > c.maxC {
		return 0, 0, surplusWh
	}
	accepted := min(surplusWh, c.maxW*dtH, max(fullWh-e, 0)/c.eff)
	stored = accepted * c.eff
	return stored, accepted - stored, surplusWh - accepted
}

// localMinute is the local clock minute of the instant at after local
// midnight day; regular days (no clock change) need no zone lookup.
func localMinute(day time.Time, at time.Duration, regular bool, loc *time.Location) int {
	if regular {
		return int(at / time.Minute)
	}
	h, m, _ := day.Add(at).In(loc).Clock()
	return h*60 + m
}
