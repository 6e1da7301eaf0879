package load

import (
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"
)

// steady is a node with a constant load: the meaning of a scenario before
// schedules existed.
func steady() Params {
	return Params{SleepW: 60e-6, RegulatorEfficiency: 0.85, FPS: 5, ClosedFPS: 5, DarkFPS: 60,
		FrameJ: 200e-6, EmptyShare: 1, MaxExposureS: 0.066, ExposureSAt100Lux: 0.01, ThresholdLux: 5,
		Weekly: Flat(12), WakeJ: 60e-3, DwellS: 10}
}

func TestSteadyBreakdownByHand(t *testing.T) {
	// Hand-computed: sleep 60 µW; vision 5 fps × 200 µJ = 1 mW; events
	// 12 /h × 60 mJ / 3600 s = 0.2 mW; node total 1.26 mW; through an 85 %
	// regulator the cells give 1.26/0.85 = 1.482353 mW, of which
	// 0.222353 mW is the regulator's loss.
	p := steady()
	b := p.CellW(Conditions{Weekday: 2, Hour: 3, Open: true, Lux: 0})
	assert.InEpsilon(t, 60e-6, b[Sleep], 1e-12)
	assert.InEpsilon(t, 1e-3, b[Vision], 1e-12)
	assert.InEpsilon(t, 0.2e-3, b[Events], 1e-12)
	assert.Zero(t, b[Illuminator])
	assert.Zero(t, b[Radio])
	assert.InEpsilon(t, 1.26e-3/0.85-1.26e-3, b[Regulator], 1e-12)
	assert.InEpsilon(t, 1.26e-3/0.85, b.Total(), 1e-12)
}

// TestScheduledDayByHand: a fixed schedule whose daily energy is worked out
// by hand here, to 1e-9.
func TestScheduledDayByHand(t *testing.T) {
	p := Params{
		SleepW: 50e-6, RegulatorEfficiency: 0.8, QuiescentW: 2e-6 * 3.6,
		FPS: 4, ClosedFPS: 1, DarkFPS: 2, BusyFPS: 8,
		FrameJ: 250e-6, EmptyShare: 0.4, SensorW: 0.5e-3, ExposureSAt100Lux: 0.01, MaxExposureS: 0.05,
		IlluminatorW: 50e-3, PulseS: 0.004, ThresholdLux: 5,
		DwellS: 30, HoldoffS: 60, WakeJ: 20e-3, MessageJ: 30e-3, HeartbeatsPerDay: 24,
	}
	// Open 08:00–18:00 under 300 lx, with 6 detections an hour; closed and
	// dark the rest of the day, with none.
	for h := 8; h < 18; h++ {
		p.Weekly[0][h] = 6
	}
	var dayJ float64
	for h := 0; h < 24; h++ {
		c := Conditions{Weekday: 0, Hour: h, Open: h >= 8 && h < 18, Lux: 0}
		if c.Open {
			c.Lux = 300
		}
		dayJ += p.CellW(c).Total() * 3600
	}
	// By hand. Open hour: busy = 6 × 30/3600 = 0.05; wakes = 6/(1 + 6·60/3600)
	// = 6/1.1 = 5.454545…/h; fps = 4·0.95 + 8·0.05 = 4.2; exposure at 300 lx
	// = 0.01·100/300 = 3.333 ms; frame = 250 µJ·(0.05 + 0.95·0.4) + 0.5 mW·
	// 3.333 ms = 107.5 µJ + 1.6667 µJ = 109.1667 µJ; vision = 4.2 × 109.1667 µJ
	// = 458.5 µW; events = 5.4545/h × 20 mJ = 30.303 µW; radio = (5.4545 + 1)/h
	// × 30 mJ = 53.788 µW; node = 50 + 458.5 + 30.303 + 53.788 = 592.59 µW.
	wakes := 6 / 1.1
	vision := 4.2 * (250e-6*(0.05+0.95*0.4) + 0.5e-3*(0.01*100.0/300))
	openNode := 50e-6 + vision + wakes*20e-3/3600 + (wakes+1)*30e-3/3600
	// Closed hour: dark (0 lx < 5): fps = min(1, 2) = 1; exposure capped at
	// 50 ms; frame = 250 µJ·0.4 + 0.5 mW·50 ms = 125 µJ; LED 50 mW × 4 ms =
	// 200 µJ a frame; radio = 1 heartbeat/h × 30 mJ.
	closedNode := 50e-6 + 1*(250e-6*0.4+0.5e-3*0.05) + 1*50e-3*0.004 + 1*30e-3/3600
	cells := func(node float64) float64 { return node/0.8 + 2e-6*3.6 }
	want := (10*cells(openNode) + 14*cells(closedNode)) * 3600
	assert.InEpsilon(t, want, dayJ, 1e-9)
}

func TestWakesAndBusy(t *testing.T) {
	// Knoll's non-paralysable dead time: at one detection a second with a
	// one-second hold-off, half of them wake the host.
	assert.InDelta(t, 1800, WakesPerHour(3600, 1), 1e-9)
	assert.Equal(t, 10.0, WakesPerHour(10, 0))
	assert.Equal(t, 1.0, BusyShare(1000, 60), "capped at always busy")
	assert.InDelta(t, 0.25, BusyShare(30, 30), 1e-12)
}

func TestDarknessBringsTheIlluminator(t *testing.T) {
	p := steady()
	p.IlluminatorW, p.PulseS = 60e-3, 0.002
	lit := p.CellW(Conditions{Open: true, Lux: 200})
	dark := p.CellW(Conditions{Open: true, Lux: 1})
	assert.Zero(t, lit[Illuminator])
	assert.InEpsilon(t, 5*60e-3*0.002, dark[Illuminator], 1e-12, "fps × LED power × pulse")
	assert.Greater(t, dark.Total(), lit.Total())
}

func TestMoreWorkNeverLess(t *testing.T) {
	base := steady()
	base.SensorW, base.IlluminatorW, base.PulseS, base.MessageJ = 0.5e-3, 50e-3, 0.003, 20e-3
	base.EmptyShare, base.BusyFPS = 0.5, 10
	c := Conditions{Open: true, Hour: 12, Lux: 50}
	for name, change := range map[string]func(p *Params){
		"more frames":      func(p *Params) { p.FPS *= 2 },
		"more detections":  func(p *Params) { p.Weekly = Flat(40) },
		"more sleep power": func(p *Params) { p.SleepW += 10e-6 },
		"worse regulator":  func(p *Params) { p.RegulatorEfficiency -= 0.1 },
		"heartbeats":       func(p *Params) { p.HeartbeatsPerDay = 96 },
	} {
		p := base
		change(&p)
		assert.Greater(t, p.CellW(c).Total(), base.CellW(c).Total(), name)
	}
	// A darker scene never costs less (longer exposures, then the LED).
	prev := 0.0
	for _, lux := range []float64{10000, 1000, 100, 10, 5, 4.99, 1, 0} {
		w := base.CellW(Conditions{Open: true, Hour: 12, Lux: lux}).Total()
		assert.GreaterOrEqual(t, w, prev, "at %g lx", lux)
		prev = w
	}
}

func TestOccupancies(t *testing.T) {
	for _, o := range Occupancies() {
		w := o.Weekly(10)
		var sum float64
		for d := range w {
			for h := range w[d] {
				assert.GreaterOrEqual(t, w[d][h], 0.0)
				sum += w[d][h]
			}
		}
		assert.InDelta(t, 10, sum/168, 1e-9, "%s: the weekly mean is the rate asked for", o.ID)
	}
	office, _ := LookupOccupancy("office")
	w := office.Weekly(5)
	assert.Greater(t, w[1][9], w[6][9], "offices are busier on a Tuesday morning than a Sunday")
	assert.Zero(t, w[2][2], "and empty at 2 in the morning")
	_, ok := LookupOccupancy("stadium")
	assert.False(t, ok)
}

func TestComponentNames(t *testing.T) {
	var names []string
	for c := Component(0); c < NumComponents; c++ {
		names = append(names, c.String())
	}
	assert.Equal(t, []string{"sleep", "vision", "illuminator", "events", "radio", "regulator"}, names)
}

func ExampleParams_CellW() {
	p := steady()
	b := p.CellW(Conditions{Open: true, Hour: 12, Lux: 300})
	for c := Component(0); c < NumComponents; c++ {
		fmt.Printf("%-11s %.3f mW\n", c, b[c]*1e3)
	}
	// Output:
	// sleep       0.060 mW
	// vision      1.000 mW
	// illuminator 0.000 mW
	// events      0.200 mW
	// radio       0.000 mW
	// regulator   0.222 mW
}

func BenchmarkCellW(b *testing.B) {
	p := steady()
	p.SensorW, p.IlluminatorW, p.PulseS = 0.5e-3, 50e-3, 0.003
	c := Conditions{Open: true, Hour: 12, Lux: 42}
	for b.Loop() {
		c.Lux++
		p.CellW(c)
	}
}
