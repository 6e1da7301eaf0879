package sim

import (
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/load"
	"nodelife/engine/scenario"
)

// monthIlluminatorWh sums the illuminator's energy over each calendar month
// of a one-year run (the ledger keeps totals only, so run month by month).
func illuminatorWh(s scenario.Scenario, start string) float64 {
	s.Plan.Start, s.Plan.Years = start, 1
	r := Run(s)
	return r.Ledger.LoadWh[load.Illuminator]
}

func TestTwilight(t *testing.T) {
	assert.InDelta(t, 400, TwilightLux(0), 1e-9)
	assert.InDelta(t, 400, TwilightLux(10), 1e-9)
	assert.InDelta(t, 40, TwilightLux(-2.5), 1e-9)
	assert.Less(t, TwilightLux(-6), 5.0, "dark by the end of civil twilight (an illuminator's usual threshold)")
}

func TestIlluminatorFollowsDarkness(t *testing.T) {
	// Svalbard, 78.2° N: in mid-December the sun stays more than 11° below
	// the horizon all day (nodelife sun), so every slot is dark.
	sv := scenario.Default()
	sv.Site.LatDeg, sv.Site.LonDeg, sv.Site.Timezone, sv.Site.Placement = 78.2, 15.6, "Arctic/Longyearbyen", scenario.Outdoor
	ys := mustYear(sv)
	for d := row(12, 10); d < row(12, 20); d++ {
		for k := 0; k < ys.PerDay; k++ {
			require.Less(t, ys.LuxOutdoor[d*ys.PerDay+k], sv.Node.Illuminator.ThresholdLux, "day %d slot %d", d, k)
		}
	}
	// Tromsø, 69.6° N: midnight sun in June, polar night in December.
	s := scenario.Default()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 69.65, 18.96, "Europe/Oslo"
	s.Site.Placement = scenario.Outdoor
	s.Node.Illuminator.PowerMW, s.Node.Illuminator.PulseMS = 50, 4
	s.Cells.Form = "D"
	s.Plan.StepMin = 10
	y := mustYear(s)
	june, dec := 0, 0
	for d := row(6, 10); d < row(6, 20); d++ {
		for k := 0; k < y.PerDay; k++ {
			if y.LuxOutdoor[d*y.PerDay+k] < s.Node.Illuminator.ThresholdLux {
				june++
			}
		}
	}
	for d := row(12, 10); d < row(12, 20); d++ {
		for k := 0; k < y.PerDay; k++ {
			if y.LuxOutdoor[d*y.PerDay+k] < s.Node.Illuminator.ThresholdLux {
				dec++
			}
		}
	}
	assert.Zero(t, june, "no dark slot in mid-June under the midnight sun")
	assert.Greater(t, dec, 8*y.PerDay, "most of mid-December's polar night is dark (noon twilight aside)")

	// Over a year, the LED's energy by month: none in June, most in December.
	s.Plan.Start, s.Plan.Years = "2027-01-01", 1
	monthly := map[time.Month]float64{}
	p := LoadParams(s, 3.6)
	for d := 0; d < 365; d++ {
		day := time.Date(2027, 1, 1+d, 0, 0, 0, 0, time.UTC)
		for k := 0; k < y.PerDay; k++ {
			i := y.Index(day.Add(time.Duration(k*y.ResMin) * time.Minute))
			w := p.CellW(load.Conditions{Open: true, Lux: y.LuxOutdoor[i]})
			monthly[day.Month()] += w[load.Illuminator] * float64(y.ResMin) / 60
		}
	}
	assert.Zero(t, monthly[time.June])
	for m := time.January; m <= time.December; m++ {
		assert.LessOrEqual(t, monthly[m], monthly[time.December], "%v", m)
	}
	// And the simulation carries it: the whole year's LED energy is that sum.
	r := Run(s)
	var yearWh float64
	for _, wh := range monthly {
		yearWh += wh
	}
	assert.InEpsilon(t, yearWh, r.Ledger.LoadWh[load.Illuminator], 0.01)
}

func TestIndoorLightsAlwaysOnNeverLightTheLED(t *testing.T) {
	s := scenario.Demo()
	s.Node.Illuminator.PowerMW = 50
	s.Site.Hours.Open, s.Site.Hours.Close = "00:00", "24:00"
	s.Site.Hours.Days = scenario.Weekdays()
	s.Site.Lighting.OpenLux = 300
	r := Run(s)
	assert.Zero(t, r.Ledger.LoadWh[load.Illuminator])
	// Lights off at night: the LED works then.
	s.Site.Hours.Open, s.Site.Hours.Close = "07:00", "21:00"
	r = Run(s)
	assert.Greater(t, r.Ledger.LoadWh[load.Illuminator], 0.0)
}

// TestWeeklyProfileAcrossClockChange: the weekly profile follows the local
// clock, so on the Sunday the clocks go forward (Europe/Oslo, 28 March 2027)
// the 02:00 hour does not exist and its events are not counted; on the day
// they go back (31 October) the 02:00 hour happens twice.
func TestWeeklyProfileAcrossClockChange(t *testing.T) {
	s := scenario.Demo()
	s.Node.Vision.FPS, s.Node.SleepUW, s.Node.RegulatorEfficiency = 0, 0, 1
	s.Node.Events.WakeMJ = 3600 // 1 mWh per event
	s.Node.Events.Weekly = make([]float64, 168)
	s.Node.Events.Weekly[6*24+2] = 1 // Sunday 02:00–03:00: one event
	s.Node.Events.Weekly[6*24+12] = 1
	s.Plan.StepMin = 10
	dayWh := func(date string) float64 {
		s.Plan.Start, s.Plan.Years = date, 1
		r := Run(s)
		return r.Days[0].LoadWh
	}
	assert.InDelta(t, 2e-3, dayWh("2027-03-21"), 1e-12, "an ordinary Sunday: two event-hours")
	assert.InDelta(t, 1e-3, dayWh("2027-03-28"), 1e-12, "spring forward: 02:00–03:00 never happens")
	assert.InDelta(t, 3e-3, dayWh("2027-10-31"), 1e-12, "fall back: 02:00–03:00 happens twice")
}

func TestMoreWorkOrDarkerNeverLongerLife(t *testing.T) {
	base := scenario.Demo()
	base.Site.Placement = scenario.Outdoor
	base.Node.Illuminator.PowerMW = 40
	base.Node.Vision.SensorMW = 0.5
	// Light only: without sun on the enclosure, a cloudier sky does not also
	// cool the cells (which would slow their self-discharge).
	base.Site.Enclosure.Absorptance = 0
	life := func(s scenario.Scenario) float64 {
		r := Run(s)
		require.False(t, r.Flat.IsZero())
		return r.Flat.Sub(r.Start).Hours()
	}
	ref := life(base)
	more := map[string]func(s *scenario.Scenario){
		"more frames": func(s *scenario.Scenario) { s.Node.Vision.FPS *= 2 },
		"more events": func(s *scenario.Scenario) { s.Node.Events.PerHour *= 3 },
		"busier week": func(s *scenario.Scenario) { s.Node.Events.Occupancy = "store"; s.Node.Events.PerHour *= 3 },
		"darker site": func(s *scenario.Scenario) {
			s.Site.Climate.Clearness = []float64{0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1}
		},

		"heartbeats": func(s *scenario.Scenario) { s.Node.Radio.Class, s.Node.Heartbeat.PerDay = "lora", 48 },
	}
	for name, change := range more {
		s := base
		change(&s)
		assert.LessOrEqual(t, life(s), ref, name)
	}
}

func TestRadioClassesAddMessages(t *testing.T) {
	s := scenario.Demo()
	s.Node.Events.WakeMJ = 20
	for _, class := range []string{"ble", "lora", "wifi", "lpwa"} {
		s.Node.Radio.Class = class
		j := MessageJ(s)
		assert.Greater(t, j, 0.0, class)
		r := Run(s)
		wakes := s.Node.Events.PerHour * r.End.Sub(r.Start).Hours()
		assert.InEpsilon(t, wakes*j/3600, r.Ledger.LoadWh[load.Radio], 0.01, class)
		assert.GreaterOrEqual(t, NodePeakMA(s), scenario.DefaultPeakMA, class)
	}
	// REFERENCE-VALUES §8.3 and §8.1: a Wi-Fi connect-and-post costs far more
	// than a LoRa-class uplink at SF9.
	s.Node.Radio.Class = "wifi"
	wifi := MessageJ(s)
	s.Node.Radio.Class = "lora"
	assert.Greater(t, wifi, 5*MessageJ(s))
	s.Node.Radio.Class, s.Node.Radio.MessageMJ = "fixed", 12
	assert.InDelta(t, 0.012, MessageJ(s), 1e-15)
	s.Node.Radio.Class = "none"
	assert.Zero(t, MessageJ(s))
}
