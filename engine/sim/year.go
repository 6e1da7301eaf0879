package sim

import (
	"time"

	"nodelife/engine/climate"
	"nodelife/engine/scenario"
)

// Year is the site's environment through one typical year at the
// simulation's resolution: the cell temperature and the harvested power for
// each slot of each UTC calendar day. Rows follow a leap year's 366 days, so
// 29 February has its own; a simulated instant uses the row of its UTC month
// and day in any year. Each slot holds the value at its midpoint.
//
// A Year depends only on the site, the harvester and the resolution, not on
// the node or the cells, so callers that re-run a scenario after editing the
// load or the cells can build it once and reuse it (see RunWith).
type Year struct {
	ResMin   int       // slot length, minutes; divides 1440
	PerDay   int       // slots per day
	TempC    []float64 // cell temperature, °C
	HarvestW []float64 // power the harvester delivers to the cells' charger, W; nil without one
}

// tableYear is the leap year whose calendar lays out the rows.
const tableYear = 2028

// resolutionFor returns the largest divisor of 1440 not above stepMin, so
// slots tile every day exactly.
func resolutionFor(stepMin int) int {
	for r := stepMin; r > 1; r-- {
		if 1440%r == 0 {
			return r
		}
	}
	return 1
}

// NewYear builds the environment table of a scenario's site at the
// resolution its plan.step_min needs.
func NewYear(s scenario.Scenario) *Year {
	res := resolutionFor(s.Plan.StepMin)
	y := &Year{ResMin: res, PerDay: 1440 / res}
	n := 366 * y.PerDay
	y.TempC = make([]float64, n)
	clim := climate.ForSite(s.Site)
	if clim.Constant() {
		t := clim.TempC(1, 0)
		for i := range y.TempC {
			y.TempC[i] = t
		}
		return y
	}
	// Local mean solar time: UTC + longitude/15 h.
	solar := time.Duration(s.Site.LonDeg / 15 * float64(time.Hour))
	base := time.Date(tableYear, 1, 1, 0, 0, 0, 0, time.UTC)
	half := time.Duration(res) * time.Minute / 2
	for i := range n {
		mid := base.Add(time.Duration(i)*time.Duration(res)*time.Minute + half).Add(solar)
		hour := float64(mid.Hour()) + float64(mid.Minute())/60 + float64(mid.Second())/3600
		y.TempC[i] = clim.TempC(float64(mid.YearDay())+hour/24, hour)
	}
	return y
}

// row returns the table row of a UTC month and day.
func row(m time.Month, d int) int {
	return daysBefore[m-1] + d - 1
}

// daysBefore[m] is the number of days before month m+1 in a leap year.
var daysBefore = [12]int{0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335}

// Index returns the slot of the instant t.
func (y *Year) Index(t time.Time) int {
	u := t.UTC()
	return row(u.Month(), u.Day())*y.PerDay + (u.Hour()*60+u.Minute())/y.ResMin
}
