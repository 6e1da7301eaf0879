package sim

import (
	"math"
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
)

// Swap is one change of cells.
type Swap struct {
	Time   time.Time
	Reason string
}

// Ledger is where the energy went over the horizon, in Wh.
type Ledger struct {
	InstalledWh     float64 // energy of every cell set put in, the first included
	HarvestedWh     float64
	HarvestUnusedWh float64 // not stored: primary cells, outside the charge window, above the charge rate, full cells
	ChargeLossWh    float64 // lost to charge inefficiency
	LoadWh          load.Breakdown
	SelfDischargeWh float64
	SwappedOutWh    float64 // left in cells taken out at swaps
	RemainingWh     float64 // left in the cells at the end
}

// Imbalance returns (in − out) relative to the energy that entered
// (installed + harvested): zero to rounding.
func (l Ledger) Imbalance() float64 {
	in := l.InstalledWh + l.HarvestedWh - l.HarvestUnusedWh - l.ChargeLossWh
	out := l.LoadWh.Total() + l.SelfDischargeWh + l.SwappedOutWh + l.RemainingWh
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
	LoadW      load.Breakdown // mean power drawn from the cells, by component
	// Flat is when the first cell set, never swapped, goes flat; zero if it
	// outlives the horizon.
	Flat      time.Time
	Swaps     []Swap
	Ledger    Ledger
	Days      []Day
	MinSoCPct float64
	TempMinC  float64
	TempMaxC  float64
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
	return cell.Pack{Chem: chem, Series: s.Cells.Series, Parallel: s.Cells.Parallel, CellCapacityMAh: capMAh}
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
	start, end := s.StartTime(), s.EndTime()
	step := time.Duration(s.Plan.StepMin) * time.Minute
	stepH := step.Hours()
	pack := PackFor(s)
	chem := pack.Chem
	ratedWh := pack.EnergyWh()
	loadW := load.FromNode(s.Node).CellW()
	loadTotalW := loadW.Total()
	reserve := s.Plan.ReservePct / 100
	chg := newCharger(pack)
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
	r := Result{Start: start, End: end, Step: step, Pack: pack, LoadW: loadW,
		MinSoCPct: 100, TempMinC: math.Inf(1), TempMaxC: math.Inf(-1)}
	r.Ledger.InstalledWh = ratedWh
	planned, first := ratedWh, ratedWh // stored energy, Wh
	firstFlat := false
	var horizonH float64 // horizon length, h

	// Temperature-dependent values, recomputed only when the temperature moves.
	thermal := cell.NewThermal(chem)
	lastT := math.NaN()
	var usable, trapped, sdW, socPerWh float64

	// The environment table is indexed by UTC day and minute of the day.
	utcDay := start.UTC().Truncate(24 * time.Hour)
	utcMin := int(start.UTC().Sub(utcDay) / time.Minute)
	rowBase := row(utcDay.Month(), utcDay.Day()) * y.PerDay
	stepMin := s.Plan.StepMin

	t := start // start of the next step
	for day := start; day.Before(end); {
		next := day.AddDate(0, 0, 1)
		limit := next
		if end.Before(limit) {
			limit = end
		}
		into := t.Sub(day)                       // the first step's offset into the day
		regular := next.Sub(day) == 24*time.Hour // no clock change today
		weekday := day.Weekday()
		steps := int((limit.Sub(t) + step - 1) / step)
		d := Day{Date: day, SoCMinPct: math.Inf(1), SoCMaxPct: math.Inf(-1),
			TempMinC: math.Inf(1), TempMaxC: math.Inf(-1)}
		var socSum, tempSum float64
		toEnd := end.Sub(day)
		for k := range steps {
			at := into + time.Duration(k)*step // step start, from local midnight
			dt, dtH := step, stepH
			if rest := toEnd - at; rest < dt {
				dt, dtH = rest, rest.Hours() // the horizon's last step
			}
			idx := rowBase + utcMin/y.ResMin
			if utcMin += stepMin; utcMin >= 1440 {
				utcMin -= 1440
				utcDay = utcDay.AddDate(0, 0, 1)
				rowBase = row(utcDay.Month(), utcDay.Day()) * y.PerDay
			}
			T := y.TempC[idx]
			if T != lastT {
				lastT = T
				var sdPerYear float64
				usable, sdPerYear = thermal.At(T)
				trapped = ratedWh * (1 - usable)
				sdW = sdPerYear * ratedWh / HoursPerYear
				socPerWh = 100 / (ratedWh * usable)
			}
			loadWh := loadTotalW * dtH
			sdWh := sdW * dtH
			horizonH += dtH
			r.Ledger.SelfDischargeWh += sdWh

			// Harvest feeds the load first; only the surplus reaches the cells.
			var harvestWh, surplusWh float64
			switch {
			case y.HarvestW != nil:
				harvestWh = y.HarvestW[idx] * dtH
			case indoorCell != nil:
				var lux float64
				if outdoor {
					lux = y.LuxOutdoor[idx]
				} else {
					minute := int(at / time.Minute)
					if !regular {
						h, m, _ := day.Add(at).In(loc).Clock()
						minute = h*60 + m
					}
					lux = open.lux(s.Site.Lighting, weekday, minute)
				}
				harvestWh = indoorCell.OutputW(lux) * dtH
			}
			if harvestWh > 0 {
				r.Ledger.HarvestedWh += harvestWh
				surplusWh = max(harvestWh-loadWh, 0)
			}
			d.HarvestWh += harvestWh
			d.LoadWh += loadWh
			need := loadWh - (harvestWh - surplusWh) + sdWh

			// The planned cells: swapped when flat within the step.
			if avail := planned - trapped; avail >= need {
				planned -= need
			} else {
				frac := max(avail, 0) / need
				planned -= need * frac
				r.Swaps = append(r.Swaps, Swap{Time: day.Add(at + time.Duration(frac*float64(dt))), Reason: ReasonFlat})
				r.Ledger.SwappedOutWh += planned
				r.Ledger.InstalledWh += ratedWh
				planned = ratedWh - need*(1-frac)
			}
			stored, lost, unused := chg.charge(planned, surplusWh, T, dtH)
			planned += stored
			r.Ledger.ChargeLossWh += lost
			r.Ledger.HarvestUnusedWh += unused

			// The first cells, left alone until flat.
			if !firstFlat {
				if avail := first - trapped; avail >= need {
					first -= need
					stored, _, _ := chg.charge(first, surplusWh, T, dtH)
					first += stored
				} else {
					frac := max(avail, 0) / need
					r.Flat = day.Add(at + time.Duration(frac*float64(dt)))
					firstFlat = true
				}
			}

			soc := max(planned-trapped, 0) * socPerWh
			d.SoCMinPct = min(d.SoCMinPct, soc)
			if reserve > 0 && soc <= reserve*100 {
				r.Swaps = append(r.Swaps, Swap{Time: day.Add(at + dt), Reason: ReasonReserve})
				r.Ledger.SwappedOutWh += planned
				r.Ledger.InstalledWh += ratedWh
				planned = ratedWh
				soc = 100
			}
			d.SoCMaxPct = max(d.SoCMaxPct, soc)
			socSum += soc
			d.TempMinC = min(d.TempMinC, T)
			d.TempMaxC = max(d.TempMaxC, T)
			tempSum += T
		}
		t = t.Add(time.Duration(steps) * step)
		if steps > 0 {
			d.SoCMeanPct = socSum / float64(steps)
			d.TempMeanC = tempSum / float64(steps)
			r.MinSoCPct = min(r.MinSoCPct, d.SoCMinPct)
			r.TempMinC = min(r.TempMinC, d.TempMinC)
			r.TempMaxC = max(r.TempMaxC, d.TempMaxC)
			r.Days = append(r.Days, d)
		}
		day = next
	}
	for k := range loadW {
		r.Ledger.LoadWh[k] = loadW[k] * horizonH
	}
	r.Ledger.RemainingWh = planned
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
	fullWh     float64
}

func newCharger(p cell.Pack) charger {
	c := p.Chem
	return charger{can: !c.Primary && c.MaxChargeC > 0, minC: c.ChargeMinC, maxC: c.ChargeMaxC,
		maxW: c.MaxChargeC * p.CapacityMAh() / 1000 * p.NominalV(), eff: c.ChargeEfficiency, fullWh: p.EnergyWh()}
}

// charge offers surplusWh over dtH hours at tempC to cells holding e Wh. It
// returns the energy stored, lost to charge inefficiency, and left unused.
func (c charger) charge(e, surplusWh, tempC, dtH float64) (stored, lost, unused float64) {
	if surplusWh <= 0 {
		return 0, 0, 0
	}
	if !c.can || tempC < c.minC || tempC > c.maxC {
		return 0, 0, surplusWh
	}
	accepted := min(surplusWh, c.maxW*dtH, max(c.fullWh-e, 0)/c.eff)
	stored = accepted * c.eff
	return stored, accepted - stored, surplusWh - accepted
}
