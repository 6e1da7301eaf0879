package sim

import (
	"time"

	"nodelife/engine/scenario"
)

// openHours answers whether the site is open at a local weekday and clock
// minute.
type openHours struct {
	days        [7]bool // by time.Weekday: Sunday is 0
	open, close int     // minutes after midnight
}

func newOpenHours(h scenario.Hours) openHours {
	var o openHours
	o.open, _ = scenario.ClockMinutes(h.Open)
	o.close, _ = scenario.ClockMinutes(h.Close)
	ids := scenario.Weekdays() // Monday first
	for _, d := range h.Days {
		for i, id := range ids {
			if d == id {
				o.days[(i+1)%7] = true
			}
		}
	}
	return o
}

// isOpen reports whether the site is open at minute m of weekday wd. Opening
// and closing at the same time means open all day on the listed days; a
// closing time before the opening time runs past midnight into the next day.
func (o openHours) isOpen(wd time.Weekday, m int) bool {
	switch {
	case o.open == o.close:
		return o.days[wd]
	case o.open < o.close:
		return o.days[wd] && m >= o.open && m < o.close
	}
	prev := (wd + 6) % 7
	return (o.days[wd] && m >= o.open) || (o.days[prev] && m < o.close)
}

// lux is the illuminance of the site's lights at the node.
func (o openHours) lux(l scenario.Lighting, wd time.Weekday, m int) float64 {
	if o.isOpen(wd, m) {
		return l.OpenLux
	}
	return l.ClosedLux
}

// visitRule says on which local days cells may be swapped.
type visitRule struct {
	days    [7]bool  // by time.Weekday
	blocked [13]bool // by time.Month
}

func newVisitRule(p scenario.Plan) visitRule {
	var v visitRule
	ids := scenario.Weekdays() // Monday first
	for _, d := range p.VisitDays {
		for i, id := range ids {
			if d == id {
				v.days[(i+1)%7] = true
			}
		}
	}
	for _, m := range p.BlockedMonths {
		for i, id := range scenario.Months() {
			if m == id {
				v.blocked[i+1] = true
			}
		}
	}
	return v
}

// allowed reports whether a visit may happen on the local date of day.
func (v visitRule) allowed(day time.Time) bool {
	return v.days[day.Weekday()] && !v.blocked[day.Month()]
}
