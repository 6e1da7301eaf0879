package sim

import (
	"nodelife/engine/cell"
)

// Limits that stop cells from carrying the node.
const (
	LimitEnergy      = "energy"      // no usable energy left at this temperature
	LimitVoltage     = "voltage"     // the voltage under the node's peak current falls below its minimum
	LimitTemperature = "temperature" // the cells are outside their rated temperature range
)

// cellSet is one set of cells in the pack as the simulation carries it.
type cellSet struct {
	storedWh float64
	health   float64 // capacity left, as a fraction of rated (1 when new)
}

func newCellSet(ratedWh float64) cellSet { return cellSet{storedWh: ratedWh, health: 1} }

// packModel holds what does not change during a run.
type packModel struct {
	pack    cell.Pack
	ratedWh float64
	chg     charger
	peakA   float64 // the node's peak current from the cells
	minV    float64 // the node's minimum input voltage
	ocv     []cell.SoCPoint
	series  float64
	fading  bool
}

func newPackModel(p cell.Pack, peakA, minV float64) *packModel {
	c := p.Chem
	return &packModel{pack: p, ratedWh: p.EnergyWh(), chg: newCharger(p), peakA: peakA, minV: minV,
		ocv: c.OCV, series: float64(p.Series), fading: !c.Primary && (c.CalendarFadePerYear > 0 || c.CycleFadePerCycle > 0)}
}

// stepEnv is one step's conditions, the same for every cell set.
type stepEnv struct {
	tempC  float64
	tempOK bool    // inside the cells' rated range
	usable float64 // usable fraction of capacity at tempC
	rOhm   float64 // the pack's internal resistance at tempC
	// trappedNew and socPerWhNew are socPct's constants for new cells.
	trappedNew, socPerWhNew float64
	// socMin is the state of charge (by energy) below which the pack's
	// voltage under the node's peak current falls below its minimum: the
	// voltage check reduced to one comparison (the OCV curve rises with SoC).
	socMin     float64
	calFadePer float64 // calendar fade this step (fraction of capacity)
	dtH        float64
	loadWh     float64 // the node's load over the step
	harvestWh  float64 // delivered by the harvester over the step
	sdWh       float64 // self-discharge over the step
}

// stepResult is what one step did to a cell set.
type stepResult struct {
	drawnWh  float64 // load drawn from the cells (beyond what harvest covered directly)
	directWh float64 // load covered directly by harvest
	sdWh     float64 // lost to self-discharge
	storedWh float64 // harvest surplus stored
	lostWh   float64 // harvest surplus lost to charge inefficiency
	unusedWh float64 // harvest surplus the cells could not take
	fadeWh   float64 // stored energy above the faded capacity, lost
	carried  float64 // share of the part the cells carried the node (1 unless flat within it)
	limit    string  // why they could not carry it, or ""
}

// step runs part (0–1] of a step on c: the harvest feeds the load first, the
// cells give the rest and their self-discharge, then take what they can of
// the surplus; they age; and the voltage under the node's peak current is
// checked. Outside the rated temperature range the node is down: the cells
// only self-discharge and the harvest goes unused.
//
// It fills *r (a pointer, as the result is large and the loop hot).
func (m *packModel) step(c *cellSet, e *stepEnv, part float64, r *stepResult) {
	if !e.tempOK {
		sd := min(e.sdWh*part, c.storedWh)
		c.storedWh -= sd
		*r = stepResult{sdWh: sd, unusedWh: e.harvestWh * part, limit: LimitTemperature}
		return
	}
	direct := min(e.harvestWh, e.loadWh) * part
	surplus := e.harvestWh*part - direct
	draw := e.loadWh*part - direct
	sd := e.sdWh * part
	need := draw + sd
	capWh := m.ratedWh * c.health
	trapped := capWh * (1 - e.usable)
	frac := 1.0
	if avail := c.storedWh - trapped; need > 0 && avail < need {
		frac = max(avail, 0) / need
	}
	c.storedWh -= need * frac
	*r = stepResult{drawnWh: draw * frac, directWh: direct * frac, sdWh: sd * frac, carried: frac}
	r.storedWh, r.lostWh, r.unusedWh = m.chg.charge(c.storedWh, capWh, surplus*frac, e.tempC, e.dtH*part*frac)
	c.storedWh += r.storedWh
	if frac < 1 {
		r.limit = LimitEnergy
		return
	}
	if m.fading {
		// Calendar fade over the step, and cycle fade per equivalent full
		// cycle discharged.
		ch := m.pack.Chem
		c.health -= e.calFadePer*part + ch.CycleFadePerCycle*r.drawnWh/m.ratedWh
		if capNow := m.ratedWh * c.health; c.storedWh > capNow {
			r.fadeWh = c.storedWh - capNow
			c.storedWh = capNow
		}
	}
	if c.storedWh < e.socMin*m.ratedWh*c.health {
		r.limit = LimitVoltage
	}
}

// socPct is the state of charge: the energy the cells can still deliver at
// the step's temperature, as a share of what they deliver when full at it.
func (m *packModel) socPct(c *cellSet, e *stepEnv) float64 {
	if c.health == 1 { // new cells (primaries always): no division per step
		return max(c.storedWh-e.trappedNew, 0) * e.socPerWhNew
	}
	capWh := m.ratedWh * c.health
	return max(c.storedWh-capWh*(1-e.usable), 0) / (capWh * e.usable) * 100
}

// freshHolds reports whether new, full cells would hold the node's minimum
// voltage under its peak current in the step's conditions: if not, swapping
// cannot help.
func (m *packModel) freshHolds(e *stepEnv) bool {
	return e.socMin <= 1
}

// socMinAt returns the state of charge below which the pack cannot hold the
// node's minimum voltage under its peak current through rOhm: the inverse
// of the OCV curve at (minV + I·R) per cell; 0 when even an empty pack holds
// it, above 1 when even a full one cannot.
func (m *packModel) socMinAt(rOhm float64) float64 {
	if m.peakA <= 0 || len(m.ocv) == 0 {
		return 0
	}
	need := (m.minV + m.peakA*rOhm) / m.series // per cell, open circuit
	tab := m.ocv
	switch {
	case need <= tab[0].V:
		return 0
	case need > tab[len(tab)-1].V:
		return 2
	}
	for i := 1; i < len(tab); i++ {
		if need <= tab[i].V {
			a, b := tab[i-1], tab[i]
			if b.V == a.V {
				return a.SoC
			}
			return a.SoC + (b.SoC-a.SoC)*(need-a.V)/(b.V-a.V)
		}
	}
	return 2
}

// ocvAt interpolates an OCV curve linearly, held at its ends.
func ocvAt(tab []cell.SoCPoint, soc float64) float64 {
	if soc <= tab[0].SoC {
		return tab[0].V
	}
	for i := 1; i < len(tab); i++ {
		if soc <= tab[i].SoC {
			a, b := tab[i-1], tab[i]
			return a.V + (b.V-a.V)*(soc-a.SoC)/(b.SoC-a.SoC)
		}
	}
	return tab[len(tab)-1].V
}
